/**
 * The comparison: candidate results against baselines, seed by seed, into per-case verdicts and a gate
 * verdict (method and defaults: docs/decisions/0001-statistical-verdict.md). Pure: plain data in, the
 * verdict document out; re-running inconclusive cases with extra seeds is planned here (extra-seeds.ts)
 * and done by the CLI, which passes the extra runs back in.
 *
 * Per case:
 * 1. no baseline → new; baseline without candidate → missing; a different case definition → new;
 * 2. every paired run bitwise equal (all metrics, traces and iterates) → unchanged;
 * 3. a seed that diverged or failed where the baseline's did not → regressed, whatever else holds;
 * 4. per metric, on the paired log ratios d (samples.ts): Hodges–Lehmann estimate of the shift, a seeded
 *    bootstrap interval, the Wilcoxon signed-rank p-value for "no shift", a minimum-effect test for "the
 *    shift exceeds the margin" (Wilcoxon on d ∓ ln m, two-sided by doubling the smaller one-sided p),
 *    and the TOST p-value for "the shift lies within the margin";
 * 5. the minimum-effect p-values (and the reach sign tests) of every gating metric of every case form one
 *    family, corrected by Holm or Benjamini–Hochberg; a metric is regressed/improved when its adjusted p
 *    is ≤ alpha per look, else equivalent when TOST's p is ≤ alpha per look, else inconclusive;
 * 6. a case is regressed if any gating metric is, improved if one is and none regressed (or a seed stopped
 *    diverging), inconclusive if one is, else equivalent.
 * The gate fails on the policy's `failOn` verdicts (strict: everything but unchanged and equivalent), and
 * always on a new divergence.
 */
import { canonicalJson } from "../core/json.js";
import { Pcg32, fnv1a64, splitmix64 } from "../core/rng.js";
import { TOOL_NAME, TOOL_VERSION } from "../core/version.js";
import type { BaselineCase, BaselineFile } from "../baselines/types.js";
import type { Environment } from "../runner/results.js";
import type { CaseResult, CaseSpec, RunMetrics } from "../runner/types.js";
import { compareFingerprint } from "./fingerprint.js";
import { DEFAULT_POLICY, type Policy } from "./policy.js";
import { healthy, metricSamples, type MetricSample, type PairedRun } from "./samples.js";
import { exactSignTest } from "./sign-test.js";
import {
  benjaminiHochbergAdjust,
  bootstrapInterval,
  equivalenceSignedRank,
  hodgesLehmann,
  holmAdjust,
  wilcoxonSignedRank,
} from "./stats/index.js";
import {
  CASE_VERDICTS,
  VERDICT_FORMAT,
  VERDICT_VERSION,
  type CaseComparison,
  type CaseVerdict,
  type GateReason,
  type Headline,
  type MetricDrift,
  type MetricStatus,
  type RatioInterval,
  type Reason,
  type RerunSummary,
  type SeedEvent,
  type TrajectoryFingerprint,
  type VerdictDocument,
} from "./types.js";

/** The candidate side: a results document, or anything with its fields. */
export interface CandidateInput {
  readonly cases: readonly CaseResult[];
  readonly suite?: { readonly hash: string };
  readonly tool?: { readonly name: string; readonly version: string };
  readonly environment?: Environment;
  readonly shard?: { readonly index: number; readonly count: number };
}

export interface CompareOptions {
  readonly policy?: Policy;
  /** Candidate runs of extra seeds, by case id (paired with the baselines' `extraRuns`). */
  readonly extraRuns?: ReadonlyMap<string, readonly RunMetrics[]>;
  /** What the re-run did, to be recorded in the document. */
  readonly rerun?: RerunSummary;
}

/** Number of looks the policy allows: a second one when inconclusive cases may get extra seeds. */
export function looksOf(policy: Policy): number {
  return policy.extraSeeds.perCase > 0 && policy.extraSeeds.maxRuns > 0 ? 2 : 1;
}

interface MetricWork {
  readonly sample: MetricSample;
  readonly gating: boolean;
  readonly margin: number;
  estimate: number | null;
  interval: MetricDrift["interval"];
  pValue: number | null;
  marginPValue: number | null;
  direction: 1 | -1 | 0;
  equivalencePValue: number | null;
  method: "exact" | "normal" | null;
  reachP: number | null;
  adjusted: number | null;
  reachAdjusted: number | null;
}

