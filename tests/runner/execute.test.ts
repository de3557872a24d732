import { describe, expect, it } from "vitest";
import { canonicalJson } from "../../src/core/json.js";
import { executeRun } from "../../src/runner/execute.js";
import { gdFactory, toyCase, toyProblem } from "../helpers/toy.js";

describe("executeRun on f = ½(x₁² + 2x₂²) with gradient descent", () => {
  // Closed form: GD with step η on coordinate i (curvature cᵢ) contracts by (1 − η cᵢ) per step, so with
  // η = 0.1 and c = (1, 2) the slow coordinate contracts by 0.9 and f by 0.81 per step asymptotically.
  it("measures the gap, the ladder and the fitted rate as the closed form says", () => {
    const { metrics } = executeRun(toyCase(), 0, 7, gdFactory(), toyProblem());
    expect(metrics.stop).toBe("steps");
    expect(metrics.steps).toBe(200);
    expect(metrics.evaluations).toBe(200);
    expect(metrics.rate).not.toBeNull();
    expect(Math.abs(metrics.rate! - 0.81)).toBeLessThan(1e-9); // absolute
    // Closed form: x_k,i = (1 − 0.1·cᵢ)^k x_0,i, so f_k = ½·0.81^k·x₀₁² + 0.64^k·x₀₂²; x₀ is recovered
    // from the kept first iterate x₁ = (0.9 x₀₁, 0.8 x₀₂). The first k with f_k ≤ 0.1·f₀ is rung 0.
    const [a, b] = [metrics.iterates![0][0]! / 0.9, metrics.iterates![0][1]! / 0.8];
    const f = (k: number) => 0.5 * 0.81 ** k * a * a + 0.64 ** k * b * b;
    let k = 0;
    while (f(k) > 0.1 * f(0)) k++;
    expect(metrics.stepsTo[0]).toBe(k);
    expect(Math.abs(metrics.f0! - f(0)) / f(0)).toBeLessThan(1e-14); // relative
    expect(metrics.stepsTo[2]).toBeGreaterThan(metrics.stepsTo[1]!);
    expect(metrics.divergence).toBeNull();
    expect(metrics.iterates).toHaveLength(3);
    expect(metrics.trace[0]).toBe(metrics.f0);
  });

  it("gives the same metrics whether the loss is reused from the step or measured again", () => {
    const reuse = executeRun(toyCase(), 1, 7, gdFactory(), toyProblem()).metrics;
    const explicit = executeRun(toyCase(), 1, 7, gdFactory({ lookahead: true }), toyProblem()).metrics;
    expect(explicit).toEqual(reuse);
    const verified = executeRun(toyCase(), 1, 7, gdFactory({ touchFirst: true }), toyProblem(), {
      verifyIterate: true,
    }).metrics;
    expect(verified).toEqual(reuse);
  });

  it("stops at the target and reports the step it was reached", () => {
    const { metrics } = executeRun(toyCase({ stopAt: 1e-4 }), 0, 7, gdFactory(), toyProblem());
    expect(metrics.stop).toBe("target");
    expect(metrics.steps).toBe(metrics.stepsTo[2]);
    expect(metrics.evaluations).toBe(metrics.steps);
    expect(metrics.trace[metrics.trace.length - 1]).toBeNull();
  });

  it("detects blow-up with a step size beyond 2/L and records where", () => {
    const { metrics } = executeRun(toyCase({ hyper: { lr: 1.5 } }), 0, 7, gdFactory(), toyProblem());
    // coordinate 2 multiplies by |1 − 1.5·2| = 2 per step: f grows ×4, blow-up limit 1e6·1.5 → ~k = 11
    expect(metrics.stop).toBe("diverged");
    expect(metrics.divergence).toBe("blow-up");
    expect(metrics.divergedAt).toBeGreaterThan(8);
    expect(metrics.divergedAt).toBeLessThan(14);
    expect(metrics.finalGap).toBeNull();
  });

  it("keeps iterates that left the finite range as null, so the results stay valid JSON", () => {
    const { metrics } = executeRun(toyCase({ hyper: { lr: 1e308 } }), 0, 7, gdFactory(), toyProblem());
    expect(metrics.stop).toBe("diverged");
    expect(metrics.iterates!.flat()).toContain(null);
    expect(() => canonicalJson(metrics)).not.toThrow();
  });

  it("records a throwing optimizer as an error run without throwing", () => {
    const { metrics } = executeRun(toyCase(), 0, 7, gdFactory({ throwAt: 5 }), toyProblem());
    expect(metrics.stop).toBe("error");
    expect(metrics.error).toBe("step 5 threw: boom");
  });

  it("honours the evaluation budget", () => {
    const { metrics } = executeRun(
      toyCase({ budget: { steps: 200, evaluations: 50, seconds: 60 } }),
      0,
      7,
      gdFactory(),
      toyProblem(),
    );
    expect(metrics.stop).toBe("evaluations");
    expect(metrics.evaluations).toBe(50);
    expect(metrics.steps).toBe(50);
  });

  it("measures stochastic problems with the exact objective every measureEvery steps", () => {
    const spec = toyCase({ measureEvery: 5 });
    const a = executeRun(spec, 0, 7, gdFactory(), toyProblem({ stochastic: true })).metrics;
    const b = executeRun(spec, 0, 7, gdFactory(), toyProblem({ stochastic: true })).metrics;
    expect(a).toEqual(b);
    const other = executeRun(spec, 1, 7, gdFactory(), toyProblem({ stochastic: true })).metrics;
    expect(other.finalGap).not.toBe(a.finalGap);
    // Noise floor of SGD: the gap stalls well above the deterministic run's.
    const det = executeRun(toyCase(), 0, 7, gdFactory(), toyProblem()).metrics;
    expect(a.finalGap!).toBeGreaterThan(1000 * det.finalGap!);
  });
});
