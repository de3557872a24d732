import { describe, expect, it } from "vitest";
import { erfc } from "../../../src/compare/stats/erfc.js";
import { normalCdf, normalSf } from "../../../src/compare/stats/normal-cdf.js";
import { normalQuantile } from "../../../src/compare/stats/normal-quantile.js";
import { expectRelative } from "./helpers.js";

// Expected values: scipy 1.10.1 (Debian 12), produced by tests/compare/stats/reference/scipy_reference.py.

// [p, scipy.stats.norm.ppf(p)] — rows cover all three branches of AS 241: |p − ½| ≤ 0.425, r ≤ 5, r > 5.
const PPF: [number, number][] = [
  [1e-300, -37.0470962993612],
  [1e-20, -9.262340089798409],
  [1e-12, -7.034483825301131],
  [1e-5, -4.264890793922825],
  [0.001, -3.090232306167813],
  [0.025, -1.9599639845400545],
  [0.0749, -1.4402382675279635],
  [0.075, -1.4395314709384563],
  [0.3, -0.5244005127080409],
  [0.6, 0.2533471031357997],
  [0.925, 1.4395314709384563],
  [0.9251, 1.4402382675279635],
  [0.975, 1.959963984540054],
  [0.999, 3.090232306167813],
  [0.999999999999, 7.0344869100478356],
];

// [z, scipy.stats.norm.cdf(z)]
const CDF: [number, number][] = [
  [-20, 2.7536241186061556e-89],
  [-10, 7.61985302416047e-24],
  [-5, 2.866515718791933e-7],
  [-3, 0.0013498980316300933],
  [-1.96, 0.024997895148220435],
  [-1.5, 0.06680720126885807],
  [-1.2247, 0.11034413707094565],
  [-1.2, 0.11506967022170822],
  [-1, 0.15865525393145707],
  [-0.5, 0.3085375387259869],
  [0, 0.5],
  [0.3, 0.6179114221889526],
  [1.2, 0.8849303297782918],
  [1.2247, 0.8896558629290543],
  [1.25, 0.8943502263331446],
  [2, 0.9772498680518208],
  [5, 0.9999997133484281],
  [8, 0.9999999999999993],
];

// [z, scipy.stats.norm.sf(z)]
const SF: [number, number][] = [
  [0.5, 0.3085375387259869],
  [1.5, 0.06680720126885807],
  [3, 0.0013498980316300933],
  [5, 2.866515718791933e-7],
  [10, 7.61985302416047e-24],
  [20, 2.7536241186061556e-89],
  [37, 5.7255712225239266e-300],
];

// [x, scipy.special.erfc(x)] — both sides of the series/continued-fraction split at √1.5 ≈ 1.2247.
const ERFC: [number, number][] = [
  [-3, 1.9999779095030015],
  [-1.3, 1.9340079449406524],
  [-0.5, 1.5204998778130465],
  [0, 1.0],
  [1e-8, 0.9999999887162083],
  [0.5, 0.4795001221869535],
  [1.2, 0.08968602177036462],
  [1.3, 0.06599205505934758],
  [2, 0.004677734981047266],
  [5, 1.5374597944280347e-12],
  [10, 2.0884875837625446e-45],
  [26, 5.663192408856145e-296],
];

describe("normalQuantile (Wichura 1988, AS 241)", () => {
  it.each(PPF)("Φ⁻¹(%s) matches scipy.stats.norm.ppf within 1e-15 relative", (p, expected) => {
    expectRelative(normalQuantile(p), expected, 1e-15, `normalQuantile(${p})`);
  });

  it("is exactly 0 at p = ½ and ±∞ at the ends", () => {
    expect(normalQuantile(0.5)).toBe(0);
    expect(normalQuantile(0)).toBe(-Infinity);
    expect(normalQuantile(1)).toBe(Infinity);
  });

  it("inverts normalCdf over 1e-300 … 1 − 1e-10 within (1 + z²)·1e-15 relative", () => {
    // An error ε·|z| in z moves Φ by a relative ≈ ε z², so the round trip is held to (1 + z²)·1e-15.
    for (const p of [1e-300, 1e-100, 1e-30, 1e-8, 0.01, 0.1, 0.2, 0.5, 0.7, 0.9, 0.99, 1 - 1e-6, 1 - 1e-10]) {
      const z = normalQuantile(p);
      expectRelative(normalCdf(z), p, (1 + z * z) * 1e-15, `normalCdf(normalQuantile(${p}))`);
    }
  });

  it("rejects a p outside [0, 1] with the expected form", () => {
    expect(() => normalQuantile(1.5)).toThrow("normalQuantile: p must be a probability in [0, 1], got 1.5");
    expect(() => normalQuantile(NaN)).toThrow("normalQuantile: p must be a probability in [0, 1], got NaN");
  });
});

describe("normalCdf / normalSf", () => {
  it.each(CDF)("Φ(%s) matches scipy.stats.norm.cdf within 5e-15 relative", (z, expected) => {
    expectRelative(normalCdf(z), expected, 5e-15, `normalCdf(${z})`);
  });

  it.each(SF)(
    "1 − Φ(%s) matches scipy.stats.norm.sf within 5e-15 relative (no cancellation)",
    (z, expected) => {
      expectRelative(normalSf(z), expected, 5e-15, `normalSf(${z})`);
    },
  );

  it("is symmetric: Φ(−z) = 1 − Φ(z) exactly as computed (same erfc call)", () => {
    for (const z of [0.1, 1, 2.5, 7]) expect(normalCdf(-z)).toBe(normalSf(z));
  });

  it("rejects NaN", () => {
    expect(() => normalCdf(NaN)).toThrow("normalCdf: z must be a number, got NaN");
    expect(() => normalSf(NaN)).toThrow("normalSf: z must be a number, got NaN");
  });
});

describe("erfc", () => {
  it.each(ERFC)("erfc(%s) matches scipy.special.erfc within 2e-15 relative", (x, expected) => {
    expectRelative(erfc(x), expected, 2e-15, `erfc(${x})`);
  });

  it("underflows to 0 far out and tends to 2 on the left", () => {
    expect(erfc(30)).toBe(0);
    expect(erfc(-30)).toBe(2);
  });
});
