/**
 * Statistics of one paired sample evaluated on bootstrap (or jackknife) resamples described by
 * multiplicities, so a resample is never materialized: a resample of a sample x_0 ≤ … ≤ x_{n−1}
 * (sorted once by the bootstrap) is the vector counts[i] = how often x_i was drawn, Σ counts = size.
 */
export interface CountStatistic {
  /** The statistic on the resample that holds x_i counts[i] times (Σ counts[i] = size ≥ 1). */
  evaluate(counts: Int32Array, size: number): number;
}

/**
 * Prepares a {@link CountStatistic} for a sample sorted ascending (called once per bootstrap). The array
 * passed by `bootstrapInterval` is a view of a scratch buffer that the next call reuses: a custom
 * factory may read it during the call but must copy what it keeps, and its `evaluate` must not call
 * `bootstrapInterval` itself.
 */
export type CountStatisticFactory = (sorted: Float64Array) => CountStatistic;

/**
 * Mean of a resample, Σ counts[i] x_i / size.
 * Cost: O(n) per evaluation, no allocation.
 */
export const resampleMean: CountStatisticFactory = (sorted) => ({
  evaluate(counts, size) {
    let s = 0;
    for (let i = 0; i < sorted.length; i++) s += counts[i] * sorted[i];
    return s / size;
  },
});

/**
 * Median of a resample (mean of the two middle values for an even size), by walking the sorted
 * sample with cumulative counts to the ranks ⌈size/2⌉ and ⌊size/2⌋ + 1.
 * Cost: O(n) per evaluation (≈ n/2 steps), no allocation.
 */
export const resampleMedian: CountStatisticFactory = (sorted) => ({
  evaluate(counts, size) {
    const r1 = (size + 1) >> 1; // 1-based rank of the lower middle value
    const r2 = (size >> 1) + 1; // 1-based rank of the upper middle value (= r1 for odd size)
    let cum = 0;
    let i = 0;
    while (cum + counts[i] < r1) cum += counts[i++];
    const a = sorted[i];
    if (r2 === r1 || cum + counts[i] >= r2) return a;
    cum += counts[i++];
    while (counts[i] === 0) i++;
    return 0.5 * (a + sorted[i]);
  },
});

/**
 * Hodges–Lehmann estimate (median of the Walsh averages) of a resample, exactly as `hodgesLehmann`
 * would compute it on the materialized resample, at a fraction of the cost.
 *
 * Derivation (recomputed here, not taken from a source): the Walsh averages of a resample with
 * multiplicities c are the pairwise averages (x_i + x_j)/2, i ≤ j, of the original sample, pair (i, j)
 * occurring c_i c_j times for i < j and c_i (c_i + 1)/2 times for i = j (total size(size+1)/2). So
 * the resample's estimate is a weighted median of the original Walsh averages, which are sorted
 * once. The weighted median is found by walking the sorted list from the position of the
 * full-sample estimate t0; the weight strictly below t0 is computed in O(n) from the staircase
 * J_i = first j ≥ i with (x_i + x_j)/2 ≥ t0 (monotone because x is sorted) and prefix sums of c:
 *   W(<t0) = Σ_{i: J_i > i} c_i ((c_i + 1)/2 + Σ_{i<j<J_i} c_j).
 * Bootstrap estimates fall close to t0, so the walk is short (≈ the bootstrap standard error in
 * Walsh ranks: tens of steps for n = 30 instead of ≈ 230 for a walk from the start).
 * Hodges & Lehmann, Ann. Math. Statist. 34(2):598–611 (1963) for the estimator.
 *
 * Cost: O(n² log n) once (`mergeWalshRows`, ≈ 10 µs for n = 30), then O(n + walk) per evaluation
 * with no allocation (≈ 0.15–0.25 µs for n = 30, see scripts/bench-stats.ts). Memory ≈ 16 bytes per
 * Walsh average.
 */
