import { describe, expect, it } from "vitest";
import { Pcg32 } from "../../../src/core/rng.js";
import { bcaLevels, bootstrapInterval } from "../../../src/compare/stats/bootstrap.js";
import { drawCounts } from "../../../src/compare/stats/draw-counts.js";
import { normalQuantile } from "../../../src/compare/stats/normal-quantile.js";
import {
  resampleHodgesLehmann,
  resampleMean,
  resampleMedian,
  type CountStatisticFactory,
} from "../../../src/compare/stats/resample-statistics.js";
import { quantileInPlace, selectInPlace } from "../../../src/compare/stats/select.js";
import { bruteWalsh, expectAbsolute, expectRelative, sortedMedian } from "./helpers.js";

/** n draws of shift + N(0, 1), rounded to `decimals` (rounding makes ties). */
function sample(rng: Pcg32, n: number, shift: number, decimals = 12): number[] {
  const f = 10 ** decimals;
  return Array.from({ length: n }, () => Math.round((shift + rng.nextNormal()) * f) / f);
}

/** Type-7 quantile of an unsorted array by full sort (independent of quantileInPlace). */
function type7(values: number[], q: number): number {
  const s = [...values].sort((a, b) => a - b);
  const h = (s.length - 1) * q;
  const k = Math.floor(h);
  return k + 1 < s.length ? s[k] + (h - k) * (s[k + 1] - s[k]) : s[k];
}

/** The resample described by counts over `sorted`, materialized. */
function materialize(sorted: Float64Array, counts: Int32Array): number[] {
  const y: number[] = [];
  for (let i = 0; i < sorted.length; i++) for (let c = 0; c < counts[i]; c++) y.push(sorted[i]);
  return y;
}

describe("bcaLevels against scipy.stats._resampling._bca_interval (scipy 1.10.1)", () => {
  // Inputs: bootstrap replicates theta_hat_b chosen by hand, statistic np.mean, jackknife means of the data;
  // expected alpha_1, alpha_2, a_hat from
  // _bca_interval((data,), mean, axis=-1, alpha=(1-level)/2, theta_hat_b=tb, batch=None) and the bounds
  // from np.percentile(tb, alpha*100) (tests/compare/stats/reference/scipy_reference.py).
  const tb1 = [
    0.31, 0.12, 0.25, 0.44, 0.19, 0.02, 0.37, 0.28, 0.22, 0.5, 0.09, 0.246, 0.33, 0.16, 0.41, 0.27, 0.246,
    0.14, 0.58, 0.21,
  ];
  const jack1 = [
    0.2514285714285714, 0.3314285714285714, 0.21285714285714288, 0.2742857142857143, 0.15,
    0.26285714285714284, 0.2928571428571428, 0.19428571428571426,
  ];
  const cases = [
    {
      name: "data [0.21, −0.35, 0.48, 0.05, 0.92, 0.13, −0.08, 0.61], level 0.9",
      tb: tb1,
      estimate: 0.24625000000000002,
      jack: jack1,
      level: 0.9,
      a1: 0.054180755577721076,
      a2: 0.9541091415614245,
      a: 0.014862743063930543,
      lo: 0.09088303067930101,
      hi: 0.5102458951733649,
    },
    {
      name: "same data, level 0.95",
      tb: tb1,
      estimate: 0.24625000000000002,
      jack: jack1,
      level: 0.95,
      a1: 0.028423492815825926,
      a2: 0.978244522836461,
      a: 0.014862743063930543,
      lo: 0.05780324544504848,
      hi: 0.5469316747114206,
    },
    {
      // three replicates tie with the estimate 0.375: they count half each in z0 (scipy's convention)
      name: "data [0.5, 0.25, −0.25, 1, 0.75, 0, 0.5, 0.25], ties at the estimate, level 0.95",
      tb: [0.375, 0.5, 0.25, 0.375, 0.625, 0.125, 0.4375, 0.3125, 0.375, 0.5625, 0.1875, 0.25],
      estimate: 0.375,
      jack: [
        0.35714285714285715, 0.39285714285714285, 0.4642857142857143, 0.2857142857142857, 0.32142857142857145,
        0.42857142857142855, 0.35714285714285715, 0.39285714285714285,
      ],
      level: 0.95,
      a1: 0.039999051920121306,
      a2: 0.9849674206839418,
      a: -9.691928757307252e-19, // symmetric jackknife: a is rounding noise on both sides
      lo: 0.1524993481950834,
      hi: 0.61466510172021,
    },
  ];

  it.each(cases)("$name", (c) => {
    const r = bcaLevels(new Float64Array(c.tb), c.estimate, new Float64Array(c.jack), c.level);
    expect(r.valid).toBe(true);
    // Levels pass through Φ and Φ⁻¹ (ours vs scipy's ndtr/ndtri): 1e-13 relative.
    expectRelative(r.lowerLevel, c.a1, 1e-13, "alpha_1");
    expectRelative(r.upperLevel, c.a2, 1e-13, "alpha_2");
    if (Math.abs(c.a) > 1e-12) expectRelative(r.acceleration, c.a, 1e-12, "a_hat");
    else expect(Math.abs(r.acceleration)).toBeLessThan(1e-15); // absolute: rounding noise
    const reps = new Float64Array(c.tb);
    expectRelative(quantileInPlace(reps, reps.length, r.lowerLevel), c.lo, 1e-12, "lower bound");
    expectRelative(quantileInPlace(reps, reps.length, r.upperLevel), c.hi, 1e-12, "upper bound");
  });

  it("flags BCa as invalid when every replicate lies above the estimate (z0 = −∞)", () => {
    const r = bcaLevels(new Float64Array([1, 2, 3]), 0.5, new Float64Array([0.1, 0.2, 0.4]), 0.95);
    expect(r.valid).toBe(false);
    expect(r.lowerLevel).toBeNaN();
  });

  it("reduces to the percentile levels when z0 = 0 and a = 0", () => {
    const r = bcaLevels(new Float64Array([1, 3]), 2, new Float64Array([5, 5, 5]), 0.9);
    expect(r.biasCorrection).toBe(0);
    expect(r.acceleration).toBe(0);
    expectRelative(r.lowerLevel, 0.05, 1e-15, "lower level");
    expectRelative(r.upperLevel, 0.95, 1e-15, "upper level");
  });
});

