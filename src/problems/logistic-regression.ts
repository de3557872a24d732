/**
 * L2-regularised logistic regression on seeded synthetic data.
 *
 * What it is for: the standard smooth, strongly convex machine-learning loss, trained with
 * mini-batches (stochastic gradients) by default; exercises weight decay vs L2 handling, noise and
 * the usual learning-rate range of ML optimizers on a problem whose exact minimum is known.
 *
 * f(w) = (1/m) Σᵢ log(1 + exp(−yᵢ xᵢ·w)) + (λ/2)‖w‖²,  yᵢ ∈ {−1, +1},
 * ∇f(w) = −(1/m) Σᵢ yᵢ σ(−yᵢ xᵢ·w) xᵢ + λw,  σ(z) = 1/(1 + e^(−z)).
 * Data (fixed by the structure seed, not by the run), drawn from
 * `structureRng("logistic-regression[m=…,n=…]", seed)` in this order: X (m×n, row by row) ~ N(0, 1);
 * w_true ~ N(0, 4/n) per coordinate (so xᵢ·w_true ~ N(0, 4): labels neither separable nor random);
 * then yᵢ = +1 when uᵢ < σ(xᵢ·w_true), else −1, uᵢ uniform. λ (param `l2`) does not change the data.
 * Mini-batches (param `batch` > 0, default 20): `batch` rows drawn uniformly with replacement from the
 * run's noise stream (one `nextBelow(m)` each); evaluate returns the batch loss and gradient (the
 * regulariser included exactly), unbiased estimates of f and ∇f. `batch = 0` is the full batch.
 * Standard start w0 = 0.
 *
 * f* and x*: computed once per parameter set and cached, by Newton's method on the full-batch
 * objective (Hessian (1/m)Σ σ(zᵢ)(1 − σ(zᵢ)) xᵢxᵢᵀ + λI, Cholesky solve, step halving until f does not
 * increase), iterated until the Newton step stops changing w (‖step‖∞ ≤ 1e−15·(1 + ‖w‖∞)); it fails
 * loudly unless ‖∇f(w*)‖∞ ≤ 1e−12 then. f is strongly convex (λ > 0), so the minimiser is unique.
 *
 * Source: constructed here (common practice); the model is textbook: Bishop (2006), Pattern
 * Recognition and Machine Learning, §4.3.2 (logistic regression) and §4.3.3 (Newton/IRLS) (section
 * numbers from memory).
 * Start perturbation: ±0.01 absolute, uniform per coordinate.
 * Cost: O(m·n) per full-batch evaluation (m exponentials), O(batch·n) per mini-batch; `measureEvery`
 * is 5 because the exact objective costs a full pass (about 4 µs with the defaults).
 */
import type { Pcg32 } from "../core/rng.js";
import { structureRng } from "../core/rng.js";
import type { ProblemDefinition, ProblemInstance, ProblemParams, ProblemRunContext } from "../core/types.js";
import { prepare, structureKey } from "./params.js";
import { cached, cholesky, choleskySolve, sigmoid, writeStart } from "./util.js";

/** Features (row-major m×n) and labels ±1. */
export interface LogisticData {
  readonly m: number;
  readonly n: number;
  readonly x: Float64Array;
  readonly y: Float64Array;
}

/** The cached full-batch solution. */
export interface LogisticSolution {
  readonly w: Float64Array;
  readonly f: number;
  /** ‖∇f(w)‖∞ at the returned w. */
  readonly gradInf: number;
  readonly iterations: number;
}

const DATA = new Map<string, LogisticData>();
const SOLUTIONS = new Map<string, LogisticSolution>();

