/**
 * The Action's run() as a workflow step runs it: real INPUT_* and GITHUB_* variables, real files for
 * GITHUB_OUTPUT and GITHUB_STEP_SUMMARY, the real @actions/core host writing workflow commands to stdout,
 * and GitHub's REST API as a local server on 127.0.0.1.
 */
import { cpSync, existsSync, mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it, vi } from "vitest";
import { markerFor } from "../../src/action/comment.js";
import { FORK_NOTE } from "../../src/action/modes.js";
import { failureMessage, run } from "../../src/action/run.js";
import { runCommand } from "../../src/cli/run-command.js";
import { canonicalJson } from "../../src/core/json.js";
import { codeSpans, proseLines } from "../report/gfm.js";
import { FakeGitHub } from "./fake-github.js";
import { HEAD_A, HEAD_B, makeProject, pullRequestEvent, readOutputs, runnerEnv } from "./workflow.js";

const gh = new FakeGitHub();
const root = mkdtempSync(join(tmpdir(), "gradgate-action-"));
const project = join(root, "project");
// @actions/core remembers the summary file of its first write, so one file serves the whole test file.
const summaryFile = join(root, "step-summary.md");
const outputFile = join(root, "step-output.txt");
const MARKER = markerFor("convergence", "");

let savedEnv: NodeJS.ProcessEnv;
let savedCwd: string;
let stdout = "";

beforeAll(async () => {
  await gh.start();
  await makeProject(project);
});
afterAll(async () => {
  await gh.stop();
  rmSync(root, { recursive: true, force: true });
});
beforeEach(() => {
  savedEnv = { ...process.env };
  savedCwd = process.cwd();
  for (const name of Object.keys(process.env))
    if (name.startsWith("INPUT_") || name.startsWith("GITHUB_")) delete process.env[name];
  writeFileSync(summaryFile, "");
  writeFileSync(outputFile, "");
  gh.reset();
  stdout = "";
  vi.spyOn(process.stdout, "write").mockImplementation((chunk: string | Uint8Array) => {
    stdout += typeof chunk === "string" ? chunk : Buffer.from(chunk).toString("utf8");
    return true;
  });
});
afterEach(() => {
  vi.restoreAllMocks();
  process.env = savedEnv;
  process.chdir(savedCwd);
  process.exitCode = undefined;
});

/** Runs one step in `dir` with the runner's variables for `event` and the given inputs. */
async function step(dir: string, event: string, payload: unknown, inputs: Record<string, string>) {
  Object.assign(process.env, runnerEnv(dir, gh.url, event, payload), {
    GITHUB_STEP_SUMMARY: summaryFile,
    GITHUB_OUTPUT: outputFile,
    INPUT_WORKERS: "1",
    INPUT_TOKEN: "ghs_test_token",
  });
  for (const [name, value] of Object.entries(inputs)) process.env[`INPUT_${name.toUpperCase()}`] = value;
  process.chdir(dir);
  await run();
  return {
    outputs: readOutputs(outputFile),
    summary: readFileSync(summaryFile, "utf8"),
    failed: process.exitCode === 1,
    errors: stdout.split("\n").filter((l) => l.startsWith("::error")),
    warnings: stdout.split("\n").filter((l) => l.startsWith("::warning")),
  };
}

