import { describe, expect, it } from "vitest";
import { equivalenceSignedRank } from "../../../src/compare/stats/equivalence.js";
import { wilcoxonSignedRank } from "../../../src/compare/stats/wilcoxon.js";
import { expectRelative } from "./helpers.js";

const D10 = [0.12, -0.05, 0.31, 0.08, 0.22, -0.11, 0.17, 0.4, 0.03, 0.26];
const D60 = [
  0.55359, -0.10087, -0.44194, -1.4484, -1.64377, 1.62059, -1.35544, -0.6083, -1.04865, 0.25377, -1.18436,
  -1.11334, 0.62717, 0.40025, -0.15702, 1.44192, 1.64157, 0.62985, -0.49783, 0.91718, 0.68614, 2.48978,
  0.65384, 1.1182, 0.16118, 2.55103, 0.2398, 2.04602, 2.70713, -0.56736, -0.96374, -0.64723, -0.69743,
  0.07449, -1.28774, 0.92557, 0.58124, -0.85947, -0.1048, 2.44903, 0.34652, 0.56367, 0.63377, -1.32147,
  1.16982, 1.50376, -1.71387, 0.88824, -0.71337, 0.26249, -0.27617, -0.0573, -2.19257, -1.2758, 0.35099,
  -0.86853, 0.48286, -0.58124, -0.05229, 0.96259,
];

// Each leg's expected p-value: scipy.stats.wilcoxon on the explicitly shifted sample, scipy 1.10.1
// (tests/compare/stats/reference/scipy_reference.py). [d, δ, pLower (call), pUpper (call), tolerance]
const ROWS: { name: string; d: number[]; margin: number; pLower: number; pUpper: number; tol: number }[] = [
  {
    // wilcoxon([v + 0.3 for v in d10], alternative='greater') -> 0.0009765625
    // wilcoxon([v - 0.3 for v in d10], alternative='less')    -> 0.009765625
    name: "d10, δ = 0.3 (exact legs)",
    d: D10,
    margin: 0.3,
    pLower: 0.0009765625,
    pUpper: 0.009765625,
    tol: 0,
  },
  {
    // wilcoxon([v + 0.2 for v in d10], alternative='greater') -> 0.0009765625
    // wilcoxon([v - 0.2 for v in d10], alternative='less')    -> 0.1611328125
    name: "d10, δ = 0.2 (exact legs, not equivalent at 5%)",
    d: D10,
    margin: 0.2,
    pLower: 0.0009765625,
    pUpper: 0.1611328125,
    tol: 0,
  },
  {
    // wilcoxon([v + 0.1 for v in d10], alternative='greater')                -> 0.001953125
    // wilcoxon([v - 0.1 for v in d10], alternative='less', mode='approx')   -> 0.7623770839304097
    // (|0.07| occurs twice after the shift: our "auto" uses the normal approximation for that leg)
    name: "d10, δ = 0.1 (a tie in the upper leg)",
    d: D10,
    margin: 0.1,
    pLower: 0.001953125,
    pUpper: 0.7623770839304097,
    tol: 1e-14,
  },
  {
    // wilcoxon([v + 0.5 for v in d60], alternative='greater') -> 0.00011293942347263628
    // wilcoxon([v - 0.5 for v in d60], alternative='less')    -> 0.008200165893812254
    name: "d60, δ = 0.5 (normal legs)",
    d: D60,
    margin: 0.5,
    pLower: 0.00011293942347263628,
    pUpper: 0.008200165893812254,
    tol: 1e-14,
  },
];

describe("equivalenceSignedRank (TOST with Wilcoxon legs)", () => {
  it.each(ROWS)("$name", (row) => {
    const r = equivalenceSignedRank(row.d, row.margin);
    expectRelative(r.pLower, row.pLower, row.tol, "pLower");
    expectRelative(r.pUpper, row.pUpper, row.tol, "pUpper");
    expect(r.pValue).toBe(Math.max(r.pLower, r.pUpper));
    expect(r.lowerTest.alternative).toBe("greater");
    expect(r.upperTest.alternative).toBe("less");
  });

  it("equals two explicit signed-rank tests on copies d + δ and d − δ (no copy is made internally)", () => {
    const r = equivalenceSignedRank(D60, 0.25, { continuity: true });
    const lower = wilcoxonSignedRank(
      D60.map((v) => v + 0.25),
      { alternative: "greater", continuity: true },
    );
    const upper = wilcoxonSignedRank(
      D60.map((v) => v - 0.25),
      { alternative: "less", continuity: true },
    );
    expect(r.lowerTest).toEqual(lower);
    expect(r.upperTest).toEqual(upper);
  });

  it("cannot show equivalence when the shift sits outside the margin", () => {
    const shifted = D10.map((v) => v + 0.5);
    expect(equivalenceSignedRank(shifted, 0.2).pValue).toBeGreaterThan(0.5);
  });

  it("rejects a margin that is not a positive finite number", () => {
    expect(() => equivalenceSignedRank(D10, 0)).toThrow(
      "equivalenceSignedRank: margin must be a finite number greater than 0, got 0",
    );
    expect(() => equivalenceSignedRank(D10, -0.1)).toThrow(
      "equivalenceSignedRank: margin must be a finite number greater than 0, got -0.1",
    );
  });
});
