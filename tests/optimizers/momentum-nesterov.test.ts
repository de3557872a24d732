import { describe, expect, it } from "vitest";
import { momentum } from "../../src/optimizers/momentum.js";
import { nesterov } from "../../src/optimizers/nesterov.js";
import { DiagonalQuadratic, expectRelClose, vec } from "./helpers.js";

const A = vec(1, 10, 0.1, 3);
const START = [1, -2, 0.5, 3];

describe("momentum (Polyak 1964; Sutskever et al. 2013 eq. 1–2)", () => {
  it("takes v₁ = η∇f(w₀), then v₂ = γv₁ + η∇f(w₁) (closed form on ½Σaᵢwᵢ²)", () => {
    // [recomputed] closed form of the first two steps for gradient a·w.
    const w = vec(2);
    const opt = momentum.create({ lr: 0.1, momentum: 0.9 }, 1);
    const oracle = new DiagonalQuadratic(vec(3));
    opt.step(w, oracle);
    const w1 = 2 - 0.1 * 3 * 2;
    expectRelClose(w[0], w1, 1e-15, "step 1"); // relative
    opt.step(w, oracle);
    expectRelClose(w[0], w1 - (0.9 * 0.1 * 3 * 2 + 0.1 * 3 * w1), 1e-15, "step 2"); // relative
    expect(oracle.lastPoint).toBe(w);
  });

  it('"lr-inside" and "lr-outside" give the same trajectory for a constant lr', () => {
    const inside = momentum.create({ lr: 0.05, momentum: 0.9, form: "lr-inside" }, 4);
    const outside = momentum.create({ lr: 0.05, momentum: 0.9, form: "lr-outside" }, 4);
    const wi = Float64Array.from(START);
    const wo = Float64Array.from(START);
    const oi = new DiagonalQuadratic(A);
    const oo = new DiagonalQuadratic(A);
    for (let k = 1; k <= 200; k++) {
      inside.step(wi, oi);
      outside.step(wo, oo);
      // relative to the largest coordinate: v = lr·b holds up to a few roundings per step
      const scale = Math.max(...Array.from(wi, Math.abs));
      for (let i = 0; i < 4; i++) expect(Math.abs(wi[i] - wo[i])).toBeLessThanOrEqual(1e-12 * scale);
    }
  });

  it("differs after setLearningRate: lr-inside keeps the old velocity, lr-outside rescales its buffer", () => {
    // [recomputed] closed form of the first step after lr₁ → lr₂ (same w and v = lr₁·b before it):
    //   lr-inside:  Δw = −(γ·v + lr₂·g);   lr-outside: Δw = −lr₂·(γ·b + g) = −((lr₂/lr₁)·γ·v + lr₂·g).
    const lr1 = 0.05;
    const lr2 = 0.005;
    const inside = momentum.create({ lr: lr1, form: "lr-inside" }, 4);
    const outside = momentum.create({ lr: lr1, form: "lr-outside" }, 4);
    const wi = Float64Array.from(START);
    const wo = Float64Array.from(START);
    const o = new DiagonalQuadratic(A);
    for (let k = 0; k < 20; k++) {
      inside.step(wi, o);
      outside.step(wo, o);
    }
    const v = inside.exportState().velocity as number[];
    const before = wi.slice();
    const g = Array.from(before, (w, i) => A[i] * w);
    inside.setLearningRate(lr2);
    outside.setLearningRate(lr2);
    inside.step(wi, o);
    outside.step(wo, o);
    for (let i = 0; i < 4; i++) {
      expectRelClose(before[i] - wi[i], 0.9 * v[i] + lr2 * g[i], 1e-9, `inside ${i}`); // relative
      expectRelClose(before[i] - wo[i], (lr2 / lr1) * 0.9 * v[i] + lr2 * g[i], 1e-9, `outside ${i}`); // relative
    }
    for (let k = 0; k < 30; k++) {
      inside.step(wi, o);
      outside.step(wo, o);
    }
    expect(Math.abs(wi[0] - wo[0])).toBeGreaterThan(1e-3 * Math.abs(wi[0])); // the forms really part
  });
});

