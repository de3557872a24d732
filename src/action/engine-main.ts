/**
 * The engine process's side (see ./engine-process.ts): the CLI on this process's arguments, its outcome
 * reported on OUTCOME_FD, then the process ends. Loaded by src/action/main.ts when ENGINE_MARKER is set;
 * nothing here touches the Action's settings, @actions/* or the GitHub API.
 */
import { writeSync } from "node:fs";
import type { Writable } from "node:stream";
import { EXIT, type Host, processHost } from "../cli/host.js";
import { main } from "../cli/main.js";
import { OUTCOME_FD, type EngineOutcome } from "./engine-process.js";

export async function engineMain(argv: readonly string[]): Promise<void> {
  // The CLI prints its error last, through its host: remember what it printed there.
  let lastError = "";
  const base = processHost();
  const host: Host = {
    ...base,
    err: (text) => {
      lastError = text;
      base.err(text);
    },
  };
  const code = await main(argv, host);
  const failed = code === EXIT.input || code === EXIT.internal;
  const outcome: EngineOutcome = {
    code,
    message: failed ? lastError.replace(/^gradgate: /, "").trimEnd() : "",
  };
  try {
    writeSync(OUTCOME_FD, JSON.stringify(outcome) + "\n");
  } catch {
    // Started by hand, without the outcome pipe: the exit code says it all.
  }
  // Optimizer code may leave timers or handles behind; the command is done, so end once the output is out.
  await Promise.all([flushed(process.stdout), flushed(process.stderr)]);
  process.exit(code);
}

function flushed(stream: Writable): Promise<void> {
  return new Promise((resolve) => stream.write("", () => resolve()));
}
