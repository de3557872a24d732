import { growFloat64 } from "./validate.js";

/**
 * Ranking core of the signed-rank procedures, reused by `wilcoxonSignedRank` and
 * `equivalenceSignedRank` without allocation (module-level scratch buffers, grown on demand).
 */
export interface SignedRankSums {
  /** Sum of the (mid)ranks of |v_i| over v_i > 0. */
  wPlus: number;
  /** Sum of the (mid)ranks of |v_i| over v_i < 0. */
  wMinus: number;
  /** Number of nonzero v_i (zeros are dropped: Wilcoxon's convention). */
  nUsed: number;
  /** Number of v_i equal to 0. */
  nZeros: number;
  /** Σ (t³ − t) over groups of t tied |v_i| (0 when there are no ties). */
  tieTerm: number;
}

let positives: Float64Array = new Float64Array(64);
let negatives: Float64Array = new Float64Array(64);

/**
 * Signed-rank sums of v_i = d_i − shift: zeros dropped, |v| ranked 1 … m with midranks for ties,
 * ranks summed by sign.
 *
 * Algorithm: split |v| by sign into two scratch arrays, sort each natively (Float64Array sort, no
 * comparator), then walk both in merged ascending order; each group of t equal |v| (from either side)
 * takes the midrank r + (t+1)/2. Equality is exact floating-point equality, as in the reference
 * libraries' rankdata. Midranks are multiples of ½, so the sums are exact.
 * Source of the procedure: Wilcoxon (1945), Biometrics Bulletin 1(6):80–83; midranks for ties as in
 * Hollander & Wolfe, Nonparametric Statistical Methods, 2nd ed. (1999), §3.1, comment on ties (from memory).
 *
 * Cost: O(n log n) time; no allocation after the scratch buffers have grown to n.
 * `out` is filled and returned so callers can reuse one object.
 */
export function signedRankSums(d: ArrayLike<number>, shift: number, out: SignedRankSums): SignedRankSums {
  const n = d.length;
  positives = growFloat64(positives, n);
  negatives = growFloat64(negatives, n);
  let np = 0;
  let nn = 0;
  let nZeros = 0;
  for (let i = 0; i < n; i++) {
    const v = d[i] - shift;
    if (v > 0) positives[np++] = v;
    else if (v < 0) negatives[nn++] = -v;
    else nZeros++;
  }
  const pos = positives.subarray(0, np).sort();
  const neg = negatives.subarray(0, nn).sort();
  let i = 0;
  let j = 0;
  let rank = 0;
  let wPlus = 0;
  let wMinus = 0;
  let tieTerm = 0;
  while (i < np || j < nn) {
    const v = j >= nn || (i < np && pos[i] <= neg[j]) ? pos[i] : neg[j];
    let cp = 0;
    let cn = 0;
    while (i < np && pos[i] === v) {
      i++;
      cp++;
    }
    while (j < nn && neg[j] === v) {
      j++;
      cn++;
    }
    const t = cp + cn;
    const mid = rank + (t + 1) / 2;
    wPlus += cp * mid;
    wMinus += cn * mid;
    if (t > 1) tieTerm += t * t * t - t;
    rank += t;
  }
  out.wPlus = wPlus;
  out.wMinus = wMinus;
  out.nUsed = np + nn;
  out.nZeros = nZeros;
  out.tieTerm = tieTerm;
  return out;
}
