/**
 * Scenarios: extra cases that run optimizers under the conditions real regressions hid behind — a
 * resume from exported state, a learning-rate change mid-run, hyperparameters such as a large ε, a
 * problem with sparse gradients or a zero loss gradient under weight decay (config `scenarios:`,
 * docs/adapters.md). A scenario runs for every optimizer that declares what it needs: the capability
 * (`exportState`/`importState` for a resume, `setLearningRate` for a learning-rate change) and every
 * hyperparameter it sets. Each scenario case is a normal case with its own metrics, named
 * `optimizer/default@scenario/problemKey`.
 *
 * A resume case runs each seed twice: uninterrupted, and interrupted after step `at` (state exported
 * through JSON, imported into a fresh instance, run continued on the same problem instance). Its metrics
 * are those of the interrupted run, plus `resume`: equal when every iterate matched the uninterrupted
 * run's bit for bit, else the first step that differed.
 *
 * Cost: a resume case costs two runs per seed, plus one 64-bit hash of the iterate per step per run.
 */
import { InputError, quote } from "../core/errors.js";
import { Pcg32 } from "../core/rng.js";
import type {
  Hyper,
  HyperValue,
  Optimizer,
  OptimizerFactory,
  OptimizerState,
  ProblemDefinition,
} from "../core/types.js";
import type { ScenarioConfig, SuiteConfig } from "../config/load.js";
import { createProblem, getProblem, problemKey, resolveProblemParams } from "../problems/index.js";
import { type ExecuteOptions, executeRun } from "./execute.js";
import { logCheckpoints } from "./recorder.js";
import type { Budget, CaseSpec, RunMetrics, ScenarioSpec } from "./types.js";

/** What an optimizer declares, for deciding which scenarios it runs. */
export interface OptimizerDeclaration {
  /** Names of the hyperparameters it has (reference: its specs; module and process: its defaults). */
  readonly hyperNames: readonly string[];
  /** exportState and importState. */
  readonly state: boolean;
  /** setLearningRate. */
  readonly lr: boolean;
}

export interface ExpandOptions {
  /** What optimizer `name` declares for a case like `base`. */
  readonly declare: (optimizer: string, base: CaseSpec) => OptimizerDeclaration;
  /** Validates and completes hyperparameters as the suite does for this optimizer's `use`. */
  readonly resolveHyper: (use: string, given: Record<string, HyperValue>, where: string) => Hyper;
}

/** The cases the config's scenarios add to `cases` (the suite's ordinary cases), in a stable order. */
export function expandScenarios(
  config: SuiteConfig,
  cases: readonly CaseSpec[],
  file: string,
  options: ExpandOptions,
): CaseSpec[] {
  const out: CaseSpec[] = [];
  (config.scenarios ?? []).forEach((sc, si) => {
    const where = `config ${file}: scenarios[${si}]`;
    for (const o of config.optimizers) {
      if (sc.optimizers && !sc.optimizers.includes(o.name)) continue;
      const explicit = sc.optimizers?.includes(o.name) === true;
      const bases = sc.problem
        ? [scenarioProblemCase(config, sc, cases, o.name, `${where}.problem`)].filter(
            (c): c is CaseSpec => c !== null,
          )
        : cases.filter(
            (c) =>
              c.optimizer === o.name &&
              c.set === "default" &&
              (!sc.problems || sc.problems.includes(c.problem)),
          );
      for (const base of bases) {
        const missing = missingNeeds(sc, options.declare(o.name, base), base);
        if (missing !== null) {
          if (explicit)
            throw new InputError(
              `${where} (${quote(sc.name)}) lists optimizer ${quote(o.name)}, which ${missing}`,
            );
          continue;
        }
        for (const [key, step] of [
          ["resume", sc.resume?.at],
          ["lrChange", sc.lrChange?.at],
        ] as const) {
          if (step !== undefined && step >= base.budget.steps) {
            throw new InputError(
              `${where}.${key}.at must be below the step budget (${base.budget.steps}) of case ${base.id}, got ${step}`,
            );
          }
        }
        const given = { ...base.hyper, ...(sc.hyper ?? {}) } as Record<string, HyperValue>;
        const hyper = sortObject(options.resolveHyper(base.use, given, `${where}.hyper`));
        const scenario: ScenarioSpec = {
          name: sc.name,
          ...(sc.resume ? { resume: { at: sc.resume.at } } : {}),
          ...(sc.lrChange
            ? {
                lrChange: {
                  at: sc.lrChange.at,
                  lr: sc.lrChange.lr ?? sc.lrChange.factor! * (hyper.lr as number),
                },
              }
            : {}),
        };
        const set = `${base.set}@${sc.name}`;
        out.push({ ...base, id: `${o.name}/${set}/${base.problemKey}`, set, hyper, scenario });
      }
    }
  });
  return out;
}

