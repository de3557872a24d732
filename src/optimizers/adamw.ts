/**
 * AdamW (Adam with decoupled weight decay) — Adam whose weight decay shrinks the parameters directly
 * instead of entering the gradient, so the decay is not rescaled by the adaptive denominator.
 *
 *   t ← t + 1;  g ← ∇f(θ)                                  (no λ·θ in the gradient)
 *   m, v, m̂, v̂ (and the AMSGrad maximum) exactly as in Adam (./adam.ts)
 *   decayScaledByLr true:   θ ← θ − α·m̂/(√v̂ + ε) − α·λ·θ      (as most frameworks write it)
 *   decayScaledByLr false:  θ ← θ − α·m̂/(√v̂ + ε) − λ·θ        (Algorithm 2 with schedule multiplier ηₜ = 1)
 *
 * Both terms use θ from before the step (Algorithm 2, line 12: θₜ ← θₜ₋₁ − ηₜ(α·m̂ₜ/(√v̂ₜ + ε) + λ·θₜ₋₁)),
 * so the decay is never applied to already-updated parameters. With a zero loss gradient the Adam
 * term vanishes and θ shrinks geometrically: θₙ = θ₀·(1 − α·λ)ⁿ (scaled) or θ₀·(1 − λ)ⁿ.
 *
 * Source: Loshchilov, I. & Hutter, F. (2019), "Decoupled Weight Decay Regularization", ICLR,
 * Algorithm 2, https://arxiv.org/abs/1711.05101. The Adam part: Kingma & Ba (2015), arXiv:1412.6980.
 *
 * Hyperparameters: lr (α) = 0.001, beta1 = 0.9, beta2 = 0.999, eps = 1e−8 (Adam's defaults, also used
 * in Algorithm 2); weightDecay (λ) = 0.01 (common practice; the paper sets no default);
 * decayScaledByLr = true; amsgrad = false, amsgradMax = "raw", epsPlacement = "corrected" as in Adam.
 * Cost per step: Adam's (one gradient evaluation at θ itself, O(dim) flops) plus 2 flops per coordinate.
 */
import { ADAM_COMMON_HYPER, ADAM_VARIANT_HYPER, AdamFamily, checkAmsgradCombination } from "./adam.js";
import { defineOptimizer, type HyperSpecs } from "./hyper.js";

export const ADAMW_HYPER: HyperSpecs = {
  ...ADAM_COMMON_HYPER,
  weightDecay: {
    type: "number",
    minimum: 0,
    default: 0.01,
    description:
      "Decoupled decay λ applied to θ directly. Default 0.01: common practice, the paper sets none.",
  },
  decayScaledByLr: {
    type: "boolean",
    default: true,
    description:
      "true: θ −= lr·λ·θ (as most frameworks write it); false: θ −= λ·θ (Loshchilov & Hutter 2019, Algorithm 2 with ηₜ = 1).",
  },
  ...ADAM_VARIANT_HYPER,
};

export const adamw = defineOptimizer({
  name: "adamw",
  title: "AdamW, decoupled weight decay (Loshchilov & Hutter 2019, ICLR, arXiv:1711.05101)",
  hyperSpecs: ADAMW_HYPER,
  checkCombination: checkAmsgradCombination,
  build: (hyper, dim) =>
    new AdamFamily("adamw", hyper, hyper.decayScaledByLr === true ? "decoupled-scaled" : "decoupled", dim),
});
