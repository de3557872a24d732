/**
 * The CLI: parses argv, dispatches to a command, turns every failure into one message and an exit code.
 * No side effects on import (bin/gradgate.js calls `main`).
 */
import { parseArgs } from "node:util";
import { InputError } from "../core/errors.js";
import { TOOL_VERSION } from "../core/version.js";
import { PROBLEMS } from "../problems/index.js";
import { OPTIMIZERS } from "../optimizers/index.js";
import { EXIT, type Host, processHost } from "./host.js";
import { DEFAULT_RESULTS, runCommand } from "./run-command.js";
import { textTable } from "./format.js";

const USAGE = `gradgate ${TOOL_VERSION} — convergence gate for optimizer code

Usage:
  gradgate run [--config FILE] [--out FILE] [--workers N] [--quiet]
      Run the suite (FILE, else ./gradgate.yml, else the built-in default suite) and write the
      results JSON (default ${DEFAULT_RESULTS}).
  gradgate problems        List the standard problems.
  gradgate optimizers      List the reference optimizers.
  gradgate help            This text.

Exit codes: 0 done, 1 gate failed, 2 bad usage or input, 3 internal error.
`;

export async function main(argv: readonly string[], host: Host = processHost()): Promise<number> {
  try {
    return await dispatch(argv, host);
  } catch (err) {
    if (err instanceof InputError) {
      host.err(`gradgate: ${err.message}\n`);
      return EXIT.input;
    }
    const text = err instanceof Error ? (err.stack ?? err.message) : String(err);
    host.err(`gradgate: internal error (please report): ${text}\n`);
    return EXIT.internal;
  }
}

async function dispatch(argv: readonly string[], host: Host): Promise<number> {
  const [command, ...rest] = argv;
  switch (command) {
    case "run": {
      const { values } = parse(rest, {
        config: { type: "string" },
        out: { type: "string" },
        workers: { type: "string" },
        quiet: { type: "boolean" },
      });
      return runCommand(host, {
        config: values.config as string | undefined,
        out: (values.out as string | undefined) ?? DEFAULT_RESULTS,
        workers: values.workers === undefined ? undefined : parseCount(values.workers as string, "--workers"),
        quiet: values.quiet === true,
      });
    }
    case "problems":
      parse(rest, {});
      host.out(
        textTable(
          ["problem", "dim", "tags", "title"],
          PROBLEMS.map((p) => [p.name, String(p.params.n?.default ?? "fixed"), p.tags.join(","), p.title]),
        ),
      );
      return EXIT.ok;
    case "optimizers":
      parse(rest, {});
      host.out(textTable(["optimizer", "title"], OPTIMIZERS.map((o) => [o.name, o.title])));
      return EXIT.ok;
    case undefined:
    case "help":
    case "--help":
    case "-h":
      host.out(USAGE);
      return command === undefined ? EXIT.input : EXIT.ok;
    case "--version":
      host.out(`${TOOL_VERSION}\n`);
      return EXIT.ok;
    default:
      throw new InputError(`unknown command ${JSON.stringify(command)}; run "gradgate help" for the commands`);
  }
}

type OptionSpec = Record<string, { type: "string" | "boolean" }>;

function parse(args: readonly string[], options: OptionSpec) {
  try {
    return parseArgs({ args: [...args], options, allowPositionals: false, strict: true });
  } catch (err) {
    throw new InputError(`${(err as Error).message}; run "gradgate help" for the options`);
  }
}

function parseCount(text: string, flag: string): number {
  const n = Number(text);
  if (!/^\d+$/.test(text) || n < 1) throw new InputError(`${flag} must be a positive integer, got ${JSON.stringify(text)}`);
  return n;
}
