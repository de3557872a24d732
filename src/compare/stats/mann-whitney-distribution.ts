/** Largest n1 + n2 for which the exact null distribution is computed (counts ≤ C(50, 25) < 2^53 stay exact). */
export const MANN_WHITNEY_EXACT_MAX_TOTAL = 50;

const cache = new Map<number, Float64Array>();

/**
 * Exact null distribution of the Mann–Whitney statistic U (number of pairs (x_i, y_j) with x_i > y_j)
 * for samples of sizes n1, n2 without ties, as cumulative probabilities cdf[u] = P(U ≤ u), u = 0 … n1·n2.
 *
 * What for: exact p-values of `mannWhitneyU` for small unpaired samples.
 * Algorithm: under H0 all C(n1+n2, n1) arrangements are equally likely (Mann & Whitney, "On a test of
 * whether one of two random variables is stochastically larger than the other", Ann. Math. Statist.
 * 18(1):50–60, 1947). The number of arrangements with U = u is the coefficient of q^u in the Gaussian
 * binomial coefficient [n1+n2 choose m]_q = Π_{i=1..m} (1 − q^{n+i}) / (1 − q^i), m = min(n1, n2),
 * n = max(n1, n2) (the generating function of partitions in an m × n box; Andrews, The Theory of
 * Partitions (1976), ch. 3, from memory). It is built factor by factor: multiply by (1 − q^{n+i})
 * (c[k] −= c[k−n−i], descending k), then divide by (1 − q^i) (c[k] += c[k−i], ascending k, up to the
 * quotient's degree; the i coefficients above it divide out exactly and are cleared). After each
 * step the polynomial is a Gaussian binomial with integer coefficients ≤ C(n1+n2, n1) ≤ C(50, 25) < 2⁵³,
 * so every count is exact; probabilities are counts / C(n1+n2, n1) (one rounding).
 * Cached per unordered pair {n1, n2}; callers must not modify the returned array.
 *
 * Cost: O(m² n) additions on first use (≈ 16,000 for n1 = n2 = 25), memory n1·n2 + 1 doubles per pair.
 */
export function mannWhitneyCdf(n1: number, n2: number): Float64Array {
  for (const [name, v] of [
    ["n1", n1],
    ["n2", n2],
  ] as const) {
    if (!Number.isInteger(v) || v < 1) {
      throw new RangeError(`mannWhitneyCdf: ${name} must be an integer ≥ 1, got ${String(v)}`);
    }
  }
  if (n1 + n2 > MANN_WHITNEY_EXACT_MAX_TOTAL) {
    throw new RangeError(
      `mannWhitneyCdf: n1 + n2 must be ≤ ${MANN_WHITNEY_EXACT_MAX_TOTAL} for the exact distribution, got ${n1} + ${n2}`,
    );
  }
  const m = Math.min(n1, n2);
  const n = Math.max(n1, n2);
  const key = m * 64 + n;
  const hit = cache.get(key);
  if (hit !== undefined) return hit;
  const top = m * n;
  const c = new Float64Array(top + 1);
  c[0] = 1;
  let deg = 0;
  for (let i = 1; i <= m; i++) {
    const s = n + i;
    const grown = deg + s;
    for (let k = grown; k >= s; k--) c[k] -= c[k - s];
    deg += n;
    for (let k = i; k <= deg; k++) c[k] += c[k - i];
    for (let k = deg + 1; k <= grown; k++) c[k] = 0; // the quotient has degree deg: the rest divides out
  }
  let total = 0;
  for (let u = 0; u <= top; u++) total += c[u];
  let acc = 0;
  for (let u = 0; u <= top; u++) {
    acc += c[u];
    c[u] = acc / total;
  }
  c[top] = 1;
  cache.set(key, c);
  return c;
}
