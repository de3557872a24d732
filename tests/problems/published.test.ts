import { describe, expect, it } from "vitest";
import type { ProblemParams } from "../../src/core/types.js";
import { createProblem, getProblem } from "../../src/problems/index.js";
import { helicalTheta } from "../../src/problems/helical-valley.js";
import { ctx } from "./helpers.js";

// MGH = Moré, Garbow & Hillstrom (1981), "Testing Unconstrained Optimization Software", ACM TOMS
// 7(1):17–41, doi:10.1145/355934.355936, §3 (problem numbers are the paper's). Values marked
// "recomputed" come from tests/problems/fixtures/recompute_mgh.py (Python decimal, 60 digits; its
// output is kept in recompute_mgh.out), rounded to double with float(Decimal(...)).

type Tol = { abs: number } | { rel: number };

function within(actual: number, expected: number, tol: Tol): boolean {
  const err = Math.abs(actual - expected);
  return "abs" in tol ? err <= tol.abs : err <= tol.rel * Math.abs(expected);
}

interface Row {
  name: string;
  params?: ProblemParams;
  x0: number[];
  expected: number;
  tol: Tol;
  source: string;
}

// Published values are checked to one unit in their last printed digit (absolute): MGH prints
// truncated, not rounded, digits (e.g. f* = 2.2499775…e−5 is printed 2.24997e−5). Recomputed values
// are checked to a few ULPs (relative) unless cancellation inside f says otherwise (row comment).

// f(x0) at the standard start.
const F_AT_START: Row[] = [
  {
    name: "rosenbrock",
    x0: [-1.2, 1],
    expected: 24.2,
    tol: { rel: 1e-15 },
    source: "MGH #1 (x0); f(x0) = 100·0.44² + 2.2², exact decimal",
  },
  {
    name: "freudenstein-roth",
    x0: [0.5, -2],
    expected: 400.5,
    tol: { rel: 1e-15 },
    source: "MGH #2 (x0); f(x0) = 19.5² + 4.5², exact",
  },
  {
    name: "powell-badly-scaled",
    x0: [0, 1],
    expected: 1.135262,
    tol: { abs: 1e-6 },
    source: "MGH #3 via SOURCES.md [read, recomputed]",
  },
  {
    name: "powell-badly-scaled",
    x0: [0, 1],
    expected: 1.1352617173483783,
    tol: { rel: 4e-16 },
    source: "recomputed (recompute_mgh.py)",
  },
  {
    name: "brown-badly-scaled",
    x0: [1, 1],
    expected: 9.99998e11,
    tol: { abs: 1e6 },
    source: "MGH #4 via SOURCES.md [read, recomputed]",
  },
  {
    name: "brown-badly-scaled",
    x0: [1, 1],
    expected: 999998000003.0,
    tol: { rel: 4e-16 },
    source: "recomputed: 999998000002.999996000004 (recompute_mgh.py)",
  },
  {
    name: "beale",
    x0: [1, 1],
    expected: 14.203125,
    tol: { rel: 0 },
    source: "MGH #5 (x0); 1.5² + 2.25² + 2.625², exact in binary",
  },
  {
    name: "helical-valley",
    x0: [-1, 0, 0],
    expected: 2500,
    tol: { rel: 0 },
    source: "MGH #7 (x0); θ = ½ so f₁ = −50, exact",
  },
  {
    name: "gaussian",
    x0: [0.4, 1, 0],
    expected: 3.888107e-6,
    tol: { abs: 1e-12 },
    source: "MGH #9 via SOURCES.md [read, recomputed]",
  },
  {
    name: "gaussian",
    x0: [0.4, 1, 0],
    expected: 3.888106991166661e-6,
    tol: { rel: 1e-12 },
    source:
      "recomputed (recompute_mgh.py); relative 1e−12 because the residuals x₁eᵢ − yᵢ ≈ 1e−3 cancel about three digits",
  },
  {
    name: "powell-singular",
    x0: [3, -1, 0, 1],
    expected: 215,
    tol: { rel: 0 },
    source: "MGH #13 via SOURCES.md; 49 + 5 + 1 + 160, exact",
  },
  {
    name: "wood",
    x0: [-3, -1, -3, -1],
    expected: 19192,
    tol: { rel: 0 },
    source: "MGH #14 via SOURCES.md; exact",
  },
  {
    name: "extended-rosenbrock",
    params: { n: 10 },
    x0: [-1.2, 1, -1.2, 1, -1.2, 1, -1.2, 1, -1.2, 1],
    expected: 121,
    tol: { rel: 1e-14 },
    source: "MGH #21 via SOURCES.md: 24.2·n/2",
  },
  {
    name: "penalty-1",
    x0: [1, 2, 3, 4],
    expected: 885.0626,
    tol: { abs: 1e-4 },
    source: "MGH #23 (n = 4) via SOURCES.md [read, recomputed]",
  },
  {
    name: "penalty-1",
    x0: [1, 2, 3, 4],
    expected: 885.06264,
    tol: { rel: 4e-16 },
    source: "recomputed: 1e−5·14 + 29.75², exact decimal",
  },
  {
    name: "penalty-2",
    x0: [0.5, 0.5, 0.5, 0.5],
    expected: 2.340009,
    tol: { abs: 1e-6 },
    source: "MGH #24 (n = 4) via SOURCES.md [read, recomputed]",
  },
  {
    name: "penalty-2",
    x0: [0.5, 0.5, 0.5, 0.5],
    expected: 2.3400088054630244,
    tol: { rel: 1e-14 },
    source: "recomputed (recompute_mgh.py)",
  },
];

