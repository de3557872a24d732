/**
 * The Python client (clients/python/gradgate_client.py) serving the Python ports in
 * examples/adapters/python/optimizers.py, against gradgate's reference optimizers run in-process.
 *
 * The ports do the same floating-point operations in the same order, and the harness measures f(x_k)
 * by the same rule, so the metrics are expected to agree exactly; the test allows a relative
 * tolerance of 1e-12 on the real-valued metrics (final and best gap, rate, trace, iterates) for libm
 * differences between Python's math.pow/sqrt and V8's Math.pow/sqrt, and requires the integer
 * metrics (stop, steps, evaluations, steps and evaluations to each rung) to be equal.
 */
import { afterAll, describe, expect, it } from "vitest";
import { runSuite } from "../../src/runner/pool.js";
import type { CaseResult } from "../../src/runner/types.js";
import { ProcessSession } from "../../src/adapters/session.js";
import { executeRun } from "../../src/runner/execute.js";
import { getOptimizer, resolveHyper } from "../../src/optimizers/index.js";
import { getProblem } from "../../src/problems/index.js";
import { PY_EXAMPLE, expectSameMetrics, pySettings, suiteFromYaml } from "./helpers.js";

describe("Python ports through the protocol give the reference metrics", () => {
  const yaml = `
seed: 11
seeds: 3
budget: { steps: 400 }
stopAt: 0
adapters:
  py:
    command: [python3, ${JSON.stringify(PY_EXAMPLE)}]
optimizers:
  - { name: momentum, hyper: { lr: 0.001 } }
  - { name: py-momentum, use: "py:momentum", hyper: { lr: 0.001 } }
  - { name: momentum-outside, use: momentum, hyper: { lr: 0.001, form: lr-outside } }
  - { name: py-momentum-outside, use: "py:momentum", hyper: { lr: 0.001, form: lr-outside } }
  - { name: adam, hyper: { lr: 0.01 } }
  - { name: py-adam, use: "py:adam", hyper: { lr: 0.01 } }
  - { name: adam-efficient, use: adam, hyper: { lr: 0.01, epsPlacement: efficient, eps: 0.1 } }
  - { name: py-adam-efficient, use: "py:adam", hyper: { lr: 0.01, epsPlacement: efficient, eps: 0.1 } }
  - { name: nesterov, hyper: { lr: 0.001 } }
  - { name: py-nesterov, use: "py:nesterov", hyper: { lr: 0.001 } }
problems:
  - use: rosenbrock
  - use: quadratic
    params: { n: 5, kappa: 50 }
  - use: noisy-quadratic
    params: { n: 4 }
`;
  let results: CaseResult[] = [];

  it("runs the suite on two workers", async () => {
    const suite = await suiteFromYaml(yaml);
    results = await runSuite(suite, { workers: 2 });
    expect(results).toHaveLength(30);
  });

  const pairs = [
    ["momentum", "py-momentum"],
    ["momentum-outside", "py-momentum-outside"],
    ["adam", "py-adam"],
    ["adam-efficient", "py-adam-efficient"],
    ["nesterov", "py-nesterov"],
  ];
  it.each(pairs)("%s = %s on every problem and seed", (ref, py) => {
    const refCases = results.filter((r) => r.case.optimizer === ref);
    const pyCases = results.filter((r) => r.case.optimizer === py);
    expect(refCases).toHaveLength(3);
    refCases.forEach((rc, i) => {
      const pc = pyCases[i];
      expect(pc.case.problemKey).toBe(rc.case.problemKey);
      expect(pc.case.hyper).toEqual(rc.case.hyper);
      rc.runs.forEach((run, s) => {
        expect(run.stop).not.toBe("error");
        expectSameMetrics(pc.runs[s], run, `${py} ${rc.case.problemKey} seed ${s}`);
      });
    });
  });
});

describe("batching does not change a run", () => {
  const sessions: ProcessSession[] = [];
  afterAll(async () => {
    await Promise.all(sessions.map((s) => s.close()));
  });

  it("gives the same metrics with 1 run in flight as with 64", async () => {
    const def = getProblem("rosenbrock");
    const adam = getOptimizer("adam");
    const hyper = resolveHyper(adam, { lr: 0.02 }, "test");
    const suite = await suiteFromYaml(`
seeds: 1
budget: { steps: 300 }
optimizers: [{ name: adam }]
problems: [{ use: rosenbrock }]
`);
    const spec = { ...suite.cases[0], hyper };
    const requests = Array.from({ length: 64 }, (_, s) => ({
      spec,
      seedIndex: s,
      suiteSeed: 3,
      definition: def,
      optimizer: "adam",
    }));
    const wide = new ProcessSession(pySettings(PY_EXAMPLE, [], { maxRuns: 64 }));
    const narrow = new ProcessSession(pySettings(PY_EXAMPLE, [], { maxRuns: 1 }));
    sessions.push(wide, narrow);
    const [a, b] = await Promise.all([wide.run(requests), narrow.run(requests.slice(0, 8))]);
    expect(b).toEqual(a.slice(0, 8));
    for (let s = 0; s < 8; s++) {
      expectSameMetrics(a[s], executeRun(spec, s, 3, adam, def).metrics, `seed ${s}`);
    }
  });
});
