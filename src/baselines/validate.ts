/**
 * Reading one baseline file: parse, check the format and version, validate against the JSON Schema with
 * ajv, check the digest (a hand edit), then the rules a schema cannot state (seeds in order, arrays as
 * long as the ladder, ids that match the optimizer). Every failure is one InputError naming the file, the
 * field and the bad value, and saying how to fix it. Pure: takes the text and the file's name.
 */
import { jsonPointerToPath, valueAtPointer } from "../core/json-pointer.js";
import { createHash } from "node:crypto";
import { Ajv2020 } from "ajv/dist/2020.js";
import type { ErrorObject } from "ajv";
import { InputError, quote } from "../core/errors.js";
import { canonicalJson } from "../core/json.js";
import { TOOL_VERSION } from "../core/version.js";
import { RESULTS_FORMAT, RESULTS_VERSION, type ResultsDocument } from "../runner/results.js";
import { baselineSchema, resultsInputSchema } from "./schema.js";
import type { RunMetrics } from "../runner/types.js";
import { BASELINE_FORMAT, BASELINE_VERSION, type BaselineFile } from "./types.js";

const REGENERATE = "regenerate the file with gradgate rebaseline";

let ajv: Ajv2020 | null = null;
let validator: ReturnType<Ajv2020["compile"]> | null = null;
let resultsValidator: ReturnType<Ajv2020["compile"]> | null = null;
function schemaValidator() {
  ajv ??= new Ajv2020({ allErrors: false, strict: true, allowUnionTypes: true });
  validator ??= ajv.compile(baselineSchema);
  return validator;
}
function resultsSchemaValidator() {
  ajv ??= new Ajv2020({ allErrors: false, strict: true, allowUnionTypes: true });
  resultsValidator ??= ajv.compile(resultsInputSchema);
  return resultsValidator;
}

/**
 * Parses a results document (what `gradgate run` wrote) and checks the parts compare and rebaseline use.
 * `file` names it in messages.
 */
export function parseResults(text: string, file: string): ResultsDocument {
  const where = `results ${file}`;
  const rerun = "run gradgate run again to rewrite it";
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch (err) {
    throw new InputError(describeParseError(text, (err as Error).message, where).replace(REGENERATE, rerun));
  }
  const obj = (data ?? {}) as Record<string, unknown>;
  if (typeof data !== "object" || Array.isArray(data) || obj.format !== RESULTS_FORMAT) {
    throw new InputError(
      `${where}: format must be ${JSON.stringify(RESULTS_FORMAT)}, got ${quote(obj.format)}: not a gradgate results file; ` +
        `pass the file written by gradgate run --out`,
    );
  }
  if (obj.version !== RESULTS_VERSION) {
    throw new InputError(`${where}: version must be ${RESULTS_VERSION}, got ${quote(obj.version)}; ${rerun}`);
  }
  const validate = resultsSchemaValidator();
  if (!validate(data)) {
    throw new InputError(describeSchemaError((validate.errors ?? [])[0], data, where).replace(REGENERATE, rerun));
  }
  return data as ResultsDocument;
}

/** "sha256:…" of the canonical JSON of a baseline without its `digest` and `$schema` fields. */
export function baselineDigest(file: Omit<BaselineFile, "digest"> & { digest?: string; $schema?: string }): string {
  const rest: Record<string, unknown> = { ...file };
  delete rest.digest;
  delete rest.$schema;
  return "sha256:" + createHash("sha256").update(canonicalJson(rest)).digest("hex");
}

/**
 * Parses and checks the text of a baseline file. `file` names it in messages (e.g. "baselines/adam.json");
 * `optimizer` is the name its file name implies (the part before ".json").
 */
export function parseBaseline(text: string, file: string, optimizer: string): BaselineFile {
  const where = `baseline ${file}`;
  if (text.trim() === "") {
    throw new InputError(`${where}: the file is empty; restore it from version control or ${REGENERATE}`);
  }
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch (err) {
    throw new InputError(describeParseError(text, (err as Error).message, where));
  }
  if (data === null || typeof data !== "object" || Array.isArray(data)) {
    throw new InputError(`${where}: must be a JSON object written by gradgate rebaseline, got ${quote(data)}; ${REGENERATE}`);
  }
  const obj = data as Record<string, unknown>;
  if (obj.format !== BASELINE_FORMAT) {
    throw new InputError(
      `${where}: format must be ${JSON.stringify(BASELINE_FORMAT)}, got ${quote(obj.format)}: not a gradgate baseline; ` +
        `move it out of the baselines directory or ${REGENERATE}`,
    );
  }
  if (obj.version !== BASELINE_VERSION) {
    const newer = typeof obj.version === "number" && obj.version > BASELINE_VERSION;
    throw new InputError(
      `${where}: version must be ${BASELINE_VERSION}, got ${quote(obj.version)}` +
        (newer
          ? `: written by a newer gradgate than ${TOOL_VERSION}; upgrade gradgate or ${REGENERATE}`
          : `; ${REGENERATE}`),
    );
  }
  const validate = schemaValidator();
  if (!validate(data)) throw new InputError(describeSchemaError((validate.errors ?? [])[0], data, where));
  const baseline = data as BaselineFile;
  const expected = baselineDigest(baseline);
  if (baseline.digest !== expected) {
    throw new InputError(
      `${where}: digest ${quote(baseline.digest)} does not match the content (${expected}): the file was changed ` +
        `after gradgate wrote it (edited by hand?); undo the edit (git checkout -- ${file}) or ${REGENERATE}`,
    );
  }
  checkConsistency(baseline, where, optimizer);
  return baseline;
}

