/**
 * The four modes of the Action, each a short sequence of the CLI's own commands (one engine) followed by
 * the report:
 * - gate: run the suite (or one shard of it), compare with the baselines, report;
 * - merge: combine shard results, compare, report;
 * - publish: report a verdict file made by another job (no optimizer code runs here);
 * - rebaseline: run the suite and write new baselines with an audit entry.
 *
 * Every CLI command that can load code of the repository (run; compare, with its extra-seed re-runs and
 * reference checks; rebaseline, with its extra seeds) runs in the engine process (./engine-process.ts),
 * never in this one, which holds the token. This process merges shard files, reads the documents the
 * engine wrote, reports, and talks to the GitHub API.
 */
import { existsSync } from "node:fs";
import { resolve } from "node:path";
import { EXIT } from "../cli/host.js";
import { InputError } from "../core/errors.js";
import { canonicalJson } from "../core/json.js";
import { writeFileAtomic } from "../io/files.js";
import { readAndMerge } from "../cli/merge-command.js";
import { readAuditLog } from "../baselines/store.js";
import { mdCode, mdText } from "../report/escape.js";
import type { CaseRuns } from "../report/model.js";
import type { ShardSpec } from "../runner/shard.js";
import {
  handoffPath,
  readBaselineRuns,
  readHandoff,
  readResultsDoc,
  readVerdict,
  type Handoff,
} from "./documents.js";
import { runEngine, type EngineCommand } from "./engine-process.js";
import type { RunContext } from "./event.js";
import { ApiError, GitHubApi } from "./github-api.js";
import type { ActionHost } from "./host.js";
import { reportVerdict } from "./report-step.js";
import { INPUT, OUTPUT, type Settings } from "./settings.js";

export interface ModeContext {
  readonly host: ActionHost;
  readonly settings: Settings;
  readonly context: RunContext;
  readonly cwd: string;
}

/** The note shown when the token of a fork's pull request cannot comment. */
export const FORK_NOTE =
  "This pull request comes from a fork, so this job's token is read-only: the verdict stays in this job summary " +
  "and in the results artifact, and a separate workflow_run workflow posts the comment without running the " +
  "pull request's code (see docs/workflows.md).";

export async function runMode(m: ModeContext): Promise<void> {
  switch (m.settings.mode) {
    case "gate":
      return m.settings.shard ? shardRun(m) : gate(m);
    case "merge":
      return merge(m);
    case "publish":
      return publish(m);
    case "rebaseline":
      return rebaseline(m);
  }
}

/** Runs one CLI command in the engine process, with the token kept out of its reach. */
function engine(m: ModeContext, command: EngineCommand): Promise<number> {
  return runEngine({ host: m.host, cwd: m.cwd, secrets: [m.settings.token] }, command);
}

/** The options every engine command shares: the config (when given) and the workers (unless auto). */
function suiteOptions(s: Settings): string[] {
  return [
    ...(s.config !== undefined ? [`--config=${s.config}`] : []),
    ...(s.workers !== undefined ? [`--workers=${s.workers}`] : []),
  ];
}

async function runSuite(m: ModeContext, shard: ShardSpec | undefined = m.settings.shard): Promise<void> {
  const { settings: s } = m;
  await m.host.group(shard ? `Run shard ${shard.index}/${shard.count} of the suite` : "Run the suite", () =>
    engine(m, {
      argv: [
        "run",
        `--out=${s.resultsFile}`,
        ...suiteOptions(s),
        ...(shard ? [`--shard=${shard.index}/${shard.count}`] : []),
      ],
      codes: [EXIT.ok],
      writes: s.resultsFile,
    }),
  );
  m.host.setOutput(OUTPUT.resultsFile, s.resultsFile);
}

async function gate(m: ModeContext): Promise<void> {
  await runSuite(m);
  await judge(m);
}

async function shardRun(m: ModeContext): Promise<void> {
  await runSuite(m);
  const shard = m.settings.shard!;
  m.host.setOutput(OUTPUT.verdict, "");
  await m.host.appendSummary(
    `### Convergence gate: shard ${shard.index}/${shard.count} ran\n\n` +
      `Results written to ${mdCode(m.settings.resultsFile)}; the job that merges the shards judges them.\n`,
  );
}

