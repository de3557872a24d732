export const id = 846;
export const ids = [846];
export const modules = {

/***/ 1425:
/***/ ((__unused_webpack___webpack_module__, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   $E: () => (/* binding */ recoverBaselineDir),
/* harmony export */   OE: () => (/* binding */ baselineFileNames),
/* harmony export */   Ob: () => (/* binding */ readAuditLog),
/* harmony export */   ff: () => (/* binding */ writeBaselineSet),
/* harmony export */   kk: () => (/* binding */ auditLine),
/* harmony export */   v5: () => (/* binding */ readBaselineDir)
/* harmony export */ });
/* unused harmony export JOURNAL */
/* harmony import */ var node_fs__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(3024);
/* harmony import */ var node_path__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(6760);
/* harmony import */ var _core_errors_js__WEBPACK_IMPORTED_MODULE_4__ = __webpack_require__(4552);
/* harmony import */ var _io_files_js__WEBPACK_IMPORTED_MODULE_2__ = __webpack_require__(1687);
/* harmony import */ var _types_js__WEBPACK_IMPORTED_MODULE_5__ = __webpack_require__(3085);
/* harmony import */ var _validate_js__WEBPACK_IMPORTED_MODULE_3__ = __webpack_require__(5373);
/* harmony import */ var _core_json_js__WEBPACK_IMPORTED_MODULE_6__ = __webpack_require__(625);
/**
 * The baselines directory on disk: read every baseline file (validated), and replace the set of files and
 * the audit log as one transaction, so a killed process never leaves a mix of old and new files.
 *
 * Protocol of `writeBaselineSet` (a redo journal):
 *   1. write every new file to a temporary file beside its target (`.NAME.TXID.tmp`, flushed to disk);
 *   2. write the journal `.rebaseline-journal.json` atomically (writeFileAtomic): the list of renames and
 *      removals. Its appearance is the commit point;
 *   3. rename the temporary files over their targets, remove the files to remove, then delete the journal.
 * Killed before 2: the previous files are untouched (stray temporary files are removed by the next
 * `recoverBaselineDir`). Killed after 2: `recoverBaselineDir` (run by every command before it reads the
 * directory) finishes the renames and removals, which are idempotent. Either way readers see one whole set.
 *
 * Test hook: GRADGATE_TEST_PAUSE_AT=temp:N | journal | rename:N makes the process announce the point on
 * stderr ("gradgate-test-paused <point>") and block for a minute, so a test can kill it there.
 */







const JOURNAL = ".rebaseline-journal.json";
const TEMP = /^\.(.+)\.([0-9a-z]+-[0-9a-z]+)\.tmp$/;
/** Names of the baseline files in `dir` (every *.json that is not hidden), sorted. */
function baselineFileNames(dir) {
    if (!(0,node_fs__WEBPACK_IMPORTED_MODULE_0__.existsSync)(dir))
        return [];
    return (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.readdirSync)(dir)
        .filter((n) => n.endsWith(".json") && !n.startsWith("."))
        .sort();
}
/**
 * Reads and validates every baseline file in `dir`. `shown` is how the directory is named in messages
 * (e.g. "baselines"). Returns them by optimizer name. Throws InputError on the first bad file, and when
 * the files disagree on the suite they were made for.
 */
function readBaselineDir(dir, shown) {
    const out = new Map();
    for (const name of baselineFileNames(dir)) {
        const file = `${shown}/${name}`;
        const baseline = (0,_validate_js__WEBPACK_IMPORTED_MODULE_3__/* .parseBaseline */ .nk)((0,node_fs__WEBPACK_IMPORTED_MODULE_0__.readFileSync)((0,node_path__WEBPACK_IMPORTED_MODULE_1__.join)(dir, name), "utf8"), file, name.slice(0, -".json".length));
        out.set(baseline.optimizer, baseline);
    }
    const hashes = new Map();
    for (const [name, b] of out)
        if (!hashes.has(b.provenance.suite.hash))
            hashes.set(b.provenance.suite.hash, name);
    if (hashes.size > 1) {
        const list = [...hashes].map(([h, n]) => `${shown}/${n}.json has ${h.slice(0, 19)}…`).join(", ");
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_4__/* .InputError */ .d(`baselines ${shown}: the files were made for different suites (${list}); regenerate the whole set with ` +
            `gradgate rebaseline --allow-suite-change`);
    }
    return out;
}
/** Reads baselines/audit.jsonl (empty when absent). */
function readAuditLog(dir, shown) {
    const path = (0,node_path__WEBPACK_IMPORTED_MODULE_1__.join)(dir, _types_js__WEBPACK_IMPORTED_MODULE_5__/* .AUDIT_LOG */ .bd);
    if (!(0,node_fs__WEBPACK_IMPORTED_MODULE_0__.existsSync)(path))
        return [];
    const text = (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.readFileSync)(path, "utf8");
    const entries = [];
    text.split("\n").forEach((line, i) => {
        if (line.trim() === "")
            return;
        let entry;
        try {
            entry = JSON.parse(line);
        }
        catch (err) {
            throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_4__/* .InputError */ .d(`audit log ${shown}/${_types_js__WEBPACK_IMPORTED_MODULE_5__/* .AUDIT_LOG */ .bd}: line ${i + 1} is not valid JSON (${err.message}); ` +
                `restore the file from version control`);
        }
        if (entry?.format !== _types_js__WEBPACK_IMPORTED_MODULE_5__/* .AUDIT_FORMAT */ .ab) {
            throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_4__/* .InputError */ .d(`audit log ${shown}/${_types_js__WEBPACK_IMPORTED_MODULE_5__/* .AUDIT_LOG */ .bd}: line ${i + 1} format must be ${JSON.stringify(_types_js__WEBPACK_IMPORTED_MODULE_5__/* .AUDIT_FORMAT */ .ab)}, got ` +
                `${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_4__/* .quote */ .h)(entry?.format)}; restore the file from version control`);
        }
        entries.push(entry);
    });
    return entries;
}
/** One audit entry as a line: canonical key order, no indentation. */
function auditLine(entry) {
    return JSON.stringify(JSON.parse((0,_core_json_js__WEBPACK_IMPORTED_MODULE_6__/* .canonicalJson */ .d)(entry))) + "\n";
}
/** Pauses at a named point when the test hook asks for it (see the file comment). */
function testPoint(point) {
    const at = process.env.GRADGATE_TEST_PAUSE_AT;
    if (at === undefined || at !== point)
        return;
    (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.writeSync)(2, `gradgate-test-paused ${point}\n`);
    Atomics.wait(new Int32Array(new SharedArrayBuffer(4)), 0, 0, 60_000);
}
function writeDurable(path, data) {
    const fd = (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.openSync)(path, "w");
    try {
        (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.writeSync)(fd, data);
        (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.fsyncSync)(fd);
    }
    finally {
        (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.closeSync)(fd);
    }
}
/** Replaces files in `dir` as one transaction (see the protocol above). */
function writeBaselineSet(dir, change) {
    (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.mkdirSync)(dir, { recursive: true });
    recoverBaselineDir(dir);
    const txid = `${process.pid.toString(36)}-${Date.now().toString(36)}`;
    const renames = [];
    let i = 0;
    try {
        for (const [name, text] of change.write) {
            checkName(name);
            const tmp = `.${name}.${txid}.tmp`;
            writeDurable((0,node_path__WEBPACK_IMPORTED_MODULE_1__.join)(dir, tmp), text);
            renames.push([tmp, name]);
            testPoint(`temp:${++i}`);
        }
    }
    catch (err) {
        for (const [tmp] of renames)
            (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.rmSync)((0,node_path__WEBPACK_IMPORTED_MODULE_1__.join)(dir, tmp), { force: true });
        throw err;
    }
    for (const name of change.remove)
        checkName(name);
    const journal = { txid, renames, removes: [...change.remove] };
    (0,_io_files_js__WEBPACK_IMPORTED_MODULE_2__/* .writeFileAtomic */ .Z)((0,node_path__WEBPACK_IMPORTED_MODULE_1__.join)(dir, JOURNAL), JSON.stringify(journal, null, 2) + "\n");
    testPoint("journal");
    applyJournal(dir, journal);
}
function checkName(name) {
    if (name.includes("/") || name.includes("\\") || name.startsWith(".")) {
        throw new Error(`writeBaselineSet: ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_4__/* .quote */ .h)(name)} is not a plain file name`);
    }
}
function applyJournal(dir, journal) {
    let i = 0;
    for (const [tmp, name] of journal.renames) {
        const from = (0,node_path__WEBPACK_IMPORTED_MODULE_1__.join)(dir, tmp);
        if ((0,node_fs__WEBPACK_IMPORTED_MODULE_0__.existsSync)(from))
            (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.renameSync)(from, (0,node_path__WEBPACK_IMPORTED_MODULE_1__.join)(dir, name));
        testPoint(`rename:${++i}`);
    }
    for (const name of journal.removes)
        (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.rmSync)((0,node_path__WEBPACK_IMPORTED_MODULE_1__.join)(dir, name), { force: true });
    (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.rmSync)((0,node_path__WEBPACK_IMPORTED_MODULE_1__.join)(dir, JOURNAL), { force: true });
}
/**
 * Finishes a rebaseline that was killed after its commit point, and removes temporary files of one that
 * was killed before it. Returns what it did ("" when there was nothing to do), for a note on stderr.
 */
function recoverBaselineDir(dir) {
    if (!(0,node_fs__WEBPACK_IMPORTED_MODULE_0__.existsSync)(dir))
        return "";
    let note = "";
    const journalPath = (0,node_path__WEBPACK_IMPORTED_MODULE_1__.join)(dir, JOURNAL);
    let keep = new Set();
    if ((0,node_fs__WEBPACK_IMPORTED_MODULE_0__.existsSync)(journalPath)) {
        let journal;
        try {
            journal = JSON.parse((0,node_fs__WEBPACK_IMPORTED_MODULE_0__.readFileSync)(journalPath, "utf8"));
        }
        catch (err) {
            throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_4__/* .InputError */ .d(`baselines ${dir}: the rebaseline journal ${JOURNAL} is unreadable (${err.message}); ` +
                `delete it and the .*.tmp files, then check the baseline files with git status`);
        }
        keep = new Set(journal.renames.map(([tmp]) => tmp));
        applyJournal(dir, journal);
        note = `completed an interrupted rebaseline (${journal.renames.length} file(s))`;
    }
    let stray = 0;
    for (const name of (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.readdirSync)(dir)) {
        if (TEMP.test(name) && !keep.has(name)) {
            (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.rmSync)((0,node_path__WEBPACK_IMPORTED_MODULE_1__.join)(dir, name), { force: true });
            stray++;
        }
    }
    if (stray > 0)
        note = `${note ? `${note}; ` : ""}removed ${stray} temporary file(s) of an interrupted rebaseline`;
    return note;
}


/***/ }),

/***/ 3085:
/***/ ((__unused_webpack___webpack_module__, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   Tm: () => (/* binding */ AUDIT_VERSION),
/* harmony export */   ab: () => (/* binding */ AUDIT_FORMAT),
/* harmony export */   bd: () => (/* binding */ AUDIT_LOG),
/* harmony export */   d0: () => (/* binding */ BASELINE_VERSION),
/* harmony export */   q4: () => (/* binding */ BASELINE_FORMAT)
/* harmony export */ });
const BASELINE_FORMAT = "gradgate-baseline";
const BASELINE_VERSION = 1;
/** The audit log beside the baseline files: JSON Lines, one entry per rebaseline. */
const AUDIT_LOG = "audit.jsonl";
const AUDIT_FORMAT = "gradgate-audit";
const AUDIT_VERSION = 1;


/***/ }),

/***/ 5373:
/***/ ((__unused_webpack___webpack_module__, __webpack_exports__, __webpack_require__) => {


// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  E8: () => (/* binding */ baselineDigest),
  nk: () => (/* binding */ parseBaseline),
  c2: () => (/* binding */ parseResults)
});

// EXTERNAL MODULE: ./build/package/core/json-pointer.js
var json_pointer = __webpack_require__(2881);
// EXTERNAL MODULE: external "node:crypto"
var external_node_crypto_ = __webpack_require__(7598);
// EXTERNAL MODULE: ./node_modules/ajv/dist/2020.js
var _2020 = __webpack_require__(2210);
// EXTERNAL MODULE: ./build/package/core/errors.js
var errors = __webpack_require__(4552);
// EXTERNAL MODULE: ./build/package/core/json.js
var json = __webpack_require__(625);
// EXTERNAL MODULE: ./build/package/core/version.js
var version = __webpack_require__(6063);
// EXTERNAL MODULE: ./build/package/runner/results.js
var results = __webpack_require__(568);
// EXTERNAL MODULE: ./build/package/baselines/types.js
var types = __webpack_require__(3085);
;// CONCATENATED MODULE: ./build/package/baselines/schema.js
/**
 * JSON Schema (draft 2020-12) of a baseline file, version 1. The code validates every baseline it reads
 * against this object with ajv; schema/baseline.schema.json is generated from it for editors
 * (scripts/write-schemas.ts), and tests/baselines/schema.test.ts checks that a baseline built from real
 * results satisfies it and that it names exactly the fields of the TypeScript types.
 */

