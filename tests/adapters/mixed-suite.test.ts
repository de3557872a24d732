/**
 * A suite that mixes reference, module and process optimizers (and scenarios) runs deterministically:
 * the same results JSON, byte for byte, on 1, 2 or 3 workers.
 */
import { describe, expect, it } from "vitest";
import { canonicalJson } from "../../src/core/json.js";
import { runSuite } from "../../src/runner/pool.js";
import { buildResults } from "../../src/runner/results.js";
import type { CaseResult } from "../../src/runner/types.js";
import { FIXTURES, PY_EXAMPLE, expectSameMetrics, suiteFromYaml } from "./helpers.js";

const YAML = `
seeds: 3
budget: { steps: 200 }
adapters:
  py:
    command: [python3, ${JSON.stringify(PY_EXAMPLE)}]
    maxRuns: 4
optimizers:
  - { name: adam, hyper: { lr: 0.01 } }
  - { name: mod-momentum, use: "module:./reference-module.mjs#momentum", hyper: { lr: 0.001 } }
  - { name: py-adam, use: "py:adam", hyper: { lr: 0.01 } }
  - { name: py-nesterov, use: "py:nesterov", hyper: { lr: 0.001 } }
problems:
  - use: rosenbrock
  - use: noisy-quadratic
    params: { n: 3 }
scenarios:
  - name: resume
    resume: { at: 30 }
  - name: lr-drop
    lrChange: { at: 60, factor: 0.5 }
`;

describe("a mixed suite", () => {
  it("carries the adapters to the workers and keeps use as written", async () => {
    const suite = await suiteFromYaml(YAML);
    expect(suite.adapters?.baseDir).toBe(FIXTURES);
    expect(Object.keys(suite.adapters?.processes ?? {})).toEqual(["py"]);
    expect([...new Set(suite.cases.map((c) => c.use))]).toEqual([
      "reference:adam",
      "module:./reference-module.mjs#momentum",
      "py:adam",
      "py:nesterov",
    ]);
    expect(suite.cases).toHaveLength(8 + 8 + 8);
  });

  it("gives the same results bytes on 1, 2 and 3 workers", async () => {
    const suite = await suiteFromYaml(YAML);
    const env = { node: "v20", platform: "test", arch: "test" };
    const texts: string[] = [];
    for (const workers of [1, 2, 3]) {
      const cases = await runSuite(suite, { workers });
      texts.push(canonicalJson(buildResults(suite, cases, env)));
    }
    expect(texts[1]).toBe(texts[0]);
    expect(texts[2]).toBe(texts[0]);
    const doc = JSON.parse(texts[0]) as { cases: CaseResult[] };
    expect(doc.cases.flatMap((c) => c.runs).filter((r) => r.stop === "error")).toEqual([]);
    // The Python Adam and the reference Adam agree (to the stated tolerance: V8's Math.pow and the C
    // library's pow differ in the last bit for some powers β^t).
    const byId = (id: string) => doc.cases.find((c) => c.case.id === id)!;
    for (const problem of ["rosenbrock", "noisy-quadratic(n=3)"]) {
      for (const set of ["default", "default@resume", "default@lr-drop"]) {
        const ref = byId(`adam/${set}/${problem}`).runs;
        byId(`py-adam/${set}/${problem}`).runs.forEach((m, s) =>
          expectSameMetrics(m, ref[s], `${set} ${problem} ${s}`),
        );
      }
    }
  });
});
