import { describe, expect, it } from "vitest";
import { InputError } from "../../src/core/errors.js";
import { getProblem } from "../../src/problems/index.js";
import { checkKnownMinimum, lastDigitUnit } from "../../src/reference/known-minimum.js";
import { runReferenceChecks } from "../../src/reference/run-checks.js";
import type { RunMetrics } from "../../src/runner/types.js";
import { caseOf, resultsOf, suiteFrom } from "./helpers.js";

// Moré, Garbow & Hillstrom (1981), "Testing Unconstrained Optimization Software", ACM TOMS 7(1):17–41,
// problem 2 (Freudenstein and Roth): f* = 0 at (5, 4); local minimum f = 48.9842 at (11.4128, −0.896805).
const FR_LOCAL = 48.9842;

describe("lastDigitUnit: the resolution of a published value", () => {
  it.each<[number, number]>([
    [48.9842, 1e-4], // MGH 1981 #2 local minimum, 6 significant digits
    [1.12793e-8, 1e-13], // MGH 1981 #9 Gaussian f*
    [3.07505e-4, 1e-9], // MGH 1981 #15 Kowalik–Osborne f*
    [24.2, 0.1],
    [1, 1],
    [0, 0],
  ])("%d → %d", (value, half) => {
    expect(Math.abs(lastDigitUnit(value) - half)).toBeLessThanOrEqual(1e-12 * half); // relative
  });
});

const SUITE = `
seeds: 3
budget: { steps: 20000 }
optimizers:
  - { name: gd, use: sgd, hyper: { lr: 0.001 } }
problems:
  - use: freudenstein-roth
checks:
  minimum:
    - { optimizer: gd, problem: freudenstein-roth, basin: local }
    - { optimizer: gd, problem: freudenstein-roth }
`;