const count = { type: "integer", minimum: 0 };
const numberOrNull = { type: ["number", "null"] };
const countOrNull = { type: ["integer", "null"], minimum: 0 };
/** RunMetrics (src/runner/types.ts). */
const runSchema = {
    type: "object",
    additionalProperties: false,
    required: [
        "seed",
        "runSeed",
        "stop",
        "steps",
        "evaluations",
        "f0",
        "finalGap",
        "bestGap",
        "stepsTo",
        "evaluationsTo",
        "divergedAt",
        "divergence",
        "rate",
        "trace",
    ],
    properties: {
        seed: count,
        runSeed: { type: "string", pattern: "^[0-9a-f]{16}$" },
        stop: { type: "string", enum: ["steps", "evaluations", "time", "target", "diverged", "error"] },
        steps: count,
        evaluations: count,
        f0: numberOrNull,
        finalGap: numberOrNull,
        bestGap: numberOrNull,
        stepsTo: { type: "array", items: countOrNull },
        evaluationsTo: { type: "array", items: countOrNull },
        divergedAt: countOrNull,
        divergence: { type: ["string", "null"], enum: ["non-finite", "blow-up", null] },
        rate: numberOrNull,
        trace: { type: "array", items: numberOrNull },
        iterates: { type: "array", items: { type: "array", items: { type: ["number", "null"] } } },
        error: { type: "string" },
        resume: {
            type: "object",
            additionalProperties: false,
            required: ["equal", "firstDifference"],
            properties: { equal: { type: "boolean" }, firstDifference: countOrNull },
        },
    },
};
/** CaseSpec (src/runner/types.ts). */
const caseSpecSchema = {
    type: "object",
    additionalProperties: false,
    required: [
        "id",
        "optimizer",
        "use",
        "set",
        "hyper",
        "problem",
        "problemKey",
        "params",
        "dim",
        "fStar",
        "fStarKind",
        "budget",
        "stopAt",
        "ladder",
        "blowUp",
        "checkpoints",
        "fingerprintSteps",
        "seeds",
        "measureEvery",
    ],
    properties: {
        id: { type: "string", minLength: 1 },
        optimizer: { type: "string", pattern: "^[A-Za-z0-9][A-Za-z0-9_.-]*$" },
        use: { type: "string", minLength: 1 },
        set: { type: "string", minLength: 1 },
        hyper: { type: "object", additionalProperties: { type: ["number", "boolean", "string"] } },
        problem: { type: "string", minLength: 1 },
        problemKey: { type: "string", minLength: 1 },
        params: { type: "object", additionalProperties: { type: "number" } },
        dim: { type: "integer", minimum: 1 },
        fStar: { type: "number" },
        fStarKind: { type: "string", enum: ["published", "computed", "lower-bound"] },
        budget: {
            type: "object",
            additionalProperties: false,
            required: ["steps", "evaluations", "seconds"],
            properties: { steps: count, evaluations: count, seconds: { type: "number", exclusiveMinimum: 0 } },
        },
        stopAt: { type: "number", minimum: 0 },
        ladder: { type: "array", items: { type: "number", exclusiveMinimum: 0 } },
        blowUp: { type: "number" },
        checkpoints: { type: "array", items: count },
        fingerprintSteps: count,
        seeds: { type: "integer", minimum: 1 },
        measureEvery: { type: "integer", minimum: 1 },
        scenario: {
            type: "object",
            additionalProperties: false,
            required: ["name"],
            properties: {
                name: { type: "string", minLength: 1 },
                resume: { type: "object", additionalProperties: false, required: ["at"], properties: { at: count } },
                lrChange: {
                    type: "object",
                    additionalProperties: false,
                    required: ["at", "lr"],
                    properties: { at: count, lr: { type: "number", exclusiveMinimum: 0 } },
                },
            },
        },
    },
};
const baselineSchema = {
    $schema: "https://json-schema.org/draft/2020-12/schema",
    $id: "https://gradgate.dev/schema/baseline.schema.json",
    title: "gradgate baseline file (one optimizer)",
    description: "Written by `gradgate rebaseline`; do not edit by hand (the digest catches edits).",
    type: "object",
    additionalProperties: false,
    required: ["format", "version", "optimizer", "provenance", "cases", "digest"],
    properties: {
        $schema: { type: "string" },
        format: { const: types/* BASELINE_FORMAT */.q4 },
        version: { const: types/* BASELINE_VERSION */.d0 },
        optimizer: { type: "string", pattern: "^[A-Za-z0-9][A-Za-z0-9_.-]*$" },
        provenance: {
            type: "object",
            additionalProperties: false,
            required: ["commit", "date", "reason", "tool", "suite", "environment"],
            properties: {
                commit: { type: "string", minLength: 1 },
                date: { type: "string", minLength: 1 },
                reason: { type: "string", minLength: 1 },
                tool: {
                    type: "object",
                    additionalProperties: false,
                    required: ["name", "version"],
                    properties: { name: { type: "string" }, version: { type: "string" } },
                },
                suite: {
                    type: "object",
                    additionalProperties: false,
                    required: ["hash", "seed"],
                    properties: { hash: { type: "string", pattern: "^sha256:[0-9a-f]{64}$" }, seed: count },
                },
                environment: {
                    type: "object",
                    additionalProperties: false,
                    required: ["node", "platform", "arch", "runtime"],
                    properties: {
                        node: { type: "string" },
                        platform: { type: "string" },
                        arch: { type: "string" },
                        runtime: { type: "string" },
                    },
                },
            },
        },
        cases: {
            type: "array",
            items: {
                type: "object",
                additionalProperties: false,
                required: ["case", "runs", "extraRuns"],
                properties: {
                    case: caseSpecSchema,
                    runs: { type: "array", minItems: 1, items: runSchema },
                    extraRuns: { type: "array", items: runSchema },
                },
            },
        },
        digest: { type: "string", pattern: "^sha256:[0-9a-f]{64}$" },
    },
};
/**
 * The parts of a results document (src/runner/results.ts) that compare and rebaseline rely on, checked
 * before use so a damaged results file gets a message instead of a crash.
 */
const resultsInputSchema = {
    type: "object",
    required: ["format", "version", "suite", "environment", "cases"],
    properties: {
        format: { type: "string" },
        version: { type: "integer" },
        suite: {
            type: "object",
            required: ["seed", "hash"],
            properties: { seed: count, hash: { type: "string", pattern: "^sha256:[0-9a-f]{64}$" } },
        },
        environment: {
            type: "object",
            required: ["node", "platform", "arch"],
            properties: { node: { type: "string" }, platform: { type: "string" }, arch: { type: "string" } },
        },
        cases: {
            type: "array",
            items: {
                type: "object",
                additionalProperties: false,
                required: ["case", "runs"],
                properties: { case: caseSpecSchema, runs: { type: "array", items: runSchema } },
            },
        },
    },
};
/** The field lists of the schema, for the test that keeps them equal to the TypeScript types. */
const RUN_FIELDS = Object.keys(runSchema.properties);
const CASE_SPEC_FIELDS = Object.keys(caseSpecSchema.properties);

;// CONCATENATED MODULE: ./build/package/baselines/validate.js
/**
 * Reading one baseline file: parse, check the format and version, validate against the JSON Schema with
 * ajv, check the digest (a hand edit), then the rules a schema cannot state (seeds in order, arrays as
 * long as the ladder, ids that match the optimizer). Every failure is one InputError naming the file, the
 * field and the bad value, and saying how to fix it. Pure: takes the text and the file's name.
 */









const REGENERATE = "regenerate the file with gradgate rebaseline";
let ajv = null;
let validator = null;
let resultsValidator = null;
function schemaValidator() {
    ajv ??= new _2020.Ajv2020({ allErrors: false, strict: true, allowUnionTypes: true });
    validator ??= ajv.compile(baselineSchema);
    return validator;
}
function resultsSchemaValidator() {
    ajv ??= new _2020.Ajv2020({ allErrors: false, strict: true, allowUnionTypes: true });
    resultsValidator ??= ajv.compile(resultsInputSchema);
    return resultsValidator;
}
/**
 * Parses a results document (what `gradgate run` wrote) and checks the parts compare and rebaseline use.
 * `file` names it in messages.
 */
function parseResults(text, file) {
    const where = `results ${file}`;
    const rerun = "run gradgate run again to rewrite it";
    let data;
    try {
        data = JSON.parse(text);
    }
    catch (err) {
        throw new errors/* InputError */.d(describeParseError(text, err.message, where).replace(REGENERATE, rerun));
    }
    const obj = (data ?? {});
    if (typeof data !== "object" || Array.isArray(data) || obj.format !== results/* RESULTS_FORMAT */.LZ) {
        throw new errors/* InputError */.d(`${where}: format must be ${JSON.stringify(results/* RESULTS_FORMAT */.LZ)}, got ${(0,errors/* quote */.h)(obj.format)}: not a gradgate results file; ` +
            `pass the file written by gradgate run --out`);
    }
    if (obj.version !== results/* RESULTS_VERSION */.kI) {
        throw new errors/* InputError */.d(`${where}: version must be ${results/* RESULTS_VERSION */.kI}, got ${(0,errors/* quote */.h)(obj.version)}; ${rerun}`);
    }
    const validate = resultsSchemaValidator();
    if (!validate(data)) {
        throw new errors/* InputError */.d(describeSchemaError((validate.errors ?? [])[0], data, where).replace(REGENERATE, rerun));
    }
    return data;
}
/** "sha256:…" of the canonical JSON of a baseline without its `digest` and `$schema` fields. */
function baselineDigest(file) {
    const rest = { ...file };
    delete rest.digest;
    delete rest.$schema;
    return "sha256:" + (0,external_node_crypto_.createHash)("sha256").update((0,json/* canonicalJson */.d)(rest)).digest("hex");
}
/**
 * Parses and checks the text of a baseline file. `file` names it in messages (e.g. "baselines/adam.json");
 * `optimizer` is the name its file name implies (the part before ".json").
 */
function parseBaseline(text, file, optimizer) {
    const where = `baseline ${file}`;
    if (text.trim() === "") {
        throw new errors/* InputError */.d(`${where}: the file is empty; restore it from version control or ${REGENERATE}`);
    }
    let data;
    try {
        data = JSON.parse(text);
    }
    catch (err) {
        throw new errors/* InputError */.d(describeParseError(text, err.message, where));
    }
    if (data === null || typeof data !== "object" || Array.isArray(data)) {
        throw new errors/* InputError */.d(`${where}: must be a JSON object written by gradgate rebaseline, got ${(0,errors/* quote */.h)(data)}; ${REGENERATE}`);
    }
    const obj = data;
    if (obj.format !== types/* BASELINE_FORMAT */.q4) {
        throw new errors/* InputError */.d(`${where}: format must be ${JSON.stringify(types/* BASELINE_FORMAT */.q4)}, got ${(0,errors/* quote */.h)(obj.format)}: not a gradgate baseline; ` +
            `move it out of the baselines directory or ${REGENERATE}`);
    }
    if (obj.version !== types/* BASELINE_VERSION */.d0) {
        const newer = typeof obj.version === "number" && obj.version > types/* BASELINE_VERSION */.d0;
        throw new errors/* InputError */.d(`${where}: version must be ${types/* BASELINE_VERSION */.d0}, got ${(0,errors/* quote */.h)(obj.version)}` +
            (newer
                ? `: written by a newer gradgate than ${version/* TOOL_VERSION */.w}; upgrade gradgate or ${REGENERATE}`
                : `; ${REGENERATE}`));
    }
    const validate = schemaValidator();
    if (!validate(data))
        throw new errors/* InputError */.d(describeSchemaError((validate.errors ?? [])[0], data, where));
    const baseline = data;
    const expected = baselineDigest(baseline);
    if (baseline.digest !== expected) {
        throw new errors/* InputError */.d(`${where}: digest ${(0,errors/* quote */.h)(baseline.digest)} does not match the content (${expected}): the file was changed ` +
            `after gradgate wrote it (edited by hand?); undo the edit (git checkout -- ${file}) or ${REGENERATE}`);
    }
    checkConsistency(baseline, where, optimizer);
    return baseline;
}
/** Truncated files and syntax errors: position as line and column. */
function describeParseError(text, message, where) {
    const pos = /position (\d+)/.exec(message);
    const offset = pos ? Number(pos[1]) : text.length;
    const truncated = /end of JSON input|Unterminated string/.test(message) || offset >= text.trimEnd().length;
    const before = text.slice(0, offset);
    const line = before.split("\n").length;
    const column = offset - before.lastIndexOf("\n");
    if (truncated) {
        return (`${where}: the file ends early at line ${line}, column ${column} (truncated: ${text.length} bytes); ` +
            `restore it from version control (git checkout -- ${where.replace(/^\S+ /, "")}) or ${REGENERATE}`);
    }
    return `${where}: not valid JSON at line ${line}, column ${column}: ${message.split("\n")[0]}; ${REGENERATE}`;
}
const article = (t) => (t === "null" ? "null" : /^[aeiou]/.test(t) ? `an ${t}` : `a ${t}`);
function describeSchemaError(e, data, where) {
    if (e === undefined)
        return `${where}: does not match the baseline schema; ${REGENERATE}`;
    const path = (0,json_pointer/* jsonPointerToPath */.K)(e.instancePath);
    const p = e.params;
    const value = (0,json_pointer/* valueAtPointer */.s)(data, e.instancePath);
    const at = path === "" ? "the top level" : path;
    switch (e.keyword) {
        case "required":
            return `${where}: ${path ? `${path}.` : ""}${String(p.missingProperty)} is missing; ${REGENERATE}`;
        case "additionalProperties":
            return `${where}: ${path ? `${path}.` : ""}${String(p.additionalProperty)} is not a baseline field; ${REGENERATE}`;
        case "type": {
            const types = (Array.isArray(p.type) ? p.type : [String(p.type)]).map(article).join(" or ");
            return `${where}: ${at} must be ${types}, got ${(0,errors/* quote */.h)(value)}; ${REGENERATE}`;
        }
        case "enum":
            return `${where}: ${at} must be one of ${p.allowedValues.map((v) => JSON.stringify(v)).join(", ")}, got ${(0,errors/* quote */.h)(value)}; ${REGENERATE}`;
        case "minimum":
            return `${where}: ${at} must be ≥ ${String(p.limit)}, got ${(0,errors/* quote */.h)(value)}; ${REGENERATE}`;
        case "exclusiveMinimum":
            return `${where}: ${at} must be > ${String(p.limit)}, got ${(0,errors/* quote */.h)(value)}; ${REGENERATE}`;
        case "minItems":
            return `${where}: ${at} must list at least ${String(p.limit)} item(s), got ${(0,errors/* quote */.h)(value)}; ${REGENERATE}`;
        case "pattern":
            return `${where}: ${at} must match ${String(p.pattern)}, got ${(0,errors/* quote */.h)(value)}; ${REGENERATE}`;
        default:
            return `${where}: ${at} ${e.message ?? "is invalid"}, got ${(0,errors/* quote */.h)(value)}; ${REGENERATE}`;
    }
}
/** What the schema cannot say. */
function checkConsistency(b, where, optimizer) {
    const fail = (field, text) => {
        throw new errors/* InputError */.d(`${where}: ${field} ${text}; ${REGENERATE}`);
    };
    if (b.optimizer !== optimizer) {
        throw new errors/* InputError */.d(`${where}: optimizer is ${(0,errors/* quote */.h)(b.optimizer)} but the file name says ${(0,errors/* quote */.h)(optimizer)}; ` +
            `rename the file to ${b.optimizer}.json or ${REGENERATE}`);
    }
    const ids = new Set();
    b.cases.forEach((c, i) => {
        const spec = c.case;
        const f = `cases[${i}]`;
        if (spec.optimizer !== b.optimizer)
            fail(`${f}.case.optimizer`, `is ${(0,errors/* quote */.h)(spec.optimizer)}, expected ${(0,errors/* quote */.h)(b.optimizer)}`);
        const id = `${spec.optimizer}/${spec.set}/${spec.problemKey}`;
        if (spec.id !== id)
            fail(`${f}.case.id`, `is ${(0,errors/* quote */.h)(spec.id)}, expected ${(0,errors/* quote */.h)(id)}`);
        if (ids.has(spec.id))
            fail(`${f}.case.id`, `${(0,errors/* quote */.h)(spec.id)} appears twice`);
        ids.add(spec.id);
        if (c.runs.length !== spec.seeds)
            fail(`${f}.runs`, `holds ${c.runs.length} runs, expected ${spec.seeds} (case.seeds)`);
        const all = c.runs.map((r, j) => [r, `${f}.runs[${j}]`, j]);
        c.extraRuns.forEach((r, j) => all.push([r, `${f}.extraRuns[${j}]`, spec.seeds + j]));
        for (const [run, rf, seed] of all) {
            if (run.seed !== seed)
                fail(`${rf}.seed`, `is ${run.seed}, expected ${seed} (seeds in order, no gaps)`);
            if (run.stepsTo.length !== spec.ladder.length) {
                fail(`${rf}.stepsTo`, `holds ${run.stepsTo.length} values, expected ${spec.ladder.length} (one per ladder rung)`);
            }
            if (run.evaluationsTo.length !== spec.ladder.length) {
                fail(`${rf}.evaluationsTo`, `holds ${run.evaluationsTo.length} values, expected ${spec.ladder.length} (one per ladder rung)`);
            }
            // Extra seeds keep no trace (charts use the suite's own seeds): an empty one is expected there.
            const traceLength = seed < spec.seeds ? spec.checkpoints.length : 0;
            if (run.trace.length !== traceLength) {
                fail(`${rf}.trace`, `holds ${run.trace.length} values, expected ${traceLength}${seed < spec.seeds ? " (one per checkpoint)" : " (extra seeds keep no trace)"}`);
            }
        }
    });
}


