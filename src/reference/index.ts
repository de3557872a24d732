/**
 * Reference checks: absolute checks against published values, judged beside the baseline drift —
 * known minimum reached, theoretical rate on quadratics, SGD's stationary variance, conformance to a
 * published update rule (docs/reference-checks.md, docs/decisions/0003-reference-checks.md).
 *
 * Use: `resolveChecks(config.checks, suite, file)` binds the config section to the suite (input errors
 * early), `runReferenceChecks({ suite, checks, results, sourceFor })` runs them, and
 * `applyReferenceChecks(verdict, report)` puts the results into the verdict document.
 */
export { applyReferenceChecks } from "./merge.js";
export {
  type ConformanceCheck,
  type MinimumCheck,
  type RateCheck,
  type ReferenceChecks,
  type StationaryCheck,
  parseChecks,
  resolveChecks,
} from "./config.js";
export { checkConformance, type ConformanceRequest } from "./conformance.js";
export { checkKnownMinimum, lastDigitUnit, type MinimumRequest } from "./known-minimum.js";
export { LINEAR_METHODS, type LinearMethod, linearRate, modelGaps, tunedParameters } from "./linear-rate.js";
export { checkRate, type RateRequest } from "./rate-check.js";
export {
  type ReferenceCheckInput,
  type ReferenceCheckReport,
  referenceSourceFor,
  runReferenceChecks,
} from "./run-checks.js";
export { runConfiguredChecks } from "./configured.js";
export { type SessionLike, type SuiteSources, processSource, suiteSources } from "./sources.js";
export { checkStationary, type StationaryRequest } from "./stationary-check.js";
export { sgdStationaryVariance } from "./stationary.js";
export {
  type Observer,
  type TrajectoryOutcome,
  type TrajectoryRequest,
  type TrajectorySource,
  inProcessSource,
  runInProcess,
} from "./trajectory.js";
