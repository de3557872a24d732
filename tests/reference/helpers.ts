/** Helpers for tests/reference (never imported by src/): suites from config text, their results. */
import { readFileSync } from "node:fs";
import { parseConfig } from "../../src/config/load.js";
import type { OptimizerFactory } from "../../src/core/types.js";
import { RunBatch } from "../../src/runner/batch.js";
import { resolveSuite } from "../../src/runner/suite.js";
import type { CaseResult, CaseSpec, SuiteSpec } from "../../src/runner/types.js";
import { type ReferenceChecks, resolveChecks } from "../../src/reference/config.js";
import { type TrajectorySource, inProcessSource } from "../../src/reference/trajectory.js";

/** A resolved suite and its bound checks from YAML text (file name "test.yml" in messages). */
export function suiteFrom(text: string): { suite: SuiteSpec; checks: ReferenceChecks } {
  const config = parseConfig(text, "test.yml");
  const suite = resolveSuite(config, "test.yml");
  return { suite, checks: resolveChecks(config.checks, suite, "test.yml") };
}

/** Runs every case of a suite in this thread (reference optimizers only), as `gradgate run` would. */
export async function resultsOf(suite: SuiteSpec): Promise<CaseResult[]> {
  const batch = new RunBatch(suite);
  const out: CaseResult[] = [];
  let item = 0;
  for (const c of suite.cases) {
    const runs = [];
    for (let s = 0; s < c.seeds; s++) runs.push(await batch.runItem(item++));
    out.push({ case: c, runs });
  }
  return out;
}

/** The one case of `suite` whose id starts with `prefix`. */
export function caseOf(suite: SuiteSpec, prefix: string): CaseSpec {
  const found = suite.cases.filter((c) => c.id.startsWith(prefix));
  if (found.length !== 1) throw new Error(`expected one case starting with ${prefix}, found ${found.length}`);
  return found[0];
}

/** A source for a test optimizer. */
export function sourceOf(factory: OptimizerFactory): TrajectorySource {
  return inProcessSource(factory, `test:${factory.name}`);
}

/**
 * Reads `name = value` from tests/reference/fixtures/reference_values.out (written by
 * reference_values.py; each line names the numpy/scipy call that produced the value).
 */
const FIXTURE = readFileSync(new URL("./fixtures/reference_values.out", import.meta.url), "utf8");
export function fixture(name: string): number {
  const line = FIXTURE.split("\n").find((l) => l.startsWith(`${name} = `));
  if (line === undefined) throw new Error(`fixture ${name} not found`);
  return Number(line.slice(name.length + 3).split("  #")[0]);
}
export function fixtureList(name: string): number[] {
  const line = FIXTURE.split("\n").find((l) => l.startsWith(`${name} = `));
  if (line === undefined) throw new Error(`fixture ${name} not found`);
  return JSON.parse(line.slice(name.length + 3).split("  #")[0]) as number[];
}
