/**
 * The harness side of one run whose optimizer lives in another process. It owns what the in-process
 * loop (src/runner/execute.ts) owns: the problem instance with the run's noise stream, the start point,
 * the evaluation count, the budget and the `RunRecorder` — so metrics mean exactly what they mean for
 * in-process runs and come out in the same `RunMetrics` shape. The optimizer process only asks for
 * evaluations at points of its choice and reports each new iterate.
 *
 * Measuring f(x_k): the harness knows every iterate the client reports, so it never has to trust a
 * value from the client. When the first evaluation of step k+1 is at x_k itself (the step entry says
 * `eval: true`, or the requested point equals x_k bit for bit) the loss computed for that evaluation is
 * f(x_k), as in the in-process reuse rule; otherwise the harness evaluates the exact objective at x_k
 * itself before it answers anything else for the run. The decision is made step by step. Stochastic
 * problems are measured with the exact objective every `measureEvery` steps, as in-process.
 *
 * Budgets and stops follow execute.ts: the evaluation budget is checked after each step, the time budget
 * every 64 steps, then the step budget; a run stops at the target or
 * at divergence as soon as the recorder says so, and the evaluations a stopped run reports are those
 * used by the last measured step.
 */
import type { ProblemDefinition, ProblemInstance } from "../core/types.js";
import { STREAM, deriveRunSeed, runStream, seedToHex } from "../core/rng.js";
import { RunRecorder } from "../runner/recorder.js";
import type { CaseSpec, RunMetrics, StopReason } from "../runner/types.js";
import type { FailurePhase, StartEntry } from "./protocol.js";

/** What to do when a run reaches its pause point (scenarios). */
export type PauseAction =
  /** Call setLearningRate(lr) in the client, then go on. */
  | { readonly kind: "lr"; readonly lr: number }
  /** Export the state, continue in a fresh instance that imports it (resume scenario). */
  | { readonly kind: "restart" };

/** Scenario control of one run: a pause after step `pauseAt`, and an observer of every iterate. */
export interface RunControl {
  readonly pauseAt?: number;
  readonly action?: PauseAction;
  readonly afterStep?: (step: number, x: Float64Array) => void;
}

/** One run to execute through a process adapter. */
export interface RunRequest {
  readonly spec: CaseSpec;
  readonly seedIndex: number;
  readonly suiteSeed: number;
  readonly definition: ProblemDefinition;
  /** The optimizer's name in the client (the part of `use` after "ADAPTER:"). */
  readonly optimizer: string;
  readonly control?: RunControl;
}

export type RunStatus = "running" | "paused" | "ended";

export class ProtocolRun {
  readonly problem: ProblemInstance;
  readonly dim: number;
  /** The last reported iterate x_k. */
  readonly x: Float64Array;
  readonly grad: Float64Array;
  /** Scratch for a requested evaluation point. */
  readonly point: Float64Array;
  readonly recorder: RunRecorder;
  status: RunStatus = "running";
  /** Id of the client-side instance (changes when a resume scenario restarts the run). */
  clientId = -1;
  /** Global step at which the current client instance started (its step 1 is step base + 1). */
  instanceBase = 0;
  /** Completed steps. */
  k = 0;
  evaluations = 0;
  /** True while x_k is not yet measured (waiting for the next evaluation or the end of the run). */
  pending = false;
  /** Evaluations used by the end of step k. */
  evalsAtK = 0;
  /** Set when the run waits for its exported state (resume scenario). */
  awaitingState = false;
  metrics: RunMetrics | null = null;
  readonly startedAt: number;
  private readonly seedHex: string;
  private readonly every: number;

