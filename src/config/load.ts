/**
 * Suite config: parse (JSON or YAML), validate against the JSON Schema with ajv, apply defaults, and
 * turn every problem into one clear message naming the file, the field, the bad value and the expected
 * form. Pure: takes the text and the file's name, reads nothing itself.
 */
import { jsonPointerToPath, valueAtPointer } from "../core/json-pointer.js";
import { Ajv2020 } from "ajv/dist/2020.js";
import type { ErrorObject } from "ajv";
import { parse as parseYaml, YAMLParseError } from "yaml";
import { InputError, quote } from "../core/errors.js";
import type { HyperValue } from "../core/types.js";
import { configSchema } from "./schema.js";

export interface BudgetConfig {
  steps?: number;
  evaluations?: number;
  seconds?: number;
}

export interface OptimizerConfig {
  name: string;
  use?: string;
  hyper?: Record<string, HyperValue>;
  sets?: Record<string, Record<string, HyperValue>>;
}

export interface ProblemConfig {
  use: string;
  params?: Record<string, number>;
  budget?: BudgetConfig;
  hyper?: Record<string, Record<string, HyperValue>>;
  optimizers?: string[];
}

/** A process adapter (`adapters.NAME`), defaults filled in; paths still relative to the config file. */
export interface ProcessAdapterConfig {
  command: string[];
  cwd: string;
  env: Record<string, string>;
  maxRuns: number;
  maxMessageBytes: number;
  timeouts: { start: number; message: number; run: number };
}

/** A scenario (`scenarios[i]`). */
export interface ScenarioConfig {
  name: string;
  resume?: { at: number };
  lrChange?: { at: number; lr?: number; factor?: number };
  hyper?: Record<string, HyperValue>;
  problem?: { use: string; params?: Record<string, number>; budget?: BudgetConfig };
  problems?: string[];
  optimizers?: string[];
}

/** A validated config with every default filled in. */
export interface SuiteConfig {
  version: number;
  seed: number;
  seeds: number;
  budget: Required<BudgetConfig>;
  ladder: number[];
  stopAt: number;
  blowUp: number;
  fingerprint: { steps: number; maxDim: number };
  optimizers: OptimizerConfig[];
  problems: ProblemConfig[];
  policy?: Record<string, unknown>;
  checks?: Record<string, unknown>;
  adapters?: Record<string, ProcessAdapterConfig>;
  scenarios?: ScenarioConfig[];
}

let validator: ReturnType<Ajv2020["compile"]> | null = null;
function validate(data: unknown): { ok: boolean; errors: ErrorObject[] } {
  if (validator === null) {
    const ajv = new Ajv2020({
      allErrors: true,
      verbose: true,
      useDefaults: true,
      strict: true,
      allowUnionTypes: true,
    });
    validator = ajv.compile(configSchema);
  }
  const ok = validator(data) as boolean;
  return { ok, errors: validator.errors ?? [] };
}

/** Parses and validates a config. `file` names it in messages, e.g. "gradgate.yml". */
export function parseConfig(text: string, file: string): SuiteConfig {
  const where = `config ${file}`;
  let data: unknown;
  try {
    data = /\.json$/i.test(file) ? JSON.parse(text) : parseYaml(text);
  } catch (err) {
    if (err instanceof YAMLParseError) {
      const pos = err.linePos?.[0];
      throw new InputError(
        `${where}: not valid YAML${pos ? ` at line ${pos.line}, column ${pos.col}` : ""}: ${firstLine(err.message)}`,
      );
    }
    throw new InputError(`${where}: not valid JSON: ${firstLine((err as Error).message)}`);
  }
  if (data === null || typeof data !== "object" || Array.isArray(data)) {
    throw new InputError(
      `${where}: must be a mapping with at least "optimizers" and "problems", got ${quote(data)}`,
    );
  }
  const { ok, errors } = validate(data);
  if (!ok) throw new InputError(describeErrors(errors, data, where));
  const config = data as SuiteConfig;
  checkCrossFields(config, where);
  checkAdaptersAndScenarios(config, where);
  return config;
}

function firstLine(s: string): string {
  return s.split("\n")[0];
}

const article = (t: string) => (/^[aeiou]/.test(t) ? `an ${t}` : `a ${t}`);

function phrase(e: ErrorObject): string {
  const p = e.params as Record<string, unknown>;
  switch (e.keyword) {
    case "type": {
      const types = Array.isArray(p.type) ? (p.type as string[]) : [String(p.type)];
      return `must be ${types.map(article).join(" or ")}`;
    }
    case "minimum":
      return `must be ≥ ${p.limit}`;
    case "maximum":
      return `must be ≤ ${p.limit}`;
    case "exclusiveMinimum":
      return `must be > ${p.limit}`;
    case "exclusiveMaximum":
      return `must be < ${p.limit}`;
    case "minItems":
      return `must list at least ${p.limit} item${p.limit === 1 ? "" : "s"}`;
    case "maxItems":
      return `must list at most ${p.limit} items`;
    case "pattern":
      return `must be letters, digits, "_", "." or "-" (starting with a letter or digit)`;
    case "const":
      return `must be ${JSON.stringify(p.allowedValue)}`;
    case "enum":
      return `must be one of ${(p.allowedValues as unknown[]).map((v) => JSON.stringify(v)).join(", ")}`;
    default:
      return e.message ?? "is invalid";
  }
}

