/**
 * Convergence chart as inline SVG, for the HTML report: gap f − f* against the step on true log axes,
 * the median over the seeds as a line and the range from the smallest to the largest gap as a band,
 * baseline and candidate in two colours, with a legend. Self-contained (no fonts, scripts or links).
 */
import { escapeHtml } from "./escape.js";
import type { Curve } from "./model.js";

export const SIDE_COLOURS = {
  baseline: { line: "#1d4f91", band: "#9dbbe3" },
  candidate: { line: "#c4450c", band: "#f2b48a" },
} as const;

const W = 460;
const H = 296;
const M = { left: 58, right: 14, top: 46, bottom: 40 };
const MAX_DECADES = 24;

/** One chart; null when the candidate has nothing to draw. */
export function svgChart(title: string, candidate: Curve, baseline: Curve | null): string | null {
  const sides = [
    ...(baseline ? [{ name: "baseline", curve: baseline, colour: SIDE_COLOURS.baseline }] : []),
    { name: "candidate", curve: candidate, colour: SIDE_COLOURS.candidate },
  ];
  let yLo = Infinity;
  let yHi = -Infinity;
  let xHi = 1;
  for (const { curve } of sides) {
    curve.steps.forEach((s, i) => {
      if (s < 1) return;
      for (const v of [curve.low[i], curve.median[i], curve.high[i]]) {
        if (typeof v === "number" && v > 0 && Number.isFinite(v)) {
          yLo = Math.min(yLo, Math.log10(v));
          yHi = Math.max(yHi, Math.log10(v));
          xHi = Math.max(xHi, s);
        }
      }
    });
  }
  if (!Number.isFinite(yLo)) return null;
  let top = Math.ceil(yHi);
  let bottom = Math.floor(yLo);
  if (top === bottom) top++;
  bottom = Math.max(bottom, top - MAX_DECADES);
  const right = Math.max(1, Math.ceil(Math.log10(xHi)));

  const px = (step: number) => M.left + (Math.log10(step) / right) * (W - M.left - M.right);
  const py = (v: number) => {
    const y = v === Infinity ? top : v > 0 ? Math.min(top, Math.max(bottom, Math.log10(v))) : bottom;
    return M.top + ((top - y) / (top - bottom)) * (H - M.top - M.bottom);
  };
  const f = (x: number) => x.toFixed(1);

  const parts: string[] = [];
  parts.push(
    `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${W} ${H}" width="${W}" height="${H}" role="img" aria-label="${escapeHtml(`Convergence of ${title}`)}">`,
    `<rect x="0" y="0" width="${W}" height="${H}" fill="#ffffff"/>`,
    `<text x="${M.left}" y="18" font-size="13" font-family="sans-serif" fill="#222">${escapeHtml(title)}</text>`,
  );
  // Grid and tick labels: every decade on both axes (thinned to at most 8 labels on y).
  const yEvery = Math.max(1, Math.ceil((top - bottom) / 8));
  for (let d = bottom; d <= top; d++) {
    const y = M.top + ((top - d) / (top - bottom)) * (H - M.top - M.bottom);
    parts.push(`<line x1="${M.left}" x2="${W - M.right}" y1="${f(y)}" y2="${f(y)}" stroke="#e3e3e3"/>`);
    if ((top - d) % yEvery === 0) {
      parts.push(
        `<text x="${M.left - 6}" y="${f(y + 4)}" font-size="11" font-family="sans-serif" text-anchor="end" fill="#444">1e${d}</text>`,
      );
    }
  }
  for (let d = 0; d <= right; d++) {
    const x = px(10 ** d);
    parts.push(`<line x1="${f(x)}" x2="${f(x)}" y1="${M.top}" y2="${H - M.bottom}" stroke="#e3e3e3"/>`);
    parts.push(
      `<text x="${f(x)}" y="${H - M.bottom + 15}" font-size="11" font-family="sans-serif" text-anchor="middle" fill="#444">${10 ** d}</text>`,
    );
  }
  parts.push(
    `<rect x="${M.left}" y="${M.top}" width="${W - M.left - M.right}" height="${H - M.top - M.bottom}" fill="none" stroke="#888"/>`,
    `<text x="${(M.left + W - M.right) / 2}" y="${H - 6}" font-size="11" font-family="sans-serif" text-anchor="middle" fill="#444">step (log scale)</text>`,
    `<text x="12" y="${(M.top + H - M.bottom) / 2}" font-size="11" font-family="sans-serif" text-anchor="middle" fill="#444" transform="rotate(-90 12 ${(M.top + H - M.bottom) / 2})">gap f − f* (log scale)</text>`,
  );

  for (const { curve, colour } of sides) {
    // Band: contiguous stretches where both ends are known.
    for (const run of stretches(curve, (i) => curve.low[i] !== null && curve.high[i] !== null)) {
      const upper = run.map((i) => `${f(px(curve.steps[i]))},${f(py(curve.high[i]!))}`);
      const lower = run.map((i) => `${f(px(curve.steps[i]))},${f(py(curve.low[i]!))}`).reverse();
      parts.push(
        `<polygon points="${[...upper, ...lower].join(" ")}" fill="${colour.band}" fill-opacity="0.45" stroke="none"/>`,
      );
    }
    for (const run of stretches(curve, (i) => curve.median[i] !== null)) {
      const pts = run.map((i) => `${f(px(curve.steps[i]))},${f(py(curve.median[i]!))}`);
      parts.push(
        `<polyline points="${pts.join(" ")}" fill="none" stroke="${colour.line}" stroke-width="2"/>`,
      );
    }
  }
  // Legend: under the title, right-aligned, above the plot.
  let lx = W - M.right - 8;
  for (const { name, curve, colour } of [...sides].reverse()) {
    const label = `${name} (${curve.seeds} seeds)`;
    const width = 26 + label.length * 6.2;
    lx -= width;
    parts.push(
      `<rect x="${f(lx)}" y="26" width="16" height="8" fill="${colour.band}"/>`,
      `<line x1="${f(lx)}" x2="${f(lx + 16)}" y1="30" y2="30" stroke="${colour.line}" stroke-width="2"/>`,
      `<text x="${f(lx + 20)}" y="34" font-size="11" font-family="sans-serif" fill="#222">${escapeHtml(label)}</text>`,
    );
  }
  parts.push("</svg>");
  return parts.join("\n");
}

/** Runs of consecutive checkpoints (step ≥ 1) where `ok` holds. */
function stretches(curve: Curve, ok: (i: number) => boolean): number[][] {
  const out: number[][] = [];
  let run: number[] = [];
  curve.steps.forEach((s, i) => {
    if (s >= 1 && ok(i)) run.push(i);
    else if (run.length > 0) {
      out.push(run);
      run = [];
    }
  });
  if (run.length > 0) out.push(run);
  return out.filter((r) => r.length > 0);
}
