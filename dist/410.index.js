export const id = 410;
export const ids = [410];
export const modules = {

/***/ 6410:
/***/ ((__unused_webpack___webpack_module__, __webpack_exports__, __webpack_require__) => {

__webpack_require__.r(__webpack_exports__);
/* harmony import */ var node_worker_threads__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(5919);
/* harmony import */ var _batch_js__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(8550);
/**
 * Worker-thread side of the pool: receives the suite once, then chunks of (case, seed) items, and
 * posts back their metrics. Optimizer faults are recorded in the runs; only harness bugs reach here.
 */


const port = node_worker_threads__WEBPACK_IMPORTED_MODULE_0__.parentPort;
if (port === null)
    throw new Error("worker.ts must run in a worker thread");
const suite = node_worker_threads__WEBPACK_IMPORTED_MODULE_0__.workerData.suite;
const batch = new _batch_js__WEBPACK_IMPORTED_MODULE_1__/* .RunBatch */ .A(suite);
port.on("message", (msg) => {
    if (msg.type === "close") {
        // End the optimizer processes this worker started, then let the thread exit.
        batch
            .close()
            .catch(() => { })
            .finally(() => port.close());
        return;
    }
    batch
        .runItems(msg.items)
        .then((metrics) => port.postMessage({ type: "done", id: msg.id, metrics }))
        .catch((err) => port.postMessage({
        type: "failed",
        id: msg.id,
        error: err instanceof Error ? (err.stack ?? err.message) : String(err),
    }));
});


/***/ })

};
