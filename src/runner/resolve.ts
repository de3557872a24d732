/**
 * From a config's `use` string to something that can run: a reference optimizer now; the adapters
 * (in-process modules, subprocess protocol) plug in here.
 */
import { InputError, quote } from "../core/errors.js";
import type { OptimizerFactory } from "../core/types.js";
import { OPTIMIZERS, type ReferenceOptimizerFactory, getOptimizer } from "../optimizers/index.js";

export interface LoadedOptimizer {
  readonly factory: OptimizerFactory;
  /** Untrusted code: the run loop double-checks what it reports (see execute.ts). */
  readonly untrusted: boolean;
}

/** Canonical form of a `use` string: "reference:adam" for "adam". */
export function canonicalUse(use: string): string {
  return use.includes(":") ? use : `reference:${use}`;
}

/** Synchronous lookup for reference optimizers (also used while resolving a suite). */
export function referenceFactory(use: string, where: string): ReferenceOptimizerFactory {
  const canonical = canonicalUse(use);
  const [kind, name] = splitUse(canonical);
  if (kind !== "reference") {
    throw new InputError(`${where}.use ${quote(use)}: adapter "${kind}" is not available (known: reference)`);
  }
  try {
    return getOptimizer(name);
  } catch {
    throw new InputError(
      `${where}.use ${quote(use)} is not a reference optimizer (known: ${OPTIMIZERS.map((o) => o.name).join(", ")})`,
    );
  }
}

export async function loadOptimizer(use: string, where: string): Promise<LoadedOptimizer> {
  return { factory: referenceFactory(use, where), untrusted: false };
}

function splitUse(use: string): [string, string] {
  const i = use.indexOf(":");
  return [use.slice(0, i), use.slice(i + 1)];
}
