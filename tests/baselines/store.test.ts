/**
 * The baselines directory as one transaction: writes land whole, a journal left by a killed process is
 * rolled forward, temporary files of an aborted write are removed, and files made for different suites
 * are refused. (The kill itself, with a real child process, is in kill.test.ts.)
 */
import { existsSync, readdirSync, readFileSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { JOURNAL, readBaselineDir, recoverBaselineDir, writeBaselineSet } from "../../src/baselines/store.js";
import { baselineDigest } from "../../src/baselines/validate.js";
import { canonicalJson } from "../../src/core/json.js";
import { baselines, run, spec } from "../compare/fixtures.js";
import { tempDir } from "./helpers/host.js";

function twoFiles(seedShift = 0) {
  const a = spec({ optimizer: "adam" });
  const s = spec({ optimizer: "sgd" });
  const runs = Array.from({ length: 5 }, (_, i) => run(i, { scale: 1 + seedShift }));
  return baselines([
    { case: a, runs },
    { case: s, runs },
  ]);
}

describe("baseline store", () => {
  it("writes every file and leaves no journal or temporary file behind", () => {
    const dir = tempDir();
    const files = twoFiles();
    writeBaselineSet(dir, { write: new Map([...files].map(([n, f]) => [`${n}.json`, canonicalJson(f)])), remove: [] });
    expect(readdirSync(dir).sort()).toEqual(["adam.json", "sgd.json"]);
    expect([...readBaselineDir(dir, "baselines").keys()]).toEqual(["adam", "sgd"]);
  });

  it("rolls a committed but unfinished write forward (journal present, renames half done)", () => {
    const dir = tempDir();
    const old = twoFiles();
    const fresh = twoFiles(0.5);
    for (const [n, f] of old) writeFileSync(join(dir, `${n}.json`), canonicalJson(f));
    // The state a kill between the first and second rename leaves: adam renamed, sgd still a temp file.
    writeFileSync(join(dir, "adam.json"), canonicalJson(fresh.get("adam")!));
    writeFileSync(join(dir, ".sgd.json.abc-def.tmp"), canonicalJson(fresh.get("sgd")!));
    writeFileSync(
      join(dir, JOURNAL),
      JSON.stringify({ txid: "abc-def", renames: [[".adam.json.abc-def.tmp", "adam.json"], [".sgd.json.abc-def.tmp", "sgd.json"]], removes: [] }),
    );
    expect(recoverBaselineDir(dir)).toBe("completed an interrupted rebaseline (2 file(s))");
    expect(readdirSync(dir).sort()).toEqual(["adam.json", "sgd.json"]);
    expect(readFileSync(join(dir, "sgd.json"), "utf8")).toBe(canonicalJson(fresh.get("sgd")!));
    expect(recoverBaselineDir(dir)).toBe("");
  });

  it("removes temporary files of a write that never reached its commit point, keeping the old files", () => {
    const dir = tempDir();
    const old = twoFiles();
    for (const [n, f] of old) writeFileSync(join(dir, `${n}.json`), canonicalJson(f));
    writeFileSync(join(dir, ".adam.json.zz-yy.tmp"), "{ half a fi");
    expect(recoverBaselineDir(dir)).toBe("removed 1 temporary file(s) of an interrupted rebaseline");
    expect(existsSync(join(dir, ".adam.json.zz-yy.tmp"))).toBe(false);
    expect(readFileSync(join(dir, "adam.json"), "utf8")).toBe(canonicalJson(old.get("adam")!));
  });

  it("refuses a directory whose files were made for different suites", () => {
    const dir = tempDir();
    const files = twoFiles();
    writeFileSync(join(dir, "adam.json"), canonicalJson(files.get("adam")!));
    const other = JSON.parse(canonicalJson(files.get("sgd")!));
    other.provenance.suite.hash = "sha256:" + "cd".repeat(32);
    other.digest = baselineDigest(other);
    writeFileSync(join(dir, "sgd.json"), canonicalJson(other));
    expect(() => readBaselineDir(dir, "baselines")).toThrow(
      "baselines baselines: the files were made for different suites (baselines/adam.json has sha256:abababababab…, " +
        "baselines/sgd.json has sha256:cdcdcdcdcdcd…); regenerate the whole set with gradgate rebaseline --allow-suite-change",
    );
  });
});
