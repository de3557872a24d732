/**
 * Adam (adaptive moment estimation), with the AMSGrad option — bias-corrected running means of the
 * gradient and of its square, used as a per-coordinate normalised step.
 *
 *   t ← t + 1
 *   g ← ∇f(θ) + λ·θ                            (λ = weightDecay: coupled L2, off by default)
 *   m ← β1·m + (1 − β1)·g
 *   v ← β2·v + (1 − β2)·g²
 *   epsPlacement "corrected" (Algorithm 1):
 *     m̂ = m/(1 − β1ᵗ);  v̂ = v/(1 − β2ᵗ);  θ ← θ − α·m̂/(√v̂ + ε)
 *   epsPlacement "efficient" (§2, last paragraph):
 *     αₜ = α·√(1 − β2ᵗ)/(1 − β1ᵗ);  θ ← θ − αₜ·m/(√v + ε)
 *     (the same as "corrected" with ε replaced by ε·√(1 − β2ᵗ); the two differ when ε matters)
 *
 * AMSGrad (amsgrad = true) keeps a running maximum and divides by it instead of v, so the
 * denominator can never shrink:
 *   amsgradMax "raw":       v_max ← max(v_max, v);        v is replaced by v_max above
 *                           (the maximum over raw v, as in Reddi et al. Algorithm 2; in the
 *                           "corrected" placement v_max/(1 − β2ᵗ) is used for v̂)
 *   amsgradMax "corrected": v̂_max ← max(v̂_max, v̂);       v̂ is replaced by v̂_max above
 *                           (the maximum over bias-corrected v̂; in the "efficient" placement
 *                           v̂_max·(1 − β2ᵗ) is used for v)
 * Both keep Adam's bias correction of m (Reddi et al.'s Algorithm 2 itself has none); they differ
 * when an early large gradient is followed by small ones, since 1 − β2ᵗ grows with t.
 *
 * Sources: Kingma, D. P. & Ba, J. (2015), "Adam: A Method for Stochastic Optimization", ICLR,
 * Algorithm 1 and §2, https://arxiv.org/abs/1412.6980. Reddi, S. J., Kale, S. & Kumar, S. (2018),
 * "On the Convergence of Adam and Beyond", ICLR, Algorithm 2, https://arxiv.org/abs/1904.09237
 * (arXiv number from memory).
 *
 * Hyperparameters: lr (α) = 0.001, beta1 = 0.9, beta2 = 0.999, eps = 1e−8 (Algorithm 1's defaults);
 * weightDecay = 0, amsgrad = false, amsgradMax = "raw", epsPlacement = "corrected".
 * Cost per step: one gradient evaluation at θ itself (the harness reuses its loss value), two powers,
 * and per coordinate one square root and about 15 flops; memory: gradient, m, v (and the AMSGrad
 * maximum) buffers. The bias corrections use β^t from the step counter, so the state needs only t.
 *
 * The same update with decoupled weight decay is AdamW (./adamw.ts), which shares `AdamFamily`.
 */
import { InputError } from "../core/errors.js";
import type { Hyper, Oracle, OptimizerState } from "../core/types.js";
import {
  checkIterate,
  checkLearningRate,
  defineOptimizer,
  type HyperSpecs,
  type ReferenceOptimizer,
} from "./hyper.js";
import { checkState, loadVector, saveVector, type StateLayout } from "./state.js";

/** The hyperparameters Adam and AdamW share (AdamW changes weightDecay's meaning and default). */
export const ADAM_COMMON_HYPER: HyperSpecs = {
  lr: {
    type: "number",
    exclusiveMinimum: 0,
    default: 0.001,
    description: "Step size α. Default 0.001 (Kingma & Ba 2015, Algorithm 1).",
  },
  beta1: {
    type: "number",
    minimum: 0,
    exclusiveMaximum: 1,
    default: 0.9,
    description:
      "Decay β1 of the first-moment estimate, in [0, 1). Default 0.9 (Kingma & Ba 2015, Algorithm 1).",
  },
  beta2: {
    type: "number",
    minimum: 0,
    exclusiveMaximum: 1,
    default: 0.999,
    description:
      "Decay β2 of the second-moment estimate, in [0, 1). Default 0.999 (Kingma & Ba 2015, Algorithm 1).",
  },
  eps: {
    type: "number",
    minimum: 0,
    default: 1e-8,
    description: "ε in the denominator. Default 1e−8 (Kingma & Ba 2015, Algorithm 1).",
  },
};

