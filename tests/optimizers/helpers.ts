/**
 * Tiny oracles and run helpers for the reference-optimizer tests. They do not depend on the problem
 * library (src/problems/): each oracle here is a one-line closed form, so expected values can be
 * derived by hand.
 */
import type { Oracle } from "../../src/core/types.js";
import type { ReferenceOptimizer } from "../../src/optimizers/hyper.js";

/**
 * f(x) = ½·Σ aᵢ·xᵢ², ∇f(x) = a ⊙ x. Counts evaluations and remembers whether the last point was a
 * given buffer. Returns the loss; allocates nothing.
 */
export class DiagonalQuadratic implements Oracle {
  evaluations = 0;
  lastPoint: Float64Array | null = null;
  constructor(readonly a: Float64Array) {}

  evaluate(x: Float64Array, grad: Float64Array): number {
    this.evaluations++;
    this.lastPoint = x;
    let f = 0;
    for (let i = 0; i < x.length; i++) {
      grad[i] = this.a[i] * x[i];
      f += 0.5 * this.a[i] * x[i] * x[i];
    }
    return f;
  }
}

/**
 * The same gradient at every point (f(x) = g·x). Returns the integer 0 as the loss, so no number has
 * to be boxed when the call is not inlined (the allocation test must see only the optimizer's own).
 */
export class ConstantGradient implements Oracle {
  evaluations = 0;
  constructor(readonly g: Float64Array) {}

  evaluate(_x: Float64Array, grad: Float64Array): number {
    this.evaluations++;
    grad.set(this.g);
    return 0;
  }
}

/** Returns the given gradients in order, one vector per call (the last one repeats). */
export class ScriptedGradient implements Oracle {
  evaluations = 0;
  constructor(readonly script: readonly (readonly number[])[]) {}

  evaluate(_x: Float64Array, grad: Float64Array): number {
    const row = this.script[Math.min(this.evaluations, this.script.length - 1)];
    this.evaluations++;
    for (let i = 0; i < grad.length; i++) grad[i] = row[i];
    return 0;
  }
}

export const vec = (...values: number[]): Float64Array => Float64Array.from(values);

/** Runs `steps` steps in place on `x`; `onStep(k)` runs after step k (1-based). */
export function run(
  opt: ReferenceOptimizer,
  x: Float64Array,
  oracle: Oracle,
  steps: number,
  onStep?: (k: number) => void,
): Float64Array {
  for (let k = 1; k <= steps; k++) {
    opt.step(x, oracle);
    onStep?.(k);
  }
  return x;
}

/** The message of what `fn` throws (fails the test when it does not throw). */
export function messageOf(fn: () => unknown): string {
  try {
    fn();
  } catch (err) {
    return err instanceof Error ? err.message : String(err);
  }
  throw new Error("expected a throw, but the call returned normally");
}

/** |actual − expected| ≤ rel·|expected| (relative tolerance), with a readable failure. */
export function expectRelClose(actual: number, expected: number, rel: number, label = ""): void {
  const err = Math.abs(actual - expected);
  if (!(err <= rel * Math.abs(expected))) {
    throw new Error(
      `${label} expected ${expected}, got ${actual}: relative error ${err / Math.abs(expected)} exceeds ${rel}`,
    );
  }
}