  constructor(
    readonly request: RunRequest,
    private readonly now: () => number,
  ) {
    const { spec, seedIndex, suiteSeed, definition } = request;
    const runSeed = deriveRunSeed(suiteSeed, spec.problemKey, seedIndex);
    this.seedHex = seedToHex(runSeed);
    this.problem = definition.create(spec.params, { noise: runStream(runSeed, STREAM.noise) });
    this.dim = this.problem.dim;
    this.x = new Float64Array(this.dim);
    this.grad = new Float64Array(this.dim);
    this.point = new Float64Array(this.dim);
    this.problem.start(this.x, runStream(runSeed, STREAM.start));
    this.recorder = new RunRecorder(spec, this.problem.fStar);
    this.every = this.problem.stochastic ? Math.max(1, spec.measureEvery) : 1;
    this.startedAt = now();
  }

  get spec(): CaseSpec {
    return this.request.spec;
  }

  /** Measures f(x₀). Returns the metrics if the run must not start (non-finite f₀), else null. */
  begin(): RunMetrics | null {
    const first = this.recorder.begin(this.problem.objective(this.x));
    return first === null ? null : this.end(first, 0);
  }

  /** The `start` entry for a client instance with id `clientId` (from x_k, with `state` for a restart). */
  startEntry(clientId: number, state?: StartEntry["state"]): StartEntry {
    this.clientId = clientId;
    this.instanceBase = this.k;
    const pauseAt = this.request.control?.pauseAt;
    const pause = pauseAt !== undefined && pauseAt > this.k ? pauseAt - this.k : undefined;
    return {
      run: clientId,
      optimizer: this.request.optimizer,
      hyper: this.spec.hyper,
      dim: this.dim,
      x: Array.from(this.x),
      ...(state !== undefined ? { state } : {}),
      ...(pause !== undefined ? { pause } : {}),
    };
  }

  /**
   * The client completed step k+1 with iterate `x` (already checked for length; null = not finite).
   * Records it, applies the budgets, and says whether the run goes on.
   */
  onStep(x: readonly number[] | null): RunStatus {
    if (this.pending && this.measure(this.problem.objective(this.x), this.evalsAtK)) return this.status;
    const k = ++this.k;
    if (x === null) {
      this.x.fill(NaN);
      this.recorder.keepIterate(k, this.x);
      this.request.control?.afterStep?.(k, this.x);
      const verdict = this.recorder.record(k, NaN, this.evaluations);
      return this.stop(verdict ?? "diverged", this.evaluations);
    }
    const xs = this.x;
    for (let i = 0; i < xs.length; i++) xs[i] = x[i];
    this.recorder.keepIterate(k, xs);
    this.request.control?.afterStep?.(k, xs);
    this.evalsAtK = this.evaluations;
    const { steps: maxSteps, evaluations: maxEvals, seconds } = this.spec.budget;
    const stochastic = this.problem.stochastic;
    if (stochastic) {
      if (k % this.every === 0 || k === maxSteps) {
        const verdict = this.recorder.record(k, this.problem.objective(xs), this.evaluations);
        if (verdict !== null) return this.stop(verdict, this.evaluations);
      }
    } else {
      this.pending = true;
    }
    let budget: StopReason | null = null;
    if (maxEvals > 0 && this.evaluations >= maxEvals) budget = "evaluations";
    else if ((k & 63) === 0 && this.now() - this.startedAt > seconds * 1000) budget = "time";
    else if (k >= maxSteps) budget = "steps";
    if (budget !== null) {
      let verdict: StopReason | null = null;
      if (this.pending) {
        this.pending = false;
        verdict = this.recorder.record(k, this.problem.objective(xs), this.evaluations);
      } else if (stochastic && k % this.every !== 0 && k !== maxSteps) {
        verdict = this.recorder.record(k, this.problem.objective(xs), this.evaluations);
      }
      return this.stop(verdict ?? budget, this.evaluations);
    }
    if (this.request.control?.pauseAt === k) this.status = "paused";
    return this.status;
  }

