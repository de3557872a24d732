/**
 * Ill-conditioned quadratic (rotated, log-spaced spectrum).
 *
 * What it is for: the problem on which first-order methods have known convergence rates. With
 * eigenvalues in [μ, L] = [1, κ], gradient descent contracts like 1 − 1/κ, heavy ball and Nesterov
 * like 1 − 1/√κ (Nesterov 2004, Introductory Lectures on Convex Optimization, Thm 2.1.15 and §2.2;
 * Polyak 1964, doi:10.1016/0041-5553(64)90137-5). The rotation makes the Hessian non-diagonal, so
 * per-coordinate methods (Adagrad, RMSProp, Adam) get no free preconditioning; `rotate = 0` keeps it
 * diagonal, where they do.
 *
 * f(x) = ½ (x − x*)ᵀ A (x − x*),  A = Qᵀ diag(λ) Q,  ∇f(x) = A (x − x*),  f* = 0,
 * λᵢ = κ^(i/(n−1)), i = 0..n−1 (log-spaced from 1 to κ, both exact; λ = (1) when n = 1),
 * x* = (1, …, 1), standard start x0 = (0, …, 0), so f(x0) = ½ Σᵢ λᵢ (qᵢ · 1)² with qᵢ the rows of Q.
 * Q: Haar-random orthogonal matrix, Gram–Schmidt QR (with reorthogonalisation) of an n×n matrix of
 * N(0, 1) draws from `structureRng("quadratic[n=…]", seed)` (see util.orthogonalMatrix). Q depends on
 * n and `seed` only, so the same rotation serves every κ. With `rotate = 0`, Q = I.
 *
 * Source: constructed here (common practice); rates as cited above.
 * Start perturbation: ±0.01 absolute, uniform per coordinate (x0 is all zeros).
 * Cost: O(n²) per evaluation with rotation (one dense symmetric matrix–vector product; A is built
 * once per (n, κ, seed) in O(n³) and cached), O(n) without. Memory 16n² bytes for Q and A.
 */
import { structureRng } from "../core/rng.js";
import type { ProblemDefinition, ProblemInstance, ProblemParams } from "../core/types.js";
import { prepare, structureKey } from "./params.js";
import { cached, logSpaced, orthogonalMatrix, writeStart } from "./util.js";

/** The quadratic's spectrum, which reference checks of theoretical rates need. */
export interface QuadraticSpectrum {
  /** Eigenvalues of A, ascending: λᵢ = κ^(i/(n−1)). */
  readonly eigenvalues: Float64Array;
  /** Strong convexity constant μ = λ_min = 1. */
  readonly mu: number;
  /** Smoothness constant L = λ_max = κ (1 when n = 1). */
  readonly L: number;
}

/** A quadratic instance: the problem plus its spectrum and its rotation. */
export interface QuadraticInstance extends ProblemInstance, QuadraticSpectrum {
  /** Q, row-major: row i is the unit eigenvector of λᵢ; null when `rotate = 0` (Q = I). */
  readonly rotation: Float64Array | null;
  /** A = Qᵀ diag(λ) Q, row-major n×n; null when `rotate = 0` (A = diag(λ)). Read-only. */
  readonly hessian: Float64Array | null;
}

/** Eigenvalues, μ and L for the given (possibly partial) parameters; defaults fill the rest. */
export function quadraticSpectrum(params: ProblemParams = {}): QuadraticSpectrum {
  const { p } = prepare(quadratic, params);
  const eigenvalues = logSpaced(p.n, 1, p.kappa);
  return { eigenvalues, mu: eigenvalues[0], L: eigenvalues[p.n - 1] };
}

const ROTATIONS = new Map<string, Float64Array>();
const HESSIANS = new Map<string, Float64Array>();

function buildHessian(q: Float64Array, lambda: Float64Array, n: number): Float64Array {
  const a = new Float64Array(n * n);
  for (let j = 0; j < n; j++) {
    for (let k = j; k < n; k++) {
      let s = 0;
      for (let i = 0; i < n; i++) s += q[i * n + j] * lambda[i] * q[i * n + k];
      a[j * n + k] = s;
      a[k * n + j] = s;
    }
  }
  return a;
}

