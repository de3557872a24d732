/**
 * The verdict in Markdown, for a pull-request comment or a job summary: the gate's verdict and reasons,
 * a table of the cases that changed (case, verdict, drift with its interval, reference checks), charts of
 * the cases that drifted most, and the rest folded away. Every name and message from the documents is
 * escaped (escape.ts). The text always fits the target's limit: when the full report does not, the least
 * useful parts go first (the list of unchanged cases, the long tail of changed ones, charts) and the
 * report says so and where the full one is.
 */
import { CASE_VERDICTS, type CaseComparison, type VerdictDocument } from "../compare/types.js";
import { mdCode, mdText } from "./escape.js";
import { driftText, metricLabel, num, plural, pValue, VERDICT_MARK } from "./format.js";
import { MERMAID_CAPTION, mermaidChart } from "./mermaid.js";
import {
  chartCases,
  checkTally,
  curvesFor,
  isChanged,
  leadDrift,
  orderCases,
  type ReportInput,
  type ReportLinks,
} from "./model.js";

/** GitHub's limit on a comment body, in characters. */
export const COMMENT_LIMIT = 65_536;
/** GitHub's limit on one step's job summary, in bytes (1 MiB). */
export const SUMMARY_LIMIT = 1_048_576;

export interface MarkdownOptions {
  /** "comment": at most COMMENT_LIMIT characters; "summary": at most SUMMARY_LIMIT bytes. */
  readonly target: "comment" | "summary";
  /** First line of a comment: the hidden marker that finds it again (see commentMarker). */
  readonly marker?: string;
  /** Charts of this many cases, most drifted first (default 3 in a comment, 8 in a summary). */
  readonly charts?: number;
  /** Override of the size limit (in the target's unit), e.g. for tests. */
  readonly limit?: number;
}

/** How much of each part a rendering keeps. */
interface Detail {
  readonly reasons: number;
  readonly mainRows: number;
  readonly moreRows: number;
  readonly otherRows: number;
  readonly charts: number;
}

/** Rows of changed cases in the main table; the rest are folded below it. */
const MAIN_ROWS = 25;
const REASONS = 10;

/** Renders the report for `options.target`, within its limit. */
export function renderMarkdown(input: ReportInput, options: MarkdownOptions): string {
  const comment = options.target === "comment";
  const limit = options.limit ?? (comment ? COMMENT_LIMIT : SUMMARY_LIMIT);
  const size = comment ? (s: string) => s.length : (s: string) => Buffer.byteLength(s, "utf8");
  const cases = input.verdict.cases ?? [];
  const full: Detail = {
    reasons: REASONS,
    mainRows: MAIN_ROWS,
    moreRows: cases.length,
    otherRows: cases.length,
    charts: options.charts ?? (comment ? 3 : 8),
  };
  // Give things up in order of least use until the text fits.
  const steps: ((d: Detail) => Detail)[] = [
    (d) => ({ ...d, otherRows: 0 }),
    (d) => ({ ...d, moreRows: 0 }),
    (d) => ({ ...d, charts: Math.min(d.charts, 1) }),
    (d) => ({ ...d, charts: 0 }),
  ];
  let detail = full;
  let text = render(input, detail, options, false);
  for (const step of steps) {
    if (size(text) <= limit) return text;
    detail = step(detail);
    text = render(input, detail, options, true);
  }
  while (size(text) > limit && (detail.mainRows > 0 || detail.reasons > 1)) {
    detail =
      detail.mainRows > 0
        ? { ...detail, mainRows: Math.floor(detail.mainRows / 2) }
        : { ...detail, reasons: Math.floor(detail.reasons / 2) };
    text = render(input, detail, options, true);
  }
  if (size(text) > limit) {
    // Only a pathological document gets here (thousands of huge reasons): cut, and say so.
    const note = "\n\n_(cut to fit GitHub's size limit; see the full report)_\n";
    let cut = text.slice(0, Math.max(0, limit - note.length - 16));
    while (size(cut + note) > limit) cut = cut.slice(0, Math.floor(cut.length * 0.9));
    text = cut + note;
  }
  return text;
}

/**
 * The hidden first line of the comment that gradgate updates in place: one per workflow and key. The
 * identity is hashed into hex by the caller, so nothing from the outside appears in the marker.
 */
export function commentMarker(identity: string): string {
  if (!/^[0-9a-f]{8,64}$/.test(identity))
    throw new Error(`comment marker identity must be hex, got ${identity}`);
  return `<!-- gradgate-report ${identity} -->`;
}

