import type { Sample } from "./types.js";
import { checkPositive, checkSample } from "./validate.js";
import { signedRankTestShifted, type SignedRankOptions, type SignedRankResult } from "./wilcoxon.js";

/** Result of {@link equivalenceSignedRank}. */
export interface EquivalenceResult {
  /** The margin δ: equivalence means the location of d lies in (−δ, +δ). */
  readonly margin: number;
  /** p-value of H0: location ≤ −δ against "greater" (signed-rank test on d + δ). */
  readonly pLower: number;
  /** p-value of H0: location ≥ +δ against "less" (signed-rank test on d − δ). */
  readonly pUpper: number;
  /** TOST p-value max(pLower, pUpper): equivalence is shown at level α when pValue < α. */
  readonly pValue: number;
  /** The two one-sided tests in full. */
  readonly lowerTest: SignedRankResult;
  readonly upperTest: SignedRankResult;
}

/** Options of {@link equivalenceSignedRank}: method and continuity of the two signed-rank tests. */
export type EquivalenceOptions = Pick<SignedRankOptions, "method" | "continuity">;

/**
 * Nonparametric equivalence test: two one-sided Wilcoxon signed-rank tests (TOST) of the location
 * of d against the margin ±δ (on log ratios, δ = ln(1 + tolerated relative change)).
 *
 * What for: to call a candidate "equivalent" to its baseline a change must be shown to stay inside
 * the practical margin, not merely fail to be significant.
 * Procedure: Schuirmann, "A comparison of the two one-sided tests procedure and the power approach
 * for assessing the equivalence of average bioavailability", J. Pharmacokinet. Biopharm.
 * 15(6):657–680 (1987), with each one-sided t-test replaced by a Wilcoxon signed-rank test
 * (Wilcoxon 1945): pLower = P-value of "greater" on d + δ (H0: θ ≤ −δ), pUpper = P-value of "less" on
 * d − δ (H0: θ ≥ δ); the TOST p-value is max(pLower, pUpper). Differences equal to ∓δ exactly are
 * zeros of the shifted samples and are dropped (Wilcoxon's convention). The shifted samples are
 * never copied.
 *
 * Cost: two signed-rank tests, O(n log n); no allocation besides the results.
 */
export function equivalenceSignedRank(
  d: Sample,
  margin: number,
  options: EquivalenceOptions = {},
): EquivalenceResult {
  const fn = "equivalenceSignedRank";
  checkSample(fn, "d", d, 1);
  checkPositive(fn, "margin", margin);
  const method = options.method;
  const continuity = options.continuity;
  const lowerTest = signedRankTestShifted(fn, d, -margin, { alternative: "greater", method, continuity });
  const upperTest = signedRankTestShifted(fn, d, margin, { alternative: "less", method, continuity });
  return {
    margin,
    pLower: lowerTest.pValue,
    pUpper: upperTest.pValue,
    pValue: Math.max(lowerTest.pValue, upperTest.pValue),
    lowerTest,
    upperTest,
  };
}
