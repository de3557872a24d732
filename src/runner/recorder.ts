/**
 * Turns the sequence of measured objective values of one run into its metrics: gaps to f*, the
 * tolerance ladder, divergence, the fitted linear rate and the compact trace. Shared by every way of
 * running an optimizer (in-process loop, subprocess protocol), so metrics mean the same everywhere.
 *
 * Cost per measurement: O(1) amortised (the ladder pointer only moves forward); memory: one float per
 * step, in a buffer the caller may reuse across runs.
 */
import type { CaseSpec, DivergenceKind, RunMetrics, StopReason } from "./types.js";
import { finiteOrNull } from "../core/json.js";

/** Smallest scale used for relative tolerances when a run starts at (or below) f*. */
const TINY_GAP = 1e-300;

export class RunRecorder {
  private readonly thresholds: Float64Array;
  private stopThreshold = 0;
  private blowLimit = Infinity;
  private nextRung = 0;
  private readonly stepsTo: (number | null)[];
  private readonly evaluationsTo: (number | null)[];
  private gaps: Float64Array;
  private lastStep = 0;
  private lastGap = NaN;
  private best = Infinity;
  private f0 = NaN;
  private divergedAt: number | null = null;
  private divergence: DivergenceKind | null = null;
  private readonly iterates: (number | null)[][] = [];

  constructor(
    private readonly spec: CaseSpec,
    private readonly fStar: number,
    scratch?: Float64Array,
  ) {
    const n = spec.budget.steps + 1;
    this.gaps = scratch && scratch.length >= n ? scratch : new Float64Array(n);
    this.gaps.fill(NaN, 0, n);
    this.thresholds = new Float64Array(spec.ladder.length);
    this.stepsTo = spec.ladder.map(() => null);
    this.evaluationsTo = spec.ladder.map(() => null);
  }

  /** The scratch buffer, so the caller can hand it to the next run. */
  get scratch(): Float64Array {
    return this.gaps;
  }

  /** Records f(x₀). Returns the stop reason if the run must not start (non-finite f₀), else null. */
  begin(f0: number): StopReason | null {
    this.f0 = f0;
    const gap0 = f0 - this.fStar;
    const scale = gap0 > TINY_GAP ? gap0 : TINY_GAP;
    for (let i = 0; i < this.thresholds.length; i++) this.thresholds[i] = this.spec.ladder[i] * scale;
    this.stopThreshold = this.spec.stopAt * scale;
    this.blowLimit = this.spec.blowUp * Math.max(gap0, 1);
    return this.record(0, f0, 0);
  }

  /**
   * Records the exact objective f(x_step) after `evaluations` evaluations. Returns a stop reason
   * ("target" or "diverged") or null to go on.
   */
  record(step: number, f: number, evaluations: number): StopReason | null {
    const gap = f - this.fStar;
    this.gaps[step] = gap;
    this.lastStep = step;
    this.lastGap = gap;
    if (!Number.isFinite(f)) return this.diverge(step, "non-finite");
    if (gap > this.blowLimit) return this.diverge(step, "blow-up");
    if (gap < this.best) this.best = gap;
    const thresholds = this.thresholds;
    while (this.nextRung < thresholds.length && gap <= thresholds[this.nextRung]) {
      this.stepsTo[this.nextRung] = step;
      this.evaluationsTo[this.nextRung] = evaluations;
      this.nextRung++;
    }
    if (this.spec.stopAt > 0 && gap <= this.stopThreshold) return "target";
    return null;
  }

  /** Keeps a copy of x_step for the trajectory fingerprint (first F steps only). */
  keepIterate(step: number, x: Float64Array): void {
    if (step >= 1 && step <= this.spec.fingerprintSteps && this.iterates.length === step - 1) {
      // JSON has no spelling for NaN or ±Infinity: a coordinate that left the finite range is kept as null.
      const copy = Array.from(x, (v): number | null => (Number.isFinite(v) ? v : null));
      this.iterates.push(copy);
    }
  }

  private diverge(step: number, kind: DivergenceKind): StopReason {
    this.divergedAt = step;
    this.divergence = kind;
    return "diverged";
  }

  /** Final metrics of the run. `steps` and `evaluations` are what the run used. */
  finish(args: {
    seed: number;
    runSeed: string;
    stop: StopReason;
    evaluations: number;
    error?: string;
  }): RunMetrics {
    const steps = this.lastStep;
    const diverged = this.divergence !== null;
    const metrics: RunMetrics = {
      seed: args.seed,
      runSeed: args.runSeed,
      stop: args.stop,
      steps,
      evaluations: args.evaluations,
      f0: finiteOrNull(this.f0),
      finalGap: diverged ? null : finiteOrNull(this.lastGap),
      bestGap: finiteOrNull(this.best),
      stepsTo: this.stepsTo.slice(),
      evaluationsTo: this.evaluationsTo.slice(),
      divergedAt: this.divergedAt,
      divergence: this.divergence,
      rate: diverged ? null : this.fitRate(),
      trace: this.trace(),
      ...(this.spec.fingerprintSteps > 0 ? { iterates: this.iterates.slice(0, steps) } : {}),
      ...(args.error !== undefined ? { error: args.error } : {}),
    };
    return metrics;
  }

  /**
   * Least-squares slope of ln(gap) against the step over the late window [K/2, K], K being the last
   * measured step whose gap is above the rounding floor; rate = e^slope. A floor of 64 ulp of |f*|
   * keeps float noise near the optimum out of the fit. Null when fewer than 5 points qualify.
   */
  private fitRate(): number | null {
    const floor = Math.max(64 * Number.EPSILON * Math.abs(this.fStar), TINY_GAP);
    let k = this.lastStep;
    const gaps = this.gaps;
    while (k > 0 && !(gaps[k] > floor)) k--;
    if (k < 8) return null;
    const from = Math.ceil(k / 2);
    let n = 0;
    let sx = 0;
    let sy = 0;
    let sxx = 0;
    let sxy = 0;
    for (let i = from; i <= k; i++) {
      const g = gaps[i];
      if (!(g > floor)) continue;
      const y = Math.log(g);
      n++;
      sx += i;
      sy += y;
      sxx += i * i;
      sxy += i * y;
    }
    if (n < 5) return null;
    const den = n * sxx - sx * sx;
    if (den <= 0) return null;
    const slope = (n * sxy - sx * sy) / den;
    return finiteOrNull(Math.exp(slope));
  }

  /** Gap at each checkpoint: the last measurement at or before it; null past the run's end. */
  private trace(): (number | null)[] {
    const out: (number | null)[] = [];
    const gaps = this.gaps;
    for (const c of this.spec.checkpoints) {
      if (c > this.lastStep) {
        out.push(null);
        continue;
      }
      let i = c;
      while (i > 0 && Number.isNaN(gaps[i])) i--;
      out.push(finiteOrNull(gaps[i]));
    }
    return out;
  }
}

/** Log-spaced checkpoint steps 0, 1, 2, … , steps (about `count` of them, no duplicates). */
export function logCheckpoints(steps: number, count = 32): number[] {
  const out = [0];
  if (steps <= 0) return out;
  const top = Math.log10(steps);
  for (let i = 0; i <= count; i++) {
    const s = Math.round(10 ** ((i * top) / count));
    if (s > out[out.length - 1] && s <= steps) out.push(s);
  }
  if (out[out.length - 1] !== steps) out.push(steps);
  return out;
}
