/**
 * The compare, rebaseline and history commands through `main`, with real files in a temporary directory:
 * exit codes, messages, the verdict JSON, the audit log, the suite-hash guard, and the extra-seed re-run
 * with the real runner.
 */
import { existsSync, readFileSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { readAuditLog } from "../../src/baselines/store.js";
import { main } from "../../src/cli/main.js";
import type { VerdictDocument } from "../../src/compare/types.js";
import { parseConfig } from "../../src/config/load.js";
import { runSuite } from "../../src/runner/pool.js";
import { buildResults } from "../../src/runner/results.js";
import { resolveSuite } from "../../src/runner/suite.js";
import { captureHost, tempDir, writeConfig, writeResults } from "../baselines/helpers/host.js";
import { HASH, jitter, results, run, spec } from "./fixtures.js";

function doc(factor: number, seeds = 30) {
  const j = jitter(seeds, 0.2, 5);
  const k = jitter(seeds, 0.01, 6);
  return results(
    ["adam", "sgd"].map((o) => ({
      case: spec({ optimizer: o, seeds }),
      runs: j.map((x, i) => run(i, { scale: o === "adam" ? x * factor * (factor === 1 ? 1 : k[i]) : x })),
    })),
  );
}

async function cli(cwd: string, ...argv: string[]) {
  const h = captureHost(cwd);
  const code = await main(argv, h);
  return { code, out: h.stdout, err: h.stderr };
}

async function withBaselines(config: Record<string, unknown> = { extraSeeds: { perCase: 0 } }) {
  const cwd = tempDir();
  writeConfig(cwd, config);
  writeResults(cwd, "base.json", doc(1));
  const r = await cli(
    cwd,
    "rebaseline",
    "--results",
    "base.json",
    "--reason",
    "first baselines",
    "--commit",
    "c0ffee1",
    "--quiet",
  );
  expect(r.code, r.err).toBe(0);
  return cwd;
}

describe("gradgate compare", () => {
  it("treats every case as new before the first baselines, and exits 2 when results are missing", async () => {
    const cwd = tempDir();
    writeConfig(cwd);
    writeResults(cwd, "r.json", doc(1));
    const first = await cli(cwd, "compare", "--results", "r.json");
    expect(first.err).toBe(
      'gradgate: no baselines in baselines/ yet: every case is new; create them with gradgate rebaseline --results r.json --reason "first baselines"\n',
    );
    expect(first.out).toMatch(/\n2 cases: 2 new\ngate: PASS\n$/);
    expect(first.code).toBe(0);
    expect((await cli(cwd, "compare")).err).toBe(
      "gradgate: compare: --results FILE is required (the file gradgate run wrote, e.g. .gradgate/results.json)\n",
    );
    expect((await cli(cwd, "compare", "--results", "nope.json")).err).toBe(
      "gradgate: results nope.json: no such file; run gradgate run --out nope.json first\n",
    );
  });

  it("exits 0 for unchanged results and writes the verdict JSON", async () => {
    const cwd = await withBaselines();
    writeResults(cwd, "same.json", doc(1));
    const r = await cli(cwd, "compare", "--results", "same.json", "--json", "out/verdict.json");
    expect(r.code).toBe(0);
    expect(r.out).toBe("2 cases: 2 unchanged\ngate: PASS\n");
    const v = JSON.parse(readFileSync(join(cwd, "out/verdict.json"), "utf8")) as VerdictDocument;
    expect(v.format).toBe("gradgate-verdict");
    expect(v.gate.verdict).toBe("pass");
    expect(v.baseline.commits).toEqual({ adam: "c0ffee1", sgd: "c0ffee1" });
  });

  it("exits 1 when a case regressed, naming it", async () => {
    const cwd = await withBaselines();
    writeResults(cwd, "slow.json", doc(1.4));
    const r = await cli(cwd, "compare", "--results", "slow.json");
    expect(r.code).toBe(1);
    expect(r.out).toMatch(/^case +verdict +drift +trajectory\n/);
    expect(r.out).toMatch(
      /adam\/default\/quadratic\(n=4\) +regressed +\S+ ×1\.4\d* \[[\d.]+, [\d.]+\] +identical/,
    );
    expect(r.out).toMatch(
      /\n2 cases: 1 regressed, 1 unchanged\ngate: FAIL\n {2}- adam\/default\/quadratic\(n=4\): regressed — /,
    );
  });

  it("exits 2 on a damaged baseline, quoting the file and the fix", async () => {
    const cwd = await withBaselines();
    const file = join(cwd, "baselines", "sgd.json");
    writeFileSync(file, readFileSync(file, "utf8").slice(0, 100));
    writeResults(cwd, "same.json", doc(1));
    const r = await cli(cwd, "compare", "--results", "same.json");
    expect(r.code).toBe(2);
    expect(r.err).toMatch(
      /^gradgate: baseline baselines\/sgd\.json: the file ends early at line \d+, column \d+ \(truncated: 100 bytes\); restore it/,
    );
  });
});

describe("gradgate rebaseline and history", () => {
  it("requires a reason", async () => {
    const cwd = tempDir();
    writeResults(cwd, "r.json", doc(1));
    expect((await cli(cwd, "rebaseline", "--results", "r.json", "--reason", "  ")).err).toBe(
      'gradgate: rebaseline: --reason is required and must not be empty: say why the baselines change, e.g. --reason "adam: fix bias correction (#123)"\n',
    );
  });

  it("appends an audit entry with the drift against the previous baselines; history shows it", async () => {
    const cwd = await withBaselines();
    writeResults(cwd, "faster.json", doc(0.7));
    const r = await cli(
      cwd,
      "rebaseline",
      "--results",
      "faster.json",
      "--reason",
      "adam: faster warm-up (#42)",
      "--commit",
      "beef",
    );
    expect(r.code, r.err).toBe(0);
    expect(r.out).toBe(
      "wrote 2 baseline file(s) to baselines/ (2 cases, commit beef)\n" +
        "against the previous baselines: 1 improved, 1 unchanged\n" +
        "audit entry appended to baselines/audit.jsonl\n",
    );
    const log = readAuditLog(join(cwd, "baselines"), "baselines");
    expect(log.map((e) => [e.commit, e.reason])).toEqual([
      ["c0ffee1", "first baselines"],
      ["beef", "adam: faster warm-up (#42)"],
    ]);
    expect(log[0].cases.map((c) => c.verdict)).toEqual(["new", "new"]);
    expect(log[1].cases.map((c) => [c.id, c.verdict])).toEqual([
      ["adam/default/quadratic(n=4)", "improved"],
      ["sgd/default/quadratic(n=4)", "unchanged"],
    ]);
    const h = await cli(cwd, "history", "adam");
    expect(h.code).toBe(0);
    expect(h.out).toMatch(
      /^history of adam: 2 baseline change\(s\), oldest first\n\n\S+ {2}c0ffee1 {2}first baselines\n {2}1 case\(s\): 1 new\n/,
    );
    expect(h.out).toMatch(
      / {2}beef {2}adam: faster warm-up \(#42\)\n {2}1 case\(s\): 1 improved\n {2}adam\/default\/quadratic\(n=4\): improved — stepsTo\(1e-1\) ×0\.7/,
    );
    expect((await cli(cwd, "history", "lbfgs")).err).toBe(
      'gradgate: history: no entry of baselines/audit.jsonl mentions optimizer "lbfgs" (known: adam, sgd)\n',
    );
  });

  it("refuses results of another suite unless --allow-suite-change, then removes files of dropped optimizers", async () => {
    const cwd = await withBaselines();
    const other = { ...doc(1), suite: { ...doc(1).suite, hash: "sha256:" + "01".repeat(32) } };
    other.cases = other.cases.filter((c) => c.case.optimizer === "adam");
    writeResults(cwd, "other.json", other);
    const refused = await cli(
      cwd,
      "rebaseline",
      "--results",
      "other.json",
      "--reason",
      "new suite",
      "--commit",
      "x",
    );
    expect(refused.code).toBe(2);
    expect(refused.err).toBe(
      `gradgate: rebaseline: results other.json come from a different suite (hash sha256:010101010101…) than baselines/adam.json ` +
        `(${HASH.slice(0, 19)}…): the suite definition changed (problems, budgets, ladder or seeds); pass --allow-suite-change ` +
        `to replace the baselines with the new suite's\n`,
    );
    const ok = await cli(
      cwd,
      "rebaseline",
      "--results",
      "other.json",
      "--reason",
      "new suite",
      "--commit",
      "x",
      "--allow-suite-change",
    );
    expect(ok.code, ok.err).toBe(0);
    expect(ok.out).toMatch(/; removed sgd\.json\n/);
    expect(existsSync(join(cwd, "baselines", "sgd.json"))).toBe(false);
    expect(readAuditLog(join(cwd, "baselines"), "baselines")[1]).toMatchObject({
      suiteChanged: true,
      removed: ["sgd.json"],
    });
  });
});

describe("extra seeds with the real runner", () => {
  it("rebaseline keeps extra seeds; compare re-runs an inconclusive case on them and pairs them seed by seed", async () => {
    const cwd = tempDir();
    const yaml = (lr: number) =>
      `seeds: 3\nbudget: { steps: 150 }\npolicy: { extraSeeds: { perCase: 4 } }\n` +
      `optimizers: [{ name: sgd, hyper: { lr: ${lr} } }]\nproblems: [{ use: rosenbrock }]\n`;
    writeFileSync(join(cwd, "gradgate.yml"), yaml(0.0005));
    const resultsFor = async (lr: number) => {
      const suite = resolveSuite(parseConfig(yaml(lr), "gradgate.yml"), "gradgate.yml");
      return buildResults(suite, await runSuite(suite, { workers: 1 }));
    };
    writeResults(cwd, "base.json", await resultsFor(0.0005));
    const rb = await cli(
      cwd,
      "rebaseline",
      "--results",
      "base.json",
      "--reason",
      "first",
      "--commit",
      "c",
      "--workers",
      "1",
    );
    expect(rb.code, rb.err).toBe(0);
    expect(rb.err).toBe("gradgate: running 4 extra seed run(s) (4 per case) for the baselines\n");
    const stored = JSON.parse(readFileSync(join(cwd, "baselines", "sgd.json"), "utf8"));
    expect(stored.cases[0].extraRuns.map((r: { seed: number }) => r.seed)).toEqual([3, 4, 5, 6]);

    writeResults(cwd, "cand.json", await resultsFor(0.00049));
    const r = await cli(cwd, "compare", "--results", "cand.json", "--json", "v.json", "--workers", "1");
    expect([0, 1]).toContain(r.code);
    expect(r.err).toBe("gradgate: 1 inconclusive case(s); running 4 extra seed run(s)\n");
    const v = JSON.parse(readFileSync(join(cwd, "v.json"), "utf8")) as VerdictDocument;
    expect(v.rerun).toEqual({
      requested: ["sgd/default/rosenbrock"],
      rerun: ["sgd/default/rosenbrock"],
      runs: 4,
      budget: 2500,
      skipped: [],
    });
    expect(v.cases[0].seeds).toEqual({ paired: 7, baselineOnly: 0, candidateOnly: 0, extra: 4 });
    expect(v.statistics).toEqual({ looks: 2, alphaPerLook: 0.025 });
    expect(r.out).toMatch(/extra seeds: 1 of 1 inconclusive case\(s\) re-run \(4 runs\)\n/);
  }, 60_000);
});
