import { describe, expect, it } from "vitest";
import {
  SIGNED_RANK_EXACT_MAX_N,
  signedRankCdf,
  signedRankLowerTail,
  signedRankUpperTail,
} from "../../../src/compare/stats/signed-rank-distribution.js";
import { wilcoxonSignedRank, type SignedRankOptions } from "../../../src/compare/stats/wilcoxon.js";
import { expectRelative } from "./helpers.js";

// Expected values: scipy.stats.wilcoxon, scipy 1.10.1 (Debian 12), zero_method="wilcox" (the default);
// produced by tests/compare/stats/reference/scipy_reference.py, call written beside each row.
const EX = [1.1, 2.3, 0.4, -0.5, 3.2, 1.7, 0.9, 2.2];
const D20 = [
  -0.027, -0.6743, 0.7946, 0.725, -0.1412, 0.2003, -1.5037, -0.5824, 0.5166, 0.8955, 0.291, -0.5228, -0.0551,
  0.8253, -1.0667, 1.5048, 0.0714, -0.505, -0.7395, -0.8292,
];
/** Ties in |d| (1.5, 2.0 ×3 with one negative, 0.5 ×2, 1.0 ×2), no zeros. */
const DT = [1.5, -0.5, 2.0, 2.0, -2.0, 3.5, 0.5, 1.0, -1.0, 4.0, 2.5, 1.5];
/** Three zeros and ties (0.3 twice). */
const DZ = [0.0, 0.3, -0.1, 0.0, 0.7, 0.3, 0.9, -0.4, 1.2, 0.0, 0.5, 0.8];
/** Two zeros, no ties among the nonzero differences. */
const DZ2 = [0.0, 0.31, -0.12, 0.72, 0.0, 0.93, -0.44, 1.25, 0.58, 0.86, 0.17];
const D50 = [
  0.56297, -1.55479, -1.04251, -0.09806, -1.41293, -1.35538, 1.48783, -0.34485, -0.57365, 1.94879, 0.79651,
  0.37643, 0.66776, 0.36772, -0.06894, -2.53776, 0.45008, -0.33908, 1.32188, 0.79775, 1.15793, -0.60241,
  0.25567, 1.11398, -1.19707, -0.33499, -0.74125, -0.00112, -0.28134, -0.54886, 0.63248, 0.31668, 0.62655,
  0.45878, -1.51543, -0.02481, -0.90194, 1.36357, -0.27766, 0.91731, 0.46717, -0.07627, -1.54618, -0.48018,
  0.19547, 0.7547, 1.54284, 0.2723, 1.89031, -0.56615,
];
/** n = 60 (normal approximation); |0.58124| occurs twice with opposite signs (one tie). */
const D60 = [
  0.55359, -0.10087, -0.44194, -1.4484, -1.64377, 1.62059, -1.35544, -0.6083, -1.04865, 0.25377, -1.18436,
  -1.11334, 0.62717, 0.40025, -0.15702, 1.44192, 1.64157, 0.62985, -0.49783, 0.91718, 0.68614, 2.48978,
  0.65384, 1.1182, 0.16118, 2.55103, 0.2398, 2.04602, 2.70713, -0.56736, -0.96374, -0.64723, -0.69743,
  0.07449, -1.28774, 0.92557, 0.58124, -0.85947, -0.1048, 2.44903, 0.34652, 0.56367, 0.63377, -1.32147,
  1.16982, 1.50376, -1.71387, 0.88824, -0.71337, 0.26249, -0.27617, -0.0573, -2.19257, -1.2758, 0.35099,
  -0.86853, 0.48286, -0.58124, -0.05229, 0.96259,
];

interface Row {
  /** The scipy call that produced the expected values. */
  call: string;
  d: number[];
  options: SignedRankOptions;
  statistic: number;
  pValue: number;
  method: "exact" | "normal";
  /** Relative tolerance on the p-value. */
  tol: number;
}