/***/ }),

/***/ 3638:
/***/ ((__unused_webpack___webpack_module__, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   Q: () => (/* binding */ processHost),
/* harmony export */   d: () => (/* binding */ EXIT)
/* harmony export */ });
/** Exit codes of every command. */
const EXIT = {
    ok: 0,
    /** The gate failed (compare), or a check failed. */
    fail: 1,
    /** Bad usage or bad input (config, baseline, results file): nothing was judged. */
    input: 2,
    /** A bug in gradgate itself. */
    internal: 3,
};
function processHost() {
    return {
        out: (t) => process.stdout.write(t),
        err: (t) => process.stderr.write(t),
        interactive: process.stderr.isTTY === true,
        cwd: process.cwd(),
    };
}


/***/ }),

/***/ 6126:
/***/ ((__unused_webpack___webpack_module__, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   cp: () => (/* binding */ mergeCommand),
/* harmony export */   gY: () => (/* binding */ readAndMerge)
/* harmony export */ });
/* unused harmony export shardFiles */
/* harmony import */ var node_fs__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(3024);
/* harmony import */ var node_path__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(6760);
/* harmony import */ var _core_errors_js__WEBPACK_IMPORTED_MODULE_5__ = __webpack_require__(4552);
/* harmony import */ var _core_json_js__WEBPACK_IMPORTED_MODULE_6__ = __webpack_require__(625);
/* harmony import */ var _io_files_js__WEBPACK_IMPORTED_MODULE_2__ = __webpack_require__(1687);
/* harmony import */ var _runner_shard_js__WEBPACK_IMPORTED_MODULE_3__ = __webpack_require__(862);
/* harmony import */ var _host_js__WEBPACK_IMPORTED_MODULE_4__ = __webpack_require__(3638);
/** `gradgate merge`: combine the results of shards 1…n (run --shard i/n) into the whole suite's results. */







/**
 * Expands the inputs into files: a file as given, a directory into the *.json files anywhere below it
 * (artifact downloads put each shard in a folder of its own), sorted so the order never depends on the
 * file system. Paths are shown relative to the working directory.
 */
function shardFiles(cwd, inputs) {
    const files = [];
    for (const input of inputs) {
        const path = (0,node_path__WEBPACK_IMPORTED_MODULE_1__.resolve)(cwd, input);
        if (!(0,node_fs__WEBPACK_IMPORTED_MODULE_0__.existsSync)(path))
            throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_5__/* .InputError */ .d(`merge: ${input}: no such file or directory`);
        if ((0,node_fs__WEBPACK_IMPORTED_MODULE_0__.statSync)(path).isDirectory()) {
            const found = jsonFilesBelow(path);
            if (found.length === 0)
                throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_5__/* .InputError */ .d(`merge: ${input}: the directory holds no .json files`);
            files.push(...found);
        }
        else
            files.push(path);
    }
    return [...new Set(files)].sort();
}
function jsonFilesBelow(dir) {
    const out = [];
    for (const entry of (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.readdirSync)(dir, { withFileTypes: true })) {
        const path = (0,node_path__WEBPACK_IMPORTED_MODULE_1__.join)(dir, entry.name);
        if (entry.isDirectory())
            out.push(...jsonFilesBelow(path));
        else if (entry.isFile() && entry.name.endsWith(".json"))
            out.push(path);
    }
    return out;
}
/** Reads the shard files and merges them (see src/runner/shard.ts). */
function readAndMerge(cwd, inputs) {
    const parts = shardFiles(cwd, inputs).map((path) => {
        const name = (0,node_path__WEBPACK_IMPORTED_MODULE_1__.relative)(cwd, path) || path;
        let doc;
        try {
            doc = JSON.parse((0,node_fs__WEBPACK_IMPORTED_MODULE_0__.readFileSync)(path, "utf8"));
        }
        catch (err) {
            throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_5__/* .InputError */ .d(`merge: ${name} is not valid JSON (${err.message})`);
        }
        return { name, doc: doc };
    });
    return (0,_runner_shard_js__WEBPACK_IMPORTED_MODULE_3__/* .mergeShards */ .Ox)(parts);
}
function mergeCommand(host, args) {
    if (args.inputs.length === 0) {
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_5__/* .InputError */ .d("merge: name the shard results files (or directories holding them)");
    }
    const doc = readAndMerge(host.cwd, args.inputs);
    (0,_io_files_js__WEBPACK_IMPORTED_MODULE_2__/* .writeFileAtomic */ .Z)((0,node_path__WEBPACK_IMPORTED_MODULE_1__.resolve)(host.cwd, args.out), (0,_core_json_js__WEBPACK_IMPORTED_MODULE_6__/* .canonicalJson */ .d)(doc));
    if (!args.quiet) {
        host.out(`merged ${doc.cases.length} cases, ${doc.suite.runs} runs; results written to ${args.out}\n`);
    }
    return _host_js__WEBPACK_IMPORTED_MODULE_4__/* .EXIT */ .d.ok;
}


/***/ }),

/***/ 5286:
/***/ ((__unused_webpack___webpack_module__, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   Hv: () => (/* binding */ VERDICT_VERSION),
/* harmony export */   KC: () => (/* binding */ VERDICT_FORMAT),
/* harmony export */   SE: () => (/* binding */ CASE_VERDICTS)
/* harmony export */ });
/* unused harmony export METRIC_KINDS */
const VERDICT_FORMAT = "gradgate-verdict";
const VERDICT_VERSION = 1;
/** Every case verdict, in the order reports list them (worst news first). */
const CASE_VERDICTS = [
    "regressed",
    "missing",
    "inconclusive",
    "improved",
    "new",
    "equivalent",
    "unchanged",
];
const METRIC_KINDS = (/* unused pure expression or super */ null && (["stepsTo", "finalGap", "evaluations"]));


/***/ }),

/***/ 2881:
/***/ ((__unused_webpack___webpack_module__, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   K: () => (/* binding */ jsonPointerToPath),
/* harmony export */   s: () => (/* binding */ valueAtPointer)
/* harmony export */ });
/** JSON Pointer (RFC 6901) helpers for turning schema errors into messages people read. */
/** "/problems/2/seeds" → "problems[2].seeds". */
function jsonPointerToPath(pointer) {
    let out = "";
    for (const raw of pointer.split("/").slice(1)) {
        const part = unescape(raw);
        out += /^\d+$/.test(part) ? `[${part}]` : out === "" ? part : `.${part}`;
    }
    return out;
}
/** The value `pointer` names inside `data`, or undefined when the path does not exist. */
function valueAtPointer(data, pointer) {
    let v = data;
    for (const raw of pointer.split("/").slice(1)) {
        if (v === null || typeof v !== "object")
            return undefined;
        v = v[unescape(raw)];
    }
    return v;
}
function unescape(token) {
    return token.replace(/~1/g, "/").replace(/~0/g, "~");
}


/***/ }),

/***/ 1687:
/***/ ((__unused_webpack___webpack_module__, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   Z: () => (/* binding */ writeFileAtomic)
/* harmony export */ });
/* harmony import */ var node_fs__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(3024);
/* harmony import */ var node_path__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(6760);
/**
 * File writing at the edges. `writeFileAtomic` writes to a temporary file in the same directory, flushes
 * it to disk and renames it over the target, so a reader (or a killed process) never sees a half-written
 * file: the target holds either the old bytes or the new ones.
 */


function writeFileAtomic(path, data) {
    const dir = (0,node_path__WEBPACK_IMPORTED_MODULE_1__.dirname)(path);
    (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.mkdirSync)(dir, { recursive: true });
    const tmp = (0,node_path__WEBPACK_IMPORTED_MODULE_1__.join)(dir, `.${(0,node_path__WEBPACK_IMPORTED_MODULE_1__.basename)(path)}.${process.pid}.${Date.now()}.tmp`);
    const fd = (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.openSync)(tmp, "w");
    try {
        (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.writeSync)(fd, data);
        (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.fsyncSync)(fd);
    }
    catch (err) {
        (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.closeSync)(fd);
        (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.rmSync)(tmp, { force: true });
        throw err;
    }
    (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.closeSync)(fd);
    try {
        (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.renameSync)(tmp, path);
    }
    catch (err) {
        (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.rmSync)(tmp, { force: true });
        throw err;
    }
}


/***/ }),

/***/ 4027:
/***/ ((__unused_webpack___webpack_module__, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   Hg: () => (/* binding */ mermaidText),
/* harmony export */   TN: () => (/* binding */ oneLine),
/* harmony export */   ZD: () => (/* binding */ escapeHtml),
/* harmony export */   bC: () => (/* binding */ mdText),
/* harmony export */   xs: () => (/* binding */ mdCode)
/* harmony export */ });
/**
 * Escaping for every piece of text that reaches a report. Names come from user config, from the
 * optimizer's own code (adapters describe themselves) and, in the publishing workflow, from a results file
 * that a pull request could have forged, so none of them may be able to add a link, an image, HTML, a
 * table cell, a mention or a Mermaid directive. Each target language has its own function; callers never
 * concatenate raw names.
 */
/** One line, no control characters (tabs and newlines become spaces), at most `max` characters. */
function oneLine(value, max = 200) {
    const text = String(value ?? "")
        // eslint-disable-next-line no-control-regex
        .replace(/[\u0000-\u001f\u007f-\u009f\u2028\u2029]+/g, " ")
        .trim();
    return text.length > max ? text.slice(0, max - 1) + "…" : text;
}
/** HTML text and attribute values: & < > " ' become entities. */
function escapeHtml(value) {
    return String(value ?? "")
        .replace(/&/g, "&amp;")
        .replace(/</g, "&lt;")
        .replace(/>/g, "&gt;")
        .replace(/"/g, "&quot;")
        .replace(/'/g, "&#39;");
}
/**
 * Plain text inside GitHub-flavoured Markdown (paragraphs, list items, table cells): every ASCII
 * punctuation character that Markdown gives a meaning to is backslash-escaped (so `[x](http://evil)`
 * stays text and `|` cannot end a table cell), `<`, `>` and `&` become entities (no HTML, no autolinks in
 * angle brackets), `:` and `.` are escaped so no bare URL or www address is linked, and `@` and `#` are
 * followed by a zero-width space so no one is mentioned and no issue is linked. One line, shortened to `max`.
 */
function mdText(value, max = 200) {
    return oneLine(value, max)
        .replace(/[\\`*_{}[\]()#+\-.!|~:^=$"'/]/g, (c) => `\\${c}`)
        .replace(/&/g, "&amp;")
        .replace(/</g, "&lt;")
        .replace(/>/g, "&gt;")
        .replace(/@/g, "&#64;\u200b")
        .replace(/\\#/g, "\\#\u200b");
}
/**
 * An identifier shown as code (case ids, optimizer and problem names) inside Markdown, including table
 * cells: a code span whose fence is longer than any run of backticks inside, with `|` escaped (GitHub
 * splits table rows on pipes before it reads code spans, and restores `\|` to `|` inside them).
 */
function mdCode(value, max = 120) {
    const text = oneLine(value, max).replace(/\|/g, "\\|");
    if (text === "")
        return "` `";
    let longest = 0;
    for (const run of text.match(/`+/g) ?? [])
        longest = Math.max(longest, run.length);
    const fence = "`".repeat(longest + 1);
    const pad = text.startsWith("`") || text.endsWith("`") || (text.startsWith(" ") && text.endsWith(" ")) ? " " : "";
    return `${fence}${pad}${text}${pad}${fence}`;
}
/**
 * Text inside a Mermaid chart (titles, axis labels, categories), which Mermaid places in double quotes:
 * only letters, digits, spaces and a few harmless marks survive; anything else becomes "?". Mermaid's
 * own syntax (quotes, brackets, `%%` directives, `;`, `#` entities) therefore cannot appear.
 */
function mermaidText(value, max = 80) {
    return oneLine(value, max).replace(/[^A-Za-z0-9 ._,/()=+\-×≤≥·]/g, "?");
}


/***/ }),

