import { describe, expect, it } from "vitest";
import { Pcg32 } from "../../src/core/rng.js";
import type { ProblemDefinition } from "../../src/core/types.js";
import {
  PROBLEMS,
  createProblem,
  getProblem,
  problemKey,
  resolveProblemParams,
} from "../../src/problems/index.js";
import { describeSpec, satisfiesSpec } from "../../src/problems/params.js";
import { ctx } from "./helpers.js";

const NAMES = [
  "quadratic",
  "rosenbrock",
  "freudenstein-roth",
  "powell-badly-scaled",
  "brown-badly-scaled",
  "beale",
  "helical-valley",
  "gaussian",
  "powell-singular",
  "wood",
  "extended-rosenbrock",
  "penalty-1",
  "penalty-2",
  "saddle",
  "plateau",
  "noisy-quadratic",
  "sparse-least-squares",
  "logistic-regression",
  "two-layer-network",
];

describe("registry", () => {
  it("lists every problem once, in the stable order", () => {
    expect(PROBLEMS.map((p) => p.name)).toEqual(NAMES);
    expect(Object.isFrozen(PROBLEMS)).toBe(true);
  });

  it.each(PROBLEMS.map((def) => [def.name, def] as const))(
    "%s: metadata and defaults are complete",
    (_, def) => {
      expect(def.name).toMatch(/^[a-z0-9]+(-[a-z0-9]+)*$/);
      expect(def.title.length).toBeGreaterThan(10);
      expect(def.source.length).toBeGreaterThan(20);
      expect(def.tags.length).toBeGreaterThan(0);
      for (const [name, spec] of Object.entries(def.params)) {
        expect(satisfiesSpec(spec, spec.default), `${def.name}.${name} default`).toBe(true);
        expect(spec.description.length, `${def.name}.${name} description`).toBeGreaterThan(3);
      }
      const inst = def.create({}, ctx());
      expect(inst.key).toBe(def.name);
      expect(["published", "computed", "lower-bound"]).toContain(inst.fStarKind);
      if (inst.fStarKind !== "published") expect(def.fStarNote ?? "", "fStarNote").not.toBe("");
      if (inst.xStar) expect(inst.xStar.length).toBe(inst.dim);
      const x = new Float64Array(inst.dim);
      inst.start(x, null);
      // the start is not already optimal, and f* is no larger than the start's value
      expect(inst.objective(x)).toBeGreaterThan(inst.fStar);
    },
  );

  it("finds problems by name and lists the known names for an unknown one", () => {
    expect(getProblem("wood").name).toBe("wood");
    expect(() => getProblem("rosenbrok")).toThrow(
      `unknown problem "rosenbrok"; expected one of: ${NAMES.join(", ")}`,
    );
  });

  it("createProblem merges defaults and names the problem in errors", () => {
    const inst = createProblem("quadratic", { kappa: 1e4 }, ctx());
    expect(inst.key).toBe("quadratic(kappa=10000)");
    expect(inst.dim).toBe(10);
    expect(() => createProblem("quadratic", { n: 0 }, ctx())).toThrow(
      'problem "quadratic".params.n must be an integer in [1, 2000], got 0',
    );
  });
});

describe("resolveProblemParams", () => {
  const where = "config gradgate.yml: problems[2]";
  const ext = getProblem("extended-rosenbrock");
  const quad = getProblem("quadratic");

  it("merges defaults and returns every declared parameter, frozen", () => {
    const p = resolveProblemParams(quad, { kappa: 1e4 }, where);
    expect(p).toEqual({ kappa: 1e4, n: 10, rotate: 1, seed: 0 });
    expect(Object.isFrozen(p)).toBe(true);
    expect(resolveProblemParams(quad, undefined, where)).toEqual({ kappa: 100, n: 10, rotate: 1, seed: 0 });
    expect(resolveProblemParams(getProblem("wood"), {}, where)).toEqual({});
  });

  const ERRORS: { def: ProblemDefinition; given: unknown; message: string }[] = [
    { def: ext, given: { n: 3 }, message: `${where}.params.n must be an even integer ≥ 2, got 3` },
    { def: ext, given: { n: 0 }, message: `${where}.params.n must be an even integer ≥ 2, got 0` },
    { def: ext, given: { n: 4.5 }, message: `${where}.params.n must be an even integer ≥ 2, got 4.5` },
    {
      def: quad,
      given: { n: "ten" },
      message: `${where}.params.n must be an integer in [1, 2000], got "ten"`,
    },
    {
      def: quad,
      given: { kappa: 0.5 },
      message: `${where}.params.kappa must be a number in [1, 1000000000000], got 0.5`,
    },
    {
      def: quad,
      given: { kappa: Number.NaN },
      message: `${where}.params.kappa must be a number in [1, 1000000000000], got NaN`,
    },
    {
      def: quad,
      given: { rotate: true },
      message: `${where}.params.rotate must be an integer in [0, 1], got true`,
    },
    { def: quad, given: { n: null }, message: `${where}.params.n must be an integer in [1, 2000], got null` },
    {
      def: quad,
      given: { dim: 3 },
      message: `${where}.params.dim is not a parameter of problem "quadratic"; expected one of: kappa, n, rotate, seed`,
    },
    {
      def: getProblem("rosenbrock"),
      given: { n: 2 },
      message: `${where}.params.n is not a parameter of problem "rosenbrock"; it takes no parameters`,
    },
    {
      def: quad,
      given: 5,
      message: `${where}.params must be a mapping from parameter name to number (kappa, n, rotate, seed), got 5`,
    },
    {
      def: quad,
      given: [1, 2],
      message: `${where}.params must be a mapping from parameter name to number (kappa, n, rotate, seed), got [1,2]`,
    },
  ];
  it.each(ERRORS)("rejects $given with the exact message", ({ def, given, message }) => {
    expect(() => resolveProblemParams(def, given, where)).toThrow(message);
    try {
      resolveProblemParams(def, given, where);
    } catch (e) {
      expect((e as Error).message).toBe(message);
    }
  });

  it("describes each form of spec", () => {
    expect(describeSpec({ default: 0, description: "x" })).toBe("a finite number");
    expect(describeSpec({ default: 0, integer: true, description: "x" })).toBe("an integer");
    expect(describeSpec({ default: 0, max: 3, description: "x" })).toBe("a number ≤ 3");
    expect(describeSpec({ default: 2, min: 2, even: true, description: "x" })).toBe("an even integer ≥ 2");
  });
});

