/**
 * Runs a whole suite, in this thread or on worker threads. Items are handed out in chunks from one
 * queue (so a slow case does not hold up a worker's share) and put back in item order, so the results
 * are identical whatever the number of workers.
 */
import { createRequire } from "node:module";
import { pathToFileURL } from "node:url";
import { Worker } from "node:worker_threads";
import { RunBatch } from "./batch.js";
import type { CaseResult, RunMetrics, SuiteSpec } from "./types.js";

export interface RunSuiteOptions {
  /** Worker threads; 1 runs in this thread. */
  readonly workers?: number;
  /** Called after each finished chunk with (runs done, runs in all). */
  readonly onProgress?: (done: number, total: number) => void;
  /** Only these items (indices into the flat run list), e.g. one shard; default all. */
  readonly items?: readonly number[];
}

interface WorkerEntry {
  /** A file URL, or (eval) the source of a small bootstrap script. */
  readonly script: URL | string;
  readonly eval: boolean;
  readonly data: Record<string, unknown>;
}

/** Where the worker script lives; a bundle may point this at itself (see setWorkerEntry). */
let workerEntry: WorkerEntry | null = null;

/** Lets a bundled entry point run workers from its own file, marking them with `data`. */
export function setWorkerEntry(url: URL, data: Record<string, unknown> = {}): void {
  workerEntry = { script: url, eval: false, data };
}

function defaultWorkerEntry(): WorkerEntry {
  const here = new URL(import.meta.url);
  if (!here.pathname.endsWith(".ts")) return { script: new URL("./worker.js", here), eval: false, data: {} };
  // Sources (development, tests) run through tsx: register its loader in the worker, then load worker.ts.
  const target = JSON.stringify(new URL("./worker.ts", here).href);
  // Resolved from this file, not from the working directory, so sources run from anywhere.
  const tsx = JSON.stringify(
    pathToFileURL(
      createRequire(here)
        .resolve("tsx/esm/api")
        .replace(/\.cjs$/, ".mjs"),
    ).href,
  );
  return {
    script: `import(${tsx}).then((m) => { m.register(); return import(${target}); });`,
    eval: true,
    data: {},
  };
}

export async function runSuite(suite: SuiteSpec, options: RunSuiteOptions = {}): Promise<CaseResult[]> {
  const batch = new RunBatch(suite);
  const items = options.items ?? Array.from({ length: batch.size }, (_, i) => i);
  const metrics = new Map<number, RunMetrics>();
  const workers = Math.max(1, Math.min(options.workers ?? 1, items.length));
  const progress = options.onProgress ?? (() => {});

  if (workers === 1) {
    // In chunks, so runs of a process adapter travel batched as they do on worker threads.
    const size = 64;
    try {
      for (let i = 0; i < items.length; i += size) {
        const chunk = items.slice(i, i + size);
        const got = await batch.runItems(chunk);
        chunk.forEach((item, j) => metrics.set(item, got[j]));
        progress(Math.min(i + size, items.length), items.length);
      }
    } finally {
      await batch.close();
    }
    return assemble(suite, batch, items, metrics);
  }
  const pool = new SuitePool(suite, workers);
  try {
    return await pool.run(items, progress);
  } finally {
    await pool.close();
  }
}

interface Job {
  readonly chunks: readonly (readonly number[])[];
  next: number;
  busy: number;
  done: number;
  readonly total: number;
  readonly metrics: Map<number, RunMetrics>;
  readonly progress: (done: number, total: number) => void;
  readonly resolve: (metrics: Map<number, RunMetrics>) => void;
  readonly reject: (err: Error) => void;
}

/**
 * Worker threads bound to one suite. They stay up between runs, so a later run (extra seeds, a
 * benchmark's second pass) finds their code already compiled; `close` ends them. Items are handed out
 * in small chunks from one queue, one job at a time.
 */
export class SuitePool {
  private readonly workers: Worker[] = [];
  private readonly exits: Promise<void>[] = [];
  private job: Job | null = null;
  private failure: Error | null = null;
  private closing = false;

