import { studentTCdf, studentTTwoTail } from "./student-t.js";
import { ALTERNATIVES, type Alternative, type Sample } from "./types.js";
import { checkChoice, checkSample } from "./validate.js";

/** Result of {@link pairedTTest}. */
export interface PairedTTestResult {
  /** t = mean(d) / (sd(d) / √n); ±∞ when sd = 0 and the mean is not 0; NaN when both are 0. */
  readonly t: number;
  /** Degrees of freedom n − 1. */
  readonly df: number;
  /** p-value for `alternative`; NaN when t is NaN. */
  readonly pValue: number;
  /** Sample mean of d. */
  readonly mean: number;
  /** Sample standard deviation of d (divisor n − 1). */
  readonly sd: number;
  readonly alternative: Alternative;
}

/** Options of {@link pairedTTest}. */
export interface PairedTTestOptions {
  /** "two-sided" (default): mean ≠ 0; "greater": mean > 0; "less": mean < 0. */
  readonly alternative?: Alternative;
}

/**
 * Paired (one-sample) Student t-test on the differences d (e.g. log ratios candidate/baseline).
 *
 * What for: a parametric cross-check beside the Wilcoxon signed-rank test; simple-statistics' t-tests
 * give no p-value (and its one-sample test uses the population SD), hence this function.
 * Formula: t = d̄ / (s/√n), s² = Σ(d_i − d̄)² / (n − 1), df = n − 1; p from Student's t distribution
 * (Student 1908, "The probable error of a mean", Biometrika 6(1):1–25): two-sided P(|T| ≥ |t|),
 * greater P(T ≥ t), less P(T ≤ t). Mean and variance by the two-pass algorithm (Chan, Golub & LeVeque
 * 1983, "Algorithms for computing the sample variance", The American Statistician 37(3):242–247).
 * Degenerate samples follow the reference library (scipy.stats.ttest_1samp): sd = 0 gives t = ±∞,
 * p = 0 (or 1 for the opposite one-sided alternative), and t = NaN, p = NaN when d is all zeros.
 *
 * Cost: O(n) time, no allocation beyond the result.
 */
export function pairedTTest(d: Sample, options: PairedTTestOptions = {}): PairedTTestResult {
  const fn = "pairedTTest";
  checkSample(fn, "d", d, 2);
  const alternative = options.alternative ?? "two-sided";
  checkChoice(fn, "options.alternative", alternative, ALTERNATIVES);
  const n = d.length;
  let sum = 0;
  for (let i = 0; i < n; i++) sum += d[i];
  const mean = sum / n;
  let ss = 0;
  let comp = 0;
  for (let i = 0; i < n; i++) {
    const r = d[i] - mean;
    ss += r * r;
    comp += r;
  }
  const variance = (ss - (comp * comp) / n) / (n - 1); // corrected two-pass (Chan, Golub & LeVeque eq. 1.7)
  const sd = Math.sqrt(Math.max(variance, 0));
  const df = n - 1;
  const t = mean / (sd / Math.sqrt(n));
  let pValue: number;
  if (Number.isNaN(t)) pValue = NaN;
  else if (alternative === "two-sided") pValue = studentTTwoTail(t, df);
  else if (alternative === "greater") pValue = studentTCdf(-t, df);
  else pValue = studentTCdf(t, df);
  return { t, df, pValue, mean, sd, alternative };
}
