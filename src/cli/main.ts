/**
 * The CLI: parses argv, dispatches to a command, turns every failure into one message and an exit code.
 * No side effects on import (bin/gradgate.js calls `main`).
 */
import { parseArgs } from "node:util";
import { InputError } from "../core/errors.js";
import { TOOL_VERSION } from "../core/version.js";
import { PROBLEMS } from "../problems/index.js";
import { Pcg32 } from "../core/rng.js";
import { OPTIMIZERS } from "../optimizers/index.js";
import { EXIT, type Host, processHost } from "./host.js";
import { DEFAULT_RESULTS, runCommand } from "./run-command.js";
import { mergeCommand } from "./merge-command.js";
import { reportCommand } from "./report-command.js";
import { parseShard } from "../runner/shard.js";
import { textTable } from "./format.js";
import { compareFromArgv } from "./compare-command.js";
import { rebaselineFromArgv } from "./rebaseline-command.js";
import { historyFromArgv } from "./history-command.js";

const USAGE = `gradgate ${TOOL_VERSION} — convergence gate for optimizer code

Usage:
  gradgate run [--config FILE] [--out FILE] [--workers N] [--shard I/N] [--quiet]
      Run the suite (FILE, else ./gradgate.yml, else the built-in default suite) and write the
      results JSON (default ${DEFAULT_RESULTS}). --shard 2/4 runs the second quarter of the runs.
  gradgate merge [--out FILE] [--quiet] SHARD_RESULTS...
      Combine the results of shards 1..N (files, or directories holding them) into the whole
      suite's results (default ${DEFAULT_RESULTS}); refuses shards that do not fit together.
  gradgate compare --results FILE [--baselines DIR] [--json OUT] [--config FILE]
                   [--no-extra-seeds] [--workers N] [--quiet]
      Judge results against the baselines (default baselines/): a verdict per case, the gate
      verdict (exit 0 pass, 1 fail); --json writes the verdict document. Inconclusive cases are
      re-run on the baselines' extra seeds first (policy.extraSeeds) unless --no-extra-seeds.
  gradgate rebaseline --results FILE --reason TEXT [--baselines DIR] [--commit SHA]
                   [--allow-suite-change] [--config FILE] [--extra-seeds N] [--workers N] [--quiet]
      Write new baselines from results (one file per optimizer, plus extra seeds), all or nothing,
      and append the change with its drift to baselines/audit.jsonl.
  gradgate history OPTIMIZER [--baselines DIR] [--json]
      How one optimizer's baselines changed across the audit log.
  gradgate report --verdict FILE [--results FILE] [--baselines DIR] [--html OUT] [--markdown OUT]
      Render a verdict (with convergence charts when results and baselines are given) as a
      self-contained HTML report and/or the Markdown the Action puts in the job summary.
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
        shard: { type: "string" },
        quiet: { type: "boolean" },
      });
      return runCommand(host, {
        shard: values.shard === undefined ? undefined : parseShard(values.shard as string, "--shard"),
        config: values.config as string | undefined,
        out: (values.out as string | undefined) ?? DEFAULT_RESULTS,
        workers: values.workers === undefined ? undefined : parseCount(values.workers as string, "--workers"),
        quiet: values.quiet === true,
      });
    }
    case "merge": {
      const { values, positionals } = parse(
        rest,
        { out: { type: "string" }, quiet: { type: "boolean" } },
        true,
      );
      return mergeCommand(host, {
        inputs: positionals,
        out: (values.out as string | undefined) ?? DEFAULT_RESULTS,
        quiet: values.quiet === true,
      });
    }
    case "compare":
      return compareFromArgv(rest, host);
    case "rebaseline":
      return rebaselineFromArgv(rest, host);
    case "history":
      return historyFromArgv(rest, host);
    case "report": {
      const { values } = parse(rest, {
        verdict: { type: "string" },
        results: { type: "string" },
        baselines: { type: "string" },
        html: { type: "string" },
        markdown: { type: "string" },
      });
      if (typeof values.verdict !== "string") {
        throw new InputError("report: --verdict FILE is required (the file gradgate compare --json wrote)");
      }
      return reportCommand(host, {
        verdict: values.verdict,
        results: values.results as string | undefined,
        baselines: values.baselines as string | undefined,
        html: values.html as string | undefined,
        markdown: values.markdown as string | undefined,
      });
    }
    case "problems":
      parse(rest, {});
      host.out(
        textTable(
          ["problem", "dim", "params (defaults)", "tags", "title"],
          PROBLEMS.map((p) => {
            const params = Object.fromEntries(Object.entries(p.params).map(([k, spec]) => [k, spec.default]));
            const dim = p.create(params, { noise: new Pcg32(0n, 0n) }).dim;
            const shown = Object.entries(params).map(([k, v]) => `${k}=${v}`);
            return [p.name, String(dim), shown.join(" ") || "—", p.tags.join(","), p.title];
          }),
        ),
      );
      return EXIT.ok;
    case "optimizers":
      parse(rest, {});
      host.out(
        textTable(
          ["optimizer", "title"],
          OPTIMIZERS.map((o) => [o.name, o.title]),
        ),
      );
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
      throw new InputError(
        `unknown command ${JSON.stringify(command)}; run "gradgate help" for the commands`,
      );
  }
}

type OptionSpec = Record<string, { type: "string" | "boolean" }>;

function parse(args: readonly string[], options: OptionSpec, allowPositionals = false) {
  try {
    return parseArgs({ args: [...args], options, allowPositionals, strict: true });
  } catch (err) {
    throw new InputError(`${(err as Error).message}; run "gradgate help" for the options`);
  }
}

function parseCount(text: string, flag: string): number {
  const n = Number(text);
  if (!/^\d+$/.test(text) || n < 1)
    throw new InputError(`${flag} must be a positive integer, got ${JSON.stringify(text)}`);
  return n;
}
