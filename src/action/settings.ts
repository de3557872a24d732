/**
 * The Action's inputs and outputs: their names (the only place they are spelled), their defaults (kept
 * equal to action.yml by tests/action/action-yml.test.ts, which also checks the table in
 * docs/workflows.md), and the one function that turns the INPUT_* environment into a typed settings
 * object. Every resolved value is logged at debug level, except the token.
 */
import { InputError, quote } from "../core/errors.js";
import { parseShard, type ShardSpec } from "../runner/shard.js";

/** What the step does. */
export type Mode = "gate" | "rebaseline" | "merge" | "publish";
export const MODES: readonly Mode[] = ["gate", "rebaseline", "merge", "publish"];

/** One input: its name in action.yml, its default there, and its description. */
export interface InputSpec {
  readonly name: string;
  readonly default: string;
  readonly description: string;
}

/** Input names (constants, so no name is spelled twice). */
export const INPUT = {
  mode: "mode",
  config: "config",
  baselines: "baselines",
  workers: "workers",
  shard: "shard",
  shardResults: "shard-results",
  resultsFile: "results-file",
  verdictFile: "verdict-file",
  reportFile: "report-file",
  reason: "reason",
  allowSuiteChange: "allow-suite-change",
  prComment: "pr-comment",
  commentKey: "comment-key",
  pullRequest: "pull-request",
  failJob: "fail-job",
  artifactName: "artifact-name",
  token: "token",
} as const;

/** Every input, in the order action.yml and the docs list them. */
export const INPUTS: readonly InputSpec[] = [
  {
    name: INPUT.mode,
    default: "gate",
    description:
      "What to do: `gate` (run the suite, compare with the baselines, report), `rebaseline` (run the suite and write new baselines), `merge` (combine shard results, then compare and report), `publish` (report a verdict made in another job; runs no optimizer code).",
  },
  {
    name: INPUT.config,
    default: "",
    description:
      "Suite config file. Empty: `gradgate.yml` in the working directory, else the built-in default suite.",
  },
  {
    name: INPUT.baselines,
    default: "baselines",
    description: "Directory of the baseline files and the audit log.",
  },
  {
    name: INPUT.workers,
    default: "auto",
    description:
      "Worker threads for the runs: a positive integer, or `auto` (the machine's cores, at most 8).",
  },
  {
    name: INPUT.shard,
    default: "",
    description:
      "`gate` mode: run only shard `i/n` of the runs (e.g. `2/4`, one matrix job per shard) and write its results; a `merge` job compares and reports.",
  },
  {
    name: INPUT.shardResults,
    default: ".gradgate/shards",
    description: "`merge` mode: shard results files, or directories holding them, one per line.",
  },
  {
    name: INPUT.resultsFile,
    default: ".gradgate/results.json",
    description:
      "Results document: written by `gate`, `rebaseline` and `merge`; read by `publish` (for the charts).",
  },
  {
    name: INPUT.verdictFile,
    default: ".gradgate/verdict.json",
    description: "Verdict document: written by `gate` and `merge`; read by `publish`.",
  },
  {
    name: INPUT.reportFile,
    default: ".gradgate/report.html",
    description: "Self-contained HTML report with charts, written by `gate`, `merge` and `publish`.",
  },
  {
    name: INPUT.reason,
    default: "",
    description:
      "`rebaseline` mode: why the baselines change (kept in the audit log). Empty on a release: the release's tag and name.",
  },
  {
    name: INPUT.allowSuiteChange,
    default: "false",
    description:
      "`rebaseline` mode: accept results of a changed suite definition (replaces the whole baseline set).",
  },
  {
    name: INPUT.prComment,
    default: "true",
    description:
      "Post the report as a pull-request comment, updated in place on later pushes (needs `pull-requests: write`).",
  },
  {
    name: INPUT.commentKey,
    default: "",
    description:
      "Tells apart the comments of several gradgate jobs in one workflow (one comment per workflow and key).",
  },
  {
    name: INPUT.pullRequest,
    default: "",
    description:
      "`publish` mode: pull-request number. Empty: read from `pull-request.json` beside the verdict file (written by `gate`).",
  },
  {
    name: INPUT.failJob,
    default: "true",
    description: "`gate` and `merge` modes: fail the step when the gate fails.",
  },
  {
    name: INPUT.artifactName,
    default: "gradgate-report",
    description: "Name under which the workflow uploads the reports (only used to point readers to it).",
  },
  {
    name: INPUT.token,
    default: "${{ github.token }}",
    description: "Token for the pull-request comment. Never passed to the optimizer under test.",
  },
];