describe("known-minimum check on Freudenstein–Roth (MGH 1981 #2)", () => {
  it("gradient descent settles in the published local basin: that check passes, the global one fails naming the basin", async () => {
    const { suite, checks } = suiteFrom(SUITE);
    const results = await resultsOf(suite);
    const report = await runReferenceChecks({ suite, checks, results });
    const [local, global] = report.cases["gd/default/freudenstein-roth"];
    expect(local).toMatchObject({
      id: "known-minimum:local",
      status: "pass",
      gating: true,
      expected: FR_LOCAL,
      tolerance: { kind: "absolute" },
    });
    // the declared 1e-6 plus one unit in the last published digit (1e-4): MGH print the exact
    // 48.98425367924002 truncated to 48.9842 (relative comparison of the tolerance, 1e-12)
    expect(Math.abs(local.tolerance!.value / (1e-6 + 1e-4) - 1)).toBeLessThanOrEqual(1e-12);
    expect(local.summary).toBe(
      "known minimum (the local basin f = 48.9842 at (11.4128, -0.896805)): 3 of 3 seeds reached it within " +
        "1.0e-6 (absolute) plus 1.0e-4 for the last digit of the published value; largest |f − 48.9842| = 5.4e-5",
    );
    // the exact local minimum is 48.98425367924002 (closed form in src/problems/freudenstein-roth.ts)
    expect(Math.abs(local.measured! - 48.98425367924002)).toBeLessThanOrEqual(1e-9); // absolute
    expect(local.source).toContain("Moré");
    expect(global.status).toBe("fail");
    expect(global.summary).toMatch(
      /^known minimum \(the global minimum f\* = 0\): 0 of 3 seeds reached it within 1\.0e-6 \(absolute\), 3 required: seed 0 ended at f = 48\.98425, the local basin f = 48\.9842 at \(11\.4128, -0\.896805\); seed 1 /,
    );
  });

  it("runs the seeds itself when there are no results, with the same final losses", async () => {
    const { suite, checks } = suiteFrom(SUITE);
    const withResults = await runReferenceChecks({ suite, checks, results: await resultsOf(suite) });
    const own = await runReferenceChecks({ suite, checks });
    expect(own).toEqual(withResults);
  });

  it("names diverged and failed seeds, and honours share", async () => {
    const { suite } = suiteFrom(SUITE);
    const spec = caseOf(suite, "gd/");
    const run = (seed: number, over: Partial<RunMetrics>): RunMetrics => ({
      seed,
      runSeed: "0",
      stop: "steps",
      steps: 100,
      evaluations: 100,
      f0: 400.5,
      finalGap: 48.98425,
      bestGap: 48.98425,
      stepsTo: [],
      evaluationsTo: [],
      divergedAt: null,
      divergence: null,
      rate: null,
      trace: [],
      ...over,
    });
    const runs = [
      run(0, {}),
      run(1, { stop: "diverged", finalGap: null, divergedAt: 37, divergence: "non-finite" }),
      run(2, { stop: "error", finalGap: null, error: "step 3 threw: out of memory" }),
      run(3, { finalGap: 1e-9 }),
      run(4, {}),
    ];
    const base = {
      spec,
      definition: getProblem("freudenstein-roth"),
      suiteSeed: 1,
      basin: "local",
      tolerance: { kind: "relative" as const, value: 1e-6 },
      gating: false,
      runs,
    };
    const all = await checkKnownMinimum({ ...base, share: 1 });
    expect(all.status).toBe("fail");
    expect(all.gating).toBe(false);
    expect(all.summary).toBe(
      "known minimum (the local basin f = 48.9842 at (11.4128, -0.896805)): 2 of 5 seeds reached it within " +
        "1.0e-6 (relative) plus 1.0e-4 for the last digit of the published value, 5 required: " +
        "seed 1 diverged (non-finite) at step 37; seed 2 failed: step 3 threw: out of memory; " +
        "seed 3 ended at f = 1e-9, the global minimum f* = 0",
    );
    // relative: (1e-6·48.9842 + 1e-4)/48.9842
    expect(all.tolerance!.kind).toBe("relative");
    expect(Math.abs(all.tolerance!.value / ((1e-6 * FR_LOCAL + 1e-4) / FR_LOCAL) - 1)).toBeLessThanOrEqual(
      1e-12,
    );
    const some = await checkKnownMinimum({ ...base, share: 0.4 });
    expect(some.status).toBe("pass");
    expect(some.summary).toContain("2 of 5 seeds reached it");
  });

  it.each<[string, string, string]>([
    [
      "an unknown basin",
      "{ optimizer: gd, problem: freudenstein-roth, basin: saddle }",
      'config test.yml: checks.minimum[0].basin "saddle" is not a basin of problem freudenstein-roth (known: global, local)',
    ],
    [
      "a relative tolerance around f* = 0",
      "{ optimizer: gd, problem: freudenstein-roth, tolerance: { kind: relative, value: 1e-6 } }",
      "config test.yml: checks.minimum[0].tolerance: a relative tolerance needs a nonzero target, and freudenstein-roth has f = 0 there; use kind: absolute",
    ],
    [
      "a problem whose f* is only a lower bound",
      "{ optimizer: gd, problem: penalty-2 }",
      "config test.yml: checks.minimum[0]: problem penalty-2(n=3) knows only a lower bound of f*, so it has no known minimum to reach",
    ],
    [
      "an optimizer that is not in the suite",
      "{ optimizer: adam, problem: freudenstein-roth }",
      'config test.yml: checks.minimum[0].optimizer "adam" is not an optimizer of the suite (known: gd)',
    ],
    [
      "a problem the optimizer does not run",
      "{ optimizer: gd, problem: rosenbrock }",
      'config test.yml: checks.minimum[0] matches no case: gd runs freudenstein-roth, penalty-2(n=3) (sets: default), not "rosenbrock"',
    ],
  ])("rejects %s", (_name, check, message) => {
    expect(() =>
      suiteFrom(`
optimizers: [{ name: gd, use: sgd }]
problems: [{ use: freudenstein-roth }, { use: penalty-2, params: { n: 3 } }]
checks: { minimum: [${check}] }
`),
    ).toThrow(new InputError(message));
  });
});
