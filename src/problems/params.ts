/**
 * Problem parameters: validation against a problem's `ParamSpec`s, merging of defaults, and the
 * canonical instance key. Kept apart from the registry (index.ts) so that problem files can use it
 * without an import cycle.
 */
import type { ParamSpec, ProblemDefinition, ProblemParams } from "../core/types.js";

/** How a rejected value is quoted in an error message: strings in JSON quotes, numbers as written. */
function quote(value: unknown): string {
  if (typeof value === "string") return JSON.stringify(value);
  if (typeof value === "number" || typeof value === "boolean" || typeof value === "bigint")
    return String(value);
  if (value === undefined) return "undefined";
  try {
    return JSON.stringify(value);
  } catch {
    return String(value);
  }
}

/** The admissible form of a parameter, e.g. "an even integer ≥ 2" or "a number in [0, 1]". */
export function describeSpec(spec: ParamSpec): string {
  const kind = spec.even ? "an even integer" : spec.integer ? "an integer" : "a number";
  const { min, max } = spec;
  if (min !== undefined && max !== undefined) return `${kind} in [${min}, ${max}]`;
  if (min !== undefined) return `${kind} ≥ ${min}`;
  if (max !== undefined) return `${kind} ≤ ${max}`;
  return spec.integer || spec.even ? kind : "a finite number";
}

/** True when `value` satisfies `spec`. */
export function satisfiesSpec(spec: ParamSpec, value: unknown): value is number {
  if (typeof value !== "number" || !Number.isFinite(value)) return false;
  if ((spec.integer || spec.even) && !Number.isInteger(value)) return false;
  if (spec.even && value % 2 !== 0) return false;
  if (spec.min !== undefined && value < spec.min) return false;
  if (spec.max !== undefined && value > spec.max) return false;
  return true;
}

/**
 * Merges the user's parameters over the problem's defaults and validates every value once.
 * `where` names the place in the input, e.g. `config gradgate.yml: problems[2]`; errors read
 * `${where}.params.n must be an even integer ≥ 2, got 3`. Unknown names and non-mapping input are
 * errors too (never ignored). Returns a frozen object holding every declared parameter.
 */
export function resolveProblemParams(def: ProblemDefinition, given: unknown, where: string): ProblemParams {
  const names = Object.keys(def.params).sort();
  if (given !== undefined && given !== null && (typeof given !== "object" || Array.isArray(given))) {
    throw new Error(
      `${where}.params must be a mapping from parameter name to number (${names.join(", ") || "none"}), got ${quote(given)}`,
    );
  }
  const input = (given ?? {}) as Record<string, unknown>;
  for (const key of Object.keys(input)) {
    if (!Object.prototype.hasOwnProperty.call(def.params, key)) {
      const known = names.length > 0 ? `expected one of: ${names.join(", ")}` : "it takes no parameters";
      throw new Error(`${where}.params.${key} is not a parameter of problem "${def.name}"; ${known}`);
    }
  }
  const out: Record<string, number> = {};
  for (const name of names) {
    const spec = def.params[name];
    const value = Object.prototype.hasOwnProperty.call(input, name) ? input[name] : spec.default;
    if (!satisfiesSpec(spec, value)) {
      throw new Error(`${where}.params.${name} must be ${describeSpec(spec)}, got ${quote(value)}`);
    }
    out[name] = value;
  }
  return Object.freeze(out);
}

/**
 * Canonical key of a problem instance: the bare name when every parameter has its default, else
 * `name(k=v,...)` listing only the non-default parameters, sorted by name, numbers as JavaScript
 * prints them (`String(v)`). Missing parameters count as defaults; names not declared are ignored.
 */
export function problemKey(def: ProblemDefinition, params: ProblemParams): string {
  const parts: string[] = [];
  for (const name of Object.keys(def.params).sort()) {
    const value = params[name];
    if (value !== undefined && value !== def.params[name].default) parts.push(`${name}=${String(value)}`);
  }
  return parts.length === 0 ? def.name : `${def.name}(${parts.join(",")})`;
}

/**
 * Key of a problem's fixed structure (rotation, data set): the name and the listed parameters,
 * always spelled out, so that parameters that do not shape the structure (a mini-batch size, a
 * regularisation weight, a condition number) never change it. Seeds `structureRng`.
 */
export function structureKey(name: string, params: ProblemParams, structural: readonly string[]): string {
  const parts = [...structural].sort().map((k) => `${k}=${String(params[k])}`);
  return `${name}[${parts.join(",")}]`;
}

/** What every `create` does first: defaults merged and validated, and the instance key. */
export function prepare(def: ProblemDefinition, params: ProblemParams): { p: ProblemParams; key: string } {
  const p = resolveProblemParams(def, params, `problem "${def.name}"`);
  return { p, key: problemKey(def, p) };
}
