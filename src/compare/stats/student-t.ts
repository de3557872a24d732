import { incompleteBeta } from "./incomplete-beta.js";
import { logBeta } from "./log-gamma.js";
import { normalCdf } from "./normal-cdf.js";

/**
 * Two-sided tail probability of Student's t distribution, P(|T_ν| ≥ |t|), computed without
 * cancellation. Formula: P(|T_ν| ≥ |t|) = I_{ν/(ν+t²)}(ν/2, ½) (Abramowitz & Stegun 1964, eq. 26.7.1
 * with 26.5.27); the complementary argument t²/(ν+t²) is passed to `incompleteBeta` as well.
 * ν = ∞ gives the normal limit. Cost: one `incompleteBeta` call.
 */
export function studentTTwoTail(t: number, df: number): number {
  checkArgs("studentTTwoTail", t, df);
  if (df === Infinity) return 2 * normalCdf(-Math.abs(t));
  const at = Math.abs(t);
  if (at === Infinity) return 0;
  const a = df / 2;
  if (at > 1e100) {
    // x = ν/(ν+t²) < ν·1e−200 may underflow although the tail does not: I_x(a, ½) = x^a/(a B(a, ½))·(1 + O(x))
    // (the continued fraction of DLMF 8.17.22 is 1 + O(x)), evaluated in logarithms.
    return Math.exp(a * (Math.log(df) - 2 * Math.log(at)) - logBeta(a, 0.5)) / a;
  }
  const t2 = at * at;
  return incompleteBeta(df / (df + t2), a, 0.5, t2 / (df + t2));
}

/**
 * Student's t cumulative distribution function P(T_ν ≤ t), for degrees of freedom ν > 0 (not
 * necessarily an integer; ν = ∞ is the standard normal).
 *
 * What for: the p-value of the paired t-test (`pairedTTest`), a parametric cross-check of the rank tests.
 * Formula: P(T ≤ t) = ½ I_{ν/(ν+t²)}(ν/2, ½) for t ≤ 0 and 1 − that for t > 0 (A&S 26.7.1, 26.5.27);
 * the incomplete beta function is computed by its continued fraction (see `incompleteBeta`).
 * The lower tail keeps full relative precision; use `studentTSf` for the upper tail.
 * Cost: one `incompleteBeta` call (O(√ν) fraction terms).
 */
export function studentTCdf(t: number, df: number): number {
  checkArgs("studentTCdf", t, df);
  const half = 0.5 * studentTTwoTail(t, df);
  return t <= 0 ? half : 1 - half;
}

/** Student's t survival function P(T_ν > t) = studentTCdf(−t, ν), precise in the upper tail. Cost: as `studentTCdf`. */
export function studentTSf(t: number, df: number): number {
  checkArgs("studentTSf", t, df);
  return studentTCdf(-t, df);
}

function checkArgs(fn: string, t: number, df: number): void {
  if (typeof t !== "number" || Number.isNaN(t)) {
    throw new RangeError(`${fn}: t must be a number, got ${String(t)}`);
  }
  if (typeof df !== "number" || !(df > 0)) {
    throw new RangeError(`${fn}: df must be a number greater than 0 (Infinity allowed), got ${String(df)}`);
  }
}