function render(input: ReportInput, detail: Detail, options: MarkdownOptions, shortened: boolean): string {
  const v = input.verdict;
  const comment = options.target === "comment";
  const out: string[] = [];
  if (comment && options.marker) out.push(options.marker);
  out.push(headline(v), "", countsLine(v));
  for (const note of input.notes ?? []) out.push("", `> ${mdText(note, 600)}`);
  if (shortened) {
    out.push(
      "",
      `> This report is shortened to fit GitHub's size limit for ${comment ? "comments" : "job summaries"}; ` +
        `the full report is in the workflow run's artifact${input.links?.artifact ? ` ${mdCode(input.links.artifact)}` : ""}.`,
    );
  }

  const reasons = v.gate?.reasons ?? [];
  if (v.gate?.verdict !== "pass" && reasons.length > 0 && detail.reasons > 0) {
    out.push("", "**Why it failed**", "");
    for (const r of reasons.slice(0, detail.reasons)) out.push(`- ${mdText(r.message, 400)}`);
    if (reasons.length > detail.reasons) out.push(`- … and ${reasons.length - detail.reasons} more`);
  }
  const gateChecks = checkTally(v.gate?.checks);
  if (gateChecks.pass + gateChecks.fail + gateChecks.skipped > 0) {
    out.push(
      "",
      `**Suite reference checks:** ${gateChecks.pass} passed, ${gateChecks.fail} failed, ${gateChecks.skipped} skipped`,
    );
    for (const c of gateChecks.failed.slice(0, 10))
      out.push(`- ❌ ${mdCode(c.id, 60)}: ${mdText(c.summary, 300)}`);
  }

  const ordered = orderCases(v.cases ?? []);
  const changed = ordered.filter(isChanged);
  const others = ordered.filter((c) => !isChanged(c));
  out.push("");
  if (changed.length === 0) {
    out.push(`Every case is unchanged or equivalent to its baseline (${plural(ordered.length, "case")}).`);
  } else {
    const main = changed.slice(0, detail.mainRows);
    if (main.length > 0) out.push(...table(main));
    const rest = changed.slice(main.length);
    if (rest.length > 0) {
      if (detail.moreRows > 0) {
        out.push(
          ...folded(
            `${plural(rest.length, "more changed case")}`,
            table(rest.slice(0, detail.moreRows)),
            rest.length - detail.moreRows,
          ),
        );
      } else out.push("", `_… and ${plural(rest.length, "more changed case")}, listed in the full report._`);
    }
  }

  const charted = chartCases(input, detail.charts);
  const charts: string[] = [];
  let drawn = 0;
  for (const c of charted) {
    const { candidate, baseline } = curvesFor(input, c.id);
    const chart = candidate ? mermaidChart(c.id, candidate, baseline) : null;
    if (chart === null) continue;
    const lead = leadDrift(c);
    charts.push(
      "",
      `${mdCode(c.id)} — ${mdText(c.verdict, 20)}${lead ? `, ${mdText(`${metricLabel(lead)} ${driftText(lead)}`)}` : ""}`,
      "",
      chart,
    );
    drawn++;
  }
  if (drawn > 0) {
    const title =
      drawn === 1
        ? "Convergence of the case that drifted most"
        : `Convergence of the ${drawn} cases that drifted most`;
    out.push(
      "",
      `<details${comment ? "" : " open"}>`,
      `<summary>${title}</summary>`,
      "",
      MERMAID_CAPTION,
      ...charts,
      "",
      "</details>",
    );
  }

  if (others.length > 0 && changed.length > 0) {
    if (detail.otherRows > 0) {
      out.push(
        ...folded(
          `${plural(others.length, "case")} unchanged or equivalent`,
          table(others.slice(0, detail.otherRows)),
          others.length - detail.otherRows,
        ),
      );
    }
  } else if (others.length > 0 && detail.otherRows > 0) {
    out.push(
      ...folded(
        `All ${plural(others.length, "case")}`,
        table(others.slice(0, detail.otherRows)),
        others.length - detail.otherRows,
      ),
    );
  }

  out.push("", footer(v, input.links));
  return out.join("\n") + "\n";
}

function headline(v: VerdictDocument): string {
  const pass = v.gate?.verdict === "pass";
  return pass ? "### ✅ Convergence gate passed" : "### ❌ Convergence gate failed";
}

function countsLine(v: VerdictDocument): string {
  const counts = (v.counts ?? {}) as Record<string, unknown>;
  const parts: string[] = [];
  let total = 0;
  for (const verdict of CASE_VERDICTS) {
    const n = typeof counts[verdict] === "number" ? (counts[verdict] as number) : 0;
    total += n;
    if (n === 0) continue;
    const text = `${n} ${verdict}`;
    parts.push(verdict === "regressed" || verdict === "missing" ? `**${text}**` : text);
  }
  return `${parts.join(" · ") || "no cases"} — ${plural(total, "case")} compared with the baseline`;
}