interface CaseWork {
  readonly spec: CaseSpec;
  readonly verdict0: CaseVerdict | null;
  readonly reasons: Reason[];
  readonly pairs: readonly PairedRun[];
  readonly seeds: CaseComparison["seeds"];
  readonly diverged: SeedEvent[];
  readonly recovered: SeedEvent[];
  readonly metrics: MetricWork[];
  readonly fingerprint: TrajectoryFingerprint;
  readonly hyperChanges: CaseComparison["hyperChanges"];
}

const UNAVAILABLE: TrajectoryFingerprint = {
  status: "unavailable",
  tolerance: 0,
  seeds: 0,
  steps: 0,
  firstDifferentStep: null,
  fromStep: null,
  relativeAtStep: null,
  maxRelative: null,
  seedsChanged: 0,
};

export function compareResults(
  candidate: CandidateInput,
  baselines: ReadonlyMap<string, BaselineFile>,
  options: CompareOptions = {},
): VerdictDocument {
  const policy = options.policy ?? DEFAULT_POLICY;
  const looks = looksOf(policy);
  const alpha = policy.alpha / looks;
  const extra = options.extraRuns ?? new Map<string, readonly RunMetrics[]>();

  const baselineCases = new Map<string, BaselineCase>();
  for (const file of baselines.values()) for (const c of file.cases) baselineCases.set(c.case.id, c);

  const works: CaseWork[] = [];
  const seen = new Set<string>();
  for (const result of candidate.cases) {
    seen.add(result.case.id);
    works.push(
      prepareCase(result, baselineCases.get(result.case.id), extra.get(result.case.id) ?? [], policy, alpha),
    );
  }
  if (!candidate.shard) {
    for (const c of baselineCases.values()) {
      if (seen.has(c.case.id)) continue;
      works.push(
        emptyCase(c.case, "missing", {
          code: "no-candidate",
          message: `the candidate results have no case ${c.case.id}; run the whole suite, or rebaseline if the case was removed on purpose`,
        }),
      );
    }
  }

  adjust(works, policy);
  const cases = works.map((w) => decideCase(w, policy, alpha));

  const counts = Object.fromEntries(CASE_VERDICTS.map((v) => [v, 0])) as Record<CaseVerdict, number>;
  const trajectory = { identical: 0, "float-noise": 0, changed: 0, unavailable: 0 };
  for (const c of cases) {
    counts[c.verdict]++;
    trajectory[c.fingerprint.status]++;
  }
  const reasons: GateReason[] = cases
    .filter((c) => c.failsGate)
    .map((c) => ({
      code: "verdict" as const,
      case: c.id,
      message: `${c.id}: ${c.verdict} — ${headline(c)}`,
    }));

  const first = [...baselines.values()][0];
  return {
    format: VERDICT_FORMAT,
    version: VERDICT_VERSION,
    tool: { name: TOOL_NAME, version: TOOL_VERSION },
    policy,
    statistics: { looks, alphaPerLook: alpha },
    baseline: {
      suiteHash: first?.provenance.suite.hash ?? null,
      tool: first ? `${first.provenance.tool.name} ${first.provenance.tool.version}` : null,
      commits: Object.fromEntries([...baselines.values()].map((b) => [b.optimizer, b.provenance.commit])),
    },
    candidate: {
      suiteHash: candidate.suite?.hash ?? null,
      tool: candidate.tool ? `${candidate.tool.name} ${candidate.tool.version}` : null,
      ...(candidate.environment ? { environment: { ...candidate.environment } } : {}),
    },
    gate: { verdict: reasons.length > 0 ? "fail" : "pass", reasons, checks: [] },
    counts,
    trajectory,
    ...(options.rerun ? { rerun: options.rerun } : {}),
    cases,
  };
}

function emptyCase(spec: CaseSpec, verdict: CaseVerdict, reason: Reason, runs = 0): CaseWork {
  return {
    spec,
    verdict0: verdict,
    reasons: [reason],
    pairs: [],
    seeds: {
      paired: 0,
      baselineOnly: verdict === "missing" ? runs || spec.seeds : 0,
      candidateOnly: verdict === "new" ? runs : 0,
      extra: 0,
    },
    diverged: [],
    recovered: [],
    metrics: [],
    fingerprint: UNAVAILABLE,
    hyperChanges: [],
  };
}

