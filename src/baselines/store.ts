/**
 * The baselines directory on disk: read every baseline file (validated), and replace the set of files and
 * the audit log as one transaction, so a killed process never leaves a mix of old and new files.
 *
 * Protocol of `writeBaselineSet` (a redo journal):
 *   1. write every new file to a temporary file beside its target (`.NAME.TXID.tmp`, flushed to disk);
 *   2. write the journal `.rebaseline-journal.json` atomically (writeFileAtomic): the list of renames and
 *      removals. Its appearance is the commit point;
 *   3. rename the temporary files over their targets, remove the files to remove, then delete the journal.
 * Killed before 2: the previous files are untouched (stray temporary files are removed by the next
 * `recoverBaselineDir`). Killed after 2: `recoverBaselineDir` (run by every command before it reads the
 * directory) finishes the renames and removals, which are idempotent. Either way readers see one whole set.
 *
 * Test hook: GRADGATE_TEST_PAUSE_AT=temp:N | journal | rename:N makes the process announce the point on
 * stderr ("gradgate-test-paused <point>") and block for a minute, so a test can kill it there.
 */
import { existsSync, fsyncSync, mkdirSync, openSync, closeSync, readdirSync, readFileSync, renameSync, rmSync, writeSync } from "node:fs";
import { join } from "node:path";
import { InputError, quote } from "../core/errors.js";
import { writeFileAtomic } from "../io/files.js";
import { AUDIT_FORMAT, AUDIT_LOG, type AuditEntry, type BaselineFile } from "./types.js";
import { parseBaseline } from "./validate.js";
import { canonicalJson } from "../core/json.js";

export const JOURNAL = ".rebaseline-journal.json";
const TEMP = /^\.(.+)\.([0-9a-z]+-[0-9a-z]+)\.tmp$/;

interface Journal {
  readonly txid: string;
  readonly renames: readonly (readonly [string, string])[];
  readonly removes: readonly string[];
}

/** Names of the baseline files in `dir` (every *.json that is not hidden), sorted. */
export function baselineFileNames(dir: string): string[] {
  if (!existsSync(dir)) return [];
  return readdirSync(dir)
    .filter((n) => n.endsWith(".json") && !n.startsWith("."))
    .sort();
}

/**
 * Reads and validates every baseline file in `dir`. `shown` is how the directory is named in messages
 * (e.g. "baselines"). Returns them by optimizer name. Throws InputError on the first bad file, and when
 * the files disagree on the suite they were made for.
 */
export function readBaselineDir(dir: string, shown: string): Map<string, BaselineFile> {
  const out = new Map<string, BaselineFile>();
  for (const name of baselineFileNames(dir)) {
    const file = `${shown}/${name}`;
    const baseline = parseBaseline(readFileSync(join(dir, name), "utf8"), file, name.slice(0, -".json".length));
    out.set(baseline.optimizer, baseline);
  }
  const hashes = new Map<string, string>();
  for (const [name, b] of out) if (!hashes.has(b.provenance.suite.hash)) hashes.set(b.provenance.suite.hash, name);
  if (hashes.size > 1) {
    const list = [...hashes].map(([h, n]) => `${shown}/${n}.json has ${h.slice(0, 19)}…`).join(", ");
    throw new InputError(
      `baselines ${shown}: the files were made for different suites (${list}); regenerate the whole set with ` +
        `gradgate rebaseline --allow-suite-change`,
    );
  }
  return out;
}

/** Reads baselines/audit.jsonl (empty when absent). */
export function readAuditLog(dir: string, shown: string): AuditEntry[] {
  const path = join(dir, AUDIT_LOG);
  if (!existsSync(path)) return [];
  const text = readFileSync(path, "utf8");
  const entries: AuditEntry[] = [];
  text.split("\n").forEach((line, i) => {
    if (line.trim() === "") return;
    let entry: unknown;
    try {
      entry = JSON.parse(line);
    } catch (err) {
      throw new InputError(
        `audit log ${shown}/${AUDIT_LOG}: line ${i + 1} is not valid JSON (${(err as Error).message}); ` +
          `restore the file from version control`,
      );
    }
    if ((entry as { format?: unknown })?.format !== AUDIT_FORMAT) {
      throw new InputError(
        `audit log ${shown}/${AUDIT_LOG}: line ${i + 1} format must be ${JSON.stringify(AUDIT_FORMAT)}, got ` +
          `${quote((entry as { format?: unknown })?.format)}; restore the file from version control`,
      );
    }
    entries.push(entry as AuditEntry);
  });
  return entries;
}

