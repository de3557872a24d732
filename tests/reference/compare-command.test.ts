/**
 * The compare command runs the config's reference checks and puts them in the verdict beside the drift:
 * results → gradgate rebaseline → gradgate compare in a temporary directory, with a module optimizer
 * (untrusted user code loaded from a file) that claims to be Nesterov but drops the look-ahead. The results
 * are made by the run loop directly (prepareSuite + RunBatch), as `gradgate run` would write them.
 */
import { mkdtempSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { prepareSuite } from "../../src/adapters/prepare.js";
import { main } from "../../src/cli/main.js";
import { parseConfig } from "../../src/config/load.js";
import { canonicalJson } from "../../src/core/json.js";
import { buildResults } from "../../src/runner/results.js";
import { resultsOf } from "./helpers.js";
import type { Host } from "../../src/cli/host.js";
import type { VerdictDocument } from "../../src/compare/types.js";

const HEAVY_BALL_MODULE = `
// Claims to be Nesterov's method; takes the gradient at the current point (heavy ball).
export const notNesterov = {
  name: "not-nesterov",
  defaults: { lr: 0.01, momentum: 0.9, weightDecay: 0 },
  create(hyper, dim) {
    const g = new Float64Array(dim), v = new Float64Array(dim);
    let lr = hyper.lr;
    return {
      step(w, oracle) {
        oracle.evaluate(w, g);
        for (let i = 0; i < dim; i++) { v[i] = hyper.momentum * v[i] + lr * (g[i] + hyper.weightDecay * w[i]); w[i] -= v[i]; }
      },
      setLearningRate(x) { lr = x; },
    };
  },
};
`;

const config = (gating: boolean) => `
seeds: 2
budget: { steps: 20000 }
optimizers:
  - { name: gd, use: sgd, hyper: { lr: 0.002 } }
  - { name: nag, use: nesterov }
  - { name: mine, use: "module:./not-nesterov.mjs#notNesterov" }
problems:
  - { use: freudenstein-roth, optimizers: [gd] }
  - { use: quadratic, params: { n: 3 }, optimizers: [nag, mine], budget: { steps: 300 } }
checks:
  minimum:
    - { optimizer: gd, problem: freudenstein-roth, basin: local }
  conformance:
    - { optimizer: nag, method: nesterov }
    - { optimizer: mine, method: nesterov, gating: ${gating} }
`;

function host(cwd: string): Host & { text: string } {
  const h = {
    text: "",
    interactive: false,
    cwd,
    out: (t: string) => void (h.text += t),
    err: (t: string) => void (h.text += t),
  };
  return h;
}

async function compareIn(gating: boolean): Promise<{ code: number; verdict: VerdictDocument; text: string }> {
  const dir = mkdtempSync(join(tmpdir(), "gradgate-reference-"));
  writeFileSync(join(dir, "gradgate.yml"), config(gating));
  writeFileSync(join(dir, "not-nesterov.mjs"), HEAVY_BALL_MODULE);
  const suite = await prepareSuite(parseConfig(config(gating), "gradgate.yml"), "gradgate.yml", {
    baseDir: dir,
  });
  const env = { node: "v20.0.0", platform: "linux", arch: "x64" };
  writeFileSync(join(dir, "results.json"), canonicalJson(buildResults(suite, await resultsOf(suite), env)));
  const h = host(dir);
  const rebaseline = [
    "rebaseline",
    "--results",
    "results.json",
    "--reason",
    "first baselines",
    "--commit",
    "0123abc",
  ];
  expect(await main([...rebaseline, "--extra-seeds", "0", "--quiet"], h), h.text).toBe(0);
  const code = await main(
    ["compare", "--results", "results.json", "--json", "verdict.json", "--no-extra-seeds"],
    h,
  );
  const verdict = JSON.parse(readFileSync(join(dir, "verdict.json"), "utf8")) as VerdictDocument;
  return { code, verdict, text: h.text };
}

describe("gradgate compare with reference checks", () => {
  it("fails the gate on a gating conformance failure, with the check's sentence, although nothing drifted", async () => {
    const { code, verdict, text } = await compareIn(true);
    expect(code).toBe(1);
    expect(verdict.counts.unchanged).toBe(3);
    expect(verdict.gate.verdict).toBe("fail");
    expect(
      verdict.gate.checks
        .filter((c) => !c.id.includes(":", "conformance:".length))
        .map((c) => `${c.id} ${c.status}`),
    ).toEqual(["conformance:nag pass", "conformance:mine fail"]);
    expect(verdict.gate.reasons).toHaveLength(1);
    expect(verdict.gate.reasons[0].code).toBe("check");
    expect(verdict.gate.reasons[0].message).toMatch(
      /^Nesterov's accelerated gradient conformance: from step 2 the iterates differ from the published rule by \d\.\de-\d \(relative, probe "[a-z ]+"\); the gradient is taken at the current point, not at the look-ahead point w − γv \(that is heavy ball\)$/,
    );
    const gd = verdict.cases.find((c) => c.id === "gd/default/freudenstein-roth")!;
    expect(gd.checks.map((c) => `${c.id} ${c.status}`)).toEqual(["known-minimum:local pass"]);
    expect(text).toContain("gate: FAIL");
    expect(text).toContain("the gradient is taken at the current point, not at the look-ahead point w − γv");
  });

  it("passes the gate when that check is declared gating: false, and still reports it", async () => {
    const { code, verdict } = await compareIn(false);
    expect(code).toBe(0);
    expect(verdict.gate.verdict).toBe("pass");
    expect(verdict.gate.checks.find((c) => c.id === "conformance:mine")).toMatchObject({
      status: "fail",
      gating: false,
    });
  });
});
