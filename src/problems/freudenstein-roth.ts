/**
 * Freudenstein and Roth function (Moré–Garbow–Hillstrom #2).
 *
 * What it is for: a problem with a strong spurious local minimum. From the standard start, gradient
 * methods usually settle in the local basin f = 48.9842 at (11.4128, −0.896805) rather than the
 * global f* = 0 at (5, 4); the basin is declared so that results are compared against it.
 *
 * f₁ = −13 + x₁ + ((5 − x₂)x₂ − 2)x₂,  f₂ = −29 + x₁ + ((x₂ + 1)x₂ − 14)x₂,  f = f₁² + f₂².
 * ∂f₁/∂x₂ = 10x₂ − 3x₂² − 2,  ∂f₂/∂x₂ = 3x₂² + 2x₂ − 14,  ∂fᵢ/∂x₁ = 1.
 * x0 = (0.5, −2), f(x0) = 400.5; f* = 0 at (5, 4); local minimum 48.9842 at (11.4128, −0.896805)
 * (MGH 1981, problem 2). The local minimum has a closed form (derived here, used by the tests):
 * ∇f = 0 with f₁ ≠ 0 forces f₁ = −f₂ and ∂f₁/∂x₂ = ∂f₂/∂x₂, i.e. 3x₂² − 4x₂ − 6 = 0, so
 * x₂ = (2 − √22)/3 and x₁ = 21 − 3x₂² + 8x₂, f = 2f₁² = 48.98425367924002 (recomputed at 60 digits,
 * tests/problems/fixtures/recompute_mgh.py).
 *
 * Source: MGH 1981 (see mgh.ts), problem 2; originally Freudenstein, F. & Roth, B. (1963), "Numerical
 * solution of systems of nonlinear equations", J. ACM 10(4):550–556 (that reference from memory).
 * Start perturbation: ±(1% of |x0ᵢ| + 0.001) uniform per coordinate. Cost: O(1) per evaluation.
 */
import type { ProblemDefinition } from "../core/types.js";
import { mghSource } from "./mgh.js";
import { prepare } from "./params.js";
import { deterministicInstance, halfWidths } from "./util.js";

function fg(x: Float64Array, g: Float64Array): number {
  const x1 = x[0];
  const x2 = x[1];
  const f1 = -13 + x1 + ((5 - x2) * x2 - 2) * x2;
  const f2 = -29 + x1 + ((x2 + 1) * x2 - 14) * x2;
  const d1 = (10 - 3 * x2) * x2 - 2;
  const d2 = (3 * x2 + 2) * x2 - 14;
  g[0] = 2 * (f1 + f2);
  g[1] = 2 * (f1 * d1 + f2 * d2);
  return f1 * f1 + f2 * f2;
}

const X0 = new Float64Array([0.5, -2]);

export const freudensteinRoth: ProblemDefinition = {
  name: "freudenstein-roth",
  title: "Freudenstein and Roth function (Moré–Garbow–Hillstrom #2)",
  tags: ["local-minimum", "nonconvex", "mgh"],
  source: mghSource(2),
  params: {},
  basins: [
    {
      name: "local",
      f: 48.9842,
      x: [11.4128, -0.896805],
      source: `${mghSource(2)} (local minimum stated beside f*)`,
    },
  ],
  create(params) {
    const { key } = prepare(freudensteinRoth, params);
    return deterministicInstance({
      name: freudensteinRoth.name,
      key,
      x0: X0,
      widths: halfWidths(X0),
      fStar: 0,
      fStarKind: "published",
      xStar: new Float64Array([5, 4]),
      fg,
    });
  },
};
