import { describe, expect, it } from "vitest";
import { parseConfig } from "../../src/config/load.js";
import { jsonPointerToPath } from "../../src/core/json-pointer.js";
import { InputError } from "../../src/core/errors.js";

const minimal = `
optimizers:
  - name: adam
problems:
  - use: rosenbrock
`;

function errorOf(text: string, file = "gradgate.yml"): string {
  try {
    parseConfig(text, file);
  } catch (err) {
    expect(err).toBeInstanceOf(InputError);
    return (err as Error).message;
  }
  throw new Error("expected an error");
}

describe("parseConfig", () => {
  it("fills every default from the schema", () => {
    const c = parseConfig(minimal, "gradgate.yml");
    expect(c).toMatchObject({
      version: 1,
      seed: 1,
      seeds: 5,
      budget: { steps: 1000, evaluations: 0, seconds: 30 },
      ladder: [1e-1, 1e-2, 1e-3, 1e-4, 1e-6, 1e-8],
      stopAt: 1e-12,
      blowUp: 1e6,
      fingerprint: { steps: 20, maxDim: 4 },
    });
  });

  it("keeps given values and fills the rest of a partial budget", () => {
    const c = parseConfig(minimal + "budget:\n  steps: 50\n", "gradgate.yml");
    expect(c.budget).toEqual({ steps: 50, evaluations: 0, seconds: 30 });
  });

  it("reads JSON by extension", () => {
    const c = parseConfig(
      JSON.stringify({ optimizers: [{ name: "sgd" }], problems: [{ use: "beale" }] }),
      "s.json",
    );
    expect(c.optimizers[0].name).toBe("sgd");
  });

  it.each([
    ["seeds: ten\n", 'config gradgate.yml: seeds must be an integer, got "ten"'],
    ["seeds: 0\n", "config gradgate.yml: seeds must be ≥ 1, got 0"],
    ["budget:\n  steps: -3\n", "config gradgate.yml: budget.steps must be ≥ 1, got -3"],
    [
      "budget:\n  stepz: 3\n",
      "config gradgate.yml: budget.stepz is not a known field (known: steps, evaluations, seconds)",
    ],
    ["stopAt: 2\n", "config gradgate.yml: stopAt must be < 1, got 2"],
    [
      "ladder: [0.1, 0.5]\n",
      "config gradgate.yml: ladder must be strictly decreasing, got 0.5 after 0.1 at ladder[1]",
    ],
    ["version: 2\n", "config gradgate.yml: version must be 1, got 2"],
  ])("rejects %j with one clear message", (extra, message) => {
    expect(errorOf(minimal + extra)).toBe(message);
  });

  it("names the index of a bad list item", () => {
    const text = `
optimizers:
  - name: adam
  - name: "bad name"
problems:
  - use: rosenbrock
  - params: { n: 4 }
`;
    expect(errorOf(text).split("\n")).toEqual([
      'config gradgate.yml: optimizers[1].name must be letters, digits, "_", "." or "-" (starting with a letter or digit), got "bad name"',
      "config gradgate.yml: problems[1].use is required",
    ]);
  });

  it("rejects duplicate names and references to unknown optimizers", () => {
    expect(errorOf("optimizers:\n  - name: a\n  - name: a\nproblems:\n  - use: beale\n")).toBe(
      'config gradgate.yml: optimizers[1].name "a" is used twice; names must be unique',
    );
    expect(errorOf("optimizers:\n  - name: a\nproblems:\n  - use: beale\n    optimizers: [b]\n")).toBe(
      'config gradgate.yml: problems[0].optimizers[0] names "b", which is not in optimizers (known: a)',
    );
  });

  it("reports YAML syntax errors with the position", () => {
    expect(errorOf("optimizers: [\n")).toMatch(
      /^config gradgate.yml: not valid YAML at line \d+, column \d+: /,
    );
  });

  it("reports a top level that is not a mapping", () => {
    expect(errorOf("- 1\n")).toBe(
      'config gradgate.yml: must be a mapping with at least "optimizers" and "problems", got [1]',
    );
  });

  it("turns JSON pointers into readable paths", () => {
    expect(jsonPointerToPath("/problems/2/params/n")).toBe("problems[2].params.n");
    expect(jsonPointerToPath("")).toBe("");
  });
});