/***/ 8787:
/***/ ((__unused_webpack___webpack_module__, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   B: () => (/* binding */ metricLabel),
/* harmony export */   LS: () => (/* binding */ plural),
/* harmony export */   LU: () => (/* binding */ driftText),
/* harmony export */   bu: () => (/* binding */ num),
/* harmony export */   s0: () => (/* binding */ VERDICT_MARK),
/* harmony export */   sp: () => (/* binding */ pValue)
/* harmony export */ });
/* unused harmony export rungText */
/** Three significant digits, scientific outside [0.001, 10⁴); "—" for null or a non-number. */
function num(x) {
    if (typeof x !== "number" || Number.isNaN(x))
        return "—";
    if (x === Infinity)
        return "∞";
    if (x === -Infinity)
        return "−∞";
    if (x === 0)
        return "0";
    const a = Math.abs(x);
    return a >= 0.001 && a < 1e4 ? String(Number(x.toPrecision(3))) : x.toExponential(2).replace("e+", "e");
}
/** A p-value: "< 0.0001" below that, else 2 significant digits. */
function pValue(p) {
    if (typeof p !== "number" || Number.isNaN(p))
        return "—";
    if (p < 1e-4)
        return "< 0.0001";
    return String(Number(p.toPrecision(2)));
}
/** The metric in words: "steps to 1e-3", "final gap", "evaluations". */
function metricLabel(d) {
    switch (d.kind) {
        case "stepsTo":
            return typeof d.rung === "number" ? `steps to ${rungText(d.rung)}` : "steps to tolerance";
        case "finalGap":
            return "final gap";
        case "evaluations":
            return "evaluations";
        default:
            return String(d.metric ?? "metric");
    }
}
/** A ladder rung (relative gap tolerance) as "1e-3". */
function rungText(rung) {
    const e = Math.log10(rung);
    return Math.abs(e - Math.round(e)) < 1e-9 ? `1e${Math.round(e)}` : rung.toExponential(1).replace("e+", "e");
}
/**
 * A drift as "×1.32 (97.5% CI 1.20–1.45)", with "≥"/"≤" when censored pairs make the ratio a bound, an
 * open end of the interval as 0 or ∞, and "no pairs" when there is nothing to estimate.
 */
function driftText(d) {
    if (typeof d.ratio !== "number")
        return "no pairs";
    const sign = d.bound === "at-least" ? "≥" : d.bound === "at-most" ? "≤" : "";
    const i = d.interval;
    const ci = i
        ? ` (${num(Number(i.level) * 100)}% CI ${i.low === null ? "0" : num(i.low)}–${i.high === null ? "∞" : num(i.high)})`
        : "";
    return `${sign}×${num(d.ratio)}${ci}`;
}
/** Symbol and word of a case verdict (the word always stands beside the symbol). */
const VERDICT_MARK = {
    regressed: "🔴",
    missing: "⚫",
    inconclusive: "🟡",
    improved: "🟢",
    new: "🆕",
    equivalent: "⚪",
    unchanged: "⚪",
};
/** Plural helper: "1 case", "3 cases". */
function plural(n, word, many = `${word}s`) {
    return `${n} ${n === 1 ? word : many}`;
}


/***/ }),

/***/ 5013:
/***/ ((__unused_webpack___webpack_module__, __webpack_exports__, __webpack_require__) => {


// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  K: () => (/* binding */ renderHtml)
});

// EXTERNAL MODULE: ./build/package/report/escape.js
var report_escape = __webpack_require__(4027);
// EXTERNAL MODULE: ./build/package/report/format.js
var format = __webpack_require__(8787);
// EXTERNAL MODULE: ./build/package/report/model.js
var model = __webpack_require__(6751);
;// CONCATENATED MODULE: ./build/package/report/svg.js
/**
 * Convergence chart as inline SVG, for the HTML report: gap f − f* against the step on true log axes,
 * the median over the seeds as a line and the range from the smallest to the largest gap as a band,
 * baseline and candidate in two colours, with a legend. Self-contained (no fonts, scripts or links).
 */

const SIDE_COLOURS = {
    baseline: { line: "#1d4f91", band: "#9dbbe3" },
    candidate: { line: "#c4450c", band: "#f2b48a" },
};
const W = 460;
const H = 296;
const M = { left: 58, right: 14, top: 46, bottom: 40 };
const MAX_DECADES = 24;
/** One chart; null when the candidate has nothing to draw. */
function svgChart(title, candidate, baseline) {
    const sides = [
        ...(baseline ? [{ name: "baseline", curve: baseline, colour: SIDE_COLOURS.baseline }] : []),
        { name: "candidate", curve: candidate, colour: SIDE_COLOURS.candidate },
    ];
    let yLo = Infinity;
    let yHi = -Infinity;
    let xHi = 1;
    for (const { curve } of sides) {
        curve.steps.forEach((s, i) => {
            if (s < 1)
                return;
            for (const v of [curve.low[i], curve.median[i], curve.high[i]]) {
                if (typeof v === "number" && v > 0 && Number.isFinite(v)) {
                    yLo = Math.min(yLo, Math.log10(v));
                    yHi = Math.max(yHi, Math.log10(v));
                    xHi = Math.max(xHi, s);
                }
            }
        });
    }
    if (!Number.isFinite(yLo))
        return null;
    let top = Math.ceil(yHi);
    let bottom = Math.floor(yLo);
    if (top === bottom)
        top++;
    bottom = Math.max(bottom, top - MAX_DECADES);
    const right = Math.max(1, Math.ceil(Math.log10(xHi)));
    const px = (step) => M.left + (Math.log10(step) / right) * (W - M.left - M.right);
    const py = (v) => {
        const y = v === Infinity ? top : v > 0 ? Math.min(top, Math.max(bottom, Math.log10(v))) : bottom;
        return M.top + ((top - y) / (top - bottom)) * (H - M.top - M.bottom);
    };
    const f = (x) => x.toFixed(1);
    const parts = [];
    parts.push(`<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${W} ${H}" width="${W}" height="${H}" role="img" aria-label="${(0,report_escape/* escapeHtml */.ZD)(`Convergence of ${title}`)}">`, `<rect x="0" y="0" width="${W}" height="${H}" fill="#ffffff"/>`, `<text x="${M.left}" y="18" font-size="13" font-family="sans-serif" fill="#222">${(0,report_escape/* escapeHtml */.ZD)(title)}</text>`);
    // Grid and tick labels: every decade on both axes (thinned to at most 8 labels on y).
    const yEvery = Math.max(1, Math.ceil((top - bottom) / 8));
    for (let d = bottom; d <= top; d++) {
        const y = M.top + ((top - d) / (top - bottom)) * (H - M.top - M.bottom);
        parts.push(`<line x1="${M.left}" x2="${W - M.right}" y1="${f(y)}" y2="${f(y)}" stroke="#e3e3e3"/>`);
        if ((top - d) % yEvery === 0) {
            parts.push(`<text x="${M.left - 6}" y="${f(y + 4)}" font-size="11" font-family="sans-serif" text-anchor="end" fill="#444">1e${d}</text>`);
        }
    }
    for (let d = 0; d <= right; d++) {
        const x = px(10 ** d);
        parts.push(`<line x1="${f(x)}" x2="${f(x)}" y1="${M.top}" y2="${H - M.bottom}" stroke="#e3e3e3"/>`);
        parts.push(`<text x="${f(x)}" y="${H - M.bottom + 15}" font-size="11" font-family="sans-serif" text-anchor="middle" fill="#444">${10 ** d}</text>`);
    }
    parts.push(`<rect x="${M.left}" y="${M.top}" width="${W - M.left - M.right}" height="${H - M.top - M.bottom}" fill="none" stroke="#888"/>`, `<text x="${(M.left + W - M.right) / 2}" y="${H - 6}" font-size="11" font-family="sans-serif" text-anchor="middle" fill="#444">step (log scale)</text>`, `<text x="12" y="${(M.top + H - M.bottom) / 2}" font-size="11" font-family="sans-serif" text-anchor="middle" fill="#444" transform="rotate(-90 12 ${(M.top + H - M.bottom) / 2})">gap f − f* (log scale)</text>`);
    for (const { curve, colour } of sides) {
        // Band: contiguous stretches where both ends are known.
        for (const run of stretches(curve, (i) => curve.low[i] !== null && curve.high[i] !== null)) {
            const upper = run.map((i) => `${f(px(curve.steps[i]))},${f(py(curve.high[i]))}`);
            const lower = run.map((i) => `${f(px(curve.steps[i]))},${f(py(curve.low[i]))}`).reverse();
            parts.push(`<polygon points="${[...upper, ...lower].join(" ")}" fill="${colour.band}" fill-opacity="0.45" stroke="none"/>`);
        }
        for (const run of stretches(curve, (i) => curve.median[i] !== null)) {
            const pts = run.map((i) => `${f(px(curve.steps[i]))},${f(py(curve.median[i]))}`);
            parts.push(`<polyline points="${pts.join(" ")}" fill="none" stroke="${colour.line}" stroke-width="2"/>`);
        }
    }
    // Legend: under the title, right-aligned, above the plot.
    let lx = W - M.right - 8;
    for (const { name, curve, colour } of [...sides].reverse()) {
        const label = `${name} (${curve.seeds} seeds)`;
        const width = 26 + label.length * 6.2;
        lx -= width;
        parts.push(`<rect x="${f(lx)}" y="26" width="16" height="8" fill="${colour.band}"/>`, `<line x1="${f(lx)}" x2="${f(lx + 16)}" y1="30" y2="30" stroke="${colour.line}" stroke-width="2"/>`, `<text x="${f(lx + 20)}" y="34" font-size="11" font-family="sans-serif" fill="#222">${(0,report_escape/* escapeHtml */.ZD)(label)}</text>`);
    }
    parts.push("</svg>");
    return parts.join("\n");
}
/** Runs of consecutive checkpoints (step ≥ 1) where `ok` holds. */
function stretches(curve, ok) {
    const out = [];
    let run = [];
    curve.steps.forEach((s, i) => {
        if (s >= 1 && ok(i))
            run.push(i);
        else if (run.length > 0) {
            out.push(run);
            run = [];
        }
    });
    if (run.length > 0)
        out.push(run);
    return out.filter((r) => r.length > 0);
}

;// CONCATENATED MODULE: ./build/package/report/html.js




