import { describe, expect, it } from "vitest";
import { createQuadratic, quadraticSpectrum } from "../../src/problems/index.js";

describe("quadratic spectrum", () => {
  it("is log-spaced from 1 to κ with exact end points; μ = 1, L = κ", () => {
    const { eigenvalues, mu, L } = quadraticSpectrum({ kappa: 1e4, n: 5 });
    expect(mu).toBe(1);
    expect(L).toBe(1e4);
    // κ^(i/4) for κ = 1e4 is 10^i (relative 1e−15: one pow per value)
    const expected = [1, 10, 100, 1000, 10000];
    for (let i = 0; i < 5; i++)
      expect(Math.abs(eigenvalues[i] - expected[i])).toBeLessThanOrEqual(1e-15 * expected[i]);
  });

  it("defaults to n = 10, κ = 100 and handles n = 1", () => {
    const d = quadraticSpectrum();
    expect(d.eigenvalues.length).toBe(10);
    expect([d.mu, d.L]).toEqual([1, 100]);
    const one = quadraticSpectrum({ n: 1, kappa: 50 });
    expect(Array.from(one.eigenvalues)).toEqual([1]);
    expect([one.mu, one.L]).toEqual([1, 1]);
  });
});

describe("quadratic rotation and Hessian", () => {
  const rows = [
    { n: 10, kappa: 100 },
    { n: 37, kappa: 1e4 },
    { n: 3, kappa: 10 },
  ];
  it.each(rows)(
    "n = $n, κ = $kappa: Q orthogonal (absolute 1e−14), A qᵢ = λᵢ qᵢ (absolute 1e−13·L)",
    ({ n, kappa }) => {
      const inst = createQuadratic({ n, kappa });
      const q = inst.rotation!;
      const a = inst.hessian!;
      for (let i = 0; i < n; i++) {
        for (let j = 0; j < n; j++) {
          let dot = 0;
          for (let k = 0; k < n; k++) dot += q[i * n + k] * q[j * n + k];
          expect(Math.abs(dot - (i === j ? 1 : 0))).toBeLessThanOrEqual(1e-14);
        }
      }
      for (let i = 0; i < n; i++) {
        for (let j = 0; j < n; j++) {
          let s = 0;
          for (let k = 0; k < n; k++) s += a[j * n + k] * q[i * n + k];
          expect(Math.abs(s - inst.eigenvalues[i] * q[i * n + j])).toBeLessThanOrEqual(1e-13 * inst.L);
        }
      }
      // symmetric bit for bit
      for (let j = 0; j < n; j++) for (let k = 0; k < n; k++) expect(a[j * n + k]).toBe(a[k * n + j]);
    },
  );

  it("f(x0) = ½ Σ λᵢ (qᵢ·(x0 − x*))², from the eigen-decomposition (relative 1e−13)", () => {
    const inst = createQuadratic({ n: 12, kappa: 1e4 });
    const n = 12;
    const x0 = new Float64Array(n);
    inst.start(x0, null);
    expect(Array.from(x0)).toEqual(new Array(n).fill(0));
    expect(Array.from(inst.xStar!)).toEqual(new Array(n).fill(1));
    let expected = 0;
    for (let i = 0; i < n; i++) {
      let c = 0;
      for (let k = 0; k < n; k++) c += inst.rotation![i * n + k] * (x0[k] - 1);
      expected += 0.5 * inst.eigenvalues[i] * c * c;
    }
    expect(Math.abs(inst.objective(x0) - expected)).toBeLessThanOrEqual(1e-13 * expected);
  });

  it("rotate = 0 is diag(λ): f(x0) = ½ Σ λᵢ (relative 1e−15), no rotation stored", () => {
    const inst = createQuadratic({ rotate: 0, kappa: 100, n: 10 });
    expect(inst.rotation).toBeNull();
    expect(inst.hessian).toBeNull();
    const x0 = new Float64Array(10);
    inst.start(x0, null);
    const expected = 0.5 * inst.eigenvalues.reduce((s, v) => s + v, 0);
    expect(Math.abs(inst.objective(x0) - expected)).toBeLessThanOrEqual(1e-15 * expected);
  });

  it("uses the same rotation for every κ at the same n and seed, another for another seed", () => {
    const a = createQuadratic({ kappa: 10 }).rotation!;
    const b = createQuadratic({ kappa: 1e4 }).rotation!;
    const c = createQuadratic({ kappa: 10, seed: 1 }).rotation!;
    const d = createQuadratic({ kappa: 10, n: 11 }).rotation!;
    expect(b).toEqual(a);
    expect(c).not.toEqual(a);
    expect(d.length).toBe(121);
  });

  it("gradient descent with step 1/L follows the spectral closed form (relative 1e−9 after 300 steps)", () => {
    // xₖ − x* = Qᵀ diag(1 − λᵢ/L)ᵏ Q (x0 − x*), so f(xₖ) = ½ Σ λᵢ (1 − λᵢ/L)^(2k) cᵢ², cᵢ = qᵢ·(x0 − x*).
    // Nesterov (2004), Introductory Lectures on Convex Optimization, Thm 2.1.15 gives the rate 1 − 1/κ
    // per step for the slowest component; here the whole trajectory is checked.
    const n = 10;
    const inst = createQuadratic({ n, kappa: 100 });
    const x = new Float64Array(n);
    const g = new Float64Array(n);
    inst.start(x, null);
    const c = new Float64Array(n);
    for (let i = 0; i < n; i++) for (let k = 0; k < n; k++) c[i] += inst.rotation![i * n + k] * (x[k] - 1);
    const steps = 300;
    for (let k = 0; k < steps; k++) {
      inst.evaluate(x, g);
      for (let i = 0; i < n; i++) x[i] -= g[i] / inst.L;
    }
    let expected = 0;
    for (let i = 0; i < n; i++) {
      const r = 1 - inst.eigenvalues[i] / inst.L;
      expected += 0.5 * inst.eigenvalues[i] * Math.pow(r, 2 * steps) * c[i] * c[i];
    }
    expect(expected).toBeGreaterThan(0);
    expect(Math.abs(inst.objective(x) - expected)).toBeLessThanOrEqual(1e-9 * expected);
  });
});
