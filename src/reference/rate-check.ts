/**
 * Theoretical rate on a quadratic: does the optimizer under test converge at the rate its method has?
 *
 * Theory (./linear-rate.ts): for gradient descent, heavy ball and Nesterov with step α and momentum β,
 * the error contracts asymptotically by ρ per step, ρ the spectral radius of the iteration matrix over
 * the problem's eigenvalues; with the classical tuned parameters ρ has a closed form (Nesterov 2004,
 * Theorem 2.1.15 and §2.2; Polyak 1964), which the check confirms equals the spectral radius.
 *
 * Measurement: one run of the optimizer under test from the suite's start point of seed 0, its gap
 * f − f* at every step, and ρ fitted over a long window (./fit-rate.ts: from 1e−3 to 1e−16 of the initial
 * gap, corrected for the k·ρᵏ behaviour of double roots, through the envelope when the error oscillates).
 *
 * Comparison: over a finite window, slower eigen-components that have not yet died out bias any fitted
 * rate (by up to several percent on clustered spectra). So the same fit is applied to the gap sequence
 * the linear theory itself predicts from the same start (`modelGaps`; for Nesterov both at w_k and at
 * the look-ahead point, whichever the code keeps), and the run must match that within `tolerance` of
 * the convergence speed −ln ρ: |ρ̂_run/ρ̂_theory − 1| ≤ tolerance·|ln ρ|. A correct implementation
 * matches to about 1e−10 (docs/decisions/0003-reference-checks.md); a wrong momentum coefficient, a
 * dropped look-ahead or a wrong step scaling changes −ln ρ by several percent or more.
 */
import { InputError, quote } from "../core/errors.js";
import type { HyperValue, ProblemDefinition } from "../core/types.js";
import type { CheckResult } from "../compare/types.js";
import type { CaseSpec } from "../runner/types.js";
import { fitRate } from "./fit-rate.js";
import {
  type LinearMethod,
  type ModelPoint,
  NESTEROV_2004,
  POLYAK_1964,
  linearRate,
  modelGaps,
  tunedParameters,
} from "./linear-rate.js";
import { eigenCoordinates, probeInstance, quadraticFacts } from "./spectrum.js";
import type { TrajectorySource } from "./trajectory.js";
import { fmt, pct } from "./format.js";

export interface RateRequest {
  readonly spec: CaseSpec;
  readonly definition: ProblemDefinition;
  readonly suiteSeed: number;
  readonly method: LinearMethod;
  /** Use the classical tuned step and momentum for the problem's μ and L instead of the case's. */
  readonly tuned: boolean;
  /** The optimizer's names for the step size and the momentum. */
  readonly names: { readonly lr: string; readonly momentum: string };
  /** Relative tolerance on the convergence speed −ln ρ. */
  readonly tolerance: number;
  /** Most steps the run may take. */
  readonly maxSteps: number;
  readonly gating: boolean;
  readonly source: TrajectorySource;
  /** Locates the declaration in messages. */
  readonly where: string;
}

const METHOD_NAMES: Readonly<Record<LinearMethod, string>> = {
  "gradient-descent": "gradient descent",
  "heavy-ball": "heavy ball",
  nesterov: "Nesterov",
};

const BLOCKS: Readonly<Record<LinearMethod, string>> = {
  "gradient-descent": "1 − αλ",
  "heavy-ball": "[[1 + β − αλ, −β], [1, 0]]",
  nesterov: "[[(1 + β)(1 − αλ), −β(1 − αλ)], [1, 0]]",
};

/** Window of the fit, relative to the initial gap (see ./fit-rate.ts). */
const UPPER = 1e-3;
const LOWER = 1e-16;

/**
 * Reads a number hyperparameter of the case; throws an InputError naming the declaration otherwise.
 * `tunable`: the declaration could use `tuned: true` instead (rate checks).
 */