function describeErrors(errors: ErrorObject[], data: unknown, where: string): string {
  // Ajv reports a union type failure once per branch; keep the first message per field.
  const seen = new Set<string>();
  const lines: string[] = [];
  for (const e of errors) {
    const path = jsonPointerToPath(e.instancePath);
    let line: string;
    if (e.keyword === "required") {
      const field = String((e.params as { missingProperty: string }).missingProperty);
      line = `${where}: ${path ? `${path}.` : ""}${field} is required`;
    } else if (e.keyword === "additionalProperties") {
      const extra = String((e.params as { additionalProperty: string }).additionalProperty);
      const known = knownFields(e);
      line = `${where}: ${path ? `${path}.` : ""}${extra} is not a known field${known ? ` (known: ${known})` : ""}`;
    } else if (e.keyword === "propertyNames") {
      continue; // the pattern error that follows names the key
    } else {
      const value = valueAtPointer(data, e.instancePath);
      line = `${where}: ${path || "the top level"} ${phrase(e)}, got ${quote(value)}`;
      if (e.keyword === "pattern" && e.propertyName !== undefined) {
        line = `${where}: ${path}.${e.propertyName} is not a valid name: ${phrase(e)}`;
      }
    }
    const key = path + "|" + e.keyword;
    if (seen.has(key)) continue;
    seen.add(key);
    lines.push(line);
  }
  return lines.join("\n");
}

function knownFields(e: ErrorObject): string {
  const props = (e.parentSchema as { properties?: Record<string, unknown> } | undefined)?.properties;
  return props
    ? Object.keys(props)
        .filter((k) => k !== "$schema")
        .join(", ")
    : "";
}

/** Rules the schema cannot say: unique names, decreasing ladder, references to optimizer names. */
function checkCrossFields(config: SuiteConfig, where: string): void {
  const names = new Set<string>();
  config.optimizers.forEach((o, i) => {
    if (names.has(o.name)) {
      throw new InputError(
        `${where}: optimizers[${i}].name ${quote(o.name)} is used twice; names must be unique`,
      );
    }
    names.add(o.name);
  });
  for (let i = 1; i < config.ladder.length; i++) {
    if (!(config.ladder[i] < config.ladder[i - 1])) {
      throw new InputError(
        `${where}: ladder must be strictly decreasing, got ${config.ladder[i]} after ${config.ladder[i - 1]} at ladder[${i}]`,
      );
    }
  }
  config.problems.forEach((p, i) => {
    for (const [j, name] of (p.optimizers ?? []).entries()) {
      if (!names.has(name)) {
        throw new InputError(
          `${where}: problems[${i}].optimizers[${j}] names ${quote(name)}, which is not in optimizers (known: ${[...names].join(", ")})`,
        );
      }
    }
    for (const name of Object.keys(p.hyper ?? {})) {
      if (!names.has(name)) {
        throw new InputError(
          `${where}: problems[${i}].hyper.${name} names an optimizer that is not in optimizers (known: ${[...names].join(", ")})`,
        );
      }
    }
  });
}

/** Adapter names that are spellings of `use` themselves (src/adapters/use.ts). */
const RESERVED_ADAPTERS = ["reference", "module"];

/** Rules for `adapters` and `scenarios` that the schema cannot say. */
function checkAdaptersAndScenarios(config: SuiteConfig, where: string): void {
  for (const name of Object.keys(config.adapters ?? {})) {
    if (RESERVED_ADAPTERS.includes(name)) {
      throw new InputError(
        `${where}: adapters.${name}: "${name}" is reserved (use: ${name}:... means something else); choose another name`,
      );
    }
  }
  const optimizerNames = config.optimizers.map((o) => o.name);
  const problemUses = config.problems.map((p) => p.use);
  const seen = new Set<string>();
  (config.scenarios ?? []).forEach((sc, i) => {
    const at = `${where}: scenarios[${i}]`;
    if (seen.has(sc.name))
      throw new InputError(`${at}.name ${quote(sc.name)} is used twice; names must be unique`);
    seen.add(sc.name);
    if (!sc.resume && !sc.lrChange && !sc.hyper && !sc.problem) {
      throw new InputError(
        `${at} (${quote(sc.name)}) changes nothing: give resume, lrChange, hyper or problem`,
      );
    }
    if (sc.resume && sc.lrChange) {
      throw new InputError(`${at} has both resume and lrChange; make them two scenarios`);
    }
    if (sc.lrChange && (sc.lrChange.lr === undefined) === (sc.lrChange.factor === undefined)) {
      throw new InputError(
        `${at}.lrChange needs exactly one of lr (the new rate) or factor (times the case's lr)`,
      );
    }
    if (sc.problem && sc.problems) {
      throw new InputError(`${at} has both problem and problems; problem replaces the suite's problems`);
    }
    for (const [j, name] of (sc.optimizers ?? []).entries()) {
      if (!optimizerNames.includes(name)) {
        throw new InputError(
          `${at}.optimizers[${j}] names ${quote(name)}, which is not in optimizers (known: ${optimizerNames.join(", ")})`,
        );
      }
    }
    for (const [j, use] of (sc.problems ?? []).entries()) {
      if (!problemUses.includes(use)) {
        throw new InputError(
          `${at}.problems[${j}] names ${quote(use)}, which is not the use of any of problems (known: ${problemUses.join(", ")})`,
        );
      }
    }
  });
}