/** The parts of a case that must agree for its runs to be comparable (those in the suite hash). */
function definitionKey(c: CaseSpec): string {
  // Canonical (sorted keys): a spec read back from a file and one built in memory must agree.
  return canonicalJson([
    c.problemKey,
    c.params,
    c.budget,
    c.stopAt,
    c.ladder,
    c.blowUp,
    c.checkpoints,
    c.fingerprintSteps,
    c.seeds,
    c.measureEvery,
    c.scenario ?? null,
  ]);
}

function describeDefinitionChange(b: CaseSpec, c: CaseSpec): string {
  const fields = [
    "params",
    "budget",
    "stopAt",
    "ladder",
    "blowUp",
    "checkpoints",
    "fingerprintSteps",
    "seeds",
    "measureEvery",
    "scenario",
  ] as const;
  const changed = fields.filter((f) => canonicalJson(b[f] ?? null) !== canonicalJson(c[f] ?? null));
  return changed
    .map((f) => `${f} ${JSON.stringify(b[f] ?? null)} → ${JSON.stringify(c[f] ?? null)}`)
    .join(", ");
}

function prepareCase(
  result: CaseResult,
  base: BaselineCase | undefined,
  extraRuns: readonly RunMetrics[],
  policy: Policy,
  alpha: number,
): CaseWork {
  const spec = result.case;
  if (base === undefined) {
    return emptyCase(
      spec,
      "new",
      { code: "no-baseline", message: "no baseline for this case; rebaseline to start tracking it" },
      result.runs.length,
    );
  }
  if (definitionKey(base.case) !== definitionKey(spec)) {
    return emptyCase(
      spec,
      "new",
      {
        code: "definition",
        message: `the case definition changed since the baseline (${describeDefinitionChange(base.case, spec)}); the runs are not comparable: rebaseline`,
      },
      result.runs.length,
    );
  }
  const reasons: Reason[] = [];
  const hyperChanges = diffHyper(base.case.hyper, spec.hyper);
  if (hyperChanges.length > 0) {
    reasons.push({
      code: "hyper",
      message: `hyperparameters differ from the baseline's: ${hyperChanges.map((h) => `${h.name} ${JSON.stringify(h.baseline)} → ${JSON.stringify(h.candidate)}`).join(", ")}`,
    });
  }

  // Pair seed by seed.
  const baseBySeed = new Map<number, RunMetrics>();
  for (const r of base.runs) baseBySeed.set(r.seed, r);
  const primary: PairedRun[] = [];
  let candidateOnly = 0;
  for (const r of result.runs) {
    const b = baseBySeed.get(r.seed);
    if (b === undefined) candidateOnly++;
    else primary.push({ seed: r.seed, base: b, cand: r });
  }
  const baselineOnly = base.runs.length - primary.length;
  const extraBase = new Map<number, RunMetrics>();
  for (const r of base.extraRuns) extraBase.set(r.seed, r);
  const extraPairs: PairedRun[] = [];
  for (const r of extraRuns) {
    const b = extraBase.get(r.seed);
    if (b !== undefined) extraPairs.push({ seed: r.seed, base: b, cand: r });
    else candidateOnly++;
  }
  if (baselineOnly + candidateOnly > 0) {
    reasons.push({
      code: "seeds",
      message: `${baselineOnly} seed(s) only in the baseline and ${candidateOnly} only in the candidate are left out`,
    });
  }
  const pairs = [...primary, ...extraPairs];
  const seeds = { paired: pairs.length, baselineOnly, candidateOnly, extra: extraPairs.length };
  const fingerprint = compareFingerprint(primary, policy.fingerprintTolerance);

  if (pairs.length > 0 && baselineOnly + candidateOnly === 0 && pairs.every((p) => sameRun(p.base, p.cand))) {
    return {
      spec,
      verdict0: "unchanged",
      reasons,
      pairs,
      seeds,
      diverged: [],
      recovered: [],
      metrics: [],
      fingerprint,
      hyperChanges,
    };
  }

  const diverged: SeedEvent[] = [];
  const recovered: SeedEvent[] = [];
  for (const p of pairs) {
    // Resume scenarios: a resumed run that retraced the uninterrupted one in the baseline must still do so.
    if (p.base.resume?.equal === true && p.cand.resume !== undefined && !p.cand.resume.equal) {
      reasons.push({
        code: "resume",
        seed: p.seed,
        message: `seed ${p.seed}: the resumed run no longer retraces the uninterrupted one (first difference at step ${p.cand.resume.firstDifference ?? "?"}); the baseline's did bit for bit`,
      });
    }
    const hb = healthy(p.base);
    const hc = healthy(p.cand);
    if (hb && !hc)
      diverged.push({ seed: p.seed, baseline: describeRun(p.base), candidate: describeRun(p.cand) });
    if (!hb && hc)
      recovered.push({ seed: p.seed, baseline: describeRun(p.base), candidate: describeRun(p.cand) });
  }

  const metrics = metricSamples(spec, pairs, policy.gapFloor).map((sample) => measure(sample, policy, alpha));
  return {
    spec,
    verdict0: null,
    reasons,
    pairs,
    seeds,
    diverged,
    recovered,
    metrics,
    fingerprint,
    hyperChanges,
  };
}

