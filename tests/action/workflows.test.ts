/**
 * The workflows people copy (docs/workflows.md) and the ones this repository runs (.github/workflows):
 * valid YAML, only inputs the Action declares, outputs it sets, and the safety rules of the docs.
 */
import { readdirSync, readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { parse } from "yaml";
import { INPUTS, MODES, OUTPUTS } from "../../src/action/settings.js";

interface StepYml {
  uses?: string;
  run?: string;
  id?: string;
  with?: Record<string, unknown>;
  env?: Record<string, unknown>;
}
interface WorkflowYml {
  on: Record<string, unknown>;
  permissions?: Record<string, string>;
  jobs: Record<string, { steps: StepYml[]; permissions?: Record<string, string> }>;
}

const root = new URL("../../", import.meta.url);
const docs = readFileSync(new URL("docs/workflows.md", root), "utf8");
const fromDocs = [...docs.matchAll(/```yaml\n([\s\S]*?)```/g)]
  .map((m) => m[1])
  .filter((text) => /^(# \.github|name:)/.test(text))
  .map((text) => [`docs: ${text.split("\n")[0]}`, text] as const);
const dir = new URL(".github/workflows/", root);
const fromRepo = readdirSync(dir)
  .sort()
  .map((f) => [`.github/workflows/${f}`, readFileSync(new URL(f, dir), "utf8")] as const);
const all = [...fromDocs, ...fromRepo].map(([name, text]) => [name, parse(text) as WorkflowYml] as const);

const isGradgate = (s: StepYml) => s.uses === "./" || /^OWNER\/gradgate@v1$/.test(s.uses ?? "");
const inputNames = new Set(INPUTS.map((i) => i.name));
const outputNames = new Set(OUTPUTS.map((o) => o.name));

describe("workflows", () => {
  it("finds the documented and the repository's workflows", () => {
    expect(fromDocs.length).toBeGreaterThanOrEqual(4);
    expect(fromRepo.map(([n]) => n)).toEqual([
      ".github/workflows/ci.yml",
      ".github/workflows/convergence-comment.yml",
      ".github/workflows/convergence.yml",
      ".github/workflows/release-baselines.yml",
    ]);
  });

  it.each(all)("%s uses only declared inputs, modes and outputs", (_name, wf) => {
    for (const job of Object.values(wf.jobs)) {
      for (const step of job.steps) {
        if (isGradgate(step)) {
          for (const key of Object.keys(step.with ?? {})) expect(inputNames.has(key), key).toBe(true);
          const mode = step.with?.mode;
          if (mode !== undefined) expect(MODES).toContain(mode);
        }
        const text = JSON.stringify(step);
        for (const m of text.matchAll(/steps\.gradgate\.outputs\.([a-z-]+)/g))
          expect(outputNames.has(m[1]), m[1]).toBe(true);
      }
    }
  });

  it.each(all)("%s keeps write tokens away from pull-request code", (_name, wf) => {
    const events = Object.keys(wf.on);
    // Nothing here runs on pull_request_target, the trigger that hands a fork's code a write token.
    expect(events).not.toContain("pull_request_target");
    for (const job of Object.values(wf.jobs)) {
      for (const step of job.steps) {
        // No expression from the event is pasted into a shell script.
        if (step.run) expect(step.run).not.toMatch(/\$\{\{\s*github\.event/);
        // Jobs that run on pull requests do not leave the token in .git/config.
        if (events.includes("pull_request") && step.uses?.startsWith("actions/checkout@")) {
          expect(step.with?.["persist-credentials"]).toBe(false);
        }
      }
    }
    if (events.includes("workflow_run")) {
      // The publishing workflow checks out its own default branch (no ref) and only publishes.
      for (const job of Object.values(wf.jobs)) {
        for (const step of job.steps) {
          if (step.uses?.startsWith("actions/checkout@")) expect(step.with?.ref).toBeUndefined();
          if (isGradgate(step)) expect(step.with?.mode).toBe("publish");
          expect(step.run).toBeUndefined();
        }
      }
    }
  });
});