export function numberHyper(
  spec: CaseSpec,
  name: string,
  where: string,
  role: string,
  tunable = false,
): number {
  const value: HyperValue | undefined = spec.hyper[name];
  if (typeof value !== "number" || !Number.isFinite(value)) {
    throw new InputError(
      `${where}: case ${spec.id} has no number hyperparameter ${quote(name)} for the ${role} (got ${quote(value)}); ` +
        `name it in names.${role === "step size" ? "lr" : "momentum"}${tunable ? " or set tuned: true" : ""}`,
    );
  }
  return value;
}

/** Runs the rate check on one case. */
export async function checkRate(request: RateRequest): Promise<CheckResult> {
  const { spec, method } = request;
  const id = `rate:${method}`;
  const instance = probeInstance(request.definition, spec.params);
  const facts = quadraticFacts(instance);
  if (facts === null || instance.stochastic) {
    throw new InputError(
      `${request.where}: problem ${spec.problemKey} has no exposed eigenvalues (rate checks need quadratic)`,
    );
  }
  const eig = facts.eigenvalues;
  let mu = Infinity;
  let L = -Infinity;
  for (const l of eig) {
    mu = Math.min(mu, l);
    L = Math.max(L, l);
  }
  let lr: number;
  let momentum: number;
  let sourceText = `spectral radius of the ${METHOD_NAMES[method]} iteration, block ${BLOCKS[method]} per eigenvalue λ (derived here; ${method === "nesterov" ? NESTEROV_2004 + ", §2.2" : method === "heavy-ball" ? POLYAK_1964 : NESTEROV_2004 + ", §2.1"})`;
  let closedForm: number | null = null;
  if (request.tuned) {
    const t = tunedParameters(method, mu, L);
    lr = t.lr;
    momentum = t.momentum;
    closedForm = t.rate;
    sourceText = `${t.source}; ${sourceText}`;
  } else {
    lr = numberHyper(spec, request.names.lr, request.where, "step size");
    momentum =
      method === "gradient-descent"
        ? 0
        : numberHyper(spec, request.names.momentum, request.where, "momentum");
  }
  const theory = linearRate(method, lr, momentum, eig);
  const rho = theory.rho;
  const params = method === "gradient-descent" ? `α = ${fmt(lr)}` : `α = ${fmt(lr)}, β = ${fmt(momentum)}`;
  const head = `rate (${METHOD_NAMES[method]}${request.tuned ? ", tuned" : ""}, ${params}, μ = ${fmt(mu)}, L = ${fmt(L)})`;
  // At the tuned parameters the dominant roots are double, where a discriminant of rounding size (1e−16)
  // moves the computed root by its square root: agreement to 1e−7 (relative) is all double precision gives.
  if (closedForm !== null && !(Math.abs(closedForm - rho) <= 1e-7 * closedForm)) {
    throw new Error(
      `${head}: closed form ${closedForm} and spectral radius ${rho} disagree; this is a bug in gradgate`,
    );
  }
  const base = { id, gating: request.gating, source: sourceText };
  if (!(rho < 1)) {
    return {
      ...base,
      status: "skipped",
      summary: `${head}: the iteration does not contract (ρ = ${fmt(rho)} ≥ 1), so there is no rate to check`,
    };
  }
  const lnRho = Math.log(rho);
  const needed = Math.ceil((1.5 * Math.log(LOWER)) / (2 * lnRho)) + 100;
  if (needed > request.maxSteps) {
    return {
      ...base,
      status: "skipped",
      summary: `${head}: ρ = ${fmt(rho)} needs about ${needed} steps to fall to ${LOWER} of the initial gap, more than steps = ${request.maxSteps}`,
    };
  }

  const hyper = { ...spec.hyper };
  if (request.tuned) {
    hyper[request.names.lr] = lr;
    if (method !== "gradient-descent") hyper[request.names.momentum] = momentum;
  }
  const gaps = new Float64Array(needed + 1).fill(NaN);
  let x0: Float64Array | null = null;
  const fStar = instance.fStar;
  const outcome = await request.source.run(
    {
      definition: request.definition,
      params: spec.params,
      problemKey: spec.problemKey,
      hyper,
      steps: needed,
      suiteSeed: request.suiteSeed,
      seedIndex: 0,
    },
    (k, x) => {
      if (k === 0) x0 = Float64Array.from(x);
      gaps[k] = instance.objective(x) - fStar;
    },
  );
  if (outcome.error !== undefined || x0 === null) {
    return {
      ...base,
      status: "fail",
      summary: `${head}: the run failed: ${outcome.error ?? "no start point was observed"}`,
    };
  }

  const fitOptions = {
    logPower: theory.double ? 2 : 0,
    block: theory.slowestAngle === null ? 1 : Math.ceil(Math.PI / theory.slowestAngle),
    upper: UPPER,
    lower: LOWER,
  };
  const run = fitRate(gaps, fitOptions);
  if (run.rho === null) {
    return {
      ...base,
      status: "fail",
      summary: `${head}: no rate could be fitted: ${run.why}, although the theory's ρ = ${fmt(rho)} reaches ${LOWER} of the initial gap in about ${Math.ceil(Math.log(LOWER) / (2 * lnRho))} steps`,
      expected: rho,
    };
  }
  const c0 = eigenCoordinates(facts, x0);
  const points: ModelPoint[] = method === "nesterov" ? ["iterate", "lookahead"] : ["iterate"];
  let best: { rho: number; point: ModelPoint } | null = null;
  for (const point of points) {
    const model = fitRate(
      modelGaps(method, lr, momentum, eig, c0, new Float64Array(needed + 1), point),
      fitOptions,
    );
    if (model.rho === null) continue;
    if (best === null || Math.abs(run.rho / model.rho - 1) < Math.abs(run.rho / best.rho - 1)) {
      best = { rho: model.rho, point };
    }
  }
  if (best === null)
    throw new Error(`${head}: the theory's own gap sequence could not be fitted; this is a bug in gradgate`);

  const allowed = request.tolerance * Math.abs(lnRho);
  const relative = Math.abs(run.rho / best.rho - 1);
  const speedRatio = Math.log(run.rho) / Math.log(best.rho);
  const closed = closedForm === null ? "" : ` = ${closedFormText(method)}`;
  const theoryText =
    `spectral radius ρ = ${fmt(rho)}${closed}` +
    (fmt(best.rho) !== fmt(rho)
      ? `; ${fmt(best.rho)} over this window, where slower components have not died out`
      : "");
  const window = `steps ${run.from}–${run.to}`;
  const tolerance = { kind: "relative" as const, value: allowed };
  if (relative <= allowed) {
    return {
      ...base,
      status: "pass",
      summary: `${head}: the run contracts by ρ = ${fmt(run.rho)} per step over ${window}, as the theory predicts (${theoryText}); tolerance ${pct(request.tolerance)} of the convergence speed −ln ρ`,
      measured: run.rho,
      expected: best.rho,
      tolerance,
    };
  }
  const direction = speedRatio < 1 ? "slower" : "faster";
  return {
    ...base,
    status: "fail",
    summary:
      `${head}: the run contracts by ρ = ${fmt(run.rho)} per step over ${window}, the theory predicts ${fmt(best.rho)} (${theoryText}): ` +
      `${pct(Math.abs(1 - speedRatio))} ${direction} convergence (−ln ρ ${fmt(-Math.log(run.rho))} vs ${fmt(-Math.log(best.rho))}), tolerance ${pct(request.tolerance)}`,
    measured: run.rho,
    expected: best.rho,
    tolerance,
  };
}

function closedFormText(method: LinearMethod): string {
  switch (method) {
    case "gradient-descent":
      return "(κ − 1)/(κ + 1)";
    case "heavy-ball":
      return "(√κ − 1)/(√κ + 1)";
    case "nesterov":
      return "1 − 1/√κ";
  }
}
