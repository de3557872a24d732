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
        maxDim: { type: "integer", minimum: 0, default: 10, description: "Only problems up to this dimension." },
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
    policy: { type: "object", description: "How results are judged against baselines." },
    checks: { type: "object", description: "Reference checks against published values." },
  },
} as const;
