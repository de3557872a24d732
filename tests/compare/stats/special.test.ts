import { describe, expect, it } from "vitest";
import { incompleteBeta } from "../../../src/compare/stats/incomplete-beta.js";
import { logBeta, logGamma } from "../../../src/compare/stats/log-gamma.js";
import { studentTCdf, studentTSf, studentTTwoTail } from "../../../src/compare/stats/student-t.js";
import { normalCdf } from "../../../src/compare/stats/normal-cdf.js";
import { expectAbsolute, expectRelative } from "./helpers.js";

// Expected values: scipy 1.10.1 (Debian 12), produced by tests/compare/stats/reference/scipy_reference.py.

// [x, scipy.special.gammaln(x)]
const GAMMALN: [number, number][] = [
  [1e-5, 11.512919692895826],
  [0.5, 0.5723649429247],
  [1, 0.0],
  [1.5, -0.12078223763524526],
  [2, 0.0],
  [3.7, 1.428072326665388],
  [10, 12.801827480081469],
  [14.9, 24.924132002217277],
  [15, 25.191221182738683],
  [100.5, 361.43554046777757],
  [100000.0, 1051287.7089736569],
];

// [a, b, x, scipy.special.betainc(a, b, x)] — rows on both sides of the split x = (a+1)/(a+b+2).
const BETAINC: [number, number, number, number][] = [
  [0.5, 0.5, 0.3, 0.3690101195655454],
  [2, 3, 0.4, 0.5247999999999999],
  [5, 0.5, 0.9, 0.316642915020012],
  [0.5, 5, 0.01, 0.24284189089843752],
  [50, 0.5, 0.99, 0.31730439787419623],
  [10, 10, 0.5, 0.5000000000000002],
  [1.5, 2.5, 0.999, 0.9999999356016206],
];

