import { describe, expect, it } from "vitest";
import { InputError } from "../../src/core/errors.js";
import type { OptimizerFactory } from "../../src/core/types.js";
import { runReferenceChecks } from "../../src/reference/run-checks.js";
import { referenceSourceFor } from "../../src/reference/run-checks.js";
import { sourceOf, suiteFrom } from "./helpers.js";
import { userMomentum, userNesterov, userSgd } from "./wrong-optimizers.js";

/** Test optimizers reachable as `use: test:NAME`. */
const TEST_OPTIMIZERS: Record<string, OptimizerFactory> = {
  "test:momentum-0.8": userMomentum({ fixedMomentum: 0.8 }),
  "test:framework-nesterov": userNesterov({ framework: true }),
  "test:half-step-sgd": userSgd({ lrScale: 0.5 }),
};
const sourceFor = (use: string) =>
  TEST_OPTIMIZERS[use] ? sourceOf(TEST_OPTIMIZERS[use]) : referenceSourceFor(use);

/** Runs one rate check of `optimizer` (YAML mapping text) on `problem` and returns its result. */
async function rate(optimizer: string, problem: string, check: string) {
  const { suite, checks } = suiteFrom(`
optimizers:
  - ${optimizer}
problems:
  - ${problem}
checks:
  rate:
    - ${check}
`);
  const report = await runReferenceChecks({ suite, checks, sourceFor });
  const all = Object.values(report.cases).flat();
  expect(all).toHaveLength(1);
  return all[0];
}

describe("rate check: the reference optimizers converge at the theoretical rate", () => {
  // Theory: spectral radius of the iteration matrix over the eigenvalues; tuned closed forms from
  // Nesterov (2004) Thm 2.1.15 (GD), Polyak (1964) (heavy ball), Nesterov (2004) §2.2 (Nesterov).
  it.each<[string, string, string, string]>([
    [
      "gd untuned",
      "{ name: o, use: sgd, hyper: { lr: 0.01 } }",
      "{ use: quadratic, params: { kappa: 100, n: 10 } }",
      "gradient-descent, tuned: false",
    ],
    [
      "gd tuned, rotated κ = 1000",
      "{ name: o, use: sgd }",
      "{ use: quadratic, params: { kappa: 1000, n: 6 } }",
      "gradient-descent, tuned: true",
    ],
    [
      "heavy ball, lr inside",
      "{ name: o, use: momentum, hyper: { lr: 0.01, momentum: 0.5 } }",
      "{ use: quadratic }",
      "heavy-ball",
    ],
    [
      "heavy ball, lr outside",
      "{ name: o, use: momentum, hyper: { lr: 0.01, momentum: 0.9, form: lr-outside } }",
      "{ use: quadratic }",
      "heavy-ball",
    ],
    [
      "heavy ball tuned (double roots)",
      "{ name: o, use: momentum }",
      "{ use: quadratic, params: { n: 50 } }",
      "heavy-ball, tuned: true",
    ],
    [
      "Nesterov look-ahead",
      "{ name: o, use: nesterov, hyper: { lr: 0.005, momentum: 0.9 } }",
      "{ use: quadratic }",
      "nesterov",
    ],
    [
      "Nesterov stored look-ahead, tuned",
      "{ name: o, use: nesterov, hyper: { form: stored-lookahead } }",
      "{ use: quadratic, params: { n: 50 } }",
      "nesterov, tuned: true",
    ],
    [
      "Nesterov as frameworks write it, tuned",
      "{ name: o, use: test:framework-nesterov }",
      "{ use: quadratic, params: { kappa: 1e4 } }",
      "nesterov, tuned: true",
    ],
    [
      "noise-free noisy quadratic",
      "{ name: o, use: momentum, hyper: { lr: 0.05, momentum: 0.5 } }",
      "{ use: noisy-quadratic, params: { sigma: 0 } }",
      "heavy-ball",
    ],
  ])("%s passes", async (_name, optimizer, problem, method) => {
    const [m, ...rest] = method.split(", ");
    const result = await rate(
      optimizer,
      problem,
      `{ optimizer: o, problem: ${problem.match(/use: ([a-z-]+)/)![1]}, method: ${m}${rest.length ? ", " + rest.join(", ") : ""} }`,
    );
    expect(result.status, result.summary).toBe("pass");
    // relative to the theory over the same window, the run agrees far inside the 2% of −ln ρ allowed
    expect(Math.abs(result.measured! / result.expected! - 1)).toBeLessThanOrEqual(
      1e-3 * result.tolerance!.value,
    );
    expect(result.tolerance!.kind).toBe("relative");
  });

  it("says what it compared: the tuned heavy ball on κ = 100 (Polyak 1964: ρ = 9/11)", async () => {
    const result = await rate(
      "{ name: hb, use: momentum }",
      "{ use: quadratic, params: { n: 2, rotate: 0 } }",
      "{ optimizer: hb, problem: quadratic, method: heavy-ball, tuned: true }",
    );
    expect(result).toMatchObject({ id: "rate:heavy-ball", status: "pass", gating: true });
    expect(result.summary).toMatch(
      /^rate \(heavy ball, tuned, α = 0\.03306, β = 0\.6694, μ = 1, L = 100\): the run contracts by ρ = 0\.818\d per step over steps \d+–\d+, as the theory predicts \(spectral radius ρ = 0\.8182 = \(√κ − 1\)\/\(√κ \+ 1\)/,
    );
    expect(result.source).toContain("Polyak (1964)");
  });
});

describe("rate check: wrong implementations fail with a sentence saying how", () => {
  it("a wrong momentum coefficient (the code uses 0.8 whatever it is given)", async () => {
    const result = await rate(
      "{ name: hb, use: test:momentum-0.8, hyper: { lr: 0.01, momentum: 0.9 } }",
      "{ use: quadratic }",
      "{ optimizer: hb, problem: quadratic, method: heavy-ball }",
    );
    expect(result.status).toBe("fail");
    expect(result.summary).toMatch(
      /^rate \(heavy ball, α = 0\.01, β = 0\.9, μ = 1, L = 100\): the run contracts by ρ = 0\.9\d+ per step over steps \d+–\d+, the theory predicts 0\.948\d \(spectral radius ρ = 0\.9487[^)]*\): \d+% faster convergence \(−ln ρ 0\.0\d+ vs 0\.05\d+\), tolerance 2%$/,
    );
  });

  it("heavy ball declared as Nesterov with Nesterov's tuned parameters (a dropped look-ahead)", async () => {
    const result = await rate(
      "{ name: nag, use: momentum }",
      "{ use: quadratic }",
      "{ optimizer: nag, problem: quadratic, method: nesterov, tuned: true }",
    );
    expect(result.status).toBe("fail");
    expect(result.summary).toContain("the theory predicts 0.89");
    expect(result.summary).toContain("(spectral radius ρ = 0.9 = 1 − 1/√κ");
  });

  it("a step scaled by one half", async () => {
    const result = await rate(
      "{ name: gd, use: test:half-step-sgd, hyper: { learning_rate: 0.01 } }",
      "{ use: quadratic }",
      "{ optimizer: gd, problem: quadratic, method: gradient-descent, names: { lr: learning_rate } }",
    );
    expect(result.status).toBe("fail");
    expect(result.summary).toMatch(
      /ρ = 0\.995 per step .*the theory predicts 0\.99 \(spectral radius ρ = 0\.99\): 50% slower convergence \(−ln ρ 0\.00501\d vs 0\.01005\), tolerance 2%$/,
    );
  });
});

