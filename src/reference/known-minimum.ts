/**
 * Known minimum reached: does every run of a case end at the published minimum value — the global f*, or
 * the local basin the declaration names (for problems where gradient methods settle in a local minimum,
 * e.g. Freudenstein–Roth's 48.9842 at (11.4128, −0.896805), Moré, Garbow & Hillstrom 1981, problem 2)?
 *
 * A run reaches the target when |f_final − f_target| ≤ tolerance, absolute or relative to |f_target|, plus
 * one unit in the last digit of the published value: tables print values truncated or rounded, and
 * 48.9842 is the exact local minimum 48.98425367924… truncated (rounding would give 48.9843), so a run at
 * the exact minimum is 5.4e−5 away from the published value. At least `share` of the seeds must reach it. The final loss comes from the results
 * (f* + final gap of each run), or, without results, from the check's own runs of the case's seeds
 * with the case's step budget. A run that fails its target is named with where it ended: diverged,
 * failed, or at another known minimum of the problem.
 */
import type { Basin, ProblemDefinition } from "../core/types.js";
import type { CheckResult } from "../compare/types.js";
import type { CaseSpec, RunMetrics } from "../runner/types.js";
import { short } from "./format.js";
import { probeInstance } from "./spectrum.js";
import type { TrajectorySource } from "./trajectory.js";

export interface MinimumTolerance {
  readonly kind: "absolute" | "relative";
  readonly value: number;
}

export interface MinimumRequest {
  readonly spec: CaseSpec;
  readonly definition: ProblemDefinition;
  readonly suiteSeed: number;
  /** "global" or the name of one of the problem's basins. */
  readonly basin: string;
  readonly tolerance: MinimumTolerance;
  /** Fraction of the seeds that must reach the target. */
  readonly share: number;
  readonly gating: boolean;
  /** The case's runs from the results; when absent the check runs the seeds itself with `source`. */
  readonly runs?: readonly RunMetrics[];
  readonly source?: TrajectorySource;
}

/** A value the runs may end at: the global minimum or a declared basin. */
interface Target {
  readonly name: string;
  readonly f: number;
  readonly text: string;
  readonly source: string;
}

/**
 * One unit in the last digit of `value` as JavaScript spells it (its shortest round-trip form):
 * 48.9842 → 1e−4, 1.12793e−8 → 1e−13, 0 → 0. A value computed to full precision gets about 1e−16 relative.
 */
export function lastDigitUnit(value: number): number {
  if (value === 0 || !Number.isFinite(value)) return 0;
  const text = Math.abs(value).toExponential();
  const [mantissa, exponent] = text.split("e");
  const decimals = mantissa.includes(".") ? mantissa.split(".")[1].length : 0;
  return Math.pow(10, Number(exponent) - decimals);
}

function targets(definition: ProblemDefinition, spec: CaseSpec): Target[] {
  const out: Target[] = [];
  if (spec.fStarKind !== "lower-bound") {
    out.push({
      name: "global",
      f: spec.fStar,
      text: `the global minimum f* = ${spec.fStar}`,
      source: definition.fStarNote ? `${definition.source}; ${definition.fStarNote}` : definition.source,
    });
  }
  for (const b of definition.basins ?? []) out.push(basinTarget(b));
  return out;
}

function basinTarget(b: Basin): Target {
  return {
    name: b.name,
    f: b.f,
    text: `the ${b.name} basin f = ${b.f} at (${b.x.join(", ")})`,
    source: b.source,
  };
}

/** The largest |f − target| a run may have: the declared tolerance plus the rounding of the target. */
function allowance(target: number, tolerance: MinimumTolerance): number {
  const declared = tolerance.kind === "absolute" ? tolerance.value : tolerance.value * Math.abs(target);
  return declared + lastDigitUnit(target);
}

/** Whether `f` is at target `t`, to name where a run ended: the allowance, but at least 1e−6·max(1, |t|). */
function near(f: number, t: Target, tolerance: MinimumTolerance): boolean {
  return Math.abs(f - t.f) <= Math.max(allowance(t.f, tolerance), 1e-6 * Math.max(1, Math.abs(t.f)));
}