const HEADER = [
  "| Case | Verdict | Drift (candidate ÷ baseline) | Reference checks |",
  "| --- | --- | --- | --- |",
];

function table(cases: readonly CaseComparison[]): string[] {
  return ["", ...HEADER, ...cases.map(row)];
}

function row(c: CaseComparison): string {
  const mark = VERDICT_MARK[c.verdict] ?? "";
  return `| ${mdCode(c.id)} | ${mark} ${mdText(c.verdict, 20)} | ${driftCell(c)} | ${checksCell(c)} |`;
}

function driftCell(c: CaseComparison): string {
  const parts: string[] = [];
  const lead = leadDrift(c);
  if (c.verdict === "new" || c.verdict === "missing" || lead === null) {
    const reason = c.reasons?.[0]?.message;
    if (reason) parts.push(mdText(reason, 140));
  } else {
    parts.push(mdText(`${metricLabel(lead)} ${driftText(lead)}`, 120));
    // The p-value behind the status: beyond the margin (adjusted) or within it (equivalence).
    if (
      (lead.status === "regressed" || lead.status === "improved") &&
      typeof lead.adjustedPValue === "number"
    ) {
      parts.push(`adj. p ${mdText(pValue(lead.adjustedPValue))}`);
    } else if (lead.status === "equivalent" && typeof lead.equivalencePValue === "number") {
      parts.push(`equivalence p ${mdText(pValue(lead.equivalencePValue))}`);
    }
  }
  const diverged = (c.diverged ?? []).length;
  if (diverged > 0) parts.push(`**${plural(diverged, "seed")} newly diverged**`);
  const recovered = (c.recovered ?? []).length;
  if (recovered > 0) parts.push(`${plural(recovered, "seed")} no longer diverge`);
  return parts.join("; ") || "—";
}

function checksCell(c: CaseComparison): string {
  const t = checkTally(c.checks);
  if (t.pass + t.fail + t.skipped === 0) return "—";
  if (t.fail === 0) return `✅ ${t.pass} passed${t.skipped ? `, ${t.skipped} skipped` : ""}`;
  const names = t.failed.slice(0, 3).map((x) => mdCode(x.id, 40));
  return `❌ ${t.fail} of ${t.pass + t.fail} failed: ${names.join(", ")}${t.failed.length > 3 ? ", …" : ""}`;
}

function folded(title: string, body: readonly string[], left: number): string[] {
  return [
    "",
    "<details>",
    `<summary>${title}</summary>`,
    ...body,
    ...(left > 0 ? ["", `_… and ${left} more, listed in the full report._`] : []),
    "",
    "</details>",
  ];
}

function footer(v: VerdictDocument, links: ReportLinks | undefined): string {
  const p = v.policy;
  const parts: string[] = [];
  if (p && typeof p === "object") {
    const margin = p.margin ?? ({} as Record<string, number>);
    parts.push(
      `margins ×${num(margin.stepsTo)} steps, ×${num(margin.finalGap)} final gap, ×${num(margin.evaluations)} evaluations; ` +
        `alpha ${num(p.alpha)}${p.correction ? `, ${mdText(p.correction, 30)} correction` : ""}${p.strict ? ", strict" : ""}`,
    );
  }
  const t = v.trajectory as Record<string, unknown> | undefined;
  if (t && typeof t === "object") {
    parts.push(
      `first iterates: ${num(t.identical)} identical, ${num(t["float-noise"])} float noise, ${num(t.changed)} changed`,
    );
  }
  if (v.rerun && Array.isArray(v.rerun.rerun))
    parts.push(`${plural(v.rerun.rerun.length, "case")} re-run with extra seeds`);
  const tool =
    v.tool && typeof v.tool === "object"
      ? `${mdText(v.tool.name, 30)} ${mdText(v.tool.version, 30)}`
      : "gradgate";
  parts.push(tool);
  const run = safeUrl(links?.run);
  if (run) {
    const artifact = links?.artifact ? ` (full report: artifact ${mdCode(links.artifact, 60)})` : "";
    parts.push(`[workflow run](${run})${artifact}`);
  }
  return `<sub>${parts.join(" · ")}</sub>`;
}

/** An http(s) URL that cannot break out of a Markdown link, or null. */
export function safeUrl(url: string | undefined): string | null {
  if (!url || !/^https?:\/\/[A-Za-z0-9.-]+(:\d+)?(\/[A-Za-z0-9._~!$&'*+,;=:@%/-]*)?$/.test(url)) return null;
  return url;
}
