/**
 * SGD's stationary variance on the noisy quadratic: does the optimizer under test, claimed to be plain
 * SGD with step η, settle into the noise floor the closed form predicts?
 *
 * Theory (./stationary.ts, derived there): E[xᵢ²] → vᵢ = ησ²/(λᵢ(2 − ηλᵢ)) per coordinate.
 * Measurement: one long run from the suite's start point of seed 0 with the suite's noise stream; the
 * first B steps are discarded (B makes the start-up transient worth at most 5% of a standard error) and
 * xᵢ² is averaged over the next T steps, T chosen so that the relative standard error of the slowest
 * coordinate is `precision` (at most 10⁷ steps).
 * Tolerance, justified by the run length: each coordinate's average must lie within `sigmas` standard
 * errors se_i = √(2(1 + aᵢ²)/(T(1 − aᵢ²))) (aᵢ = 1 − ηλᵢ) of vᵢ, relative. With the default 5 and a
 * correct SGD, the chance that any of n ≤ 100 coordinates lands outside is below 6e−5 (Bonferroni over
 * the coordinates, normal approximation of a long time average).
 */
import { InputError } from "../core/errors.js";
import type { ProblemDefinition } from "../core/types.js";
import type { CheckResult } from "../compare/types.js";
import type { CaseSpec } from "../runner/types.js";
import { fmt, pct } from "./format.js";
import { numberHyper } from "./rate-check.js";
import { probeInstance, quadraticFacts } from "./spectrum.js";
import {
  burnInSteps,
  sgdStationaryVariance,
  stepsForPrecision,
  timeAverageRelativeError,
} from "./stationary.js";
import { type TrajectorySource, requestProblem } from "./trajectory.js";

/** The longest run the check makes. */
export const MAX_STATIONARY_STEPS = 10_000_000;

export interface StationaryRequest {
  readonly spec: CaseSpec;
  readonly definition: ProblemDefinition;
  readonly suiteSeed: number;
  readonly names: { readonly lr: string };
  /** Target relative standard error of the slowest coordinate's time average. */
  readonly precision: number;
  /** Standard errors allowed per coordinate. */
  readonly sigmas: number;
  readonly gating: boolean;
  readonly source: TrajectorySource;
  readonly where: string;
}

export const STATIONARY_SOURCE =
  "closed form E[xᵢ²] = ησ²/(λᵢ(2 − ηλᵢ)) of the AR(1) recursion xᵢ ← (1 − ηλᵢ)xᵢ − ησzᵢ (derived in src/reference/stationary.ts); time-average precision via Isserlis (1918), Biometrika 12(1/2):134–139 (reference from memory)";

/** Runs the stationary-variance check on one case. */
export async function checkStationary(request: StationaryRequest): Promise<CheckResult> {
  const { spec } = request;
  const instance = probeInstance(request.definition, spec.params);
  const facts = quadraticFacts(instance);
  if (facts === null || !(facts.sigma > 0) || facts.rotation !== null) {
    throw new InputError(
      `${request.where}: problem ${spec.problemKey} is not a diagonal quadratic with gradient noise (use noisy-quadratic with sigma > 0)`,
    );
  }
  const lr = numberHyper(spec, request.names.lr, request.where, "step size");
  const eig = facts.eigenvalues;
  const sigma = facts.sigma;
  const base = { id: "stationary-variance", gating: request.gating, source: STATIONARY_SOURCE };
  const head = `stationary variance (SGD, η = ${fmt(lr)}, σ = ${fmt(sigma)})`;
  for (const l of eig) {
    if (!(lr * l > 0 && lr * l < 2)) {
      throw new InputError(
        `${request.where}: case ${spec.id} has η·λ = ${fmt(lr * l)} for λ = ${fmt(l)}; SGD has a stationary distribution only for 0 < η·λ < 2`,
      );
    }
  }
  const averaged = Math.min(MAX_STATIONARY_STEPS, stepsForPrecision(eig, lr, request.precision));
  const seedRequest = {
    definition: request.definition,
    params: spec.params,
    problemKey: spec.problemKey,
    hyper: spec.hyper,
    suiteSeed: request.suiteSeed,
    seedIndex: 0,
  };
  const { x0 } = requestProblem({ ...seedRequest, steps: 0 });
  let burnIn = 0;
  for (let i = 0; i < eig.length; i++)
    burnIn = Math.max(burnIn, burnInSteps(eig[i], sigma, lr, x0[i], averaged, 0.05));
  const n = eig.length;
  const sums = new Float64Array(n);
  const outcome = await request.source.run({ ...seedRequest, steps: burnIn + averaged }, (k, x) => {
    if (k <= burnIn) return;
    for (let i = 0; i < n; i++) sums[i] += x[i] * x[i];
  });
  if (outcome.error !== undefined) {
    return { ...base, status: "fail", summary: `${head}: the run failed: ${outcome.error}` };
  }
  let worst = 0;
  let worstZ = -1;
  for (let i = 0; i < n; i++) {
    const v = sgdStationaryVariance(eig[i], sigma, lr);
    const z = Math.abs(sums[i] / averaged / v - 1) / timeAverageRelativeError(eig[i], lr, averaged);
    if (z > worstZ) {
      worstZ = z;
      worst = i;
    }
  }
  const v = sgdStationaryVariance(eig[worst], sigma, lr);
  const mean = sums[worst] / averaged;
  const se = timeAverageRelativeError(eig[worst], lr, averaged);
  const allowed = request.sigmas * se;
  const where = `coordinate ${worst + 1} (λ = ${fmt(eig[worst])})`;
  const run = `over ${averaged} steps after ${burnIn} of burn-in`;
  const tolerance = { kind: "relative" as const, value: allowed };
  const off = mean / v - 1;
  if (worstZ <= request.sigmas) {
    return {
      ...base,
      status: "pass",
      summary:
        `${head}: ${run}, E[xᵢ²] matches ησ²/(λᵢ(2 − ηλᵢ)) in all ${n} coordinates; farthest is ${where}: ` +
        `${fmt(mean)} vs ${fmt(v)}, ${fmt(worstZ)} standard errors (tolerance ${request.sigmas} standard errors = ${pct(allowed)})`,
      measured: mean,
      expected: v,
      tolerance,
    };
  }
  return {
    ...base,
    status: "fail",
    summary:
      `${head}: ${run}, ${where} averages E[x²] = ${fmt(mean)}, ${pct(Math.abs(off))} ${off > 0 ? "above" : "below"} ` +
      `the closed form ησ²/(λ(2 − ηλ)) = ${fmt(v)} (tolerance ${pct(allowed)}, ${request.sigmas} standard errors of the time average)`,
    measured: mean,
    expected: v,
    tolerance,
  };
}
