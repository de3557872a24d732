/**
 * Damaged baseline files: truncated, not JSON, another format, wrong version, edited by hand (content and
 * types), inconsistent. Each gets one message naming the file and the field, quoting the bad value and
 * giving the fix.
 */
import { describe, expect, it } from "vitest";
import { baselineDigest, parseBaseline } from "../../src/baselines/validate.js";
import type { BaselineFile } from "../../src/baselines/types.js";
import { canonicalJson } from "../../src/core/json.js";
import { baselines, run, spec } from "../compare/fixtures.js";

const FILE = "baselines/adam.json";
function good(): BaselineFile {
  const s = spec({ seeds: 3 });
  return baselines([{ case: s, runs: [run(0), run(1), run(2)] }]).get("adam")!;
}
const text = canonicalJson(good());
const parse = (t: string, name = "adam") => () => parseBaseline(t, FILE, name);
/** Re-digested, so only the consistency checks can object. */
function redigest(b: Record<string, unknown>): string {
  return canonicalJson({ ...b, digest: baselineDigest(b as unknown as BaselineFile) });
}

describe("baseline file errors", () => {
  it("reads a good file", () => {
    expect(parseBaseline(text, FILE, "adam").cases[0].runs).toHaveLength(3);
  });

  it("truncated", () => {
    const cut = text.slice(0, 200);
    const lines = cut.split("\n");
    expect(parse(cut)).toThrow(
      `baseline baselines/adam.json: the file ends early at line ${lines.length}, column ${lines.at(-1)!.length + 1} ` +
        `(truncated: 200 bytes); restore it from version control (git checkout -- baselines/adam.json) or regenerate the file with gradgate rebaseline`,
    );
  });

  it("empty", () => {
    expect(parse("")).toThrow(
      "baseline baselines/adam.json: the file is empty; restore it from version control or regenerate the file with gradgate rebaseline",
    );
  });

  it("not valid JSON (a merge conflict marker)", () => {
    const broken = text.replace('"format"', '<<<<<<< HEAD\n"format"');
    const before = broken.slice(0, broken.indexOf("<<<<<<<"));
    const line = before.split("\n").length;
    const column = before.length - before.lastIndexOf("\n");
    expect(parse(broken)).toThrow(
      `baseline baselines/adam.json: not valid JSON at line ${line}, column ${column}: Expected double-quoted property name ` +
        `in JSON at position ${before.length}; regenerate the file with gradgate rebaseline`,
    );
  });

  it("another format", () => {
    expect(parse(JSON.stringify({ format: "gradgate-results", version: 1 }))).toThrow(
      'baseline baselines/adam.json: format must be "gradgate-baseline", got "gradgate-results": not a gradgate baseline; ' +
        "move it out of the baselines directory or regenerate the file with gradgate rebaseline",
    );
  });

  it("wrong version: newer and older", () => {
    expect(parse(text.replace('"version": 1', '"version": 2'))).toThrow(
      "baseline baselines/adam.json: version must be 1, got 2: written by a newer gradgate than 0.1.0; upgrade gradgate or regenerate the file with gradgate rebaseline",
    );
    expect(parse(text.replace('"version": 1', '"version": "1"'))).toThrow(
      'baseline baselines/adam.json: version must be 1, got "1"; regenerate the file with gradgate rebaseline',
    );
  });

  it("a value edited by hand (still a number): the digest catches it", () => {
    const edited = text.replace('"finalGap": 5e-12', '"finalGap": 4e-12');
    expect(edited).not.toBe(text);
    expect(parse(edited)).toThrow(
      /^baseline baselines\/adam\.json: digest "sha256:[0-9a-f]{64}" does not match the content \(sha256:[0-9a-f]{64}\): the file was changed after gradgate wrote it \(edited by hand\?\); undo the edit \(git checkout -- baselines\/adam\.json\) or regenerate the file with gradgate rebaseline$/,
    );
  });

  it("a value of the wrong type: the field is named", () => {
    const b = JSON.parse(text);
    b.cases[0].runs[2].finalGap = "x";
    expect(parse(JSON.stringify(b))).toThrow(
      'baseline baselines/adam.json: cases[0].runs[2].finalGap must be a number or null, got "x"; regenerate the file with gradgate rebaseline',
    );
  });

  it("a field removed, a field added", () => {
    const b = JSON.parse(text);
    delete b.provenance.commit;
    expect(parse(JSON.stringify(b))).toThrow(
      "baseline baselines/adam.json: provenance.commit is missing; regenerate the file with gradgate rebaseline",
    );
    const c = JSON.parse(text);
    c.cases[0].runs[0].note = "fast";
    expect(parse(JSON.stringify(c))).toThrow(
      "baseline baselines/adam.json: cases[0].runs[0].note is not a baseline field; regenerate the file with gradgate rebaseline",
    );
  });

  it("seeds out of order, arrays of the wrong length, a file under another name", () => {
    const b = JSON.parse(text);
    b.cases[0].runs[1].seed = 2;
    expect(parse(redigest(b))).toThrow(
      "baseline baselines/adam.json: cases[0].runs[1].seed is 2, expected 1 (seeds in order, no gaps); regenerate the file with gradgate rebaseline",
    );
    const c = JSON.parse(text);
    c.cases[0].runs[0].stepsTo.pop();
    expect(parse(redigest(c))).toThrow(
      "baseline baselines/adam.json: cases[0].runs[0].stepsTo holds 5 values, expected 6 (one per ladder rung); regenerate the file with gradgate rebaseline",
    );
    expect(parse(text, "sgd")).toThrow(
      'baseline baselines/adam.json: optimizer is "adam" but the file name says "sgd"; rename the file to adam.json or regenerate the file with gradgate rebaseline',
    );
  });
});
