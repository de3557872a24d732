import { describe, expect, it } from "vitest";
import { INPUTS, inputValue, readSettings } from "../../src/action/settings.js";

describe("readSettings", () => {
  it("gives every input its action.yml default when the runner passes nothing", () => {
    const lines: string[] = [];
    const s = readSettings({}, (l) => lines.push(l));
    expect(s).toEqual({
      mode: "gate",
      config: undefined,
      baselines: "baselines",
      workers: undefined,
      shard: undefined,
      shardResults: [".gradgate/shards"],
      resultsFile: ".gradgate/results.json",
      verdictFile: ".gradgate/verdict.json",
      reportFile: ".gradgate/report.html",
      reason: "",
      allowSuiteChange: false,
      prComment: true,
      commentKey: "",
      pullRequest: undefined,
      failJob: true,
      artifactName: "gradgate-report",
      token: "",
    });
    expect(lines).toHaveLength(17);
    expect(lines).toContain('gradgate setting mode = "gate"');
    expect(lines).toContain("gradgate setting workers = (default)");
  });

  it("reads INPUT_* variables the way the runner names them, and never logs the token", () => {
    const env = {
      INPUT_MODE: " merge ",
      "INPUT_SHARD-RESULTS": "shards/a\n\n  shards/b  \r\n",
      INPUT_WORKERS: "3",
      "INPUT_PR-COMMENT": "False",
      "INPUT_FAIL-JOB": "TRUE",
      INPUT_TOKEN: "ghs_secret",
    };
    const lines: string[] = [];
    const s = readSettings(env, (l) => lines.push(l));
    expect(s.mode).toBe("merge");
    expect(s.shardResults).toEqual(["shards/a", "shards/b"]);
    expect(s.workers).toBe(3);
    expect(s.prComment).toBe(false);
    expect(s.failJob).toBe(true);
    expect(s.token).toBe("ghs_secret");
    expect(lines.join("\n")).not.toContain("ghs_secret");
    expect(lines).toContain("gradgate setting token = (set, not shown)");
    expect(inputValue({ "INPUT_COMMENT-KEY": "gpu" }, "comment-key")).toBe("gpu");
  });

  it("reads a shard and a pull-request number", () => {
    expect(readSettings({ INPUT_SHARD: "2/4" }).shard).toEqual({ index: 2, count: 4 });
    expect(readSettings({ INPUT_MODE: "publish", "INPUT_PULL-REQUEST": "42" }).pullRequest).toBe(42);
  });

  it.each([
    [{ INPUT_MODE: "check" }, 'input mode must be one of gate, rebaseline, merge, publish, got "check"'],
    [{ INPUT_WORKERS: "0" }, 'input workers must be a positive integer or "auto", got "0"'],
    [{ INPUT_WORKERS: "many" }, 'input workers must be a positive integer or "auto", got "many"'],
    [
      { INPUT_SHARD: "5/4" },
      'input shard must be "i/n" with 1 ≤ i ≤ n ≤ 256 (shard i of n, e.g. "2/4"), got "5/4"',
    ],
    [
      { INPUT_SHARD: "1/2", INPUT_MODE: "publish" },
      'input shard is for mode "gate" (one shard of the runs), got mode "publish"',
    ],
    [{ "INPUT_PULL-REQUEST": "#12" }, 'input pull-request must be a pull-request number, got "#12"'],
    [{ "INPUT_PR-COMMENT": "yes" }, 'input pr-comment must be true or false, got "yes"'],
    [{ "INPUT_ALLOW-SUITE-CHANGE": "1" }, 'input allow-suite-change must be true or false, got "1"'],
  ])("refuses %j", (env, message) => {
    expect(() => readSettings(env)).toThrow(message);
  });

  it("declares each input once, with a description", () => {
    const names = INPUTS.map((i) => i.name);
    expect(new Set(names).size).toBe(names.length);
    for (const i of INPUTS) expect(i.description.length).toBeGreaterThan(20);
  });
});
