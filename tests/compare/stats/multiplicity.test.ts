import { describe, expect, it } from "vitest";
import { benjaminiHochbergAdjust } from "../../../src/compare/stats/benjamini-hochberg.js";
import { holmAdjust } from "../../../src/compare/stats/holm.js";
import { expectRelative } from "./helpers.js";

// The 15 p-values of the worked example in Benjamini & Hochberg (1995), JRSS B 57:289–300 (list from
// memory); at q = 0.05 BH rejects the 4 smallest and Holm the 3 smallest, as the statsmodels calls confirm.
const BH_EXAMPLE = [
  0.0001, 0.0004, 0.0019, 0.0095, 0.0201, 0.0278, 0.0298, 0.0344, 0.0459, 0.324, 0.4262, 0.5719, 0.6528,
  0.759, 1.0,
];
/** Unsorted, with ties, to check the output order and tie handling. */
const MIXED = [0.04, 0.01, 0.03, 0.04, 0.2, 0.005, 0.9, 0.03];

// statsmodels 0.13.5 (Debian 12): statsmodels.stats.multitest.multipletests(p, alpha=0.05, method=...)[1]
const EXPECTED = {
  holm: {
    // multipletests(BH_EXAMPLE, alpha=0.05, method='holm')[1]
    example: [
      0.0015, 0.0056, 0.0247, 0.11399999999999999, 0.2211, 0.27799999999999997, 0.27799999999999997,
      0.27799999999999997, 0.32130000000000003, 1.0, 1.0, 1.0, 1.0, 1.0, 1.0,
    ],
    // multipletests(MIXED, alpha=0.05, method='holm')[1]
    mixed: [0.18, 0.07, 0.18, 0.18, 0.4, 0.04, 0.9, 0.18],
  },
  bh: {
    // multipletests(BH_EXAMPLE, alpha=0.05, method='fdr_bh')[1]
    example: [
      0.0015, 0.003, 0.0095, 0.035625, 0.0603, 0.06385714285714286, 0.06385714285714286, 0.0645,
      0.07650000000000001, 0.48600000000000004, 0.5811818181818182, 0.7148749999999999, 0.7532307692307693,
      0.8132142857142857, 1.0,
    ],
    // multipletests(MIXED, alpha=0.05, method='fdr_bh')[1]
    mixed: [
      0.05333333333333334, 0.04, 0.05333333333333334, 0.05333333333333334, 0.2285714285714286, 0.04, 0.9,
      0.05333333333333334,
    ],
  },
};

/** statsmodels computes p·(m/k) where we compute m·p/k: a few ULPs apart, hence 1e-15 relative. */
const TOL = 1e-15;

describe("holmAdjust", () => {
  it("matches statsmodels multipletests(method='holm') on the BH example and on unsorted tied input", () => {
    const a = holmAdjust(BH_EXAMPLE);
    EXPECTED.holm.example.forEach((e, i) => expectRelative(a[i], e, TOL, `example[${i}]`));
    const b = holmAdjust(MIXED);
    EXPECTED.holm.mixed.forEach((e, i) => expectRelative(b[i], e, TOL, `mixed[${i}]`));
    expect(Array.from(a).filter((v) => v <= 0.05)).toHaveLength(3);
  });
});

describe("benjaminiHochbergAdjust", () => {
  it("matches statsmodels multipletests(method='fdr_bh') on the BH example and on unsorted tied input", () => {
    const a = benjaminiHochbergAdjust(BH_EXAMPLE);
    EXPECTED.bh.example.forEach((e, i) => expectRelative(a[i], e, TOL, `example[${i}]`));
    const b = benjaminiHochbergAdjust(MIXED);
    EXPECTED.bh.mixed.forEach((e, i) => expectRelative(b[i], e, TOL, `mixed[${i}]`));
    expect(Array.from(a).filter((v) => v <= 0.05)).toHaveLength(4);
  });
});

describe.each([
  ["holmAdjust", holmAdjust],
  ["benjaminiHochbergAdjust", benjaminiHochbergAdjust],
] as const)("%s properties", (name, adjust) => {
  it("is monotone in p, never below p, capped at 1, in input order", () => {
    const p = [0.3, 0.001, 0.2, 0.9, 0.04, 0.04, 0.6, 0.0007, 0.5, 0.051];
    const a = adjust(p);
    expect(a).toHaveLength(p.length);
    for (let i = 0; i < p.length; i++) {
      expect(a[i]).toBeGreaterThanOrEqual(p[i]);
      expect(a[i]).toBeLessThanOrEqual(1);
      for (let j = 0; j < p.length; j++) if (p[i] < p[j]) expect(a[i]).toBeLessThanOrEqual(a[j]);
    }
  });

  it("returns one p-value unchanged and an empty list empty", () => {
    expect(Array.from(adjust([0.037]))).toEqual([0.037]);
    expect(adjust([])).toHaveLength(0);
  });

  it("rejects a value that is not a probability", () => {
    expect(() => adjust([0.1, 1.2])).toThrow(`${name}: p[1] must be a probability in [0, 1], got 1.2`);
    expect(() => adjust([NaN])).toThrow(`${name}: p[0] must be a finite number, got NaN`);
  });
});
