/**
 * A stand-in for one workflow step on a runner, for the Action tests: a project directory with a suite
 * and baselines, the GITHUB_* and INPUT_* variables the runner sets, an event payload file, and real
 * files for GITHUB_OUTPUT and GITHUB_STEP_SUMMARY that the tests read back. Test helper.
 */
import { mkdirSync, readFileSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { rebaselineCommand } from "../../src/cli/rebaseline-command.js";
import { runCommand } from "../../src/cli/run-command.js";
import type { Host } from "../../src/cli/host.js";

/** The suite of the tests: two reference optimizers on two problems, 6 seeds, quick. */
export const SUITE = (sgdLr: number) => `seed: 3
seeds: 6
budget: { steps: 400 }
policy: { extraSeeds: { perCase: 4 } }
optimizers:
  - name: sgd
    use: sgd
    hyper: { lr: ${sgdLr} }
  - name: adam
    use: adam
    hyper: { lr: 0.05 }
problems:
  - use: quadratic
  - use: beale
`;

export const HEAD_A = "a".repeat(40);
export const HEAD_B = "b".repeat(40);
export const BASE_SHA = "0123456789abcdef0123456789abcdef01234567";

const quietHost = (cwd: string): Host => ({ out: () => {}, err: () => {}, interactive: false, cwd });

/**
 * Writes gradgate.yml (baseline step size 0.01), candidate-slow.yml (the same suite with SGD at half the
 * step size: slower on both problems) and records baselines from gradgate.yml.
 */
export async function makeProject(dir: string): Promise<void> {
  mkdirSync(dir, { recursive: true });
  writeFileSync(join(dir, "gradgate.yml"), SUITE(0.01));
  writeFileSync(join(dir, "candidate-slow.yml"), SUITE(0.005));
  const host = quietHost(dir);
  await runCommand(host, { config: "gradgate.yml", out: "first/results.json", workers: 1, quiet: true });
  await rebaselineCommand(host, {
    results: "first/results.json",
    reason: "first baselines",
    baselines: "baselines",
    commit: BASE_SHA,
    allowSuiteChange: false,
    workers: 1,
    quiet: true,
  });
}

export interface Step {
  /** Variables to set for the step (INPUT_*, GITHUB_*), on top of the common ones. */
  readonly env: Record<string, string>;
}

/** The event payload of a pull request; `from` is the head repository ("owner/name"). */
export function pullRequestEvent(number: number, headSha: string, from = "lumen-labs/lumen") {
  return {
    action: "synchronize",
    number,
    pull_request: {
      number,
      head: { sha: headSha, ref: "feature", repo: { full_name: from } },
      base: { sha: BASE_SHA, ref: "main", repo: { full_name: "lumen-labs/lumen" } },
    },
  };
}

/** Parses the GITHUB_OUTPUT file format (name<<delimiter, value lines, delimiter). */
export function readOutputs(path: string): Record<string, string> {
  const out: Record<string, string> = {};
  const lines = readFileSync(path, "utf8").split("\n");
  for (let i = 0; i < lines.length; i++) {
    const m = /^([^<]+)<<(.+)$/.exec(lines[i]);
    if (!m) continue;
    const value: string[] = [];
    for (i++; i < lines.length && lines[i] !== m[2]; i++) value.push(lines[i]);
    out[m[1]] = value.join("\n");
  }
  return out;
}

/** The variables the runner sets for every step of the tests' workflow. */
export function runnerEnv(
  dir: string,
  apiUrl: string,
  event: string,
  payload: unknown,
): Record<string, string> {
  const eventPath = join(dir, `event-${event}.json`);
  writeFileSync(eventPath, JSON.stringify(payload));
  return {
    GITHUB_ACTIONS: "true",
    GITHUB_EVENT_NAME: event,
    GITHUB_EVENT_PATH: eventPath,
    GITHUB_REPOSITORY: "lumen-labs/lumen",
    GITHUB_SHA: BASE_SHA,
    GITHUB_WORKFLOW: "convergence",
    GITHUB_RUN_ID: "4242",
    GITHUB_SERVER_URL: "https://github.example",
    GITHUB_API_URL: apiUrl,
    GITHUB_WORKSPACE: dir,
  };
}
