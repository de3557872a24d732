/**
 * The client's general form (a step that evaluates as often as it likes, or not at all) against the same
 * methods written in JavaScript and run in-process: evaluation-free steps (the run waits for `resume`),
 * two evaluations per step, evaluations away from the iterate (the harness measures f(x_k) itself).
 * Fixture: tests/fixtures/adapters/generators.py.
 */
import { join } from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import type { OptimizerFactory } from "../../src/core/types.js";
import { ProcessSession } from "../../src/adapters/session.js";
import { executeRun } from "../../src/runner/execute.js";
import { getProblem } from "../../src/problems/index.js";
import { FIXTURES, expectSameMetrics, pySettings, suiteFromYaml } from "./helpers.js";

const LR = 0.001;

/** Gradient descent on odd steps; even steps repeat the last displacement without evaluating. */
const everyOther: OptimizerFactory = {
  name: "every-other",
  title: "every-other (test)",
  defaults: { lr: LR },
  create(_hyper, dim) {
    const copy = new Float64Array(dim);
    const g = new Float64Array(dim);
    const last = new Float64Array(dim);
    let t = 0;
    return {
      step(x, oracle) {
        t++;
        if (t % 2 === 1) {
          copy.set(x);
          oracle.evaluate(copy, g);
          for (let i = 0; i < dim; i++) last[i] = -LR * g[i];
        }
        for (let i = 0; i < dim; i++) x[i] = x[i] + last[i];
      },
    };
  },
};

/** Extragradient: g(x), y = x − lr·g(x), x ← x − lr·g(y). */
const extragradient: OptimizerFactory = {
  name: "extragradient",
  title: "extragradient (test)",
  defaults: { lr: LR },
  create(_hyper, dim) {
    const g = new Float64Array(dim);
    const y = new Float64Array(dim);
    return {
      step(x, oracle) {
        oracle.evaluate(x, g);
        for (let i = 0; i < dim; i++) y[i] = x[i] - LR * g[i];
        oracle.evaluate(y, g);
        for (let i = 0; i < dim; i++) x[i] = x[i] - LR * g[i];
      },
    };
  },
};

const sessions: ProcessSession[] = [];
afterAll(async () => {
  await Promise.all(sessions.map((s) => s.close()));
});

describe("the general (generator) form through the protocol", () => {
  it.each([
    ["every-other", everyOther],
    ["extragradient", extragradient],
  ] as const)("%s gives the in-process metrics", async (name, factory) => {
    const suite = await suiteFromYaml(`seeds: 4
budget: { steps: 150 }
optimizers: [{ name: sgd }]
problems: [{ use: rosenbrock }, { use: quadratic, params: { n: 3 } }]
`);
    const session = new ProcessSession(pySettings(join(FIXTURES, "generators.py"), [], { maxRuns: 5 }));
    sessions.push(session);
    for (const base of suite.cases) {
      const spec = { ...base, hyper: { lr: LR } };
      const definition = getProblem(spec.problem);
      const requests = [0, 1, 2, 3].map((s) => ({
        spec,
        seedIndex: s,
        suiteSeed: suite.seed,
        definition,
        optimizer: name,
      }));
      const got = await session.run(requests);
      got.forEach((m, s) => {
        const want = executeRun(spec, s, suite.seed, factory, definition).metrics;
        expect(m.stop).toBe("steps");
        expect(m.evaluations).toBe(name === "every-other" ? 75 : 300);
        expectSameMetrics(m, want, `${name} ${spec.problemKey} seed ${s}`);
      });
    }
  });
});
