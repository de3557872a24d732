/**
 * Entry file of the Action (bundled into dist/index.js). In the main thread it only calls `run()`. The
 * bundle is also the worker-thread script: the runner's worker pool starts workers from this very file
 * with a marker in workerData, and those load the runner's worker code instead. (No top-level await:
 * the bundler reads this file as a script.)
 */
import { isMainThread, workerData } from "node:worker_threads";
import { setWorkerEntry } from "../runner/pool.js";
import { WORKER_MARKER } from "./worker-marker.js";

const marked = !isMainThread && (workerData as Record<string, unknown> | null)?.[WORKER_MARKER] === true;

if (marked) {
  void import("../runner/worker.js");
} else {
  // Only a bundle (plain .js) can start workers from itself; from the sources the pool uses runner/worker.ts.
  if (import.meta.url.endsWith(".js")) setWorkerEntry(new URL(import.meta.url), { [WORKER_MARKER]: true });
  void import("./run.js").then(({ run }) => run());
}
