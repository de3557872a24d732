/**
 * `gradgate rebaseline --results FILE --reason TEXT [--baselines DIR] [--commit SHA] [--allow-suite-change]
 * [--config FILE] [--extra-seeds N] [--workers N] [--quiet]`: writes new baseline files from a results
 * document, one per optimizer, with the runs of extra seeds (policy.extraSeeds.perCase, run here) for
 * re-running inconclusive cases later; appends an entry to baselines/audit.jsonl with the drift of every
 * case against the previous baselines. The files and the log are replaced as one transaction
 * (src/baselines/store.ts). Refuses results of a different suite unless --allow-suite-change; then the
 * files of optimizers no longer in the suite are removed.
 */
import { execFileSync } from "node:child_process";
import { existsSync, readFileSync } from "node:fs";
import { join, resolve } from "node:path";
import { InputError } from "../core/errors.js";
import { canonicalJson } from "../core/json.js";
import { TOOL_NAME, TOOL_VERSION } from "../core/version.js";
import { buildBaselineFiles } from "../baselines/build.js";
import {
  auditLine,
  baselineFileNames,
  readAuditLog,
  recoverBaselineDir,
  writeBaselineSet,
} from "../baselines/store.js";
import {
  AUDIT_FORMAT,
  AUDIT_LOG,
  AUDIT_VERSION,
  type AuditEntry,
  type BaselineFile,
} from "../baselines/types.js";
import { parseBaseline } from "../baselines/validate.js";
import { auditDrift } from "../compare/audit-drift.js";
import { compareResults } from "../compare/compare.js";
import type { ExtraSeedPlan } from "../compare/extra-seeds.js";
import { EXIT, type Host } from "./host.js";
import { loadPreparedSuite } from "./run-command.js";
import {
  DEFAULT_BASELINES,
  parseOptions,
  positiveInt,
  readPolicy,
  readResults,
  runPlannedSeeds,
} from "./compare-command.js";

export interface RebaselineArgs {
  readonly results: string;
  readonly reason: string;
  readonly baselines: string;
  readonly commit?: string;
  readonly allowSuiteChange: boolean;
  readonly config?: string;
  /** Extra seeds per case; default policy.extraSeeds.perCase. */
  readonly extraSeeds?: number;
  readonly workers?: number;
  readonly quiet: boolean;
  /** The clock, for tests; default now. */
  readonly now?: () => Date;
}

export async function rebaselineFromArgv(argv: readonly string[], host: Host): Promise<number> {
  const { values } = parseOptions(argv, {
    results: { type: "string" },
    reason: { type: "string" },
    baselines: { type: "string" },
    commit: { type: "string" },
    "allow-suite-change": { type: "boolean" },
    config: { type: "string" },
    "extra-seeds": { type: "string" },
    workers: { type: "string" },
    quiet: { type: "boolean" },
  });
  if (typeof values.results !== "string") {
    throw new InputError(`rebaseline: --results FILE is required (the file gradgate run wrote)`);
  }
  const reason = typeof values.reason === "string" ? values.reason.trim() : "";
  if (reason === "") {
    throw new InputError(
      `rebaseline: --reason is required and must not be empty: say why the baselines change, e.g. --reason "adam: fix bias correction (#123)"`,
    );
  }
  const extra = values["extra-seeds"] as string | undefined;
  if (extra !== undefined && !/^\d+$/.test(extra)) {
    throw new InputError(`--extra-seeds must be a whole number ≥ 0, got ${JSON.stringify(extra)}`);
  }
  return rebaselineCommand(host, {
    results: values.results,
    reason,
    baselines: (values.baselines as string | undefined) ?? DEFAULT_BASELINES,
    commit: values.commit as string | undefined,
    allowSuiteChange: values["allow-suite-change"] === true,
    config: values.config as string | undefined,
    extraSeeds: extra === undefined ? undefined : Number(extra),
    workers: values.workers === undefined ? undefined : positiveInt(values.workers as string, "--workers"),
    quiet: values.quiet === true,
  });
}

