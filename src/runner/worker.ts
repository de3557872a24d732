/**
 * Worker-thread side of the pool: receives the suite once, then chunks of (case, seed) items, and
 * posts back their metrics. Optimizer faults are recorded in the runs; only harness bugs reach here.
 */
import { parentPort, workerData } from "node:worker_threads";
import { RunBatch } from "./batch.js";
import type { SuiteSpec } from "./types.js";

interface ChunkMessage {
  readonly type: "chunk";
  readonly id: number;
  readonly items: readonly number[];
}

const port = parentPort;
if (port === null) throw new Error("worker.ts must run in a worker thread");
const suite = (workerData as { suite: SuiteSpec }).suite;
const batch = new RunBatch(suite);

port.on("message", (msg: ChunkMessage | { type: "close" }) => {
  if (msg.type === "close") {
    // End the optimizer processes this worker started, then let the thread exit.
    batch
      .close()
      .catch(() => {})
      .finally(() => port.close());
    return;
  }
  batch
    .runItems(msg.items)
    .then((metrics) => port.postMessage({ type: "done", id: msg.id, metrics }))
    .catch((err: unknown) =>
      port.postMessage({
        type: "failed",
        id: msg.id,
        error: err instanceof Error ? (err.stack ?? err.message) : String(err),
      }),
    );
});
