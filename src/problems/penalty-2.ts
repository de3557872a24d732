/**
 * Penalty function II (Moré–Garbow–Hillstrom #24).
 *
 * What it is for: like Penalty I a tiny penalty weight a = 10⁻⁵ against a weighted quartic term, but
 * with exponential residuals coupling neighbouring coordinates; the minimiser has unequal
 * coordinates and a small positive f*.
 *
 * With a = 10⁻⁵, eⱼ = exp(xⱼ/10), yᵢ = exp(i/10) + exp((i − 1)/10):
 * f₁ = x₁ − 0.2;  fᵢ = √a(eᵢ + eᵢ₋₁ − yᵢ), 2 ≤ i ≤ n;  fᵢ = √a(eᵢ₋ₙ₊₁ − exp(−1/10)), n < i < 2n;
 * f₂ₙ = Σⱼ (n − j + 1)xⱼ² − 1;  f = Σ fᵢ². (The term for i = n + 1 … 2n − 1 involves x₂ … xₙ.)
 * x0 = (½, …, ½); n = 4: f(x0) = 2.340009, f* = 9.37629e−6; n = 10: f* = 2.93660e−4
 * (MGH 1981, problem 24). Residuals cross-checked against a public port of the problem set
 * (NLSProblems.jl, src/mgh24.jl).
 *
 * x* and full digits of f* for n = 4 and n = 10 are recomputed by damped Newton at 60 digits
 * (tests/problems/fixtures/recompute_mgh.py) and reproduce the published values. For other n no
 * minimum is known here: f* = 0 is given as a lower bound ("lower-bound", x* null).
 *
 * Source: MGH 1981 (see mgh.ts), problem 24.
 * Start perturbation: ±(1% of |x0ᵢ| + 0.001) uniform per coordinate. Cost: n exponentials and O(n)
 * flops per evaluation, using one buffer of n made at create time.
 */
import type { ProblemDefinition } from "../core/types.js";
import { mghSource } from "./mgh.js";
import { prepare } from "./params.js";
import { deterministicInstance, halfWidths } from "./util.js";

const A = 1e-5;
const E_MINUS = Math.exp(-0.1);

/** Minimisers recomputed at 60 digits (recompute_mgh.py), rounded to double. */
const KNOWN: Readonly<Record<number, { fStar: number; xStar: readonly number[] }>> = {
  4: {
    fStar: 9.376293007355442e-6,
    xStar: [0.1999993333503804, 0.19131670099277245, 0.48010148533262315, 0.5188454043902005],
  },
  10: {
    fStar: 2.9366053745674594e-4,
    xStar: [
      0.1999836051978236, 0.010350648471292297, 0.019604934480438402, 0.03208906722068565,
      0.049932677399641294, 0.07651399515399361, 0.11862407286950417, 0.19214487233557667,
      0.34732058694184365, 0.3691643741593508,
    ],
  },
};

function makeFg(n: number) {
  const y = new Float64Array(n);
  for (let i = 1; i < n; i++) y[i] = Math.exp((i + 1) / 10) + Math.exp(i / 10);
  const e = new Float64Array(n);
  const fg = (x: Float64Array, g: Float64Array): number => {
    let w = 0;
    for (let j = 0; j < n; j++) {
      e[j] = Math.exp(x[j] / 10);
      w += (n - j) * x[j] * x[j];
    }
    const r1 = x[0] - 0.2;
    const last = w - 1;
    let f = r1 * r1 + last * last;
    for (let j = 0; j < n; j++) g[j] = 4 * last * (n - j) * x[j];
    g[0] += 2 * r1;
    for (let i = 1; i < n; i++) {
      const d = e[i] + e[i - 1] - y[i];
      const h = e[i] - E_MINUS;
      f += A * (d * d + h * h);
      // ∂/∂xᵢ of a·d² is 2a·d·eᵢ/10; of a·h² is 2a·h·eᵢ/10; ∂/∂xᵢ₋₁ of a·d² is 2a·d·eᵢ₋₁/10
      g[i] += 0.2 * A * (d + h) * e[i];
      g[i - 1] += 0.2 * A * d * e[i - 1];
    }
    return f;
  };
  return fg;
}

export const penalty2: ProblemDefinition = {
  name: "penalty-2",
  title: "Penalty function II (Moré–Garbow–Hillstrom #24)",
  tags: ["penalty", "badly-scaled", "mgh"],
  source: mghSource(24),
  fStarNote:
    "Published for n = 4 (9.37629e−6) and n = 10 (2.93660e−4); full digits and x* recomputed by damped Newton at 60 digits (tests/problems/fixtures/recompute_mgh.py). Other n: f* = 0 is only a lower bound.",
  params: {
    n: { default: 4, min: 1, max: 100000, integer: true, description: "dimension" },
  },
  create(params) {
    const { p, key } = prepare(penalty2, params);
    const n = p.n;
    const x0 = new Float64Array(n).fill(0.5);
    const known = KNOWN[n];
    return deterministicInstance({
      name: penalty2.name,
      key,
      x0,
      widths: halfWidths(x0),
      fStar: known ? known.fStar : 0,
      fStarKind: known ? "published" : "lower-bound",
      xStar: known ? Float64Array.from(known.xStar) : null,
      fg: makeFg(n),
    });
  },
};
