/**
 * Small optimizers written the way users write them — some correct in another convention, some
 * deliberately wrong — for the reference-check tests. Written here from the update rules, independently
 * of src/optimizers/, so that a check passing on them is not the reference agreeing with itself.
 * Each allocates its buffers in `create`. Names of hyperparameters follow each "user's" own style.
 */
import type { Hyper, Optimizer, OptimizerFactory, Oracle } from "../../src/core/types.js";

function num(hyper: Hyper, name: string, fallback: number): number {
  const v = hyper[name];
  if (v === undefined) return fallback;
  if (typeof v !== "number") throw new Error(`${name} must be a number, got ${JSON.stringify(v)}`);
  return v;
}

/** Rejects names it does not know, like strict user code does. */
function only(hyper: Hyper, names: readonly string[], who: string): void {
  for (const k of Object.keys(hyper)) if (!names.includes(k)) throw new Error(`${who}: unknown option ${k}`);
}

function factory(
  name: string,
  defaults: Hyper,
  make: (hyper: Hyper, dim: number) => Optimizer,
): OptimizerFactory {
  return {
    name,
    title: `${name} (test optimizer)`,
    defaults,
    create(hyper, dim) {
      only(hyper, Object.keys(defaults), name);
      return make({ ...defaults, ...hyper }, dim);
    },
  };
}

/** Plain SGD with its own names (learning_rate); optionally a schedule that takes effect one step late. */
export function userSgd(opts: { lateSchedule?: boolean; lrScale?: number } = {}): OptimizerFactory {
  return factory("user-sgd", { learning_rate: 0.01 }, (hyper, dim) => {
    const g = new Float64Array(dim);
    let lr = num(hyper, "learning_rate", 0.01) * (opts.lrScale ?? 1);
    let pending: number | null = null;
    return {
      step(x: Float64Array, oracle: Oracle) {
        oracle.evaluate(x, g);
        for (let i = 0; i < dim; i++) x[i] -= lr * g[i];
        if (pending !== null) {
          lr = pending;
          pending = null;
        }
      },
      setLearningRate(v: number) {
        if (opts.lateSchedule) pending = v * (opts.lrScale ?? 1);
        else lr = v * (opts.lrScale ?? 1);
      },
    };
  });
}

/**
 * Heavy ball. `form` "inside": v = γv + ηg, w −= v; "outside": b = γb + g, w −= η·b.
 * `fixedMomentum` ignores the configured coefficient (a wrong momentum coefficient);
 * `schedule: false` leaves out setLearningRate.
 */
export function userMomentum(
  opts: { form?: "inside" | "outside"; fixedMomentum?: number; schedule?: boolean } = {},
): OptimizerFactory {
  return factory("user-momentum", { lr: 0.01, momentum: 0.9, weightDecay: 0 }, (hyper, dim) => {
    const g = new Float64Array(dim);
    const buf = new Float64Array(dim);
    let lr = num(hyper, "lr", 0.01);
    const gamma = opts.fixedMomentum ?? num(hyper, "momentum", 0.9);
    const wd = num(hyper, "weightDecay", 0);
    const inside = (opts.form ?? "inside") === "inside";
    const opt: Optimizer = {
      step(w: Float64Array, oracle: Oracle) {
        oracle.evaluate(w, g);
        for (let i = 0; i < dim; i++) {
          const gi = g[i] + wd * w[i];
          if (inside) {
            buf[i] = gamma * buf[i] + lr * gi;
            w[i] -= buf[i];
          } else {
            buf[i] = gamma * buf[i] + gi;
            w[i] -= lr * buf[i];
          }
        }
      },
    };
    if (opts.schedule !== false) opt.setLearningRate = (v: number) => void (lr = v);
    return opt;
  });
}

/**
 * Claims to be Nesterov. `dropLookahead` takes the gradient at the current point (heavy ball: the
 * regression "Nesterov written with the previous velocity" is this too). `framework` is the stored
 * look-ahead form with the learning rate outside the buffer: b = μb + g; u −= lr·(g + μb).
 */
export function userNesterov(opts: { dropLookahead?: boolean; framework?: boolean } = {}): OptimizerFactory {
  return factory("user-nesterov", { lr: 0.01, momentum: 0.9, weightDecay: 0 }, (hyper, dim) => {
    const g = new Float64Array(dim);
    const v = new Float64Array(dim);
    const ahead = new Float64Array(dim);
    let lr = num(hyper, "lr", 0.01);
    const mu = num(hyper, "momentum", 0.9);
    const wd = num(hyper, "weightDecay", 0);
    return {
      step(w: Float64Array, oracle: Oracle) {
        if (opts.framework) {
          oracle.evaluate(w, g);
          for (let i = 0; i < dim; i++) {
            const gi = g[i] + wd * w[i];
            v[i] = mu * v[i] + gi;
            w[i] -= lr * (gi + mu * v[i]);
          }
          return;
        }
        const at = opts.dropLookahead ? w : ahead;
        if (!opts.dropLookahead) for (let i = 0; i < dim; i++) ahead[i] = w[i] - mu * v[i];
        oracle.evaluate(at, g);
        for (let i = 0; i < dim; i++) {
          v[i] = mu * v[i] + lr * (g[i] + wd * at[i]);
          w[i] -= v[i];
        }
      },
      setLearningRate(x: number) {
        lr = x;
      },
    };
  });
}

