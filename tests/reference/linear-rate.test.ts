import { describe, expect, it } from "vitest";
import { getOptimizer } from "../../src/optimizers/index.js";
import { createQuadratic, getProblem } from "../../src/problems/index.js";
import {
  type LinearMethod,
  blockRoots,
  linearRate,
  modelGaps,
  quadraticRoots,
  tunedParameters,
} from "../../src/reference/linear-rate.js";
import { runInProcess } from "../../src/reference/trajectory.js";
import { fixture } from "./helpers.js";

/** Relative difference |a − b|/|b|. */
const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

/** 10 eigenvalues log-spaced in [1, 100], as np.logspace(0, 2, 10) and the quadratic problem (n = 10, κ = 100). */
const EIG = createQuadratic({ n: 10, kappa: 100, rotate: 0 }).eigenvalues;

describe("spectral radius of the iteration blocks", () => {
  // Expected: max |eigenvalue| over the blocks by numpy.linalg.eigvals (numpy 1.24.2), see
  // tests/reference/fixtures/reference_values.py; one tolerance (relative) per row.
  it.each<[string, LinearMethod, number, number, string, number]>([
    ["gradient descent α = 0.01", "gradient-descent", 0.01, 0, "rho_gd_lr0.01", 1e-14],
    ["heavy ball α = 0.01, β = 0.5 (real roots)", "heavy-ball", 0.01, 0.5, "rho_hb_lr0.01_m0.5", 1e-12],
    ["heavy ball α = 0.001, β = 0.9", "heavy-ball", 0.001, 0.9, "rho_hb_lr0.001_m0.9", 1e-12],
    ["heavy ball α = 0.03, β = 0.95 (complex roots)", "heavy-ball", 0.03, 0.95, "rho_hb_lr0.03_m0.95", 1e-12],
    [
      "heavy ball α = 0.025, β = 0.9 (all complex, |z| = √β)",
      "heavy-ball",
      0.025,
      0.9,
      "rho_hb_lr0.025_m0.9",
      1e-12,
    ],
    ["Nesterov α = 0.005, β = 0.9", "nesterov", 0.005, 0.9, "rho_nag_lr0.005_m0.9", 1e-12],
    ["Nesterov α = 0.01, β = 0.5", "nesterov", 0.01, 0.5, "rho_nag_lr0.01_m0.5", 1e-12],
    [
      "gradient descent α = 0.021 (αL > 2: diverges)",
      "gradient-descent",
      0.021,
      0,
      "rho_gd_lr0.021_unstable",
      1e-14,
    ],
  ])("%s matches numpy.linalg.eigvals", (_name, method, lr, momentum, key, tol) => {
    expect(rel(linearRate(method, lr, momentum, EIG).rho, fixture(key))).toBeLessThanOrEqual(tol);
  });

  it("handles real, double and complex roots of z² − tz + d", () => {
    // z² − 1.5z + 0.5 = (z − 1)(z − 0.5): real roots 1 and 0.5 [recomputed by hand]
    expect(quadraticRoots(1.5, 0.5)).toMatchObject({ modulus: 1, complex: false, double: false, angle: 0 });
    // z² + 1.5z + 0.5 = (z + 1)(z + 0.5): the largest root is −1, angle π
    expect(quadraticRoots(-1.5, 0.5)).toMatchObject({ modulus: 1, complex: false, angle: Math.PI });
    // z² − z + 0.25 = (z − 0.5)²: a double root
    expect(quadraticRoots(1, 0.25)).toMatchObject({ modulus: 0.5, double: true });
    // z² + 0.25 = 0: z = ±0.5i, modulus 0.5, angle π/2
    const c = quadraticRoots(0, 0.25);
    expect(c.complex).toBe(true);
    expect(c.modulus).toBe(0.5);
    expect(rel(c.angle, Math.PI / 2)).toBeLessThanOrEqual(1e-15);
  });

  it("gradient descent is heavy ball with β = 0 (roots 1 − αλ and 0)", () => {
    const r = blockRoots("gradient-descent", 0.3, 0.9, 2);
    expect(r.modulus).toBeCloseTo(0.4, 15); // |1 − 0.3·2|, absolute 1e-15
    expect(blockRoots("heavy-ball", 0.3, 0, 2).modulus).toBe(r.modulus);
  });
});

