import { MANN_WHITNEY_EXACT_MAX_TOTAL, mannWhitneyCdf } from "./mann-whitney-distribution.js";
import { normalSf } from "./normal-cdf.js";
import { ALTERNATIVES, RANK_METHODS, type Alternative, type RankMethod, type Sample } from "./types.js";
import { checkChoice, checkSample, describeValue, growFloat64 } from "./validate.js";

/** Result of {@link mannWhitneyU}. */
export interface MannWhitneyResult {
  /** U1 = R1 − n1(n1+1)/2, the statistic of x (as scipy.stats.mannwhitneyu reports it). */
  readonly statistic: number;
  readonly u1: number;
  /** U2 = n1·n2 − U1. */
  readonly u2: number;
  readonly n1: number;
  readonly n2: number;
  /** True when some values tie across the pooled sample (midranks were used). */
  readonly ties: boolean;
  readonly pValue: number;
  readonly method: "exact" | "normal";
  /** Standardized statistic of the normal approximation; NaN for the exact method. */
  readonly z: number;
  readonly alternative: Alternative;
}

/** Options of {@link mannWhitneyU}. */
export interface MannWhitneyOptions {
  /** "two-sided" (default); "greater": x tends to be larger than y; "less": smaller. */
  readonly alternative?: Alternative;
  /** "auto" (default): exact when n1 + n2 ≤ 50 and no ties, normal otherwise; "exact"; "normal". */
  readonly method?: RankMethod;
  /** Continuity correction −½ in the normal approximation; default true (scipy's default). */
  readonly continuity?: boolean;
}

let xs: Float64Array = new Float64Array(64);
let ys: Float64Array = new Float64Array(64);

/**
 * Mann–Whitney U test (Wilcoxon rank-sum test) for two unpaired samples x, y: H0 "x and y come from
 * the same distribution".
 *
 * What for: runs that cannot be paired by seed (e.g. a baseline recorded with other seeds).
 * Source: Mann & Whitney, Ann. Math. Statist. 18(1):50–60 (1947).
 * Procedure: rank the pooled sample (midranks for ties), R1 = rank sum of x, U1 = R1 − n1(n1+1)/2,
 * U2 = n1 n2 − U1; the test uses U = U1 ("greater"), U2 ("less") or max(U1, U2) ("two-sided", p doubled,
 * capped at 1), always as an upper tail P(U' ≥ U).
 * - exact: from `mannWhitneyCdf` (no ties, n1 + n2 ≤ 50).
 * - normal: z = (U − n1 n2/2 − c)/σ, σ² = n1 n2/12 · ((N + 1) − Σ(t³ − t)/(N(N − 1))), N = n1 + n2,
 *   c = ½ with the continuity correction; p = Φ(−z) (× 2 two-sided). This reproduces
 *   scipy.stats.mannwhitneyu (scipy 1.10, method="asymptotic") term for term. If every pooled value
 *   is equal (σ = 0) the p-value is 1.
 * Differences from scipy 1.10, on purpose: scipy's method="auto" takes the exact distribution only when
 * min(n1, n2) ≤ 8; here whenever it is computable exactly (n1 + n2 ≤ 50) and valid (no ties).
 * scipy's method="exact" with ties truncates U to an integer; here "exact" with ties throws.
 *
 * Cost: O(N log N) (two native sorts and a merge), no allocation besides the result; the exact table
 * costs O(min(n1,n2)² max(n1,n2)) once per size pair.
 */
export function mannWhitneyU(x: Sample, y: Sample, options: MannWhitneyOptions = {}): MannWhitneyResult {
  const fn = "mannWhitneyU";
  checkSample(fn, "x", x, 1);
  checkSample(fn, "y", y, 1);
  const alternative = options.alternative ?? "two-sided";
  const method = options.method ?? "auto";
  const continuity = options.continuity ?? true;
  checkChoice(fn, "options.alternative", alternative, ALTERNATIVES);
  checkChoice(fn, "options.method", method, RANK_METHODS);
  if (typeof continuity !== "boolean") {
    throw new TypeError(`${fn}: options.continuity must be true or false, got ${describeValue(continuity)}`);
  }
  const n1 = x.length;
  const n2 = y.length;
  xs = growFloat64(xs, n1);
  ys = growFloat64(ys, n2);
  const sx = xs.subarray(0, n1);
  const sy = ys.subarray(0, n2);
  for (let i = 0; i < n1; i++) sx[i] = x[i];
  for (let j = 0; j < n2; j++) sy[j] = y[j];
  sx.sort();
  sy.sort();
  let i = 0;
  let j = 0;
  let rank = 0;
  let r1 = 0;
  let tieTerm = 0;
  while (i < n1 || j < n2) {
    const v = j >= n2 || (i < n1 && sx[i] <= sy[j]) ? sx[i] : sy[j];
    let cx = 0;
    let cy = 0;
    while (i < n1 && sx[i] === v) {
      i++;
      cx++;
    }
    while (j < n2 && sy[j] === v) {
      j++;
      cy++;
    }
    const t = cx + cy;
    r1 += cx * (rank + (t + 1) / 2);
    if (t > 1) tieTerm += t * t * t - t;
    rank += t;
  }
  const u1 = r1 - (n1 * (n1 + 1)) / 2;
  const u2 = n1 * n2 - u1;
  const ties = tieTerm > 0;
  const exactApplies = !ties && n1 + n2 <= MANN_WHITNEY_EXACT_MAX_TOTAL;
  if (method === "exact" && !exactApplies) {
    const why = ties
      ? "the pooled sample has ties (midranks)"
      : `the exact distribution is computed for n1 + n2 ≤ ${MANN_WHITNEY_EXACT_MAX_TOTAL}, got ${n1} + ${n2}`;
    throw new RangeError(`${fn}: options.method "exact" does not apply: ${why}; use "auto" or "normal"`);
  }
  const u = alternative === "greater" ? u1 : alternative === "less" ? u2 : Math.max(u1, u2);
  const factor = alternative === "two-sided" ? 2 : 1;
  const base = { statistic: u1, u1, u2, n1, n2, ties, alternative };
  if (method === "exact" || (method === "auto" && exactApplies)) {
    const cdf = mannWhitneyCdf(n1, n2);
    const upper = cdf[n1 * n2 - u] ?? 0; // P(U' ≥ u) = P(U' ≤ n1 n2 − u) by symmetry
    return { ...base, pValue: Math.min(1, factor * upper), method: "exact", z: NaN };
  }
  const total = n1 + n2;
  const sigma = Math.sqrt(((n1 * n2) / 12) * (total + 1 - tieTerm / (total * (total - 1))));
  if (!(sigma > 0)) return { ...base, pValue: 1, method: "normal", z: NaN };
  const z = (u - (n1 * n2) / 2 - (continuity ? 0.5 : 0)) / sigma;
  return { ...base, pValue: Math.min(1, factor * normalSf(z)), method: "normal", z };
}
