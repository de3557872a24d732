/**
 * Shards: one suite split across CI matrix jobs, and the merge that puts the pieces back together.
 *
 * The split is over the flat run list (item = the run's position in suite order: case by case, seed by
 * seed; see batch.ts) and deals the items round-robin: shard i of n (1-based) runs the items whose
 * position p satisfies p mod n = i − 1. Whole cases are deliberately NOT kept together: the runs of one
 * case cost about the same, while cases differ in cost by orders of magnitude (a 2-D Rosenbrock against a
 * two-layer network), so dealing runs evenly gives every shard about 1/n of every case and therefore about
 * 1/n of the time, whatever the suite looks like. The price is that a shard's results hold part of most
 * cases; they are meant for `merge`, never for `compare` on their own.
 *
 * The merge uses the same rule backwards: the k-th run in shard i's results is item (i − 1) + k·n, so every
 * run gets its place back and the merged document is byte for byte the document a single machine writes.
 * Anything that does not fit (another suite, another tool version, another machine type, a shard given
 * twice or missing, a run missing or repeated) is refused with a message that names the file.
 */
import { InputError, quote } from "../core/errors.js";
import { canonicalJson } from "../core/json.js";
import { RESULTS_FORMAT, RESULTS_VERSION, type ResultsDocument } from "./results.js";
import type { CaseResult, CaseSpec, RunMetrics } from "./types.js";

/** Shard `index` of `count`, 1-based: "2/4" is the second of four. */
export interface ShardSpec {
  readonly index: number;
  readonly count: number;
}

/** Largest shard count accepted (a matrix job per shard; GitHub allows 256 jobs per matrix). */
export const MAX_SHARDS = 256;

/**
 * Parses "i/n" (1 ≤ i ≤ n ≤ 256). `where` names the option or input for the message, e.g. "--shard".
 */
export function parseShard(text: string, where: string): ShardSpec {
  const m = /^\s*(\d+)\s*\/\s*(\d+)\s*$/.exec(text);
  const index = m ? Number(m[1]) : NaN;
  const count = m ? Number(m[2]) : NaN;
  if (!m || index < 1 || count < 1 || index > count || count > MAX_SHARDS) {
    throw new InputError(
      `${where} must be "i/n" with 1 ≤ i ≤ n ≤ ${MAX_SHARDS} (shard i of n, e.g. "2/4"), got ${quote(text)}`,
    );
  }
  return { index, count };
}

/** The items (positions in the flat run list of `total` runs) that shard `shard` runs, ascending. */
export function shardItems(total: number, shard: ShardSpec): number[] {
  const items: number[] = [];
  for (let p = shard.index - 1; p < total; p += shard.count) items.push(p);
  return items;
}

/** A shard's results document with the name it is reported under (usually its file path). */
export interface NamedResults {
  readonly name: string;
  readonly doc: ResultsDocument;
}

/**
 * Merges the results of shards 1…n of one suite into the results document of the whole suite. Throws an
 * InputError naming the file when the shards do not fit together.
 */
