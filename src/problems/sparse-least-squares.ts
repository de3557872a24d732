/**
 * Sparse least squares with rare features.
 *
 * What it is for: the case per-parameter learning rates are for. Feature j occurs in a fraction pⱼ of
 * the rows, decaying from 0.5 to 0.005, so the curvature of coordinate j is roughly proportional to
 * pⱼ: a single global step suits the frequent features and starves the rare ones, while Adagrad's
 * per-coordinate steps (Duchi, Hazan & Singer 2011, JMLR 12:2121–2159) equalise them.
 *
 * f(x) = (1/(2m)) ‖A x − b‖²,  ∇f = (1/m) Aᵀ(A x − b),  b = A x_true,  so f* = 0 at x* = x_true.
 * Data (fixed by the structure seed, not the run), drawn from
 * `structureRng("sparse-least-squares[m=…,n=…]", seed)` in this order: for each row r = 0..m−1 and
 * feature j = 0..n−1, one uniform u (entry present when u < pⱼ, pⱼ = 0.5·0.01^(j/(n−1))) and, when
 * present, its value N(0, 1); then x_true ~ N(0, I). Row j < n always contains feature j (an
 * "anchor" entry), so every column is nonzero and A has full column rank with probability one (the
 * first n rows have a nonzero diagonal and continuous entries); x* is then unique. Stored in
 * compressed sparse rows.
 * Mini-batches (param `batch` > 0): `batch` rows drawn uniformly with replacement from the run's noise
 * stream (one `nextBelow(m)` each); evaluate returns (1/(2B))Σ rᵣ² and (1/B)Σ aᵣ rᵣ, unbiased
 * estimates of f and ∇f. `batch = 0` (default) is the full batch and deterministic.
 * Standard start x0 = 0.
 *
 * Source: constructed here (common practice), after the sparse-feature setting of Duchi, Hazan &
 * Singer (2011), "Adaptive subgradient methods for online learning and stochastic optimization",
 * JMLR 12:2121–2159 (https://jmlr.org/papers/v12/duchi11a.html).
 * Start perturbation: ±0.01 absolute, uniform per coordinate.
 * Cost: O(nnz) per full-batch evaluation (about m·Σpⱼ ≈ 0.1·m·n nonzeros with the defaults),
 * O(batch · nnz per row) per mini-batch.
 */
import type { Pcg32 } from "../core/rng.js";
import { structureRng } from "../core/rng.js";
import type { ProblemDefinition, ProblemInstance, ProblemParams, ProblemRunContext } from "../core/types.js";
import { prepare, structureKey } from "./params.js";
import { cached, writeStart } from "./util.js";

/** Compressed sparse rows of A with consistent targets b = A x_true. */
export interface SparseData {
  readonly m: number;
  readonly n: number;
  /** Row r's entries are at rowPtr[r] .. rowPtr[r+1]−1 of `col` and `val`. */
  readonly rowPtr: Int32Array;
  readonly col: Int32Array;
  readonly val: Float64Array;
  readonly b: Float64Array;
  readonly xTrue: Float64Array;
  /** pⱼ, the probability that feature j occurs in a row (anchors aside). */
  readonly frequency: Float64Array;
}

const DATA = new Map<string, SparseData>();

function buildData(rng: Pcg32, m: number, n: number): SparseData {
  const frequency = new Float64Array(n);
  for (let j = 0; j < n; j++) frequency[j] = n === 1 ? 0.5 : 0.5 * Math.pow(0.01, j / (n - 1));
  const rowPtr = new Int32Array(m + 1);
  const cols: number[] = [];
  const vals: number[] = [];
  for (let r = 0; r < m; r++) {
    for (let j = 0; j < n; j++) {
      const present = rng.nextFloat() < frequency[j];
      if (present) {
        cols.push(j);
        vals.push(rng.nextNormal());
      } else if (r === j) {
        cols.push(j);
        vals.push(rng.nextNormal());
      }
    }
    rowPtr[r + 1] = cols.length;
  }
  const col = Int32Array.from(cols);
  const val = Float64Array.from(vals);
  const xTrue = new Float64Array(n);
  for (let j = 0; j < n; j++) xTrue[j] = rng.nextNormal();
  const b = new Float64Array(m);
  for (let r = 0; r < m; r++) {
    let s = 0;
    for (let k = rowPtr[r]; k < rowPtr[r + 1]; k++) s += val[k] * xTrue[col[k]];
    b[r] = s;
  }
  return { m, n, rowPtr, col, val, b, xTrue, frequency };
}

