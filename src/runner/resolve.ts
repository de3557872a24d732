/**
 * From a config's `use` string to something that can run in-process: a reference optimizer or a module
 * optimizer (src/adapters/module.ts). Process optimizers run through their adapter (src/runner/batch.ts).
 */
import { InputError, quote } from "../core/errors.js";
import type { OptimizerFactory } from "../core/types.js";
import { OPTIMIZERS, type ReferenceOptimizerFactory, getOptimizer } from "../optimizers/index.js";
import { loadModuleOptimizer } from "../adapters/module.js";
import { parseUse } from "../adapters/use.js";
import type { AdapterContext } from "./types.js";

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
    throw new InputError(
      `${where}.use ${quote(use)}: "${kind}:" is not a reference optimizer (see src/adapters/use.ts)`,
    );
  }
  try {
    return getOptimizer(name);
  } catch {
    throw new InputError(
      `${where}.use ${quote(use)} is not a reference optimizer (known: ${OPTIMIZERS.map((o) => o.name).join(", ")})`,
    );
  }
}

/**
 * A factory for an in-process optimizer: a reference optimizer, or a module optimizer (`module:PATH#EXPORT`,
 * loaded relative to `context.baseDir`, untrusted). Process optimizers do not run in-process: RunBatch
 * hands them to their adapter's session.
 */
export async function loadOptimizer(
  use: string,
  where: string,
  context?: AdapterContext,
): Promise<LoadedOptimizer> {
  const spec = parseUse(canonicalUse(use), Object.keys(context?.processes ?? {}), `${where}.use`);
  if (spec.kind === "module") {
    if (context === undefined) {
      throw new InputError(
        `${where}.use ${quote(use)}: module paths are relative to the config file's directory, which this ` +
          `suite does not carry; prepare it with prepareSuite (src/adapters/prepare.ts)`,
      );
    }
    const { factory } = await loadModuleOptimizer(spec.path, spec.exportName, context.baseDir, where);
    return { factory, untrusted: true };
  }
  if (spec.kind === "process") {
    throw new InputError(
      `${where}.use ${quote(use)} is served by process adapter "${spec.adapter}", not in-process`,
    );
  }
  return { factory: referenceFactory(use, where), untrusted: false };
}

function splitUse(use: string): [string, string] {
  const i = use.indexOf(":");
  return [use.slice(0, i), use.slice(i + 1)];
}
