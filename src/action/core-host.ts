/** The ActionHost of a real workflow run: @actions/core (log commands, GITHUB_OUTPUT, GITHUB_STEP_SUMMARY). */
import { randomUUID } from "node:crypto";
import * as core from "@actions/core";
import type { ActionHost } from "./host.js";

export function coreHost(): ActionHost {
  return {
    debug: (m) => core.debug(m),
    info: (m) => core.info(m),
    warning: (m) => core.warning(m),
    annotate: (message, title) => core.error(message, { title }),
    setOutput: (name, value) => core.setOutput(name, value),
    appendSummary: async (markdown) => {
      await core.summary.addRaw(markdown, true).write();
      core.summary.emptyBuffer();
    },
    fail: (m) => core.setFailed(m),
    group: (name, fn) => core.group(name, fn),
    withoutCommands: async (fn) => {
      // The runner's "stop-commands" command: nothing is a command until the unguessable end token.
      const token = randomUUID();
      core.info(`::stop-commands::${token}`);
      try {
        return await fn();
      } finally {
        core.info(`::${token}::`);
      }
    },
  };
}
