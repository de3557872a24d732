import { logBeta } from "./log-gamma.js";

const TINY = 1e-300;
const EPS = 1e-16;
const MAX_TERMS = 10_000;

/**
 * Regularized incomplete beta function I_x(a, b) = B(x; a, b) / B(a, b), for a, b > 0, x in [0, 1].
 *
 * What for: the Student-t distribution (`studentTCdf`): P(|T_ν| ≥ t) = I_{ν/(ν+t²)}(ν/2, ½).
 *
 * Algorithm: the continued fraction
 *   I_x(a, b) = x^a (1−x)^b / (a B(a, b)) · 1 / (1 + d1 / (1 + d2 / (1 + …))),
 *   d_{2m+1} = −(a+m)(a+b+m) x / ((a+2m)(a+2m+1)),  d_{2m} = m(b−m) x / ((a+2m−1)(a+2m)),
 * (NIST DLMF eq. 8.17.22; Abramowitz & Stegun 1964, eq. 26.5.8) evaluated by the modified Lentz method
 * (Lentz 1976, Applied Optics 15:668–671; Thompson & Barnett 1986, J. Comput. Phys. 64:490–509).
 * It converges fast for x < (a+1)/(a+b+2); above that the symmetry I_x(a, b) = 1 − I_{1−x}(b, a) is
 * used (the split of Press et al., Numerical Recipes, 3rd ed. (2007), §6.4).
 * `y` is 1 − x; callers that know it more accurately than `1 - x` (e.g. t²/(ν+t²)) pass it in, and the
 * logarithms of the prefactor are taken from the smaller of x and y (log1p for the other).
 * Accuracy: relative ≈ 1e−14 in the tested range (scipy comparisons for a, b ≤ 50 and for a = ν/2 up to
 * 5·10⁵ with b = ½); far tails lose ≈ |a ln x|·1e−16 to the rounding of the exponent.
 *
 * Cost: O(√max(a, b)) fraction terms, three log-gamma calls, one exp.
 */
export function incompleteBeta(x: number, a: number, b: number, y: number = 1 - x): number {
  if (!(a > 0) || !Number.isFinite(a)) {
    throw new RangeError(`incompleteBeta: a must be a finite number greater than 0, got ${String(a)}`);
  }
  if (!(b > 0) || !Number.isFinite(b)) {
    throw new RangeError(`incompleteBeta: b must be a finite number greater than 0, got ${String(b)}`);
  }
  if (!(x >= 0 && x <= 1)) {
    throw new RangeError(`incompleteBeta: x must be a number in [0, 1], got ${String(x)}`);
  }
  if (x === 0) return 0;
  if (y <= 0 || x === 1) return 1;
  // ln x and ln(1 − x) from whichever of x, y is small (accurate), so a·ln x keeps its precision for large a.
  const logX = x > 0.5 ? Math.log1p(-y) : Math.log(x);
  const logY = y > 0.5 ? Math.log1p(-x) : Math.log(y);
  const logFront = a * logX + b * logY - logBeta(a, b);
  if (x < (a + 1) / (a + b + 2)) {
    return Math.exp(logFront) / (a * betaFraction(x, a, b));
  }
  return 1 - Math.exp(logFront) / (b * betaFraction(y, b, a));
}

/** The denominator 1 + d1/(1 + d2/(1 + …)) of DLMF 8.17.22, by modified Lentz. */
function betaFraction(x: number, a: number, b: number): number {
  let f = 1;
  let c = 1;
  let d = 0;
  for (let k = 1; k <= MAX_TERMS; k++) {
    const m = k >> 1;
    const dk =
      (k & 1) === 1
        ? (-(a + m) * (a + b + m) * x) / ((a + 2 * m) * (a + 2 * m + 1))
        : (m * (b - m) * x) / ((a + 2 * m - 1) * (a + 2 * m));
    d = 1 + dk * d;
    if (d === 0) d = TINY;
    c = 1 + dk / c;
    if (c === 0) c = TINY;
    d = 1 / d;
    const delta = c * d;
    f *= delta;
    if (Math.abs(delta - 1) < EPS) return f;
  }
  throw new Error(
    `incompleteBeta: continued fraction did not converge in ${MAX_TERMS} terms for x = ${x}, a = ${a}, b = ${b}`,
  );
}