const STYLE = `
body{font:14px/1.45 system-ui,-apple-system,"Segoe UI",sans-serif;color:#1f2328;margin:24px auto;max-width:1100px;padding:0 16px}
h1{font-size:22px;margin:0 0 4px}h2{font-size:17px;margin:28px 0 8px;border-bottom:1px solid #d0d7de;padding-bottom:4px}
.pass{color:#1a7f37}.fail{color:#cf222e}.muted{color:#59636e}
table{border-collapse:collapse;width:100%;font-size:13px}th,td{border:1px solid #d0d7de;padding:4px 6px;text-align:left;vertical-align:top}
th{background:#f6f8fa}code{font:12px ui-monospace,SFMono-Regular,Menlo,monospace;background:#f6f8fa;padding:1px 3px;border-radius:3px}
tr.regressed>td:first-child,tr.missing>td:first-child{border-left:4px solid #cf222e}tr.improved>td:first-child{border-left:4px solid #1a7f37}
tr.inconclusive>td:first-child{border-left:4px solid #bf8700}
.dot{display:inline-block;width:9px;height:9px;border-radius:50%;margin-right:5px;background:#afb8c1}
.dot.regressed,.dot.missing{background:#cf222e}.dot.improved{background:#1a7f37}.dot.inconclusive{background:#bf8700}.dot.new{background:#0969da}
.badge{display:inline-block;color:#fff;border-radius:4px;padding:0 8px;margin-right:8px;font-size:15px;vertical-align:2px}
.badge.pass{background:#1a7f37;color:#fff}.badge.fail{background:#cf222e;color:#fff}
.charts{display:flex;flex-wrap:wrap;gap:12px}.charts figure{margin:0;border:1px solid #d0d7de;border-radius:6px;padding:6px}
figcaption{font-size:12px;color:#59636e;max-width:460px}details{margin:6px 0}summary{cursor:pointer}
ul.reasons{margin:4px 0 8px 18px;padding:0}
`;
/** Renders the whole report. */
function renderHtml(input, options = {}) {
    const v = input.verdict;
    const pass = v.gate?.verdict === "pass";
    const ordered = (0,model/* orderCases */.o$)(v.cases ?? []);
    const counts = (v.counts ?? {});
    const out = [];
    out.push("<!doctype html>", '<html lang="en">', "<head>", '<meta charset="utf-8">', `<meta http-equiv="Content-Security-Policy" content="default-src 'none'; style-src 'unsafe-inline'; img-src data:">`, '<meta name="viewport" content="width=device-width, initial-scale=1">', `<title>gradgate: convergence gate ${pass ? "passed" : "failed"}</title>`, `<style>${STYLE}</style>`, "</head>", "<body>", `<h1 class="${pass ? "pass" : "fail"}"><span class="badge ${pass ? "pass" : "fail"}">${pass ? "PASS" : "FAIL"}</span>` +
        `Convergence gate ${pass ? "passed" : "failed"}</h1>`, `<p>${Object.entries(counts)
        .filter(([, n]) => typeof n === "number" && n > 0)
        .map(([k, n]) => `${(0,report_escape/* escapeHtml */.ZD)(n)} ${(0,report_escape/* escapeHtml */.ZD)(k)}`)
        .join(" · ")} — ${(0,format/* plural */.LS)(ordered.length, "case")} compared with the baseline</p>`);
    for (const note of input.notes ?? [])
        out.push(`<p class="muted">${(0,report_escape/* escapeHtml */.ZD)((0,report_escape/* oneLine */.TN)(note, 600))}</p>`);
    const reasons = v.gate?.reasons ?? [];
    if (!pass && reasons.length > 0) {
        out.push("<h2>Why it failed</h2>", '<ul class="reasons">');
        for (const r of reasons)
            out.push(`<li>${(0,report_escape/* escapeHtml */.ZD)((0,report_escape/* oneLine */.TN)(r.message, 600))}</li>`);
        out.push("</ul>");
    }
    const gateChecks = v.gate?.checks ?? [];
    if (gateChecks.length > 0) {
        out.push("<h2>Suite reference checks</h2>", checksTable(gateChecks));
    }
    const charted = (0,model/* chartCases */.iA)(input, options.charts ?? 60);
    const figures = [];
    for (const c of charted) {
        const { candidate, baseline } = (0,model/* curvesFor */.ek)(input, c.id);
        const svg = candidate ? svgChart(c.id, candidate, baseline) : null;
        if (svg === null)
            continue;
        const lead = (0,model/* leadDrift */.mF)(c);
        figures.push(`<figure>${svg}<figcaption>${dot(c.verdict)}${(0,report_escape/* escapeHtml */.ZD)(c.verdict)}${lead ? ` — ${(0,report_escape/* escapeHtml */.ZD)(`${(0,format/* metricLabel */.B)(lead)} ${(0,format/* driftText */.LU)(lead)}`)}` : ""}</figcaption></figure>`);
    }
    if (figures.length > 0) {
        out.push(`<h2>Convergence of the ${(0,format/* plural */.LS)(figures.length, "case")} that drifted most</h2>`, '<p class="muted">Median gap f − f* over the seeds (line) and the range from the smallest to the largest gap (band), against the step, both on log scales.</p>', `<div class="charts">${figures.join("\n")}</div>`);
    }
    out.push(`<h2>All ${(0,format/* plural */.LS)(ordered.length, "case")}</h2>`, "<table><thead><tr><th>Case</th><th>Verdict</th><th>Drift (candidate ÷ baseline)</th><th>Reference checks</th><th>Details</th></tr></thead><tbody>");
    for (const c of ordered)
        out.push(caseRow(c));
    out.push("</tbody></table>");
    out.push(`<p class="muted">${footer(input)}</p>`, "</body>", "</html>");
    return out.join("\n") + "\n";
}
function caseRow(c) {
    const lead = (0,model/* leadDrift */.mF)(c);
    const t = (0,model/* checkTally */.tL)(c.checks);
    const checks = t.pass + t.fail + t.skipped === 0
        ? "—"
        : `${t.pass} passed, ${t.fail} failed${t.skipped ? `, ${t.skipped} skipped` : ""}${t.failed.length
            ? `: ${t.failed.map((x) => `<code>${(0,report_escape/* escapeHtml */.ZD)((0,report_escape/* oneLine */.TN)(x.id, 60))}</code>`).join(", ")}`
            : ""}`;
    const details = [];
    if ((c.reasons ?? []).length > 0) {
        details.push(`<ul class="reasons">${c.reasons.map((r) => `<li>${(0,report_escape/* escapeHtml */.ZD)((0,report_escape/* oneLine */.TN)(r.message, 600))}</li>`).join("")}</ul>`);
    }
    if ((c.drift ?? []).length > 0)
        details.push(metricsTable(c.drift));
    if ((c.checks ?? []).length > 0)
        details.push(checksTable(c.checks));
    const body = details.length
        ? `<details${(0,model/* isChanged */.Hq)(c) ? " open" : ""}><summary>${(0,format/* plural */.LS)((c.drift ?? []).length, "metric")}</summary>${details.join("")}</details>`
        : "—";
    return (`<tr class="${(0,report_escape/* escapeHtml */.ZD)(c.verdict)}"><td><code>${(0,report_escape/* escapeHtml */.ZD)((0,report_escape/* oneLine */.TN)(c.id, 200))}</code></td>` +
        `<td>${dot(c.verdict)}${(0,report_escape/* escapeHtml */.ZD)(c.verdict)}</td>` +
        `<td>${lead ? (0,report_escape/* escapeHtml */.ZD)(`${(0,format/* metricLabel */.B)(lead)} ${(0,format/* driftText */.LU)(lead)}`) : "—"}${(c.diverged ?? []).length
            ? `<br><strong>${(0,format/* plural */.LS)(c.diverged.length, "seed")} newly diverged</strong>`
            : ""}</td><td>${checks}</td><td>${body}</td></tr>`);
}
/** A coloured dot for a verdict (CSS only: no emoji font needed). */
function dot(verdict) {
    return `<span class="dot ${(0,report_escape/* escapeHtml */.ZD)(verdict)}"></span>`;
}
function metricsTable(drift) {
    const rows = drift.map((d) => `<tr><td>${(0,report_escape/* escapeHtml */.ZD)((0,format/* metricLabel */.B)(d))}${d.gating ? "" : " (reported only)"}</td><td>${(0,report_escape/* escapeHtml */.ZD)(d.status)}</td>` +
        `<td>${(0,report_escape/* escapeHtml */.ZD)((0,format/* driftText */.LU)(d))}</td><td>${(0,report_escape/* escapeHtml */.ZD)((0,format/* pValue */.sp)(d.adjustedPValue))}</td>` +
        `<td>${(0,report_escape/* escapeHtml */.ZD)((0,format/* pValue */.sp)(d.equivalencePValue))}</td><td>${(0,report_escape/* escapeHtml */.ZD)((0,format/* num */.bu)(d.pairs))}</td></tr>`);
    return ("<table><thead><tr><th>Metric</th><th>Status</th><th>Drift</th><th>Adjusted p (beyond margin)</th>" +
        `<th>p (within margin)</th><th>Pairs</th></tr></thead><tbody>${rows.join("")}</tbody></table>`);
}
function checksTable(checks) {
    const rows = checks.map((c) => `<tr><td><code>${(0,report_escape/* escapeHtml */.ZD)((0,report_escape/* oneLine */.TN)(c.id, 80))}</code></td><td>${(0,report_escape/* escapeHtml */.ZD)(c.status)}${c.gating ? "" : " (informational)"}</td>` +
        `<td>${(0,report_escape/* escapeHtml */.ZD)((0,report_escape/* oneLine */.TN)(c.summary, 400))}</td><td>${(0,report_escape/* escapeHtml */.ZD)((0,report_escape/* oneLine */.TN)(c.source, 300))}</td></tr>`);
    return `<table><thead><tr><th>Check</th><th>Status</th><th>Result</th><th>Source</th></tr></thead><tbody>${rows.join("")}</tbody></table>`;
}
function footer(input) {
    const v = input.verdict;
    const p = v.policy;
    const parts = [];
    if (p && typeof p === "object") {
        parts.push(`Policy: margins ×${(0,format/* num */.bu)(p.margin?.stepsTo)} steps, ×${(0,format/* num */.bu)(p.margin?.finalGap)} final gap, ×${(0,format/* num */.bu)(p.margin?.evaluations)} evaluations; ` +
            `alpha ${(0,format/* num */.bu)(p.alpha)}, ${(0,report_escape/* escapeHtml */.ZD)(p.correction)} correction${p.strict ? ", strict" : ""}.`);
    }
    parts.push(`Baseline suite ${(0,report_escape/* escapeHtml */.ZD)((0,report_escape/* oneLine */.TN)(v.baseline?.suiteHash ?? "—", 80))}; candidate suite ${(0,report_escape/* escapeHtml */.ZD)((0,report_escape/* oneLine */.TN)(v.candidate?.suiteHash ?? "—", 80))}.`);
    if (v.tool)
        parts.push(`${(0,report_escape/* escapeHtml */.ZD)((0,report_escape/* oneLine */.TN)(v.tool.name, 40))} ${(0,report_escape/* escapeHtml */.ZD)((0,report_escape/* oneLine */.TN)(v.tool.version, 40))}.`);
    return parts.join(" ");
}


/***/ }),

/***/ 902:
/***/ ((__unused_webpack___webpack_module__, __webpack_exports__, __webpack_require__) => {


// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  Ql: () => (/* binding */ commentMarker),
  Gc: () => (/* binding */ renderMarkdown)
});

// UNUSED EXPORTS: COMMENT_LIMIT, SUMMARY_LIMIT, safeUrl

// EXTERNAL MODULE: ./build/package/compare/types.js
var types = __webpack_require__(5286);
// EXTERNAL MODULE: ./build/package/report/escape.js
var report_escape = __webpack_require__(4027);
// EXTERNAL MODULE: ./build/package/report/format.js
var format = __webpack_require__(8787);
;// CONCATENATED MODULE: ./build/package/report/mermaid.js
/**
 * Convergence charts as Mermaid `xychart-beta` blocks, which GitHub draws in comments and job summaries.
 * Mermaid has neither a log axis nor a legend, so the chart plots log10 of the gap, puts the checkpoints
 * (log-spaced steps) on a category axis, and the caption above it says which line is which.
 */

/** Line colours in drawing order: spread first, medians on top (baseline blue, candidate orange). */
const BASELINE_SPREAD = "#9dbbe3";
const BASELINE_MEDIAN = "#1d4f91";
const CANDIDATE_SPREAD = "#f2b48a";
const CANDIDATE_MEDIAN = "#c4450c";
/** The caption that goes above every chart (Markdown we write ourselves, no user text). */
const MERMAID_CAPTION = "Median gap f − f* over the seeds against the step, with the smallest and largest gap as thin lines: " +
    "**baseline in blue, candidate in orange**. Mermaid has no log axis, so the chart plots **log10 of the gap** " +
    "and the steps are the log-spaced checkpoints, evenly placed (approximately a log axis).";
/** At most this many checkpoints per chart (Mermaid labels every category). */
const MAX_POINTS = 15;
/** The y axis spans at most this many decades below the largest gap. */
const MAX_DECADES = 24;
/** Picks up to MAX_POINTS checkpoint indices: step 0, then steps spread evenly in log scale. */
function pickPoints(steps, max = MAX_POINTS) {
    if (steps.length <= max)
        return steps.map((_, i) => i);
    const picked = new Set();
    if (steps[0] === 0)
        picked.add(0);
    const positive = steps.map((s, i) => [s, i]).filter(([s]) => s >= 1);
    const top = positive[positive.length - 1][0];
    const slots = max - picked.size;
    for (let j = 0; j < slots; j++) {
        const target = Math.log(top) * (slots === 1 ? 1 : j / (slots - 1));
        let best = positive[0];
        for (const p of positive)
            if (Math.abs(Math.log(p[0]) - target) < Math.abs(Math.log(best[0]) - target))
                best = p;
        picked.add(best[1]);
    }
    return [...picked].sort((a, b) => a - b);
}
/**
 * One chart, or null when there is nothing to draw. The baseline is drawn only when its checkpoints are
 * the candidate's (otherwise the case definition changed and the case is "new").
 */
function mermaidChart(title, candidate, baseline) {
    const steps = candidate.steps;
    if (steps.length === 0 || candidate.median.every((v) => v === null))
        return null;
    const base = baseline && sameSteps(baseline.steps, steps) ? baseline : null;
    const sides = base ? [base, candidate] : [candidate];
    // y range: whole decades around every finite positive value, at most MAX_DECADES deep.
    let lo = Infinity;
    let hi = -Infinity;
    for (const c of sides)
        for (const series of [c.low, c.median, c.high])
            for (const v of series)
                if (typeof v === "number" && v > 0 && Number.isFinite(v)) {
                    lo = Math.min(lo, Math.log10(v));
                    hi = Math.max(hi, Math.log10(v));
                }
    if (!Number.isFinite(lo))
        return null;
    let top = Math.ceil(hi);
    let bottom = Math.floor(lo);
    if (top === bottom)
        top = bottom + 1;
    bottom = Math.max(bottom, top - MAX_DECADES);
    const points = pickPoints(steps);
    const series = (values) => {
        let held = bottom;
        return points.map((i) => {
            const v = values[i];
            let y;
            if (v === null || v === undefined)
                y = held;
            else if (v === Infinity)
                y = top;
            else if (!(v > 0))
                y = bottom;
            else
                y = Math.min(top, Math.max(bottom, Math.log10(v)));
            held = y;
            return String(Number(y.toFixed(2)));
        });
    };
    const lines = [];
    const palette = [];
    for (const [c, spread, median] of base
        ? [
            [base, BASELINE_SPREAD, BASELINE_MEDIAN],
            [candidate, CANDIDATE_SPREAD, CANDIDATE_MEDIAN],
        ]
        : [[candidate, CANDIDATE_SPREAD, CANDIDATE_MEDIAN]]) {
        lines.push(`  line [${series(c.high).join(", ")}]`, `  line [${series(c.low).join(", ")}]`);
        lines.push(`  line [${series(c.median).join(", ")}]`);
        palette.push(spread, spread, median);
    }
    const init = { theme: "base", themeVariables: { xyChart: { plotColorPalette: palette.join(", ") } } };
    return [
        "```mermaid",
        `%%{init: ${JSON.stringify(init)}}%%`,
        "xychart-beta",
        `  title "${(0,report_escape/* mermaidText */.Hg)(title)}"`,
        `  x-axis "step (log-spaced checkpoints)" [${points.map((i) => `"${steps[i]}"`).join(", ")}]`,
        `  y-axis "log10 gap" ${bottom} --> ${top}`,
        ...lines,
        "```",
    ].join("\n");
}
function sameSteps(a, b) {
    return a.length === b.length && a.every((s, i) => s === b[i]);
}

