import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { parse } from "yaml";
import { actionTables, actionYml, tablesIn } from "../../src/action/action-docs.js";
import { INPUTS, OUTPUTS } from "../../src/action/settings.js";

const root = new URL("../../", import.meta.url);
const actionText = readFileSync(new URL("action.yml", root), "utf8");
const action = parse(actionText) as {
  runs: { using: string; main: string };
  inputs: Record<string, { description: string; default: string; required: boolean }>;
  outputs: Record<string, { description: string }>;
};

describe("action.yml", () => {
  it("runs the committed bundle on node24", () => {
    expect(action.runs).toEqual({ using: "node24", main: "dist/index.js" });
  });

  it("declares exactly the inputs settings.ts reads, with the same defaults", () => {
    expect(Object.keys(action.inputs)).toEqual(INPUTS.map((i) => i.name));
    for (const i of INPUTS) {
      expect(action.inputs[i.name].default, i.name).toBe(i.default);
      expect(action.inputs[i.name].description, i.name).toBe(i.description);
      expect(action.inputs[i.name].required, i.name).toBe(false);
    }
    expect(Object.keys(action.outputs)).toEqual(OUTPUTS.map((o) => o.name));
  });

  it("is what npm run action-docs writes", () => {
    expect(actionText).toBe(actionYml());
  });
});

describe("docs/workflows.md", () => {
  const docs = readFileSync(new URL("docs/workflows.md", root), "utf8");

  it("has the table of every input (with its default) and output of action.yml", () => {
    const fromYml = actionTables(
      Object.entries(action.inputs).map(([name, i]) => ({
        name,
        default: i.default,
        description: i.description,
      })),
      Object.entries(action.outputs).map(([name, o]) => ({ name, description: o.description })),
    );
    expect(tablesIn(docs)).toBe(fromYml);
  });

  it("shows a minimal workflow that uses the action on pull requests", () => {
    const block = /```yaml\n(# \.github\/workflows\/convergence\.yml[\s\S]*?)```/.exec(docs);
    expect(block, "the minimal workflow block").not.toBeNull();
    const wf = parse(block![1]) as {
      on: Record<string, unknown>;
      jobs: Record<string, { steps: { uses?: string; with?: Record<string, unknown> }[] }>;
    };
    expect(Object.keys(wf.on)).toContain("pull_request");
    const steps = Object.values(wf.jobs)[0].steps;
    expect(steps.some((s) => /gradgate@v1$/.test(s.uses ?? ""))).toBe(true);
    const checkout = steps.find((s) => (s.uses ?? "").startsWith("actions/checkout@"));
    expect(checkout?.with?.["persist-credentials"]).toBe(false);
  });
});
