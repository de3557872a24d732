import { describe, expect, it } from "vitest";
import { adagrad } from "../../src/optimizers/adagrad.js";
import { rmsprop } from "../../src/optimizers/rmsprop.js";
import { sgd } from "../../src/optimizers/sgd.js";
import { ConstantGradient, DiagonalQuadratic, expectRelClose, run, vec } from "./helpers.js";

describe("adagrad (Duchi, Hazan & Singer 2011)", () => {
  it("moves −0.185896 after 100 steps of constant gradient at lr = 0.01", () => {
    // [recomputed] SOURCES.md; closed form: with constant g the k-th step is lr·g/(δ + |g|·√k), i.e.
    // lr/√k for δ → 0, so the displacement is −0.01·Σ_{k≤100} k^(−1/2) = −0.18589603824784148
    // (python3: -0.01*sum(k**-0.5 for k in range(1,101))).
    for (const g of [1, 2, 0.3]) {
      const x = vec(0);
      run(adagrad.create({ lr: 0.01 }, 1), x, new ConstantGradient(vec(g)), 100);
      expect(Math.abs(x[0] - -0.185896)).toBeLessThan(5e-7); // absolute: the 6 decimals published
      expectRelClose(x[0], -0.18589603824784148, 1e-9, `g = ${g}`); // relative; δ = 1e−10 shifts it by ~1e−10
    }
  });

  it("adds δ outside the square root and starts the sum at initialAccumulator", () => {
    // [recomputed] closed form of one step: x −= lr·g/(δ + √(G₀ + g²)).
    const x = vec(0);
    run(adagrad.create({ lr: 0.1, eps: 0.5, initialAccumulator: 3 }, 1), x, new ConstantGradient(vec(1)), 1);
    expectRelClose(x[0], (-0.1 * 1) / (0.5 + Math.sqrt(3 + 1)), 1e-15, "one step"); // relative
  });
});

describe("rmsprop (Graves 2013 §4; Ruder 2016 §4.5)", () => {
  it("first step is lr·sign(g)/√(1−ρ): no bias correction", () => {
    // [recomputed] closed form: E₁ = (1−ρ)g², so the step is lr·g/(√(1−ρ)·|g| + ε), which is
    // lr·sign(g)/√(1−ρ) for ε → 0 (3.16227766·lr for ρ = 0.9; python3: 1/math.sqrt(0.1)).
    const rows = [
      { rho: 0.9, g: 3 },
      { rho: 0.9, g: -0.25 },
      { rho: 0.99, g: 7 },
      { rho: 0.5, g: -1e-3 },
    ];
    for (const { rho, g } of rows) {
      const exact = vec(0);
      run(rmsprop.create({ lr: 0.01, rho, eps: 0 }, 1), exact, new ConstantGradient(vec(g)), 1);
      expectRelClose(-exact[0], (0.01 * Math.sign(g)) / Math.sqrt(1 - rho), 1e-15, `ρ=${rho} g=${g} ε=0`); // relative
      const withEps = vec(0);
      run(rmsprop.create({ lr: 0.01, rho }, 1), withEps, new ConstantGradient(vec(g)), 1);
      // relative: the default ε = 1e−8 changes it by ε/(√(1−ρ)|g|) ≤ 1e−5 for these rows
      expectRelClose(-withEps[0], (0.01 * Math.sign(g)) / Math.sqrt(1 - rho), 2e-5, `ρ=${rho} g=${g}`);
    }
    const tenth = vec(0);
    run(rmsprop.create({ lr: 1, rho: 0.9, eps: 0 }, 1), tenth, new ConstantGradient(vec(1)), 1);
    expect(Math.abs(-tenth[0] - 3.162277660168379)).toBeLessThan(1e-15); // absolute
  });

  it("puts ε outside (√E + ε) or inside (√(E + ε)) the root, as chosen", () => {
    // [recomputed] closed forms of the first step with ε = 0.01, ρ = 0.9, g = 0.05, lr = 1.
    const g = 0.05;
    const outside = vec(0);
    const inside = vec(0);
    run(rmsprop.create({ lr: 1, eps: 0.01 }, 1), outside, new ConstantGradient(vec(g)), 1);
    run(
      rmsprop.create({ lr: 1, eps: 0.01, epsPlacement: "inside" }, 1),
      inside,
      new ConstantGradient(vec(g)),
      1,
    );
    expectRelClose(-outside[0], g / (Math.sqrt(0.1 * g * g) + 0.01), 1e-15, "outside"); // relative
    expectRelClose(-inside[0], g / Math.sqrt(0.1 * g * g + 0.01), 1e-15, "inside"); // relative
    expect(Math.abs(outside[0] - inside[0])).toBeGreaterThan(0.1); // absolute: 0.61 vs 0.49
  });

  it("defaults to lr 0.001, rho 0.9 (Ruder 2016 §4.5) and ε outside", () => {
    expect(rmsprop.defaults).toMatchObject({ lr: 0.001, rho: 0.9, epsPlacement: "outside" });
  });
});

describe("sgd", () => {
  it("contracts each coordinate of ½Σaᵢxᵢ² by (1 − lr·(aᵢ + λ)) per step", () => {
    // [recomputed] closed form: x_k = (1 − lr·(a + λ))^k·x₀ for gradient a·x and coupled decay λ.
    const a = vec(1, 4, 0.25);
    const x0 = [3, -1, 2];
    for (const weightDecay of [0, 0.5]) {
      const x = Float64Array.from(x0);
      const oracle = new DiagonalQuadratic(a);
      run(sgd.create({ lr: 0.1, weightDecay }, 3), x, oracle, 30);
      for (let i = 0; i < 3; i++) {
        expectRelClose(
          x[i],
          Math.pow(1 - 0.1 * (a[i] + weightDecay), 30) * x0[i],
          1e-13,
          `λ=${weightDecay} i=${i}`,
        ); // relative
      }
      expect(oracle.lastPoint).toBe(x);
      expect(oracle.evaluations).toBe(30);
    }
  });
});
