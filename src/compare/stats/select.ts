/**
 * In-place selection: rearranges a[lo..hi] (inclusive) so that a[k] is the value that would be there
 * if a[lo..hi] were sorted, everything in a[lo..k−1] is ≤ a[k] and everything in a[k+1..hi] is ≥ a[k].
 *
 * What for: order statistics (medians, Walsh-average order statistics, bootstrap quantiles) in O(n)
 * without sorting and without allocating.
 *
 * Algorithm: Hoare's FIND (C. A. R. Hoare, "Algorithm 65: Find", Communications of the ACM 4(7):321–322,
 * 1961) with a median-of-three pivot and iterative narrowing to the side that holds k.
 * Several order statistics k1 < k2 < … are obtained by selecting k1 in [lo, hi], then k2 in
 * [k1 + 1, hi], and so on (each call leaves the ranges it did not touch partitioned).
 * Values must not be NaN.
 *
 * Cost: O(hi − lo) expected comparisons (≈ 2–3.4 (hi − lo)), O(1) memory.
 */
export function selectInPlace(a: Float64Array, lo: number, hi: number, k: number): number {
  let left = lo;
  let right = hi;
  while (right > left) {
    const mid = (left + right) >>> 1;
    // median of three → a[mid], with a[left] ≤ a[mid] ≤ a[right]
    if (a[mid] < a[left]) swap(a, mid, left);
    if (a[right] < a[left]) swap(a, right, left);
    if (a[right] < a[mid]) swap(a, right, mid);
    const pivot = a[mid];
    let i = left;
    let j = right;
    while (i <= j) {
      while (a[i] < pivot) i++;
      while (a[j] > pivot) j--;
      if (i <= j) {
        swap(a, i, j);
        i++;
        j--;
      }
    }
    // now a[left..j] ≤ pivot ≤ a[i..right], and j < i
    if (k <= j) right = j;
    else if (k >= i) left = i;
    else return a[k];
  }
  return a[k];
}

function swap(a: Float64Array, i: number, j: number): void {
  const t = a[i];
  a[i] = a[j];
  a[j] = t;
}

/**
 * Linear-interpolation quantile of a[0..n−1] at probability q (the default "linear" definition of
 * numpy.percentile, Hyndman & Fan 1996 type 7: h = (n−1) q, value = x_(⌊h⌋) + (h − ⌊h⌋)(x_(⌊h⌋+1) − x_(⌊h⌋)),
 * x sorted ascending). Rearranges `a[0..n−1]` in place.
 * Source: Hyndman & Fan, "Sample quantiles in statistical packages", The American Statistician
 * 50(4):361–365 (1996). Cost: O(n) expected.
 */
export function quantileInPlace(a: Float64Array, n: number, q: number): number {
  const h = (n - 1) * q;
  const k = Math.floor(h);
  const lowValue = selectInPlace(a, 0, n - 1, k);
  const frac = h - k;
  if (frac === 0 || k + 1 >= n) return lowValue;
  let next = a[k + 1];
  for (let i = k + 2; i < n; i++) if (a[i] < next) next = a[i];
  return lowValue + frac * (next - lowValue);
}
