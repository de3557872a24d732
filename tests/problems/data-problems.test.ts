import { describe, expect, it } from "vitest";
import { Pcg32 } from "../../src/core/rng.js";
import type { ProblemParams } from "../../src/core/types.js";
import { createProblem, getProblem } from "../../src/problems/index.js";
import { logisticData, logisticSolution } from "../../src/problems/logistic-regression.js";
import { sparseLeastSquaresData } from "../../src/problems/sparse-least-squares.js";
import { networkData } from "../../src/problems/two-layer-network.js";
import { cholesky } from "../../src/problems/util.js";
import { ctx } from "./helpers.js";

describe("sparse least squares", () => {
  it.each<ProblemParams>([{}, { seed: 1 }, { n: 40, m: 500 }])(
    "%o: AᵀA is positive definite (Cholesky succeeds), so x* is unique",
    (params) => {
      const { m, n, rowPtr, col, val } = sparseLeastSquaresData(params);
      const ata = new Float64Array(n * n);
      for (let r = 0; r < m; r++) {
        for (let a = rowPtr[r]; a < rowPtr[r + 1]; a++) {
          for (let b = rowPtr[r]; b < rowPtr[r + 1]; b++) ata[col[a] * n + col[b]] += val[a] * val[b];
        }
      }
      expect(cholesky(ata, n)).toBe(true);
    },
  );

  it("feature frequencies decay from 0.5 to 0.005 (exact end points) and the data follow them", () => {
    const { m, n, rowPtr, col, frequency } = sparseLeastSquaresData({});
    expect(frequency[0]).toBe(0.5);
    expect(Math.abs(frequency[n - 1] - 0.005)).toBeLessThanOrEqual(1e-17);
    for (let j = 1; j < n; j++) expect(frequency[j]).toBeLessThan(frequency[j - 1]);
    const counts = new Array<number>(n).fill(0);
    for (let k = 0; k < rowPtr[m]; k++) counts[col[k]]++;
    for (let j = 0; j < n; j++) {
      // binomial(m, pⱼ) plus at most one anchor entry; 5 standard deviations
      const mean = m * frequency[j];
      const sd = Math.sqrt(m * frequency[j] * (1 - frequency[j]));
      expect(Math.abs(counts[j] - mean), `feature ${j}`).toBeLessThanOrEqual(5 * sd + 1);
      expect(counts[j]).toBeGreaterThanOrEqual(1);
    }
    expect(counts[0]).toBeGreaterThan(10 * counts[n - 1]); // frequent vs rare: about 150 vs 2–3
  });

  it("f(x_true) = 0 exactly and the data do not depend on the batch size", () => {
    const inst = createProblem("sparse-least-squares", {}, ctx());
    expect(inst.objective(inst.xStar!)).toBe(0);
    expect(sparseLeastSquaresData({ batch: 32 })).toBe(sparseLeastSquaresData({}));
  });

  it("rejects m < n with a message naming both", () => {
    expect(() => createProblem("sparse-least-squares", { n: 30, m: 20 }, ctx())).toThrow(
      'problem "sparse-least-squares": params.m must be ≥ params.n (30) so that x* is unique, got 20',
    );
  });
});

