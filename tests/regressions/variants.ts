/**
 * The injected-regression set: changes to the reference optimizers (src/optimizers) that a maintainer
 * would care about ("behaviour"), and rewrites that change only the last bits of the arithmetic
 * ("rewrite"). Each variant is a compact re-implementation of one reference optimizer's update, written
 * to perform the very same floating-point operations in the same order as the reference, plus one
 * change. tests/regressions/regressions.test.ts checks that each family with no change is bitwise
 * identical to the reference (verdict "unchanged"), so a variant differs from the reference by its
 * change alone. Several changes mirror kinds of regression that widely used frameworks have had (ε moved,
 * step counter, AdamW turned into Adam + L2, AMSGrad lost, ε inside/outside √ in RMSProp; from the
 * project's notes, common practice, no single source).
 */
import type { Hyper, Optimizer, OptimizerFactory, Oracle } from "../../src/core/types.js";
import { getOptimizer } from "../../src/optimizers/index.js";

export type VariantKind = "behaviour" | "rewrite";

export interface Variant {
  readonly name: string;
  readonly kind: VariantKind;
  /** The suite optimizer (config name) whose cases run this variant instead of the reference. */
  readonly replaces: string;
  readonly description: string;
  readonly factory: OptimizerFactory;
}

function factoryOf(reference: string, create: (hyper: Hyper, dim: number) => Optimizer): OptimizerFactory {
  const ref = getOptimizer(reference);
  return { name: ref.name, title: ref.title, defaults: ref.defaults, create };
}

// ---------------------------------------------------------------- Adam / AdamW

interface AdamChange {
  /** "coupled" (Adam: λθ in the gradient), "decoupled-scaled" (AdamW: θ −= lr·λ·θ). */
  decay?: "coupled" | "decoupled-scaled";
  noBiasCorrection?: boolean;
  epsInsideSqrt?: boolean;
  /** The step counter used in the bias corrections lags one step (t − 1: 0 at the first step). */
  counterLags?: boolean;
  beta2?: number;
  amsgradMaxLost?: boolean;
  decaySignFlipped?: boolean;
  /** AdamW's decay applied as L2 in the gradient (Adam + L2) instead of decoupled. */
  decayCoupled?: boolean;
  // Rewrites
  runningProduct?: boolean;
  reassociate?: boolean;
  efficientForm?: boolean;
}

/** Adam's "corrected" ε placement with raw AMSGrad maximum, as src/optimizers/adam.ts computes it. */
function adamLike(reference: "adam" | "adamw", change: AdamChange): OptimizerFactory {
  return factoryOf(reference, (hyper, dim) => {
    const g = new Float64Array(dim);
    const m = new Float64Array(dim);
    const v = new Float64Array(dim);
    const vMax = new Float64Array(dim);
    const lr = hyper.lr as number;
    const b1 = hyper.beta1 as number;
    const b2 = change.beta2 ?? (hyper.beta2 as number);
    const eps = hyper.eps as number;
    const lambda = hyper.weightDecay as number;
    const amsgrad = hyper.amsgrad === true;
    const decay = reference === "adam" || change.decayCoupled ? "coupled" : "decoupled-scaled";
    const l2 = decay === "coupled" ? lambda : 0;
    const shrink =
      decay === "decoupled-scaled" ? (change.decaySignFlipped ? -(lr * lambda) : lr * lambda) : 0;
    let t = 0;
    let b1t = 1;
    let b2t = 1;
    return {
      step(x: Float64Array, oracle: Oracle) {
        oracle.evaluate(x, g);
        t += 1;
        const tc = change.counterLags ? t - 1 : t;
        b1t *= b1;
        b2t *= b2;
        let bc1 = change.runningProduct ? 1 - b1t : 1 - Math.pow(b1, tc);
        let bc2 = change.runningProduct ? 1 - b2t : 1 - Math.pow(b2, tc);
        if (change.noBiasCorrection) bc1 = bc2 = 1;
        const stepSize = (lr * Math.sqrt(bc2)) / bc1;
        const epsHat = eps * Math.sqrt(bc2);
        for (let i = 0; i < dim; i++) {
          const xi = x[i];
          const gi = g[i] + l2 * xi;
          const mi = b1 * m[i] + (1 - b1) * gi;
          const vi = b2 * v[i] + (1 - b2) * gi * gi;
          m[i] = mi;
          v[i] = vi;
          let update: number;
          if (change.efficientForm) {
            // Kingma & Ba 2015 §2 with ε̂ = ε·√(1 − β2ᵗ): the same update, other rounding.
            let vRaw = vi;
            if (amsgrad && !change.amsgradMaxLost) {
              vMax[i] = Math.max(vMax[i], vi);
              vRaw = vMax[i];
            }
            update = (stepSize * mi) / (Math.sqrt(vRaw) + epsHat);
          } else {
            let vHat = vi / bc2;
            if (amsgrad && !change.amsgradMaxLost) {
              vMax[i] = Math.max(vMax[i], vi);
              vHat = vMax[i] / bc2;
            }
            const mHat = mi / bc1;
            if (change.epsInsideSqrt) update = (lr * mHat) / Math.sqrt(vHat + eps);
            else if (change.reassociate) update = lr * (mHat / (Math.sqrt(vHat) + eps));
            else update = (lr * mHat) / (Math.sqrt(vHat) + eps);
          }
          x[i] = xi - update - shrink * xi;
        }
      },
    };
  });
}