describe("f at the standard start", () => {
  it.each(F_AT_START)("$name $params: f(x0) = $expected ($source)", ({ name, params, x0, expected, tol }) => {
    const inst = createProblem(name, params ?? {}, ctx());
    const x = new Float64Array(inst.dim);
    inst.start(x, null);
    expect(Array.from(x)).toEqual(x0);
    const f = inst.objective(x);
    expect(within(f, expected, tol), `f(x0) = ${f}`).toBe(true);
  });
});

interface StarRow {
  name: string;
  params?: ProblemParams;
  /** The instance's fStar against this value. */
  fStar: number;
  fStarTol: Tol;
  /** objective(xStar) against the instance's fStar. */
  atXStar: Tol;
  kind: string;
  source: string;
}

const F_STAR: StarRow[] = [
  {
    name: "rosenbrock",
    fStar: 0,
    fStarTol: { abs: 0 },
    atXStar: { abs: 0 },
    kind: "published",
    source: "MGH #1: 0 at (1, 1)",
  },
  {
    name: "freudenstein-roth",
    fStar: 0,
    fStarTol: { abs: 0 },
    atXStar: { abs: 0 },
    kind: "published",
    source: "MGH #2: 0 at (5, 4)",
  },
  // x* rounded to double leaves residuals of a few ULPs: f(x*) ~ 1e−32.
  {
    name: "powell-badly-scaled",
    fStar: 0,
    fStarTol: { abs: 0 },
    atXStar: { abs: 1e-28 },
    kind: "published",
    source: "MGH #3: 0 at (1.098…e−5, 9.106…)",
  },
  {
    name: "brown-badly-scaled",
    fStar: 0,
    fStarTol: { abs: 0 },
    atXStar: { abs: 1e-28 },
    kind: "published",
    source: "MGH #4: 0 at (1e6, 2e−6)",
  },
  {
    name: "beale",
    fStar: 0,
    fStarTol: { abs: 0 },
    atXStar: { abs: 0 },
    kind: "published",
    source: "MGH #5: 0 at (3, 0.5)",
  },
  {
    name: "helical-valley",
    fStar: 0,
    fStarTol: { abs: 0 },
    atXStar: { abs: 0 },
    kind: "published",
    source: "MGH #7: 0 at (1, 0, 0)",
  },
  {
    name: "gaussian",
    fStar: 1.12793e-8,
    fStarTol: { abs: 1e-13 },
    atXStar: { rel: 1e-12 },
    kind: "published",
    source: "MGH #9: 1.12793e−8",
  },
  {
    name: "gaussian",
    fStar: 1.127932769618648e-8,
    fStarTol: { rel: 1e-15 },
    atXStar: { rel: 1e-12 },
    kind: "published",
    source: "recomputed (recompute_mgh.py)",
  },
  {
    name: "powell-singular",
    fStar: 0,
    fStarTol: { abs: 0 },
    atXStar: { abs: 0 },
    kind: "published",
    source: "MGH #13: 0 at the origin",
  },
  {
    name: "wood",
    fStar: 0,
    fStarTol: { abs: 0 },
    atXStar: { abs: 0 },
    kind: "published",
    source: "MGH #14: 0 at (1, 1, 1, 1)",
  },
  {
    name: "extended-rosenbrock",
    params: { n: 1000 },
    fStar: 0,
    fStarTol: { abs: 0 },
    atXStar: { abs: 0 },
    kind: "published",
    source: "MGH #21: 0 at all ones",
  },
  {
    name: "penalty-1",
    fStar: 2.24997e-5,
    fStarTol: { abs: 1e-10 },
    atXStar: { rel: 0 },
    kind: "published",
    source: "MGH #23, n = 4: 2.24997e−5",
  },
  {
    name: "penalty-1",
    fStar: 2.249977500899937e-5,
    fStarTol: { rel: 1e-13 },
    atXStar: { rel: 0 },
    kind: "published",
    source: "recomputed (recompute_mgh.py), n = 4",
  },
  {
    name: "penalty-1",
    params: { n: 10 },
    fStar: 7.08765e-5,
    fStarTol: { abs: 1e-10 },
    atXStar: { rel: 0 },
    kind: "published",
    source: "MGH #23, n = 10: 7.08765e−5",
  },
  {
    name: "penalty-1",
    params: { n: 10 },
    fStar: 7.087651467090369e-5,
    fStarTol: { rel: 1e-13 },
    atXStar: { rel: 0 },
    kind: "published",
    source: "recomputed (recompute_mgh.py), n = 10",
  },
  {
    name: "penalty-2",
    fStar: 9.37629e-6,
    fStarTol: { abs: 1e-11 },
    atXStar: { rel: 1e-12 },
    kind: "published",
    source: "MGH #24, n = 4: 9.37629e−6",
  },
  {
    name: "penalty-2",
    params: { n: 10 },
    fStar: 2.9366e-4,
    fStarTol: { abs: 1e-9 },
    atXStar: { rel: 1e-12 },
    kind: "published",
    source: "MGH #24, n = 10: 2.93660e−4",
  },
  {
    name: "saddle",
    fStar: -0.25,
    fStarTol: { abs: 0 },
    atXStar: { abs: 0 },
    kind: "computed",
    source: "derived: ¼(y² − 1)² − ¼ + ½x²",
  },
  {
    name: "plateau",
    fStar: 0,
    fStarTol: { abs: 0 },
    atXStar: { abs: 0 },
    kind: "computed",
    source: "by construction",
  },
  {
    name: "quadratic",
    fStar: 0,
    fStarTol: { abs: 0 },
    atXStar: { abs: 0 },
    kind: "computed",
    source: "by construction",
  },
];

