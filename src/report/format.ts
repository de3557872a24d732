/** Number and label formats shared by the Markdown and HTML reports (plain text: callers escape). */
import type { CaseVerdict, MetricDrift } from "../compare/types.js";

/** Three significant digits, scientific outside [0.001, 10⁴); "—" for null or a non-number. */
export function num(x: unknown): string {
  if (typeof x !== "number" || Number.isNaN(x)) return "—";
  if (x === Infinity) return "∞";
  if (x === -Infinity) return "−∞";
  if (x === 0) return "0";
  const a = Math.abs(x);
  return a >= 0.001 && a < 1e4 ? String(Number(x.toPrecision(3))) : x.toExponential(2).replace("e+", "e");
}

/** A p-value: "< 0.0001" below that, else 2 significant digits. */
export function pValue(p: unknown): string {
  if (typeof p !== "number" || Number.isNaN(p)) return "—";
  if (p < 1e-4) return "< 0.0001";
  return String(Number(p.toPrecision(2)));
}

/** The metric in words: "steps to 1e-3", "final gap", "evaluations". */
export function metricLabel(d: Pick<MetricDrift, "kind" | "rung" | "metric">): string {
  switch (d.kind) {
    case "stepsTo":
      return typeof d.rung === "number" ? `steps to ${rungText(d.rung)}` : "steps to tolerance";
    case "finalGap":
      return "final gap";
    case "evaluations":
      return "evaluations";
    default:
      return String(d.metric ?? "metric");
  }
}

/** A ladder rung (relative gap tolerance) as "1e-3". */
export function rungText(rung: number): string {
  const e = Math.log10(rung);
  return Math.abs(e - Math.round(e)) < 1e-9 ? `1e${Math.round(e)}` : rung.toExponential(1).replace("e+", "e");
}

/**
 * A drift as "×1.32 (97.5% CI 1.20–1.45)", with "≥"/"≤" when censored pairs make the ratio a bound, an
 * open end of the interval as 0 or ∞, and "no pairs" when there is nothing to estimate.
 */
export function driftText(d: MetricDrift): string {
  if (typeof d.ratio !== "number") return "no pairs";
  const sign = d.bound === "at-least" ? "≥" : d.bound === "at-most" ? "≤" : "";
  const i = d.interval;
  const ci = i
    ? ` (${num(Number(i.level) * 100)}% CI ${i.low === null ? "0" : num(i.low)}–${i.high === null ? "∞" : num(i.high)})`
    : "";
  return `${sign}×${num(d.ratio)}${ci}`;
}

/** Symbol and word of a case verdict (the word always stands beside the symbol). */
export const VERDICT_MARK: Readonly<Record<CaseVerdict, string>> = {
  regressed: "🔴",
  missing: "⚫",
  inconclusive: "🟡",
  improved: "🟢",
  new: "🆕",
  equivalent: "⚪",
  unchanged: "⚪",
};

/** Plural helper: "1 case", "3 cases". */
export function plural(n: number, word: string, many = `${word}s`): string {
  return `${n} ${n === 1 ? word : many}`;
}
