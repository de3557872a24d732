/**
 * The environment of the engine process (./engine-process.ts), the child process in which the optimizer
 * under test runs: an allow-list, never the step's own environment.
 *
 * A workflow step's environment holds the token input (INPUT_TOKEN), the runner's own credentials
 * (ACTIONS_RUNTIME_TOKEN, ACTIONS_ID_TOKEN_REQUEST_*), and whatever the workflow put under `env:` — job-wide
 * secrets included. A deny-list would pass on every secret nobody named, so the engine process gets only
 * what a Node.js process needs to run (the same allow-list as optimizer processes of the subprocess
 * adapter, src/adapters/env.ts) and a little non-secret context about the runner. The names of known
 * credentials, every INPUT_* and ACTIONS_* variable and every value that contains a secret are refused
 * on top, so that widening the allow-list by mistake still cannot pass them on.
 */
import { PASSED_VARIABLES } from "../adapters/env.js";

/** Variables that hold credentials in a workflow step. */
export const CREDENTIAL_VARIABLES: readonly string[] = Object.freeze([
  "INPUT_TOKEN",
  "GITHUB_TOKEN",
  "GH_TOKEN",
  "ACTIONS_RUNTIME_TOKEN",
  "ACTIONS_ID_TOKEN_REQUEST_TOKEN",
  "ACTIONS_ID_TOKEN_REQUEST_URL",
]);

/** Non-secret context about the runner passed to the engine process when set (on top of PASSED_VARIABLES). */
export const CONTEXT_VARIABLES: readonly string[] = Object.freeze([
  "CI",
  "GITHUB_ACTIONS",
  "GITHUB_WORKSPACE",
  "RUNNER_OS",
  "RUNNER_ARCH",
  "RUNNER_TEMP",
]);

/** True for a variable the engine process never receives, whatever the allow-list says. */
export function isCredentialName(name: string): boolean {
  const upper = name.toUpperCase();
  return CREDENTIAL_VARIABLES.includes(upper) || upper.startsWith("INPUT_") || upper.startsWith("ACTIONS_");
}

/**
 * The engine process's environment: the allow-listed variables of `parent` that are set, minus credential
 * names and minus any variable whose value contains one of `secrets` (non-empty values only).
 */
export function engineEnvironment(
  parent: Readonly<Record<string, string | undefined>>,
  secrets: readonly string[],
): Record<string, string> {
  const hidden = secrets.filter((s) => s !== "");
  const env: Record<string, string> = {};
  for (const name of [...PASSED_VARIABLES, ...CONTEXT_VARIABLES]) {
    const value = parent[name];
    if (value === undefined || isCredentialName(name)) continue;
    if (hidden.some((s) => value.includes(s))) continue;
    env[name] = value;
  }
  return env;
}
