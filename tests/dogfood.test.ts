/**
 * gradgate gates itself: the reference optimizers, run on the built-in default suite, must reproduce the
 * committed baselines/ bit for bit. A change to a reference optimizer or problem that moves any number
 * fails here until the baselines are refreshed on purpose (gradgate rebaseline, with a reason in the
 * audit log) — the same workflow the Action asks of its users.
 */
import { describe, expect, it } from "vitest";
import { readBaselineDir } from "../src/baselines/store.js";
import { compareResults } from "../src/compare/compare.js";
import { parseConfig } from "../src/config/load.js";
import { DEFAULT_SUITE_YAML } from "../src/config/default-suite.js";
import { runSuite } from "../src/runner/pool.js";
import { buildResults } from "../src/runner/results.js";
import { prepareSuite } from "../src/adapters/prepare.js";
import { fileURLToPath } from "node:url";

describe("the committed baselines", () => {
  it("are reproduced exactly by the reference optimizers on the default suite (2 workers)", async () => {
    const file = "(built-in default suite)";
    const suite = await prepareSuite(parseConfig(DEFAULT_SUITE_YAML, file), file, { baseDir: process.cwd() });
    const results = buildResults(suite, await runSuite(suite, { workers: 2 }));
    const baselines = readBaselineDir(fileURLToPath(new URL("../baselines", import.meta.url)), "baselines");
    const verdict = compareResults(results, baselines);
    const moved = verdict.cases.filter((c) => c.verdict !== "unchanged").map((c) => `${c.id}: ${c.verdict}`);
    expect(moved).toEqual([]);
    expect(verdict.cases).toHaveLength(suite.cases.length);
    expect(verdict.gate.verdict).toBe("pass");
  });
});
