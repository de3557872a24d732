/**
 * Reference checks through the process adapter: the Python client (clients/python/gradgate_client.py)
 * serving the Python ports of examples/adapters/python/optimizers.py in a real child process. The harness
 * serves the evaluations, pauses the run for a learning-rate change and observes every iterate.
 */
import { afterAll, describe, expect, it } from "vitest";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { prepareSuite } from "../../src/adapters/prepare.js";
import { parseConfig } from "../../src/config/load.js";
import { resolveChecks } from "../../src/reference/config.js";
import { runReferenceChecks } from "../../src/reference/run-checks.js";
import { type SuiteSources, suiteSources } from "../../src/reference/sources.js";

const ROOT = fileURLToPath(new URL("../../", import.meta.url));
const PY_EXAMPLE = join(ROOT, "examples/adapters/python/optimizers.py");

const YAML = `
seeds: 2
budget: { steps: 5000 }
adapters:
  py:
    command: [python3, ${JSON.stringify(PY_EXAMPLE)}]
optimizers:
  - { name: py-sgd, use: "py:sgd", hyper: { lr: 0.002 } }
  - { name: py-momentum, use: "py:momentum", hyper: { lr: 0.01, momentum: 0.5, form: lr-outside } }
  - { name: py-nesterov, use: "py:nesterov", hyper: { lr: 0.005, momentum: 0.9 } }
  - { name: py-adam, use: "py:adam", hyper: { epsPlacement: efficient } }
problems:
  - { use: freudenstein-roth, optimizers: [py-sgd] }
  - { use: quadratic, params: { n: 4 }, optimizers: [py-momentum, py-nesterov], budget: { steps: 200 } }
  - { use: rosenbrock, optimizers: [py-adam], budget: { steps: 10 } }
checks:
  minimum:
    - { optimizer: py-sgd, problem: freudenstein-roth, basin: local, tolerance: { kind: absolute, value: 1e-3 } }
  rate:
    - { optimizer: py-momentum, problem: quadratic, method: heavy-ball }
    - { optimizer: py-nesterov, problem: quadratic, method: nesterov, tuned: true }
  conformance:
    - { optimizer: py-sgd, method: sgd }
    - { optimizer: py-momentum, method: momentum }
    - { optimizer: py-nesterov, method: nesterov }
    - { optimizer: py-adam, method: adam, expect: { epsPlacement: efficient } }
    - { optimizer: py-nesterov, method: momentum }
`;

describe("reference checks through the process adapter (Python client)", () => {
  let sources: SuiteSources | null = null;
  afterAll(async () => {
    await sources?.close();
  });

  it("run every kind of check on optimizers served by a child process", async () => {
    const config = parseConfig(YAML, "gradgate.yml");
    const suite = await prepareSuite(config, "gradgate.yml", { baseDir: ROOT });
    const checks = resolveChecks(config.checks, suite, "gradgate.yml");
    sources = suiteSources(suite);
    const report = await runReferenceChecks({ suite, checks, sourceFor: sources.sourceFor });

    const cases = Object.fromEntries(
      Object.entries(report.cases).map(([id, list]) => [id, list.map((c) => `${c.id} ${c.status}`)]),
    );
    expect(cases).toEqual({
      "py-sgd/default/freudenstein-roth": ["known-minimum:local pass"],
      "py-momentum/default/quadratic(n=4)": ["rate:heavy-ball pass"],
      "py-nesterov/default/quadratic(n=4)": ["rate:nesterov pass"],
    });
    const gate = report.gate.map((c) => `${c.id} ${c.status}`);
    expect(gate).toEqual([
      "conformance:py-sgd pass",
      "conformance:py-momentum pass",
      "conformance:py-momentum:form pass",
      "conformance:py-nesterov pass",
      "conformance:py-nesterov:form pass",
      "conformance:py-nesterov:lrPlacement pass",
      "conformance:py-adam pass",
      "conformance:py-adam:epsPlacement pass",
      "conformance:py-adam:decay pass",
      "conformance:py-nesterov fail",
      "conformance:py-nesterov:form skipped",
    ]);
    // the learning-rate change went through the protocol: the momentum form was told apart
    expect(report.gate[2].summary).toBe(
      "heavy-ball momentum learning-rate placement: learning rate outside the velocity (b = γb + g; w −= η·b)",
    );
    expect(report.gate[9].summary).toMatch(
      /^heavy-ball momentum conformance: from step 2 the iterates differ from the published rule by \d\.\de-\d \(relative, probe "[a-z ]+"\); they follow Nesterov's method instead: the gradient is taken at the look-ahead point w − γv/,
    );
  });
});
