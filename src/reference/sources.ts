/**
 * Trajectory sources for every kind of optimizer a suite can name: reference optimizers and module
 * optimizers run in this thread (`inProcessSource`), process-adapter optimizers run through their
 * adapter's session — the harness serves the evaluations from its own problem instance, pauses after the
 * step a learning-rate change is due, and observes every iterate the client reports (RunControl in
 * src/adapters/process-run.ts). So every reference check, conformance included, works the same for all
 * three.
 */
import { InputError, quote } from "../core/errors.js";
import type { OptimizerDescription, ReadyMessage } from "../adapters/protocol.js";
import type { RunRequest } from "../adapters/process-run.js";
import { ProcessSession } from "../adapters/session.js";
import { parseUse } from "../adapters/use.js";
import { canonicalUse, loadOptimizer } from "../runner/resolve.js";
import type { CaseSpec, RunMetrics, SuiteSpec } from "../runner/types.js";
import {
  type TrajectoryOutcome,
  type TrajectorySource,
  inProcessSource,
  requestProblem,
} from "./trajectory.js";

/** What the checks need of a process session (src/adapters/session.ts). */
export interface SessionLike {
  describe(): Promise<ReadyMessage>;
  run(requests: readonly RunRequest[]): Promise<RunMetrics[]>;
}

/** Wall-clock allowance of one check run through a process; the adapter's own run time-out still applies. */
const CHECK_RUN_SECONDS = 3600;

/**
 * A source for optimizer `optimizer` of a process session. Asks the session for its description first
 * (hyperparameter names from its defaults, whether it can change its learning rate).
 */
export async function processSource(
  session: SessionLike,
  optimizer: string,
  label: string,
): Promise<TrajectorySource> {
  const ready = await session.describe();
  const description: OptimizerDescription | undefined = ready.optimizers.find((o) => o.name === optimizer);
  if (description === undefined) {
    throw new InputError(
      `reference checks: ${quote(label)}: the adapter serves no optimizer ${quote(optimizer)} (it serves: ${ready.optimizers.map((o) => o.name).join(", ")})`,
    );
  }
  const canChangeLr = description.capabilities.includes("lr");
  return {
    label,
    ...(description.defaults !== undefined ? { hyperNames: Object.keys(description.defaults) } : {}),
    async run(request, observe): Promise<TrajectoryOutcome> {
      if (request.lrChange !== undefined && !canChangeLr) return { steps: 0, lrChange: "unsupported" };
      const { problem, x0 } = requestProblem(request);
      const spec: CaseSpec = {
        id: `reference-check/${label}/${request.problemKey}`,
        optimizer: label,
        use: label,
        set: "reference-check",
        hyper: request.hyper,
        problem: request.definition.name,
        problemKey: request.problemKey,
        params: request.params,
        dim: problem.dim,
        fStar: problem.fStar,
        fStarKind: problem.fStarKind,
        budget: { steps: request.steps, evaluations: 0, seconds: CHECK_RUN_SECONDS },
        stopAt: 0,
        ladder: [],
        blowUp: Number.MAX_VALUE,
        checkpoints: [0],
        fingerprintSteps: 0,
        seeds: 1,
        measureEvery: 1,
      };
      observe(0, x0);
      let steps = 0;
      const change = request.lrChange;
      const [metrics] = await session.run([
        {
          spec,
          seedIndex: request.seedIndex,
          suiteSeed: request.suiteSeed,
          definition: request.definition,
          optimizer,
          control: {
            afterStep: (k, x) => {
              steps = k;
              observe(k, x);
            },
            ...(change !== undefined
              ? { pauseAt: change.after, action: { kind: "lr" as const, lr: change.lr } }
              : {}),
          },
        },
      ]);
      const lrChange = change === undefined ? "none" : "applied";
      if (metrics.stop === "error") return { steps, error: metrics.error ?? "the run failed", lrChange };
      if (metrics.stop === "diverged") {
        return {
          steps,
          error: `the iterate is not finite after step ${metrics.divergedAt ?? steps}`,
          lrChange,
        };
      }
      if (steps < request.steps)
        return { steps, error: `the run stopped after step ${steps} (${metrics.stop})`, lrChange };
      return { steps, lrChange };
    },
  };
}

/** Sources for the optimizers of one suite, and the processes to close afterwards. */
export interface SuiteSources {
  readonly sourceFor: (use: string) => Promise<TrajectorySource>;
  /** Ends the optimizer processes the checks started. */
  close(): Promise<void>;
}

/** Sources for reference, module and process optimizers of `suite` (its `adapters` context). */
export function suiteSources(suite: SuiteSpec): SuiteSources {
  const sessions = new Map<string, ProcessSession>();
  const sources = new Map<string, Promise<TrajectorySource>>();
  const context = suite.adapters;
  const adapterNames = Object.keys(context?.processes ?? {});
  const make = async (use: string): Promise<TrajectorySource> => {
    const canonical = canonicalUse(use);
    const spec = parseUse(canonical, adapterNames, `reference checks: ${quote(use)}`);
    if (spec.kind === "process") {
      let session = sessions.get(spec.adapter);
      if (session === undefined) {
        session = new ProcessSession(context!.processes[spec.adapter]);
        sessions.set(spec.adapter, session);
      }
      return processSource(session, spec.optimizer, canonical);
    }
    const { factory } = await loadOptimizer(canonical, `reference checks: ${quote(use)}`, context);
    return inProcessSource(factory, canonical);
  };
  return {
    sourceFor(use) {
      let s = sources.get(use);
      if (s === undefined) {
        s = make(use);
        sources.set(use, s);
      }
      return s;
    },
    async close() {
      const all = [...sessions.values()];
      sessions.clear();
      await Promise.all(all.map((s) => s.close()));
    },
  };
}
