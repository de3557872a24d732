/**
 * Exact two-sided sign test for paired binary outcomes: McNemar's test in its exact (binomial) form.
 * Used for the count of seeds that reach a ladder rung: `lost` seeds reached it in the baseline only,
 * `gained` in the candidate only; seeds that agree carry no information about a change.
 *
 *   p = min(1, 2 · P(X ≤ min(lost, gained))),  X ~ Binomial(lost + gained, ½)
 *
 * Source: McNemar, "Note on the sampling error of the difference between correlated proportions or
 * percentages", Psychometrika 12(2):153–157 (1947); the exact binomial form is the sign test on the
 * discordant pairs. (Not in the statistics kernel; candidate to move there.)
 * Worked value (recomputed by hand): lost 6, gained 0 → 2 · 2⁻⁶ = 0.03125.
 * Cost: O(min(lost, gained)) terms, computed in log space for large counts.
 */
export function exactSignTest(lost: number, gained: number): number {
  const n = lost + gained;
  if (n === 0) return 1;
  const k = Math.min(lost, gained);
  // Σ_{i≤k} C(n, i) / 2ⁿ, each term from the previous: C(n, i) = C(n, i−1) · (n − i + 1) / i.
  let logTerm = -n * Math.LN2;
  let sum = Math.exp(logTerm);
  for (let i = 1; i <= k; i++) {
    logTerm += Math.log((n - i + 1) / i);
    sum += Math.exp(logTerm);
  }
  return Math.min(1, 2 * sum);
}
