import { describe, expect, it } from "vitest";
import { fitRate } from "../../src/reference/fit-rate.js";

/** Gaps g_k = f(k) for k = 0 … n. */
function gaps(n: number, f: (k: number) => number): Float64Array {
  return Float64Array.from({ length: n + 1 }, (_, k) => f(k));
}

describe("fitRate", () => {
  it("recovers ρ exactly from a pure geometric gap ρ^(2k)", () => {
    const fit = fitRate(gaps(400, (k) => 0.9 ** (2 * k)));
    expect(fit.rho).not.toBeNull();
    expect(Math.abs(fit.rho! - 0.9)).toBeLessThanOrEqual(1e-12); // absolute
    // window: first gap ≤ 1e−3 (k = 33: 0.81^33 = 9.6e−4) to the last ≥ 1e−16 (k = 174)
    expect(fit).toMatchObject({ from: 33, to: 174, block: 1 });
  });

  it("needs the k² correction for a double root: k²·ρ^(2k)", () => {
    const g = gaps(2000, (k) => (k + 1) ** 2 * 0.98 ** (2 * k));
    const corrected = fitRate(g, { logPower: 2 });
    const plain = fitRate(g, { logPower: 0 });
    // with the correction (ln g − 2 ln k; here (k+1)² vs k², a vanishing difference) the fit is right to 1e-5
    expect(Math.abs(corrected.rho! / 0.98 - 1)).toBeLessThanOrEqual(1e-5); // relative
    // without it the k² growth makes the gap look slower to contract, by far more than the tolerance of checks
    expect(plain.rho! / 0.98 - 1).toBeGreaterThan(1e-3);
  });

  it("fits the envelope of an oscillating gap through block maxima", () => {
    // ρ^(2k)·(cos²(kθ) + 1e-6): near-zeros at single steps would bias a plain least-squares fit of ln g
    const theta = 0.3;
    const g = gaps(1200, (k) => 0.97 ** (2 * k) * (Math.cos(k * theta) ** 2 + 1e-6));
    const envelope = fitRate(g, { block: Math.ceil(Math.PI / theta) });
    expect(Math.abs(envelope.rho! / 0.97 - 1)).toBeLessThanOrEqual(2e-4); // relative
    expect(envelope).toMatchObject({ block: 11 });
  });

  it.each<[string, Float64Array, string]>([
    [
      "a gap that never falls",
      gaps(50, () => 1),
      "the gap never fell to 0.001 of the initial gap in 50 steps",
    ],
    ["a non-finite gap", gaps(50, (k) => (k === 3 ? NaN : 1)), "the gap is not finite at step 3"],
    [
      "a window that is too short (1e−4 to 1e−16 in steps 1–4)",
      gaps(50, (k) => 1e-4 ** k),
      "only 4 steps lie between 0.001 and 1e-16 of the initial gap",
    ],
    ["a zero initial gap", gaps(50, () => 0), "the initial gap is 0, not a positive number"],
  ])("says why it cannot fit %s", (_name, g, why) => {
    expect(fitRate(g)).toEqual({ rho: null, why });
  });
});