// Exact p-values are dyadic rationals (counts / 2ⁿ) computed exactly on both sides: tolerance 0 for
// n ≤ 20; for n = 50 scipy sums float pmf values, so 1e-14 relative. Normal-approximation rows differ
// only by the normal CDF's rounding: 1e-14 relative.
const ROWS: Row[] = [
  { call: "wilcoxon(ex)", d: EX, options: {}, statistic: 2, pValue: 0.0234375, method: "exact", tol: 0 },
  {
    call: "wilcoxon(ex, alternative='greater')",
    d: EX,
    options: { alternative: "greater" },
    statistic: 34,
    pValue: 0.01171875,
    method: "exact",
    tol: 0,
  },
  {
    call: "wilcoxon(ex, alternative='less')",
    d: EX,
    options: { alternative: "less" },
    statistic: 34,
    pValue: 0.9921875,
    method: "exact",
    tol: 0,
  },
  {
    call: "wilcoxon([1, -2, 3, -4, -5, 6, 7, -8])",
    d: [1, -2, 3, -4, -5, 6, 7, -8],
    options: {},
    statistic: 17,
    pValue: 0.9453125,
    method: "exact",
    tol: 0,
  },
  {
    call: "wilcoxon(d20)",
    d: D20,
    options: {},
    statistic: 100,
    pValue: 0.8694877624511719,
    method: "exact",
    tol: 0,
  },
  {
    call: "wilcoxon(d20, alternative='greater')",
    d: D20,
    options: { alternative: "greater" },
    statistic: 100,
    pValue: 0.5795888900756836,
    method: "exact",
    tol: 0,
  },
  {
    call: "wilcoxon(d20, alternative='less')",
    d: D20,
    options: { alternative: "less" },
    statistic: 100,
    pValue: 0.43474388122558594,
    method: "exact",
    tol: 0,
  },
  {
    call: "wilcoxon(d20, mode='approx')",
    d: D20,
    options: { method: "normal" },
    statistic: 100,
    pValue: 0.8519245948146423,
    method: "normal",
    tol: 1e-14,
  },
  {
    call: "wilcoxon(d20, mode='approx', correction=True)",
    d: D20,
    options: { method: "normal", continuity: true },
    statistic: 100,
    pValue: 0.8665856286390512,
    method: "normal",
    tol: 1e-14,
  },
  {
    call: "wilcoxon(d20, mode='approx', correction=True, alternative='less')",
    d: D20,
    options: { method: "normal", continuity: true, alternative: "less" },
    statistic: 100,
    pValue: 0.4332928143195256,
    method: "normal",
    tol: 1e-14,
  },
  // Ties: our "auto" uses the normal approximation with tie correction; scipy 1.10's auto would use the
  // exact table on truncated midrank sums, so the reference is scipy's mode='approx'.
  {
    call: "wilcoxon(dt, mode='approx')",
    d: DT,
    options: {},
    statistic: 13,
    pValue: 0.040842897548396644,
    method: "normal",
    tol: 1e-14,
  },
  {
    call: "wilcoxon(dt, mode='approx', correction=True)",
    d: DT,
    options: { continuity: true },
    statistic: 13,
    pValue: 0.04487843633957442,
    method: "normal",
    tol: 1e-14,
  },
  {
    call: "wilcoxon(dt, mode='approx', alternative='greater')",
    d: DT,
    options: { alternative: "greater" },
    statistic: 65,
    pValue: 0.020421448774198322,
    method: "normal",
    tol: 1e-14,
  },
  {
    call: "wilcoxon(dt, mode='approx', alternative='greater', correction=True)",
    d: DT,
    options: { alternative: "greater", continuity: true },
    statistic: 65,
    pValue: 0.02243921816978721,
    method: "normal",
    tol: 1e-14,
  },
  {
    call: "wilcoxon(dt, mode='approx', alternative='less', correction=True)",
    d: DT,
    options: { alternative: "less", continuity: true },
    statistic: 65,
    pValue: 0.9814403999027429,
    method: "normal",
    tol: 1e-14,
  },
  // Zeros (dropped) and ties.
  {
    call: "wilcoxon(dz, mode='approx')",
    d: DZ,
    options: {},
    statistic: 5,
    pValue: 0.03798263464326016,
    method: "normal",
    tol: 1e-14,
  },
  {
    call: "wilcoxon(dz, mode='approx', correction=True, alternative='greater')",
    d: DZ,
    options: { continuity: true, alternative: "greater" },
    statistic: 40,
    pValue: 0.021912791888454904,
    method: "normal",
    tol: 1e-14,
  },
  // Zeros without ties: exact on the nonzero differences (scipy's exact result on d with zeros removed).
  {
    call: "wilcoxon([v for v in dz2 if v != 0])",
    d: DZ2,
    options: {},
    statistic: 5,
    pValue: 0.0390625,
    method: "exact",
    tol: 0,
  },
  {
    call: "wilcoxon([v for v in dz2 if v != 0], alternative='greater')",
    d: DZ2,
    options: { alternative: "greater" },
    statistic: 40,
    pValue: 0.01953125,
    method: "exact",
    tol: 0,
  },
  {
    call: "wilcoxon(dz2, mode='approx')",
    d: DZ2,
    options: { method: "normal" },
    statistic: 5,
    pValue: 0.038151710173415135,
    method: "normal",
    tol: 1e-14,
  },
  {
    call: "wilcoxon(d50)",
    d: D50,
    options: {},
    statistic: 590,
    pValue: 0.652772195247282,
    method: "exact",
    tol: 1e-14,
  },
  {
    call: "wilcoxon(d50, alternative='less')",
    d: D50,
    options: { alternative: "less" },
    statistic: 685,
    pValue: 0.677062021602457,
    method: "exact",
    tol: 1e-14,
  },
  {
    call: "wilcoxon(d60)",
    d: D60,
    options: {},
    statistic: 832.5,
    pValue: 0.5436290767561336,
    method: "normal",
    tol: 1e-14,
  },
  {
    call: "wilcoxon(d60, correction=True)",
    d: D60,
    options: { continuity: true },
    statistic: 832.5,
    pValue: 0.5460740416742117,
    method: "normal",
    tol: 1e-14,
  },
  {
    call: "wilcoxon(d60, alternative='greater')",
    d: D60,
    options: { alternative: "greater" },
    statistic: 997.5,
    pValue: 0.2718145383780668,
    method: "normal",
    tol: 1e-14,
  },
];

