import { expect } from "vitest";

/** |actual − expected| / |expected| (|actual| when expected is 0). */
export function relativeError(actual: number, expected: number): number {
  return expected === 0 ? Math.abs(actual) : Math.abs(actual - expected) / Math.abs(expected);
}

/** Asserts a relative error of at most `relTol` (a relative tolerance), naming the row on failure. */
export function expectRelative(actual: number, expected: number, relTol: number, label: string): void {
  expect(
    relativeError(actual, expected),
    `${label}: got ${actual}, expected ${expected}`,
  ).toBeLessThanOrEqual(relTol);
}

/** Asserts an absolute error of at most `absTol` (an absolute tolerance), naming the row on failure. */
export function expectAbsolute(actual: number, expected: number, absTol: number, label: string): void {
  expect(Math.abs(actual - expected), `${label}: got ${actual}, expected ${expected}`).toBeLessThanOrEqual(
    absTol,
  );
}

/** Brute-force Hodges–Lehmann estimate: median of all sorted Walsh averages (d_i + d_j)/2, i ≤ j. */
export function bruteWalsh(d: ArrayLike<number>): number[] {
  const w: number[] = [];
  for (let i = 0; i < d.length; i++) for (let j = i; j < d.length; j++) w.push(0.5 * (d[i] + d[j]));
  return w.sort((a, b) => a - b);
}

/** Median of a sorted array (mean of the two middle values for even length). */
export function sortedMedian(sorted: number[]): number {
  const m = sorted.length;
  return m % 2 === 1 ? sorted[(m - 1) / 2] : 0.5 * (sorted[m / 2 - 1] + sorted[m / 2]);
}