export function mergeShards(parts: readonly NamedResults[]): ResultsDocument {
  if (parts.length === 0)
    throw new InputError("merge: no shard results given; pass the files written by run --shard");
  for (const { name, doc } of parts) checkShape(name, doc);

  const first = parts[0];
  const count = first.doc.shard!.count;
  const bySlot = new Map<number, NamedResults>();
  for (const part of parts) {
    const { index, count: c } = part.doc.shard!;
    if (c !== count) {
      throw new InputError(
        `merge: ${part.name} is shard ${index}/${c} but ${first.name} is shard ${first.doc.shard!.index}/${count}; ` +
          `merge the shards of one split only`,
      );
    }
    const other = bySlot.get(index);
    if (other !== undefined) {
      throw new InputError(
        `merge: ${other.name} and ${part.name} are both shard ${index}/${count}; give each shard's results once`,
      );
    }
    bySlot.set(index, part);
    sameField(first, part, "suite hash", (d) => d.suite.hash, "every shard must run the same suite config");
    sameField(
      first,
      part,
      "suite",
      (d) => canonicalJson(d.suite),
      "every shard must run the same suite config",
    );
    sameField(
      first,
      part,
      "tool",
      (d) => `${d.tool.name} ${d.tool.version}`,
      "use one gradgate version for every shard",
    );
    sameField(
      first,
      part,
      "environment",
      (d) => `${d.environment.node} ${d.environment.platform} ${d.environment.arch}`,
      "run every shard on the same runner image and Node.js version",
    );
  }
  const missing: number[] = [];
  for (let i = 1; i <= count; i++) if (!bySlot.has(i)) missing.push(i);
  if (missing.length > 0) {
    const have = [...bySlot.keys()].sort((a, b) => a - b).join(", ");
    throw new InputError(
      `merge: shard${missing.length > 1 ? "s" : ""} ${missing.map((i) => `${i}/${count}`).join(", ")} ` +
        `${missing.length > 1 ? "are" : "is"} missing (have ${have}); pass the results of every shard`,
    );
  }

  // Give every run its place in the flat run list back, and check each case's spec is the same everywhere.
  const total = first.doc.suite.runs;
  const slots: ({ spec: CaseSpec; run: RunMetrics; from: string } | undefined)[] = new Array(total);
  const specs = new Map<string, { text: string; from: string }>();
  for (let s = 1; s <= count; s++) {
    const { name, doc } = bySlot.get(s)!;
    const expected = shardItems(total, { index: s, count }).length;
    const runs = doc.cases.reduce((n, c) => n + c.runs.length, 0);
    if (runs !== expected) {
      throw new InputError(
        `merge: ${name} (shard ${s}/${count}) holds ${runs} runs, expected ${expected} for a suite of ${total} runs; ` +
          `it is incomplete or was not written by run --shard ${s}/${count}`,
      );
    }
    let k = 0;
    for (const { case: spec, runs: caseRuns } of doc.cases) {
      const text = canonicalJson(spec);
      const seen = specs.get(spec.id);
      if (seen === undefined) specs.set(spec.id, { text, from: name });
      else if (seen.text !== text) {
        throw new InputError(
          `merge: case ${quote(spec.id)} is defined differently in ${seen.from} and ${name}; ` +
            `every shard must run the same suite config`,
        );
      }
      for (const run of caseRuns) {
        slots[s - 1 + k * count] = { spec, run, from: name };
        k++;
      }
    }
  }

  // Walk the flat list: each case must be one block with seeds 0 … seeds−1 in order.
  const cases: CaseResult[] = [];
  let p = 0;
  while (p < total) {
    const head = slots[p]!;
    const spec = head.spec;
    const runs: RunMetrics[] = [];
    for (let seed = 0; seed < spec.seeds; seed++, p++) {
      const slot = slots[p];
      if (slot === undefined || slot.spec.id !== spec.id || slot.run.seed !== seed) {
        const found =
          slot === undefined ? "nothing" : `case ${quote(slot.spec.id)} seed ${slot.run.seed} (${slot.from})`;
        throw new InputError(
          `merge: run ${p} of the suite should be case ${quote(spec.id)} seed ${seed}, found ${found}; ` +
            `the shards do not come from one split of one suite`,
        );
      }
      runs.push(slot.run);
    }
    cases.push({ case: spec, runs });
  }
  if (cases.length !== first.doc.suite.cases) {
    throw new InputError(
      `merge: the shards hold ${cases.length} cases but the suite has ${first.doc.suite.cases}; ` +
        `the shards do not come from one split of one suite`,
    );
  }

  return {
    format: RESULTS_FORMAT,
    version: RESULTS_VERSION,
    tool: first.doc.tool,
    suite: first.doc.suite,
    environment: first.doc.environment,
    cases,
  };
}

function checkShape(name: string, doc: ResultsDocument): void {
  const d = doc as unknown as Record<string, unknown> | null;
  if (d === null || typeof d !== "object" || d.format !== RESULTS_FORMAT) {
    throw new InputError(
      `merge: ${name} is not a gradgate results document (format ${quote(d?.format)}, expected "${RESULTS_FORMAT}")`,
    );
  }
  if (d.version !== RESULTS_VERSION) {
    throw new InputError(
      `merge: ${name} has results version ${quote(d.version)}; this gradgate reads ${RESULTS_VERSION}`,
    );
  }
  const shard = d.shard as Record<string, unknown> | undefined;
  if (shard === undefined) {
    throw new InputError(
      `merge: ${name} has no "shard" field: it holds a whole suite; merge takes the files of run --shard i/n`,
    );
  }
  const { index, count } = shard;
  if (
    !Number.isInteger(index) ||
    !Number.isInteger(count) ||
    (index as number) < 1 ||
    (index as number) > (count as number) ||
    (count as number) > MAX_SHARDS
  ) {
    throw new InputError(
      `merge: ${name}: shard must be {index, count} with 1 ≤ index ≤ count, got ${quote(shard)}`,
    );
  }
  const suite = d.suite as Record<string, unknown> | undefined;
  if (
    !suite ||
    !Number.isInteger(suite.runs) ||
    !Number.isInteger(suite.cases) ||
    typeof suite.hash !== "string"
  ) {
    throw new InputError(`merge: ${name}: suite must have hash, cases and runs, got ${quote(suite)}`);
  }
  if (!Array.isArray(d.cases))
    throw new InputError(`merge: ${name}: cases must be a list, got ${quote(d.cases)}`);
  (d.cases as unknown[]).forEach((c, i) => {
    const cr = c as { case?: { id?: unknown; seeds?: unknown }; runs?: unknown } | null;
    if (
      !cr ||
      typeof cr.case?.id !== "string" ||
      !Number.isInteger(cr.case.seeds) ||
      !Array.isArray(cr.runs)
    ) {
      throw new InputError(`merge: ${name}: cases[${i}] must have case.id, case.seeds and runs`);
    }
  });
}

function sameField(
  a: NamedResults,
  b: NamedResults,
  what: string,
  get: (d: ResultsDocument) => string,
  fix: string,
): void {
  const va = get(a.doc);
  const vb = get(b.doc);
  if (va !== vb) {
    throw new InputError(
      `merge: ${what} differs: ${a.name} has ${quote(va)}, ${b.name} has ${quote(vb)}; ${fix}`,
    );
  }
}