describe("resample statistics on counts equal the statistic of the materialized resample", () => {
  const factories: [string, CountStatisticFactory, (y: number[]) => number, number][] = [
    // [name, factory, brute force, tolerance: 0 = exactly equal; else absolute (data are of order 1 and
    // the two sums add in different orders, so a relative tolerance would blow up near a zero mean)]
    ["hodges-lehmann", resampleHodgesLehmann, (y) => sortedMedian(bruteWalsh(y)), 0],
    ["median", resampleMedian, (y) => sortedMedian([...y].sort((a, b) => a - b)), 0],
    ["mean", resampleMean, (y) => y.reduce((s, v) => s + v, 0) / y.length, 1e-15],
  ];
  it.each(factories)(
    "%s: 3,000 random resamples (sizes n and n − 1, ties present)",
    (_name, factory, brute, tol) => {
      const rng = new Pcg32(21n, 2n);
      for (const n of [2, 3, 7, 30, 41]) {
        for (const decimals of [12, 1]) {
          const sorted = new Float64Array(sample(rng, n, 0.1, decimals)).sort();
          const stat = factory(sorted);
          const counts = new Int32Array(n);
          for (let b = 0; b < 300; b++) {
            counts.fill(0);
            const size = b % 3 === 0 ? n - 1 : n;
            for (let k = 0; k < size; k++) counts[rng.nextBelow(n)]++;
            const want = brute(materialize(sorted, counts));
            const got = stat.evaluate(counts, size);
            if (tol === 0) expect(got).toBe(want);
            else expectAbsolute(got, want, tol, "mean");
          }
        }
      }
    },
  );
});

