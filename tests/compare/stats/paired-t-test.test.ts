import { describe, expect, it } from "vitest";
import { pairedTTest } from "../../../src/compare/stats/paired-t-test.js";
import { expectRelative } from "./helpers.js";

const EX = [1.1, 2.3, 0.4, -0.5, 3.2, 1.7, 0.9, 2.2];
const D20 = [
  -0.027, -0.6743, 0.7946, 0.725, -0.1412, 0.2003, -1.5037, -0.5824, 0.5166, 0.8955, 0.291, -0.5228, -0.0551,
  0.8253, -1.0667, 1.5048, 0.0714, -0.505, -0.7395, -0.8292,
];

// scipy.stats.ttest_1samp(d, 0, alternative=...), scipy 1.10.1 (tests/compare/stats/reference/scipy_reference.py).
const ROWS: [string, number[], "two-sided" | "greater" | "less", number, number][] = [
  ["ttest_1samp(ex, 0)", EX, "two-sided", 3.388862501351209, 0.011617430245917828],
  ["ttest_1samp(ex, 0, alternative='greater')", EX, "greater", 3.388862501351209, 0.005808715122958914],
  ["ttest_1samp(ex, 0, alternative='less')", EX, "less", 3.388862501351209, 0.9941912848770411],
  ["ttest_1samp(d20, 0)", D20, "two-sided", -0.2390184472760283, 0.8136505271476842],
];

describe("pairedTTest against scipy.stats.ttest_1samp (scipy 1.10.1)", () => {
  it.each(ROWS)("%s", (_call, d, alternative, t, p) => {
    const r = pairedTTest(d, { alternative });
    expectRelative(r.t, t, 1e-14, "t");
    expectRelative(r.pValue, p, 1e-13, "p");
    expect(r.df).toBe(d.length - 1);
  });

  it("follows the reference library on degenerate samples (sd = 0)", () => {
    const constant = pairedTTest([0.2, 0.2, 0.2]);
    expect(constant.t).toBe(Infinity);
    expect(constant.pValue).toBe(0);
    expect(pairedTTest([0.2, 0.2, 0.2], { alternative: "less" }).pValue).toBe(1);
    const zeros = pairedTTest([0, 0, 0, 0]);
    expect(zeros.t).toBeNaN();
    expect(zeros.pValue).toBeNaN();
  });

  it("rejects fewer than two differences", () => {
    expect(() => pairedTTest([1])).toThrow("pairedTTest: d must hold at least 2 finite numbers, got 1");
  });
});