describe("gate mode on a pull request from a branch of the repository", () => {
  it("runs, judges and reports; the first push creates the comment, the next one updates it", async () => {
    const first = await step(project, "pull_request", pullRequestEvent(7, HEAD_A), {});
    expect(first.failed).toBe(false);
    expect(first.outputs.verdict).toBe("pass");
    expect(first.outputs.cases).toBe("4");
    expect(JSON.parse(first.outputs.counts)).toMatchObject({ unchanged: 4, regressed: 0 });
    expect(first.outputs["verdict-file"]).toBe(".gradgate/verdict.json");
    expect(first.summary.startsWith("### ✅ Convergence gate passed\n")).toBe(true);
    expect(readFileSync(join(project, ".gradgate/report.html"), "utf8")).toContain("Convergence gate passed");
    expect(JSON.parse(readFileSync(join(project, ".gradgate/pull-request.json"), "utf8"))).toEqual({
      number: 7,
      headSha: HEAD_A,
    });
    expect(gh.writes().map((r) => `${r.method} ${r.path}`)).toEqual([
      "POST /repos/lumen-labs/lumen/issues/7/comments",
    ]);
    const body = (gh.writes()[0].body as { body: string }).body;
    expect(body.startsWith(`${MARKER}\n### ✅ Convergence gate passed\n`)).toBe(true);
    expect(body).toContain("[workflow run](https://github.example/lumen-labs/lumen/actions/runs/4242)");
    expect(first.outputs["comment-url"]).toBe(
      `https://github.example/o/r/pull/1#issuecomment-${gh.comments.get(7)![0].id}`,
    );
    expect(gh.requests.every((r) => r.auth === "Bearer ghs_test_token")).toBe(true);
    // The token is gone from the environment once the inputs are read.
    expect(process.env.INPUT_TOKEN).toBeUndefined();

    gh.requests.length = 0;
    const second = await step(project, "pull_request", pullRequestEvent(7, HEAD_B), {});
    expect(second.outputs.verdict).toBe("pass");
    expect(gh.writes().map((r) => r.method)).toEqual(["PATCH"]);
    expect(gh.comments.get(7)).toHaveLength(1);
  });

  it("fails the step on a regression with one message, one annotation per failing case, and says why in the comment", async () => {
    const r = await step(project, "pull_request", pullRequestEvent(7, HEAD_A), {
      config: "candidate-slow.yml",
    });
    expect(r.failed).toBe(true);
    expect(r.outputs.verdict).toBe("fail");
    expect(r.outputs.regressed).toBe("2");
    expect(r.errors.filter((l) => l.startsWith("::error title=gradgate%3A sgd/default/"))).toHaveLength(2);
    expect(r.errors[r.errors.length - 1]).toBe(
      "::error::convergence gate failed: 2 regressed (see the job summary)",
    );
    const body = (gh.writes()[0].body as { body: string }).body;
    expect(body).toContain("### ❌ Convergence gate failed");
    expect(body).toContain("| `sgd/default/quadratic` | 🔴 regressed |");
    expect(body).toContain("```mermaid");
  });

  it("with fail-job false, reports the failure as a warning and lets the step pass", async () => {
    const r = await step(project, "pull_request", pullRequestEvent(7, HEAD_A), {
      config: "candidate-slow.yml",
      "fail-job": "false",
    });
    expect(r.failed).toBe(false);
    expect(r.outputs.verdict).toBe("fail");
    expect(r.warnings).toContain(
      "::warning::convergence gate failed: 2 regressed (see the job summary); the step passes because fail-job is false",
    );
  });
});

describe("the verdict never depends on GitHub's API", () => {
  it("on a fork's pull request: no API call, a clear note, the same verdict", async () => {
    const r = await step(project, "pull_request", pullRequestEvent(9, HEAD_A, "mallory/lumen"), {});
    expect(gh.requests).toEqual([]);
    expect(r.outputs.verdict).toBe("pass");
    expect(r.failed).toBe(false);
    // The summary escapes the note's punctuation for Markdown; without the backslashes it reads as written.
    expect(r.summary.replace(/\\/g, "")).toContain(`> ${FORK_NOTE}`);
    expect(stdout).toContain(`gradgate: ${FORK_NOTE}`);
  });

  it.each([
    [
      "a read-only token (403)",
      "GET comments",
      { status: 403, body: { message: "Resource not accessible by integration" } },
      "the token may not write pull-request comments",
    ],
    [
      "a refused comment (422)",
      "POST comments",
      { status: 422, body: { message: "Validation Failed" } },
      "GitHub refused the comment",
    ],
    [
      "the rate limit",
      "GET comments",
      {
        status: 403,
        body: { message: "API rate limit exceeded" },
        headers: {
          "x-ratelimit-remaining": "0",
          "x-ratelimit-reset": String(Math.floor(Date.now() / 1000) + 3000),
        },
      },
      "gradgate hit GitHub's API rate limit",
    ],
    [
      "a broken API (500)",
      "GET comments",
      { status: 500, body: { message: "oops" } },
      "could not reach GitHub",
    ],
  ])("%s: a warning, the same outputs and step result", async (_what, route, fault, warning) => {
    gh.faults.set(route, fault);
    const r = await step(project, "pull_request", pullRequestEvent(7, HEAD_A), {});
    expect(r.outputs.verdict).toBe("pass");
    expect(r.outputs.counts).toBe(
      JSON.stringify({
        equivalent: 0,
        improved: 0,
        inconclusive: 0,
        missing: 0,
        new: 0,
        regressed: 0,
        unchanged: 4,
      }),
    );
    expect(r.failed).toBe(false);
    expect(r.warnings.some((w) => w.includes(warning) && w.includes("The verdict is unaffected"))).toBe(true);
    expect(r.summary.startsWith("### ✅ Convergence gate passed")).toBe(true);

    gh.faults.set(route, fault);
    const failing = await step(project, "pull_request", pullRequestEvent(7, HEAD_A), {
      config: "candidate-slow.yml",
    });
    expect(failing.failed).toBe(true);
    expect(failing.outputs.verdict).toBe("fail");
  });
});

