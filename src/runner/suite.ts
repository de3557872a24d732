/**
 * Expands a validated config into the suite's cases: optimizers × hyperparameter sets × problems, in a
 * stable order (config order of optimizers, then sets in the order written with "default" first, then
 * problems in config order). Resolves problem parameters and hyperparameters with their defaults, so the
 * results say exactly what ran.
 */
import { createHash } from "node:crypto";
import { canonicalJson } from "../core/json.js";
import type { Hyper, HyperValue } from "../core/types.js";
import type { SuiteConfig } from "../config/load.js";
import { InputError, quote } from "../core/errors.js";
import { PROBLEMS, getProblem, problemKey, resolveProblemParams, createProblem } from "../problems/index.js";
import { resolveHyper } from "../optimizers/index.js";
import { Pcg32 } from "../core/rng.js";
import { canonicalUse, referenceFactory } from "./resolve.js";
import { logCheckpoints } from "./recorder.js";
import type { Budget, CaseSpec, SuiteSpec } from "./types.js";

export interface ResolveOptions {
  /** Validates and completes hyperparameters of non-reference optimizers (adapters); default: as given. */
  readonly resolveForeignHyper?: (use: string, hyper: Record<string, HyperValue>, where: string) => Hyper;
}

export function resolveSuite(config: SuiteConfig, file: string, options: ResolveOptions = {}): SuiteSpec {
  const where = `config ${file}`;
  const problems = config.problems.map((p, i) => {
    const pw = `${where}: problems[${i}]`;
    const def = getProblemOrThrow(p.use, `${pw}.use`);
    const params = resolveProblemParams(def, p.params ?? {}, pw);
    // One throwaway instance tells the dimension and f*; problems cache their structure.
    const probe = createProblem(def.name, params, { noise: new Pcg32(0n, 0n) });
    const budget: Budget = { ...config.budget, ...(p.budget ?? {}) };
    return { config: p, def, params, key: problemKey(def, params), probe, budget };
  });
  const seenKeys = new Map<string, number>();
  problems.forEach((p, i) => {
    const prev = seenKeys.get(p.key);
    if (prev !== undefined) {
      throw new InputError(
        `${where}: problems[${i}] repeats problems[${prev}] (${p.key}); give it different params`,
      );
    }
    seenKeys.set(p.key, i);
  });

  const cases: CaseSpec[] = [];
  config.optimizers.forEach((o, oi) => {
    const ow = `${where}: optimizers[${oi}]`;
    const use = canonicalUse(o.use ?? o.name);
    const isReference = use.startsWith("reference:");
    const factory = isReference ? referenceFactory(use, ow) : null;
    const sets: [string, Record<string, HyperValue>][] = [["default", {}], ...Object.entries(o.sets ?? {})];
    for (const [setName, setHyper] of sets) {
      for (const p of problems) {
        if (p.config.optimizers && !p.config.optimizers.includes(o.name)) continue;
        const given = { ...(o.hyper ?? {}), ...setHyper, ...(p.config.hyper?.[o.name] ?? {}) };
        const hw = setName === "default" ? ow : `${ow}.sets.${setName}`;
        const hyper = factory
          ? resolveHyper(factory, given, hw)
          : (options.resolveForeignHyper?.(use, given, hw) ?? given);
        const fingerprintSteps =
          p.probe.dim <= config.fingerprint.maxDim ? Math.min(config.fingerprint.steps, p.budget.steps) : 0;
        cases.push({
          id: `${o.name}/${setName}/${p.key}`,
          optimizer: o.name,
          use,
          set: setName,
          hyper: sortObject(hyper),
          problem: p.def.name,
          problemKey: p.key,
          params: sortObject(p.params),
          dim: p.probe.dim,
          fStar: p.probe.fStar,
          fStarKind: p.probe.fStarKind,
          budget: p.budget,
          stopAt: config.stopAt,
          ladder: config.ladder,
          blowUp: config.blowUp,
          checkpoints: logCheckpoints(p.budget.steps),
          fingerprintSteps,
          seeds: config.seeds,
          measureEvery: p.def.measureEvery ?? 1,
        });
      }
    }
  });
  return { seed: config.seed, cases };
}

function getProblemOrThrow(name: string, where: string) {
  try {
    return getProblem(name);
  } catch {
    throw new InputError(
      `${where} ${quote(name)} is not a known problem (known: ${PROBLEMS.map((p) => p.name).join(", ")})`,
    );
  }
}

function sortObject<T extends object>(o: T): T {
  return Object.fromEntries(Object.entries(o).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))) as T;
}

/**
 * Hash of the suite definition: seed and every case's problem, parameters, budget, tolerances and
 * seeds, but not the hyperparameters or the optimizer code (those are what a comparison looks at).
 * Results with equal hashes are comparable run for run.
 */
export function suiteHash(spec: SuiteSpec): string {
  const definition = {
    seed: spec.seed,
    cases: spec.cases.map((c) => ({
      id: c.id,
      problemKey: c.problemKey,
      params: c.params,
      budget: c.budget,
      stopAt: c.stopAt,
      ladder: c.ladder,
      blowUp: c.blowUp,
      checkpoints: c.checkpoints,
      fingerprintSteps: c.fingerprintSteps,
      seeds: c.seeds,
      measureEvery: c.measureEvery,
    })),
  };
  return "sha256:" + createHash("sha256").update(canonicalJson(definition)).digest("hex");
}
