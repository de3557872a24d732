/**
 * The in-process adapter: an optimizer from an ES module of the user's repository, implementing the
 * same `OptimizerFactory` contract as the reference optimizers (src/core/types.ts):
 *
 *   export const myAdam = {
 *     name: "my-adam", title: "...", defaults: { lr: 0.001 },      // name, title, defaults optional
 *     create(hyper, dim) { return { step(x, oracle) { ... }, exportState() {...}, ... }; },
 *   };
 *
 * JavaScript only (ESM; CommonJS through Node's interop). TypeScript sources need a build step first:
 * Node 20 cannot strip types (`use.ts` rejects .ts paths with that advice).
 *
 * Hyperparameters: the factory's `defaults` (if any) are merged under the config's values and the
 * result is passed through unchecked — the module validates its own. The code is untrusted: the run
 * loop double-checks the iterate before reusing a loss (LoadedOptimizer.untrusted → verifyIterate),
 * and `create` is wrapped so that a wrong shape becomes a clear error in the run, never a crash.
 */
import { existsSync } from "node:fs";
import { resolve } from "node:path";
import { pathToFileURL } from "node:url";
import { InputError, quote } from "../core/errors.js";
import type { Hyper, HyperValue, Optimizer, OptimizerFactory } from "../core/types.js";

/** A module optimizer, loaded and checked. */
export interface ModuleOptimizer {
  readonly factory: OptimizerFactory;
  /** The absolute file it came from. */
  readonly file: string;
}

const cache = new Map<string, Promise<ModuleOptimizer>>();

/**
 * Imports `path#exportName` relative to `baseDir` and checks its shape. Throws an `InputError` whose
 * message starts with `where` when the file is missing, cannot be imported, lacks the export, or the
 * export is not factory-shaped. Cached per file and export (per thread).
 */
export function loadModuleOptimizer(
  path: string,
  exportName: string,
  baseDir: string,
  where: string,
): Promise<ModuleOptimizer> {
  const file = resolve(baseDir, path);
  const key = `${file}#${exportName}`;
  let loaded = cache.get(key);
  if (loaded === undefined) {
    loaded = load(file, path, exportName, where);
    cache.set(key, loaded);
    loaded.catch(() => cache.delete(key));
  }
  return loaded;
}

async function load(file: string, path: string, exportName: string, where: string): Promise<ModuleOptimizer> {
  const label = `module ${quote(`${path}#${exportName}`)}`;
  if (!existsSync(file)) throw new InputError(`${where}: ${label}: no such file ${quote(file)}`);
  let namespace: Record<string, unknown>;
  try {
    namespace = (await import(/* @vite-ignore */ pathToFileURL(file).href)) as Record<string, unknown>;
  } catch (err) {
    throw new InputError(`${where}: ${label} could not be imported: ${firstLine(err)}`);
  }
  if (!(exportName in namespace)) {
    const names = Object.keys(namespace).sort();
    throw new InputError(
      `${where}: ${label} has no export ${quote(exportName)} (exports: ${names.length > 0 ? names.join(", ") : "none"})`,
    );
  }
  const value = namespace[exportName];
  return { factory: checkFactory(value, `${where}: ${label}`, exportName), file };
}

/**
 * Checks that `value` is factory-shaped and returns a wrapper: `defaults` validated once, `create`
 * given a frozen copy of the hyperparameters and its result checked for a `step` method.
 */
export function checkFactory(value: unknown, where: string, fallbackName: string): OptimizerFactory {
  if (
    value === null ||
    typeof value !== "object" ||
    typeof (value as { create?: unknown }).create !== "function"
  ) {
    throw new InputError(
      `${where} must be an object with a create(hyper, dim) method (an OptimizerFactory), got ${describe(value)}`,
    );
  }
  const source = value as Partial<OptimizerFactory> & { create: OptimizerFactory["create"] };
  const defaults = source.defaults ?? {};
  if (defaults === null || typeof defaults !== "object" || Array.isArray(defaults)) {
    throw new InputError(
      `${where}: defaults must be a mapping of hyperparameter names to values, got ${quote(defaults)}`,
    );
  }
  for (const [name, v] of Object.entries(defaults)) {
    if (!isHyperValue(v)) {
      throw new InputError(
        `${where}: defaults.${name} must be a finite number, a boolean or a string, got ${quote(v)}`,
      );
    }
  }
  const name = typeof source.name === "string" && source.name !== "" ? source.name : fallbackName;
  const title = typeof source.title === "string" ? source.title : name;
  const frozenDefaults = Object.freeze({ ...(defaults as Record<string, HyperValue>) });
  return Object.freeze({
    name,
    title,
    defaults: frozenDefaults,
    create(hyper: Hyper, dim: number): Optimizer {
      const instance = source.create.call(source, Object.freeze({ ...hyper }), dim) as unknown;
      if (
        instance === null ||
        typeof instance !== "object" ||
        typeof (instance as { step?: unknown }).step !== "function"
      ) {
        throw new Error(
          `create(hyper, dim) must return an object with a step(x, oracle) method, got ${describe(instance)}`,
        );
      }
      return instance as Optimizer;
    },
  });
}

/** The factory's defaults under the config's values (the config wins); nothing is checked. */
export function mergeModuleHyper(
  factory: OptimizerFactory,
  given: Readonly<Record<string, HyperValue>>,
): Hyper {
  return { ...factory.defaults, ...given };
}

/** Which optional capabilities an instance has (probed on an instance made for the purpose). */
export function instanceCapabilities(instance: Optimizer): { state: boolean; lr: boolean } {
  return {
    state: typeof instance.exportState === "function" && typeof instance.importState === "function",
    lr: typeof instance.setLearningRate === "function",
  };
}

function isHyperValue(v: unknown): v is HyperValue {
  return typeof v === "boolean" || typeof v === "string" || (typeof v === "number" && Number.isFinite(v));
}

function describe(value: unknown): string {
  if (typeof value === "function") return "a function (export the factory object, not a class or function)";
  if (value === null || typeof value !== "object") return quote(value);
  const keys = Object.keys(value);
  return keys.length === 0 ? "an object without methods" : `an object with ${keys.slice(0, 8).join(", ")}`;
}

function firstLine(err: unknown): string {
  const text = err instanceof Error ? err.message : String(err);
  return text.split("\n")[0];
}
