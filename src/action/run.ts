/**
 * The Action's `run()`: read the inputs and the workflow context, keep the token out of reach of the
 * optimizer under test, run the mode, and turn anything thrown (Error or not) into one failure message.
 * No side effects on import: tests import it and call it with their own INPUT_* environment.
 */
import { InputError } from "../core/errors.js";
import { coreHost } from "./core-host.js";
import { readContext } from "./event.js";
import type { ActionHost } from "./host.js";
import { runMode } from "./modes.js";
import { readSettings } from "./settings.js";

/**
 * Variables that hold credentials in a workflow step. They are removed from this process's environment
 * before any optimizer code is loaded, so in-process optimizers, worker threads and child processes do
 * not inherit them. (That is defence in depth only: code running in a job can reach the runner's own
 * files and processes, so a job that runs untrusted code must not hold a write token at all; see
 * docs/workflows.md.)
 */
export const CREDENTIAL_VARIABLES: readonly string[] = [
  "INPUT_TOKEN",
  "GITHUB_TOKEN",
  "GH_TOKEN",
  "ACTIONS_RUNTIME_TOKEN",
  "ACTIONS_ID_TOKEN_REQUEST_TOKEN",
  "ACTIONS_ID_TOKEN_REQUEST_URL",
];

export async function run(host: ActionHost = coreHost()): Promise<void> {
  try {
    const settings = readSettings(process.env, (line) => host.debug(line));
    for (const name of CREDENTIAL_VARIABLES) delete process.env[name];
    const context = readContext(process.env);
    host.debug(
      `gradgate context: event ${context.eventName || "(none)"}, repository ${
        context.repository ? `${context.repository.owner}/${context.repository.repo}` : "(none)"
      }, pull request ${context.pullRequest ? `#${context.pullRequest.number}${context.pullRequest.fork ? " (fork)" : ""}` : "(none)"}`,
    );
    await runMode({ host, settings, context, cwd: process.cwd() });
  } catch (err) {
    host.fail(failureMessage(err));
  }
}

/** One line for people: input errors as they are, anything else marked as a gradgate bug with its stack. */
export function failureMessage(err: unknown): string {
  if (err instanceof InputError) return `gradgate: ${err.message}`;
  if (err instanceof Error) return `gradgate: internal error (please report): ${err.stack ?? err.message}`;
  return `gradgate: internal error (please report): ${String(err)}`;
}
