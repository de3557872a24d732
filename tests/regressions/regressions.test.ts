/**
 * The injected-regression set (variants.ts) under the default policy, on tests/regressions/suite.yml
 * (5 seeds per case, 25 extra seeds in the baseline, compared exactly as `gradgate compare` does):
 * - each re-implementation with no change is bitwise identical to its reference (so each variant
 *   differs from the reference by its change alone);
 * - every behaviour change is reported as a behaviour change (regressed or improved) in at least one
 *   case, and fails the gate wherever a case regressed; its cases that did not move convergence still
 *   report a changed trajectory;
 * - no last-bits rewrite is regressed or improved anywhere, and none fails the gate; they are reported
 *   as trajectory changes (float noise) where iterates are kept.
 * The table itself: npx tsx scripts/regression-table.ts (--default-suite for the built-in suite, which
 * as it stands sets neither AMSGrad nor a large ε, so three of the changes have no case that exercises
 * them there; suite.yml adds those sets). Takes about 25 s.
 */
import { readFileSync } from "node:fs";
import { beforeAll, describe, expect, it } from "vitest";
import { runReference, runVariant, tally, type Reference } from "./harness.js";
import { FAITHFUL, VARIANTS } from "./variants.js";

const SUITE = new URL("./suite.yml", import.meta.url);
let ref: Reference;

beforeAll(() => {
  ref = runReference(readFileSync(SUITE, "utf8"), "tests/regressions/suite.yml");
}, 120_000);

describe("injected-regression set", () => {
  it("uses the default policy and keeps extra seeds in the baseline", () => {
    expect(ref.policy.correction).toBe("holm");
    expect(ref.policy.extraSeeds.perCase).toBe(25);
    expect(VARIANTS.filter((v) => v.kind === "behaviour").length).toBeGreaterThanOrEqual(10);
    expect(VARIANTS.filter((v) => v.kind === "rewrite").length).toBeGreaterThanOrEqual(5);
  });

  it.each(FAITHFUL.map((v) => [v.name, v]))("%s is bitwise identical to the reference", (_, v) => {
    const t = tally(runVariant(ref, v));
    expect(t.unchanged).toBe(t.cases);
    expect(t.gate).toBe("pass");
  });

  it.each(VARIANTS.filter((v) => v.kind === "behaviour").map((v) => [v.name, v]))(
    "%s is reported as a behaviour change, and fails the gate where a case regressed",
    (_, v) => {
      const out = runVariant(ref, v);
      const t = tally(out);
      expect(t.regressed + t.improved, JSON.stringify(t)).toBeGreaterThanOrEqual(1);
      expect(t.gate).toBe(t.regressed > 0 ? "fail" : "pass");
      for (const c of out.cases) {
        if (c.verdict === "regressed") expect(c.failsGate).toBe(true);
        // A change too small to move convergence in a case is still visible in its first iterates.
        if (c.verdict === "equivalent" || c.verdict === "inconclusive") {
          expect(["changed", "float-noise", "unavailable"], c.id).toContain(c.fingerprint.status);
        }
        if (c.verdict === "unchanged") expect(["identical", "unavailable"]).toContain(c.fingerprint.status);
      }
    },
  );

  it.each(VARIANTS.filter((v) => v.kind === "rewrite").map((v) => [v.name, v]))(
    "%s changes only the last bits: never regressed or improved, the gate passes, the trajectory says so",
    (_, v) => {
      const out = runVariant(ref, v);
      const t = tally(out);
      expect(t.regressed, JSON.stringify(t)).toBe(0);
      expect(t.improved, JSON.stringify(t)).toBe(0);
      expect(t.gate).toBe("pass");
      expect(t.trajectoryChanged + t.floatNoise).toBeGreaterThanOrEqual(1);
    },
  );
});
