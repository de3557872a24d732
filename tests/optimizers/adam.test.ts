import { describe, expect, it } from "vitest";
import { adam } from "../../src/optimizers/adam.js";
import {
  ConstantGradient,
  DiagonalQuadratic,
  ScriptedGradient,
  expectRelClose,
  run,
  vec,
} from "./helpers.js";

// Kingma & Ba 2015 (arXiv:1412.6980), Algorithm 1 defaults: α = 0.001, β1 = 0.9, β2 = 0.999, ε = 1e−8.
const ALPHA = 0.001;
const EPS = 1e-8;

describe("adam (Kingma & Ba 2015, Algorithm 1)", () => {
  it("has Algorithm 1's defaults", () => {
    expect(adam.defaults).toMatchObject({ lr: 0.001, beta1: 0.9, beta2: 0.999, eps: 1e-8 });
  });

  it("takes a first step of α·g/(|g| + ε) per coordinate", () => {
    // [recomputed] closed form: at t = 1, m̂ = g and v̂ = g², so the step is α·g/(|g| + ε).
    // Rows include |g| comparable to ε (1e−9 → α/11) and g = 0 (no move).
    const g = vec(3, -0.5, 1e-9, 0, -2e-7);
    const x = vec(1, 1, 1, 1, 1);
    run(adam.create({}, g.length), x, new ConstantGradient(g), 1);
    for (let i = 0; i < g.length; i++) {
      const expected = 1 - (ALPHA * g[i]) / (Math.abs(g[i]) + EPS);
      expectRelClose(x[i], expected, 1e-15, `coordinate ${i}`); // relative, a few ULPs of 1
    }
    expectRelClose(1 - x[2], ALPHA / 11, 1e-9, "g = 1e-9"); // relative; the ε = 1e−8 case
  });

  it("moves −0.0999999995 after 100 steps of constant gradient g = 2 at α = 0.001", () => {
    // [recomputed] SOURCES.md; closed form: with a constant gradient m̂ = g and v̂ = g² at every t,
    // so each step is α·g/(g + ε) and 100 steps give −100·0.001·2/(2 + 1e−8) = −0.0999999995.
    const x = vec(0);
    run(adam.create({}, 1), x, new ConstantGradient(vec(2)), 100);
    expectRelClose(x[0], -0.0999999995, 1e-12, "displacement"); // relative; 100 roundings of ~1e−16
  });

  it("evaluates once per step, at the iterate itself", () => {
    const x = vec(1, -2);
    const oracle = new DiagonalQuadratic(vec(1, 4));
    run(adam.create({}, 2), x, oracle, 7);
    expect(oracle.evaluations).toBe(7);
    expect(oracle.lastPoint).toBe(x);
  });

  it("coupled weightDecay adds λ·θ to the gradient: one step equals Adam on g + λθ", () => {
    const x1 = vec(2, -1);
    const x2 = vec(2, -1);
    run(adam.create({ weightDecay: 0.5 }, 2), x1, new ConstantGradient(vec(0.1, 0.2)), 1);
    // g + λθ = (0.1 + 1, 0.2 − 0.5)
    run(adam.create({}, 2), x2, new ConstantGradient(vec(1.1, -0.3)), 1);
    expect(Array.from(x1)).toEqual(Array.from(x2));
  });
});

describe("adam epsPlacement", () => {
  it('"efficient" first step is α·g·√(1−β2)/(√(1−β2)·|g| + ε) (Kingma & Ba 2015, §2)', () => {
    // [recomputed] closed form: αₜ = α·√(1−β2)/(1−β1), m = (1−β1)·g, v = (1−β2)·g² at t = 1.
    const g = vec(3, 1e-9);
    const x = vec(0, 0);
    run(adam.create({ epsPlacement: "efficient" }, 2), x, new ConstantGradient(g), 1);
    const s = Math.sqrt(1 - 0.999);
    for (let i = 0; i < 2; i++) {
      expectRelClose(-x[i], (ALPHA * g[i] * s) / (s * Math.abs(g[i]) + EPS), 1e-14, `coordinate ${i}`); // relative
    }
    // The "corrected" placement moves the small coordinate by α/11; "efficient" by about α/317.
    expect(-x[1]).toBeLessThan(ALPHA / 300);
  });

  it("agrees with the corrected placement when ε = 0 and differs when ε is large", () => {
    const a = vec(1, 10, 0.1);
    const start = vec(1, -1, 2);
    const corrected = run(adam.create({ eps: 0 }, 3), start.slice(), new DiagonalQuadratic(a), 50);
    const efficient = run(
      adam.create({ eps: 0, epsPlacement: "efficient" }, 3),
      start.slice(),
      new DiagonalQuadratic(a),
      50,
    );
    for (let i = 0; i < 3; i++) expectRelClose(efficient[i], corrected[i], 1e-12, `coordinate ${i}`); // relative
    const bigC = run(adam.create({ eps: 0.1 }, 3), start.slice(), new DiagonalQuadratic(a), 50);
    const bigE = run(
      adam.create({ eps: 0.1, epsPlacement: "efficient" }, 3),
      start.slice(),
      new DiagonalQuadratic(a),
      50,
    );
    expect(Math.abs(bigE[0] - bigC[0])).toBeGreaterThan(1e-3); // absolute; ε̂ = ε·√(1−β2ᵗ) ≪ ε early on
  });
});

