/** The key in workerData that marks a worker thread started from the bundle (see src/action/main.ts). */
export const WORKER_MARKER = "gradgateWorker";
