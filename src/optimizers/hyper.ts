/**
 * Hyperparameter specifications of the reference optimizers, and the one validator that applies them.
 *
 * Each reference optimizer declares its hyperparameters once, as a `HyperSpecs` table (type, admissible
 * range or choices, default, description). Everything else is derived from that table: the factory's
 * `defaults`, the validation in `resolveHyper` (used by the config loader and by every `create`), and
 * the JSON Schema fragment from `hyperJsonSchema` (for the config schema and the generated docs).
 *
 * Cost: O(number of hyperparameters) per call; nothing here runs inside a step.
 */
import { InputError, quote } from "../core/errors.js";
import type { Hyper, HyperValue, Optimizer, OptimizerFactory } from "../core/types.js";

/**
 * A numeric hyperparameter. Bounds use the JSON Schema keywords of the same names (an open standard),
 * so the schema fragment is a copy of these fields. Values must always be finite.
 */
export interface NumberHyperSpec {
  readonly type: "number";
  readonly default: number;
  readonly description: string;
  readonly minimum?: number;
  readonly exclusiveMinimum?: number;
  readonly maximum?: number;
  readonly exclusiveMaximum?: number;
}

/** An on/off hyperparameter. */
export interface BooleanHyperSpec {
  readonly type: "boolean";
  readonly default: boolean;
  readonly description: string;
}

/** A hyperparameter that picks one of a few named variants (e.g. where ε goes). */
export interface ChoiceHyperSpec {
  readonly type: "choice";
  readonly choices: readonly string[];
  readonly default: string;
  readonly description: string;
}

export type HyperSpec = NumberHyperSpec | BooleanHyperSpec | ChoiceHyperSpec;

/** Hyperparameter name → spec, in the order they are documented and listed in messages. */
export type HyperSpecs = Readonly<Record<string, HyperSpec>>;

/** A reference optimizer instance: every optional capability of `Optimizer` is implemented. */
export type ReferenceOptimizer = Required<Optimizer>;

/** A reference optimizer factory: declares its hyperparameters and creates full-capability instances. */
export interface ReferenceOptimizerFactory extends OptimizerFactory {
  /** The single place where the hyperparameters, their ranges and their defaults are declared. */
  readonly hyperSpecs: HyperSpecs;
  /**
   * Rules about combinations that a single spec cannot state. Receives resolved (complete) values;
   * throws an `InputError` whose message starts with `where`.
   */
  readonly checkCombination?: (hyper: Hyper, where: string) => void;
  create(hyper: Hyper, dim: number): ReferenceOptimizer;
}

/** The defaults of a spec table, as a frozen `Hyper` in declaration order. */
export function defaultsOf(specs: HyperSpecs): Hyper {
  const out: Record<string, HyperValue> = {};
  for (const [name, spec] of Object.entries(specs)) out[name] = spec.default;
  return Object.freeze(out);
}

/** "a positive number", "a nonnegative number" or "a number in [0, 1)": the expected form of a value. */
export function describeNumberSpec(spec: NumberHyperSpec): string {
  const hasMax = spec.maximum !== undefined || spec.exclusiveMaximum !== undefined;
  if (!hasMax && spec.exclusiveMinimum === 0 && spec.minimum === undefined) return "a positive number";
  if (!hasMax && spec.minimum === 0 && spec.exclusiveMinimum === undefined) return "a nonnegative number";
  const lo =
    spec.minimum !== undefined
      ? `[${spec.minimum}`
      : spec.exclusiveMinimum !== undefined
        ? `(${spec.exclusiveMinimum}`
        : "(-∞";
  const hi =
    spec.maximum !== undefined
      ? `${spec.maximum}]`
      : spec.exclusiveMaximum !== undefined
        ? `${spec.exclusiveMaximum})`
        : "∞)";
  return `a number in ${lo}, ${hi}`;
}

/** Quotes a bad value; numbers keep their JavaScript spelling (NaN and Infinity are not JSON). */
function show(value: unknown): string {
  return typeof value === "number" ? String(value) : quote(value);
}

function inRange(x: number, spec: NumberHyperSpec): boolean {
  if (!Number.isFinite(x)) return false;
  if (spec.minimum !== undefined && !(x >= spec.minimum)) return false;
  if (spec.exclusiveMinimum !== undefined && !(x > spec.exclusiveMinimum)) return false;
  if (spec.maximum !== undefined && !(x <= spec.maximum)) return false;
  if (spec.exclusiveMaximum !== undefined && !(x < spec.exclusiveMaximum)) return false;
  return true;
}

/** Throws unless `value` satisfies `spec`; the message names `${where}.${name}` and quotes the value. */
function checkValue(name: string, spec: HyperSpec, value: unknown, where: string): void {
  const field = `${where}.${name}`;
  switch (spec.type) {
    case "number":
      if (typeof value !== "number" || !inRange(value, spec)) {
        throw new InputError(`${field} must be ${describeNumberSpec(spec)}, got ${show(value)}`);
      }
      return;
    case "boolean":
      if (typeof value !== "boolean")
        throw new InputError(`${field} must be true or false, got ${show(value)}`);
      return;
    case "choice":
      if (typeof value !== "string" || !spec.choices.includes(value)) {
        const choices = spec.choices.map((c) => JSON.stringify(c)).join(", ");
        throw new InputError(`${field} must be one of ${choices}, got ${show(value)}`);
      }
      return;
  }
}

