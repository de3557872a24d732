/** Test helpers for tests/problems (never imported by src/). */
import { setFlagsFromString } from "node:v8";
import { runInNewContext } from "node:vm";
import { Pcg32, STREAM } from "../../src/core/rng.js";
import type { ProblemInstance, ProblemRunContext } from "../../src/core/types.js";

/** A run context with a fixed noise stream. */
export function ctx(seed = 1n): ProblemRunContext {
  return { noise: new Pcg32(seed, STREAM.noise) };
}

export interface GradientMismatch {
  i: number;
  analytic: number;
  fd: number;
  bound: number;
}

/**
 * Compares ∇f from `evaluate` with central differences of `objective` at x.
 * Step hᵢ = 1e−6·max(|xᵢ|, 0.1). Component i passes when
 *   |fdᵢ − gᵢ| ≤ rtol·|gᵢ| + 8·ε·max(|f(x ± hᵢeᵢ)|)/hᵢ,
 * i.e. a relative tolerance plus the rounding error a central difference cannot avoid (ε = 2⁻⁵²).
 * Also fills the gradient buffer with NaN first, so a component `evaluate` does not write fails.
 */
export function gradientMismatches(inst: ProblemInstance, x: Float64Array, rtol: number): GradientMismatch[] {
  const g = new Float64Array(inst.dim).fill(Number.NaN);
  const f = inst.evaluate(x, g);
  const bad: GradientMismatch[] = [];
  if (!Number.isFinite(f)) return [{ i: -1, analytic: f, fd: Number.NaN, bound: 0 }];
  const xp = Float64Array.from(x);
  for (let i = 0; i < inst.dim; i++) {
    const h = 1e-6 * Math.max(Math.abs(x[i]), 0.1);
    xp[i] = x[i] + h;
    const fp = inst.objective(xp);
    xp[i] = x[i] - h;
    const fm = inst.objective(xp);
    xp[i] = x[i];
    const hh = x[i] + h - (x[i] - h); // the step actually taken, after rounding of x ± h
    const fd = (fp - fm) / hh;
    const bound = rtol * Math.abs(g[i]) + (8 * Number.EPSILON * Math.max(Math.abs(fp), Math.abs(fm))) / h;
    if (!(Math.abs(fd - g[i]) <= bound)) bad.push({ i, analytic: g[i], fd, bound });
  }
  return bad;
}

/** `global.gc`, made available at run time (V8 flag set programmatically, no CLI flag needed). */
export function getGc(): () => void {
  setFlagsFromString("--expose-gc");
  return runInNewContext("gc") as () => void;
}

/**
 * Bytes retained on the JS heap plus in ArrayBuffers across `calls` calls of `fn`, each window
 * starting after a full collection; the least over `windows` windows (the steady state). Early
 * windows include V8's tier-up, whose unoptimised code boxes doubles (16 bytes each) until the
 * function is optimised, which is not an allocation of the code under test. A function that allocates
 * per call keeps its garbage until the next collection, so it shows in every window. `fn` should
 * discard results: storing a double into an outer variable boxes it too.
 */
export function retainedBytes(fn: () => void, calls: number, windows = 5): number {
  const gc = getGc();
  let least = Infinity;
  for (let w = 0; w < windows; w++) {
    gc();
    const a = process.memoryUsage();
    for (let k = 0; k < calls; k++) fn();
    const b = process.memoryUsage();
    least = Math.min(least, b.heapUsed - a.heapUsed + (b.arrayBuffers - a.arrayBuffers));
  }
  return least;
}
