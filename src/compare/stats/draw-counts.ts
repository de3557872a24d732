import type { Pcg32 } from "../../core/rng.js";

/**
 * Multiplicities of `draws` indices drawn uniformly with replacement from {0, …, n−1}: adds 1 to
 * counts[v] per draw (the caller zeroes `counts` first). This is one bootstrap resample of a sample
 * of size n, as counts.
 *
 * What for: the inner loop of `bootstrapInterval`; calling `rng.nextBelow(n)` per index costs one
 * 32-bit output per index, this uses a fraction of one.
 * Algorithm: with k = ⌈log₂ n⌉ bits per index, each 32-bit output of `rng.nextU32()` is cut into
 * ⌊32/k⌋ chunks of k bits (low bits first); a chunk v < n is accepted as an index and a chunk v ≥ n is
 * rejected. Each accepted chunk is exactly uniform on {0, …, n−1} (rejection sampling of uniform
 * integers from fair bits; e.g. Knuth, The Art of Computer Programming vol. 2, 3rd ed. (1997),
 * §3.4.1, from memory), and PCG32's 32 output bits are all full-quality (O'Neill 2014, HMC-CS-2014-0905).
 * For n = 30: k = 5, six chunks per output, acceptance 30/32, ≈ 5.3 outputs per resample instead of 30.
 * For n > 2¹⁶ it falls back to `rng.nextBelow(n)` per index. Deterministic for a given generator state.
 *
 * Cost: ≈ draws · 2^k / (n ⌊32/k⌋) generator outputs (≤ 2 · draws · k / 32 + 1), O(1) memory.
 */
export function drawCounts(rng: Pcg32, n: number, draws: number, counts: Int32Array): void {
  if (n === 1) {
    counts[0] += draws;
    return;
  }
  if (n > 65536) {
    for (let d = 0; d < draws; d++) counts[rng.nextBelow(n)]++;
    return;
  }
  const k = 32 - Math.clz32(n - 1); // ⌈log₂ n⌉ for n ≥ 2
  const mask = (1 << k) - 1;
  const perWord = Math.floor(32 / k);
  let left = draws;
  while (left > 0) {
    let u = rng.nextU32();
    for (let c = 0; c < perWord; c++) {
      const v = u & mask;
      u >>>= k;
      if (v < n) {
        counts[v]++;
        if (--left === 0) return;
      }
    }
  }
}
