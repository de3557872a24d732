/**
 * Runs every declared reference check of a suite and returns their results per case and at gate level,
 * as `CheckResult`s for the verdict document (src/compare/types.ts). Engine code: plain data in, plain
 * data out, no file I/O; the optimizers under test are reached through `sourceFor`.
 *
 * - known minimum: per matched case, from the candidate results when given (else from the check's own
 *   runs of the case's seeds);
 * - rate and stationary variance: per matched case, from the check's own run of seed 0;
 * - conformance: per declaration, at gate level (it is about the code, not about one case).
 * Results keep declaration order; cases keep suite order.
 */
import { InputError, quote } from "../core/errors.js";
import type { CheckResult } from "../compare/types.js";
import { getOptimizer } from "../optimizers/index.js";
import type { CaseResult, SuiteSpec } from "../runner/types.js";
import type { ReferenceChecks } from "./config.js";
import { checkConformance } from "./conformance.js";
import { checkKnownMinimum } from "./known-minimum.js";
import { checkRate } from "./rate-check.js";
import { checkStationary } from "./stationary-check.js";
import { type TrajectorySource, inProcessSource } from "./trajectory.js";

export interface ReferenceCheckInput {
  readonly suite: SuiteSpec;
  /** The suite's `checks`, bound to it by `resolveChecks`. */
  readonly checks: ReferenceChecks;
  /** The candidate's results; known-minimum checks read the final losses from them. */
  readonly results?: readonly CaseResult[];
  /** How to run the optimizer of a case, by its canonical `use` (e.g. "reference:adam"). */
  readonly sourceFor?: (use: string) => TrajectorySource | Promise<TrajectorySource>;
}

export interface ReferenceCheckReport {
  /** Results per case id, in suite order (cases without checks are absent). */
  readonly cases: Readonly<Record<string, readonly CheckResult[]>>;
  /** Results that concern an optimizer rather than one case (conformance). */
  readonly gate: readonly CheckResult[];
}

/** Sources for the reference optimizers ("reference:NAME"); anything else is an input error. */
export function referenceSourceFor(use: string): TrajectorySource {
  const [kind, name] = use.includes(":")
    ? [use.slice(0, use.indexOf(":")), use.slice(use.indexOf(":") + 1)]
    : ["reference", use];
  if (kind !== "reference") {
    throw new InputError(
      `reference checks: no way to run ${quote(use)} was given (only reference optimizers run by default)`,
    );
  }
  return inProcessSource(getOptimizer(name, `reference checks: ${quote(use)}`), use);
}

/** Runs the declared checks. Rejects only for input errors and for bugs, never for a failing optimizer. */
export async function runReferenceChecks(input: ReferenceCheckInput): Promise<ReferenceCheckReport> {
  const { suite, checks } = input;
  const sourceFor = input.sourceFor ?? referenceSourceFor;
  const sources = new Map<string, Promise<TrajectorySource>>();
  const source = (use: string) => {
    let s = sources.get(use);
    if (s === undefined) {
      s = Promise.resolve(sourceFor(use));
      sources.set(use, s);
    }
    return s;
  };
  const runsById = new Map<string, CaseResult>();
  for (const r of input.results ?? []) runsById.set(r.case.id, r);

  const perCase = new Map<string, CheckResult[]>();
  const add = (id: string, result: CheckResult) => {
    const list = perCase.get(id) ?? [];
    list.push(result);
    perCase.set(id, list);
  };

  for (const d of checks.minimum) {
    for (const { spec, definition } of d.cases) {
      const result = input.results !== undefined ? runsById.get(spec.id) : undefined;
      if (input.results !== undefined && result === undefined) {
        add(spec.id, {
          id: d.basin === "global" ? "known-minimum" : `known-minimum:${d.basin}`,
          status: "skipped",
          gating: d.gating,
          summary: `known minimum: the results have no runs of case ${spec.id}`,
          source: definition.source,
        });
        continue;
      }
      add(
        spec.id,
        await checkKnownMinimum({
          spec,
          definition,
          suiteSeed: suite.seed,
          basin: d.basin,
          tolerance: d.tolerance,
          share: d.share,
          gating: d.gating,
          ...(result !== undefined ? { runs: result.runs } : { source: await source(spec.use) }),
        }),
      );
    }
  }
  for (const d of checks.rate) {
    for (const { spec, definition } of d.cases) {
      add(
        spec.id,
        await checkRate({
          spec,
          definition,
          suiteSeed: suite.seed,
          method: d.method,
          tuned: d.tuned,
          names: d.names,
          tolerance: d.tolerance,
          maxSteps: d.steps,
          gating: d.gating,
          source: await source(spec.use),
          where: d.where,
        }),
      );
    }
  }
  for (const d of checks.stationary) {
    for (const { spec, definition } of d.cases) {
      add(
        spec.id,
        await checkStationary({
          spec,
          definition,
          suiteSeed: suite.seed,
          names: d.names,
          precision: d.precision,
          sigmas: d.sigmas,
          gating: d.gating,
          source: await source(spec.use),
          where: d.where,
        }),
      );
    }
  }
  const gate: CheckResult[] = [];
  for (const d of checks.conformance) {
    gate.push(
      ...(await checkConformance({
        optimizer: d.optimizer,
        method: d.method,
        claim: d.hyper,
        base: d.spec.hyper,
        names: d.names,
        expect: d.expect,
        tolerance: d.tolerance,
        gating: d.gating,
        source: await source(d.spec.use),
        where: d.where,
      })),
    );
  }

  const cases: Record<string, readonly CheckResult[]> = {};
  for (const c of suite.cases) {
    const list = perCase.get(c.id);
    if (list !== undefined) cases[c.id] = list;
  }
  return { cases, gate };
}
