/**
 * Turns a results document (and the runs of the extra seeds) into baseline files, one per optimizer.
 * Pure: the commit, the date and the runtime come from the caller (the CLI edge runs `git rev-parse`).
 */
import { InputError } from "../core/errors.js";
import { TOOL_NAME, TOOL_VERSION } from "../core/version.js";
import type { ResultsDocument } from "../runner/results.js";
import type { RunMetrics } from "../runner/types.js";
import { BASELINE_FORMAT, BASELINE_VERSION, type BaselineCase, type BaselineFile, type Provenance } from "./types.js";
import { baselineDigest } from "./validate.js";

export interface BaselineStamp {
  readonly commit: string;
  /** ISO 8601 (UTC). */
  readonly date: string;
  readonly reason: string;
  /** The runtime of each optimizer's adapter, by `use` (e.g. "reference:adam"); default: in-process. */
  readonly runtime?: (use: string) => string;
}

/** Default runtime description of an optimizer run in this Node process. */
export function inProcessRuntime(node: string): string {
  return `in-process (node ${node})`;
}

/**
 * One baseline file per optimizer, in the order the optimizers first appear in the results.
 * `extraRuns` holds the runs of the extra seeds by case id (iterates and trace are dropped: the
 * fingerprint and the charts use the suite's own seeds).
 */
export function buildBaselineFiles(
  results: ResultsDocument,
  stamp: BaselineStamp,
  extraRuns: ReadonlyMap<string, readonly RunMetrics[]> = new Map(),
): BaselineFile[] {
  if (results.shard) {
    throw new InputError(
      `results hold shard ${results.shard.index} of ${results.shard.count} only; merge the shards before rebaselining`,
    );
  }
  const byOptimizer = new Map<string, BaselineCase[]>();
  const runtimes = new Map<string, string>();
  for (const c of results.cases) {
    const name = c.case.optimizer;
    let list = byOptimizer.get(name);
    if (list === undefined) byOptimizer.set(name, (list = []));
    const extra = (extraRuns.get(c.case.id) ?? []).map(stripIterates);
    list.push({ case: c.case, runs: c.runs, extraRuns: extra });
    const runtime = stamp.runtime?.(c.case.use) ?? inProcessRuntime(results.environment.node);
    const seen = runtimes.get(name);
    if (seen !== undefined && seen !== runtime) {
      throw new InputError(`optimizer ${name} reports two runtimes (${seen}; ${runtime}); one baseline file needs one`);
    }
    runtimes.set(name, runtime);
  }
  return [...byOptimizer.entries()].map(([optimizer, cases]) => {
    const provenance: Provenance = {
      commit: stamp.commit,
      date: stamp.date,
      reason: stamp.reason,
      tool: { name: TOOL_NAME, version: TOOL_VERSION },
      suite: { hash: results.suite.hash, seed: results.suite.seed },
      environment: {
        node: results.environment.node,
        platform: results.environment.platform,
        arch: results.environment.arch,
        runtime: runtimes.get(optimizer)!,
      },
    };
    const body = { format: BASELINE_FORMAT, version: BASELINE_VERSION, optimizer, provenance, cases } as const;
    return { ...body, digest: baselineDigest(body) };
  });
}

/** Extra seeds serve the statistics only: their iterates and trace are not kept (smaller files). */
function stripIterates(run: RunMetrics): RunMetrics {
  const copy: Record<string, unknown> = { ...run, trace: [] };
  delete copy.iterates;
  return copy as unknown as RunMetrics;
}
