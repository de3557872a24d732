/**
 * RMSProp (root-mean-square propagation) — gradient descent divided per coordinate by a running root
 * mean square of recent gradients.
 *
 *   g ← ∇f(x) + λ·x                     (λ = weightDecay, coupled L2, off by default)
 *   E ← ρ·E + (1 − ρ)·g²                (E starts at 0)
 *   epsPlacement "outside": x ← x − η·g / (√E + ε)
 *   epsPlacement "inside":  x ← x − η·g / √(E + ε)
 *
 * There is no bias correction, so the first step is η·g/(√(1−ρ)·|g| + ε), i.e. η·sign(g)/√(1−ρ) for
 * ε → 0 (3.162·η for ρ = 0.9). The two placements differ noticeably when ε is not small against E;
 * widely used frameworks have used both, and moving ε is a known silent regression.
 *
 * Sources: Graves, A. (2013), "Generating Sequences With Recurrent Neural Networks", §4,
 * https://arxiv.org/abs/1308.0850 (a centred variant with momentum and ε inside the root; its
 * eq. (38)–(41), equation numbers from memory); Ruder, S. (2016),
 * "An overview of gradient descent optimization algorithms", §4.5, https://arxiv.org/abs/1609.04747
 * (the plain form above, written with ε inside the root, and the suggested ρ = 0.9, η = 0.001).
 *
 * Hyperparameters: lr = 0.001 and rho = 0.9 (Ruder 2016 §4.5), eps = 1e−8 and
 * epsPlacement = "outside" (common practice), weightDecay = 0.
 * Cost per step: one gradient evaluation at x itself (the harness reuses its loss value), one square
 * root and about 8 flops per coordinate; memory: gradient and mean-square buffers.
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

export const RMSPROP_HYPER: HyperSpecs = {
  lr: {
    type: "number",
    exclusiveMinimum: 0,
    default: 0.001,
    description: "Learning rate η. Default 0.001 as suggested in Ruder 2016, §4.5.",
  },
  rho: {
    type: "number",
    minimum: 0,
    exclusiveMaximum: 1,
    default: 0.9,
    description:
      "Decay ρ of the running mean of g², in [0, 1). Default 0.9 as suggested in Ruder 2016, §4.5.",
  },
  eps: {
    type: "number",
    minimum: 0,
    default: 1e-8,
    description: "ε in the denominator. Default 1e−8: common practice.",
  },
  epsPlacement: {
    type: "choice",
    choices: ["outside", "inside"],
    default: "outside",
    description:
      '"outside": η·g/(√E + ε) (common practice). "inside": η·g/√(E + ε) (Graves 2013; Ruder 2016).',
  },
  weightDecay: {
    type: "number",
    minimum: 0,
    default: 0,
    description: "Coupled L2 coefficient λ: λ·x is added to the gradient.",
  },
};

const LAYOUT: StateLayout = { step: "count", lr: "lr", meanSquare: "vector" };

class RmsProp implements ReferenceOptimizer {
  private readonly grad: Float64Array;
  private readonly meanSquare: Float64Array;
  private lr: number;
  private readonly rho: number;
  private readonly eps: number;
  private readonly inside: boolean;
  private readonly weightDecay: number;
  private t = 0;

  constructor(
    hyper: Hyper,
    private readonly dim: number,
  ) {
    this.grad = new Float64Array(dim);
    this.meanSquare = new Float64Array(dim);
    this.lr = hyper.lr as number;
    this.rho = hyper.rho as number;
    this.eps = hyper.eps as number;
    this.inside = hyper.epsPlacement === "inside";
    this.weightDecay = hyper.weightDecay as number;
  }

  step(x: Float64Array, oracle: Oracle): void {
    checkIterate(x, this.dim, "rmsprop");
    const g = this.grad;
    const E = this.meanSquare;
    oracle.evaluate(x, g);
    const lr = this.lr;
    const rho = this.rho;
    const eps = this.eps;
    const wd = this.weightDecay;
    for (let i = 0; i < this.dim; i++) {
      const gi = g[i] + wd * x[i];
      const Ei = rho * E[i] + (1 - rho) * gi * gi;
      E[i] = Ei;
      const denom = this.inside ? Math.sqrt(Ei + eps) : Math.sqrt(Ei) + eps;
      x[i] -= (lr * gi) / denom;
    }
    this.t++;
  }

  exportState(): OptimizerState {
    return { step: this.t, lr: this.lr, meanSquare: saveVector(this.meanSquare) };
  }

  importState(state: OptimizerState): void {
    const s = checkState(state, LAYOUT, this.dim, "importState rmsprop");
    this.t = s.step as number;
    this.lr = s.lr as number;
    loadVector(s, "meanSquare", this.meanSquare);
  }

  setLearningRate(lr: number): void {
    this.lr = checkLearningRate(lr, "setLearningRate rmsprop");
  }
}

export const rmsprop = defineOptimizer({
  name: "rmsprop",
  title: "RMSProp (described in Graves 2013, arXiv:1308.0850 §4; Ruder 2016, arXiv:1609.04747 §4.5)",
  hyperSpecs: RMSPROP_HYPER,
  build: (hyper, dim) => new RmsProp(hyper, dim),
});