describe("f* and x*", () => {
  it.each(F_STAR)(
    "$name $params: f* = $fStar ($source)",
    ({ name, params, fStar, fStarTol, atXStar, kind }) => {
      const inst = createProblem(name, params ?? {}, ctx());
      expect(inst.fStarKind).toBe(kind);
      expect(within(inst.fStar, fStar, fStarTol), `fStar = ${inst.fStar}`).toBe(true);
      expect(inst.xStar).not.toBeNull();
      const f = inst.objective(inst.xStar!);
      expect(within(f, inst.fStar, atXStar), `f(x*) = ${f}`).toBe(true);
    },
  );

  it("Penalty I's minimiser has the 60-digit coordinates for n = 4 and 10 (relative 1e−15)", () => {
    // recompute_mgh.py: t = 0.2500074995875378707… (n = 4), 0.1581223011131163550… (n = 10)
    for (const [n, t] of [
      [4, 0.2500074995875379],
      [10, 0.15812230111311634],
    ] as const) {
      const xs = createProblem("penalty-1", { n }, ctx()).xStar!;
      for (const v of xs) expect(Math.abs(v - t)).toBeLessThanOrEqual(1e-15 * t);
    }
  });

  it("Penalty I at other n is computed, a true minimum (gradient 0 within 1e−15 absolute)", () => {
    const inst = createProblem("penalty-1", { n: 7 }, ctx());
    expect(inst.fStarKind).toBe("computed");
    const g = new Float64Array(7);
    inst.evaluate(inst.xStar!, g);
    for (const v of g) expect(Math.abs(v)).toBeLessThanOrEqual(1e-15);
  });

  it("Penalty II at other n gives 0 as a lower bound and no x*", () => {
    const inst = createProblem("penalty-2", { n: 6 }, ctx());
    expect(inst.fStarKind).toBe("lower-bound");
    expect(inst.fStar).toBe(0);
    expect(inst.xStar).toBeNull();
  });

  it("Powell badly scaled x* agrees with the published digits (relative 5e−7)", () => {
    // SOURCES.md (MGH #3) [read, recomputed]: (1.098159e−5, 9.106147)
    const xs = createProblem("powell-badly-scaled", {}, ctx()).xStar!;
    expect(Math.abs(xs[0] - 1.098159e-5)).toBeLessThanOrEqual(5e-7 * 1.098159e-5);
    expect(Math.abs(xs[1] - 9.106147)).toBeLessThanOrEqual(5e-7 * 9.106147);
  });

  it("gradients vanish at the recomputed minimisers (absolute, scaled to the problem)", () => {
    const rows: [string, ProblemParams, number][] = [
      ["powell-badly-scaled", {}, 1e-10], // ∂f/∂x₁ carries a factor 2·10⁴·x₂ ≈ 2e5
      ["gaussian", {}, 1e-15],
      ["penalty-2", {}, 1e-15],
      ["penalty-2", { n: 10 }, 1e-15],
    ];
    for (const [name, params, tol] of rows) {
      const inst = createProblem(name, params, ctx());
      const g = new Float64Array(inst.dim);
      inst.evaluate(inst.xStar!, g);
      for (const v of g) expect(Math.abs(v), name).toBeLessThanOrEqual(tol);
    }
  });
});