function buildData(rng: Pcg32, m: number, n: number): LogisticData {
  const x = new Float64Array(m * n);
  for (let i = 0; i < m * n; i++) x[i] = rng.nextNormal();
  const wTrue = new Float64Array(n);
  const scale = 2 / Math.sqrt(n);
  for (let j = 0; j < n; j++) wTrue[j] = scale * rng.nextNormal();
  const y = new Float64Array(m);
  for (let i = 0; i < m; i++) {
    let z = 0;
    for (let j = 0; j < n; j++) z += x[i * n + j] * wTrue[j];
    y[i] = rng.nextFloat() < sigmoid(z) ? 1 : -1;
  }
  return { m, n, x, y };
}

/** Full-batch loss and gradient (into g); no allocation. */
function fullLossGrad(data: LogisticData, l2: number, w: Float64Array, g: Float64Array | null): number {
  const { m, n, x, y } = data;
  if (g) g.fill(0);
  let loss = 0;
  for (let i = 0; i < m; i++) {
    const row = i * n;
    let z = 0;
    for (let j = 0; j < n; j++) z += x[row + j] * w[j];
    const yz = y[i] * z;
    // log(1 + e^(−yz)) = max(−yz, 0) + log1p(e^(−|yz|)) and σ(−yz) = 1/(1 + e^(yz)), both from
    // e = e^(−|yz|) without overflow; written out so that no call in the loop returns a double
    const e = Math.exp(-Math.abs(yz));
    loss += yz < 0 ? -yz + Math.log1p(e) : Math.log1p(e);
    if (g) {
      const sig = yz < 0 ? 1 / (1 + e) : e / (1 + e);
      const c = (-y[i] * sig) / m;
      for (let j = 0; j < n; j++) g[j] += c * x[row + j];
    }
  }
  let reg = 0;
  for (let j = 0; j < n; j++) {
    reg += w[j] * w[j];
    if (g) g[j] += l2 * w[j];
  }
  return loss / m + 0.5 * l2 * reg;
}

function solve(data: LogisticData, l2: number): LogisticSolution {
  const { m, n, x } = data;
  const w = new Float64Array(n);
  const g = new Float64Array(n);
  const h = new Float64Array(n * n);
  const step = new Float64Array(n);
  const trial = new Float64Array(n);
  let f = fullLossGrad(data, l2, w, g);
  let iterations = 0;
  for (; iterations < 100; iterations++) {
    h.fill(0);
    for (let i = 0; i < m; i++) {
      const row = i * n;
      let z = 0;
      for (let j = 0; j < n; j++) z += x[row + j] * w[j];
      const s = sigmoid(z);
      const c = (s * (1 - s)) / m;
      for (let j = 0; j < n; j++) for (let k = 0; k <= j; k++) h[j * n + k] += c * x[row + j] * x[row + k];
    }
    for (let j = 0; j < n; j++) h[j * n + j] += l2;
    if (!cholesky(h, n)) throw new Error("logistic-regression: Newton Hessian not positive definite");
    for (let j = 0; j < n; j++) step[j] = -g[j];
    choleskySolve(h, n, step);
    let t = 1;
    let fNew = f;
    for (let halvings = 0; halvings < 60; halvings++, t /= 2) {
      for (let j = 0; j < n; j++) trial[j] = w[j] + t * step[j];
      fNew = fullLossGrad(data, l2, trial, null);
      if (fNew <= f) break;
    }
    let stepInf = 0;
    let wInf = 0;
    for (let j = 0; j < n; j++) {
      stepInf = Math.max(stepInf, Math.abs(trial[j] - w[j]));
      wInf = Math.max(wInf, Math.abs(trial[j]));
    }
    if (fNew > f) break; // no decrease possible at this precision: w is converged
    w.set(trial);
    f = fullLossGrad(data, l2, w, g);
    if (stepInf <= 1e-15 * (1 + wInf)) break;
  }
  let gradInf = 0;
  for (let j = 0; j < n; j++) gradInf = Math.max(gradInf, Math.abs(g[j]));
  if (!(gradInf <= 1e-12)) {
    throw new Error(
      `logistic-regression: Newton solve for f* did not converge (‖∇f‖∞ = ${gradInf} after ${iterations} iterations)`,
    );
  }
  return { w, f, gradInf, iterations };
}

