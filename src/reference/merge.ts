/**
 * Puts reference-check results into a verdict document beside the baseline drift: each case's `checks`,
 * the gate's `checks`, and — for every failed check declared gating — a "check" reason on the case and
 * on the gate, which then fails. Skipped and passing checks never change a verdict. Pure: returns a new
 * document, the input is not modified.
 */
import type { CaseComparison, CheckResult, GateReason, Reason, VerdictDocument } from "../compare/types.js";
import type { ReferenceCheckReport } from "./run-checks.js";

function failing(checks: readonly CheckResult[]): CheckResult[] {
  return checks.filter((c) => c.status === "fail" && c.gating);
}

/** The verdict with the report's checks added (see the file comment). */
export function applyReferenceChecks(
  verdict: VerdictDocument,
  report: ReferenceCheckReport,
): VerdictDocument {
  const gateReasons: GateReason[] = [...verdict.gate.reasons];
  const seen = new Set<string>();
  const cases = verdict.cases.map((c): CaseComparison => {
    const added = report.cases[c.id];
    if (added === undefined || added.length === 0) return c;
    seen.add(c.id);
    const failed = failing(added);
    const reasons: Reason[] = failed.map((f) => ({ code: "check", message: f.summary }));
    for (const f of failed) gateReasons.push({ code: "check", case: c.id, message: `${c.id}: ${f.summary}` });
    return {
      ...c,
      checks: [...c.checks, ...added],
      reasons: [...c.reasons, ...reasons],
      failsGate: c.failsGate || failed.length > 0,
    };
  });
  // Checks of cases the verdict does not list (e.g. a case filtered out of the comparison) still count.
  for (const [id, list] of Object.entries(report.cases)) {
    if (seen.has(id)) continue;
    for (const f of failing(list))
      gateReasons.push({ code: "check", case: id, message: `${id}: ${f.summary}` });
  }
  for (const f of failing(report.gate)) gateReasons.push({ code: "check", message: f.summary });
  return {
    ...verdict,
    gate: {
      verdict: gateReasons.length > 0 ? "fail" : "pass",
      reasons: gateReasons,
      checks: [...verdict.gate.checks, ...report.gate],
    },
    cases,
  };
}
