import { Ajv } from "ajv";
import { describe, expect, it } from "vitest";
import type { HyperValue } from "../../src/core/types.js";
import {
  OPTIMIZERS,
  OPTIMIZER_NAMES,
  adam,
  adamw,
  defaultsOf,
  getOptimizer,
  hyperJsonSchema,
  momentum,
  resolveHyper,
  rmsprop,
} from "../../src/optimizers/index.js";
import { messageOf } from "./helpers.js";

const WHERE = "config gradgate.yml: optimizers[1].hyper";

describe("resolveHyper error messages", () => {
  const rows: { given: Record<string, unknown>; message: string }[] = [
    { given: { lr: "fast" }, message: `${WHERE}.lr must be a positive number, got "fast"` },
    {
      given: { betaOne: 0.9 },
      message:
        `${WHERE}.betaOne is not a hyperparameter of adam ` +
        "(known: lr, beta1, beta2, eps, weightDecay, amsgrad, amsgradMax, epsPlacement)",
    },
    { given: { lr: 0 }, message: `${WHERE}.lr must be a positive number, got 0` },
    { given: { lr: -0.1 }, message: `${WHERE}.lr must be a positive number, got -0.1` },
    { given: { lr: Number.NaN }, message: `${WHERE}.lr must be a positive number, got NaN` },
    {
      given: { lr: Number.POSITIVE_INFINITY },
      message: `${WHERE}.lr must be a positive number, got Infinity`,
    },
    { given: { lr: null }, message: `${WHERE}.lr must be a positive number, got null` },
    { given: { lr: "0.001" }, message: `${WHERE}.lr must be a positive number, got "0.001"` },
    { given: { beta1: 1 }, message: `${WHERE}.beta1 must be a number in [0, 1), got 1` },
    { given: { beta2: -0.5 }, message: `${WHERE}.beta2 must be a number in [0, 1), got -0.5` },
    { given: { eps: -1e-8 }, message: `${WHERE}.eps must be a nonnegative number, got -1e-8` },
    { given: { amsgrad: "yes" }, message: `${WHERE}.amsgrad must be true or false, got "yes"` },
    { given: { amsgrad: 1 }, message: `${WHERE}.amsgrad must be true or false, got 1` },
    {
      given: { epsPlacement: "middle" },
      message: `${WHERE}.epsPlacement must be one of "corrected", "efficient", got "middle"`,
    },
    {
      given: { amsgradMax: "corrected" },
      message:
        `${WHERE}.amsgradMax "corrected" has no effect unless amsgrad is true; ` +
        "set amsgrad: true or remove amsgradMax",
    },
  ];
  it.each(rows.map((r) => [r.message, r.given] as const))("%s", (message, given) => {
    expect(messageOf(() => resolveHyper(adam, given, WHERE))).toBe(message);
  });

  it("names the optimizer and lists its own hyperparameters", () => {
    expect(messageOf(() => resolveHyper(momentum, { beta1: 0.9 }, WHERE))).toBe(
      `${WHERE}.beta1 is not a hyperparameter of momentum (known: lr, momentum, form, weightDecay)`,
    );
    expect(messageOf(() => resolveHyper(momentum, { form: "inside" }, WHERE))).toBe(
      `${WHERE}.form must be one of "lr-inside", "lr-outside", got "inside"`,
    );
  });

  it("rejects a hyperparameter mapping that is not a mapping", () => {
    expect(messageOf(() => resolveHyper(adam, [0.1], WHERE))).toBe(
      `${WHERE} must be a mapping of hyperparameter names to values, got [0.1]`,
    );
    expect(messageOf(() => resolveHyper(adam, "fast", WHERE))).toBe(
      `${WHERE} must be a mapping of hyperparameter names to values, got "fast"`,
    );
  });
});

describe("resolveHyper merging", () => {
  it("puts the given values over the defaults, in declaration order", () => {
    const resolved = resolveHyper(adam, { epsPlacement: "efficient", lr: 0.01 }, WHERE);
    expect(resolved).toEqual({ ...adam.defaults, lr: 0.01, epsPlacement: "efficient" });
    expect(Object.keys(resolved)).toEqual(Object.keys(adam.hyperSpecs));
    expect(Object.isFrozen(resolved)).toBe(true);
  });

  it("treats a missing mapping as empty", () => {
    expect(resolveHyper(rmsprop, undefined, WHERE)).toEqual(rmsprop.defaults);
    expect(resolveHyper(rmsprop, null, WHERE)).toEqual(rmsprop.defaults);
  });

  it("accepts the range boundaries that are inside the range", () => {
    expect(() => resolveHyper(adam, { beta1: 0, beta2: 0, eps: 0, weightDecay: 0 }, WHERE)).not.toThrow();
    expect(() => resolveHyper(adam, { amsgrad: true, amsgradMax: "corrected" }, WHERE)).not.toThrow();
  });
});

