/** `gradgate run`: run a suite and write its results JSON. */
import { existsSync, readFileSync } from "node:fs";
import { availableParallelism } from "node:os";
import { dirname, resolve } from "node:path";
import { InputError, quote } from "../core/errors.js";
import { canonicalJson } from "../core/json.js";
import { parseConfig } from "../config/load.js";
import { DEFAULT_SUITE_YAML } from "../config/default-suite.js";
import { writeFileAtomic } from "../io/files.js";
import { runSuite } from "../runner/pool.js";
import { buildResults, type ResultsDocument } from "../runner/results.js";
import { prepareSuite } from "../adapters/prepare.js";
import { type ShardSpec, shardItems } from "../runner/shard.js";
import { EXIT, type Host } from "./host.js";
import { medianOf, sci, textTable } from "./format.js";

export interface RunArgs {
  readonly config?: string;
  readonly out: string;
  readonly workers?: number;
  readonly quiet: boolean;
  /** Run only this shard of the flat run list (src/runner/shard.ts); the results say which. */
  readonly shard?: ShardSpec;
}

export const DEFAULT_CONFIG_FILES = ["gradgate.yml", "gradgate.yaml", "gradgate.json"];
export const DEFAULT_RESULTS = ".gradgate/results.json";

/** Reads the config named on the command line, or gradgate.yml in the working directory, or the default suite. */
export function loadSuiteConfig(host: Host, config: string | undefined) {
  if (config !== undefined) {
    const path = resolve(host.cwd, config);
    if (!existsSync(path)) throw new InputError(`config ${config}: no such file`);
    return { config: parseConfig(readFileSync(path, "utf8"), config), file: config };
  }
  for (const name of DEFAULT_CONFIG_FILES) {
    const path = resolve(host.cwd, name);
    if (existsSync(path)) return { config: parseConfig(readFileSync(path, "utf8"), name), file: name };
  }
  return {
    config: parseConfig(DEFAULT_SUITE_YAML, "(built-in default suite)"),
    file: "(built-in default suite)",
  };
}

/**
 * Loads the config (see loadSuiteConfig) and resolves it into a suite with its module and process
 * optimizers and scenarios; module paths and adapter directories are relative to the config file.
 */
export async function loadPreparedSuite(host: Host, configArg: string | undefined) {
  const { config, file } = loadSuiteConfig(host, configArg);
  const baseDir = configArg === undefined ? host.cwd : dirname(resolve(host.cwd, configArg));
  const suite = await prepareSuite(config, file, { baseDir });
  return { config, file, suite };
}

export async function runCommand(host: Host, args: RunArgs): Promise<number> {
  const { file, suite } = await loadPreparedSuite(host, args.config);
  const runs = suite.cases.reduce((n, c) => n + c.seeds, 0);
  const workers = args.workers ?? Math.min(availableParallelism(), 8);
  if (!Number.isInteger(workers) || workers < 1) {
    throw new InputError(`--workers must be a positive integer, got ${quote(args.workers)}`);
  }
  const items = args.shard ? shardItems(runs, args.shard) : undefined;
  if (!args.quiet) {
    const part = args.shard ? `, shard ${args.shard.index}/${args.shard.count} (${items!.length} runs)` : "";
    host.err(
      `gradgate: ${suite.cases.length} cases, ${runs} runs${part}, ${workers} worker(s), suite ${file}\n`,
    );
  }
  const started = performance.now();
  let lastDraw = 0;
  const cases = await runSuite(suite, {
    workers,
    items,
    onProgress: (done, total) => {
      if (args.quiet || !host.interactive) return;
      const now = performance.now();
      if (now - lastDraw < 100 && done < total) return;
      lastDraw = now;
      host.err(`\r  ${done}/${total} runs (${Math.round((100 * done) / total)}%)`);
      if (done === total) host.err("\n");
    },
  });
  const doc = buildResults(suite, cases, undefined, args.shard);
  writeFileAtomic(resolve(host.cwd, args.out), canonicalJson(doc));
  const seconds = (performance.now() - started) / 1000;
  if (!args.quiet) {
    host.out(summaryTable(doc));
    host.out(`\n${items?.length ?? runs} runs in ${seconds.toFixed(2)} s; results written to ${args.out}\n`);
  }
  return EXIT.ok;
}

/** One line per case: medians across seeds of the headline metrics. */
export function summaryTable(doc: ResultsDocument): string {
  const rows = doc.cases.map(({ case: c, runs }) => {
    const diverged = runs.filter((r) => r.divergence !== null).length;
    const errors = runs.filter((r) => r.stop === "error").length;
    // The deepest rung that at least half the runs reached.
    let rung = -1;
    for (let i = c.ladder.length - 1; i >= 0; i--) {
      if (runs.filter((r) => r.stepsTo[i] !== null).length * 2 >= runs.length) {
        rung = i;
        break;
      }
    }
    const stepsTo = rung >= 0 ? medianOf(runs.map((r) => r.stepsTo[rung])) : null;
    const status = errors > 0 ? `${errors} error` : diverged > 0 ? `${diverged} diverged` : "ok";
    return [
      c.id,
      sci(medianOf(runs.map((r) => r.finalGap))),
      rung >= 0 ? `${c.ladder[rung].toExponential(0)}` : "—",
      stepsTo === null ? "—" : String(Math.round(stepsTo)),
      sci(medianOf(runs.map((r) => r.rate))),
      status,
    ];
  });
  return textTable(["case", "final gap", "reached", "steps", "rate", "runs"], rows);
}
