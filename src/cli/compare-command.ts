/**
 * `gradgate compare --results FILE [--baselines DIR] [--json OUT] [--config FILE] [--no-extra-seeds]
 * [--workers N] [--quiet]`: judges candidate results against the baselines, prints per-case verdicts and
 * the gate verdict, optionally writes the verdict JSON. Inconclusive cases are re-run on the baselines'
 * extra seeds (policy.extraSeeds) before the verdict is final. Exit 0 pass, 1 fail, 2 usage/input error.
 */
import { existsSync, readFileSync } from "node:fs";
import { availableParallelism } from "node:os";
import { dirname, resolve } from "node:path";
import { parseArgs } from "node:util";
import { InputError, quote } from "../core/errors.js";
import { canonicalJson } from "../core/json.js";
import { writeFileAtomic } from "../io/files.js";
import { readBaselineDir, recoverBaselineDir } from "../baselines/store.js";
import { parseResults } from "../baselines/validate.js";
import type { BaselineFile } from "../baselines/types.js";
import { compareResults, describeHeadline } from "../compare/compare.js";
import {
  extraRunsById,
  extraSeedSuite,
  planExtraSeeds,
  rerunSummary,
  type ExtraSeedPlan,
} from "../compare/extra-seeds.js";
import { resolvePolicy, type Policy } from "../compare/policy.js";
import type { VerdictDocument } from "../compare/types.js";
import { runConfiguredChecks } from "../reference/configured.js";
import { applyReferenceChecks } from "../reference/merge.js";
import { runSuite } from "../runner/pool.js";
import type { ResultsDocument } from "../runner/results.js";
import type { AdapterContext, CaseSpec, RunMetrics } from "../runner/types.js";
import { textTable } from "./format.js";
import { EXIT, type Host } from "./host.js";
import { loadPreparedSuite, loadSuiteConfig } from "./run-command.js";

export const DEFAULT_BASELINES = "baselines";

export interface CompareArgs {
  readonly results: string;
  readonly baselines: string;
  readonly json?: string;
  readonly config?: string;
  readonly extraSeeds: boolean;
  readonly workers?: number;
  readonly quiet: boolean;
}

/** Parses the arguments after "compare" and runs it. */
export async function compareFromArgv(argv: readonly string[], host: Host): Promise<number> {
  const { values } = parseOptions(argv, {
    results: { type: "string" },
    baselines: { type: "string" },
    json: { type: "string" },
    config: { type: "string" },
    "no-extra-seeds": { type: "boolean" },
    workers: { type: "string" },
    quiet: { type: "boolean" },
  });
  if (typeof values.results !== "string") {
    throw new InputError(
      `compare: --results FILE is required (the file gradgate run wrote, e.g. .gradgate/results.json)`,
    );
  }
  return compareCommand(host, {
    results: values.results,
    baselines: (values.baselines as string | undefined) ?? DEFAULT_BASELINES,
    json: values.json as string | undefined,
    config: values.config as string | undefined,
    extraSeeds: values["no-extra-seeds"] !== true,
    workers: values.workers === undefined ? undefined : positiveInt(values.workers as string, "--workers"),
    quiet: values.quiet === true,
  });
}

export async function compareCommand(host: Host, args: CompareArgs): Promise<number> {
  const results = readResults(host, args.results);
  const baselines = readBaselines(host, args.baselines);
  if (baselines.size === 0 && !args.quiet) {
    // A first run: every case is new, and the reference checks still judge right or wrong.
    host.err(
      `gradgate: no baselines in ${args.baselines}/ yet: every case is new; create them with ` +
        `gradgate rebaseline --results ${args.results} --reason "first baselines"\n`,
    );
  }
  let policy = readPolicy(host, args.config);
  if (!args.extraSeeds) policy = { ...policy, extraSeeds: { ...policy.extraSeeds, perCase: 0 } };

  let verdict = compareResults(results, baselines, { policy });
  const plan = planExtraSeeds(verdict, baselines, policy);
  if (plan.requested.length > 0 && policy.extraSeeds.perCase > 0) {
    if (!args.quiet && plan.runs > 0) {
      host.err(
        `gradgate: ${plan.requested.length} inconclusive case(s); running ${plan.runs} extra seed run(s)\n`,
      );
    }
    const { suite } = await loadPreparedSuite(host, args.config);
    const extraRuns = await runPlannedSeeds(results, plan, args.workers, suite.adapters);
    verdict = compareResults(results, baselines, {
      policy,
      extraRuns,
      rerun: rerunSummary(plan, policy.extraSeeds.maxRuns),
    });
  }
  // Reference checks declared in the config (src/reference/): judged beside the drift, gating as declared.
  const suiteConfig = loadSuiteConfig(host, args.config);
  const baseDir = args.config === undefined ? host.cwd : dirname(resolve(host.cwd, args.config));
  const checks = await runConfiguredChecks(suiteConfig.config, suiteConfig.file, baseDir, results.cases);
  if (checks !== null) verdict = applyReferenceChecks(verdict, checks);
  if (args.json !== undefined) writeFileAtomic(resolve(host.cwd, args.json), canonicalJson(verdict));
  if (!args.quiet) host.out(verdictText(verdict));
  return verdict.gate.verdict === "pass" ? EXIT.ok : EXIT.fail;
}

