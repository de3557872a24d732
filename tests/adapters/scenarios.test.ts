/**
 * Scenarios (src/runner/scenarios.ts): resume from exported state, a learning-rate change mid-run, and
 * conditions (large ε, sparse gradients, zero loss gradient under weight decay), for in-process
 * (reference and module) and process (Python) optimizers alike. Fixtures: broken-resume.mjs and
 * broken_resume.py export momentum without its velocity, so a resume must be caught at step at + 1.
 */
import { describe, expect, it } from "vitest";
import { InputError } from "../../src/core/errors.js";
import { runSuite } from "../../src/runner/pool.js";
import type { CaseResult } from "../../src/runner/types.js";
import { expectSameMetrics, suiteFromYaml } from "./helpers.js";

const BASE = `
seeds: 2
budget: { steps: 120 }
stopAt: 0
adapters:
  py: { command: [python3, broken_resume.py] }
optimizers:
  - { name: momentum, hyper: { lr: 0.001 } }
  - { name: mod-leaky, use: "module:./broken-resume.mjs#leakyMomentum" }
  - { name: py-momentum, use: "py:momentum", hyper: { lr: 0.001 } }
  - { name: py-leaky, use: "py:leaky-momentum" }
  - { name: adam, hyper: { lr: 0.01 } }
  - { name: touchy, use: "module:./bad-modules.mjs#touchesIterate", hyper: { lr: 0.001 } }
problems:
  - use: rosenbrock
`;

const SCENARIOS = `
scenarios:
  - name: resume
    resume: { at: 40 }
  - name: lr-drop
    lrChange: { at: 50, factor: 0.1 }
  - name: large-eps
    hyper: { eps: 0.1 }
  - name: sparse
    problem: { use: sparse-least-squares, params: { batch: 1, n: 10, m: 50 } }
    optimizers: [adam, py-momentum]
  - name: decay-only
    problem: { use: plateau, params: { r0: 30 } }
    hyper: { weightDecay: 0.01 }
`;

describe("scenario cases", () => {
  let results: CaseResult[] = [];
  const byId = (id: string) => {
    const found = results.find((r) => r.case.id === id);
    if (found === undefined) throw new Error(`no case ${id}`);
    return found;
  };

  it("are added for every optimizer that declares what the scenario needs", async () => {
    const suite = await suiteFromYaml(BASE + SCENARIOS);
    expect(suite.cases.map((c) => c.id)).toEqual([
      "momentum/default/rosenbrock",
      "mod-leaky/default/rosenbrock",
      "py-momentum/default/rosenbrock",
      "py-leaky/default/rosenbrock",
      "adam/default/rosenbrock",
      "touchy/default/rosenbrock",
      // resume and lrChange: every optimizer with exportState/importState, resp. setLearningRate
      // (touchy has neither)
      "momentum/default@resume/rosenbrock",
      "mod-leaky/default@resume/rosenbrock",
      "py-momentum/default@resume/rosenbrock",
      "py-leaky/default@resume/rosenbrock",
      "adam/default@resume/rosenbrock",
      "momentum/default@lr-drop/rosenbrock",
      "mod-leaky/default@lr-drop/rosenbrock",
      "py-momentum/default@lr-drop/rosenbrock",
      "py-leaky/default@lr-drop/rosenbrock",
      "adam/default@lr-drop/rosenbrock",
      // hyper eps: only optimizers that declare eps
      "adam/default@large-eps/rosenbrock",
      // an explicit list
      "py-momentum/default@sparse/sparse-least-squares(batch=1,m=50,n=10)",
      "adam/default@sparse/sparse-least-squares(batch=1,m=50,n=10)",
      // weightDecay: the reference optimizers and the Python port declare it, the leaky fixtures do not
      "momentum/default@decay-only/plateau(r0=30)",
      "py-momentum/default@decay-only/plateau(r0=30)",
      "adam/default@decay-only/plateau(r0=30)",
    ]);
    const lr = suite.cases.find((c) => c.id === "adam/default@lr-drop/rosenbrock")!;
    expect(lr.scenario).toEqual({ name: "lr-drop", lrChange: { at: 50, lr: 0.001 } });
    expect(suite.cases.find((c) => c.id === "adam/default@large-eps/rosenbrock")!.hyper.eps).toBe(0.1);
    expect(
      suite.cases.find((c) => c.id === "momentum/default@decay-only/plateau(r0=30)")!.hyper,
    ).toMatchObject({
      lr: 0.001,
      weightDecay: 0.01,
    });
    results = await runSuite(suite, { workers: 2 });
    expect(results.flatMap((r) => r.runs).filter((m) => m.stop === "error")).toEqual([]);
  });

  it("resume: retraces the uninterrupted run bit for bit, in-process and through the protocol", () => {
    for (const id of ["momentum", "py-momentum", "adam"]) {
      const resumed = byId(`${id}/default@resume/rosenbrock`);
      expect(resumed.runs.map((m) => m.resume)).toEqual([
        { equal: true, firstDifference: null },
        { equal: true, firstDifference: null },
      ]);
      // …and its metrics are those of the uninterrupted case.
      expect(resumed.runs.map(({ resume: _, ...m }) => m)).toEqual(byId(`${id}/default/rosenbrock`).runs);
    }
  });

  it("resume: a state without the velocity differs from step at + 1 = 41", () => {
    for (const id of ["mod-leaky", "py-leaky"]) {
      expect(byId(`${id}/default@resume/rosenbrock`).runs.map((m) => m.resume)).toEqual([
        { equal: false, firstDifference: 41 },
        { equal: false, firstDifference: 41 },
      ]);
    }
  });

  it("lrChange: a normal case with its own metrics, the same in-process and through the protocol", () => {
    const inProcess = byId("momentum/default@lr-drop/rosenbrock");
    const plain = byId("momentum/default/rosenbrock");
    inProcess.runs.forEach((m, s) => {
      expect(m.resume).toBeUndefined();
      expect(m.trace).not.toEqual(plain.runs[s].trace);
      // Up to the change (step 50) the iterates are those of the plain run (20 fingerprint steps).
      expect(m.iterates).toEqual(plain.runs[s].iterates);
      expectSameMetrics(byId("py-momentum/default@lr-drop/rosenbrock").runs[s], m, `seed ${s}`);
      expect(byId("mod-leaky/default@lr-drop/rosenbrock").runs[s]).toEqual(m);
    });
  });

  it("conditions: hyperparameters and problems of the scenario, compared like any case", () => {
    const eps = byId("adam/default@large-eps/rosenbrock");
    expect(eps.runs[0].finalGap).not.toBe(byId("adam/default/rosenbrock").runs[0].finalGap);
    const sparse = byId("adam/default@sparse/sparse-least-squares(batch=1,m=50,n=10)");
    expect(sparse.case.measureEvery).toBeGreaterThanOrEqual(1);
    expect(sparse.runs.every((m) => m.stop === "steps")).toBe(true);
    // Zero loss gradient (plateau at radius 30: f = 1 exactly): only the decay moves the iterate,
    // coupled L2 through momentum, both in-process and in the Python port, alike.
    const decay = byId("momentum/default@decay-only/plateau(r0=30)");
    expect(decay.runs[0].finalGap).toBe(1);
    expect(decay.runs[0].iterates![1]).not.toEqual(decay.runs[0].iterates![0]);
    expectSameMetrics(byId("py-momentum/default@decay-only/plateau(r0=30)").runs[0], decay.runs[0], "decay");
  });
});

