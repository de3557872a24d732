/**
 * Rosenbrock function (Moré–Garbow–Hillstrom #1).
 *
 * What it is for: a curved, narrow valley; first-order methods progress slowly along its floor, and
 * momentum methods overshoot the bend. The classic smoke test of an optimizer.
 *
 * f(x) = f₁² + f₂², f₁ = 10(x₂ − x₁²), f₂ = 1 − x₁; i.e. 100(x₂ − x₁²)² + (1 − x₁)².
 * ∇f = (−400x₁(x₂ − x₁²) − 2(1 − x₁), 200(x₂ − x₁²)).
 * x0 = (−1.2, 1), f(x0) = 24.2; f* = 0 at (1, 1) (MGH 1981, problem 1).
 *
 * Source: Rosenbrock, H. H. (1960), "An automatic method for finding the greatest or least value of a
 * function", The Computer Journal 3(3):175–184; standard form and start from MGH 1981 (see mgh.ts).
 * Start perturbation: ±(1% of |x0ᵢ| + 0.001) uniform per coordinate (util.writeStart).
 * Cost: O(1) per evaluation.
 */
import type { ProblemDefinition } from "../core/types.js";
import { mghSource } from "./mgh.js";
import { prepare } from "./params.js";
import { deterministicInstance, halfWidths } from "./util.js";

function fg(x: Float64Array, g: Float64Array): number {
  const x1 = x[0];
  const x2 = x[1];
  const f1 = 10 * (x2 - x1 * x1);
  const f2 = 1 - x1;
  g[0] = -40 * x1 * f1 - 2 * f2;
  g[1] = 20 * f1;
  return f1 * f1 + f2 * f2;
}

const X0 = new Float64Array([-1.2, 1]);

export const rosenbrock: ProblemDefinition = {
  name: "rosenbrock",
  title: "Rosenbrock function (Moré–Garbow–Hillstrom #1)",
  tags: ["valley", "nonconvex", "mgh"],
  source: `${mghSource(1)}; Rosenbrock (1960), The Computer Journal 3(3):175–184`,
  params: {},
  create(params) {
    const { key } = prepare(rosenbrock, params);
    return deterministicInstance({
      name: rosenbrock.name,
      key,
      x0: X0,
      widths: halfWidths(X0),
      fStar: 0,
      fStarKind: "published",
      xStar: new Float64Array([1, 1]),
      fg,
    });
  },
};
