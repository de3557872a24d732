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
import { runCommand } from "../../src/cli/run-command.js";
import { FakeGitHub } from "./fake-github.js";
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

interface StepResult {
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
    GITHUB_TOKEN: "ghs_job_token",
    ACTIONS_RUNTIME_TOKEN: "runtime_secret",
    INPUT_TOKEN: "ghs_input_token",
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
      resolve({ code, stdout, outputs: readOutputs(output), summary: readFileSync(summary, "utf8") });
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

  it("loads an optimizer module of the repository on worker threads, without the credentials in its environment", async () => {
    const dir = join(root, "module");
    cpSync(project, dir, { recursive: true, filter: (src) => !src.includes(".gradgate") });
    // Untrusted code of the repository: plain gradient descent that also writes down what it can see.
    writeFileSync(
      join(dir, "my-sgd.mjs"),
      `import { appendFileSync } from "node:fs";
const seen = Object.keys(process.env).filter((k) => /TOKEN|SECRET|ACTIONS_/.test(k) || k === "INPUT_TOKEN");
appendFileSync(new URL("./seen.txt", import.meta.url), JSON.stringify(seen) + "\\n");
export const mySgd = {
  name: "my-sgd",
  title: "gradient descent (test module)",
  defaults: { lr: 0.01 },
  create(hyper, dim) {
    const g = new Float64Array(dim);
    return { step(x, oracle) { oracle.evaluate(x, g); for (let i = 0; i < dim; i++) x[i] -= hyper.lr * g[i]; } };
  },
};
`,
    );
    writeFileSync(
      join(dir, "modules.yml"),
      readFileSync(join(dir, "gradgate.yml"), "utf8").replace(
        "    use: sgd\n",
        "    use: module:./my-sgd.mjs#mySgd\n",
      ),
    );
    const r = await step(dir, "push", {}, { config: "modules.yml", workers: "2" });
    expect(r.code, r.stdout).toBe(0);
    const seen = readFileSync(join(dir, "seen.txt"), "utf8").trim().split("\n");
    expect(seen.length).toBeGreaterThanOrEqual(2); // the main thread and at least one worker loaded it
    for (const line of seen) expect(JSON.parse(line)).toEqual([]);
    // The same module in place of the reference SGD gives the reference SGD's numbers: unchanged.
    expect(r.outputs.verdict).toBe("pass");
  });

  it("fails with one message and exit code 1 on bad input", async () => {
    const r = await step(project, "push", {}, { workers: "lots" });
    expect(r.code).toBe(1);
    expect(r.stdout.split("\n").filter((l) => l.startsWith("::error"))).toEqual([
      '::error::gradgate: input workers must be a positive integer or "auto", got "lots"',
    ]);
  });
});
