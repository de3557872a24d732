/**
 * Powell singular function (Moré–Garbow–Hillstrom #13).
 *
 * What it is for: a minimum with a singular Hessian (rank 2 of 4 at x* = 0), where convergence of
 * every method slows from linear to sublinear; tests behaviour when the curvature vanishes.
 *
 * f₁ = x₁ + 10x₂,  f₂ = √5(x₃ − x₄),  f₃ = (x₂ − 2x₃)²,  f₄ = √10(x₁ − x₄)², so
 * f = (x₁ + 10x₂)² + 5(x₃ − x₄)² + (x₂ − 2x₃)⁴ + 10(x₁ − x₄)⁴,
 * ∇f = (2a + 40d³, 20a + 4c³, 10b − 8c³, −10b − 40d³) with a = x₁ + 10x₂, b = x₃ − x₄, c = x₂ − 2x₃,
 * d = x₁ − x₄. x0 = (3, −1, 0, 1), f(x0) = 215; f* = 0 at the origin (MGH 1981, problem 13).
 * (One public port writes f₄ with √2; the paper's √10 is the one that gives f(x0) = 215.)
 *
 * Source: MGH 1981 (see mgh.ts), problem 13; originally Powell, M. J. D. (1962), "An iterative method
 * for finding stationary values of a function of several variables", The Computer Journal
 * 5(2):147–151 (that reference from memory).
 * Start perturbation: ±(1% of |x0ᵢ| + 0.001) uniform per coordinate. Cost: O(1) per evaluation.
 */
import type { ProblemDefinition } from "../core/types.js";
import { mghSource } from "./mgh.js";
import { prepare } from "./params.js";
import { deterministicInstance, halfWidths } from "./util.js";

function fg(x: Float64Array, g: Float64Array): number {
  const a = x[0] + 10 * x[1];
  const b = x[2] - x[3];
  const c = x[1] - 2 * x[2];
  const d = x[0] - x[3];
  const c3 = c * c * c;
  const d3 = d * d * d;
  g[0] = 2 * a + 40 * d3;
  g[1] = 20 * a + 4 * c3;
  g[2] = 10 * b - 8 * c3;
  g[3] = -10 * b - 40 * d3;
  return a * a + 5 * b * b + c3 * c + 10 * d3 * d;
}

const X0 = new Float64Array([3, -1, 0, 1]);

export const powellSingular: ProblemDefinition = {
  name: "powell-singular",
  title: "Powell singular function (Moré–Garbow–Hillstrom #13)",
  tags: ["singular-hessian", "mgh"],
  source: mghSource(13),
  params: {},
  create(params) {
    const { key } = prepare(powellSingular, params);
    return deterministicInstance({
      name: powellSingular.name,
      key,
      x0: X0,
      widths: halfWidths(X0),
      fStar: 0,
      fStarKind: "published",
      xStar: new Float64Array(4),
      fg,
    });
  },
};
