/**
 * Re-running inconclusive cases with extra seeds before deciding.
 *
 * A baseline keeps, besides the suite's seeds, `policy.extraSeeds.perCase` extra seeds per case
 * (`extraRuns`, written by `gradgate rebaseline`). When the first look leaves a case inconclusive, the
 * CLI runs the candidate on those same extra seed indices (same start points and noise: the pairing
 * stays seed by seed), within `policy.extraSeeds.maxRuns` runs per compare, and compares again with all
 * seeds. The policy fixes the number of looks before any data is seen, and each look uses alpha / looks,
 * so the chance of a false verdict over both looks stays ≤ alpha (Bonferroni).
 * Pure: `planExtraSeeds` says which seeds to run; `extraSeedSuite` turns that into a suite and item
 * list for src/runner/pool.ts runSuite.
 */
import type { BaselineFile } from "../baselines/types.js";
import type { AdapterContext, CaseResult, CaseSpec, RunMetrics, SuiteSpec } from "../runner/types.js";
import type { Policy } from "./policy.js";
import type { RerunSummary, VerdictDocument } from "./types.js";

export interface ExtraSeedPlan {
  /** Cases to re-run with these seed indices, in suite order. */
  readonly cases: readonly { readonly id: string; readonly seeds: readonly number[] }[];
  readonly runs: number;
  readonly requested: readonly string[];
  readonly skipped: readonly { readonly case: string; readonly why: string }[];
}

export function planExtraSeeds(
  verdict: VerdictDocument,
  baselines: ReadonlyMap<string, BaselineFile>,
  policy: Policy,
): ExtraSeedPlan {
  const { perCase, maxRuns } = policy.extraSeeds;
  const requested = verdict.cases.filter((c) => c.verdict === "inconclusive").map((c) => c.id);
  const cases: { id: string; seeds: number[] }[] = [];
  const skipped: { case: string; why: string }[] = [];
  if (perCase === 0 || maxRuns === 0) {
    for (const id of requested)
      skipped.push({ case: id, why: "extra seeds are turned off by the policy (extraSeeds)" });
    return { cases, runs: 0, requested, skipped };
  }
  const byId = new Map<string, readonly RunMetrics[]>();
  for (const file of baselines.values()) for (const c of file.cases) byId.set(c.case.id, c.extraRuns);
  let runs = 0;
  for (const id of requested) {
    const extra = byId.get(id) ?? [];
    if (extra.length === 0) {
      skipped.push({
        case: id,
        why: "the baseline holds no extra seeds for this case; rebaseline to add them",
      });
      continue;
    }
    const seeds = extra.slice(0, perCase).map((r) => r.seed);
    if (runs + seeds.length > maxRuns) {
      skipped.push({
        case: id,
        why: `the budget of ${maxRuns} extra runs (policy.extraSeeds.maxRuns) is used up`,
      });
      continue;
    }
    runs += seeds.length;
    cases.push({ id, seeds });
  }
  return { cases, runs, requested, skipped };
}

/**
 * The suite and item list that run exactly the planned seeds: each planned case with `seeds` raised to
 * cover its highest planned seed index (run seeds depend on the seed index only, not on `seeds`).
 * `adapters` reaches module and process optimizers (results do not record it: it comes from the config).
 */
export function extraSeedSuite(
  suiteSeed: number,
  specs: ReadonlyMap<string, CaseSpec>,
  plan: ExtraSeedPlan,
  adapters?: AdapterContext,
): { suite: SuiteSpec; items: number[] } {
  const cases: CaseSpec[] = [];
  const items: number[] = [];
  let offset = 0;
  for (const { id, seeds } of plan.cases) {
    const spec = specs.get(id);
    if (spec === undefined) throw new Error(`extraSeedSuite: no case ${id} in the candidate results`);
    const count = Math.max(spec.seeds, ...seeds.map((s) => s + 1));
    cases.push({ ...spec, seeds: count });
    for (const s of seeds) items.push(offset + s);
    offset += count;
  }
  return { suite: { seed: suiteSeed, cases, ...(adapters ? { adapters } : {}) }, items };
}

/** Extra runs by case id, from what runSuite returned for an extraSeedSuite. */
export function extraRunsById(results: readonly CaseResult[]): Map<string, RunMetrics[]> {
  return new Map(results.map((r) => [r.case.id, [...r.runs]]));
}

export function rerunSummary(plan: ExtraSeedPlan, budget: number): RerunSummary {
  return {
    requested: plan.requested,
    rerun: plan.cases.map((c) => c.id),
    runs: plan.runs,
    budget,
    skipped: plan.skipped,
  };
}