/** Why an optimizer cannot run a scenario (completes "which ..."), or null if it can. */
function missingNeeds(sc: ScenarioConfig, decl: OptimizerDeclaration, base: CaseSpec): string | null {
  if (sc.resume && !decl.state) return "has no exportState/importState (needed by resume)";
  if (sc.lrChange && !decl.lr) return "has no setLearningRate (needed by lrChange)";
  if (sc.lrChange?.factor !== undefined && typeof base.hyper.lr !== "number") {
    return "has no numeric lr hyperparameter (needed by lrChange.factor)";
  }
  const absent = Object.keys(sc.hyper ?? {}).filter((name) => !decl.hyperNames.includes(name));
  if (absent.length > 0)
    return `does not declare the hyperparameter${absent.length > 1 ? "s" : ""} ${absent.join(", ")}`;
  return null;
}

/** A default-set case of `optimizer` on the scenario's own problem, built as the suite builds cases. */
function scenarioProblemCase(
  config: SuiteConfig,
  sc: ScenarioConfig,
  cases: readonly CaseSpec[],
  optimizer: string,
  where: string,
): CaseSpec | null {
  const template = cases.find((c) => c.optimizer === optimizer && c.set === "default");
  if (template === undefined) return null;
  const p = sc.problem!;
  let def: ProblemDefinition;
  try {
    def = getProblem(p.use);
  } catch {
    throw new InputError(`${where}.use ${quote(p.use)} is not a known problem (see gradgate problems)`);
  }
  const params = resolveProblemParams(def, p.params ?? {}, where);
  const probe = createProblem(def.name, params, { noise: new Pcg32(0n, 0n) });
  const budget: Budget = { ...config.budget, ...(p.budget ?? {}) };
  const optimizerConfig = config.optimizers.find((o) => o.name === optimizer)!;
  return {
    ...template,
    // Completed with the optimizer's defaults by ExpandOptions.resolveHyper.
    hyper: { ...(optimizerConfig.hyper ?? {}) },
    problem: def.name,
    problemKey: problemKey(def, params),
    params: sortObject(params),
    dim: probe.dim,
    fStar: probe.fStar,
    fStarKind: probe.fStarKind,
    budget,
    checkpoints: logCheckpoints(budget.steps),
    fingerprintSteps:
      probe.dim <= config.fingerprint.maxDim ? Math.min(config.fingerprint.steps, budget.steps) : 0,
    measureEvery: def.measureEvery ?? 1,
  };
}

// ------------------------------------------------------------------ running

/**
 * Per-step 64-bit hashes of the iterates of one run (two 32-bit FNV-1a lanes over the bytes), enough to
 * find the first step where two trajectories differ without keeping them.
 */
export class TrajectoryHashes {
  private hashes: Uint32Array;
  /** Steps recorded (1 … count). */
  count = 0;

  constructor(steps: number) {
    this.hashes = new Uint32Array(2 * Math.min(Math.max(steps, 1), 1 << 24));
  }

  /** Records x_step (steps arrive in order from 1). */
  readonly record = (step: number, x: Float64Array): void => {
    if (2 * step > this.hashes.length) {
      const grown = new Uint32Array(this.hashes.length * 2);
      grown.set(this.hashes);
      this.hashes = grown;
    }
    const words = new Uint32Array(x.buffer, x.byteOffset, x.length * 2);
    let a = 0x811c9dc5;
    let b = 0x01000193 ^ 0x9e3779b9;
    for (let i = 0; i < words.length; i++) {
      const w = words[i];
      a = Math.imul(a ^ (w & 0xffff), 0x01000193);
      a = Math.imul(a ^ (w >>> 16), 0x01000193);
      b = Math.imul(b ^ w, 0x5bd1e995);
      b ^= b >>> 15;
    }
    this.hashes[2 * (step - 1)] = a >>> 0;
    this.hashes[2 * (step - 1) + 1] = b >>> 0;
    this.count = step;
  };

