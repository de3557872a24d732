/**
 * Canonical JSON: object keys sorted, arrays in order, numbers in JavaScript's shortest round-trip
 * form, two-space indentation and a final newline; an array of plain values (numbers, strings, null,
 * booleans) stays on one line, so a run's trace or iterate is one line of a diff. The same value always
 * gives the same bytes, so results and baselines diff cleanly and equal runs compare byte for byte.
 */
export function canonicalJson(value: unknown): string {
  return write(sortKeys(value), "") + "\n";
}

function isPlain(v: unknown): boolean {
  return v === null || typeof v !== "object";
}

function write(value: unknown, indent: string): string {
  if (Array.isArray(value)) {
    if (value.length === 0) return "[]";
    if (value.every(isPlain)) return "[" + value.map((v) => JSON.stringify(v)).join(", ") + "]";
    const inner = indent + "  ";
    return "[\n" + value.map((v) => inner + write(v, inner)).join(",\n") + "\n" + indent + "]";
  }
  if (value !== null && typeof value === "object") {
    const entries = Object.entries(value as Record<string, unknown>);
    if (entries.length === 0) return "{}";
    const inner = indent + "  ";
    return (
      "{\n" +
      entries.map(([k, v]) => inner + JSON.stringify(k) + ": " + write(v, inner)).join(",\n") +
      "\n" +
      indent +
      "}"
    );
  }
  return JSON.stringify(value);
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
    throw new TypeError(
      `canonicalJson: non-finite number ${value} cannot be written as JSON; store null instead`,
    );
  }
  return value;
}

/** A finite number, or null for NaN and ±Infinity (JSON has no spelling for them). */
export function finiteOrNull(x: number): number | null {
  return Number.isFinite(x) ? x : null;
}