async function merge(m: ModeContext): Promise<void> {
  const { settings: s } = m;
  const doc = readAndMerge(m.cwd, s.shardResults);
  writeFileAtomic(resolve(m.cwd, s.resultsFile), canonicalJson(doc));
  m.host.info(`gradgate: merged ${doc.cases.length} cases, ${doc.suite.runs} runs into ${s.resultsFile}`);
  m.host.setOutput(OUTPUT.resultsFile, s.resultsFile);
  await judge(m);
}

/** Compare the results file with the baselines, write the verdict file, report, and fail the step if asked. */
async function judge(m: ModeContext): Promise<void> {
  const { settings: s, context, host } = m;
  const code = await host.group("Compare with the baselines", () =>
    engine(m, {
      argv: [
        "compare",
        `--results=${s.resultsFile}`,
        `--baselines=${s.baselines}`,
        `--json=${s.verdictFile}`,
        ...suiteOptions(s),
      ],
      codes: [EXIT.ok, EXIT.fail],
      writes: s.verdictFile,
    }),
  );
  const verdict = readVerdict(m.cwd, s.verdictFile);
  if ((code === EXIT.ok) !== (verdict.gate.verdict === "pass")) {
    throw new Error(
      `the engine process's exit code ${code} disagrees with the gate verdict "${verdict.gate.verdict}" in ${s.verdictFile}`,
    );
  }
  const results = readResultsDoc(m.cwd, s.resultsFile);
  const pr = context.pullRequest;
  if (pr && /^[0-9a-f]{40}$/.test(pr.headSha)) {
    // For the publishing workflow: which pull request (and commit) this verdict belongs to.
    writeFileAtomic(
      handoffPath(m.cwd, s.verdictFile),
      canonicalJson({ number: pr.number, headSha: pr.headSha }),
    );
  }
  await reportVerdict(host, s, context, m.cwd, {
    verdict,
    candidate: results.cases,
    baseline: readBaselineRuns(m.cwd, s.baselines),
    notes: pr?.fork ? [FORK_NOTE] : [],
    pullRequest: pr?.number ?? null,
    noComment: pr?.fork ? `gradgate: ${FORK_NOTE}` : undefined,
    commentWorkflow: context.workflow,
    runUrl: runUrl(context, context.runId),
  });
  if (verdict.gate.verdict === "fail") {
    const counts = Object.entries(verdict.counts)
      .filter(([k, n]) => n > 0 && verdict.cases.some((c) => c.verdict === k && c.failsGate))
      .map(([k, n]) => `${n} ${k}`)
      .join(", ");
    const message = `convergence gate failed${counts ? `: ${counts}` : ""} (see the job summary)`;
    if (s.failJob) host.fail(message);
    else host.warning(`${message}; the step passes because ${INPUT.failJob} is false`);
  }
}

