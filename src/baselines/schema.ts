/**
 * JSON Schema (draft 2020-12) of a baseline file, version 1. The code validates every baseline it reads
 * against this object with ajv; schema/baseline.schema.json is generated from it for editors
 * (scripts/write-schemas.ts), and tests/baselines/schema.test.ts checks that a baseline built from real
 * results satisfies it and that it names exactly the fields of the TypeScript types.
 */
import { BASELINE_FORMAT, BASELINE_VERSION } from "./types.js";

const count = { type: "integer", minimum: 0 } as const;
const numberOrNull = { type: ["number", "null"] } as const;
const countOrNull = { type: ["integer", "null"], minimum: 0 } as const;

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
} as const;

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
} as const;

export const baselineSchema = {
  $schema: "https://json-schema.org/draft/2020-12/schema",
  $id: "https://gradgate.dev/schema/baseline.schema.json",
  title: "gradgate baseline file (one optimizer)",
  description: "Written by `gradgate rebaseline`; do not edit by hand (the digest catches edits).",
  type: "object",
  additionalProperties: false,
  required: ["format", "version", "optimizer", "provenance", "cases", "digest"],
  properties: {
    $schema: { type: "string" },
    format: { const: BASELINE_FORMAT },
    version: { const: BASELINE_VERSION },
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
} as const;

/**
 * The parts of a results document (src/runner/results.ts) that compare and rebaseline rely on, checked
 * before use so a damaged results file gets a message instead of a crash.
 */
export const resultsInputSchema = {
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
} as const;

/** The field lists of the schema, for the test that keeps them equal to the TypeScript types. */
export const RUN_FIELDS = Object.keys(runSchema.properties);
export const CASE_SPEC_FIELDS = Object.keys(caseSpecSchema.properties);
