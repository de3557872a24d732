/**
 * Shared helpers of the problem library: seeded start-point perturbation, a seeded orthogonal matrix,
 * small dense linear algebra (Cholesky), numerically safe logistic functions, and the instance
 * wrapper used by every deterministic problem. Nothing here allocates per evaluation.
 */
import type { Pcg32 } from "../core/rng.js";
import type { FStarKind, ProblemInstance } from "../core/types.js";

/**
 * Half-widths of the default start perturbation: `rel·|x0ᵢ| + abs` per coordinate, i.e. relative
 * `rel` of the coordinate plus an absolute floor so that zero coordinates move too.
 */
export function halfWidths(x0: ArrayLike<number>, rel = 0.01, abs = 1e-3): Float64Array {
  const out = new Float64Array(x0.length);
  for (let i = 0; i < x0.length; i++) out[i] = rel * Math.abs(x0[i]) + abs;
  return out;
}

/**
 * Writes the start point: `x0` exactly when `rng` is null, else `x0ᵢ + wᵢ·(2uᵢ − 1)` with uᵢ uniform
 * in [0, 1) drawn from `rng` in coordinate order (one `nextFloat` per coordinate). A uniform, not a
 * normal, perturbation so that it is bounded by wᵢ and cannot change the problem's character.
 */
export function writeStart(
  out: Float64Array,
  x0: Float64Array,
  widths: Float64Array,
  rng: Pcg32 | null,
  name: string,
): void {
  if (out.length !== x0.length) {
    throw new Error(
      `problem "${name}": start(out) needs out of length ${x0.length} (the dimension), got ${out.length}`,
    );
  }
  out.set(x0);
  if (rng === null) return;
  for (let i = 0; i < out.length; i++) out[i] += widths[i] * (2 * rng.nextFloat() - 1);
}

/** What a deterministic problem supplies; `deterministicInstance` turns it into a `ProblemInstance`. */
export interface DeterministicSpec {
  readonly name: string;
  readonly key: string;
  readonly x0: Float64Array;
  /** Half-widths of the seeded start perturbation (see `writeStart`). */
  readonly widths: Float64Array;
  readonly fStar: number;
  readonly fStarKind: FStarKind;
  readonly xStar: Float64Array | null;
  /** f(x), writing ∇f(x) into `grad`. Must not allocate. */
  readonly fg: (x: Float64Array, grad: Float64Array) => number;
  /** f(x) alone; when absent, `fg` is called with a scratch gradient buffer made once. */
  readonly f?: (x: Float64Array) => number;
}

/** A deterministic `ProblemInstance` (no noise: `evaluate` and `objective` agree). */
export function deterministicInstance(spec: DeterministicSpec): ProblemInstance {
  const { fg, x0, widths, name } = spec;
  const scratch = new Float64Array(x0.length);
  const f = spec.f ?? ((x: Float64Array) => fg(x, scratch));
  return {
    key: spec.key,
    dim: x0.length,
    fStar: spec.fStar,
    fStarKind: spec.fStarKind,
    xStar: spec.xStar,
    stochastic: false,
    evaluate: fg,
    objective: f,
    start: (out, rng) => writeStart(out, x0, widths, rng, name),
  };
}

/**
 * n values log-spaced from `lo` to `hi` inclusive: lo·(hi/lo)^(i/(n−1)); a single value `lo` when
 * n = 1. The end points are exact.
 */
export function logSpaced(n: number, lo: number, hi: number): Float64Array {
  const out = new Float64Array(n);
  if (n === 1) {
    out[0] = lo;
    return out;
  }
  const ratio = hi / lo;
  for (let i = 0; i < n; i++) out[i] = lo * Math.pow(ratio, i / (n - 1));
  out[n - 1] = hi;
  return out;
}

