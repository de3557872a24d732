import { describe, expect, it } from "vitest";
import { adam } from "../../src/optimizers/adam.js";
import { adamw } from "../../src/optimizers/adamw.js";
import { ConstantGradient, DiagonalQuadratic, expectRelClose, run, vec } from "./helpers.js";

const zero = () => new ConstantGradient(vec(0));

describe("adamw (Loshchilov & Hutter 2019, Algorithm 2)", () => {
  it("defaults to weightDecay 0.01 with the decay scaled by lr", () => {
    expect(adamw.defaults).toMatchObject({ lr: 0.001, weightDecay: 0.01, decayScaledByLr: true });
  });

  it("zero loss gradient, θ0 = 1, lr = 1e−3, λ = 1e−2, 100 steps → 0.9990005 (decay scaled by lr)", () => {
    // [recomputed] SOURCES.md; closed form: with g = 0 the Adam term is 0/(0 + ε) = 0 and each step
    // multiplies θ by (1 − lr·λ), so θ₁₀₀ = (1 − 1e−5)¹⁰⁰ = 0.99900049484… ≈ 0.9990005.
    const x = vec(1);
    run(adamw.create({ lr: 1e-3, weightDecay: 1e-2 }, 1), x, zero(), 100);
    expect(Math.abs(x[0] - 0.9990005)).toBeLessThan(5e-8); // absolute: the 7 decimals published
    expectRelClose(x[0], Math.pow(1 - 1e-5, 100), 1e-14, "closed form"); // relative, 100 roundings
  });

  it("Adam with coupled L2 on the same problem gives 0.9017437: not the same algorithm", () => {
    // [recomputed] SOURCES.md, by a python3 float loop of Algorithm 1 with g = λ·θ:
    //   th=1.0; m=v=0.0
    //   for t in range(1,101): g=1e-2*th; m=.9*m+.1*g; v=.999*v+.001*g*g
    //     th -= 1e-3*(m/(1-.9**t))/(math.sqrt(v/(1-.999**t))+1e-8)
    //   → 0.901743696500246
    const x = vec(1);
    run(adam.create({ lr: 1e-3, weightDecay: 1e-2 }, 1), x, zero(), 100);
    expect(Math.abs(x[0] - 0.9017437)).toBeLessThan(5e-8); // absolute: the 7 decimals published
    expectRelClose(x[0], 0.901743696500246, 1e-12, "python3 loop"); // relative
  });

  it("decayScaledByLr false applies θ ← θ − λθ: (1 − 0.01)¹⁰⁰ after 100 zero-gradient steps", () => {
    // [recomputed] closed form: 0.99¹⁰⁰ = 0.3660323412732292 (python3: 0.99**100).
    const x = vec(1);
    run(adamw.create({ weightDecay: 0.01, decayScaledByLr: false }, 1), x, zero(), 100);
    expectRelClose(x[0], 0.3660323412732292, 1e-13, "unscaled decay"); // relative
  });

  it("a scaled decay follows setLearningRate; an unscaled one does not", () => {
    // [recomputed] closed form: θ = (1 − lr₁λ)⁵⁰·(1 − lr₂λ)⁵⁰ when scaled, (1 − λ)¹⁰⁰ when not.
    const scaled = adamw.create({ lr: 1e-3, weightDecay: 0.1 }, 1);
    const unscaled = adamw.create({ lr: 1e-3, weightDecay: 0.001, decayScaledByLr: false }, 1);
    const xs = vec(1);
    const xu = vec(1);
    run(scaled, xs, zero(), 50);
    run(unscaled, xu, zero(), 50);
    scaled.setLearningRate(1e-2);
    unscaled.setLearningRate(1e-2);
    run(scaled, xs, zero(), 50);
    run(unscaled, xu, zero(), 50);
    expectRelClose(xs[0], Math.pow(1 - 1e-4, 50) * Math.pow(1 - 1e-3, 50), 1e-13, "scaled"); // relative
    expectRelClose(xu[0], Math.pow(1 - 0.001, 100), 1e-13, "unscaled"); // relative
  });

  it("decays θ from before the step: one step equals θ − Adam step − lr·λ·θ_old", () => {
    // [recomputed] closed form at t = 1: Adam step α·g/(|g| + ε); decay lr·λ·θ₀.
    const x = vec(2, -3);
    const g = vec(0.5, 4);
    run(adamw.create({ lr: 0.01, weightDecay: 0.2 }, 2), x, new ConstantGradient(g), 1);
    for (let i = 0; i < 2; i++) {
      const theta0 = i === 0 ? 2 : -3;
      const expected = theta0 - (0.01 * g[i]) / (Math.abs(g[i]) + 1e-8) - 0.01 * 0.2 * theta0;
      expectRelClose(x[i], expected, 1e-15, `coordinate ${i}`); // relative, a few ULPs
    }
  });

  it("keeps the moments free of the decay: with λ = 0 it is Adam exactly", () => {
    const a = vec(1, 3, 0.2);
    const xa = run(adam.create({}, 3), vec(1, 2, 3), new DiagonalQuadratic(a), 40);
    const xw = run(adamw.create({ weightDecay: 0 }, 3), vec(1, 2, 3), new DiagonalQuadratic(a), 40);
    expect(Array.from(xw)).toEqual(Array.from(xa));
  });
});