describe("problemKey", () => {
  const quad = getProblem("quadratic");
  const rows: [Record<string, number>, string][] = [
    [{}, "quadratic"],
    [{ kappa: 100, n: 10, rotate: 1, seed: 0 }, "quadratic"],
    [{ kappa: 1e4 }, "quadratic(kappa=10000)"],
    [{ n: 20, kappa: 100 }, "quadratic(n=20)"],
    [{ rotate: 0, kappa: 10 }, "quadratic(kappa=10,rotate=0)"],
    [{ seed: 3, n: 5, kappa: 0.5e1 }, "quadratic(kappa=5,n=5,seed=3)"],
  ];
  it.each(rows)("%o → %s", (params, key) => {
    expect(problemKey(quad, params)).toBe(key);
    expect(createProblem("quadratic", params, ctx()).key).toBe(key);
  });
  it("prints small numbers as JavaScript does", () => {
    expect(problemKey(getProblem("logistic-regression"), { l2: 1e-7 })).toBe("logistic-regression(l2=1e-7)");
    expect(problemKey(getProblem("noisy-quadratic"), { sigma: 0.25 })).toBe("noisy-quadratic(sigma=0.25)");
  });
});

describe("start points", () => {
  // Problems whose perturbation is the default ±(1%·|x0ᵢ| + 0.001), uniform (util.halfWidths).
  const DEFAULT_RULE = [
    "rosenbrock",
    "freudenstein-roth",
    "beale",
    "helical-valley",
    "gaussian",
    "powell-singular",
    "wood",
    "extended-rosenbrock",
    "penalty-1",
    "penalty-2",
    "plateau",
    "noisy-quadratic",
    "two-layer-network",
  ];
  // Problems with their own half-widths (documented in each file).
  const OWN_RULE: Record<string, (x0: number, i: number) => number> = {
    quadratic: () => 0.01,
    "powell-badly-scaled": (_, i) => (i === 0 ? 1e-6 : 0.01),
    "brown-badly-scaled": (x0) => 0.01 * Math.abs(x0),
    "sparse-least-squares": () => 0.01,
    "logistic-regression": () => 0.01,
  };

  it.each(NAMES)(
    "%s: standard start is exact and repeatable; seeded starts are bounded and differ",
    (name) => {
      const inst = createProblem(name, {}, ctx());
      const x0 = new Float64Array(inst.dim);
      const again = new Float64Array(inst.dim);
      inst.start(x0, null);
      inst.start(again, null);
      expect(again).toEqual(x0);
      const a = new Float64Array(inst.dim);
      const b = new Float64Array(inst.dim);
      const c = new Float64Array(inst.dim);
      inst.start(a, new Pcg32(7n, 1n));
      inst.start(b, new Pcg32(7n, 1n));
      inst.start(c, new Pcg32(8n, 1n));
      expect(b).toEqual(a);
      expect(c).not.toEqual(a);
      expect(a).not.toEqual(x0);
      if (name === "saddle") return; // its own test below
      const width = DEFAULT_RULE.includes(name) ? (v: number) => 0.01 * Math.abs(v) + 1e-3 : OWN_RULE[name];
      expect(width, `perturbation rule of ${name}`).toBeDefined();
      for (let i = 0; i < inst.dim; i++) {
        expect(Math.abs(a[i] - x0[i])).toBeLessThanOrEqual(width(x0[i], i));
      }
    },
  );

  it("saddle: y stays tiny, positive and never 0; x within 1%", () => {
    const inst = createProblem("saddle", {}, ctx());
    const x = new Float64Array(2);
    inst.start(x, null);
    expect(Array.from(x)).toEqual([1, 1e-6]);
    for (let s = 0n; s < 2000n; s++) {
      inst.start(x, new Pcg32(s, 1n));
      expect(x[1]).toBeGreaterThanOrEqual(5e-7);
      expect(x[1]).toBeLessThanOrEqual(1.5e-6);
      expect(Math.abs(x[0] - 1)).toBeLessThanOrEqual(0.01);
    }
  });

  it("rejects an output buffer of the wrong length", () => {
    const inst = createProblem("wood", {}, ctx());
    expect(() => inst.start(new Float64Array(3), null)).toThrow(
      'problem "wood": start(out) needs out of length 4 (the dimension), got 3',
    );
  });
});