export const resampleHodgesLehmann: CountStatisticFactory = (sorted) => {
  const n = sorted.length;
  const m = (n * (n + 1)) / 2;
  // Sorted Walsh averages and, per entry, two indices into `ext` (below) whose product is its weight:
  // (i, j) for i < j, and (i, n + i) for the diagonal, since ext[n + i] = (c_i + 1)/2.
  const value = new Float64Array(m);
  const pa = new Int32Array(m);
  const pb = new Int32Array(m);
  mergeWalshRows(sorted, value, pa, pb);
  const t0 = m % 2 === 1 ? value[(m - 1) / 2] : 0.5 * (value[m / 2 - 1] + value[m / 2]);
  let start = 0; // number of Walsh averages < t0
  while (start < m && value[start] < t0) start++;
  // Staircase: pairs (i, j), i ≤ j, with (x_i + x_j)/2 < t0 are exactly i < diagEnd, i ≤ j < stair[i].
  const stair = new Int32Array(n);
  let diagEnd = 0;
  let total = 0;
  let j = n;
  for (let i = 0; i < n; i++) {
    while (j > 0 && 0.5 * (sorted[i] + sorted[j - 1]) >= t0) j--;
    stair[i] = Math.max(i, j);
    if (stair[i] > i) diagEnd = i + 1;
    total += stair[i] - i;
  }
  if (total !== start) {
    throw new Error(`resampleHodgesLehmann: internal staircase count ${total} differs from ${start}`);
  }
  const prefix = new Float64Array(n + 1);
  const ext = new Float64Array(2 * n);

  return {
    evaluate(counts, size) {
      let run = 0;
      for (let i = 0; i < n; i++) {
        const c = counts[i];
        ext[i] = c;
        ext[n + i] = 0.5 * (c + 1);
        run += c;
        prefix[i + 1] = run;
      }
      let below = 0;
      for (let i = 0; i < diagEnd; i++) below += ext[i] * (ext[n + i] + prefix[stair[i]] - prefix[i + 1]);
      const tw = (size * (size + 1)) / 2;
      const r1 = Math.floor((tw + 1) / 2);
      const r2 = Math.floor(tw / 2) + 1;
      // locate the entry q holding rank r1: cum(q − 1) < r1 ≤ cum(q)
      let q: number;
      let cum = below;
      if (below < r1) {
        q = start - 1;
        while (cum < r1) {
          q++;
          cum += ext[pa[q]] * ext[pb[q]];
        }
      } else {
        q = start;
        for (;;) {
          const w = ext[pa[q - 1]] * ext[pb[q - 1]];
          if (cum - w < r1) break;
          cum -= w;
          q--;
        }
        q--;
      }
      const a = value[q];
      if (r2 === r1 || cum >= r2) return a;
      do q++;
      while (ext[pa[q]] * ext[pb[q]] === 0);
      return 0.5 * (a + value[q]);
    },
  };
};

/**
 * Writes the n(n+1)/2 Walsh averages (x_i + x_j)/2, i ≤ j, of a sorted sample in ascending order into
 * `value`, with the pair of each in (pa, pb) as used by `resampleHodgesLehmann` (pb = n + i on the
 * diagonal). Row i, (x_i + x_j)/2 for j = i … n−1, is already ascending, so the n rows are merged with
 * a binary min-heap of rows keyed by (current head value, row) (Williams, "Algorithm 232: Heapsort",
 * CACM 7(6):347–348, 1964, for the heap). Ties are broken by row, so the order is deterministic.
 * Cost: O(n² log n) comparisons (≈ 9 µs for n = 30, as fast as a native sort of the bare values);
 * allocates three arrays of n.
 */
function mergeWalshRows(x: Float64Array, value: Float64Array, pa: Int32Array, pb: Int32Array): void {
  const n = x.length;
  const heap = new Int32Array(n); // rows, heap-ordered by headLess
  const next = new Int32Array(n); // column j of each row's head
  const head = new Float64Array(n); // each row's head value (x_row + x_next)/2
  for (let i = 0; i < n; i++) {
    heap[i] = i;
    next[i] = i;
    head[i] = x[i];
  }
  let size = n;
  for (let pos = (size >> 1) - 1; pos >= 0; pos--) siftDown(heap, head, size, pos, heap[pos]);
  let q = 0;
  while (size > 0) {
    const top = heap[0];
    const col = next[top];
    value[q] = head[top];
    pa[q] = top;
    pb[q] = top === col ? n + top : col;
    q++;
    let row = top;
    if (col + 1 < n) {
      next[top] = col + 1;
      head[top] = 0.5 * (x[top] + x[col + 1]);
    } else {
      size--;
      if (size === 0) break;
      row = heap[size];
    }
    siftDown(heap, head, size, 0, row);
  }
}

/** Heap order of rows: smaller head first, then smaller row index. */
function headLess(head: Float64Array, r: number, s: number): boolean {
  return head[r] < head[s] || (head[r] === head[s] && r < s);
}

/** Places `row` at heap position `pos` and sifts it down (heap[0..size−1]). */
function siftDown(heap: Int32Array, head: Float64Array, size: number, pos: number, row: number): void {
  for (;;) {
    let child = 2 * pos + 1;
    if (child >= size) break;
    if (child + 1 < size && headLess(head, heap[child + 1], heap[child])) child++;
    if (!headLess(head, heap[child], row)) break;
    heap[pos] = heap[child];
    pos = child;
  }
  heap[pos] = row;
}
