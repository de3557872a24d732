/**
 * Heavy-ball momentum (classical momentum) — gradient descent with a velocity that accumulates past
 * gradients; the reference for both ways users write it.
 *
 *   g ← ∇f(w) + λ·w                       (λ = weightDecay, coupled L2, off by default)
 *   form "lr-inside":   v ← γ·v + η·g;  w ← w − v
 *   form "lr-outside":  b ← γ·b + g;    w ← w − η·b
 *
 * (γ = momentum, η = lr.) For a constant η the two forms give the same trajectory, since v = η·b
 * throughout; they differ once η changes mid-run (`setLearningRate`): "lr-inside" keeps the velocity
 * built with the old rate, "lr-outside" rescales the whole accumulated buffer by the new rate at once.
 *
 * Sources: Polyak, B. T. (1964), "Some methods of speeding up the convergence of iteration methods",
 * USSR Computational Mathematics and Mathematical Physics 4(5):1–17, doi:10.1016/0041-5553(64)90137-5.
 * "lr-inside" is eq. (1)–(2) of Sutskever, Martens, Dahl & Hinton (2013), "On the importance of
 * initialization and momentum in deep learning", ICML, PMLR 28(3):1139–1147,
 * https://proceedings.mlr.press/v28/sutskever13.html (they write v ← μv − ε∇f, θ ← θ + v: the same
 * update with the sign of v flipped).
 *
 * Hyperparameters: lr = 0.01 and momentum = 0.9 (common practice; no paper sets defaults),
 * form = "lr-inside", weightDecay = 0.
 * Cost per step: one gradient evaluation at w itself (the harness reuses its loss value), about
 * 5·dim flops; memory: gradient and velocity buffers (2·dim doubles).
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

export const MOMENTUM_HYPER: HyperSpecs = {
  lr: {
    type: "number",
    exclusiveMinimum: 0,
    default: 0.01,
    description: "Learning rate η. Default 0.01: common practice, no paper sets one.",
  },
  momentum: {
    type: "number",
    minimum: 0,
    exclusiveMaximum: 1,
    default: 0.9,
    description: "Momentum coefficient γ in [0, 1). Default 0.9: common practice.",
  },
  form: {
    type: "choice",
    choices: ["lr-inside", "lr-outside"],
    default: "lr-inside",
    description:
      '"lr-inside": v = γv + ηg, w −= v (Polyak 1964; Sutskever et al. 2013 eq. 1–2). ' +
      '"lr-outside": b = γb + g, w −= η·b. Same trajectory for a constant lr; they differ after an lr change.',
  },
  weightDecay: {
    type: "number",
    minimum: 0,
    default: 0,
    description: "Coupled L2 coefficient λ: λ·w is added to the gradient.",
  },
};

class Momentum implements ReferenceOptimizer {
  private readonly grad: Float64Array;
  /** v (lr-inside) or b (lr-outside). */
  private readonly buf: Float64Array;
  private lr: number;
  private readonly gamma: number;
  private readonly weightDecay: number;
  private readonly lrInside: boolean;
  private readonly layout: StateLayout;
  private readonly key: string;
  private t = 0;

  constructor(
    hyper: Hyper,
    private readonly dim: number,
  ) {
    this.grad = new Float64Array(dim);
    this.buf = new Float64Array(dim);
    this.lr = hyper.lr as number;
    this.gamma = hyper.momentum as number;
    this.weightDecay = hyper.weightDecay as number;
    this.lrInside = hyper.form === "lr-inside";
    this.key = this.lrInside ? "velocity" : "buffer";
    this.layout = { step: "count", lr: "lr", [this.key]: "vector" };
  }

  step(w: Float64Array, oracle: Oracle): void {
    checkIterate(w, this.dim, "momentum");
    const g = this.grad;
    const b = this.buf;
    oracle.evaluate(w, g);
    const lr = this.lr;
    const gamma = this.gamma;
    const wd = this.weightDecay;
    if (this.lrInside) {
      for (let i = 0; i < this.dim; i++) {
        const v = gamma * b[i] + lr * (g[i] + wd * w[i]);
        b[i] = v;
        w[i] -= v;
      }
    } else {
      for (let i = 0; i < this.dim; i++) {
        const bi = gamma * b[i] + (g[i] + wd * w[i]);
        b[i] = bi;
        w[i] -= lr * bi;
      }
    }
    this.t++;
  }

  exportState(): OptimizerState {
    return { step: this.t, lr: this.lr, [this.key]: saveVector(this.buf) };
  }

  importState(state: OptimizerState): void {
    const s = checkState(state, this.layout, this.dim, "importState momentum");
    this.t = s.step as number;
    this.lr = s.lr as number;
    loadVector(s, this.key, this.buf);
  }

  setLearningRate(lr: number): void {
    this.lr = checkLearningRate(lr, "setLearningRate momentum");
  }
}

export const momentum = defineOptimizer({
  name: "momentum",
  title: "Heavy-ball momentum (Polyak 1964, USSR Comput. Math. Math. Phys. 4(5):1–17)",
  hyperSpecs: MOMENTUM_HYPER,
  build: (hyper, dim) => new Momentum(hyper, dim),
});
