/** The ActionHost of a real workflow run: @actions/core (log commands, GITHUB_OUTPUT, GITHUB_STEP_SUMMARY). */
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
  };
}
