import { describe, expect, it } from "vitest";
import { mannWhitneyCdf } from "../../../src/compare/stats/mann-whitney-distribution.js";
import { mannWhitneyU, type MannWhitneyOptions } from "../../../src/compare/stats/mann-whitney.js";
import { expectRelative } from "./helpers.js";

const X5 = [0.8, 1.9, 2.7, 3.1, 4.6];
const Y6 = [2.2, 3.9, 5.4, 6.1, 7.3, 8.8];
const X20 = [
  0.0012, 0.2987, -0.2741, -0.8906, -0.4547, -0.9916, 0.0601, 1.3402, -0.4922, -0.6205, 0.4898, 0.3569,
  0.1054, -0.9305, -0.0293, 0.6953, -1.3442, -0.4576, -1.9012, -1.2895,
];
const Y25 = [
  -1.2417, 0.3649, -0.6674, 0.8713, 0.7568, 0.4131, -1.9168, 0.0613, 0.5515, 0.7133, -0.9301, 0.1222, -0.3785,
  -0.2088, 1.6609, -0.2075, 0.5675, 1.4844, 0.0164, 0.4883, 0.7105, 0.6638, -0.6251, 0.6761, 1.9588,
];
/** Integer data: heavy ties. */
const X30 = [3, 0, 1, 4, 5, 4, 4, 6, 5, 2, 5, 4, 0, 0, 5, 3, 4, 2, 1, 1, 3, 6, 3, 3, 4, 7, 3, 4, 3, 4];
const Y40 = [
  4, 6, 5, 6, 8, 2, 5, 4, 3, 2, 1, 4, 7, 1, 4, 8, 8, 2, 1, 6, 1, 3, 4, 7, 1, 6, 5, 2, 7, 7, 4, 8, 5, 8, 8, 5,
  3, 2, 5, 2,
];
const A = [1, 2, 3, 4, 5];
const B = [3, 4, 5, 6, 7, 8];

interface Row {
  call: string;
  x: number[];
  y: number[];
  options: MannWhitneyOptions;
  u: number;
  pValue: number;
  method: "exact" | "normal";
  tol: number;
}

// scipy.stats.mannwhitneyu, scipy 1.10.1 (tests/compare/stats/reference/scipy_reference.py).
// Exact rows: our probabilities are exact counts / C(n1+n2, n1) (one rounding): 1e-14 relative.
const ROWS: Row[] = [
  {
    call: "mannwhitneyu(x5, y6, method='exact')",
    x: X5,
    y: Y6,
    options: {},
    u: 4,
    pValue: 0.05194805194805195,
    method: "exact",
    tol: 1e-14,
  },
  {
    call: "mannwhitneyu(x5, y6, method='exact', alternative='greater')",
    x: X5,
    y: Y6,
    options: { alternative: "greater" },
    u: 4,
    pValue: 0.984848484848485,
    method: "exact",
    tol: 1e-14,
  },
  {
    call: "mannwhitneyu(x5, y6, method='exact', alternative='less')",
    x: X5,
    y: Y6,
    options: { alternative: "less" },
    u: 4,
    pValue: 0.025974025974025976,
    method: "exact",
    tol: 1e-14,
  },
  {
    call: "mannwhitneyu(x20, y25, method='exact')",
    x: X20,
    y: Y25,
    options: {},
    u: 147,
    pValue: 0.01814295858223156,
    method: "exact",
    tol: 1e-14,
  },
  {
    call: "mannwhitneyu(x20, y25, method='exact', alternative='less')",
    x: X20,
    y: Y25,
    options: { alternative: "less" },
    u: 147,
    pValue: 0.00907147929111578,
    method: "exact",
    tol: 1e-14,
  },
  {
    call: "mannwhitneyu(x20, y25, method='asymptotic')",
    x: X20,
    y: Y25,
    options: { method: "normal" },
    u: 147,
    pValue: 0.01921852121937493,
    method: "normal",
    tol: 1e-14,
  },
  // Ties: our "auto" uses the normal approximation with tie correction.
  {
    call: "mannwhitneyu([1..5], [3..8], method='asymptotic')",
    x: A,
    y: B,
    options: {},
    u: 4.5,
    pValue: 0.066015431521231,
    method: "normal",
    tol: 1e-14,
  },
  {
    call: "mannwhitneyu([1..5], [3..8], method='asymptotic', use_continuity=False)",
    x: A,
    y: B,
    options: { continuity: false },
    u: 4.5,
    pValue: 0.05357774928971018,
    method: "normal",
    tol: 1e-14,
  },
  {
    call: "mannwhitneyu([1..5], [3..8], alternative='less', method='asymptotic')",
    x: A,
    y: B,
    options: { alternative: "less" },
    u: 4.5,
    pValue: 0.0330077157606155,
    method: "normal",
    tol: 1e-14,
  },
  {
    call: "mannwhitneyu(x30, y40)",
    x: X30,
    y: Y40,
    options: {},
    u: 427,
    pValue: 0.03880857136422791,
    method: "normal",
    tol: 1e-14,
  },
  {
    call: "mannwhitneyu(x30, y40, use_continuity=False)",
    x: X30,
    y: Y40,
    options: { continuity: false },
    u: 427,
    pValue: 0.0382468024113122,
    method: "normal",
    tol: 1e-14,
  },
  {
    call: "mannwhitneyu(x30, y40, alternative='greater')",
    x: X30,
    y: Y40,
    options: { alternative: "greater" },
    u: 427,
    pValue: 0.9811540189225606,
    method: "normal",
    tol: 1e-14,
  },
  {
    call: "mannwhitneyu(x30, y40, alternative='less')",
    x: X30,
    y: Y40,
    options: { alternative: "less" },
    u: 427,
    pValue: 0.019404285682113956,
    method: "normal",
    tol: 1e-14,
  },
];

