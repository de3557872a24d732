/**
 * The baseline JSON Schema agrees with the TypeScript types (field lists checked at compile time and
 * at run time) and with what the real runner produces; the shipped file in schema/ is generated from it.
 */
import { describe, expect, it } from "vitest";
import { buildBaselineFiles } from "../../src/baselines/build.js";
import { baselineSchema, CASE_SPEC_FIELDS, RUN_FIELDS } from "../../src/baselines/schema.js";
import type { BaselineFile, Provenance } from "../../src/baselines/types.js";
import { parseBaseline } from "../../src/baselines/validate.js";
import { parseConfig } from "../../src/config/load.js";
import { canonicalJson } from "../../src/core/json.js";
import { runSuite } from "../../src/runner/pool.js";
import { buildResults } from "../../src/runner/results.js";
import { resolveSuite } from "../../src/runner/suite.js";
import type { CaseSpec, RunMetrics } from "../../src/runner/types.js";

// A key missing here, or one the type does not have, is a compile error (tsc --noEmit).
const RUN_KEYS: Record<keyof RunMetrics, true> = {
  seed: true,
  runSeed: true,
  stop: true,
  steps: true,
  evaluations: true,
  f0: true,
  finalGap: true,
  bestGap: true,
  stepsTo: true,
  evaluationsTo: true,
  divergedAt: true,
  divergence: true,
  rate: true,
  trace: true,
  iterates: true,
  error: true,
  resume: true,
};
const CASE_KEYS: Record<keyof CaseSpec, true> = {
  id: true,
  optimizer: true,
  use: true,
  set: true,
  hyper: true,
  problem: true,
  problemKey: true,
  params: true,
  dim: true,
  fStar: true,
  fStarKind: true,
  budget: true,
  stopAt: true,
  ladder: true,
  blowUp: true,
  checkpoints: true,
  fingerprintSteps: true,
  seeds: true,
  measureEvery: true,
  scenario: true,
};
const FILE_KEYS: Record<keyof BaselineFile, true> = {
  format: true,
  version: true,
  optimizer: true,
  provenance: true,
  cases: true,
  digest: true,
};
const PROVENANCE_KEYS: Record<keyof Provenance, true> = {
  commit: true,
  date: true,
  reason: true,
  tool: true,
  suite: true,
  environment: true,
};

const sorted = (a: readonly string[]) => [...a].sort();

describe("baseline schema", () => {
  it("names exactly the fields of the TypeScript types", () => {
    expect(sorted(RUN_FIELDS)).toEqual(sorted(Object.keys(RUN_KEYS)));
    expect(sorted(CASE_SPEC_FIELDS)).toEqual(sorted(Object.keys(CASE_KEYS)));
    expect(sorted(Object.keys(baselineSchema.properties).filter((k) => k !== "$schema"))).toEqual(sorted(Object.keys(FILE_KEYS)));
    expect(sorted(Object.keys(baselineSchema.properties.provenance.properties))).toEqual(sorted(Object.keys(PROVENANCE_KEYS)));
  });

  it("accepts baselines built from what the real runner produces, and reads them back unchanged", async () => {
    const config = parseConfig(
      "seeds: 2\nbudget: { steps: 60 }\noptimizers: [{ name: sgd }, { name: adam }]\nproblems: [{ use: rosenbrock }, { use: quadratic }]\n",
      "inline.yml",
    );
    const suite = resolveSuite(config, "inline.yml");
    const results = buildResults(suite, await runSuite(suite, { workers: 1 }));
    const extra = new Map(results.cases.map((c) => [c.case.id, c.runs.map((r) => ({ ...r, seed: r.seed + 2 }))]));
    const files = buildBaselineFiles(results, { commit: "abc", date: "2026-01-01T00:00:00.000Z", reason: "schema test" }, extra);
    expect(files.map((f) => f.optimizer)).toEqual(["sgd", "adam"]);
    for (const f of files) {
      const text = canonicalJson(f);
      const back = parseBaseline(text, `baselines/${f.optimizer}.json`, f.optimizer);
      expect(canonicalJson(back)).toBe(text);
      expect(back.cases[0].runs[0].iterates?.length).toBeGreaterThan(0);
      expect(back.cases[0].extraRuns[0].iterates).toBeUndefined();
      expect(back.cases[0].extraRuns[0].trace).toEqual([]);
    }
  });
});
