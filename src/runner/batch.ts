/**
 * Runs items of a suite in the current thread. An item is an index into the flat list of runs:
 * item = caseIndex · seeds + seedIndex, in case order. Used directly for one worker and inside each
 * worker thread for more.
 */
import type { ProblemDefinition } from "../core/types.js";
import { getProblem } from "../problems/index.js";
import { executeRun } from "./execute.js";
import { type LoadedOptimizer, loadOptimizer } from "./resolve.js";
import type { RunMetrics, SuiteSpec } from "./types.js";

export class RunBatch {
  private readonly optimizers = new Map<string, Promise<LoadedOptimizer>>();
  private readonly problems = new Map<string, ProblemDefinition>();
  private scratch: Float64Array | undefined;
  private readonly starts: number[] = [];
  private readonly total: number;

  constructor(private readonly suite: SuiteSpec) {
    let n = 0;
    for (const c of suite.cases) {
      this.starts.push(n);
      n += c.seeds;
    }
    this.total = n;
  }

  /** Number of runs in the suite. */
  get size(): number {
    return this.total;
  }

  /** (case index, seed index) of an item. */
  locate(item: number): [number, number] {
    let lo = 0;
    let hi = this.starts.length - 1;
    while (lo < hi) {
      const mid = (lo + hi + 1) >> 1;
      if (this.starts[mid] <= item) lo = mid;
      else hi = mid - 1;
    }
    return [lo, item - this.starts[lo]];
  }

  async runItems(items: readonly number[]): Promise<RunMetrics[]> {
    const out: RunMetrics[] = [];
    for (const item of items) out.push(await this.runItem(item));
    return out;
  }

  async runItem(item: number): Promise<RunMetrics> {
    const [ci, si] = this.locate(item);
    const spec = this.suite.cases[ci];
    let loaded = this.optimizers.get(spec.use);
    if (loaded === undefined) {
      loaded = loadOptimizer(spec.use, `case ${spec.id}`);
      this.optimizers.set(spec.use, loaded);
    }
    const { factory, untrusted } = await loaded;
    let def = this.problems.get(spec.problem);
    if (def === undefined) {
      def = getProblem(spec.problem);
      this.problems.set(spec.problem, def);
    }
    const { metrics, scratch } = executeRun(spec, si, this.suite.seed, factory, def, {
      verifyIterate: untrusted,
      scratch: this.scratch,
    });
    this.scratch = scratch;
    return metrics;
  }
}
