/**
 * Gaussian function (Moré–Garbow–Hillstrom #9).
 *
 * What it is for: a small-residual nonlinear least-squares fit whose minimum is close to the start
 * and positive (f* ≈ 1.13e−8), so it tests how far a method gets below a tiny gap.
 *
 * fᵢ = x₁·exp(−x₂(tᵢ − x₃)²/2) − yᵢ, tᵢ = (8 − i)/2, i = 1..15,  f = Σ fᵢ², with
 * y₁..y₈ = 0.0009, 0.0044, 0.0175, 0.0540, 0.1295, 0.2420, 0.3521, 0.3989 and y₁₆₋ᵢ = yᵢ.
 * With eᵢ = exp(−x₂(tᵢ − x₃)²/2): ∂fᵢ/∂x₁ = eᵢ, ∂fᵢ/∂x₂ = −x₁eᵢ(tᵢ − x₃)²/2, ∂fᵢ/∂x₃ = x₁x₂eᵢ(tᵢ − x₃).
 * x0 = (0.4, 1, 0), f(x0) = 3.888107e−6; f* = 1.12793e−8 (MGH 1981, problem 9). The y table was
 * checked against a public port of the paper's problem set (NLSProblems.jl, src/mgh09.jl).
 *
 * x* and the digits of f* used here: x* = (0.39895613783875666, 1.0000190844878056, 0),
 * f* = 1.1279327696186480e−8, recomputed by damped Newton at 60 digits
 * (tests/problems/fixtures/recompute_mgh.py); they reproduce the published 1.12793e−8. x₃ = 0 exactly
 * by symmetry (t and y are symmetric about i = 8).
 *
 * Source: MGH 1981 (see mgh.ts), problem 9.
 * Start perturbation: ±(1% of |x0ᵢ| + 0.001) uniform per coordinate. Cost: 15 exponentials per
 * evaluation.
 */
import type { ProblemDefinition } from "../core/types.js";
import { mghSource } from "./mgh.js";
import { prepare } from "./params.js";
import { deterministicInstance, halfWidths } from "./util.js";

const Y = new Float64Array([
  0.0009, 0.0044, 0.0175, 0.054, 0.1295, 0.242, 0.3521, 0.3989, 0.3521, 0.242, 0.1295, 0.054, 0.0175, 0.0044,
  0.0009,
]);

function fg(x: Float64Array, g: Float64Array): number {
  const x1 = x[0];
  const x2 = x[1];
  const x3 = x[2];
  let f = 0;
  let g1 = 0;
  let g2 = 0;
  let g3 = 0;
  for (let i = 1; i <= 15; i++) {
    const d = (8 - i) / 2 - x3;
    const e = Math.exp((-x2 * d * d) / 2);
    const r = x1 * e - Y[i - 1];
    f += r * r;
    g1 += r * e;
    g2 += (r * -x1 * e * d * d) / 2;
    g3 += r * x1 * x2 * e * d;
  }
  g[0] = 2 * g1;
  g[1] = 2 * g2;
  g[2] = 2 * g3;
  return f;
}

const X0 = new Float64Array([0.4, 1, 0]);

export const gaussian: ProblemDefinition = {
  name: "gaussian",
  title: "Gaussian function (Moré–Garbow–Hillstrom #9)",
  tags: ["least-squares", "small-residual", "mgh"],
  source: mghSource(9),
  fStarNote:
    "Published f* = 1.12793e−8 (MGH 1981, problem 9); the full digits 1.1279327696186480e−8 and x* are recomputed by damped Newton at 60 digits (tests/problems/fixtures/recompute_mgh.py).",
  params: {},
  create(params) {
    const { key } = prepare(gaussian, params);
    return deterministicInstance({
      name: gaussian.name,
      key,
      x0: X0,
      widths: halfWidths(X0),
      fStar: 1.127932769618648e-8,
      fStarKind: "published",
      xStar: new Float64Array([0.39895613783875666, 1.0000190844878056, 0]),
      fg,
    });
  },
};
