/**
 * The engine process: every mode that runs code of the repository (gate, a shard's run, merge's extra-seed
 * re-runs and reference checks, rebaseline) runs it in a child Node.js process, never in the process that
 * holds the token. Optimizer code loaded in-process (ES modules, on worker threads or on the main thread)
 * can patch anything in its process — `fetch`, `http`/`https`, the API client — so it must not share a
 * process with the code that later sends the token to GitHub.
 *
 * The child is the Action's own entry file (dist/index.js; the TypeScript sources through tsx in tests),
 * started with ENGINE_MARKER set, which makes it run the CLI on its arguments (src/action/main.ts). It
 * gets the allow-listed environment of ./engine-env.ts: no token, no INPUT_*, no ACTIONS_*, no step files
 * (GITHUB_OUTPUT, GITHUB_STEP_SUMMARY). It writes the results, verdict and baseline files exactly as the CLI
 * does; this process only reads them, reports, and talks to the API. The child's output goes to the step
 * log line by line with workflow commands switched off, so nothing it prints is read as a command.
 *
 * Exit codes are the CLI's: 0 done, 1 gate failed (compare only), 2 input error (its message fails the
 * step as it is), 3 internal error. The engine reports its code and error message on a pipe of its own
 * (OUTCOME_FD) just before exiting; an exit without that report (process.exit or a signal, which optimizer
 * code can cause) is reported as the engine process ending early, never as a result.
 */
import { spawn } from "node:child_process";
import { existsSync, rmSync, statSync } from "node:fs";
import { createRequire } from "node:module";
import { resolve } from "node:path";
import type { Readable } from "node:stream";
import { fileURLToPath, pathToFileURL } from "node:url";
import { InputError } from "../core/errors.js";
import { engineEnvironment } from "./engine-env.js";
import { ENGINE_MARKER } from "./engine-marker.js";
import type { ActionHost } from "./host.js";

/** How the engine process is started: `node [...execArgv] script ...argv`. */
interface EngineEntry {
  readonly script: string;
  readonly execArgv: readonly string[];
}

let engineEntry: EngineEntry | null = null;

/** Lets a bundled entry file start the engine process from itself (see src/action/main.ts). */
export function setEngineEntry(url: URL): void {
  engineEntry = { script: fileURLToPath(url), execArgv: [] };
}

/** Compiled: main.js beside this file. Sources (tests, development): main.ts through tsx's loader. */
function defaultEngineEntry(): EngineEntry {
  const here = new URL(import.meta.url);
  if (!here.pathname.endsWith(".ts"))
    return { script: fileURLToPath(new URL("./main.js", here)), execArgv: [] };
  // Resolved from this file (an absolute URL), so the engine starts from any working directory.
  const tsx = pathToFileURL(createRequire(here).resolve("tsx")).href;
  return { script: fileURLToPath(new URL("./main.ts", here)), execArgv: ["--import", tsx] };
}

/**
 * The engine process ended without one of the results its command promises. The message is for people
 * as it is (the step's failure message adds only the "gradgate: " prefix).
 */
export class EngineFailure extends Error {
  override readonly name = "EngineFailure";
}

export interface EngineCommand {
  /** The CLI's arguments, e.g. ["run", "--out=.gradgate/results.json"]. */
  readonly argv: readonly string[];
  /** Exit codes that are results: 0 for every command, and 1 (gate failed) for compare. */
  readonly codes: readonly number[];
  /**
   * A file the command writes, relative to the working directory: removed before the engine starts and
   * required after it, so a file left by an earlier run is never taken for this run's.
   */
  readonly writes?: string;
}

export interface EngineOptions {
  readonly host: ActionHost;
  readonly cwd: string;
  /** Values the engine process must not receive (the token): a variable holding one is left out. */
  readonly secrets: readonly string[];
}

/** The file descriptor on which the engine process reports its outcome (see ./engine-main.ts). */
export const OUTCOME_FD = 3;
/** Most bytes read from the outcome pipe. */
const MAX_OUTCOME = 1024 * 1024;
/** A line longer than this (characters) is logged in pieces. */
const MAX_LINE = 64 * 1024;
/** How long to wait for the output pipes after the engine exited (a grandchild may hold them open), ms. */
const DRAIN_MS = 2000;

/** What the engine process reports on OUTCOME_FD just before it exits: the CLI's exit code and error. */
export interface EngineOutcome {
  readonly code: number;
  /** The CLI's error message for exit codes 2 and 3 (without the "gradgate: " prefix), else "". */
  readonly message: string;
}