/** One audit entry as a line: canonical key order, no indentation. */
export function auditLine(entry: AuditEntry): string {
  return JSON.stringify(JSON.parse(canonicalJson(entry))) + "\n";
}

export interface BaselineSetChange {
  /** Files to write: name (e.g. "adam.json") → content. */
  readonly write: ReadonlyMap<string, string>;
  /** Files to remove (e.g. optimizers no longer in the suite). */
  readonly remove: readonly string[];
}

/** Pauses at a named point when the test hook asks for it (see the file comment). */
function testPoint(point: string): void {
  const at = process.env.GRADGATE_TEST_PAUSE_AT;
  if (at === undefined || at !== point) return;
  writeSync(2, `gradgate-test-paused ${point}\n`);
  Atomics.wait(new Int32Array(new SharedArrayBuffer(4)), 0, 0, 60_000);
}

function writeDurable(path: string, data: string): void {
  const fd = openSync(path, "w");
  try {
    writeSync(fd, data);
    fsyncSync(fd);
  } finally {
    closeSync(fd);
  }
}

/** Replaces files in `dir` as one transaction (see the protocol above). */
export function writeBaselineSet(dir: string, change: BaselineSetChange): void {
  mkdirSync(dir, { recursive: true });
  recoverBaselineDir(dir);
  const txid = `${process.pid.toString(36)}-${Date.now().toString(36)}`;
  const renames: [string, string][] = [];
  let i = 0;
  try {
    for (const [name, text] of change.write) {
      checkName(name);
      const tmp = `.${name}.${txid}.tmp`;
      writeDurable(join(dir, tmp), text);
      renames.push([tmp, name]);
      testPoint(`temp:${++i}`);
    }
  } catch (err) {
    for (const [tmp] of renames) rmSync(join(dir, tmp), { force: true });
    throw err;
  }
  for (const name of change.remove) checkName(name);
  const journal: Journal = { txid, renames, removes: [...change.remove] };
  writeFileAtomic(join(dir, JOURNAL), JSON.stringify(journal, null, 2) + "\n");
  testPoint("journal");
  applyJournal(dir, journal);
}

function checkName(name: string): void {
  if (name.includes("/") || name.includes("\\") || name.startsWith(".")) {
    throw new Error(`writeBaselineSet: ${quote(name)} is not a plain file name`);
  }
}

function applyJournal(dir: string, journal: Journal): void {
  let i = 0;
  for (const [tmp, name] of journal.renames) {
    const from = join(dir, tmp);
    if (existsSync(from)) renameSync(from, join(dir, name));
    testPoint(`rename:${++i}`);
  }
  for (const name of journal.removes) rmSync(join(dir, name), { force: true });
  rmSync(join(dir, JOURNAL), { force: true });
}

/**
 * Finishes a rebaseline that was killed after its commit point, and removes temporary files of one that
 * was killed before it. Returns what it did ("" when there was nothing to do), for a note on stderr.
 */
export function recoverBaselineDir(dir: string): string {
  if (!existsSync(dir)) return "";
  let note = "";
  const journalPath = join(dir, JOURNAL);
  let keep = new Set<string>();
  if (existsSync(journalPath)) {
    let journal: Journal;
    try {
      journal = JSON.parse(readFileSync(journalPath, "utf8")) as Journal;
    } catch (err) {
      throw new InputError(
        `baselines ${dir}: the rebaseline journal ${JOURNAL} is unreadable (${(err as Error).message}); ` +
          `delete it and the .*.tmp files, then check the baseline files with git status`,
      );
    }
    keep = new Set(journal.renames.map(([tmp]) => tmp));
    applyJournal(dir, journal);
    note = `completed an interrupted rebaseline (${journal.renames.length} file(s))`;
  }
  let stray = 0;
  for (const name of readdirSync(dir)) {
    if (TEMP.test(name) && !keep.has(name)) {
      rmSync(join(dir, name), { force: true });
      stray++;
    }
  }
  if (stray > 0) note = `${note ? `${note}; ` : ""}removed ${stray} temporary file(s) of an interrupted rebaseline`;
  return note;
}