// [df, t, scipy.stats.t.cdf(t, df), scipy.stats.t.sf(t, df)]
const T_TABLE: [number, number, number, number][] = [
  [1, -50, 0.006365349100972797, 0.9936346508990271],
  [1, -4, 0.07797913037736932, 0.9220208696226307],
  [1, -2.1, 0.141463028121509, 0.858536971878491],
  [1, -0.7, 0.3055998877857853, 0.6944001122142147],
  [1, 0, 0.5, 0.5],
  [1, 0.7, 0.6944001122142147, 0.3055998877857853],
  [1, 2.1, 0.858536971878491, 0.141463028121509],
  [1, 4, 0.9220208696226307, 0.07797913037736932],
  [1, 50, 0.9936346508990271, 0.006365349100972797],
  [2, -50, 0.00019988007994404026, 0.999800119920056],
  [2, -4, 0.028595479208968315, 0.9714045207910317],
  [2, -2.1, 0.08527493459498373, 0.9147250654050163],
  [2, -0.7, 0.2781965123164327, 0.7218034876835673],
  [2, 0, 0.5, 0.5],
  [2, 0.7, 0.7218034876835673, 0.2781965123164327],
  [2, 2.1, 0.9147250654050163, 0.08527493459498373],
  [2, 4, 0.9714045207910317, 0.028595479208968315],
  [2, 50, 0.999800119920056, 0.00019988007994404026],
  [3, -50, 8.808576020635976e-6, 0.9999911914239793],
  [3, -4, 0.014004228005073078, 0.9859957719949269],
  [3, -2.1, 0.06328260127484227, 0.9367173987251578],
  [3, -0.7, 0.2671634991523818, 0.7328365008476182],
  [3, 0, 0.5, 0.5],
  [3, 0.7, 0.7328365008476182, 0.2671634991523818],
  [3, 2.1, 0.9367173987251578, 0.06328260127484227],
  [3, 4, 0.9859957719949269, 0.014004228005073078],
  [3, 50, 0.9999911914239793, 8.808576020635976e-6],
  [5, -50, 3.023878813300617e-8, 0.9999999697612119],
  [5, -4, 0.005161707740415726, 0.9948382922595843],
  [5, -2.1, 0.04487662494229934, 0.9551233750577007],
  [5, -0.7, 0.25757447415740825, 0.7424255258425918],
  [5, 0, 0.5, 0.5],
  [5, 0.7, 0.7424255258425918, 0.25757447415740825],
  [5, 2.1, 0.9551233750577007, 0.04487662494229934],
  [5, 4, 0.9948382922595843, 0.005161707740415726],
  [5, 50, 0.9999999697612119, 3.023878813300617e-8],
  [9.5, -50, 3.957932717410373e-13, 0.9999999999996042],
  [9.5, -4, 0.0013950037837556649, 0.9986049962162443],
  [9.5, -2.1, 0.03175799188177527, 0.9682420081182247],
  [9.5, -0.7, 0.2503544127117649, 0.749645587288235],
  [9.5, 0, 0.5, 0.5],
  [9.5, 0.7, 0.749645587288235, 0.2503544127117649],
  [9.5, 2.1, 0.9682420081182247, 0.03175799188177527],
  [9.5, 4, 0.9986049962162443, 0.0013950037837556649],
  [9.5, 50, 0.9999999999996042, 3.957932717410373e-13],
  [29, -50, 5.374311992786225e-30, 1.0],
  [29, -4, 0.00020003197282624573, 0.9997999680271737],
  [29, -2.1, 0.022270979018145235, 0.9777290209818548],
  [29, -0.7, 0.24475257430724184, 0.7552474256927582],
  [29, 0, 0.5, 0.5],
  [29, 0.7, 0.7552474256927582, 0.24475257430724184],
  [29, 2.1, 0.9777290209818548, 0.022270979018145235],
  [29, 4, 0.9997999680271737, 0.00020003197282624573],
  [29, 50, 1.0, 5.374311992786225e-30],
  [100, -50, 7.23608183988067e-73, 1.0],
  [100, -4, 6.076182215038079e-5, 0.9999392381778497],
  [100, -2.1, 0.019122627910640455, 0.9808773720893595],
  [100, -0.7, 0.24277630322718685, 0.7572236967728132],
  [100, 0, 0.5, 0.5],
  [100, 0.7, 0.7572236967728132, 0.24277630322718685],
  [100, 2.1, 0.9808773720893595, 0.019122627910640455],
  [100, 4, 0.9999392381778497, 6.076182215038079e-5],
  [100, 50, 1.0, 7.23608183988067e-73],
  [1000, -50, 1.3793362061624403e-274, 1.0],
  [1000, -4, 3.4004959604390776e-5, 0.9999659950403956],
  [1000, -2.1, 0.01798943715539097, 0.982010562844609],
  [1000, -0.7, 0.24204505699630124, 0.7579549430036987],
  [1000, 0, 0.5, 0.5],
  [1000, 0.7, 0.7579549430036987, 0.24204505699630124],
  [1000, 2.1, 0.982010562844609, 0.01798943715539097],
  [1000, 4, 0.9999659950403956, 3.4004959604390776e-5],
  [1000, 50, 1.0, 1.3793362061624403e-274],
];

/**
 * Relative tolerance per df. Measured worst cases: 8e−15 (ν ≤ 100) and 9e−14 for ν = 1000, where the
 * far tail (t = ±50, p ≈ 1e−274) carries the rounding of the exponent a·ln x ≈ −600.
 */
function tTolerance(df: number): number {
  return df <= 100 ? 3e-14 : 3e-13;
}

// [df, scipy.stats.t.cdf(-1.7, df)] for large df (checks the log1p and log-gamma-ratio paths).
const T_LARGE_DF: [number, number][] = [
  [1e4, 0.04458101136385253],
  [1e5, 0.04456701762433148],
  [1e6, 0.04456561824517436],
];