describe("merge mode", () => {
  it("merges shard results into the bytes of one run, then judges and reports them", async () => {
    const dir = join(root, "merge");
    cpSync(project, dir, { recursive: true, filter: (src) => !src.includes(".gradgate") });
    const host = { out: () => {}, err: () => {}, interactive: false, cwd: dir };
    await runCommand(host, { config: "candidate-slow.yml", out: "whole.json", workers: 1, quiet: true });
    for (let i = 1; i <= 3; i++) {
      await runCommand(host, {
        config: "candidate-slow.yml",
        out: `artifacts/shard-${i}/r.json`,
        workers: 1,
        quiet: true,
        shard: { index: i, count: 3 },
      });
    }
    const r = await step(dir, "pull_request", pullRequestEvent(7, HEAD_A), {
      mode: "merge",
      "shard-results": "artifacts",
      config: "candidate-slow.yml",
    });
    expect(readFileSync(join(dir, ".gradgate/results.json"), "utf8")).toBe(
      readFileSync(join(dir, "whole.json"), "utf8"),
    );
    expect(r.outputs.verdict).toBe("fail");
    expect(r.outputs.regressed).toBe("2");
  });

  it("refuses a missing shard with the merge's message", async () => {
    const dir = join(root, "merge");
    rmSync(join(dir, "artifacts/shard-2"), { recursive: true });
    const r = await step(dir, "pull_request", pullRequestEvent(7, HEAD_A), {
      mode: "merge",
      "shard-results": "artifacts",
    });
    expect(r.failed).toBe(true);
    expect(r.errors).toEqual([
      "::error::gradgate: merge: shard 2/3 is missing (have 1, 3); pass the results of every shard",
    ]);
  });
});

describe("publish mode (workflow_run after a fork's pull request)", () => {
  const dir = join(root, "publish");
  const artifact = join(dir, "artifact");
  const workflowRun = (headSha: string) => ({
    action: "completed",
    workflow_run: {
      name: "convergence",
      id: 777,
      head_sha: headSha,
      event: "pull_request",
      pull_requests: [],
    },
  });

  beforeAll(async () => {
    // The gate job's artifact, from a fork's pull request (no comment there).
    const gateDir = join(root, "gate-for-publish");
    cpSync(project, gateDir, { recursive: true, filter: (src) => !src.includes(".gradgate") });
    const saved = { ...process.env };
    Object.assign(
      process.env,
      runnerEnv(gateDir, "http://127.0.0.1:9", "pull_request", pullRequestEvent(12, HEAD_A, "mallory/lumen")),
      {
        GITHUB_STEP_SUMMARY: summaryFile,
        GITHUB_OUTPUT: outputFile,
        INPUT_WORKERS: "1",
        INPUT_CONFIG: "candidate-slow.yml",
      },
    );
    const cwd = process.cwd();
    process.chdir(gateDir);
    vi.spyOn(process.stdout, "write").mockImplementation(() => true);
    await run();
    vi.restoreAllMocks();
    process.chdir(cwd);
    process.env = saved;
    process.exitCode = undefined;
    // The publishing job's checkout: the default branch (baselines, a config it never reads) + the artifact.
    mkdirSync(artifact, { recursive: true });
    cpSync(join(project, "baselines"), join(dir, "baselines"), { recursive: true });
    writeFileSync(join(dir, "gradgate.yml"), "optimizers: [ {{ this is not YAML");
    for (const f of ["verdict.json", "results.json", "pull-request.json"])
      cpSync(join(gateDir, ".gradgate", f), join(artifact, f));
  });

  const inputs = {
    mode: "publish",
    "verdict-file": "artifact/verdict.json",
    "results-file": "artifact/results.json",
  };

  it("comments on the pull request whose head was tested, with the gate workflow's marker, running no suite", async () => {
    gh.pulls.set(12, { headSha: HEAD_A });
    const r = await step(dir, "workflow_run", workflowRun(HEAD_A), inputs);
    expect(r.failed).toBe(false); // publishing is not gating
    expect(r.outputs.verdict).toBe("fail");
    expect(gh.writes().map((w) => `${w.method} ${w.path}`)).toEqual([
      "POST /repos/lumen-labs/lumen/issues/12/comments",
    ]);
    const body = (gh.writes()[0].body as { body: string }).body;
    expect(body.startsWith(`${MARKER}\n### ❌ Convergence gate failed`)).toBe(true);
    expect(body).toContain("[workflow run](https://github.example/lumen-labs/lumen/actions/runs/777)");
    expect(body).toContain("```mermaid"); // charts from the artifact's results and this checkout's baselines
    expect(existsSync(join(dir, ".gradgate/results.json"))).toBe(false); // nothing ran
  });

  it("does not comment when the pull request's head moved on (or the artifact names another one)", async () => {
    gh.pulls.set(12, { headSha: HEAD_B });
    const r = await step(dir, "workflow_run", workflowRun(HEAD_A), inputs);
    expect(gh.writes()).toEqual([]);
    expect(r.warnings).toContain(
      "::warning::gradgate: not commenting on pull request #12: its head is bbbbbbbbbbbb but the verdict was made for aaaaaaaaaaaa (a newer push will publish its own verdict)",
    );
    expect(r.outputs.verdict).toBe("fail");
  });

  it("renders a forged verdict's names as text", async () => {
    gh.pulls.set(12, { headSha: HEAD_A });
    const verdict = JSON.parse(readFileSync(join(artifact, "verdict.json"), "utf8"));
    const evil = "<script>alert(1)</script>[x](http://evil.example)|@octocat";
    verdict.cases[0].id = evil;
    verdict.gate.reasons[0].message = evil;
    writeFileSync(join(artifact, "forged.json"), canonicalJson(verdict));
    await step(dir, "workflow_run", workflowRun(HEAD_A), {
      ...inputs,
      "verdict-file": "artifact/forged.json",
      "results-file": "none.json",
    });
    const body = (gh.writes()[0].body as { body: string }).body;
    // In the table the name is literal code; everywhere else it is escaped text.
    expect(body).toContain(
      "| `<script>alert(1)</script>[x](http://evil.example)\\|@octocat` | 🔴 regressed |",
    );
    for (const { line } of proseLines(body)) {
      // Our own link to the workflow run is the only link allowed.
      const outside = codeSpans(line).outside.replace(
        "[workflow run](https://github.example/lumen-labs/lumen/actions/runs/777)",
        "",
      );
      expect(outside).not.toContain("<script>");
      expect(outside).not.toMatch(/(?<!\\)\]\(http/);
      expect(outside).not.toContain("@octocat");
    }
    expect(body).toContain("&lt;script&gt;alert\\(1\\)&lt;\\/script&gt;");
  });

  it("refuses a verdict file that is not one", async () => {
    writeFileSync(
      join(artifact, "bad.json"),
      JSON.stringify({ format: "gradgate-verdict", version: 1, gate: { verdict: "maybe" } }),
    );
    const r = await step(dir, "workflow_run", workflowRun(HEAD_A), {
      ...inputs,
      "verdict-file": "artifact/bad.json",
    });
    expect(r.errors).toEqual([
      '::error::gradgate: verdict artifact/bad.json: gate.verdict must be "pass" or "fail", got "maybe"',
    ]);
    expect(gh.writes()).toEqual([]);
  });
});

