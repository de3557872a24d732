/**
 * The verdict document: what `gradgate compare` writes as JSON (and what the Markdown/HTML reports and the
 * Action render). Plain data, canonical JSON, no wall time: the same results, baselines and policy always
 * give the same bytes.
 *
 * Words (DESIGN.md): a *case* gets a verdict — unchanged (every metric bitwise equal), equivalent (shown to
 * lie within the practical margins), improved, regressed, inconclusive (changed, but neither shown to
 * exceed the margins nor to lie within them), new (no comparable baseline), missing (baseline without
 * candidate). The *gate* passes or fails, with its reasons. *Drift* is the candidate's change against the
 * baseline as a ratio (candidate / baseline, so > 1 means larger: slower, a larger final gap, more
 * evaluations — worse for every gating metric) with a confidence interval.
 *
 * Reference checks (known minimum reached, theoretical rate, conformance to a published update rule) are
 * judged beside the baseline drift: each case and the gate carry a `checks` list for them.
 */
import type { Policy } from "./policy.js";

export const VERDICT_FORMAT = "gradgate-verdict";
export const VERDICT_VERSION = 1;

/** Verdict of one case. */
export type CaseVerdict =
  "unchanged" | "equivalent" | "improved" | "regressed" | "inconclusive" | "new" | "missing";

/** Every case verdict, in the order reports list them (worst news first). */
export const CASE_VERDICTS: readonly CaseVerdict[] = [
  "regressed",
  "missing",
  "inconclusive",
  "improved",
  "new",
  "equivalent",
  "unchanged",
];

/** Verdict of the gate. */
export type GateVerdict = "pass" | "fail";

/** The kinds of gating metric (all three are "lower is better"). */
export type MetricKind = "stepsTo" | "finalGap" | "evaluations";

export const METRIC_KINDS: readonly MetricKind[] = ["stepsTo", "finalGap", "evaluations"];

/**
 * Outcome for one metric of one case:
 * - unchanged: equal in every paired seed (within the metric's resolution: see `MetricDrift.ties`);
 * - equivalent: the paired shift is shown to lie inside the margin (TOST);
 * - improved / regressed: the shift is shown to exceed the margin in that direction (after the
 *   multiplicity correction across cases);
 * - inconclusive: none of the above at the policy's alpha;
 * - untested: too few paired seeds to say anything (see `pairs`).
 */
export type MetricStatus =
  "unchanged" | "equivalent" | "improved" | "regressed" | "inconclusive" | "untested";

/** A two-sided confidence interval for a drift ratio. */
export interface RatioInterval {
  /** Lower bound; null when the interval is unbounded below (too few seeds to reach the level). */
  readonly low: number | null;
  /** Upper bound; null when unbounded above. */
  readonly high: number | null;
  /** Confidence level, e.g. 0.975 (1 − alpha per look). */
  readonly level: number;
  /**
   * "hodges-lehmann": Tukey's distribution-free interval of the Hodges–Lehmann shift (the Walsh averages
   * at the signed-rank critical ranks: the inversion of the test the verdict uses);
   * "bootstrap-bca" / "bootstrap-percentile": seeded bootstrap of the Hodges–Lehmann estimate over the
   * seeds (BCa; the percentile interval where BCa is undefined).
   */
  readonly method: "hodges-lehmann" | "bootstrap-bca" | "bootstrap-percentile";
  /** Bootstrap resamples (bootstrap methods only). */
  readonly resamples?: number;
}

/**
 * The one figure a report leads with for a changed case: its most telling gating metric (the largest
 * decisive shift for regressed/improved, the largest open shift for inconclusive, the one nearest its
 * margin for equivalent), with a seeded bootstrap interval.
 */
export interface Headline {
  readonly metric: string;
  readonly ratio: number;
  readonly bound: "none" | "at-least" | "at-most";
  /** Bootstrap interval; null with fewer than two paired values. */
  readonly interval: RatioInterval | null;
  readonly status: MetricStatus;
}

/**
 * Counts of the runs that reached one ladder rung, paired by seed (stepsTo metrics only). A change in
 * these counts is a signal of its own: `lost` seeds reached the rung in the baseline but not in the
 * candidate, `gained` the reverse; `pValue` is the exact two-sided sign test on the lost/gained pairs
 * (McNemar's test in its exact binomial form), null when no seed changed.
 */
export interface ReachCounts {
  readonly baseline: number;
  readonly candidate: number;
  readonly lost: number;
  readonly gained: number;
  readonly pValue: number | null;
}

