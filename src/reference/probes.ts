/**
 * Probes of the conformance check: small deterministic problems and hyperparameters chosen so that each
 * convention shows in the iterates within a few dozen steps.
 *
 * - bowl: f = ½(x₁² + 3x₂² + 0.5x₃²) from (1, −0.6, 0.8): gradients of order 1, distinct curvatures.
 * - valley: f = ½(x₁ − 1)² + 2(x₂ − x₁²)² from (−0.8, 0.9): nonlinear, coupled coordinates, so a
 *   gradient taken at the wrong point cannot agree by accident.
 * - faint: f = ½(0.004x₁² + 0.001x₂²) from (0.3, −0.5): gradients of order 1e−3, run with ε = 1e−2, where
 *   ε inside or outside a square root, before or after a bias correction, changes every step. (Not 1e−3:
 *   with β2 = 0.999, √ε = √(1 − β2) would make ε inside √v̂ look like Adam's efficient form at step 1.)
 * - flat: f ≡ 0 from (1, −2, 0.5): a zero loss gradient, so only the weight decay moves the parameters and
 *   coupled, decoupled, scaled and unscaled decay all differ (Loshchilov & Hutter 2019, Algorithm 2).
 * - schedule: the bowl with the learning rate cut to a quarter after step 8, which separates the two
 *   momentum forms (they differ only once the learning rate changes) and catches a schedule applied late.
 * - amsgrad: the bowl with β2 = 0.9 and a larger step, where the second moment falls early, so the running
 *   maximum of v, of v̂, or none at all give different steps.
 * The problems are constructed here (common practice); their start points ignore the seed.
 */
import type { Hyper, ProblemDefinition, ProblemInstance } from "../core/types.js";

/** One probe: a problem, what it sets, and what it needs from the optimizer under test. */
export interface Probe {
  readonly id: string;
  /** What it exposes, as a phrase for messages. */
  readonly title: string;
  readonly definition: ProblemDefinition;
  readonly steps: number;
  /** Reference hyperparameters it sets (each only if the optimizer under test lets the check set it). */
  readonly set: Hyper;
  /** Reference names that must be settable, else the probe does not run. */
  readonly requires: readonly string[];
  /** Multiply the learning rate by `factor` after step `after`. */
  readonly lrChange?: { readonly after: number; readonly factor: number };
}

function probeProblem(
  name: string,
  title: string,
  x0: readonly number[],
  fg: (x: Float64Array, g: Float64Array) => number,
): ProblemDefinition {
  const dim = x0.length;
  const scratch = new Float64Array(dim);
  return {
    name,
    title,
    tags: ["probe"],
    source: "constructed here for the conformance check (common practice)",
    params: {},
    create(): ProblemInstance {
      return {
        key: name,
        dim,
        fStar: 0,
        fStarKind: "lower-bound",
        xStar: null,
        stochastic: false,
        evaluate: fg,
        objective: (x) => fg(x, scratch),
        start(out) {
          for (let i = 0; i < dim; i++) out[i] = x0[i];
        },
      };
    },
  };
}

function diagonal(
  name: string,
  title: string,
  a: readonly number[],
  x0: readonly number[],
): ProblemDefinition {
  return probeProblem(name, title, x0, (x, g) => {
    let f = 0;
    for (let i = 0; i < a.length; i++) {
      g[i] = a[i] * x[i];
      f += 0.5 * a[i] * x[i] * x[i];
    }
    return f;
  });
}

export const BOWL = diagonal("probe-bowl", "diagonal quadratic", [1, 3, 0.5], [1, -0.6, 0.8]);

export const VALLEY = probeProblem("probe-valley", "curved valley", [-0.8, 0.9], (x, g) => {
  const r = x[1] - x[0] * x[0];
  g[0] = x[0] - 1 - 8 * x[0] * r;
  g[1] = 4 * r;
  return 0.5 * (x[0] - 1) * (x[0] - 1) + 2 * r * r;
});

export const FAINT = diagonal(
  "probe-faint",
  "quadratic with gradients of order 1e-3",
  [0.004, 0.001],
  [0.3, -0.5],
);

export const FLAT = probeProblem("probe-flat", "zero loss gradient", [1, -2, 0.5], (_x, g) => {
  g.fill(0);
  return 0;
});

/** Step sizes that keep each method stable on the bowl and the valley (curvatures up to about 9). */
const PROBE_LR: Readonly<Record<string, number>> = {
  sgd: 0.05,
  momentum: 0.02,
  nesterov: 0.02,
  adagrad: 0.1,
  rmsprop: 0.01,
  adam: 0.01,
  adamw: 0.01,
};

/** The probes for `method` and a claim (complete reference hyperparameters). */
export function probesFor(method: string, claim: Hyper): Probe[] {
  const lr = PROBE_LR[method];
  if (lr === undefined) throw new RangeError(`probesFor: unknown method ${JSON.stringify(method)}`);
  const probes: Probe[] = [
    { id: "bowl", title: "diagonal quadratic", definition: BOWL, steps: 24, set: { lr }, requires: [] },
    { id: "valley", title: "curved valley", definition: VALLEY, steps: 24, set: { lr }, requires: [] },
    {
      id: "schedule",
      title: "learning rate cut to a quarter after step 8",
      definition: BOWL,
      steps: 24,
      set: { lr },
      requires: [],
      lrChange: { after: 8, factor: 0.25 },
    },
  ];
  if (method === "adagrad" || method === "rmsprop" || method === "adam" || method === "adamw") {
    probes.push({
      id: "faint",
      title: "gradients of order 1e-3 with ε = 1e-2",
      definition: FAINT,
      steps: 24,
      set: { lr: method === "adagrad" ? 0.01 : 0.002, eps: 1e-2 },
      requires: ["eps"],
    });
  }
  probes.push({
    id: "flat",
    title: "zero loss gradient with weight decay 0.1",
    definition: FLAT,
    steps: 16,
    set: {
      lr: method === "adam" || method === "adamw" || method === "rmsprop" ? 0.01 : 0.1,
      weightDecay: 0.1,
    },
    requires: ["weightDecay"],
  });
  if ((method === "adam" || method === "adamw") && claim.amsgrad === true) {
    probes.push({
      id: "amsgrad",
      title: "second moment falling early (β2 = 0.9)",
      definition: BOWL,
      steps: 40,
      set: { lr: 0.05, beta2: 0.9 },
      requires: ["beta2"],
    });
  }
  return probes;
}
