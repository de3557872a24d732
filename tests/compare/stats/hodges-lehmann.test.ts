import { describe, expect, it } from "vitest";
import { Pcg32 } from "../../../src/core/rng.js";
import { hodgesLehmann } from "../../../src/compare/stats/hodges-lehmann.js";
import { normalQuantile } from "../../../src/compare/stats/normal-quantile.js";
import { wilcoxonSignedRank } from "../../../src/compare/stats/wilcoxon.js";
import { bruteWalsh, expectRelative, sortedMedian } from "./helpers.js";

/** n draws of shift + N(0, 1), rounded to `decimals` (rounding makes ties). */
function sample(rng: Pcg32, n: number, shift: number, decimals = 12): number[] {
  const f = 10 ** decimals;
  return Array.from({ length: n }, () => Math.round((shift + rng.nextNormal()) * f) / f);
}

// [n, level, C, achieved level]: C = #{w : cdf[w] ≤ (1 − level)/2} with
// cdf = np.cumsum(scipy.stats._hypotests._get_wilcoxon_distr(n)), achieved = 1 − 2·cdf[C − 1]
// (scipy 1.10.1; tests/compare/stats/reference/scipy_reference.py). C = 0 means no finite interval.
const C_TABLE: [number, number, number, number][] = [
  [5, 0.9, 1, 0.9375],
  [5, 0.95, 0, 1.0],
  [5, 0.99, 0, 1.0],
  [6, 0.9, 3, 0.90625],
  [6, 0.95, 1, 0.96875],
  [6, 0.99, 0, 1.0],
  [8, 0.9, 6, 0.921875],
  [8, 0.95, 4, 0.9609375],
  [8, 0.99, 1, 0.9921875],
  [10, 0.9, 11, 0.916015625],
  [10, 0.95, 9, 0.951171875],
  [10, 0.99, 4, 0.990234375],
  [20, 0.9, 61, 0.9026927947998047],
  [20, 0.95, 53, 0.9515590667724609],
  [20, 0.99, 38, 0.9905643463134766],
  [30, 0.9, 152, 0.9038984272629023],
  [30, 0.95, 138, 0.9502898789942265],
  [30, 0.99, 110, 0.9900684896856546],
  [50, 0.9, 467, 0.9009140754515759],
  [50, 0.95, 435, 0.9505535931993983],
  [50, 0.99, 374, 0.9900357182346387],
];