describe("rebaseline mode", () => {
  it("on a release, takes the release as the reason and writes the audit entry", async () => {
    const dir = join(root, "release");
    cpSync(project, dir, { recursive: true, filter: (src) => !src.includes(".gradgate") });
    const r = await step(
      dir,
      "release",
      { action: "published", release: { tag_name: "v1.3.0", name: "Spring cleaning" } },
      {
        mode: "rebaseline",
        config: "candidate-slow.yml",
      },
    );
    expect(r.failed).toBe(false);
    expect(r.outputs["baselines-changed"]).toBe("true");
    const log = readFileSync(join(dir, "baselines/audit.jsonl"), "utf8").trim().split("\n");
    expect(log).toHaveLength(2);
    const entry = JSON.parse(log[1]);
    expect(entry.reason).toBe("release v1.3.0: Spring cleaning");
    expect(entry.commit).toBe("0123456789abcdef0123456789abcdef01234567");
    expect(r.summary).toContain("### Baselines refreshed");
    expect(r.summary).toContain("Reason: release v1\\.3\\.0\\: Spring cleaning");
    expect(gh.requests).toEqual([]);
  });

  it("by hand, needs a reason", async () => {
    const r = await step(project, "workflow_dispatch", {}, { mode: "rebaseline" });
    expect(r.errors).toEqual([
      '::error::gradgate: input reason is required in mode "rebaseline" outside a release: say why the baselines change, e.g. "adam: fix bias correction (#123)"',
    ]);
  });
});

describe("failures", () => {
  it("turns bad input into one failure message", async () => {
    const r = await step(project, "pull_request", pullRequestEvent(7, HEAD_A), { mode: "judge" });
    expect(r.errors).toEqual([
      '::error::gradgate: input mode must be one of gate, rebaseline, merge, publish, got "judge"',
    ]);
    expect(r.failed).toBe(true);
  });
  it("marks anything else as an internal error, Error or not", () => {
    expect(failureMessage("boom")).toBe("gradgate: internal error (please report): boom");
    expect(failureMessage(new TypeError("x is not a function"))).toMatch(
      /^gradgate: internal error \(please report\): TypeError: x is not a function\n {4}at /,
    );
  });
});