/** Runs one CLI command in the engine process and returns its exit code (one of `command.codes`). */
export async function runEngine(options: EngineOptions, command: EngineCommand): Promise<number> {
  const { host, cwd } = options;
  const target = command.writes === undefined ? null : resolve(cwd, command.writes);
  if (target !== null && existsSync(target) && statSync(target).isFile()) rmSync(target);
  const env = { ...engineEnvironment(process.env, options.secrets), [ENGINE_MARKER]: "1" };
  host.debug(
    `gradgate engine process: gradgate ${command.argv.join(" ")} (environment: ${Object.keys(env).sort().join(", ")})`,
  );
  const ended = await host.withoutCommands(() => spawnEngine(host, cwd, env, command.argv));
  const what = `the engine process (gradgate ${command.argv[0]}, which runs the optimizer code)`;
  const outcome = ended.signal === null ? parseOutcome(ended.outcome) : null;
  if (outcome === null || outcome.code !== ended.code || !isCliExit(outcome.code, command.codes)) {
    const how = ended.signal !== null ? `was ended by ${ended.signal}` : `exited with code ${ended.code}`;
    throw new EngineFailure(
      `${what} ${how} before finishing its command; optimizer code can end it early (process.exit, a ` +
        `signal, running out of memory): see its output in the log above`,
    );
  }
  if (outcome.code === 2) throw new InputError(outcome.message || `${what} reported an input error`);
  if (outcome.code === 3) throw new EngineFailure(outcome.message || `${what} reported an internal error`);
  if (target !== null && !existsSync(target)) {
    throw new EngineFailure(`${what} finished without writing ${command.writes}`);
  }
  return outcome.code;
}

/** Codes the CLI itself ends with for this command: its results, input error, internal error. */
function isCliExit(code: number, results: readonly number[]): boolean {
  return results.includes(code) || code === 2 || code === 3;
}

/** The last line of the outcome pipe, checked; null when there is none or it is not an outcome. */
export function parseOutcome(text: string): EngineOutcome | null {
  const line = text.trimEnd().split("\n").pop() ?? "";
  let data: unknown;
  try {
    data = JSON.parse(line);
  } catch {
    return null;
  }
  const o = data as Record<string, unknown> | null;
  if (o === null || typeof o !== "object" || !Number.isInteger(o.code) || typeof o.message !== "string") {
    return null;
  }
  return { code: o.code as number, message: o.message };
}

interface Ended {
  readonly code: number | null;
  readonly signal: NodeJS.Signals | null;
  /** What arrived on the outcome pipe. */
  readonly outcome: string;
}

function spawnEngine(
  host: ActionHost,
  cwd: string,
  env: Record<string, string>,
  argv: readonly string[],
): Promise<Ended> {
  const entry = engineEntry ?? defaultEngineEntry();
  return new Promise((resolvePromise, reject) => {
    const child = spawn(process.execPath, [...entry.execArgv, entry.script, ...argv], {
      cwd,
      env,
      stdio: ["ignore", "pipe", "pipe", "pipe"],
      shell: false,
      windowsHide: true,
    });
    const out = lineSink((line) => host.info(line));
    const err = lineSink((line) => host.info(line));
    const pipe = child.stdio[OUTCOME_FD] as Readable;
    let outcome = "";
    child.stdout!.setEncoding("utf8");
    child.stderr!.setEncoding("utf8");
    pipe.setEncoding("utf8");
    child.stdout!.on("data", out.write);
    child.stderr!.on("data", err.write);
    pipe.on("data", (text: string) => {
      if (outcome.length < MAX_OUTCOME) outcome += text;
    });
    let settled = false;
    let drain: NodeJS.Timeout | null = null;
    const finish = (code: number | null, signal: NodeJS.Signals | null) => {
      if (settled) return;
      settled = true;
      if (drain) clearTimeout(drain);
      out.end();
      err.end();
      for (const stream of [child.stdout!, child.stderr!, pipe]) stream.destroy();
      resolvePromise({ code, signal, outcome });
    };
    child.on("error", (error) => {
      if (settled) return;
      settled = true;
      reject(error);
    });
    // "close" comes once the output is drained too; a grandchild holding the pipes must not hold up the step.
    child.on("exit", (code, signal) => {
      drain = setTimeout(() => finish(code, signal), DRAIN_MS);
    });
    child.on("close", (code, signal) => finish(code, signal));
  });
}

/** Splits text into lines (blank ones dropped), emitting each whole line as it arrives. */
function lineSink(emit: (line: string) => void) {
  let pending = "";
  return {
    write(text: string): void {
      pending += text.replace(/\r\n?/g, "\n");
      const lines = pending.split("\n");
      pending = lines.pop() ?? "";
      for (const line of lines) if (line.trim() !== "") emit(line);
      while (pending.length > MAX_LINE) {
        emit(pending.slice(0, MAX_LINE));
        pending = pending.slice(MAX_LINE);
      }
    },
    end(): void {
      if (pending.trim() !== "") emit(pending);
      pending = "";
    },
  };
}