describe("rate check: when there is nothing to check", () => {
  it("skips parameters that do not contract (α·L > 2)", async () => {
    const result = await rate(
      "{ name: gd, use: sgd, hyper: { lr: 0.03 } }",
      "{ use: quadratic }",
      "{ optimizer: gd, problem: quadratic, method: gradient-descent }",
    );
    expect(result).toMatchObject({
      status: "skipped",
      summary:
        "rate (gradient descent, α = 0.03, μ = 1, L = 100): the iteration does not contract (ρ = 2 ≥ 1), so there is no rate to check",
    });
  });

  it("skips when the theory needs more steps than allowed", async () => {
    const result = await rate(
      "{ name: gd, use: sgd, hyper: { lr: 1e-6 } }",
      "{ use: quadratic }",
      "{ optimizer: gd, problem: quadratic, method: gradient-descent, steps: 1000 }",
    );
    expect(result.status).toBe("skipped");
    expect(result.summary).toMatch(
      /: ρ = 1 needs about \d+ steps to fall to 1e-16 of the initial gap, more than steps = 1000$/,
    );
  });

  it.each<[string, string, string]>([
    [
      "a problem without a known spectrum",
      "{ optimizer: o, problem: rosenbrock, method: gradient-descent }",
      "config test.yml: checks.rate[0].problem: rosenbrock has no known spectrum; rate checks need a quadratic (quadratic, or noisy-quadratic with sigma: 0)",
    ],
  ])("rejects %s in the config", (_name, check, message) => {
    expect(() =>
      suiteFrom(`
optimizers: [{ name: o, use: sgd }]
problems: [{ use: rosenbrock }]
checks: { rate: [${check}] }
`),
    ).toThrow(new InputError(message));
  });

  it("rejects a step-size name the case does not have", () => {
    expect(() =>
      suiteFrom(`
optimizers: [{ name: o, use: sgd }]
problems: [{ use: quadratic }]
checks: { rate: [{ optimizer: o, problem: quadratic, method: gradient-descent, names: { lr: eta } }] }
`),
    ).toThrow(
      new InputError(
        'config test.yml: checks.rate[0]: case o/default/quadratic has no number hyperparameter "eta" for the step size (got nothing); name it in names.lr or set tuned: true',
      ),
    );
  });
});
