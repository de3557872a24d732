/** Plain-text tables and number formats for the terminal. */

/** Renders rows as a left-aligned text table (numbers right-aligned) with a header rule. */
export function textTable(header: readonly string[], rows: readonly (readonly string[])[]): string {
  const widths = header.map((h, i) => Math.max(h.length, ...rows.map((r) => (r[i] ?? "").length)));
  const numeric = header.map(
    (_, i) => rows.length > 0 && rows.every((r) => /^[-+]?[\d.,e+%x×—-]*$/i.test(r[i] ?? "")),
  );
  const line = (cells: readonly string[]) =>
    cells
      .map((c, i) => (numeric[i] ? c.padStart(widths[i]) : c.padEnd(widths[i])))
      .join("  ")
      .trimEnd();
  return [line(header), widths.map((w) => "-".repeat(w)).join("  "), ...rows.map(line)].join("\n") + "\n";
}

/** Short scientific form for gaps: 3 significant digits, "—" for null. */
export function sci(x: number | null | undefined): string {
  if (x === null || x === undefined || Number.isNaN(x)) return "—";
  if (x === 0) return "0";
  const a = Math.abs(x);
  if (a >= 0.01 && a < 1e4) return x.toPrecision(3);
  return x.toExponential(2);
}

/** Median of the non-null values, or null when there are none. */
export function medianOf(values: readonly (number | null)[]): number | null {
  const v = values.filter((x): x is number => x !== null).sort((a, b) => a - b);
  if (v.length === 0) return null;
  const m = v.length >> 1;
  return v.length % 2 ? v[m] : (v[m - 1] + v[m]) / 2;
}