function diffHyper(a: CaseSpec["hyper"], b: CaseSpec["hyper"]): CaseComparison["hyperChanges"] {
  const names = [...new Set([...Object.keys(a), ...Object.keys(b)])].sort();
  return names
    .filter((n) => a[n] !== b[n])
    .map((n) => ({ name: n, baseline: a[n] ?? null, candidate: b[n] ?? null }));
}

function describeRun(r: RunMetrics): string {
  if (r.stop === "diverged") return `diverged (${r.divergence ?? "?"}) at step ${r.divergedAt ?? r.steps}`;
  if (r.stop === "error") return `failed: ${r.error ?? "error"}`;
  return r.stop === "target" ? `converged at step ${r.steps}` : `ran ${r.steps} steps (${r.stop} budget)`;
}

/** Field-by-field equality of two runs (=== on numbers, so −0 equals +0). */
export function sameRun(a: RunMetrics, b: RunMetrics): boolean {
  if (
    a.seed !== b.seed ||
    a.runSeed !== b.runSeed ||
    a.stop !== b.stop ||
    a.steps !== b.steps ||
    a.evaluations !== b.evaluations ||
    a.f0 !== b.f0 ||
    a.finalGap !== b.finalGap ||
    a.bestGap !== b.bestGap ||
    a.divergedAt !== b.divergedAt ||
    a.divergence !== b.divergence ||
    a.rate !== b.rate ||
    a.error !== b.error
  ) {
    return false;
  }
  if (
    !sameArray(a.stepsTo, b.stepsTo) ||
    !sameArray(a.evaluationsTo, b.evaluationsTo) ||
    !sameArray(a.trace, b.trace)
  ) {
    return false;
  }
  const ra = a.resume;
  const rb = b.resume;
  if (
    ra !== rb &&
    (ra === undefined ||
      rb === undefined ||
      ra.equal !== rb.equal ||
      ra.firstDifference !== rb.firstDifference)
  ) {
    return false;
  }
  const ia = a.iterates;
  const ib = b.iterates;
  if (ia === undefined || ib === undefined) return ia === ib;
  if (ia.length !== ib.length) return false;
  for (let i = 0; i < ia.length; i++) if (!sameArray(ia[i], ib[i])) return false;
  return true;
}

function sameArray(a: readonly (number | null)[], b: readonly (number | null)[]): boolean {
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return false;
  return true;
}

let shifted = new Float64Array(64);

