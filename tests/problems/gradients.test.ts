import { describe, expect, it } from "vitest";
import { Pcg32 } from "../../src/core/rng.js";
import type { ProblemParams } from "../../src/core/types.js";
import { createProblem } from "../../src/problems/index.js";
import { ctx, gradientMismatches } from "./helpers.js";

/**
 * Analytic gradients against central differences of the exact objective (tolerance: relative, per
 * component, plus the central difference's rounding floor; see helpers.gradientMismatches).
 * Points: the standard start with three seeded perturbations scaled up by `spread`, and (where x* is
 * known) x* moved by a seeded relative 5% plus 0.01 absolute. Stochastic problems are checked with
 * their noise switched off (batch = 0 / sigma = 0); their noise is tested in stochastic.test.ts.
 */
const ROWS: { name: string; params?: ProblemParams; rtol: number; spread?: number }[] = [
  { name: "quadratic", rtol: 1e-6 },
  { name: "quadratic", params: { n: 7, kappa: 1e4 }, rtol: 1e-6 },
  { name: "quadratic", params: { rotate: 0, kappa: 10 }, rtol: 1e-6 },
  { name: "quadratic", params: { n: 1 }, rtol: 1e-6 },
  { name: "rosenbrock", rtol: 1e-6, spread: 20 },
  { name: "freudenstein-roth", rtol: 1e-6, spread: 20 },
  { name: "powell-badly-scaled", rtol: 1e-6, spread: 5 },
  { name: "brown-badly-scaled", rtol: 1e-6, spread: 20 },
  { name: "beale", rtol: 1e-6, spread: 20 },
  { name: "helical-valley", rtol: 1e-6, spread: 20 },
  { name: "gaussian", rtol: 1e-6, spread: 20 },
  { name: "powell-singular", rtol: 1e-6, spread: 20 },
  { name: "wood", rtol: 1e-6, spread: 20 },
  { name: "extended-rosenbrock", params: { n: 6 }, rtol: 1e-6, spread: 20 },
  { name: "penalty-1", rtol: 1e-6, spread: 20 },
  { name: "penalty-1", params: { n: 7 }, rtol: 1e-6, spread: 20 },
  { name: "penalty-2", rtol: 1e-6, spread: 20 },
  { name: "penalty-2", params: { n: 10 }, rtol: 1e-6, spread: 20 },
  { name: "saddle", rtol: 1e-6 },
  { name: "plateau", rtol: 1e-6, spread: 20 },
  { name: "plateau", params: { n: 5, r0: 1.5 }, rtol: 1e-6, spread: 20 },
  { name: "noisy-quadratic", params: { sigma: 0 }, rtol: 1e-6, spread: 20 },
  { name: "sparse-least-squares", rtol: 1e-6 },
  { name: "logistic-regression", params: { batch: 0 }, rtol: 1e-6 },
  { name: "two-layer-network", params: { batch: 0 }, rtol: 1e-6, spread: 20 },
];

function points(name: string, params: ProblemParams | undefined, spread: number): Float64Array[] {
  const inst = createProblem(name, params ?? {}, ctx());
  const x0 = new Float64Array(inst.dim);
  inst.start(x0, null);
  const out: Float64Array[] = [];
  for (let s = 1n; s <= 3n; s++) {
    const x = new Float64Array(inst.dim);
    inst.start(x, new Pcg32(s, 1n));
    for (let i = 0; i < x.length; i++) x[i] = x0[i] + spread * (x[i] - x0[i]);
    out.push(x);
  }
  if (inst.xStar) {
    const rng = new Pcg32(99n, 1n);
    const x = Float64Array.from(inst.xStar);
    for (let i = 0; i < x.length; i++) x[i] += (0.05 * Math.abs(x[i]) + 0.01) * (2 * rng.nextFloat() - 1);
    out.push(x);
  }
  return out;
}

describe("gradients match central differences", () => {
  it.each(ROWS)("$name $params (rtol $rtol)", ({ name, params, rtol, spread }) => {
    const inst = createProblem(name, params ?? {}, ctx());
    expect(inst.stochastic).toBe(false);
    const pts = points(name, params, spread ?? 1);
    expect(pts.length).toBeGreaterThanOrEqual(3);
    for (const x of pts) {
      expect(gradientMismatches(inst, x, rtol)).toEqual([]);
      // deterministic problems: evaluate's value is the objective, bit for bit
      const g = new Float64Array(inst.dim);
      expect(inst.evaluate(x, g)).toBe(inst.objective(x));
    }
  });

  it.each(ROWS)(
    "$name $params: a 0.1% error in any one component is detected",
    ({ name, params, rtol, spread }) => {
      const inst = createProblem(name, params ?? {}, ctx());
      const pts = points(name, params, spread ?? 1);
      for (let j = 0; j < inst.dim; j++) {
        const broken = {
          ...inst,
          evaluate: (x: Float64Array, g: Float64Array) => {
            const f = inst.evaluate(x, g);
            g[j] *= 1.001;
            return f;
          },
        };
        const caught = pts.some((x) => gradientMismatches(broken, x, rtol).some((m) => m.i === j));
        expect(caught, `component ${j} unchecked`).toBe(true);
      }
    },
  );

  it("detects a wrong gradient (the check itself can fail)", () => {
    const inst = createProblem("rosenbrock", {}, ctx());
    const broken = {
      ...inst,
      evaluate: (x: Float64Array, g: Float64Array) => {
        const f = inst.evaluate(x, g);
        g[1] *= 1.001;
        return f;
      },
    };
    const x = new Float64Array([-1.2, 1]);
    expect(gradientMismatches(broken, x, 1e-6).map((m) => m.i)).toEqual([1]);
    const unwritten = { ...inst, evaluate: (x: Float64Array) => inst.objective(x) };
    expect(gradientMismatches(unwritten, x, 1e-6).length).toBe(2);
  });
});
