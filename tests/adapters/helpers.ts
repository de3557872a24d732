/** Shared pieces of the adapter tests: paths, adapter settings, config-to-suite in a temp directory. */
import { mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { parseConfig } from "../../src/config/load.js";
import { prepareSuite } from "../../src/adapters/prepare.js";
import type { ProcessAdapterSpec, SuiteSpec } from "../../src/runner/types.js";
import type { RunMetrics } from "../../src/runner/types.js";
import { expect } from "vitest";

export const ROOT = fileURLToPath(new URL("../../", import.meta.url));
export const FIXTURES = join(ROOT, "tests/fixtures/adapters");
export const PY_EXAMPLE = join(ROOT, "examples/adapters/python/optimizers.py");

/** Settings of a process adapter running `python3 script args…` (short time-outs for tests). */
export function pySettings(
  script: string,
  args: readonly string[] = [],
  over: Partial<ProcessAdapterSpec> = {},
): ProcessAdapterSpec {
  return {
    name: "py",
    command: ["python3", script, ...args],
    cwd: ROOT,
    env: {},
    maxRuns: 256,
    maxMessageBytes: 1 << 24,
    timeouts: { start: 20, message: 20, run: 120 },
    ...over,
  };
}

/** A fresh temporary directory. */
export function tempDir(): string {
  return mkdtempSync(join(tmpdir(), "gradgate-adapters-"));
}

/**
 * Prepares the suite of config text `yaml` as if it were gradgate.yml in `baseDir` (default: the adapter
 * fixtures, so `module:./…` names a fixture). Nothing is written.
 */
export async function suiteFromYaml(yaml: string, baseDir = FIXTURES): Promise<SuiteSpec> {
  return prepareSuite(parseConfig(yaml, "gradgate.yml"), "gradgate.yml", { baseDir });
}

/** Relative tolerance of real-valued metrics between Python and V8 arithmetic. */
const REL = 1e-12;

function closeRel(a: number | null, b: number | null): boolean {
  if (a === null || b === null) return a === b;
  if (a === b) return true;
  return Math.abs(a - b) <= REL * Math.max(Math.abs(a), Math.abs(b));
}

/**
 * Asserts two runs' metrics agree: integer metrics exactly, real-valued ones (gaps, rate, trace, iterates)
 * to a relative tolerance of REL = 1e-12 (room for libm differences between Python and V8).
 */
export function expectSameMetrics(got: RunMetrics, want: RunMetrics, label: string): void {
  const ints = [
    "seed",
    "runSeed",
    "stop",
    "steps",
    "evaluations",
    "divergedAt",
    "divergence",
    "error",
  ] as const;
  for (const k of ints) expect(got[k], `${label}: ${k}`).toEqual(want[k]);
  expect(got.stepsTo, `${label}: stepsTo`).toEqual(want.stepsTo);
  expect(got.evaluationsTo, `${label}: evaluationsTo`).toEqual(want.evaluationsTo);
  for (const k of ["f0", "finalGap", "bestGap", "rate"] as const) {
    expect(closeRel(got[k], want[k]), `${label}: ${k} ${got[k]} vs ${want[k]}`).toBe(true);
  }
  expect(got.trace.length).toBe(want.trace.length);
  got.trace.forEach((t, i) => expect(closeRel(t, want.trace[i]), `${label}: trace[${i}]`).toBe(true));
  expect(got.iterates?.length).toBe(want.iterates?.length);
  (got.iterates ?? []).forEach((x, i) =>
    x.forEach((v, j) =>
      expect(closeRel(v, want.iterates![i][j]), `${label}: iterates[${i}][${j}]`).toBe(true),
    ),
  );
}