  /** First step (from 1) where the trajectories differ, or null when they are equal step for step. */
  firstDifference(other: TrajectoryHashes): number | null {
    const n = Math.min(this.count, other.count);
    for (let i = 0; i < 2 * n; i++) if (this.hashes[i] !== other.hashes[i]) return (i >> 1) + 1;
    return this.count === other.count ? null : n + 1;
  }
}

/** The `resume` field of a resume scenario's metrics. */
export function resumeVerdict(
  plain: TrajectoryHashes,
  resumed: TrajectoryHashes,
  resumedMetrics: RunMetrics,
): NonNullable<RunMetrics["resume"]> {
  if (resumedMetrics.stop === "error") return { equal: false, firstDifference: null };
  const first = plain.firstDifference(resumed);
  return { equal: first === null, firstDifference: first };
}

/** A deep copy of a state through JSON, as a checkpoint file (or the protocol) would carry it. */
export function copyState(state: OptimizerState): OptimizerState {
  return JSON.parse(JSON.stringify(state)) as OptimizerState;
}

/**
 * Runs one seed of a scenario case in-process (cases with `scenario.resume` or `scenario.lrChange`;
 * other scenario cases are ordinary runs). Never throws for optimizer faults.
 */
export function executeScenarioRun(
  spec: CaseSpec,
  seedIndex: number,
  suiteSeed: number,
  factory: OptimizerFactory,
  definition: ProblemDefinition,
  options: ExecuteOptions = {},
): { metrics: RunMetrics; scratch: Float64Array } {
  const sc = spec.scenario;
  if (sc?.lrChange) {
    const { at, lr } = sc.lrChange;
    return executeRun(spec, seedIndex, suiteSeed, factory, definition, {
      ...options,
      beforeStep: (k, optimizer) => {
        if (k !== at + 1) return;
        if (typeof optimizer.setLearningRate !== "function") {
          throw new Error(`setLearningRate before step ${k} failed: the optimizer has no setLearningRate`);
        }
        try {
          optimizer.setLearningRate(lr);
        } catch (err) {
          throw new Error(`setLearningRate before step ${k} failed: ${text(err)}`);
        }
      },
    });
  }
  if (sc?.resume) {
    const { at } = sc.resume;
    const plain = new TrajectoryHashes(spec.budget.steps);
    const first = executeRun(spec, seedIndex, suiteSeed, factory, definition, {
      ...options,
      afterStep: plain.record,
    });
    const resumed = new TrajectoryHashes(spec.budget.steps);
    const second = executeRun(spec, seedIndex, suiteSeed, factory, definition, {
      ...options,
      scratch: first.scratch,
      afterStep: resumed.record,
      beforeStep: (k, optimizer) => (k === at + 1 ? restart(optimizer, factory, spec, at) : undefined),
    });
    return {
      metrics: { ...second.metrics, resume: resumeVerdict(plain, resumed, second.metrics) },
      scratch: second.scratch,
    };
  }
  return executeRun(spec, seedIndex, suiteSeed, factory, definition, options);
}

/** Exports the state after step `at` and imports a JSON copy into a fresh instance. */
function restart(optimizer: Optimizer, factory: OptimizerFactory, spec: CaseSpec, at: number): Optimizer {
  if (typeof optimizer.exportState !== "function") {
    throw new Error(`exportState after step ${at} failed: the optimizer has no exportState`);
  }
  let state: OptimizerState;
  try {
    state = copyState(optimizer.exportState());
  } catch (err) {
    throw new Error(`exportState after step ${at} failed: ${text(err)}`);
  }
  let fresh: Optimizer;
  try {
    fresh = factory.create(spec.hyper, spec.dim);
  } catch (err) {
    throw new Error(`creating the optimizer failed: ${text(err)}`);
  }
  if (typeof fresh.importState !== "function") {
    throw new Error(`importState before step ${at + 1} failed: the optimizer has no importState`);
  }
  try {
    fresh.importState(state);
  } catch (err) {
    throw new Error(`importState before step ${at + 1} failed: ${text(err)}`);
  }
  return fresh;
}

function text(err: unknown): string {
  return err instanceof Error ? err.message : String(err);
}

function sortObject<T extends object>(o: T): T {
  return Object.fromEntries(Object.entries(o).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))) as T;
}