// EXTERNAL MODULE: ./build/package/report/model.js
var model = __webpack_require__(6751);
;// CONCATENATED MODULE: ./build/package/report/markdown.js
/**
 * The verdict in Markdown, for a pull-request comment or a job summary: the gate's verdict and reasons,
 * a table of the cases that changed (case, verdict, drift with its interval, reference checks), charts of
 * the cases that drifted most, and the rest folded away. Every name and message from the documents is
 * escaped (escape.ts). The text always fits the target's limit: when the full report does not, the least
 * useful parts go first (the list of unchanged cases, the long tail of changed ones, charts) and the
 * report says so and where the full one is.
 */





/** GitHub's limit on a comment body, in characters. */
const COMMENT_LIMIT = 65_536;
/** GitHub's limit on one step's job summary, in bytes (1 MiB). */
const SUMMARY_LIMIT = 1_048_576;
/** Rows of changed cases in the main table; the rest are folded below it. */
const MAIN_ROWS = 25;
const REASONS = 10;
/** Renders the report for `options.target`, within its limit. */
function renderMarkdown(input, options) {
    const comment = options.target === "comment";
    const limit = options.limit ?? (comment ? COMMENT_LIMIT : SUMMARY_LIMIT);
    const size = comment ? (s) => s.length : (s) => Buffer.byteLength(s, "utf8");
    const cases = input.verdict.cases ?? [];
    const full = {
        reasons: REASONS,
        mainRows: MAIN_ROWS,
        moreRows: cases.length,
        otherRows: cases.length,
        charts: options.charts ?? (comment ? 3 : 8),
    };
    // Give things up in order of least use until the text fits.
    const steps = [
        (d) => ({ ...d, otherRows: 0 }),
        (d) => ({ ...d, moreRows: 0 }),
        (d) => ({ ...d, charts: Math.min(d.charts, 1) }),
        (d) => ({ ...d, charts: 0 }),
    ];
    let detail = full;
    let text = render(input, detail, options, false);
    for (const step of steps) {
        if (size(text) <= limit)
            return text;
        detail = step(detail);
        text = render(input, detail, options, true);
    }
    while (size(text) > limit && (detail.mainRows > 0 || detail.reasons > 1)) {
        detail =
            detail.mainRows > 0
                ? { ...detail, mainRows: Math.floor(detail.mainRows / 2) }
                : { ...detail, reasons: Math.floor(detail.reasons / 2) };
        text = render(input, detail, options, true);
    }
    if (size(text) > limit) {
        // Only a pathological document gets here (thousands of huge reasons): cut, and say so.
        const note = "\n\n_(cut to fit GitHub's size limit; see the full report)_\n";
        let cut = text.slice(0, Math.max(0, limit - note.length - 16));
        while (size(cut + note) > limit)
            cut = cut.slice(0, Math.floor(cut.length * 0.9));
        text = cut + note;
    }
    return text;
}
/**
 * The hidden first line of the comment that gradgate updates in place: one per workflow and key. The
 * identity is hashed into hex by the caller, so nothing from the outside appears in the marker.
 */
function commentMarker(identity) {
    if (!/^[0-9a-f]{8,64}$/.test(identity))
        throw new Error(`comment marker identity must be hex, got ${identity}`);
    return `<!-- gradgate-report ${identity} -->`;
}
function render(input, detail, options, shortened) {
    const v = input.verdict;
    const comment = options.target === "comment";
    const out = [];
    if (comment && options.marker)
        out.push(options.marker);
    out.push(headline(v), "", countsLine(v));
    for (const note of input.notes ?? [])
        out.push("", `> ${(0,report_escape/* mdText */.bC)(note, 600)}`);
    if (shortened) {
        out.push("", `> This report is shortened to fit GitHub's size limit for ${comment ? "comments" : "job summaries"}; ` +
            `the full report is in the workflow run's artifact${input.links?.artifact ? ` ${(0,report_escape/* mdCode */.xs)(input.links.artifact)}` : ""}.`);
    }
    const reasons = v.gate?.reasons ?? [];
    if (v.gate?.verdict !== "pass" && reasons.length > 0 && detail.reasons > 0) {
        out.push("", "**Why it failed**", "");
        for (const r of reasons.slice(0, detail.reasons))
            out.push(`- ${(0,report_escape/* mdText */.bC)(r.message, 400)}`);
        if (reasons.length > detail.reasons)
            out.push(`- … and ${reasons.length - detail.reasons} more`);
    }
    const gateChecks = (0,model/* checkTally */.tL)(v.gate?.checks);
    if (gateChecks.pass + gateChecks.fail + gateChecks.skipped > 0) {
        out.push("", `**Suite reference checks:** ${gateChecks.pass} passed, ${gateChecks.fail} failed, ${gateChecks.skipped} skipped`);
        for (const c of gateChecks.failed.slice(0, 10))
            out.push(`- ❌ ${(0,report_escape/* mdCode */.xs)(c.id, 60)}: ${(0,report_escape/* mdText */.bC)(c.summary, 300)}`);
    }
    const ordered = (0,model/* orderCases */.o$)(v.cases ?? []);
    const changed = ordered.filter(model/* isChanged */.Hq);
    const others = ordered.filter((c) => !(0,model/* isChanged */.Hq)(c));
    out.push("");
    if (changed.length === 0) {
        out.push(`Every case is unchanged or equivalent to its baseline (${(0,format/* plural */.LS)(ordered.length, "case")}).`);
    }
    else {
        const main = changed.slice(0, detail.mainRows);
        if (main.length > 0)
            out.push(...table(main));
        const rest = changed.slice(main.length);
        if (rest.length > 0) {
            if (detail.moreRows > 0) {
                out.push(...folded(`${(0,format/* plural */.LS)(rest.length, "more changed case")}`, table(rest.slice(0, detail.moreRows)), rest.length - detail.moreRows));
            }
            else
                out.push("", `_… and ${(0,format/* plural */.LS)(rest.length, "more changed case")}, listed in the full report._`);
        }
    }
    const charted = (0,model/* chartCases */.iA)(input, detail.charts);
    const charts = [];
    let drawn = 0;
    for (const c of charted) {
        const { candidate, baseline } = (0,model/* curvesFor */.ek)(input, c.id);
        const chart = candidate ? mermaidChart(c.id, candidate, baseline) : null;
        if (chart === null)
            continue;
        const lead = (0,model/* leadDrift */.mF)(c);
        charts.push("", `${(0,report_escape/* mdCode */.xs)(c.id)} — ${(0,report_escape/* mdText */.bC)(c.verdict, 20)}${lead ? `, ${(0,report_escape/* mdText */.bC)(`${(0,format/* metricLabel */.B)(lead)} ${(0,format/* driftText */.LU)(lead)}`)}` : ""}`, "", chart);
        drawn++;
    }
    if (drawn > 0) {
        const title = drawn === 1
            ? "Convergence of the case that drifted most"
            : `Convergence of the ${drawn} cases that drifted most`;
        out.push("", `<details${comment ? "" : " open"}>`, `<summary>${title}</summary>`, "", MERMAID_CAPTION, ...charts, "", "</details>");
    }
    if (others.length > 0 && changed.length > 0) {
        if (detail.otherRows > 0) {
            out.push(...folded(`${(0,format/* plural */.LS)(others.length, "case")} unchanged or equivalent`, table(others.slice(0, detail.otherRows)), others.length - detail.otherRows));
        }
    }
    else if (others.length > 0 && detail.otherRows > 0) {
        out.push(...folded(`All ${(0,format/* plural */.LS)(others.length, "case")}`, table(others.slice(0, detail.otherRows)), others.length - detail.otherRows));
    }
    out.push("", footer(v, input.links));
    return out.join("\n") + "\n";
}
function headline(v) {
    const pass = v.gate?.verdict === "pass";
    return pass ? "### ✅ Convergence gate passed" : "### ❌ Convergence gate failed";
}
function countsLine(v) {
    const counts = (v.counts ?? {});
    const parts = [];
    let total = 0;
    for (const verdict of types/* CASE_VERDICTS */.SE) {
        const n = typeof counts[verdict] === "number" ? counts[verdict] : 0;
        total += n;
        if (n === 0)
            continue;
        const text = `${n} ${verdict}`;
        parts.push(verdict === "regressed" || verdict === "missing" ? `**${text}**` : text);
    }
    return `${parts.join(" · ") || "no cases"} — ${(0,format/* plural */.LS)(total, "case")} compared with the baseline`;
}
const HEADER = [
    "| Case | Verdict | Drift (candidate ÷ baseline) | Reference checks |",
    "| --- | --- | --- | --- |",
];
function table(cases) {
    return ["", ...HEADER, ...cases.map(row)];
}
function row(c) {
    const mark = format/* VERDICT_MARK */.s0[c.verdict] ?? "";
    return `| ${(0,report_escape/* mdCode */.xs)(c.id)} | ${mark} ${(0,report_escape/* mdText */.bC)(c.verdict, 20)} | ${driftCell(c)} | ${checksCell(c)} |`;
}
function driftCell(c) {
    const parts = [];
    const lead = (0,model/* leadDrift */.mF)(c);
    if (c.verdict === "new" || c.verdict === "missing" || lead === null) {
        const reason = c.reasons?.[0]?.message;
        if (reason)
            parts.push((0,report_escape/* mdText */.bC)(reason, 140));
    }
    else {
        parts.push((0,report_escape/* mdText */.bC)(`${(0,format/* metricLabel */.B)(lead)} ${(0,format/* driftText */.LU)(lead)}`, 120));
        // The p-value behind the status: beyond the margin (adjusted) or within it (equivalence).
        if ((lead.status === "regressed" || lead.status === "improved") &&
            typeof lead.adjustedPValue === "number") {
            parts.push(`adj. p ${(0,report_escape/* mdText */.bC)((0,format/* pValue */.sp)(lead.adjustedPValue))}`);
        }
        else if (lead.status === "equivalent" && typeof lead.equivalencePValue === "number") {
            parts.push(`equivalence p ${(0,report_escape/* mdText */.bC)((0,format/* pValue */.sp)(lead.equivalencePValue))}`);
        }
    }
    const diverged = (c.diverged ?? []).length;
    if (diverged > 0)
        parts.push(`**${(0,format/* plural */.LS)(diverged, "seed")} newly diverged**`);
    const recovered = (c.recovered ?? []).length;
    if (recovered > 0)
        parts.push(`${(0,format/* plural */.LS)(recovered, "seed")} no longer diverge`);
    return parts.join("; ") || "—";
}
function checksCell(c) {
    const t = (0,model/* checkTally */.tL)(c.checks);
    if (t.pass + t.fail + t.skipped === 0)
        return "—";
    if (t.fail === 0)
        return `✅ ${t.pass} passed${t.skipped ? `, ${t.skipped} skipped` : ""}`;
    const names = t.failed.slice(0, 3).map((x) => (0,report_escape/* mdCode */.xs)(x.id, 40));
    return `❌ ${t.fail} of ${t.pass + t.fail} failed: ${names.join(", ")}${t.failed.length > 3 ? ", …" : ""}`;
}
function folded(title, body, left) {
    return [
        "",
        "<details>",
        `<summary>${title}</summary>`,
        ...body,
        ...(left > 0 ? ["", `_… and ${left} more, listed in the full report._`] : []),
        "",
        "</details>",
    ];
}
function footer(v, links) {
    const p = v.policy;
    const parts = [];
    if (p && typeof p === "object") {
        const margin = p.margin ?? {};
        parts.push(`margins ×${(0,format/* num */.bu)(margin.stepsTo)} steps, ×${(0,format/* num */.bu)(margin.finalGap)} final gap, ×${(0,format/* num */.bu)(margin.evaluations)} evaluations; ` +
            `alpha ${(0,format/* num */.bu)(p.alpha)}${p.correction ? `, ${(0,report_escape/* mdText */.bC)(p.correction, 30)} correction` : ""}${p.strict ? ", strict" : ""}`);
    }
    const t = v.trajectory;
    if (t && typeof t === "object") {
        parts.push(`first iterates: ${(0,format/* num */.bu)(t.identical)} identical, ${(0,format/* num */.bu)(t["float-noise"])} float noise, ${(0,format/* num */.bu)(t.changed)} changed`);
    }
    if (v.rerun && Array.isArray(v.rerun.rerun))
        parts.push(`${(0,format/* plural */.LS)(v.rerun.rerun.length, "case")} re-run with extra seeds`);
    const tool = v.tool && typeof v.tool === "object"
        ? `${(0,report_escape/* mdText */.bC)(v.tool.name, 30)} ${(0,report_escape/* mdText */.bC)(v.tool.version, 30)}`
        : "gradgate";
    parts.push(tool);
    const run = safeUrl(links?.run);
    if (run) {
        const artifact = links?.artifact ? ` (full report: artifact ${(0,report_escape/* mdCode */.xs)(links.artifact, 60)})` : "";
        parts.push(`[workflow run](${run})${artifact}`);
    }
    return `<sub>${parts.join(" · ")}</sub>`;
}
/** An http(s) URL that cannot break out of a Markdown link, or null. */
function safeUrl(url) {
    if (!url || !/^https?:\/\/[A-Za-z0-9.-]+(:\d+)?(\/[A-Za-z0-9._~!$&'*+,;=:@%/-]*)?$/.test(url))
        return null;
    return url;
}


/***/ }),

/***/ 6751:
/***/ ((__unused_webpack___webpack_module__, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   Hq: () => (/* binding */ isChanged),
/* harmony export */   ek: () => (/* binding */ curvesFor),
/* harmony export */   iA: () => (/* binding */ chartCases),
/* harmony export */   mF: () => (/* binding */ leadDrift),
/* harmony export */   o$: () => (/* binding */ orderCases),
/* harmony export */   tL: () => (/* binding */ checkTally)
/* harmony export */ });
/* unused harmony exports verdictRank, driftScore, curveOf */
/* harmony import */ var _compare_types_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(5286);
/**
 * What every report shows, worked out once from the verdict document: the order cases are listed in
 * (worst news first), the drift that stands for a case, how far a case moved, and the convergence curves
 * of each side. Pure functions of plain data.
 */

const STATUS_RANK = {
    regressed: 0,
    improved: 1,
    inconclusive: 2,
    equivalent: 3,
    unchanged: 4,
    untested: 5,
};
/** Position of a verdict in CASE_VERDICTS (worst first); unknown verdicts go last. */
function verdictRank(v) {
    const i = _compare_types_js__WEBPACK_IMPORTED_MODULE_0__/* .CASE_VERDICTS */ .SE.indexOf(v);
    return i < 0 ? _compare_types_js__WEBPACK_IMPORTED_MODULE_0__/* .CASE_VERDICTS */ .SE.length : i;
}
function lnRatio(d) {
    return typeof d.ratio === "number" && d.ratio > 0 ? Math.abs(Math.log(d.ratio)) : 0;
}
/**
 * The drift that stands for a case in one table cell: the comparison's headline when it gives one, else
 * among the gating metrics the one with the most telling status (regressed, improved, inconclusive,
 * equivalent, unchanged), then the largest move.
 */
function leadDrift(c) {
    // The comparison names the figure to lead with (with its bootstrap interval) for changed cases.
    const h = c.headline;
    const named = h ? (c.drift ?? []).find((d) => d.metric === h.metric) : undefined;
    if (h && named)
        return {
            ...named,
            ratio: h.ratio,
            bound: h.bound,
            interval: h.interval ?? named.interval,
            status: h.status,
        };
    const pool = (c.drift ?? []).filter((d) => d.gating);
    const list = pool.length > 0 ? pool : (c.drift ?? []);
    let best = null;
    for (const d of list) {
        if (best === null)
            best = d;
        else {
            const r = (STATUS_RANK[d.status] ?? 9) - (STATUS_RANK[best.status] ?? 9);
            if (r < 0 || (r === 0 && lnRatio(d) > lnRatio(best)))
                best = d;
        }
    }
    return best;
}
/** How far a case moved: the largest |ln ratio| over its gating metrics; ∞ when a seed newly diverged. */
function driftScore(c) {
    if ((c.diverged ?? []).length > 0)
        return Infinity;
    let score = 0;
    for (const d of c.drift ?? [])
        if (d.gating)
            score = Math.max(score, lnRatio(d));
    return score;
}
/** Cases worst news first: by verdict (CASE_VERDICTS order), then by how far they moved, then by id. */
function orderCases(cases) {
    return [...cases].sort((a, b) => verdictRank(a.verdict) - verdictRank(b.verdict) ||
        driftScore(b) - driftScore(a) ||
        (a.id < b.id ? -1 : a.id > b.id ? 1 : 0));
}
/** True for the verdicts that need a reader's attention (everything but unchanged and equivalent). */
function isChanged(c) {
    return c.verdict !== "unchanged" && c.verdict !== "equivalent";
}
/** Counts of reference checks by status, and the ones that failed. */
function checkTally(checks) {
    const list = checks ?? [];
    const failed = list.filter((c) => c.status === "fail");
    return {
        pass: list.filter((c) => c.status === "pass").length,
        fail: failed.length,
        skipped: list.filter((c) => c.status === "skipped").length,
        failed,
    };
}
/**
 * The cases to draw, most drifted first: cases with candidate runs whose verdict is not unchanged, cases
 * that fail the gate before the others, then by drift score.
 */
function chartCases(input, limit) {
    if (limit <= 0 || !input.candidate)
        return [];
    const have = new Set(input.candidate.map((c) => c.case.id));
    return [...input.verdict.cases]
        .filter((c) => c.verdict !== "unchanged" && have.has(c.id))
        .sort((a, b) => Number(b.failsGate) - Number(a.failsGate) ||
        driftScore(b) - driftScore(a) ||
        verdictRank(a.verdict) - verdictRank(b.verdict) ||
        (a.id < b.id ? -1 : a.id > b.id ? 1 : 0))
        .slice(0, limit);
}
/**
 * The convergence curve of one side: per checkpoint, the median gap over the seeds and the smallest and
 * largest. A run that stopped at its target keeps its last gap (it is at least that close); a run that
 * diverged counts as +∞ from then on (so the median shows divergence once half the seeds diverged);
 * a run cut short by an error or the clock contributes nothing past its end.
 */
function curveOf(side) {
    const steps = side.case.checkpoints ?? [];
    const median = [];
    const low = [];
    const high = [];
    const last = side.runs.map(() => null);
    for (let k = 0; k < steps.length; k++) {
        const values = [];
        side.runs.forEach((run, r) => {
            const v = run.trace?.[k];
            if (typeof v === "number") {
                last[r] = v;
                values.push(v);
            }
            else if (run.stop === "diverged")
                values.push(Infinity);
            else if (run.stop === "target" && last[r] !== null)
                values.push(last[r]);
        });
        values.sort((a, b) => a - b);
        const n = values.length;
        median.push(n === 0 ? null : n % 2 ? values[n >> 1] : (values[n / 2 - 1] + values[n / 2]) / 2);
        low.push(n === 0 ? null : values[0]);
        high.push(n === 0 ? null : values[n - 1]);
    }
    return { steps, median, low, high, seeds: side.runs.length };
}
/** Both sides' curves of a case, when the runs are at hand. */
function curvesFor(input, id) {
    const find = (side) => side?.find((c) => c.case.id === id);
    const cand = find(input.candidate);
    const base = find(input.baseline);
    return { candidate: cand ? curveOf(cand) : null, baseline: base ? curveOf(base) : null };
}


/***/ }),

