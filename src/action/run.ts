/**
 * The Action's `run()`: read the inputs and the workflow context, keep the token out of reach of the
 * optimizer under test, run the mode, and turn anything thrown (Error or not) into one failure message.
 * No side effects on import: tests import it and call it with their own INPUT_* environment.
 *
 * The token is read here, into the settings, and stays in this process: optimizer code runs only in the
 * engine process (./engine-process.ts), whose environment, arguments and files never carry it. The
 * credential variables are also removed from this process's environment once read (defence in depth:
 * nothing started from here inherits them by accident).
 */
import { InputError } from "../core/errors.js";
import { coreHost } from "./core-host.js";
import { CREDENTIAL_VARIABLES } from "./engine-env.js";
import { EngineFailure } from "./engine-process.js";
import { readContext } from "./event.js";
import type { ActionHost } from "./host.js";
import { runMode } from "./modes.js";
import { readSettings } from "./settings.js";

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

/** One line for people: input errors and the engine process's failures as they are, anything else marked as a gradgate bug with its stack. */
export function failureMessage(err: unknown): string {
  if (err instanceof InputError || err instanceof EngineFailure) return `gradgate: ${err.message}`;
  if (err instanceof Error) return `gradgate: internal error (please report): ${err.stack ?? err.message}`;
  return `gradgate: internal error (please report): ${String(err)}`;
}
