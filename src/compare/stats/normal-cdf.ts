import { erfc } from "./erfc.js";

const INV_SQRT2 = 0.7071067811865476; // 1/√2

/**
 * Standard normal cumulative distribution function Φ(z) = P(Z ≤ z), Z ~ N(0, 1).
 *
 * What for: normal-approximation p-values (Wilcoxon, Mann–Whitney) and the BCa bootstrap levels.
 * Formula: Φ(z) = ½ erfc(−z/√2) (Abramowitz & Stegun 1964, eq. 26.2.29), so the lower tail keeps
 * full relative precision down to Φ ≈ 1e−308; see `erfc` for the algorithm and accuracy.
 * Cost: one `erfc` call.
 */
export function normalCdf(z: number): number {
  if (Number.isNaN(z)) throw new RangeError(`normalCdf: z must be a number, got NaN`);
  return 0.5 * erfc(-z * INV_SQRT2);
}

/**
 * Standard normal survival function 1 − Φ(z) = P(Z > z), computed as ½ erfc(z/√2) so the upper tail
 * keeps full relative precision (no 1 − Φ cancellation). Cost: one `erfc` call.
 */
export function normalSf(z: number): number {
  if (Number.isNaN(z)) throw new RangeError(`normalSf: z must be a number, got NaN`);
  return 0.5 * erfc(z * INV_SQRT2);
}
