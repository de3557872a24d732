import { sortedPValueOrder } from "./p-order.js";

/**
 * Holm step-down adjusted p-values, in the order of the input.
 *
 * What for: family-wise error control across the cases of a suite (no case fails the gate by chance
 * with probability above α, whatever the dependence between cases).
 * Formula: with p_(1) ≤ … ≤ p_(m), adj_(k) = max_{j ≤ k} min(1, (m − j + 1) p_(j)); reject H_(k) at level α
 * iff adj_(k) ≤ α. Source: Holm, "A simple sequentially rejective multiple test procedure",
 * Scandinavian Journal of Statistics 6(2):65–70 (1979); the adjusted-p form is Wright, "Adjusted
 * P-values for simultaneous inference", Biometrics 48(4):1005–1013 (1992).
 * Monotone in p, capped at 1. An empty input gives an empty output.
 *
 * Cost: O(m log m) (one sort of indices), one Float64Array of m for the result.
 */
export function holmAdjust(p: ArrayLike<number>): Float64Array {
  const order = sortedPValueOrder("holmAdjust", p);
  const m = order.length;
  const out = new Float64Array(m);
  let running = 0;
  for (let k = 0; k < m; k++) {
    const i = order[k];
    running = Math.max(running, Math.min(1, (m - k) * p[i]));
    out[i] = running;
  }
  return out;
}
