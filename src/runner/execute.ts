/**
 * The in-process run loop: one case, one seed, an optimizer that implements the `Optimizer` contract.
 *
 * Measuring without paying twice: metrics need f(x_k) after every step. Most optimizers evaluate
 * the loss at the iterate itself at the start of the next step; when the first evaluation of a step is
 * made at the iterate buffer (the same Float64Array), the harness takes that value as f(x_{k−1})
 * instead of evaluating again. Whether an optimizer does so is learned from its first step; one that
 * does not (e.g. Nesterov's look-ahead form) gets an explicit f(x_k) after each step. Untrusted
 * optimizers (`verifyIterate`) have the iterate compared with a copy kept before the step, so one that
 * modifies x before evaluating there can never corrupt the metrics. Stochastic problems are measured
 * explicitly with the exact objective every `measureEvery` steps.
 */
import type {
  Optimizer,
  OptimizerFactory,
  Oracle,
  ProblemDefinition,
  ProblemInstance,
} from "../core/types.js";
import { STREAM, deriveRunSeed, runStream, seedToHex } from "../core/rng.js";
import { RunRecorder } from "./recorder.js";
import type { CaseSpec, RunMetrics, StopReason } from "./types.js";

/** Counts evaluations and catches the value at the iterate, once per step. */
class HarnessOracle implements Oracle {
  evaluations = 0;
  captured = false;
  capturedValue = NaN;
  constructor(
    private readonly problem: ProblemInstance,
    private readonly iterate: Float64Array,
    private readonly before: Float64Array | null,
  ) {}

  evaluate(x: Float64Array, grad: Float64Array): number {
    const n = this.iterate.length;
    if (x.length !== n || grad.length !== n) throw lengthError(n, x, grad);
    this.evaluations++;
    const f = this.problem.evaluate(x, grad);
    if (x === this.iterate && !this.captured) {
      this.captured = true;
      this.capturedValue = this.before === null || sameValues(x, this.before) ? f : NaN;
    }
    return f;
  }
}

function lengthError(n: number, x: Float64Array, grad: Float64Array): RangeError {
  return new RangeError(
    `evaluate: point and gradient must have length ${n}, got ${x.length} and ${grad.length}`,
  );
}

function sameValues(a: Float64Array, b: Float64Array): boolean {
  for (let i = 0; i < a.length; i++)
    if (a[i] !== b[i] && !(Number.isNaN(a[i]) && Number.isNaN(b[i]))) return false;
  return true;
}

export interface ExecuteOptions {
  /** Compare the iterate with a copy before trusting a captured value (untrusted optimizers). */
  readonly verifyIterate?: boolean;
  /** Reusable per-step buffer (see RunRecorder). */
  readonly scratch?: Float64Array;
  /** Clock for the wall-time budget, in milliseconds. */
  readonly now?: () => number;
  /**
   * Scenario hook (src/runner/scenarios.ts), called before each step k with the current instance: may
   * act on it (a learning-rate change) or return a replacement (a resume). If it throws, the run ends
   * with stop "error" and the exception's message as `error`.
   */
  readonly beforeStep?: (step: number, optimizer: Optimizer) => Optimizer | void;
  /** Scenario observer of each iterate x_k, right after step k. */
  readonly afterStep?: (step: number, x: Float64Array) => void;
}

