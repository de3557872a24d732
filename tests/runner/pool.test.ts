import { describe, expect, it } from "vitest";
import { parseConfig } from "../../src/config/load.js";
import { canonicalJson } from "../../src/core/json.js";
import { runSuite } from "../../src/runner/pool.js";
import { buildResults } from "../../src/runner/results.js";
import { resolveSuite } from "../../src/runner/suite.js";

// A small suite touching a deterministic, a stochastic and a mini-batch problem, two optimizers.
const CONFIG = `
seed: 11
seeds: 3
budget: { steps: 300 }
optimizers:
  - name: momentum
    hyper: { lr: 0.001, momentum: 0.9 }
  - name: adam
    hyper: { lr: 0.01 }
problems:
  - use: rosenbrock
  - use: noisy-quadratic
  - use: logistic-regression
`;

describe("runSuite", () => {
  it("writes byte-identical results twice in a row and with 1 or 2 workers", async () => {
    const suite = resolveSuite(parseConfig(CONFIG, "pool.yml"), "pool.yml");
    const env = { node: "v0", platform: "test", arch: "test" };
    const one = canonicalJson(buildResults(suite, await runSuite(suite, { workers: 1 }), env));
    const again = canonicalJson(buildResults(suite, await runSuite(suite, { workers: 1 }), env));
    const two = canonicalJson(buildResults(suite, await runSuite(suite, { workers: 2 }), env));
    expect(again).toBe(one);
    expect(two).toBe(one);
    expect(JSON.parse(one).cases).toHaveLength(6);
  });

  it("keeps a case's numbers when other cases are added or removed", async () => {
    const whole = resolveSuite(parseConfig(CONFIG, "pool.yml"), "pool.yml");
    const alone = resolveSuite(
      parseConfig(
        CONFIG.replace("  - use: rosenbrock\n", "").replace(/ {2}- name: momentum\n.*\n/, ""),
        "pool.yml",
      ),
      "pool.yml",
    );
    const a = await runSuite(whole, { workers: 1 });
    const b = await runSuite(alone, { workers: 1 });
    const pick = (cases: typeof a, id: string) => cases.find((c) => c.case.id === id)!.runs;
    expect(b.map((c) => c.case.id)).toEqual([
      "adam/default/noisy-quadratic",
      "adam/default/logistic-regression",
    ]);
    expect(pick(b, "adam/default/logistic-regression")).toEqual(pick(a, "adam/default/logistic-regression"));
    expect(pick(b, "adam/default/noisy-quadratic")).toEqual(pick(a, "adam/default/noisy-quadratic"));
  });
});
