/**
 * What every report shows, worked out once from the verdict document: the order cases are listed in
 * (worst news first), the drift that stands for a case, how far a case moved, and the convergence curves
 * of each side. Pure functions of plain data.
 */
import {
  CASE_VERDICTS,
  type CaseComparison,
  type CaseVerdict,
  type CheckResult,
  type MetricDrift,
  type VerdictDocument,
} from "../compare/types.js";
import type { CaseSpec, RunMetrics } from "../runner/types.js";

/** The runs of one case on one side: a results document's case, or a baseline file's case. */
export interface CaseRuns {
  readonly case: Pick<CaseSpec, "id" | "checkpoints">;
  readonly runs: readonly Pick<RunMetrics, "trace" | "stop">[];
}

/** Where the full report and the workflow run can be found (absolute URLs; omitted when unknown). */
export interface ReportLinks {
  /** The workflow run (its page lists the artifacts, including the HTML report). */
  readonly run?: string;
  /** Name of the artifact that holds the HTML report and the JSON documents. */
  readonly artifact?: string;
}

/** Everything a report is drawn from. Only `verdict` is required; charts need the runs. */
export interface ReportInput {
  readonly verdict: VerdictDocument;
  /** The candidate's cases (results document `cases`). */
  readonly candidate?: readonly CaseRuns[];
  /** The baseline's cases (baseline files' `cases`). */
  readonly baseline?: readonly CaseRuns[];
  readonly links?: ReportLinks;
  /** Notes from the entry point, shown under the headline (plain text, escaped when rendered). */
  readonly notes?: readonly string[];
}

const STATUS_RANK: Readonly<Record<string, number>> = {
  regressed: 0,
  improved: 1,
  inconclusive: 2,
  equivalent: 3,
  unchanged: 4,
  untested: 5,
};

/** Position of a verdict in CASE_VERDICTS (worst first); unknown verdicts go last. */
export function verdictRank(v: CaseVerdict): number {
  const i = CASE_VERDICTS.indexOf(v);
  return i < 0 ? CASE_VERDICTS.length : i;
}

function lnRatio(d: MetricDrift): number {
  return typeof d.ratio === "number" && d.ratio > 0 ? Math.abs(Math.log(d.ratio)) : 0;
}

/**
 * The drift that stands for a case in one table cell: the comparison's headline when it gives one, else
 * among the gating metrics the one with the most telling status (regressed, improved, inconclusive,
 * equivalent, unchanged), then the largest move.
 */
export function leadDrift(c: CaseComparison): MetricDrift | null {
  // The comparison names the figure to lead with (with its bootstrap interval) for changed cases.
  const h = c.headline;
  const named = h ? (c.drift ?? []).find((d) => d.metric === h.metric) : undefined;
  if (h && named)
    return {
      ...named,
      ratio: h.ratio,
      bound: h.bound,
      interval: h.interval ?? named.interval,
      status: h.status,
    };
  const pool = (c.drift ?? []).filter((d) => d.gating);
  const list = pool.length > 0 ? pool : (c.drift ?? []);
  let best: MetricDrift | null = null;
  for (const d of list) {
    if (best === null) best = d;
    else {
      const r = (STATUS_RANK[d.status] ?? 9) - (STATUS_RANK[best.status] ?? 9);
      if (r < 0 || (r === 0 && lnRatio(d) > lnRatio(best))) best = d;
    }
  }
  return best;
}

/** How far a case moved: the largest |ln ratio| over its gating metrics; ∞ when a seed newly diverged. */
export function driftScore(c: CaseComparison): number {
  if ((c.diverged ?? []).length > 0) return Infinity;
  let score = 0;
  for (const d of c.drift ?? []) if (d.gating) score = Math.max(score, lnRatio(d));
  return score;
}

/** Cases worst news first: by verdict (CASE_VERDICTS order), then by how far they moved, then by id. */
export function orderCases(cases: readonly CaseComparison[]): CaseComparison[] {
  return [...cases].sort(
    (a, b) =>
      verdictRank(a.verdict) - verdictRank(b.verdict) ||
      driftScore(b) - driftScore(a) ||
      (a.id < b.id ? -1 : a.id > b.id ? 1 : 0),
  );
}