describe("wilcoxonSignedRank against scipy.stats.wilcoxon (scipy 1.10.1)", () => {
  it.each(ROWS)("$call", (row) => {
    const r = wilcoxonSignedRank(row.d, row.options);
    expect(r.statistic).toBe(row.statistic);
    expect(r.method).toBe(row.method);
    expectRelative(r.pValue, row.pValue, row.tol, row.call);
  });
});

describe("wilcoxonSignedRank bookkeeping", () => {
  it("reports W+, W−, n used, zeros and ties (DZ: 3 zeros dropped, |0.3| tied)", () => {
    const r = wilcoxonSignedRank(DZ);
    expect(r.nZeros).toBe(3);
    expect(r.nUsed).toBe(9);
    expect(r.ties).toBe(true);
    expect(r.wPlus + r.wMinus).toBe((9 * 10) / 2);
    expect(r.wMinus).toBe(5); // |−0.1| has rank 1, |−0.4| rank 4
  });

  it("gives p = 1 at the centre of the null distribution (W+ = W− = 5 for n = 4)", () => {
    const r = wilcoxonSignedRank([1, -2, -3, 4]);
    expect(r.wPlus).toBe(5);
    expect(r.pValue).toBe(1);
  });

  it("gives p = 1 for every alternative when all differences are zero (n used = 0)", () => {
    for (const alternative of ["two-sided", "greater", "less"] as const) {
      const r = wilcoxonSignedRank([0, 0, 0], { alternative });
      expect(r.nUsed).toBe(0);
      expect(r.pValue).toBe(1);
    }
  });

  it("does not depend on the order of d", () => {
    const shuffled = [...D20].reverse();
    expect(wilcoxonSignedRank(shuffled)).toEqual(wilcoxonSignedRank(D20));
  });

  it("reports z for the normal approximation: z = (T − n(n+1)/4)/σ (recomputed for d20, no correction)", () => {
    const r = wilcoxonSignedRank(D20, { method: "normal" });
    const sigma = Math.sqrt((20 * 21 * 41) / 24);
    expectRelative(r.z, (100 - 105) / sigma, 1e-15, "z");
  });
});

