import { normalCdf, normalSf } from "./normal-cdf.js";
import {
  SIGNED_RANK_EXACT_MAX_N,
  signedRankLowerTail,
  signedRankUpperTail,
} from "./signed-rank-distribution.js";
import { signedRankSums, type SignedRankSums } from "./signed-ranks.js";
import { ALTERNATIVES, RANK_METHODS, type Alternative, type RankMethod, type Sample } from "./types.js";
import { checkChoice, checkSample, describeValue } from "./validate.js";

/** Result of {@link wilcoxonSignedRank}. */
export interface SignedRankResult {
  /** min(W+, W−) for "two-sided" (as scipy.stats.wilcoxon reports it); W+ for "greater"/"less". */
  readonly statistic: number;
  /** Sum of the ranks of the positive differences. */
  readonly wPlus: number;
  /** Sum of the ranks of the negative differences; W+ + W− = n(n+1)/2 with n = nUsed. */
  readonly wMinus: number;
  /** Number of nonzero differences, the n of the test. */
  readonly nUsed: number;
  /** Number of differences equal to 0, dropped before ranking. */
  readonly nZeros: number;
  /** True when some |d| tie (midranks were used). */
  readonly ties: boolean;
  readonly pValue: number;
  /** How the p-value was computed. */
  readonly method: "exact" | "normal";
  /** Standardized statistic of the normal approximation; NaN for the exact method. */
  readonly z: number;
  readonly alternative: Alternative;
}

/** Options of {@link wilcoxonSignedRank}. */
export interface SignedRankOptions {
  /** "two-sided" (default): location ≠ 0; "greater": > 0; "less": < 0. */
  readonly alternative?: Alternative;
  /**
   * "auto" (default): exact when the nonzero differences number ≤ 50 and no |d| tie, normal otherwise;
   * "exact": throws when that does not hold; "normal": always the normal approximation.
   */
  readonly method?: RankMethod;
  /** Continuity correction (±½) in the normal approximation; default false (scipy's default). */
  readonly continuity?: boolean;
}

const sums: SignedRankSums = { wPlus: 0, wMinus: 0, nUsed: 0, nZeros: 0, tieTerm: 0 };

/**
 * Wilcoxon signed-rank test of H0 "the differences d are symmetric about 0" (e.g. the per-seed log
 * ratios of a candidate against its baseline).
 *
 * Source: Wilcoxon, "Individual comparisons by ranking methods", Biometrics Bulletin 1(6):80–83 (1945).
 * Procedure: drop zero differences (Wilcoxon's convention; scipy's default zero_method="wilcox"),
 * rank |d| (midranks for ties), W+ = Σ ranks of positive d.
 * - Exact: P-values from the exact null distribution of W+ (`signedRankCdf`, cached per n):
 *   greater P(W+ ≥ w+), less P(W+ ≤ w+), two-sided min(1, 2 P(W+ ≤ min(w+, w−))).
 *   Valid without ties; n ≤ 50.
 * - Normal: z = (T − n(n+1)/4 − c) / σ, σ² = [n(n+1)(2n+1) − ½ Σ(t³ − t)] / 24 (tie correction over
 *   groups of t tied ranks), c = continuity correction (two-sided ½·sign(T − mean), greater +½, less −½)
 *   when enabled; two-sided p = 2 Φ(−|z|). This reproduces scipy.stats.wilcoxon (scipy 1.10,
 *   mode="approx") term for term.
 * Differences from scipy 1.10, on purpose: scipy's mode="auto" counts zeros toward n ≤ 50 and switches to
 * the normal approximation whenever a zero is present; here zeros are dropped first and the exact
 * distribution of the remaining n is used (the same as scipy on d with its zeros removed). With no
 * nonzero difference at all (n = 0) the null distribution is the point W+ = 0 and every p-value is 1.
 *
 * Cost: O(n log n) (two native sorts), no allocation besides the result; the exact table costs
 * O(n³) once per n (see `signedRankCdf`).
 */
export function wilcoxonSignedRank(d: Sample, options: SignedRankOptions = {}): SignedRankResult {
  const fn = "wilcoxonSignedRank";
  checkSample(fn, "d", d, 1);
  return signedRankTestShifted(fn, d, 0, options);
}

/**
 * The test on d − shift (used by the equivalence test without copying d). Validates the options, not d.
 * Cost: as {@link wilcoxonSignedRank}.
 */
export function signedRankTestShifted(
  fn: string,
  d: Sample,
  shift: number,
  options: SignedRankOptions,
): SignedRankResult {
  const alternative = options.alternative ?? "two-sided";
  const method = options.method ?? "auto";
  const continuity = options.continuity ?? false;
  checkChoice(fn, "options.alternative", alternative, ALTERNATIVES);
  checkChoice(fn, "options.method", method, RANK_METHODS);
  if (typeof continuity !== "boolean") {
    throw new TypeError(`${fn}: options.continuity must be true or false, got ${describeValue(continuity)}`);
  }
  const s = signedRankSums(d, shift, sums);
  const n = s.nUsed;
  const ties = s.tieTerm > 0;
  const wPlus = s.wPlus;
  const wMinus = s.wMinus;
  const statistic = alternative === "two-sided" ? Math.min(wPlus, wMinus) : wPlus;
  const exactApplies = !ties && n <= SIGNED_RANK_EXACT_MAX_N;
  if (method === "exact" && !exactApplies) {
    const why = ties
      ? "some |d| are tied (midranks)"
      : `the exact distribution is tabulated for n ≤ ${SIGNED_RANK_EXACT_MAX_N} nonzero differences, got n = ${n}`;
    throw new RangeError(`${fn}: options.method "exact" does not apply: ${why}; use "auto" or "normal"`);
  }
  const base = { statistic, wPlus, wMinus, nUsed: n, nZeros: s.nZeros, ties, alternative };
  if (n === 0) return { ...base, pValue: 1, method: method === "normal" ? "normal" : "exact", z: NaN };
  if (method === "exact" || (method === "auto" && exactApplies)) {
    let pValue: number;
    if (alternative === "greater") pValue = signedRankUpperTail(n, wPlus);
    else if (alternative === "less") pValue = signedRankLowerTail(n, wPlus);
    else pValue = Math.min(1, 2 * signedRankLowerTail(n, statistic));
    return { ...base, pValue, method: "exact", z: NaN };
  }
  const mean = (n * (n + 1)) / 4;
  const sd = Math.sqrt((n * (n + 1) * (2 * n + 1) - 0.5 * s.tieTerm) / 24);
  let c = 0;
  if (continuity) {
    if (alternative === "two-sided") c = 0.5 * Math.sign(statistic - mean);
    else c = alternative === "less" ? -0.5 : 0.5;
  }
  const z = (statistic - mean - c) / sd;
  let pValue: number;
  if (alternative === "two-sided") pValue = Math.min(1, 2 * normalSf(Math.abs(z)));
  else if (alternative === "greater") pValue = normalSf(z);
  else pValue = normalCdf(z);
  return { ...base, pValue, method: "normal", z };
}
