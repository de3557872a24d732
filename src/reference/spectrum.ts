/**
 * What the rate and stationary-variance checks need to know about a quadratic problem instance: its
 * eigenvalues, the eigenvectors (rotation) and the minimiser, and for the noisy quadratic the noise level.
 * Read from the instance's own fields (src/problems/quadratic.ts, src/problems/noisy-quadratic.ts), so
 * any problem exposing the same fields qualifies.
 */
import { Pcg32 } from "../core/rng.js";
import type { ProblemDefinition, ProblemInstance, ProblemParams } from "../core/types.js";

export interface QuadraticFacts {
  readonly instance: ProblemInstance;
  /** Eigenvalues λᵢ of the Hessian. */
  readonly eigenvalues: Float64Array;
  /** Row i is the unit eigenvector of λᵢ (row-major n×n); null for a diagonal Hessian. */
  readonly rotation: Float64Array | null;
  readonly xStar: Float64Array;
  /** Standard deviation of the additive gradient noise (0 when there is none). */
  readonly sigma: number;
}

/** An instance of the problem with dummy noise, for reading its structure (never for a run). */
export function probeInstance(definition: ProblemDefinition, params: ProblemParams): ProblemInstance {
  return definition.create(params, { noise: new Pcg32(0n, 0n) });
}

/** The facts of a quadratic instance, or null when the instance does not expose its eigenvalues. */
export function quadraticFacts(instance: ProblemInstance): QuadraticFacts | null {
  const fields = instance as unknown as Record<string, unknown>;
  const eigenvalues = fields.eigenvalues;
  if (!(eigenvalues instanceof Float64Array) || eigenvalues.length !== instance.dim) return null;
  if (instance.xStar === null) return null;
  const rotation = fields.rotation instanceof Float64Array ? fields.rotation : null;
  const sigma = typeof fields.sigma === "number" ? fields.sigma : 0;
  return { instance, eigenvalues, rotation, xStar: instance.xStar, sigma };
}

/** Coordinates of x − x* in the eigenbasis: c = Q·(x − x*). */
export function eigenCoordinates(facts: QuadraticFacts, x: Float64Array): Float64Array {
  const n = x.length;
  const out = new Float64Array(n);
  const q = facts.rotation;
  for (let i = 0; i < n; i++) {
    if (q === null) {
      out[i] = x[i] - facts.xStar[i];
      continue;
    }
    let s = 0;
    for (let j = 0; j < n; j++) s += q[i * n + j] * (x[j] - facts.xStar[j]);
    out[i] = s;
  }
  return out;
}