describe("nesterov (Nesterov 1983; Sutskever et al. 2013 eq. 3–4; Bengio et al. 2013 §3.5)", () => {
  it('"lookahead" takes the gradient at w − γv, in its own buffer', () => {
    const w = vec(1, -1);
    const opt = nesterov.create({ lr: 0.1, momentum: 0.9 }, 2);
    const points: number[][] = [];
    const oracle = {
      evaluate(x: Float64Array, grad: Float64Array): number {
        expect(x).not.toBe(w);
        points.push(Array.from(x));
        grad[0] = x[0];
        grad[1] = 2 * x[1];
        return 0;
      },
    };
    opt.step(w, oracle);
    const v1 = opt.exportState().velocity as number[];
    const w1 = Array.from(w);
    opt.step(w, oracle);
    expect(points[0]).toEqual([1, -1]); // v₀ = 0
    for (let i = 0; i < 2; i++) expectRelClose(points[1][i], w1[i] - 0.9 * v1[i], 1e-15, `look-ahead ${i}`); // relative
  });

  it('"stored-lookahead" is the same algorithm: u_k = w_k − γ·v_k at every step, also across an lr change', () => {
    const gamma = 0.9;
    const look = nesterov.create({ lr: 0.05, momentum: gamma, form: "lookahead" }, 4);
    const stored = nesterov.create({ lr: 0.05, momentum: gamma, form: "stored-lookahead" }, 4);
    const w = Float64Array.from(START);
    const u = Float64Array.from(START); // u₀ = w₀ − γ·0
    const ow = new DiagonalQuadratic(A);
    const ou = new DiagonalQuadratic(A);
    for (let k = 1; k <= 300; k++) {
      if (k === 100) {
        look.setLearningRate(0.01);
        stored.setLearningRate(0.01);
      }
      look.step(w, ow);
      stored.step(u, ou);
      expect(ou.lastPoint).toBe(u); // the stored form evaluates at the iterate itself
      const v = look.exportState().velocity as number[];
      const vu = stored.exportState().velocity as number[];
      for (let i = 0; i < 4; i++) {
        // relative to |w| + γ|v|, the size of the terms being combined
        const scale = Math.abs(w[i]) + gamma * Math.abs(v[i]);
        const rel = Math.abs(u[i] - (w[i] - gamma * v[i])) / scale;
        expect(rel).toBeLessThanOrEqual(1e-12);
        expectRelClose(vu[i], v[i], 1e-12, `velocity step ${k} coordinate ${i}`); // relative
      }
    }
    // The two iterates are not equal (the forms are shifted, not identical).
    expect(Math.abs(u[0] - w[0])).toBeGreaterThan(0);
  });

  it('"lr-outside" matches "lr-inside" for a constant lr (v = η·b) and rescales its buffer after an lr change', () => {
    for (const form of ["lookahead", "stored-lookahead"] as const) {
      const inside = nesterov.create({ lr: 0.05, momentum: 0.9, form }, 4);
      const outside = nesterov.create({ lr: 0.05, momentum: 0.9, form, lrPlacement: "lr-outside" }, 4);
      const xi = Float64Array.from(START);
      const xo = Float64Array.from(START);
      const oi = new DiagonalQuadratic(A);
      const oo = new DiagonalQuadratic(A);
      for (let k = 1; k <= 60; k++) {
        inside.step(xi, oi);
        outside.step(xo, oo);
        for (let i = 0; i < 4; i++) expectRelClose(xo[i], xi[i], 1e-12, `${form} step ${k} coordinate ${i}`); // relative
      }
      const v = inside.exportState().velocity as number[];
      const b = outside.exportState().buffer as number[];
      for (let i = 0; i < 4; i++)
        expectRelClose(0.05 * b[i], v[i], 1e-12, `${form} v = η·b, coordinate ${i}`); // relative
      // Closed form of the next step after the lr drops to η' = 0.01 (stored form shown; the look-ahead form
      // differs the same way): lr-inside keeps v, lr-outside's velocity becomes η'·b = (η'/η)·v at once.
      inside.setLearningRate(0.01);
      outside.setLearningRate(0.01);
      inside.step(xi, oi);
      outside.step(xo, oo);
      const differs = [0, 1, 2, 3].some((i) => Math.abs(xo[i] - xi[i]) > 1e-9 * Math.abs(xi[i]));
      expect(differs, form).toBe(true);
    }
  });
});