describe("logGamma / logBeta (Stirling series with shift)", () => {
  it.each(GAMMALN)(
    "ln Γ(%s) matches scipy.special.gammaln within 1e-14 absolute + 1e-15 relative",
    (x, expected) => {
      expectAbsolute(logGamma(x), expected, 1e-14 + 1e-15 * Math.abs(expected), `logGamma(${x})`);
    },
  );

  it("satisfies ln B(a, b) = ln B(b, a) and ln B(1, b) = −ln b (absolute 1e-14)", () => {
    expectAbsolute(logBeta(2.5, 7), logBeta(7, 2.5), 1e-14, "symmetry");
    expectAbsolute(logBeta(1, 4), -Math.log(4), 1e-14, "logBeta(1, 4)");
  });

  it("rejects x ≤ 0", () => {
    expect(() => logGamma(0)).toThrow("logGamma: x must be a number greater than 0, got 0");
    expect(() => logGamma(-1)).toThrow("logGamma: x must be a number greater than 0, got -1");
  });
});

describe("incompleteBeta (continued fraction, DLMF 8.17.22)", () => {
  it.each(BETAINC)(
    "I_x(%s, %s) at x = %s matches scipy.special.betainc within 1e-13 relative",
    (a, b, x, expected) => {
      expectRelative(incompleteBeta(x, a, b), expected, 1e-13, `incompleteBeta(${x}, ${a}, ${b})`);
    },
  );

  it("is 0 at x = 0, 1 at x = 1, and equals the closed form I_x(1, 1) = x", () => {
    expect(incompleteBeta(0, 2, 3)).toBe(0);
    expect(incompleteBeta(1, 2, 3)).toBe(1);
    expectRelative(incompleteBeta(0.37, 1, 1), 0.37, 1e-14, "I_0.37(1, 1)");
  });

  it("rejects bad arguments with the expected form", () => {
    expect(() => incompleteBeta(1.2, 1, 1)).toThrow("incompleteBeta: x must be a number in [0, 1], got 1.2");
    expect(() => incompleteBeta(0.5, 0, 1)).toThrow(
      "incompleteBeta: a must be a finite number greater than 0, got 0",
    );
  });
});

describe("Student t distribution", () => {
  it.each(T_TABLE)(
    "df %s, t %s: cdf and sf match scipy.stats.t within the df's relative tolerance",
    (df, t, cdf, sf) => {
      expectRelative(studentTCdf(t, df), cdf, tTolerance(df), `studentTCdf(${t}, ${df})`);
      expectRelative(studentTSf(t, df), sf, tTolerance(df), `studentTSf(${t}, ${df})`);
    },
  );

  it("df = 1 is the Cauchy distribution: P(T ≤ t) = ½ + atan(t)/π (closed form, 1e-14 relative)", () => {
    // The closed form itself loses ≈ 2 digits to cancellation at t = −30, hence 1e-14.
    for (const t of [-30, -1, 0.25, 3]) {
      expectRelative(studentTCdf(t, 1), 0.5 + Math.atan(t) / Math.PI, 1e-14, `Cauchy cdf at ${t}`);
    }
  });

  it("df = ∞ is the standard normal", () => {
    expect(studentTCdf(-1.7, Infinity)).toBe(normalCdf(-1.7));
  });

  it.each(T_LARGE_DF)("df %s: cdf(−1.7) matches scipy.stats.t.cdf within 5e-14 relative", (df, expected) => {
    expectRelative(studentTCdf(-1.7, df), expected, 5e-14, `studentTCdf(-1.7, ${df})`);
  });

  it("two-tail equals twice the lower tail, and survives t beyond 1e100", () => {
    expectRelative(studentTTwoTail(-2.1, 5), 2 * 0.04487662494229934, 5e-14, "two-tail df 5");
    // df = 1: P(|T| ≥ t) = 1 − 2 atan(t)/π ≈ 2/(π t) for huge t (closed form).
    expectRelative(studentTTwoTail(1e200, 1), 2 / (Math.PI * 1e200), 1e-12, "two-tail at 1e200");
    expect(studentTTwoTail(Infinity, 3)).toBe(0);
  });

  it("rejects a bad df or t", () => {
    expect(() => studentTCdf(1, 0)).toThrow(
      "studentTCdf: df must be a number greater than 0 (Infinity allowed), got 0",
    );
    expect(() => studentTSf(NaN, 3)).toThrow("studentTSf: t must be a number, got NaN");
  });
});
