/**
 * Asymptotic convergence rates of the linear first-order methods on a quadratic — the theory the rate
 * check compares a run with.
 *
 * On f(x) = ½ (x − x*)ᵀ A (x − x*) with eigenvalues λ of A, gradient descent, heavy ball and Nesterov's
 * method are linear iterations in the error e = x − x*. In the eigenbasis they decouple into one 2×2
 * block per eigenvalue acting on (e_k, e_{k−1}):
 *
 *   heavy ball (step α, momentum β):  [[1 + β − αλ, −β], [1, 0]]
 *   Nesterov (step α, momentum β):    [[(1 + β)(1 − αλ), −β(1 − αλ)], [1, 0]]
 *   gradient descent:                  heavy ball with β = 0 (roots 1 − αλ and 0)
 *
 * A block [[a, b], [1, 0]] has the characteristic polynomial z² − a·z − b, so its eigenvalues are the
 * roots of z² − t·z + d with t = a, d = −b: real when t² ≥ 4d, else a complex pair of modulus √d. The
 * asymptotic rate of the error is the spectral radius ρ = max over the eigenvalues of the largest root
 * modulus; the gap f − f* contracts like ρ² per step. When the largest root of a block is double (t² = 4d,
 * which the tuned parameters below produce) the block is not diagonalisable and the error behaves like
 * k·ρᵏ instead of ρᵏ, so the gap behaves like k²·ρ^(2k): the fit in ./fit-rate.ts corrects for that.
 *
 * Sources: the blocks are the standard companion form of the three-term recursions (derived here);
 * the tuned closed forms are in `tunedParameters` with their sources. Cost: O(number of eigenvalues).
 */

/** The linear methods whose rate on a quadratic is known exactly. */
export type LinearMethod = "gradient-descent" | "heavy-ball" | "nesterov";

export const LINEAR_METHODS: readonly LinearMethod[] = ["gradient-descent", "heavy-ball", "nesterov"];

/** The roots of z² − t·z + d = 0 as the rate analysis needs them. */
export interface BlockRoots {
  /** Largest root modulus. */
  readonly modulus: number;
  /** True for a complex pair (t² < 4d). */
  readonly complex: boolean;
  /** True when the two largest-modulus roots coincide to relative 1e-6: the error then grows like k·ρᵏ. */
  readonly double: boolean;
  /** Argument θ ∈ [0, π] of the root of largest modulus (0 or π for real roots). */
  readonly angle: number;
}

/** Relative distance of two roots below which they count as double (see `BlockRoots.double`). */
export const DOUBLE_ROOT_TOLERANCE = 1e-6;

/**
 * Roots of z² − t·z + d = 0 (the eigenvalues of the block [[t, −d], [1, 0]]). The larger real root is
 * computed without cancellation as (t + sign(t)·√(t² − 4d))/2 and the other as d divided by it.
 */
export function quadraticRoots(t: number, d: number): BlockRoots {
  const disc = t * t - 4 * d;
  if (disc < 0) {
    const modulus = Math.sqrt(d);
    const gap = Math.sqrt(-disc); // |z₁ − z₂|
    return {
      modulus,
      complex: true,
      double: gap <= DOUBLE_ROOT_TOLERANCE * modulus,
      angle: Math.atan2(Math.sqrt(-disc) / 2, t / 2),
    };
  }
  const s = Math.sqrt(disc);
  const r1 = t >= 0 ? (t + s) / 2 : (t - s) / 2;
  const r2 = r1 === 0 ? 0 : d / r1;
  const modulus = Math.max(Math.abs(r1), Math.abs(r2));
  return {
    modulus,
    complex: false,
    double: Math.abs(r1 - r2) <= DOUBLE_ROOT_TOLERANCE * modulus,
    angle: Math.abs(r1) >= Math.abs(r2) ? (r1 < 0 ? Math.PI : 0) : r2 < 0 ? Math.PI : 0,
  };
}

/** The roots of the iteration block of `method` for one eigenvalue λ. */
export function blockRoots(method: LinearMethod, lr: number, momentum: number, lambda: number): BlockRoots {
  const beta = method === "gradient-descent" ? 0 : momentum;
  if (method === "nesterov") {
    const q = 1 - lr * lambda;
    return quadraticRoots((1 + beta) * q, beta * q);
  }
  return quadraticRoots(1 + beta - lr * lambda, beta);
}

/** The asymptotic rate of a linear method on a quadratic, with what the fit needs to know. */
export interface LinearRate {
  /** Spectral radius of the iteration: per-step contraction of the error (the gap contracts like ρ²). */
  readonly rho: number;
  /** The eigenvalue whose block attains ρ (the smallest such). */
  readonly lambda: number;
  /** True when a block attaining ρ has a double root: the error behaves like k·ρᵏ. */
  readonly double: boolean;
  /**
   * Smallest nonzero argument θ of a complex root pair attaining ρ (the slowest oscillation of the
   * error, period 2π/θ steps), or null when no dominant block oscillates.
   */
  readonly slowestAngle: number | null;
}

/** Blocks within this relative distance of ρ count as attaining it. */
const DOMINANT = 1e-9;

/**
 * Spectral radius of `method` with step `lr` and momentum `momentum` (ignored by gradient descent) over
 * the given eigenvalues. Throws a RangeError for an empty spectrum or non-finite parameters.
 */
