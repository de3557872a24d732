/**
 * Nesterov's accelerated gradient (NAG) in momentum form — the momentum method that takes its
 * gradient at the point the velocity is about to carry it to; the reference for both ways users
 * write it.
 *
 *   form "lookahead" (x holds w):
 *     g ← ∇f(w − γ·v) + λ·(w − γ·v)
 *     v ← γ·v + η·g;   w ← w − v
 *
 *   form "stored-lookahead" (x holds u = w − γ·v, so the gradient is taken at x itself):
 *     g ← ∇f(u) + λ·u
 *     v ← γ·v + η·g;   u ← u − (γ·v + η·g)        (v already updated)
 *
 * lrPlacement "lr-outside" keeps the buffer b = v/η instead, as many frameworks write it (common
 * practice): lookahead g ← ∇f(w − η·γ·b), b ← γ·b + g, w ← w − η·b; stored-lookahead b ← γ·b + g,
 * u ← u − η·(g + γ·b). With a constant η it is the same trajectory; when η changes, the whole
 * accumulated buffer is rescaled by the new η at once, as for heavy ball's "lr-outside" form.
 *
 * (γ = momentum, η = lr, λ = weightDecay.) Both forms are the same algorithm on shifted iterates:
 * with u_k = w_k − γ·v_k, u_{k+1} = w_{k+1} − γ·v_{k+1} = u_k + γ·v_k − (1+γ)·v_{k+1}, which is the
 * second line because v_{k+1} − γ·v_k = η·g_k. Both start with v = 0, so u_0 = w_0 = the start point,
 * and the identity holds at every step, also after an lr change.
 *
 * Sources: Nesterov, Y. (1983), "A method for solving the convex programming problem with convergence
 * rate O(1/k²)", Soviet Mathematics Doklady 27(2):372–376 (Doklady AN SSSR 269(3):543–547; journal
 * details from memory). The momentum form "lookahead" is eq. (3)–(4) of Sutskever, Martens, Dahl &
 * Hinton (2013), "On the importance of initialization and momentum in deep learning", ICML,
 * PMLR 28(3):1139–1147, https://proceedings.mlr.press/v28/sutskever13.html (with the sign of v
 * flipped). Storing the look-ahead point is the reformulation of Bengio, Boulanger-Lewandowski &
 * Pascanu (2013), "Advances in optimizing recurrent networks", ICASSP, §3.5,
 * https://arxiv.org/abs/1212.0901; the update above is our own derivation in this file's notation.
 *
 * Hyperparameters: lr = 0.01 and momentum = 0.9 (common practice; no paper sets defaults),
 * form = "lookahead", lrPlacement = "lr-inside", weightDecay = 0.
 * Cost per step: one gradient evaluation — at a separate look-ahead buffer in "lookahead" form (the
 * harness then measures f(x) itself), at x itself in "stored-lookahead" form; about 7·dim flops;
 * memory: gradient, velocity and (lookahead form) look-ahead buffers.
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

export const NESTEROV_HYPER: HyperSpecs = {
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
    choices: ["lookahead", "stored-lookahead"],
    default: "lookahead",
    description:
      '"lookahead": gradient at w − γv (Nesterov 1983; Sutskever et al. 2013 eq. 3–4). ' +
      '"stored-lookahead": the parameters hold u = w − γv and the gradient is taken there ' +
      "(Bengio, Boulanger-Lewandowski & Pascanu 2013, §3.5). Same algorithm, shifted iterates.",
  },
  lrPlacement: {
    type: "choice",
    choices: ["lr-inside", "lr-outside"],
    default: "lr-inside",
    description:
      '"lr-inside": v = γv + η·g, as in Sutskever et al. 2013 eq. 3–4. "lr-outside": a buffer b = γb + g with ' +
      "steps of η·(…), as many frameworks write it (common practice); with v = η·b the same trajectory " +
      "while η is constant, different once η changes (the whole buffer is rescaled by the new η at once).",
  },
  weightDecay: {
    type: "number",
    minimum: 0,
    default: 0,
    description: "Coupled L2 coefficient λ: λ times the point where the gradient is taken is added to it.",
  },
};

/** The state's vector means v = η·b with the learning rate inside, b without: different keys, no mix-up. */
const LAYOUT_INSIDE: StateLayout = { step: "count", lr: "lr", velocity: "vector" };
const LAYOUT_OUTSIDE: StateLayout = { step: "count", lr: "lr", buffer: "vector" };

