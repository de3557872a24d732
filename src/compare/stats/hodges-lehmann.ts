import { normalCdf } from "./normal-cdf.js";
import { normalQuantile } from "./normal-quantile.js";
import { selectInPlace } from "./select.js";
import { SIGNED_RANK_EXACT_MAX_N, signedRankCdf } from "./signed-rank-distribution.js";
import { RANK_METHODS, type RankMethod, type Sample } from "./types.js";
import { checkChoice, checkOpenUnit, checkSample, growFloat64 } from "./validate.js";

/** Result of {@link hodgesLehmann}. */
export interface HodgesLehmannResult {
  /** Median of the Walsh averages (d_i + d_j)/2, i ≤ j. */
  readonly estimate: number;
  /** Lower confidence bound W_(C); −∞ when no finite interval reaches the level (tiny n). */
  readonly lower: number;
  /** Upper confidence bound W_(M+1−C); +∞ when no finite interval reaches the level. */
  readonly upper: number;
  /** Requested confidence level. */
  readonly level: number;
  /**
   * Confidence the interval actually has when d is continuous and symmetric about its centre:
   * exact 1 − 2 P(W+ ≤ C − 1) ≥ level for the exact method, its normal approximation otherwise.
   */
  readonly achievedLevel: number;
  readonly method: "exact" | "normal";
  /** Sample size (zeros included). */
  readonly n: number;
  /** M = n(n+1)/2, the number of Walsh averages. */
  readonly walshCount: number;
  /** 1-based rank C of the lower bound among the sorted Walsh averages (0 when unbounded). */
  readonly lowerRank: number;
  /** 1-based rank M + 1 − C of the upper bound (M + 1 when unbounded). */
  readonly upperRank: number;
}

/** Options of {@link hodgesLehmann}. */
export interface HodgesLehmannOptions {
  /** Confidence level in (0, 1); default 0.95. */
  readonly level?: number;
  /** "auto" (default): exact for n ≤ 50, normal above; "exact" throws for n > 50; "normal". */
  readonly method?: RankMethod;
}

let walsh: Float64Array = new Float64Array(1024);

/**
 * Hodges–Lehmann one-sample estimate of the location (centre of symmetry) of d, with Tukey's
 * distribution-free confidence interval.
 *
 * What for: the drift of a case: on log ratios d_i = ln(candidate_i / baseline_i), exp(estimate) is
 * the typical ratio and [exp(lower), exp(upper)] its confidence interval.
 *
 * Estimate: the median of the M = n(n+1)/2 Walsh averages (d_i + d_j)/2, i ≤ j (the mean of the two
 * middle ones when M is even). Source: Hodges & Lehmann, "Estimates of location based on rank tests",
 * Ann. Math. Statist. 34(2):598–611 (1963). All n observations are used, zeros included.
 * Interval: [W_(C), W_(M+1−C)], the order statistics of the Walsh averages, where C is the largest
 * integer with P(W+ ≤ C − 1) ≤ (1 − level)/2 under the signed-rank null distribution; this is the
 * set of shifts θ not rejected by the two-sided Wilcoxon test on d − θ, because the number of Walsh
 * averages above θ equals W+ of d − θ. Source: Hollander & Wolfe, Nonparametric Statistical Methods,
 * 2nd ed. (1999), §3.3 "A distribution-free confidence interval based on Wilcoxon's signed rank
 * test (Tukey)" (section number from memory); Bauer, "Constructing confidence sets using rank
 * statistics", JASA 67(339):687–690 (1972).
 * - exact (n ≤ 50): C from the exact table `signedRankCdf(n)`.
 * - normal (n > 50): C = ⌊M/2 + ½ − z_{(1+level)/2} σ⌋, σ² = n(n+1)(2n+1)/24 (the normal approximation
 *   with continuity correction of P(W+ ≤ C − 1) ≤ α/2, solved for C; recomputed here).
 * When even C = 1 misses the level (n ≤ 5 at 95%) the interval is (−∞, +∞) with achievedLevel 1.
 *
 * Cost: O(n²) time to form the Walsh averages plus O(n²) expected for four quickselects on a reused
 * scratch buffer (≈ 10 µs for n = 30); no allocation besides the result once the buffer has grown.
 */
export function hodgesLehmann(d: Sample, options: HodgesLehmannOptions = {}): HodgesLehmannResult {
  const fn = "hodgesLehmann";
  checkSample(fn, "d", d, 1);
  const level = options.level ?? 0.95;
  const method = options.method ?? "auto";
  checkOpenUnit(fn, "options.level", level);
  checkChoice(fn, "options.method", method, RANK_METHODS);
  const n = d.length;
  if (method === "exact" && n > SIGNED_RANK_EXACT_MAX_N) {
    throw new RangeError(
      `${fn}: options.method "exact" needs n ≤ ${SIGNED_RANK_EXACT_MAX_N}, got n = ${n}; use "auto" or "normal"`,
    );
  }
  const m = (n * (n + 1)) / 2;
  walsh = growFloat64(walsh, m);
  const w = walsh;
  let k = 0;
  for (let i = 0; i < n; i++) {
    const di = d[i];
    for (let j = i; j < n; j++) w[k++] = 0.5 * (di + d[j]);
  }

  const alphaHalf = (1 - level) / 2;
  const useExact = method === "exact" || (method === "auto" && n <= SIGNED_RANK_EXACT_MAX_N);
  let c: number;
  let achievedLevel: number;
  if (useExact) {
    const cdf = signedRankCdf(n);
    c = 0;
    while (c < cdf.length && cdf[c] <= alphaHalf) c++;
    achievedLevel = c === 0 ? 1 : 1 - 2 * cdf[c - 1];
  } else {
    const sigma = Math.sqrt((n * (n + 1) * (2 * n + 1)) / 24);
    c = Math.max(0, Math.floor(m / 2 + 0.5 - normalQuantile(1 - alphaHalf) * sigma));
    achievedLevel = c === 0 ? 1 : 1 - 2 * normalCdfApprox(c, m, sigma);
  }

  // Order statistics needed, as 0-based positions in ascending order: C−1, the middle one(s), M−C.
  const midLo = (m - 1) >> 1;
  const midHi = m >> 1;
  let lower = -Infinity;
  let upper = Infinity;
  let from = 0;
  if (c > 0) {
    lower = selectInPlace(w, 0, m - 1, c - 1);
    from = c;
  }
  const a = midLo >= from ? selectInPlace(w, from, m - 1, midLo) : lower;
  from = Math.max(from, midLo + 1);
  const b = midHi === midLo ? a : selectInPlace(w, from, m - 1, midHi);
  from = Math.max(from, midHi + 1);
  if (c > 0) upper = m - c === midHi ? b : selectInPlace(w, from, m - 1, m - c);
  return {
    estimate: midHi === midLo ? a : 0.5 * (a + b),
    lower,
    upper,
    level,
    achievedLevel,
    method: useExact ? "exact" : "normal",
    n,
    walshCount: m,
    lowerRank: c,
    upperRank: m + 1 - c,
  };
}

/** Normal approximation (with continuity correction) of P(W+ ≤ C − 1), mean M/2, sd σ. */
function normalCdfApprox(c: number, m: number, sigma: number): number {
  return normalCdf((c - 1 + 0.5 - m / 2) / sigma);
}
