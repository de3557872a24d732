/**
 * The in-process module adapter (src/adapters/module.ts, use.ts): user ES modules exporting an
 * OptimizerFactory, loaded relative to the config file's directory, in this thread and in workers.
 * Fixtures: tests/fixtures/adapters/reference-module.mjs (re-exports the reference optimizers) and
 * bad-modules.mjs (wrong on purpose); see the README there.
 */
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { InputError } from "../../src/core/errors.js";
import type { OptimizerFactory } from "../../src/core/types.js";
import { RunBatch } from "../../src/runner/batch.js";
import { executeRun } from "../../src/runner/execute.js";
import { runSuite } from "../../src/runner/pool.js";
import { getProblem } from "../../src/problems/index.js";
import { FIXTURES, suiteFromYaml } from "./helpers.js";

const ALL = ["sgd", "momentum", "nesterov", "adagrad", "rmsprop", "adam", "adamw"];

function oneOptimizer(use: string, hyper = "{}"): string {
  return `seeds: 2
budget: { steps: 60 }
optimizers: [{ name: a, use: ${JSON.stringify(use)}, hyper: ${hyper} }]
problems: [{ use: rosenbrock }]
`;
}

async function errorOf(yaml: string): Promise<string> {
  try {
    await suiteFromYaml(yaml);
  } catch (err) {
    expect(err).toBeInstanceOf(InputError);
    return (err as Error).message;
  }
  throw new Error("expected an InputError");
}

describe("reference optimizers re-exported by a module", () => {
  const yaml = `
seeds: 3
budget: { steps: 300 }
optimizers:
${ALL.map((n) => `  - { name: ${n} }\n  - { name: mod-${n}, use: "module:./reference-module.mjs#${n}" }`).join("\n")}
  - { name: mod-default, use: "module:./reference-module.mjs" }
problems:
  - use: rosenbrock
  - use: quadratic
    params: { n: 6, kappa: 30 }
`;

  it.each([1, 2])("give exactly the reference metrics (%i worker(s))", async (workers) => {
    const suite = await suiteFromYaml(yaml);
    const results = await runSuite(suite, { workers });
    for (const name of [...ALL, "default"]) {
      const ref = results.filter((r) => r.case.optimizer === (name === "default" ? "adam" : name));
      const mod = results.filter((r) => r.case.optimizer === `mod-${name}`);
      expect(mod).toHaveLength(2);
      expect(mod.map((r) => r.case.use)[0]).toBe(
        name === "default" ? "module:./reference-module.mjs" : `module:./reference-module.mjs#${name}`,
      );
      mod.forEach((m, i) => {
        expect(m.case.hyper).toEqual(ref[i].case.hyper);
        expect(m.runs).toEqual(ref[i].runs);
        expect(m.runs.every((r) => r.stop !== "error")).toBe(true);
      });
    }
  });

  it("merges the module's defaults under the config's values and passes unknown names through", async () => {
    const suite = await suiteFromYaml(
      oneOptimizer("module:./reference-module.mjs#momentum", "{ lr: 0.002, extra: on }"),
    );
    expect(suite.cases[0].hyper).toEqual({
      extra: "on",
      form: "lr-inside",
      lr: 0.002,
      momentum: 0.9,
      weightDecay: 0,
    });
  });
});