export const logisticRegression: ProblemDefinition = {
  name: "logistic-regression",
  title: "L2-regularised logistic regression on seeded synthetic data",
  tags: ["convex", "stochastic", "mini-batch", "machine-learning"],
  source:
    "Constructed here (common practice); model and Newton/IRLS solve: Bishop (2006), Pattern Recognition and Machine Learning, §4.3.2–4.3.3",
  fStarNote:
    "Computed once per parameter set (cached) by a damped Newton solve of the full-batch objective, converged until the step stops changing w and checked to ‖∇f(w*)‖∞ ≤ 1e−12 (src/problems/logistic-regression.ts).",
  params: {
    n: { default: 10, min: 1, max: 1000, integer: true, description: "number of features (dimension)" },
    m: { default: 128, min: 1, max: 1000000, integer: true, description: "number of examples" },
    l2: { default: 0.01, min: 1e-8, max: 1e4, description: "L2 regularisation weight λ (> 0)" },
    batch: {
      default: 20,
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
  // The exact objective is a full pass over m examples (≈ m/batch = 6 mini-batch evaluations).
  measureEvery: 5,
  create: (params, ctx) => createLogisticRegression(params, ctx),
};

/** The data set of a parameter set (shared, read-only). */
export function logisticData(params: ProblemParams): LogisticData {
  const { p } = prepare(logisticRegression, params);
  const sKey = structureKey(logisticRegression.name, p, ["m", "n"]);
  return cached(DATA, `${sKey}#${p.seed}`, () => buildData(structureRng(sKey, p.seed), p.m, p.n));
}

/** The full-batch minimiser of a parameter set (computed once, cached; shared, read-only). */
export function logisticSolution(params: ProblemParams): LogisticSolution {
  const { p } = prepare(logisticRegression, params);
  const sKey = structureKey(logisticRegression.name, p, ["m", "n"]);
  const data = logisticData(p);
  return cached(SOLUTIONS, `${sKey}#${p.seed}#${p.l2}`, () => solve(data, p.l2));
}

function createLogisticRegression(params: ProblemParams, ctx: ProblemRunContext): ProblemInstance {
  const { p, key } = prepare(logisticRegression, params);
  const data = logisticData(p);
  const solution = logisticSolution(p);
  const { m, n, x, y } = data;
  const l2 = p.l2;
  const batch = p.batch;
  const noise = ctx.noise;
  const w0 = new Float64Array(n);
  const widths = new Float64Array(n).fill(0.01);

  const evaluate =
    batch > 0
      ? (w: Float64Array, g: Float64Array): number => {
          let reg = 0;
          for (let j = 0; j < n; j++) {
            reg += w[j] * w[j];
            g[j] = l2 * w[j];
          }
          let loss = 0;
          const inv = 1 / batch;
          for (let t = 0; t < batch; t++) {
            const i = noise.nextBelow(m);
            const row = i * n;
            const yi = y[i];
            let z = 0;
            for (let j = 0; j < n; j++) z += x[row + j] * w[j];
            const yz = yi * z;
            const e = Math.exp(-Math.abs(yz));
            loss += yz < 0 ? -yz + Math.log1p(e) : Math.log1p(e);
            const c = -yi * (yz < 0 ? 1 / (1 + e) : e / (1 + e)) * inv;
            for (let j = 0; j < n; j++) g[j] += c * x[row + j];
          }
          return loss * inv + 0.5 * l2 * reg;
        }
      : (w: Float64Array, g: Float64Array): number => fullLossGrad(data, l2, w, g);

  return {
    key,
    dim: n,
    fStar: solution.f,
    fStarKind: "computed",
    xStar: Float64Array.from(solution.w),
    stochastic: batch > 0,
    evaluate,
    objective: (w: Float64Array): number => fullLossGrad(data, l2, w, null),
    start: (out, rng) => writeStart(out, w0, widths, rng, logisticRegression.name),
  };
}
