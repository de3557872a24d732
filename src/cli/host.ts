/** What differs between the CLI, the Action and tests: where text goes and what the terminal is. */
export interface Host {
  /** Standard output: results people read or pipe. */
  out(text: string): void;
  /** Standard error: progress, warnings, errors. */
  err(text: string): void;
  /** True when stderr is an interactive terminal (progress is drawn in place). */
  readonly interactive: boolean;
  /** Working directory that relative paths are resolved against. */
  readonly cwd: string;
}

/** Exit codes of every command. */
export const EXIT = {
  ok: 0,
  /** The gate failed (compare), or a check failed. */
  fail: 1,
  /** Bad usage or bad input (config, baseline, results file): nothing was judged. */
  input: 2,
  /** A bug in gradgate itself. */
  internal: 3,
} as const;

export function processHost(): Host {
  return {
    out: (t) => process.stdout.write(t),
    err: (t) => process.stderr.write(t),
    interactive: process.stderr.isTTY === true,
    cwd: process.cwd(),
  };
}