describe("logistic regression", () => {
  it("f* is a converged minimum: ‖∇f(x*)‖∞ ≤ 1e−12 and f grows in every seeded direction", () => {
    const inst = createProblem("logistic-regression", { batch: 0 }, ctx());
    const sol = logisticSolution({});
    expect(sol.gradInf).toBeLessThanOrEqual(1e-12);
    expect(inst.fStarKind).toBe("computed");
    expect(getProblem("logistic-regression").fStarNote).toContain("Newton");
    expect(inst.objective(inst.xStar!)).toBe(inst.fStar);
    const g = new Float64Array(inst.dim);
    inst.evaluate(inst.xStar!, g);
    for (const v of g) expect(Math.abs(v)).toBeLessThanOrEqual(1e-12);
    const x = new Float64Array(inst.dim);
    for (let s = 1n; s <= 8n; s++) {
      inst.start(x, new Pcg32(s, 1n)); // x0 = 0 plus a seeded offset in [−0.01, 0.01] per coordinate
      for (let i = 0; i < x.length; i++) x[i] = inst.xStar![i] + 0.1 * x[i];
      expect(inst.objective(x)).toBeGreaterThan(inst.fStar);
    }
  });

  it("f* agrees with plain gradient descent run to convergence (relative 1e−13)", () => {
    // An independent solver: gradient descent with step 1/L, L = λ + ‖X‖²_F/(4m) ≥ the Hessian's
    // largest eigenvalue (σ' ≤ ¼), from w = 0; the objective is λ-strongly convex, so it converges
    // linearly to the same minimum.
    const params = { batch: 0, n: 5, m: 60, l2: 0.1 };
    const inst = createProblem("logistic-regression", params, ctx());
    const { x, m } = logisticData(params);
    let fro = 0;
    for (const v of x) fro += v * v;
    const L = 0.1 + fro / (4 * m);
    const w = new Float64Array(5);
    const g = new Float64Array(5);
    for (let k = 0; k < 20000; k++) {
      inst.evaluate(w, g);
      for (let j = 0; j < 5; j++) w[j] -= g[j] / L;
    }
    const f = inst.objective(w);
    expect(Math.abs(f - inst.fStar)).toBeLessThanOrEqual(1e-13 * inst.fStar);
    for (let j = 0; j < 5; j++) expect(Math.abs(w[j] - inst.xStar![j])).toBeLessThanOrEqual(1e-8);
  });

  it("is solved once per parameter set; the data ignore λ and the batch size", () => {
    expect(logisticSolution({ batch: 5 })).toBe(logisticSolution({}));
    expect(logisticSolution({ l2: 0.1 })).not.toBe(logisticSolution({}));
    expect(logisticData({ l2: 0.1, batch: 0 })).toBe(logisticData({}));
    const a = createProblem("logistic-regression", { l2: 0.1 }, ctx()).fStar;
    const b = createProblem("logistic-regression", {}, ctx()).fStar;
    expect(a).toBeGreaterThan(b); // more regularisation, higher minimum
  });

  it("labels are both classes and the full-batch loss at w = 0 is log 2 (relative 1e−14: a sum of 128 rounded terms)", () => {
    const { y } = logisticData({});
    const positives = y.filter((v) => v === 1).length;
    expect(positives).toBeGreaterThan(y.length * 0.2);
    expect(positives).toBeLessThan(y.length * 0.8);
    const inst = createProblem("logistic-regression", {}, ctx());
    const x0 = new Float64Array(inst.dim);
    inst.start(x0, null);
    expect(Math.abs(inst.objective(x0) - Math.LN2)).toBeLessThanOrEqual(1e-14 * Math.LN2);
  });
});

describe("two-layer network", () => {
  it("reaches f = 0 exactly at the teacher and at a hidden-unit permutation and sign flip of it", () => {
    const inst = createProblem("two-layer-network", { batch: 0 }, ctx());
    const { d, h, teacher } = networkData({});
    expect(inst.dim).toBe(h * (d + 2) + 1);
    expect(inst.objective(inst.xStar!)).toBe(0);
    // swap hidden units 0 and 1, and flip the sign of unit 2: the same function (tanh is odd)
    const t = Float64Array.from(teacher);
    const b1 = h * d;
    const w2 = b1 + h;
    const swap = (i: number, j: number) => {
      const v = t[i];
      t[i] = t[j];
      t[j] = v;
    };
    for (let j = 0; j < d; j++) swap(j, d + j);
    swap(b1, b1 + 1);
    swap(w2, w2 + 1);
    for (let j = 0; j < d; j++) t[2 * d + j] = -t[2 * d + j];
    t[b1 + 2] = -t[b1 + 2];
    t[w2 + 2] = -t[w2 + 2];
    expect(t).not.toEqual(teacher);
    expect(inst.objective(t)).toBeLessThanOrEqual(1e-30);
  });

  it("the standard start is the seeded initialisation (biases 0) and is not near the teacher", () => {
    const inst = createProblem("two-layer-network", {}, ctx());
    const { d, h, start } = networkData({});
    const x0 = new Float64Array(inst.dim);
    inst.start(x0, null);
    expect(x0).toEqual(start);
    for (let k = 0; k < h; k++) expect(x0[h * d + k]).toBe(0);
    expect(x0[inst.dim - 1]).toBe(0);
    expect(inst.objective(x0)).toBeGreaterThan(1e-2);
  });

  it("its structure depends on the seed, not on the batch size", () => {
    expect(networkData({ batch: 0 })).toBe(networkData({}));
    expect(networkData({ seed: 1 }).teacher).not.toEqual(networkData({}).teacher);
  });
});