/** Drift of one gating metric of one case. */
export interface MetricDrift {
  /** "stepsTo(1e-3)", "finalGap" or "evaluations". */
  readonly metric: string;
  readonly kind: MetricKind;
  /** The ladder rung (relative gap tolerance) for stepsTo metrics, else null. */
  readonly rung: number | null;
  /** Whether the policy gates on this metric (non-gating metrics are reported, never decisive). */
  readonly gating: boolean;
  readonly status: MetricStatus;
  /** Seeds that entered the statistics (both sides have a value, censored ones included). */
  readonly pairs: number;
  /** Pairs whose values agree within the metric's resolution (a zero difference for the rank tests). */
  readonly ties: number;
  /**
   * Pairs where one side did not reach the rung within its budget: the run's step (or evaluation) count
   * plus one stands in as a bound, which makes the estimate a bound too (see `bound`).
   */
  readonly censored: { readonly baseline: number; readonly candidate: number };
  /** "at-least" / "at-most" when censored pairs make `ratio` a bound; "none" otherwise. */
  readonly bound: "none" | "at-least" | "at-most";
  /** Hodges–Lehmann estimate of the paired shift of ln values, as a ratio candidate / baseline. */
  readonly ratio: number | null;
  /** Tukey's Hodges–Lehmann interval of the ratio at 1 − alpha per look (null with no changed pair). */
  readonly interval: RatioInterval | null;
  /** Wilcoxon signed-rank p-value (two-sided) for "no shift". */
  readonly pValue: number | null;
  /** Minimum-effect test: p-value for "the shift exceeds the margin" in the direction of the estimate. */
  readonly marginPValue: number | null;
  /** `marginPValue` after the multiplicity correction across cases. */
  readonly adjustedPValue: number | null;
  /** Nonparametric TOST p-value for "the shift lies within the margin" (the larger one-sided p). */
  readonly equivalencePValue: number | null;
  /** The practical margin as a ratio m > 1: the equivalence band is [1/m, m]. */
  readonly margin: number;
  /** How the p-values were computed: "exact" null distribution or "normal" approximation. */
  readonly method: "exact" | "normal" | null;
  /** Present for stepsTo metrics. */
  readonly reach?: ReachCounts;
}

/**
 * Whether the arithmetic itself changed, from the first iterates (RunMetrics.iterates) of paired seeds.
 * Differences are relative and norm-wise: ‖x_c − x_b‖∞ / max(‖x_c‖∞, ‖x_b‖∞) at each step.
 */
export interface TrajectoryFingerprint {
  /**
   * identical: bitwise equal in every seed (−0 and +0 count as equal: JSON does not keep the sign of zero);
   * float-noise: different bits, every relative difference ≤ `tolerance`;
   * changed: some relative difference exceeds `tolerance` (from `fromStep` on);
   * unavailable: no iterates kept (dimension above the fingerprint limit) or nothing paired.
   */
  readonly status: "identical" | "float-noise" | "changed" | "unavailable";
  /** The relative tolerance separating float noise from a change. */
  readonly tolerance: number;
  /** Seeds and steps compared. */
  readonly seeds: number;
  readonly steps: number;
  /** First step (1-based) whose iterate is not bitwise equal, over all seeds; null when identical. */
  readonly firstDifferentStep: number | null;
  /** First step whose relative difference exceeds the tolerance, over all seeds; null unless changed. */
  readonly fromStep: number | null;
  /** Largest relative difference at `fromStep` over the seeds; null unless changed. */
  readonly relativeAtStep: number | null;
  /** Largest relative difference over every compared step and seed; null when nothing compared. */
  readonly maxRelative: number | null;
  /** Seeds whose iterates differ beyond the tolerance. */
  readonly seedsChanged: number;
}

/** A seed whose run diverged or failed on one side only. */
export interface SeedEvent {
  readonly seed: number;
  /** "diverged (non-finite) at step 12", "error: step 3 threw: ...", "converged", "stopped (steps)". */
  readonly baseline: string;
  readonly candidate: string;
}

/**
 * A reference check's outcome (filled in by the reference checks, beside the baseline drift). The
 * `source` names the paper with table or theorem, or the reference library call with its version.
 */
export interface CheckResult {
  /** Stable identifier, e.g. "known-minimum", "rate", "conformance:adam-first-step". */
  readonly id: string;
  readonly status: "pass" | "fail" | "skipped";
  /** Whether a failure fails the gate. */
  readonly gating: boolean;
  /** One line for people. */
  readonly summary: string;
  readonly source: string;
  readonly measured?: number | null;
  readonly expected?: number | null;
  readonly tolerance?: { readonly kind: "absolute" | "relative" | "ulps"; readonly value: number };
}

