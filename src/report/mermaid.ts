/**
 * Convergence charts as Mermaid `xychart-beta` blocks, which GitHub draws in comments and job summaries.
 * Mermaid has neither a log axis nor a legend, so the chart plots log10 of the gap, puts the checkpoints
 * (log-spaced steps) on a category axis, and the caption above it says which line is which.
 */
import { mermaidText } from "./escape.js";
import type { Curve } from "./model.js";

/** Line colours in drawing order: spread first, medians on top (baseline blue, candidate orange). */
const BASELINE_SPREAD = "#9dbbe3";
const BASELINE_MEDIAN = "#1d4f91";
const CANDIDATE_SPREAD = "#f2b48a";
const CANDIDATE_MEDIAN = "#c4450c";

/** The caption that goes above every chart (Markdown we write ourselves, no user text). */
export const MERMAID_CAPTION =
  "Median gap f − f* over the seeds against the step, with the smallest and largest gap as thin lines: " +
  "**baseline in blue, candidate in orange**. Mermaid has no log axis, so the chart plots **log10 of the gap** " +
  "and the steps are the log-spaced checkpoints, evenly placed (approximately a log axis).";

/** At most this many checkpoints per chart (Mermaid labels every category). */
const MAX_POINTS = 15;
/** The y axis spans at most this many decades below the largest gap. */
const MAX_DECADES = 24;

/** Picks up to MAX_POINTS checkpoint indices: step 0, then steps spread evenly in log scale. */
export function pickPoints(steps: readonly number[], max = MAX_POINTS): number[] {
  if (steps.length <= max) return steps.map((_, i) => i);
  const picked = new Set<number>();
  if (steps[0] === 0) picked.add(0);
  const positive = steps.map((s, i) => [s, i] as const).filter(([s]) => s >= 1);
  const top = positive[positive.length - 1][0];
  const slots = max - picked.size;
  for (let j = 0; j < slots; j++) {
    const target = Math.log(top) * (slots === 1 ? 1 : j / (slots - 1));
    let best = positive[0];
    for (const p of positive)
      if (Math.abs(Math.log(p[0]) - target) < Math.abs(Math.log(best[0]) - target)) best = p;
    picked.add(best[1]);
  }
  return [...picked].sort((a, b) => a - b);
}

/**
 * One chart, or null when there is nothing to draw. The baseline is drawn only when its checkpoints are
 * the candidate's (otherwise the case definition changed and the case is "new").
 */
export function mermaidChart(title: string, candidate: Curve, baseline: Curve | null): string | null {
  const steps = candidate.steps;
  if (steps.length === 0 || candidate.median.every((v) => v === null)) return null;
  const base = baseline && sameSteps(baseline.steps, steps) ? baseline : null;
  const sides = base ? [base, candidate] : [candidate];

  // y range: whole decades around every finite positive value, at most MAX_DECADES deep.
  let lo = Infinity;
  let hi = -Infinity;
  for (const c of sides)
    for (const series of [c.low, c.median, c.high])
      for (const v of series)
        if (typeof v === "number" && v > 0 && Number.isFinite(v)) {
          lo = Math.min(lo, Math.log10(v));
          hi = Math.max(hi, Math.log10(v));
        }
  if (!Number.isFinite(lo)) return null;
  let top = Math.ceil(hi);
  let bottom = Math.floor(lo);
  if (top === bottom) top = bottom + 1;
  bottom = Math.max(bottom, top - MAX_DECADES);

  const points = pickPoints(steps);
  const series = (values: readonly (number | null)[]) => {
    let held = bottom;
    return points.map((i) => {
      const v = values[i];
      let y: number;
      if (v === null || v === undefined) y = held;
      else if (v === Infinity) y = top;
      else if (!(v > 0)) y = bottom;
      else y = Math.min(top, Math.max(bottom, Math.log10(v)));
      held = y;
      return String(Number(y.toFixed(2)));
    });
  };
  const lines: string[] = [];
  const palette: string[] = [];
  for (const [c, spread, median] of base
    ? [
        [base, BASELINE_SPREAD, BASELINE_MEDIAN] as const,
        [candidate, CANDIDATE_SPREAD, CANDIDATE_MEDIAN] as const,
      ]
    : [[candidate, CANDIDATE_SPREAD, CANDIDATE_MEDIAN] as const]) {
    lines.push(`  line [${series(c.high).join(", ")}]`, `  line [${series(c.low).join(", ")}]`);
    lines.push(`  line [${series(c.median).join(", ")}]`);
    palette.push(spread, spread, median);
  }
  const init = { theme: "base", themeVariables: { xyChart: { plotColorPalette: palette.join(", ") } } };
  return [
    "```mermaid",
    `%%{init: ${JSON.stringify(init)}}%%`,
    "xychart-beta",
    `  title "${mermaidText(title)}"`,
    `  x-axis "step (log-spaced checkpoints)" [${points.map((i) => `"${steps[i]}"`).join(", ")}]`,
    `  y-axis "log10 gap" ${bottom} --> ${top}`,
    ...lines,
    "```",
  ].join("\n");
}

function sameSteps(a: readonly number[], b: readonly number[]): boolean {
  return a.length === b.length && a.every((s, i) => s === b[i]);
}
