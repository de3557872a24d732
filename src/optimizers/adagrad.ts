/**
 * Adagrad (adaptive subgradient method, diagonal version) — per-coordinate step sizes that shrink
 * with the sum of the squared gradients seen so far.
 *
 *   g ← ∇f(x) + λ·x                 (λ = weightDecay, coupled L2, off by default)
 *   G ← G + g²                      (per coordinate; G starts at initialAccumulator)
 *   x ← x − η·g / (δ + √G)          (η = lr, δ = eps)
 *
 * Source: Duchi, J., Hazan, E. & Singer, Y. (2011), "Adaptive Subgradient Methods for Online Learning
 * and Stochastic Optimization", JMLR 12:2121–2159, https://jmlr.org/papers/v12/duchi11a.html — the
 * diagonal update with δ added outside the square root.
 *
 * With a constant gradient the k-th step is η/√k per coordinate (for δ → 0), so after n steps the
 * displacement is −η·Σ_{k≤n} k^(−1/2).
 *
 * Hyperparameters: lr = 0.01, eps = 1e−10, initialAccumulator = 0 (common practice; the paper leaves η
 * and δ free), weightDecay = 0. With eps = 0 and initialAccumulator = 0 a zero gradient coordinate
 * gives 0/0 = NaN, which the harness reports as divergence.
 * Cost per step: one gradient evaluation at x itself (the harness reuses its loss value), one square
 * root and about 6 flops per coordinate; memory: gradient and accumulator buffers.
 */
import type { Hyper, Oracle, OptimizerState } from "../core/types.js";
import {
  checkIterate,
  checkLearningRate,
  defineOptimizer,
  type HyperSpecs,
  type ReferenceOptimizer,
} from "./hyper.js";
import { checkState, loadVector, saveVector, type StateLayout } from "./state.js";

export const ADAGRAD_HYPER: HyperSpecs = {
  lr: {
    type: "number",
    exclusiveMinimum: 0,
    default: 0.01,
    description: "Learning rate η. Default 0.01: common practice, the paper leaves it free.",
  },
  eps: {
    type: "number",
    minimum: 0,
    default: 1e-10,
    description: "δ added to √G (outside the square root). Default 1e−10: common practice.",
  },
  initialAccumulator: {
    type: "number",
    minimum: 0,
    default: 0,
    description: "Starting value of the per-coordinate sum of squared gradients G.",
  },
  weightDecay: {
    type: "number",
    minimum: 0,
    default: 0,
    description: "Coupled L2 coefficient λ: λ·x is added to the gradient.",
  },
};

const LAYOUT: StateLayout = { step: "count", lr: "lr", sumSquares: "vector" };

class Adagrad implements ReferenceOptimizer {
  private readonly grad: Float64Array;
  private readonly sumSquares: Float64Array;
  private lr: number;
  private readonly eps: number;
  private readonly weightDecay: number;
  private t = 0;

  constructor(
    hyper: Hyper,
    private readonly dim: number,
  ) {
    this.grad = new Float64Array(dim);
    this.sumSquares = new Float64Array(dim).fill(hyper.initialAccumulator as number);
    this.lr = hyper.lr as number;
    this.eps = hyper.eps as number;
    this.weightDecay = hyper.weightDecay as number;
  }

  step(x: Float64Array, oracle: Oracle): void {
    checkIterate(x, this.dim, "adagrad");
    const g = this.grad;
    const G = this.sumSquares;
    oracle.evaluate(x, g);
    const lr = this.lr;
    const eps = this.eps;
    const wd = this.weightDecay;
    for (let i = 0; i < this.dim; i++) {
      const gi = g[i] + wd * x[i];
      const Gi = G[i] + gi * gi;
      G[i] = Gi;
      x[i] -= (lr * gi) / (eps + Math.sqrt(Gi));
    }
    this.t++;
  }

  exportState(): OptimizerState {
    return { step: this.t, lr: this.lr, sumSquares: saveVector(this.sumSquares) };
  }

  importState(state: OptimizerState): void {
    const s = checkState(state, LAYOUT, this.dim, "importState adagrad");
    this.t = s.step as number;
    this.lr = s.lr as number;
    loadVector(s, "sumSquares", this.sumSquares);
  }

  setLearningRate(lr: number): void {
    this.lr = checkLearningRate(lr, "setLearningRate adagrad");
  }
}

export const adagrad = defineOptimizer({
  name: "adagrad",
  title: "Adagrad, diagonal (Duchi, Hazan & Singer 2011, JMLR 12:2121–2159)",
  hyperSpecs: ADAGRAD_HYPER,
  build: (hyper, dim) => new Adagrad(hyper, dim),
});