/** Runs one case with one seed and returns its metrics. Never throws for optimizer faults. */
export function executeRun(
  spec: CaseSpec,
  seedIndex: number,
  suiteSeed: number,
  factory: OptimizerFactory,
  definition: ProblemDefinition,
  options: ExecuteOptions = {},
): { metrics: RunMetrics; scratch: Float64Array } {
  const runSeed = deriveRunSeed(suiteSeed, spec.problemKey, seedIndex);
  const seedHex = seedToHex(runSeed);
  const problem = definition.create(spec.params, { noise: runStream(runSeed, STREAM.noise) });
  const dim = problem.dim;
  const x = new Float64Array(dim);
  problem.start(x, runStream(runSeed, STREAM.start));
  const recorder = new RunRecorder(spec, problem.fStar, options.scratch);
  const done = (stop: StopReason, evaluations: number, error?: string) => ({
    metrics: recorder.finish({ seed: seedIndex, runSeed: seedHex, stop, evaluations, error }),
    scratch: recorder.scratch,
  });

  const first = recorder.begin(problem.objective(x));
  if (first !== null) return done(first, 0);

  let optimizer: Optimizer;
  try {
    optimizer = factory.create(spec.hyper, dim);
  } catch (err) {
    return done("error", 0, `creating the optimizer failed: ${message(err)}`);
  }

  const verify = options.verifyIterate === true;
  const before = verify ? new Float64Array(dim) : null;
  const oracle = new HarnessOracle(problem, x, before);
  const now = options.now ?? (() => performance.now());
  const started = now();
  const { steps: maxSteps, evaluations: maxEvals, seconds } = spec.budget;
  const stochastic = problem.stochastic;
  const every = stochastic ? Math.max(1, spec.measureEvery) : 1;
  // Decided after step 1: does the optimizer evaluate at the iterate first thing in a step?
  let reuse = false;
  let evalsBefore = 0;
  let stop: StopReason = "steps";
  const keep = spec.fingerprintSteps;

  const { beforeStep, afterStep } = options;
  for (let k = 1; k <= maxSteps; k++) {
    if (beforeStep !== undefined) {
      try {
        optimizer = beforeStep(k, optimizer) ?? optimizer;
      } catch (err) {
        return done("error", oracle.evaluations, message(err));
      }
    }
    if (before !== null) before.set(x);
    oracle.captured = false;
    try {
      optimizer.step(x, oracle);
    } catch (err) {
      return done("error", oracle.evaluations, `step ${k} threw: ${message(err)}`);
    }
    if (k <= keep) recorder.keepIterate(k, x);
    afterStep?.(k, x);

    let verdict: StopReason | null = null;
    if (stochastic) {
      if (k % every === 0 || k === maxSteps)
        verdict = recorder.record(k, problem.objective(x), oracle.evaluations);
    } else {
      if (k === 1) reuse = oracle.captured && !Number.isNaN(oracle.capturedValue);
      if (reuse) {
        if (k > 1) {
          let value = oracle.capturedValue;
          if (!oracle.captured) {
            return done(
              "error",
              evalsBefore,
              `step ${k} did not evaluate at the iterate although step 1 did; pass a separate buffer when evaluating elsewhere`,
            );
          }
          if (Number.isNaN(value) && before !== null) value = problem.objective(before);
          verdict = recorder.record(k - 1, value, evalsBefore);
          if (verdict !== null) return done(verdict, evalsBefore);
        }
      } else {
        verdict = recorder.record(k, problem.objective(x), oracle.evaluations);
      }
    }
    evalsBefore = oracle.evaluations;
    if (verdict !== null) return done(verdict, oracle.evaluations);
    if (maxEvals > 0 && oracle.evaluations >= maxEvals) {
      stop = "evaluations";
      if (reuse) verdict = recorder.record(k, problem.objective(x), oracle.evaluations);
      else if (stochastic && k % every !== 0)
        verdict = recorder.record(k, problem.objective(x), oracle.evaluations);
      return done(verdict ?? stop, oracle.evaluations);
    }
    if ((k & 63) === 0 && now() - started > seconds * 1000) {
      stop = "time";
      if (reuse || (stochastic && k % every !== 0))
        verdict = recorder.record(k, problem.objective(x), oracle.evaluations);
      return done(verdict ?? stop, oracle.evaluations);
    }
  }
  // The last iterate of a run that reused values is still unmeasured.
  if (reuse && maxSteps > 0) {
    const verdict = recorder.record(maxSteps, problem.objective(x), oracle.evaluations);
    if (verdict !== null) return done(verdict, oracle.evaluations);
  }
  return done(stop, oracle.evaluations);
}

function message(err: unknown): string {
  return err instanceof Error ? err.message : String(err);
}
