/**
 * From paired runs to the paired samples the statistics work on: one log ratio per seed and metric,
 *   d_i = ln(candidate_i / baseline_i),
 * for the steps to reach each ladder rung, the final gap and the evaluations (lower is better for all).
 *
 * Resolution: step and evaluation counts are integers that locate a crossing only to within one step, so
 * pairs that differ by at most one step (one step's evaluations) count as a tie (d = 0). Final gaps are
 * floored at gapFloor · gap₀ (relative) on both sides: below it, differences are float noise near the
 * optimum, and runs that stopped at the target would otherwise differ by whatever digits were left.
 *
 * Censoring (steps to a rung): a healthy run that did not reach the rung within its budget is known only
 * to need more than its `steps` steps, so `steps + 1` stands in as a bound:
 * - candidate censored: d ≥ ln((steps_c + 1) / s_b), a lower bound — conservative for "regressed";
 * - baseline censored:  d ≤ ln(s_c / (steps_b + 1)), an upper bound — conservative for "improved".
 * For the equivalence test (TOST) censored pairs are the worst case instead: ±`CENSORED_EXTREME`, larger
 * in magnitude than any real pair, so a censored pair can never help show equivalence. Pairs where
 * neither run reached the rung carry no information and are left out; the change in the count of runs
 * reaching the rung is a signal of its own (see sign-test.ts).
 *
 * Runs that diverged or failed are left out of every sample: they are judged seed by seed (a divergence
 * where the baseline did not diverge is a regression whatever the statistics say).
 */
import type { CaseSpec, RunMetrics } from "../runner/types.js";
import type { MetricKind } from "./types.js";

export interface PairedRun {
  readonly seed: number;
  readonly base: RunMetrics;
  readonly cand: RunMetrics;
}

export interface MetricSample {
  readonly metric: string;
  readonly kind: MetricKind;
  readonly rung: number | null;
  /** Log ratios with censored pairs at their bounds. */
  readonly d: Float64Array;
  /** Log ratios with censored pairs at ±CENSORED_EXTREME (for TOST). */
  readonly dEquivalence: Float64Array;
  /** For each value of `d`, the index of its seed pair in the case's pair list (for the joint bootstrap). */
  readonly pairIndex: Int32Array;
  readonly ties: number;
  readonly censoredBaseline: number;
  readonly censoredCandidate: number;
  readonly reach?: { baseline: number; candidate: number; lost: number; gained: number };
}

interface Indexed {
  readonly pair: number;
  readonly base: RunMetrics;
  readonly cand: RunMetrics;
}

/** Stand-in magnitude of a censored pair in the equivalence test: beyond any real log ratio. */
export const CENSORED_EXTREME = 1e6;

/** True when the run neither diverged nor failed. */
export function healthy(run: RunMetrics): boolean {
  return run.stop !== "diverged" && run.stop !== "error";
}

/** Label of a ladder rung metric, e.g. "stepsTo(1e-3)". */
export function rungLabel(rung: number): string {
  return `stepsTo(${rung.toExponential().replace(/\.?0*e\+?/, "e")})`;
}

/** Samples for every metric of a case, in a stable order: rungs (ladder order), finalGap, evaluations. */
export function metricSamples(spec: CaseSpec, pairs: readonly PairedRun[], gapFloor: number): MetricSample[] {
  const ok: Indexed[] = [];
  pairs.forEach((p, pair) => {
    if (healthy(p.base) && healthy(p.cand)) ok.push({ pair, base: p.base, cand: p.cand });
  });
  const out: MetricSample[] = [];
  spec.ladder.forEach((rung, r) => {
    const sample = rungSample(spec, ok, r, rung);
    if (sample !== null) out.push(sample);
  });
  out.push(finalGapSample(spec, ok, gapFloor));
  out.push(evaluationsSample(ok));
  return out;
}

