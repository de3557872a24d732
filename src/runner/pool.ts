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
  } else {
    await runOnWorkers(suite, items, workers, metrics, progress);
  }
  return assemble(suite, batch, items, metrics);
}

async function runOnWorkers(
  suite: SuiteSpec,
  items: readonly number[],
  count: number,
  metrics: Map<number, RunMetrics>,
  progress: (done: number, total: number) => void,
): Promise<void> {
  const entry = workerEntry ?? defaultWorkerEntry();
  // Small chunks from one queue: the slowest cases cannot leave one worker busy long after the others.
  const chunkSize = Math.max(1, Math.min(8, Math.ceil(items.length / (count * 32))));
  const chunks: number[][] = [];
  for (let i = 0; i < items.length; i += chunkSize) chunks.push(items.slice(i, i + chunkSize));
  let next = 0;
  let done = 0;

  await new Promise<void>((resolve, reject) => {
    let live = count;
    let failed = false;
    const pool: Worker[] = [];
    const fail = (err: Error) => {
      if (failed) return;
      failed = true;
      for (const w of pool) void w.terminate();
      reject(err);
    };
    for (let w = 0; w < count; w++) {
      const worker = new Worker(entry.script, { eval: entry.eval, workerData: { ...entry.data, suite } });
      pool.push(worker);
      const feed = () => {
        if (next < chunks.length) {
          const id = next++;
          worker.postMessage({ type: "chunk", id, items: chunks[id] });
        } else {
          worker.postMessage({ type: "close" });
        }
      };
      worker.on("message", (msg: { type: string; id: number; metrics?: RunMetrics[]; error?: string }) => {
        if (msg.type === "failed") return fail(new Error(`worker failed: ${msg.error}`));
        const chunk = chunks[msg.id];
        chunk.forEach((item, j) => metrics.set(item, msg.metrics![j]));
        done += chunk.length;
        progress(done, items.length);
        feed();
      });
      worker.on("error", (err) => fail(err));
      worker.on("exit", () => {
        live--;
        if (live === 0 && !failed) {
          if (metrics.size === items.length) resolve();
          else fail(new Error(`workers exited with ${items.length - metrics.size} runs unfinished`));
        }
      });
      feed();
    }
  });
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
