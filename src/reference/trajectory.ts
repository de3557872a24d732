/**
 * Trajectories: how the reference checks step an optimizer under test. A check asks for the iterates
 * x₀, x₁, …, x_n of one run — a problem with its parameters, hyperparameters, a seed, a number of steps
 * and optionally a learning-rate change between two steps — and reads them as they come. Everything a
 * check measures (gaps, time averages, step-by-step agreement with a reference form) is computed from
 * those iterates with the harness's own copy of the problem, never from numbers the optimizer reports.
 *
 * A `TrajectorySource` hides where the optimizer lives. `inProcessSource` wraps any `OptimizerFactory`
 * (the reference optimizers and in-process modules); a process adapter can implement the same interface
 * with its run control (pause after a step, change the learning rate, observe every iterate).
 *
 * The start point and the gradient noise are derived exactly as in the run loop (src/runner/execute.ts):
 * run seed = deriveRunSeed(suiteSeed, problemKey, seedIndex), start perturbation from stream `start`,
 * noise from stream `noise`. So a check's run with seed index i starts where the suite's run i starts.
 */
import { STREAM, deriveRunSeed, runStream } from "../core/rng.js";
import type {
  Hyper,
  Optimizer,
  OptimizerFactory,
  ProblemDefinition,
  ProblemInstance,
  ProblemParams,
} from "../core/types.js";

/** One run a check wants to watch. */
export interface TrajectoryRequest {
  readonly definition: ProblemDefinition;
  /** Complete (resolved) problem parameters. */
  readonly params: ProblemParams;
  /** The problem's canonical key (seeds derive from it). */
  readonly problemKey: string;
  /** Hyperparameters handed to the optimizer, in its own names. */
  readonly hyper: Hyper;
  /** Steps to take. */
  readonly steps: number;
  readonly suiteSeed: number;
  readonly seedIndex: number;
  /** Call setLearningRate(lr) after step `after` (1 ≤ after < steps). */
  readonly lrChange?: { readonly after: number; readonly lr: number };
}

/** How a watched run ended. */
export interface TrajectoryOutcome {
  /** Steps completed and observed. */
  readonly steps: number;
  /** Why the run stopped before `steps`, as a sentence; absent when it completed. */
  readonly error?: string;
  /**
   * "applied": the learning rate was changed as asked; "unsupported": the optimizer cannot change its
   * learning rate between steps, so nothing was run (steps = 0); "none": no change was asked for.
   */
  readonly lrChange: "applied" | "unsupported" | "none";
}

/** Receives x₀ (step 0) and every iterate after it. `x` is only valid during the call. */
export type Observer = (step: number, x: Float64Array) => void;

/** Runs an optimizer under test for the checks. */
export interface TrajectorySource {
  /** Names the optimizer in messages, e.g. "reference:adam". */
  readonly label: string;
  /**
   * The hyperparameter names the optimizer declares (its defaults), when known. The conformance check
   * passes only these names unless the declaration maps names itself.
   */
  readonly hyperNames?: readonly string[];
  run(request: TrajectoryRequest, observe: Observer): Promise<TrajectoryOutcome>;
}

/** Creates the problem instance of a request, bound to the request's noise stream (as the run loop does). */
export function requestProblem(request: TrajectoryRequest): { problem: ProblemInstance; x0: Float64Array } {
  const runSeed = deriveRunSeed(request.suiteSeed, request.problemKey, request.seedIndex);
  const problem = request.definition.create(request.params, { noise: runStream(runSeed, STREAM.noise) });
  const x0 = new Float64Array(problem.dim);
  problem.start(x0, runStream(runSeed, STREAM.start));
  return { problem, x0 };
}

function message(err: unknown): string {
  return err instanceof Error ? err.message : String(err);
}

/** True when every coordinate is finite. */
function finite(x: Float64Array): boolean {
  for (let i = 0; i < x.length; i++) if (!Number.isFinite(x[i])) return false;
  return true;
}

/**
 * Steps `factory`'s optimizer in this thread, on the request's problem instance (the optimizer's
 * evaluations go straight to the problem). Faults of the optimizer end the run with a sentence saying
 * what happened; nothing it does makes `run` reject. A run stops at the first non-finite iterate.
 */
export function runInProcess(
  factory: OptimizerFactory,
  request: TrajectoryRequest,
  observe: Observer,
): TrajectoryOutcome {
  const { problem, x0 } = requestProblem(request);
  const x = x0;
  let optimizer: Optimizer;
  try {
    optimizer = factory.create(request.hyper, problem.dim);
  } catch (err) {
    return { steps: 0, error: `creating the optimizer failed: ${message(err)}`, lrChange: "none" };
  }
  const change = request.lrChange;
  if (change !== undefined && typeof optimizer.setLearningRate !== "function") {
    return { steps: 0, lrChange: "unsupported" };
  }
  const lrChange = change === undefined ? "none" : "applied";
  observe(0, x);
  const oracle = { evaluate: (p: Float64Array, g: Float64Array) => problem.evaluate(p, g) };
  for (let k = 1; k <= request.steps; k++) {
    try {
      optimizer.step(x, oracle);
    } catch (err) {
      return { steps: k - 1, error: `step ${k} threw: ${message(err)}`, lrChange };
    }
    observe(k, x);
    if (!finite(x)) return { steps: k, error: `the iterate is not finite after step ${k}`, lrChange };
    if (change !== undefined && k === change.after) {
      try {
        optimizer.setLearningRate!(change.lr);
      } catch (err) {
        return {
          steps: k,
          error: `setLearningRate(${change.lr}) after step ${k} threw: ${message(err)}`,
          lrChange,
        };
      }
    }
  }
  return { steps: request.steps, lrChange };
}

/** A `TrajectorySource` for any in-process `OptimizerFactory` (reference optimizers, module adapters). */
export function inProcessSource(factory: OptimizerFactory, label: string = factory.name): TrajectorySource {
  return {
    label,
    hyperNames: Object.keys(factory.defaults),
    run: (request, observe) => Promise.resolve(runInProcess(factory, request, observe)),
  };
}