describe("mannWhitneyU against scipy.stats.mannwhitneyu (scipy 1.10.1)", () => {
  it.each(ROWS)("$call", (row) => {
    const r = mannWhitneyU(row.x, row.y, row.options);
    expect(r.statistic).toBe(row.u);
    expect(r.u1 + r.u2).toBe(row.x.length * row.y.length);
    expect(r.method).toBe(row.method);
    expectRelative(r.pValue, row.pValue, row.tol, row.call);
  });

  it("refuses method 'exact' with ties, where scipy 1.10 truncates U", () => {
    // scipy.stats.mannwhitneyu([1,2,3,4,5], [3,4,5,6,7,8], method='exact') returns U 4.5 and
    // p 0.08225108225108226, the exact tail at the truncated U = 25 of max(U1, U2) = 25.5; that is not a
    // valid p-value for tied data, so this kernel throws instead.
    expect(() => mannWhitneyU(A, B, { method: "exact" })).toThrow(
      'mannWhitneyU: options.method "exact" does not apply: the pooled sample has ties (midranks); use "auto" or "normal"',
    );
  });

  it("gives p = 1 when every pooled value is equal", () => {
    expect(mannWhitneyU([2, 2, 2], [2, 2]).pValue).toBe(1);
  });

  it("rejects bad input with the expected form", () => {
    expect(() => mannWhitneyU([], [1])).toThrow("mannWhitneyU: x must hold at least 1 finite number, got 0");
    expect(() => mannWhitneyU([1], ["a" as never])).toThrow(
      'mannWhitneyU: y[0] must be a finite number, got "a"',
    );
  });
});

describe("mannWhitneyCdf (exact null distribution of U)", () => {
  it("equals brute-force enumeration of all arrangements for n1, n2 ≤ 6", () => {
    for (let n1 = 1; n1 <= 6; n1++) {
      for (let n2 = 1; n2 <= 6; n2++) {
        const n = n1 + n2;
        const counts = new Array<number>(n1 * n2 + 1).fill(0);
        let total = 0;
        for (let mask = 0; mask < 1 << n; mask++) {
          let bits = 0;
          for (let k = 0; k < n; k++) if (mask & (1 << k)) bits++;
          if (bits !== n1) continue;
          // positions 0…n−1 in ascending order; x at the set bits; U = #(x above y)
          let u = 0;
          let ysBelow = 0;
          for (let k = 0; k < n; k++) {
            if (mask & (1 << k)) u += ysBelow;
            else ysBelow++;
          }
          counts[u]++;
          total++;
        }
        const cdf = mannWhitneyCdf(n1, n2);
        let acc = 0;
        for (let u = 0; u <= n1 * n2; u++) {
          acc += counts[u];
          expectRelative(cdf[u], acc / total, 1e-15, `n1 = ${n1}, n2 = ${n2}, u = ${u}`);
        }
      }
    }
  });

  it("is the same table for (n1, n2) and (n2, n1) and ends at 1", () => {
    expect(mannWhitneyCdf(7, 13)).toBe(mannWhitneyCdf(13, 7));
    expect(mannWhitneyCdf(25, 25)[625]).toBe(1);
  });

  it("rejects sizes beyond the exact range", () => {
    expect(() => mannWhitneyCdf(30, 21)).toThrow(
      "mannWhitneyCdf: n1 + n2 must be ≤ 50 for the exact distribution, got 30 + 21",
    );
  });
});