/**
 * A seeded n×n orthogonal matrix Q (row-major; rows orthonormal): Gram–Schmidt QR of a matrix of
 * independent N(0, 1) draws taken row by row from `rng`, each row orthogonalised twice against the
 * previous ones (classical Gram–Schmidt with one reorthogonalisation, "twice is enough": Giraud,
 * Langou, Rozložník & van den Eshof 2005, Numer. Math. 101:87–100) and then normalised. Because
 * Gram–Schmidt makes R's diagonal positive, Q is Haar-distributed (Mezzadri 2007, "How to generate
 * random matrices from the classical compact groups", Notices AMS 54(5):592–604,
 * arXiv:math-ph/0609050). A row that collapses (probability zero) is redrawn. Cost O(n³), once.
 */
export function orthogonalMatrix(rng: Pcg32, n: number): Float64Array {
  const q = new Float64Array(n * n);
  const v = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    for (;;) {
      for (let k = 0; k < n; k++) v[k] = rng.nextNormal();
      const before = norm2(v);
      for (let pass = 0; pass < 2; pass++) {
        for (let j = 0; j < i; j++) {
          let dot = 0;
          for (let k = 0; k < n; k++) dot += q[j * n + k] * v[k];
          for (let k = 0; k < n; k++) v[k] -= dot * q[j * n + k];
        }
      }
      const after = norm2(v);
      if (after > 1e-8 * before) {
        for (let k = 0; k < n; k++) q[i * n + k] = v[k] / after;
        break;
      }
    }
  }
  return q;
}

/** Euclidean norm. */
export function norm2(v: ArrayLike<number>): number {
  let s = 0;
  for (let i = 0; i < v.length; i++) s += v[i] * v[i];
  return Math.sqrt(s);
}

/**
 * In-place Cholesky factorisation A = L·Lᵀ of a symmetric positive definite n×n matrix (row-major;
 * only the lower triangle is read; L overwrites it, the strict upper triangle is zeroed). Returns
 * false when a pivot is not positive (A not numerically positive definite). Golub & Van Loan,
 * Matrix Computations, 4th ed. (2013), Algorithm 4.2.1. Cost n³/3 flops.
 */
export function cholesky(a: Float64Array, n: number): boolean {
  for (let j = 0; j < n; j++) {
    let d = a[j * n + j];
    for (let k = 0; k < j; k++) d -= a[j * n + k] * a[j * n + k];
    if (!(d > 0)) return false;
    const ljj = Math.sqrt(d);
    a[j * n + j] = ljj;
    for (let i = j + 1; i < n; i++) {
      let s = a[i * n + j];
      for (let k = 0; k < j; k++) s -= a[i * n + k] * a[j * n + k];
      a[i * n + j] = s / ljj;
    }
    for (let k = j + 1; k < n; k++) a[j * n + k] = 0;
  }
  return true;
}

/** Solves L·Lᵀ·x = b with the factor from `cholesky`; `b` is overwritten by x. Cost 2n² flops. */
export function choleskySolve(l: Float64Array, n: number, b: Float64Array): void {
  for (let i = 0; i < n; i++) {
    let s = b[i];
    for (let k = 0; k < i; k++) s -= l[i * n + k] * b[k];
    b[i] = s / l[i * n + i];
  }
  for (let i = n - 1; i >= 0; i--) {
    let s = b[i];
    for (let k = i + 1; k < n; k++) s -= l[k * n + i] * b[k];
    b[i] = s / l[i * n + i];
  }
}

/** Logistic function 1/(1 + e^(−z)) without overflow. */
export function sigmoid(z: number): number {
  if (z >= 0) return 1 / (1 + Math.exp(-z));
  const e = Math.exp(z);
  return e / (1 + e);
}

/**
 * Returns the cached value for `key`, building and storing it on first use. Used for a problem's
 * fixed structure (rotation, data set, f*) so that it is built once per parameter set, not per run.
 * Cached values are shared between instances and must be treated as read-only.
 */
export function cached<T>(cache: Map<string, T>, key: string, build: () => T): T {
  let value = cache.get(key);
  if (value === undefined) {
    value = build();
    cache.set(key, value);
  }
  return value;
}
