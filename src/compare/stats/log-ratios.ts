import { checkSample } from "./validate.js";

/**
 * Paired log ratios d_i = ln(candidate_i / baseline_i), the gating quantity of a metric.
 *
 * What for: per-seed metrics like "final gap" or "steps to reach a tolerance" are positive and
 * multiplicative; on the log scale a change is a shift, symmetric for ×r and ÷r, and the rank tests and
 * Hodges–Lehmann estimate apply to d directly (exp of a shift is a ratio).
 * Computed as ln(candidate_i) − ln(baseline_i) (no overflow of the quotient; identical pairs give
 * exactly 0, which the signed-rank test treats as "no change").
 * Throws unless both arrays have the same length ≥ 1 and hold finite numbers > 0 (a zero or
 * negative metric has no log ratio: report such runs separately, e.g. as reached/diverged).
 *
 * Cost: O(n); allocates the result unless `out` (length ≥ n) is given, in which case it is filled and a
 * view of its first n values is returned.
 */
export function pairedLogRatios(
  candidate: ArrayLike<number>,
  baseline: ArrayLike<number>,
  out?: Float64Array,
): Float64Array {
  const fn = "pairedLogRatios";
  checkSample(fn, "candidate", candidate, 1);
  checkSample(fn, "baseline", baseline, 1);
  const n = candidate.length;
  if (baseline.length !== n) {
    throw new RangeError(
      `${fn}: candidate and baseline must pair up seed by seed (same length), got ${n} and ${baseline.length}`,
    );
  }
  for (let i = 0; i < n; i++) {
    if (!(candidate[i] > 0)) {
      throw new RangeError(
        `${fn}: candidate[${i}] must be a finite number greater than 0, got ${candidate[i]}`,
      );
    }
    if (!(baseline[i] > 0)) {
      throw new RangeError(
        `${fn}: baseline[${i}] must be a finite number greater than 0, got ${baseline[i]}`,
      );
    }
  }
  if (out !== undefined && out.length < n) {
    throw new RangeError(`${fn}: out must hold at least ${n} values, got length ${out.length}`);
  }
  const d = out === undefined ? new Float64Array(n) : out.subarray(0, n);
  for (let i = 0; i < n; i++) d[i] = Math.log(candidate[i]) - Math.log(baseline[i]);
  return d;
}
