/**
 * Tiny problem and optimizer used to test the runner on its own: f(x) = ½ Σ cᵢ xᵢ² with cᵢ = i + 1,
 * and plain gradient descent. Closed forms make the metrics checkable by hand.
 */
import type {
  Optimizer,
  OptimizerFactory,
  Oracle,
  ProblemDefinition,
  ProblemInstance,
  ProblemParams,
} from "../../src/core/types.js";
import type { Pcg32 } from "../../src/core/rng.js";
import type { CaseSpec } from "../../src/runner/types.js";
import { logCheckpoints } from "../../src/runner/recorder.js";

export function toyProblem(opts: { stochastic?: boolean; sigma?: number } = {}): ProblemDefinition {
  return {
    name: "toy",
    title: "Toy diagonal quadratic",
    tags: ["test"],
    source: "constructed for tests",
    params: { n: { default: 2, min: 1, integer: true, description: "dimension" } },
    measureEvery: opts.stochastic ? 5 : 1,
    create(params: ProblemParams, ctx): ProblemInstance {
      const n = params.n ?? 2;
      const sigma = opts.sigma ?? 0.1;
      const objective = (x: Float64Array) => {
        let f = 0;
        for (let i = 0; i < n; i++) f += 0.5 * (i + 1) * x[i] * x[i];
        return f;
      };
      return {
        key: n === 2 ? "toy" : `toy(n=${n})`,
        dim: n,
        fStar: 0,
        fStarKind: "published",
        xStar: new Float64Array(n),
        stochastic: opts.stochastic === true,
        evaluate(x, grad) {
          for (let i = 0; i < n; i++)
            grad[i] = (i + 1) * x[i] + (opts.stochastic ? sigma * ctx.noise.nextNormal() : 0);
          return objective(x);
        },
        objective,
        start(out: Float64Array, rng: Pcg32 | null) {
          for (let i = 0; i < n; i++) out[i] = 1 + (rng ? 0.01 * rng.nextNormal() : 0);
        },
      };
    },
  };
}

/** Gradient descent; `lookahead` evaluates at a separate buffer first (never at the iterate). */
export function gdFactory(
  opts: { lookahead?: boolean; throwAt?: number; touchFirst?: boolean } = {},
): OptimizerFactory {
  return {
    name: "gd",
    title: "gradient descent (test)",
    defaults: { lr: 0.1 },
    create(hyper, dim): Optimizer {
      const lr = Number(hyper.lr ?? 0.1);
      const g = new Float64Array(dim);
      const tmp = new Float64Array(dim);
      let t = 0;
      return {
        step(x: Float64Array, oracle: Oracle) {
          t++;
          if (opts.throwAt === t) throw new Error("boom");
          if (opts.touchFirst) x[0] += 0; // harmless write before evaluating: value unchanged
          if (opts.lookahead) {
            tmp.set(x);
            oracle.evaluate(tmp, g);
          } else {
            oracle.evaluate(x, g);
          }
          for (let i = 0; i < dim; i++) x[i] -= lr * g[i];
        },
      };
    },
  };
}

export function toyCase(over: Partial<CaseSpec> = {}): CaseSpec {
  const steps = over.budget?.steps ?? 200;
  return {
    id: "gd/default/toy",
    optimizer: "gd",
    use: "reference:gd",
    set: "default",
    hyper: { lr: 0.1 },
    problem: "toy",
    problemKey: "toy",
    params: { n: 2 },
    dim: 2,
    fStar: 0,
    fStarKind: "published",
    budget: { steps, evaluations: 0, seconds: 60 },
    stopAt: 0,
    ladder: [1e-1, 1e-2, 1e-4],
    blowUp: 1e6,
    checkpoints: logCheckpoints(steps),
    fingerprintSteps: 3,
    seeds: 3,
    measureEvery: 1,
    ...over,
  };
}
