/** Plain-data shapes of a resolved suite and of its results. */
import type { FStarKind, Hyper, ProblemParams } from "../core/types.js";

/** Limits of one run. A run stops at whichever comes first. */
export interface Budget {
  /** Iterations (optimizer steps). */
  readonly steps: number;
  /** Loss-and-gradient evaluations; 0 means no limit beyond the steps. */
  readonly evaluations: number;
  /** Wall-clock seconds; results of a run cut by time are not reproducible and say so. */
  readonly seconds: number;
}

/** How a run ended. */
export type StopReason =
  | "steps" // step budget used up
  | "evaluations" // evaluation budget used up
  | "time" // wall-clock budget used up
  | "target" // gap fell to the stop threshold
  | "diverged" // NaN, Inf or blow-up: see `divergence`
  | "error"; // the optimizer threw or broke its contract: see `error`

/** Which way a run diverged. */
export type DivergenceKind = "non-finite" | "blow-up";

/** Everything the runner needs for one case; identical on every worker and every shard. */
export interface CaseSpec {
  /** Stable identity: `optimizer/set/problemKey`. */
  readonly id: string;
  /** The optimizer's label in the suite. */
  readonly optimizer: string;
  /** Where the optimizer comes from, e.g. "reference:adam". */
  readonly use: string;
  /** Name of the hyperparameter set ("default" unless the suite names others). */
  readonly set: string;
  /** Resolved hyperparameters, defaults included. */
  readonly hyper: Hyper;
  readonly problem: string;
  readonly problemKey: string;
  readonly params: ProblemParams;
  readonly dim: number;
  readonly fStar: number;
  readonly fStarKind: FStarKind;
  readonly budget: Budget;
  /** Run stops once gap ≤ stopAt · gap₀ (relative); 0 never stops early. */
  readonly stopAt: number;
  /** Relative gap tolerances (gap / gap₀), decreasing: the ladder. */
  readonly ladder: readonly number[];
  /** A run diverges when gap > blowUp · max(gap₀, 1). */
  readonly blowUp: number;
  /** Steps at which the compact trace is sampled (log-spaced, 0 first). */
  readonly checkpoints: readonly number[];
  /** Iterates kept for the trajectory fingerprint (0 = none). */
  readonly fingerprintSteps: number;
  /** Seed indices of this case's runs: 0 … seeds−1. */
  readonly seeds: number;
  /** Measure the exact objective every this many steps (stochastic problems). */
  readonly measureEvery: number;
  /** Set on the cases a scenario adds (src/runner/scenarios.ts); absent on ordinary cases. */
  readonly scenario?: ScenarioSpec;
}

/** What a scenario does to its runs beyond the case's hyperparameters and problem. */
export interface ScenarioSpec {
  /** The scenario's name in the config. */
  readonly name: string;
  /** Stop after step `at`, export the state, continue in a fresh instance that imports it. */
  readonly resume?: { readonly at: number };
  /** setLearningRate(lr) after step `at` (lr resolved from the config's lr or factor). */
  readonly lrChange?: { readonly at: number; readonly lr: number };
}

/** A process adapter, resolved: defaults filled in, `cwd` absolute (src/adapters/session.ts). */
export interface ProcessAdapterSpec {
  readonly name: string;
  readonly command: readonly string[];
  readonly cwd: string;
  readonly env: Readonly<Record<string, string>>;
  readonly maxRuns: number;
  readonly maxMessageBytes: number;
  readonly timeouts: { readonly start: number; readonly message: number; readonly run: number };
}

/** What adapters need to reach the user's code; sent to every worker, never written into results. */
export interface AdapterContext {
  /** Directory of the config file: module paths are relative to it. */
  readonly baseDir: string;
  /** Process adapters by name. */
  readonly processes: Readonly<Record<string, ProcessAdapterSpec>>;
}

/** A resolved suite: the cases in stable order plus what identifies the suite definition. */
export interface SuiteSpec {
  readonly seed: number;
  readonly cases: readonly CaseSpec[];
  /** Present when the suite uses module or process optimizers (src/adapters/prepare.ts). */
  readonly adapters?: AdapterContext;
}

/** Metrics of one run (one case, one seed). Non-finite values are stored as null. */
export interface RunMetrics {
  readonly seed: number;
  /** The derived 64-bit run seed, hex. */
  readonly runSeed: string;
  readonly stop: StopReason;
  readonly steps: number;
  readonly evaluations: number;
  readonly f0: number | null;
  readonly finalGap: number | null;
  readonly bestGap: number | null;
  /** Per ladder rung: the first step whose gap ≤ rung · gap₀, or null. */
  readonly stepsTo: readonly (number | null)[];
  /** Per ladder rung: evaluations used by then, or null. */
  readonly evaluationsTo: readonly (number | null)[];
  readonly divergedAt: number | null;
  readonly divergence: DivergenceKind | null;
  /** Fitted per-step contraction of the gap (gap_{k+1} ≈ rate · gap_k) over the late window, or null. */
  readonly rate: number | null;
  /** Gap at each checkpoint; null past the end of the run. */
  readonly trace: readonly (number | null)[];
  /** First iterates x_1 … x_F (trajectory fingerprint), when the case keeps them. */
  readonly iterates?: readonly (readonly (number | null)[])[];
  /** Why the run failed, when stop = "error". */
  readonly error?: string;
  /**
   * Resume scenarios: whether the resumed run retraced the uninterrupted one bit for bit, else the
   * first step whose iterate differs (null when the runs could not be compared: see `error`).
   */
  readonly resume?: { readonly equal: boolean; readonly firstDifference: number | null };
}

export interface CaseResult {
  readonly case: CaseSpec;
  readonly runs: readonly RunMetrics[];
}
