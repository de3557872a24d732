/**
 * Helical valley function (Moré–Garbow–Hillstrom #7).
 *
 * What it is for: a valley that winds around the x₃ axis; methods must follow a helix to reach the
 * minimum, and curvature across the valley (10²) dwarfs curvature along it.
 *
 * f₁ = 10(x₃ − 10θ(x₁, x₂)),  f₂ = 10(√(x₁² + x₂²) − 1),  f₃ = x₃,  f = f₁² + f₂² + f₃², with
 * 2π·θ = arctan(x₂/x₁) for x₁ > 0 and arctan(x₂/x₁) + π for x₁ < 0 (MGH 1981, problem 7).
 * x0 = (−1, 0, 0), f(x0) = 2500 (θ = ½ there); f* = 0 at (1, 0, 0).
 *
 * Which θ, and why: the paper's θ, not atan2/(2π). The paper's θ takes values in (−¼, ¾) and is
 * continuous everywhere except across the half-line x₁ = 0, x₂ < 0; atan2/(2π) takes values in
 * (−½, ½] and jumps across x₁ < 0, x₂ = 0 — exactly where the standard start lies, so a seeded
 * perturbation of x₂ to ±tiny would flip θ between ±½ and change the problem. Computed here as
 * θ = atan2(x₂, x₁)/(2π), plus 1 when that is below −¼ (equal to the paper's definition for x₁ ≠ 0).
 * On x₁ = 0, where the paper leaves θ undefined, θ = ¼ for x₂ ≥ 0 and −¼ for x₂ < 0 (the limits
 * from the x₁ > 0 side at x₂ < 0 and from both sides at x₂ > 0). At x₁ = x₂ = 0 the gradients of θ and
 * of the radius do not exist; they are taken as 0 there so that f and ∇f stay finite.
 * ∇θ = (−x₂, x₁)/(2π r²), ∇r = (x₁, x₂)/r, r = √(x₁² + x₂²).
 *
 * Source: MGH 1981 (see mgh.ts), problem 7; originally Fletcher, R. & Powell, M. J. D. (1963), "A
 * rapidly convergent descent method for minimization", The Computer Journal 6(2):163–168 (that
 * reference from memory).
 * Start perturbation: ±(1% of |x0ᵢ| + 0.001) uniform per coordinate, so x₂ stays within 0.001 of 0
 * and θ near ½. Cost: O(1) per evaluation (one atan2, one sqrt).
 */
import type { ProblemDefinition } from "../core/types.js";
import { mghSource } from "./mgh.js";
import { prepare } from "./params.js";
import { deterministicInstance, halfWidths } from "./util.js";

const TWO_PI = 2 * Math.PI;

/** The paper's θ(x₁, x₂), extended to x₁ = 0 as described above. */
export function helicalTheta(x1: number, x2: number): number {
  if (x1 === 0) return x2 >= 0 ? 0.25 : -0.25;
  const t = Math.atan2(x2, x1) / TWO_PI;
  return t < -0.25 ? t + 1 : t;
}

function fg(x: Float64Array, g: Float64Array): number {
  const x1 = x[0];
  const x2 = x[1];
  const x3 = x[2];
  const r2 = x1 * x1 + x2 * x2;
  const r = Math.sqrt(r2);
  const f1 = 10 * (x3 - 10 * helicalTheta(x1, x2));
  const f2 = 10 * (r - 1);
  if (r2 > 0) {
    // ∂f₁/∂x = −100∇θ, ∂f₂/∂x = 10∇r
    const c = 100 / (TWO_PI * r2);
    g[0] = 2 * (f1 * c * x2 + (f2 * 10 * x1) / r);
    g[1] = 2 * (-f1 * c * x1 + (f2 * 10 * x2) / r);
  } else {
    g[0] = 0;
    g[1] = 0;
  }
  g[2] = 2 * (10 * f1 + x3);
  return f1 * f1 + f2 * f2 + x3 * x3;
}

const X0 = new Float64Array([-1, 0, 0]);

export const helicalValley: ProblemDefinition = {
  name: "helical-valley",
  title: "Helical valley function (Moré–Garbow–Hillstrom #7)",
  tags: ["valley", "curved", "mgh"],
  source: mghSource(7),
  params: {},
  create(params) {
    const { key } = prepare(helicalValley, params);
    return deterministicInstance({
      name: helicalValley.name,
      key,
      x0: X0,
      widths: halfWidths(X0),
      fStar: 0,
      fStarKind: "published",
      xStar: new Float64Array([1, 0, 0]),
      fg,
    });
  },
};