function measure(sample: MetricSample, policy: Policy, alpha: number): MetricWork {
  const gating = policy.metrics.includes(sample.kind);
  const margin = policy.margin[sample.kind];
  const work: MetricWork = {
    sample,
    gating,
    margin,
    estimate: null,
    interval: null,
    pValue: null,
    marginPValue: null,
    direction: 0,
    equivalencePValue: null,
    method: null,
    reachP: null,
    adjusted: null,
    reachAdjusted: null,
  };
  const r = sample.reach;
  if (r !== undefined && r.lost + r.gained > 0) work.reachP = exactSignTest(r.lost, r.gained);
  const d = sample.d;
  const n = d.length;
  if (n === 0) return work;
  if (sample.ties === n) {
    work.estimate = 0;
    return work;
  }
  const delta = Math.log(margin);
  const hl = hodgesLehmann(d, { level: 1 - alpha });
  work.estimate = hl.estimate;
  work.interval = {
    low: Number.isFinite(hl.lower) ? Math.exp(hl.lower) : null,
    high: Number.isFinite(hl.upper) ? Math.exp(hl.upper) : null,
    level: 1 - alpha,
    method: "hodges-lehmann",
  };
  const two = wilcoxonSignedRank(d);
  work.pValue = two.pValue;
  work.method = two.method;
  if (shifted.length < n) shifted = new Float64Array(Math.max(n, 2 * shifted.length));
  const s = shifted.subarray(0, n);
  for (let i = 0; i < n; i++) s[i] = d[i] - delta;
  const up = wilcoxonSignedRank(s, { alternative: "greater" }).pValue;
  for (let i = 0; i < n; i++) s[i] = d[i] + delta;
  const down = wilcoxonSignedRank(s, { alternative: "less" }).pValue;
  work.direction = up < down ? 1 : down < up ? -1 : hl.estimate > 0 ? 1 : hl.estimate < 0 ? -1 : 0;
  work.marginPValue = Math.min(1, 2 * Math.min(up, down));
  work.equivalencePValue = equivalenceSignedRank(sample.dEquivalence, delta).pValue;
  return work;
}

/** The multiplicity correction across every gating test of every case. */
function adjust(works: CaseWork[], policy: Policy): void {
  const ps: number[] = [];
  const slots: { m: MetricWork; reach: boolean }[] = [];
  for (const w of works) {
    for (const m of w.metrics) {
      if (!m.gating) continue;
      if (m.marginPValue !== null) {
        ps.push(m.marginPValue);
        slots.push({ m, reach: false });
      }
      if (m.reachP !== null) {
        ps.push(m.reachP);
        slots.push({ m, reach: true });
      }
    }
  }
  const adjusted =
    policy.correction === "holm"
      ? holmAdjust(ps)
      : policy.correction === "benjamini-hochberg"
        ? benjaminiHochbergAdjust(ps)
        : Float64Array.from(ps);
  slots.forEach(({ m, reach }, i) => {
    if (reach) m.reachAdjusted = adjusted[i];
    else m.adjusted = adjusted[i];
  });
}

function statusOf(m: MetricWork, alpha: number): MetricStatus {
  const s = m.sample;
  const r = s.reach;
  const reachSignal =
    m.reachAdjusted !== null && m.reachAdjusted <= alpha && r !== undefined && r.lost !== r.gained;
  if (reachSignal && r!.lost > r!.gained) return "regressed";
  if (s.d.length === 0) return reachSignal ? "improved" : "untested";
  if (s.ties === s.d.length && s.censoredBaseline + s.censoredCandidate === 0) {
    return reachSignal ? "improved" : "unchanged";
  }
  if (m.adjusted !== null && m.adjusted <= alpha && m.direction !== 0)
    return m.direction > 0 ? "regressed" : "improved";
  if (reachSignal) return "improved";
  if (m.equivalencePValue !== null && m.equivalencePValue <= alpha) return "equivalent";
  return "inconclusive";
}

