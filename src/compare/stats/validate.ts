/**
 * Input checks shared by the statistics kernel. Every message names the function and the argument,
 * quotes the bad value and gives the expected form, e.g.
 * `wilcoxonSignedRank: d[3] must be a finite number, got NaN`.
 * Cost: O(n) for a sample, O(1) otherwise.
 */

/** Renders a value for an error message: strings in quotes, everything else as JavaScript prints it. */
export function describeValue(value: unknown): string {
  if (typeof value === "string") return JSON.stringify(value);
  if (Array.isArray(value)) return `an array of length ${value.length}`;
  if (typeof value === "object" && value !== null) return Object.prototype.toString.call(value);
  return String(value);
}

/** Throws unless `values` is an array-like of at least `minLength` finite numbers. */
export function checkSample(fn: string, name: string, values: unknown, minLength: number): void {
  if (
    values === null ||
    typeof values !== "object" ||
    typeof (values as { length?: unknown }).length !== "number"
  ) {
    throw new TypeError(`${fn}: ${name} must be an array of finite numbers, got ${describeValue(values)}`);
  }
  const arr = values as ArrayLike<unknown>;
  if (arr.length < minLength) {
    throw new RangeError(
      `${fn}: ${name} must hold at least ${minLength} finite number${minLength === 1 ? "" : "s"}, got ${arr.length}`,
    );
  }
  for (let i = 0; i < arr.length; i++) {
    const v = arr[i];
    if (typeof v !== "number" || !Number.isFinite(v)) {
      throw new RangeError(`${fn}: ${name}[${i}] must be a finite number, got ${describeValue(v)}`);
    }
  }
}

/** Throws unless `value` is a number strictly between 0 and 1 (a confidence level or a significance level). */
export function checkOpenUnit(fn: string, name: string, value: unknown): void {
  if (typeof value !== "number" || !(value > 0 && value < 1)) {
    throw new RangeError(
      `${fn}: ${name} must be a number strictly between 0 and 1, got ${describeValue(value)}`,
    );
  }
}

/** Throws unless `value` is one of `choices`. */
export function checkChoice<T extends string>(
  fn: string,
  name: string,
  value: unknown,
  choices: readonly T[],
): asserts value is T {
  if (typeof value !== "string" || !(choices as readonly string[]).includes(value)) {
    const list = choices.map((c) => JSON.stringify(c)).join(", ");
    throw new RangeError(`${fn}: ${name} must be one of ${list}, got ${describeValue(value)}`);
  }
}

/** Throws unless `value` is an integer in [min, max]. */
export function checkInteger(fn: string, name: string, value: unknown, min: number, max: number): void {
  if (typeof value !== "number" || !Number.isInteger(value) || value < min || value > max) {
    throw new RangeError(
      `${fn}: ${name} must be an integer in [${min}, ${max}], got ${describeValue(value)}`,
    );
  }
}

/** Throws unless `value` is a finite number greater than zero. */
export function checkPositive(fn: string, name: string, value: unknown): void {
  if (typeof value !== "number" || !Number.isFinite(value) || !(value > 0)) {
    throw new RangeError(
      `${fn}: ${name} must be a finite number greater than 0, got ${describeValue(value)}`,
    );
  }
}

/** Returns `buffer` when it holds at least `length` values, else a larger Float64Array (growth by doubling). */
export function growFloat64(buffer: Float64Array, length: number): Float64Array {
  if (buffer.length >= length) return buffer;
  return new Float64Array(Math.max(length, 2 * buffer.length));
}

/** Returns `buffer` when it holds at least `length` values, else a larger Int32Array (growth by doubling). */
export function growInt32(buffer: Int32Array, length: number): Int32Array {
  if (buffer.length >= length) return buffer;
  return new Int32Array(Math.max(length, 2 * buffer.length));
}