  constructor(
    private readonly suite: SuiteSpec,
    count: number,
  ) {
    const entry = workerEntry ?? defaultWorkerEntry();
    for (let w = 0; w < count; w++) {
      const worker = new Worker(entry.script, { eval: entry.eval, workerData: { ...entry.data, suite } });
      worker.on("message", (msg: WorkerReply) => this.onMessage(worker, msg));
      worker.on("error", (err) => this.fail(err));
      this.exits.push(
        new Promise((resolve) =>
          worker.on("exit", () => {
            if (!this.closing) this.fail(new Error("a worker thread exited while runs were unfinished"));
            resolve();
          }),
        ),
      );
      this.workers.push(worker);
    }
  }

  /** Runs `items` (indices into the flat run list) and returns their results in case order. */
  run(
    items: readonly number[],
    onProgress: (done: number, total: number) => void = () => {},
  ): Promise<CaseResult[]> {
    if (this.failure) return Promise.reject(this.failure);
    if (this.job !== null) return Promise.reject(new Error("SuitePool runs one job at a time"));
    // Small chunks: the slowest cases cannot leave one worker busy long after the others.
    const size = Math.max(1, Math.min(8, Math.ceil(items.length / (this.workers.length * 32))));
    const chunks: number[][] = [];
    for (let i = 0; i < items.length; i += size) chunks.push(items.slice(i, i + size));
    const batch = new RunBatch(this.suite);
    return new Promise<Map<number, RunMetrics>>((resolve, reject) => {
      const job: Job = {
        chunks,
        next: 0,
        busy: 0,
        done: 0,
        total: items.length,
        metrics: new Map(),
        progress: onProgress,
        resolve,
        reject,
      };
      this.job = job;
      if (chunks.length === 0) {
        this.job = null;
        resolve(job.metrics);
        return;
      }
      for (const w of this.workers) this.feed(w, job);
    }).then((metrics) => assemble(this.suite, batch, items, metrics));
  }

  /** Ends the worker threads (after their optimizer processes). */
  async close(): Promise<void> {
    this.closing = true;
    for (const w of this.workers) w.postMessage({ type: "close" });
    await Promise.all(this.exits);
  }

  private feed(worker: Worker, job: Job): void {
    if (job.next >= job.chunks.length) return;
    const id = job.next++;
    job.busy++;
    worker.postMessage({ type: "chunk", id, items: job.chunks[id] });
  }

  private onMessage(worker: Worker, msg: WorkerReply): void {
    const job = this.job;
    if (job === null) return;
    if (msg.type === "failed") return this.fail(new Error(`worker failed: ${msg.error}`));
    job.busy--;
    const chunk = job.chunks[msg.id];
    chunk.forEach((item, j) => job.metrics.set(item, msg.metrics![j]));
    job.done += chunk.length;
    job.progress(job.done, job.total);
    if (job.next < job.chunks.length) this.feed(worker, job);
    else if (job.busy === 0) {
      this.job = null;
      job.resolve(job.metrics);
    }
  }

  private fail(err: Error): void {
    if (this.failure !== null || this.closing) return;
    this.failure = err;
    this.closing = true;
    for (const w of this.workers) void w.terminate();
    const job = this.job;
    this.job = null;
    job?.reject(err);
  }
}

interface WorkerReply {
  readonly type: "done" | "failed";
  readonly id: number;
  readonly metrics?: RunMetrics[];
  readonly error?: string;
}

function assemble(
  suite: SuiteSpec,
  batch: RunBatch,
  items: readonly number[],
  metrics: Map<number, RunMetrics>,
): CaseResult[] {
  const byCase = new Map<number, RunMetrics[]>();
  for (const item of [...items].sort((a, b) => a - b)) {
    const [ci] = batch.locate(item);
    let runs = byCase.get(ci);
    if (runs === undefined) byCase.set(ci, (runs = []));
    runs.push(metrics.get(item)!);
  }
  return [...byCase.entries()]
    .sort(([a], [b]) => a - b)
    .map(([ci, runs]) => ({ case: suite.cases[ci], runs }));
}