describe("tuned parameters and their closed-form rates", () => {
  // μ = 1, L = 100 (κ = 100): exact rationals in tests/reference/fixtures/reference_values.out.
  it.each<[LinearMethod, string, string, string, string]>([
    // Nesterov (2004), Introductory Lectures on Convex Optimization, Theorem 2.1.15: step 2/(L + μ), (κ−1)/(κ+1)
    ["gradient-descent", "tuned_gd_rate", "", "", "Nesterov 2004 Thm 2.1.15"],
    // Polyak (1964), USSR Comput. Math. Math. Phys. 4(5):1–17: α = 4/(√L+√μ)², β = ((√κ−1)/(√κ+1))²
    ["heavy-ball", "tuned_hb_rate", "tuned_hb_lr", "tuned_hb_momentum", "Polyak 1964"],
    // Nesterov (2004), §2.2: α = 1/L, β = (√L−√μ)/(√L+√μ), rate 1 − 1/√κ
    ["nesterov", "tuned_nag_rate", "", "tuned_nag_momentum", "Nesterov 2004 §2.2"],
  ])("%s: closed form as published (%s)", (method, rateKey, lrKey, momentumKey) => {
    const t = tunedParameters(method, 1, 100);
    expect(rel(t.rate, fixture(rateKey))).toBeLessThanOrEqual(1e-15); // relative
    if (lrKey) expect(rel(t.lr, fixture(lrKey))).toBeLessThanOrEqual(1e-15); // relative
    if (momentumKey) expect(rel(t.momentum, fixture(momentumKey))).toBeLessThanOrEqual(1e-15); // relative
  });

  it.each<LinearMethod>(["gradient-descent", "heavy-ball", "nesterov"])(
    "%s: the closed form equals the spectral radius for κ from 2 to 1e6",
    (method) => {
      for (const kappa of [2, 10, 100, 1e4, 1e6]) {
        const eig = createQuadratic({ n: 12, kappa, rotate: 0 }).eigenvalues;
        const t = tunedParameters(method, 1, kappa);
        const r = linearRate(method, t.lr, t.momentum, eig);
        // relative; double roots are ill-conditioned: a rounding-size discriminant moves them by ~√ε
        expect(rel(r.rho, t.rate)).toBeLessThanOrEqual(1e-7);
        expect(r.double).toBe(method !== "gradient-descent");
      }
    },
  );

  it("numpy agrees at the tuned parameters within the same √ε conditioning", () => {
    // rho_*_tuned_numpy: numpy.linalg.eigvals at the tuned parameters, μ = 1, L = 100.
    const hb = tunedParameters("heavy-ball", 1, 100);
    const nag = tunedParameters("nesterov", 1, 100);
    expect(
      rel(linearRate("heavy-ball", hb.lr, hb.momentum, EIG).rho, fixture("rho_hb_tuned_numpy")),
    ).toBeLessThanOrEqual(1e-7);
    expect(
      rel(linearRate("nesterov", nag.lr, nag.momentum, EIG).rho, fixture("rho_nag_tuned_numpy")),
    ).toBeLessThanOrEqual(1e-7);
  });

  it("rejects μ > L", () => {
    expect(() => tunedParameters("nesterov", 2, 1)).toThrow(
      "tunedParameters: need 0 < μ ≤ L, got μ = 2, L = 1",
    );
  });
});

describe("worked example: gradient descent with step 2/(L + μ) on diag(1, 100)", () => {
  // From x0 = (1, 1) to the minimum 0: ‖x₅₀‖ = √2·(99/101)⁵⁰ = 0.5202428 (worked value; recomputed as
  // math.sqrt(2)*(99/101)**50 and by a numpy loop, reference_values.out: gd_worked_closed, gd_worked_norm50).
  it("the reference SGD run reproduces ‖x₅₀ − x*‖ = 0.5202428", () => {
    // The quadratic problem with n = 2, κ = 100, rotate = 0 is diag(1, 100) around x* = (1, 1), started
    // at (0, 0): the error starts at (−1, −1), the worked example's x0 up to sign.
    const definition = getProblem("quadratic");
    const params = { kappa: 100, n: 2, rotate: 0, seed: 0 };
    let norm = NaN;
    const t = tunedParameters("gradient-descent", 1, 100);
    const outcome = runInProcess(
      getOptimizer("sgd"),
      {
        // the standard start x0 = (0, 0) without the seeded perturbation
        definition: {
          ...definition,
          create: (p, c) => ({ ...definition.create(p, c), start: (out) => out.fill(0) }),
        },
        params,
        problemKey: "quadratic(kappa=100,n=2,rotate=0)",
        hyper: { lr: t.lr },
        steps: 50,
        suiteSeed: 1,
        seedIndex: 0,
      },
      (k, x) => {
        if (k === 50) norm = Math.hypot(x[0] - 1, x[1] - 1);
      },
    );
    expect(outcome).toEqual({ steps: 50, lrChange: "none" });
    expect(Math.abs(norm - 0.5202428)).toBeLessThanOrEqual(5e-8); // absolute: the worked value has 7 decimals
    expect(rel(norm, fixture("gd_worked_closed"))).toBeLessThanOrEqual(1e-13); // relative, 50 roundings
  });

  it("the linear model gives the same error, and ρ = 99/101", () => {
    const gaps = modelGaps("gradient-descent", 2 / 101, 0, [1, 100], [1, 1], new Float64Array(51));
    // gap = ½·Σλᵢeᵢ² with e₅₀ = ((99/101)⁵⁰, (−99/101)⁵⁰): ½·101·(99/101)¹⁰⁰ [recomputed]
    expect(rel(gaps[50], 0.5 * 101 * (99 / 101) ** 100)).toBeLessThanOrEqual(1e-13);
    expect(rel(linearRate("gradient-descent", 2 / 101, 0, [1, 100]).rho, 99 / 101)).toBeLessThanOrEqual(
      1e-15,
    );
  });

  it("the model's Nesterov gap at the look-ahead point follows y = (1 + β)w_k − βw_{k−1}", () => {
    // One eigenvalue λ = 1, α = 0.1, β = 0.5, e₀ = 1: e₁ = 0.9, e₂ = 0.9·(1.5·0.9 − 0.5·1) = 0.765;
    // y₂ = 1.5·0.765 − 0.5·0.9 = 0.6975 [recomputed by hand]
    const w = modelGaps("nesterov", 0.1, 0.5, [1], [1], new Float64Array(3));
    const y = modelGaps("nesterov", 0.1, 0.5, [1], [1], new Float64Array(3), "lookahead");
    expect(rel(w[2], 0.5 * 0.765 ** 2)).toBeLessThanOrEqual(1e-15);
    expect(rel(y[2], 0.5 * 0.6975 ** 2)).toBeLessThanOrEqual(1e-15);
    expect(y[0]).toBe(w[0]);
  });
});
