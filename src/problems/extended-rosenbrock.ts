/**
 * Extended Rosenbrock function (Moré–Garbow–Hillstrom #21).
 *
 * What it is for: scale. n/2 independent Rosenbrock valleys side by side; with n = 10⁶ it measures the
 * per-step overhead of an optimizer (memory traffic, allocation) rather than its convergence.
 *
 * For i = 1..n/2: f₂ᵢ₋₁ = 10(x₂ᵢ − x₂ᵢ₋₁²), f₂ᵢ = 1 − x₂ᵢ₋₁,  f = Σ fⱼ², n even.
 * ∂f/∂x₂ᵢ₋₁ = −40x₂ᵢ₋₁f₂ᵢ₋₁ − 2f₂ᵢ,  ∂f/∂x₂ᵢ = 20f₂ᵢ₋₁.
 * x0 = (−1.2, 1, −1.2, 1, …), f(x0) = 24.2·n/2; f* = 0 at (1, …, 1) (MGH 1981, problem 21).
 *
 * Parameter n: any even n ≥ 2 (default 10); memory is the only upper bound (the instance keeps x0,
 * x* and the perturbation widths: 24n bytes).
 * Source: MGH 1981 (see mgh.ts), problem 21.
 * Start perturbation: ±(1% of |x0ᵢ| + 0.001) uniform per coordinate.
 * Cost: one pass over x, about 10n flops per evaluation, no allocation; `objective` skips the
 * gradient.
 */
import type { ProblemDefinition } from "../core/types.js";
import { mghSource } from "./mgh.js";
import { prepare } from "./params.js";
import { deterministicInstance, halfWidths } from "./util.js";

function fg(x: Float64Array, g: Float64Array): number {
  const n = x.length;
  let f = 0;
  for (let i = 0; i < n; i += 2) {
    const a = x[i];
    const f1 = 10 * (x[i + 1] - a * a);
    const f2 = 1 - a;
    g[i] = -40 * a * f1 - 2 * f2;
    g[i + 1] = 20 * f1;
    f += f1 * f1 + f2 * f2;
  }
  return f;
}

function value(x: Float64Array): number {
  const n = x.length;
  let f = 0;
  for (let i = 0; i < n; i += 2) {
    const a = x[i];
    const f1 = 10 * (x[i + 1] - a * a);
    const f2 = 1 - a;
    f += f1 * f1 + f2 * f2;
  }
  return f;
}

export const extendedRosenbrock: ProblemDefinition = {
  name: "extended-rosenbrock",
  title: "Extended Rosenbrock function (Moré–Garbow–Hillstrom #21)",
  tags: ["valley", "large-scale", "mgh"],
  source: mghSource(21),
  params: {
    n: { default: 10, min: 2, integer: true, even: true, description: "dimension (even)" },
  },
  create(params) {
    const { p, key } = prepare(extendedRosenbrock, params);
    const n = p.n;
    const x0 = new Float64Array(n);
    for (let i = 0; i < n; i += 2) {
      x0[i] = -1.2;
      x0[i + 1] = 1;
    }
    return deterministicInstance({
      name: extendedRosenbrock.name,
      key,
      x0,
      widths: halfWidths(x0),
      fStar: 0,
      fStarKind: "published",
      xStar: new Float64Array(n).fill(1),
      fg,
      f: value,
    });
  },
};