// ---------------------------------------------------------------- heavy ball

interface MomentumChange {
  notPersisted?: boolean;
  lrTwice?: boolean;
  /** The "lr-outside" form b = γb + g, w −= lr·b: the same trajectory for a constant lr, other rounding. */
  otherForm?: boolean;
}

function momentumLike(change: MomentumChange): OptimizerFactory {
  return factoryOf("momentum", (hyper, dim) => {
    const g = new Float64Array(dim);
    const b = new Float64Array(dim);
    const lr = hyper.lr as number;
    const gamma = hyper.momentum as number;
    const wd = hyper.weightDecay as number;
    return {
      step(w: Float64Array, oracle: Oracle) {
        oracle.evaluate(w, g);
        for (let i = 0; i < dim; i++) {
          if (change.otherForm) {
            const bi = gamma * b[i] + (g[i] + wd * w[i]);
            b[i] = bi;
            w[i] -= lr * bi;
            continue;
          }
          const prev = change.notPersisted ? 0 : b[i];
          const vi = gamma * prev + lr * (g[i] + wd * w[i]);
          b[i] = vi;
          w[i] -= change.lrTwice ? lr * vi : vi;
        }
      },
    };
  });
}

// ---------------------------------------------------------------- Nesterov (look-ahead form)

function nesterovLike(change: { lostLookahead?: boolean }): OptimizerFactory {
  return factoryOf("nesterov", (hyper, dim) => {
    const g = new Float64Array(dim);
    const v = new Float64Array(dim);
    const a = new Float64Array(dim);
    const lr = hyper.lr as number;
    const gamma = hyper.momentum as number;
    const wd = hyper.weightDecay as number;
    return {
      step(x: Float64Array, oracle: Oracle) {
        for (let i = 0; i < dim; i++) a[i] = change.lostLookahead ? x[i] : x[i] - gamma * v[i];
        oracle.evaluate(a, g);
        for (let i = 0; i < dim; i++) {
          const vi = gamma * v[i] + lr * (g[i] + wd * a[i]);
          v[i] = vi;
          x[i] -= vi;
        }
      },
    };
  });
}

// ---------------------------------------------------------------- RMSProp, Adagrad

function rmspropLike(change: { epsInsideSqrt?: boolean; reassociate?: boolean }): OptimizerFactory {
  return factoryOf("rmsprop", (hyper, dim) => {
    const g = new Float64Array(dim);
    const E = new Float64Array(dim);
    const lr = hyper.lr as number;
    const rho = hyper.rho as number;
    const eps = hyper.eps as number;
    const wd = hyper.weightDecay as number;
    const inside = (hyper.epsPlacement === "inside") !== (change.epsInsideSqrt === true);
    return {
      step(x: Float64Array, oracle: Oracle) {
        oracle.evaluate(x, g);
        for (let i = 0; i < dim; i++) {
          const gi = g[i] + wd * x[i];
          const Ei = rho * E[i] + (1 - rho) * gi * gi;
          E[i] = Ei;
          const denom = inside ? Math.sqrt(Ei + eps) : Math.sqrt(Ei) + eps;
          x[i] -= change.reassociate ? lr * (gi / denom) : (lr * gi) / denom;
        }
      },
    };
  });
}

function adagradLike(change: { reassociate?: boolean }): OptimizerFactory {
  return factoryOf("adagrad", (hyper, dim) => {
    const g = new Float64Array(dim);
    const G = new Float64Array(dim).fill(hyper.initialAccumulator as number);
    const lr = hyper.lr as number;
    const eps = hyper.eps as number;
    const wd = hyper.weightDecay as number;
    return {
      step(x: Float64Array, oracle: Oracle) {
        oracle.evaluate(x, g);
        for (let i = 0; i < dim; i++) {
          const gi = g[i] + wd * x[i];
          const Gi = G[i] + gi * gi;
          G[i] = Gi;
          x[i] -= change.reassociate ? lr * (gi / (eps + Math.sqrt(Gi))) : (lr * gi) / (eps + Math.sqrt(Gi));
        }
      },
    };
  });
}

/** The re-implementations with no change: must be bitwise identical to the references. */
export const FAITHFUL: readonly Variant[] = [
  {
    name: "adam (faithful copy)",
    kind: "rewrite",
    replaces: "adam",
    description: "no change",
    factory: adamLike("adam", {}),
  },
  {
    name: "adamw (faithful copy)",
    kind: "rewrite",
    replaces: "adamw",
    description: "no change",
    factory: adamLike("adamw", {}),
  },
  {
    name: "momentum (faithful copy)",
    kind: "rewrite",
    replaces: "momentum",
    description: "no change",
    factory: momentumLike({}),
  },
  {
    name: "nesterov (faithful copy)",
    kind: "rewrite",
    replaces: "nesterov",
    description: "no change",
    factory: nesterovLike({}),
  },
  {
    name: "rmsprop (faithful copy)",
    kind: "rewrite",
    replaces: "rmsprop",
    description: "no change",
    factory: rmspropLike({}),
  },
  {
    name: "adagrad (faithful copy)",
    kind: "rewrite",
    replaces: "adagrad",
    description: "no change",
    factory: adagradLike({}),
  },
];

