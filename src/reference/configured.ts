/**
 * The reference checks a config declares, run for a command: resolves the suite with its module and
 * process optimizers, binds the `checks` section to it, runs the checks (known minima read from the
 * candidate results when given) and closes any optimizer process it started. Returns null when the
 * config declares no checks, so callers can leave the verdict exactly as it was.
 */
import { prepareSuite } from "../adapters/prepare.js";
import type { SuiteConfig } from "../config/load.js";
import type { CaseResult } from "../runner/types.js";
import { parseChecks, resolveChecks } from "./config.js";
import { type ReferenceCheckReport, runReferenceChecks } from "./run-checks.js";
import { suiteSources } from "./sources.js";

/**
 * Runs the checks declared in `config` (read from `file`, whose directory is `baseDir`). Throws an
 * `InputError` for a bad `checks` section; a failing optimizer only makes checks fail.
 */
export async function runConfiguredChecks(
  config: SuiteConfig,
  file: string,
  baseDir: string,
  results?: readonly CaseResult[],
): Promise<ReferenceCheckReport | null> {
  const declared = parseChecks(config.checks, `config ${file}: checks`);
  const count =
    declared.minimum.length + declared.rate.length + declared.stationary.length + declared.conformance.length;
  if (count === 0) return null;
  const suite = await prepareSuite(config, file, { baseDir });
  const checks = resolveChecks(config.checks, suite, file);
  const sources = suiteSources(suite);
  try {
    return await runReferenceChecks({ suite, checks, results, sourceFor: sources.sourceFor });
  } finally {
    await sources.close();
  }
}