class Nesterov implements ReferenceOptimizer {
  private readonly grad: Float64Array;
  private readonly velocity: Float64Array;
  /** w − γv in the "lookahead" form; unused (length 0) in the "stored-lookahead" form. */
  private readonly ahead: Float64Array;
  private lr: number;
  private readonly gamma: number;
  private readonly weightDecay: number;
  private readonly stored: boolean;
  private readonly lrInside: boolean;
  private t = 0;

  constructor(
    hyper: Hyper,
    private readonly dim: number,
  ) {
    this.stored = hyper.form === "stored-lookahead";
    this.lrInside = hyper.lrPlacement !== "lr-outside";
    this.grad = new Float64Array(dim);
    this.velocity = new Float64Array(dim);
    this.ahead = new Float64Array(this.stored ? 0 : dim);
    this.lr = hyper.lr as number;
    this.gamma = hyper.momentum as number;
    this.weightDecay = hyper.weightDecay as number;
  }

  step(x: Float64Array, oracle: Oracle): void {
    checkIterate(x, this.dim, "nesterov");
    const g = this.grad;
    const v = this.velocity;
    const lr = this.lr;
    const gamma = this.gamma;
    const wd = this.weightDecay;
    if (this.lrInside) {
      if (this.stored) {
        oracle.evaluate(x, g);
        for (let i = 0; i < this.dim; i++) {
          const gi = g[i] + wd * x[i];
          const vi = gamma * v[i] + lr * gi;
          v[i] = vi;
          x[i] -= gamma * vi + lr * gi;
        }
      } else {
        const a = this.ahead;
        for (let i = 0; i < this.dim; i++) a[i] = x[i] - gamma * v[i];
        oracle.evaluate(a, g);
        for (let i = 0; i < this.dim; i++) {
          const vi = gamma * v[i] + lr * (g[i] + wd * a[i]);
          v[i] = vi;
          x[i] -= vi;
        }
      }
    } else if (this.stored) {
      // v holds the buffer b: b ← γb + g; u ← u − η·(g + γb).
      oracle.evaluate(x, g);
      for (let i = 0; i < this.dim; i++) {
        const gi = g[i] + wd * x[i];
        const bi = gamma * v[i] + gi;
        v[i] = bi;
        x[i] -= lr * (gi + gamma * bi);
      }
    } else {
      // v holds the buffer b: the look-ahead point is w − η·γ·b; b ← γb + g; w ← w − η·b.
      const a = this.ahead;
      for (let i = 0; i < this.dim; i++) a[i] = x[i] - lr * gamma * v[i];
      oracle.evaluate(a, g);
      for (let i = 0; i < this.dim; i++) {
        const bi = gamma * v[i] + (g[i] + wd * a[i]);
        v[i] = bi;
        x[i] -= lr * bi;
      }
    }
    this.t++;
  }

  exportState(): OptimizerState {
    const key = this.lrInside ? "velocity" : "buffer";
    return { step: this.t, lr: this.lr, [key]: saveVector(this.velocity) };
  }

  importState(state: OptimizerState): void {
    const layout = this.lrInside ? LAYOUT_INSIDE : LAYOUT_OUTSIDE;
    const s = checkState(state, layout, this.dim, "importState nesterov");
    this.t = s.step as number;
    this.lr = s.lr as number;
    loadVector(s, this.lrInside ? "velocity" : "buffer", this.velocity);
  }

  setLearningRate(lr: number): void {
    this.lr = checkLearningRate(lr, "setLearningRate nesterov");
  }
}

export const nesterov = defineOptimizer({
  name: "nesterov",
  title: "Nesterov's accelerated gradient, momentum form (Nesterov 1983; Sutskever et al. 2013, ICML)",
  hyperSpecs: NESTEROV_HYPER,
  build: (hyper, dim) => new Nesterov(hyper, dim),
});
