/**
 * Builders of synthetic cases and runs for the comparison tests: plain objects with the shapes of
 * src/runner/types.ts, so verdict logic is tested on constructed paired samples with known answers.
 */
import { buildBaselineFiles } from "../../src/baselines/build.js";
import type { BaselineFile } from "../../src/baselines/types.js";
import type { ResultsDocument } from "../../src/runner/results.js";
import type { CaseResult, CaseSpec, RunMetrics } from "../../src/runner/types.js";

export const LADDER = [1e-1, 1e-2, 1e-3, 1e-4, 1e-6, 1e-8];
export const CHECKPOINTS = [0, 1, 2, 4, 8, 16, 32, 64, 128, 256, 512, 1000];
export const HASH = "sha256:" + "ab".repeat(32);

export function spec(over: Partial<CaseSpec> = {}): CaseSpec {
  const optimizer = over.optimizer ?? "adam";
  const set = over.set ?? "default";
  const problemKey = over.problemKey ?? "quadratic(n=4)";
  return {
    id: `${optimizer}/${set}/${problemKey}`,
    optimizer,
    use: `reference:${optimizer}`,
    set,
    hyper: { lr: 0.01 },
    problem: problemKey.replace(/\(.*$/, ""),
    problemKey,
    params: { n: 4 },
    dim: 4,
    fStar: 0,
    fStarKind: "published",
    budget: { steps: 1000, evaluations: 0, seconds: 30 },
    stopAt: 1e-12,
    ladder: LADDER,
    blowUp: 1e6,
    checkpoints: CHECKPOINTS,
    fingerprintSteps: 3,
    seeds: 5,
    measureEvery: 1,
    ...over,
  };
}

/** A healthy run reaching the ladder rungs at `stepsTo` (null = not reached), 1000-step budget. */
export function run(seed: number, over: Partial<RunMetrics> & { scale?: number } = {}): RunMetrics {
  const scale = over.scale ?? 1;
  const stepsTo = over.stepsTo ?? [10, 40, 90, 150, 300, 600].map((s) => Math.round(s * scale));
  const reachedAll = stepsTo.every((s) => s !== null);
  const steps = over.steps ?? (reachedAll ? Math.round(900 * scale) : 1000);
  const base: RunMetrics = {
    seed,
    runSeed: seed.toString(16).padStart(16, "0"),
    stop: reachedAll ? "target" : "steps",
    steps,
    evaluations: steps,
    f0: 10,
    finalGap: reachedAll ? 5e-12 : 1e-7,
    bestGap: reachedAll ? 5e-12 : 1e-7,
    stepsTo,
    evaluationsTo: stepsTo,
    divergedAt: null,
    divergence: null,
    rate: 0.97,
    trace: CHECKPOINTS.map((c) => 10 * Math.pow(0.97, c)),
    iterates: [
      [1, 2, 3, 4],
      [0.9, 1.8, 2.7, 3.6],
      [0.81, 1.62, 2.43, 3.24],
    ],
  };
  const out: Record<string, unknown> = { ...base, ...over };
  delete out.scale;
  return out as unknown as RunMetrics;
}

export function diverged(seed: number): RunMetrics {
  return run(seed, {
    stop: "diverged",
    steps: 12,
    finalGap: null,
    bestGap: 3,
    stepsTo: [null, null, null, null, null, null],
    evaluationsTo: [null, null, null, null, null, null],
    divergedAt: 12,
    divergence: "non-finite",
    rate: null,
  });
}

export function results(cases: CaseResult[]): ResultsDocument {
  return {
    format: "gradgate-results",
    version: 1,
    tool: { name: "gradgate", version: "0.1.0" },
    suite: { seed: 1, hash: HASH, cases: cases.length, runs: cases.reduce((n, c) => n + c.runs.length, 0) },
    environment: { node: "v20.0.0", platform: "linux", arch: "x64" },
    cases,
  };
}

/** Baselines from case results, with extra runs by case id. */
export function baselines(
  cases: CaseResult[],
  extra: Map<string, RunMetrics[]> = new Map(),
): Map<string, BaselineFile> {
  const files = buildBaselineFiles(
    results(cases),
    { commit: "0123abc", date: "2026-01-01T00:00:00.000Z", reason: "test" },
    extra,
  );
  return new Map(files.map((f) => [f.optimizer, f]));
}

/** Deterministic pseudo-random multipliers in [1 − w, 1 + w] (a small LCG; any fixed sequence will do). */
export function jitter(count: number, width: number, seed = 1): number[] {
  let s = seed >>> 0;
  const out: number[] = [];
  for (let i = 0; i < count; i++) {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    out.push(1 + width * (2 * (s / 2 ** 32) - 1));
  }
  return out;
}