describe("bootstrapInterval", () => {
  const d = sample(new Pcg32(31n, 1n), 30, 0.05);

  it("is deterministic for a given generator state and independent of the order of d", () => {
    const a = bootstrapInterval(d, { rng: new Pcg32(7n, 9n) });
    const b = bootstrapInterval([...d].reverse(), { rng: new Pcg32(7n, 9n) });
    expect(b).toEqual(a);
    const c = bootstrapInterval(d, { rng: new Pcg32(8n, 9n) });
    expect(c.lower).not.toBe(a.lower);
    expect(a.estimate).toBe(c.estimate);
  });

  it("percentile bounds are the type-7 quantiles of brute-force statistics of the same resamples", () => {
    // Record every resample the bootstrap draws, recompute HL on each materialized resample, take quantiles.
    const seen: Int32Array[] = [];
    let sortedSeen = new Float64Array(0);
    const recording: CountStatisticFactory = (sorted) => {
      sortedSeen = Float64Array.from(sorted);
      const inner = resampleHodgesLehmann(sorted);
      return {
        evaluate(counts, size) {
          if (size === sorted.length) seen.push(Int32Array.from(counts));
          return inner.evaluate(counts, size);
        },
      };
    };
    const r = bootstrapInterval(d, {
      rng: new Pcg32(5n, 5n),
      statistic: recording,
      method: "percentile",
      resamples: 400,
    });
    expect(seen).toHaveLength(401); // the full sample, then 400 resamples
    const replicates = seen.slice(1).map((c) => sortedMedian(bruteWalsh(materialize(sortedSeen, c))));
    expect([r.lowerLevel, r.upperLevel]).toEqual([(1 - 0.95) / 2, 1 - (1 - 0.95) / 2]);
    expect(r.lower).toBe(type7(replicates, r.lowerLevel));
    expect(r.upper).toBe(type7(replicates, r.upperLevel));
    expect(r.estimate).toBe(sortedMedian(bruteWalsh(d)));
    for (const c of seen) expect(c.reduce((s, v) => s + v, 0)).toBe(30);
  });

  it("BCa bounds use the levels of bcaLevels on the same replicates and jackknife values", () => {
    const reps: number[] = [];
    const jack: number[] = [];
    const recording: CountStatisticFactory = (sorted) => {
      const inner = resampleMedian(sorted);
      let calls = 0;
      return {
        evaluate(counts, size) {
          const v = inner.evaluate(counts, size);
          if (calls++ > 0) (size === sorted.length ? reps : jack).push(v);
          return v;
        },
      };
    };
    const r = bootstrapInterval(d, {
      rng: new Pcg32(6n, 6n),
      statistic: recording,
      resamples: 300,
      level: 0.9,
    });
    expect(reps).toHaveLength(300);
    expect(jack).toHaveLength(30);
    const levels = bcaLevels(new Float64Array(reps), r.estimate, new Float64Array(jack), 0.9);
    expect(r.lowerLevel).toBe(levels.lowerLevel);
    expect(r.lower).toBe(type7(reps, levels.lowerLevel));
    expect(r.upper).toBe(type7(reps, levels.upperLevel));
  });

  it("covers the true centre at roughly the nominal level (coverage sanity check, 400 samples of n = 30)", () => {
    // Symmetric data: mean, median and HL all estimate the centre 0.2. 90% intervals; with 400 samples
    // the binomial SE is 0.015, and percentile/BCa intervals under-cover slightly at n = 30: accept
    // [0.83, 0.96]. A swapped level, a wrong quantile or a biased resampler falls outside.
    const rng = new Pcg32(77n, 3n);
    const gen = new Pcg32(78n, 3n);
    for (const [statistic, method] of [
      ["mean", "percentile"],
      ["hodges-lehmann", "bca"],
      ["median", "bca"],
    ] as const) {
      let covered = 0;
      for (let k = 0; k < 400; k++) {
        const r = bootstrapInterval(sample(gen, 30, 0.2), {
          rng,
          statistic,
          method,
          level: 0.9,
          resamples: 500,
        });
        if (r.lower <= 0.2 && 0.2 <= r.upper) covered++;
      }
      const coverage = covered / 400;
      expect(coverage, `${statistic}/${method} coverage ${coverage}`).toBeGreaterThanOrEqual(0.83);
      expect(coverage, `${statistic}/${method} coverage ${coverage}`).toBeLessThanOrEqual(0.96);
    }
  });

  it("gives a degenerate interval for constant data and reports an undefined BCa as invalid", () => {
    const flat = bootstrapInterval([0.3, 0.3, 0.3, 0.3], { rng: new Pcg32(1n, 1n) });
    expect([flat.lower, flat.estimate, flat.upper, flat.valid]).toEqual([0.3, 0.3, 0.3, true]);
    // A statistic that is 0 on the full sample and 1 on every other resample: z0 = −∞. (n = 30, so a
    // resample that repeats the full sample, probability 30!/30³⁰ ≈ 1e−12 each, does not occur.)
    const jump: CountStatisticFactory = () => ({
      evaluate: (counts, size) => (size === counts.length && counts.every((c) => c === 1) ? 0 : 1),
    });
    const r = bootstrapInterval(d, { rng: new Pcg32(1n, 1n), statistic: jump });
    expect(r.valid).toBe(false);
    expect(r.lower).toBeNaN();
    expect(r.upper).toBeNaN();
  });

  it("rejects bad options with the expected form", () => {
    const rng = new Pcg32(1n, 1n);
    expect(() => bootstrapInterval([1], { rng })).toThrow(
      "bootstrapInterval: d must hold at least 2 finite numbers, got 1",
    );
    expect(() => bootstrapInterval(d, {} as never)).toThrow(
      "bootstrapInterval: options.rng must be a Pcg32 generator, got undefined",
    );
    expect(() => bootstrapInterval(d, { rng, resamples: 0 })).toThrow(
      "bootstrapInterval: options.resamples must be an integer in [1, 10000000], got 0",
    );
    expect(() => bootstrapInterval(d, { rng, statistic: "trimmed" as never })).toThrow(
      'bootstrapInterval: options.statistic must be one of "hodges-lehmann", "median", "mean", got "trimmed"',
    );
    expect(() => bootstrapInterval(d, { rng, method: "basic" as never })).toThrow(
      'bootstrapInterval: options.method must be one of "bca", "percentile", got "basic"',
    );
  });
});