export function linearRate(
  method: LinearMethod,
  lr: number,
  momentum: number,
  eigenvalues: ArrayLike<number>,
): LinearRate {
  if (eigenvalues.length === 0) throw new RangeError("linearRate: the spectrum is empty");
  if (!Number.isFinite(lr) || !Number.isFinite(momentum)) {
    throw new RangeError(`linearRate: lr and momentum must be finite, got ${lr} and ${momentum}`);
  }
  const roots: BlockRoots[] = [];
  let rho = 0;
  for (let i = 0; i < eigenvalues.length; i++) {
    const r = blockRoots(method, lr, momentum, eigenvalues[i]);
    roots.push(r);
    if (r.modulus > rho) rho = r.modulus;
  }
  let lambda = NaN;
  let double = false;
  let slowestAngle: number | null = null;
  for (let i = 0; i < roots.length; i++) {
    const r = roots[i];
    if (r.modulus < rho * (1 - DOMINANT)) continue;
    if (Number.isNaN(lambda) || eigenvalues[i] < lambda) lambda = eigenvalues[i];
    if (r.double) double = true;
    if (r.complex && !r.double && r.angle > 0 && (slowestAngle === null || r.angle < slowestAngle)) {
      slowestAngle = r.angle;
    }
  }
  return { rho, lambda, double, slowestAngle };
}

/** Tuned parameters of a method for eigenvalues in [μ, L], with the rate they give and its source. */
export interface TunedParameters {
  readonly lr: number;
  /** 0 for gradient descent. */
  readonly momentum: number;
  /** Closed-form asymptotic rate of the error. */
  readonly rate: number;
  /** Where the parameters and the rate are published. */
  readonly source: string;
}

export const NESTEROV_2004 =
  "Nesterov (2004), Introductory Lectures on Convex Optimization: A Basic Course, Kluwer (book)";
export const POLYAK_1964 =
  "Polyak (1964), Some methods of speeding up the convergence of iteration methods, USSR Comput. Math. Math. Phys. 4(5):1–17, doi:10.1016/0041-5553(64)90137-5";

/**
 * The classical tuned parameters and their rates, κ = L/μ:
 * - gradient descent, step 2/(L + μ): ρ = (κ − 1)/(κ + 1) (Nesterov 2004, Theorem 2.1.15);
 * - heavy ball, α = 4/(√L + √μ)², β = ((√κ − 1)/(√κ + 1))²: ρ = (√κ − 1)/(√κ + 1) (Polyak 1964);
 * - Nesterov, α = 1/L, β = (√L − √μ)/(√L + √μ): ρ = 1 − 1/√κ (Nesterov 2004, §2.2, constant step scheme).
 * On a quadratic each rate equals the spectral radius of `linearRate` with these parameters exactly
 * (the tests check that). Throws a RangeError unless 0 < μ ≤ L.
 */
export function tunedParameters(method: LinearMethod, mu: number, L: number): TunedParameters {
  if (!(mu > 0 && L >= mu && Number.isFinite(L))) {
    throw new RangeError(`tunedParameters: need 0 < μ ≤ L, got μ = ${mu}, L = ${L}`);
  }
  const sL = Math.sqrt(L);
  const sMu = Math.sqrt(mu);
  switch (method) {
    case "gradient-descent":
      return {
        lr: 2 / (L + mu),
        momentum: 0,
        rate: (L - mu) / (L + mu),
        source: `${NESTEROV_2004}, Theorem 2.1.15`,
      };
    case "heavy-ball": {
      const r = (sL - sMu) / (sL + sMu);
      return {
        lr: 4 / ((sL + sMu) * (sL + sMu)),
        momentum: r * r,
        rate: r,
        source: POLYAK_1964,
      };
    }
    case "nesterov":
      return {
        lr: 1 / L,
        momentum: (sL - sMu) / (sL + sMu),
        rate: 1 - sMu / sL,
        source: `${NESTEROV_2004}, §2.2 (constant step scheme)`,
      };
  }
}

/** Where Nesterov's gap is measured: at w_k (the gradient step's result) or at the look-ahead y_k. */
export type ModelPoint = "iterate" | "lookahead";

/**
 * The gap sequence the linear theory predicts: each eigen-component of the initial error c_i evolves by
 * its 2×2 block, starting with e₁ = (1 − αλ)·e₀ (the velocity starts at zero in every form), and the gap
 * is ½·Σ λᵢ·eᵢ². `point` "lookahead" measures Nesterov's gap at y_k = w_k + β(w_k − w_{k−1}) (y₀ = w₀),
 * the point the stored-look-ahead form keeps as its parameters; heavy ball and gradient descent have
 * one point only. Writes g_0 … g_steps into `out` (length steps + 1); allocates nothing else.
 * Cost O(n·steps).
 */
export function modelGaps(
  method: LinearMethod,
  lr: number,
  momentum: number,
  eigenvalues: ArrayLike<number>,
  c0: ArrayLike<number>,
  out: Float64Array,
  point: ModelPoint = "iterate",
): Float64Array {
  const n = eigenvalues.length;
  const beta = method === "gradient-descent" ? 0 : momentum;
  const ahead = method === "nesterov" && point === "lookahead";
  out.fill(0);
  const steps = out.length - 1;
  for (let i = 0; i < n; i++) {
    const lambda = eigenvalues[i];
    const h = 0.5 * lambda;
    const q = 1 - lr * lambda;
    let prev = c0[i];
    let cur = q * prev;
    out[0] += h * prev * prev;
    if (steps >= 1) {
      const y = ahead ? (1 + beta) * cur - beta * prev : cur;
      out[1] += h * y * y;
    }
    for (let k = 2; k <= steps; k++) {
      const next =
        method === "nesterov"
          ? q * ((1 + beta) * cur - beta * prev)
          : (1 + beta - lr * lambda) * cur - beta * prev;
      prev = cur;
      cur = next;
      const y = ahead ? (1 + beta) * cur - beta * prev : cur;
      out[k] += h * y * y;
    }
  }
  return out;
}
