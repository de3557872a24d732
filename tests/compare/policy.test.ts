/**
 * The policy: defaults come from the config schema's `policy` fragment alone, the decision record's
 * table states the same values, and bad policies get one clear message.
 */
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { DEFAULT_POLICY, resolvePolicy } from "../../src/compare/policy.js";
import { parseConfig } from "../../src/config/load.js";
import { policySchema } from "../../src/config/schema.js";

function flatten(o: Record<string, unknown>, prefix = ""): [string, unknown][] {
  return Object.entries(o).flatMap(([k, v]) =>
    v !== null && typeof v === "object" && !Array.isArray(v)
      ? flatten(v as Record<string, unknown>, `${prefix}${k}.`)
      : [[`${prefix}${k}`, v] as [string, unknown]],
  );
}

describe("policy", () => {
  it("defaults are the schema's, and a config without policy gets them", () => {
    const fromSchema = Object.fromEntries(
      Object.entries(policySchema.properties).map(([k, p]) => [
        k,
        "properties" in p
          ? Object.fromEntries(Object.entries(p.properties).map(([kk, pp]) => [kk, pp.default]))
          : p.default,
      ]),
    );
    expect(DEFAULT_POLICY).toEqual(fromSchema);
    const config = parseConfig("optimizers: [{ name: sgd }]\nproblems: [{ use: quadratic }]\n", "g.yml");
    expect(resolvePolicy(config.policy, "config g.yml: policy")).toEqual(DEFAULT_POLICY);
  });

  it("the decision record lists every default with its value", () => {
    const doc = readFileSync(
      new URL("../../docs/decisions/0001-statistical-verdict.md", import.meta.url),
      "utf8",
    );
    const rows = new Map(
      [...doc.matchAll(/^\| `([\w.]+)` \| `([^`]+)` \|/gm)].map((m) => [m[1], JSON.parse(m[2]) as unknown]),
    );
    const flat = flatten(DEFAULT_POLICY as unknown as Record<string, unknown>);
    expect([...rows.keys()].sort()).toEqual(flat.map(([k]) => k).sort());
    for (const [k, v] of flat) expect(rows.get(k), k).toEqual(v);
  });

  it("partial policies keep the other defaults", () => {
    const p = resolvePolicy({ margin: { stepsTo: 1.25 }, strict: true });
    expect(p.margin).toEqual({ stepsTo: 1.25, finalGap: 2, evaluations: 1.1 });
    expect(p.strict).toBe(true);
    expect(p.alpha).toBe(0.05);
  });

  it("bad values get one message naming the field", () => {
    expect(() => resolvePolicy({ correction: "bonferroni" }, "config g.yml: policy")).toThrow(
      'config g.yml: policy.correction must be one of "holm", "benjamini-hochberg", "none", got "bonferroni"',
    );
    expect(() => resolvePolicy({ margin: { steps: 1.2 } }, "config g.yml: policy")).toThrow(
      "config g.yml: policy.margin.steps is not a known field (known: stepsTo, finalGap, evaluations)",
    );
    expect(() => resolvePolicy({ alpha: 0 }, "config g.yml: policy")).toThrow(
      "config g.yml: policy.alpha must be > 0, got 0",
    );
    expect(() => resolvePolicy({ failOn: ["regressed", "regressed"] }, "p")).toThrow(
      'p.failOn lists ["regressed","regressed"] with a repeated item; list each once',
    );
  });
});