/** Runs the candidate (the optimizer code in this checkout) on the planned extra seeds. */
export async function runPlannedSeeds(
  results: ResultsDocument,
  plan: ExtraSeedPlan,
  workers?: number,
  adapters?: AdapterContext,
): Promise<Map<string, RunMetrics[]>> {
  if (plan.cases.length === 0) return new Map();
  const specs = new Map<string, CaseSpec>(results.cases.map((c) => [c.case.id, c.case]));
  const { suite, items } = extraSeedSuite(results.suite.seed, specs, plan, adapters);
  const cases = await runSuite(suite, { workers: workers ?? Math.min(availableParallelism(), 8), items });
  return extraRunsById(cases);
}

export function readResults(host: Host, file: string): ResultsDocument {
  const path = resolve(host.cwd, file);
  if (!existsSync(path))
    throw new InputError(`results ${file}: no such file; run gradgate run --out ${file} first`);
  return parseResults(readFileSync(path, "utf8"), file);
}

/** Finishes an interrupted rebaseline if there is one (saying so), then reads and validates every file. */
export function readBaselines(host: Host, dir: string): Map<string, BaselineFile> {
  const path = resolve(host.cwd, dir);
  const note = recoverBaselineDir(path);
  if (note) host.err(`gradgate: ${dir}/: ${note}\n`);
  return readBaselineDir(path, dir.replace(/\/+$/, ""));
}

/** The policy of the config named (or found in the working directory, or the built-in default suite). */
export function readPolicy(host: Host, config: string | undefined): Policy {
  const { config: suite, file } = loadSuiteConfig(host, config);
  return resolvePolicy(suite.policy ?? {}, `config ${file}: policy`);
}

/** The terminal summary: changed cases, then the counts and the gate with its reasons. */
export function verdictText(v: VerdictDocument): string {
  const shown = v.cases.filter((c) => c.verdict !== "unchanged");
  let text = "";
  if (shown.length > 0) {
    text += textTable(
      ["case", "verdict", "drift", "trajectory"],
      shown.map((c) => [
        c.id,
        c.verdict,
        c.headline ? describeHeadline(c.headline) : "—",
        c.fingerprint.status === "changed"
          ? `changed from step ${c.fingerprint.fromStep}`
          : c.fingerprint.status,
      ]),
    );
    text += "\n";
  }
  const counts = Object.entries(v.counts)
    .filter(([, n]) => n > 0)
    .map(([k, n]) => `${n} ${k}`)
    .join(", ");
  text += `${v.cases.length} cases: ${counts || "none"}\n`;
  if (v.rerun) {
    text += `extra seeds: ${v.rerun.rerun.length} of ${v.rerun.requested.length} inconclusive case(s) re-run (${v.rerun.runs} runs)\n`;
  }
  text += `gate: ${v.gate.verdict.toUpperCase()}\n`;
  for (const r of v.gate.reasons) text += `  - ${r.message}\n`;
  return text;
}

type OptionSpec = Record<string, { type: "string" | "boolean" }>;

export function parseOptions(args: readonly string[], options: OptionSpec, positionals = false) {
  try {
    return parseArgs({ args: [...args], options, allowPositionals: positionals, strict: true });
  } catch (err) {
    throw new InputError(`${(err as Error).message}; run "gradgate help" for the options`);
  }
}

export function positiveInt(text: string, flag: string): number {
  if (!/^\d+$/.test(text) || Number(text) < 1)
    throw new InputError(`${flag} must be a positive integer, got ${quote(text)}`);
  return Number(text);
}
