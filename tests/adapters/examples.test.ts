/**
 * The examples in examples/adapters/ run as documented, and docs/adapters.md stays in step with the code:
 * the example files it shows are quoted verbatim, the adapter settings table states the schema's
 * defaults, and the environment allow-list it prints is the one the code applies.
 */
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { parseConfig } from "../../src/config/load.js";
import { processAdapterSchema } from "../../src/config/schema.js";
import { PASSED_VARIABLES } from "../../src/adapters/env.js";
import { prepareSuite } from "../../src/adapters/prepare.js";
import { runSuite } from "../../src/runner/pool.js";
import type { CaseResult } from "../../src/runner/types.js";
import { ROOT, expectSameMetrics } from "./helpers.js";

const EXAMPLES = join(ROOT, "examples/adapters");
const DOC = readFileSync(join(ROOT, "docs/adapters.md"), "utf8");

async function runExample(dir: string): Promise<CaseResult[]> {
  const base = join(EXAMPLES, dir);
  const config = parseConfig(readFileSync(join(base, "gradgate.yml"), "utf8"), "gradgate.yml");
  return runSuite(await prepareSuite(config, "gradgate.yml", { baseDir: base }), { workers: 2 });
}

function pair(results: CaseResult[], a: string, b: string) {
  const left = results.filter((r) => r.case.optimizer === a);
  const right = results.filter((r) => r.case.optimizer === b);
  expect(left.length).toBeGreaterThan(0);
  expect(right.map((r) => r.case.id.replace(`${b}/`, ""))).toEqual(
    left.map((r) => r.case.id.replace(`${a}/`, "")),
  );
  return left.map((l, i) => [l, right[i]] as const);
}

describe("examples/adapters", () => {
  it("module/: the example module gives the reference SGD's runs exactly, scenarios included", async () => {
    const results = await runExample("module");
    expect(results).toHaveLength(12);
    for (const [ref, mine] of pair(results, "sgd", "my-sgd")) expect(mine.runs).toEqual(ref.runs);
    expect(results.flatMap((r) => r.runs).every((m) => m.stop === "steps")).toBe(true);
  });

  it("python/: the Python ports give the reference metrics, scenarios included", async () => {
    const results = await runExample("python");
    expect(results.flatMap((r) => r.runs).filter((m) => m.stop === "error")).toEqual([]);
    for (const [a, b] of [
      ["adam", "py-adam"],
      ["momentum", "py-momentum"],
    ]) {
      for (const [ref, port] of pair(results, a, b)) {
        port.runs.forEach((m, s) => expectSameMetrics(m, ref.runs[s], `${port.case.id} seed ${s}`));
      }
    }
    // minimal.py declares no state, so it has no resume case; it matches sgd's numbers on Rosenbrock.
    expect(results.filter((r) => r.case.optimizer === "my-sgd").map((r) => r.case.set)).toEqual([
      "default",
      "default",
    ]);
  });
});

describe("docs/adapters.md", () => {
  it.each(["module/my-sgd.mjs", "python/minimal.py"])("quotes examples/adapters/%s verbatim", (file) => {
    expect(DOC).toContain(readFileSync(join(EXAMPLES, file), "utf8").trimEnd());
  });

  it("states the adapter defaults of the config schema", () => {
    const p = processAdapterSchema.properties;
    const expected: [string, unknown][] = [
      ["cwd", p.cwd.default],
      ["env", p.env.default],
      ["maxRuns", p.maxRuns.default],
      ["maxMessageBytes", p.maxMessageBytes.default],
      ["timeouts.start", p.timeouts.properties.start.default],
      ["timeouts.message", p.timeouts.properties.message.default],
      ["timeouts.run", p.timeouts.properties.run.default],
    ];
    for (const [field, value] of expected) {
      expect(DOC, field).toContain(`| \`${field}\` | \`${JSON.stringify(value)}\` |`);
    }
  });

  it("lists exactly the variables the child inherits", () => {
    const line = DOC.split("\n").find((l) => l.startsWith("Inherited when set:"));
    expect(line).toBeDefined();
    const names = [...line!.matchAll(/`([A-Z_]+)`/g)].map((m) => m[1]);
    expect(names).toEqual([...PASSED_VARIABLES]);
  });
});