export async function rebaselineCommand(host: Host, args: RebaselineArgs): Promise<number> {
  const results = readResults(host, args.results);
  if (results.shard) {
    throw new InputError(
      `rebaseline: results ${args.results} hold shard ${results.shard.index} of ${results.shard.count} only; ` +
        `merge the shards first (gradgate merge)`,
    );
  }
  const shownDir = args.baselines.replace(/\/+$/, "");
  const dir = resolve(host.cwd, args.baselines);
  const note = recoverBaselineDir(dir);
  if (note && !args.quiet) host.err(`gradgate: ${shownDir}/: ${note}\n`);

  // The previous set; an unreadable file is replaced (that is the fix its error message gives).
  const previous = new Map<string, BaselineFile>();
  for (const name of baselineFileNames(dir)) {
    try {
      const b = parseBaseline(
        readFileSync(join(dir, name), "utf8"),
        `${shownDir}/${name}`,
        name.slice(0, -5),
      );
      previous.set(b.optimizer, b);
    } catch (err) {
      if (!(err instanceof InputError)) throw err;
      if (!args.quiet) host.err(`gradgate: replacing an unreadable baseline: ${err.message}\n`);
    }
  }
  const previousHashes = [...new Set([...previous.values()].map((b) => b.provenance.suite.hash))];
  const suiteChanged = previousHashes.some((h) => h !== results.suite.hash);
  if (suiteChanged && !args.allowSuiteChange) {
    const which = [...previous.values()].find((b) => b.provenance.suite.hash !== results.suite.hash)!;
    throw new InputError(
      `rebaseline: results ${args.results} come from a different suite (hash ${results.suite.hash.slice(0, 19)}…) than ` +
        `${shownDir}/${which.optimizer}.json (${which.provenance.suite.hash.slice(0, 19)}…): the suite definition changed ` +
        `(problems, budgets, ladder or seeds); pass --allow-suite-change to replace the baselines with the new suite's`,
    );
  }
  const auditText = existsSync(join(dir, AUDIT_LOG)) ? readFileSync(join(dir, AUDIT_LOG), "utf8") : "";
  readAuditLog(dir, shownDir); // refuse to append to a damaged log

  const policy = readPolicy(host, args.config);
  const perCase = args.extraSeeds ?? policy.extraSeeds.perCase;
  const plan: ExtraSeedPlan = {
    cases: results.cases.map((c) => ({
      id: c.case.id,
      seeds: Array.from({ length: perCase }, (_, i) => c.case.seeds + i),
    })),
    runs: perCase * results.cases.length,
    requested: [],
    skipped: [],
  };
  if (perCase > 0 && !args.quiet) {
    host.err(`gradgate: running ${plan.runs} extra seed run(s) (${perCase} per case) for the baselines\n`);
  }
  const extraRuns =
    perCase > 0
      ? await runPlannedSeeds(
          results,
          plan,
          args.workers,
          (await loadPreparedSuite(host, args.config)).suite.adapters,
        )
      : new Map();

  const when = (args.now ?? (() => new Date()))().toISOString();
  const commit = args.commit ?? gitHead(host.cwd);
  const files = buildBaselineFiles(results, { commit, date: when, reason: args.reason }, extraRuns);
  const drift = compareResults(results, previous, {
    policy: { ...policy, extraSeeds: { ...policy.extraSeeds, perCase: 0 } },
  });
  const newNames = new Set(files.map((f) => `${f.optimizer}.json`));
  const removed = suiteChanged ? baselineFileNames(dir).filter((n) => !newNames.has(n)) : [];
  const entry: AuditEntry = {
    format: AUDIT_FORMAT,
    version: AUDIT_VERSION,
    when,
    commit,
    reason: args.reason,
    tool: { name: TOOL_NAME, version: TOOL_VERSION },
    suite: { hash: results.suite.hash, previousHash: previousHashes[0] ?? null },
    suiteChanged,
    files: files.map((f) => ({ optimizer: f.optimizer, file: `${f.optimizer}.json`, digest: f.digest })),
    removed,
    cases: auditDrift(drift),
  };
  const write = new Map<string, string>();
  for (const f of files) write.set(`${f.optimizer}.json`, canonicalJson(f));
  const log = auditText === "" || auditText.endsWith("\n") ? auditText : auditText + "\n";
  write.set(AUDIT_LOG, log + auditLine(entry));
  writeBaselineSet(dir, { write, remove: removed });

  if (!args.quiet) {
    const counts = Object.entries(drift.counts)
      .filter(([, n]) => n > 0)
      .map(([k, n]) => `${n} ${k}`)
      .join(", ");
    host.out(
      `wrote ${files.length} baseline file(s) to ${shownDir}/ (${results.cases.length} cases, commit ${commit.slice(0, 12)})` +
        `${removed.length > 0 ? `; removed ${removed.join(", ")}` : ""}\n` +
        `against the previous baselines: ${counts || "none"}\n` +
        `audit entry appended to ${shownDir}/${AUDIT_LOG}\n`,
    );
  }
  return EXIT.ok;
}

/** The commit of the working directory, read at the edge (never inside the engine). */
function gitHead(cwd: string): string {
  try {
    return execFileSync("git", ["rev-parse", "HEAD"], {
      cwd,
      encoding: "utf8",
      stdio: ["ignore", "pipe", "pipe"],
    }).trim();
  } catch (err) {
    const why = ((err as { stderr?: string }).stderr ?? (err as Error).message).toString().split("\n")[0];
    throw new InputError(
      `rebaseline: could not read the commit (git rev-parse HEAD: ${why}); pass --commit SHA`,
    );
  }
}
