/**
 * The results document: what a `run` produced, in a stable, canonical JSON form. Everything in it is a
 * function of the suite, the seeds and the optimizer code (wall time is deliberately absent), so two runs
 * of the same code give the same bytes.
 */
import { TOOL_NAME, TOOL_VERSION } from "../core/version.js";
import { suiteHash } from "./suite.js";
import type { CaseResult, SuiteSpec } from "./types.js";

export const RESULTS_FORMAT = "gradgate-results";
export const RESULTS_VERSION = 1;

export interface Environment {
  readonly node: string;
  readonly platform: string;
  readonly arch: string;
}

export interface ResultsDocument {
  readonly format: typeof RESULTS_FORMAT;
  readonly version: number;
  readonly tool: { readonly name: string; readonly version: string };
  readonly suite: {
    readonly seed: number;
    readonly hash: string;
    readonly cases: number;
    readonly runs: number;
  };
  readonly environment: Environment;
  /** Present when only part of the suite ran (a shard); absent for a whole suite. */
  readonly shard?: { readonly index: number; readonly count: number };
  readonly cases: readonly CaseResult[];
}

export function currentEnvironment(): Environment {
  return { node: process.version, platform: process.platform, arch: process.arch };
}

export function buildResults(
  suite: SuiteSpec,
  cases: readonly CaseResult[],
  environment: Environment = currentEnvironment(),
  shard?: { index: number; count: number },
): ResultsDocument {
  return {
    format: RESULTS_FORMAT,
    version: RESULTS_VERSION,
    tool: { name: TOOL_NAME, version: TOOL_VERSION },
    suite: {
      seed: suite.seed,
      hash: suiteHash(suite),
      cases: suite.cases.length,
      runs: suite.cases.reduce((n, c) => n + c.seeds, 0),
    },
    environment,
    ...(shard ? { shard } : {}),
    cases,
  };
}
