/**
 * The problem registry: every standard problem in a stable order, lookup by name, parameter
 * resolution and the canonical instance key.
 */
import type { ProblemDefinition, ProblemInstance, ProblemRunContext } from "../core/types.js";
import { beale } from "./beale.js";
import { brownBadlyScaled } from "./brown-badly-scaled.js";
import { extendedRosenbrock } from "./extended-rosenbrock.js";
import { freudensteinRoth } from "./freudenstein-roth.js";
import { gaussian } from "./gaussian.js";
import { helicalValley } from "./helical-valley.js";
import { logisticRegression } from "./logistic-regression.js";
import { noisyQuadratic } from "./noisy-quadratic.js";
import { resolveProblemParams } from "./params.js";
import { penalty1 } from "./penalty-1.js";
import { penalty2 } from "./penalty-2.js";
import { plateau } from "./plateau.js";
import { powellBadlyScaled } from "./powell-badly-scaled.js";
import { powellSingular } from "./powell-singular.js";
import { quadratic } from "./quadratic.js";
import { rosenbrock } from "./rosenbrock.js";
import { saddle } from "./saddle.js";
import { sparseLeastSquares } from "./sparse-least-squares.js";
import { twoLayerNetwork } from "./two-layer-network.js";
import { wood } from "./wood.js";

export { describeSpec, problemKey, resolveProblemParams, structureKey } from "./params.js";
export { createQuadratic, quadraticSpectrum } from "./quadratic.js";
export type { QuadraticInstance, QuadraticSpectrum } from "./quadratic.js";
export { createNoisyQuadratic, sgdStationaryLoss } from "./noisy-quadratic.js";
export type { NoisyQuadraticInstance } from "./noisy-quadratic.js";

/**
 * Every problem, in a stable order: the quadratic, the Moré–Garbow–Hillstrom problems by number,
 * then the constructed and machine-learning problems. Append new problems at the end.
 */
export const PROBLEMS: readonly ProblemDefinition[] = Object.freeze([
  quadratic,
  rosenbrock,
  freudensteinRoth,
  powellBadlyScaled,
  brownBadlyScaled,
  beale,
  helicalValley,
  gaussian,
  powellSingular,
  wood,
  extendedRosenbrock,
  penalty1,
  penalty2,
  saddle,
  plateau,
  noisyQuadratic,
  sparseLeastSquares,
  logisticRegression,
  twoLayerNetwork,
]);

const BY_NAME: ReadonlyMap<string, ProblemDefinition> = new Map(PROBLEMS.map((def) => [def.name, def]));

/** The problem called `name`; an unknown name is an error listing the known names. */
export function getProblem(name: string): ProblemDefinition {
  const def = BY_NAME.get(name);
  if (!def) {
    throw new Error(
      `unknown problem ${JSON.stringify(name)}; expected one of: ${PROBLEMS.map((p) => p.name).join(", ")}`,
    );
  }
  return def;
}

/**
 * Creates an instance of problem `name` with `params` (missing ones take their defaults; errors
 * name `problem "<name>"` as the place), bound to the run context `ctx`.
 */
export function createProblem(name: string, params: unknown, ctx: ProblemRunContext): ProblemInstance {
  const def = getProblem(name);
  return def.create(resolveProblemParams(def, params, `problem "${name}"`), ctx);
}