/***/ 3494:
/***/ ((__unused_webpack___webpack_module__, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   P: () => (/* binding */ parseVerdict)
/* harmony export */ });
/* harmony import */ var _core_errors_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(4552);
/* harmony import */ var _compare_types_js__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(5286);
/**
 * A verdict document read back from its JSON text (the file `gradgate compare --json` wrote, or an
 * artifact of another job, which may be forged): parsed, and checked for the fields the reports rely on,
 * with messages naming the file, the field and the bad value. Pure: the caller reads the file.
 */


function parseVerdict(text, file) {
    let data;
    try {
        data = JSON.parse(text);
    }
    catch (err) {
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`verdict ${file} is not valid JSON (${err.message})`);
    }
    const d = (data ?? {});
    const where = `verdict ${file}`;
    if (d.format !== _compare_types_js__WEBPACK_IMPORTED_MODULE_1__/* .VERDICT_FORMAT */ .KC) {
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`${where}: format must be "${_compare_types_js__WEBPACK_IMPORTED_MODULE_1__/* .VERDICT_FORMAT */ .KC}", got ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .quote */ .h)(d.format)}; pass the file gradgate compare --json wrote`);
    }
    if (d.version !== _compare_types_js__WEBPACK_IMPORTED_MODULE_1__/* .VERDICT_VERSION */ .Hv)
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`${where}: version must be ${_compare_types_js__WEBPACK_IMPORTED_MODULE_1__/* .VERDICT_VERSION */ .Hv}, got ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .quote */ .h)(d.version)}`);
    const gate = (d.gate ?? {});
    if (gate.verdict !== "pass" && gate.verdict !== "fail") {
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`${where}: gate.verdict must be "pass" or "fail", got ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .quote */ .h)(gate.verdict)}`);
    }
    if (!Array.isArray(gate.reasons))
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`${where}: gate.reasons must be a list, got ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .quote */ .h)(gate.reasons)}`);
    const counts = (d.counts ?? null);
    if (counts === null ||
        typeof counts !== "object" ||
        !_compare_types_js__WEBPACK_IMPORTED_MODULE_1__/* .CASE_VERDICTS */ .SE.every((v) => Number.isInteger(counts[v]))) {
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`${where}: counts must give a whole number for each of ${_compare_types_js__WEBPACK_IMPORTED_MODULE_1__/* .CASE_VERDICTS */ .SE.join(", ")}`);
    }
    if (!Array.isArray(d.cases))
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`${where}: cases must be a list, got ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .quote */ .h)(d.cases)}`);
    d.cases.forEach((c, i) => {
        const x = (c ?? {});
        if (typeof x.id !== "string")
            throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`${where}: cases[${i}].id must be a string, got ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .quote */ .h)(x.id)}`);
        if (!_compare_types_js__WEBPACK_IMPORTED_MODULE_1__/* .CASE_VERDICTS */ .SE.includes(x.verdict)) {
            throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`${where}: cases[${i}].verdict must be one of ${_compare_types_js__WEBPACK_IMPORTED_MODULE_1__/* .CASE_VERDICTS */ .SE.join(", ")}, got ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .quote */ .h)(x.verdict)}`);
        }
        if (typeof x.failsGate !== "boolean") {
            throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`${where}: cases[${i}].failsGate must be true or false, got ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .quote */ .h)(x.failsGate)}`);
        }
        for (const list of ["reasons", "drift", "checks", "diverged", "recovered"]) {
            if (!Array.isArray(x[list]))
                throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`${where}: cases[${i}].${list} must be a list, got ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .quote */ .h)(x[list])}`);
        }
    });
    return data;
}


/***/ }),

/***/ 568:
/***/ ((__unused_webpack___webpack_module__, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   LZ: () => (/* binding */ RESULTS_FORMAT),
/* harmony export */   kI: () => (/* binding */ RESULTS_VERSION),
/* harmony export */   rq: () => (/* binding */ buildResults)
/* harmony export */ });
/* unused harmony export currentEnvironment */
/* harmony import */ var _core_version_js__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(6063);
/* harmony import */ var _suite_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(5926);
/**
 * The results document: what a `run` produced, in a stable, canonical JSON form. Everything in it is a
 * function of the suite, the seeds and the optimizer code (wall time is deliberately absent), so two runs
 * of the same code give the same bytes.
 */


const RESULTS_FORMAT = "gradgate-results";
const RESULTS_VERSION = 1;
function currentEnvironment() {
    return { node: process.version, platform: process.platform, arch: process.arch };
}
function buildResults(suite, cases, environment = currentEnvironment(), shard) {
    return {
        format: RESULTS_FORMAT,
        version: RESULTS_VERSION,
        tool: { name: _core_version_js__WEBPACK_IMPORTED_MODULE_1__/* .TOOL_NAME */ .l, version: _core_version_js__WEBPACK_IMPORTED_MODULE_1__/* .TOOL_VERSION */ .w },
        suite: {
            seed: suite.seed,
            hash: (0,_suite_js__WEBPACK_IMPORTED_MODULE_0__/* .suiteHash */ .f)(suite),
            cases: suite.cases.length,
            runs: suite.cases.reduce((n, c) => n + c.seeds, 0),
        },
        environment,
        ...(shard ? { shard } : {}),
        cases,
    };
}


/***/ }),

/***/ 862:
/***/ ((__unused_webpack___webpack_module__, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   Ox: () => (/* binding */ mergeShards),
/* harmony export */   l6: () => (/* binding */ shardItems),
/* harmony export */   uK: () => (/* binding */ parseShard)
/* harmony export */ });
/* unused harmony export MAX_SHARDS */
/* harmony import */ var _core_errors_js__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(4552);
/* harmony import */ var _core_json_js__WEBPACK_IMPORTED_MODULE_2__ = __webpack_require__(625);
/* harmony import */ var _results_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(568);
/**
 * Shards: one suite split across CI matrix jobs, and the merge that puts the pieces back together.
 *
 * The split is over the flat run list (item = the run's position in suite order: case by case, seed by
 * seed; see batch.ts) and deals the items round-robin: shard i of n (1-based) runs the items whose
 * position p satisfies p mod n = i − 1. Whole cases are deliberately NOT kept together: the runs of one
 * case cost about the same, while cases differ in cost by orders of magnitude (a 2-D Rosenbrock against a
 * two-layer network), so dealing runs evenly gives every shard about 1/n of every case and therefore about
 * 1/n of the time, whatever the suite looks like. The price is that a shard's results hold part of most
 * cases; they are meant for `merge`, never for `compare` on their own.
 *
 * The merge uses the same rule backwards: the k-th run in shard i's results is item (i − 1) + k·n, so every
 * run gets its place back and the merged document is byte for byte the document a single machine writes.
 * Anything that does not fit (another suite, another tool version, another machine type, a shard given
 * twice or missing, a run missing or repeated) is refused with a message that names the file.
 */



/** Largest shard count accepted (a matrix job per shard; GitHub allows 256 jobs per matrix). */
const MAX_SHARDS = 256;
/**
 * Parses "i/n" (1 ≤ i ≤ n ≤ 256). `where` names the option or input for the message, e.g. "--shard".
 */
function parseShard(text, where) {
    const m = /^\s*(\d+)\s*\/\s*(\d+)\s*$/.exec(text);
    const index = m ? Number(m[1]) : NaN;
    const count = m ? Number(m[2]) : NaN;
    if (!m || index < 1 || count < 1 || index > count || count > MAX_SHARDS) {
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .d(`${where} must be "i/n" with 1 ≤ i ≤ n ≤ ${MAX_SHARDS} (shard i of n, e.g. "2/4"), got ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_1__/* .quote */ .h)(text)}`);
    }
    return { index, count };
}
/** The items (positions in the flat run list of `total` runs) that shard `shard` runs, ascending. */
function shardItems(total, shard) {
    const items = [];
    for (let p = shard.index - 1; p < total; p += shard.count)
        items.push(p);
    return items;
}
/**
 * Merges the results of shards 1…n of one suite into the results document of the whole suite. Throws an
 * InputError naming the file when the shards do not fit together.
 */
