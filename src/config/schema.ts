/**
 * JSON Schema (draft 2020-12 subset that ajv understands) of a suite config. The single home of the
 * config defaults: ajv applies them (`useDefaults`), the editor schema in schema/ is generated from this
 * object (`npm run schema`), and the docs table is tested against it.
 */
export const CONFIG_VERSION = 1;

const positiveInt = { type: "integer", minimum: 1 } as const;

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
} as const;

const hyper = {
  type: "object",
  description: "Hyperparameters by name: numbers, booleans or strings.",
  additionalProperties: { type: ["number", "boolean", "string"] },
} as const;

/**
 * How results are judged against baselines (see docs/decisions/0001-statistical-verdict.md). The single
 * home of the policy defaults; src/compare/policy.ts resolves a policy against this fragment.
 */
export const policySchema = {
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
      description:
        "Gating metrics: steps to reach each ladder rung, final gap, evaluations. The others are reported only.",
    },
    margin: {
      type: "object",
      additionalProperties: false,
      default: {},
      description:
        "Practical margins as ratios m > 1 (candidate / baseline): changes inside [1/m, m] are equivalent.",
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
      description:
        "Significance level of every decision (per look; split across looks when extra seeds are used).",
    },
    correction: {
      type: "string",
      enum: ["holm", "benjamini-hochberg", "none"],
      default: "holm",
      description:
        "Multiplicity correction across cases and metrics: Holm (1979) or Benjamini–Hochberg (1995).",
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
      description:
        "Final gaps below gapFloor × initial gap count as equal (relative): float noise near the optimum.",
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
} as const;

/**
 * A process adapter (`adapters.NAME`): an optimizer process spoken to over the subprocess protocol
 * (docs/adapters.md). The single home of its defaults.
 */
export const processAdapterSchema = {
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
      description:
        "Extra environment variables with literal values. The process gets only these and PATH, HOME, LANG " +
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
} as const;

/**
 * A scenario (`scenarios[i]`): extra cases that run every optimizer declaring what the scenario needs
 * (a capability, or the hyperparameters it sets) under a condition real regressions hid behind.
 */
export const scenarioSchema = {
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
      description:
        "Stop after step `at`, export the state, continue in a fresh instance; compared with the uninterrupted run.",
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
      description:
        "Only these optimizers, by name (default: every one that declares what the scenario needs).",
    },
  },
} as const;

/** Names an optimizer of the suite and, optionally, which of its cases a check applies to. */
const checkTarget = {
  optimizer: { type: "string", description: "The optimizer's name in `optimizers`." },
  problem: {
    type: "string",
    description:
      "A problem name (every instance of it) or a problem key as in case ids, e.g. quadratic(kappa=1000).",
  },
  set: { type: "string", description: "Only cases of this hyperparameter set (default: every set)." },
  gating: { type: "boolean", default: true, description: "Whether a failure of this check fails the gate." },
} as const;

/**
 * Reference checks (`checks`): absolute checks against published values, judged beside the baseline
 * drift (docs/reference-checks.md). The single home of their defaults; src/reference/config.ts resolves
 * the section against this fragment.
 */
export const checksSchema = {
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
            description:
              '"global" (the problem\'s f*) or the name of a basin the problem declares (e.g. "local").',
          },
          tolerance: {
            type: "object",
            additionalProperties: false,
            required: ["kind", "value"],
            default: { kind: "absolute", value: 1e-6 },
            description:
              "How close the final loss must come to the target: |f − target| ≤ value (absolute) or value·|target| (relative).",
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
      description:
        "Theoretical rates on quadratics: the fitted rate must match the spectral radius of the method's iteration.",
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
            description:
              "Run with the method's classical tuned step and momentum for the problem's μ and L instead of the case's.",
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
      description:
        "SGD's stationary variance on the noisy quadratic against its closed form ησ²/(λ(2 − ηλ)).",
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
      description:
        "Step-by-step agreement with the reference implementation of the published method the optimizer claims to be.",
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
            description:
              "Conventions the code must follow, e.g. epsPlacement: inside (default: any published form).",
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
} as const;

export const configSchema = {
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
      description:
        "Relative gap tolerances (gap / initial gap), decreasing: steps to reach each are recorded.",
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
} as const;