/** Machine-readable cause of a verdict, with its sentence for people. */
export type ReasonCode =
  | "diverged" // a seed diverged or failed where the baseline did not
  | "recovered" // a seed no longer diverges or fails
  | "resume" // a resumed run no longer retraces the uninterrupted one where the baseline's did
  | "drift" // a gating metric moved beyond its margin
  | "reach" // the count of seeds reaching a rung changed
  | "inconclusive" // changed, not shown beyond nor within the margins
  | "trajectory" // the first iterates changed (informational)
  | "hyper" // hyperparameters differ from the baseline's
  | "definition" // the case's definition (budget, ladder, ...) differs from the baseline's
  | "no-baseline" // no baseline for this case
  | "no-candidate" // the candidate results lack this case
  | "seeds" // seeds present on one side only
  | "check" // a reference check failed
  | "strict"; // the strict policy fails every non-equivalent change

export interface Reason {
  readonly code: ReasonCode;
  readonly message: string;
  /** The metric concerned, e.g. "stepsTo(1e-3)". */
  readonly metric?: string;
  /** The seed concerned. */
  readonly seed?: number;
}

/** The comparison of one case. */
export interface CaseComparison {
  /** `optimizer/set/problemKey`. */
  readonly id: string;
  readonly optimizer: string;
  readonly set: string;
  readonly problem: string;
  readonly problemKey: string;
  readonly verdict: CaseVerdict;
  /** Whether this case counts against the gate under the policy. */
  readonly failsGate: boolean;
  readonly reasons: readonly Reason[];
  /** Seeds paired, and seeds present on one side only (ignored by the statistics). */
  readonly seeds: {
    readonly paired: number;
    readonly baselineOnly: number;
    readonly candidateOnly: number;
    /** Of the paired seeds, how many came from a re-run with extra seeds. */
    readonly extra: number;
  };
  /** Seeds that newly diverged or failed (always a regression) and seeds that recovered. */
  readonly diverged: readonly SeedEvent[];
  readonly recovered: readonly SeedEvent[];
  /** The figure to lead with (changed cases only). */
  readonly headline: Headline | null;
  /** One entry per metric (gating or not), in a stable order: stepsTo rungs, finalGap, evaluations. */
  readonly drift: readonly MetricDrift[];
  readonly fingerprint: TrajectoryFingerprint;
  /** Hyperparameters whose values differ from the baseline's. */
  readonly hyperChanges: readonly {
    readonly name: string;
    readonly baseline: unknown;
    readonly candidate: unknown;
  }[];
  /** Reference checks of this case (empty until they run). */
  readonly checks: readonly CheckResult[];
}

export type VerdictCounts = Readonly<Record<CaseVerdict, number>>;

/** Why the gate failed (or what it noticed). */
export interface GateReason {
  readonly code: ReasonCode | "verdict";
  readonly message: string;
  /** The case concerned, when there is one. */
  readonly case?: string;
}

export interface GateResult {
  readonly verdict: GateVerdict;
  /** Every reason the gate failed; empty when it passed. */
  readonly reasons: readonly GateReason[];
  /** Reference checks at suite level (empty until they run). */
  readonly checks: readonly CheckResult[];
}

/** Re-runs of inconclusive cases with extra seeds (see docs/decisions/0001-statistical-verdict.md). */
export interface RerunSummary {
  /** Cases that were inconclusive after the first look. */
  readonly requested: readonly string[];
  /** Cases re-run with extra seeds. */
  readonly rerun: readonly string[];
  /** Extra runs made, and the budget they came out of. */
  readonly runs: number;
  readonly budget: number;
  /** Why some requested cases were not re-run (budget used up, no extra seeds in the baseline). */
  readonly skipped: readonly { readonly case: string; readonly why: string }[];
}

/** Where each side came from. */
export interface SideInfo {
  readonly suiteHash: string | null;
  readonly tool: string | null;
  /** Baseline side: commit of each optimizer's baseline file, by optimizer. */
  readonly commits?: Readonly<Record<string, string>>;
  readonly environment?: Readonly<Record<string, string>>;
}

/** The whole verdict document. */
export interface VerdictDocument {
  readonly format: typeof VERDICT_FORMAT;
  readonly version: number;
  readonly tool: { readonly name: string; readonly version: string };
  /** The policy as resolved (defaults filled in). */
  readonly policy: Policy;
  /**
   * Looks at the data the policy allows (2 when inconclusive cases may be re-run with extra seeds, else 1)
   * and the significance level of each look, alpha / looks (Bonferroni over the looks).
   */
  readonly statistics: { readonly looks: number; readonly alphaPerLook: number };
  readonly baseline: SideInfo;
  readonly candidate: SideInfo;
  readonly gate: GateResult;
  readonly counts: VerdictCounts;
  /** How many cases' first iterates were identical / float noise / changed / unavailable. */
  readonly trajectory: Readonly<Record<TrajectoryFingerprint["status"], number>>;
  /** Present when inconclusive cases were re-run with extra seeds. */
  readonly rerun?: RerunSummary;
  readonly cases: readonly CaseComparison[];
}