describe("Freudenstein–Roth local basin", () => {
  const basin = getProblem("freudenstein-roth").basins![0];

  it("declares MGH's local minimum 48.9842 at (11.4128, −0.896805)", () => {
    expect(basin.f).toBe(48.9842);
    expect(basin.x).toEqual([11.4128, -0.896805]);
    expect(basin.source).toContain("problem 2");
  });

  it("is a stationary point: closed form x₂ = (2 − √22)/3, x₁ = 21 − 3x₂² + 8x₂ (derived in the source)", () => {
    const x2 = (2 - Math.sqrt(22)) / 3;
    const x1 = 21 - 3 * x2 * x2 + 8 * x2;
    // recompute_mgh.py: x₁ = 11.41277898690209…, x₂ = −0.89680525327447…, f = 48.98425367924002…
    expect(Math.abs(x1 - 11.412778986902094)).toBeLessThanOrEqual(1e-14 * 11.4);
    expect(Math.abs(x2 - -0.8968052532744765)).toBeLessThanOrEqual(1e-15);
    const inst = createProblem("freudenstein-roth", {}, ctx());
    const g = new Float64Array(2);
    const f = inst.evaluate(new Float64Array([x1, x2]), g);
    expect(Math.abs(f - 48.98425367924002)).toBeLessThanOrEqual(1e-13 * 49);
    expect(Math.abs(g[0])).toBeLessThanOrEqual(1e-11);
    expect(Math.abs(g[1])).toBeLessThanOrEqual(1e-11);
    // the paper's digits: its 48.9842 is 48.984253… truncated, so one unit in the last digit (absolute)
    expect(Math.abs(f - basin.f)).toBeLessThanOrEqual(1e-4);
    expect(Math.abs(x1 - basin.x[0])).toBeLessThanOrEqual(1e-4);
    expect(Math.abs(x2 - basin.x[1])).toBeLessThanOrEqual(1e-6);
    // and it is a local minimum, not a saddle: f grows in every direction of a small circle
    for (let k = 0; k < 16; k++) {
      const a = (2 * Math.PI * k) / 16;
      expect(
        inst.objective(new Float64Array([x1 + 1e-3 * Math.cos(a), x2 + 1e-3 * Math.sin(a)])),
      ).toBeGreaterThan(f);
    }
  });
});

describe("helical valley θ", () => {
  // The paper's definition (MGH #7): 2πθ = arctan(x₂/x₁) for x₁ > 0, arctan(x₂/x₁) + π for x₁ < 0.
  const paper = (x1: number, x2: number) => (Math.atan(x2 / x1) + (x1 < 0 ? Math.PI : 0)) / (2 * Math.PI);
  const pts: [number, number][] = [
    [1, 0],
    [1, 2],
    [1, -2],
    [-1, 0],
    [-1, 1e-9],
    [-1, -1e-9],
    [-0.3, 2],
    [-0.3, -2],
    [0.2, -5],
  ];
  it.each(pts)("θ(%d, %d) equals the paper's arctan form (absolute 4e−16, 2 ULPs below 1)", (x1, x2) => {
    expect(Math.abs(helicalTheta(x1, x2) - paper(x1, x2))).toBeLessThanOrEqual(4e-16);
  });

  it("is continuous through the standard start and defined on x₁ = 0", () => {
    expect(helicalTheta(-1, 0)).toBe(0.5);
    expect(helicalTheta(-1, -0)).toBe(0.5);
    expect(Math.abs(helicalTheta(-1, 1e-12) - helicalTheta(-1, -1e-12))).toBeLessThan(1e-12);
    expect(helicalTheta(0, 3)).toBe(0.25);
    expect(helicalTheta(0, -3)).toBe(-0.25);
    const inst = createProblem("helical-valley", {}, ctx());
    const g = new Float64Array(3);
    expect(Number.isFinite(inst.evaluate(new Float64Array([0, 0, 0.5]), g))).toBe(true);
    expect(Array.from(g).every(Number.isFinite)).toBe(true);
  });
});
