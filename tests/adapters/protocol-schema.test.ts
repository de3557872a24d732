/**
 * The protocol's JSON Schemas: the files shipped in schema/protocol/ are the objects the harness
 * validates with (scripts/write-schemas.ts writes them), and real traffic between the harness and the
 * Python client — every message kind and every section — is valid against the shipped files.
 */
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { Ajv2020 } from "ajv/dist/2020.js";
import { describe, expect, it } from "vitest";
import { PROTOCOL_SCHEMAS } from "../../src/adapters/protocol-schema.js";
import { ProcessSession } from "../../src/adapters/session.js";
import type { RunRequest } from "../../src/adapters/process-run.js";
import { getProblem } from "../../src/problems/index.js";
import { adam } from "../../src/optimizers/index.js";

const ADAM_DEFAULTS = adam.defaults;
import { PY_EXAMPLE, ROOT, pySettings, suiteFromYaml } from "./helpers.js";

const shipped = Object.fromEntries(
  PROTOCOL_SCHEMAS.map(({ file }) => [
    file.replace(/^schema\/protocol\/(.*)\.schema\.json$/, "$1"),
    JSON.parse(readFileSync(join(ROOT, file), "utf8")) as Record<string, unknown>,
  ]),
);
const ajv = new Ajv2020({ allErrors: true, strict: true, allowUnionTypes: true });
const validators = Object.fromEntries(Object.entries(shipped).map(([k, s]) => [k, ajv.compile(s)]));

describe("shipped protocol schemas", () => {
  it.each(PROTOCOL_SCHEMAS.map((s) => [s.file, s.schema]))(
    "%s equals the schema the harness uses (npx tsx scripts/write-schemas.ts)",
    (file, schema) => {
      expect(JSON.parse(readFileSync(join(ROOT, file), "utf8"))).toEqual(schema);
    },
  );

  it.each([
    ["report", { type: "report", steps: [{ run: 1, x: [1, "2"] }] }],
    ["report", { type: "report", evals: [{ run: -1, x: [1] }] }],
    ["report", { type: "report", failed: [{ run: 1, phase: "later", message: "" }] }],
    ["report", { type: "report", extra: [] }],
    ["orders", { type: "orders", start: [{ run: 1, optimizer: "a", hyper: {}, dim: 0, x: [] }] }],
    ["orders", { type: "orders", values: [{ run: 1, f: "1", g: [] }] }],
    ["ready", { type: "ready", protocol: 1, optimizers: [{ name: "a", capabilities: ["telepathy"] }] }],
    ["ready", { type: "ready", protocol: 1, optimizers: [] }],
    ["hello", { type: "hello", protocols: [], harness: "x" }],
  ])("rejects an invalid %s message: %j", (kind, message) => {
    expect(validators[kind](message)).toBe(false);
  });
});

describe("real traffic", () => {
  it("is valid against the shipped schemas, for every message kind and section", async () => {
    const lines: { direction: "out" | "in"; line: string }[] = [];
    const session = new ProcessSession(pySettings(PY_EXAMPLE, [], { maxRuns: 3 }), {
      onLine: (direction, line) => lines.push({ direction, line }),
    });
    const suite = await suiteFromYaml(`seeds: 1
budget: { steps: 30 }
optimizers: [{ name: momentum, hyper: { lr: 0.001 } }]
problems: [{ use: rosenbrock }]
`);
    const spec = suite.cases[0];
    const base = { spec, seedIndex: 0, suiteSeed: 1, definition: getProblem("rosenbrock") };
    const requests: RunRequest[] = [
      { ...base, optimizer: "momentum", control: { pauseAt: 10, action: { kind: "restart" } } },
      { ...base, optimizer: "momentum", control: { pauseAt: 12, action: { kind: "lr", lr: 0.0005 } } },
      {
        ...base,
        spec: { ...spec, hyper: { lr: 0.001, momentum: 0.9, form: "lookahead", weightDecay: 0 } },
        optimizer: "nesterov",
      },
      { ...base, optimizer: "no-such-optimizer" },
      { ...base, spec: { ...spec, hyper: { ...ADAM_DEFAULTS, lr: 0.01 } }, optimizer: "adam" },
    ];
    const metrics = await session.run(requests);
    await session.close();
    expect(metrics.map((m) => m.stop)).toEqual(["steps", "steps", "steps", "error", "steps"]);
    expect(metrics[3].error).toBe(
      `creating the optimizer failed: KeyError: "no optimizer named 'no-such-optimizer' here"`,
    );

    const seen = new Set<string>();
    for (const { direction, line } of lines) {
      const message = JSON.parse(line) as Record<string, unknown>;
      const kind = message.type as string;
      expect(direction === "out" ? ["hello", "orders", "bye"] : ["ready", "report"]).toContain(kind);
      const validate = validators[kind];
      expect(validate(message), `${kind}: ${JSON.stringify(validate.errors)}`).toBe(true);
      seen.add(kind);
      for (const key of Object.keys(message)) if (key !== "type") seen.add(`${kind}.${key}`);
      for (const entry of (message.start as Record<string, unknown>[] | undefined) ?? []) {
        for (const key of Object.keys(entry)) seen.add(`orders.start.${key}`);
      }
    }
    expect([...seen].sort()).toEqual(
      [
        "bye",
        "hello",
        "hello.harness",
        "hello.protocols",
        "orders",
        "orders.end",
        "orders.exportState",
        "orders.resume",
        "orders.start",
        "orders.start.dim",
        "orders.start.hyper",
        "orders.start.optimizer",
        "orders.start.pause",
        "orders.start.run",
        "orders.start.state",
        "orders.start.x",
        "orders.values",
        "ready",
        "ready.client",
        "ready.optimizers",
        "ready.protocol",
        "report",
        "report.evals",
        "report.failed",
        "report.states",
        "report.steps",
      ].sort(),
    );
  });
});
