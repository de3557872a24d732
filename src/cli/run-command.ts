/** `gradgate run`: run a suite and write its results JSON. */
import { existsSync, readFileSync } from "node:fs";
import { availableParallelism } from "node:os";
import { resolve } from "node:path";
import { InputError, quote } from "../core/errors.js";
import { canonicalJson } from "../core/json.js";
import { parseConfig } from "../config/load.js";
import { DEFAULT_SUITE_YAML } from "../config/default-suite.js";
import { writeFileAtomic } from "../io/files.js";
import { runSuite } from "../runner/pool.js";
import { buildResults, type ResultsDocument } from "../runner/results.js";
import { resolveSuite } from "../runner/suite.js";
import { EXIT, type Host } from "./host.js";
import { medianOf, sci, textTable } from "./format.js";

export interface RunArgs {
  readonly config?: string;
  readonly out: string;
  readonly workers?: number;
  readonly quiet: boolean;
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
  return { config: parseConfig(DEFAULT_SUITE_YAML, "(built-in default suite)"), file: "(built-in default suite)" };
}

export async function runCommand(host: Host, args: RunArgs): Promise<number> {
  const { config, file } = loadSuiteConfig(host, args.config);
  const suite = resolveSuite(config, file);
  const runs = suite.cases.reduce((n, c) => n + c.seeds, 0);
  const workers = args.workers ?? Math.min(availableParallelism(), 8);
  if (!Number.isInteger(workers) || workers < 1) {
    throw new InputError(`--workers must be a positive integer, got ${quote(args.workers)}`);
  }
  if (!args.quiet) host.err(`gradgate: ${suite.cases.length} cases, ${runs} runs, ${workers} worker(s), suite ${file}\n`);
  const started = performance.now();
  let lastDraw = 0;
  const cases = await runSuite(suite, {
    workers,
    onProgress: (done, total) => {
      if (args.quiet || !host.interactive) return;
      const now = performance.now();
      if (now - lastDraw < 100 && done < total) return;
      lastDraw = now;
      host.err(`\r  ${done}/${total} runs (${Math.round((100 * done) / total)}%)`);
      if (done === total) host.err("\n");
    },
  });
  const doc = buildResults(suite, cases);
  writeFileAtomic(resolve(host.cwd, args.out), canonicalJson(doc));
  const seconds = (performance.now() - started) / 1000;
  if (!args.quiet) {
    host.out(summaryTable(doc));
    host.out(`\n${runs} runs in ${seconds.toFixed(2)} s; results written to ${args.out}\n`);
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