/** Final losses of the case's seeds from the check's own runs. */
async function ownRuns(request: MinimumRequest): Promise<{ seed: number; f: number | null; why?: string }[]> {
  const { spec, source } = request;
  if (source === undefined) throw new Error("known minimum: neither results nor a source to run the case");
  const instance = probeInstance(request.definition, spec.params);
  const out: { seed: number; f: number | null; why?: string }[] = [];
  for (let seed = 0; seed < spec.seeds; seed++) {
    let last = NaN;
    const outcome = await source.run(
      {
        definition: request.definition,
        params: spec.params,
        problemKey: spec.problemKey,
        hyper: spec.hyper,
        steps: spec.budget.steps,
        suiteSeed: request.suiteSeed,
        seedIndex: seed,
      },
      (_k, x) => {
        last = instance.objective(x);
      },
    );
    if (outcome.error !== undefined) out.push({ seed, f: null, why: outcome.error });
    else out.push({ seed, f: Number.isFinite(last) ? last : null, why: "the loss is not finite" });
  }
  return out;
}

function fromResults(
  spec: CaseSpec,
  runs: readonly RunMetrics[],
): { seed: number; f: number | null; why?: string }[] {
  return runs.map((r) => {
    if (r.finalGap !== null) return { seed: r.seed, f: spec.fStar + r.finalGap };
    const why =
      r.stop === "error"
        ? `failed: ${r.error ?? "no reason given"}`
        : r.divergedAt !== null
          ? `diverged (${r.divergence ?? "unknown"}) at step ${r.divergedAt}`
          : `ended without a final loss (${r.stop})`;
    return { seed: r.seed, f: null, why };
  });
}

/** Runs the known-minimum check on one case. */
export async function checkKnownMinimum(request: MinimumRequest): Promise<CheckResult> {
  const { spec, tolerance } = request;
  const all = targets(request.definition, spec);
  const target = all.find((t) => t.name === request.basin);
  if (target === undefined)
    throw new Error(`known minimum: ${spec.problemKey} has no target ${request.basin}`);
  const id = request.basin === "global" ? "known-minimum" : `known-minimum:${request.basin}`;
  const allowed = allowance(target.f, tolerance);
  const rounding = lastDigitUnit(target.f);
  const finals = request.runs !== undefined ? fromResults(spec, request.runs) : await ownRuns(request);
  const required = Math.ceil(request.share * finals.length - 1e-9);
  const misses: string[] = [];
  let reached = 0;
  let worst = 0;
  let worstF: number | null = null;
  for (const run of finals) {
    if (run.f === null) {
      misses.push(`seed ${run.seed} ${run.why ?? "has no final loss"}`);
      continue;
    }
    const off = Math.abs(run.f - target.f);
    if (off >= worst) {
      worst = off;
      worstF = run.f;
    }
    if (off <= allowed) {
      reached++;
      continue;
    }
    const other = all.find((t) => t !== target && near(run.f!, t, tolerance));
    const at = other ? `, ${other.text}` : `, ${short(off)} away`;
    misses.push(`seed ${run.seed} ended at f = ${Number(run.f.toPrecision(7))}${at}`);
  }
  const tolText =
    `${short(tolerance.value)} (${tolerance.kind})` +
    (rounding > 0 ? ` plus ${short(rounding)} for the last digit of the published value` : "");
  const reportedTolerance =
    tolerance.kind === "absolute"
      ? { kind: "absolute" as const, value: allowed }
      : { kind: "relative" as const, value: allowed / Math.abs(target.f) };
  const base = {
    id,
    gating: request.gating,
    source: target.source,
    measured: worstF,
    expected: target.f,
    tolerance: reportedTolerance,
  };
  const head = `known minimum (${target.text})`;
  if (finals.length > 0 && reached >= required) {
    const rest = misses.length > 0 ? `; ${misses.join("; ")}` : "";
    return {
      ...base,
      status: "pass",
      summary: `${head}: ${reached} of ${finals.length} seeds reached it within ${tolText}; largest |f − ${target.f}| = ${short(worst)}${rest}`,
    };
  }
  return {
    ...base,
    status: "fail",
    summary: `${head}: ${reached} of ${finals.length} seeds reached it within ${tolText}, ${required} required: ${misses.join("; ") || "no runs"}`,
  };
}