describe("create validates like resolveHyper", () => {
  it("rejects bad hyperparameters and dimensions passed programmatically", () => {
    expect(messageOf(() => adam.create({ lr: -1 }, 3))).toBe(
      "optimizer adam: hyper.lr must be a positive number, got -1",
    );
    expect(messageOf(() => adamw.create({ decayScaledByLr: "no" }, 3))).toBe(
      'optimizer adamw: hyper.decayScaledByLr must be true or false, got "no"',
    );
    expect(messageOf(() => adam.create({}, 0))).toBe("optimizer adam: dim must be a positive integer, got 0");
    expect(messageOf(() => adam.create({}, 2.5))).toBe(
      "optimizer adam: dim must be a positive integer, got 2.5",
    );
  });
});

describe("registry", () => {
  it("lists the reference optimizers in a stable order", () => {
    expect(OPTIMIZER_NAMES).toEqual(["sgd", "momentum", "nesterov", "adagrad", "rmsprop", "adam", "adamw"]);
    expect(OPTIMIZERS.map((f) => f.name)).toEqual(OPTIMIZER_NAMES);
  });

  it("finds by name, and lists the known names for an unknown one", () => {
    expect(getOptimizer("adamw")).toBe(adamw);
    expect(messageOf(() => getOptimizer("adamx", "config gradgate.yml: optimizers[1].name"))).toBe(
      "config gradgate.yml: optimizers[1].name must name a reference optimizer " +
        '(known: sgd, momentum, nesterov, adagrad, rmsprop, adam, adamw), got "adamx"',
    );
  });

  it.each(OPTIMIZERS.map((f) => [f.name, f] as const))(
    "%s: defaults come from its spec table, pass its own validator, and every capability exists",
    (_name, f) => {
      expect(f.defaults).toEqual(defaultsOf(f.hyperSpecs));
      expect(resolveHyper(f, f.defaults, WHERE)).toEqual(f.defaults);
      expect(f.title.length).toBeGreaterThan(10);
      for (const spec of Object.values(f.hyperSpecs)) expect(spec.description.length).toBeGreaterThan(10);
      const opt = f.create({}, 2);
      expect(typeof opt.exportState).toBe("function");
      expect(typeof opt.importState).toBe("function");
      expect(typeof opt.setLearningRate).toBe("function");
    },
  );
});

describe("hyperJsonSchema agrees with resolveHyper", () => {
  // ajv 8.20 (a project dependency) with strictNumbers, so NaN and ±Infinity are not numbers.
  const ajv = new Ajv({ strictNumbers: true });
  const probes: HyperValue[] = [
    -1,
    0,
    1e-12,
    0.5,
    0.999,
    1,
    2,
    true,
    false,
    "raw",
    "inside",
    "lookahead",
    "x",
  ];

  it.each(OPTIMIZERS.map((f) => [f.name, f] as const))(
    "%s: same verdict on every probe value",
    (_name, f) => {
      const validate = ajv.compile(hyperJsonSchema(f));
      let accepted = 0;
      for (const [name, spec] of Object.entries(f.hyperSpecs)) {
        const values = spec.type === "choice" ? [...probes, ...spec.choices] : probes;
        for (const value of values) {
          // amsgradMax is only meaningful with amsgrad (a rule between fields, not in the schema).
          const given = name === "amsgradMax" ? { amsgrad: true, [name]: value } : { [name]: value };
          let ok = true;
          try {
            resolveHyper(f, given, WHERE);
          } catch {
            ok = false;
          }
          expect({ given, schema: validate(given) }).toEqual({ given, schema: ok });
          if (ok) accepted++;
        }
      }
      expect(validate({ notAHyperparameter: 1 })).toBe(false);
      expect(accepted).toBeGreaterThan(0);
    },
  );
});
