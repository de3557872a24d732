import { describe, expect, it } from "vitest";
import { InputError } from "../../src/core/errors.js";
import type { OptimizerFactory } from "../../src/core/types.js";
import { sgdStationaryLoss } from "../../src/problems/index.js";
import { referenceSourceFor, runReferenceChecks } from "../../src/reference/run-checks.js";
import {
  burnInSteps,
  sgdStationaryVariance,
  stepsForPrecision,
  timeAverageRelativeError,
} from "../../src/reference/stationary.js";
import { fixture, sourceOf, suiteFrom } from "./helpers.js";
import { userSgd } from "./wrong-optimizers.js";

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

describe("SGD's stationary variance: the closed form", () => {
  // Expected: scipy.linalg.solve_discrete_lyapunov([[1 − ηλ]], [[(ησ)²]]) (scipy 1.10.1), an independent
  // solution of v = a·v·a + q for the AR(1) recursion x ← (1 − ηλ)x − ησz.
  it.each<[number, number, number, string]>([
    [1, 0.1, 0.1, "stationary_1.0_0.1_0.1"],
    [10, 0.1, 0.1, "stationary_10.0_0.1_0.1"],
    [3, 0.5, 2, "stationary_3.0_0.5_2.0"],
  ])(
    "λ = %d, η = %d, σ = %d: ησ²/(λ(2 − ηλ)) agrees with the discrete Lyapunov solution",
    (lambda, lr, sigma, key) => {
      expect(rel(sgdStationaryVariance(lambda, sigma, lr), fixture(key))).toBeLessThanOrEqual(1e-14); // relative
    },
  );

  it("sums to the problem library's stationary mean loss Σ ½λᵢvᵢ", () => {
    const eig = [1, 2, 5, 10];
    const total = eig.reduce((s, l) => s + 0.5 * l * sgdStationaryVariance(l, 0.3, 0.05), 0);
    expect(rel(total, sgdStationaryLoss(eig, 0.3, 0.05))).toBeLessThanOrEqual(1e-14); // relative
  });

  it("rejects a step with no stationary distribution", () => {
    expect(() => sgdStationaryVariance(10, 0.1, 0.2)).toThrow(
      "SGD has no stationary distribution unless 0 < lr·λ < 2; got lr = 0.2, λ = 10",
    );
  });

  // The asymptotic standard error √(2(1 + a²)/(T(1 − a²))) against the exact finite-T value
  // √(Σ_h (T − |h|)·2a^(2|h|))/T (numpy, reference_values.out): they agree to a few 1/(T(1 − a²)).
  it.each<[number, number, string, number]>([
    [0.9, 2000, "se_exact_a0.9_T2000", 0.01],
    [0.5, 500, "se_exact_a0.5_T500", 0.01],
  ])("the time-average standard error for a = %d, T = %d matches the exact sum", (a, T, key, tol) => {
    // a = 1 − ηλ with λ = 1
    expect(rel(timeAverageRelativeError(1, 1 - a, T), fixture(key))).toBeLessThanOrEqual(tol); // relative
  });

  it("sizes the run from the slowest coordinate and the burn-in from the transient", () => {
    // a = 0.9 (λ = 1, η = 0.1): T = 2(1 + 0.81)/((1 − 0.81)·0.01²) = 190527 [recomputed]
    expect(stepsForPrecision([1, 5, 10], 0.1, 0.01)).toBe(190527);
    const b = burnInSteps(1, 0.1, 0.1, 1, 190527, 0.05);
    // after B steps the transient a^(2B)·|x0² − v|/((1 − a²)·T·v) is below 5% of the standard error
    const v = sgdStationaryVariance(1, 0.1, 0.1);
    const bias = (b2: number) => (0.81 ** b2 * Math.abs(1 - v)) / (0.19 * 190527 * v);
    expect(bias(b)).toBeLessThanOrEqual(0.05 * timeAverageRelativeError(1, 0.1, 190527));
    expect(bias(b - 1)).toBeGreaterThan(0.05 * timeAverageRelativeError(1, 0.1, 190527));
  });
});

