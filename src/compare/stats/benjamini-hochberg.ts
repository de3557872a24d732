import { sortedPValueOrder } from "./p-order.js";

/**
 * Benjamini–Hochberg step-up adjusted p-values ("q-values" of the linear step-up procedure), in the
 * order of the input.
 *
 * What for: false-discovery-rate control across many cases when a few expected regressions should
 * not be masked by a family-wise correction.
 * Formula: with p_(1) ≤ … ≤ p_(m), adj_(k) = min_{j ≥ k} min(1, m p_(j) / j); rejecting every H with
 * adj ≤ q is the procedure of Benjamini & Hochberg, "Controlling the false discovery rate: a
 * practical and powerful approach to multiple testing", JRSS B 57(1):289–300 (1995), which controls
 * the FDR at q for independent (and positively dependent) tests. The adjusted-p form is as in
 * Wright (1992), Biometrics 48:1005–1013. Monotone in p, capped at 1.
 *
 * Cost: O(m log m) (one sort of indices), one Float64Array of m for the result.
 */
export function benjaminiHochbergAdjust(p: ArrayLike<number>): Float64Array {
  const order = sortedPValueOrder("benjaminiHochbergAdjust", p);
  const m = order.length;
  const out = new Float64Array(m);
  let running = 1;
  for (let k = m - 1; k >= 0; k--) {
    const i = order[k];
    running = Math.min(running, (m * p[i]) / (k + 1));
    out[i] = running;
  }
  return out;
}