/** The AMSGrad and ε-placement options, shared by Adam and AdamW. */
export const ADAM_VARIANT_HYPER: HyperSpecs = {
  amsgrad: {
    type: "boolean",
    default: false,
    description:
      "Divide by the running maximum of the second moment (Reddi, Kale & Kumar 2018, Algorithm 2).",
  },
  amsgradMax: {
    type: "choice",
    choices: ["raw", "corrected"],
    default: "raw",
    description:
      '"raw": maximum over raw v (as in Reddi et al. Algorithm 2); "corrected": maximum over bias-corrected v̂. ' +
      "Only with amsgrad: true.",
  },
  epsPlacement: {
    type: "choice",
    choices: ["corrected", "efficient"],
    default: "corrected",
    description:
      '"corrected": α·m̂/(√v̂ + ε) (Kingma & Ba 2015, Algorithm 1). ' +
      '"efficient": αₜ·m/(√v + ε) with αₜ = α·√(1−β2ᵗ)/(1−β1ᵗ) (Kingma & Ba 2015, §2).',
  },
};

export const ADAM_HYPER: HyperSpecs = {
  ...ADAM_COMMON_HYPER,
  weightDecay: {
    type: "number",
    minimum: 0,
    default: 0,
    description: "Coupled L2 coefficient λ: λ·θ is added to the gradient before the moments (not AdamW).",
  },
  ...ADAM_VARIANT_HYPER,
};

/** Rejects amsgradMax "corrected" without amsgrad: it would silently do nothing. */
export function checkAmsgradCombination(hyper: Hyper, where: string): void {
  if (hyper.amsgrad === false && hyper.amsgradMax !== "raw") {
    throw new InputError(
      `${where}.amsgradMax ${JSON.stringify(hyper.amsgradMax)} has no effect unless amsgrad is true; ` +
        `set amsgrad: true or remove amsgradMax`,
    );
  }
}

/** How the weight decay enters the update. */
export type DecayMode =
  /** λ·θ added to the gradient (Adam + L2). */
  | "coupled"
  /** θ ← θ − lr·λ·θ beside the Adam step (AdamW as most frameworks write it). */
  | "decoupled-scaled"
  /** θ ← θ − λ·θ beside the Adam step (AdamW Algorithm 2 with schedule multiplier 1). */
  | "decoupled";

/** Adam and AdamW: one update, parameterised by the decay mode. */
export class AdamFamily implements ReferenceOptimizer {
  private readonly grad: Float64Array;
  private readonly m: Float64Array;
  private readonly v: Float64Array;
  /** AMSGrad maximum: of raw v ("raw") or of v̂ ("corrected"); length 0 without AMSGrad. */
  private readonly vMax: Float64Array;
  private lr: number;
  private readonly beta1: number;
  private readonly beta2: number;
  private readonly eps: number;
  /** λ added to the gradient as λ·θ (coupled mode), else 0. */
  private readonly l2: number;
  /** λ of the decoupled decay that is multiplied by lr ("decoupled-scaled"), else 0. */
  private readonly decayPerLr: number;
  /** λ of the decoupled decay that is not multiplied by lr ("decoupled"), else 0. */
  private readonly decayFixed: number;
  private readonly amsgrad: boolean;
  private readonly maxCorrected: boolean;
  private readonly efficient: boolean;
  private readonly layout: StateLayout;
  private readonly maxKey: string;
  private t = 0;

