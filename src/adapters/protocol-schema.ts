/**
 * JSON Schemas (draft 2020-12) of every message of the subprocess protocol, version 1 (see
 * ./protocol.ts for the meaning of each field). The harness validates what a client sends against
 * `readySchema` and `reportSchema` with ajv; client authors validate what they receive against the
 * harness messages. scripts/write-schemas.ts writes these objects to schema/protocol/ and
 * tests/adapters/protocol-schema.test.ts fails when a shipped file differs from the object here.
 *
 * What a schema cannot say is checked by the harness in code: vector lengths (the run's dimension),
 * run ids that exist, and the order of a run's entries.
 */
import { CAPABILITIES, FAILURE_PHASES } from "./protocol.js";

const BASE = "https://gradgate.dev/schema/protocol/v1";
const DRAFT = "https://json-schema.org/draft/2020-12/schema";

const runId = { type: "integer", minimum: 0, maximum: 9007199254740991, description: "Run id." } as const;
const runIds = { type: "array", items: runId } as const;
const count = { type: "integer", minimum: 1, maximum: 9007199254740991 } as const;
const finiteVector = { type: "array", items: { type: "number" } } as const;
const vectorOrNull = {
  type: ["array", "null"],
  items: { type: "number" },
  description: "A point; null when it is not finite (NaN or ±Infinity cannot be written in JSON).",
} as const;
const hyperValues = {
  type: "object",
  additionalProperties: { type: ["number", "boolean", "string"] },
} as const;
const state = {
  type: "object",
  description: "An optimizer's exported state: named numbers and arrays of numbers.",
  additionalProperties: {
    anyOf: [{ type: "number" }, { type: "array", items: { type: "number" } }],
  },
} as const;

export const helloSchema = {
  $schema: DRAFT,
  $id: `${BASE}/hello.schema.json`,
  title: "gradgate protocol: hello (harness → client, first message)",
  type: "object",
  additionalProperties: false,
  required: ["type", "protocols", "harness"],
  properties: {
    type: { const: "hello" },
    protocols: {
      type: "array",
      minItems: 1,
      items: { type: "integer", minimum: 1 },
      description: "Protocol versions the harness speaks; the client answers with one of them.",
    },
    harness: { type: "string", description: "Name and version of the harness (informative)." },
  },
} as const;

export const readySchema = {
  $schema: DRAFT,
  $id: `${BASE}/ready.schema.json`,
  title: "gradgate protocol: ready (client → harness, answer to hello)",
  type: "object",
  additionalProperties: false,
  required: ["type", "protocol", "optimizers"],
  properties: {
    type: { const: "ready" },
    protocol: { type: "integer", minimum: 1, description: "The version chosen from hello.protocols." },
    client: { type: "string", maxLength: 200, description: "Name and version of the client (informative)." },
    optimizers: {
      type: "array",
      minItems: 1,
      description: "The optimizers this process serves.",
      items: {
        type: "object",
        additionalProperties: false,
        required: ["name", "capabilities"],
        properties: {
          name: { type: "string", pattern: "^[A-Za-z0-9][A-Za-z0-9_.-]*$", maxLength: 100 },
          title: { type: "string", maxLength: 300 },
          defaults: {
            ...hyperValues,
            description: "Default hyperparameters; the config's values override them.",
          },
          capabilities: {
            type: "array",
            uniqueItems: true,
            items: { type: "string", enum: [...CAPABILITIES] },
            description: '"state": exportState/importState (resume); "lr": setLearningRate between steps.',
          },
        },
      },
    },
  },
} as const;

