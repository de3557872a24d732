/**
 * Beale function (Moré–Garbow–Hillstrom #5).
 *
 * What it is for: a flat region with steep walls; the residuals are polynomial in x₂ up to x₂³, so
 * the curvature varies by orders of magnitude across the domain.
 *
 * fᵢ = yᵢ − x₁(1 − x₂ⁱ), i = 1, 2, 3, y = (1.5, 2.25, 2.625),  f = Σ fᵢ².
 * ∂fᵢ/∂x₁ = −(1 − x₂ⁱ),  ∂fᵢ/∂x₂ = i·x₁·x₂^(i−1).
 * x0 = (1, 1), f(x0) = 14.203125; f* = 0 at (3, 0.5) (MGH 1981, problem 5).
 *
 * Source: MGH 1981 (see mgh.ts), problem 5; originally Beale, E. M. L. (1958), "On an iterative method
 * for finding a local minimum of a function of more than one variable", Tech. Rep. 25, Statistical
 * Techniques Research Group, Princeton University (that reference from memory).
 * Start perturbation: ±(1% of |x0ᵢ| + 0.001) uniform per coordinate. Cost: O(1) per evaluation.
 */
import type { ProblemDefinition } from "../core/types.js";
import { mghSource } from "./mgh.js";
import { prepare } from "./params.js";
import { deterministicInstance, halfWidths } from "./util.js";

function fg(x: Float64Array, g: Float64Array): number {
  const x1 = x[0];
  const x2 = x[1];
  const p2 = x2 * x2;
  const p3 = p2 * x2;
  const f1 = 1.5 - x1 * (1 - x2);
  const f2 = 2.25 - x1 * (1 - p2);
  const f3 = 2.625 - x1 * (1 - p3);
  g[0] = -2 * (f1 * (1 - x2) + f2 * (1 - p2) + f3 * (1 - p3));
  g[1] = 2 * x1 * (f1 + 2 * x2 * f2 + 3 * p2 * f3);
  return f1 * f1 + f2 * f2 + f3 * f3;
}

const X0 = new Float64Array([1, 1]);

export const beale: ProblemDefinition = {
  name: "beale",
  title: "Beale function (Moré–Garbow–Hillstrom #5)",
  tags: ["valley", "nonconvex", "mgh"],
  source: mghSource(5),
  params: {},
  create(params) {
    const { key } = prepare(beale, params);
    return deterministicInstance({
      name: beale.name,
      key,
      x0: X0,
      widths: halfWidths(X0),
      fStar: 0,
      fStarKind: "published",
      xStar: new Float64Array([3, 0.5]),
      fg,
    });
  },
};
