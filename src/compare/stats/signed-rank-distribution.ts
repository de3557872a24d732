/** Largest n for which the exact null distribution is tabulated (counts up to 2^50 stay exact in a double). */
export const SIGNED_RANK_EXACT_MAX_N = 50;

const cache: (Float64Array | undefined)[] = [];

/**
 * Exact null distribution of Wilcoxon's signed-rank statistic W+ (sum of the ranks of the positive
 * differences among n untied, nonzero differences), as the cumulative probabilities
 * cdf[w] = P(W+ ≤ w), w = 0 … n(n+1)/2.
 *
 * What for: exact p-values of `wilcoxonSignedRank` and exact confidence intervals of
 * `hodgesLehmann` (Tukey's interval from the order statistics of the Walsh averages).
 *
 * Algorithm: under H0 each rank k = 1 … n carries a + sign with probability ½ independently
 * (Wilcoxon 1945, "Individual comparisons by ranking methods", Biometrics Bulletin 1(6):80–83), so the
 * number of sign patterns with W+ = w is the number of subsets of {1, …, n} summing to w. It is
 * counted by the dynamic programme c_k(w) = c_{k−1}(w) + c_{k−1}(w − k) (a 0/1 knapsack over ranks),
 * then accumulated and divided by 2ⁿ. All counts are integers ≤ 2⁵⁰ < 2⁵³ for n ≤ 50, so the table
 * is exact: every probability is an integer times 2⁻ⁿ, represented without rounding.
 *
 * The table of each n is computed once and cached for the life of the process; callers must not
 * modify the returned array.
 * Cost: O(n · n(n+1)/2) ≈ 32,000 additions for n = 50 on first use, O(1) afterwards; memory
 * n(n+1)/2 + 1 doubles per cached n.
 */
export function signedRankCdf(n: number): Float64Array {
  if (!Number.isInteger(n) || n < 0 || n > SIGNED_RANK_EXACT_MAX_N) {
    throw new RangeError(
      `signedRankCdf: n must be an integer in [0, ${SIGNED_RANK_EXACT_MAX_N}], got ${String(n)}`,
    );
  }
  const hit = cache[n];
  if (hit !== undefined) return hit;
  const top = (n * (n + 1)) / 2;
  const counts = new Float64Array(top + 1);
  counts[0] = 1;
  let reach = 0;
  for (let k = 1; k <= n; k++) {
    reach += k;
    for (let w = reach; w >= k; w--) counts[w] += counts[w - k];
  }
  const scale = Math.pow(2, -n);
  let acc = 0;
  for (let w = 0; w <= top; w++) {
    acc += counts[w];
    counts[w] = acc * scale;
  }
  cache[n] = counts;
  return counts;
}

/** P(W+ ≤ w) under H0 for n untied nonzero differences (0 for w < 0, 1 above the maximum). Cost: O(1) after the table. */
export function signedRankLowerTail(n: number, w: number): number {
  const cdf = signedRankCdf(n);
  const k = Math.floor(w);
  if (k < 0) return 0;
  if (k >= cdf.length) return 1;
  return cdf[k];
}

/**
 * P(W+ ≥ w) under H0, computed through the symmetry W+ ↦ n(n+1)/2 − W+ as a lower tail, so small upper
 * tails keep full precision (no 1 − cdf cancellation). Cost: O(1) after the table.
 */
export function signedRankUpperTail(n: number, w: number): number {
  return signedRankLowerTail(n, (n * (n + 1)) / 2 - Math.ceil(w));
}
