import { describe, expect, it } from "vitest";
import { buildBaselineFiles } from "../../src/baselines/build.js";
import { compareResults } from "../../src/compare/compare.js";
import { InputError } from "../../src/core/errors.js";
import { applyReferenceChecks } from "../../src/reference/merge.js";
import { referenceSourceFor, runReferenceChecks } from "../../src/reference/run-checks.js";
import { buildResults } from "../../src/runner/results.js";
import { resultsOf, sourceOf, suiteFrom } from "./helpers.js";
import { userNesterov } from "./wrong-optimizers.js";

const ENV = { node: "v20.0.0", platform: "linux", arch: "x64" };

/** A suite with one check of every kind; `nag` is the optimizer under test (`use` chosen by the test). */
const suiteText = (nagUse: string, gating: boolean) => `
seeds: 2
budget: { steps: 20000 }
optimizers:
  - { name: gd, use: sgd, hyper: { lr: 0.001 } }
  - { name: nag, use: "${nagUse}", hyper: { lr: 0.01, momentum: 0.8 } }
problems:
  - { use: freudenstein-roth, optimizers: [gd] }
  - { use: quadratic, params: { n: 4 }, optimizers: [nag], budget: { steps: 600 } }
  - { use: noisy-quadratic, params: { n: 2, kappa: 4 }, optimizers: [gd], budget: { steps: 100 } }
checks:
  minimum:
    - { optimizer: gd, problem: freudenstein-roth, basin: local }
  rate:
    - { optimizer: nag, problem: quadratic, method: nesterov, gating: ${gating} }
  stationary:
    - { optimizer: gd, problem: noisy-quadratic, precision: 0.05 }
  conformance:
    - { optimizer: nag, method: nesterov, gating: ${gating} }
`;

const sourceFor = (use: string) =>
  use === "test:heavy-ball" ? sourceOf(userNesterov({ dropLookahead: true })) : referenceSourceFor(use);

describe("runReferenceChecks", () => {
  it("reports per case in suite order and conformance at gate level; the reference optimizers pass everything", async () => {
    const { suite, checks } = suiteFrom(suiteText("nesterov", true));
    const report = await runReferenceChecks({ suite, checks, results: await resultsOf(suite) });
    expect(Object.keys(report.cases)).toEqual([
      "gd/default/freudenstein-roth",
      "gd/default/noisy-quadratic(kappa=4,n=2)",
      "nag/default/quadratic(n=4)",
    ]);
    const summary = (list: readonly { id: string; status: string }[]) =>
      list.map((c) => `${c.id} ${c.status}`);
    expect(summary(report.cases["gd/default/freudenstein-roth"])).toEqual(["known-minimum:local pass"]);
    expect(summary(report.cases["gd/default/noisy-quadratic(kappa=4,n=2)"])).toEqual([
      "stationary-variance pass",
    ]);
    expect(summary(report.cases["nag/default/quadratic(n=4)"])).toEqual(["rate:nesterov pass"]);
    expect(summary(report.gate)).toEqual([
      "conformance:nag pass",
      "conformance:nag:form pass",
      "conformance:nag:lrPlacement pass",
    ]);
    for (const r of [...Object.values(report.cases).flat(), ...report.gate])
      expect(r.source.length).toBeGreaterThan(10);
  });

  it("is deterministic: the same suite gives the same report", async () => {
    const { suite, checks } = suiteFrom(suiteText("nesterov", true));
    const results = await resultsOf(suite);
    expect(await runReferenceChecks({ suite, checks, results })).toEqual(
      await runReferenceChecks({ suite, checks, results }),
    );
  });

  it("refuses an optimizer it has no way to run", async () => {
    const { suite, checks } = suiteFrom(suiteText("test:heavy-ball", true));
    await expect(runReferenceChecks({ suite, checks, results: [] })).rejects.toThrow(
      new InputError(
        'reference checks: no way to run "test:heavy-ball" was given (only reference optimizers run by default)',
      ),
    );
  });
});

describe("applyReferenceChecks: reference results beside the baseline drift", () => {
  async function verdictFor(gating: boolean) {
    const { suite, checks } = suiteFrom(suiteText("test:heavy-ball", gating));
    const cases = await resultsOf({ ...suite, cases: suite.cases.filter((c) => !c.use.startsWith("test:")) });
    const document = buildResults(suite, cases, ENV);
    const files = buildBaselineFiles(document, {
      commit: "0123abc",
      date: "2026-01-01T00:00:00.000Z",
      reason: "test",
    });
    const verdict = compareResults(document, new Map(files.map((f) => [f.optimizer, f])));
    const report = await runReferenceChecks({ suite, checks, results: cases, sourceFor });
    return { verdict, merged: applyReferenceChecks(verdict, report), report };
  }

  it("a failing gating check fails the gate, with the check's sentence as the reason", async () => {
    const { verdict, merged, report } = await verdictFor(true);
    expect(verdict.gate.verdict).toBe("pass"); // unchanged against its own baseline
    expect(merged.gate.verdict).toBe("fail");
    const conformance = report.gate[0];
    expect(conformance.status).toBe("fail");
    expect(merged.gate.checks).toEqual(report.gate);
    // the rate check fails on the case of the heavy ball (no results for it: the case is not in the verdict)
    expect(merged.gate.reasons.map((r) => r.code)).toEqual(["check", "check"]);
    expect(merged.gate.reasons[0]).toMatchObject({ case: "nag/default/quadratic(n=4)" });
    expect(merged.gate.reasons[1].message).toBe(conformance.summary);
    expect(conformance.summary).toContain(
      "the gradient is taken at the current point, not at the look-ahead point w − γv",
    );
    // the other cases carry their (passing) checks and still do not fail the gate
    const gd = merged.cases.find((c) => c.id === "gd/default/freudenstein-roth")!;
    expect(gd.checks.map((c) => c.status)).toEqual(["pass"]);
    expect(gd.failsGate).toBe(false);
    expect(verdict.cases.find((c) => c.id === gd.id)!.checks).toEqual([]); // the input is not modified
  });

  it("a failing check declared gating: false is reported and does not fail the gate", async () => {
    const { merged, report } = await verdictFor(false);
    expect(report.gate[0].status).toBe("fail");
    expect(merged.gate.verdict).toBe("pass");
    expect(merged.gate.reasons).toEqual([]);
  });
});
