/**
 * Stationary variance of SGD on the noisy quadratic, and how precisely a time average estimates it —
 * the theory behind the stationary-variance check.
 *
 * Model: f(x) = ½ Σᵢ λᵢ xᵢ², gradient estimates ∇f(x) + σz with z ~ N(0, I) independent across steps,
 * plain SGD x ← x − η·(∇f(x) + σz). Per coordinate (dropping i):
 *
 *   x_{t+1} = a·x_t − ησ·z_t,   a = 1 − ηλ.
 *
 * For |a| < 1 (0 < ηλ < 2) this is a stable AR(1) process. Taking the variance of both sides in the
 * stationary state, v = a²·v + η²σ², so
 *
 *   E[x²] → v = η²σ²/(1 − a²) = η²σ²/(ηλ(2 − ηλ)) = ησ²/(λ(2 − ηλ)).
 *
 * (Derived here; the mean loss Σ ½λᵢvᵢ = Σ ησ²/(2(2 − ηλᵢ)) is `sgdStationaryLoss` in
 * src/problems/noisy-quadratic.ts.) From x₀ the mean square approaches v geometrically:
 * E[x_t²] − v = a^(2t)·(x₀² − v) (same recursion without noise).
 *
 * Precision of a time average. In the stationary state Cov(x_t, x_{t+h}) = v·a^|h| and, x being
 * Gaussian, Cov(x_t², x_{t+h}²) = 2·(v·a^|h|)² (Isserlis 1918, Biometrika 12(1/2):134–139). The variance
 * of the mean of T consecutive x_t² is, for T ≫ 1/(1 − a²), (1/T)·Σ_h 2v²a^(2|h|) (the long-run variance
 * of a stationary sequence: common practice), so its relative standard error is
 *
 *   se = √(2(1 + a²) / (T(1 − a²))).
 *
 * Cost: O(1) per call.
 */

/** Throws a RangeError unless 0 < ηλ < 2 (otherwise SGD has no stationary distribution). */
function checkStable(lambda: number, lr: number): number {
  const t = lr * lambda;
  if (!(t > 0 && t < 2)) {
    throw new RangeError(
      `SGD has no stationary distribution unless 0 < lr·λ < 2; got lr = ${lr}, λ = ${lambda}`,
    );
  }
  return 1 - t;
}

/** v = ησ²/(λ(2 − ηλ)): the stationary E[x²] of one coordinate with curvature λ (see above). */
export function sgdStationaryVariance(lambda: number, sigma: number, lr: number): number {
  checkStable(lambda, lr);
  return (lr * sigma * sigma) / (lambda * (2 - lr * lambda));
}

/** Relative standard error √(2(1 + a²)/(T(1 − a²))) of the mean of T stationary values of x², a = 1 − ηλ. */
export function timeAverageRelativeError(lambda: number, lr: number, steps: number): number {
  const a = checkStable(lambda, lr);
  const a2 = a * a;
  return Math.sqrt((2 * (1 + a2)) / (steps * (1 - a2)));
}

/**
 * Steps to discard so that the start-up transient biases the time average by at most `fraction` of its
 * standard error: the transient adds at most a^(2B)·|x₀² − v|/(1 − a²) to the sum of the averaged
 * values, i.e. a^(2B)·|x₀² − v|/((1 − a²)·T·v) to the relative mean.
 */
export function burnInSteps(
  lambda: number,
  sigma: number,
  lr: number,
  x0: number,
  steps: number,
  fraction: number,
): number {
  const a = checkStable(lambda, lr);
  const v = sgdStationaryVariance(lambda, sigma, lr);
  const excess = Math.abs(x0 * x0 - v) / ((1 - a * a) * steps * v);
  const allowed = fraction * timeAverageRelativeError(lambda, lr, steps);
  if (excess <= allowed || a === 0) return 0;
  return Math.ceil(Math.log(allowed / excess) / (2 * Math.log(Math.abs(a))));
}

/**
 * Averaged steps T that make the relative standard error of the slowest coordinate at most `target`:
 * T = 2(1 + a²)/((1 − a²)·target²) with a for the eigenvalue where that is largest.
 */
export function stepsForPrecision(eigenvalues: ArrayLike<number>, lr: number, target: number): number {
  let worst = 0;
  for (let i = 0; i < eigenvalues.length; i++) {
    const a = checkStable(eigenvalues[i], lr);
    const a2 = a * a;
    worst = Math.max(worst, (2 * (1 + a2)) / (1 - a2));
  }
  return Math.ceil(worst / (target * target));
}