/** True for the verdicts that need a reader's attention (everything but unchanged and equivalent). */
export function isChanged(c: CaseComparison): boolean {
  return c.verdict !== "unchanged" && c.verdict !== "equivalent";
}

/** Counts of reference checks by status, and the ones that failed. */
export function checkTally(checks: readonly CheckResult[] | undefined): {
  pass: number;
  fail: number;
  skipped: number;
  failed: CheckResult[];
} {
  const list = checks ?? [];
  const failed = list.filter((c) => c.status === "fail");
  return {
    pass: list.filter((c) => c.status === "pass").length,
    fail: failed.length,
    skipped: list.filter((c) => c.status === "skipped").length,
    failed,
  };
}

/**
 * The cases to draw, most drifted first: cases with candidate runs whose verdict is not unchanged, cases
 * that fail the gate before the others, then by drift score.
 */
export function chartCases(input: ReportInput, limit: number): CaseComparison[] {
  if (limit <= 0 || !input.candidate) return [];
  const have = new Set(input.candidate.map((c) => c.case.id));
  return [...input.verdict.cases]
    .filter((c) => c.verdict !== "unchanged" && have.has(c.id))
    .sort(
      (a, b) =>
        Number(b.failsGate) - Number(a.failsGate) ||
        driftScore(b) - driftScore(a) ||
        verdictRank(a.verdict) - verdictRank(b.verdict) ||
        (a.id < b.id ? -1 : a.id > b.id ? 1 : 0),
    )
    .slice(0, limit);
}

/** Median and spread of the gap across seeds at each checkpoint of one side of one case. */
export interface Curve {
  /** Steps of the checkpoints. */
  readonly steps: readonly number[];
  /** Per checkpoint: median, smallest and largest gap over the seeds (null: no run has a value there). */
  readonly median: readonly (number | null)[];
  readonly low: readonly (number | null)[];
  readonly high: readonly (number | null)[];
  /** Seeds drawn. */
  readonly seeds: number;
}

/**
 * The convergence curve of one side: per checkpoint, the median gap over the seeds and the smallest and
 * largest. A run that stopped at its target keeps its last gap (it is at least that close); a run that
 * diverged counts as +∞ from then on (so the median shows divergence once half the seeds diverged);
 * a run cut short by an error or the clock contributes nothing past its end.
 */
export function curveOf(side: CaseRuns): Curve {
  const steps = side.case.checkpoints ?? [];
  const median: (number | null)[] = [];
  const low: (number | null)[] = [];
  const high: (number | null)[] = [];
  const last = side.runs.map(() => null as number | null);
  for (let k = 0; k < steps.length; k++) {
    const values: number[] = [];
    side.runs.forEach((run, r) => {
      const v = run.trace?.[k];
      if (typeof v === "number") {
        last[r] = v;
        values.push(v);
      } else if (run.stop === "diverged") values.push(Infinity);
      else if (run.stop === "target" && last[r] !== null) values.push(last[r]!);
    });
    values.sort((a, b) => a - b);
    const n = values.length;
    median.push(n === 0 ? null : n % 2 ? values[n >> 1] : (values[n / 2 - 1] + values[n / 2]) / 2);
    low.push(n === 0 ? null : values[0]);
    high.push(n === 0 ? null : values[n - 1]);
  }
  return { steps, median, low, high, seeds: side.runs.length };
}

/** Both sides' curves of a case, when the runs are at hand. */
export function curvesFor(
  input: ReportInput,
  id: string,
): { candidate: Curve | null; baseline: Curve | null } {
  const find = (side: readonly CaseRuns[] | undefined) => side?.find((c) => c.case.id === id);
  const cand = find(input.candidate);
  const base = find(input.baseline);
  return { candidate: cand ? curveOf(cand) : null, baseline: base ? curveOf(base) : null };
}