describe("module errors name the config field and the fix", () => {
  const bad = (name: string) => `module "./bad-modules.mjs#${name}"`;
  it.each([
    [
      "module:./nope.mjs#x",
      `config gradgate.yml: optimizers[0].use: module "./nope.mjs#x": no such file ${JSON.stringify(join(FIXTURES, "nope.mjs"))}`,
    ],
    [
      "module:./bad-modules.mjs#missing",
      `config gradgate.yml: optimizers[0].use: ${bad("missing")} has no export "missing" (exports: NotAFactory, badDefaults, noCreate, noStep, throwsOnCreate, touchesIterate)`,
    ],
    [
      "module:./bad-modules.mjs#NotAFactory",
      `config gradgate.yml: optimizers[0].use: ${bad("NotAFactory")} must be an object with a create(hyper, dim) method (an OptimizerFactory), got a function (export the factory object, not a class or function)`,
    ],
    [
      "module:./bad-modules.mjs#noCreate",
      `config gradgate.yml: optimizers[0].use: ${bad("noCreate")} must be an object with a create(hyper, dim) method (an OptimizerFactory), got an object with name, step`,
    ],
    [
      "module:./bad-modules.mjs#badDefaults",
      `config gradgate.yml: optimizers[0].use: ${bad("badDefaults")}: defaults.lr must be a finite number, a boolean or a string, got [0.1]`,
    ],
    [
      "module:./opt/adam.ts#adam",
      `config gradgate.yml: optimizers[0].use "module:./opt/adam.ts#adam": "./opt/adam.ts" is TypeScript, which Node 20 cannot load directly; compile it to JavaScript first (e.g. tsc) and name the .js or .mjs file (see docs/adapters.md)`,
    ],
    [
      "module:opt.mjs",
      `config gradgate.yml: optimizers[0].use "module:opt.mjs": the module path must start with "./" or "../" (relative to the config file's directory) or "/"; expected module:PATH#EXPORT, e.g. "module:./opt/my-adam.mjs#myAdam"`,
    ],
    [
      "module:./x.mjs#my-adam",
      `config gradgate.yml: optimizers[0].use "module:./x.mjs#my-adam": "my-adam" is not an export name; expected module:PATH#EXPORT, e.g. "module:./opt/my-adam.mjs#myAdam"`,
    ],
    [
      "foo:bar",
      `config gradgate.yml: optimizers[0].use "foo:bar": "foo" is neither "reference", "module" nor a process adapter declared under adapters (declared: none)`,
    ],
  ])("%s", async (use, message) => {
    expect(await errorOf(oneOptimizer(use))).toBe(message);
  });

  it.each([
    [
      "noStep",
      "creating the optimizer failed: create(hyper, dim) must return an object with a step(x, oracle) method, got an object with run",
    ],
    ["throwsOnCreate", "creating the optimizer failed: lr 0.1 is not supported"],
  ])("a factory whose create fails (%s) fails its runs, not the harness", async (name, error) => {
    const suite = await suiteFromYaml(oneOptimizer(`module:./bad-modules.mjs#${name}`, "{ lr: 0.1 }"));
    const metrics = await new RunBatch(suite).runItems([0, 1]);
    expect(metrics.map((m) => [m.stop, m.error, m.steps, m.evaluations])).toEqual([
      ["error", error, 0, 0],
      ["error", error, 0, 0],
    ]);
  });
});

describe("module optimizers are untrusted", () => {
  it("a module that evaluates a modified iterate gets f(x_k) measured by the harness", async () => {
    const suite = await suiteFromYaml(
      oneOptimizer("module:./bad-modules.mjs#touchesIterate", "{ lr: 0.001 }"),
    );
    const [run] = await new RunBatch(suite).runItems([0]);
    // The same steps, evaluating at a separate buffer x + e₀ (so the harness measures f(x_k) itself).
    const clean: OptimizerFactory = {
      name: "clean",
      title: "clean",
      defaults: {},
      create(_hyper, dim) {
        const g = new Float64Array(dim);
        const p = new Float64Array(dim);
        return {
          step(x, oracle) {
            p.set(x);
            p[0] += 1;
            oracle.evaluate(p, g);
            for (let i = 0; i < dim; i++) x[i] -= 0.001 * g[i];
          },
        };
      },
    };
    const want = executeRun(suite.cases[0], 0, suite.seed, clean, getProblem("rosenbrock")).metrics;
    expect(run).toEqual(want);
    // Trusting the loss it computed would have recorded f(x_k + e₀) instead.
    const fixture = (await import(join(FIXTURES, "bad-modules.mjs"))) as { touchesIterate: OptimizerFactory };
    const trusted = executeRun(
      suite.cases[0],
      0,
      suite.seed,
      fixture.touchesIterate,
      getProblem("rosenbrock"),
    ).metrics;
    expect(trusted.trace).not.toEqual(want.trace);
  });
});