/** Output names. */
export const OUTPUT = {
  verdict: "verdict",
  cases: "cases",
  regressed: "regressed",
  counts: "counts",
  resultsFile: "results-file",
  verdictFile: "verdict-file",
  reportFile: "report-file",
  commentUrl: "comment-url",
  baselinesChanged: "baselines-changed",
} as const;

/** Every output with its description, in the order action.yml and the docs list them. */
export const OUTPUTS: readonly { readonly name: string; readonly description: string }[] = [
  {
    name: OUTPUT.verdict,
    description:
      "Gate verdict: `pass` or `fail` (empty when nothing was judged: a shard run or `rebaseline`).",
  },
  { name: OUTPUT.cases, description: "Number of cases judged." },
  { name: OUTPUT.regressed, description: "Number of regressed cases." },
  {
    name: OUTPUT.counts,
    description: 'Cases per verdict as JSON, e.g. `{"regressed":1,"unchanged":11,...}`.',
  },
  { name: OUTPUT.resultsFile, description: "Path of the results document written or read." },
  { name: OUTPUT.verdictFile, description: "Path of the verdict document written or read." },
  { name: OUTPUT.reportFile, description: "Path of the HTML report." },
  {
    name: OUTPUT.commentUrl,
    description: "URL of the pull-request comment created or updated (empty when none).",
  },
  {
    name: OUTPUT.baselinesChanged,
    description: "`rebaseline` mode: `true` when baseline files were written.",
  },
];

/** Every input, resolved. */
export interface Settings {
  readonly mode: Mode;
  /** Suite config file, or undefined for the default lookup. */
  readonly config: string | undefined;
  readonly baselines: string;
  /** Worker threads, or undefined for the machine's cores (at most 8). */
  readonly workers: number | undefined;
  /** Gate mode: the shard to run, or undefined for the whole suite. */
  readonly shard: ShardSpec | undefined;
  /** Merge mode: shard results files or directories. */
  readonly shardResults: readonly string[];
  readonly resultsFile: string;
  readonly verdictFile: string;
  readonly reportFile: string;
  /** Rebaseline mode: the reason given, or "" to take it from the release. */
  readonly reason: string;
  readonly allowSuiteChange: boolean;
  readonly prComment: boolean;
  readonly commentKey: string;
  /** Publish mode: the pull request, or undefined to read it from pull-request.json. */
  readonly pullRequest: number | undefined;
  readonly failJob: boolean;
  readonly artifactName: string;
  /** Empty when none was given. Kept out of logs and out of the environment the optimizer sees. */
  readonly token: string;
}

const DEFAULTS: ReadonlyMap<string, string> = new Map(INPUTS.map((i) => [i.name, i.default]));

/**
 * The value of an input as the runner passes it: INPUT_<NAME> with the name upper-cased and spaces
 * replaced by underscores (hyphens stay), trimmed. An empty or missing value takes the default of
 * action.yml, except where the default is an expression the runner evaluates (the token).
 */
