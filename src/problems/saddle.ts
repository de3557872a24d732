/**
 * Saddle escape problem: f(x, y) = ½x² − ½y² + ¼y⁴.
 *
 * What it is for: escaping a strict saddle. The start lies almost on the saddle's stable manifold, so
 * the gradient first pulls the iterate towards the saddle and only the tiny unstable component
 * (|y| ≈ 1e−6) grows; methods differ in how fast they leave (momentum and per-coordinate scaling
 * help, plain gradient descent needs about ln(10⁶)/ln(1 + η) steps).
 *
 * f(x, y) = ½x² − ½y² + ¼y⁴,  ∇f = (x, y³ − y),  Hessian diag(1, 3y² − 1).
 * Properties (derived here): stationary points are (0, 0) and (0, ±1). At the origin the Hessian is
 * diag(1, −1): a strict saddle, f = 0, stable manifold {y = 0}, unstable direction y. At (0, ±1) the
 * Hessian is diag(1, 2): minima with f* = −¼; f ≥ −¼ everywhere since −½y² + ¼y⁴ = ¼(y² − 1)² − ¼.
 * Standard start (1, 1e−6); the minimiser reported is (0, 1), on the side of the start (y > 0).
 *
 * Source: constructed here (common practice). Motivated by Dauphin, Pascanu, Gulcehre, Cho, Ganguli
 * & Bengio (2014), "Identifying and attacking the saddle point problem in high-dimensional
 * non-convex optimization", NeurIPS, arXiv:1406.2572 (https://arxiv.org/abs/1406.2572).
 * Start perturbation: x ± 1% uniform; y multiplied by a uniform factor in [0.5, 1.5], so y stays in
 * [5e−7, 1.5e−6]: tiny, positive, never 0 (at y = 0 the iterate could never leave the saddle).
 * Cost: O(1) per evaluation.
 */
import type { Pcg32 } from "../core/rng.js";
import type { ProblemDefinition } from "../core/types.js";
import { prepare } from "./params.js";
import { writeStart } from "./util.js";

const X0 = new Float64Array([1, 1e-6]);
const NO_WIDTHS = new Float64Array(2);

function fg(x: Float64Array, g: Float64Array): number {
  const a = x[0];
  const b = x[1];
  const b2 = b * b;
  g[0] = a;
  g[1] = b * (b2 - 1);
  return 0.5 * a * a + b2 * (0.25 * b2 - 0.5);
}

function value(x: Float64Array): number {
  const a = x[0];
  const b2 = x[1] * x[1];
  return 0.5 * a * a + b2 * (0.25 * b2 - 0.5);
}

function start(out: Float64Array, rng: Pcg32 | null): void {
  writeStart(out, X0, NO_WIDTHS, null, saddle.name);
  if (rng === null) return;
  out[0] = X0[0] * (1 + 0.01 * (2 * rng.nextFloat() - 1));
  out[1] = X0[1] * (1 + 0.5 * (2 * rng.nextFloat() - 1));
}

export const saddle: ProblemDefinition = {
  name: "saddle",
  title: "Saddle escape: ½x² − ½y² + ¼y⁴ from next to the stable manifold",
  tags: ["saddle", "nonconvex"],
  source:
    'Constructed here (common practice); motivated by Dauphin et al. (2014), "Identifying and attacking the saddle point problem in high-dimensional non-convex optimization", NeurIPS, arXiv:1406.2572',
  fStarNote: "f* = −¼ at (0, ±1), derived analytically in src/problems/saddle.ts (exact).",
  params: {},
  create(params) {
    const { key } = prepare(saddle, params);
    return {
      key,
      dim: 2,
      fStar: -0.25,
      fStarKind: "computed",
      xStar: new Float64Array([0, 1]),
      stochastic: false,
      evaluate: fg,
      objective: value,
      start,
    };
  },
};
