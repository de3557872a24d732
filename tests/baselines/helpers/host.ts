/** An in-memory Host and temporary directories for CLI tests. */
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import type { Host } from "../../../src/cli/host.js";
import { canonicalJson } from "../../../src/core/json.js";
import type { ResultsDocument } from "../../../src/runner/results.js";

export interface CapturedHost extends Host {
  stdout: string;
  stderr: string;
}

export function captureHost(cwd: string): CapturedHost {
  const h: CapturedHost = {
    stdout: "",
    stderr: "",
    interactive: false,
    cwd,
    out: (t) => {
      h.stdout += t;
    },
    err: (t) => {
      h.stderr += t;
    },
  };
  return h;
}

export function tempDir(prefix = "gradgate-"): string {
  return mkdtempSync(join(tmpdir(), prefix));
}

/** A minimal valid suite config whose only role in these tests is to carry a policy. */
export function writeConfig(dir: string, policy: Record<string, unknown> = { extraSeeds: { perCase: 0 } }): string {
  const file = join(dir, "gradgate.json");
  writeFileSync(file, JSON.stringify({ optimizers: [{ name: "sgd" }], problems: [{ use: "quadratic" }], policy }));
  return "gradgate.json";
}

export function writeResults(dir: string, name: string, doc: ResultsDocument): string {
  writeFileSync(join(dir, name), canonicalJson(doc));
  return name;
}