export const VARIANTS: readonly Variant[] = [
  // Behaviour changes.
  {
    name: "adam: bias correction dropped",
    kind: "behaviour",
    replaces: "adam",
    description: "m̂ = m, v̂ = v (Kingma & Ba 2015, Algorithm 1 without its correction lines)",
    factory: adamLike("adam", { noBiasCorrection: true }),
  },
  {
    name: "adam: ε moved inside √",
    kind: "behaviour",
    replaces: "adam",
    description: "α·m̂/√(v̂ + ε) instead of α·m̂/(√v̂ + ε)",
    factory: adamLike("adam", { epsInsideSqrt: true }),
  },
  {
    name: "adam: step counter off by one",
    kind: "behaviour",
    replaces: "adam",
    description: "bias corrections use t − 1 (0 at the first step: 1 − β⁰ = 0)",
    factory: adamLike("adam", { counterLags: true }),
  },
  {
    name: "adam: wrong β2 default",
    kind: "behaviour",
    replaces: "adam",
    description: "β2 = 0.99 instead of the published 0.999",
    factory: adamLike("adam", { beta2: 0.99 }),
  },
  {
    name: "adam: AMSGrad maximum lost",
    kind: "behaviour",
    replaces: "adam",
    description: "amsgrad: true silently divides by v instead of max(v) (plain Adam)",
    factory: adamLike("adam", { amsgradMaxLost: true }),
  },
  {
    name: "adamw: decay coupled (Adam + L2)",
    kind: "behaviour",
    replaces: "adamw",
    description: "λθ added to the gradient instead of θ −= lr·λ·θ (Loshchilov & Hutter 2019, Algorithm 2)",
    factory: adamLike("adamw", { decayCoupled: true }),
  },
  {
    name: "adamw: sign of decay flipped",
    kind: "behaviour",
    replaces: "adamw",
    description: "θ += lr·λ·θ",
    factory: adamLike("adamw", { decaySignFlipped: true }),
  },
  {
    name: "nesterov: look-ahead lost",
    kind: "behaviour",
    replaces: "nesterov",
    description: "gradient at w instead of w − γv (becomes heavy ball)",
    factory: nesterovLike({ lostLookahead: true }),
  },
  {
    name: "momentum: velocity not persisted",
    kind: "behaviour",
    replaces: "momentum",
    description: "the velocity starts from 0 every step (becomes plain gradient descent)",
    factory: momentumLike({ notPersisted: true }),
  },
  {
    name: "momentum: lr applied twice",
    kind: "behaviour",
    replaces: "momentum",
    description: "w −= lr·v with v = γv + lr·g",
    factory: momentumLike({ lrTwice: true }),
  },
  {
    name: "rmsprop: ε moved inside √",
    kind: "behaviour",
    replaces: "rmsprop",
    description: "η·g/√(E + ε) instead of η·g/(√E + ε)",
    factory: rmspropLike({ epsInsideSqrt: true }),
  },
  // Rewrites that change only the last bits.
  {
    name: "adam: β^t as a running product",
    kind: "rewrite",
    replaces: "adam",
    description: "β1ᵗ, β2ᵗ kept as products updated each step instead of Math.pow",
    factory: adamLike("adam", { runningProduct: true }),
  },
  {
    name: "adam: reassociated update",
    kind: "rewrite",
    replaces: "adam",
    description: "α·(m̂/(√v̂ + ε)) instead of (α·m̂)/(√v̂ + ε)",
    factory: adamLike("adam", { reassociate: true }),
  },
  {
    name: "adam: efficient form with ε̂",
    kind: "rewrite",
    replaces: "adam",
    description: "αₜ·m/(√v + ε̂), αₜ = α√(1−β2ᵗ)/(1−β1ᵗ), ε̂ = ε√(1−β2ᵗ) (Kingma & Ba 2015 §2)",
    factory: adamLike("adam", { efficientForm: true }),
  },
  {
    name: "momentum: the other form",
    kind: "rewrite",
    replaces: "momentum",
    description: "b = γb + g, w −= lr·b instead of v = γv + lr·g, w −= v",
    factory: momentumLike({ otherForm: true }),
  },
  {
    name: "rmsprop: reassociated update",
    kind: "rewrite",
    replaces: "rmsprop",
    description: "η·(g/(√E + ε)) instead of (η·g)/(√E + ε)",
    factory: rmspropLike({ reassociate: true }),
  },
  {
    name: "adagrad: reassociated update",
    kind: "rewrite",
    replaces: "adagrad",
    description: "η·(g/(δ + √G)) instead of (η·g)/(δ + √G)",
    factory: adagradLike({ reassociate: true }),
  },
];