const TEST_OPTIMIZERS: Record<string, OptimizerFactory> = {
  "test:sgd-0.7": userSgd({ lrScale: 0.7 }),
};
const sourceFor = (use: string) =>
  TEST_OPTIMIZERS[use] ? sourceOf(TEST_OPTIMIZERS[use]) : referenceSourceFor(use);

async function stationary(optimizer: string, check = "{ optimizer: o, problem: noisy-quadratic }") {
  const { suite, checks } = suiteFrom(`
optimizers: [${optimizer}]
problems: [{ use: noisy-quadratic, params: { n: 4, kappa: 10, sigma: 0.1 } }]
checks: { stationary: [${check}] }
`);
  const report = await runReferenceChecks({ suite, checks, sourceFor });
  return Object.values(report.cases).flat()[0];
}

describe("stationary-variance check", () => {
  it("passes for the reference SGD, within 5 standard errors of a run sized for 1% precision", async () => {
    const result = await stationary("{ name: o, use: sgd, hyper: { lr: 0.1 } }");
    expect(result).toMatchObject({ id: "stationary-variance", status: "pass", gating: true });
    expect(result.summary).toMatch(
      /^stationary variance \(SGD, η = 0\.1, σ = 0\.1\): over 190527 steps after \d+ of burn-in, E\[xᵢ²\] matches ησ²\/\(λᵢ\(2 − ηλᵢ\)\) in all 4 coordinates; farthest is coordinate \d \(λ = [\d.]+\): /,
    );
    expect(result.tolerance).toEqual({ kind: "relative", value: expect.any(Number) });
    expect(Math.abs(result.measured! / result.expected! - 1)).toBeLessThanOrEqual(result.tolerance!.value);
  });

  it("fails for an SGD whose step is 0.7 of the one it is given", async () => {
    const result = await stationary(
      "{ name: o, use: test:sgd-0.7, hyper: { learning_rate: 0.1 } }",
      "{ optimizer: o, problem: noisy-quadratic, names: { lr: learning_rate } }",
    );
    expect(result.status).toBe("fail");
    expect(result.summary).toMatch(
      /^stationary variance \(SGD, η = 0\.1, σ = 0\.1\): over 190527 steps after \d+ of burn-in, coordinate \d \(λ = [\d.]+\) averages E\[x²\] = [\d.e-]+, \d+% below the closed form ησ²\/\(λ\(2 − ηλ\)\) = [\d.e-]+ \(tolerance [\d.]+%, 5 standard errors of the time average\)$/,
    );
  });

  it("fails for momentum SGD declared as plain SGD (its noise floor is higher)", async () => {
    const result = await stationary("{ name: o, use: momentum, hyper: { lr: 0.1, momentum: 0.5 } }");
    expect(result.status).toBe("fail");
    expect(result.summary).toContain("above the closed form");
  });

  it.each<[string, string, string]>([
    [
      "a problem without gradient noise",
      "{ optimizer: o, problem: quadratic }",
      "config test.yml: checks.stationary[0].problem: quadratic is not a diagonal quadratic with gradient noise (use noisy-quadratic with sigma > 0)",
    ],
    [
      "a step with no stationary distribution",
      "{ optimizer: b, problem: noisy-quadratic }",
      "config test.yml: checks.stationary[0]: case b/default/noisy-quadratic has lr·λ = 2.5 for λ = 10; SGD has a stationary distribution only for 0 < lr·λ < 2",
    ],
  ])("rejects %s in the config", (_name, check, message) => {
    expect(() =>
      suiteFrom(`
optimizers: [{ name: o, use: sgd }, { name: b, use: sgd, hyper: { lr: 0.25 } }]
problems: [{ use: quadratic }, { use: noisy-quadratic }]
checks: { stationary: [${check}] }
`),
    ).toThrow(new InputError(message));
  });
});
