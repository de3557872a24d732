import { checkSample } from "./validate.js";

/**
 * Validates a list of p-values (each in [0, 1]) and returns the permutation that sorts them ascending,
 * ties kept in input order (so the adjustment is deterministic).
 * Cost: O(m log m) time, one Uint32Array of m.
 */
export function sortedPValueOrder(fn: string, p: ArrayLike<number>): Uint32Array {
  checkSample(fn, "p", p, 0);
  const m = p.length;
  for (let i = 0; i < m; i++) {
    if (!(p[i] >= 0 && p[i] <= 1)) {
      throw new RangeError(`${fn}: p[${i}] must be a probability in [0, 1], got ${String(p[i])}`);
    }
  }
  const order = new Uint32Array(m);
  for (let i = 0; i < m; i++) order[i] = i;
  order.sort((a, b) => p[a] - p[b] || a - b);
  return order;
}
