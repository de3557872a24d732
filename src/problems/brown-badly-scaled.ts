/**
 * Brown badly scaled function (Moré–Garbow–Hillstrom #4).
 *
 * What it is for: per-parameter scaling. The solution is (10⁶, 2·10⁻⁶): one coordinate must travel a
 * million units while the other must settle at a few millionths, which rewards per-parameter step
 * sizes (Adagrad, RMSProp, Adam) and defeats a single global learning rate.
 *
 * f₁ = x₁ − 10⁶,  f₂ = x₂ − 2·10⁻⁶,  f₃ = x₁x₂ − 2,  f = f₁² + f₂² + f₃².
 * ∇f = (2f₁ + 2x₂f₃, 2f₂ + 2x₁f₃).
 * x0 = (1, 1), f(x0) = 9.99998e11; f* = 0 at (10⁶, 2·10⁻⁶) (MGH 1981, problem 4).
 *
 * Source: MGH 1981 (see mgh.ts), problem 4.
 * Start perturbation, scaled per coordinate: ±1% of each coordinate of x0 (x0 has no zeros, so no
 * absolute floor is needed), uniform. Cost: O(1) per evaluation.
 */
import type { ProblemDefinition } from "../core/types.js";
import { mghSource } from "./mgh.js";
import { prepare } from "./params.js";
import { deterministicInstance, halfWidths } from "./util.js";

function fg(x: Float64Array, g: Float64Array): number {
  const x1 = x[0];
  const x2 = x[1];
  const f1 = x1 - 1e6;
  const f2 = x2 - 2e-6;
  const f3 = x1 * x2 - 2;
  g[0] = 2 * (f1 + x2 * f3);
  g[1] = 2 * (f2 + x1 * f3);
  return f1 * f1 + f2 * f2 + f3 * f3;
}

const X0 = new Float64Array([1, 1]);

export const brownBadlyScaled: ProblemDefinition = {
  name: "brown-badly-scaled",
  title: "Brown badly scaled function (Moré–Garbow–Hillstrom #4)",
  tags: ["badly-scaled", "per-parameter-scaling", "mgh"],
  source: mghSource(4),
  params: {},
  create(params) {
    const { key } = prepare(brownBadlyScaled, params);
    return deterministicInstance({
      name: brownBadlyScaled.name,
      key,
      x0: X0,
      widths: halfWidths(X0, 0.01, 0),
      fStar: 0,
      fStarKind: "published",
      xStar: new Float64Array([1e6, 2e-6]),
      fg,
    });
  },
};
