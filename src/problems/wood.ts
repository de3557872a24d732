/**
 * Wood function (Moré–Garbow–Hillstrom #14).
 *
 * What it is for: two coupled Rosenbrock valleys with a nearly flat saddle region on the way; methods
 * that stop on small gradients stop early here.
 *
 * f₁ = 10(x₂ − x₁²), f₂ = 1 − x₁, f₃ = √90(x₄ − x₃²), f₄ = 1 − x₃, f₅ = √10(x₂ + x₄ − 2),
 * f₆ = (x₂ − x₄)/√10, so f = 100(x₂ − x₁²)² + (1 − x₁)² + 90(x₄ − x₃²)² + (1 − x₃)² + 10(x₂ + x₄ − 2)²
 * + 0.1(x₂ − x₄)². x0 = (−3, −1, −3, −1), f(x0) = 19192; f* = 0 at (1, 1, 1, 1) (MGH 1981, problem 14).
 *
 * Source: MGH 1981 (see mgh.ts), problem 14; originally Colville, A. R. (1968), "A comparative study
 * of nonlinear programming codes", IBM NY Scientific Center Report 320-2949 (that reference from
 * memory). Start perturbation: ±(1% of |x0ᵢ| + 0.001) uniform per coordinate. Cost: O(1).
 */
import type { ProblemDefinition } from "../core/types.js";
import { mghSource } from "./mgh.js";
import { prepare } from "./params.js";
import { deterministicInstance, halfWidths } from "./util.js";

function fg(x: Float64Array, g: Float64Array): number {
  const x1 = x[0];
  const x2 = x[1];
  const x3 = x[2];
  const x4 = x[3];
  const a = x2 - x1 * x1; // f₁ = 10a
  const b = 1 - x1;
  const c = x4 - x3 * x3; // f₃ = √90·c
  const d = 1 - x3;
  const e = x2 + x4 - 2; // f₅ = √10·e
  const h = x2 - x4; // f₆ = h/√10
  g[0] = -400 * x1 * a - 2 * b;
  g[1] = 200 * a + 20 * e + 0.2 * h;
  g[2] = -360 * x3 * c - 2 * d;
  g[3] = 180 * c + 20 * e - 0.2 * h;
  return 100 * a * a + b * b + 90 * c * c + d * d + 10 * e * e + 0.1 * h * h;
}

const X0 = new Float64Array([-3, -1, -3, -1]);

export const wood: ProblemDefinition = {
  name: "wood",
  title: "Wood function (Moré–Garbow–Hillstrom #14)",
  tags: ["valley", "nonconvex", "mgh"],
  source: mghSource(14),
  params: {},
  create(params) {
    const { key } = prepare(wood, params);
    return deterministicInstance({
      name: wood.name,
      key,
      x0: X0,
      widths: halfWidths(X0),
      fStar: 0,
      fStarKind: "published",
      xStar: new Float64Array([1, 1, 1, 1]),
      fg,
    });
  },
};