describe("adam amsgrad (Reddi, Kale & Kumar 2018, Algorithm 2)", () => {
  // Gradient 1, then 0.01 for ever: v shrinks after step 1, so the running maximum matters.
  const script = [[1], [0.01]];

  it("raw and corrected maxima give different second steps, both as the closed forms say", () => {
    // [recomputed] with python3 float arithmetic of the closed forms at t = 2, ε = 0:
    //   m̂₂ = (0.9·0.1 + 0.1·0.01)/(1 − 0.9²) = 0.478947…; v₁ = 0.001; v₂ = 0.999·0.001 + 0.001·1e−4;
    //   raw:       α·m̂₂/√(max(v₁, v₂)/(1 − 0.999²))           = 0.0006771645094459537
    //   corrected: α·m̂₂/√max(v₁/(1 − 0.999), v₂/(1 − 0.999²)) = 0.0004789473684210527
    //   plain:     α·m̂₂/√(v₂/(1 − 0.999²))                     = 0.0006774694393183122
    const second = (hyper: Record<string, boolean | string | number>) => {
      const opt = adam.create({ eps: 0, ...hyper }, 1);
      const x = vec(0);
      const oracle = new ScriptedGradient(script);
      opt.step(x, oracle);
      const after1 = x[0];
      opt.step(x, oracle);
      return after1 - x[0];
    };
    const raw = second({ amsgrad: true });
    const corrected = second({ amsgrad: true, amsgradMax: "corrected" });
    const plain = second({});
    expectRelClose(raw, 0.0006771645094459537, 1e-12, "raw"); // relative
    expectRelClose(corrected, 0.0004789473684210527, 1e-12, "corrected"); // relative
    expectRelClose(plain, 0.0006774694393183122, 1e-12, "plain Adam"); // relative
    expect(Math.abs(raw - corrected) / corrected).toBeGreaterThan(0.4);
  });

  it("never lets the running maximum or the corrected denominator shrink, while plain Adam's v does", () => {
    // A gradient that decays with random signs: plain Adam's v must fall at some step (the control).
    const n = 3;
    const script: number[][] = [];
    for (let k = 0; k < 300; k++) {
      script.push([Math.cos(k) * 5 * Math.exp(-k / 20), Math.sin(3 * k) / (1 + k), k % 7 === 0 ? 2 : 0.01]);
    }
    const watch = (
      hyper: Record<string, boolean | string>,
      key: string,
      check: (prev: number, now: number, t: number) => void,
    ) => {
      const opt = adam.create(hyper, n);
      const x = new Float64Array(n);
      const oracle = new ScriptedGradient(script);
      let prev = Array.from({ length: n }, () => 0);
      let prevX = x.slice();
      for (let t = 1; t <= script.length; t++) {
        opt.step(x, oracle);
        const state = opt.exportState();
        const now = state[key] as number[];
        for (let i = 0; i < n; i++) check(prev[i], now[i], t);
        // The denominator actually used, recovered from the move: |Δx| = α·|m̂|/(√s + ε).
        if (key !== "v") {
          const m = state.m as number[];
          for (let i = 0; i < n; i++) {
            const dx = Math.abs(x[i] - prevX[i]);
            if (dx === 0) continue;
            const denom = (ALPHA * Math.abs(m[i] / (1 - 0.9 ** t))) / dx - EPS;
            const sHat = key === "vHatMax" ? now[i] : now[i] / (1 - 0.999 ** t);
            expectRelClose(denom, Math.sqrt(sHat), 1e-6, `step ${t} coordinate ${i}`); // relative
          }
        }
        prev = now;
        prevX = x.slice();
      }
    };
    let adamShrank = false;
    watch({}, "v", (prev, now) => {
      if (now < prev) adamShrank = true;
    });
    expect(adamShrank).toBe(true);
    watch({ amsgrad: true }, "vMax", (prev, now) => expect(now).toBeGreaterThanOrEqual(prev));
    watch({ amsgrad: true, amsgradMax: "corrected" }, "vHatMax", (prev, now) =>
      expect(now).toBeGreaterThanOrEqual(prev),
    );
  });
});
