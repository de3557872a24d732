/** Trajectory fingerprint and the exact sign test, on hand-made inputs. */
import { describe, expect, it } from "vitest";
import { compareFingerprint } from "../../src/compare/fingerprint.js";
import { exactSignTest } from "../../src/compare/sign-test.js";
import { run } from "./fixtures.js";

const withIterates = (seed: number, iterates: number[][]) => run(seed, { iterates });
const X = [
  [1, 2],
  [0.5, 1],
  [0.25, 0.5],
];

describe("compareFingerprint", () => {
  it("identical, including −0 against +0", () => {
    const a = withIterates(0, [[0, 1], ...X.slice(1)]);
    const b = withIterates(0, [[-0, 1], ...X.slice(1)]);
    expect(compareFingerprint([{ base: a, cand: b }], 1e-12)).toMatchObject({
      status: "identical",
      firstDifferentStep: null,
      seeds: 1,
      steps: 3,
    });
  });

  it("float noise: relative norm-wise difference within the tolerance", () => {
    const b = withIterates(
      0,
      X.map((x, s) => (s === 2 ? [x[0] * (1 + 2 ** -52), x[1]] : x)),
    );
    const f = compareFingerprint([{ base: withIterates(0, X), cand: b }], 1e-12);
    // ‖Δ‖∞ / ‖x‖∞ = 0.25·2⁻⁵² / 0.5 = 2⁻⁵³ (recomputed by hand).
    expect(f).toMatchObject({
      status: "float-noise",
      firstDifferentStep: 3,
      fromStep: null,
      maxRelative: 2 ** -53,
    });
  });

  it("changed from the first step beyond the tolerance, over all seeds", () => {
    const later = withIterates(
      1,
      X.map((x, s) => (s === 2 ? [0.26, 0.5] : x)),
    );
    const earlier = withIterates(
      0,
      X.map((x, s) => (s >= 1 ? [x[0], x[1] * 1.5] : x)),
    );
    const f = compareFingerprint(
      [
        { base: withIterates(0, X), cand: earlier },
        { base: withIterates(1, X), cand: later },
      ],
      1e-12,
    );
    // Step 2: ‖(0, 0.5)‖∞ / max(1, 1.5) = 1/3.
    expect(f).toMatchObject({ status: "changed", fromStep: 2, firstDifferentStep: 2, seedsChanged: 2 });
    expect(f.relativeAtStep).toBeCloseTo(1 / 3, 15);
  });

  it("a run that kept fewer iterates (it stopped earlier) changed from the first missing step", () => {
    const f = compareFingerprint([{ base: withIterates(0, X), cand: withIterates(0, X.slice(0, 2)) }], 1e-12);
    expect(f).toMatchObject({ status: "changed", fromStep: 3, relativeAtStep: null, maxRelative: null });
  });

  it("unavailable without iterates", () => {
    const a = run(0, { iterates: undefined });
    expect(compareFingerprint([{ base: a, cand: a }], 1e-12).status).toBe("unavailable");
  });
});

describe("exactSignTest (McNemar's exact form)", () => {
  // Reference values: scipy 1.17.1, scipy.stats.binomtest(k, n, 0.5).pvalue (two-sided).
  it.each([
    [6, 0, 0.03125], // binomtest(0, 6)
    [10, 2, 0.03857421875], // binomtest(2, 12)
    [1, 7, 0.0703125], // binomtest(1, 8)
    [3, 3, 1],
    [0, 0, 1],
  ])("lost %i, gained %i → %f", (lost, gained, p) => {
    expect(exactSignTest(lost, gained)).toBeCloseTo(p, 14);
  });
});