  constructor(
    private readonly name: string,
    hyper: Hyper,
    decay: DecayMode,
    private readonly dim: number,
  ) {
    this.grad = new Float64Array(dim);
    this.m = new Float64Array(dim);
    this.v = new Float64Array(dim);
    this.amsgrad = hyper.amsgrad as boolean;
    this.maxCorrected = hyper.amsgradMax === "corrected";
    this.vMax = new Float64Array(this.amsgrad ? dim : 0);
    this.efficient = hyper.epsPlacement === "efficient";
    this.lr = hyper.lr as number;
    this.beta1 = hyper.beta1 as number;
    this.beta2 = hyper.beta2 as number;
    this.eps = hyper.eps as number;
    const lambda = hyper.weightDecay as number;
    this.l2 = decay === "coupled" ? lambda : 0;
    this.decayPerLr = decay === "decoupled-scaled" ? lambda : 0;
    this.decayFixed = decay === "decoupled" ? lambda : 0;
    this.maxKey = this.maxCorrected ? "vHatMax" : "vMax";
    this.layout = this.amsgrad
      ? { step: "count", lr: "lr", m: "vector", v: "vector", [this.maxKey]: "vector" }
      : { step: "count", lr: "lr", m: "vector", v: "vector" };
  }

  step(x: Float64Array, oracle: Oracle): void {
    checkIterate(x, this.dim, this.name);
    const g = this.grad;
    const m = this.m;
    const v = this.v;
    const vMax = this.vMax;
    oracle.evaluate(x, g);
    const t = this.t + 1;
    const lr = this.lr;
    const b1 = this.beta1;
    const b2 = this.beta2;
    const eps = this.eps;
    const bc1 = 1 - Math.pow(b1, t);
    const bc2 = 1 - Math.pow(b2, t);
    // Per-step scalars are computed without branches: a conditional that mixes a field with a
    // computed double made V8 box the result once per step (seen by tests/optimizers/allocation).
    const stepSizeEfficient = (lr * Math.sqrt(bc2)) / bc1;
    const l2 = this.l2;
    const shrink = lr * this.decayPerLr + this.decayFixed;
    const amsgrad = this.amsgrad;
    const maxCorrected = this.maxCorrected;
    const efficient = this.efficient;
    for (let i = 0; i < this.dim; i++) {
      const xi = x[i];
      const gi = g[i] + l2 * xi;
      const mi = b1 * m[i] + (1 - b1) * gi;
      const vi = b2 * v[i] + (1 - b2) * gi * gi;
      m[i] = mi;
      v[i] = vi;
      let update: number;
      if (efficient) {
        let vRaw = vi;
        if (amsgrad) {
          if (maxCorrected) {
            vMax[i] = Math.max(vMax[i], vi / bc2);
            vRaw = vMax[i] * bc2;
          } else {
            vMax[i] = Math.max(vMax[i], vi);
            vRaw = vMax[i];
          }
        }
        update = (stepSizeEfficient * mi) / (Math.sqrt(vRaw) + eps);
      } else {
        let vHat = vi / bc2;
        if (amsgrad) {
          if (maxCorrected) {
            vMax[i] = Math.max(vMax[i], vHat);
            vHat = vMax[i];
          } else {
            vMax[i] = Math.max(vMax[i], vi);
            vHat = vMax[i] / bc2;
          }
        }
        const mHat = mi / bc1;
        update = (lr * mHat) / (Math.sqrt(vHat) + eps);
      }
      x[i] = xi - update - shrink * xi;
    }
    this.t = t;
  }

  exportState(): OptimizerState {
    const state: OptimizerState = { step: this.t, lr: this.lr, m: saveVector(this.m), v: saveVector(this.v) };
    if (this.amsgrad) state[this.maxKey] = saveVector(this.vMax);
    return state;
  }

  importState(state: OptimizerState): void {
    const s = checkState(state, this.layout, this.dim, `importState ${this.name}`);
    this.t = s.step as number;
    this.lr = s.lr as number;
    loadVector(s, "m", this.m);
    loadVector(s, "v", this.v);
    if (this.amsgrad) loadVector(s, this.maxKey, this.vMax);
  }

  setLearningRate(lr: number): void {
    this.lr = checkLearningRate(lr, `setLearningRate ${this.name}`);
  }
}

export const adam = defineOptimizer({
  name: "adam",
  title: "Adam (Kingma & Ba 2015, ICLR, arXiv:1412.6980); AMSGrad option (Reddi, Kale & Kumar 2018, ICLR)",
  hyperSpecs: ADAM_HYPER,
  checkCombination: checkAmsgradCombination,
  build: (hyper, dim) => new AdamFamily("adam", hyper, "coupled", dim),
});
