/**
 * Powell badly scaled function (Moré–Garbow–Hillstrom #3).
 *
 * What it is for: extreme scaling. The solution's coordinates differ by six orders of magnitude and
 * f₁ multiplies them by 10⁴, so a single global step size cannot suit both coordinates.
 *
 * f₁ = 10⁴x₁x₂ − 1,  f₂ = e^(−x₁) + e^(−x₂) − 1.0001,  f = f₁² + f₂².
 * ∇f = (2·10⁴x₂f₁ − 2e^(−x₁)f₂, 2·10⁴x₁f₁ − 2e^(−x₂)f₂).
 * x0 = (0, 1), f(x0) = 1.135262; f* = 0 at (1.098…e−5, 9.106…) (MGH 1981, problem 3). The minimiser
 * used here, (1.0981593296998175e−5, 9.1061467398665240), is recomputed by Newton's method at
 * 60 digits (tests/problems/fixtures/recompute_mgh.py) and agrees with the paper's digits.
 *
 * Source: MGH 1981 (see mgh.ts), problem 3; the paper attributes it to Powell, M. J. D. (1970), "A
 * hybrid method for nonlinear equations" (that original reference from memory).
 * Start perturbation, scaled per coordinate: x₁ ± 1e−6 (a tenth of the solution's x₁; 1% of a unit
 * scale would change 10⁴x₁x₂ by 100 and swamp the problem), x₂ ± 0.01 (1% of x0₂), uniform.
 * Cost: O(1) per evaluation (two exponentials).
 */
import type { ProblemDefinition } from "../core/types.js";
import { mghSource } from "./mgh.js";
import { prepare } from "./params.js";
import { deterministicInstance } from "./util.js";

function fg(x: Float64Array, g: Float64Array): number {
  const x1 = x[0];
  const x2 = x[1];
  const e1 = Math.exp(-x1);
  const e2 = Math.exp(-x2);
  const f1 = 1e4 * x1 * x2 - 1;
  const f2 = e1 + e2 - 1.0001;
  g[0] = 2 * (1e4 * x2 * f1 - e1 * f2);
  g[1] = 2 * (1e4 * x1 * f1 - e2 * f2);
  return f1 * f1 + f2 * f2;
}

const X0 = new Float64Array([0, 1]);
const WIDTHS = new Float64Array([1e-6, 0.01]);

export const powellBadlyScaled: ProblemDefinition = {
  name: "powell-badly-scaled",
  title: "Powell badly scaled function (Moré–Garbow–Hillstrom #3)",
  tags: ["badly-scaled", "mgh"],
  source: mghSource(3),
  params: {},
  create(params) {
    const { key } = prepare(powellBadlyScaled, params);
    return deterministicInstance({
      name: powellBadlyScaled.name,
      key,
      x0: X0,
      widths: WIDTHS,
      fStar: 0,
      fStarKind: "published",
      xStar: new Float64Array([1.0981593296998175e-5, 9.106146739866524]),
      fg,
    });
  },
};
