/**
 * The full report as one self-contained HTML file: no scripts, no external fonts, styles or images, and a
 * Content-Security-Policy that forbids fetching anything, so it opens the same offline, from an artifact
 * or from disk. It lists every case with every metric, reason and reference check, and draws the
 * convergence of the cases that drifted most as inline SVG on true log axes.
 */
import type { CaseComparison, MetricDrift } from "../compare/types.js";
import { escapeHtml, oneLine } from "./escape.js";
import { driftText, metricLabel, num, plural, pValue } from "./format.js";
import {
  chartCases,
  checkTally,
  curvesFor,
  isChanged,
  leadDrift,
  orderCases,
  type ReportInput,
} from "./model.js";
import { svgChart } from "./svg.js";

export interface HtmlOptions {
  /** Charts of this many cases, most drifted first (default 60). */
  readonly charts?: number;
}

const STYLE = `
body{font:14px/1.45 system-ui,-apple-system,"Segoe UI",sans-serif;color:#1f2328;margin:24px auto;max-width:1100px;padding:0 16px}
h1{font-size:22px;margin:0 0 4px}h2{font-size:17px;margin:28px 0 8px;border-bottom:1px solid #d0d7de;padding-bottom:4px}
.pass{color:#1a7f37}.fail{color:#cf222e}.muted{color:#59636e}
table{border-collapse:collapse;width:100%;font-size:13px}th,td{border:1px solid #d0d7de;padding:4px 6px;text-align:left;vertical-align:top}
th{background:#f6f8fa}code{font:12px ui-monospace,SFMono-Regular,Menlo,monospace;background:#f6f8fa;padding:1px 3px;border-radius:3px}
tr.regressed>td:first-child,tr.missing>td:first-child{border-left:4px solid #cf222e}tr.improved>td:first-child{border-left:4px solid #1a7f37}
tr.inconclusive>td:first-child{border-left:4px solid #bf8700}
.dot{display:inline-block;width:9px;height:9px;border-radius:50%;margin-right:5px;background:#afb8c1}
.dot.regressed,.dot.missing{background:#cf222e}.dot.improved{background:#1a7f37}.dot.inconclusive{background:#bf8700}.dot.new{background:#0969da}
.badge{display:inline-block;color:#fff;border-radius:4px;padding:0 8px;margin-right:8px;font-size:15px;vertical-align:2px}
.badge.pass{background:#1a7f37;color:#fff}.badge.fail{background:#cf222e;color:#fff}
.charts{display:flex;flex-wrap:wrap;gap:12px}.charts figure{margin:0;border:1px solid #d0d7de;border-radius:6px;padding:6px}
figcaption{font-size:12px;color:#59636e;max-width:460px}details{margin:6px 0}summary{cursor:pointer}
ul.reasons{margin:4px 0 8px 18px;padding:0}
`;

/** Renders the whole report. */
export function renderHtml(input: ReportInput, options: HtmlOptions = {}): string {
  const v = input.verdict;
  const pass = v.gate?.verdict === "pass";
  const ordered = orderCases(v.cases ?? []);
  const counts = (v.counts ?? {}) as Record<string, unknown>;
  const out: string[] = [];
  out.push(
    "<!doctype html>",
    '<html lang="en">',
    "<head>",
    '<meta charset="utf-8">',
    `<meta http-equiv="Content-Security-Policy" content="default-src 'none'; style-src 'unsafe-inline'; img-src data:">`,
    '<meta name="viewport" content="width=device-width, initial-scale=1">',
    `<title>gradgate: convergence gate ${pass ? "passed" : "failed"}</title>`,
    `<style>${STYLE}</style>`,
    "</head>",
    "<body>",
    `<h1 class="${pass ? "pass" : "fail"}"><span class="badge ${pass ? "pass" : "fail"}">${pass ? "PASS" : "FAIL"}</span>` +
      `Convergence gate ${pass ? "passed" : "failed"}</h1>`,
    `<p>${Object.entries(counts)
      .filter(([, n]) => typeof n === "number" && n > 0)
      .map(([k, n]) => `${escapeHtml(n)} ${escapeHtml(k)}`)
      .join(" · ")} — ${plural(ordered.length, "case")} compared with the baseline</p>`,
  );
  for (const note of input.notes ?? []) out.push(`<p class="muted">${escapeHtml(oneLine(note, 600))}</p>`);

  const reasons = v.gate?.reasons ?? [];
  if (!pass && reasons.length > 0) {
    out.push("<h2>Why it failed</h2>", '<ul class="reasons">');
    for (const r of reasons) out.push(`<li>${escapeHtml(oneLine(r.message, 600))}</li>`);
    out.push("</ul>");
  }
  const gateChecks = v.gate?.checks ?? [];
  if (gateChecks.length > 0) {
    out.push("<h2>Suite reference checks</h2>", checksTable(gateChecks));
  }

  const charted = chartCases(input, options.charts ?? 60);
  const figures: string[] = [];
  for (const c of charted) {
    const { candidate, baseline } = curvesFor(input, c.id);
    const svg = candidate ? svgChart(c.id, candidate, baseline) : null;
    if (svg === null) continue;
    const lead = leadDrift(c);
    figures.push(
      `<figure>${svg}<figcaption>${dot(c.verdict)}${escapeHtml(c.verdict)}${
        lead ? ` — ${escapeHtml(`${metricLabel(lead)} ${driftText(lead)}`)}` : ""
      }</figcaption></figure>`,
    );
  }
  if (figures.length > 0) {
    out.push(
      `<h2>Convergence of the ${plural(figures.length, "case")} that drifted most</h2>`,
      '<p class="muted">Median gap f − f* over the seeds (line) and the range from the smallest to the largest gap (band), against the step, both on log scales.</p>',
      `<div class="charts">${figures.join("\n")}</div>`,
    );
  }

  out.push(
    `<h2>All ${plural(ordered.length, "case")}</h2>`,
    "<table><thead><tr><th>Case</th><th>Verdict</th><th>Drift (candidate ÷ baseline)</th><th>Reference checks</th><th>Details</th></tr></thead><tbody>",
  );
  for (const c of ordered) out.push(caseRow(c));
  out.push("</tbody></table>");
  out.push(`<p class="muted">${footer(input)}</p>`, "</body>", "</html>");
  return out.join("\n") + "\n";
}

