/**
 * Nesterov's accelerated gradient with the learning rate outside the velocity — the form many frameworks
 * write, kept here so the conformance check can recognise it (src/optimizers/nesterov.ts implements the
 * learning rate inside the velocity only).
 *
 *   form "lookahead" (x holds w):          g ← ∇f(w − η·γ·b) + λ·(w − η·γ·b);  b ← γ·b + g;  w ← w − η·b
 *   form "stored-lookahead" (x holds u):   g ← ∇f(u) + λ·u;  b ← γ·b + g;  u ← u − η·(g + γ·b)
 *
 * (γ = momentum, η = lr, λ = weightDecay.) With v = η·b these are the two forms of ./nesterov.ts while η
 * is constant; when η changes, the whole accumulated buffer b is rescaled by the new η at once, exactly as
 * for heavy ball's "lr-outside" form. The stored form is the reformulation of Bengio, Boulanger-Lewandowski
 * & Pascanu (2013), "Advances in optimizing recurrent networks", ICASSP, §3.5, arXiv:1212.0901, written
 * with the buffer b = v/η (our own rewriting; the frameworks' form is common practice).
 *
 * Hyperparameters: lr = 0.01, momentum = 0.9 (common practice), form = "stored-lookahead", weightDecay = 0.
 * Cost per step: one gradient evaluation, about 7·dim flops; memory: gradient, buffer and (lookahead form)
 * look-ahead buffers.
 */
import type { Hyper, Oracle, OptimizerState } from "../core/types.js";
import {
  checkIterate,
  checkLearningRate,
  defineOptimizer,
  type HyperSpecs,
  type ReferenceOptimizer,
} from "../optimizers/hyper.js";
import { checkState, loadVector, saveVector, type StateLayout } from "../optimizers/state.js";

export const NESTEROV_LR_OUTSIDE_HYPER: HyperSpecs = {
  lr: {
    type: "number",
    exclusiveMinimum: 0,
    default: 0.01,
    description: "Learning rate η (common practice).",
  },
  momentum: {
    type: "number",
    minimum: 0,
    exclusiveMaximum: 1,
    default: 0.9,
    description: "Momentum coefficient γ in [0, 1) (common practice).",
  },
  form: {
    type: "choice",
    choices: ["lookahead", "stored-lookahead"],
    default: "stored-lookahead",
    description:
      '"lookahead": x holds w; "stored-lookahead": x holds the look-ahead point (as frameworks write it).',
  },
  weightDecay: { type: "number", minimum: 0, default: 0, description: "Coupled L2 coefficient λ." },
};

const LAYOUT: StateLayout = { step: "count", lr: "lr", buffer: "vector" };

class NesterovLrOutside implements ReferenceOptimizer {
  private readonly grad: Float64Array;
  private readonly buffer: Float64Array;
  private readonly ahead: Float64Array;
  private lr: number;
  private readonly gamma: number;
  private readonly weightDecay: number;
  private readonly stored: boolean;
  private t = 0;

  constructor(
    hyper: Hyper,
    private readonly dim: number,
  ) {
    this.stored = hyper.form === "stored-lookahead";
    this.grad = new Float64Array(dim);
    this.buffer = new Float64Array(dim);
    this.ahead = new Float64Array(this.stored ? 0 : dim);
    this.lr = hyper.lr as number;
    this.gamma = hyper.momentum as number;
    this.weightDecay = hyper.weightDecay as number;
  }

  step(x: Float64Array, oracle: Oracle): void {
    checkIterate(x, this.dim, "nesterov-lr-outside");
    const g = this.grad;
    const b = this.buffer;
    const lr = this.lr;
    const gamma = this.gamma;
    const wd = this.weightDecay;
    if (this.stored) {
      oracle.evaluate(x, g);
      for (let i = 0; i < this.dim; i++) {
        const gi = g[i] + wd * x[i];
        const bi = gamma * b[i] + gi;
        b[i] = bi;
        x[i] -= lr * (gi + gamma * bi);
      }
    } else {
      const a = this.ahead;
      for (let i = 0; i < this.dim; i++) a[i] = x[i] - lr * gamma * b[i];
      oracle.evaluate(a, g);
      for (let i = 0; i < this.dim; i++) {
        const bi = gamma * b[i] + (g[i] + wd * a[i]);
        b[i] = bi;
        x[i] -= lr * bi;
      }
    }
    this.t++;
  }

  exportState(): OptimizerState {
    return { step: this.t, lr: this.lr, buffer: saveVector(this.buffer) };
  }

  importState(state: OptimizerState): void {
    const s = checkState(state, LAYOUT, this.dim, "importState nesterov-lr-outside");
    this.t = s.step as number;
    this.lr = s.lr as number;
    loadVector(s, "buffer", this.buffer);
  }

  setLearningRate(lr: number): void {
    this.lr = checkLearningRate(lr, "setLearningRate nesterov-lr-outside");
  }
}

export const nesterovLrOutside = defineOptimizer({
  name: "nesterov-lr-outside",
  title: "Nesterov's accelerated gradient, learning rate outside the velocity (common practice)",
  hyperSpecs: NESTEROV_LR_OUTSIDE_HYPER,
  build: (hyper, dim) => new NesterovLrOutside(hyper, dim),
});
