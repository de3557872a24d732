/**
 * Runs items of a suite in the current thread. An item is an index into the flat list of runs:
 * item = caseIndex · seeds + seedIndex, in case order. Used directly for one worker and inside each
 * worker thread for more.
 *
 * Items of process-adapter optimizers (`use: NAME:optimizer`) go to that adapter's session — one
 * optimizer process per adapter per batch, started on first use — all of a `runItems` call at once, so
 * their evaluations travel batched; the other items run in this thread afterwards. Each run's numbers
 * depend only on its case and seed, so the grouping never changes a result. `close` ends the processes.
 */
import type { ProblemDefinition } from "../core/types.js";
import { getProblem } from "../problems/index.js";
import { ProcessSession } from "../adapters/session.js";
import type { RunControl, RunRequest } from "../adapters/process-run.js";
import { executeRun } from "./execute.js";
import { type LoadedOptimizer, loadOptimizer } from "./resolve.js";
import { TrajectoryHashes, executeScenarioRun, resumeVerdict } from "./scenarios.js";
import type { RunMetrics, SuiteSpec } from "./types.js";

export class RunBatch {
  private readonly optimizers = new Map<string, Promise<LoadedOptimizer>>();
  private readonly problems = new Map<string, ProblemDefinition>();
  private readonly sessions = new Map<string, ProcessSession>();
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
    const out: RunMetrics[] = new Array(items.length);
    const byAdapter = new Map<string, number[]>();
    const local: number[] = [];
    items.forEach((item, j) => {
      const adapter = this.processAdapterOf(this.suite.cases[this.locate(item)[0]].use);
      if (adapter === null) local.push(j);
      else {
        let positions = byAdapter.get(adapter);
        if (positions === undefined) byAdapter.set(adapter, (positions = []));
        positions.push(j);
      }
    });
    await Promise.all(
      [...byAdapter].map(async ([adapter, positions]) => {
        const metrics = await this.runProcessItems(
          adapter,
          positions.map((j) => items[j]),
        );
        positions.forEach((j, i) => (out[j] = metrics[i]));
      }),
    );
    for (const j of local) out[j] = await this.runLocalItem(items[j]);
    return out;
  }

  async runItem(item: number): Promise<RunMetrics> {
    return (await this.runItems([item]))[0];
  }

  /** Ends the optimizer processes this batch started. */
  async close(): Promise<void> {
    const sessions = [...this.sessions.values()];
    this.sessions.clear();
    await Promise.all(sessions.map((s) => s.close()));
  }

  private async runLocalItem(item: number): Promise<RunMetrics> {
    const [ci, si] = this.locate(item);
    const spec = this.suite.cases[ci];
    let loaded = this.optimizers.get(spec.use);
    if (loaded === undefined) {
      loaded = loadOptimizer(spec.use, `case ${spec.id}`, this.suite.adapters);
      this.optimizers.set(spec.use, loaded);
    }
    const { factory, untrusted } = await loaded;
    const def = this.problem(spec.problem);
    const run = spec.scenario?.resume || spec.scenario?.lrChange ? executeScenarioRun : executeRun;
    const { metrics, scratch } = run(spec, si, this.suite.seed, factory, def, {
      verifyIterate: untrusted,
      scratch: this.scratch,
    });
    this.scratch = scratch;
    return metrics;
  }

  /** The process adapter serving `use` ("NAME:optimizer" with NAME declared), or null. */
  private processAdapterOf(use: string): string | null {
    const i = use.indexOf(":");
    const name = i < 0 ? "" : use.slice(0, i);
    return this.suite.adapters?.processes[name] !== undefined ? name : null;
  }

  private problem(name: string): ProblemDefinition {
    let def = this.problems.get(name);
    if (def === undefined) {
      def = getProblem(name);
      this.problems.set(name, def);
    }
    return def;
  }

  /** Runs items of one process adapter together; resume scenarios add an uninterrupted twin per run. */
  private async runProcessItems(adapter: string, items: readonly number[]): Promise<RunMetrics[]> {
    let session = this.sessions.get(adapter);
    if (session === undefined) {
      session = new ProcessSession(this.suite.adapters!.processes[adapter]);
      this.sessions.set(adapter, session);
    }
    const requests: RunRequest[] = [];
    const plan: { at: number; twin?: { plain: TrajectoryHashes; resumed: TrajectoryHashes } }[] = [];
    for (const item of items) {
      const [ci, si] = this.locate(item);
      const spec = this.suite.cases[ci];
      const base = {
        spec,
        seedIndex: si,
        suiteSeed: this.suite.seed,
        definition: this.problem(spec.problem),
        optimizer: spec.use.slice(adapter.length + 1),
      };
      const sc = spec.scenario;
      if (sc?.resume) {
        const plain = new TrajectoryHashes(spec.budget.steps);
        const resumed = new TrajectoryHashes(spec.budget.steps);
        requests.push({ ...base, control: { afterStep: plain.record } });
        const control: RunControl = {
          pauseAt: sc.resume.at,
          action: { kind: "restart" },
          afterStep: resumed.record,
        };
        plan.push({ at: requests.length, twin: { plain, resumed } });
        requests.push({ ...base, control });
      } else {
        const control: RunControl | undefined = sc?.lrChange
          ? { pauseAt: sc.lrChange.at, action: { kind: "lr", lr: sc.lrChange.lr } }
          : undefined;
        plan.push({ at: requests.length });
        requests.push(control ? { ...base, control } : base);
      }
    }
    const metrics = await session.run(requests);
    return plan.map(({ at, twin }) => {
      const m = metrics[at];
      return twin ? { ...m, resume: resumeVerdict(twin.plain, twin.resumed, m) } : m;
    });
  }
}