describe("drawCounts (k-bit chunks with rejection)", () => {
  /**
   * Upper 99.9% point of χ² with k degrees of freedom by the Wilson–Hilferty approximation
   * (Wilson & Hilferty 1931, PNAS 17(12):684–688): k (1 − 2/(9k) + z √(2/(9k)))³.
   */
  const chi2Upper = (k: number) =>
    k * (1 - 2 / (9 * k) + normalQuantile(0.999) * Math.sqrt(2 / (9 * k))) ** 3;

  it.each([2, 7, 30, 33, 100, 70000])(
    "n = %s: counts sum to the draws and are uniform (χ² at 99.9%)",
    (n) => {
      const rng = new Pcg32(BigInt(n), 8n);
      const counts = new Int32Array(n);
      const draws = Math.max(200_000, 20 * n);
      for (let done = 0; done < draws; done += 1000) drawCounts(rng, n, 1000, counts);
      let sum = 0;
      let chi2 = 0;
      const expected = draws / n;
      for (let i = 0; i < n; i++) {
        sum += counts[i];
        chi2 += (counts[i] - expected) ** 2 / expected;
      }
      expect(sum).toBe(draws);
      expect(chi2).toBeLessThan(chi2Upper(n - 1));
    },
  );

  it("n = 1 puts every draw on index 0 without touching the generator", () => {
    const rng = new Pcg32(3n, 3n);
    const counts = new Int32Array(1);
    drawCounts(rng, 1, 30, counts);
    expect(counts[0]).toBe(30);
    expect(rng.nextU32()).toBe(new Pcg32(3n, 3n).nextU32());
  });
});

describe("selectInPlace / quantileInPlace", () => {
  it("select returns the k-th smallest for every k, with duplicates", () => {
    const rng = new Pcg32(4n, 4n);
    for (const n of [1, 2, 3, 10, 57]) {
      const values = Array.from({ length: n }, () => rng.nextBelow(6));
      const sorted = [...values].sort((a, b) => a - b);
      for (let k = 0; k < n; k++) {
        const a = new Float64Array(values);
        expect(selectInPlace(a, 0, n - 1, k)).toBe(sorted[k]);
        for (let i = 0; i < k; i++) expect(a[i]).toBeLessThanOrEqual(a[k]);
        for (let i = k + 1; i < n; i++) expect(a[i]).toBeGreaterThanOrEqual(a[k]);
      }
    }
  });

  it("quantile matches the type-7 definition (numpy.percentile's default) computed by sorting", () => {
    const rng = new Pcg32(5n, 4n);
    const values = Array.from({ length: 101 }, () => rng.nextNormal());
    for (const q of [0, 0.01, 0.025, 0.5, 0.9, 0.975, 1]) {
      expect(quantileInPlace(new Float64Array(values), values.length, q)).toBe(type7(values, q));
    }
  });
});
