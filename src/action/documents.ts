/**
 * Reading the documents a report is drawn from. In `publish` mode they come from an artifact of a run
 * that executed a pull request's code, so they are untrusted: size-capped, parsed as JSON, checked for the
 * shape the renderers rely on, and everything in them is escaped when rendered. The baseline runs (for
 * the charts) are read from this checkout, never from the artifact.
 */
import { existsSync, readFileSync, statSync } from "node:fs";
import { dirname, join, resolve } from "node:path";
import { InputError, quote } from "../core/errors.js";
import type { VerdictDocument } from "../compare/types.js";
import { parseResults } from "../baselines/validate.js";
import { readBaselineDir } from "../baselines/store.js";
import type { ResultsDocument } from "../runner/results.js";
import type { CaseRuns } from "../report/model.js";
import { parseVerdict } from "../report/verdict-file.js";

/** Largest document read (bytes): far above a real suite's, far below what would hurt the runner. */
export const MAX_DOCUMENT_BYTES = 64 * 1024 * 1024;

function readCapped(path: string, shown: string, what: string): string {
  if (!existsSync(path)) throw new InputError(`${what} ${shown}: no such file`);
  const size = statSync(path).size;
  if (size > MAX_DOCUMENT_BYTES) {
    throw new InputError(
      `${what} ${shown} is ${size} bytes, more than the ${MAX_DOCUMENT_BYTES} bytes gradgate reads`,
    );
  }
  return readFileSync(path, "utf8");
}

/** Reads a verdict document and checks the fields the reports use. */
export function readVerdict(cwd: string, file: string): VerdictDocument {
  return parseVerdict(readCapped(resolve(cwd, file), file, "verdict"), file);
}

/** Reads and validates a results document (schema of src/baselines/validate.ts). */
export function readResultsDoc(cwd: string, file: string): ResultsDocument {
  return parseResults(readCapped(resolve(cwd, file), file, "results"), file);
}

/** The baselines' runs by case, for the charts; empty when the directory is absent. */
export function readBaselineRuns(cwd: string, dir: string): CaseRuns[] {
  const path = resolve(cwd, dir);
  if (!existsSync(path)) return [];
  return [...readBaselineDir(path, dir.replace(/\/+$/, "")).values()].flatMap((b) => b.cases);
}

/** Where the gate job leaves the pull request for the publishing workflow: beside the verdict. */
export function handoffPath(cwd: string, verdictFile: string): string {
  return join(dirname(resolve(cwd, verdictFile)), "pull-request.json");
}

export interface Handoff {
  readonly number: number;
  readonly headSha: string;
}

/** Reads pull-request.json (untrusted: only a number and a commit id are taken from it). */
export function readHandoff(path: string, shown: string): Handoff {
  const text = readCapped(path, shown, "pull-request file");
  let d: Record<string, unknown>;
  try {
    d = (JSON.parse(text) ?? {}) as Record<string, unknown>;
  } catch (err) {
    throw new InputError(`pull-request file ${shown} is not valid JSON (${(err as Error).message})`);
  }
  if (!Number.isInteger(d.number) || (d.number as number) < 1) {
    throw new InputError(
      `pull-request file ${shown}: number must be a pull-request number, got ${quote(d.number)}`,
    );
  }
  if (typeof d.headSha !== "string" || !/^[0-9a-f]{40}$/.test(d.headSha)) {
    throw new InputError(
      `pull-request file ${shown}: headSha must be a 40-digit commit id, got ${quote(d.headSha)}`,
    );
  }
  return { number: d.number as number, headSha: d.headSha };
}
