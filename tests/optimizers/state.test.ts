import { describe, expect, it } from "vitest";
import { adam, momentum, sgd } from "../../src/optimizers/index.js";
import { CASES } from "./cases.js";
import { DiagonalQuadratic, messageOf, run, vec } from "./helpers.js";

const A = vec(1, 10, 0.1, 3, 0.5);
const START = [1, -2, 0.5, 3, -1];

/** 60 steps with an lr change at step 10, optionally split at step 30 by export → JSON → import. */
function trajectory(
  c: (typeof CASES)[number],
  split: "none" | "resume" | "fresh",
): { x: number[]; state: unknown } {
  const x = Float64Array.from(START);
  const oracle = new DiagonalQuadratic(A);
  const lr = c.hyper.lr as number;
  let opt = c.factory.create(c.hyper, 5);
  run(opt, x, oracle, 30, (k) => {
    if (k === 10) opt.setLearningRate(lr / 2);
  });
  if (split !== "none") {
    const saved = JSON.parse(JSON.stringify(opt.exportState()));
    opt = c.factory.create(c.hyper, 5);
    if (split === "resume") opt.importState(saved);
  }
  run(opt, x, oracle, 30);
  return { x: Array.from(x), state: opt.exportState() };
}

describe("exportState → importState", () => {
  it.each(CASES.map((c) => [c.label, c] as const))(
    "%s: a fresh instance continues bit for bit like the uninterrupted run",
    (_label, c) => {
      const straight = trajectory(c, "none");
      const resumed = trajectory(c, "resume");
      expect(resumed.x).toEqual(straight.x); // exact: toEqual compares doubles with Object.is
      expect(resumed.state).toEqual(straight.state);
      // Control: without the import the continuation differs, so the state really carries the run.
      expect(trajectory(c, "fresh").x).not.toEqual(straight.x);
    },
  );

  it.each(CASES.map((c) => [c.label, c] as const))(
    "%s: the exported state is plain JSON-safe data",
    (_label, c) => {
      const opt = c.factory.create(c.hyper, 5);
      run(opt, Float64Array.from(START), new DiagonalQuadratic(A), 3);
      const state = opt.exportState();
      expect(state.step).toBe(3);
      expect(state.lr).toBe(c.hyper.lr);
      for (const value of Object.values(state)) {
        expect(
          typeof value === "number" || (Array.isArray(value) && value.every((v) => typeof v === "number")),
        ).toBe(true);
      }
      expect(JSON.parse(JSON.stringify(state))).toEqual(state);
    },
  );
});

describe("importState rejects a state that does not fit, naming the field", () => {
  const dim = 3;
  const good = () => adam.create({}, dim).exportState();

  it("wrong vector length", () => {
    expect(messageOf(() => adam.create({}, dim).importState({ ...good(), m: [1, 2] }))).toBe(
      "importState adam: state.m must be an array of 3 finite numbers, got [1,2]",
    );
  });

  it("non-finite entries", () => {
    expect(messageOf(() => adam.create({}, dim).importState({ ...good(), v: [0, Number.NaN, 0] }))).toBe(
      "importState adam: state.v must be an array of 3 finite numbers, got [0,NaN,0]",
    );
  });

  it("a key of another variant (AMSGrad state into plain Adam)", () => {
    const amsState = adam.create({ amsgrad: true }, dim).exportState();
    expect(messageOf(() => adam.create({}, dim).importState(amsState))).toBe(
      "importState adam: state.vMax is not part of this optimizer's state (expected: step, lr, m, v)",
    );
  });

  it("a missing key (plain Adam state into AMSGrad)", () => {
    expect(messageOf(() => adam.create({ amsgrad: true }, dim).importState(good()))).toBe(
      "importState adam: state.vMax is missing (expected: step, lr, m, v, vMax)",
    );
  });

  it("the other momentum form's buffer", () => {
    const outsideState = momentum.create({ form: "lr-outside" }, dim).exportState();
    expect(messageOf(() => momentum.create({ form: "lr-inside" }, dim).importState(outsideState))).toBe(
      "importState momentum: state.buffer is not part of this optimizer's state (expected: step, lr, velocity)",
    );
  });

  it("a bad step counter or learning rate", () => {
    expect(messageOf(() => sgd.create({}, dim).importState({ step: -1, lr: 0.1 }))).toBe(
      "importState sgd: state.step must be a nonnegative integer, got -1",
    );
    expect(messageOf(() => sgd.create({}, dim).importState({ step: 2.5, lr: 0.1 }))).toBe(
      "importState sgd: state.step must be a nonnegative integer, got 2.5",
    );
    expect(messageOf(() => sgd.create({}, dim).importState({ step: 2, lr: 0 }))).toBe(
      "importState sgd: state.lr must be a positive number, got 0",
    );
  });

  it("leaves the instance untouched when it rejects", () => {
    const opt = adam.create({}, dim);
    run(opt, vec(1, 2, 3), new DiagonalQuadratic(vec(1, 1, 1)), 4);
    const before = opt.exportState();
    expect(() => opt.importState({ step: 9, lr: 0.5, m: [7, 7, 7], v: [1] })).toThrow();
    expect(opt.exportState()).toEqual(before);
  });
});

describe("setLearningRate", () => {
  it.each(CASES.map((c) => [c.label, c] as const))(
    "%s rejects a non-positive rate, naming it",
    (_label, c) => {
      const opt = c.factory.create(c.hyper, 2);
      expect(messageOf(() => opt.setLearningRate(0))).toBe(
        `setLearningRate ${c.factory.name}: lr must be a positive number, got 0`,
      );
      expect(messageOf(() => opt.setLearningRate(Number.NaN))).toBe(
        `setLearningRate ${c.factory.name}: lr must be a positive number, got NaN`,
      );
    },
  );
});

describe("the oracle contract", () => {
  it.each(CASES.map((c) => [c.label, c] as const))(
    "%s evaluates once per step, at x itself unless it is the look-ahead form",
    (label, c) => {
      const x = Float64Array.from(START);
      const oracle = new DiagonalQuadratic(A);
      run(c.factory.create(c.hyper, 5), x, oracle, 5);
      expect(oracle.evaluations).toBe(5);
      if (c.factory.name === "nesterov" && c.hyper.form === "lookahead")
        expect(oracle.lastPoint, label).not.toBe(x);
      else expect(oracle.lastPoint, label).toBe(x);
    },
  );

  it("rejects an iterate of the wrong length", () => {
    expect(messageOf(() => adam.create({}, 3).step(vec(1, 2), new DiagonalQuadratic(vec(1, 1))))).toBe(
      "adam.step: x must have length 3, got length 2",
    );
  });
});
