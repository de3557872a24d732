/**
 * The committed bundle, run the way the runner runs it: `node dist/index.js` in a child process (this
 * Node.js, 20 here), with INPUT_* and GITHUB_* variables, real GITHUB_OUTPUT and GITHUB_STEP_SUMMARY files,
 * and the GitHub API as a local server. `.ci/run` rebuilds dist/ and fails when it differs from the
 * committed one, so these tests see the bundle of the sources under test.
 */
import { spawn } from "node:child_process";
import { cpSync, existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { CREDENTIAL_VARIABLES } from "../../src/action/engine-env.js";
import { runCommand } from "../../src/cli/run-command.js";
import { FakeGitHub } from "./fake-github.js";
import { readSpy, writeSpyProject } from "./spy-optimizer.js";
import { HEAD_A, makeProject, pullRequestEvent, readOutputs, runnerEnv } from "./workflow.js";

const bundle = fileURLToPath(new URL("../../dist/index.js", import.meta.url));
const gh = new FakeGitHub();
const root = mkdtempSync(join(tmpdir(), "gradgate-dist-"));
const project = join(root, "project");

beforeAll(async () => {
  await gh.start();
  await makeProject(project);
});
afterAll(async () => {
  await gh.stop();
  rmSync(root, { recursive: true, force: true });
});
beforeEach(() => gh.reset());

/** The credentials of the step; none may reach the optimizer. */
const SECRETS = {
  GITHUB_TOKEN: "ghs_job_token",
  ACTIONS_RUNTIME_TOKEN: "runtime_secret",
  INPUT_TOKEN: "ghs_input_token",
  // A secret the workflow put under `env:` for the whole job, under a name nobody listed.
  DEPLOY_KEY: "deploy_secret",
};

interface StepResult {
  /** The process id of the Action (the process that talks to the API). */
  readonly pid: number;
  readonly code: number | null;
  readonly stdout: string;
  readonly outputs: Record<string, string>;
  readonly summary: string;
}

/** Runs the bundle as one workflow step in `dir`. The child gets only the variables a runner would set. */
function step(
  dir: string,
  event: string,
  payload: unknown,
  inputs: Record<string, string>,
): Promise<StepResult> {
  const summary = join(dir, `summary-${Date.now()}.md`);
  const output = join(dir, `output-${Date.now()}.txt`);
  writeFileSync(summary, "");
  writeFileSync(output, "");
  const env: Record<string, string> = {
    PATH: process.env.PATH ?? "/usr/bin:/bin",
    HOME: dir,
    ...runnerEnv(dir, gh.url, event, payload),
    GITHUB_STEP_SUMMARY: summary,
    GITHUB_OUTPUT: output,
    ...SECRETS,
  };
  for (const [name, value] of Object.entries(inputs)) env[`INPUT_${name.toUpperCase()}`] = value;
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, [bundle], { cwd: dir, env, stdio: ["ignore", "pipe", "pipe"] });
    let stdout = "";
    child.stdout.on("data", (d) => (stdout += d));
    child.stderr.on("data", (d) => (stdout += d));
    const timer = setTimeout(() => child.kill("SIGKILL"), 120_000);
    child.on("error", reject);
    child.on("close", (code) => {
      clearTimeout(timer);
      resolve({
        pid: child.pid!,
        code,
        stdout,
        outputs: readOutputs(output),
        summary: readFileSync(summary, "utf8"),
      });
    });
  });
}

describe("dist/index.js", () => {
  it("exists with its package.json marking it as ES modules", () => {
    expect(existsSync(bundle)).toBe(true);
    expect(JSON.parse(readFileSync(join(bundle, "../package.json"), "utf8"))).toEqual({ type: "module" });
  });

  it("runs the gate on three worker threads started from the bundle, with the same bytes as one thread", async () => {
    const r = await step(project, "pull_request", pullRequestEvent(7, HEAD_A), { workers: "3" });
    expect(r.code, r.stdout).toBe(0);
    expect(r.stdout).toContain("gradgate: 4 cases, 24 runs, 3 worker(s), suite gradgate.yml");
    expect(r.outputs.verdict).toBe("pass");
    await runCommand(
      { out: () => {}, err: () => {}, interactive: false, cwd: project },
      { config: "gradgate.yml", out: "one-thread.json", workers: 1, quiet: true },
    );
    expect(readFileSync(join(project, ".gradgate/results.json"), "utf8")).toBe(
      readFileSync(join(project, "one-thread.json"), "utf8"),
    );
    expect(gh.writes().map((w) => `${w.method} ${w.path}`)).toEqual([
      "POST /repos/lumen-labs/lumen/issues/7/comments",
    ]);
    expect(gh.requests.every((q) => q.auth === "Bearer ghs_input_token")).toBe(true);
  });

  it.each([1, 2])(
    "workers %i: runs the repository's optimizer module in an engine process without credentials; the Action alone comments",
    async (workers) => {
      const dir = join(root, `spy-${workers}`);
      cpSync(project, dir, { recursive: true, filter: (src) => !src.includes(".gradgate") });
      // Untrusted code of the repository: gradient descent that writes down its process, its environment
      // and every request sent from its threads (tests/action/spy-optimizer.ts).
      const config = writeSpyProject(dir, "gradgate.yml", true);
      const r = await step(dir, "pull_request", pullRequestEvent(7, HEAD_A), {
        config,
        workers: String(workers),
      });
      expect(r.code, r.stdout).toBe(0);
      // The same module in place of the reference SGD gives the reference SGD's numbers: unchanged.
      expect(r.outputs.verdict).toBe("pass");
      expect(gh.writes().map((w) => `${w.method} ${w.path} ${w.auth}`)).toEqual([
        `POST /repos/lumen-labs/lumen/issues/7/comments Bearer ${SECRETS.INPUT_TOKEN}`,
      ]);

      const spy = readSpy(dir);
      // Loaded by `run` and by `compare` (its reference check): two engine processes started by the Action.
      expect(new Set(spy.filter((s) => s.kind === "loaded").map((s) => s.pid)).size).toBe(2);
      for (const s of spy) {
        expect(s.pid).not.toBe(r.pid);
        expect(s.ppid).toBe(r.pid);
      }
      const steps = spy.filter((s) => s.kind === "step");
      expect(steps.length).toBeGreaterThanOrEqual(1);
      for (const s of steps) expect(s.threadId === 0).toBe(workers === 1);
      for (const s of spy.filter((x) => x.kind === "loaded")) {
        expect(s.env!.GITHUB_WORKSPACE).toBe(dir);
        expect(s.env!.HOME).toBe(dir);
        for (const name of Object.keys(s.env!)) expect(name).not.toMatch(/^(INPUT_|ACTIONS_)/);
        for (const name of [...CREDENTIAL_VARIABLES, "DEPLOY_KEY"])
          expect(s.env![name], name).toBeUndefined();
        const seen = JSON.stringify([s.env, s.argv, s.execArgv]);
        for (const secret of Object.values(SECRETS)) expect(seen).not.toContain(secret);
        // Started from the bundle itself.
        expect(s.argv![1]).toBe(bundle);
      }
      expect(spy.filter((s) => s.kind === "request")).toEqual([]);
    },
  );

  it("fails with one message and exit code 1 on bad input", async () => {
    const r = await step(project, "push", {}, { workers: "lots" });
    expect(r.code).toBe(1);
    expect(r.stdout.split("\n").filter((l) => l.startsWith("::error"))).toEqual([
      '::error::gradgate: input workers must be a positive integer or "auto", got "lots"',
    ]);
  });
});
