import { describe, expect, it } from "vitest";
import { Pcg32 } from "../../src/core/rng.js";
import type { ProblemParams } from "../../src/core/types.js";
import { createNoisyQuadratic, createProblem, sgdStationaryLoss } from "../../src/problems/index.js";
import { ctx } from "./helpers.js";

/** Stochastic problems with the parameters that make their exact (noise-free) twin. */
const STOCHASTIC: { name: string; params: ProblemParams; exact: ProblemParams }[] = [
  { name: "noisy-quadratic", params: {}, exact: { sigma: 0 } },
  { name: "sparse-least-squares", params: { batch: 8 }, exact: {} },
  { name: "logistic-regression", params: {}, exact: { batch: 0 } },
  { name: "two-layer-network", params: {}, exact: { batch: 0 } },
];

function startPoint(name: string, params: ProblemParams): Float64Array {
  const inst = createProblem(name, params, ctx());
  const x = new Float64Array(inst.dim);
  inst.start(x, new Pcg32(3n, 1n));
  return x;
}

describe("stochastic problems", () => {
  it.each(STOCHASTIC)("$name: flagged stochastic; its exact twin is not", ({ name, params, exact }) => {
    expect(createProblem(name, params, ctx()).stochastic).toBe(true);
    expect(createProblem(name, exact, ctx()).stochastic).toBe(false);
  });

  it.each(STOCHASTIC)(
    "$name: the same noise stream gives the same numbers, another stream others",
    ({ name, params }) => {
      const x = startPoint(name, params);
      const run = (seed: bigint) => {
        const inst = createProblem(name, params, ctx(seed));
        const g = new Float64Array(inst.dim);
        const out: number[] = [];
        for (let k = 0; k < 5; k++) {
          out.push(inst.evaluate(x, g));
          out.push(...g);
        }
        return out;
      };
      const a = run(11n);
      expect(run(11n)).toEqual(a);
      expect(run(12n)).not.toEqual(a);
    },
  );

  it.each(STOCHASTIC)(
    "$name: mean of 20 000 stochastic gradients ≈ exact gradient (within 5 standard errors per coordinate)",
    ({ name, params, exact }) => {
      const x = startPoint(name, params);
      const exactInst = createProblem(name, exact, ctx());
      const gExact = new Float64Array(exactInst.dim);
      const fExact = exactInst.evaluate(x, gExact);
      expect(exactInst.objective(x)).toBe(fExact);
      const inst = createProblem(name, params, ctx(5n));
      const n = inst.dim;
      const g = new Float64Array(n);
      const sum = new Float64Array(n);
      const sumSq = new Float64Array(n);
      const draws = 20000;
      let fSum = 0;
      let fSumSq = 0;
      for (let k = 0; k < draws; k++) {
        const f = inst.evaluate(x, g);
        fSum += f;
        fSumSq += f * f;
        for (let i = 0; i < n; i++) {
          sum[i] += g[i];
          sumSq[i] += g[i] * g[i];
        }
        // objective stays exact while evaluate is noisy
      }
      expect(inst.objective(x)).toBe(fExact);
      let noisy = 0;
      for (let i = 0; i < n; i++) {
        const mean = sum[i] / draws;
        const sd = Math.sqrt(Math.max(0, sumSq[i] / draws - mean * mean));
        if (sd > 0) noisy++;
        expect(Math.abs(mean - gExact[i]), `coordinate ${i}`).toBeLessThanOrEqual(
          (5 * sd) / Math.sqrt(draws) + 1e-12,
        );
      }
      expect(noisy).toBeGreaterThan(0); // the estimate really is noisy, so the bound means something
      const fMean = fSum / draws;
      const fSd = Math.sqrt(Math.max(0, fSumSq / draws - fMean * fMean));
      expect(Math.abs(fMean - fExact)).toBeLessThanOrEqual((5 * fSd) / Math.sqrt(draws) + 1e-12);
    },
  );
});

describe("noisy quadratic", () => {
  it("adds σ·N(0, I) to the exact gradient and returns the exact loss", () => {
    const noise = new Pcg32(21n, 2n);
    const inst = createNoisyQuadratic({ n: 4, kappa: 8, sigma: 0.5 }, { noise: new Pcg32(21n, 2n) });
    const x = new Float64Array([1, -2, 3, 0.5]);
    const g = new Float64Array(4);
    const f = inst.evaluate(x, g);
    expect(f).toBe(inst.objective(x));
    // λ = (1, 2, 4, 8): log-spaced in [1, 8]
    const lambda = [1, 2, 4, 8];
    for (let i = 0; i < 4; i++) {
      expect(Math.abs(inst.eigenvalues[i] - lambda[i])).toBeLessThanOrEqual(1e-15 * lambda[i]);
      const expected = inst.eigenvalues[i] * x[i] + 0.5 * noise.nextNormal();
      expect(g[i]).toBe(expected);
    }
  });

  it("SGD's stationary mean loss matches Σ ησ²/(2(2 − ηλᵢ)) (relative 3%, about 10 standard errors)", () => {
    // Closed form derived in src/problems/noisy-quadratic.ts. Monte Carlo: 200 000 steps after a
    // 2 000-step burn-in; the loss's autocorrelation time is ≈ 1/(ηλ_min(2 − ηλ_min)) ≈ 5 steps,
    // so the standard error of the time average is about 0.3%.
    const sigma = 0.3;
    const lr = 0.1;
    const inst = createNoisyQuadratic({ n: 10, kappa: 10, sigma }, { noise: new Pcg32(4n, 2n) });
    const x = new Float64Array(10);
    const g = new Float64Array(10);
    inst.start(x, null);
    let sum = 0;
    const burn = 2000;
    const steps = 200000;
    for (let k = 0; k < burn + steps; k++) {
      inst.evaluate(x, g);
      for (let i = 0; i < 10; i++) x[i] -= lr * g[i];
      if (k >= burn) sum += inst.objective(x);
    }
    const expected = sgdStationaryLoss(inst.eigenvalues, sigma, lr);
    expect(Math.abs(sum / steps - expected)).toBeLessThanOrEqual(0.03 * expected);
  });

  it("sgdStationaryLoss rejects a step outside the stable range", () => {
    expect(() => sgdStationaryLoss([1, 10], 0.1, 0.25)).toThrow(
      "sgdStationaryLoss: lr·λ must lie in (0, 2) for every eigenvalue, got lr = 0.25, λ = 10",
    );
  });
});
