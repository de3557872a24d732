/**
 * Shared types of the engine. Vocabulary (see DEVELOPERS.md): a *problem* is a test function with its
 * gradient, start point and known minimum; an *optimizer* is the code under test; a *case* is one
 * optimizer with one hyperparameter set on one problem; a *run* is one case with one seed.
 */
import type { Pcg32 } from "./rng.js";

/** A hyperparameter value as written in a suite config. */
export type HyperValue = number | boolean | string;
/** Hyperparameters of one optimizer: name → value. */
export type Hyper = Readonly<Record<string, HyperValue>>;

/**
 * What the harness hands an optimizer during a step: loss and gradient at any point the optimizer
 * chooses. Each call is one *evaluation*; the harness counts them.
 */
export interface Oracle {
  /** Writes ∇f(x) into `grad` (length = dimension) and returns f(x). */
  evaluate(x: Float64Array, grad: Float64Array): number;
}

/** Optimizer state exported for a resume: named numeric arrays and scalars, JSON-safe. */
export type OptimizerState = Record<string, number | number[]>;

/** One optimizer instance, bound to one run. */
export interface Optimizer {
  /**
   * One iteration: reads and updates `x` in place, calling `oracle.evaluate` as often as it needs.
   * Must not allocate per call in reference implementations (buffers are made in `create`).
   */
  step(x: Float64Array, oracle: Oracle): void;
  /** Optional capability: the full internal state, so a fresh instance can continue the run. */
  exportState?(): OptimizerState;
  /** Optional capability: restore what `exportState` returned. */
  importState?(state: OptimizerState): void;
  /** Optional capability: change the learning rate between steps (schedules). */
  setLearningRate?(lr: number): void;
}

/** A named optimizer: validates its hyperparameters once and creates instances. */
export interface OptimizerFactory {
  /** Short stable name, e.g. "adam". */
  readonly name: string;
  /** Long name and paper, one line, for reports. */
  readonly title: string;
  /** Published default hyperparameters (merged under the user's). */
  readonly defaults: Hyper;
  /** Creates an instance for a problem of dimension `dim`. Throws on invalid hyperparameters. */
  create(hyper: Hyper, dim: number): Optimizer;
}

/** How the problem's f* is known. */
export type FStarKind =
  /** f* published in the cited source. */
  | "published"
  /** computed here by a converged high-precision solve, described in `fStarNote`. */
  | "computed"
  /** only a lower bound (e.g. 0 for a nonnegative loss): gate on the loss itself. */
  | "lower-bound";

/** Numeric parameters of a problem (dimension, condition number, ...). */
export type ProblemParams = Readonly<Record<string, number>>;

/** Declares one parameter of a problem: its default and its admissible values. */
export interface ParamSpec {
  readonly default: number;
  readonly min?: number;
  readonly max?: number;
  readonly integer?: boolean;
  readonly even?: boolean;
  readonly description: string;
}

/** Per-run randomness handed to a problem instance. */
export interface ProblemRunContext {
  /** Stream for stochastic gradients and mini-batches of this run. */
  readonly noise: Pcg32;
}

/** A problem bound to its parameters (and, for stochastic problems, to one run's noise stream). */
export interface ProblemInstance {
  /** Canonical key: name plus non-default parameters, e.g. "quadratic(kappa=100,n=10)". */
  readonly key: string;
  readonly dim: number;
  /** Known minimum value, or a lower bound (see `fStarKind`). */
  readonly fStar: number;
  readonly fStarKind: FStarKind;
  /** Minimiser where known, else null. */
  readonly xStar: Float64Array | null;
  /** True when `evaluate` returns a stochastic estimate (noise or mini-batches). */
  readonly stochastic: boolean;
  /**
   * Loss and gradient at x: writes ∇f(x) into `grad` and returns f(x). For stochastic problems an
   * estimate drawn from the run's noise stream. Must not allocate.
   */
  evaluate(x: Float64Array, grad: Float64Array): number;
  /** The exact objective at x (no noise, full batch): what metrics measure. Must not allocate. */
  objective(x: Float64Array): number;
  /**
   * Writes the start point into `out`: the standard point when `rng` is null, else the standard point
   * plus this problem's seeded perturbation drawn from `rng`.
   */
  start(out: Float64Array, rng: Pcg32 | null): void;
}

/** A local minimum (basin) that gradient methods are known to settle in, with its source. */
export interface Basin {
  readonly name: string;
  readonly f: number;
  readonly x: readonly number[];
  readonly source: string;
}

/** A problem definition: one file in src/problems/. */
export interface ProblemDefinition {
  /** Stable short name used in configs, e.g. "rosenbrock". */
  readonly name: string;
  /** Long name, e.g. "Rosenbrock function (Moré–Garbow–Hillstrom #1)". */
  readonly title: string;
  /** Behaviours it exercises, e.g. "ill-conditioned", "valley", "saddle", "plateau", "stochastic". */
  readonly tags: readonly string[];
  /** Published source: authors, year, title, and a free link where one exists. */
  readonly source: string;
  /** Where f* comes from, when it is computed here rather than published. */
  readonly fStarNote?: string;
  readonly params: Readonly<Record<string, ParamSpec>>;
  /** Published local minima other than the global one (e.g. Freudenstein–Roth's 48.9842). */
  readonly basins?: readonly Basin[];
  /** How often (in steps) the runner measures the exact objective; 1 unless `objective` is costly. */
  readonly measureEvery?: number;
  create(params: ProblemParams, ctx: ProblemRunContext): ProblemInstance;
}
