/**
 * Hand-made verdict documents and runs for the report tests, typed with src/compare/types.ts. The data
 * are invented: a fictional optimizer library ("lumen") whose Adam variant got slower on Rosenbrock after
 * a change; nothing here was measured.
 */
import { DEFAULT_POLICY } from "../../src/compare/policy.js";
import {
  CASE_VERDICTS,
  type CaseComparison,
  type CaseVerdict,
  type CheckResult,
  type MetricDrift,
  type VerdictDocument,
} from "../../src/compare/types.js";
import type { CaseRuns } from "../../src/report/model.js";

export function drift(over: Partial<MetricDrift> = {}): MetricDrift {
  return {
    metric: "stepsTo(1e-3)",
    kind: "stepsTo",
    rung: 1e-3,
    gating: true,
    status: "equivalent",
    pairs: 8,
    ties: 0,
    censored: { baseline: 0, candidate: 0 },
    bound: "none",
    ratio: 1.01,
    interval: { low: 0.98, high: 1.04, level: 0.95, method: "hodges-lehmann" },
    pValue: 0.4,
    marginPValue: 0.9,
    adjustedPValue: 1,
    equivalencePValue: 0.01,
    margin: 1.1,
    method: "exact",
    ...over,
  };
}

export function check(over: Partial<CheckResult> = {}): CheckResult {
  return {
    id: "known-minimum",
    status: "pass",
    gating: true,
    summary: "reached f* within 1e-8 (absolute)",
    source: "Moré, Garbow & Hillstrom 1981, problem 1",
    ...over,
  };
}

export function caseOf(id: string, verdict: CaseVerdict, over: Partial<CaseComparison> = {}): CaseComparison {
  const [optimizer, set, problemKey] = id.split("/");
  return {
    id,
    optimizer: optimizer ?? id,
    set: set ?? "default",
    problem: (problemKey ?? "").replace(/\(.*$/, ""),
    problemKey: problemKey ?? "",
    verdict,
    failsGate: verdict === "regressed" || verdict === "missing",
    reasons: [],
    seeds: { paired: 8, baselineOnly: 0, candidateOnly: 0, extra: 0 },
    diverged: [],
    recovered: [],
    drift: [
      drift({
        status: verdict === "unchanged" ? "unchanged" : "equivalent",
        ratio: verdict === "unchanged" ? 1 : 1.01,
      }),
    ],
    fingerprint: {
      status: verdict === "unchanged" ? "identical" : "changed",
      tolerance: 1e-12,
      seeds: 8,
      steps: 20,
      firstDifferentStep: verdict === "unchanged" ? null : 3,
      fromStep: verdict === "unchanged" ? null : 3,
      relativeAtStep: verdict === "unchanged" ? null : 1e-6,
      maxRelative: verdict === "unchanged" ? 0 : 1e-3,
      seedsChanged: verdict === "unchanged" ? 0 : 8,
    },
    headline: null,
    hyperChanges: [],
    checks: [],
    ...over,
  };
}

/** A verdict document around `cases`, with counts and the gate worked out from them. */
export function verdictOf(
  cases: readonly CaseComparison[],
  over: Partial<VerdictDocument> = {},
): VerdictDocument {
  const counts = Object.fromEntries(CASE_VERDICTS.map((v) => [v, 0])) as Record<CaseVerdict, number>;
  const trajectory = { identical: 0, "float-noise": 0, changed: 0, unavailable: 0 };
  for (const c of cases) {
    counts[c.verdict]++;
    trajectory[c.fingerprint.status]++;
  }
  const failing = cases.filter((c) => c.failsGate);
  return {
    format: "gradgate-verdict",
    version: 1,
    tool: { name: "gradgate", version: "0.1.0" },
    policy: DEFAULT_POLICY,
    statistics: { looks: 2, alphaPerLook: 0.025 },
    baseline: { suiteHash: "sha256:1111", tool: "gradgate 0.1.0" },
    candidate: { suiteHash: "sha256:1111", tool: "gradgate 0.1.0" },
    gate: {
      verdict: failing.length > 0 ? "fail" : "pass",
      reasons: failing.map((c) => ({
        code: "verdict" as const,
        case: c.id,
        message: `${c.id}: ${c.verdict}`,
      })),
      checks: [],
    },
    counts,
    trajectory,
    cases,
    ...over,
  };
}

/** The lumen scenario: one regression, one improvement, one inconclusive, the rest quiet. */
export function lumenVerdict(): VerdictDocument {
  return verdictOf([
    caseOf("lumen-adam/default/rosenbrock", "regressed", {
      reasons: [
        {
          code: "drift",
          metric: "stepsTo(1e-3)",
          message: "stepsTo(1e-3) ×1.46 [1.31, 1.62], beyond the margin ×1.1 (adjusted p = 0.0039, n = 8)",
        },
      ],
      drift: [
        drift({
          status: "regressed",
          ratio: 1.46,
          interval: { low: 1.31, high: 1.62, level: 0.95, method: "hodges-lehmann" },
          adjustedPValue: 0.0039,
        }),
        drift({
          metric: "finalGap",
          kind: "finalGap",
          rung: null,
          status: "inconclusive",
          ratio: 1.8,
          margin: 2,
        }),
      ],
      checks: [
        check(),
        check({ id: "rate", status: "fail", summary: "fitted rate 0.9991, expected ≤ 0.999" }),
      ],
    }),
    caseOf("lumen-sgd/default/quadratic(kappa=100)", "improved", {
      drift: [
        drift({
          status: "improved",
          ratio: 0.71,
          interval: { low: 0.66, high: 0.77, level: 0.95, method: "hodges-lehmann" },
          adjustedPValue: 0.002,
        }),
      ],
    }),
    caseOf("lumen-adam/default/beale", "inconclusive", {
      drift: [
        drift({
          status: "inconclusive",
          ratio: 1.09,
          interval: { low: 0.97, high: 1.22, level: 0.95, method: "hodges-lehmann" },
        }),
      ],
    }),
    caseOf("lumen-adam/default/quadratic(kappa=100)", "equivalent"),
    caseOf("lumen-sgd/default/rosenbrock", "unchanged"),
    caseOf("lumen-sgd/default/beale", "unchanged"),
  ]);
}

/** Checkpoints like the runner's for a 1000-step budget. */
export const CHECKPOINTS = [0, 1, 2, 3, 5, 8, 13, 21, 35, 57, 94, 155, 256, 422, 696, 1000];

/**
 * Runs whose gap falls geometrically: gap_k = g0 · rate^k, with the rate spread a little over the seeds.
 * Invented numbers for drawing, not measured.
 */
export function geometricRuns(id: string, rate: number, seeds = 5, g0 = 24.2): CaseRuns {
  return {
    case: { id, checkpoints: CHECKPOINTS },
    runs: Array.from({ length: seeds }, (_, s) => {
      const r = rate * (1 + (s - (seeds - 1) / 2) * 0.0004);
      return { stop: "steps" as const, trace: CHECKPOINTS.map((k) => g0 * r ** k) };
    }),
  };
}
