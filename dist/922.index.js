export const id = 922;
export const ids = [922];
export const modules = {

/***/ 922:
/***/ ((__unused_webpack___webpack_module__, __webpack_exports__, __webpack_require__) => {

// ESM COMPAT FLAG
__webpack_require__.r(__webpack_exports__);

// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  engineMain: () => (/* binding */ engineMain)
});

// EXTERNAL MODULE: external "node:fs"
var external_node_fs_ = __webpack_require__(3024);
// EXTERNAL MODULE: ./build/package/cli/host.js
var cli_host = __webpack_require__(3638);
// EXTERNAL MODULE: external "node:util"
var external_node_util_ = __webpack_require__(7975);
// EXTERNAL MODULE: ./build/package/core/errors.js
var core_errors = __webpack_require__(4552);
// EXTERNAL MODULE: ./build/package/core/version.js
var version = __webpack_require__(6063);
// EXTERNAL MODULE: ./build/package/problems/index.js + 22 modules
var problems = __webpack_require__(5006);
// EXTERNAL MODULE: ./build/package/core/rng.js
var core_rng = __webpack_require__(2906);
// EXTERNAL MODULE: ./build/package/optimizers/index.js + 8 modules
var optimizers = __webpack_require__(6372);
// EXTERNAL MODULE: external "node:os"
var external_node_os_ = __webpack_require__(8161);
// EXTERNAL MODULE: external "node:path"
var external_node_path_ = __webpack_require__(6760);
// EXTERNAL MODULE: ./build/package/core/json.js
var json = __webpack_require__(625);
// EXTERNAL MODULE: ./build/package/core/json-pointer.js
var json_pointer = __webpack_require__(2881);
// EXTERNAL MODULE: ./node_modules/ajv/dist/2020.js
var _2020 = __webpack_require__(2210);
// EXTERNAL MODULE: ./node_modules/yaml/dist/index.js
var dist = __webpack_require__(8815);
;// CONCATENATED MODULE: ./build/package/config/schema.js
/**
 * JSON Schema (draft 2020-12 subset that ajv understands) of a suite config. The single home of the
 * config defaults: ajv applies them (`useDefaults`), the editor schema in schema/ is generated from this
 * object (`npm run schema`), and the docs table is tested against it.
 */
const CONFIG_VERSION = 1;
const positiveInt = { type: "integer", minimum: 1 };
const budget = {
    type: "object",
    additionalProperties: false,
    description: "Limits of one run; a run stops at whichever comes first.",
    properties: {
        steps: { ...positiveInt, maximum: 100_000_000, description: "Optimizer steps (iterations)." },
        evaluations: {
            type: "integer",
            minimum: 0,
            description: "Loss-and-gradient evaluations; 0 = no limit beyond the steps.",
        },
        seconds: { type: "number", exclusiveMinimum: 0, description: "Wall-clock seconds per run." },
    },
};
const hyper = {
    type: "object",
    description: "Hyperparameters by name: numbers, booleans or strings.",
    additionalProperties: { type: ["number", "boolean", "string"] },
};
/**
 * How results are judged against baselines (see docs/decisions/0001-statistical-verdict.md). The single
 * home of the policy defaults; src/compare/policy.ts resolves a policy against this fragment.
 */
const policySchema = {
    type: "object",
    additionalProperties: false,
    default: {},
    description: "How results are judged against baselines (docs/decisions/0001-statistical-verdict.md).",
    properties: {
        metrics: {
            type: "array",
            uniqueItems: true,
            items: { type: "string", enum: ["stepsTo", "finalGap", "evaluations"] },
            default: ["stepsTo", "finalGap", "evaluations"],
            description: "Gating metrics: steps to reach each ladder rung, final gap, evaluations. The others are reported only.",
        },
        margin: {
            type: "object",
            additionalProperties: false,
            default: {},
            description: "Practical margins as ratios m > 1 (candidate / baseline): changes inside [1/m, m] are equivalent.",
            properties: {
                stepsTo: { type: "number", exclusiveMinimum: 1, default: 1.1 },
                finalGap: { type: "number", exclusiveMinimum: 1, default: 2 },
                evaluations: { type: "number", exclusiveMinimum: 1, default: 1.1 },
            },
        },
        alpha: {
            type: "number",
            exclusiveMinimum: 0,
            maximum: 0.5,
            default: 0.05,
            description: "Significance level of every decision (per look; split across looks when extra seeds are used).",
        },
        correction: {
            type: "string",
            enum: ["holm", "benjamini-hochberg", "none"],
            default: "holm",
            description: "Multiplicity correction across cases and metrics: Holm (1979) or Benjamini–Hochberg (1995).",
        },
        failOn: {
            type: "array",
            uniqueItems: true,
            items: { type: "string", enum: ["regressed", "missing", "inconclusive", "improved", "new"] },
            default: ["regressed", "missing"],
            description: "Case verdicts that fail the gate.",
        },
        strict: {
            type: "boolean",
            default: false,
            description: "Pure refactors: fail the gate on any case that is not unchanged or equivalent.",
        },
        bootstrap: {
            type: "object",
            additionalProperties: false,
            default: {},
            description: "Seeded bootstrap confidence intervals of the drift.",
            properties: {
                resamples: { type: "integer", minimum: 100, maximum: 100000, default: 1000 },
                seed: { type: "integer", minimum: 0, maximum: 4294967295, default: 1 },
            },
        },
        fingerprintTolerance: {
            type: "number",
            minimum: 0,
            exclusiveMaximum: 1,
            default: 1e-12,
            description: "Relative (norm-wise) difference of the first iterates still counted as float noise.",
        },
        gapFloor: {
            type: "number",
            minimum: 0,
            exclusiveMaximum: 1,
            default: 1e-10,
            description: "Final gaps below gapFloor × initial gap count as equal (relative): float noise near the optimum.",
        },
        extraSeeds: {
            type: "object",
            additionalProperties: false,
            default: {},
            description: "Re-run inconclusive cases with extra seeds (stored in the baselines) before deciding.",
            properties: {
                perCase: {
                    type: "integer",
                    minimum: 0,
                    maximum: 1000,
                    default: 25,
                    description: "Extra seeds per case, kept in the baselines; 0 turns re-runs off.",
                },
                maxRuns: {
                    type: "integer",
                    minimum: 0,
                    default: 2500,
                    description: "Extra runs per compare, at most.",
                },
            },
        },
    },
};
/**
 * A process adapter (`adapters.NAME`): an optimizer process spoken to over the subprocess protocol
 * (docs/adapters.md). The single home of its defaults.
 */
const processAdapterSchema = {
    type: "object",
    additionalProperties: false,
    required: ["command"],
    description: "An optimizer process reached through the subprocess protocol (docs/adapters.md).",
    properties: {
        command: {
            type: "array",
            minItems: 1,
            items: { type: "string", minLength: 1 },
            description: "Program and arguments, run without a shell, e.g. [python3, opt/serve.py].",
        },
        cwd: {
            type: "string",
            default: ".",
            description: "Working directory of the process, relative to the config file's directory.",
        },
        env: {
            type: "object",
            default: {},
            propertyNames: { pattern: "^[A-Za-z_][A-Za-z0-9_]*$" },
            additionalProperties: { type: "string" },
            description: "Extra environment variables with literal values. The process gets only these and PATH, HOME, LANG " +
                "and the like, never the harness's other variables (no tokens, no INPUT_*, no ACTIONS_*).",
        },
        maxRuns: {
            type: "integer",
            minimum: 1,
            maximum: 100000,
            default: 256,
            description: "Runs multiplexed in one process at once; 1 isolates every run.",
        },
        maxMessageBytes: {
            type: "integer",
            minimum: 1024,
            maximum: 1073741824,
            default: 67108864,
            description: "Longest protocol line accepted from the process, in bytes.",
        },
        timeouts: {
            type: "object",
            additionalProperties: false,
            default: {},
            description: "Seconds before the harness gives up.",
            properties: {
                start: {
                    type: "number",
                    exclusiveMinimum: 0,
                    default: 30,
                    description: "From launch to the ready message.",
                },
                message: {
                    type: "number",
                    exclusiveMinimum: 0,
                    default: 60,
                    description: "From orders to the report that answers them.",
                },
                run: {
                    type: "number",
                    exclusiveMinimum: 0,
                    default: 600,
                    description: "Whole run, checked at every report.",
                },
            },
        },
    },
};
/**
 * A scenario (`scenarios[i]`): extra cases that run every optimizer declaring what the scenario needs
 * (a capability, or the hyperparameters it sets) under a condition real regressions hid behind.
 */
const scenarioSchema = {
    type: "object",
    additionalProperties: false,
    required: ["name"],
    description: "Extra cases under a condition: a resume, a learning-rate change, hyperparameters, a problem.",
    properties: {
        name: {
            type: "string",
            pattern: "^[A-Za-z0-9][A-Za-z0-9_.-]*$",
            description: "Label; the cases are named optimizer/set@name/problem.",
        },
        resume: {
            type: "object",
            additionalProperties: false,
            required: ["at"],
            description: "Stop after step `at`, export the state, continue in a fresh instance; compared with the uninterrupted run.",
            properties: { at: { type: "integer", minimum: 1 } },
        },
        lrChange: {
            type: "object",
            additionalProperties: false,
            required: ["at"],
            description: "setLearningRate after step `at`: to `lr`, or to `factor` times the case's lr.",
            properties: {
                at: { type: "integer", minimum: 1 },
                lr: { type: "number", exclusiveMinimum: 0 },
                factor: { type: "number", exclusiveMinimum: 0 },
            },
        },
        hyper: {
            ...hyper,
            description: "Hyperparameters set for the scenario; only optimizers that declare them run it.",
        },
        problem: {
            type: "object",
            additionalProperties: false,
            required: ["use"],
            description: "Run on this problem instead of the suite's problems.",
            properties: {
                use: { type: "string" },
                params: { type: "object", additionalProperties: { type: "number" } },
                budget,
            },
        },
        problems: {
            type: "array",
            items: { type: "string" },
            description: "Only these of the suite's problems, by `use` (default: all).",
        },
        optimizers: {
            type: "array",
            items: { type: "string" },
            description: "Only these optimizers, by name (default: every one that declares what the scenario needs).",
        },
    },
};
/** Names an optimizer of the suite and, optionally, which of its cases a check applies to. */
const checkTarget = {
    optimizer: { type: "string", description: "The optimizer's name in `optimizers`." },
    problem: {
        type: "string",
        description: "A problem name (every instance of it) or a problem key as in case ids, e.g. quadratic(kappa=1000).",
    },
    set: { type: "string", description: "Only cases of this hyperparameter set (default: every set)." },
    gating: { type: "boolean", default: true, description: "Whether a failure of this check fails the gate." },
};
/**
 * Reference checks (`checks`): absolute checks against published values, judged beside the baseline
 * drift (docs/reference-checks.md). The single home of their defaults; src/reference/config.ts resolves
 * the section against this fragment.
 */
const checksSchema = {
    type: "object",
    additionalProperties: false,
    default: {},
    description: "Reference checks against published values (docs/reference-checks.md).",
    properties: {
        minimum: {
            type: "array",
            default: [],
            description: "Known minima: every matched case must end at f* or at a basin the problem declares.",
            items: {
                type: "object",
                additionalProperties: false,
                required: ["optimizer", "problem"],
                properties: {
                    ...checkTarget,
                    basin: {
                        type: "string",
                        default: "global",
                        description: '"global" (the problem\'s f*) or the name of a basin the problem declares (e.g. "local").',
                    },
                    tolerance: {
                        type: "object",
                        additionalProperties: false,
                        required: ["kind", "value"],
                        default: { kind: "absolute", value: 1e-6 },
                        description: "How close the final loss must come to the target: |f − target| ≤ value (absolute) or value·|target| (relative).",
                        properties: {
                            kind: { type: "string", enum: ["absolute", "relative"] },
                            value: { type: "number", exclusiveMinimum: 0 },
                        },
                    },
                    share: {
                        type: "number",
                        exclusiveMinimum: 0,
                        maximum: 1,
                        default: 1,
                        description: "Fraction of the seeds that must reach the target.",
                    },
                },
            },
        },
        rate: {
            type: "array",
            default: [],
            description: "Theoretical rates on quadratics: the fitted rate must match the spectral radius of the method's iteration.",
            items: {
                type: "object",
                additionalProperties: false,
                required: ["optimizer", "problem", "method"],
                properties: {
                    ...checkTarget,
                    method: { type: "string", enum: ["gradient-descent", "heavy-ball", "nesterov"] },
                    tuned: {
                        type: "boolean",
                        default: false,
                        description: "Run with the method's classical tuned step and momentum for the problem's μ and L instead of the case's.",
                    },
                    names: {
                        type: "object",
                        additionalProperties: false,
                        default: {},
                        description: "The optimizer's names for the step size and the momentum.",
                        properties: {
                            lr: { type: "string", default: "lr" },
                            momentum: { type: "string", default: "momentum" },
                        },
                    },
                    tolerance: {
                        type: "number",
                        exclusiveMinimum: 0,
                        exclusiveMaximum: 1,
                        default: 0.02,
                        description: "Relative tolerance on the convergence speed −ln ρ.",
                    },
                    steps: {
                        type: "integer",
                        minimum: 10,
                        maximum: 10000000,
                        default: 200000,
                        description: "Most steps the check's own run may take.",
                    },
                },
            },
        },
        stationary: {
            type: "array",
            default: [],
            description: "SGD's stationary variance on the noisy quadratic against its closed form ησ²/(λ(2 − ηλ)).",
            items: {
                type: "object",
                additionalProperties: false,
                required: ["optimizer", "problem"],
                properties: {
                    ...checkTarget,
                    names: {
                        type: "object",
                        additionalProperties: false,
                        default: {},
                        description: "The optimizer's name for the step size.",
                        properties: { lr: { type: "string", default: "lr" } },
                    },
                    precision: {
                        type: "number",
                        exclusiveMinimum: 0,
                        maximum: 0.5,
                        default: 0.01,
                        description: "Relative standard error of the time average to aim for (sets the run length).",
                    },
                    sigmas: {
                        type: "number",
                        exclusiveMinimum: 0,
                        default: 5,
                        description: "Standard errors of the time average allowed per coordinate.",
                    },
                },
            },
        },
        conformance: {
            type: "array",
            default: [],
            description: "Step-by-step agreement with the reference implementation of the published method the optimizer claims to be.",
            items: {
                type: "object",
                additionalProperties: false,
                required: ["optimizer", "method"],
                properties: {
                    optimizer: checkTarget.optimizer,
                    set: {
                        type: "string",
                        default: "default",
                        description: "The hyperparameter set whose values the claim starts from.",
                    },
                    method: {
                        type: "string",
                        enum: ["sgd", "momentum", "nesterov", "adagrad", "rmsprop", "adam", "adamw"],
                        description: "The reference optimizer of the published method.",
                    },
                    hyper: { ...hyper, description: "Claimed hyperparameters, in the reference optimizer's names." },
                    names: {
                        type: "object",
                        default: {},
                        additionalProperties: { type: ["string", "null"] },
                        description: "Reference name → the optimizer's name, or null when it has no such setting.",
                    },
                    expect: {
                        type: "object",
                        default: {},
                        additionalProperties: { type: "string" },
                        description: "Conventions the code must follow, e.g. epsPlacement: inside (default: any published form).",
                    },
                    tolerance: {
                        type: "number",
                        exclusiveMinimum: 0,
                        exclusiveMaximum: 1,
                        default: 1e-9,
                        description: "Relative (norm-wise) difference of the iterates still counted as agreement.",
                    },
                    gating: checkTarget.gating,
                },
            },
        },
    },
};
const configSchema = {
    $schema: "https://json-schema.org/draft/2020-12/schema",
    $id: "https://gradgate.dev/schema/gradgate.schema.json",
    title: "gradgate suite config",
    type: "object",
    additionalProperties: false,
    required: ["optimizers", "problems"],
    properties: {
        $schema: { type: "string" },
        version: { const: CONFIG_VERSION, default: CONFIG_VERSION, description: "Config format version." },
        seed: {
            type: "integer",
            minimum: 0,
            maximum: 9007199254740991,
            default: 1,
            description: "Suite seed; every run's seed is derived from it, the problem and the seed index.",
        },
        seeds: { ...positiveInt, maximum: 1000, default: 5, description: "Runs (seeds) per case." },
        budget: {
            ...budget,
            properties: {
                steps: { ...budget.properties.steps, default: 1000 },
                evaluations: { ...budget.properties.evaluations, default: 0 },
                seconds: { ...budget.properties.seconds, default: 30 },
            },
            default: {},
        },
        ladder: {
            type: "array",
            minItems: 1,
            maxItems: 20,
            items: { type: "number", exclusiveMinimum: 0, exclusiveMaximum: 1 },
            default: [1e-1, 1e-2, 1e-3, 1e-4, 1e-6, 1e-8],
            description: "Relative gap tolerances (gap / initial gap), decreasing: steps to reach each are recorded.",
        },
        stopAt: {
            type: "number",
            minimum: 0,
            exclusiveMaximum: 1,
            default: 1e-12,
            description: "A run stops once gap ≤ stopAt · initial gap; 0 = always use the whole budget.",
        },
        blowUp: {
            type: "number",
            exclusiveMinimum: 1,
            default: 1e6,
            description: "A run has diverged once gap > blowUp · max(initial gap, 1).",
        },
        fingerprint: {
            type: "object",
            additionalProperties: false,
            default: {},
            description: "First iterates kept per run, to tell whether the arithmetic itself changed.",
            properties: {
                steps: { type: "integer", minimum: 0, maximum: 1000, default: 20 },
                maxDim: {
                    type: "integer",
                    minimum: 0,
                    default: 4,
                    description: "Only problems up to this dimension.",
                },
            },
        },
        optimizers: {
            type: "array",
            minItems: 1,
            description: "The optimizers under test.",
            items: {
                type: "object",
                additionalProperties: false,
                required: ["name"],
                properties: {
                    name: {
                        type: "string",
                        pattern: "^[A-Za-z0-9][A-Za-z0-9_.-]*$",
                        description: "Label used in case ids and reports; unique in the suite.",
                    },
                    use: {
                        type: "string",
                        description: "Where it comes from: a reference optimizer name (e.g. adam) or an adapter spec.",
                    },
                    hyper,
                    sets: {
                        type: "object",
                        description: "Extra named hyperparameter sets, each overriding `hyper`.",
                        propertyNames: { pattern: "^[A-Za-z0-9][A-Za-z0-9_.-]*$" },
                        additionalProperties: hyper,
                    },
                },
            },
        },
        problems: {
            type: "array",
            minItems: 1,
            description: "The problems every optimizer runs on.",
            items: {
                type: "object",
                additionalProperties: false,
                required: ["use"],
                properties: {
                    use: { type: "string", description: "Problem name (see `gradgate problems`)." },
                    params: {
                        type: "object",
                        additionalProperties: { type: "number" },
                        description: "Problem parameters (dimension, condition number, ...).",
                    },
                    budget,
                    hyper: {
                        type: "object",
                        description: "Per-optimizer hyperparameter overrides on this problem, by optimizer name.",
                        additionalProperties: hyper,
                    },
                    optimizers: {
                        type: "array",
                        items: { type: "string" },
                        description: "Only these optimizers run on this problem (default: all).",
                    },
                },
            },
        },
        policy: policySchema,
        checks: checksSchema,
        adapters: {
            type: "object",
            description: "Process adapters by name, used as `use: NAME:optimizer` (docs/adapters.md).",
            propertyNames: { pattern: "^[A-Za-z][A-Za-z0-9_-]*$" },
            additionalProperties: processAdapterSchema,
        },
        scenarios: {
            type: "array",
            description: "Scenarios: extra cases under conditions real regressions hid behind (docs/adapters.md).",
            items: scenarioSchema,
        },
    },
};

;// CONCATENATED MODULE: ./build/package/config/load.js
/**
 * Suite config: parse (JSON or YAML), validate against the JSON Schema with ajv, apply defaults, and
 * turn every problem into one clear message naming the file, the field, the bad value and the expected
 * form. Pure: takes the text and the file's name, reads nothing itself.
 */





let validator = null;
function validate(data) {
    if (validator === null) {
        const ajv = new _2020.Ajv2020({
            allErrors: true,
            verbose: true,
            useDefaults: true,
            strict: true,
            allowUnionTypes: true,
        });
        validator = ajv.compile(configSchema);
    }
    const ok = validator(data);
    return { ok, errors: validator.errors ?? [] };
}
/** Parses and validates a config. `file` names it in messages, e.g. "gradgate.yml". */
function parseConfig(text, file) {
    const where = `config ${file}`;
    let data;
    try {
        data = /\.json$/i.test(file) ? JSON.parse(text) : (0,dist/* parse */.qg)(text);
    }
    catch (err) {
        if (err instanceof dist/* YAMLParseError */.XT) {
            const pos = err.linePos?.[0];
            throw new core_errors/* InputError */.d(`${where}: not valid YAML${pos ? ` at line ${pos.line}, column ${pos.col}` : ""}: ${firstLine(err.message)}`);
        }
        throw new core_errors/* InputError */.d(`${where}: not valid JSON: ${firstLine(err.message)}`);
    }
    if (data === null || typeof data !== "object" || Array.isArray(data)) {
        throw new core_errors/* InputError */.d(`${where}: must be a mapping with at least "optimizers" and "problems", got ${(0,core_errors/* quote */.h)(data)}`);
    }
    const { ok, errors } = validate(data);
    if (!ok)
        throw new core_errors/* InputError */.d(describeErrors(errors, data, where));
    const config = data;
    checkCrossFields(config, where);
    checkAdaptersAndScenarios(config, where);
    return config;
}
function firstLine(s) {
    return s.split("\n")[0];
}
const article = (t) => (/^[aeiou]/.test(t) ? `an ${t}` : `a ${t}`);
function phrase(e) {
    const p = e.params;
    switch (e.keyword) {
        case "type": {
            const types = Array.isArray(p.type) ? p.type : [String(p.type)];
            return `must be ${types.map(article).join(" or ")}`;
        }
        case "minimum":
            return `must be ≥ ${p.limit}`;
        case "maximum":
            return `must be ≤ ${p.limit}`;
        case "exclusiveMinimum":
            return `must be > ${p.limit}`;
        case "exclusiveMaximum":
            return `must be < ${p.limit}`;
        case "minItems":
            return `must list at least ${p.limit} item${p.limit === 1 ? "" : "s"}`;
        case "maxItems":
            return `must list at most ${p.limit} items`;
        case "pattern":
            return `must be letters, digits, "_", "." or "-" (starting with a letter or digit)`;
        case "const":
            return `must be ${JSON.stringify(p.allowedValue)}`;
        case "enum":
            return `must be one of ${p.allowedValues.map((v) => JSON.stringify(v)).join(", ")}`;
        default:
            return e.message ?? "is invalid";
    }
}
function describeErrors(errors, data, where) {
    // Ajv reports a union type failure once per branch; keep the first message per field.
    const seen = new Set();
    const lines = [];
    for (const e of errors) {
        const path = (0,json_pointer/* jsonPointerToPath */.K)(e.instancePath);
        let line;
        if (e.keyword === "required") {
            const field = String(e.params.missingProperty);
            line = `${where}: ${path ? `${path}.` : ""}${field} is required`;
        }
        else if (e.keyword === "additionalProperties") {
            const extra = String(e.params.additionalProperty);
            const known = knownFields(e);
            line = `${where}: ${path ? `${path}.` : ""}${extra} is not a known field${known ? ` (known: ${known})` : ""}`;
        }
        else if (e.keyword === "propertyNames") {
            continue; // the pattern error that follows names the key
        }
        else {
            const value = (0,json_pointer/* valueAtPointer */.s)(data, e.instancePath);
            line = `${where}: ${path || "the top level"} ${phrase(e)}, got ${(0,core_errors/* quote */.h)(value)}`;
            if (e.keyword === "pattern" && e.propertyName !== undefined) {
                line = `${where}: ${path}.${e.propertyName} is not a valid name: ${phrase(e)}`;
            }
        }
        const key = path + "|" + e.keyword;
        if (seen.has(key))
            continue;
        seen.add(key);
        lines.push(line);
    }
    return lines.join("\n");
}
function knownFields(e) {
    const props = e.parentSchema?.properties;
    return props
        ? Object.keys(props)
            .filter((k) => k !== "$schema")
            .join(", ")
        : "";
}
/** Rules the schema cannot say: unique names, decreasing ladder, references to optimizer names. */
function checkCrossFields(config, where) {
    const names = new Set();
    config.optimizers.forEach((o, i) => {
        if (names.has(o.name)) {
            throw new core_errors/* InputError */.d(`${where}: optimizers[${i}].name ${(0,core_errors/* quote */.h)(o.name)} is used twice; names must be unique`);
        }
        names.add(o.name);
    });
    for (let i = 1; i < config.ladder.length; i++) {
        if (!(config.ladder[i] < config.ladder[i - 1])) {
            throw new core_errors/* InputError */.d(`${where}: ladder must be strictly decreasing, got ${config.ladder[i]} after ${config.ladder[i - 1]} at ladder[${i}]`);
        }
    }
    config.problems.forEach((p, i) => {
        for (const [j, name] of (p.optimizers ?? []).entries()) {
            if (!names.has(name)) {
                throw new core_errors/* InputError */.d(`${where}: problems[${i}].optimizers[${j}] names ${(0,core_errors/* quote */.h)(name)}, which is not in optimizers (known: ${[...names].join(", ")})`);
            }
        }
        for (const name of Object.keys(p.hyper ?? {})) {
            if (!names.has(name)) {
                throw new core_errors/* InputError */.d(`${where}: problems[${i}].hyper.${name} names an optimizer that is not in optimizers (known: ${[...names].join(", ")})`);
            }
        }
    });
}
/** Adapter names that are spellings of `use` themselves (src/adapters/use.ts). */
const RESERVED_ADAPTERS = ["reference", "module"];
/** Rules for `adapters` and `scenarios` that the schema cannot say. */
function checkAdaptersAndScenarios(config, where) {
    for (const name of Object.keys(config.adapters ?? {})) {
        if (RESERVED_ADAPTERS.includes(name)) {
            throw new core_errors/* InputError */.d(`${where}: adapters.${name}: "${name}" is reserved (use: ${name}:... means something else); choose another name`);
        }
    }
    const optimizerNames = config.optimizers.map((o) => o.name);
    const problemUses = config.problems.map((p) => p.use);
    const seen = new Set();
    (config.scenarios ?? []).forEach((sc, i) => {
        const at = `${where}: scenarios[${i}]`;
        if (seen.has(sc.name))
            throw new core_errors/* InputError */.d(`${at}.name ${(0,core_errors/* quote */.h)(sc.name)} is used twice; names must be unique`);
        seen.add(sc.name);
        if (!sc.resume && !sc.lrChange && !sc.hyper && !sc.problem) {
            throw new core_errors/* InputError */.d(`${at} (${(0,core_errors/* quote */.h)(sc.name)}) changes nothing: give resume, lrChange, hyper or problem`);
        }
        if (sc.resume && sc.lrChange) {
            throw new core_errors/* InputError */.d(`${at} has both resume and lrChange; make them two scenarios`);
        }
        if (sc.lrChange && (sc.lrChange.lr === undefined) === (sc.lrChange.factor === undefined)) {
            throw new core_errors/* InputError */.d(`${at}.lrChange needs exactly one of lr (the new rate) or factor (times the case's lr)`);
        }
        if (sc.problem && sc.problems) {
            throw new core_errors/* InputError */.d(`${at} has both problem and problems; problem replaces the suite's problems`);
        }
        for (const [j, name] of (sc.optimizers ?? []).entries()) {
            if (!optimizerNames.includes(name)) {
                throw new core_errors/* InputError */.d(`${at}.optimizers[${j}] names ${(0,core_errors/* quote */.h)(name)}, which is not in optimizers (known: ${optimizerNames.join(", ")})`);
            }
        }
        for (const [j, use] of (sc.problems ?? []).entries()) {
            if (!problemUses.includes(use)) {
                throw new core_errors/* InputError */.d(`${at}.problems[${j}] names ${(0,core_errors/* quote */.h)(use)}, which is not the use of any of problems (known: ${problemUses.join(", ")})`);
            }
        }
    });
}

;// CONCATENATED MODULE: ./build/package/config/default-suite.js
/**
 * The suite gradgate runs when a repository has no gradgate.yml: the seven reference optimizers on the
 * standard problems, with step sizes tuned per problem (a coarse grid 1e-4 … 1, three seeds, best median
 * final gap after 2000 steps — chosen here, not published). It is also what `npm run demo` and the
 * benchmark run. Behaviours covered: ill-conditioned quadratics (κ = 10, 100, 10⁴), curved valleys
 * (Rosenbrock, helical valley, Wood), bad scaling (Powell, Brown: per-parameter step sizes), a local
 * basin (Freudenstein–Roth), a saddle, a plateau, stochastic gradients (noisy quadratic, mini-batch
 * logistic regression and a two-layer network) and rare features (sparse least squares). Extra sets
 * expose what only shows under specific conditions: AMSGrad (its running maximum) and a large ε (where
 * ε sits relative to the square root and the bias correction).
 */
const DEFAULT_SUITE_YAML = `# gradgate default suite
version: 1
seed: 1
seeds: 5
budget:
  steps: 2000
optimizers:
  - name: sgd
  - name: momentum
    hyper: { momentum: 0.9 }
  - name: nesterov
    hyper: { momentum: 0.9 }
  - name: adagrad
  - name: rmsprop
    sets:
      large-eps: { eps: 0.0001 }
  - name: adam
    sets:
      amsgrad: { amsgrad: true }
      large-eps: { eps: 0.01 }
  - name: adamw
problems:
  - use: quadratic
    params: { kappa: 10 }
    hyper:
      sgd: { lr: 0.01 }
      momentum: { lr: 0.001 }
      nesterov: { lr: 0.1 }
      adagrad: { lr: 0.1 }
      rmsprop: { lr: 0.001 }
      adam: { lr: 0.01 }
      adamw: { lr: 0.1 }
  - use: quadratic
    params: { kappa: 100 }
    hyper:
      sgd: { lr: 0.01 }
      momentum: { lr: 0.001 }
      nesterov: { lr: 0.001 }
      adagrad: { lr: 0.3 }
      rmsprop: { lr: 0.003 }
      adam: { lr: 0.03 }
      adamw: { lr: 0.03 }
  - use: quadratic
    params: { kappa: 10000 }
    hyper:
      sgd: { lr: 0.0001 }
      momentum: { lr: 0.0003 }
      nesterov: { lr: 0.0001 }
      adagrad: { lr: 1 }
      rmsprop: { lr: 0.003 }
      adam: { lr: 1 }
      adamw: { lr: 0.1 }
  - use: rosenbrock
    hyper:
      sgd: { lr: 0.001 }
      momentum: { lr: 0.003 }
      nesterov: { lr: 0.001 }
      adagrad: { lr: 1 }
      rmsprop: { lr: 0.003 }
      adam: { lr: 0.1 }
      adamw: { lr: 0.03 }
  - use: freudenstein-roth
    hyper:
      sgd: { lr: 0.0001 }
      momentum: { lr: 0.0001 }
      nesterov: { lr: 0.0001 }
      adagrad: { lr: 0.03 }
      rmsprop: { lr: 0.01 }
      adam: { lr: 0.001 }
      adamw: { lr: 0.001 }
  - use: powell-badly-scaled
    optimizers: [adagrad, rmsprop, adam, adamw]
    hyper:
      adagrad: { lr: 0.0001 }
      rmsprop: { lr: 0.0001 }
      adam: { lr: 0.0001 }
      adamw: { lr: 0.0001 }
  - use: brown-badly-scaled
    optimizers: [adagrad, rmsprop, adam, adamw]
    hyper:
      adagrad: { lr: 0.1 }
      rmsprop: { lr: 0.1 }
      adam: { lr: 0.1 }
      adamw: { lr: 0.1, weightDecay: 0 }
  - use: beale
    hyper:
      sgd: { lr: 0.03 }
      momentum: { lr: 0.003 }
      nesterov: { lr: 0.003 }
      adagrad: { lr: 0.3 }
      rmsprop: { lr: 0.003 }
      adam: { lr: 0.03 }
      adamw: { lr: 0.1 }
  - use: helical-valley
    hyper:
      sgd: { lr: 0.001 }
      momentum: { lr: 0.001 }
      nesterov: { lr: 0.001 }
      adagrad: { lr: 1 }
      rmsprop: { lr: 0.003 }
      adam: { lr: 0.3 }
      adamw: { lr: 1 }
  - use: gaussian
    hyper:
      sgd: { lr: 0.1 }
      momentum: { lr: 0.01 }
      nesterov: { lr: 0.1 }
      adagrad: { lr: 0.001 }
      rmsprop: { lr: 0.0001 }
      adam: { lr: 0.0001 }
      adamw: { lr: 0.0003 }
  - use: powell-singular
    hyper:
      sgd: { lr: 0.003 }
      momentum: { lr: 0.003 }
      nesterov: { lr: 0.003 }
      adagrad: { lr: 1 }
      rmsprop: { lr: 0.003 }
      adam: { lr: 1 }
      adamw: { lr: 0.3 }
  - use: wood
    hyper:
      sgd: { lr: 0.0003 }
      momentum: { lr: 0.0001 }
      nesterov: { lr: 0.0001 }
      adagrad: { lr: 0.1 }
      rmsprop: { lr: 0.001 }
      adam: { lr: 1 }
      adamw: { lr: 0.3 }
  - use: extended-rosenbrock
    hyper:
      sgd: { lr: 0.001 }
      momentum: { lr: 0.001 }
      nesterov: { lr: 0.001 }
      adagrad: { lr: 1 }
      rmsprop: { lr: 0.003 }
      adam: { lr: 0.1 }
      adamw: { lr: 0.03 }
  - use: penalty-1
    hyper:
      sgd: { lr: 0.003 }
      momentum: { lr: 0.001 }
      nesterov: { lr: 0.001 }
      adagrad: { lr: 1 }
      rmsprop: { lr: 0.003 }
      adam: { lr: 0.1 }
      adamw: { lr: 0.3 }
  - use: penalty-2
    hyper:
      sgd: { lr: 0.003 }
      momentum: { lr: 0.003 }
      nesterov: { lr: 0.003 }
      adagrad: { lr: 0.1 }
      rmsprop: { lr: 0.0003 }
      adam: { lr: 0.003 }
      adamw: { lr: 0.003 }
  - use: saddle
    hyper:
      sgd: { lr: 0.03 }
      momentum: { lr: 0.03 }
      nesterov: { lr: 0.3 }
      adagrad: { lr: 0.1 }
      rmsprop: { lr: 0.3 }
      adam: { lr: 0.003 }
      adamw: { lr: 0.03 }
  - use: plateau
    hyper:
      sgd: { lr: 1 }
      momentum: { lr: 0.01 }
      nesterov: { lr: 0.3 }
      adagrad: { lr: 0.1 }
      rmsprop: { lr: 0.003 }
      adam: { lr: 0.003 }
      adamw: { lr: 0.003 }
  - use: noisy-quadratic
    hyper:
      sgd: { lr: 0.003 }
      momentum: { lr: 0.0003 }
      nesterov: { lr: 0.0003 }
      adagrad: { lr: 0.03 }
      rmsprop: { lr: 0.001 }
      adam: { lr: 0.003 }
      adamw: { lr: 0.003 }
  - use: sparse-least-squares
    hyper:
      sgd: { lr: 1 }
      momentum: { lr: 1 }
      nesterov: { lr: 1 }
      adagrad: { lr: 0.3 }
      rmsprop: { lr: 0.003 }
      adam: { lr: 0.01 }
      adamw: { lr: 0.3 }
  - use: logistic-regression
    hyper:
      sgd: { lr: 0.01 }
      momentum: { lr: 0.001 }
      nesterov: { lr: 0.001 }
      adagrad: { lr: 0.03 }
      rmsprop: { lr: 0.001 }
      adam: { lr: 0.003 }
      adamw: { lr: 0.003 }
  - use: two-layer-network
    hyper:
      sgd: { lr: 1 }
      momentum: { lr: 0.1 }
      nesterov: { lr: 0.1 }
      adagrad: { lr: 0.3 }
      rmsprop: { lr: 0.001 }
      adam: { lr: 0.03 }
      adamw: { lr: 0.03 }
`;

// EXTERNAL MODULE: ./build/package/io/files.js
var files = __webpack_require__(1687);
// EXTERNAL MODULE: ./build/package/runner/pool.js
var pool = __webpack_require__(9442);
// EXTERNAL MODULE: ./build/package/runner/results.js
var results = __webpack_require__(568);
// EXTERNAL MODULE: ./build/package/optimizers/hyper.js
var optimizers_hyper = __webpack_require__(650);
// EXTERNAL MODULE: ./build/package/runner/resolve.js
var resolve = __webpack_require__(5966);
// EXTERNAL MODULE: ./build/package/runner/scenarios.js
var scenarios = __webpack_require__(8857);
// EXTERNAL MODULE: ./build/package/runner/suite.js
var runner_suite = __webpack_require__(5926);
// EXTERNAL MODULE: ./build/package/adapters/child.js
var child = __webpack_require__(5742);
// EXTERNAL MODULE: ./build/package/adapters/module.js
var adapters_module = __webpack_require__(6902);
// EXTERNAL MODULE: ./build/package/adapters/session.js + 3 modules
var adapters_session = __webpack_require__(3065);
// EXTERNAL MODULE: ./build/package/adapters/use.js
var adapters_use = __webpack_require__(2683);
;// CONCATENATED MODULE: ./build/package/adapters/prepare.js
/**
 * Resolving a suite whose config uses adapters: `resolveSuite` plus what it cannot do synchronously.
 *
 * 1. Process adapters get their paths resolved against the config file's directory (`baseDir`).
 * 2. Module optimizers are imported (a missing file or export is an error now, naming the config field)
 *    and process adapters are started once for their handshake (a process that does not start, or does
 *    not serve an optimizer the config names, is an error now), then closed again.
 * 3. Hyperparameters of module and process optimizers: their declared defaults under the config's values.
 * 4. Scenarios are expanded (src/runner/scenarios.ts) against what each optimizer declares.
 *
 * The result carries `adapters` (the base directory and the process adapters) to every worker; `use`
 * strings stay as written (relative paths), so results do not depend on where the repository is checked
 * out. Entry points call `prepareSuite(config, file, { baseDir: dirname(configPath) })` in place of
 * `resolveSuite(config, file)`.
 */











/** The process adapters of a config with `cwd` made absolute. */
function processAdapterSpecs(config, baseDir) {
    const out = {};
    for (const [name, a] of Object.entries(config.adapters ?? {})) {
        out[name] = {
            name,
            command: [...a.command],
            cwd: (0,external_node_path_.isAbsolute)(a.cwd) ? a.cwd : (0,external_node_path_.resolve)(baseDir, a.cwd),
            env: { ...a.env },
            maxRuns: a.maxRuns,
            maxMessageBytes: a.maxMessageBytes,
            timeouts: { ...a.timeouts },
        };
    }
    return out;
}
/** Resolves the suite with its module and process optimizers and its scenarios. */
async function prepareSuite(config, file, options) {
    const where = `config ${file}`;
    const processes = processAdapterSpecs(config, options.baseDir);
    const context = { baseDir: options.baseDir, processes };
    const adapterNames = Object.keys(processes);
    const uses = new Map();
    const whereOf = new Map();
    config.optimizers.forEach((o, i) => {
        const use = (0,resolve/* canonicalUse */.sx)(o.use ?? o.name);
        const w = `${where}: optimizers[${i}].use`;
        uses.set(use, (0,adapters_use/* parseUse */.f)(use, adapterNames, w));
        if (!whereOf.has(use))
            whereOf.set(use, `${where}: optimizers[${i}]`);
    });
    // Module optimizers: import now, so a wrong path fails before anything runs.
    const modules = new Map();
    for (const [use, spec] of uses) {
        if (spec.kind !== "module")
            continue;
        const loaded = await (0,adapters_module/* loadModuleOptimizer */.kD)(spec.path, spec.exportName, options.baseDir, `${whereOf.get(use)}.use`);
        modules.set(use, loaded.factory);
    }
    // Process adapters: one handshake each (in parallel), then check the optimizers named.
    const needed = [...new Set([...uses.values()].flatMap((u) => (u.kind === "process" ? [u.adapter] : [])))];
    const served = new Map();
    await Promise.all(needed.map(async (name) => {
        const session = new adapters_session/* ProcessSession */.M(processes[name], { parentEnv: options.parentEnv });
        try {
            served.set(name, (await session.describe()).optimizers);
        }
        catch (err) {
            const reason = err instanceof child/* ChildFault */.X_ ? err.reason : String(err);
            throw new core_errors/* InputError */.d(`${where}: adapters.${name} (command ${(0,core_errors/* quote */.h)(processes[name].command)}): ${reason}`);
        }
        finally {
            await session.close();
        }
    }));
    const descriptions = new Map();
    for (const [use, spec] of uses) {
        if (spec.kind !== "process")
            continue;
        const list = served.get(spec.adapter);
        const found = list.find((d) => d.name === spec.optimizer);
        if (found === undefined) {
            throw new core_errors/* InputError */.d(`${whereOf.get(use)}.use ${(0,core_errors/* quote */.h)(use)}: adapter "${spec.adapter}" serves no optimizer ${(0,core_errors/* quote */.h)(spec.optimizer)} ` +
                `(it serves: ${list.map((d) => d.name).join(", ")})`);
        }
        descriptions.set(use, found);
    }
    const defaultsOf = (use) => modules.get(use)?.defaults ?? descriptions.get(use)?.defaults ?? {};
    const resolveHyper = (use, given, w) => {
        const spec = uses.get(use) ?? (0,adapters_use/* parseUse */.f)(use, adapterNames, w);
        if (spec.kind === "reference")
            return (0,optimizers_hyper/* resolveHyper */.Vn)((0,optimizers/* getOptimizer */.KH)(spec.name, w), given, w);
        return { ...defaultsOf(use), ...given };
    };
    const suite = (0,runner_suite/* resolveSuite */.Z)(config, file, { resolveForeignHyper: resolveHyper });
    const declare = (_optimizer, base) => {
        const spec = uses.get(base.use);
        if (spec.kind === "reference") {
            return { hyperNames: Object.keys((0,optimizers/* getOptimizer */.KH)(spec.name).hyperSpecs), state: true, lr: true };
        }
        if (spec.kind === "process") {
            const d = descriptions.get(base.use);
            return {
                hyperNames: Object.keys(d.defaults ?? {}),
                state: d.capabilities.includes("state"),
                lr: d.capabilities.includes("lr"),
            };
        }
        const factory = modules.get(base.use);
        let caps = { state: false, lr: false };
        try {
            caps = (0,adapters_module/* instanceCapabilities */.QN)(factory.create(base.hyper, base.dim));
        }
        catch {
            // An instance that cannot be made declares nothing; its runs will say why.
        }
        return { hyperNames: Object.keys(factory.defaults), ...caps };
    };
    const extra = (0,scenarios/* expandScenarios */.Ed)(config, suite.cases, file, { declare, resolveHyper });
    return { ...suite, cases: [...suite.cases, ...extra], adapters: context };
}

// EXTERNAL MODULE: ./build/package/runner/shard.js
var shard = __webpack_require__(862);
;// CONCATENATED MODULE: ./build/package/cli/format.js
/** Plain-text tables and number formats for the terminal. */
/** Renders rows as a left-aligned text table (numbers right-aligned) with a header rule. */
function textTable(header, rows) {
    const widths = header.map((h, i) => Math.max(h.length, ...rows.map((r) => (r[i] ?? "").length)));
    const numeric = header.map((_, i) => rows.length > 0 && rows.every((r) => /^[-+]?[\d.,e+%x×—-]*$/i.test(r[i] ?? "")));
    const line = (cells) => cells
        .map((c, i) => (numeric[i] ? c.padStart(widths[i]) : c.padEnd(widths[i])))
        .join("  ")
        .trimEnd();
    return [line(header), widths.map((w) => "-".repeat(w)).join("  "), ...rows.map(line)].join("\n") + "\n";
}
/** Short scientific form for gaps: 3 significant digits, "—" for null. */
function sci(x) {
    if (x === null || x === undefined || Number.isNaN(x))
        return "—";
    if (x === 0)
        return "0";
    const a = Math.abs(x);
    if (a >= 0.01 && a < 1e4)
        return x.toPrecision(3);
    return x.toExponential(2);
}
/** Median of the non-null values, or null when there are none. */
function medianOf(values) {
    const v = values.filter((x) => x !== null).sort((a, b) => a - b);
    if (v.length === 0)
        return null;
    const m = v.length >> 1;
    return v.length % 2 ? v[m] : (v[m - 1] + v[m]) / 2;
}

;// CONCATENATED MODULE: ./build/package/cli/run-command.js
/** `gradgate run`: run a suite and write its results JSON. */














const DEFAULT_CONFIG_FILES = ["gradgate.yml", "gradgate.yaml", "gradgate.json"];
const DEFAULT_RESULTS = ".gradgate/results.json";
/** Reads the config named on the command line, or gradgate.yml in the working directory, or the default suite. */
function loadSuiteConfig(host, config) {
    if (config !== undefined) {
        const path = (0,external_node_path_.resolve)(host.cwd, config);
        if (!(0,external_node_fs_.existsSync)(path))
            throw new core_errors/* InputError */.d(`config ${config}: no such file`);
        return { config: parseConfig((0,external_node_fs_.readFileSync)(path, "utf8"), config), file: config };
    }
    for (const name of DEFAULT_CONFIG_FILES) {
        const path = (0,external_node_path_.resolve)(host.cwd, name);
        if ((0,external_node_fs_.existsSync)(path))
            return { config: parseConfig((0,external_node_fs_.readFileSync)(path, "utf8"), name), file: name };
    }
    return {
        config: parseConfig(DEFAULT_SUITE_YAML, "(built-in default suite)"),
        file: "(built-in default suite)",
    };
}
/**
 * Loads the config (see loadSuiteConfig) and resolves it into a suite with its module and process
 * optimizers and scenarios; module paths and adapter directories are relative to the config file.
 */
async function loadPreparedSuite(host, configArg) {
    const { config, file } = loadSuiteConfig(host, configArg);
    const baseDir = configArg === undefined ? host.cwd : (0,external_node_path_.dirname)((0,external_node_path_.resolve)(host.cwd, configArg));
    const suite = await prepareSuite(config, file, { baseDir });
    return { config, file, suite };
}
async function runCommand(host, args) {
    const { file, suite } = await loadPreparedSuite(host, args.config);
    const runs = suite.cases.reduce((n, c) => n + c.seeds, 0);
    const workers = args.workers ?? Math.min((0,external_node_os_.availableParallelism)(), 8);
    if (!Number.isInteger(workers) || workers < 1) {
        throw new core_errors/* InputError */.d(`--workers must be a positive integer, got ${(0,core_errors/* quote */.h)(args.workers)}`);
    }
    const items = args.shard ? (0,shard/* shardItems */.l6)(runs, args.shard) : undefined;
    if (!args.quiet) {
        const part = args.shard ? `, shard ${args.shard.index}/${args.shard.count} (${items.length} runs)` : "";
        host.err(`gradgate: ${suite.cases.length} cases, ${runs} runs${part}, ${workers} worker(s), suite ${file}\n`);
    }
    const started = performance.now();
    let lastDraw = 0;
    const cases = await (0,pool/* runSuite */.og)(suite, {
        workers,
        items,
        onProgress: (done, total) => {
            if (args.quiet || !host.interactive)
                return;
            const now = performance.now();
            if (now - lastDraw < 100 && done < total)
                return;
            lastDraw = now;
            host.err(`\r  ${done}/${total} runs (${Math.round((100 * done) / total)}%)`);
            if (done === total)
                host.err("\n");
        },
    });
    const doc = (0,results/* buildResults */.rq)(suite, cases, undefined, args.shard);
    (0,files/* writeFileAtomic */.Z)((0,external_node_path_.resolve)(host.cwd, args.out), (0,json/* canonicalJson */.d)(doc));
    const seconds = (performance.now() - started) / 1000;
    if (!args.quiet) {
        host.out(summaryTable(doc));
        host.out(`\n${items?.length ?? runs} runs in ${seconds.toFixed(2)} s; results written to ${args.out}\n`);
    }
    return cli_host/* EXIT */.d.ok;
}
/** One line per case: medians across seeds of the headline metrics. */
function summaryTable(doc) {
    const rows = doc.cases.map(({ case: c, runs }) => {
        const diverged = runs.filter((r) => r.divergence !== null).length;
        const errors = runs.filter((r) => r.stop === "error").length;
        // The deepest rung that at least half the runs reached.
        let rung = -1;
        for (let i = c.ladder.length - 1; i >= 0; i--) {
            if (runs.filter((r) => r.stepsTo[i] !== null).length * 2 >= runs.length) {
                rung = i;
                break;
            }
        }
        const stepsTo = rung >= 0 ? medianOf(runs.map((r) => r.stepsTo[rung])) : null;
        const status = errors > 0 ? `${errors} error` : diverged > 0 ? `${diverged} diverged` : "ok";
        return [
            c.id,
            sci(medianOf(runs.map((r) => r.finalGap))),
            rung >= 0 ? `${c.ladder[rung].toExponential(0)}` : "—",
            stepsTo === null ? "—" : String(Math.round(stepsTo)),
            sci(medianOf(runs.map((r) => r.rate))),
            status,
        ];
    });
    return textTable(["case", "final gap", "reached", "steps", "rate", "runs"], rows);
}

// EXTERNAL MODULE: ./build/package/cli/merge-command.js
var merge_command = __webpack_require__(6126);
// EXTERNAL MODULE: ./build/package/baselines/store.js
var store = __webpack_require__(1425);
// EXTERNAL MODULE: ./build/package/baselines/validate.js + 1 modules
var baselines_validate = __webpack_require__(5373);
// EXTERNAL MODULE: ./build/package/report/html.js + 1 modules
var html = __webpack_require__(5013);
// EXTERNAL MODULE: ./build/package/report/markdown.js + 1 modules
var markdown = __webpack_require__(902);
// EXTERNAL MODULE: ./build/package/report/verdict-file.js
var verdict_file = __webpack_require__(3494);
;// CONCATENATED MODULE: ./build/package/cli/report-command.js
/**
 * `gradgate report --verdict FILE [--results FILE] [--baselines DIR] [--html OUT] [--markdown OUT]`:
 * renders a verdict document (with the charts when the results and baselines are at hand) as the
 * self-contained HTML report and/or the Markdown of the job summary, the same pure renderers the Action uses.
 */










function reportCommand(host, args) {
    if (args.html === undefined && args.markdown === undefined) {
        throw new core_errors/* InputError */.d("report: name an output: --html FILE and/or --markdown FILE");
    }
    const read = (file, what) => {
        const path = (0,external_node_path_.resolve)(host.cwd, file);
        if (!(0,external_node_fs_.existsSync)(path))
            throw new core_errors/* InputError */.d(`report: ${what} ${file}: no such file`);
        return (0,external_node_fs_.readFileSync)(path, "utf8");
    };
    const verdict = (0,verdict_file/* parseVerdict */.P)(read(args.verdict, "verdict"), args.verdict);
    const candidate = args.results
        ? [...(0,baselines_validate/* parseResults */.c2)(read(args.results, "results"), args.results).cases]
        : undefined;
    let baseline;
    if (args.baselines !== undefined) {
        const dir = (0,external_node_path_.resolve)(host.cwd, args.baselines);
        if (!(0,external_node_fs_.existsSync)(dir))
            throw new core_errors/* InputError */.d(`report: baselines ${args.baselines}: no such directory`);
        baseline = [...(0,store/* readBaselineDir */.v5)(dir, args.baselines.replace(/\/+$/, "")).values()].flatMap((b) => b.cases);
    }
    const input = { verdict, candidate, baseline };
    if (args.html !== undefined) {
        (0,files/* writeFileAtomic */.Z)((0,external_node_path_.resolve)(host.cwd, args.html), (0,html/* renderHtml */.K)(input));
        host.out(`HTML report written to ${args.html}\n`);
    }
    if (args.markdown !== undefined) {
        (0,files/* writeFileAtomic */.Z)((0,external_node_path_.resolve)(host.cwd, args.markdown), (0,markdown/* renderMarkdown */.Gc)(input, { target: "summary" }));
        host.out(`Markdown report written to ${args.markdown}\n`);
    }
    return cli_host/* EXIT */.d.ok;
}

;// CONCATENATED MODULE: ./build/package/compare/fingerprint.js
/** r_k of one step: −1 when bitwise equal, Infinity when not comparable (NaN, lengths differ). */
function stepDifference(x, y) {
    if (x.length !== y.length)
        return Infinity;
    let bitwise = true;
    let diff = 0;
    let scale = 0;
    for (let i = 0; i < x.length; i++) {
        const xi = x[i];
        const yi = y[i];
        if (xi === yi) {
            const m = xi === null ? 0 : Math.abs(xi);
            if (m > scale)
                scale = m;
            continue;
        }
        bitwise = false;
        // null stands for a coordinate that left the finite range: any difference with it is unbounded.
        if (xi === null || yi === null)
            return Infinity;
        const dd = Math.abs(xi - yi);
        diff = Number.isNaN(dd) ? Infinity : Math.max(diff, dd);
        scale = Math.max(scale, Math.abs(xi), Math.abs(yi));
    }
    if (bitwise)
        return -1;
    return scale === 0 || !Number.isFinite(scale) ? Infinity : diff / scale;
}
function compareFingerprint(pairs, tolerance) {
    let seeds = 0;
    let steps = 0;
    let firstDifferent = Infinity;
    let fromStep = Infinity;
    let relativeAtStep = 0;
    let maxRelative = 0;
    let seedsChanged = 0;
    for (const { base, cand } of pairs) {
        const a = base.iterates;
        const b = cand.iterates;
        if (a === undefined || b === undefined || (a.length === 0 && b.length === 0))
            continue;
        seeds++;
        const k = Math.min(a.length, b.length);
        steps = Math.max(steps, a.length, b.length);
        let exceedAt = Infinity;
        let exceedR = 0;
        for (let s = 0; s < k; s++) {
            const r = stepDifference(a[s], b[s]);
            if (r < 0)
                continue;
            firstDifferent = Math.min(firstDifferent, s + 1);
            maxRelative = Math.max(maxRelative, r);
            if (r > tolerance && exceedAt === Infinity) {
                exceedAt = s + 1;
                exceedR = r;
            }
        }
        if (a.length !== b.length) {
            firstDifferent = Math.min(firstDifferent, k + 1);
            maxRelative = Infinity;
            if (exceedAt === Infinity) {
                exceedAt = k + 1;
                exceedR = Infinity;
            }
        }
        if (exceedAt === Infinity)
            continue;
        seedsChanged++;
        if (exceedAt < fromStep) {
            fromStep = exceedAt;
            relativeAtStep = exceedR;
        }
        else if (exceedAt === fromStep)
            relativeAtStep = Math.max(relativeAtStep, exceedR);
    }
    const finite = (v) => (Number.isFinite(v) ? v : null);
    if (seeds === 0) {
        return {
            status: "unavailable",
            tolerance,
            seeds: 0,
            steps: 0,
            firstDifferentStep: null,
            fromStep: null,
            relativeAtStep: null,
            maxRelative: null,
            seedsChanged: 0,
        };
    }
    const identical = firstDifferent === Infinity;
    const status = identical ? "identical" : seedsChanged > 0 ? "changed" : "float-noise";
    return {
        status,
        tolerance,
        seeds,
        steps,
        firstDifferentStep: identical ? null : firstDifferent,
        fromStep: status === "changed" ? fromStep : null,
        relativeAtStep: status === "changed" ? finite(relativeAtStep) : null,
        maxRelative: finite(maxRelative),
        seedsChanged,
    };
}

;// CONCATENATED MODULE: ./build/package/compare/policy.js
/**
 * The comparison policy: which metrics gate, the practical margins, alpha, the multiplicity correction,
 * what fails the gate, the strict setting for pure refactors, and the extra-seed re-runs. Its defaults
 * live in one place, the `policy` fragment of the config schema (src/config/schema.ts); `resolvePolicy`
 * fills them in with ajv, so a config without `policy` gets exactly the documented defaults
 * (docs/decisions/0001-statistical-verdict.md, kept in step by tests/compare/policy.test.ts).
 */



let policy_validator = null;
function compile() {
    if (policy_validator === null) {
        const ajv = new _2020.Ajv2020({
            allErrors: true,
            verbose: true,
            useDefaults: true,
            strict: true,
            allowUnionTypes: true,
        });
        // Wrapped, because ajv applies defaults to properties only (not to the schema root).
        policy_validator = ajv.compile({ type: "object", properties: { policy: policySchema } });
    }
    return policy_validator;
}
/**
 * Validates a policy object (e.g. the config's `policy`, or a `--policy` JSON) and fills in the defaults.
 * `where` names its origin in messages, e.g. "config gradgate.yml: policy".
 */
function resolvePolicy(raw, where = "policy") {
    const data = structuredClone(raw ?? {});
    if (data === null || typeof data !== "object" || Array.isArray(data)) {
        throw new core_errors/* InputError */.d(`${where} must be a mapping, got ${(0,core_errors/* quote */.h)(raw)}`);
    }
    const validate = compile();
    const wrapped = { policy: data };
    if (!validate(wrapped))
        throw new core_errors/* InputError */.d(describe(validate.errors ?? [], wrapped, where));
    return wrapped.policy;
}
/** The defaults, exactly as the schema states them. */
const DEFAULT_POLICY = Object.freeze(resolvePolicy({}));
function describe(errors, data, where) {
    const lines = [];
    for (const e of errors) {
        const path = e.instancePath
            .split("/")
            .slice(2)
            .map((p) => (/^\d+$/.test(p) ? `[${p}]` : `.${p}`))
            .join("");
        const field = `${where}${path}`;
        const p = e.params;
        let value = data;
        for (const part of e.instancePath.split("/").slice(1))
            value = value?.[part];
        switch (e.keyword) {
            case "additionalProperties": {
                const known = Object.keys(e.parentSchema?.properties ?? {}).join(", ");
                lines.push(`${field}.${String(p.additionalProperty)} is not a known field (known: ${known})`);
                break;
            }
            case "enum":
                lines.push(`${field} must be one of ${p.allowedValues.map((v) => JSON.stringify(v)).join(", ")}, got ${(0,core_errors/* quote */.h)(value)}`);
                break;
            case "uniqueItems":
                lines.push(`${field} lists ${(0,core_errors/* quote */.h)(value)} with a repeated item; list each once`);
                break;
            default:
                lines.push(`${field} ${e.message ?? "is invalid"}, got ${(0,core_errors/* quote */.h)(value)}`);
        }
    }
    return lines.join("\n");
}

;// CONCATENATED MODULE: ./build/package/compare/samples.js
/** Stand-in magnitude of a censored pair in the equivalence test: beyond any real log ratio. */
const CENSORED_EXTREME = 1e6;
/** True when the run neither diverged nor failed. */
function healthy(run) {
    return run.stop !== "diverged" && run.stop !== "error";
}
/** Label of a ladder rung metric, e.g. "stepsTo(1e-3)". */
function rungLabel(rung) {
    return `stepsTo(${rung.toExponential().replace(/\.?0*e\+?/, "e")})`;
}
/** Samples for every metric of a case, in a stable order: rungs (ladder order), finalGap, evaluations. */
function metricSamples(spec, pairs, gapFloor) {
    const ok = [];
    pairs.forEach((p, pair) => {
        if (healthy(p.base) && healthy(p.cand))
            ok.push({ pair, base: p.base, cand: p.cand });
    });
    const out = [];
    spec.ladder.forEach((rung, r) => {
        const sample = rungSample(spec, ok, r, rung);
        if (sample !== null)
            out.push(sample);
    });
    out.push(finalGapSample(spec, ok, gapFloor));
    out.push(evaluationsSample(ok));
    return out;
}
function rungSample(spec, ok, r, rung) {
    const d = [];
    const dEq = [];
    const idx = [];
    let ties = 0;
    let cb = 0;
    let cc = 0;
    let reachB = 0;
    let reachC = 0;
    let lost = 0;
    let gained = 0;
    for (const { pair, base, cand } of ok) {
        const sb = base.stepsTo[r];
        const sc = cand.stepsTo[r];
        if (sb !== null)
            reachB++;
        if (sc !== null)
            reachC++;
        if (sb !== null && sc === null)
            lost++;
        if (sb === null && sc !== null)
            gained++;
        if (sb !== null && sc !== null) {
            idx.push(pair);
            if (Math.abs(sc - sb) <= 1) {
                ties++;
                d.push(0);
                dEq.push(0);
            }
            else {
                const v = Math.log(Math.max(sc, 1)) - Math.log(Math.max(sb, 1));
                d.push(v);
                dEq.push(v);
            }
        }
        else if (sb !== null && sc === null && censorable(cand, spec)) {
            cc++;
            idx.push(pair);
            d.push(Math.max(0, Math.log(cand.steps + 1) - Math.log(Math.max(sb, 1))));
            dEq.push(CENSORED_EXTREME);
        }
        else if (sb === null && sc !== null && censorable(base, spec)) {
            cb++;
            idx.push(pair);
            d.push(Math.min(0, Math.log(Math.max(sc, 1)) - Math.log(base.steps + 1)));
            dEq.push(-CENSORED_EXTREME);
        }
    }
    if (reachB === 0 && reachC === 0)
        return null;
    return {
        metric: rungLabel(rung),
        kind: "stepsTo",
        rung,
        d: Float64Array.from(d),
        dEquivalence: Float64Array.from(dEq),
        pairIndex: Int32Array.from(idx),
        ties,
        censoredBaseline: cb,
        censoredCandidate: cc,
        reach: { baseline: reachB, candidate: reachC, lost, gained },
    };
}
/** A run that missed a rung because its budget ran out (not because it stopped at the target). */
function censorable(run, spec) {
    return run.stop === "steps" || run.stop === "evaluations" || run.stop === "time" || spec.stopAt === 0;
}
function finalGapSample(spec, ok, gapFloor) {
    const d = [];
    const idx = [];
    let ties = 0;
    for (const { pair, base, cand } of ok) {
        if (base.finalGap === null || cand.finalGap === null)
            continue;
        idx.push(pair);
        const gap0 = base.f0 === null ? 1 : base.f0 - spec.fStar;
        const floor = gapFloor * Math.max(gap0, 1e-300);
        const b = Math.max(base.finalGap, floor);
        const c = Math.max(cand.finalGap, floor);
        if (b === c) {
            ties++;
            d.push(0);
        }
        else
            d.push(Math.log(c) - Math.log(b));
    }
    const arr = Float64Array.from(d);
    return {
        metric: "finalGap",
        kind: "finalGap",
        rung: null,
        d: arr,
        dEquivalence: arr,
        pairIndex: Int32Array.from(idx),
        ties,
        censoredBaseline: 0,
        censoredCandidate: 0,
    };
}
function evaluationsSample(ok) {
    const d = [];
    const idx = [];
    let ties = 0;
    for (const { pair, base, cand } of ok) {
        idx.push(pair);
        const slack = Math.max(1, Math.ceil(base.evaluations / Math.max(1, base.steps)));
        if (Math.abs(cand.evaluations - base.evaluations) <= slack) {
            ties++;
            d.push(0);
        }
        else
            d.push(Math.log(Math.max(cand.evaluations, 1)) - Math.log(Math.max(base.evaluations, 1)));
    }
    const arr = Float64Array.from(d);
    return {
        metric: "evaluations",
        kind: "evaluations",
        rung: null,
        d: arr,
        dEquivalence: arr,
        pairIndex: Int32Array.from(idx),
        ties,
        censoredBaseline: 0,
        censoredCandidate: 0,
    };
}

;// CONCATENATED MODULE: ./build/package/compare/sign-test.js
/**
 * Exact two-sided sign test for paired binary outcomes: McNemar's test in its exact (binomial) form.
 * Used for the count of seeds that reach a ladder rung: `lost` seeds reached it in the baseline only,
 * `gained` in the candidate only; seeds that agree carry no information about a change.
 *
 *   p = min(1, 2 · P(X ≤ min(lost, gained))),  X ~ Binomial(lost + gained, ½)
 *
 * Source: McNemar, "Note on the sampling error of the difference between correlated proportions or
 * percentages", Psychometrika 12(2):153–157 (1947); the exact binomial form is the sign test on the
 * discordant pairs. (Not in the statistics kernel; candidate to move there.)
 * Worked value (recomputed by hand): lost 6, gained 0 → 2 · 2⁻⁶ = 0.03125.
 * Cost: O(min(lost, gained)) terms, computed in log space for large counts.
 */
function exactSignTest(lost, gained) {
    const n = lost + gained;
    if (n === 0)
        return 1;
    const k = Math.min(lost, gained);
    // Σ_{i≤k} C(n, i) / 2ⁿ, each term from the previous: C(n, i) = C(n, i−1) · (n − i + 1) / i.
    let logTerm = -n * Math.LN2;
    let sum = Math.exp(logTerm);
    for (let i = 1; i <= k; i++) {
        logTerm += Math.log((n - i + 1) / i);
        sum += Math.exp(logTerm);
    }
    return Math.min(1, 2 * sum);
}

;// CONCATENATED MODULE: ./build/package/compare/stats/erfc.js
/**
 * Complementary error function erfc(x) = (2/√π) ∫ₓ^∞ e^{−t²} dt, accurate in both tails.
 *
 * What for: the standard normal CDF and survival function (`normalCdf`, `normalSf`), hence every
 * normal-approximation p-value of the kernel.
 *
 * Algorithm: erfc(x) = Q(½, x²), the regularized upper incomplete gamma function at a = ½.
 * - |x| < √1.5: erf by its power series  erf x = (2/√π) e^{−x²} Σ_{n≥0} 2ⁿ x^{2n+1} / (1·3·5···(2n+1))
 *   (Abramowitz & Stegun 1964, eq. 7.1.6), and erfc = 1 − erf (no cancellation: erfc ≥ 0.08 there).
 * - x ≥ √1.5: Legendre's continued fraction for Γ(a, z), z = x²,
 *   Γ(a, z) = e^{−z} z^a / (z + 1 − a − 1·(1−a) / (z + 3 − a − 2·(2−a) / (z + 5 − a − …))),
 *   evaluated by the modified Lentz method (Lentz 1976, Applied Optics 15:668–671; Thompson & Barnett
 *   1986, J. Comput. Phys. 64:490–509); the split at z = a + 1 and the even form of the fraction
 *   are those of Press, Teukolsky, Vetterling & Flannery, Numerical Recipes, 3rd ed. (2007), §6.2.
 * - x < −√1.5: erfc(x) = 2 − erfc(−x).
 * Relative error: a few 1e−16 near the origin, ≈ 1e−15 in the far tail (the continued fraction
 * stops at a relative tolerance of 1e−16 on the fraction; exp(−x²) adds ≈ x²·1e−16 relative).
 *
 * Cost: O(1): ≤ 40 series terms or ≤ 60 fraction terms (fewer as |x| grows), one exp.
 */
const TWO_OVER_SQRT_PI = 1.1283791670955126; // 2/√π
const INV_SQRT_PI = 0.5641895835477563; // 1/√π
const SPLIT = 1.224744871391589; // √1.5
const TINY = 1e-300;
const EPS = 1e-16;
const MAX_TERMS = 500;
function erfc(x) {
    if (Number.isNaN(x)) {
        throw new RangeError(`erfc: x must be a number, got NaN`);
    }
    if (x < -SPLIT)
        return 2 - erfc(-x);
    if (x < SPLIT) {
        // erf series: term_n = 2ⁿ x^{2n+1} / (2n+1)!!, ratio term_{n+1}/term_n = 2x² / (2n+3).
        const z = x * x;
        let term = x;
        let sum = x;
        for (let n = 0; n < MAX_TERMS; n++) {
            term *= (2 * z) / (2 * n + 3);
            sum += term;
            if (Math.abs(term) < Math.abs(sum) * EPS)
                break;
        }
        return 1 - TWO_OVER_SQRT_PI * Math.exp(-z) * sum;
    }
    if (x > 27.3)
        return 0; // erfc(27.3) < 2^−1074: underflows to zero.
    // Γ(½, z) = e^{−z} √z / f, f = b0 + a1/(b1 + a2/(b2 + …)), b_k = z + 2k + ½, a_k = −k (k − ½).
    const z = x * x;
    let f = z + 0.5;
    let c = f;
    let d = 0;
    for (let k = 1; k <= MAX_TERMS; k++) {
        const a = -k * (k - 0.5);
        const b = z + 2 * k + 0.5;
        d = b + a * d;
        if (d === 0)
            d = TINY;
        c = b + a / c;
        if (c === 0)
            c = TINY;
        d = 1 / d;
        const delta = c * d;
        f *= delta;
        if (Math.abs(delta - 1) < EPS)
            break;
    }
    return (INV_SQRT_PI * Math.exp(-z) * x) / f;
}

;// CONCATENATED MODULE: ./build/package/compare/stats/normal-cdf.js

const INV_SQRT2 = 0.7071067811865476; // 1/√2
/**
 * Standard normal cumulative distribution function Φ(z) = P(Z ≤ z), Z ~ N(0, 1).
 *
 * What for: normal-approximation p-values (Wilcoxon, Mann–Whitney) and the BCa bootstrap levels.
 * Formula: Φ(z) = ½ erfc(−z/√2) (Abramowitz & Stegun 1964, eq. 26.2.29), so the lower tail keeps
 * full relative precision down to Φ ≈ 1e−308; see `erfc` for the algorithm and accuracy.
 * Cost: one `erfc` call.
 */
function normalCdf(z) {
    if (Number.isNaN(z))
        throw new RangeError(`normalCdf: z must be a number, got NaN`);
    return 0.5 * erfc(-z * INV_SQRT2);
}
/**
 * Standard normal survival function 1 − Φ(z) = P(Z > z), computed as ½ erfc(z/√2) so the upper tail
 * keeps full relative precision (no 1 − Φ cancellation). Cost: one `erfc` call.
 */
function normal_cdf_normalSf(z) {
    if (Number.isNaN(z))
        throw new RangeError(`normalSf: z must be a number, got NaN`);
    return 0.5 * erfc(z * INV_SQRT2);
}

;// CONCATENATED MODULE: ./build/package/compare/stats/signed-rank-distribution.js
/** Largest n for which the exact null distribution is tabulated (counts up to 2^50 stay exact in a double). */
const SIGNED_RANK_EXACT_MAX_N = 50;
const cache = [];
/**
 * Exact null distribution of Wilcoxon's signed-rank statistic W+ (sum of the ranks of the positive
 * differences among n untied, nonzero differences), as the cumulative probabilities
 * cdf[w] = P(W+ ≤ w), w = 0 … n(n+1)/2.
 *
 * What for: exact p-values of `wilcoxonSignedRank` and exact confidence intervals of
 * `hodgesLehmann` (Tukey's interval from the order statistics of the Walsh averages).
 *
 * Algorithm: under H0 each rank k = 1 … n carries a + sign with probability ½ independently
 * (Wilcoxon 1945, "Individual comparisons by ranking methods", Biometrics Bulletin 1(6):80–83), so the
 * number of sign patterns with W+ = w is the number of subsets of {1, …, n} summing to w. It is
 * counted by the dynamic programme c_k(w) = c_{k−1}(w) + c_{k−1}(w − k) (a 0/1 knapsack over ranks),
 * then accumulated and divided by 2ⁿ. All counts are integers ≤ 2⁵⁰ < 2⁵³ for n ≤ 50, so the table
 * is exact: every probability is an integer times 2⁻ⁿ, represented without rounding.
 *
 * The table of each n is computed once and cached for the life of the process; callers must not
 * modify the returned array.
 * Cost: O(n · n(n+1)/2) ≈ 32,000 additions for n = 50 on first use, O(1) afterwards; memory
 * n(n+1)/2 + 1 doubles per cached n.
 */
function signedRankCdf(n) {
    if (!Number.isInteger(n) || n < 0 || n > SIGNED_RANK_EXACT_MAX_N) {
        throw new RangeError(`signedRankCdf: n must be an integer in [0, ${SIGNED_RANK_EXACT_MAX_N}], got ${String(n)}`);
    }
    const hit = cache[n];
    if (hit !== undefined)
        return hit;
    const top = (n * (n + 1)) / 2;
    const counts = new Float64Array(top + 1);
    counts[0] = 1;
    let reach = 0;
    for (let k = 1; k <= n; k++) {
        reach += k;
        for (let w = reach; w >= k; w--)
            counts[w] += counts[w - k];
    }
    const scale = Math.pow(2, -n);
    let acc = 0;
    for (let w = 0; w <= top; w++) {
        acc += counts[w];
        counts[w] = acc * scale;
    }
    cache[n] = counts;
    return counts;
}
/** P(W+ ≤ w) under H0 for n untied nonzero differences (0 for w < 0, 1 above the maximum). Cost: O(1) after the table. */
function signedRankLowerTail(n, w) {
    const cdf = signedRankCdf(n);
    const k = Math.floor(w);
    if (k < 0)
        return 0;
    if (k >= cdf.length)
        return 1;
    return cdf[k];
}
/**
 * P(W+ ≥ w) under H0, computed through the symmetry W+ ↦ n(n+1)/2 − W+ as a lower tail, so small upper
 * tails keep full precision (no 1 − cdf cancellation). Cost: O(1) after the table.
 */
function signedRankUpperTail(n, w) {
    return signedRankLowerTail(n, (n * (n + 1)) / 2 - Math.ceil(w));
}

;// CONCATENATED MODULE: ./build/package/compare/stats/validate.js
/**
 * Input checks shared by the statistics kernel. Every message names the function and the argument,
 * quotes the bad value and gives the expected form, e.g.
 * `wilcoxonSignedRank: d[3] must be a finite number, got NaN`.
 * Cost: O(n) for a sample, O(1) otherwise.
 */
/** Renders a value for an error message: strings in quotes, everything else as JavaScript prints it. */
function validate_describeValue(value) {
    if (typeof value === "string")
        return JSON.stringify(value);
    if (Array.isArray(value))
        return `an array of length ${value.length}`;
    if (typeof value === "object" && value !== null)
        return Object.prototype.toString.call(value);
    return String(value);
}
/** Throws unless `values` is an array-like of at least `minLength` finite numbers. */
function validate_checkSample(fn, name, values, minLength) {
    if (values === null ||
        typeof values !== "object" ||
        typeof values.length !== "number") {
        throw new TypeError(`${fn}: ${name} must be an array of finite numbers, got ${validate_describeValue(values)}`);
    }
    const arr = values;
    if (arr.length < minLength) {
        throw new RangeError(`${fn}: ${name} must hold at least ${minLength} finite number${minLength === 1 ? "" : "s"}, got ${arr.length}`);
    }
    for (let i = 0; i < arr.length; i++) {
        const v = arr[i];
        if (typeof v !== "number" || !Number.isFinite(v)) {
            throw new RangeError(`${fn}: ${name}[${i}] must be a finite number, got ${validate_describeValue(v)}`);
        }
    }
}
/** Throws unless `value` is a number strictly between 0 and 1 (a confidence level or a significance level). */
function checkOpenUnit(fn, name, value) {
    if (typeof value !== "number" || !(value > 0 && value < 1)) {
        throw new RangeError(`${fn}: ${name} must be a number strictly between 0 and 1, got ${validate_describeValue(value)}`);
    }
}
/** Throws unless `value` is one of `choices`. */
function validate_checkChoice(fn, name, value, choices) {
    if (typeof value !== "string" || !choices.includes(value)) {
        const list = choices.map((c) => JSON.stringify(c)).join(", ");
        throw new RangeError(`${fn}: ${name} must be one of ${list}, got ${validate_describeValue(value)}`);
    }
}
/** Throws unless `value` is an integer in [min, max]. */
function checkInteger(fn, name, value, min, max) {
    if (typeof value !== "number" || !Number.isInteger(value) || value < min || value > max) {
        throw new RangeError(`${fn}: ${name} must be an integer in [${min}, ${max}], got ${validate_describeValue(value)}`);
    }
}
/** Throws unless `value` is a finite number greater than zero. */
function checkPositive(fn, name, value) {
    if (typeof value !== "number" || !Number.isFinite(value) || !(value > 0)) {
        throw new RangeError(`${fn}: ${name} must be a finite number greater than 0, got ${validate_describeValue(value)}`);
    }
}
/** Returns `buffer` when it holds at least `length` values, else a larger Float64Array (growth by doubling). */
function validate_growFloat64(buffer, length) {
    if (buffer.length >= length)
        return buffer;
    return new Float64Array(Math.max(length, 2 * buffer.length));
}
/** Returns `buffer` when it holds at least `length` values, else a larger Int32Array (growth by doubling). */
function growInt32(buffer, length) {
    if (buffer.length >= length)
        return buffer;
    return new Int32Array(Math.max(length, 2 * buffer.length));
}

;// CONCATENATED MODULE: ./build/package/compare/stats/signed-ranks.js

let positives = new Float64Array(64);
let negatives = new Float64Array(64);
/**
 * Signed-rank sums of v_i = d_i − shift: zeros dropped, |v| ranked 1 … m with midranks for ties,
 * ranks summed by sign.
 *
 * Algorithm: split |v| by sign into two scratch arrays, sort each natively (Float64Array sort, no
 * comparator), then walk both in merged ascending order; each group of t equal |v| (from either side)
 * takes the midrank r + (t+1)/2. Equality is exact floating-point equality, as in the reference
 * libraries' rankdata. Midranks are multiples of ½, so the sums are exact.
 * Source of the procedure: Wilcoxon (1945), Biometrics Bulletin 1(6):80–83; midranks for ties as in
 * Hollander & Wolfe, Nonparametric Statistical Methods, 2nd ed. (1999), §3.1, comment on ties (from memory).
 *
 * Cost: O(n log n) time; no allocation after the scratch buffers have grown to n.
 * `out` is filled and returned so callers can reuse one object.
 */
function signedRankSums(d, shift, out) {
    const n = d.length;
    positives = validate_growFloat64(positives, n);
    negatives = validate_growFloat64(negatives, n);
    let np = 0;
    let nn = 0;
    let nZeros = 0;
    for (let i = 0; i < n; i++) {
        const v = d[i] - shift;
        if (v > 0)
            positives[np++] = v;
        else if (v < 0)
            negatives[nn++] = -v;
        else
            nZeros++;
    }
    const pos = positives.subarray(0, np).sort();
    const neg = negatives.subarray(0, nn).sort();
    let i = 0;
    let j = 0;
    let rank = 0;
    let wPlus = 0;
    let wMinus = 0;
    let tieTerm = 0;
    while (i < np || j < nn) {
        const v = j >= nn || (i < np && pos[i] <= neg[j]) ? pos[i] : neg[j];
        let cp = 0;
        let cn = 0;
        while (i < np && pos[i] === v) {
            i++;
            cp++;
        }
        while (j < nn && neg[j] === v) {
            j++;
            cn++;
        }
        const t = cp + cn;
        const mid = rank + (t + 1) / 2;
        wPlus += cp * mid;
        wMinus += cn * mid;
        if (t > 1)
            tieTerm += t * t * t - t;
        rank += t;
    }
    out.wPlus = wPlus;
    out.wMinus = wMinus;
    out.nUsed = np + nn;
    out.nZeros = nZeros;
    out.tieTerm = tieTerm;
    return out;
}

;// CONCATENATED MODULE: ./build/package/compare/stats/types.js
/**
 * Shared vocabulary of the statistics kernel.
 *
 * The kernel works on plain numbers: a paired sample `d` is an array of per-seed differences
 * (usually log ratios d_i = ln(candidate_i / baseline_i), see `pairedLogRatios`), two unpaired
 * samples are two arrays. Nothing here does I/O or keeps state beyond caches of exact null
 * distributions and reusable scratch buffers.
 */
/** The accepted values of {@link Alternative}, in the order error messages list them. */
const types_ALTERNATIVES = ["two-sided", "greater", "less"];
/** The accepted values of {@link RankMethod}. */
const types_RANK_METHODS = ["auto", "exact", "normal"];

;// CONCATENATED MODULE: ./build/package/compare/stats/wilcoxon.js





const sums = { wPlus: 0, wMinus: 0, nUsed: 0, nZeros: 0, tieTerm: 0 };
/**
 * Wilcoxon signed-rank test of H0 "the differences d are symmetric about 0" (e.g. the per-seed log
 * ratios of a candidate against its baseline).
 *
 * Source: Wilcoxon, "Individual comparisons by ranking methods", Biometrics Bulletin 1(6):80–83 (1945).
 * Procedure: drop zero differences (Wilcoxon's convention; scipy's default zero_method="wilcox"),
 * rank |d| (midranks for ties), W+ = Σ ranks of positive d.
 * - Exact: P-values from the exact null distribution of W+ (`signedRankCdf`, cached per n):
 *   greater P(W+ ≥ w+), less P(W+ ≤ w+), two-sided min(1, 2 P(W+ ≤ min(w+, w−))).
 *   Valid without ties; n ≤ 50.
 * - Normal: z = (T − n(n+1)/4 − c) / σ, σ² = [n(n+1)(2n+1) − ½ Σ(t³ − t)] / 24 (tie correction over
 *   groups of t tied ranks), c = continuity correction (two-sided ½·sign(T − mean), greater +½, less −½)
 *   when enabled; two-sided p = 2 Φ(−|z|). This reproduces scipy.stats.wilcoxon (scipy 1.10,
 *   mode="approx") term for term.
 * Differences from scipy 1.10, on purpose: scipy's mode="auto" counts zeros toward n ≤ 50 and switches to
 * the normal approximation whenever a zero is present; here zeros are dropped first and the exact
 * distribution of the remaining n is used (the same as scipy on d with its zeros removed). With no
 * nonzero difference at all (n = 0) the null distribution is the point W+ = 0 and every p-value is 1.
 *
 * Cost: O(n log n) (two native sorts), no allocation besides the result; the exact table costs
 * O(n³) once per n (see `signedRankCdf`).
 */
function wilcoxonSignedRank(d, options = {}) {
    const fn = "wilcoxonSignedRank";
    validate_checkSample(fn, "d", d, 1);
    return signedRankTestShifted(fn, d, 0, options);
}
/**
 * The test on d − shift (used by the equivalence test without copying d). Validates the options, not d.
 * Cost: as {@link wilcoxonSignedRank}.
 */
function signedRankTestShifted(fn, d, shift, options) {
    const alternative = options.alternative ?? "two-sided";
    const method = options.method ?? "auto";
    const continuity = options.continuity ?? false;
    validate_checkChoice(fn, "options.alternative", alternative, types_ALTERNATIVES);
    validate_checkChoice(fn, "options.method", method, types_RANK_METHODS);
    if (typeof continuity !== "boolean") {
        throw new TypeError(`${fn}: options.continuity must be true or false, got ${validate_describeValue(continuity)}`);
    }
    const s = signedRankSums(d, shift, sums);
    const n = s.nUsed;
    const ties = s.tieTerm > 0;
    const wPlus = s.wPlus;
    const wMinus = s.wMinus;
    const statistic = alternative === "two-sided" ? Math.min(wPlus, wMinus) : wPlus;
    const exactApplies = !ties && n <= SIGNED_RANK_EXACT_MAX_N;
    if (method === "exact" && !exactApplies) {
        const why = ties
            ? "some |d| are tied (midranks)"
            : `the exact distribution is tabulated for n ≤ ${SIGNED_RANK_EXACT_MAX_N} nonzero differences, got n = ${n}`;
        throw new RangeError(`${fn}: options.method "exact" does not apply: ${why}; use "auto" or "normal"`);
    }
    const base = { statistic, wPlus, wMinus, nUsed: n, nZeros: s.nZeros, ties, alternative };
    if (n === 0)
        return { ...base, pValue: 1, method: method === "normal" ? "normal" : "exact", z: NaN };
    if (method === "exact" || (method === "auto" && exactApplies)) {
        let pValue;
        if (alternative === "greater")
            pValue = signedRankUpperTail(n, wPlus);
        else if (alternative === "less")
            pValue = signedRankLowerTail(n, wPlus);
        else
            pValue = Math.min(1, 2 * signedRankLowerTail(n, statistic));
        return { ...base, pValue, method: "exact", z: NaN };
    }
    const mean = (n * (n + 1)) / 4;
    const sd = Math.sqrt((n * (n + 1) * (2 * n + 1) - 0.5 * s.tieTerm) / 24);
    let c = 0;
    if (continuity) {
        if (alternative === "two-sided")
            c = 0.5 * Math.sign(statistic - mean);
        else
            c = alternative === "less" ? -0.5 : 0.5;
    }
    const z = (statistic - mean - c) / sd;
    let pValue;
    if (alternative === "two-sided")
        pValue = Math.min(1, 2 * normal_cdf_normalSf(Math.abs(z)));
    else if (alternative === "greater")
        pValue = normal_cdf_normalSf(z);
    else
        pValue = normalCdf(z);
    return { ...base, pValue, method: "normal", z };
}

;// CONCATENATED MODULE: ./build/package/compare/stats/normal-quantile.js
/**
 * Standard normal quantile function Φ⁻¹(p): the z with P(Z ≤ z) = p.
 *
 * What for: critical values of normal approximations (Hodges–Lehmann interval for large n) and the
 * bias correction z0 and levels of the BCa bootstrap interval.
 *
 * Algorithm: Wichura, "Algorithm AS 241: The percentage points of the normal distribution",
 * Applied Statistics 37(3):477–484 (1988), routine PPND16: for |p − ½| ≤ 0.425 a degree-7/7 rational
 * function of r = 0.180625 − q², q = p − ½; otherwise r = √(−ln min(p, 1−p)) and one of two degree-7/7
 * rational functions of r − 1.6 (r ≤ 5) or r − 5 (r > 5). The published accuracy is about 1 part
 * in 10¹⁶. The coefficients below are the paper's; they were checked digit by digit against a
 * public Fortran transcription of PPND16 and the results against scipy.stats.norm.ppf (scipy 1.10.1)
 * in tests/compare/stats/normal.test.ts.
 *
 * p = 0 gives −∞, p = 1 gives +∞; anything outside [0, 1] or NaN throws.
 * Cost: O(1): at most one log, one sqrt, two degree-7 polynomials.
 */
/* eslint-disable no-loss-of-precision -- the coefficients keep the paper's 20 significant digits so they can be
   checked against it digit by digit; each rounds to the nearest double when parsed. */
function normalQuantile(p) {
    if (typeof p !== "number" || !(p >= 0 && p <= 1)) {
        throw new RangeError(`normalQuantile: p must be a probability in [0, 1], got ${String(p)}`);
    }
    if (p === 0)
        return -Infinity;
    if (p === 1)
        return Infinity;
    const q = p - 0.5;
    if (Math.abs(q) <= 0.425) {
        const r = 0.180625 - q * q;
        return ((q *
            (((((((2509.0809287301226727 * r + 33430.575583588128105) * r + 67265.770927008700853) * r +
                45921.953931549871457) *
                r +
                13731.693765509461125) *
                r +
                1971.5909503065514427) *
                r +
                133.14166789178437745) *
                r +
                3.387132872796366608)) /
            (((((((5226.495278852854561 * r + 28729.085735721942674) * r + 39307.89580009271061) * r +
                21213.794301586595867) *
                r +
                5394.1960214247511077) *
                r +
                687.1870074920579083) *
                r +
                42.313330701600911252) *
                r +
                1));
    }
    let r = q < 0 ? p : 1 - p;
    r = Math.sqrt(-Math.log(r));
    let z;
    if (r <= 5) {
        r -= 1.6;
        z =
            (((((((7.7454501427834140764e-4 * r + 0.0227238449892691845833) * r + 0.24178072517745061177) * r +
                1.27045825245236838258) *
                r +
                3.64784832476320460504) *
                r +
                5.7694972214606914055) *
                r +
                4.6303378461565452959) *
                r +
                1.42343711074968357734) /
                (((((((1.05075007164441684324e-9 * r + 5.475938084995344946e-4) * r + 0.0151986665636164571966) * r +
                    0.14810397642748007459) *
                    r +
                    0.68976733498510000455) *
                    r +
                    1.6763848301838038494) *
                    r +
                    2.05319162663775882187) *
                    r +
                    1);
    }
    else {
        r -= 5;
        z =
            (((((((2.01033439929228813265e-7 * r + 2.71155556874348757815e-5) * r + 0.0012426609473880784386) * r +
                0.026532189526576123093) *
                r +
                0.29656057182850489123) *
                r +
                1.7848265399172913358) *
                r +
                5.4637849111641143699) *
                r +
                6.6579046435011037772) /
                (((((((2.04426310338993978564e-15 * r + 1.4215117583164458887e-7) * r + 1.8463183175100546818e-5) * r +
                    7.868691311456132591e-4) *
                    r +
                    0.0148753612908506148525) *
                    r +
                    0.13692988092273580531) *
                    r +
                    0.59983220655588793769) *
                    r +
                    1);
    }
    return q < 0 ? -z : z;
}
/* eslint-enable no-loss-of-precision */

;// CONCATENATED MODULE: ./build/package/compare/stats/select.js
/**
 * In-place selection: rearranges a[lo..hi] (inclusive) so that a[k] is the value that would be there
 * if a[lo..hi] were sorted, everything in a[lo..k−1] is ≤ a[k] and everything in a[k+1..hi] is ≥ a[k].
 *
 * What for: order statistics (medians, Walsh-average order statistics, bootstrap quantiles) in O(n)
 * without sorting and without allocating.
 *
 * Algorithm: Hoare's FIND (C. A. R. Hoare, "Algorithm 65: Find", Communications of the ACM 4(7):321–322,
 * 1961) with a median-of-three pivot and iterative narrowing to the side that holds k.
 * Several order statistics k1 < k2 < … are obtained by selecting k1 in [lo, hi], then k2 in
 * [k1 + 1, hi], and so on (each call leaves the ranges it did not touch partitioned).
 * Values must not be NaN.
 *
 * Cost: O(hi − lo) expected comparisons (≈ 2–3.4 (hi − lo)), O(1) memory.
 */
function selectInPlace(a, lo, hi, k) {
    let left = lo;
    let right = hi;
    while (right > left) {
        const mid = (left + right) >>> 1;
        // median of three → a[mid], with a[left] ≤ a[mid] ≤ a[right]
        if (a[mid] < a[left])
            swap(a, mid, left);
        if (a[right] < a[left])
            swap(a, right, left);
        if (a[right] < a[mid])
            swap(a, right, mid);
        const pivot = a[mid];
        let i = left;
        let j = right;
        while (i <= j) {
            while (a[i] < pivot)
                i++;
            while (a[j] > pivot)
                j--;
            if (i <= j) {
                swap(a, i, j);
                i++;
                j--;
            }
        }
        // now a[left..j] ≤ pivot ≤ a[i..right], and j < i
        if (k <= j)
            right = j;
        else if (k >= i)
            left = i;
        else
            return a[k];
    }
    return a[k];
}
function swap(a, i, j) {
    const t = a[i];
    a[i] = a[j];
    a[j] = t;
}
/**
 * Linear-interpolation quantile of a[0..n−1] at probability q (the default "linear" definition of
 * numpy.percentile, Hyndman & Fan 1996 type 7: h = (n−1) q, value = x_(⌊h⌋) + (h − ⌊h⌋)(x_(⌊h⌋+1) − x_(⌊h⌋)),
 * x sorted ascending). Rearranges `a[0..n−1]` in place.
 * Source: Hyndman & Fan, "Sample quantiles in statistical packages", The American Statistician
 * 50(4):361–365 (1996). Cost: O(n) expected.
 */
function quantileInPlace(a, n, q) {
    const h = (n - 1) * q;
    const k = Math.floor(h);
    const lowValue = selectInPlace(a, 0, n - 1, k);
    const frac = h - k;
    if (frac === 0 || k + 1 >= n)
        return lowValue;
    let next = a[k + 1];
    for (let i = k + 2; i < n; i++)
        if (a[i] < next)
            next = a[i];
    return lowValue + frac * (next - lowValue);
}

;// CONCATENATED MODULE: ./build/package/compare/stats/hodges-lehmann.js






let walsh = new Float64Array(1024);
/**
 * Hodges–Lehmann one-sample estimate of the location (centre of symmetry) of d, with Tukey's
 * distribution-free confidence interval.
 *
 * What for: the drift of a case: on log ratios d_i = ln(candidate_i / baseline_i), exp(estimate) is
 * the typical ratio and [exp(lower), exp(upper)] its confidence interval.
 *
 * Estimate: the median of the M = n(n+1)/2 Walsh averages (d_i + d_j)/2, i ≤ j (the mean of the two
 * middle ones when M is even). Source: Hodges & Lehmann, "Estimates of location based on rank tests",
 * Ann. Math. Statist. 34(2):598–611 (1963). All n observations are used, zeros included.
 * Interval: [W_(C), W_(M+1−C)], the order statistics of the Walsh averages, where C is the largest
 * integer with P(W+ ≤ C − 1) ≤ (1 − level)/2 under the signed-rank null distribution; this is the
 * set of shifts θ not rejected by the two-sided Wilcoxon test on d − θ, because the number of Walsh
 * averages above θ equals W+ of d − θ. Source: Hollander & Wolfe, Nonparametric Statistical Methods,
 * 2nd ed. (1999), §3.3 "A distribution-free confidence interval based on Wilcoxon's signed rank
 * test (Tukey)" (section number from memory); Bauer, "Constructing confidence sets using rank
 * statistics", JASA 67(339):687–690 (1972).
 * - exact (n ≤ 50): C from the exact table `signedRankCdf(n)`.
 * - normal (n > 50): C = ⌊M/2 + ½ − z_{(1+level)/2} σ⌋, σ² = n(n+1)(2n+1)/24 (the normal approximation
 *   with continuity correction of P(W+ ≤ C − 1) ≤ α/2, solved for C; recomputed here).
 * When even C = 1 misses the level (n ≤ 5 at 95%) the interval is (−∞, +∞) with achievedLevel 1.
 *
 * Cost: O(n²) time to form the Walsh averages plus O(n²) expected for four quickselects on a reused
 * scratch buffer (≈ 10 µs for n = 30); no allocation besides the result once the buffer has grown.
 */
function hodgesLehmann(d, options = {}) {
    const fn = "hodgesLehmann";
    validate_checkSample(fn, "d", d, 1);
    const level = options.level ?? 0.95;
    const method = options.method ?? "auto";
    checkOpenUnit(fn, "options.level", level);
    validate_checkChoice(fn, "options.method", method, types_RANK_METHODS);
    const n = d.length;
    if (method === "exact" && n > SIGNED_RANK_EXACT_MAX_N) {
        throw new RangeError(`${fn}: options.method "exact" needs n ≤ ${SIGNED_RANK_EXACT_MAX_N}, got n = ${n}; use "auto" or "normal"`);
    }
    const m = (n * (n + 1)) / 2;
    walsh = validate_growFloat64(walsh, m);
    const w = walsh;
    let k = 0;
    for (let i = 0; i < n; i++) {
        const di = d[i];
        for (let j = i; j < n; j++)
            w[k++] = 0.5 * (di + d[j]);
    }
    const alphaHalf = (1 - level) / 2;
    const useExact = method === "exact" || (method === "auto" && n <= SIGNED_RANK_EXACT_MAX_N);
    let c;
    let achievedLevel;
    if (useExact) {
        const cdf = signedRankCdf(n);
        c = 0;
        while (c < cdf.length && cdf[c] <= alphaHalf)
            c++;
        achievedLevel = c === 0 ? 1 : 1 - 2 * cdf[c - 1];
    }
    else {
        const sigma = Math.sqrt((n * (n + 1) * (2 * n + 1)) / 24);
        c = Math.max(0, Math.floor(m / 2 + 0.5 - normalQuantile(1 - alphaHalf) * sigma));
        achievedLevel = c === 0 ? 1 : 1 - 2 * normalCdfApprox(c, m, sigma);
    }
    // Order statistics needed, as 0-based positions in ascending order: C−1, the middle one(s), M−C.
    const midLo = (m - 1) >> 1;
    const midHi = m >> 1;
    let lower = -Infinity;
    let upper = Infinity;
    let from = 0;
    if (c > 0) {
        lower = selectInPlace(w, 0, m - 1, c - 1);
        from = c;
    }
    const a = midLo >= from ? selectInPlace(w, from, m - 1, midLo) : lower;
    from = Math.max(from, midLo + 1);
    const b = midHi === midLo ? a : selectInPlace(w, from, m - 1, midHi);
    from = Math.max(from, midHi + 1);
    if (c > 0)
        upper = m - c === midHi ? b : selectInPlace(w, from, m - 1, m - c);
    return {
        estimate: midHi === midLo ? a : 0.5 * (a + b),
        lower,
        upper,
        level,
        achievedLevel,
        method: useExact ? "exact" : "normal",
        n,
        walshCount: m,
        lowerRank: c,
        upperRank: m + 1 - c,
    };
}
/** Normal approximation (with continuity correction) of P(W+ ≤ C − 1), mean M/2, sd σ. */
function normalCdfApprox(c, m, sigma) {
    return normalCdf((c - 1 + 0.5 - m / 2) / sigma);
}

;// CONCATENATED MODULE: ./build/package/compare/stats/draw-counts.js
/**
 * Multiplicities of `draws` indices drawn uniformly with replacement from {0, …, n−1}: adds 1 to
 * counts[v] per draw (the caller zeroes `counts` first). This is one bootstrap resample of a sample
 * of size n, as counts.
 *
 * What for: the inner loop of `bootstrapInterval`; calling `rng.nextBelow(n)` per index costs one
 * 32-bit output per index, this uses a fraction of one.
 * Algorithm: with k = ⌈log₂ n⌉ bits per index, each 32-bit output of `rng.nextU32()` is cut into
 * ⌊32/k⌋ chunks of k bits (low bits first); a chunk v < n is accepted as an index and a chunk v ≥ n is
 * rejected. Each accepted chunk is exactly uniform on {0, …, n−1} (rejection sampling of uniform
 * integers from fair bits; e.g. Knuth, The Art of Computer Programming vol. 2, 3rd ed. (1997),
 * §3.4.1, from memory), and PCG32's 32 output bits are all full-quality (O'Neill 2014, HMC-CS-2014-0905).
 * For n = 30: k = 5, six chunks per output, acceptance 30/32, ≈ 5.3 outputs per resample instead of 30.
 * For n > 2¹⁶ it falls back to `rng.nextBelow(n)` per index. Deterministic for a given generator state.
 *
 * Cost: ≈ draws · 2^k / (n ⌊32/k⌋) generator outputs (≤ 2 · draws · k / 32 + 1), O(1) memory.
 */
function drawCounts(rng, n, draws, counts) {
    if (n === 1) {
        counts[0] += draws;
        return;
    }
    if (n > 65536) {
        for (let d = 0; d < draws; d++)
            counts[rng.nextBelow(n)]++;
        return;
    }
    const k = 32 - Math.clz32(n - 1); // ⌈log₂ n⌉ for n ≥ 2
    const mask = (1 << k) - 1;
    const perWord = Math.floor(32 / k);
    let left = draws;
    while (left > 0) {
        let u = rng.nextU32();
        for (let c = 0; c < perWord; c++) {
            const v = u & mask;
            u >>>= k;
            if (v < n) {
                counts[v]++;
                if (--left === 0)
                    return;
            }
        }
    }
}

;// CONCATENATED MODULE: ./build/package/compare/stats/resample-statistics.js
/**
 * Mean of a resample, Σ counts[i] x_i / size.
 * Cost: O(n) per evaluation, no allocation.
 */
const resampleMean = (sorted) => ({
    evaluate(counts, size) {
        let s = 0;
        for (let i = 0; i < sorted.length; i++)
            s += counts[i] * sorted[i];
        return s / size;
    },
});
/**
 * Median of a resample (mean of the two middle values for an even size), by walking the sorted
 * sample with cumulative counts to the ranks ⌈size/2⌉ and ⌊size/2⌋ + 1.
 * Cost: O(n) per evaluation (≈ n/2 steps), no allocation.
 */
const resampleMedian = (sorted) => ({
    evaluate(counts, size) {
        const r1 = (size + 1) >> 1; // 1-based rank of the lower middle value
        const r2 = (size >> 1) + 1; // 1-based rank of the upper middle value (= r1 for odd size)
        let cum = 0;
        let i = 0;
        while (cum + counts[i] < r1)
            cum += counts[i++];
        const a = sorted[i];
        if (r2 === r1 || cum + counts[i] >= r2)
            return a;
        cum += counts[i++];
        while (counts[i] === 0)
            i++;
        return 0.5 * (a + sorted[i]);
    },
});
/**
 * Hodges–Lehmann estimate (median of the Walsh averages) of a resample, exactly as `hodgesLehmann`
 * would compute it on the materialized resample, at a fraction of the cost.
 *
 * Derivation (recomputed here, not taken from a source): the Walsh averages of a resample with
 * multiplicities c are the pairwise averages (x_i + x_j)/2, i ≤ j, of the original sample, pair (i, j)
 * occurring c_i c_j times for i < j and c_i (c_i + 1)/2 times for i = j (total size(size+1)/2). So
 * the resample's estimate is a weighted median of the original Walsh averages, which are sorted
 * once. The weighted median is found by walking the sorted list from the position of the
 * full-sample estimate t0; the weight strictly below t0 is computed in O(n) from the staircase
 * J_i = first j ≥ i with (x_i + x_j)/2 ≥ t0 (monotone because x is sorted) and prefix sums of c:
 *   W(<t0) = Σ_{i: J_i > i} c_i ((c_i + 1)/2 + Σ_{i<j<J_i} c_j).
 * Bootstrap estimates fall close to t0, so the walk is short (≈ the bootstrap standard error in
 * Walsh ranks: tens of steps for n = 30 instead of ≈ 230 for a walk from the start).
 * Hodges & Lehmann, Ann. Math. Statist. 34(2):598–611 (1963) for the estimator.
 *
 * Cost: O(n² log n) once (`mergeWalshRows`, ≈ 10 µs for n = 30), then O(n + walk) per evaluation
 * with no allocation (≈ 0.15–0.25 µs for n = 30, see scripts/bench-stats.ts). Memory ≈ 16 bytes per
 * Walsh average.
 */
const resampleHodgesLehmann = (sorted) => {
    const n = sorted.length;
    const m = (n * (n + 1)) / 2;
    // Sorted Walsh averages and, per entry, two indices into `ext` (below) whose product is its weight:
    // (i, j) for i < j, and (i, n + i) for the diagonal, since ext[n + i] = (c_i + 1)/2.
    const value = new Float64Array(m);
    const pa = new Int32Array(m);
    const pb = new Int32Array(m);
    mergeWalshRows(sorted, value, pa, pb);
    const t0 = m % 2 === 1 ? value[(m - 1) / 2] : 0.5 * (value[m / 2 - 1] + value[m / 2]);
    let start = 0; // number of Walsh averages < t0
    while (start < m && value[start] < t0)
        start++;
    // Staircase: pairs (i, j), i ≤ j, with (x_i + x_j)/2 < t0 are exactly i < diagEnd, i ≤ j < stair[i].
    const stair = new Int32Array(n);
    let diagEnd = 0;
    let total = 0;
    let j = n;
    for (let i = 0; i < n; i++) {
        while (j > 0 && 0.5 * (sorted[i] + sorted[j - 1]) >= t0)
            j--;
        stair[i] = Math.max(i, j);
        if (stair[i] > i)
            diagEnd = i + 1;
        total += stair[i] - i;
    }
    if (total !== start) {
        throw new Error(`resampleHodgesLehmann: internal staircase count ${total} differs from ${start}`);
    }
    const prefix = new Float64Array(n + 1);
    const ext = new Float64Array(2 * n);
    return {
        evaluate(counts, size) {
            let run = 0;
            for (let i = 0; i < n; i++) {
                const c = counts[i];
                ext[i] = c;
                ext[n + i] = 0.5 * (c + 1);
                run += c;
                prefix[i + 1] = run;
            }
            let below = 0;
            for (let i = 0; i < diagEnd; i++)
                below += ext[i] * (ext[n + i] + prefix[stair[i]] - prefix[i + 1]);
            const tw = (size * (size + 1)) / 2;
            const r1 = Math.floor((tw + 1) / 2);
            const r2 = Math.floor(tw / 2) + 1;
            // locate the entry q holding rank r1: cum(q − 1) < r1 ≤ cum(q)
            let q;
            let cum = below;
            if (below < r1) {
                q = start - 1;
                while (cum < r1) {
                    q++;
                    cum += ext[pa[q]] * ext[pb[q]];
                }
            }
            else {
                q = start;
                for (;;) {
                    const w = ext[pa[q - 1]] * ext[pb[q - 1]];
                    if (cum - w < r1)
                        break;
                    cum -= w;
                    q--;
                }
                q--;
            }
            const a = value[q];
            if (r2 === r1 || cum >= r2)
                return a;
            do
                q++;
            while (ext[pa[q]] * ext[pb[q]] === 0);
            return 0.5 * (a + value[q]);
        },
    };
};
/**
 * Writes the n(n+1)/2 Walsh averages (x_i + x_j)/2, i ≤ j, of a sorted sample in ascending order into
 * `value`, with the pair of each in (pa, pb) as used by `resampleHodgesLehmann` (pb = n + i on the
 * diagonal). Row i, (x_i + x_j)/2 for j = i … n−1, is already ascending, so the n rows are merged with
 * a binary min-heap of rows keyed by (current head value, row) (Williams, "Algorithm 232: Heapsort",
 * CACM 7(6):347–348, 1964, for the heap). Ties are broken by row, so the order is deterministic.
 * Cost: O(n² log n) comparisons (≈ 9 µs for n = 30, as fast as a native sort of the bare values);
 * allocates three arrays of n.
 */
function mergeWalshRows(x, value, pa, pb) {
    const n = x.length;
    const heap = new Int32Array(n); // rows, heap-ordered by headLess
    const next = new Int32Array(n); // column j of each row's head
    const head = new Float64Array(n); // each row's head value (x_row + x_next)/2
    for (let i = 0; i < n; i++) {
        heap[i] = i;
        next[i] = i;
        head[i] = x[i];
    }
    let size = n;
    for (let pos = (size >> 1) - 1; pos >= 0; pos--)
        siftDown(heap, head, size, pos, heap[pos]);
    let q = 0;
    while (size > 0) {
        const top = heap[0];
        const col = next[top];
        value[q] = head[top];
        pa[q] = top;
        pb[q] = top === col ? n + top : col;
        q++;
        let row = top;
        if (col + 1 < n) {
            next[top] = col + 1;
            head[top] = 0.5 * (x[top] + x[col + 1]);
        }
        else {
            size--;
            if (size === 0)
                break;
            row = heap[size];
        }
        siftDown(heap, head, size, 0, row);
    }
}
/** Heap order of rows: smaller head first, then smaller row index. */
function headLess(head, r, s) {
    return head[r] < head[s] || (head[r] === head[s] && r < s);
}
/** Places `row` at heap position `pos` and sifts it down (heap[0..size−1]). */
function siftDown(heap, head, size, pos, row) {
    for (;;) {
        let child = 2 * pos + 1;
        if (child >= size)
            break;
        if (child + 1 < size && headLess(head, heap[child + 1], heap[child]))
            child++;
        if (!headLess(head, heap[child], row))
            break;
        heap[pos] = heap[child];
        pos = child;
    }
    heap[pos] = row;
}

;// CONCATENATED MODULE: ./build/package/compare/stats/bootstrap.js






const STATISTICS = {
    "hodges-lehmann": resampleHodgesLehmann,
    median: resampleMedian,
    mean: resampleMean,
};
const STATISTIC_NAMES = Object.keys(STATISTICS);
const METHODS = ["bca", "percentile"];
/** Largest number of resamples accepted (keeps a mistyped option from hanging a gate). */
const BOOTSTRAP_MAX_RESAMPLES = 10_000_000;
let sortedBuf = new Float64Array(64);
let countsBuf = new Int32Array(64);
let replicatesBuf = new Float64Array(1024);
let jackBuf = new Float64Array(64);
/**
 * Seeded bootstrap confidence interval for a statistic of one paired sample d (e.g. the HL shift or
 * the median of per-seed log ratios).
 *
 * Sources: Efron, "Bootstrap methods: another look at the jackknife", Ann. Statist. 7(1):1–26 (1979)
 * (resampling, percentile interval); Efron, "Better bootstrap confidence intervals", JASA
 * 82(397):171–185 (1987) (BCa); Efron & Tibshirani, An Introduction to the Bootstrap (1993), §14.3
 * (z0 and the jackknife acceleration; section from memory).
 * Algorithm:
 * 1. Sort d once (so the result depends on the multiset of d only, not on its order).
 * 2. B times: draw n indices uniformly with replacement into a reused count vector (`drawCounts`:
 *    k-bit chunks of `rng.nextU32()` with rejection, so several indices per generator output) and
 *    evaluate the statistic on the counts (see `resample-statistics.ts`; nothing is copied).
 * 3. percentile: the (1 ∓ level)/2 quantiles of the B values; BCa: z0 = Φ⁻¹(p0) with
 *    p0 = (#{θ*_b < θ̂} + #{θ*_b ≤ θ̂}) / (2B) (ties at θ̂ count half, as scipy.stats.bootstrap 1.10
 *    does), a = Σ(θ̄ − θ_(i))³ / (6 [Σ(θ̄ − θ_(i))²]^{3/2}) from the n leave-one-out values θ_(i)
 *    (0 when all θ_(i) are equal), levels α_{1,2} = Φ(z0 + (z0 + z)/(1 − a(z0 + z))) with z = Φ⁻¹((1 ∓ level)/2).
 *    Quantiles use linear interpolation (numpy.percentile's default; Hyndman & Fan 1996 type 7).
 * Deterministic: the same generator state, sample multiset and options give the same interval
 * bit for bit.
 *
 * Cost: O(n) draws and one statistic evaluation per resample, O(B) selection for the quantiles, O(n)
 * extra evaluations for BCa's jackknife. Measured for n = 30, B = 1000 (scripts/bench-stats.ts):
 * ≈ 0.2 ms with "median" or "mean", ≈ 0.5 ms with "hodges-lehmann" (whose Walsh table is built once per
 * call). When the budget is tight, note that `hodgesLehmann` already gives an exact distribution-free
 * interval for the HL shift without resampling, and bootstrapping the median costs ≈ 40% of HL.
 * No allocation per resample: counts and replicates live in module-level typed arrays reused across
 * calls.
 */
function bootstrapInterval(d, options) {
    const fn = "bootstrapInterval";
    validate_checkSample(fn, "d", d, 2);
    if (options === null || typeof options !== "object") {
        throw new TypeError(`${fn}: options must be an object with at least { rng }, got ${validate_describeValue(options)}`);
    }
    const rng = options.rng;
    if (rng === null || typeof rng !== "object" || typeof rng.nextBelow !== "function") {
        throw new TypeError(`${fn}: options.rng must be a Pcg32 generator, got ${validate_describeValue(rng)}`);
    }
    const statisticOption = options.statistic ?? "hodges-lehmann";
    let factory;
    if (typeof statisticOption === "function")
        factory = statisticOption;
    else {
        validate_checkChoice(fn, "options.statistic", statisticOption, STATISTIC_NAMES);
        factory = STATISTICS[statisticOption];
    }
    const resamples = options.resamples ?? 1000;
    checkInteger(fn, "options.resamples", resamples, 1, BOOTSTRAP_MAX_RESAMPLES);
    const level = options.level ?? 0.95;
    checkOpenUnit(fn, "options.level", level);
    const method = options.method ?? "bca";
    validate_checkChoice(fn, "options.method", method, METHODS);
    const n = d.length;
    sortedBuf = validate_growFloat64(sortedBuf, n);
    const sorted = sortedBuf.subarray(0, n);
    for (let i = 0; i < n; i++)
        sorted[i] = d[i];
    sorted.sort();
    const statistic = factory(sorted);
    countsBuf = growInt32(countsBuf, n);
    const counts = countsBuf.subarray(0, n);
    counts.fill(1);
    const estimate = statistic.evaluate(counts, n);
    replicatesBuf = validate_growFloat64(replicatesBuf, resamples);
    const reps = replicatesBuf;
    for (let b = 0; b < resamples; b++) {
        counts.fill(0);
        drawCounts(rng, n, n, counts);
        reps[b] = statistic.evaluate(counts, n);
    }
    const alpha = 1 - level;
    let lowerLevel = alpha / 2;
    let upperLevel = 1 - alpha / 2;
    let biasCorrection = NaN;
    let acceleration = NaN;
    let valid = true;
    if (method === "bca") {
        jackBuf = validate_growFloat64(jackBuf, n);
        counts.fill(1);
        for (let i = 0; i < n; i++) {
            counts[i] = 0;
            jackBuf[i] = statistic.evaluate(counts, n - 1);
            counts[i] = 1;
        }
        const levels = bcaLevels(reps.subarray(0, resamples), estimate, jackBuf.subarray(0, n), level);
        lowerLevel = levels.lowerLevel;
        upperLevel = levels.upperLevel;
        biasCorrection = levels.biasCorrection;
        acceleration = levels.acceleration;
        valid = levels.valid;
    }
    let lower = NaN;
    let upper = NaN;
    if (valid) {
        lower = quantileInPlace(reps, resamples, lowerLevel);
        upper = quantileInPlace(reps, resamples, upperLevel);
    }
    return {
        estimate,
        lower,
        upper,
        level,
        method,
        resamples,
        lowerLevel,
        upperLevel,
        biasCorrection,
        acceleration,
        valid,
    };
}
/**
 * Bias-corrected and accelerated (BCa) percentile levels from bootstrap replicates, the full-sample
 * estimate and the leave-one-out (jackknife) estimates.
 * Formulas (Efron 1987, JASA 82:171–185; Efron & Tibshirani 1993, §14.3, section from memory):
 *   z0 = Φ⁻¹(p0), p0 = (#{θ*_b < θ̂} + #{θ*_b ≤ θ̂}) / (2B),
 *   a  = Σ(θ̄ − θ_(i))³ / (6 [Σ(θ̄ − θ_(i))²]^{3/2}), θ̄ = mean of θ_(i) (a = 0 when the θ_(i) are all equal),
 *   α1 = Φ(z0 + (z0 + z_{α/2})/(1 − a(z0 + z_{α/2}))),  α2 = the same with z_{1−α/2}.
 * `valid` is false (levels NaN) when p0 ∈ {0, 1} or a denominator 1 − a(z0 + z) is ≤ 0.
 * Cost: O(B + n).
 */
function bcaLevels(replicates, estimate, jackknife, level) {
    const b = replicates.length;
    let less = 0;
    let lessOrEqual = 0;
    for (let i = 0; i < b; i++) {
        const v = replicates[i];
        if (v < estimate)
            less++;
        if (v <= estimate)
            lessOrEqual++;
    }
    const p0 = (less + lessOrEqual) / (2 * b);
    const biasCorrection = normalQuantile(p0);
    const n = jackknife.length;
    let mean = 0;
    for (let i = 0; i < n; i++)
        mean += jackknife[i];
    mean /= n;
    let s2 = 0;
    let s3 = 0;
    for (let i = 0; i < n; i++) {
        const u = mean - jackknife[i];
        s2 += u * u;
        s3 += u * u * u;
    }
    const acceleration = s2 === 0 ? 0 : s3 / (6 * Math.pow(s2, 1.5));
    const alpha = 1 - level;
    const zLow = normalQuantile(alpha / 2);
    const zHigh = -zLow;
    const nLow = biasCorrection + zLow;
    const nHigh = biasCorrection + zHigh;
    const dLow = 1 - acceleration * nLow;
    const dHigh = 1 - acceleration * nHigh;
    if (!Number.isFinite(biasCorrection) || !(dLow > 0) || !(dHigh > 0)) {
        return { biasCorrection, acceleration, lowerLevel: NaN, upperLevel: NaN, valid: false };
    }
    return {
        biasCorrection,
        acceleration,
        lowerLevel: normalCdf(biasCorrection + nLow / dLow),
        upperLevel: normalCdf(biasCorrection + nHigh / dHigh),
        valid: true,
    };
}

;// CONCATENATED MODULE: ./build/package/compare/stats/equivalence.js


/**
 * Nonparametric equivalence test: two one-sided Wilcoxon signed-rank tests (TOST) of the location
 * of d against the margin ±δ (on log ratios, δ = ln(1 + tolerated relative change)).
 *
 * What for: to call a candidate "equivalent" to its baseline a change must be shown to stay inside
 * the practical margin, not merely fail to be significant.
 * Procedure: Schuirmann, "A comparison of the two one-sided tests procedure and the power approach
 * for assessing the equivalence of average bioavailability", J. Pharmacokinet. Biopharm.
 * 15(6):657–680 (1987), with each one-sided t-test replaced by a Wilcoxon signed-rank test
 * (Wilcoxon 1945): pLower = P-value of "greater" on d + δ (H0: θ ≤ −δ), pUpper = P-value of "less" on
 * d − δ (H0: θ ≥ δ); the TOST p-value is max(pLower, pUpper). Differences equal to ∓δ exactly are
 * zeros of the shifted samples and are dropped (Wilcoxon's convention). The shifted samples are
 * never copied.
 *
 * Cost: two signed-rank tests, O(n log n); no allocation besides the results.
 */
function equivalenceSignedRank(d, margin, options = {}) {
    const fn = "equivalenceSignedRank";
    validate_checkSample(fn, "d", d, 1);
    checkPositive(fn, "margin", margin);
    const method = options.method;
    const continuity = options.continuity;
    const lowerTest = signedRankTestShifted(fn, d, -margin, { alternative: "greater", method, continuity });
    const upperTest = signedRankTestShifted(fn, d, margin, { alternative: "less", method, continuity });
    return {
        margin,
        pLower: lowerTest.pValue,
        pUpper: upperTest.pValue,
        pValue: Math.max(lowerTest.pValue, upperTest.pValue),
        lowerTest,
        upperTest,
    };
}

;// CONCATENATED MODULE: ./build/package/compare/stats/p-order.js

/**
 * Validates a list of p-values (each in [0, 1]) and returns the permutation that sorts them ascending,
 * ties kept in input order (so the adjustment is deterministic).
 * Cost: O(m log m) time, one Uint32Array of m.
 */
function sortedPValueOrder(fn, p) {
    validate_checkSample(fn, "p", p, 0);
    const m = p.length;
    for (let i = 0; i < m; i++) {
        if (!(p[i] >= 0 && p[i] <= 1)) {
            throw new RangeError(`${fn}: p[${i}] must be a probability in [0, 1], got ${String(p[i])}`);
        }
    }
    const order = new Uint32Array(m);
    for (let i = 0; i < m; i++)
        order[i] = i;
    order.sort((a, b) => p[a] - p[b] || a - b);
    return order;
}

;// CONCATENATED MODULE: ./build/package/compare/stats/holm.js

/**
 * Holm step-down adjusted p-values, in the order of the input.
 *
 * What for: family-wise error control across the cases of a suite (no case fails the gate by chance
 * with probability above α, whatever the dependence between cases).
 * Formula: with p_(1) ≤ … ≤ p_(m), adj_(k) = max_{j ≤ k} min(1, (m − j + 1) p_(j)); reject H_(k) at level α
 * iff adj_(k) ≤ α. Source: Holm, "A simple sequentially rejective multiple test procedure",
 * Scandinavian Journal of Statistics 6(2):65–70 (1979); the adjusted-p form is Wright, "Adjusted
 * P-values for simultaneous inference", Biometrics 48(4):1005–1013 (1992).
 * Monotone in p, capped at 1. An empty input gives an empty output.
 *
 * Cost: O(m log m) (one sort of indices), one Float64Array of m for the result.
 */
function holmAdjust(p) {
    const order = sortedPValueOrder("holmAdjust", p);
    const m = order.length;
    const out = new Float64Array(m);
    let running = 0;
    for (let k = 0; k < m; k++) {
        const i = order[k];
        running = Math.max(running, Math.min(1, (m - k) * p[i]));
        out[i] = running;
    }
    return out;
}

;// CONCATENATED MODULE: ./build/package/compare/stats/benjamini-hochberg.js

/**
 * Benjamini–Hochberg step-up adjusted p-values ("q-values" of the linear step-up procedure), in the
 * order of the input.
 *
 * What for: false-discovery-rate control across many cases when a few expected regressions should
 * not be masked by a family-wise correction.
 * Formula: with p_(1) ≤ … ≤ p_(m), adj_(k) = min_{j ≥ k} min(1, m p_(j) / j); rejecting every H with
 * adj ≤ q is the procedure of Benjamini & Hochberg, "Controlling the false discovery rate: a
 * practical and powerful approach to multiple testing", JRSS B 57(1):289–300 (1995), which controls
 * the FDR at q for independent (and positively dependent) tests. The adjusted-p form is as in
 * Wright (1992), Biometrics 48:1005–1013. Monotone in p, capped at 1.
 *
 * Cost: O(m log m) (one sort of indices), one Float64Array of m for the result.
 */
function benjaminiHochbergAdjust(p) {
    const order = sortedPValueOrder("benjaminiHochbergAdjust", p);
    const m = order.length;
    const out = new Float64Array(m);
    let running = 1;
    for (let k = m - 1; k >= 0; k--) {
        const i = order[k];
        running = Math.min(running, (m * p[i]) / (k + 1));
        out[i] = running;
    }
    return out;
}

;// CONCATENATED MODULE: ./build/package/compare/stats/mann-whitney-distribution.js
/** Largest n1 + n2 for which the exact null distribution is computed (counts ≤ C(50, 25) < 2^53 stay exact). */
const mann_whitney_distribution_MANN_WHITNEY_EXACT_MAX_TOTAL = 50;
const mann_whitney_distribution_cache = new Map();
/**
 * Exact null distribution of the Mann–Whitney statistic U (number of pairs (x_i, y_j) with x_i > y_j)
 * for samples of sizes n1, n2 without ties, as cumulative probabilities cdf[u] = P(U ≤ u), u = 0 … n1·n2.
 *
 * What for: exact p-values of `mannWhitneyU` for small unpaired samples.
 * Algorithm: under H0 all C(n1+n2, n1) arrangements are equally likely (Mann & Whitney, "On a test of
 * whether one of two random variables is stochastically larger than the other", Ann. Math. Statist.
 * 18(1):50–60, 1947). The number of arrangements with U = u is the coefficient of q^u in the Gaussian
 * binomial coefficient [n1+n2 choose m]_q = Π_{i=1..m} (1 − q^{n+i}) / (1 − q^i), m = min(n1, n2),
 * n = max(n1, n2) (the generating function of partitions in an m × n box; Andrews, The Theory of
 * Partitions (1976), ch. 3, from memory). It is built factor by factor: multiply by (1 − q^{n+i})
 * (c[k] −= c[k−n−i], descending k), then divide by (1 − q^i) (c[k] += c[k−i], ascending k, up to the
 * quotient's degree; the i coefficients above it divide out exactly and are cleared). After each
 * step the polynomial is a Gaussian binomial with integer coefficients ≤ C(n1+n2, n1) ≤ C(50, 25) < 2⁵³,
 * so every count is exact; probabilities are counts / C(n1+n2, n1) (one rounding).
 * Cached per unordered pair {n1, n2}; callers must not modify the returned array.
 *
 * Cost: O(m² n) additions on first use (≈ 16,000 for n1 = n2 = 25), memory n1·n2 + 1 doubles per pair.
 */
function mann_whitney_distribution_mannWhitneyCdf(n1, n2) {
    for (const [name, v] of [
        ["n1", n1],
        ["n2", n2],
    ]) {
        if (!Number.isInteger(v) || v < 1) {
            throw new RangeError(`mannWhitneyCdf: ${name} must be an integer ≥ 1, got ${String(v)}`);
        }
    }
    if (n1 + n2 > mann_whitney_distribution_MANN_WHITNEY_EXACT_MAX_TOTAL) {
        throw new RangeError(`mannWhitneyCdf: n1 + n2 must be ≤ ${mann_whitney_distribution_MANN_WHITNEY_EXACT_MAX_TOTAL} for the exact distribution, got ${n1} + ${n2}`);
    }
    const m = Math.min(n1, n2);
    const n = Math.max(n1, n2);
    const key = m * 64 + n;
    const hit = mann_whitney_distribution_cache.get(key);
    if (hit !== undefined)
        return hit;
    const top = m * n;
    const c = new Float64Array(top + 1);
    c[0] = 1;
    let deg = 0;
    for (let i = 1; i <= m; i++) {
        const s = n + i;
        const grown = deg + s;
        for (let k = grown; k >= s; k--)
            c[k] -= c[k - s];
        deg += n;
        for (let k = i; k <= deg; k++)
            c[k] += c[k - i];
        for (let k = deg + 1; k <= grown; k++)
            c[k] = 0; // the quotient has degree deg: the rest divides out
    }
    let total = 0;
    for (let u = 0; u <= top; u++)
        total += c[u];
    let acc = 0;
    for (let u = 0; u <= top; u++) {
        acc += c[u];
        c[u] = acc / total;
    }
    c[top] = 1;
    mann_whitney_distribution_cache.set(key, c);
    return c;
}

;// CONCATENATED MODULE: ./build/package/compare/stats/mann-whitney.js




let xs = new Float64Array(64);
let ys = new Float64Array(64);
/**
 * Mann–Whitney U test (Wilcoxon rank-sum test) for two unpaired samples x, y: H0 "x and y come from
 * the same distribution".
 *
 * What for: runs that cannot be paired by seed (e.g. a baseline recorded with other seeds).
 * Source: Mann & Whitney, Ann. Math. Statist. 18(1):50–60 (1947).
 * Procedure: rank the pooled sample (midranks for ties), R1 = rank sum of x, U1 = R1 − n1(n1+1)/2,
 * U2 = n1 n2 − U1; the test uses U = U1 ("greater"), U2 ("less") or max(U1, U2) ("two-sided", p doubled,
 * capped at 1), always as an upper tail P(U' ≥ U).
 * - exact: from `mannWhitneyCdf` (no ties, n1 + n2 ≤ 50).
 * - normal: z = (U − n1 n2/2 − c)/σ, σ² = n1 n2/12 · ((N + 1) − Σ(t³ − t)/(N(N − 1))), N = n1 + n2,
 *   c = ½ with the continuity correction; p = Φ(−z) (× 2 two-sided). This reproduces
 *   scipy.stats.mannwhitneyu (scipy 1.10, method="asymptotic") term for term. If every pooled value
 *   is equal (σ = 0) the p-value is 1.
 * Differences from scipy 1.10, on purpose: scipy's method="auto" takes the exact distribution only when
 * min(n1, n2) ≤ 8; here whenever it is computable exactly (n1 + n2 ≤ 50) and valid (no ties).
 * scipy's method="exact" with ties truncates U to an integer; here "exact" with ties throws.
 *
 * Cost: O(N log N) (two native sorts and a merge), no allocation besides the result; the exact table
 * costs O(min(n1,n2)² max(n1,n2)) once per size pair.
 */
function mannWhitneyU(x, y, options = {}) {
    const fn = "mannWhitneyU";
    checkSample(fn, "x", x, 1);
    checkSample(fn, "y", y, 1);
    const alternative = options.alternative ?? "two-sided";
    const method = options.method ?? "auto";
    const continuity = options.continuity ?? true;
    checkChoice(fn, "options.alternative", alternative, ALTERNATIVES);
    checkChoice(fn, "options.method", method, RANK_METHODS);
    if (typeof continuity !== "boolean") {
        throw new TypeError(`${fn}: options.continuity must be true or false, got ${describeValue(continuity)}`);
    }
    const n1 = x.length;
    const n2 = y.length;
    xs = growFloat64(xs, n1);
    ys = growFloat64(ys, n2);
    const sx = xs.subarray(0, n1);
    const sy = ys.subarray(0, n2);
    for (let i = 0; i < n1; i++)
        sx[i] = x[i];
    for (let j = 0; j < n2; j++)
        sy[j] = y[j];
    sx.sort();
    sy.sort();
    let i = 0;
    let j = 0;
    let rank = 0;
    let r1 = 0;
    let tieTerm = 0;
    while (i < n1 || j < n2) {
        const v = j >= n2 || (i < n1 && sx[i] <= sy[j]) ? sx[i] : sy[j];
        let cx = 0;
        let cy = 0;
        while (i < n1 && sx[i] === v) {
            i++;
            cx++;
        }
        while (j < n2 && sy[j] === v) {
            j++;
            cy++;
        }
        const t = cx + cy;
        r1 += cx * (rank + (t + 1) / 2);
        if (t > 1)
            tieTerm += t * t * t - t;
        rank += t;
    }
    const u1 = r1 - (n1 * (n1 + 1)) / 2;
    const u2 = n1 * n2 - u1;
    const ties = tieTerm > 0;
    const exactApplies = !ties && n1 + n2 <= MANN_WHITNEY_EXACT_MAX_TOTAL;
    if (method === "exact" && !exactApplies) {
        const why = ties
            ? "the pooled sample has ties (midranks)"
            : `the exact distribution is computed for n1 + n2 ≤ ${MANN_WHITNEY_EXACT_MAX_TOTAL}, got ${n1} + ${n2}`;
        throw new RangeError(`${fn}: options.method "exact" does not apply: ${why}; use "auto" or "normal"`);
    }
    const u = alternative === "greater" ? u1 : alternative === "less" ? u2 : Math.max(u1, u2);
    const factor = alternative === "two-sided" ? 2 : 1;
    const base = { statistic: u1, u1, u2, n1, n2, ties, alternative };
    if (method === "exact" || (method === "auto" && exactApplies)) {
        const cdf = mannWhitneyCdf(n1, n2);
        const upper = cdf[n1 * n2 - u] ?? 0; // P(U' ≥ u) = P(U' ≤ n1 n2 − u) by symmetry
        return { ...base, pValue: Math.min(1, factor * upper), method: "exact", z: NaN };
    }
    const total = n1 + n2;
    const sigma = Math.sqrt(((n1 * n2) / 12) * (total + 1 - tieTerm / (total * (total - 1))));
    if (!(sigma > 0))
        return { ...base, pValue: 1, method: "normal", z: NaN };
    const z = (u - (n1 * n2) / 2 - (continuity ? 0.5 : 0)) / sigma;
    return { ...base, pValue: Math.min(1, factor * normalSf(z)), method: "normal", z };
}

;// CONCATENATED MODULE: ./build/package/compare/stats/index.js






















// EXTERNAL MODULE: ./build/package/compare/types.js
var types = __webpack_require__(5286);
;// CONCATENATED MODULE: ./build/package/compare/compare.js
/**
 * The comparison: candidate results against baselines, seed by seed, into per-case verdicts and a gate
 * verdict (method and defaults: docs/decisions/0001-statistical-verdict.md). Pure: plain data in, the
 * verdict document out; re-running inconclusive cases with extra seeds is planned here (extra-seeds.ts)
 * and done by the CLI, which passes the extra runs back in.
 *
 * Per case:
 * 1. no baseline → new; baseline without candidate → missing; a different case definition → new;
 * 2. every paired run bitwise equal (all metrics, traces and iterates) → unchanged;
 * 3. a seed that diverged or failed where the baseline's did not → regressed, whatever else holds;
 * 4. per metric, on the paired log ratios d (samples.ts): Hodges–Lehmann estimate of the shift, a seeded
 *    bootstrap interval, the Wilcoxon signed-rank p-value for "no shift", a minimum-effect test for "the
 *    shift exceeds the margin" (Wilcoxon on d ∓ ln m, two-sided by doubling the smaller one-sided p),
 *    and the TOST p-value for "the shift lies within the margin";
 * 5. the minimum-effect p-values (and the reach sign tests) of every gating metric of every case form one
 *    family, corrected by Holm or Benjamini–Hochberg; a metric is regressed/improved when its adjusted p
 *    is ≤ alpha per look, else equivalent when TOST's p is ≤ alpha per look, else inconclusive;
 * 6. a case is regressed if any gating metric is, improved if one is and none regressed (or a seed stopped
 *    diverging), inconclusive if one is, else equivalent.
 * The gate fails on the policy's `failOn` verdicts (strict: everything but unchanged and equivalent), and
 * always on a new divergence.
 */









/** Number of looks the policy allows: a second one when inconclusive cases may get extra seeds. */
function looksOf(policy) {
    return policy.extraSeeds.perCase > 0 && policy.extraSeeds.maxRuns > 0 ? 2 : 1;
}
const UNAVAILABLE = {
    status: "unavailable",
    tolerance: 0,
    seeds: 0,
    steps: 0,
    firstDifferentStep: null,
    fromStep: null,
    relativeAtStep: null,
    maxRelative: null,
    seedsChanged: 0,
};
function compareResults(candidate, baselines, options = {}) {
    const policy = options.policy ?? DEFAULT_POLICY;
    const looks = looksOf(policy);
    const alpha = policy.alpha / looks;
    const extra = options.extraRuns ?? new Map();
    const baselineCases = new Map();
    for (const file of baselines.values())
        for (const c of file.cases)
            baselineCases.set(c.case.id, c);
    const works = [];
    const seen = new Set();
    for (const result of candidate.cases) {
        seen.add(result.case.id);
        works.push(prepareCase(result, baselineCases.get(result.case.id), extra.get(result.case.id) ?? [], policy, alpha));
    }
    if (!candidate.shard) {
        for (const c of baselineCases.values()) {
            if (seen.has(c.case.id))
                continue;
            works.push(emptyCase(c.case, "missing", {
                code: "no-candidate",
                message: `the candidate results have no case ${c.case.id}; run the whole suite, or rebaseline if the case was removed on purpose`,
            }));
        }
    }
    adjust(works, policy);
    const cases = works.map((w) => decideCase(w, policy, alpha));
    const counts = Object.fromEntries(types/* CASE_VERDICTS */.SE.map((v) => [v, 0]));
    const trajectory = { identical: 0, "float-noise": 0, changed: 0, unavailable: 0 };
    for (const c of cases) {
        counts[c.verdict]++;
        trajectory[c.fingerprint.status]++;
    }
    const reasons = cases
        .filter((c) => c.failsGate)
        .map((c) => ({
        code: "verdict",
        case: c.id,
        message: `${c.id}: ${c.verdict} — ${headline(c)}`,
    }));
    const first = [...baselines.values()][0];
    return {
        format: types/* VERDICT_FORMAT */.KC,
        version: types/* VERDICT_VERSION */.Hv,
        tool: { name: version/* TOOL_NAME */.l, version: version/* TOOL_VERSION */.w },
        policy,
        statistics: { looks, alphaPerLook: alpha },
        baseline: {
            suiteHash: first?.provenance.suite.hash ?? null,
            tool: first ? `${first.provenance.tool.name} ${first.provenance.tool.version}` : null,
            commits: Object.fromEntries([...baselines.values()].map((b) => [b.optimizer, b.provenance.commit])),
        },
        candidate: {
            suiteHash: candidate.suite?.hash ?? null,
            tool: candidate.tool ? `${candidate.tool.name} ${candidate.tool.version}` : null,
            ...(candidate.environment ? { environment: { ...candidate.environment } } : {}),
        },
        gate: { verdict: reasons.length > 0 ? "fail" : "pass", reasons, checks: [] },
        counts,
        trajectory,
        ...(options.rerun ? { rerun: options.rerun } : {}),
        cases,
    };
}
function emptyCase(spec, verdict, reason, runs = 0) {
    return {
        spec,
        verdict0: verdict,
        reasons: [reason],
        pairs: [],
        seeds: {
            paired: 0,
            baselineOnly: verdict === "missing" ? runs || spec.seeds : 0,
            candidateOnly: verdict === "new" ? runs : 0,
            extra: 0,
        },
        diverged: [],
        recovered: [],
        metrics: [],
        fingerprint: UNAVAILABLE,
        hyperChanges: [],
    };
}
/** The parts of a case that must agree for its runs to be comparable (those in the suite hash). */
function definitionKey(c) {
    // Canonical (sorted keys): a spec read back from a file and one built in memory must agree.
    return (0,json/* canonicalJson */.d)([
        c.problemKey,
        c.params,
        c.budget,
        c.stopAt,
        c.ladder,
        c.blowUp,
        c.checkpoints,
        c.fingerprintSteps,
        c.seeds,
        c.measureEvery,
        c.scenario ?? null,
    ]);
}
function describeDefinitionChange(b, c) {
    const fields = [
        "params",
        "budget",
        "stopAt",
        "ladder",
        "blowUp",
        "checkpoints",
        "fingerprintSteps",
        "seeds",
        "measureEvery",
        "scenario",
    ];
    const changed = fields.filter((f) => (0,json/* canonicalJson */.d)(b[f] ?? null) !== (0,json/* canonicalJson */.d)(c[f] ?? null));
    return changed
        .map((f) => `${f} ${JSON.stringify(b[f] ?? null)} → ${JSON.stringify(c[f] ?? null)}`)
        .join(", ");
}
function prepareCase(result, base, extraRuns, policy, alpha) {
    const spec = result.case;
    if (base === undefined) {
        return emptyCase(spec, "new", { code: "no-baseline", message: "no baseline for this case; rebaseline to start tracking it" }, result.runs.length);
    }
    if (definitionKey(base.case) !== definitionKey(spec)) {
        return emptyCase(spec, "new", {
            code: "definition",
            message: `the case definition changed since the baseline (${describeDefinitionChange(base.case, spec)}); the runs are not comparable: rebaseline`,
        }, result.runs.length);
    }
    const reasons = [];
    const hyperChanges = diffHyper(base.case.hyper, spec.hyper);
    if (hyperChanges.length > 0) {
        reasons.push({
            code: "hyper",
            message: `hyperparameters differ from the baseline's: ${hyperChanges.map((h) => `${h.name} ${JSON.stringify(h.baseline)} → ${JSON.stringify(h.candidate)}`).join(", ")}`,
        });
    }
    // Pair seed by seed.
    const baseBySeed = new Map();
    for (const r of base.runs)
        baseBySeed.set(r.seed, r);
    const primary = [];
    let candidateOnly = 0;
    for (const r of result.runs) {
        const b = baseBySeed.get(r.seed);
        if (b === undefined)
            candidateOnly++;
        else
            primary.push({ seed: r.seed, base: b, cand: r });
    }
    const baselineOnly = base.runs.length - primary.length;
    const extraBase = new Map();
    for (const r of base.extraRuns)
        extraBase.set(r.seed, r);
    const extraPairs = [];
    for (const r of extraRuns) {
        const b = extraBase.get(r.seed);
        if (b !== undefined)
            extraPairs.push({ seed: r.seed, base: b, cand: r });
        else
            candidateOnly++;
    }
    if (baselineOnly + candidateOnly > 0) {
        reasons.push({
            code: "seeds",
            message: `${baselineOnly} seed(s) only in the baseline and ${candidateOnly} only in the candidate are left out`,
        });
    }
    const pairs = [...primary, ...extraPairs];
    const seeds = { paired: pairs.length, baselineOnly, candidateOnly, extra: extraPairs.length };
    const fingerprint = compareFingerprint(primary, policy.fingerprintTolerance);
    if (pairs.length > 0 && baselineOnly + candidateOnly === 0 && pairs.every((p) => sameRun(p.base, p.cand))) {
        return {
            spec,
            verdict0: "unchanged",
            reasons,
            pairs,
            seeds,
            diverged: [],
            recovered: [],
            metrics: [],
            fingerprint,
            hyperChanges,
        };
    }
    const diverged = [];
    const recovered = [];
    for (const p of pairs) {
        // Resume scenarios: a resumed run that retraced the uninterrupted one in the baseline must still do so.
        if (p.base.resume?.equal === true && p.cand.resume !== undefined && !p.cand.resume.equal) {
            reasons.push({
                code: "resume",
                seed: p.seed,
                message: `seed ${p.seed}: the resumed run no longer retraces the uninterrupted one (first difference at step ${p.cand.resume.firstDifference ?? "?"}); the baseline's did bit for bit`,
            });
        }
        const hb = healthy(p.base);
        const hc = healthy(p.cand);
        if (hb && !hc)
            diverged.push({ seed: p.seed, baseline: describeRun(p.base), candidate: describeRun(p.cand) });
        if (!hb && hc)
            recovered.push({ seed: p.seed, baseline: describeRun(p.base), candidate: describeRun(p.cand) });
    }
    const metrics = metricSamples(spec, pairs, policy.gapFloor).map((sample) => measure(sample, policy, alpha));
    return {
        spec,
        verdict0: null,
        reasons,
        pairs,
        seeds,
        diverged,
        recovered,
        metrics,
        fingerprint,
        hyperChanges,
    };
}
function diffHyper(a, b) {
    const names = [...new Set([...Object.keys(a), ...Object.keys(b)])].sort();
    return names
        .filter((n) => a[n] !== b[n])
        .map((n) => ({ name: n, baseline: a[n] ?? null, candidate: b[n] ?? null }));
}
function describeRun(r) {
    if (r.stop === "diverged")
        return `diverged (${r.divergence ?? "?"}) at step ${r.divergedAt ?? r.steps}`;
    if (r.stop === "error")
        return `failed: ${r.error ?? "error"}`;
    return r.stop === "target" ? `converged at step ${r.steps}` : `ran ${r.steps} steps (${r.stop} budget)`;
}
/** Field-by-field equality of two runs (=== on numbers, so −0 equals +0). */
function sameRun(a, b) {
    if (a.seed !== b.seed ||
        a.runSeed !== b.runSeed ||
        a.stop !== b.stop ||
        a.steps !== b.steps ||
        a.evaluations !== b.evaluations ||
        a.f0 !== b.f0 ||
        a.finalGap !== b.finalGap ||
        a.bestGap !== b.bestGap ||
        a.divergedAt !== b.divergedAt ||
        a.divergence !== b.divergence ||
        a.rate !== b.rate ||
        a.error !== b.error) {
        return false;
    }
    if (!sameArray(a.stepsTo, b.stepsTo) ||
        !sameArray(a.evaluationsTo, b.evaluationsTo) ||
        !sameArray(a.trace, b.trace)) {
        return false;
    }
    const ra = a.resume;
    const rb = b.resume;
    if (ra !== rb &&
        (ra === undefined ||
            rb === undefined ||
            ra.equal !== rb.equal ||
            ra.firstDifference !== rb.firstDifference)) {
        return false;
    }
    const ia = a.iterates;
    const ib = b.iterates;
    if (ia === undefined || ib === undefined)
        return ia === ib;
    if (ia.length !== ib.length)
        return false;
    for (let i = 0; i < ia.length; i++)
        if (!sameArray(ia[i], ib[i]))
            return false;
    return true;
}
function sameArray(a, b) {
    if (a.length !== b.length)
        return false;
    for (let i = 0; i < a.length; i++)
        if (a[i] !== b[i])
            return false;
    return true;
}
let shifted = new Float64Array(64);
function measure(sample, policy, alpha) {
    const gating = policy.metrics.includes(sample.kind);
    const margin = policy.margin[sample.kind];
    const work = {
        sample,
        gating,
        margin,
        estimate: null,
        interval: null,
        pValue: null,
        marginPValue: null,
        direction: 0,
        equivalencePValue: null,
        method: null,
        reachP: null,
        adjusted: null,
        reachAdjusted: null,
    };
    const r = sample.reach;
    if (r !== undefined && r.lost + r.gained > 0)
        work.reachP = exactSignTest(r.lost, r.gained);
    const d = sample.d;
    const n = d.length;
    if (n === 0)
        return work;
    if (sample.ties === n) {
        work.estimate = 0;
        return work;
    }
    const delta = Math.log(margin);
    const hl = hodgesLehmann(d, { level: 1 - alpha });
    work.estimate = hl.estimate;
    work.interval = {
        low: Number.isFinite(hl.lower) ? Math.exp(hl.lower) : null,
        high: Number.isFinite(hl.upper) ? Math.exp(hl.upper) : null,
        level: 1 - alpha,
        method: "hodges-lehmann",
    };
    const two = wilcoxonSignedRank(d);
    work.pValue = two.pValue;
    work.method = two.method;
    if (shifted.length < n)
        shifted = new Float64Array(Math.max(n, 2 * shifted.length));
    const s = shifted.subarray(0, n);
    for (let i = 0; i < n; i++)
        s[i] = d[i] - delta;
    const up = wilcoxonSignedRank(s, { alternative: "greater" }).pValue;
    for (let i = 0; i < n; i++)
        s[i] = d[i] + delta;
    const down = wilcoxonSignedRank(s, { alternative: "less" }).pValue;
    work.direction = up < down ? 1 : down < up ? -1 : hl.estimate > 0 ? 1 : hl.estimate < 0 ? -1 : 0;
    work.marginPValue = Math.min(1, 2 * Math.min(up, down));
    work.equivalencePValue = equivalenceSignedRank(sample.dEquivalence, delta).pValue;
    return work;
}
/** The multiplicity correction across every gating test of every case. */
function adjust(works, policy) {
    const ps = [];
    const slots = [];
    for (const w of works) {
        for (const m of w.metrics) {
            if (!m.gating)
                continue;
            if (m.marginPValue !== null) {
                ps.push(m.marginPValue);
                slots.push({ m, reach: false });
            }
            if (m.reachP !== null) {
                ps.push(m.reachP);
                slots.push({ m, reach: true });
            }
        }
    }
    const adjusted = policy.correction === "holm"
        ? holmAdjust(ps)
        : policy.correction === "benjamini-hochberg"
            ? benjaminiHochbergAdjust(ps)
            : Float64Array.from(ps);
    slots.forEach(({ m, reach }, i) => {
        if (reach)
            m.reachAdjusted = adjusted[i];
        else
            m.adjusted = adjusted[i];
    });
}
function statusOf(m, alpha) {
    const s = m.sample;
    const r = s.reach;
    const reachSignal = m.reachAdjusted !== null && m.reachAdjusted <= alpha && r !== undefined && r.lost !== r.gained;
    if (reachSignal && r.lost > r.gained)
        return "regressed";
    if (s.d.length === 0)
        return reachSignal ? "improved" : "untested";
    if (s.ties === s.d.length && s.censoredBaseline + s.censoredCandidate === 0) {
        return reachSignal ? "improved" : "unchanged";
    }
    if (m.adjusted !== null && m.adjusted <= alpha && m.direction !== 0)
        return m.direction > 0 ? "regressed" : "improved";
    if (reachSignal)
        return "improved";
    if (m.equivalencePValue !== null && m.equivalencePValue <= alpha)
        return "equivalent";
    return "inconclusive";
}
function decideCase(w, policy, alpha) {
    const reasons = [...w.reasons];
    const drift = w.metrics.map((m) => toDrift(m, statusOf(m, alpha)));
    let verdict;
    if (w.verdict0 !== null)
        verdict = w.verdict0;
    else {
        for (const e of w.diverged) {
            reasons.push({
                code: "diverged",
                seed: e.seed,
                message: `seed ${e.seed} ${e.candidate}; the baseline ${e.baseline}`,
            });
        }
        for (const e of w.recovered) {
            reasons.push({
                code: "recovered",
                seed: e.seed,
                message: `seed ${e.seed} ${e.candidate}; the baseline ${e.baseline}`,
            });
        }
        const gating = drift.filter((d) => d.gating);
        for (const d of gating) {
            const reach = d.reach;
            if ((d.status === "regressed" || d.status === "improved") &&
                reach &&
                reach.lost !== reach.gained &&
                reach.pValue !== null) {
                const m = w.metrics.find((x) => x.sample.metric === d.metric);
                if (m.reachAdjusted !== null && m.reachAdjusted <= alpha) {
                    reasons.push({
                        code: "reach",
                        metric: d.metric,
                        message: `${d.metric}: ${reach.lost} seed(s) no longer reach it, ${reach.gained} newly do (sign test, adjusted p = ${fmtP(m.reachAdjusted)})`,
                    });
                }
            }
            if ((d.status === "regressed" || d.status === "improved") &&
                d.adjustedPValue !== null &&
                d.adjustedPValue <= alpha) {
                reasons.push({
                    code: "drift",
                    metric: d.metric,
                    message: `${d.metric} ${describeDrift(d)}, beyond the margin ×${d.margin} (adjusted p = ${fmtP(d.adjustedPValue)}, n = ${d.pairs})`,
                });
            }
        }
        const statuses = new Set(gating.map((d) => d.status));
        const resumeBroken = reasons.some((r) => r.code === "resume");
        if (w.diverged.length > 0 || resumeBroken || statuses.has("regressed"))
            verdict = "regressed";
        else if (statuses.has("improved") || w.recovered.length > 0)
            verdict = "improved";
        else if (statuses.has("inconclusive") || statuses.has("untested") || gating.length === 0) {
            verdict = "inconclusive";
            const open = gating.filter((d) => d.status === "inconclusive" || d.status === "untested");
            reasons.push({
                code: "inconclusive",
                message: gating.length === 0
                    ? "no gating metric could be compared (every paired seed diverged or failed on both sides)"
                    : `changed, neither shown beyond nor within the margins at alpha ${fmtP(alpha)}: ` +
                        open.map((d) => `${d.metric} ${describeDrift(d)} (n = ${d.pairs})`).join("; "),
            });
        }
        else
            verdict = "equivalent";
    }
    const fp = w.fingerprint;
    if (verdict !== "new" &&
        verdict !== "missing" &&
        fp.status !== "unavailable" &&
        fp.status !== "identical") {
        const convergence = verdict === "unchanged" ? "metrics unchanged" : `convergence ${verdict}`;
        reasons.push({
            code: "trajectory",
            message: fp.status === "changed"
                ? `trajectory changed from step ${fp.fromStep} (relative ${fmtNum(fp.relativeAtStep)} > ${fp.tolerance}), ${convergence}`
                : `trajectory differs by float noise only (relative ≤ ${fmtNum(fp.maxRelative)}, tolerance ${fp.tolerance}), ${convergence}`,
        });
    }
    let failsGate = policy.strict
        ? verdict !== "unchanged" && verdict !== "equivalent"
        : policy.failOn.includes(verdict);
    if (w.diverged.length > 0)
        failsGate = true;
    if (policy.strict && failsGate) {
        reasons.push({ code: "strict", message: `strict policy: a ${verdict} case is a behaviour change` });
    }
    return {
        id: w.spec.id,
        optimizer: w.spec.optimizer,
        set: w.spec.set,
        problem: w.spec.problem,
        problemKey: w.spec.problemKey,
        verdict,
        failsGate,
        reasons,
        seeds: w.seeds,
        diverged: w.diverged,
        recovered: w.recovered,
        headline: headlineOf(w, drift, verdict, policy, alpha),
        drift,
        fingerprint: fp,
        hyperChanges: w.hyperChanges,
        checks: [],
    };
}
/**
 * The case's headline metric and its seeded bootstrap interval (one per changed case: the bootstrap
 * costs B evaluations, so it is spent where a reader looks; every metric has its Tukey interval).
 */
function headlineOf(w, drift, verdict, policy, alpha) {
    if (verdict === "unchanged" || verdict === "new" || verdict === "missing")
        return null;
    const want = verdict === "regressed"
        ? ["regressed"]
        : verdict === "improved"
            ? ["improved"]
            : verdict === "inconclusive"
                ? ["inconclusive", "untested"]
                : ["equivalent"];
    let best = -1;
    let bestSize = -1;
    drift.forEach((d, i) => {
        if (!d.gating || !want.includes(d.status) || d.ratio === null)
            return;
        const size = Math.abs(Math.log(d.ratio));
        if (size > bestSize) {
            best = i;
            bestSize = size;
        }
    });
    if (best < 0)
        return null;
    const d = drift[best];
    const sample = w.metrics[best].sample.d;
    let interval = null;
    if (sample.length >= 2) {
        const rng = new core_rng/* Pcg32 */._8((0,core_rng/* splitmix64 */.Tj)(BigInt(policy.bootstrap.seed)) ^ (0,core_rng/* fnv1a64 */.Rq)(`${w.spec.id}|${d.metric}`), 0x67n);
        const options = { rng, resamples: policy.bootstrap.resamples, level: 1 - alpha };
        let b = bootstrapInterval(sample, options);
        if (!b.valid)
            b = bootstrapInterval(sample, { ...options, method: "percentile" });
        interval = {
            low: Math.exp(b.lower),
            high: Math.exp(b.upper),
            level: 1 - alpha,
            method: b.method === "bca" ? "bootstrap-bca" : "bootstrap-percentile",
            resamples: b.resamples,
        };
    }
    return { metric: d.metric, ratio: d.ratio, bound: d.bound, interval, status: d.status };
}
function toDrift(m, status) {
    const s = m.sample;
    const bound = s.censoredCandidate > 0 && s.censoredBaseline === 0
        ? "at-least"
        : s.censoredBaseline > 0 && s.censoredCandidate === 0
            ? "at-most"
            : "none";
    return {
        metric: s.metric,
        kind: s.kind,
        rung: s.rung,
        gating: m.gating,
        status,
        pairs: s.d.length,
        ties: s.ties,
        censored: { baseline: s.censoredBaseline, candidate: s.censoredCandidate },
        bound,
        ratio: m.estimate === null ? null : Math.exp(m.estimate),
        interval: m.interval,
        pValue: m.pValue,
        marginPValue: m.marginPValue,
        adjustedPValue: m.adjusted,
        equivalencePValue: m.equivalencePValue,
        margin: m.margin,
        method: m.method,
        ...(s.reach ? { reach: { ...s.reach, pValue: m.reachP } } : {}),
    };
}
/** "×1.32 [1.20, 1.45]" (with "≥"/"≤" when censored pairs make it a bound). */
function describeDrift(d) {
    if (d.ratio === null)
        return "(no pairs)";
    const sign = d.bound === "at-least" ? "≥" : d.bound === "at-most" ? "≤" : "";
    const ci = d.interval
        ? ` [${d.interval.low === null ? "0" : fmtNum(d.interval.low)}, ${d.interval.high === null ? "∞" : fmtNum(d.interval.high)}]`
        : "";
    return `${sign}×${fmtNum(d.ratio)}${ci}`;
}
/** "stepsTo(1e-3) ×1.32 [1.20, 1.45]" for a case's headline (bootstrap interval). */
function describeHeadline(h) {
    const sign = h.bound === "at-least" ? "≥" : h.bound === "at-most" ? "≤" : "";
    const i = h.interval;
    const ci = i ? ` [${i.low === null ? "0" : fmtNum(i.low)}, ${i.high === null ? "∞" : fmtNum(i.high)}]` : "";
    return `${h.metric} ${sign}×${fmtNum(h.ratio)}${ci}`;
}
/** One line on why a case got its verdict, for the gate's reasons. */
function headline(c) {
    const decisive = c.reasons.filter((r) => r.code !== "trajectory" && r.code !== "hyper" && r.code !== "seeds");
    const shown = decisive.length > 0 ? decisive : c.reasons;
    const more = shown.length > 3 ? ` (and ${shown.length - 3} more: see the case)` : "";
    const text = shown
        .slice(0, 3)
        .map((r) => r.message)
        .join("; ");
    return text ? text + more : c.verdict;
}
function fmtNum(x) {
    if (x === null)
        return "—";
    if (x === 0)
        return "0";
    const a = Math.abs(x);
    return a >= 0.001 && a < 1e4 ? String(Number(x.toPrecision(3))) : Number(x.toPrecision(3)).toExponential();
}
function fmtP(p) {
    return p >= 0.001 ? String(Number(p.toPrecision(2))) : p.toExponential(1);
}

;// CONCATENATED MODULE: ./build/package/compare/extra-seeds.js
function planExtraSeeds(verdict, baselines, policy) {
    const { perCase, maxRuns } = policy.extraSeeds;
    const requested = verdict.cases.filter((c) => c.verdict === "inconclusive").map((c) => c.id);
    const cases = [];
    const skipped = [];
    if (perCase === 0 || maxRuns === 0) {
        for (const id of requested)
            skipped.push({ case: id, why: "extra seeds are turned off by the policy (extraSeeds)" });
        return { cases, runs: 0, requested, skipped };
    }
    const byId = new Map();
    for (const file of baselines.values())
        for (const c of file.cases)
            byId.set(c.case.id, c.extraRuns);
    let runs = 0;
    for (const id of requested) {
        const extra = byId.get(id) ?? [];
        if (extra.length === 0) {
            skipped.push({
                case: id,
                why: "the baseline holds no extra seeds for this case; rebaseline to add them",
            });
            continue;
        }
        const seeds = extra.slice(0, perCase).map((r) => r.seed);
        if (runs + seeds.length > maxRuns) {
            skipped.push({
                case: id,
                why: `the budget of ${maxRuns} extra runs (policy.extraSeeds.maxRuns) is used up`,
            });
            continue;
        }
        runs += seeds.length;
        cases.push({ id, seeds });
    }
    return { cases, runs, requested, skipped };
}
/**
 * The suite and item list that run exactly the planned seeds: each planned case with `seeds` raised to
 * cover its highest planned seed index (run seeds depend on the seed index only, not on `seeds`).
 * `adapters` reaches module and process optimizers (results do not record it: it comes from the config).
 */
function extraSeedSuite(suiteSeed, specs, plan, adapters) {
    const cases = [];
    const items = [];
    let offset = 0;
    for (const { id, seeds } of plan.cases) {
        const spec = specs.get(id);
        if (spec === undefined)
            throw new Error(`extraSeedSuite: no case ${id} in the candidate results`);
        const count = Math.max(spec.seeds, ...seeds.map((s) => s + 1));
        cases.push({ ...spec, seeds: count });
        for (const s of seeds)
            items.push(offset + s);
        offset += count;
    }
    return { suite: { seed: suiteSeed, cases, ...(adapters ? { adapters } : {}) }, items };
}
/** Extra runs by case id, from what runSuite returned for an extraSeedSuite. */
function extraRunsById(results) {
    return new Map(results.map((r) => [r.case.id, [...r.runs]]));
}
function rerunSummary(plan, budget) {
    return {
        requested: plan.requested,
        rerun: plan.cases.map((c) => c.id),
        runs: plan.runs,
        budget,
        skipped: plan.skipped,
    };
}

;// CONCATENATED MODULE: ./build/package/reference/format.js
/** Number formats of the reference checks' messages (plain text, no locale). */
/** Two significant digits in exponent form, as in "3.1e-2": for tolerances and differences. */
function format_short(x) {
    if (!Number.isFinite(x))
        return String(x);
    return x.toExponential(1).replace("e+", "e");
}
/** Four significant digits in JavaScript's shortest spelling: 0.9487, 1.2e-7, 48.98. */
function fmt(x) {
    return Number.isFinite(x) ? String(Number(x.toPrecision(4))) : String(x);
}
/** A fraction as a percentage with two significant digits: 0.0213 → "2.1%". */
function pct(x) {
    return `${Number((100 * x).toPrecision(2))}%`;
}

;// CONCATENATED MODULE: ./build/package/reference/probes.js
function probeProblem(name, title, x0, fg) {
    const dim = x0.length;
    const scratch = new Float64Array(dim);
    return {
        name,
        title,
        tags: ["probe"],
        source: "constructed here for the conformance check (common practice)",
        params: {},
        create() {
            return {
                key: name,
                dim,
                fStar: 0,
                fStarKind: "lower-bound",
                xStar: null,
                stochastic: false,
                evaluate: fg,
                objective: (x) => fg(x, scratch),
                start(out) {
                    for (let i = 0; i < dim; i++)
                        out[i] = x0[i];
                },
            };
        },
    };
}
function diagonal(name, title, a, x0) {
    return probeProblem(name, title, x0, (x, g) => {
        let f = 0;
        for (let i = 0; i < a.length; i++) {
            g[i] = a[i] * x[i];
            f += 0.5 * a[i] * x[i] * x[i];
        }
        return f;
    });
}
const BOWL = diagonal("probe-bowl", "diagonal quadratic", [1, 3, 0.5], [1, -0.6, 0.8]);
const VALLEY = probeProblem("probe-valley", "curved valley", [-0.8, 0.9], (x, g) => {
    const r = x[1] - x[0] * x[0];
    g[0] = x[0] - 1 - 8 * x[0] * r;
    g[1] = 4 * r;
    return 0.5 * (x[0] - 1) * (x[0] - 1) + 2 * r * r;
});
const FAINT = diagonal("probe-faint", "quadratic with gradients of order 1e-3", [0.004, 0.001], [0.3, -0.5]);
const FLAT = probeProblem("probe-flat", "zero loss gradient", [1, -2, 0.5], (_x, g) => {
    g.fill(0);
    return 0;
});
/** Step sizes that keep each method stable on the bowl and the valley (curvatures up to about 9). */
const PROBE_LR = {
    sgd: 0.05,
    momentum: 0.02,
    nesterov: 0.02,
    adagrad: 0.1,
    rmsprop: 0.01,
    adam: 0.01,
    adamw: 0.01,
};
/** The probes for `method` and a claim (complete reference hyperparameters). */
function probesFor(method, claim) {
    const lr = PROBE_LR[method];
    if (lr === undefined)
        throw new RangeError(`probesFor: unknown method ${JSON.stringify(method)}`);
    const probes = [
        { id: "bowl", title: "diagonal quadratic", definition: BOWL, steps: 24, set: { lr }, requires: [] },
        { id: "valley", title: "curved valley", definition: VALLEY, steps: 24, set: { lr }, requires: [] },
        {
            id: "schedule",
            title: "learning rate cut to a quarter after step 8",
            definition: BOWL,
            steps: 24,
            set: { lr },
            requires: [],
            lrChange: { after: 8, factor: 0.25 },
        },
    ];
    if (method === "adagrad" || method === "rmsprop" || method === "adam" || method === "adamw") {
        probes.push({
            id: "faint",
            title: "gradients of order 1e-3 with ε = 1e-2",
            definition: FAINT,
            steps: 24,
            set: { lr: method === "adagrad" ? 0.01 : 0.002, eps: 1e-2 },
            requires: ["eps"],
        });
    }
    probes.push({
        id: "flat",
        title: "zero loss gradient with weight decay 0.1",
        definition: FLAT,
        steps: 16,
        set: {
            lr: method === "adam" || method === "adamw" || method === "rmsprop" ? 0.01 : 0.1,
            weightDecay: 0.1,
        },
        requires: ["weightDecay"],
    });
    if ((method === "adam" || method === "adamw") && claim.amsgrad === true) {
        probes.push({
            id: "amsgrad",
            title: "second moment falling early (β2 = 0.9)",
            definition: BOWL,
            steps: 40,
            set: { lr: 0.05, beta2: 0.9 },
            requires: ["beta2"],
        });
    }
    return probes;
}

;// CONCATENATED MODULE: ./build/package/reference/trajectory.js
/**
 * Trajectories: how the reference checks step an optimizer under test. A check asks for the iterates
 * x₀, x₁, …, x_n of one run — a problem with its parameters, hyperparameters, a seed, a number of steps
 * and optionally a learning-rate change between two steps — and reads them as they come. Everything a
 * check measures (gaps, time averages, step-by-step agreement with a reference form) is computed from
 * those iterates with the harness's own copy of the problem, never from numbers the optimizer reports.
 *
 * A `TrajectorySource` hides where the optimizer lives. `inProcessSource` wraps any `OptimizerFactory`
 * (the reference optimizers and in-process modules); a process adapter can implement the same interface
 * with its run control (pause after a step, change the learning rate, observe every iterate).
 *
 * The start point and the gradient noise are derived exactly as in the run loop (src/runner/execute.ts):
 * run seed = deriveRunSeed(suiteSeed, problemKey, seedIndex), start perturbation from stream `start`,
 * noise from stream `noise`. So a check's run with seed index i starts where the suite's run i starts.
 */

/** Creates the problem instance of a request, bound to the request's noise stream (as the run loop does). */
function requestProblem(request) {
    const runSeed = (0,core_rng/* deriveRunSeed */.EK)(request.suiteSeed, request.problemKey, request.seedIndex);
    const problem = request.definition.create(request.params, { noise: (0,core_rng/* runStream */.G5)(runSeed, core_rng/* STREAM */.dY.noise) });
    const x0 = new Float64Array(problem.dim);
    problem.start(x0, (0,core_rng/* runStream */.G5)(runSeed, core_rng/* STREAM */.dY.start));
    return { problem, x0 };
}
function message(err) {
    return err instanceof Error ? err.message : String(err);
}
/** True when every coordinate is finite. */
function finite(x) {
    for (let i = 0; i < x.length; i++)
        if (!Number.isFinite(x[i]))
            return false;
    return true;
}
/**
 * Steps `factory`'s optimizer in this thread, on the request's problem instance (the optimizer's
 * evaluations go straight to the problem). Faults of the optimizer end the run with a sentence saying
 * what happened; nothing it does makes `run` reject. A run stops at the first non-finite iterate.
 */
function runInProcess(factory, request, observe) {
    const { problem, x0 } = requestProblem(request);
    const x = x0;
    let optimizer;
    try {
        optimizer = factory.create(request.hyper, problem.dim);
    }
    catch (err) {
        return { steps: 0, error: `creating the optimizer failed: ${message(err)}`, lrChange: "none" };
    }
    const change = request.lrChange;
    if (change !== undefined && typeof optimizer.setLearningRate !== "function") {
        return { steps: 0, lrChange: "unsupported" };
    }
    const lrChange = change === undefined ? "none" : "applied";
    observe(0, x);
    const oracle = { evaluate: (p, g) => problem.evaluate(p, g) };
    for (let k = 1; k <= request.steps; k++) {
        try {
            optimizer.step(x, oracle);
        }
        catch (err) {
            return { steps: k - 1, error: `step ${k} threw: ${message(err)}`, lrChange };
        }
        observe(k, x);
        if (!finite(x))
            return { steps: k, error: `the iterate is not finite after step ${k}`, lrChange };
        if (change !== undefined && k === change.after) {
            try {
                optimizer.setLearningRate(change.lr);
            }
            catch (err) {
                return {
                    steps: k,
                    error: `setLearningRate(${change.lr}) after step ${k} threw: ${message(err)}`,
                    lrChange,
                };
            }
        }
    }
    return { steps: request.steps, lrChange };
}
/** A `TrajectorySource` for any in-process `OptimizerFactory` (reference optimizers, module adapters). */
function inProcessSource(factory, label = factory.name) {
    return {
        label,
        hyperNames: Object.keys(factory.defaults),
        run: (request, observe) => Promise.resolve(runInProcess(factory, request, observe)),
    };
}

;// CONCATENATED MODULE: ./build/package/reference/variants.js

const SUTSKEVER = "Sutskever, Martens, Dahl & Hinton (2013), On the importance of initialization and momentum in deep learning, ICML, PMLR 28(3):1139–1147";
const KINGMA_BA = "Kingma & Ba (2015), Adam: A Method for Stochastic Optimization, ICLR, arXiv:1412.6980";
const LOSHCHILOV = "Loshchilov & Hutter (2019), Decoupled Weight Decay Regularization, ICLR, arXiv:1711.05101";
const REDDI = "Reddi, Kale & Kumar (2018), On the Convergence of Adam and Beyond, ICLR, Algorithm 2";
/** The reference options that select a form; a claim never sets them (a config pins them with `expect`). */
const CONVENTION_KEYS = ["form", "epsPlacement", "amsgradMax", "decayScaledByLr"];
/** The reference optimizer of each method. */
const METHOD_FACTORIES = {
    sgd: optimizers/* sgd */.D5,
    momentum: optimizers/* momentum */.Pg,
    nesterov: optimizers/* nesterov */.fX,
    adagrad: optimizers/* adagrad */.bw,
    rmsprop: optimizers/* rmsprop */.m0,
    adam: optimizers/* adam */.Ch,
    adamw: optimizers/* adamw */.dp,
};
const variants_METHODS = Object.keys(METHOD_FACTORIES);
const MOMENTUM_FORM = {
    key: "form",
    title: "learning-rate placement",
    values: [
        {
            key: "lr-inside",
            label: "learning rate inside the velocity (v = γv + ηg; w −= v)",
            accepted: true,
            source: `Polyak (1964); ${SUTSKEVER}, eq. (1)–(2)`,
        },
        {
            key: "lr-outside",
            label: "learning rate outside the velocity (b = γb + g; w −= η·b)",
            accepted: true,
            source: "common practice (the same trajectory as v = η·b while the learning rate is constant)",
        },
    ],
    exposedBy: ["schedule"],
    whenUnprobed: "indistinguishable at constant lr: both forms give the same iterates, and the optimizer cannot change its learning rate between steps",
};
const NESTEROV_FORM = {
    key: "form",
    title: "look-ahead storage",
    values: [
        {
            key: "lookahead",
            label: "the parameters hold w and the gradient is taken at the look-ahead point w − γv",
            accepted: true,
            source: `${SUTSKEVER}, eq. (3)–(4)`,
        },
        {
            key: "stored-lookahead",
            label: "the parameters hold the look-ahead point u = w − γv and the gradient is taken there",
            accepted: true,
            source: "Bengio, Boulanger-Lewandowski & Pascanu (2013), Advances in optimizing recurrent networks, ICASSP, §3.5, arXiv:1212.0901",
        },
    ],
    exposedBy: ["bowl", "valley", "schedule", "flat"],
    whenUnprobed: "no probe ran",
};
const NESTEROV_LR = {
    key: "lrPlacement",
    title: "learning-rate placement",
    values: [
        {
            key: "lr-inside",
            label: "learning rate inside the velocity (v = γv + ηg)",
            accepted: true,
            source: `${SUTSKEVER}, eq. (3)–(4)`,
        },
        {
            key: "lr-outside",
            label: "learning rate outside the velocity (b = γb + g, steps of η·(…))",
            accepted: true,
            source: "common practice (the same trajectory as v = η·b while the learning rate is constant)",
        },
    ],
    exposedBy: ["schedule"],
    whenUnprobed: MOMENTUM_FORM.whenUnprobed,
};
const RMSPROP_EPS = {
    key: "epsPlacement",
    title: "ε placement",
    values: [
        {
            key: "outside",
            label: "ε outside the square root, η·g/(√E + ε)",
            accepted: true,
            source: "common practice",
        },
        {
            key: "inside",
            label: "ε inside the square root, η·g/√(E + ε)",
            accepted: true,
            source: "Graves (2013), Generating Sequences With Recurrent Neural Networks, §4, arXiv:1308.0850; Ruder (2016), arXiv:1609.04747, §4.5",
        },
    ],
    exposedBy: ["faint"],
    whenUnprobed: "not probed: the optimizer has no setting for ε, so the probe with a large ε could not run",
};
const ADAM_EPS = {
    key: "epsPlacement",
    title: "ε placement",
    values: [
        {
            key: "corrected",
            label: "ε added after bias correction, α·m̂/(√v̂ + ε)",
            accepted: true,
            source: `${KINGMA_BA}, Algorithm 1`,
        },
        {
            key: "efficient",
            label: "ε added before bias correction, αₜ·m/(√v + ε) with αₜ = α·√(1 − β2ᵗ)/(1 − β1ᵗ)",
            accepted: true,
            source: `${KINGMA_BA}, §2 (the efficient form)`,
        },
    ],
    exposedBy: ["faint"],
    whenUnprobed: "not probed: the optimizer has no setting for ε, so the probe with a large ε could not run",
};
function decayAxis(claimed) {
    const isAdamW = claimed === "adamw";
    return {
        key: "decay",
        title: "weight decay",
        values: [
            {
                key: "coupled",
                label: "coupled L2, λθ added to the gradient before the moment estimates",
                accepted: !isAdamW,
                source: "common practice (Adam with L2 regularisation); " + `${LOSHCHILOV}, §2`,
                meaning: isAdamW
                    ? "that is Adam with L2 regularisation, where the decay goes through the moment estimates, which AdamW avoids"
                    : undefined,
            },
            {
                key: "decoupled-scaled",
                label: "decoupled and scaled by the learning rate, θ −= α·λ·θ beside the Adam step",
                accepted: isAdamW,
                source: `${LOSHCHILOV}, Algorithm 2 with the decay multiplied by the learning rate (common practice)`,
                meaning: isAdamW ? undefined : "that is AdamW's decoupled decay, not Adam with L2 regularisation",
            },
            {
                key: "decoupled",
                label: "decoupled and not scaled by the learning rate, θ −= λ·θ beside the Adam step",
                accepted: isAdamW,
                source: `${LOSHCHILOV}, Algorithm 2 with schedule multiplier ηₜ = 1`,
                meaning: isAdamW ? undefined : "that is AdamW's decoupled decay, not Adam with L2 regularisation",
            },
        ],
        exposedBy: ["flat", "bowl", "valley", "schedule", "faint"],
        whenUnprobed: "not probed",
    };
}
const AMSGRAD_MAX = {
    key: "amsgradMax",
    title: "AMSGrad maximum",
    values: [
        {
            key: "raw",
            label: "running maximum of the raw second moment v",
            accepted: true,
            source: REDDI,
        },
        {
            key: "corrected",
            label: "running maximum of the bias-corrected second moment v̂",
            accepted: true,
            source: "common practice",
        },
        {
            key: "none",
            label: "no running maximum",
            accepted: false,
            source: `${KINGMA_BA}, Algorithm 1`,
            meaning: "that is plain Adam: the AMSGrad maximum is not used",
        },
    ],
    exposedBy: ["amsgrad"],
    whenUnprobed: "not probed: the optimizer has no setting for beta2, so the probe with β2 = 0.9 could not run",
};
/** Axis keys and value keys per method, for validating `expect` (independent of the claim). */
const METHOD_AXES = {
    sgd: [],
    momentum: [MOMENTUM_FORM],
    nesterov: [NESTEROV_FORM, NESTEROV_LR],
    adagrad: [],
    rmsprop: [RMSPROP_EPS],
    adam: [ADAM_EPS, decayAxis("adam"), AMSGRAD_MAX],
    adamw: [ADAM_EPS, decayAxis("adamw"), AMSGRAD_MAX],
};
/** Every combination of one value per axis, in axis order. */
function combinations(axes) {
    let out = [{}];
    for (const axis of axes) {
        const next = [];
        for (const partial of out)
            for (const value of axis.values)
                next.push({ ...partial, [axis.key]: value });
        out = next;
    }
    return out;
}
function axisVariants(axes, build) {
    return combinations(axes).map((values) => {
        const { factory, patch } = build(values);
        const meanings = Object.values(values)
            .map((v) => v.meaning)
            .filter((m) => m !== undefined);
        return {
            label: axes.map((a) => `${a.title}: ${values[a.key].label}`).join("; ") || "the published rule",
            factory,
            patch,
            lrScale: 1,
            values: Object.fromEntries(Object.entries(values).map(([k, v]) => [k, v.key])),
            accepted: Object.values(values).every((v) => v.accepted),
            ...(meanings.length > 0 ? { meaning: meanings.join("; ") } : {}),
        };
    });
}
/**
 * The catalogue of `method` for a claim (complete reference hyperparameters) and the reference names the
 * optimizer under test lets the check set. Axes that cannot matter for this claim are left out: the
 * AMSGrad maximum unless the claim uses AMSGrad, the weight decay unless it is settable or nonzero.
 */
function methodCatalogue(method, claim, settable) {
    const gamma = typeof claim.momentum === "number" ? claim.momentum : 0;
    switch (method) {
        case "sgd":
            return {
                method,
                title: "gradient descent (SGD)",
                source: "Robbins & Monro (1951), A Stochastic Approximation Method, Ann. Math. Statist. 22(3):400–407",
                factory: optimizers/* sgd */.D5,
                axes: [],
                variants: axisVariants([], () => ({ factory: optimizers/* sgd */.D5, patch: {} })),
                firstStepHint: "the step x −= η·∇f(x) already differs: check the learning rate and how the gradient is used",
                laterStepHint: "step 1 agrees, so something carried between steps differs (the learning rate or a hidden state)",
            };
        case "momentum":
            return {
                method,
                title: "heavy-ball momentum",
                source: `Polyak (1964), USSR Comput. Math. Math. Phys. 4(5):1–17, doi:10.1016/0041-5553(64)90137-5; ${SUTSKEVER}, eq. (1)–(2)`,
                factory: optimizers/* momentum */.Pg,
                axes: [MOMENTUM_FORM],
                variants: [
                    ...axisVariants([MOMENTUM_FORM], (v) => ({ factory: optimizers/* momentum */.Pg, patch: { form: v.form.key } })),
                    {
                        label: "Nesterov's accelerated gradient",
                        factory: optimizers/* nesterov */.fX,
                        patch: { form: "lookahead" },
                        lrScale: 1,
                        values: {},
                        accepted: false,
                        meaning: "they follow Nesterov's method instead: the gradient is taken at the look-ahead point w − γv",
                    },
                    {
                        label: "dampened momentum",
                        factory: optimizers/* momentum */.Pg,
                        patch: { form: "lr-outside" },
                        lrScale: 1 - gamma,
                        values: {},
                        accepted: false,
                        meaning: "the velocity is dampened, b = γb + (1 − γ)g, which scales every step by 1 − γ",
                    },
                ],
                firstStepHint: "the first step −η∇f(w₀) already differs (the velocity starts at zero): check the learning rate and the gradient",
                laterStepHint: "step 1 agrees (the velocity starts at zero), so the gradient step is right and what carries over between steps differs: check the momentum coefficient and the velocity update",
            };
        case "nesterov":
            return {
                method,
                title: "Nesterov's accelerated gradient",
                source: `Nesterov (1983), Soviet Mathematics Doklady 27(2):372–376; ${SUTSKEVER}, eq. (3)–(4)`,
                factory: optimizers/* nesterov */.fX,
                axes: [NESTEROV_FORM, NESTEROV_LR],
                variants: [
                    ...axisVariants([NESTEROV_FORM, NESTEROV_LR], (v) => ({
                        factory: optimizers/* nesterov */.fX,
                        patch: { form: v.form.key, lrPlacement: v.lrPlacement.key },
                    })),
                    ...["lr-inside", "lr-outside"].map((form) => ({
                        label: "heavy-ball momentum",
                        factory: optimizers/* momentum */.Pg,
                        patch: { form },
                        lrScale: 1,
                        values: {},
                        accepted: false,
                        meaning: "the gradient is taken at the current point, not at the look-ahead point w − γv (that is heavy ball)",
                    })),
                ],
                firstStepHint: "the first step already differs (the velocity starts at zero): check the learning rate and the gradient",
                laterStepHint: "step 1 agrees (the velocity starts at zero), so what carries over between steps differs: check the momentum coefficient, the velocity update and where the gradient is taken",
            };
        case "adagrad":
            return {
                method,
                title: "Adagrad",
                source: "Duchi, Hazan & Singer (2011), Adaptive Subgradient Methods for Online Learning and Stochastic Optimization, JMLR 12:2121–2159",
                factory: optimizers/* adagrad */.bw,
                axes: [],
                variants: axisVariants([], () => ({ factory: optimizers/* adagrad */.bw, patch: {} })),
                firstStepHint: "the first step η·g/(δ + |g|) already differs: check the learning rate, δ and the initial accumulator",
                laterStepHint: "step 1 agrees, so the accumulation of squared gradients differs",
            };
        case "rmsprop":
            return {
                method,
                title: "RMSProp",
                source: "Graves (2013), arXiv:1308.0850, §4; Ruder (2016), arXiv:1609.04747, §4.5",
                factory: optimizers/* rmsprop */.m0,
                axes: [RMSPROP_EPS],
                variants: axisVariants([RMSPROP_EPS], (v) => ({
                    factory: optimizers/* rmsprop */.m0,
                    patch: { epsPlacement: v.epsPlacement.key },
                })),
                firstStepHint: "the first step η·g/(√((1 − ρ)g²) + ε) already differs (no bias correction): check ρ, ε and the learning rate",
                laterStepHint: "step 1 agrees, so the running mean of g² differs: check ρ and the update of the mean",
            };
        case "adam":
        case "adamw": {
            const isAdamW = method === "adamw";
            const axes = [ADAM_EPS];
            const lambda = typeof claim.weightDecay === "number" ? claim.weightDecay : 0;
            if (settable.has("weightDecay") || lambda > 0)
                axes.push(decayAxis(method));
            if (claim.amsgrad === true)
                axes.push(AMSGRAD_MAX);
            return {
                method,
                title: isAdamW ? "AdamW" : "Adam",
                source: isAdamW ? `${LOSHCHILOV}, Algorithm 2` : `${KINGMA_BA}, Algorithm 1`,
                factory: isAdamW ? optimizers/* adamw */.dp : optimizers/* adam */.Ch,
                axes,
                variants: axisVariants(axes, (v) => {
                    const decay = v.decay?.key ?? (isAdamW ? "decoupled-scaled" : "coupled");
                    const ams = v.amsgradMax?.key;
                    const patch = { epsPlacement: v.epsPlacement.key };
                    if (ams !== undefined) {
                        patch.amsgrad = ams !== "none";
                        patch.amsgradMax = ams === "none" ? "raw" : ams;
                    }
                    if (decay === "coupled")
                        return { factory: optimizers/* adam */.Ch, patch };
                    return { factory: optimizers/* adamw */.dp, patch: { ...patch, decayScaledByLr: decay === "decoupled-scaled" } };
                }),
                firstStepHint: "the first step α·g/(|g| + ε) per coordinate already differs (Kingma & Ba 2015, Algorithm 1): check the bias correction, ε and the learning rate",
                laterStepHint: "step 1 agrees, so the moment estimates of later steps differ: check β1, β2, the bias corrections and that the step counter advances once per step",
            };
        }
        default:
            throw new RangeError(`methodCatalogue: unknown method ${JSON.stringify(method)}`);
    }
}

;// CONCATENATED MODULE: ./build/package/reference/conformance.js
/**
 * Conformance to a published update rule: is the optimizer under test the method it claims to be, and
 * which of the method's forms does it follow?
 *
 * The optimizer under test and every known form of the claimed method (./variants.ts) run the same
 * probes (./probes.ts): same problem, same start, same hyperparameters, step by step. Each probe is a
 * small deterministic problem, so the same point always gets the same gradient; the probes are chosen so
 * that every convention shows (a learning-rate change for the momentum forms, a large ε for its
 * placement, a zero loss gradient for the weight decay, a falling second moment for AMSGrad). At every
 * step the iterates are compared norm-wise:
 *
 *   d_k = ‖c_k − r_k‖∞ / max(‖c_k‖∞, ‖r_k‖∞)          (relative)
 *
 * and a form *matches* when d_k ≤ tolerance at every step of every probe that ran. The default 1e−9 is far
 * above the rounding differences of equivalent arithmetic in double precision (about 1e−15 per step; a
 * few dozen steps are compared) and far below what a different rule produces on these probes (1e−6 and
 * more); float32 code needs about 1e−5 (docs/decisions/0003-reference-checks.md).
 *
 * The outcome: "is it right" — some accepted form matches (and the `expect` pins hold) — and "which
 * variant" — per convention axis, the values of the forms that match. When no accepted form matches, the
 * message names the first step at which the closest accepted form departs, by how much, and why that is
 * likely (a known mix-up that does match, or what a departure at that step and probe points to).
 */






/** Relative norm-wise difference of two iterates; 0 for bitwise-equal NaN coordinates, Infinity for one-sided non-finite. */
function relativeDifference(a, b) {
    let diff = 0;
    let scale = 0;
    for (let i = 0; i < a.length; i++) {
        const x = a[i];
        const y = b[i];
        if (!Number.isFinite(x) || !Number.isFinite(y)) {
            if (Object.is(x, y))
                continue;
            return Infinity;
        }
        diff = Math.max(diff, Math.abs(x - y));
        scale = Math.max(scale, Math.abs(x), Math.abs(y));
    }
    if (diff === 0)
        return 0;
    return diff / scale;
}
/**
 * The optimizer's name for each non-convention reference hyperparameter: the declared mapping, else the
 * same name when the optimizer declares it (or when its names are unknown), else null.
 */
function resolveNames(method, declared, known) {
    const factory = METHOD_FACTORIES[method];
    const out = {};
    for (const name of Object.keys(factory.hyperSpecs)) {
        if (CONVENTION_KEYS.includes(name))
            continue;
        if (Object.prototype.hasOwnProperty.call(declared, name))
            out[name] = declared[name];
        else
            out[name] = known === undefined || known.includes(name) ? name : null;
    }
    return out;
}
/** The complete claim: reference defaults, then the optimizer's own values (translated), then the declared claim. */
function completeClaim(request, names) {
    const factory = METHOD_FACTORIES[request.method];
    const merged = {};
    for (const [ref, own] of Object.entries(names)) {
        if (own === null || !Object.prototype.hasOwnProperty.call(request.base, own))
            continue;
        const value = request.base[own];
        const spec = factory.hyperSpecs[ref];
        if ((spec.type === "number" && typeof value === "number") ||
            (spec.type === "boolean" && typeof value === "boolean")) {
            merged[ref] = value;
        }
    }
    Object.assign(merged, request.claim);
    return (0,optimizers/* resolveHyper */.Vn)(factory, merged, `${request.where}: the claimed hyperparameters`);
}
/** Reference hyperparameters of one probe: the claim with the probe's settings where they can be set. */
function probeValues(claim, probe, settable) {
    const out = { ...claim };
    for (const [k, v] of Object.entries(probe.set))
        if (settable.has(k))
            out[k] = v;
    return out;
}
function probeRequest(probe, hyper, lr) {
    return {
        definition: probe.definition,
        params: {},
        problemKey: probe.definition.name,
        hyper,
        steps: probe.steps,
        suiteSeed: 0,
        seedIndex: 0,
        ...(probe.lrChange ? { lrChange: { after: probe.lrChange.after, lr: lr * probe.lrChange.factor } } : {}),
    };
}
/** Collects copies of the iterates x₀ … x_n. */
function collector() {
    const iterates = [];
    return { iterates, observe: (_k, x) => iterates.push(Float64Array.from(x)) };
}
/** The reference trajectory of `variant` on `probe`. */
function referenceTrajectory(variant, values, probe) {
    const specs = variant.factory.hyperSpecs;
    const hyper = {};
    for (const [k, v] of Object.entries(values))
        if (Object.prototype.hasOwnProperty.call(specs, k))
            hyper[k] = v;
    Object.assign(hyper, variant.patch);
    const lr = values.lr * variant.lrScale;
    hyper.lr = lr;
    const { iterates, observe } = collector();
    const outcome = runInProcess(variant.factory, probeRequest(probe, hyper, lr), observe);
    if (outcome.steps === 0 && outcome.error !== undefined) {
        throw new Error(`conformance: the reference ${variant.factory.name} could not run probe ${probe.id}: ${outcome.error}`);
    }
    return iterates;
}
/** First step at which two trajectories differ by more than `tolerance`, and the largest difference. */
function compare(candidate, reference, tolerance) {
    let first = null;
    let max = 0;
    const n = Math.max(candidate.length, reference.length);
    for (let k = 0; k < n; k++) {
        const c = candidate[k];
        const r = reference[k];
        const d = c === undefined || r === undefined ? Infinity : relativeDifference(c, r);
        if (d > max)
            max = d;
        if (first === null && !(d <= tolerance))
            first = { step: k, relative: d };
    }
    return { first, max };
}
/** Orders forms from the closest to the farthest: more probes matched, later departure, smaller difference. */
function closer(a, b) {
    if (a.matched !== b.matched)
        return b.matched - a.matched;
    const sa = a.departure?.step ?? Infinity;
    const sb = b.departure?.step ?? Infinity;
    if (sa !== sb)
        return sb - sa;
    return (a.departure?.relative ?? 0) - (b.departure?.relative ?? 0);
}
/** What a departure confined to one special probe says about the code. */
const PROBE_CONCLUSIONS = {
    faint: "ε enters differently from every known form",
    flat: "the weight decay is applied differently from every known form",
    amsgrad: "the running maximum of the second moment is kept differently from every known form",
};
/** Differences this many times smaller than the largest one count as side effects of it. */
const DOMINANCE = 1e3;
/** Why the closest accepted form departs, as a clause. */
function departureHint(catalogue, closest, results, ran) {
    const impostor = results.find((r) => r.departure === null && !r.variant.accepted);
    if (impostor !== undefined)
        return impostor.variant.meaning ?? `they match ${impostor.variant.label}`;
    const dep = closest.departure;
    const failing = ran
        .map((p) => closest.byProbe.get(p.id))
        .filter((d) => d !== null && d !== undefined);
    const dominant = failing.reduce((a, b) => (b.relative > a.relative ? b : a));
    const others = failing.filter((d) => d !== dominant);
    const alone = others.every((d) => d.relative * DOMINANCE <= dominant.relative);
    const probe = dominant.probe;
    if (alone) {
        const where = others.length === 0
            ? `only the probe "${probe.title}" departs`
            : `the difference is largest on the probe "${probe.title}" (${format_short(dominant.relative)}, against at most ` +
                `${format_short(Math.max(...others.map((d) => d.relative)))} elsewhere)`;
        if (probe.id === "schedule" && probe.lrChange && dominant.step === probe.lrChange.after + 1) {
            return `${where}, right after the learning-rate change, so the new learning rate is applied differently from the published rule: one step late, not at all, or to the accumulated velocity`;
        }
        const conclusion = PROBE_CONCLUSIONS[probe.id];
        if (conclusion !== undefined)
            return `${where}, so ${conclusion}`;
    }
    return dep.step <= 1 ? catalogue.firstStepHint : catalogue.laterStepHint;
}
/** Labels of an axis's values, quoted for a list. */
function valueLabels(axis, keys) {
    return keys.map((k) => axis.values.find((v) => v.key === k)?.label ?? k).join(" / ");
}
/**
 * Runs the conformance check. Returns the overall result (id `conformance:OPTIMIZER`) followed by one
 * informational result per convention axis (id `conformance:OPTIMIZER:AXIS`, never gating). Throws an
 * `InputError` when the claimed hyperparameters are invalid for the reference optimizer.
 */
async function checkConformance(request) {
    const { method, tolerance } = request;
    const id = `conformance:${request.optimizer}`;
    const names = resolveNames(method, request.names, request.source.hyperNames);
    const settable = new Set(Object.keys(names).filter((k) => names[k] !== null));
    const claim = completeClaim(request, names);
    const catalogue = methodCatalogue(method, claim, settable);
    const tol = { kind: "relative", value: tolerance };
    const head = `${catalogue.title} conformance`;
    const fail = (summary, extra = {}) => [
        {
            id,
            status: "fail",
            gating: request.gating,
            summary,
            source: catalogue.source,
            tolerance: tol,
            ...extra,
        },
    ];
    // 1. The optimizer under test on every probe it can run.
    const ran = [];
    const skipped = [];
    const candidate = new Map();
    for (const probe of probesFor(method, claim)) {
        const missing = probe.requires.filter((r) => !settable.has(r));
        if (missing.length > 0) {
            skipped.push(`${probe.id} (no setting for ${missing.join(", ")})`);
            continue;
        }
        const values = probeValues(claim, probe, settable);
        const hyper = { ...request.base };
        for (const [ref, own] of Object.entries(names))
            if (own !== null)
                hyper[own] = values[ref];
        const { iterates, observe } = collector();
        const outcome = await request.source.run(probeRequest(probe, hyper, values.lr), observe);
        if (outcome.lrChange === "unsupported") {
            skipped.push(`${probe.id} (the optimizer cannot change its learning rate between steps)`);
            continue;
        }
        if (outcome.error !== undefined) {
            const hint = outcome.steps === 0 ? `; map or drop hyperparameter names with ${request.where}.names` : "";
            return fail(`${head}: the optimizer failed on the probe "${probe.title}": ${outcome.error}${hint}`);
        }
        ran.push(probe);
        candidate.set(probe.id, iterates);
    }
    if (ran.length === 0) {
        return [
            {
                id,
                status: "skipped",
                gating: request.gating,
                summary: `${head}: no probe could run (${skipped.join("; ")})`,
                source: catalogue.source,
            },
        ];
    }
    // 2. Every known form on the same probes.
    const results = [];
    for (const variant of catalogue.variants) {
        let departure = null;
        let matched = 0;
        let maxRelative = 0;
        const byProbe = new Map();
        for (const probe of ran) {
            const reference = referenceTrajectory(variant, probeValues(claim, probe, settable), probe);
            const { first, max } = compare(candidate.get(probe.id), reference, tolerance);
            maxRelative = Math.max(maxRelative, max);
            const dep = first === null ? null : { probe, step: first.step, relative: first.relative };
            byProbe.set(probe.id, dep);
            if (dep === null)
                matched++;
            else if (departure === null ||
                dep.step < departure.step ||
                (dep.step === departure.step && dep.relative > departure.relative)) {
                departure = dep;
            }
        }
        results.push({ variant, departure, matched, maxRelative, byProbe });
    }
    // 3. Which values of each axis are consistent with the iterates.
    const matching = results.filter((r) => r.departure === null);
    const axisResults = catalogue.axes.map((axis) => axisOutcome(axis, matching, ran, request, catalogue));
    const probeList = `${ran.length} probe${ran.length === 1 ? "" : "s"} (${ran.map((p) => p.id).join(", ")})`;
    const notRun = skipped.length > 0 ? `; not run: ${skipped.join("; ")}` : "";
    const acceptedMatches = matching.filter((r) => r.variant.accepted);
    if (acceptedMatches.length > 0) {
        const violated = pinViolations(catalogue, request.expect, acceptedMatches);
        const best = acceptedMatches.reduce((a, b) => (b.maxRelative < a.maxRelative ? b : a));
        if (violated.length > 0) {
            return [
                ...fail(`${head}: ${violated.join("; ")}`, { measured: best.maxRelative, expected: 0 }),
                ...axisResults,
            ];
        }
        const conventions = catalogue.axes.map((axis) => {
            const keys = [...new Set(acceptedMatches.map((r) => r.variant.values[axis.key]))];
            return keys.length === 1
                ? `${axis.title}: ${valueLabels(axis, keys)}`
                : `${axis.title}: indistinguishable`;
        });
        const which = conventions.length > 0 ? `; ${conventions.join("; ")}` : "";
        return [
            {
                id,
                status: "pass",
                gating: request.gating,
                summary: `${head}: matches the published rule step for step on ${probeList} within ${format_short(tolerance)} (relative)${which}${notRun}`,
                source: catalogue.source,
                measured: best.maxRelative,
                expected: 0,
                tolerance: tol,
            },
            ...axisResults,
        ];
    }
    const accepted = results.filter((r) => r.variant.accepted).sort(closer);
    const closest = accepted[0];
    const dep = closest.departure;
    const hint = departureHint(catalogue, closest, results, ran);
    const summary = `${head}: from step ${dep.step} the iterates differ from the published rule by ${format_short(dep.relative)} ` +
        `(relative, probe "${dep.probe.title}"); ${hint}${notRun}`;
    return [...fail(summary, { measured: dep.relative, expected: 0 }), ...axisResults];
}
/** Sentences for every `expect` pin that no matching accepted form satisfies. */
function pinViolations(catalogue, expect, acceptedMatches) {
    const out = [];
    for (const [axisKey, want] of Object.entries(expect)) {
        const axis = catalogue.axes.find((a) => a.key === axisKey);
        if (axis === undefined)
            continue; // an axis that cannot matter for this claim (e.g. AMSGrad off)
        const found = [...new Set(acceptedMatches.map((r) => r.variant.values[axisKey]))];
        if (found.includes(want))
            continue;
        out.push(`the code follows ${axis.title}: ${valueLabels(axis, found)}, but the declaration expects ${valueLabels(axis, [want])}`);
    }
    return out;
}
/** The informational result of one convention axis. */
function axisOutcome(axis, matching, ran, request, catalogue) {
    const id = `conformance:${request.optimizer}:${axis.key}`;
    const base = { id, gating: false, source: catalogue.source };
    const withValue = matching.filter((r) => r.variant.values[axis.key] !== undefined);
    const keys = [...new Set(withValue.map((r) => r.variant.values[axis.key]))];
    const title = `${catalogue.title} ${axis.title}`;
    if (keys.length === 0) {
        return {
            ...base,
            status: "skipped",
            summary: `${title}: not determined, no known form matches the iterates`,
        };
    }
    if (keys.length > 1) {
        const exposed = ran.some((p) => axis.exposedBy.includes(p.id));
        const why = exposed ? `the probes could not tell ${valueLabels(axis, keys)} apart` : axis.whenUnprobed;
        return { ...base, status: "skipped", summary: `${title}: ${why}` };
    }
    const value = axis.values.find((v) => v.key === keys[0]);
    const want = request.expect[axis.key];
    if (!value.accepted) {
        return {
            ...base,
            status: "fail",
            summary: `${title}: ${value.label}; ${value.meaning ?? "not a form of this method"}`,
            source: value.source,
        };
    }
    if (want !== undefined && want !== value.key) {
        return {
            ...base,
            status: "fail",
            summary: `${title}: ${value.label}; the declaration expects ${valueLabels(axis, [want])}`,
            source: value.source,
        };
    }
    return { ...base, status: "pass", summary: `${title}: ${value.label}`, source: value.source };
}
/**
 * Throws an `InputError` unless `expect` names conventions of `method` and forms of the method for them
 * (see METHOD_AXES; a known mix-up such as AMSGrad without its maximum cannot be expected).
 */
function checkExpect(method, expect, axes, where) {
    for (const [key, value] of Object.entries(expect)) {
        const axis = axes.find((a) => a.key === key);
        if (axis === undefined) {
            const known = axes.map((a) => a.key).join(", ") || "none";
            throw new core_errors/* InputError */.d(`${where}.expect.${key} is not a convention of ${method} (known: ${known})`);
        }
        const forms = axis.values.filter((v) => v.accepted).map((v) => v.key);
        if (!forms.includes(value)) {
            throw new core_errors/* InputError */.d(`${where}.expect.${key} must be one of ${forms.map((v) => JSON.stringify(v)).join(", ")}, got ${JSON.stringify(value)}`);
        }
    }
}

;// CONCATENATED MODULE: ./build/package/reference/fit-rate.js
/**
 * Fitted asymptotic rate of a run on a quadratic — what the rate check compares with the spectral radius.
 *
 * The gap g_k = f(x_k) − f* of a linear method behaves asymptotically like C·k^m·ρ^(2k): m = 0 when the
 * blocks attaining ρ are diagonalisable, m = 2 when one has a double root (the error then behaves like
 * k·ρᵏ, the "optimal" parameters of heavy ball and Nesterov do this). So ln g_k − m·ln k is linear in
 * k with slope 2·ln ρ, and ρ = exp(slope/2) is the per-step contraction of the error.
 *
 * Window: from the first step whose gap is at most `upper`·g₀ (past the start-up transient, where the
 * slower-than-dominant components have not yet died out) to the step before the gap first drops below
 * `lower`·g₀ (before rounding noise of the iterates, about 1e-16 relative, dominates). When the dominant
 * roots are complex the gap oscillates (it can come close to zero at single steps), so the window is cut
 * into blocks of at least half an oscillation period and the fit goes through the largest value of each
 * block — the envelope — by least squares. Without oscillation the blocks are single steps.
 *
 * Source: the asymptotic forms are those of ./linear-rate.ts (derived there); the envelope fit is our
 * own choice. Cost: O(window length).
 */
const DEFAULT_FIT = { logPower: 0, block: 1, upper: 1e-3, lower: 1e-16 };
/** Fewest blocks a fit goes through; the block is shortened when the window is short. */
const MIN_BLOCKS = 8;
/**
 * Fits ρ to the gaps g_0 … g_n of one run (index = step). Returns the fit, or the reason none was
 * possible (the gap never got below upper·g₀, or the window is shorter than 8 steps).
 */
function fitRate(gaps, options = {}) {
    const { logPower, upper, lower } = { ...DEFAULT_FIT, ...options };
    const n = gaps.length - 1;
    const g0 = gaps[0];
    if (!(g0 > 0) || !Number.isFinite(g0))
        return { rho: null, why: `the initial gap is ${g0}, not a positive number` };
    let from = -1;
    for (let k = 1; k <= n; k++) {
        const g = gaps[k];
        if (!Number.isFinite(g))
            return { rho: null, why: `the gap is not finite at step ${k}` };
        if (g <= upper * g0) {
            from = k;
            break;
        }
    }
    if (from < 0) {
        return { rho: null, why: `the gap never fell to ${upper} of the initial gap in ${n} steps` };
    }
    let to = n;
    for (let k = from + 1; k <= n; k++) {
        const g = gaps[k];
        if (!Number.isFinite(g) || !(g >= lower * g0)) {
            to = k - 1;
            break;
        }
    }
    const length = to - from + 1;
    if (length < MIN_BLOCKS) {
        return { rho: null, why: `only ${length} steps lie between ${upper} and ${lower} of the initial gap` };
    }
    const block = Math.max(1, Math.min(Math.floor(options.block ?? 1), Math.floor(length / MIN_BLOCKS)));
    let count = 0;
    let sx = 0;
    let sy = 0;
    let sxx = 0;
    let sxy = 0;
    for (let start = from; start + block - 1 <= to; start += block) {
        let bestK = -1;
        let bestY = -Infinity;
        for (let k = start; k < start + block; k++) {
            const g = gaps[k];
            if (!(g > 0))
                continue;
            const y = Math.log(g) - logPower * Math.log(k);
            if (y > bestY) {
                bestY = y;
                bestK = k;
            }
        }
        if (bestK < 0)
            continue;
        count++;
        sx += bestK;
        sy += bestY;
        sxx += bestK * bestK;
        sxy += bestK * bestY;
    }
    const den = count * sxx - sx * sx;
    if (count < 3 || !(den > 0))
        return { rho: null, why: `too few positive gaps in the window [${from}, ${to}]` };
    const slope = (count * sxy - sx * sy) / den;
    return { rho: Math.exp(slope / 2), from, to, points: count, block };
}

;// CONCATENATED MODULE: ./build/package/reference/linear-rate.js
/**
 * Asymptotic convergence rates of the linear first-order methods on a quadratic — the theory the rate
 * check compares a run with.
 *
 * On f(x) = ½ (x − x*)ᵀ A (x − x*) with eigenvalues λ of A, gradient descent, heavy ball and Nesterov's
 * method are linear iterations in the error e = x − x*. In the eigenbasis they decouple into one 2×2
 * block per eigenvalue acting on (e_k, e_{k−1}):
 *
 *   heavy ball (step α, momentum β):  [[1 + β − αλ, −β], [1, 0]]
 *   Nesterov (step α, momentum β):    [[(1 + β)(1 − αλ), −β(1 − αλ)], [1, 0]]
 *   gradient descent:                  heavy ball with β = 0 (roots 1 − αλ and 0)
 *
 * A block [[a, b], [1, 0]] has the characteristic polynomial z² − a·z − b, so its eigenvalues are the
 * roots of z² − t·z + d with t = a, d = −b: real when t² ≥ 4d, else a complex pair of modulus √d. The
 * asymptotic rate of the error is the spectral radius ρ = max over the eigenvalues of the largest root
 * modulus; the gap f − f* contracts like ρ² per step. When the largest root of a block is double (t² = 4d,
 * which the tuned parameters below produce) the block is not diagonalisable and the error behaves like
 * k·ρᵏ instead of ρᵏ, so the gap behaves like k²·ρ^(2k): the fit in ./fit-rate.ts corrects for that.
 *
 * Sources: the blocks are the standard companion form of the three-term recursions (derived here);
 * the tuned closed forms are in `tunedParameters` with their sources. Cost: O(number of eigenvalues).
 */
const LINEAR_METHODS = (/* unused pure expression or super */ null && (["gradient-descent", "heavy-ball", "nesterov"]));
/** Relative distance of two roots below which they count as double (see `BlockRoots.double`). */
const DOUBLE_ROOT_TOLERANCE = 1e-6;
/**
 * Roots of z² − t·z + d = 0 (the eigenvalues of the block [[t, −d], [1, 0]]). The larger real root is
 * computed without cancellation as (t + sign(t)·√(t² − 4d))/2 and the other as d divided by it.
 */
function quadraticRoots(t, d) {
    const disc = t * t - 4 * d;
    if (disc < 0) {
        const modulus = Math.sqrt(d);
        const gap = Math.sqrt(-disc); // |z₁ − z₂|
        return {
            modulus,
            complex: true,
            double: gap <= DOUBLE_ROOT_TOLERANCE * modulus,
            angle: Math.atan2(Math.sqrt(-disc) / 2, t / 2),
        };
    }
    const s = Math.sqrt(disc);
    const r1 = t >= 0 ? (t + s) / 2 : (t - s) / 2;
    const r2 = r1 === 0 ? 0 : d / r1;
    const modulus = Math.max(Math.abs(r1), Math.abs(r2));
    return {
        modulus,
        complex: false,
        double: Math.abs(r1 - r2) <= DOUBLE_ROOT_TOLERANCE * modulus,
        angle: Math.abs(r1) >= Math.abs(r2) ? (r1 < 0 ? Math.PI : 0) : r2 < 0 ? Math.PI : 0,
    };
}
/** The roots of the iteration block of `method` for one eigenvalue λ. */
function blockRoots(method, lr, momentum, lambda) {
    const beta = method === "gradient-descent" ? 0 : momentum;
    if (method === "nesterov") {
        const q = 1 - lr * lambda;
        return quadraticRoots((1 + beta) * q, beta * q);
    }
    return quadraticRoots(1 + beta - lr * lambda, beta);
}
/** Blocks within this relative distance of ρ count as attaining it. */
const DOMINANT = 1e-9;
/**
 * Spectral radius of `method` with step `lr` and momentum `momentum` (ignored by gradient descent) over
 * the given eigenvalues. Throws a RangeError for an empty spectrum or non-finite parameters.
 */
function linearRate(method, lr, momentum, eigenvalues) {
    if (eigenvalues.length === 0)
        throw new RangeError("linearRate: the spectrum is empty");
    if (!Number.isFinite(lr) || !Number.isFinite(momentum)) {
        throw new RangeError(`linearRate: lr and momentum must be finite, got ${lr} and ${momentum}`);
    }
    const roots = [];
    let rho = 0;
    for (let i = 0; i < eigenvalues.length; i++) {
        const r = blockRoots(method, lr, momentum, eigenvalues[i]);
        roots.push(r);
        if (r.modulus > rho)
            rho = r.modulus;
    }
    let lambda = NaN;
    let double = false;
    let slowestAngle = null;
    for (let i = 0; i < roots.length; i++) {
        const r = roots[i];
        if (r.modulus < rho * (1 - DOMINANT))
            continue;
        if (Number.isNaN(lambda) || eigenvalues[i] < lambda)
            lambda = eigenvalues[i];
        if (r.double)
            double = true;
        if (r.complex && !r.double && r.angle > 0 && (slowestAngle === null || r.angle < slowestAngle)) {
            slowestAngle = r.angle;
        }
    }
    return { rho, lambda, double, slowestAngle };
}
const NESTEROV_2004 = "Nesterov (2004), Introductory Lectures on Convex Optimization: A Basic Course, Kluwer (book)";
const POLYAK_1964 = "Polyak (1964), Some methods of speeding up the convergence of iteration methods, USSR Comput. Math. Math. Phys. 4(5):1–17, doi:10.1016/0041-5553(64)90137-5";
/**
 * The classical tuned parameters and their rates, κ = L/μ:
 * - gradient descent, step 2/(L + μ): ρ = (κ − 1)/(κ + 1) (Nesterov 2004, Theorem 2.1.15);
 * - heavy ball, α = 4/(√L + √μ)², β = ((√κ − 1)/(√κ + 1))²: ρ = (√κ − 1)/(√κ + 1) (Polyak 1964);
 * - Nesterov, α = 1/L, β = (√L − √μ)/(√L + √μ): ρ = 1 − 1/√κ (Nesterov 2004, §2.2, constant step scheme).
 * On a quadratic each rate equals the spectral radius of `linearRate` with these parameters exactly
 * (the tests check that). Throws a RangeError unless 0 < μ ≤ L.
 */
function tunedParameters(method, mu, L) {
    if (!(mu > 0 && L >= mu && Number.isFinite(L))) {
        throw new RangeError(`tunedParameters: need 0 < μ ≤ L, got μ = ${mu}, L = ${L}`);
    }
    const sL = Math.sqrt(L);
    const sMu = Math.sqrt(mu);
    switch (method) {
        case "gradient-descent":
            return {
                lr: 2 / (L + mu),
                momentum: 0,
                rate: (L - mu) / (L + mu),
                source: `${NESTEROV_2004}, Theorem 2.1.15`,
            };
        case "heavy-ball": {
            const r = (sL - sMu) / (sL + sMu);
            return {
                lr: 4 / ((sL + sMu) * (sL + sMu)),
                momentum: r * r,
                rate: r,
                source: POLYAK_1964,
            };
        }
        case "nesterov":
            return {
                lr: 1 / L,
                momentum: (sL - sMu) / (sL + sMu),
                rate: 1 - sMu / sL,
                source: `${NESTEROV_2004}, §2.2 (constant step scheme)`,
            };
    }
}
/**
 * The gap sequence the linear theory predicts: each eigen-component of the initial error c_i evolves by
 * its 2×2 block, starting with e₁ = (1 − αλ)·e₀ (the velocity starts at zero in every form), and the gap
 * is ½·Σ λᵢ·eᵢ². `point` "lookahead" measures Nesterov's gap at y_k = w_k + β(w_k − w_{k−1}) (y₀ = w₀),
 * the point the stored-look-ahead form keeps as its parameters; heavy ball and gradient descent have
 * one point only. Writes g_0 … g_steps into `out` (length steps + 1); allocates nothing else.
 * Cost O(n·steps).
 */
function modelGaps(method, lr, momentum, eigenvalues, c0, out, point = "iterate") {
    const n = eigenvalues.length;
    const beta = method === "gradient-descent" ? 0 : momentum;
    const ahead = method === "nesterov" && point === "lookahead";
    out.fill(0);
    const steps = out.length - 1;
    for (let i = 0; i < n; i++) {
        const lambda = eigenvalues[i];
        const h = 0.5 * lambda;
        const q = 1 - lr * lambda;
        let prev = c0[i];
        let cur = q * prev;
        out[0] += h * prev * prev;
        if (steps >= 1) {
            const y = ahead ? (1 + beta) * cur - beta * prev : cur;
            out[1] += h * y * y;
        }
        for (let k = 2; k <= steps; k++) {
            const next = method === "nesterov"
                ? q * ((1 + beta) * cur - beta * prev)
                : (1 + beta - lr * lambda) * cur - beta * prev;
            prev = cur;
            cur = next;
            const y = ahead ? (1 + beta) * cur - beta * prev : cur;
            out[k] += h * y * y;
        }
    }
    return out;
}

;// CONCATENATED MODULE: ./build/package/reference/spectrum.js
/**
 * What the rate and stationary-variance checks need to know about a quadratic problem instance: its
 * eigenvalues, the eigenvectors (rotation) and the minimiser, and for the noisy quadratic the noise level.
 * Read from the instance's own fields (src/problems/quadratic.ts, src/problems/noisy-quadratic.ts), so
 * any problem exposing the same fields qualifies.
 */

/** An instance of the problem with dummy noise, for reading its structure (never for a run). */
function probeInstance(definition, params) {
    return definition.create(params, { noise: new core_rng/* Pcg32 */._8(0n, 0n) });
}
/** The facts of a quadratic instance, or null when the instance does not expose its eigenvalues. */
function quadraticFacts(instance) {
    const fields = instance;
    const eigenvalues = fields.eigenvalues;
    if (!(eigenvalues instanceof Float64Array) || eigenvalues.length !== instance.dim)
        return null;
    if (instance.xStar === null)
        return null;
    const rotation = fields.rotation instanceof Float64Array ? fields.rotation : null;
    const sigma = typeof fields.sigma === "number" ? fields.sigma : 0;
    return { instance, eigenvalues, rotation, xStar: instance.xStar, sigma };
}
/** Coordinates of x − x* in the eigenbasis: c = Q·(x − x*). */
function eigenCoordinates(facts, x) {
    const n = x.length;
    const out = new Float64Array(n);
    const q = facts.rotation;
    for (let i = 0; i < n; i++) {
        if (q === null) {
            out[i] = x[i] - facts.xStar[i];
            continue;
        }
        let s = 0;
        for (let j = 0; j < n; j++)
            s += q[i * n + j] * (x[j] - facts.xStar[j]);
        out[i] = s;
    }
    return out;
}

;// CONCATENATED MODULE: ./build/package/reference/rate-check.js
/**
 * Theoretical rate on a quadratic: does the optimizer under test converge at the rate its method has?
 *
 * Theory (./linear-rate.ts): for gradient descent, heavy ball and Nesterov with step α and momentum β,
 * the error contracts asymptotically by ρ per step, ρ the spectral radius of the iteration matrix over
 * the problem's eigenvalues; with the classical tuned parameters ρ has a closed form (Nesterov 2004,
 * Theorem 2.1.15 and §2.2; Polyak 1964), which the check confirms equals the spectral radius.
 *
 * Measurement: one run of the optimizer under test from the suite's start point of seed 0, its gap
 * f − f* at every step, and ρ fitted over a long window (./fit-rate.ts: from 1e−3 to 1e−16 of the initial
 * gap, corrected for the k·ρᵏ behaviour of double roots, through the envelope when the error oscillates).
 *
 * Comparison: over a finite window, slower eigen-components that have not yet died out bias any fitted
 * rate (by up to several percent on clustered spectra). So the same fit is applied to the gap sequence
 * the linear theory itself predicts from the same start (`modelGaps`; for Nesterov both at w_k and at
 * the look-ahead point, whichever the code keeps), and the run must match that within `tolerance` of
 * the convergence speed −ln ρ: |ρ̂_run/ρ̂_theory − 1| ≤ tolerance·|ln ρ|. A correct implementation
 * matches to about 1e−10 (docs/decisions/0003-reference-checks.md); a wrong momentum coefficient, a
 * dropped look-ahead or a wrong step scaling changes −ln ρ by several percent or more.
 */





const METHOD_NAMES = {
    "gradient-descent": "gradient descent",
    "heavy-ball": "heavy ball",
    nesterov: "Nesterov",
};
const BLOCKS = {
    "gradient-descent": "1 − αλ",
    "heavy-ball": "[[1 + β − αλ, −β], [1, 0]]",
    nesterov: "[[(1 + β)(1 − αλ), −β(1 − αλ)], [1, 0]]",
};
/** Window of the fit, relative to the initial gap (see ./fit-rate.ts). */
const UPPER = 1e-3;
const LOWER = 1e-16;
/**
 * Reads a number hyperparameter of the case; throws an InputError naming the declaration otherwise.
 * `tunable`: the declaration could use `tuned: true` instead (rate checks).
 */
function numberHyper(spec, name, where, role, tunable = false) {
    const value = spec.hyper[name];
    if (typeof value !== "number" || !Number.isFinite(value)) {
        throw new core_errors/* InputError */.d(`${where}: case ${spec.id} has no number hyperparameter ${(0,core_errors/* quote */.h)(name)} for the ${role} (got ${(0,core_errors/* quote */.h)(value)}); ` +
            `name it in names.${role === "step size" ? "lr" : "momentum"}${tunable ? " or set tuned: true" : ""}`);
    }
    return value;
}
/** Runs the rate check on one case. */
async function checkRate(request) {
    const { spec, method } = request;
    const id = `rate:${method}`;
    const instance = probeInstance(request.definition, spec.params);
    const facts = quadraticFacts(instance);
    if (facts === null || instance.stochastic) {
        throw new core_errors/* InputError */.d(`${request.where}: problem ${spec.problemKey} has no exposed eigenvalues (rate checks need quadratic)`);
    }
    const eig = facts.eigenvalues;
    let mu = Infinity;
    let L = -Infinity;
    for (const l of eig) {
        mu = Math.min(mu, l);
        L = Math.max(L, l);
    }
    let lr;
    let momentum;
    let sourceText = `spectral radius of the ${METHOD_NAMES[method]} iteration, block ${BLOCKS[method]} per eigenvalue λ (derived here; ${method === "nesterov" ? NESTEROV_2004 + ", §2.2" : method === "heavy-ball" ? POLYAK_1964 : NESTEROV_2004 + ", §2.1"})`;
    let closedForm = null;
    if (request.tuned) {
        const t = tunedParameters(method, mu, L);
        lr = t.lr;
        momentum = t.momentum;
        closedForm = t.rate;
        sourceText = `${t.source}; ${sourceText}`;
    }
    else {
        lr = numberHyper(spec, request.names.lr, request.where, "step size");
        momentum =
            method === "gradient-descent"
                ? 0
                : numberHyper(spec, request.names.momentum, request.where, "momentum");
    }
    const theory = linearRate(method, lr, momentum, eig);
    const rho = theory.rho;
    const params = method === "gradient-descent" ? `α = ${fmt(lr)}` : `α = ${fmt(lr)}, β = ${fmt(momentum)}`;
    const head = `rate (${METHOD_NAMES[method]}${request.tuned ? ", tuned" : ""}, ${params}, μ = ${fmt(mu)}, L = ${fmt(L)})`;
    // At the tuned parameters the dominant roots are double, where a discriminant of rounding size (1e−16)
    // moves the computed root by its square root: agreement to 1e−7 (relative) is all double precision gives.
    if (closedForm !== null && !(Math.abs(closedForm - rho) <= 1e-7 * closedForm)) {
        throw new Error(`${head}: closed form ${closedForm} and spectral radius ${rho} disagree; this is a bug in gradgate`);
    }
    const base = { id, gating: request.gating, source: sourceText };
    if (!(rho < 1)) {
        return {
            ...base,
            status: "skipped",
            summary: `${head}: the iteration does not contract (ρ = ${fmt(rho)} ≥ 1), so there is no rate to check`,
        };
    }
    const lnRho = Math.log(rho);
    const needed = Math.ceil((1.5 * Math.log(LOWER)) / (2 * lnRho)) + 100;
    if (needed > request.maxSteps) {
        return {
            ...base,
            status: "skipped",
            summary: `${head}: ρ = ${fmt(rho)} needs about ${needed} steps to fall to ${LOWER} of the initial gap, more than steps = ${request.maxSteps}`,
        };
    }
    const hyper = { ...spec.hyper };
    if (request.tuned) {
        hyper[request.names.lr] = lr;
        if (method !== "gradient-descent")
            hyper[request.names.momentum] = momentum;
    }
    const gaps = new Float64Array(needed + 1).fill(NaN);
    let x0 = null;
    const fStar = instance.fStar;
    const outcome = await request.source.run({
        definition: request.definition,
        params: spec.params,
        problemKey: spec.problemKey,
        hyper,
        steps: needed,
        suiteSeed: request.suiteSeed,
        seedIndex: 0,
    }, (k, x) => {
        if (k === 0)
            x0 = Float64Array.from(x);
        gaps[k] = instance.objective(x) - fStar;
    });
    if (outcome.error !== undefined || x0 === null) {
        return {
            ...base,
            status: "fail",
            summary: `${head}: the run failed: ${outcome.error ?? "no start point was observed"}`,
        };
    }
    const fitOptions = {
        logPower: theory.double ? 2 : 0,
        block: theory.slowestAngle === null ? 1 : Math.ceil(Math.PI / theory.slowestAngle),
        upper: UPPER,
        lower: LOWER,
    };
    const run = fitRate(gaps, fitOptions);
    if (run.rho === null) {
        return {
            ...base,
            status: "fail",
            summary: `${head}: no rate could be fitted: ${run.why}, although the theory's ρ = ${fmt(rho)} reaches ${LOWER} of the initial gap in about ${Math.ceil(Math.log(LOWER) / (2 * lnRho))} steps`,
            expected: rho,
        };
    }
    const c0 = eigenCoordinates(facts, x0);
    const points = method === "nesterov" ? ["iterate", "lookahead"] : ["iterate"];
    let best = null;
    for (const point of points) {
        const model = fitRate(modelGaps(method, lr, momentum, eig, c0, new Float64Array(needed + 1), point), fitOptions);
        if (model.rho === null)
            continue;
        if (best === null || Math.abs(run.rho / model.rho - 1) < Math.abs(run.rho / best.rho - 1)) {
            best = { rho: model.rho, point };
        }
    }
    if (best === null)
        throw new Error(`${head}: the theory's own gap sequence could not be fitted; this is a bug in gradgate`);
    const allowed = request.tolerance * Math.abs(lnRho);
    const relative = Math.abs(run.rho / best.rho - 1);
    const speedRatio = Math.log(run.rho) / Math.log(best.rho);
    const closed = closedForm === null ? "" : ` = ${closedFormText(method)}`;
    const theoryText = `spectral radius ρ = ${fmt(rho)}${closed}` +
        (fmt(best.rho) !== fmt(rho)
            ? `; ${fmt(best.rho)} over this window, where slower components have not died out`
            : "");
    const window = `steps ${run.from}–${run.to}`;
    const tolerance = { kind: "relative", value: allowed };
    if (relative <= allowed) {
        return {
            ...base,
            status: "pass",
            summary: `${head}: the run contracts by ρ = ${fmt(run.rho)} per step over ${window}, as the theory predicts (${theoryText}); tolerance ${pct(request.tolerance)} of the convergence speed −ln ρ`,
            measured: run.rho,
            expected: best.rho,
            tolerance,
        };
    }
    const direction = speedRatio < 1 ? "slower" : "faster";
    return {
        ...base,
        status: "fail",
        summary: `${head}: the run contracts by ρ = ${fmt(run.rho)} per step over ${window}, the theory predicts ${fmt(best.rho)} (${theoryText}): ` +
            `${pct(Math.abs(1 - speedRatio))} ${direction} convergence (−ln ρ ${fmt(-Math.log(run.rho))} vs ${fmt(-Math.log(best.rho))}), tolerance ${pct(request.tolerance)}`,
        measured: run.rho,
        expected: best.rho,
        tolerance,
    };
}
function closedFormText(method) {
    switch (method) {
        case "gradient-descent":
            return "(κ − 1)/(κ + 1)";
        case "heavy-ball":
            return "(√κ − 1)/(√κ + 1)";
        case "nesterov":
            return "1 − 1/√κ";
    }
}

;// CONCATENATED MODULE: ./build/package/reference/config.js
/**
 * The `checks` section of a suite config: validated against its JSON Schema fragment (the single home of
 * its defaults, `checksSchema` in src/config/schema.ts) and bound to the resolved suite — every
 * declaration to the cases it applies to — with one clear message per mistake naming the field, the bad
 * value and the expected form.
 */









let config_validator = null;
function config_compile() {
    if (config_validator === null) {
        // verbose: errors carry their schema, so a message can list the known fields
        const ajv = new _2020.Ajv2020({
            allErrors: true,
            verbose: true,
            useDefaults: true,
            strict: true,
            allowUnionTypes: true,
        });
        // Wrapped, because ajv applies defaults to properties only (not to the schema root).
        config_validator = ajv.compile({ type: "object", properties: { checks: checksSchema } });
    }
    return config_validator;
}
/** "/checks/rate/0/method" → ".rate[0].method". */
function pathOf(pointer) {
    return pointer
        .split("/")
        .slice(2)
        .map((p) => (/^\d+$/.test(p) ? `[${p}]` : `.${p}`))
        .join("");
}
function config_describe(errors, data, where) {
    const lines = [];
    const seen = new Set();
    for (const e of errors) {
        const path = pathOf(e.instancePath);
        const field = `${where}${path}`;
        const p = e.params;
        let value = data;
        for (const part of e.instancePath.split("/").slice(1))
            value = value?.[part];
        let line;
        switch (e.keyword) {
            case "additionalProperties": {
                const known = Object.keys(e.parentSchema?.properties ?? {}).join(", ");
                line = `${field}.${String(p.additionalProperty)} is not a known field (known: ${known})`;
                break;
            }
            case "required":
                line = `${field}.${String(p.missingProperty)} is required`;
                break;
            case "enum":
                line = `${field} must be one of ${p.allowedValues.map((v) => JSON.stringify(v)).join(", ")}, got ${(0,core_errors/* quote */.h)(value)}`;
                break;
            case "type":
                line = `${field} must be ${[p.type]
                    .flat()
                    .map((t) => (t === "null" ? "null" : /^[aeiou]/.test(String(t)) ? `an ${t}` : `a ${t}`))
                    .join(" or ")}, got ${(0,core_errors/* quote */.h)(value)}`;
                break;
            case "minimum":
            case "maximum":
            case "exclusiveMinimum":
            case "exclusiveMaximum": {
                const op = { minimum: "≥", maximum: "≤", exclusiveMinimum: ">", exclusiveMaximum: "<" }[e.keyword];
                line = `${field} must be ${op} ${String(p.limit)}, got ${(0,core_errors/* quote */.h)(value)}`;
                break;
            }
            default:
                line = `${field} ${e.message ?? "is invalid"}, got ${(0,core_errors/* quote */.h)(value)}`;
        }
        const key = `${path}|${e.keyword}`;
        if (seen.has(key))
            continue;
        seen.add(key);
        lines.push(line);
    }
    return lines.join("\n");
}
/** Validates the `checks` section and fills in its defaults. `where` names it, e.g. "config gradgate.yml: checks". */
function parseChecks(raw, where) {
    const data = structuredClone(raw ?? {});
    if (data === null || typeof data !== "object" || Array.isArray(data)) {
        throw new core_errors/* InputError */.d(`${where} must be a mapping, got ${(0,core_errors/* quote */.h)(raw)}`);
    }
    const validate = config_compile();
    const wrapped = { checks: data };
    if (!validate(wrapped))
        throw new core_errors/* InputError */.d(config_describe(validate.errors ?? [], wrapped, where));
    return wrapped.checks;
}
function knownOptimizers(suite) {
    return [...new Set(suite.cases.map((c) => c.optimizer))];
}
function checkOptimizer(suite, name, where) {
    const known = knownOptimizers(suite);
    if (!known.includes(name)) {
        throw new core_errors/* InputError */.d(`${where}.optimizer ${(0,core_errors/* quote */.h)(name)} is not an optimizer of the suite (known: ${known.join(", ")})`);
    }
}
/** The cases a declaration applies to; at least one, else an error saying what the suite has. */
function matchCases(suite, d, where) {
    checkOptimizer(suite, d.optimizer, where);
    // Scenario cases replay a resume or a learning-rate change, which the checks' own runs do not: ordinary cases only.
    const own = suite.cases.filter((c) => c.optimizer === d.optimizer && c.scenario === undefined);
    const found = own.filter((c) => (c.problem === d.problem || c.problemKey === d.problem) && (d.set === undefined || c.set === d.set));
    if (found.length === 0) {
        const problems = [...new Set(own.map((c) => c.problemKey))].join(", ");
        const sets = [...new Set(own.map((c) => c.set))].join(", ");
        throw new core_errors/* InputError */.d(`${where} matches no case: ${d.optimizer} runs ${problems} (sets: ${sets}), not ${(0,core_errors/* quote */.h)(d.problem)}` +
            (d.set !== undefined ? ` in set ${(0,core_errors/* quote */.h)(d.set)}` : ""));
    }
    return found.map((spec) => ({ spec, definition: (0,problems/* getProblem */.Ai)(spec.problem) }));
}
/**
 * Validates `raw` (the config's `checks`, possibly absent) and binds every declaration to the suite.
 * `file` names the config in messages.
 */
function resolveChecks(raw, suite, file) {
    const where = `config ${file}: checks`;
    const checks = parseChecks(raw, where);
    const minimum = checks.minimum.map((d, i) => {
        const w = `${where}.minimum[${i}]`;
        const cases = matchCases(suite, d, w);
        for (const { spec, definition } of cases) {
            const basins = (definition.basins ?? []).map((b) => b.name);
            if (d.basin === "global") {
                if (spec.fStarKind === "lower-bound") {
                    throw new core_errors/* InputError */.d(`${w}: problem ${spec.problemKey} knows only a lower bound of f*, so it has no known minimum to reach`);
                }
            }
            else if (!basins.includes(d.basin)) {
                throw new core_errors/* InputError */.d(`${w}.basin ${(0,core_errors/* quote */.h)(d.basin)} is not a basin of problem ${definition.name} (known: global${basins.map((b) => ", " + b).join("")})`);
            }
            const target = d.basin === "global" ? spec.fStar : definition.basins.find((b) => b.name === d.basin).f;
            if (d.tolerance.kind === "relative" && target === 0) {
                throw new core_errors/* InputError */.d(`${w}.tolerance: a relative tolerance needs a nonzero target, and ${spec.problemKey} has f = 0 there; use kind: absolute`);
            }
        }
        return {
            where: w,
            optimizer: d.optimizer,
            gating: d.gating,
            cases,
            basin: d.basin,
            tolerance: d.tolerance,
            share: d.share,
        };
    });
    const rate = checks.rate.map((d, i) => {
        const w = `${where}.rate[${i}]`;
        const cases = matchCases(suite, d, w);
        for (const { spec, definition } of cases) {
            const instance = probeInstance(definition, spec.params);
            if (quadraticFacts(instance) === null || instance.stochastic) {
                throw new core_errors/* InputError */.d(`${w}.problem: ${spec.problemKey} has no known spectrum; rate checks need a quadratic (quadratic, or noisy-quadratic with sigma: 0)`);
            }
            if (!d.tuned) {
                numberHyper(spec, d.names.lr, w, "step size", true);
                if (d.method !== "gradient-descent")
                    numberHyper(spec, d.names.momentum, w, "momentum", true);
            }
        }
        return {
            where: w,
            optimizer: d.optimizer,
            gating: d.gating,
            cases,
            method: d.method,
            tuned: d.tuned,
            names: d.names,
            tolerance: d.tolerance,
            steps: d.steps,
        };
    });
    const stationary = checks.stationary.map((d, i) => {
        const w = `${where}.stationary[${i}]`;
        const cases = matchCases(suite, d, w);
        for (const { spec, definition } of cases) {
            const facts = quadraticFacts(probeInstance(definition, spec.params));
            if (facts === null || !(facts.sigma > 0) || facts.rotation !== null) {
                throw new core_errors/* InputError */.d(`${w}.problem: ${spec.problemKey} is not a diagonal quadratic with gradient noise (use noisy-quadratic with sigma > 0)`);
            }
            const lr = numberHyper(spec, d.names.lr, w, "step size");
            const bad = Array.from(facts.eigenvalues).find((l) => !(lr * l > 0 && lr * l < 2));
            if (bad !== undefined) {
                throw new core_errors/* InputError */.d(`${w}: case ${spec.id} has lr·λ = ${lr * bad} for λ = ${bad}; SGD has a stationary distribution only for 0 < lr·λ < 2`);
            }
        }
        return {
            where: w,
            optimizer: d.optimizer,
            gating: d.gating,
            cases,
            names: d.names,
            precision: d.precision,
            sigmas: d.sigmas,
        };
    });
    const conformance = checks.conformance.map((d, i) => {
        const w = `${where}.conformance[${i}]`;
        checkOptimizer(suite, d.optimizer, w);
        if (!variants_METHODS.includes(d.method)) {
            throw new core_errors/* InputError */.d(`${w}.method must be one of ${variants_METHODS.map((m) => JSON.stringify(m)).join(", ")}, got ${(0,core_errors/* quote */.h)(d.method)}`);
        }
        const spec = suite.cases.find((c) => c.optimizer === d.optimizer && c.set === d.set && c.scenario === undefined);
        if (spec === undefined) {
            const sets = [
                ...new Set(suite.cases.filter((c) => c.optimizer === d.optimizer).map((c) => c.set)),
            ].join(", ");
            throw new core_errors/* InputError */.d(`${w}.set ${(0,core_errors/* quote */.h)(d.set)} is not a hyperparameter set of ${d.optimizer} (known: ${sets})`);
        }
        const factory = METHOD_FACTORIES[d.method];
        const referenceNames = Object.keys(factory.hyperSpecs).filter((k) => !CONVENTION_KEYS.includes(k));
        for (const key of Object.keys(d.names)) {
            if (!referenceNames.includes(key)) {
                throw new core_errors/* InputError */.d(`${w}.names.${key} is not a hyperparameter of ${d.method} (known: ${referenceNames.join(", ")})`);
            }
        }
        const hyper = d.hyper ?? {};
        for (const key of Object.keys(hyper)) {
            if (CONVENTION_KEYS.includes(key)) {
                throw new core_errors/* InputError */.d(`${w}.hyper.${key} selects a form, which the check finds out itself; pin it with ${w}.expect.${key} instead`);
            }
        }
        (0,optimizers/* resolveHyper */.Vn)(factory, hyper, `${w}.hyper`);
        checkExpect(d.method, d.expect, METHOD_AXES[d.method], w);
        return {
            where: w,
            optimizer: d.optimizer,
            gating: d.gating,
            set: d.set,
            method: d.method,
            hyper,
            names: d.names,
            expect: d.expect,
            tolerance: d.tolerance,
            spec,
        };
    });
    return { minimum, rate, stationary, conformance };
}

;// CONCATENATED MODULE: ./build/package/reference/known-minimum.js


/**
 * One unit in the last digit of `value` as JavaScript spells it (its shortest round-trip form):
 * 48.9842 → 1e−4, 1.12793e−8 → 1e−13, 0 → 0. A value computed to full precision gets about 1e−16 relative.
 */
function lastDigitUnit(value) {
    if (value === 0 || !Number.isFinite(value))
        return 0;
    const text = Math.abs(value).toExponential();
    const [mantissa, exponent] = text.split("e");
    const decimals = mantissa.includes(".") ? mantissa.split(".")[1].length : 0;
    return Math.pow(10, Number(exponent) - decimals);
}
function targets(definition, spec) {
    const out = [];
    if (spec.fStarKind !== "lower-bound") {
        out.push({
            name: "global",
            f: spec.fStar,
            text: `the global minimum f* = ${spec.fStar}`,
            source: definition.fStarNote ? `${definition.source}; ${definition.fStarNote}` : definition.source,
        });
    }
    for (const b of definition.basins ?? [])
        out.push(basinTarget(b));
    return out;
}
function basinTarget(b) {
    return {
        name: b.name,
        f: b.f,
        text: `the ${b.name} basin f = ${b.f} at (${b.x.join(", ")})`,
        source: b.source,
    };
}
/** The largest |f − target| a run may have: the declared tolerance plus the rounding of the target. */
function allowance(target, tolerance) {
    const declared = tolerance.kind === "absolute" ? tolerance.value : tolerance.value * Math.abs(target);
    return declared + lastDigitUnit(target);
}
/** Whether `f` is at target `t`, to name where a run ended: the allowance, but at least 1e−6·max(1, |t|). */
function near(f, t, tolerance) {
    return Math.abs(f - t.f) <= Math.max(allowance(t.f, tolerance), 1e-6 * Math.max(1, Math.abs(t.f)));
}
/** Final losses of the case's seeds from the check's own runs. */
async function ownRuns(request) {
    const { spec, source } = request;
    if (source === undefined)
        throw new Error("known minimum: neither results nor a source to run the case");
    const instance = probeInstance(request.definition, spec.params);
    const out = [];
    for (let seed = 0; seed < spec.seeds; seed++) {
        let last = NaN;
        const outcome = await source.run({
            definition: request.definition,
            params: spec.params,
            problemKey: spec.problemKey,
            hyper: spec.hyper,
            steps: spec.budget.steps,
            suiteSeed: request.suiteSeed,
            seedIndex: seed,
        }, (_k, x) => {
            last = instance.objective(x);
        });
        if (outcome.error !== undefined)
            out.push({ seed, f: null, why: outcome.error });
        else
            out.push({ seed, f: Number.isFinite(last) ? last : null, why: "the loss is not finite" });
    }
    return out;
}
function fromResults(spec, runs) {
    return runs.map((r) => {
        if (r.finalGap !== null)
            return { seed: r.seed, f: spec.fStar + r.finalGap };
        const why = r.stop === "error"
            ? `failed: ${r.error ?? "no reason given"}`
            : r.divergedAt !== null
                ? `diverged (${r.divergence ?? "unknown"}) at step ${r.divergedAt}`
                : `ended without a final loss (${r.stop})`;
        return { seed: r.seed, f: null, why };
    });
}
/** Runs the known-minimum check on one case. */
async function checkKnownMinimum(request) {
    const { spec, tolerance } = request;
    const all = targets(request.definition, spec);
    const target = all.find((t) => t.name === request.basin);
    if (target === undefined)
        throw new Error(`known minimum: ${spec.problemKey} has no target ${request.basin}`);
    const id = request.basin === "global" ? "known-minimum" : `known-minimum:${request.basin}`;
    const allowed = allowance(target.f, tolerance);
    const rounding = lastDigitUnit(target.f);
    const finals = request.runs !== undefined ? fromResults(spec, request.runs) : await ownRuns(request);
    const required = Math.ceil(request.share * finals.length - 1e-9);
    const misses = [];
    let reached = 0;
    let worst = 0;
    let worstF = null;
    for (const run of finals) {
        if (run.f === null) {
            misses.push(`seed ${run.seed} ${run.why ?? "has no final loss"}`);
            continue;
        }
        const off = Math.abs(run.f - target.f);
        if (off >= worst) {
            worst = off;
            worstF = run.f;
        }
        if (off <= allowed) {
            reached++;
            continue;
        }
        const other = all.find((t) => t !== target && near(run.f, t, tolerance));
        const at = other ? `, ${other.text}` : `, ${format_short(off)} away`;
        misses.push(`seed ${run.seed} ended at f = ${Number(run.f.toPrecision(7))}${at}`);
    }
    const tolText = `${format_short(tolerance.value)} (${tolerance.kind})` +
        (rounding > 0 ? ` plus ${format_short(rounding)} for the last digit of the published value` : "");
    const reportedTolerance = tolerance.kind === "absolute"
        ? { kind: "absolute", value: allowed }
        : { kind: "relative", value: allowed / Math.abs(target.f) };
    const base = {
        id,
        gating: request.gating,
        source: target.source,
        measured: worstF,
        expected: target.f,
        tolerance: reportedTolerance,
    };
    const head = `known minimum (${target.text})`;
    if (finals.length > 0 && reached >= required) {
        const rest = misses.length > 0 ? `; ${misses.join("; ")}` : "";
        return {
            ...base,
            status: "pass",
            summary: `${head}: ${reached} of ${finals.length} seeds reached it within ${tolText}; largest |f − ${target.f}| = ${format_short(worst)}${rest}`,
        };
    }
    return {
        ...base,
        status: "fail",
        summary: `${head}: ${reached} of ${finals.length} seeds reached it within ${tolText}, ${required} required: ${misses.join("; ") || "no runs"}`,
    };
}

;// CONCATENATED MODULE: ./build/package/reference/stationary.js
/**
 * Stationary variance of SGD on the noisy quadratic, and how precisely a time average estimates it —
 * the theory behind the stationary-variance check.
 *
 * Model: f(x) = ½ Σᵢ λᵢ xᵢ², gradient estimates ∇f(x) + σz with z ~ N(0, I) independent across steps,
 * plain SGD x ← x − η·(∇f(x) + σz). Per coordinate (dropping i):
 *
 *   x_{t+1} = a·x_t − ησ·z_t,   a = 1 − ηλ.
 *
 * For |a| < 1 (0 < ηλ < 2) this is a stable AR(1) process. Taking the variance of both sides in the
 * stationary state, v = a²·v + η²σ², so
 *
 *   E[x²] → v = η²σ²/(1 − a²) = η²σ²/(ηλ(2 − ηλ)) = ησ²/(λ(2 − ηλ)).
 *
 * (Derived here; the mean loss Σ ½λᵢvᵢ = Σ ησ²/(2(2 − ηλᵢ)) is `sgdStationaryLoss` in
 * src/problems/noisy-quadratic.ts.) From x₀ the mean square approaches v geometrically:
 * E[x_t²] − v = a^(2t)·(x₀² − v) (same recursion without noise).
 *
 * Precision of a time average. In the stationary state Cov(x_t, x_{t+h}) = v·a^|h| and, x being
 * Gaussian, Cov(x_t², x_{t+h}²) = 2·(v·a^|h|)² (Isserlis 1918, Biometrika 12(1/2):134–139). The variance
 * of the mean of T consecutive x_t² is, for T ≫ 1/(1 − a²), (1/T)·Σ_h 2v²a^(2|h|) (the long-run variance
 * of a stationary sequence: common practice), so its relative standard error is
 *
 *   se = √(2(1 + a²) / (T(1 − a²))).
 *
 * Cost: O(1) per call.
 */
/** Throws a RangeError unless 0 < ηλ < 2 (otherwise SGD has no stationary distribution). */
function checkStable(lambda, lr) {
    const t = lr * lambda;
    if (!(t > 0 && t < 2)) {
        throw new RangeError(`SGD has no stationary distribution unless 0 < lr·λ < 2; got lr = ${lr}, λ = ${lambda}`);
    }
    return 1 - t;
}
/** v = ησ²/(λ(2 − ηλ)): the stationary E[x²] of one coordinate with curvature λ (see above). */
function sgdStationaryVariance(lambda, sigma, lr) {
    checkStable(lambda, lr);
    return (lr * sigma * sigma) / (lambda * (2 - lr * lambda));
}
/** Relative standard error √(2(1 + a²)/(T(1 − a²))) of the mean of T stationary values of x², a = 1 − ηλ. */
function timeAverageRelativeError(lambda, lr, steps) {
    const a = checkStable(lambda, lr);
    const a2 = a * a;
    return Math.sqrt((2 * (1 + a2)) / (steps * (1 - a2)));
}
/**
 * Steps to discard so that the start-up transient biases the time average by at most `fraction` of its
 * standard error: the transient adds at most a^(2B)·|x₀² − v|/(1 − a²) to the sum of the averaged
 * values, i.e. a^(2B)·|x₀² − v|/((1 − a²)·T·v) to the relative mean.
 */
function burnInSteps(lambda, sigma, lr, x0, steps, fraction) {
    const a = checkStable(lambda, lr);
    const v = sgdStationaryVariance(lambda, sigma, lr);
    const excess = Math.abs(x0 * x0 - v) / ((1 - a * a) * steps * v);
    const allowed = fraction * timeAverageRelativeError(lambda, lr, steps);
    if (excess <= allowed || a === 0)
        return 0;
    return Math.ceil(Math.log(allowed / excess) / (2 * Math.log(Math.abs(a))));
}
/**
 * Averaged steps T that make the relative standard error of the slowest coordinate at most `target`:
 * T = 2(1 + a²)/((1 − a²)·target²) with a for the eigenvalue where that is largest.
 */
function stepsForPrecision(eigenvalues, lr, target) {
    let worst = 0;
    for (let i = 0; i < eigenvalues.length; i++) {
        const a = checkStable(eigenvalues[i], lr);
        const a2 = a * a;
        worst = Math.max(worst, (2 * (1 + a2)) / (1 - a2));
    }
    return Math.ceil(worst / (target * target));
}

;// CONCATENATED MODULE: ./build/package/reference/stationary-check.js
/**
 * SGD's stationary variance on the noisy quadratic: does the optimizer under test, claimed to be plain
 * SGD with step η, settle into the noise floor the closed form predicts?
 *
 * Theory (./stationary.ts, derived there): E[xᵢ²] → vᵢ = ησ²/(λᵢ(2 − ηλᵢ)) per coordinate.
 * Measurement: one long run from the suite's start point of seed 0 with the suite's noise stream; the
 * first B steps are discarded (B makes the start-up transient worth at most 5% of a standard error) and
 * xᵢ² is averaged over the next T steps, T chosen so that the relative standard error of the slowest
 * coordinate is `precision` (at most 10⁷ steps).
 * Tolerance, justified by the run length: each coordinate's average must lie within `sigmas` standard
 * errors se_i = √(2(1 + aᵢ²)/(T(1 − aᵢ²))) (aᵢ = 1 − ηλᵢ) of vᵢ, relative. With the default 5 and a
 * correct SGD, the chance that any of n ≤ 100 coordinates lands outside is below 6e−5 (Bonferroni over
 * the coordinates, normal approximation of a long time average).
 */






/** The longest run the check makes. */
const MAX_STATIONARY_STEPS = 10_000_000;
const STATIONARY_SOURCE = "closed form E[xᵢ²] = ησ²/(λᵢ(2 − ηλᵢ)) of the AR(1) recursion xᵢ ← (1 − ηλᵢ)xᵢ − ησzᵢ (derived in src/reference/stationary.ts); time-average precision via Isserlis (1918), Biometrika 12(1/2):134–139 (reference from memory)";
/** Runs the stationary-variance check on one case. */
async function checkStationary(request) {
    const { spec } = request;
    const instance = probeInstance(request.definition, spec.params);
    const facts = quadraticFacts(instance);
    if (facts === null || !(facts.sigma > 0) || facts.rotation !== null) {
        throw new core_errors/* InputError */.d(`${request.where}: problem ${spec.problemKey} is not a diagonal quadratic with gradient noise (use noisy-quadratic with sigma > 0)`);
    }
    const lr = numberHyper(spec, request.names.lr, request.where, "step size");
    const eig = facts.eigenvalues;
    const sigma = facts.sigma;
    const base = { id: "stationary-variance", gating: request.gating, source: STATIONARY_SOURCE };
    const head = `stationary variance (SGD, η = ${fmt(lr)}, σ = ${fmt(sigma)})`;
    for (const l of eig) {
        if (!(lr * l > 0 && lr * l < 2)) {
            throw new core_errors/* InputError */.d(`${request.where}: case ${spec.id} has η·λ = ${fmt(lr * l)} for λ = ${fmt(l)}; SGD has a stationary distribution only for 0 < η·λ < 2`);
        }
    }
    const averaged = Math.min(MAX_STATIONARY_STEPS, stepsForPrecision(eig, lr, request.precision));
    const seedRequest = {
        definition: request.definition,
        params: spec.params,
        problemKey: spec.problemKey,
        hyper: spec.hyper,
        suiteSeed: request.suiteSeed,
        seedIndex: 0,
    };
    const { x0 } = requestProblem({ ...seedRequest, steps: 0 });
    let burnIn = 0;
    for (let i = 0; i < eig.length; i++)
        burnIn = Math.max(burnIn, burnInSteps(eig[i], sigma, lr, x0[i], averaged, 0.05));
    const n = eig.length;
    const sums = new Float64Array(n);
    const outcome = await request.source.run({ ...seedRequest, steps: burnIn + averaged }, (k, x) => {
        if (k <= burnIn)
            return;
        for (let i = 0; i < n; i++)
            sums[i] += x[i] * x[i];
    });
    if (outcome.error !== undefined) {
        return { ...base, status: "fail", summary: `${head}: the run failed: ${outcome.error}` };
    }
    let worst = 0;
    let worstZ = -1;
    for (let i = 0; i < n; i++) {
        const v = sgdStationaryVariance(eig[i], sigma, lr);
        const z = Math.abs(sums[i] / averaged / v - 1) / timeAverageRelativeError(eig[i], lr, averaged);
        if (z > worstZ) {
            worstZ = z;
            worst = i;
        }
    }
    const v = sgdStationaryVariance(eig[worst], sigma, lr);
    const mean = sums[worst] / averaged;
    const se = timeAverageRelativeError(eig[worst], lr, averaged);
    const allowed = request.sigmas * se;
    const where = `coordinate ${worst + 1} (λ = ${fmt(eig[worst])})`;
    const run = `over ${averaged} steps after ${burnIn} of burn-in`;
    const tolerance = { kind: "relative", value: allowed };
    const off = mean / v - 1;
    if (worstZ <= request.sigmas) {
        return {
            ...base,
            status: "pass",
            summary: `${head}: ${run}, E[xᵢ²] matches ησ²/(λᵢ(2 − ηλᵢ)) in all ${n} coordinates; farthest is ${where}: ` +
                `${fmt(mean)} vs ${fmt(v)}, ${fmt(worstZ)} standard errors (tolerance ${request.sigmas} standard errors = ${pct(allowed)})`,
            measured: mean,
            expected: v,
            tolerance,
        };
    }
    return {
        ...base,
        status: "fail",
        summary: `${head}: ${run}, ${where} averages E[x²] = ${fmt(mean)}, ${pct(Math.abs(off))} ${off > 0 ? "above" : "below"} ` +
            `the closed form ησ²/(λ(2 − ηλ)) = ${fmt(v)} (tolerance ${pct(allowed)}, ${request.sigmas} standard errors of the time average)`,
        measured: mean,
        expected: v,
        tolerance,
    };
}

;// CONCATENATED MODULE: ./build/package/reference/run-checks.js
/**
 * Runs every declared reference check of a suite and returns their results per case and at gate level,
 * as `CheckResult`s for the verdict document (src/compare/types.ts). Engine code: plain data in, plain
 * data out, no file I/O; the optimizers under test are reached through `sourceFor`.
 *
 * - known minimum: per matched case, from the candidate results when given (else from the check's own
 *   runs of the case's seeds);
 * - rate and stationary variance: per matched case, from the check's own run of seed 0;
 * - conformance: per declaration, at gate level (it is about the code, not about one case).
 * Results keep declaration order; cases keep suite order.
 */







/** Sources for the reference optimizers ("reference:NAME"); anything else is an input error. */
function referenceSourceFor(use) {
    const [kind, name] = use.includes(":")
        ? [use.slice(0, use.indexOf(":")), use.slice(use.indexOf(":") + 1)]
        : ["reference", use];
    if (kind !== "reference") {
        throw new core_errors/* InputError */.d(`reference checks: no way to run ${(0,core_errors/* quote */.h)(use)} was given (only reference optimizers run by default)`);
    }
    return inProcessSource((0,optimizers/* getOptimizer */.KH)(name, `reference checks: ${(0,core_errors/* quote */.h)(use)}`), use);
}
/** Runs the declared checks. Rejects only for input errors and for bugs, never for a failing optimizer. */
async function runReferenceChecks(input) {
    const { suite, checks } = input;
    const sourceFor = input.sourceFor ?? referenceSourceFor;
    const sources = new Map();
    const source = (use) => {
        let s = sources.get(use);
        if (s === undefined) {
            s = Promise.resolve(sourceFor(use));
            sources.set(use, s);
        }
        return s;
    };
    const runsById = new Map();
    for (const r of input.results ?? [])
        runsById.set(r.case.id, r);
    const perCase = new Map();
    const add = (id, result) => {
        const list = perCase.get(id) ?? [];
        list.push(result);
        perCase.set(id, list);
    };
    for (const d of checks.minimum) {
        for (const { spec, definition } of d.cases) {
            const result = input.results !== undefined ? runsById.get(spec.id) : undefined;
            if (input.results !== undefined && result === undefined) {
                add(spec.id, {
                    id: d.basin === "global" ? "known-minimum" : `known-minimum:${d.basin}`,
                    status: "skipped",
                    gating: d.gating,
                    summary: `known minimum: the results have no runs of case ${spec.id}`,
                    source: definition.source,
                });
                continue;
            }
            add(spec.id, await checkKnownMinimum({
                spec,
                definition,
                suiteSeed: suite.seed,
                basin: d.basin,
                tolerance: d.tolerance,
                share: d.share,
                gating: d.gating,
                ...(result !== undefined ? { runs: result.runs } : { source: await source(spec.use) }),
            }));
        }
    }
    for (const d of checks.rate) {
        for (const { spec, definition } of d.cases) {
            add(spec.id, await checkRate({
                spec,
                definition,
                suiteSeed: suite.seed,
                method: d.method,
                tuned: d.tuned,
                names: d.names,
                tolerance: d.tolerance,
                maxSteps: d.steps,
                gating: d.gating,
                source: await source(spec.use),
                where: d.where,
            }));
        }
    }
    for (const d of checks.stationary) {
        for (const { spec, definition } of d.cases) {
            add(spec.id, await checkStationary({
                spec,
                definition,
                suiteSeed: suite.seed,
                names: d.names,
                precision: d.precision,
                sigmas: d.sigmas,
                gating: d.gating,
                source: await source(spec.use),
                where: d.where,
            }));
        }
    }
    const gate = [];
    for (const d of checks.conformance) {
        gate.push(...(await checkConformance({
            optimizer: d.optimizer,
            method: d.method,
            claim: d.hyper,
            base: d.spec.hyper,
            names: d.names,
            expect: d.expect,
            tolerance: d.tolerance,
            gating: d.gating,
            source: await source(d.spec.use),
            where: d.where,
        })));
    }
    const cases = {};
    for (const c of suite.cases) {
        const list = perCase.get(c.id);
        if (list !== undefined)
            cases[c.id] = list;
    }
    return { cases, gate };
}

;// CONCATENATED MODULE: ./build/package/reference/sources.js
/**
 * Trajectory sources for every kind of optimizer a suite can name: reference optimizers and module
 * optimizers run in this thread (`inProcessSource`), process-adapter optimizers run through their
 * adapter's session — the harness serves the evaluations from its own problem instance, pauses after the
 * step a learning-rate change is due, and observes every iterate the client reports (RunControl in
 * src/adapters/process-run.ts). So every reference check, conformance included, works the same for all
 * three.
 */





/** Wall-clock allowance of one check run through a process; the adapter's own run time-out still applies. */
const CHECK_RUN_SECONDS = 3600;
/**
 * A source for optimizer `optimizer` of a process session. Asks the session for its description first
 * (hyperparameter names from its defaults, whether it can change its learning rate).
 */
async function processSource(session, optimizer, label) {
    const ready = await session.describe();
    const description = ready.optimizers.find((o) => o.name === optimizer);
    if (description === undefined) {
        throw new core_errors/* InputError */.d(`reference checks: ${(0,core_errors/* quote */.h)(label)}: the adapter serves no optimizer ${(0,core_errors/* quote */.h)(optimizer)} (it serves: ${ready.optimizers.map((o) => o.name).join(", ")})`);
    }
    const canChangeLr = description.capabilities.includes("lr");
    return {
        label,
        ...(description.defaults !== undefined ? { hyperNames: Object.keys(description.defaults) } : {}),
        async run(request, observe) {
            if (request.lrChange !== undefined && !canChangeLr)
                return { steps: 0, lrChange: "unsupported" };
            const { problem, x0 } = requestProblem(request);
            const spec = {
                id: `reference-check/${label}/${request.problemKey}`,
                optimizer: label,
                use: label,
                set: "reference-check",
                hyper: request.hyper,
                problem: request.definition.name,
                problemKey: request.problemKey,
                params: request.params,
                dim: problem.dim,
                fStar: problem.fStar,
                fStarKind: problem.fStarKind,
                budget: { steps: request.steps, evaluations: 0, seconds: CHECK_RUN_SECONDS },
                stopAt: 0,
                ladder: [],
                blowUp: Number.MAX_VALUE,
                checkpoints: [0],
                fingerprintSteps: 0,
                seeds: 1,
                measureEvery: 1,
            };
            observe(0, x0);
            let steps = 0;
            const change = request.lrChange;
            const [metrics] = await session.run([
                {
                    spec,
                    seedIndex: request.seedIndex,
                    suiteSeed: request.suiteSeed,
                    definition: request.definition,
                    optimizer,
                    control: {
                        afterStep: (k, x) => {
                            steps = k;
                            observe(k, x);
                        },
                        ...(change !== undefined
                            ? { pauseAt: change.after, action: { kind: "lr", lr: change.lr } }
                            : {}),
                    },
                },
            ]);
            const lrChange = change === undefined ? "none" : "applied";
            if (metrics.stop === "error")
                return { steps, error: metrics.error ?? "the run failed", lrChange };
            if (metrics.stop === "diverged") {
                return {
                    steps,
                    error: `the iterate is not finite after step ${metrics.divergedAt ?? steps}`,
                    lrChange,
                };
            }
            if (steps < request.steps)
                return { steps, error: `the run stopped after step ${steps} (${metrics.stop})`, lrChange };
            return { steps, lrChange };
        },
    };
}
/** Sources for reference, module and process optimizers of `suite` (its `adapters` context). */
function suiteSources(suite) {
    const sessions = new Map();
    const sources = new Map();
    const context = suite.adapters;
    const adapterNames = Object.keys(context?.processes ?? {});
    const make = async (use) => {
        const canonical = (0,resolve/* canonicalUse */.sx)(use);
        const spec = (0,adapters_use/* parseUse */.f)(canonical, adapterNames, `reference checks: ${(0,core_errors/* quote */.h)(use)}`);
        if (spec.kind === "process") {
            let session = sessions.get(spec.adapter);
            if (session === undefined) {
                session = new adapters_session/* ProcessSession */.M(context.processes[spec.adapter]);
                sessions.set(spec.adapter, session);
            }
            return processSource(session, spec.optimizer, canonical);
        }
        const { factory } = await (0,resolve/* loadOptimizer */.uk)(canonical, `reference checks: ${(0,core_errors/* quote */.h)(use)}`, context);
        return inProcessSource(factory, canonical);
    };
    return {
        sourceFor(use) {
            let s = sources.get(use);
            if (s === undefined) {
                s = make(use);
                sources.set(use, s);
            }
            return s;
        },
        async close() {
            const all = [...sessions.values()];
            sessions.clear();
            await Promise.all(all.map((s) => s.close()));
        },
    };
}

;// CONCATENATED MODULE: ./build/package/reference/configured.js
/**
 * The reference checks a config declares, run for a command: resolves the suite with its module and
 * process optimizers, binds the `checks` section to it, runs the checks (known minima read from the
 * candidate results when given) and closes any optimizer process it started. Returns null when the
 * config declares no checks, so callers can leave the verdict exactly as it was.
 */




/**
 * Runs the checks declared in `config` (read from `file`, whose directory is `baseDir`). Throws an
 * `InputError` for a bad `checks` section; a failing optimizer only makes checks fail.
 */
async function runConfiguredChecks(config, file, baseDir, results) {
    const declared = parseChecks(config.checks, `config ${file}: checks`);
    const count = declared.minimum.length + declared.rate.length + declared.stationary.length + declared.conformance.length;
    if (count === 0)
        return null;
    const suite = await prepareSuite(config, file, { baseDir });
    const checks = resolveChecks(config.checks, suite, file);
    const sources = suiteSources(suite);
    try {
        return await runReferenceChecks({ suite, checks, results, sourceFor: sources.sourceFor });
    }
    finally {
        await sources.close();
    }
}

;// CONCATENATED MODULE: ./build/package/reference/merge.js
function failing(checks) {
    return checks.filter((c) => c.status === "fail" && c.gating);
}
/** The verdict with the report's checks added (see the file comment). */
function applyReferenceChecks(verdict, report) {
    const gateReasons = [...verdict.gate.reasons];
    const seen = new Set();
    const cases = verdict.cases.map((c) => {
        const added = report.cases[c.id];
        if (added === undefined || added.length === 0)
            return c;
        seen.add(c.id);
        const failed = failing(added);
        const reasons = failed.map((f) => ({ code: "check", message: f.summary }));
        for (const f of failed)
            gateReasons.push({ code: "check", case: c.id, message: `${c.id}: ${f.summary}` });
        return {
            ...c,
            checks: [...c.checks, ...added],
            reasons: [...c.reasons, ...reasons],
            failsGate: c.failsGate || failed.length > 0,
        };
    });
    // Checks of cases the verdict does not list (e.g. a case filtered out of the comparison) still count.
    for (const [id, list] of Object.entries(report.cases)) {
        if (seen.has(id))
            continue;
        for (const f of failing(list))
            gateReasons.push({ code: "check", case: id, message: `${id}: ${f.summary}` });
    }
    for (const f of failing(report.gate))
        gateReasons.push({ code: "check", message: f.summary });
    return {
        ...verdict,
        gate: {
            verdict: gateReasons.length > 0 ? "fail" : "pass",
            reasons: gateReasons,
            checks: [...verdict.gate.checks, ...report.gate],
        },
        cases,
    };
}

;// CONCATENATED MODULE: ./build/package/cli/compare-command.js
/**
 * `gradgate compare --results FILE [--baselines DIR] [--json OUT] [--config FILE] [--no-extra-seeds]
 * [--workers N] [--quiet]`: judges candidate results against the baselines, prints per-case verdicts and
 * the gate verdict, optionally writes the verdict JSON. Inconclusive cases are re-run on the baselines'
 * extra seeds (policy.extraSeeds) before the verdict is final. Exit 0 pass, 1 fail, 2 usage/input error.
 */


















const DEFAULT_BASELINES = "baselines";
/** Parses the arguments after "compare" and runs it. */
async function compareFromArgv(argv, host) {
    const { values } = parseOptions(argv, {
        results: { type: "string" },
        baselines: { type: "string" },
        json: { type: "string" },
        config: { type: "string" },
        "no-extra-seeds": { type: "boolean" },
        workers: { type: "string" },
        quiet: { type: "boolean" },
    });
    if (typeof values.results !== "string") {
        throw new core_errors/* InputError */.d(`compare: --results FILE is required (the file gradgate run wrote, e.g. .gradgate/results.json)`);
    }
    return compareCommand(host, {
        results: values.results,
        baselines: values.baselines ?? DEFAULT_BASELINES,
        json: values.json,
        config: values.config,
        extraSeeds: values["no-extra-seeds"] !== true,
        workers: values.workers === undefined ? undefined : compare_command_positiveInt(values.workers, "--workers"),
        quiet: values.quiet === true,
    });
}
async function compareCommand(host, args) {
    const results = readResults(host, args.results);
    const baselines = readBaselines(host, args.baselines);
    if (baselines.size === 0 && !args.quiet) {
        // A first run: every case is new, and the reference checks still judge right or wrong.
        host.err(`gradgate: no baselines in ${args.baselines}/ yet: every case is new; create them with ` +
            `gradgate rebaseline --results ${args.results} --reason "first baselines"\n`);
    }
    let policy = readPolicy(host, args.config);
    if (!args.extraSeeds)
        policy = { ...policy, extraSeeds: { ...policy.extraSeeds, perCase: 0 } };
    let verdict = compareResults(results, baselines, { policy });
    const plan = planExtraSeeds(verdict, baselines, policy);
    if (plan.requested.length > 0 && policy.extraSeeds.perCase > 0) {
        if (!args.quiet && plan.runs > 0) {
            host.err(`gradgate: ${plan.requested.length} inconclusive case(s); running ${plan.runs} extra seed run(s)\n`);
        }
        const { suite } = await loadPreparedSuite(host, args.config);
        const extraRuns = await runPlannedSeeds(results, plan, args.workers, suite.adapters);
        verdict = compareResults(results, baselines, {
            policy,
            extraRuns,
            rerun: rerunSummary(plan, policy.extraSeeds.maxRuns),
        });
    }
    // Reference checks declared in the config (src/reference/): judged beside the drift, gating as declared.
    const suiteConfig = loadSuiteConfig(host, args.config);
    const baseDir = args.config === undefined ? host.cwd : (0,external_node_path_.dirname)((0,external_node_path_.resolve)(host.cwd, args.config));
    const checks = await runConfiguredChecks(suiteConfig.config, suiteConfig.file, baseDir, results.cases);
    if (checks !== null)
        verdict = applyReferenceChecks(verdict, checks);
    if (args.json !== undefined)
        (0,files/* writeFileAtomic */.Z)((0,external_node_path_.resolve)(host.cwd, args.json), (0,json/* canonicalJson */.d)(verdict));
    if (!args.quiet)
        host.out(verdictText(verdict));
    return verdict.gate.verdict === "pass" ? cli_host/* EXIT */.d.ok : cli_host/* EXIT */.d.fail;
}
/** Runs the candidate (the optimizer code in this checkout) on the planned extra seeds. */
async function runPlannedSeeds(results, plan, workers, adapters) {
    if (plan.cases.length === 0)
        return new Map();
    const specs = new Map(results.cases.map((c) => [c.case.id, c.case]));
    const { suite, items } = extraSeedSuite(results.suite.seed, specs, plan, adapters);
    const cases = await (0,pool/* runSuite */.og)(suite, { workers: workers ?? Math.min((0,external_node_os_.availableParallelism)(), 8), items });
    return extraRunsById(cases);
}
function readResults(host, file) {
    const path = (0,external_node_path_.resolve)(host.cwd, file);
    if (!(0,external_node_fs_.existsSync)(path))
        throw new core_errors/* InputError */.d(`results ${file}: no such file; run gradgate run --out ${file} first`);
    return (0,baselines_validate/* parseResults */.c2)((0,external_node_fs_.readFileSync)(path, "utf8"), file);
}
/** Finishes an interrupted rebaseline if there is one (saying so), then reads and validates every file. */
function readBaselines(host, dir) {
    const path = (0,external_node_path_.resolve)(host.cwd, dir);
    const note = (0,store/* recoverBaselineDir */.$E)(path);
    if (note)
        host.err(`gradgate: ${dir}/: ${note}\n`);
    return (0,store/* readBaselineDir */.v5)(path, dir.replace(/\/+$/, ""));
}
/** The policy of the config named (or found in the working directory, or the built-in default suite). */
function readPolicy(host, config) {
    const { config: suite, file } = loadSuiteConfig(host, config);
    return resolvePolicy(suite.policy ?? {}, `config ${file}: policy`);
}
/** The terminal summary: changed cases, then the counts and the gate with its reasons. */
function verdictText(v) {
    const shown = v.cases.filter((c) => c.verdict !== "unchanged");
    let text = "";
    if (shown.length > 0) {
        text += textTable(["case", "verdict", "drift", "trajectory"], shown.map((c) => [
            c.id,
            c.verdict,
            c.headline ? describeHeadline(c.headline) : "—",
            c.fingerprint.status === "changed"
                ? `changed from step ${c.fingerprint.fromStep}`
                : c.fingerprint.status,
        ]));
        text += "\n";
    }
    const counts = Object.entries(v.counts)
        .filter(([, n]) => n > 0)
        .map(([k, n]) => `${n} ${k}`)
        .join(", ");
    text += `${v.cases.length} cases: ${counts || "none"}\n`;
    if (v.rerun) {
        text += `extra seeds: ${v.rerun.rerun.length} of ${v.rerun.requested.length} inconclusive case(s) re-run (${v.rerun.runs} runs)\n`;
    }
    text += `gate: ${v.gate.verdict.toUpperCase()}\n`;
    for (const r of v.gate.reasons)
        text += `  - ${r.message}\n`;
    return text;
}
function parseOptions(args, options, positionals = false) {
    try {
        return (0,external_node_util_.parseArgs)({ args: [...args], options, allowPositionals: positionals, strict: true });
    }
    catch (err) {
        throw new core_errors/* InputError */.d(`${err.message}; run "gradgate help" for the options`);
    }
}
function compare_command_positiveInt(text, flag) {
    if (!/^\d+$/.test(text) || Number(text) < 1)
        throw new core_errors/* InputError */.d(`${flag} must be a positive integer, got ${(0,core_errors/* quote */.h)(text)}`);
    return Number(text);
}

// EXTERNAL MODULE: external "node:child_process"
var external_node_child_process_ = __webpack_require__(1421);
// EXTERNAL MODULE: ./build/package/baselines/types.js
var baselines_types = __webpack_require__(3085);
;// CONCATENATED MODULE: ./build/package/baselines/build.js
/**
 * Turns a results document (and the runs of the extra seeds) into baseline files, one per optimizer.
 * Pure: the commit, the date and the runtime come from the caller (the CLI edge runs `git rev-parse`).
 */




/** Default runtime description of an optimizer run in this Node process. */
function inProcessRuntime(node) {
    return `in-process (node ${node})`;
}
/**
 * One baseline file per optimizer, in the order the optimizers first appear in the results.
 * `extraRuns` holds the runs of the extra seeds by case id (iterates and trace are dropped: the
 * fingerprint and the charts use the suite's own seeds).
 */
function buildBaselineFiles(results, stamp, extraRuns = new Map()) {
    if (results.shard) {
        throw new core_errors/* InputError */.d(`results hold shard ${results.shard.index} of ${results.shard.count} only; merge the shards before rebaselining`);
    }
    const byOptimizer = new Map();
    const runtimes = new Map();
    for (const c of results.cases) {
        const name = c.case.optimizer;
        let list = byOptimizer.get(name);
        if (list === undefined)
            byOptimizer.set(name, (list = []));
        const extra = (extraRuns.get(c.case.id) ?? []).map(stripIterates);
        list.push({ case: c.case, runs: c.runs, extraRuns: extra });
        const runtime = stamp.runtime?.(c.case.use) ?? inProcessRuntime(results.environment.node);
        const seen = runtimes.get(name);
        if (seen !== undefined && seen !== runtime) {
            throw new core_errors/* InputError */.d(`optimizer ${name} reports two runtimes (${seen}; ${runtime}); one baseline file needs one`);
        }
        runtimes.set(name, runtime);
    }
    return [...byOptimizer.entries()].map(([optimizer, cases]) => {
        const provenance = {
            commit: stamp.commit,
            date: stamp.date,
            reason: stamp.reason,
            tool: { name: version/* TOOL_NAME */.l, version: version/* TOOL_VERSION */.w },
            suite: { hash: results.suite.hash, seed: results.suite.seed },
            environment: {
                node: results.environment.node,
                platform: results.environment.platform,
                arch: results.environment.arch,
                runtime: runtimes.get(optimizer),
            },
        };
        const body = { format: baselines_types/* BASELINE_FORMAT */.q4, version: baselines_types/* BASELINE_VERSION */.d0, optimizer, provenance, cases };
        return { ...body, digest: (0,baselines_validate/* baselineDigest */.E8)(body) };
    });
}
/** Extra seeds serve the statistics only: their iterates and trace are not kept (smaller files). */
function stripIterates(run) {
    const copy = { ...run, trace: [] };
    delete copy.iterates;
    return copy;
}

;// CONCATENATED MODULE: ./build/package/compare/audit-drift.js
function auditDrift(verdict) {
    return verdict.cases.map((c) => ({
        id: c.id,
        verdict: c.verdict,
        trajectory: c.fingerprint.status,
        drift: c.drift
            .filter((d) => d.gating && d.status !== "unchanged" && d.status !== "untested" && d.ratio !== null)
            .map((d) => ({
            metric: d.metric,
            ratio: d.ratio,
            low: d.interval?.low ?? null,
            high: d.interval?.high ?? null,
            status: d.status,
        })),
    }));
}

;// CONCATENATED MODULE: ./build/package/cli/rebaseline-command.js
/**
 * `gradgate rebaseline --results FILE --reason TEXT [--baselines DIR] [--commit SHA] [--allow-suite-change]
 * [--config FILE] [--extra-seeds N] [--workers N] [--quiet]`: writes new baseline files from a results
 * document, one per optimizer, with the runs of extra seeds (policy.extraSeeds.perCase, run here) for
 * re-running inconclusive cases later; appends an entry to baselines/audit.jsonl with the drift of every
 * case against the previous baselines. The files and the log are replaced as one transaction
 * (src/baselines/store.ts). Refuses results of a different suite unless --allow-suite-change; then the
 * files of optimizers no longer in the suite are removed.
 */















async function rebaselineFromArgv(argv, host) {
    const { values } = parseOptions(argv, {
        results: { type: "string" },
        reason: { type: "string" },
        baselines: { type: "string" },
        commit: { type: "string" },
        "allow-suite-change": { type: "boolean" },
        config: { type: "string" },
        "extra-seeds": { type: "string" },
        workers: { type: "string" },
        quiet: { type: "boolean" },
    });
    if (typeof values.results !== "string") {
        throw new core_errors/* InputError */.d(`rebaseline: --results FILE is required (the file gradgate run wrote)`);
    }
    const reason = typeof values.reason === "string" ? values.reason.trim() : "";
    if (reason === "") {
        throw new core_errors/* InputError */.d(`rebaseline: --reason is required and must not be empty: say why the baselines change, e.g. --reason "adam: fix bias correction (#123)"`);
    }
    const extra = values["extra-seeds"];
    if (extra !== undefined && !/^\d+$/.test(extra)) {
        throw new core_errors/* InputError */.d(`--extra-seeds must be a whole number ≥ 0, got ${JSON.stringify(extra)}`);
    }
    return rebaselineCommand(host, {
        results: values.results,
        reason,
        baselines: values.baselines ?? DEFAULT_BASELINES,
        commit: values.commit,
        allowSuiteChange: values["allow-suite-change"] === true,
        config: values.config,
        extraSeeds: extra === undefined ? undefined : Number(extra),
        workers: values.workers === undefined ? undefined : compare_command_positiveInt(values.workers, "--workers"),
        quiet: values.quiet === true,
    });
}
async function rebaselineCommand(host, args) {
    const results = readResults(host, args.results);
    if (results.shard) {
        throw new core_errors/* InputError */.d(`rebaseline: results ${args.results} hold shard ${results.shard.index} of ${results.shard.count} only; ` +
            `merge the shards first (gradgate merge)`);
    }
    const shownDir = args.baselines.replace(/\/+$/, "");
    const dir = (0,external_node_path_.resolve)(host.cwd, args.baselines);
    const note = (0,store/* recoverBaselineDir */.$E)(dir);
    if (note && !args.quiet)
        host.err(`gradgate: ${shownDir}/: ${note}\n`);
    // The previous set; an unreadable file is replaced (that is the fix its error message gives).
    const previous = new Map();
    for (const name of (0,store/* baselineFileNames */.OE)(dir)) {
        try {
            const b = (0,baselines_validate/* parseBaseline */.nk)((0,external_node_fs_.readFileSync)((0,external_node_path_.join)(dir, name), "utf8"), `${shownDir}/${name}`, name.slice(0, -5));
            previous.set(b.optimizer, b);
        }
        catch (err) {
            if (!(err instanceof core_errors/* InputError */.d))
                throw err;
            if (!args.quiet)
                host.err(`gradgate: replacing an unreadable baseline: ${err.message}\n`);
        }
    }
    const previousHashes = [...new Set([...previous.values()].map((b) => b.provenance.suite.hash))];
    const suiteChanged = previousHashes.some((h) => h !== results.suite.hash);
    if (suiteChanged && !args.allowSuiteChange) {
        const which = [...previous.values()].find((b) => b.provenance.suite.hash !== results.suite.hash);
        throw new core_errors/* InputError */.d(`rebaseline: results ${args.results} come from a different suite (hash ${results.suite.hash.slice(0, 19)}…) than ` +
            `${shownDir}/${which.optimizer}.json (${which.provenance.suite.hash.slice(0, 19)}…): the suite definition changed ` +
            `(problems, budgets, ladder or seeds); pass --allow-suite-change to replace the baselines with the new suite's`);
    }
    const auditText = (0,external_node_fs_.existsSync)((0,external_node_path_.join)(dir, baselines_types/* AUDIT_LOG */.bd)) ? (0,external_node_fs_.readFileSync)((0,external_node_path_.join)(dir, baselines_types/* AUDIT_LOG */.bd), "utf8") : "";
    (0,store/* readAuditLog */.Ob)(dir, shownDir); // refuse to append to a damaged log
    const policy = readPolicy(host, args.config);
    const perCase = args.extraSeeds ?? policy.extraSeeds.perCase;
    const plan = {
        cases: results.cases.map((c) => ({
            id: c.case.id,
            seeds: Array.from({ length: perCase }, (_, i) => c.case.seeds + i),
        })),
        runs: perCase * results.cases.length,
        requested: [],
        skipped: [],
    };
    if (perCase > 0 && !args.quiet) {
        host.err(`gradgate: running ${plan.runs} extra seed run(s) (${perCase} per case) for the baselines\n`);
    }
    const extraRuns = perCase > 0
        ? await runPlannedSeeds(results, plan, args.workers, (await loadPreparedSuite(host, args.config)).suite.adapters)
        : new Map();
    const when = (args.now ?? (() => new Date()))().toISOString();
    const commit = args.commit ?? gitHead(host.cwd);
    const files = buildBaselineFiles(results, { commit, date: when, reason: args.reason }, extraRuns);
    const drift = compareResults(results, previous, {
        policy: { ...policy, extraSeeds: { ...policy.extraSeeds, perCase: 0 } },
    });
    const newNames = new Set(files.map((f) => `${f.optimizer}.json`));
    const removed = suiteChanged ? (0,store/* baselineFileNames */.OE)(dir).filter((n) => !newNames.has(n)) : [];
    const entry = {
        format: baselines_types/* AUDIT_FORMAT */.ab,
        version: baselines_types/* AUDIT_VERSION */.Tm,
        when,
        commit,
        reason: args.reason,
        tool: { name: version/* TOOL_NAME */.l, version: version/* TOOL_VERSION */.w },
        suite: { hash: results.suite.hash, previousHash: previousHashes[0] ?? null },
        suiteChanged,
        files: files.map((f) => ({ optimizer: f.optimizer, file: `${f.optimizer}.json`, digest: f.digest })),
        removed,
        cases: auditDrift(drift),
    };
    const write = new Map();
    for (const f of files)
        write.set(`${f.optimizer}.json`, (0,json/* canonicalJson */.d)(f));
    const log = auditText === "" || auditText.endsWith("\n") ? auditText : auditText + "\n";
    write.set(baselines_types/* AUDIT_LOG */.bd, log + (0,store/* auditLine */.kk)(entry));
    (0,store/* writeBaselineSet */.ff)(dir, { write, remove: removed });
    if (!args.quiet) {
        const counts = Object.entries(drift.counts)
            .filter(([, n]) => n > 0)
            .map(([k, n]) => `${n} ${k}`)
            .join(", ");
        host.out(`wrote ${files.length} baseline file(s) to ${shownDir}/ (${results.cases.length} cases, commit ${commit.slice(0, 12)})` +
            `${removed.length > 0 ? `; removed ${removed.join(", ")}` : ""}\n` +
            `against the previous baselines: ${counts || "none"}\n` +
            `audit entry appended to ${shownDir}/${baselines_types/* AUDIT_LOG */.bd}\n`);
    }
    return cli_host/* EXIT */.d.ok;
}
/** The commit of the working directory, read at the edge (never inside the engine). */
function gitHead(cwd) {
    try {
        return (0,external_node_child_process_.execFileSync)("git", ["rev-parse", "HEAD"], {
            cwd,
            encoding: "utf8",
            stdio: ["ignore", "pipe", "pipe"],
        }).trim();
    }
    catch (err) {
        const why = (err.stderr ?? err.message).toString().split("\n")[0];
        throw new core_errors/* InputError */.d(`rebaseline: could not read the commit (git rev-parse HEAD: ${why}); pass --commit SHA`);
    }
}

;// CONCATENATED MODULE: ./build/package/baselines/history.js
/** Entries that touched `optimizer`, in log order; the optimizer's case ids start with `optimizer/`. */
function optimizerHistory(entries, optimizer) {
    const prefix = `${optimizer}/`;
    const rows = [];
    for (const e of entries) {
        const written = e.files.some((f) => f.optimizer === optimizer);
        const removed = e.removed.includes(`${optimizer}.json`);
        if (!written && !removed)
            continue;
        rows.push({
            when: e.when,
            commit: e.commit,
            reason: e.reason,
            suiteChanged: e.suiteChanged,
            action: written ? "written" : "removed",
            cases: e.cases.filter((c) => c.id.startsWith(prefix)),
        });
    }
    return rows;
}
/** Every optimizer named in the log, sorted (for "known: ..." in messages). */
function optimizersInLog(entries) {
    const names = new Set();
    for (const e of entries)
        for (const f of e.files)
            names.add(f.optimizer);
    return [...names].sort();
}

;// CONCATENATED MODULE: ./build/package/cli/history-command.js
/**
 * `gradgate history OPTIMIZER [--baselines DIR] [--json]`: how one optimizer's baselines changed across
 * the audit log (baselines/audit.jsonl), oldest first: when, commit, reason, and per case the verdict of
 * the new baseline against the previous one with the gating metrics that moved.
 */








function historyFromArgv(argv, host) {
    const { values, positionals } = parseOptions(argv, { baselines: { type: "string" }, json: { type: "boolean" } }, true);
    if (positionals.length !== 1) {
        throw new core_errors/* InputError */.d(`history: name one optimizer, e.g. gradgate history adam (got ${positionals.length === 0 ? "none" : positionals.map((p) => JSON.stringify(p)).join(" ")})`);
    }
    return historyCommand(host, {
        optimizer: positionals[0],
        baselines: values.baselines ?? DEFAULT_BASELINES,
        json: values.json === true,
    });
}
function historyCommand(host, args) {
    const shown = args.baselines.replace(/\/+$/, "");
    const dir = (0,external_node_path_.resolve)(host.cwd, args.baselines);
    const note = (0,store/* recoverBaselineDir */.$E)(dir);
    if (note)
        host.err(`gradgate: ${shown}/: ${note}\n`);
    const entries = (0,store/* readAuditLog */.Ob)(dir, shown);
    if (entries.length === 0) {
        throw new core_errors/* InputError */.d(`history: ${shown}/${baselines_types/* AUDIT_LOG */.bd} has no entries yet; gradgate rebaseline writes one per refresh`);
    }
    const rows = optimizerHistory(entries, args.optimizer);
    if (rows.length === 0) {
        throw new core_errors/* InputError */.d(`history: no entry of ${shown}/${baselines_types/* AUDIT_LOG */.bd} mentions optimizer ${JSON.stringify(args.optimizer)} (known: ${optimizersInLog(entries).join(", ")})`);
    }
    host.out(args.json ? (0,json/* canonicalJson */.d)(rows) : historyText(args.optimizer, rows));
    return cli_host/* EXIT */.d.ok;
}
function historyText(optimizer, rows) {
    let text = `history of ${optimizer}: ${rows.length} baseline change(s), oldest first\n`;
    for (const r of rows) {
        text += `\n${r.when}  ${r.commit.slice(0, 12)}  ${r.reason}${r.suiteChanged ? "  [suite changed]" : ""}${r.action === "removed" ? "  [removed]" : ""}\n`;
        const counts = new Map();
        for (const c of r.cases)
            counts.set(c.verdict, (counts.get(c.verdict) ?? 0) + 1);
        text += `  ${r.cases.length} case(s): ${[...counts].map(([v, n]) => `${n} ${v}`).join(", ") || "none"}\n`;
        for (const c of r.cases) {
            if (c.verdict === "unchanged")
                continue;
            const moved = c.drift
                .map((d) => `${d.metric} ×${history_command_fmt(d.ratio)}${d.low !== null || d.high !== null ? ` [${history_command_fmt(d.low)}, ${d.high === null ? "∞" : history_command_fmt(d.high)}]` : ""}`)
                .join("; ");
            text += `  ${c.id}: ${c.verdict}${c.trajectory === "changed" ? ", trajectory changed" : ""}${moved ? ` — ${moved}` : ""}\n`;
        }
    }
    return text;
}
function history_command_fmt(x) {
    if (x === null)
        return "0";
    return Math.abs(x) >= 0.001 && Math.abs(x) < 1e4 ? String(Number(x.toPrecision(3))) : x.toExponential(2);
}

;// CONCATENATED MODULE: ./build/package/cli/main.js
/**
 * The CLI: parses argv, dispatches to a command, turns every failure into one message and an exit code.
 * No side effects on import (bin/gradgate.js calls `main`).
 */















const USAGE = `gradgate ${version/* TOOL_VERSION */.w} — convergence gate for optimizer code

Usage:
  gradgate run [--config FILE] [--out FILE] [--workers N] [--shard I/N] [--quiet]
      Run the suite (FILE, else ./gradgate.yml, else the built-in default suite) and write the
      results JSON (default ${DEFAULT_RESULTS}). --shard 2/4 runs the second quarter of the runs.
  gradgate merge [--out FILE] [--quiet] SHARD_RESULTS...
      Combine the results of shards 1..N (files, or directories holding them) into the whole
      suite's results (default ${DEFAULT_RESULTS}); refuses shards that do not fit together.
  gradgate compare --results FILE [--baselines DIR] [--json OUT] [--config FILE]
                   [--no-extra-seeds] [--workers N] [--quiet]
      Judge results against the baselines (default baselines/): a verdict per case, the gate
      verdict (exit 0 pass, 1 fail); --json writes the verdict document. Inconclusive cases are
      re-run on the baselines' extra seeds first (policy.extraSeeds) unless --no-extra-seeds.
  gradgate rebaseline --results FILE --reason TEXT [--baselines DIR] [--commit SHA]
                   [--allow-suite-change] [--config FILE] [--extra-seeds N] [--workers N] [--quiet]
      Write new baselines from results (one file per optimizer, plus extra seeds), all or nothing,
      and append the change with its drift to baselines/audit.jsonl.
  gradgate history OPTIMIZER [--baselines DIR] [--json]
      How one optimizer's baselines changed across the audit log.
  gradgate report --verdict FILE [--results FILE] [--baselines DIR] [--html OUT] [--markdown OUT]
      Render a verdict (with convergence charts when results and baselines are given) as a
      self-contained HTML report and/or the Markdown the Action puts in the job summary.
  gradgate problems        List the standard problems.
  gradgate optimizers      List the reference optimizers.
  gradgate help            This text.

Exit codes: 0 done, 1 gate failed, 2 bad usage or input, 3 internal error.
`;
async function main(argv, host = (0,cli_host/* processHost */.Q)()) {
    try {
        return await dispatch(argv, host);
    }
    catch (err) {
        if (err instanceof core_errors/* InputError */.d) {
            host.err(`gradgate: ${err.message}\n`);
            return cli_host/* EXIT */.d.input;
        }
        const text = err instanceof Error ? (err.stack ?? err.message) : String(err);
        host.err(`gradgate: internal error (please report): ${text}\n`);
        return cli_host/* EXIT */.d.internal;
    }
}
async function dispatch(argv, host) {
    const [command, ...rest] = argv;
    switch (command) {
        case "run": {
            const { values } = parse(rest, {
                config: { type: "string" },
                out: { type: "string" },
                workers: { type: "string" },
                shard: { type: "string" },
                quiet: { type: "boolean" },
            });
            return runCommand(host, {
                shard: values.shard === undefined ? undefined : (0,shard/* parseShard */.uK)(values.shard, "--shard"),
                config: values.config,
                out: values.out ?? DEFAULT_RESULTS,
                workers: values.workers === undefined ? undefined : parseCount(values.workers, "--workers"),
                quiet: values.quiet === true,
            });
        }
        case "merge": {
            const { values, positionals } = parse(rest, { out: { type: "string" }, quiet: { type: "boolean" } }, true);
            return (0,merge_command/* mergeCommand */.cp)(host, {
                inputs: positionals,
                out: values.out ?? DEFAULT_RESULTS,
                quiet: values.quiet === true,
            });
        }
        case "compare":
            return compareFromArgv(rest, host);
        case "rebaseline":
            return rebaselineFromArgv(rest, host);
        case "history":
            return historyFromArgv(rest, host);
        case "report": {
            const { values } = parse(rest, {
                verdict: { type: "string" },
                results: { type: "string" },
                baselines: { type: "string" },
                html: { type: "string" },
                markdown: { type: "string" },
            });
            if (typeof values.verdict !== "string") {
                throw new core_errors/* InputError */.d("report: --verdict FILE is required (the file gradgate compare --json wrote)");
            }
            return reportCommand(host, {
                verdict: values.verdict,
                results: values.results,
                baselines: values.baselines,
                html: values.html,
                markdown: values.markdown,
            });
        }
        case "problems":
            parse(rest, {});
            host.out(textTable(["problem", "dim", "params (defaults)", "tags", "title"], problems/* PROBLEMS */.D3.map((p) => {
                const params = Object.fromEntries(Object.entries(p.params).map(([k, spec]) => [k, spec.default]));
                const dim = p.create(params, { noise: new core_rng/* Pcg32 */._8(0n, 0n) }).dim;
                const shown = Object.entries(params).map(([k, v]) => `${k}=${v}`);
                return [p.name, String(dim), shown.join(" ") || "—", p.tags.join(","), p.title];
            })));
            return cli_host/* EXIT */.d.ok;
        case "optimizers":
            parse(rest, {});
            host.out(textTable(["optimizer", "title"], optimizers/* OPTIMIZERS */.r9.map((o) => [o.name, o.title])));
            return cli_host/* EXIT */.d.ok;
        case undefined:
        case "help":
        case "--help":
        case "-h":
            host.out(USAGE);
            return command === undefined ? cli_host/* EXIT */.d.input : cli_host/* EXIT */.d.ok;
        case "--version":
            host.out(`${version/* TOOL_VERSION */.w}\n`);
            return cli_host/* EXIT */.d.ok;
        default:
            throw new core_errors/* InputError */.d(`unknown command ${JSON.stringify(command)}; run "gradgate help" for the commands`);
    }
}
function parse(args, options, allowPositionals = false) {
    try {
        return (0,external_node_util_.parseArgs)({ args: [...args], options, allowPositionals, strict: true });
    }
    catch (err) {
        throw new core_errors/* InputError */.d(`${err.message}; run "gradgate help" for the options`);
    }
}
function parseCount(text, flag) {
    const n = Number(text);
    if (!/^\d+$/.test(text) || n < 1)
        throw new core_errors/* InputError */.d(`${flag} must be a positive integer, got ${JSON.stringify(text)}`);
    return n;
}

// EXTERNAL MODULE: ./build/package/action/engine-process.js
var engine_process = __webpack_require__(6142);
;// CONCATENATED MODULE: ./build/package/action/engine-main.js
/**
 * The engine process's side (see ./engine-process.ts): the CLI on this process's arguments, its outcome
 * reported on OUTCOME_FD, then the process ends. Loaded by src/action/main.ts when ENGINE_MARKER is set;
 * nothing here touches the Action's settings, @actions/* or the GitHub API.
 */




async function engineMain(argv) {
    // The CLI prints its error last, through its host: remember what it printed there.
    let lastError = "";
    const base = (0,cli_host/* processHost */.Q)();
    const host = {
        ...base,
        err: (text) => {
            lastError = text;
            base.err(text);
        },
    };
    const code = await main(argv, host);
    const failed = code === cli_host/* EXIT */.d.input || code === cli_host/* EXIT */.d.internal;
    const outcome = {
        code,
        message: failed ? lastError.replace(/^gradgate: /, "").trimEnd() : "",
    };
    try {
        (0,external_node_fs_.writeSync)(engine_process/* OUTCOME_FD */.Yi, JSON.stringify(outcome) + "\n");
    }
    catch {
        // Started by hand, without the outcome pipe: the exit code says it all.
    }
    // Optimizer code may leave timers or handles behind; the command is done, so end once the output is out.
    await Promise.all([flushed(process.stdout), flushed(process.stderr)]);
    process.exit(code);
}
function flushed(stream) {
    return new Promise((resolve) => stream.write("", () => resolve()));
}


/***/ })

};