/**
 * Merges the user's hyperparameters over the factory's defaults and validates every given value.
 *
 * `where` locates the hyperparameter mapping for messages, e.g.
 * `config gradgate.yml: optimizers[1].hyper`, giving
 * `config gradgate.yml: optimizers[1].hyper.lr must be a positive number, got "fast"`.
 * Unknown names, wrong types and out-of-range values throw an `InputError`; nothing is coerced.
 * Returns a frozen mapping with every declared hyperparameter, in declaration order.
 */
export function resolveHyper(factory: ReferenceOptimizerFactory, given: unknown, where: string): Hyper {
  if (given === undefined || given === null) given = {};
  if (typeof given !== "object" || Array.isArray(given)) {
    throw new InputError(`${where} must be a mapping of hyperparameter names to values, got ${show(given)}`);
  }
  const specs = factory.hyperSpecs;
  const known = Object.keys(specs);
  const values = given as Record<string, unknown>;
  for (const [name, value] of Object.entries(values)) {
    if (!Object.prototype.hasOwnProperty.call(specs, name)) {
      throw new InputError(
        `${where}.${name} is not a hyperparameter of ${factory.name} (known: ${known.join(", ")})`,
      );
    }
    checkValue(name, specs[name], value, where);
  }
  const out: Record<string, HyperValue> = {};
  for (const name of known) {
    out[name] = Object.prototype.hasOwnProperty.call(values, name)
      ? (values[name] as HyperValue)
      : specs[name].default;
  }
  factory.checkCombination?.(out, where);
  return Object.freeze(out);
}

/** Throws unless `dim` is a positive integer (the problem dimension handed to `create`). */
export function checkDim(dim: unknown, who: string): number {
  if (typeof dim !== "number" || !Number.isInteger(dim) || dim < 1) {
    throw new InputError(`${who}: dim must be a positive integer, got ${show(dim)}`);
  }
  return dim;
}

/** Throws unless `lr` is a positive finite number (for `setLearningRate`). */
export function checkLearningRate(lr: unknown, who: string): number {
  if (typeof lr !== "number" || !Number.isFinite(lr) || !(lr > 0)) {
    throw new InputError(`${who}: lr must be a positive number, got ${show(lr)}`);
  }
  return lr;
}

/**
 * Throws a `RangeError` unless the iterate has the dimension the instance was created for. Called at
 * the top of every step, so the message is built only on failure (no string work per step).
 */
export function checkIterate(x: Float64Array, dim: number, optimizerName: string): void {
  if (x.length !== dim) {
    throw new RangeError(`${optimizerName}.step: x must have length ${dim}, got length ${x.length}`);
  }
}

/**
 * Builds a reference factory from its spec table: `defaults` is derived from the specs, and `create`
 * validates through `resolveHyper` (so programmatic use is as safe as a config file) before calling
 * `build` with complete, valid values.
 */
export function defineOptimizer(def: {
  readonly name: string;
  readonly title: string;
  readonly hyperSpecs: HyperSpecs;
  readonly checkCombination?: (hyper: Hyper, where: string) => void;
  readonly build: (hyper: Hyper, dim: number) => ReferenceOptimizer;
}): ReferenceOptimizerFactory {
  const factory: ReferenceOptimizerFactory = {
    name: def.name,
    title: def.title,
    hyperSpecs: def.hyperSpecs,
    defaults: defaultsOf(def.hyperSpecs),
    checkCombination: def.checkCombination,
    create(hyper: Hyper, dim: number): ReferenceOptimizer {
      const resolved = resolveHyper(factory, hyper, `optimizer ${def.name}: hyper`);
      return def.build(resolved, checkDim(dim, `optimizer ${def.name}`));
    },
  };
  return Object.freeze(factory);
}

/**
 * The JSON Schema (draft 2020-12 vocabulary, as ajv reads it) of one optimizer's hyperparameter
 * mapping, generated from its spec table: unknown names rejected, each value typed and bounded, with
 * its default and description.
 */
export function hyperJsonSchema(factory: ReferenceOptimizerFactory): Record<string, unknown> {
  const properties: Record<string, unknown> = {};
  for (const [name, spec] of Object.entries(factory.hyperSpecs)) {
    if (spec.type === "number") {
      const { type: _type, ...bounds } = spec;
      properties[name] = { type: "number", ...bounds };
    } else if (spec.type === "boolean") {
      properties[name] = { type: "boolean", default: spec.default, description: spec.description };
    } else {
      properties[name] = {
        type: "string",
        enum: [...spec.choices],
        default: spec.default,
        description: spec.description,
      };
    }
  }
  return {
    type: "object",
    description: `Hyperparameters of ${factory.title}.`,
    additionalProperties: false,
    properties,
  };
}
