/**
 * Noisy diagonal quadratic (additive isotropic Gaussian gradient noise).
 *
 * What it is for: the simplest stochastic problem with a closed-form answer. SGD with a constant step
 * does not converge on it but settles into a stationary distribution whose mean loss is known
 * exactly, so a change in how an optimizer handles noise (step size, averaging, momentum) shows as a
 * change in the noise floor.
 *
 * f(x) = ½ Σᵢ λᵢ xᵢ²,  λᵢ = κ^(i/(n−1)) log-spaced in [1, κ] (λ = (1) when n = 1),  x* = 0,  f* = 0.
 * evaluate(x) writes g = ∇f(x) + σ·z, z ~ N(0, I) drawn from the run's noise stream (`ctx.noise`:
 * `fillNormal` into a buffer made once, n normals per call in coordinate order, the same values as n
 * calls of σ·nextNormal()), and returns the exact f(x) (the loss itself is not noised).
 * `objective` is exact. σ = 0 gives a deterministic problem (`stochastic` false, no draws).
 * Standard start x0 = (1, …, 1).
 *
 * Closed form (derived here, standard for a linear recursion): plain SGD x ← x − η·g with 0 < ηλᵢ < 2
 * gives per coordinate xᵢ' = (1 − ηλᵢ)xᵢ − ησzᵢ, a stable AR(1) process whose stationary variance is
 * vᵢ = η²σ²/(1 − (1 − ηλᵢ)²) = ησ²/(λᵢ(2 − ηλᵢ)), so the stationary mean loss is
 * E f = Σᵢ ½λᵢvᵢ = Σᵢ ησ²/(2(2 − ηλᵢ)) (see `sgdStationaryLoss`). The problem is kept a plain
 * diagonal quadratic with known eigenvalues and additive isotropic noise so this stays exact.
 *
 * Source: constructed here (common practice); the noisy-quadratic model of stochastic optimisation is
 * used e.g. by Schaul, Zhang & LeCun (2013), "No more pesky learning rates", ICML,
 * arXiv:1206.1106.
 * Start perturbation: ±(1% of |x0ᵢ| + 0.001) uniform per coordinate.
 * Cost: O(n) per evaluation plus n normal draws.
 */
import type { ProblemDefinition, ProblemInstance, ProblemParams, ProblemRunContext } from "../core/types.js";
import { prepare } from "./params.js";
import { halfWidths, logSpaced, writeStart } from "./util.js";

/** A noisy-quadratic instance with its eigenvalues and noise level exposed. */
export interface NoisyQuadraticInstance extends ProblemInstance {
  readonly eigenvalues: Float64Array;
  readonly sigma: number;
}

/**
 * Stationary mean loss of plain SGD with constant step `lr` on the noisy quadratic:
 * Σᵢ lr·σ²/(2(2 − lr·λᵢ)) (derivation in the doc comment above). Throws unless 0 < lr·λᵢ < 2 for
 * every i (otherwise SGD diverges and there is no stationary distribution).
 */
export function sgdStationaryLoss(eigenvalues: ArrayLike<number>, sigma: number, lr: number): number {
  let s = 0;
  for (let i = 0; i < eigenvalues.length; i++) {
    const t = lr * eigenvalues[i];
    if (!(t > 0 && t < 2)) {
      throw new Error(
        `sgdStationaryLoss: lr·λ must lie in (0, 2) for every eigenvalue, got lr = ${lr}, λ = ${eigenvalues[i]}`,
      );
    }
    s += (lr * sigma * sigma) / (2 * (2 - t));
  }
  return s;
}

export const noisyQuadratic: ProblemDefinition = {
  name: "noisy-quadratic",
  title: "Noisy diagonal quadratic, gradient noise σ·N(0, I)",
  tags: ["convex", "quadratic", "stochastic", "noise-floor"],
  source:
    'Constructed here (common practice); noisy-quadratic model as used by Schaul, Zhang & LeCun (2013), "No more pesky learning rates", ICML, arXiv:1206.1106',
  fStarNote:
    "f* = 0 at x* = 0 by construction; SGD's stationary mean loss has a closed form (sgdStationaryLoss).",
  params: {
    kappa: { default: 10, min: 1, max: 1e12, description: "condition number κ (λ from 1 to κ)" },
    n: { default: 10, min: 1, max: 1000000, integer: true, description: "dimension" },
    sigma: {
      default: 0.1,
      min: 0,
      max: 1e6,
      description: "standard deviation of the gradient noise per coordinate",
    },
  },
  create: (params, ctx) => createNoisyQuadratic(params, ctx),
};

/** Creates a noisy-quadratic instance bound to the run's noise stream. */
export function createNoisyQuadratic(params: ProblemParams, ctx: ProblemRunContext): NoisyQuadraticInstance {
  const { p, key } = prepare(noisyQuadratic, params);
  const n = p.n;
  const sigma = p.sigma;
  const lambda = logSpaced(n, 1, p.kappa);
  const noise = ctx.noise;
  const x0 = new Float64Array(n).fill(1);
  const widths = halfWidths(x0);
  const z = new Float64Array(n);
  const objective = (x: Float64Array): number => {
    let f = 0;
    for (let i = 0; i < n; i++) f += lambda[i] * x[i] * x[i];
    return 0.5 * f;
  };
  const evaluate =
    sigma > 0
      ? (x: Float64Array, g: Float64Array): number => {
          noise.fillNormal(z, sigma); // σ·N(0, 1) per coordinate, into a buffer made once
          let f = 0;
          for (let i = 0; i < n; i++) {
            const s = lambda[i] * x[i];
            f += s * x[i];
            g[i] = s + z[i];
          }
          return 0.5 * f;
        }
      : (x: Float64Array, g: Float64Array): number => {
          let f = 0;
          for (let i = 0; i < n; i++) {
            const s = lambda[i] * x[i];
            f += s * x[i];
            g[i] = s;
          }
          return 0.5 * f;
        };
  return {
    key,
    dim: n,
    fStar: 0,
    fStarKind: "computed",
    xStar: new Float64Array(n),
    stochastic: sigma > 0,
    evaluate,
    objective,
    start: (out, rng) => writeStart(out, x0, widths, rng, noisyQuadratic.name),
    eigenvalues: lambda,
    sigma,
  };
}