export function inputValue(env: Readonly<Record<string, string | undefined>>, name: string): string {
  const raw = env[`INPUT_${name.replace(/ /g, "_").toUpperCase()}`];
  const value = (raw ?? "").trim();
  if (value !== "") return value;
  const fallback = DEFAULTS.get(name) ?? "";
  return fallback.startsWith("${{") ? "" : fallback;
}

/** Reads and checks every input; `debug` receives one line per resolved value. */
export function readSettings(
  env: Readonly<Record<string, string | undefined>>,
  debug: (line: string) => void = () => {},
): Settings {
  const get = (name: string) => inputValue(env, name);
  const mode = get(INPUT.mode);
  if (!(MODES as readonly string[]).includes(mode)) {
    throw new InputError(`input ${INPUT.mode} must be one of ${MODES.join(", ")}, got ${quote(mode)}`);
  }
  const workersText = get(INPUT.workers);
  let workers: number | undefined;
  if (workersText !== "auto") {
    if (!/^\d+$/.test(workersText) || Number(workersText) < 1) {
      throw new InputError(
        `input ${INPUT.workers} must be a positive integer or "auto", got ${quote(workersText)}`,
      );
    }
    workers = Number(workersText);
  }
  const shardText = get(INPUT.shard);
  const shard = shardText === "" ? undefined : parseShard(shardText, `input ${INPUT.shard}`);
  if (shard && mode !== "gate") {
    throw new InputError(
      `input ${INPUT.shard} is for mode "gate" (one shard of the runs), got mode ${quote(mode)}`,
    );
  }
  const prText = get(INPUT.pullRequest);
  let pullRequest: number | undefined;
  if (prText !== "") {
    if (!/^[1-9]\d{0,9}$/.test(prText)) {
      throw new InputError(`input ${INPUT.pullRequest} must be a pull-request number, got ${quote(prText)}`);
    }
    pullRequest = Number(prText);
  }
  const commentKey = get(INPUT.commentKey);
  const settings: Settings = {
    mode: mode as Mode,
    config: get(INPUT.config) || undefined,
    baselines: nonEmpty(get(INPUT.baselines), INPUT.baselines),
    workers,
    shard,
    shardResults: get(INPUT.shardResults)
      .split(/\r?\n/)
      .map((s) => s.trim())
      .filter((s) => s !== ""),
    resultsFile: nonEmpty(get(INPUT.resultsFile), INPUT.resultsFile),
    verdictFile: nonEmpty(get(INPUT.verdictFile), INPUT.verdictFile),
    reportFile: nonEmpty(get(INPUT.reportFile), INPUT.reportFile),
    reason: get(INPUT.reason),
    allowSuiteChange: bool(get(INPUT.allowSuiteChange), INPUT.allowSuiteChange),
    prComment: bool(get(INPUT.prComment), INPUT.prComment),
    commentKey,
    pullRequest,
    failJob: bool(get(INPUT.failJob), INPUT.failJob),
    artifactName: get(INPUT.artifactName),
    token: get(INPUT.token),
  };
  if (settings.mode === "merge" && settings.shardResults.length === 0) {
    throw new InputError(
      `input ${INPUT.shardResults} must name the shard results (files or directories) in mode "merge"`,
    );
  }
  for (const [key, value] of Object.entries(settings)) {
    const shown =
      key === "token"
        ? value
          ? "(set, not shown)"
          : "(empty)"
        : value === undefined
          ? "(default)"
          : JSON.stringify(value);
    debug(`gradgate setting ${key} = ${shown}`);
  }
  return settings;
}

/** YAML 1.2 core schema booleans, as the runner's own boolean inputs accept them. */
function bool(text: string, name: string): boolean {
  if (/^(true|True|TRUE)$/.test(text)) return true;
  if (/^(false|False|FALSE)$/.test(text)) return false;
  throw new InputError(`input ${name} must be true or false, got ${quote(text)}`);
}

function nonEmpty(text: string, name: string): string {
  if (text === "") throw new InputError(`input ${name} must not be empty`);
  return text;
}