export const sparseLeastSquares: ProblemDefinition = {
  name: "sparse-least-squares",
  title: "Sparse least squares with rare features (frequencies 0.5 down to 0.005)",
  tags: ["convex", "sparse", "per-parameter-scaling", "least-squares"],
  source:
    'Constructed here (common practice), after the sparse-feature setting of Duchi, Hazan & Singer (2011), "Adaptive subgradient methods for online learning and stochastic optimization", JMLR 12:2121–2159, https://jmlr.org/papers/v12/duchi11a.html',
  fStarNote:
    "f* = 0 at x* = x_true by construction (consistent targets b = A·x_true; A has full column rank).",
  params: {
    n: { default: 20, min: 1, max: 10000, integer: true, description: "number of features (dimension)" },
    m: { default: 300, min: 1, max: 1000000, integer: true, description: "number of rows (must be ≥ n)" },
    batch: {
      default: 0,
      min: 0,
      max: 1000000,
      integer: true,
      description: "mini-batch size; 0 = full batch",
    },
    seed: {
      default: 0,
      min: 0,
      max: 4294967295,
      integer: true,
      description: "structure seed of the data set",
    },
  },
  create: (params, ctx) => createSparseLeastSquares(params, ctx),
};

/** The data set of a parameter set (shared, read-only). */
export function sparseLeastSquaresData(params: ProblemParams): SparseData {
  const { p } = prepare(sparseLeastSquares, params);
  if (p.m < p.n) {
    throw new Error(
      `problem "sparse-least-squares": params.m must be ≥ params.n (${p.n}) so that x* is unique, got ${p.m}`,
    );
  }
  const sKey = structureKey(sparseLeastSquares.name, p, ["m", "n"]);
  return cached(DATA, `${sKey}#${p.seed}`, () => buildData(structureRng(sKey, p.seed), p.m, p.n));
}

function createSparseLeastSquares(params: ProblemParams, ctx: ProblemRunContext): ProblemInstance {
  const { p, key } = prepare(sparseLeastSquares, params);
  const data = sparseLeastSquaresData(p);
  const { m, n, rowPtr, col, val, b } = data;
  const batch = p.batch;
  const noise = ctx.noise;
  const x0 = new Float64Array(n);
  const widths = new Float64Array(n).fill(0.01);

  const objective = (x: Float64Array): number => {
    let f = 0;
    for (let r = 0; r < m; r++) {
      let s = 0;
      for (let k = rowPtr[r]; k < rowPtr[r + 1]; k++) s += val[k] * x[col[k]];
      s -= b[r];
      f += s * s;
    }
    return f / (2 * m);
  };
  // The per-row work is written out inside the loop (no helper returning a double), so that no call in
  // the hot loop depends on V8 inlining it to avoid boxing its result.
  const evaluate = (x: Float64Array, g: Float64Array): number => {
    g.fill(0);
    const count = batch > 0 ? batch : m;
    const w = 1 / count;
    let f = 0;
    for (let t = 0; t < count; t++) {
      const r = batch > 0 ? noise.nextBelow(m) : t;
      const lo = rowPtr[r];
      const hi = rowPtr[r + 1];
      let s = 0;
      for (let k = lo; k < hi; k++) s += val[k] * x[col[k]];
      s -= b[r]; // same order as b was built: exactly 0 at x_true
      f += s * s;
      const ws = w * s;
      for (let k = lo; k < hi; k++) g[col[k]] += ws * val[k];
    }
    return f / (2 * count);
  };
  return {
    key,
    dim: n,
    fStar: 0,
    fStarKind: "computed",
    xStar: Float64Array.from(data.xTrue),
    stochastic: batch > 0,
    evaluate,
    objective,
    start: (out: Float64Array, rng: Pcg32 | null) =>
      writeStart(out, x0, widths, rng, sparseLeastSquares.name),
  };
}