/** Truncated files and syntax errors: position as line and column. */
function describeParseError(text: string, message: string, where: string): string {
  const pos = /position (\d+)/.exec(message);
  const offset = pos ? Number(pos[1]) : text.length;
  const truncated = /end of JSON input|Unterminated string/.test(message) || offset >= text.trimEnd().length;
  const before = text.slice(0, offset);
  const line = before.split("\n").length;
  const column = offset - before.lastIndexOf("\n");
  if (truncated) {
    return (
      `${where}: the file ends early at line ${line}, column ${column} (truncated: ${text.length} bytes); ` +
      `restore it from version control (git checkout -- ${where.replace(/^\S+ /, "")}) or ${REGENERATE}`
    );
  }
  return `${where}: not valid JSON at line ${line}, column ${column}: ${message.split("\n")[0]}; ${REGENERATE}`;
}

const article = (t: string) => (t === "null" ? "null" : /^[aeiou]/.test(t) ? `an ${t}` : `a ${t}`);

function describeSchemaError(e: ErrorObject | undefined, data: unknown, where: string): string {
  if (e === undefined) return `${where}: does not match the baseline schema; ${REGENERATE}`;
  const path = jsonPointerToPath(e.instancePath);
  const p = e.params as Record<string, unknown>;
  const value = valueAtPointer(data, e.instancePath);
  const at = path === "" ? "the top level" : path;
  switch (e.keyword) {
    case "required":
      return `${where}: ${path ? `${path}.` : ""}${String(p.missingProperty)} is missing; ${REGENERATE}`;
    case "additionalProperties":
      return `${where}: ${path ? `${path}.` : ""}${String(p.additionalProperty)} is not a baseline field; ${REGENERATE}`;
    case "type": {
      const types = (Array.isArray(p.type) ? (p.type as string[]) : [String(p.type)]).map(article).join(" or ");
      return `${where}: ${at} must be ${types}, got ${quote(value)}; ${REGENERATE}`;
    }
    case "enum":
      return `${where}: ${at} must be one of ${(p.allowedValues as unknown[]).map((v) => JSON.stringify(v)).join(", ")}, got ${quote(value)}; ${REGENERATE}`;
    case "minimum":
      return `${where}: ${at} must be ≥ ${String(p.limit)}, got ${quote(value)}; ${REGENERATE}`;
    case "exclusiveMinimum":
      return `${where}: ${at} must be > ${String(p.limit)}, got ${quote(value)}; ${REGENERATE}`;
    case "minItems":
      return `${where}: ${at} must list at least ${String(p.limit)} item(s), got ${quote(value)}; ${REGENERATE}`;
    case "pattern":
      return `${where}: ${at} must match ${String(p.pattern)}, got ${quote(value)}; ${REGENERATE}`;
    default:
      return `${where}: ${at} ${e.message ?? "is invalid"}, got ${quote(value)}; ${REGENERATE}`;
  }
}

/** What the schema cannot say. */
function checkConsistency(b: BaselineFile, where: string, optimizer: string): void {
  const fail = (field: string, text: string) => {
    throw new InputError(`${where}: ${field} ${text}; ${REGENERATE}`);
  };
  if (b.optimizer !== optimizer) {
    throw new InputError(
      `${where}: optimizer is ${quote(b.optimizer)} but the file name says ${quote(optimizer)}; ` +
        `rename the file to ${b.optimizer}.json or ${REGENERATE}`,
    );
  }
  const ids = new Set<string>();
  b.cases.forEach((c, i) => {
    const spec = c.case;
    const f = `cases[${i}]`;
    if (spec.optimizer !== b.optimizer) fail(`${f}.case.optimizer`, `is ${quote(spec.optimizer)}, expected ${quote(b.optimizer)}`);
    const id = `${spec.optimizer}/${spec.set}/${spec.problemKey}`;
    if (spec.id !== id) fail(`${f}.case.id`, `is ${quote(spec.id)}, expected ${quote(id)}`);
    if (ids.has(spec.id)) fail(`${f}.case.id`, `${quote(spec.id)} appears twice`);
    ids.add(spec.id);
    if (c.runs.length !== spec.seeds) fail(`${f}.runs`, `holds ${c.runs.length} runs, expected ${spec.seeds} (case.seeds)`);
    const all: [RunMetrics, string, number][] = c.runs.map((r, j) => [r, `${f}.runs[${j}]`, j]);
    c.extraRuns.forEach((r, j) => all.push([r, `${f}.extraRuns[${j}]`, spec.seeds + j]));
    for (const [run, rf, seed] of all) {
      if (run.seed !== seed) fail(`${rf}.seed`, `is ${run.seed}, expected ${seed} (seeds in order, no gaps)`);
      if (run.stepsTo.length !== spec.ladder.length) {
        fail(`${rf}.stepsTo`, `holds ${run.stepsTo.length} values, expected ${spec.ladder.length} (one per ladder rung)`);
      }
      if (run.evaluationsTo.length !== spec.ladder.length) {
        fail(`${rf}.evaluationsTo`, `holds ${run.evaluationsTo.length} values, expected ${spec.ladder.length} (one per ladder rung)`);
      }
      // Extra seeds keep no trace (charts use the suite's own seeds): an empty one is expected there.
      const traceLength = seed < spec.seeds ? spec.checkpoints.length : 0;
      if (run.trace.length !== traceLength) {
        fail(
          `${rf}.trace`,
          `holds ${run.trace.length} values, expected ${traceLength}${seed < spec.seeds ? " (one per checkpoint)" : " (extra seeds keep no trace)"}`,
        );
      }
    }
  });
}
