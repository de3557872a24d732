/**
 * The per-case drift an audit log entry keeps: the verdict of the new baseline against the previous one,
 * the trajectory status, and every gating metric that moved (ratio with its interval). Compact on
 * purpose: one line of JSON per rebaseline.
 */
import type { AuditCaseDrift } from "../baselines/types.js";
import type { VerdictDocument } from "./types.js";

export function auditDrift(verdict: VerdictDocument): AuditCaseDrift[] {
  return verdict.cases.map((c) => ({
    id: c.id,
    verdict: c.verdict,
    trajectory: c.fingerprint.status,
    drift: c.drift
      .filter((d) => d.gating && d.status !== "unchanged" && d.status !== "untested" && d.ratio !== null)
      .map((d) => ({
        metric: d.metric,
        ratio: d.ratio,
        low: d.interval?.low ?? null,
        high: d.interval?.high ?? null,
        status: d.status,
      })),
  }));
}