function caseRow(c: CaseComparison): string {
  const lead = leadDrift(c);
  const t = checkTally(c.checks);
  const checks =
    t.pass + t.fail + t.skipped === 0
      ? "—"
      : `${t.pass} passed, ${t.fail} failed${t.skipped ? `, ${t.skipped} skipped` : ""}${
          t.failed.length
            ? `: ${t.failed.map((x) => `<code>${escapeHtml(oneLine(x.id, 60))}</code>`).join(", ")}`
            : ""
        }`;
  const details: string[] = [];
  if ((c.reasons ?? []).length > 0) {
    details.push(
      `<ul class="reasons">${c.reasons.map((r) => `<li>${escapeHtml(oneLine(r.message, 600))}</li>`).join("")}</ul>`,
    );
  }
  if ((c.drift ?? []).length > 0) details.push(metricsTable(c.drift));
  if ((c.checks ?? []).length > 0) details.push(checksTable(c.checks));
  const body = details.length
    ? `<details${isChanged(c) ? " open" : ""}><summary>${plural((c.drift ?? []).length, "metric")}</summary>${details.join("")}</details>`
    : "—";
  return (
    `<tr class="${escapeHtml(c.verdict)}"><td><code>${escapeHtml(oneLine(c.id, 200))}</code></td>` +
    `<td>${dot(c.verdict)}${escapeHtml(c.verdict)}</td>` +
    `<td>${lead ? escapeHtml(`${metricLabel(lead)} ${driftText(lead)}`) : "—"}${
      (c.diverged ?? []).length
        ? `<br><strong>${plural(c.diverged.length, "seed")} newly diverged</strong>`
        : ""
    }</td><td>${checks}</td><td>${body}</td></tr>`
  );
}

/** A coloured dot for a verdict (CSS only: no emoji font needed). */
function dot(verdict: string): string {
  return `<span class="dot ${escapeHtml(verdict)}"></span>`;
}

function metricsTable(drift: readonly MetricDrift[]): string {
  const rows = drift.map(
    (d) =>
      `<tr><td>${escapeHtml(metricLabel(d))}${d.gating ? "" : " (reported only)"}</td><td>${escapeHtml(d.status)}</td>` +
      `<td>${escapeHtml(driftText(d))}</td><td>${escapeHtml(pValue(d.adjustedPValue))}</td>` +
      `<td>${escapeHtml(pValue(d.equivalencePValue))}</td><td>${escapeHtml(num(d.pairs))}</td></tr>`,
  );
  return (
    "<table><thead><tr><th>Metric</th><th>Status</th><th>Drift</th><th>Adjusted p (beyond margin)</th>" +
    `<th>p (within margin)</th><th>Pairs</th></tr></thead><tbody>${rows.join("")}</tbody></table>`
  );
}

function checksTable(checks: CaseComparison["checks"]): string {
  const rows = checks.map(
    (c) =>
      `<tr><td><code>${escapeHtml(oneLine(c.id, 80))}</code></td><td>${escapeHtml(c.status)}${c.gating ? "" : " (informational)"}</td>` +
      `<td>${escapeHtml(oneLine(c.summary, 400))}</td><td>${escapeHtml(oneLine(c.source, 300))}</td></tr>`,
  );
  return `<table><thead><tr><th>Check</th><th>Status</th><th>Result</th><th>Source</th></tr></thead><tbody>${rows.join("")}</tbody></table>`;
}

function footer(input: ReportInput): string {
  const v = input.verdict;
  const p = v.policy;
  const parts: string[] = [];
  if (p && typeof p === "object") {
    parts.push(
      `Policy: margins ×${num(p.margin?.stepsTo)} steps, ×${num(p.margin?.finalGap)} final gap, ×${num(p.margin?.evaluations)} evaluations; ` +
        `alpha ${num(p.alpha)}, ${escapeHtml(p.correction)} correction${p.strict ? ", strict" : ""}.`,
    );
  }
  parts.push(
    `Baseline suite ${escapeHtml(oneLine(v.baseline?.suiteHash ?? "—", 80))}; candidate suite ${escapeHtml(oneLine(v.candidate?.suiteHash ?? "—", 80))}.`,
  );
  if (v.tool)
    parts.push(`${escapeHtml(oneLine(v.tool.name, 40))} ${escapeHtml(oneLine(v.tool.version, 40))}.`);
  return parts.join(" ");
}