  /**
   * The client asks for the loss and gradient at `x` (length already checked; null = not finite;
   * "iterate" = at x_k, from a step entry's `eval: true`). Returns the answer (a values entry as JSON
   * text), or null when the run
   * ended instead (target reached or divergence found while measuring x_k).
   */
  onEval(x: readonly number[] | null | "iterate"): string | null {
    let atIterate = x === "iterate";
    if (x !== "iterate" && x !== null && this.pending) atIterate = sameBits(x, this.x);
    if (this.pending) {
      this.pending = false;
      if (atIterate) {
        const f = this.problem.evaluate(this.x, this.grad);
        this.evaluations++;
        const verdict = this.recorder.record(this.k, f, this.evalsAtK);
        if (verdict !== null) {
          this.stop(verdict, this.evalsAtK);
          return null;
        }
        return this.values(f);
      }
      const verdict = this.recorder.record(this.k, this.problem.objective(this.x), this.evalsAtK);
      if (verdict !== null) {
        this.stop(verdict, this.evalsAtK);
        return null;
      }
    }
    if (x === null) {
      // A point that is no longer finite: the run has diverged during step k+1.
      this.evaluations++;
      const verdict = this.recorder.record(this.k + 1, NaN, this.evaluations);
      this.stop(verdict ?? "diverged", this.evaluations);
      return null;
    }
    let f: number;
    if (atIterate) {
      f = this.problem.evaluate(this.x, this.grad);
    } else {
      const p = this.point;
      const xs = x as readonly number[];
      for (let i = 0; i < p.length; i++) p[i] = xs[i];
      f = this.problem.evaluate(p, this.grad);
    }
    this.evaluations++;
    return this.values(f);
  }

  /** The client's optimizer code failed: the run ends with an error naming the phase and the step. */
  onFailed(phase: FailurePhase, message: string): void {
    const next = this.k + 1;
    const text =
      phase === "create"
        ? `creating the optimizer failed: ${message}`
        : phase === "step"
          ? `step ${next} threw: ${message}`
          : phase === "exportState"
            ? `exportState after step ${this.k} failed: ${message}`
            : `${phase} before step ${next} failed: ${message}`;
    this.fail(text);
  }

  /** Ends the run with stop "error" and `reason` (no further measurement). */
  fail(reason: string): RunMetrics {
    return this.end("error", this.evaluations, reason);
  }

  /** The values entry as JSON text (non-finite numbers as null), built directly: the hot path. */
  private values(f: number): string {
    const g = this.grad;
    let text = `{"run":${this.clientId},"f":${jsonNumber(f)},"g":[`;
    for (let i = 0; i < g.length; i++) text += i === 0 ? jsonNumber(g[i]) : `,${jsonNumber(g[i])}`;
    return text + "]}";
  }

  /** Records f(x_k) for a pending measurement; true if the run ended. */
  private measure(f: number, evaluations: number): boolean {
    this.pending = false;
    const verdict = this.recorder.record(this.k, f, evaluations);
    if (verdict === null) return false;
    this.stop(verdict, evaluations);
    return true;
  }

  private stop(reason: StopReason, evaluations: number): RunStatus {
    this.end(reason, evaluations);
    return this.status;
  }

  private end(stop: StopReason, evaluations: number, error?: string): RunMetrics {
    if (this.metrics === null) {
      this.metrics = this.recorder.finish({
        seed: this.request.seedIndex,
        runSeed: this.seedHex,
        stop,
        evaluations,
        error,
      });
    }
    this.status = "ended";
    return this.metrics;
  }
}

/** A number as JSON writes it (the same digits as JSON.stringify), null for NaN and ±Infinity. */
function jsonNumber(x: number): string {
  return Number.isFinite(x) ? String(x) : "null";
}

/** Bitwise equality of a requested point and the iterate (so -0 ≠ 0 and NaN never matches). */
function sameBits(a: readonly number[], b: Float64Array): boolean {
  for (let i = 0; i < b.length; i++) if (!Object.is(a[i], b[i])) return false;
  return true;
}