function decideCase(w: CaseWork, policy: Policy, alpha: number): CaseComparison {
  const reasons = [...w.reasons];
  const drift: MetricDrift[] = w.metrics.map((m) => toDrift(m, statusOf(m, alpha)));
  let verdict: CaseVerdict;
  if (w.verdict0 !== null) verdict = w.verdict0;
  else {
    for (const e of w.diverged) {
      reasons.push({
        code: "diverged",
        seed: e.seed,
        message: `seed ${e.seed} ${e.candidate}; the baseline ${e.baseline}`,
      });
    }
    for (const e of w.recovered) {
      reasons.push({
        code: "recovered",
        seed: e.seed,
        message: `seed ${e.seed} ${e.candidate}; the baseline ${e.baseline}`,
      });
    }
    const gating = drift.filter((d) => d.gating);
    for (const d of gating) {
      const reach = d.reach;
      if (
        (d.status === "regressed" || d.status === "improved") &&
        reach &&
        reach.lost !== reach.gained &&
        reach.pValue !== null
      ) {
        const m = w.metrics.find((x) => x.sample.metric === d.metric)!;
        if (m.reachAdjusted !== null && m.reachAdjusted <= alpha) {
          reasons.push({
            code: "reach",
            metric: d.metric,
            message: `${d.metric}: ${reach.lost} seed(s) no longer reach it, ${reach.gained} newly do (sign test, adjusted p = ${fmtP(m.reachAdjusted)})`,
          });
        }
      }
      if (
        (d.status === "regressed" || d.status === "improved") &&
        d.adjustedPValue !== null &&
        d.adjustedPValue <= alpha
      ) {
        reasons.push({
          code: "drift",
          metric: d.metric,
          message: `${d.metric} ${describeDrift(d)}, beyond the margin ×${d.margin} (adjusted p = ${fmtP(d.adjustedPValue)}, n = ${d.pairs})`,
        });
      }
    }
    const statuses = new Set(gating.map((d) => d.status));
    const resumeBroken = reasons.some((r) => r.code === "resume");
    if (w.diverged.length > 0 || resumeBroken || statuses.has("regressed")) verdict = "regressed";
    else if (statuses.has("improved") || w.recovered.length > 0) verdict = "improved";
    else if (statuses.has("inconclusive") || statuses.has("untested") || gating.length === 0) {
      verdict = "inconclusive";
      const open = gating.filter((d) => d.status === "inconclusive" || d.status === "untested");
      reasons.push({
        code: "inconclusive",
        message:
          gating.length === 0
            ? "no gating metric could be compared (every paired seed diverged or failed on both sides)"
            : `changed, neither shown beyond nor within the margins at alpha ${fmtP(alpha)}: ` +
              open.map((d) => `${d.metric} ${describeDrift(d)} (n = ${d.pairs})`).join("; "),
      });
    } else verdict = "equivalent";
  }
  const fp = w.fingerprint;
  if (
    verdict !== "new" &&
    verdict !== "missing" &&
    fp.status !== "unavailable" &&
    fp.status !== "identical"
  ) {
    const convergence = verdict === "unchanged" ? "metrics unchanged" : `convergence ${verdict}`;
    reasons.push({
      code: "trajectory",
      message:
        fp.status === "changed"
          ? `trajectory changed from step ${fp.fromStep} (relative ${fmtNum(fp.relativeAtStep)} > ${fp.tolerance}), ${convergence}`
          : `trajectory differs by float noise only (relative ≤ ${fmtNum(fp.maxRelative)}, tolerance ${fp.tolerance}), ${convergence}`,
    });
  }
  let failsGate = policy.strict
    ? verdict !== "unchanged" && verdict !== "equivalent"
    : (policy.failOn as readonly string[]).includes(verdict);
  if (w.diverged.length > 0) failsGate = true;
  if (policy.strict && failsGate) {
    reasons.push({ code: "strict", message: `strict policy: a ${verdict} case is a behaviour change` });
  }
  return {
    id: w.spec.id,
    optimizer: w.spec.optimizer,
    set: w.spec.set,
    problem: w.spec.problem,
    problemKey: w.spec.problemKey,
    verdict,
    failsGate,
    reasons,
    seeds: w.seeds,
    diverged: w.diverged,
    recovered: w.recovered,
    headline: headlineOf(w, drift, verdict, policy, alpha),
    drift,
    fingerprint: fp,
    hyperChanges: w.hyperChanges,
    checks: [],
  };
}

/**
 * The case's headline metric and its seeded bootstrap interval (one per changed case: the bootstrap
 * costs B evaluations, so it is spent where a reader looks; every metric has its Tukey interval).
 */
