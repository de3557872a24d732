/**
 * `gradgate history OPTIMIZER`: how one optimizer's cases changed across the audit log, oldest first.
 * Pure: takes the parsed entries.
 */
import type { AuditCaseDrift, AuditEntry } from "./types.js";

export interface HistoryRow {
  readonly when: string;
  readonly commit: string;
  readonly reason: string;
  readonly suiteChanged: boolean;
  /** Whether this entry wrote (or removed) the optimizer's file. */
  readonly action: "written" | "removed";
  /** The optimizer's cases in this entry. */
  readonly cases: readonly AuditCaseDrift[];
}

/** Entries that touched `optimizer`, in log order; the optimizer's case ids start with `optimizer/`. */
export function optimizerHistory(entries: readonly AuditEntry[], optimizer: string): HistoryRow[] {
  const prefix = `${optimizer}/`;
  const rows: HistoryRow[] = [];
  for (const e of entries) {
    const written = e.files.some((f) => f.optimizer === optimizer);
    const removed = e.removed.includes(`${optimizer}.json`);
    if (!written && !removed) continue;
    rows.push({
      when: e.when,
      commit: e.commit,
      reason: e.reason,
      suiteChanged: e.suiteChanged,
      action: written ? "written" : "removed",
      cases: e.cases.filter((c) => c.id.startsWith(prefix)),
    });
  }
  return rows;
}

/** Every optimizer named in the log, sorted (for "known: ..." in messages). */
export function optimizersInLog(entries: readonly AuditEntry[]): string[] {
  const names = new Set<string>();
  for (const e of entries) for (const f of e.files) names.add(f.optimizer);
  return [...names].sort();
}
