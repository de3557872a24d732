/**
 * Canonical JSON: object keys sorted, arrays in order, numbers in JavaScript's shortest round-trip
 * form, two-space indentation and a final newline. The same value always gives the same bytes, so
 * results and baselines diff cleanly and equal runs compare byte for byte.
 */
export function canonicalJson(value: unknown): string {
  return JSON.stringify(sortKeys(value), null, 2) + "\n";
}

function sortKeys(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(sortKeys);
  if (value !== null && typeof value === "object") {
    const out: Record<string, unknown> = {};
    for (const key of Object.keys(value as object).sort()) {
      const v = (value as Record<string, unknown>)[key];
      if (v !== undefined) out[key] = sortKeys(v);
    }
    return out;
  }
  if (typeof value === "number" && !Number.isFinite(value)) {
    throw new TypeError(`canonicalJson: non-finite number ${value} cannot be written as JSON; store null instead`);
  }
  return value;
}

/** A finite number, or null for NaN and ±Infinity (JSON has no spelling for them). */
export function finiteOrNull(x: number): number | null {
  return Number.isFinite(x) ? x : null;
}