function headlineOf(
  w: CaseWork,
  drift: readonly MetricDrift[],
  verdict: CaseVerdict,
  policy: Policy,
  alpha: number,
): Headline | null {
  if (verdict === "unchanged" || verdict === "new" || verdict === "missing") return null;
  const want: MetricStatus[] =
    verdict === "regressed"
      ? ["regressed"]
      : verdict === "improved"
        ? ["improved"]
        : verdict === "inconclusive"
          ? ["inconclusive", "untested"]
          : ["equivalent"];
  let best = -1;
  let bestSize = -1;
  drift.forEach((d, i) => {
    if (!d.gating || !want.includes(d.status) || d.ratio === null) return;
    const size = Math.abs(Math.log(d.ratio));
    if (size > bestSize) {
      best = i;
      bestSize = size;
    }
  });
  if (best < 0) return null;
  const d = drift[best];
  const sample = w.metrics[best].sample.d;
  let interval: RatioInterval | null = null;
  if (sample.length >= 2) {
    const rng = new Pcg32(
      splitmix64(BigInt(policy.bootstrap.seed)) ^ fnv1a64(`${w.spec.id}|${d.metric}`),
      0x67n,
    );
    const options = { rng, resamples: policy.bootstrap.resamples, level: 1 - alpha };
    let b = bootstrapInterval(sample, options);
    if (!b.valid) b = bootstrapInterval(sample, { ...options, method: "percentile" });
    interval = {
      low: Math.exp(b.lower),
      high: Math.exp(b.upper),
      level: 1 - alpha,
      method: b.method === "bca" ? "bootstrap-bca" : "bootstrap-percentile",
      resamples: b.resamples,
    };
  }
  return { metric: d.metric, ratio: d.ratio!, bound: d.bound, interval, status: d.status };
}

function toDrift(m: MetricWork, status: MetricStatus): MetricDrift {
  const s = m.sample;
  const bound =
    s.censoredCandidate > 0 && s.censoredBaseline === 0
      ? "at-least"
      : s.censoredBaseline > 0 && s.censoredCandidate === 0
        ? "at-most"
        : "none";
  return {
    metric: s.metric,
    kind: s.kind,
    rung: s.rung,
    gating: m.gating,
    status,
    pairs: s.d.length,
    ties: s.ties,
    censored: { baseline: s.censoredBaseline, candidate: s.censoredCandidate },
    bound,
    ratio: m.estimate === null ? null : Math.exp(m.estimate),
    interval: m.interval,
    pValue: m.pValue,
    marginPValue: m.marginPValue,
    adjustedPValue: m.adjusted,
    equivalencePValue: m.equivalencePValue,
    margin: m.margin,
    method: m.method,
    ...(s.reach ? { reach: { ...s.reach, pValue: m.reachP } } : {}),
  };
}

/** "×1.32 [1.20, 1.45]" (with "≥"/"≤" when censored pairs make it a bound). */
export function describeDrift(d: MetricDrift): string {
  if (d.ratio === null) return "(no pairs)";
  const sign = d.bound === "at-least" ? "≥" : d.bound === "at-most" ? "≤" : "";
  const ci = d.interval
    ? ` [${d.interval.low === null ? "0" : fmtNum(d.interval.low)}, ${d.interval.high === null ? "∞" : fmtNum(d.interval.high)}]`
    : "";
  return `${sign}×${fmtNum(d.ratio)}${ci}`;
}

/** "stepsTo(1e-3) ×1.32 [1.20, 1.45]" for a case's headline (bootstrap interval). */
export function describeHeadline(h: Headline): string {
  const sign = h.bound === "at-least" ? "≥" : h.bound === "at-most" ? "≤" : "";
  const i = h.interval;
  const ci = i ? ` [${i.low === null ? "0" : fmtNum(i.low)}, ${i.high === null ? "∞" : fmtNum(i.high)}]` : "";
  return `${h.metric} ${sign}×${fmtNum(h.ratio)}${ci}`;
}

/** One line on why a case got its verdict, for the gate's reasons. */
function headline(c: CaseComparison): string {
  const decisive = c.reasons.filter(
    (r) => r.code !== "trajectory" && r.code !== "hyper" && r.code !== "seeds",
  );
  const shown = decisive.length > 0 ? decisive : c.reasons;
  const more = shown.length > 3 ? ` (and ${shown.length - 3} more: see the case)` : "";
  const text = shown
    .slice(0, 3)
    .map((r) => r.message)
    .join("; ");
  return text ? text + more : c.verdict;
}

function fmtNum(x: number | null): string {
  if (x === null) return "—";
  if (x === 0) return "0";
  const a = Math.abs(x);
  return a >= 0.001 && a < 1e4 ? String(Number(x.toPrecision(3))) : Number(x.toPrecision(3)).toExponential();
}

function fmtP(p: number): string {
  return p >= 0.001 ? String(Number(p.toPrecision(2))) : p.toExponential(1);
}
