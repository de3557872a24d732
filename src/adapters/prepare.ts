/**
 * Resolving a suite whose config uses adapters: `resolveSuite` plus what it cannot do synchronously.
 *
 * 1. Process adapters get their paths resolved against the config file's directory (`baseDir`).
 * 2. Module optimizers are imported (a missing file or export is an error now, naming the config field)
 *    and process adapters are started once for their handshake (a process that does not start, or does
 *    not serve an optimizer the config names, is an error now), then closed again.
 * 3. Hyperparameters of module and process optimizers: their declared defaults under the config's values.
 * 4. Scenarios are expanded (src/runner/scenarios.ts) against what each optimizer declares.
 *
 * The result carries `adapters` (the base directory and the process adapters) to every worker; `use`
 * strings stay as written (relative paths), so results do not depend on where the repository is checked
 * out. Entry points call `prepareSuite(config, file, { baseDir: dirname(configPath) })` in place of
 * `resolveSuite(config, file)`.
 */
import { isAbsolute, resolve } from "node:path";
import { InputError, quote } from "../core/errors.js";
import type { Hyper, HyperValue, OptimizerFactory } from "../core/types.js";
import type { SuiteConfig } from "../config/load.js";
import { getOptimizer } from "../optimizers/index.js";
import { resolveHyper as resolveReferenceHyper } from "../optimizers/hyper.js";
import { canonicalUse } from "../runner/resolve.js";
import { type OptimizerDeclaration, expandScenarios } from "../runner/scenarios.js";
import { resolveSuite } from "../runner/suite.js";
import type { AdapterContext, CaseSpec, ProcessAdapterSpec, SuiteSpec } from "../runner/types.js";
import { ChildFault } from "./child.js";
import { instanceCapabilities, loadModuleOptimizer } from "./module.js";
import type { OptimizerDescription } from "./protocol.js";
import { ProcessSession } from "./session.js";
import { type UseSpec, parseUse } from "./use.js";

export interface PrepareOptions {
  /** Directory of the config file (module paths and adapter working directories are relative to it). */
  readonly baseDir: string;
  /** Environment the allow-listed variables of adapter processes come from; default process.env. */
  readonly parentEnv?: Readonly<Record<string, string | undefined>>;
}

/** The process adapters of a config with `cwd` made absolute. */
export function processAdapterSpecs(
  config: SuiteConfig,
  baseDir: string,
): Record<string, ProcessAdapterSpec> {
  const out: Record<string, ProcessAdapterSpec> = {};
  for (const [name, a] of Object.entries(config.adapters ?? {})) {
    out[name] = {
      name,
      command: [...a.command],
      cwd: isAbsolute(a.cwd) ? a.cwd : resolve(baseDir, a.cwd),
      env: { ...a.env },
      maxRuns: a.maxRuns,
      maxMessageBytes: a.maxMessageBytes,
      timeouts: { ...a.timeouts },
    };
  }
  return out;
}

/** Resolves the suite with its module and process optimizers and its scenarios. */
export async function prepareSuite(
  config: SuiteConfig,
  file: string,
  options: PrepareOptions,
): Promise<SuiteSpec> {
  const where = `config ${file}`;
  const processes = processAdapterSpecs(config, options.baseDir);
  const context: AdapterContext = { baseDir: options.baseDir, processes };
  const adapterNames = Object.keys(processes);

  const uses = new Map<string, UseSpec>();
  const whereOf = new Map<string, string>();
  config.optimizers.forEach((o, i) => {
    const use = canonicalUse(o.use ?? o.name);
    const w = `${where}: optimizers[${i}].use`;
    uses.set(use, parseUse(use, adapterNames, w));
    if (!whereOf.has(use)) whereOf.set(use, `${where}: optimizers[${i}]`);
  });

  // Module optimizers: import now, so a wrong path fails before anything runs.
  const modules = new Map<string, OptimizerFactory>();
  for (const [use, spec] of uses) {
    if (spec.kind !== "module") continue;
    const loaded = await loadModuleOptimizer(
      spec.path,
      spec.exportName,
      options.baseDir,
      `${whereOf.get(use)!}.use`,
    );
    modules.set(use, loaded.factory);
  }

  // Process adapters: one handshake each (in parallel), then check the optimizers named.
  const needed = [...new Set([...uses.values()].flatMap((u) => (u.kind === "process" ? [u.adapter] : [])))];
  const served = new Map<string, readonly OptimizerDescription[]>();
  await Promise.all(
    needed.map(async (name) => {
      const session = new ProcessSession(processes[name], { parentEnv: options.parentEnv });
      try {
        served.set(name, (await session.describe()).optimizers);
      } catch (err) {
        const reason = err instanceof ChildFault ? err.reason : String(err);
        throw new InputError(
          `${where}: adapters.${name} (command ${quote(processes[name].command)}): ${reason}`,
        );
      } finally {
        await session.close();
      }
    }),
  );
  const descriptions = new Map<string, OptimizerDescription>();
  for (const [use, spec] of uses) {
    if (spec.kind !== "process") continue;
    const list = served.get(spec.adapter)!;
    const found = list.find((d) => d.name === spec.optimizer);
    if (found === undefined) {
      throw new InputError(
        `${whereOf.get(use)!}.use ${quote(use)}: adapter "${spec.adapter}" serves no optimizer ${quote(spec.optimizer)} ` +
          `(it serves: ${list.map((d) => d.name).join(", ")})`,
      );
    }
    descriptions.set(use, found);
  }

  const defaultsOf = (use: string): Readonly<Record<string, HyperValue>> =>
    modules.get(use)?.defaults ?? descriptions.get(use)?.defaults ?? {};
  const resolveHyper = (use: string, given: Record<string, HyperValue>, w: string): Hyper => {
    const spec = uses.get(use) ?? parseUse(use, adapterNames, w);
    if (spec.kind === "reference") return resolveReferenceHyper(getOptimizer(spec.name, w), given, w);
    return { ...defaultsOf(use), ...given };
  };
  const suite = resolveSuite(config, file, { resolveForeignHyper: resolveHyper });

  const declare = (_optimizer: string, base: CaseSpec): OptimizerDeclaration => {
    const spec = uses.get(base.use)!;
    if (spec.kind === "reference") {
      return { hyperNames: Object.keys(getOptimizer(spec.name).hyperSpecs), state: true, lr: true };
    }
    if (spec.kind === "process") {
      const d = descriptions.get(base.use)!;
      return {
        hyperNames: Object.keys(d.defaults ?? {}),
        state: d.capabilities.includes("state"),
        lr: d.capabilities.includes("lr"),
      };
    }
    const factory = modules.get(base.use)!;
    let caps = { state: false, lr: false };
    try {
      caps = instanceCapabilities(factory.create(base.hyper, base.dim));
    } catch {
      // An instance that cannot be made declares nothing; its runs will say why.
    }
    return { hyperNames: Object.keys(factory.defaults), ...caps };
  };
  const extra = expandScenarios(config, suite.cases, file, { declare, resolveHyper });
  return { ...suite, cases: [...suite.cases, ...extra], adapters: context };
}
