/**
 * Common text of the Moré–Garbow–Hillstrom problems.
 *
 * Moré, J. J., Garbow, B. S. & Hillstrom, K. E. (1981). "Testing Unconstrained Optimization
 * Software", ACM Transactions on Mathematical Software 7(1):17–41, doi:10.1145/355934.355936.
 * Each problem is f(x) = Σᵢ fᵢ(x)² with the residuals fᵢ, the standard start x0 and the minimum
 * f* given in §3 of the paper under the problem's number.
 */
export const MGH_SOURCE =
  'Moré, Garbow & Hillstrom (1981), "Testing Unconstrained Optimization Software", ACM TOMS 7(1):17–41, doi:10.1145/355934.355936';

/** Source line of MGH problem `n`. */
export function mghSource(n: number): string {
  return `${MGH_SOURCE}, problem ${n}`;
}