function rungSample(spec: CaseSpec, ok: readonly Indexed[], r: number, rung: number): MetricSample | null {
  const d: number[] = [];
  const dEq: number[] = [];
  const idx: number[] = [];
  let ties = 0;
  let cb = 0;
  let cc = 0;
  let reachB = 0;
  let reachC = 0;
  let lost = 0;
  let gained = 0;
  for (const { pair, base, cand } of ok) {
    const sb = base.stepsTo[r];
    const sc = cand.stepsTo[r];
    if (sb !== null) reachB++;
    if (sc !== null) reachC++;
    if (sb !== null && sc === null) lost++;
    if (sb === null && sc !== null) gained++;
    if (sb !== null && sc !== null) {
      idx.push(pair);
      if (Math.abs(sc - sb) <= 1) {
        ties++;
        d.push(0);
        dEq.push(0);
      } else {
        const v = Math.log(Math.max(sc, 1)) - Math.log(Math.max(sb, 1));
        d.push(v);
        dEq.push(v);
      }
    } else if (sb !== null && sc === null && censorable(cand, spec)) {
      cc++;
      idx.push(pair);
      d.push(Math.max(0, Math.log(cand.steps + 1) - Math.log(Math.max(sb, 1))));
      dEq.push(CENSORED_EXTREME);
    } else if (sb === null && sc !== null && censorable(base, spec)) {
      cb++;
      idx.push(pair);
      d.push(Math.min(0, Math.log(Math.max(sc, 1)) - Math.log(base.steps + 1)));
      dEq.push(-CENSORED_EXTREME);
    }
  }
  if (reachB === 0 && reachC === 0) return null;
  return {
    metric: rungLabel(rung),
    kind: "stepsTo",
    rung,
    d: Float64Array.from(d),
    dEquivalence: Float64Array.from(dEq),
    pairIndex: Int32Array.from(idx),
    ties,
    censoredBaseline: cb,
    censoredCandidate: cc,
    reach: { baseline: reachB, candidate: reachC, lost, gained },
  };
}

/** A run that missed a rung because its budget ran out (not because it stopped at the target). */
function censorable(run: RunMetrics, spec: CaseSpec): boolean {
  return run.stop === "steps" || run.stop === "evaluations" || run.stop === "time" || spec.stopAt === 0;
}

function finalGapSample(spec: CaseSpec, ok: readonly Indexed[], gapFloor: number): MetricSample {
  const d: number[] = [];
  const idx: number[] = [];
  let ties = 0;
  for (const { pair, base, cand } of ok) {
    if (base.finalGap === null || cand.finalGap === null) continue;
    idx.push(pair);
    const gap0 = base.f0 === null ? 1 : base.f0 - spec.fStar;
    const floor = gapFloor * Math.max(gap0, 1e-300);
    const b = Math.max(base.finalGap, floor);
    const c = Math.max(cand.finalGap, floor);
    if (b === c) {
      ties++;
      d.push(0);
    } else d.push(Math.log(c) - Math.log(b));
  }
  const arr = Float64Array.from(d);
  return {
    metric: "finalGap",
    kind: "finalGap",
    rung: null,
    d: arr,
    dEquivalence: arr,
    pairIndex: Int32Array.from(idx),
    ties,
    censoredBaseline: 0,
    censoredCandidate: 0,
  };
}

function evaluationsSample(ok: readonly Indexed[]): MetricSample {
  const d: number[] = [];
  const idx: number[] = [];
  let ties = 0;
  for (const { pair, base, cand } of ok) {
    idx.push(pair);
    const slack = Math.max(1, Math.ceil(base.evaluations / Math.max(1, base.steps)));
    if (Math.abs(cand.evaluations - base.evaluations) <= slack) {
      ties++;
      d.push(0);
    } else d.push(Math.log(Math.max(cand.evaluations, 1)) - Math.log(Math.max(base.evaluations, 1)));
  }
  const arr = Float64Array.from(d);
  return {
    metric: "evaluations",
    kind: "evaluations",
    rung: null,
    d: arr,
    dEquivalence: arr,
    pairIndex: Int32Array.from(idx),
    ties,
    censoredBaseline: 0,
    censoredCandidate: 0,
  };
}
