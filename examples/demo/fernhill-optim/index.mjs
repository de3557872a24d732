// fernhill-optim — the optimizer package of a fictional team (the controls group of "Fernhill Robotics"),
// used as gradgate's demo. Scenario of our own: release 2.3 is what the committed baselines in
// ../baselines were made from; pull request #57 ("make step() re-entrant; use the cheaper form of Adam's
// update") is the change under review. FERNHILL_BUILD selects which one this module serves:
// "release-2.3" or "pr-57" (the default, since the demo reviews the pull request).
//
// The contract is gradgate's in-process one (docs/adapters.md): a factory with create(hyper, dim)
// returning { step(x, oracle) }, where oracle.evaluate(point, grad) writes the gradient and returns f.

const build = process.env.FERNHILL_BUILD ?? "pr-57";
if (build !== "release-2.3" && build !== "pr-57") {
  throw new Error(`FERNHILL_BUILD must be "release-2.3" or "pr-57", got ${JSON.stringify(build)}`);
}

/**
 * Heavy-ball momentum: v = γv + ηg, x −= v. PR #57 allocates the velocity inside step() "to make it
 * re-entrant", so the velocity no longer persists between steps: the method silently becomes plain
 * gradient descent. This is the regression the demo's gate must catch.
 */
export const momentum = {
  name: "momentum",
  title: "fernhill-optim momentum",
  defaults: { lr: 0.01, momentum: 0.9 },
  create(hyper, dim) {
    const lr = hyper.lr ?? 0.01;
    const gamma = hyper.momentum ?? 0.9;
    const g = new Float64Array(dim);
    let v = new Float64Array(dim);
    return {
      step(x, oracle) {
        if (build === "pr-57") v = new Float64Array(dim);
        oracle.evaluate(x, g);
        for (let i = 0; i < dim; i++) {
          v[i] = gamma * v[i] + lr * g[i];
          x[i] -= v[i];
        }
      },
    };
  },
};

/**
 * Adam (Kingma & Ba 2015, Algorithm 1). PR #57 switches to the paper's "efficient" form (§2): the bias
 * corrections folded into the step size, ε added to √v instead of √v̂. That moves ε by a factor
 * √(1 − β2ᵗ): the iterates change in their last digits, convergence should not. The demo shows it as
 * "trajectory changed, convergence equivalent".
 */
export const adam = {
  name: "adam",
  title: "fernhill-optim Adam",
  defaults: { lr: 0.001, beta1: 0.9, beta2: 0.999, eps: 1e-8 },
  create(hyper, dim) {
    const lr = hyper.lr ?? 0.001;
    const b1 = hyper.beta1 ?? 0.9;
    const b2 = hyper.beta2 ?? 0.999;
    const eps = hyper.eps ?? 1e-8;
    const g = new Float64Array(dim);
    const m = new Float64Array(dim);
    const v = new Float64Array(dim);
    let t = 0;
    return {
      step(x, oracle) {
        oracle.evaluate(x, g);
        t++;
        const c1 = 1 - b1 ** t;
        const c2 = 1 - b2 ** t;
        const lrt = (lr * Math.sqrt(c2)) / c1;
        for (let i = 0; i < dim; i++) {
          m[i] = b1 * m[i] + (1 - b1) * g[i];
          v[i] = b2 * v[i] + (1 - b2) * g[i] * g[i];
          if (build === "release-2.3") x[i] -= (lr * (m[i] / c1)) / (Math.sqrt(v[i] / c2) + eps);
          else x[i] -= (lrt * m[i]) / (Math.sqrt(v[i]) + eps);
        }
      },
    };
  },
};