describe("scenario config errors", () => {
  async function errorOf(scenarios: string): Promise<string> {
    const err = await suiteFromYaml(BASE + scenarios).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(InputError);
    return (err as Error).message;
  }

  it.each([
    [
      "an optimizer listed that lacks the capability",
      "scenarios:\n  - { name: r, resume: { at: 5 }, optimizers: [touchy] }\n",
      'config gradgate.yml: scenarios[0] ("r") lists optimizer "touchy", which has no exportState/importState (needed by resume)',
    ],
    [
      "an optimizer listed that lacks a hyperparameter",
      "scenarios:\n  - { name: e, hyper: { eps: 1 }, optimizers: [momentum] }\n",
      'config gradgate.yml: scenarios[0] ("e") lists optimizer "momentum", which does not declare the hyperparameter eps',
    ],
    [
      "a step at or beyond the budget",
      "scenarios:\n  - { name: late, lrChange: { at: 120, lr: 0.1 } }\n",
      "config gradgate.yml: scenarios[0].lrChange.at must be below the step budget (120) of case momentum/default/rosenbrock, got 120",
    ],
    [
      "both lr and factor",
      "scenarios:\n  - { name: both, lrChange: { at: 5, lr: 0.1, factor: 2 } }\n",
      "config gradgate.yml: scenarios[0].lrChange needs exactly one of lr (the new rate) or factor (times the case's lr)",
    ],
    [
      "nothing to do",
      "scenarios:\n  - { name: idle }\n",
      'config gradgate.yml: scenarios[0] ("idle") changes nothing: give resume, lrChange, hyper or problem',
    ],
    [
      "a problem that is not in the suite",
      "scenarios:\n  - { name: p, hyper: { lr: 1 }, problems: [beale] }\n",
      'config gradgate.yml: scenarios[0].problems[0] names "beale", which is not the use of any of problems (known: rosenbrock)',
    ],
  ])("%s", async (_what, scenarios, message) => {
    expect(await errorOf(scenarios)).toBe(message);
  });
});