function mergeShards(parts) {
    if (parts.length === 0)
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .d("merge: no shard results given; pass the files written by run --shard");
    for (const { name, doc } of parts)
        checkShape(name, doc);
    const first = parts[0];
    const count = first.doc.shard.count;
    const bySlot = new Map();
    for (const part of parts) {
        const { index, count: c } = part.doc.shard;
        if (c !== count) {
            throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .d(`merge: ${part.name} is shard ${index}/${c} but ${first.name} is shard ${first.doc.shard.index}/${count}; ` +
                `merge the shards of one split only`);
        }
        const other = bySlot.get(index);
        if (other !== undefined) {
            throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .d(`merge: ${other.name} and ${part.name} are both shard ${index}/${count}; give each shard's results once`);
        }
        bySlot.set(index, part);
        sameField(first, part, "suite hash", (d) => d.suite.hash, "every shard must run the same suite config");
        sameField(first, part, "suite", (d) => (0,_core_json_js__WEBPACK_IMPORTED_MODULE_2__/* .canonicalJson */ .d)(d.suite), "every shard must run the same suite config");
        sameField(first, part, "tool", (d) => `${d.tool.name} ${d.tool.version}`, "use one gradgate version for every shard");
        sameField(first, part, "environment", (d) => `${d.environment.node} ${d.environment.platform} ${d.environment.arch}`, "run every shard on the same runner image and Node.js version");
    }
    const missing = [];
    for (let i = 1; i <= count; i++)
        if (!bySlot.has(i))
            missing.push(i);
    if (missing.length > 0) {
        const have = [...bySlot.keys()].sort((a, b) => a - b).join(", ");
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .d(`merge: shard${missing.length > 1 ? "s" : ""} ${missing.map((i) => `${i}/${count}`).join(", ")} ` +
            `${missing.length > 1 ? "are" : "is"} missing (have ${have}); pass the results of every shard`);
    }
    // Give every run its place in the flat run list back, and check each case's spec is the same everywhere.
    const total = first.doc.suite.runs;
    const slots = new Array(total);
    const specs = new Map();
    for (let s = 1; s <= count; s++) {
        const { name, doc } = bySlot.get(s);
        const expected = shardItems(total, { index: s, count }).length;
        const runs = doc.cases.reduce((n, c) => n + c.runs.length, 0);
        if (runs !== expected) {
            throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .d(`merge: ${name} (shard ${s}/${count}) holds ${runs} runs, expected ${expected} for a suite of ${total} runs; ` +
                `it is incomplete or was not written by run --shard ${s}/${count}`);
        }
        let k = 0;
        for (const { case: spec, runs: caseRuns } of doc.cases) {
            const text = (0,_core_json_js__WEBPACK_IMPORTED_MODULE_2__/* .canonicalJson */ .d)(spec);
            const seen = specs.get(spec.id);
            if (seen === undefined)
                specs.set(spec.id, { text, from: name });
            else if (seen.text !== text) {
                throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .d(`merge: case ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_1__/* .quote */ .h)(spec.id)} is defined differently in ${seen.from} and ${name}; ` +
                    `every shard must run the same suite config`);
            }
            for (const run of caseRuns) {
                slots[s - 1 + k * count] = { spec, run, from: name };
                k++;
            }
        }
    }
    // Walk the flat list: each case must be one block with seeds 0 … seeds−1 in order.
    const cases = [];
    let p = 0;
    while (p < total) {
        const head = slots[p];
        const spec = head.spec;
        const runs = [];
        for (let seed = 0; seed < spec.seeds; seed++, p++) {
            const slot = slots[p];
            if (slot === undefined || slot.spec.id !== spec.id || slot.run.seed !== seed) {
                const found = slot === undefined ? "nothing" : `case ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_1__/* .quote */ .h)(slot.spec.id)} seed ${slot.run.seed} (${slot.from})`;
                throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .d(`merge: run ${p} of the suite should be case ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_1__/* .quote */ .h)(spec.id)} seed ${seed}, found ${found}; ` +
                    `the shards do not come from one split of one suite`);
            }
            runs.push(slot.run);
        }
        cases.push({ case: spec, runs });
    }
    if (cases.length !== first.doc.suite.cases) {
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .d(`merge: the shards hold ${cases.length} cases but the suite has ${first.doc.suite.cases}; ` +
            `the shards do not come from one split of one suite`);
    }
    return {
        format: _results_js__WEBPACK_IMPORTED_MODULE_0__/* .RESULTS_FORMAT */ .LZ,
        version: _results_js__WEBPACK_IMPORTED_MODULE_0__/* .RESULTS_VERSION */ .kI,
        tool: first.doc.tool,
        suite: first.doc.suite,
        environment: first.doc.environment,
        cases,
    };
}
function checkShape(name, doc) {
    const d = doc;
    if (d === null || typeof d !== "object" || d.format !== _results_js__WEBPACK_IMPORTED_MODULE_0__/* .RESULTS_FORMAT */ .LZ) {
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .d(`merge: ${name} is not a gradgate results document (format ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_1__/* .quote */ .h)(d?.format)}, expected "${_results_js__WEBPACK_IMPORTED_MODULE_0__/* .RESULTS_FORMAT */ .LZ}")`);
    }
    if (d.version !== _results_js__WEBPACK_IMPORTED_MODULE_0__/* .RESULTS_VERSION */ .kI) {
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .d(`merge: ${name} has results version ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_1__/* .quote */ .h)(d.version)}; this gradgate reads ${_results_js__WEBPACK_IMPORTED_MODULE_0__/* .RESULTS_VERSION */ .kI}`);
    }
    const shard = d.shard;
    if (shard === undefined) {
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .d(`merge: ${name} has no "shard" field: it holds a whole suite; merge takes the files of run --shard i/n`);
    }
    const { index, count } = shard;
    if (!Number.isInteger(index) ||
        !Number.isInteger(count) ||
        index < 1 ||
        index > count ||
        count > MAX_SHARDS) {
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .d(`merge: ${name}: shard must be {index, count} with 1 ≤ index ≤ count, got ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_1__/* .quote */ .h)(shard)}`);
    }
    const suite = d.suite;
    if (!suite ||
        !Number.isInteger(suite.runs) ||
        !Number.isInteger(suite.cases) ||
        typeof suite.hash !== "string") {
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .d(`merge: ${name}: suite must have hash, cases and runs, got ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_1__/* .quote */ .h)(suite)}`);
    }
    if (!Array.isArray(d.cases))
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .d(`merge: ${name}: cases must be a list, got ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_1__/* .quote */ .h)(d.cases)}`);
    d.cases.forEach((c, i) => {
        const cr = c;
        if (!cr ||
            typeof cr.case?.id !== "string" ||
            !Number.isInteger(cr.case.seeds) ||
            !Array.isArray(cr.runs)) {
            throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .d(`merge: ${name}: cases[${i}] must have case.id, case.seeds and runs`);
        }
    });
}
function sameField(a, b, what, get, fix) {
    const va = get(a.doc);
    const vb = get(b.doc);
    if (va !== vb) {
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .d(`merge: ${what} differs: ${a.name} has ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_1__/* .quote */ .h)(va)}, ${b.name} has ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_1__/* .quote */ .h)(vb)}; ${fix}`);
    }
}


/***/ }),

/***/ 5926:
/***/ ((__unused_webpack___webpack_module__, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   Z: () => (/* binding */ resolveSuite),
/* harmony export */   f: () => (/* binding */ suiteHash)
/* harmony export */ });
/* harmony import */ var node_crypto__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(7598);
/* harmony import */ var _core_json_js__WEBPACK_IMPORTED_MODULE_7__ = __webpack_require__(625);
/* harmony import */ var _core_errors_js__WEBPACK_IMPORTED_MODULE_5__ = __webpack_require__(4552);
/* harmony import */ var _problems_index_js__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(5006);
/* harmony import */ var _optimizers_index_js__WEBPACK_IMPORTED_MODULE_2__ = __webpack_require__(6372);
/* harmony import */ var _core_rng_js__WEBPACK_IMPORTED_MODULE_3__ = __webpack_require__(2906);
/* harmony import */ var _resolve_js__WEBPACK_IMPORTED_MODULE_4__ = __webpack_require__(5966);
/* harmony import */ var _recorder_js__WEBPACK_IMPORTED_MODULE_6__ = __webpack_require__(8022);
/**
 * Expands a validated config into the suite's cases: optimizers × hyperparameter sets × problems, in a
 * stable order (config order of optimizers, then sets in the order written with "default" first, then
 * problems in config order). Resolves problem parameters and hyperparameters with their defaults, so the
 * results say exactly what ran.
 */








function resolveSuite(config, file, options = {}) {
    const where = `config ${file}`;
    const problems = config.problems.map((p, i) => {
        const pw = `${where}: problems[${i}]`;
        const def = getProblemOrThrow(p.use, `${pw}.use`);
        const params = (0,_problems_index_js__WEBPACK_IMPORTED_MODULE_1__/* .resolveProblemParams */ .wN)(def, p.params ?? {}, pw);
        // One throwaway instance tells the dimension and f*; problems cache their structure.
        const probe = (0,_problems_index_js__WEBPACK_IMPORTED_MODULE_1__/* .createProblem */ .Yx)(def.name, params, { noise: new _core_rng_js__WEBPACK_IMPORTED_MODULE_3__/* .Pcg32 */ ._8(0n, 0n) });
        const budget = { ...config.budget, ...(p.budget ?? {}) };
        return { config: p, def, params, key: (0,_problems_index_js__WEBPACK_IMPORTED_MODULE_1__/* .problemKey */ .ZL)(def, params), probe, budget };
    });
    const seenKeys = new Map();
    problems.forEach((p, i) => {
        const prev = seenKeys.get(p.key);
        if (prev !== undefined) {
            throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_5__/* .InputError */ .d(`${where}: problems[${i}] repeats problems[${prev}] (${p.key}); give it different params`);
        }
        seenKeys.set(p.key, i);
    });
    const cases = [];
    config.optimizers.forEach((o, oi) => {
        const ow = `${where}: optimizers[${oi}]`;
        const use = (0,_resolve_js__WEBPACK_IMPORTED_MODULE_4__/* .canonicalUse */ .sx)(o.use ?? o.name);
        const isReference = use.startsWith("reference:");
        const factory = isReference ? (0,_resolve_js__WEBPACK_IMPORTED_MODULE_4__/* .referenceFactory */ .eW)(use, ow) : null;
        const sets = [["default", {}], ...Object.entries(o.sets ?? {})];
        for (const [setName, setHyper] of sets) {
            for (const p of problems) {
                if (p.config.optimizers && !p.config.optimizers.includes(o.name))
                    continue;
                const given = { ...(o.hyper ?? {}), ...setHyper, ...(p.config.hyper?.[o.name] ?? {}) };
                const hw = setName === "default" ? ow : `${ow}.sets.${setName}`;
                const hyper = factory
                    ? (0,_optimizers_index_js__WEBPACK_IMPORTED_MODULE_2__/* .resolveHyper */ .Vn)(factory, given, hw)
                    : (options.resolveForeignHyper?.(use, given, hw) ?? given);
                const fingerprintSteps = p.probe.dim <= config.fingerprint.maxDim ? Math.min(config.fingerprint.steps, p.budget.steps) : 0;
                cases.push({
                    id: `${o.name}/${setName}/${p.key}`,
                    optimizer: o.name,
                    use,
                    set: setName,
                    hyper: sortObject(hyper),
                    problem: p.def.name,
                    problemKey: p.key,
                    params: sortObject(p.params),
                    dim: p.probe.dim,
                    fStar: p.probe.fStar,
                    fStarKind: p.probe.fStarKind,
                    budget: p.budget,
                    stopAt: config.stopAt,
                    ladder: config.ladder,
                    blowUp: config.blowUp,
                    checkpoints: (0,_recorder_js__WEBPACK_IMPORTED_MODULE_6__/* .logCheckpoints */ .M)(p.budget.steps),
                    fingerprintSteps,
                    seeds: config.seeds,
                    measureEvery: p.def.measureEvery ?? 1,
                });
            }
        }
    });
    return { seed: config.seed, cases };
}
function getProblemOrThrow(name, where) {
    try {
        return (0,_problems_index_js__WEBPACK_IMPORTED_MODULE_1__/* .getProblem */ .Ai)(name);
    }
    catch {
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_5__/* .InputError */ .d(`${where} ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_5__/* .quote */ .h)(name)} is not a known problem (known: ${_problems_index_js__WEBPACK_IMPORTED_MODULE_1__/* .PROBLEMS */ .D3.map((p) => p.name).join(", ")})`);
    }
}
function sortObject(o) {
    return Object.fromEntries(Object.entries(o).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)));
}
/**
 * Hash of the suite definition: seed and every case's problem, parameters, budget, tolerances and
 * seeds, but not the hyperparameters or the optimizer code (those are what a comparison looks at).
 * Results with equal hashes are comparable run for run.
 */
function suiteHash(spec) {
    const definition = {
        seed: spec.seed,
        cases: spec.cases.map((c) => ({
            id: c.id,
            problemKey: c.problemKey,
            params: c.params,
            budget: c.budget,
            stopAt: c.stopAt,
            ladder: c.ladder,
            blowUp: c.blowUp,
            checkpoints: c.checkpoints,
            fingerprintSteps: c.fingerprintSteps,
            seeds: c.seeds,
            measureEvery: c.measureEvery,
        })),
    };
    return "sha256:" + (0,node_crypto__WEBPACK_IMPORTED_MODULE_0__.createHash)("sha256").update((0,_core_json_js__WEBPACK_IMPORTED_MODULE_7__/* .canonicalJson */ .d)(definition)).digest("hex");
}


/***/ })

};