export const ordersSchema = {
  $schema: DRAFT,
  $id: `${BASE}/orders.schema.json`,
  title: "gradgate protocol: orders (harness → client; answered by exactly one report, in order)",
  type: "object",
  additionalProperties: false,
  required: ["type"],
  properties: {
    type: { const: "orders" },
    start: {
      type: "array",
      description: "New runs: create an instance, then begin stepping from x.",
      items: {
        type: "object",
        additionalProperties: false,
        required: ["run", "optimizer", "hyper", "dim", "x"],
        properties: {
          run: runId,
          optimizer: { type: "string" },
          hyper: { ...hyperValues, description: "Hyperparameters with the optimizer's defaults merged in." },
          dim: count,
          x: { ...finiteVector, description: "Start point, length dim." },
          state: { ...state, description: "Import this state before the first step." },
          pause: {
            ...count,
            description: "After completing this step (counted from 1 for this instance), wait for resume.",
          },
        },
      },
    },
    values: {
      type: "array",
      description: "Loss and gradient at the point each run asked about; null = not finite.",
      items: {
        type: "object",
        additionalProperties: false,
        required: ["run", "f", "g"],
        properties: {
          run: runId,
          f: { type: ["number", "null"] },
          g: { type: "array", items: { type: ["number", "null"] } },
        },
      },
    },
    resume: {
      type: "array",
      description:
        "Waiting runs to continue: at their pause point, or after a step reported without an evaluation request.",
      items: {
        type: "object",
        additionalProperties: false,
        required: ["run"],
        properties: {
          run: runId,
          lr: {
            type: "number",
            exclusiveMinimum: 0,
            description: "Call setLearningRate(lr) before the next step.",
          },
          pause: {
            ...count,
            description: "New pause point: after this step (counted from 1 for this instance).",
          },
        },
      },
    },
    exportState: { ...runIds, description: "Paused runs whose state the report must carry in states." },
    end: { ...runIds, description: "Runs that are over: forget them." },
  },
} as const;

export const byeSchema = {
  $schema: DRAFT,
  $id: `${BASE}/bye.schema.json`,
  title: "gradgate protocol: bye (harness → client, last message; the client exits with status 0)",
  type: "object",
  additionalProperties: false,
  required: ["type"],
  properties: { type: { const: "bye" } },
} as const;

export const reportSchema = {
  $schema: DRAFT,
  $id: `${BASE}/report.schema.json`,
  title: "gradgate protocol: report (client → harness; answers one orders, for exactly the runs it names)",
  type: "object",
  additionalProperties: false,
  required: ["type"],
  properties: {
    type: { const: "report" },
    steps: {
      type: "array",
      description: "Completed steps (at most one per run per report, before that run's evaluation request).",
      items: {
        type: "object",
        additionalProperties: false,
        required: ["run", "x"],
        properties: {
          run: runId,
          x: { ...vectorOrNull, description: "The new iterate, length dim; null when it is not finite." },
          eval: {
            type: "boolean",
            description: "true: the next step's first evaluation is at this iterate.",
          },
        },
      },
    },
    evals: {
      type: "array",
      description: "Evaluation requests (at most one outstanding per run).",
      items: {
        type: "object",
        additionalProperties: false,
        required: ["run", "x"],
        properties: { run: runId, x: vectorOrNull },
      },
    },
    states: {
      type: "array",
      description: "States asked for by orders.exportState.",
      items: {
        type: "object",
        additionalProperties: false,
        required: ["run", "state"],
        properties: { run: runId, state },
      },
    },
    failed: {
      type: "array",
      description: 'Runs whose optimizer code raised an error; each ends with stop "error".',
      items: {
        type: "object",
        additionalProperties: false,
        required: ["run", "phase", "message"],
        properties: {
          run: runId,
          phase: { type: "string", enum: [...FAILURE_PHASES] },
          message: { type: "string" },
        },
      },
    },
  },
} as const;

/** Every protocol schema with the file it ships as (paths relative to the repository root). */
export const PROTOCOL_SCHEMAS: readonly {
  readonly file: string;
  readonly schema: Record<string, unknown>;
}[] = [
  { file: "schema/protocol/hello.schema.json", schema: helloSchema },
  { file: "schema/protocol/ready.schema.json", schema: readySchema },
  { file: "schema/protocol/orders.schema.json", schema: ordersSchema },
  { file: "schema/protocol/report.schema.json", schema: reportSchema },
  { file: "schema/protocol/bye.schema.json", schema: byeSchema },
];
