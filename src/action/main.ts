/**
 * Entry file of the Action (bundled into dist/index.js). It is three programs in one file, told apart by a
 * marker:
 * - a worker thread marked in workerData: the runner's worker code (the pool starts workers from this
 *   very file when it is a bundle);
 * - a process started with ENGINE_MARKER set: the engine process, which runs the CLI on its arguments and
 *   with it the optimizer code, without the token (see ./engine-process.ts);
 * - otherwise the Action itself: it only calls `run()`.
 * (No top-level await: the bundler reads this file as a script.)
 */
import { isMainThread, workerData } from "node:worker_threads";
import { setWorkerEntry } from "../runner/pool.js";
import { ENGINE_MARKER } from "./engine-marker.js";
import { setEngineEntry } from "./engine-process.js";
import { WORKER_MARKER } from "./worker-marker.js";

const marked = !isMainThread && (workerData as Record<string, unknown> | null)?.[WORKER_MARKER] === true;
// Only a compiled file (plain .js) can start workers and the engine from itself; from the sources the
// pool uses runner/worker.ts and the engine starts main.ts through tsx.
const compiled = import.meta.url.endsWith(".js");

if (marked) {
  void import("../runner/worker.js");
} else {
  if (compiled) setWorkerEntry(new URL(import.meta.url), { [WORKER_MARKER]: true });
  if (process.env[ENGINE_MARKER] === "1") {
    void import("./engine-main.js").then(({ engineMain }) => engineMain(process.argv.slice(2)));
  } else {
    if (compiled) setEngineEntry(new URL(import.meta.url));
    void import("./run.js").then(({ run }) => run());
  }
}