export const quadratic: ProblemDefinition = {
  name: "quadratic",
  title: "Ill-conditioned quadratic, log-spaced spectrum in [1, κ], seeded rotation",
  tags: ["convex", "ill-conditioned", "quadratic", "rates"],
  source:
    "Constructed here (common practice); rates: Nesterov (2004), Introductory Lectures on Convex Optimization, Thm 2.1.15 and §2.2; Polyak (1964), USSR Comput. Math. Math. Phys. 4(5):1–17, doi:10.1016/0041-5553(64)90137-5",
  fStarNote: "f* = 0 at x* = (1, …, 1) by construction (A is positive definite).",
  params: {
    kappa: { default: 100, min: 1, max: 1e12, description: "condition number κ = L/μ (λ from 1 to κ)" },
    n: { default: 10, min: 1, max: 2000, integer: true, description: "dimension" },
    rotate: { default: 1, min: 0, max: 1, integer: true, description: "1: random rotation Q; 0: diagonal A" },
    seed: {
      default: 0,
      min: 0,
      max: 4294967295,
      integer: true,
      description: "structure seed of the rotation",
    },
  },
  create: (params) => createQuadratic(params),
};

/** Creates a quadratic instance with its spectrum and rotation exposed (see `QuadraticInstance`). */
export function createQuadratic(params: ProblemParams = {}): QuadraticInstance {
  const { p, key } = prepare(quadratic, params);
  const n = p.n;
  const { eigenvalues, mu, L } = quadraticSpectrum(p);
  const rotated = p.rotate === 1;
  let rotation: Float64Array | null = null;
  let hessian: Float64Array | null = null;
  if (rotated) {
    const sKey = structureKey(quadratic.name, p, ["n"]);
    const q = cached(ROTATIONS, `${sKey}#${p.seed}`, () => orthogonalMatrix(structureRng(sKey, p.seed), n));
    rotation = q;
    hessian = cached(HESSIANS, `${sKey}#${p.seed}#${p.kappa}`, () => buildHessian(q, eigenvalues, n));
  }
  const x0 = new Float64Array(n);
  const widths = new Float64Array(n).fill(0.01);
  const d = new Float64Array(n);
  const a = hessian;
  const lambda = eigenvalues;

  const evaluate = a
    ? (x: Float64Array, g: Float64Array): number => {
        for (let j = 0; j < n; j++) d[j] = x[j] - 1;
        let f = 0;
        for (let j = 0; j < n; j++) {
          const row = j * n;
          let s = 0;
          for (let k = 0; k < n; k++) s += a[row + k] * d[k];
          g[j] = s;
          f += d[j] * s;
        }
        return 0.5 * f;
      }
    : (x: Float64Array, g: Float64Array): number => {
        let f = 0;
        for (let j = 0; j < n; j++) {
          const dj = x[j] - 1;
          const s = lambda[j] * dj;
          g[j] = s;
          f += dj * s;
        }
        return 0.5 * f;
      };
  const objective = a
    ? (x: Float64Array): number => {
        for (let j = 0; j < n; j++) d[j] = x[j] - 1;
        let f = 0;
        for (let j = 0; j < n; j++) {
          const row = j * n;
          let s = 0;
          for (let k = 0; k < n; k++) s += a[row + k] * d[k];
          f += d[j] * s;
        }
        return 0.5 * f;
      }
    : (x: Float64Array): number => {
        let f = 0;
        for (let j = 0; j < n; j++) {
          const dj = x[j] - 1;
          f += lambda[j] * dj * dj;
        }
        return 0.5 * f;
      };

  return {
    key,
    dim: n,
    fStar: 0,
    fStarKind: "computed",
    xStar: new Float64Array(n).fill(1),
    stochastic: false,
    evaluate,
    objective,
    start: (out, rng) => writeStart(out, x0, widths, rng, quadratic.name),
    eigenvalues,
    mu,
    L,
    rotation,
    hessian,
  };
}