/** RMSProp with ε inside or outside the square root (Graves 2013 §4 / common practice). */
export function userRmsprop(opts: { epsInside: boolean }): OptimizerFactory {
  return factory("user-rmsprop", { lr: 0.001, rho: 0.9, eps: 1e-8, weightDecay: 0 }, (hyper, dim) => {
    const g = new Float64Array(dim);
    const e = new Float64Array(dim);
    let lr = num(hyper, "lr", 0.001);
    const rho = num(hyper, "rho", 0.9);
    const eps = num(hyper, "eps", 1e-8);
    const wd = num(hyper, "weightDecay", 0);
    return {
      step(x: Float64Array, oracle: Oracle) {
        oracle.evaluate(x, g);
        for (let i = 0; i < dim; i++) {
          const gi = g[i] + wd * x[i];
          e[i] = rho * e[i] + (1 - rho) * gi * gi;
          const den = opts.epsInside ? Math.sqrt(e[i] + eps) : Math.sqrt(e[i]) + eps;
          x[i] -= (lr * gi) / den;
        }
      },
      setLearningRate(v: number) {
        lr = v;
      },
    };
  });
}

export type UserDecay = "coupled" | "decoupled" | "decoupled-scaled";

/**
 * Adam/AdamW written from Kingma & Ba (2015) Algorithm 1 and Loshchilov & Hutter (2019) Algorithm 2.
 * `eps`: "corrected" α·m̂/(√v̂ + ε); "efficient" ε before the bias correction (§2); "inside-sqrt"
 * α·m̂/√(v̂ + ε), a moved ε that is no published form. `amsgrad`: "raw" / "corrected" maximum, or
 * "ignored" (the flag is accepted and does nothing: AMSGrad silently turned into Adam).
 */
export function userAdam(
  opts: {
    decay?: UserDecay;
    eps?: "corrected" | "efficient" | "inside-sqrt";
    amsgrad?: "raw" | "corrected" | "ignored";
  } = {},
): OptimizerFactory {
  const defaults = { lr: 0.001, beta1: 0.9, beta2: 0.999, eps: 1e-8, weightDecay: 0, amsgrad: false };
  return factory("user-adam", defaults, (hyper, dim) => {
    const g = new Float64Array(dim);
    const m = new Float64Array(dim);
    const v = new Float64Array(dim);
    const vmax = new Float64Array(dim);
    let lr = num(hyper, "lr", 0.001);
    const b1 = num(hyper, "beta1", 0.9);
    const b2 = num(hyper, "beta2", 0.999);
    const eps = num(hyper, "eps", 1e-8);
    const wd = num(hyper, "weightDecay", 0);
    const ams = hyper.amsgrad === true && opts.amsgrad !== "ignored";
    const decay = opts.decay ?? "coupled";
    const epsMode = opts.eps ?? "corrected";
    let t = 0;
    return {
      step(x: Float64Array, oracle: Oracle) {
        t++;
        oracle.evaluate(x, g);
        const c1 = 1 - b1 ** t;
        const c2 = 1 - b2 ** t;
        for (let i = 0; i < dim; i++) {
          const gi = g[i] + (decay === "coupled" ? wd * x[i] : 0);
          m[i] = b1 * m[i] + (1 - b1) * gi;
          v[i] = b2 * v[i] + (1 - b2) * gi * gi;
          let vHat = v[i] / c2;
          if (ams && opts.amsgrad === "corrected") {
            vmax[i] = Math.max(vmax[i], vHat);
            vHat = vmax[i];
          } else if (ams) {
            vmax[i] = Math.max(vmax[i], v[i]);
            vHat = vmax[i] / c2;
          }
          const mHat = m[i] / c1;
          let step: number;
          if (epsMode === "corrected") step = (lr * mHat) / (Math.sqrt(vHat) + eps);
          else if (epsMode === "inside-sqrt") step = (lr * mHat) / Math.sqrt(vHat + eps);
          else step = ((lr * Math.sqrt(c2)) / c1) * (m[i] / (Math.sqrt(vHat * c2) + eps));
          const shrink = decay === "decoupled" ? wd : decay === "decoupled-scaled" ? lr * wd : 0;
          x[i] = x[i] - step - shrink * x[i];
        }
      },
      setLearningRate(value: number) {
        lr = value;
      },
    };
  });
}

/** An optimizer that throws on its third step. */
export function throwingOptimizer(): OptimizerFactory {
  return factory("thrower", { lr: 0.01 }, (_hyper, dim) => {
    let k = 0;
    const g = new Float64Array(dim);
    return {
      step(x: Float64Array, oracle: Oracle) {
        if (++k === 3) throw new Error("out of memory (simulated)");
        oracle.evaluate(x, g);
        for (let i = 0; i < dim; i++) x[i] -= 0.01 * g[i];
      },
    };
  });
}
