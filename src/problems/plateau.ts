/**
 * Gaussian-well plateau: f(x) = 1 − exp(−‖x‖²/(2s²)), s = 1.
 *
 * What it is for: a plateau with a vanishing gradient far from the minimum. From radius r the
 * gradient norm is r·e^(−r²/2) (0.033 at r = 3, 1.3e−3 at r = 4), so methods whose step scales with
 * the gradient (SGD, momentum) crawl across the plateau, while normalised steps (Adam, RMSProp) do
 * not; once in the well it is a well-conditioned bowl.
 *
 * f(x) = 1 − e^(−‖x‖²/2),  ∇f = x·e^(−‖x‖²/2),  f* = 0 at x* = 0, sup f = 1.
 * Radially f(r) = 1 − e^(−r²/2) has f'' = (1 − r²)e^(−r²/2): convex for r < 1, concave beyond, so the
 * Hessian's largest eigenvalue is 1 (at the origin) and the problem is nonconvex.
 * Standard start x0 = (r0/√n)·(1, …, 1), at distance r0 (param, default 3) from the minimum.
 *
 * Source: constructed here (common practice). Plateaus of this kind in neural-network training are
 * studied by Saad & Solla (1995), "On-line learning in soft committee machines", Phys. Rev. E 52(4)
 * (volume and issue from memory).
 * Start perturbation: ±1% of each coordinate (+0.001 floor), uniform. Cost: O(n) and one exponential.
 */
import type { ProblemDefinition } from "../core/types.js";
import { prepare } from "./params.js";
import { deterministicInstance, halfWidths } from "./util.js";

function fg(x: Float64Array, g: Float64Array): number {
  const n = x.length;
  let r2 = 0;
  for (let i = 0; i < n; i++) r2 += x[i] * x[i];
  const e = Math.exp(-0.5 * r2);
  for (let i = 0; i < n; i++) g[i] = x[i] * e;
  return -Math.expm1(-0.5 * r2);
}

function value(x: Float64Array): number {
  let r2 = 0;
  for (let i = 0; i < x.length; i++) r2 += x[i] * x[i];
  return -Math.expm1(-0.5 * r2);
}

export const plateau: ProblemDefinition = {
  name: "plateau",
  title: "Gaussian-well plateau 1 − exp(−‖x‖²/2), start on the plateau",
  tags: ["plateau", "vanishing-gradient", "nonconvex"],
  source:
    'Constructed here (common practice); plateaus: Saad & Solla (1995), "On-line learning in soft committee machines", Phys. Rev. E 52(4)',
  fStarNote: "f* = 0 at x* = 0 by construction (exact).",
  params: {
    n: { default: 2, min: 1, max: 1000000, integer: true, description: "dimension" },
    r0: { default: 3, min: 0, max: 30, description: "distance of the standard start from the minimum" },
  },
  create(params) {
    const { p, key } = prepare(plateau, params);
    const n = p.n;
    const x0 = new Float64Array(n).fill(p.r0 / Math.sqrt(n));
    return deterministicInstance({
      name: plateau.name,
      key,
      x0,
      widths: halfWidths(x0),
      fStar: 0,
      fStarKind: "computed",
      xStar: new Float64Array(n),
      fg,
      f: value,
    });
  },
};
