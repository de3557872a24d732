/**
 * The process boundary between the optimizer under test and the token (src/action/engine-process.ts),
 * with run() from the sources as a workflow step runs it: real INPUT_* and GITHUB_* variables, real
 * GITHUB_OUTPUT and GITHUB_STEP_SUMMARY files, the real @actions/core host, the GitHub API as a local server
 * on 127.0.0.1, and the engine started as a real child process (main.ts through tsx). The process that
 * posts the comment is this test's own process; the optimizer writes down which process it ran in.
 */
import { cpSync, existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { pathToFileURL } from "node:url";
import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it, vi } from "vitest";
import { CREDENTIAL_VARIABLES } from "../../src/action/engine-env.js";
import { run } from "../../src/action/run.js";
import { FakeGitHub } from "./fake-github.js";
import { readSpy, SPY_FILE, writeSpyProject } from "./spy-optimizer.js";
import { HEAD_A, makeProject, pullRequestEvent, readOutputs, runnerEnv } from "./workflow.js";

const gh = new FakeGitHub();
const root = mkdtempSync(join(tmpdir(), "gradgate-engine-"));
const project = join(root, "project");
// @actions/core remembers the summary file of its first write, so one file serves the whole test file.
const summaryFile = join(root, "step-summary.md");
const outputFile = join(root, "step-output.txt");

/** The credentials of the step; none may reach the optimizer. */
const SECRETS = {
  INPUT_TOKEN: "ghs_input_token_4f1c",
  GITHUB_TOKEN: "ghs_job_token_9b2e",
  ACTIONS_RUNTIME_TOKEN: "runtime_secret_77aa",
  ACTIONS_ID_TOKEN_REQUEST_TOKEN: "oidc_secret_31d0",
  ACTIONS_ID_TOKEN_REQUEST_URL: "https://token.example/oidc?secret=5c5c",
  // A secret the workflow put under `env:` for the whole job, under a name nobody listed.
  DEPLOY_KEY: "deploy_secret_e0e0",
};

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
    if (name.startsWith("INPUT_") || name.startsWith("GITHUB_") || name.startsWith("ACTIONS_"))
      delete process.env[name];
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

/**
 * The lines of the log the runner reads as workflow commands: those starting with "::" outside the
 * blocks between "::stop-commands::TOKEN" and "::TOKEN::".
 */
function commands(log: string): string[] {
  const out: string[] = [];
  let stopped: string | null = null;
  for (const line of log.split("\n")) {
    if (stopped !== null) {
      if (line === `::${stopped}::`) stopped = null;
      continue;
    }
    const m = /^::stop-commands::(.+)$/.exec(line);
    if (m) stopped = m[1];
    else if (line.startsWith("::")) out.push(line);
  }
  return out;
}

/** A copy of the project in which to run one step. */
function copyProject(name: string): string {
  const dir = join(root, name);
  cpSync(project, dir, { recursive: true, filter: (src) => !src.includes(".gradgate") });
  return dir;
}

/** Runs one step in `dir` with the runner's variables for a pull request, the credentials and `inputs`. */
async function step(dir: string, inputs: Record<string, string>) {
  Object.assign(process.env, runnerEnv(dir, gh.url, "pull_request", pullRequestEvent(7, HEAD_A)), SECRETS, {
    GITHUB_STEP_SUMMARY: summaryFile,
    GITHUB_OUTPUT: outputFile,
    INPUT_WORKERS: "1",
  });
  for (const [name, value] of Object.entries(inputs)) process.env[`INPUT_${name.toUpperCase()}`] = value;
  process.chdir(dir);
  await run();
  const cmds = commands(stdout);
  return {
    outputs: readOutputs(outputFile),
    failed: process.exitCode === 1,
    errors: cmds.filter((l) => l.startsWith("::error")),
  };
}

