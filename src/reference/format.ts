/** Number formats of the reference checks' messages (plain text, no locale). */

/** Two significant digits in exponent form, as in "3.1e-2": for tolerances and differences. */
export function short(x: number): string {
  if (!Number.isFinite(x)) return String(x);
  return x.toExponential(1).replace("e+", "e");
}

/** Four significant digits in JavaScript's shortest spelling: 0.9487, 1.2e-7, 48.98. */
export function fmt(x: number): string {
  return Number.isFinite(x) ? String(Number(x.toPrecision(4))) : String(x);
}

/** A fraction as a percentage with two significant digits: 0.0213 → "2.1%". */
export function pct(x: number): string {
  return `${Number((100 * x).toPrecision(2))}%`;
}
