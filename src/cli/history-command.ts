/**
 * `gradgate history OPTIMIZER [--baselines DIR] [--json]`: how one optimizer's baselines changed across
 * the audit log (baselines/audit.jsonl), oldest first: when, commit, reason, and per case the verdict of
 * the new baseline against the previous one with the gating metrics that moved.
 */
import { resolve } from "node:path";
import { InputError } from "../core/errors.js";
import { canonicalJson } from "../core/json.js";
import { optimizerHistory, optimizersInLog, type HistoryRow } from "../baselines/history.js";
import { readAuditLog, recoverBaselineDir } from "../baselines/store.js";
import { AUDIT_LOG } from "../baselines/types.js";
import { EXIT, type Host } from "./host.js";
import { DEFAULT_BASELINES, parseOptions } from "./compare-command.js";

export interface HistoryArgs {
  readonly optimizer: string;
  readonly baselines: string;
  readonly json: boolean;
}

export function historyFromArgv(argv: readonly string[], host: Host): number {
  const { values, positionals } = parseOptions(
    argv,
    { baselines: { type: "string" }, json: { type: "boolean" } },
    true,
  );
  if (positionals.length !== 1) {
    throw new InputError(
      `history: name one optimizer, e.g. gradgate history adam (got ${positionals.length === 0 ? "none" : positionals.map((p) => JSON.stringify(p)).join(" ")})`,
    );
  }
  return historyCommand(host, {
    optimizer: positionals[0],
    baselines: (values.baselines as string | undefined) ?? DEFAULT_BASELINES,
    json: values.json === true,
  });
}

export function historyCommand(host: Host, args: HistoryArgs): number {
  const shown = args.baselines.replace(/\/+$/, "");
  const dir = resolve(host.cwd, args.baselines);
  const note = recoverBaselineDir(dir);
  if (note) host.err(`gradgate: ${shown}/: ${note}\n`);
  const entries = readAuditLog(dir, shown);
  if (entries.length === 0) {
    throw new InputError(
      `history: ${shown}/${AUDIT_LOG} has no entries yet; gradgate rebaseline writes one per refresh`,
    );
  }
  const rows = optimizerHistory(entries, args.optimizer);
  if (rows.length === 0) {
    throw new InputError(
      `history: no entry of ${shown}/${AUDIT_LOG} mentions optimizer ${JSON.stringify(args.optimizer)} (known: ${optimizersInLog(entries).join(", ")})`,
    );
  }
  host.out(args.json ? canonicalJson(rows) : historyText(args.optimizer, rows));
  return EXIT.ok;
}

export function historyText(optimizer: string, rows: readonly HistoryRow[]): string {
  let text = `history of ${optimizer}: ${rows.length} baseline change(s), oldest first\n`;
  for (const r of rows) {
    text += `\n${r.when}  ${r.commit.slice(0, 12)}  ${r.reason}${r.suiteChanged ? "  [suite changed]" : ""}${r.action === "removed" ? "  [removed]" : ""}\n`;
    const counts = new Map<string, number>();
    for (const c of r.cases) counts.set(c.verdict, (counts.get(c.verdict) ?? 0) + 1);
    text += `  ${r.cases.length} case(s): ${[...counts].map(([v, n]) => `${n} ${v}`).join(", ") || "none"}\n`;
    for (const c of r.cases) {
      if (c.verdict === "unchanged") continue;
      const moved = c.drift
        .map(
          (d) =>
            `${d.metric} ×${fmt(d.ratio)}${d.low !== null || d.high !== null ? ` [${fmt(d.low)}, ${d.high === null ? "∞" : fmt(d.high)}]` : ""}`,
        )
        .join("; ");
      text += `  ${c.id}: ${c.verdict}${c.trajectory === "changed" ? ", trajectory changed" : ""}${moved ? ` — ${moved}` : ""}\n`;
    }
  }
  return text;
}

function fmt(x: number | null): string {
  if (x === null) return "0";
  return Math.abs(x) >= 0.001 && Math.abs(x) < 1e4 ? String(Number(x.toPrecision(3))) : x.toExponential(2);
}