async function publish(m: ModeContext): Promise<void> {
  const { settings: s, context, host } = m;
  const verdict = readVerdict(m.cwd, s.verdictFile);
  host.setOutput(OUTPUT.resultsFile, s.resultsFile);
  let candidate: CaseRuns[] | undefined;
  if (existsSync(resolve(m.cwd, s.resultsFile))) {
    try {
      candidate = [...readResultsDoc(m.cwd, s.resultsFile).cases];
    } catch (err) {
      if (!(err instanceof InputError)) throw err;
      host.warning(`gradgate: charts left out: ${err.message}`);
    }
  }
  let baseline: CaseRuns[] | undefined;
  try {
    baseline = readBaselineRuns(m.cwd, s.baselines);
  } catch (err) {
    if (!(err instanceof InputError)) throw err;
    host.warning(`gradgate: baseline curves left out: ${err.message}`);
  }

  const run = context.workflowRun;
  const handoffFile = handoffPath(m.cwd, s.verdictFile);
  const handoff: Handoff | null = existsSync(handoffFile)
    ? readHandoff(handoffFile, "pull-request.json")
    : null;
  const number = s.pullRequest ?? handoff?.number ?? run?.pullRequests[0] ?? null;
  const notes = [
    `Published by a separate workflow from the verdict file of ${run ? `run ${run.id}` : "another job"}; no code from the pull request ran here.`,
  ];
  let noComment: string | undefined;
  const expectedHead = run?.headSha || handoff?.headSha || "";
  if (number !== null && s.prComment && s.token !== "" && context.repository && expectedHead) {
    // The artifact names the pull request; make sure it is the one whose commit was judged.
    try {
      const head = await new GitHubApi({ baseUrl: context.apiUrl, token: s.token }).pullRequestHead(
        context.repository.owner,
        context.repository.repo,
        number,
      );
      if (head !== expectedHead) {
        noComment =
          `gradgate: not commenting on pull request #${number}: its head is ${head.slice(0, 12) || "unknown"} but the ` +
          `verdict was made for ${expectedHead.slice(0, 12)} (a newer push will publish its own verdict)`;
      }
    } catch (err) {
      if (!(err instanceof ApiError)) throw err;
      noComment = `gradgate: not commenting: could not read pull request #${number} (${err.message})`;
    }
  }
  await reportVerdict(host, s, context, m.cwd, {
    verdict,
    candidate,
    baseline,
    notes,
    pullRequest: noComment ? null : number,
    commentWorkflow: run?.name || context.workflow,
    runUrl: runUrl(context, run ? String(run.id) : context.runId),
  });
  if (noComment) host.warning(noComment);
}

async function rebaseline(m: ModeContext): Promise<void> {
  const { settings: s, context, host } = m;
  let reason = s.reason;
  if (reason === "" && context.release) {
    const { tag, name } = context.release;
    reason = `release ${tag}${name && name !== tag ? `: ${name}` : ""}`;
  }
  if (reason === "") {
    throw new InputError(
      `input ${INPUT.reason} is required in mode "rebaseline" outside a release: say why the baselines change, ` +
        `e.g. "adam: fix bias correction (#123)"`,
    );
  }
  await runSuite(m, undefined);
  const before = readAuditLog(resolve(m.cwd, s.baselines), s.baselines).length;
  await host.group("Write the baselines", () =>
    engine(m, {
      argv: [
        "rebaseline",
        `--results=${s.resultsFile}`,
        `--reason=${reason}`,
        `--baselines=${s.baselines}`,
        ...(/^[0-9a-f]{40}$/.test(context.sha) ? [`--commit=${context.sha}`] : []),
        ...(s.allowSuiteChange ? ["--allow-suite-change"] : []),
        ...suiteOptions(s),
      ],
      codes: [EXIT.ok],
    }),
  );
  const log = readAuditLog(resolve(m.cwd, s.baselines), s.baselines);
  const entry = log.length > before ? log[log.length - 1] : null;
  host.setOutput(OUTPUT.baselinesChanged, String(entry !== null));
  host.setOutput(OUTPUT.verdict, "");
  const lines = [`### Baselines refreshed`, "", `Reason: ${mdText(reason, 300)}`, ""];
  if (entry) {
    const tally = new Map<string, number>();
    for (const c of entry.cases) tally.set(c.verdict, (tally.get(c.verdict) ?? 0) + 1);
    lines.push(
      `Files written: ${entry.files.map((f) => mdCode(`${s.baselines}/${f.file}`)).join(", ") || "none"}` +
        (entry.removed.length ? `; removed: ${entry.removed.map((f) => mdCode(f)).join(", ")}` : ""),
      "",
      `Against the previous baselines: ${[...tally].map(([k, n]) => `${n} ${mdText(k, 20)}`).join(" · ") || "no cases"}` +
        `${entry.suiteChanged ? " (the suite definition changed)" : ""}.`,
      "",
      `The audit entry is the last line of ${mdCode(`${s.baselines}/audit.jsonl`)}.`,
    );
  }
  await host.appendSummary(lines.join("\n") + "\n");
}

function runUrl(context: RunContext, id: string): string | undefined {
  if (!context.repository || !/^\d+$/.test(id)) return undefined;
  return `${context.serverUrl}/${context.repository.owner}/${context.repository.repo}/actions/runs/${id}`;
}
