/**
 * Gradient descent (SGD when the gradients are stochastic estimates) — the baseline every other
 * reference optimizer is measured against.
 *
 *   g ← ∇f(x) + λ·x        (λ = weightDecay: coupled L2 regularisation, off by default)
 *   x ← x − η·g             (η = lr)
 *
 * Source: the stochastic version is Robbins, H. & Monro, S. (1951), "A Stochastic Approximation
 * Method", Annals of Mathematical Statistics 22(3):400–407, doi:10.1214/aoms/1177729586 (free at
 * https://projecteuclid.org/euclid.aoms/1177729586). With exact gradients it is Cauchy's steepest
 * descent.
 *
 * Hyperparameters: lr = 0.01 (common practice; no paper sets a default), weightDecay = 0.
 * Cost per step: one gradient evaluation at x itself (the harness reuses its loss value), 3·dim flops,
 * no memory beyond one gradient buffer.
 */
import type { Hyper, Oracle, OptimizerState } from "../core/types.js";
import {
  checkIterate,
  checkLearningRate,
  defineOptimizer,
  type HyperSpecs,
  type ReferenceOptimizer,
} from "./hyper.js";
import { checkState, type StateLayout } from "./state.js";

export const SGD_HYPER: HyperSpecs = {
  lr: {
    type: "number",
    exclusiveMinimum: 0,
    default: 0.01,
    description: "Learning rate η (step size). Default 0.01: common practice, no paper sets one.",
  },
  weightDecay: {
    type: "number",
    minimum: 0,
    default: 0,
    description: "Coupled L2 coefficient λ: λ·x is added to the gradient.",
  },
};

const LAYOUT: StateLayout = { step: "count", lr: "lr" };

class Sgd implements ReferenceOptimizer {
  private readonly grad: Float64Array;
  private lr: number;
  private readonly weightDecay: number;
  private t = 0;

  constructor(
    hyper: Hyper,
    private readonly dim: number,
  ) {
    this.grad = new Float64Array(dim);
    this.lr = hyper.lr as number;
    this.weightDecay = hyper.weightDecay as number;
  }

  step(x: Float64Array, oracle: Oracle): void {
    checkIterate(x, this.dim, "sgd");
    const g = this.grad;
    oracle.evaluate(x, g);
    const lr = this.lr;
    const wd = this.weightDecay;
    for (let i = 0; i < this.dim; i++) x[i] -= lr * (g[i] + wd * x[i]);
    this.t++;
  }

  exportState(): OptimizerState {
    return { step: this.t, lr: this.lr };
  }

  importState(state: OptimizerState): void {
    const s = checkState(state, LAYOUT, this.dim, "importState sgd");
    this.t = s.step as number;
    this.lr = s.lr as number;
  }

  setLearningRate(lr: number): void {
    this.lr = checkLearningRate(lr, "setLearningRate sgd");
  }
}

export const sgd = defineOptimizer({
  name: "sgd",
  title: "Gradient descent / SGD (Robbins & Monro 1951, Ann. Math. Statist. 22(3):400–407)",
  hyperSpecs: SGD_HYPER,
  build: (hyper, dim) => new Sgd(hyper, dim),
});