describe("hodgesLehmann", () => {
  it("reproduces a recomputed example (numpy brute force over the Walsh averages, C from scipy's table)", () => {
    // Recomputed by tests/compare/stats/reference/scipy_reference.py: w = np.sort([(x[i]+x[j])/2 ...]),
    // estimate np.median(w), bounds w[C−1], w[M−C] with C from _get_wilcoxon_distr(10) (C = 9 at 95%, 11 at 90%).
    const d10 = [0.12, -0.05, 0.31, 0.08, 0.22, -0.11, 0.17, 0.4, 0.03, 0.26];
    const r95 = hodgesLehmann(d10);
    expect([r95.estimate, r95.lower, r95.upper]).toEqual([0.14500000000000002, 0.03, 0.26]);
    expect([r95.lowerRank, r95.upperRank, r95.walshCount]).toEqual([9, 47, 55]);
    const r90 = hodgesLehmann(d10, { level: 0.9 });
    expect([r90.estimate, r90.lower, r90.upper]).toEqual([
      0.14500000000000002, 0.034999999999999996, 0.24000000000000002,
    ]);
  });

  it.each(C_TABLE)(
    "n = %s, level %s: lower rank C = %s, achieved level as scipy's table",
    (n, level, c, achieved) => {
      const r = hodgesLehmann(sample(new Pcg32(BigInt(n), 3n), n, 0), { level });
      expect(r.lowerRank).toBe(c);
      expect(r.upperRank).toBe((n * (n + 1)) / 2 + 1 - c);
      expectRelative(r.achievedLevel, achieved, 1e-15, `achieved level n = ${n}`);
      if (c === 0) {
        expect(r.lower).toBe(-Infinity);
        expect(r.upper).toBe(Infinity);
      }
    },
  );

  it("equals brute force (sorted Walsh averages) for n = 1 … 60, with and without ties, exactly", () => {
    const rng = new Pcg32(11n, 5n);
    for (let n = 1; n <= 60; n++) {
      for (const decimals of [12, 1]) {
        const d = sample(rng, n, 0.2, decimals);
        const w = bruteWalsh(d);
        const r = hodgesLehmann(d);
        expect(r.estimate).toBe(sortedMedian(w));
        expect(r.method).toBe(n <= 50 ? "exact" : "normal");
        if (r.lowerRank > 0) {
          expect(r.lower).toBe(w[r.lowerRank - 1]);
          expect(r.upper).toBe(w[r.upperRank - 1]);
        }
      }
    }
  });

  it("is the set of shifts the two-sided exact Wilcoxon test does not reject (test inversion)", () => {
    const rng = new Pcg32(12n, 5n);
    for (const n of [8, 15, 30]) {
      const d = sample(rng, n, 0.5);
      const w = bruteWalsh(d);
      const r = hodgesLehmann(d, { level: 0.9 });
      const c = r.lowerRank;
      const alpha = 0.1;
      const pAt = (theta: number) => wilcoxonSignedRank(d.map((v) => v - theta)).pValue;
      // just inside each bound: not rejected; just outside: rejected (Walsh averages are distinct here)
      expect(pAt(0.5 * (w[c - 1] + w[c]))).toBeGreaterThan(alpha);
      expect(pAt(0.5 * (w[c - 2] + w[c - 1]))).toBeLessThanOrEqual(alpha);
      const u = r.upperRank;
      expect(pAt(0.5 * (w[u - 2] + w[u - 1]))).toBeGreaterThan(alpha);
      expect(pAt(0.5 * (w[u - 1] + w[u]))).toBeLessThanOrEqual(alpha);
    }
  });

  it("uses C = ⌊M/2 + ½ − z σ⌋ for n > 50 (recomputed) and agrees with the exact rank within 1 at n = 50", () => {
    const n = 80;
    const m = (n * (n + 1)) / 2;
    const sigma = Math.sqrt((n * (n + 1) * (2 * n + 1)) / 24);
    const r = hodgesLehmann(sample(new Pcg32(4n, 4n), n, 0));
    expect(r.method).toBe("normal");
    expect(r.lowerRank).toBe(Math.floor(m / 2 + 0.5 - normalQuantile(0.975) * sigma));
    const d50 = sample(new Pcg32(5n, 4n), 50, 0);
    const exact = hodgesLehmann(d50, { method: "exact" }).lowerRank;
    const normal = hodgesLehmann(d50, { method: "normal" }).lowerRank;
    expect(exact).toBe(435); // scipy's table above
    expect(Math.abs(normal - exact)).toBeLessThanOrEqual(1);
  });

  it("covers the true centre of a symmetric distribution at the achieved level (2,000 samples, n = 12)", () => {
    // Exact coverage for continuous symmetric data is the achieved level; binomial SE ≈ 0.005, bound 4 SE.
    const rng = new Pcg32(99n, 1n);
    let covered = 0;
    let achieved = 0;
    const reps = 2000;
    for (let k = 0; k < reps; k++) {
      const r = hodgesLehmann(sample(rng, 12, 0.3));
      achieved = r.achievedLevel;
      if (r.lower <= 0.3 && 0.3 <= r.upper) covered++;
    }
    expect(Math.abs(covered / reps - achieved)).toBeLessThan(0.02);
  });

  it("handles n = 1 (estimate d[0], no finite interval)", () => {
    const r = hodgesLehmann([0.7]);
    expect(r.estimate).toBe(0.7);
    expect([r.lower, r.upper, r.achievedLevel]).toEqual([-Infinity, Infinity, 1]);
  });

  it("rejects a bad level, method or sample", () => {
    expect(() => hodgesLehmann([1, 2], { level: 95 })).toThrow(
      "hodgesLehmann: options.level must be a number strictly between 0 and 1, got 95",
    );
    expect(() => hodgesLehmann(new Array(51).fill(1), { method: "exact" })).toThrow(
      'hodgesLehmann: options.method "exact" needs n ≤ 50, got n = 51; use "auto" or "normal"',
    );
    expect(() => hodgesLehmann([1, Infinity])).toThrow(
      "hodgesLehmann: d[1] must be a finite number, got Infinity",
    );
  });
});