describe("wilcoxonSignedRank input errors", () => {
  it("refuses method 'exact' with ties or beyond n = 50", () => {
    expect(() => wilcoxonSignedRank(DT, { method: "exact" })).toThrow(
      'wilcoxonSignedRank: options.method "exact" does not apply: some |d| are tied (midranks); use "auto" or "normal"',
    );
    expect(() =>
      wilcoxonSignedRank(
        D60.map((v, i) => v + i * 1e-9),
        { method: "exact" },
      ),
    ).toThrow(
      'wilcoxonSignedRank: options.method "exact" does not apply: the exact distribution is tabulated for n ≤ 50 nonzero differences, got n = 60; use "auto" or "normal"',
    );
  });

  it("names the bad element, option or value", () => {
    expect(() => wilcoxonSignedRank([1, NaN, 2])).toThrow(
      "wilcoxonSignedRank: d[1] must be a finite number, got NaN",
    );
    expect(() => wilcoxonSignedRank([])).toThrow(
      "wilcoxonSignedRank: d must hold at least 1 finite number, got 0",
    );
    expect(() => wilcoxonSignedRank(EX, { alternative: "bigger" as never })).toThrow(
      'wilcoxonSignedRank: options.alternative must be one of "two-sided", "greater", "less", got "bigger"',
    );
    expect(() => wilcoxonSignedRank(EX, { continuity: "yes" as never })).toThrow(
      'wilcoxonSignedRank: options.continuity must be true or false, got "yes"',
    );
  });
});

describe("signedRankCdf (exact null distribution of W+)", () => {
  it("equals brute-force enumeration of all 2ⁿ sign patterns for n = 0 … 14 (exactly)", () => {
    for (let n = 0; n <= 14; n++) {
      const top = (n * (n + 1)) / 2;
      const counts = new Array<number>(top + 1).fill(0);
      for (let mask = 0; mask < 1 << n; mask++) {
        let w = 0;
        for (let k = 0; k < n; k++) if (mask & (1 << k)) w += k + 1;
        counts[w]++;
      }
      const cdf = signedRankCdf(n);
      let acc = 0;
      for (let w = 0; w <= top; w++) {
        acc += counts[w];
        expect(cdf[w]).toBe(acc / 2 ** n);
      }
    }
  });

  it("is symmetric, ends at 1 and is cached per n", () => {
    const n = SIGNED_RANK_EXACT_MAX_N;
    const top = (n * (n + 1)) / 2;
    const cdf = signedRankCdf(n);
    expect(cdf[top]).toBe(1);
    expect(cdf[0]).toBe(2 ** -n);
    for (const w of [0, 17, 300, 637])
      expect(signedRankUpperTail(n, top - w)).toBe(signedRankLowerTail(n, w));
    expect(signedRankCdf(n)).toBe(cdf);
  });

  it("matches the critical values of scipy's table: P(W+ ≤ 52) ≤ 0.025 < P(W+ ≤ 53) for n = 20", () => {
    // From the same scipy run: np.cumsum(scipy.stats._hypotests._get_wilcoxon_distr(20)) gives C = 53
    // for level 0.95 (the largest C with cdf[C−1] ≤ 0.025) and achieved level 0.9515590667724609.
    expectRelative(1 - 2 * signedRankLowerTail(20, 52), 0.9515590667724609, 1e-15, "n = 20");
    expect(signedRankLowerTail(20, 53)).toBeGreaterThan(0.025);
  });

  it("rejects n outside [0, 50]", () => {
    expect(() => signedRankCdf(51)).toThrow("signedRankCdf: n must be an integer in [0, 50], got 51");
  });
});
