/**
 * Baseline files: one JSON file per optimizer in `baselines/`, in canonical JSON (sorted keys, stable
 * numbers) so a pull request that refreshes them shows a readable diff. Each holds, per case, the case
 * definition, the per-seed metrics and compact traces of the suite's seeds (`runs`, with the first
 * iterates for the trajectory fingerprint) and of extra seeds kept for re-running inconclusive cases
 * (`extraRuns`, without iterates), plus where the numbers came from (`provenance`) and a digest of the
 * content that tells a hand edit from a file gradgate wrote.
 */
import type { CaseSpec, RunMetrics } from "../runner/types.js";

export const BASELINE_FORMAT = "gradgate-baseline";
export const BASELINE_VERSION = 1;
/** The audit log beside the baseline files: JSON Lines, one entry per rebaseline. */
export const AUDIT_LOG = "audit.jsonl";
export const AUDIT_FORMAT = "gradgate-audit";
export const AUDIT_VERSION = 1;

/** Where a baseline came from. */
export interface Provenance {
  /** Commit of the optimizer code the numbers were produced from (given at the CLI edge). */
  readonly commit: string;
  /** When the baseline was written, ISO 8601 (UTC). */
  readonly date: string;
  /** Why, as given to `gradgate rebaseline --reason`. */
  readonly reason: string;
  readonly tool: { readonly name: string; readonly version: string };
  readonly suite: { readonly hash: string; readonly seed: number };
  readonly environment: {
    readonly node: string;
    readonly platform: string;
    readonly arch: string;
    /** The optimizer's runtime as its adapter reports it, e.g. "in-process (reference optimizers)". */
    readonly runtime: string;
  };
}

/** One case of a baseline. */
export interface BaselineCase {
  readonly case: CaseSpec;
  /** Seeds 0 … case.seeds − 1, in order. */
  readonly runs: readonly RunMetrics[];
  /** Extra seeds case.seeds … case.seeds + k − 1, in order, without iterates (see policy.extraSeeds). */
  readonly extraRuns: readonly RunMetrics[];
}

/** The content of baselines/OPTIMIZER.json. */
export interface BaselineFile {
  readonly format: typeof BASELINE_FORMAT;
  readonly version: number;
  /** The optimizer's label in the suite; also the file's name. */
  readonly optimizer: string;
  readonly provenance: Provenance;
  /** In suite order. */
  readonly cases: readonly BaselineCase[];
  /** "sha256:…" of the canonical JSON of every other field: a hand edit that does not update it is caught. */
  readonly digest: string;
}

/** Drift of one case against the previous baseline, as the audit log keeps it. */
export interface AuditCaseDrift {
  readonly id: string;
  /** Case verdict of the new baseline against the previous one (see src/compare/types.ts). */
  readonly verdict: string;
  /** Trajectory fingerprint status against the previous baseline. */
  readonly trajectory: string;
  /** Gating metrics that moved: ratio (candidate / previous) with its interval. */
  readonly drift: readonly {
    readonly metric: string;
    readonly ratio: number | null;
    readonly low: number | null;
    readonly high: number | null;
    readonly status: string;
  }[];
}

/** One line of baselines/audit.jsonl. */
export interface AuditEntry {
  readonly format: typeof AUDIT_FORMAT;
  readonly version: number;
  /** ISO 8601 (UTC). */
  readonly when: string;
  readonly commit: string;
  readonly reason: string;
  readonly tool: { readonly name: string; readonly version: string };
  readonly suite: { readonly hash: string; readonly previousHash: string | null };
  /** Whether the suite definition changed and the user allowed it. */
  readonly suiteChanged: boolean;
  /** Files written (with their digests) and removed. */
  readonly files: readonly { readonly optimizer: string; readonly file: string; readonly digest: string }[];
  readonly removed: readonly string[];
  /** Per case: drift of the new baseline against the previous one. */
  readonly cases: readonly AuditCaseDrift[];
}
