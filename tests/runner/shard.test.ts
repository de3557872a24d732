import { mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { mergeCommand, readAndMerge } from "../../src/cli/merge-command.js";
import type { Host } from "../../src/cli/host.js";
import { runCommand } from "../../src/cli/run-command.js";
import { canonicalJson } from "../../src/core/json.js";
import type { ResultsDocument } from "../../src/runner/results.js";
import { mergeShards, parseShard, shardItems } from "../../src/runner/shard.js";

// A small real suite: 2 reference optimizers × 3 problems × 5 seeds = 30 runs, quick to run.
const CONFIG = `
seed: 11
seeds: 5
budget: { steps: 150 }
optimizers:
  - name: sgd
    use: sgd
    hyper: { lr: 0.001 }
  - name: adam
    use: adam
    hyper: { lr: 0.01 }
problems:
  - use: rosenbrock
  - use: quadratic
  - use: beale
`;

let dir: string;
const host = (): Host => ({ out: () => {}, err: () => {}, interactive: false, cwd: dir });
const read = (name: string) => readFileSync(join(dir, name), "utf8");
const doc = (name: string) => JSON.parse(read(name)) as ResultsDocument;

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), "gradgate-shard-"));
  writeFileSync(join(dir, "gradgate.yml"), CONFIG);
  await runCommand(host(), { config: "gradgate.yml", out: "whole.json", workers: 1, quiet: true });
  for (let i = 1; i <= 4; i++) {
    await runCommand(host(), {
      config: "gradgate.yml",
      out: `shards/s${i}.json`,
      workers: 1,
      quiet: true,
      shard: { index: i, count: 4 },
    });
  }
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe("parseShard", () => {
  it.each([
    ["1/1", 1, 1],
    ["2/4", 2, 4],
    [" 3 / 7 ", 3, 7],
  ])("reads %j", (text, index, count) => {
    expect(parseShard(text, "--shard")).toEqual({ index, count });
  });
  it.each(["0/4", "5/4", "2", "a/b", "1/0", "1/257", "-1/4"])("refuses %j", (text) => {
    expect(() => parseShard(text, "--shard")).toThrow(
      `--shard must be "i/n" with 1 ≤ i ≤ n ≤ 256 (shard i of n, e.g. "2/4"), got ${JSON.stringify(text)}`,
    );
  });
});

describe("shardItems", () => {
  it("deals the flat run list round-robin, every item exactly once", () => {
    expect(shardItems(10, { index: 1, count: 4 })).toEqual([0, 4, 8]);
    expect(shardItems(10, { index: 4, count: 4 })).toEqual([3, 7]);
    for (const count of [1, 3, 4, 7, 31]) {
      const all = Array.from({ length: count }, (_, i) => shardItems(30, { index: i + 1, count })).flat();
      expect(all.sort((a, b) => a - b)).toEqual(Array.from({ length: 30 }, (_, i) => i));
    }
  });
});

describe("run --shard and merge", () => {
  it("writes each shard's part with its shard field, sizes 8, 8, 7, 7 of 30 runs", () => {
    const sizes = [1, 2, 3, 4].map((i) => {
      const d = doc(`shards/s${i}.json`);
      expect(d.shard).toEqual({ index: i, count: 4 });
      return d.cases.reduce((n, c) => n + c.runs.length, 0);
    });
    expect(sizes).toEqual([8, 8, 7, 7]);
    expect(doc("whole.json").shard).toBeUndefined();
  });

  it("merges shards 1..4 into exactly the bytes of a single-machine run", () => {
    const code = mergeCommand(host(), { inputs: ["shards"], out: "merged.json", quiet: true });
    expect(code).toBe(0);
    expect(read("merged.json")).toBe(read("whole.json"));
  });

  it("gives the same bytes whatever order the files are named in", () => {
    const files = [3, 1, 4, 2].map((i) => `shards/s${i}.json`);
    expect(canonicalJson(readAndMerge(dir, files))).toBe(read("whole.json"));
  });

  it("refuses a missing shard", () => {
    expect(() => readAndMerge(dir, ["shards/s1.json", "shards/s2.json", "shards/s4.json"])).toThrow(
      "merge: shard 3/4 is missing (have 1, 2, 4); pass the results of every shard",
    );
  });

  it("refuses a shard given twice", () => {
    writeFileSync(join(dir, "copy.json"), read("shards/s2.json"));
    expect(() => readAndMerge(dir, ["shards", "copy.json"])).toThrow(
      "merge: copy.json and shards/s2.json are both shard 2/4; give each shard's results once",
    );
  });

  it("refuses shards of different suites", () => {
    const other = doc("shards/s3.json");
    writeFileSync(
      join(dir, "other.json"),
      canonicalJson({ ...other, suite: { ...other.suite, hash: "sha256:0000" } }),
    );
    expect(() =>
      readAndMerge(dir, ["shards/s1.json", "shards/s2.json", "other.json", "shards/s4.json"]),
    ).toThrow(
      // Files are taken in sorted order, so other.json is the first one the others are held against.
      `merge: suite hash differs: other.json has "sha256:0000", shards/s1.json has "${other.suite.hash}"; ` +
        "every shard must run the same suite config",
    );
  });

  it("refuses a whole-suite results file", () => {
    expect(() => readAndMerge(dir, ["whole.json"])).toThrow(
      'merge: whole.json has no "shard" field: it holds a whole suite; merge takes the files of run --shard i/n',
    );
  });

  it("refuses a shard with a run removed (a gap) and one with a run repeated", () => {
    const s2 = doc("shards/s2.json");
    const cut = { ...s2, cases: s2.cases.map((c, i) => (i === 0 ? { ...c, runs: c.runs.slice(1) } : c)) };
    const parts = (d: ResultsDocument) =>
      [1, 2, 3, 4].map((i) =>
        i === 2 ? { name: "s2-edited.json", doc: d } : { name: `s${i}`, doc: doc(`shards/s${i}.json`) },
      );
    expect(() => mergeShards(parts(cut))).toThrow(
      "merge: s2-edited.json (shard 2/4) holds 7 runs, expected 8 for a suite of 30 runs; " +
        "it is incomplete or was not written by run --shard 2/4",
    );
    // Same count, but a case's first run in this shard replaced by a copy of its second: a seed twice, one gone.
    const ci = s2.cases.findIndex((c) => c.runs.length >= 2);
    const target = s2.cases[ci];
    const k = s2.cases.slice(0, ci).reduce((n, c) => n + c.runs.length, 0);
    const dup = {
      ...s2,
      cases: s2.cases.map((c, i) => (i === ci ? { ...c, runs: [c.runs[1], ...c.runs.slice(1)] } : c)),
    };
    expect(() => mergeShards(parts(dup))).toThrow(
      `merge: run ${1 + 4 * k} of the suite should be case "${target.case.id}" seed ${target.runs[0].seed}, found case ` +
        `"${target.case.id}" seed ${target.runs[1].seed} (s2-edited.json); the shards do not come from one split of one suite`,
    );
  });

  it("refuses shards run on different machine types", () => {
    const s4 = doc("shards/s4.json");
    const moved = { ...s4, environment: { ...s4.environment, arch: "riscv64" } };
    const parts = [1, 2, 3].map((i) => ({ name: `s${i}`, doc: doc(`shards/s${i}.json`) }));
    expect(() => mergeShards([...parts, { name: "s4", doc: moved }])).toThrow(
      /^merge: environment differs: s1 has .*, s4 has .*riscv64"; run every shard on the same runner image and Node.js version$/,
    );
  });
});