describe("the optimizer under test never shares a process with the token", () => {
  it.each([
    [1, "the engine process's main thread"],
    [2, "worker threads of the engine process"],
  ])(
    "workers %i: the optimizer runs on %s, sees no credential and sends nothing; this process comments",
    async (workers) => {
      const dir = copyProject(`spy-${workers}`);
      const config = writeSpyProject(dir, "gradgate.yml", true);
      const r = await step(dir, { config, workers: String(workers) });

      // This process posted the comment, with the token.
      expect(r.failed, stdout).toBe(false);
      expect(r.outputs.verdict).toBe("pass");
      expect(gh.writes().map((w) => `${w.method} ${w.path} ${w.auth}`)).toEqual([
        `POST /repos/lumen-labs/lumen/issues/7/comments Bearer ${SECRETS.INPUT_TOKEN}`,
      ]);

      const spy = readSpy(dir);
      const loaded = spy.filter((s) => s.kind === "loaded");
      // Loaded by `run` (main thread, and each worker) and by `compare` (its reference check): two engine
      // processes, both children of this one, neither of them this one.
      expect(new Set(loaded.map((s) => s.pid)).size).toBe(2);
      for (const s of spy) {
        expect(s.pid).not.toBe(process.pid);
        expect(s.ppid).toBe(process.pid);
      }
      // Where the runs happened.
      const steps = spy.filter((s) => s.kind === "step");
      expect(steps.length).toBeGreaterThanOrEqual(1);
      for (const s of steps) {
        if (workers === 1) expect(s.threadId).toBe(0);
        else expect(s.threadId).toBeGreaterThan(0);
      }
      // What the optimizer saw: the non-secret context, and no credential by name or by value.
      for (const s of loaded) {
        const env = s.env!;
        expect(env.GITHUB_WORKSPACE).toBe(dir);
        expect(env.PATH).toBe(process.env.PATH);
        for (const name of Object.keys(env)) expect(name).not.toMatch(/^(INPUT_|ACTIONS_)/);
        for (const name of [...CREDENTIAL_VARIABLES, "DEPLOY_KEY", "GITHUB_OUTPUT", "GITHUB_STEP_SUMMARY"])
          expect(env[name], name).toBeUndefined();
        const seen = JSON.stringify([env, s.argv, s.execArgv]);
        for (const secret of Object.values(SECRETS)) expect(seen).not.toContain(secret);
      }
      // No request left the optimizer's processes, so no Authorization header was there to catch.
      expect(spy.filter((s) => s.kind === "request")).toEqual([]);
      // The token reached no file the step left behind.
      for (const f of [".gradgate/results.json", ".gradgate/verdict.json", ".gradgate/report.html"])
        expect(readFileSync(join(dir, f), "utf8")).not.toContain(SECRETS.INPUT_TOKEN);
    },
  );

  it("control: the same spy loaded into the process that posts catches the token", async () => {
    const dir = copyProject("spy-control");
    writeSpyProject(dir, "gradgate.yml", false);
    const spyModule = (await import(
      /* @vite-ignore */ `${pathToFileURL(join(dir, SPY_FILE)).href}?control`
    )) as { unwrap: () => void };
    try {
      // The suite is the plain one: the engine never loads the spy, only this process has it.
      const r = await step(dir, {});
      expect(r.outputs.verdict).toBe("pass");
    } finally {
      spyModule.unwrap();
    }
    const requests = readSpy(dir).filter((s) => s.kind === "request");
    expect(requests.length).toBeGreaterThanOrEqual(2); // list the comments, then create one
    for (const q of requests) {
      expect(q.pid).toBe(process.pid);
      expect(q.via).toBe("fetch");
      expect(q.authorization).toBe(`Bearer ${SECRETS.INPUT_TOKEN}`);
    }
  });
});

describe("the engine process's exit", () => {
  it("an input error in the engine (exit 2) fails the step with the engine's message, nothing posted", async () => {
    const dir = copyProject("input-error");
    const r = await step(dir, { config: "missing.yml" });
    expect(r.failed).toBe(true);
    expect(r.errors).toEqual(["::error::gradgate: config missing.yml: no such file"]);
    expect(gh.requests).toEqual([]);
  });

  it("optimizer code that ends the engine early (exit 0, no results) fails the step; a stale results file is not read", async () => {
    const dir = copyProject("ends-early");
    writeFileSync(
      join(dir, "quits.mjs"),
      `process.stdout.write("::error title=forged::written by the optimizer\\n::add-mask::gradgate\\n");
export const quits = { create() { process.exit(0); } };
`,
    );
    writeFileSync(
      join(dir, "quits.yml"),
      readFileSync(join(dir, "gradgate.yml"), "utf8").replace(
        "    use: sgd\n",
        "    use: module:./quits.mjs#quits\n",
      ),
    );
    // The results of an earlier run, which this run must not take for its own.
    cpSync(join(project, "first/results.json"), join(dir, ".gradgate/results.json"));
    const r = await step(dir, { config: "quits.yml" });
    expect(r.failed).toBe(true);
    // The optimizer's lines are in the log as text, inside a stop-commands block, not read as commands.
    expect(stdout).toContain("::error title=forged::written by the optimizer\n");
    expect(r.errors).toEqual([
      "::error::gradgate: the engine process (gradgate run, which runs the optimizer code) exited with code 0 " +
        "before finishing its command; optimizer code can end it early (process.exit, a signal, running out of " +
        "memory): see its output in the log above",
    ]);
    expect(commands(stdout).some((l) => l.startsWith("::add-mask::"))).toBe(false);
    expect(existsSync(join(dir, ".gradgate/results.json"))).toBe(false);
    expect(gh.requests).toEqual([]);
  });

  it("streams the engine's output into the step's log groups", async () => {
    const r = await step(copyProject("log"), {});
    expect(r.outputs.verdict).toBe("pass");
    const lines = stdout.split("\n");
    const at = (text: string) => lines.findIndex((l) => l.includes(text));
    const runGroup = at("::group::Run the suite");
    const compareGroup = at("::group::Compare with the baselines");
    expect(runGroup).toBeGreaterThanOrEqual(0);
    expect(at("gradgate: 4 cases, 24 runs, 1 worker(s), suite gradgate.yml")).toBeGreaterThan(runGroup);
    expect(at("gradgate: 4 cases, 24 runs, 1 worker(s), suite gradgate.yml")).toBeLessThan(compareGroup);
    expect(at("gate: PASS")).toBeGreaterThan(compareGroup);
  });
});
