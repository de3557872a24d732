/** The engine process's environment (src/action/engine-env.ts): what passes, what never does. */
import { describe, expect, it } from "vitest";
import { engineEnvironment, isCredentialName } from "../../src/action/engine-env.js";
import { parseOutcome } from "../../src/action/engine-process.js";

/** A workflow step's environment, trimmed: the runner's variables, the token input, a job-wide secret. */
const STEP_ENV = {
  PATH: "/usr/local/bin:/usr/bin:/bin",
  HOME: "/home/runner",
  LANG: "C.UTF-8",
  TMPDIR: "/tmp",
  CI: "true",
  GITHUB_ACTIONS: "true",
  GITHUB_WORKSPACE: "/home/runner/work/lumen/lumen",
  RUNNER_OS: "Linux",
  RUNNER_ARCH: "X64",
  RUNNER_TEMP: "/home/runner/work/_temp",
  GITHUB_REPOSITORY: "lumen-labs/lumen",
  GITHUB_EVENT_PATH: "/home/runner/work/_temp/_github_workflow/event.json",
  GITHUB_OUTPUT: "/home/runner/work/_temp/_runner_file_commands/set_output_1",
  GITHUB_STEP_SUMMARY: "/home/runner/work/_temp/_runner_file_commands/step_summary_1",
  GITHUB_ENV: "/home/runner/work/_temp/_runner_file_commands/set_env_1",
  INPUT_TOKEN: "ghs_abc",
  INPUT_WORKERS: "2",
  INPUT_CONFIG: "gradgate.yml",
  GITHUB_TOKEN: "ghs_abc",
  GH_TOKEN: "ghs_abc",
  ACTIONS_RUNTIME_TOKEN: "rt",
  ACTIONS_RUNTIME_URL: "https://pipelines.example/",
  ACTIONS_ID_TOKEN_REQUEST_TOKEN: "oidc",
  ACTIONS_ID_TOKEN_REQUEST_URL: "https://oidc.example/?x",
  AWS_SECRET_ACCESS_KEY: "aws",
  NPM_TOKEN: "npm",
};

describe("engineEnvironment", () => {
  it("passes only what a process needs and non-secret runner context", () => {
    expect(engineEnvironment(STEP_ENV, ["ghs_abc"])).toEqual({
      PATH: "/usr/local/bin:/usr/bin:/bin",
      HOME: "/home/runner",
      LANG: "C.UTF-8",
      TMPDIR: "/tmp",
      CI: "true",
      GITHUB_ACTIONS: "true",
      GITHUB_WORKSPACE: "/home/runner/work/lumen/lumen",
      RUNNER_OS: "Linux",
      RUNNER_ARCH: "X64",
      RUNNER_TEMP: "/home/runner/work/_temp",
    });
  });

  it("leaves out an allow-listed variable whose value holds the token", () => {
    const env = engineEnvironment({ ...STEP_ENV, HOME: "/home/ghs_abc", TMPDIR: "/tmp" }, ["ghs_abc"]);
    expect(env.HOME).toBeUndefined();
    expect(env.TMPDIR).toBe("/tmp");
  });

  it("ignores an empty token (no input given) instead of dropping every variable", () => {
    expect(engineEnvironment({ PATH: "/bin" }, [""])).toEqual({ PATH: "/bin" });
  });

  it.each([
    ["INPUT_TOKEN", true],
    ["input_token", true],
    ["INPUT_WORKERS", true],
    ["ACTIONS_RUNTIME_URL", true],
    ["GITHUB_TOKEN", true],
    ["GH_TOKEN", true],
    ["GITHUB_WORKSPACE", false],
    ["PATH", false],
  ])("isCredentialName(%s) is %s", (name, expected) => {
    expect(isCredentialName(name)).toBe(expected);
  });
});

describe("parseOutcome", () => {
  it.each([
    ['{"code":0,"message":""}\n', { code: 0, message: "" }],
    [
      '{"code":2,"message":"config x.yml: no such file"}\n',
      { code: 2, message: "config x.yml: no such file" },
    ],
    // Only the last line counts.
    ['{"code":0,"message":""}\n{"code":1,"message":""}\n', { code: 1, message: "" }],
    ["", null],
    ["not json\n", null],
    ['{"code":"0","message":""}\n', null],
    ['{"code":0}\n', null],
  ])("%j → %j", (text, expected) => {
    expect(parseOutcome(text)).toEqual(expected);
  });
});
