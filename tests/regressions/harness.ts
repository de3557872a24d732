/**
 * Runs the injected-regression set: the suite with the reference optimizers (the baseline, with its extra
 * seeds), then, per variant, the suite with one optimizer replaced by the variant, compared exactly as
 * `gradgate compare` does under the given policy (first look, extra seeds for inconclusive cases within
 * the budget, second look). Cases of the other optimizers run the unchanged reference code, so their
 * reference runs are reused (same code, same seeds: the same numbers).
 */
import { buildBaselineFiles } from "../../src/baselines/build.js";
import type { BaselineFile } from "../../src/baselines/types.js";
import { compareResults } from "../../src/compare/compare.js";
import { planExtraSeeds, rerunSummary } from "../../src/compare/extra-seeds.js";
import { resolvePolicy, type Policy } from "../../src/compare/policy.js";
import type { CaseComparison, VerdictDocument } from "../../src/compare/types.js";
import { parseConfig } from "../../src/config/load.js";
import type { OptimizerFactory } from "../../src/core/types.js";
import { getOptimizer } from "../../src/optimizers/index.js";
import { getProblem } from "../../src/problems/index.js";
import { executeRun } from "../../src/runner/execute.js";
import { buildResults, type ResultsDocument } from "../../src/runner/results.js";
import { resolveSuite } from "../../src/runner/suite.js";
import type { CaseResult, CaseSpec, RunMetrics, SuiteSpec } from "../../src/runner/types.js";
import type { Variant } from "./variants.js";

export interface Reference {
  readonly suite: SuiteSpec;
  readonly policy: Policy;
  readonly results: ResultsDocument;
  readonly baselines: Map<string, BaselineFile>;
  /** Runs executed for the baseline. */
  readonly runs: number;
}

export interface VariantOutcome {
  readonly variant: Variant;
  readonly verdict: VerdictDocument;
  /** The cases of the replaced optimizer. */
  readonly cases: readonly CaseComparison[];
  /** Runs executed for this variant (first look plus extra seeds). */
  readonly runs: number;
}

function runSeeds(
  spec: CaseSpec,
  suiteSeed: number,
  factory: OptimizerFactory,
  seeds: readonly number[],
): RunMetrics[] {
  const def = getProblem(spec.problem);
  let scratch: Float64Array | undefined;
  return seeds.map((s) => {
    const out = executeRun(spec, s, suiteSeed, factory, def, { scratch });
    scratch = out.scratch;
    return out.metrics;
  });
}

const range = (from: number, count: number) => Array.from({ length: count }, (_, i) => from + i);

/** Resolves the suite and runs the references on every seed (suite seeds plus the policy's extra seeds). */
export function runReference(configText: string, configFile: string, extraSeeds?: number): Reference {
  const config = parseConfig(configText, configFile);
  const suite = resolveSuite(config, configFile);
  const base = resolvePolicy(config.policy ?? {}, `config ${configFile}: policy`);
  const policy =
    extraSeeds === undefined ? base : { ...base, extraSeeds: { ...base.extraSeeds, perCase: extraSeeds } };
  const cases: CaseResult[] = [];
  const extra = new Map<string, RunMetrics[]>();
  let runs = 0;
  for (const spec of suite.cases) {
    const factory = getOptimizer(spec.use.slice("reference:".length));
    cases.push({ case: spec, runs: runSeeds(spec, suite.seed, factory, range(0, spec.seeds)) });
    const e = runSeeds(spec, suite.seed, factory, range(spec.seeds, policy.extraSeeds.perCase));
    extra.set(spec.id, e);
    runs += spec.seeds + e.length;
  }
  const results = buildResults(suite, cases);
  const files = buildBaselineFiles(
    results,
    { commit: "reference", date: "1970-01-01T00:00:00.000Z", reason: "injected-regression set" },
    extra,
  );
  return { suite, policy, results, baselines: new Map(files.map((f) => [f.optimizer, f])), runs };
}

/** One variant through the whole compare flow. */
export function runVariant(ref: Reference, variant: Variant): VariantOutcome {
  const { suite, policy, results, baselines } = ref;
  let runs = 0;
  const cases = results.cases.map((c) => {
    if (c.case.optimizer !== variant.replaces) return c;
    runs += c.case.seeds;
    return { case: c.case, runs: runSeeds(c.case, suite.seed, variant.factory, range(0, c.case.seeds)) };
  });
  const candidate: ResultsDocument = { ...results, cases };
  let verdict = compareResults(candidate, baselines, { policy });
  const plan = planExtraSeeds(verdict, baselines, policy);
  if (plan.requested.length > 0 && policy.extraSeeds.perCase > 0) {
    const extraRuns = new Map<string, RunMetrics[]>();
    const byId = new Map(cases.map((c) => [c.case.id, c.case]));
    for (const { id, seeds } of plan.cases) {
      const spec = byId.get(id)!;
      // Only the replaced optimizer's code differs; other optimizers' extra runs equal the baseline's.
      const factory =
        spec.optimizer === variant.replaces
          ? variant.factory
          : getOptimizer(spec.use.slice("reference:".length));
      extraRuns.set(id, runSeeds(spec, suite.seed, factory, seeds));
      runs += seeds.length;
    }
    verdict = compareResults(candidate, baselines, {
      policy,
      extraRuns,
      rerun: rerunSummary(plan, policy.extraSeeds.maxRuns),
    });
  }
  return { variant, verdict, cases: verdict.cases.filter((c) => c.optimizer === variant.replaces), runs };
}

/** Counts of a variant's case verdicts and trajectory statuses. */
export function tally(outcome: VariantOutcome) {
  const count = (f: (c: CaseComparison) => boolean) => outcome.cases.filter(f).length;
  return {
    cases: outcome.cases.length,
    regressed: count((c) => c.verdict === "regressed"),
    improved: count((c) => c.verdict === "improved"),
    inconclusive: count((c) => c.verdict === "inconclusive"),
    equivalent: count((c) => c.verdict === "equivalent"),
    unchanged: count((c) => c.verdict === "unchanged"),
    trajectoryChanged: count((c) => c.fingerprint.status === "changed"),
    floatNoise: count((c) => c.fingerprint.status === "float-noise"),
    identical: count((c) => c.fingerprint.status === "identical"),
    gate: outcome.verdict.gate.verdict,
  };
}
