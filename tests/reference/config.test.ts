import { describe, expect, it } from "vitest";
import { parseConfig } from "../../src/config/load.js";
import { checksSchema } from "../../src/config/schema.js";
import { InputError } from "../../src/core/errors.js";
import { OPTIMIZER_NAMES } from "../../src/optimizers/index.js";
import { parseChecks } from "../../src/reference/config.js";
import { LINEAR_METHODS } from "../../src/reference/linear-rate.js";
import { METHODS } from "../../src/reference/variants.js";

const WHERE = "config test.yml: checks";

describe("the checks section: defaults from the schema", () => {
  it("is empty when absent", () => {
    expect(parseChecks(undefined, WHERE)).toEqual({ minimum: [], rate: [], stationary: [], conformance: [] });
  });

  it("fills every default of every kind of declaration", () => {
    const checks = parseChecks(
      {
        minimum: [{ optimizer: "o", problem: "p" }],
        rate: [{ optimizer: "o", problem: "p", method: "heavy-ball" }],
        stationary: [{ optimizer: "o", problem: "p" }],
        conformance: [{ optimizer: "o", method: "adam" }],
      },
      WHERE,
    );
    expect(checks).toEqual({
      minimum: [
        {
          optimizer: "o",
          problem: "p",
          basin: "global",
          tolerance: { kind: "absolute", value: 1e-6 },
          share: 1,
          gating: true,
        },
      ],
      rate: [
        {
          optimizer: "o",
          problem: "p",
          method: "heavy-ball",
          tuned: false,
          names: { lr: "lr", momentum: "momentum" },
          tolerance: 0.02,
          steps: 200000,
          gating: true,
        },
      ],
      stationary: [
        { optimizer: "o", problem: "p", names: { lr: "lr" }, precision: 0.01, sigmas: 5, gating: true },
      ],
      conformance: [
        {
          optimizer: "o",
          method: "adam",
          set: "default",
          names: {},
          expect: {},
          tolerance: 1e-9,
          gating: true,
        },
      ],
    });
  });

  it("is validated and defaulted by the config loader too", () => {
    const config = parseConfig(
      "optimizers: [{ name: o }]\nproblems: [{ use: rosenbrock }]\nchecks: { minimum: [{ optimizer: o, problem: rosenbrock }] }\n",
      "test.yml",
    );
    expect(config.checks).toEqual({
      minimum: [
        {
          optimizer: "o",
          problem: "rosenbrock",
          basin: "global",
          tolerance: { kind: "absolute", value: 1e-6 },
          share: 1,
          gating: true,
        },
      ],
      rate: [],
      stationary: [],
      conformance: [],
    });
  });

  it("lists exactly the methods the checks know", () => {
    const items = checksSchema.properties.conformance.items.properties;
    expect([...items.method.enum]).toEqual(METHODS);
    expect([...METHODS].sort()).toEqual([...OPTIMIZER_NAMES].sort());
    expect([...checksSchema.properties.rate.items.properties.method.enum]).toEqual(LINEAR_METHODS);
  });
});

describe("the checks section: one clear message per mistake", () => {
  it.each<[string, unknown, string]>([
    ["not a mapping", [1], "config test.yml: checks must be a mapping, got [1]"],
    [
      "an unknown kind",
      { speed: [] },
      "config test.yml: checks.speed is not a known field (known: minimum, rate, stationary, conformance)",
    ],
    [
      "a missing field",
      { minimum: [{ optimizer: "o" }] },
      "config test.yml: checks.minimum[0].problem is required",
    ],
    [
      "a tolerance outside (0, 1)",
      { conformance: [{ optimizer: "o", method: "sgd", tolerance: 0 }] },
      "config test.yml: checks.conformance[0].tolerance must be > 0, got 0",
    ],
    [
      "an unknown method",
      { rate: [{ optimizer: "o", problem: "p", method: "newton" }] },
      'config test.yml: checks.rate[0].method must be one of "gradient-descent", "heavy-ball", "nesterov", got "newton"',
    ],
    [
      "a tolerance kind that is not absolute or relative",
      { minimum: [{ optimizer: "o", problem: "p", tolerance: { kind: "ulps", value: 4 } }] },
      'config test.yml: checks.minimum[0].tolerance.kind must be one of "absolute", "relative", got "ulps"',
    ],
    [
      "a share above 1",
      { minimum: [{ optimizer: "o", problem: "p", share: 2 }] },
      "config test.yml: checks.minimum[0].share must be ≤ 1, got 2",
    ],
    [
      "a non-string name",
      { conformance: [{ optimizer: "o", method: "sgd", names: { lr: 3 } }] },
      "config test.yml: checks.conformance[0].names.lr must be a string or null, got 3",
    ],
  ])("%s", (_name, raw, message) => {
    expect(() => parseChecks(raw, WHERE)).toThrow(new InputError(message));
  });
});
