/**
 * The forms users actually write for each published method, as the conformance check tries them.
 *
 * A *convention axis* is one choice a correct implementation can make either way (where ε goes, whether
 * the parameters hold the look-ahead point, ...). Its values are the published or common forms; some
 * values are *not* forms of the claimed method but known mix-ups that the check recognises so it can
 * name them (AdamW written as Adam + L2, AMSGrad without its maximum). A *variant* is one combination of
 * axis values, run by a reference optimizer with the matching options; *impostors* are further known
 * mix-ups outside the axes (heavy ball claimed as Nesterov). Every value names where it is published.
 *
 * The axis keys and value keys are the reference optimizers' own option names and choices
 * (src/optimizers/), so `expect: { epsPlacement: inside }` in a config reads like the option it pins.
 */
import type { Hyper } from "../core/types.js";
import {
  adagrad,
  adam,
  adamw,
  momentum,
  nesterov,
  rmsprop,
  sgd,
  type ReferenceOptimizerFactory,
} from "../optimizers/index.js";

/** One value of a convention axis. */
export interface AxisValue {
  readonly key: string;
  /** What the code does, as a phrase: "ε inside the square root, η·g/√(E + ε)". */
  readonly label: string;
  /** Whether it is a form of the claimed method. */
  readonly accepted: boolean;
  /** Where this form is published (or "common practice"). */
  readonly source: string;
  /** For a value that is not a form of the claimed method: what that means, as a clause. */
  readonly meaning?: string;
}

/** One choice a correct implementation can make either way. */
export interface ConventionAxis {
  /** The reference optimizer option it corresponds to, e.g. "epsPlacement". */
  readonly key: string;
  /** "ε placement". */
  readonly title: string;
  readonly values: readonly AxisValue[];
  /** Ids of the probes whose iterates tell the values apart. */
  readonly exposedBy: readonly string[];
  /** Why the values could not be told apart when none of those probes ran. */
  readonly whenUnprobed: string;
}

/** One reference form to compare the optimizer under test with. */
export interface Variant {
  /** "ε placement: …; weight decay: …" or the impostor's name. */
  readonly label: string;
  readonly factory: ReferenceOptimizerFactory;
  /** Reference options set on top of the claim (the axis values). */
  readonly patch: Hyper;
  /** Multiplies every learning rate handed to the reference (dampened momentum). */
  readonly lrScale: number;
  /** Axis key → value key; empty for impostors outside the axes. */
  readonly values: Readonly<Record<string, string>>;
  readonly accepted: boolean;
  /** For a variant that is not the claimed method: what it means, as a clause. */
  readonly meaning?: string;
}

/** Everything the conformance check knows about one published method. */
export interface MethodCatalogue {
  readonly method: string;
  /** "Adam". */
  readonly title: string;
  readonly source: string;
  /** The reference optimizer whose hyperparameters the claim is written in. */
  readonly factory: ReferenceOptimizerFactory;
  readonly axes: readonly ConventionAxis[];
  readonly variants: readonly Variant[];
  /** Clause for a departure at step 1. */
  readonly firstStepHint: string;
  /** Clause for a departure after step 1. */
  readonly laterStepHint: string;
}

const SUTSKEVER =
  "Sutskever, Martens, Dahl & Hinton (2013), On the importance of initialization and momentum in deep learning, ICML, PMLR 28(3):1139–1147";
const KINGMA_BA = "Kingma & Ba (2015), Adam: A Method for Stochastic Optimization, ICLR, arXiv:1412.6980";
const LOSHCHILOV =
  "Loshchilov & Hutter (2019), Decoupled Weight Decay Regularization, ICLR, arXiv:1711.05101";
const REDDI = "Reddi, Kale & Kumar (2018), On the Convergence of Adam and Beyond, ICLR, Algorithm 2";

/** The reference options that select a form; a claim never sets them (a config pins them with `expect`). */
export const CONVENTION_KEYS: readonly string[] = ["form", "epsPlacement", "amsgradMax", "decayScaledByLr"];

/** The reference optimizer of each method. */
export const METHOD_FACTORIES: Readonly<Record<string, ReferenceOptimizerFactory>> = {
  sgd,
  momentum,
  nesterov,
  adagrad,
  rmsprop,
  adam,
  adamw,
};

export const METHODS: readonly string[] = Object.keys(METHOD_FACTORIES);

const MOMENTUM_FORM: ConventionAxis = {
  key: "form",
  title: "learning-rate placement",
  values: [
    {
      key: "lr-inside",
      label: "learning rate inside the velocity (v = γv + ηg; w −= v)",
      accepted: true,
      source: `Polyak (1964); ${SUTSKEVER}, eq. (1)–(2)`,
    },
    {
      key: "lr-outside",
      label: "learning rate outside the velocity (b = γb + g; w −= η·b)",
      accepted: true,
      source: "common practice (the same trajectory as v = η·b while the learning rate is constant)",
    },
  ],
  exposedBy: ["schedule"],
  whenUnprobed:
    "indistinguishable at constant lr: both forms give the same iterates, and the optimizer cannot change its learning rate between steps",
};

const NESTEROV_FORM: ConventionAxis = {
  key: "form",
  title: "look-ahead storage",
  values: [
    {
      key: "lookahead",
      label: "the parameters hold w and the gradient is taken at the look-ahead point w − γv",
      accepted: true,
      source: `${SUTSKEVER}, eq. (3)–(4)`,
    },
    {
      key: "stored-lookahead",
      label: "the parameters hold the look-ahead point u = w − γv and the gradient is taken there",
      accepted: true,
      source:
        "Bengio, Boulanger-Lewandowski & Pascanu (2013), Advances in optimizing recurrent networks, ICASSP, §3.5, arXiv:1212.0901",
    },
  ],
  exposedBy: ["bowl", "valley", "schedule", "flat"],
  whenUnprobed: "no probe ran",
};

const NESTEROV_LR: ConventionAxis = {
  key: "lrPlacement",
  title: "learning-rate placement",
  values: [
    {
      key: "lr-inside",
      label: "learning rate inside the velocity (v = γv + ηg)",
      accepted: true,
      source: `${SUTSKEVER}, eq. (3)–(4)`,
    },
    {
      key: "lr-outside",
      label: "learning rate outside the velocity (b = γb + g, steps of η·(…))",
      accepted: true,
      source: "common practice (the same trajectory as v = η·b while the learning rate is constant)",
    },
  ],
  exposedBy: ["schedule"],
  whenUnprobed: MOMENTUM_FORM.whenUnprobed,
};

const RMSPROP_EPS: ConventionAxis = {
  key: "epsPlacement",
  title: "ε placement",
  values: [
    {
      key: "outside",
      label: "ε outside the square root, η·g/(√E + ε)",
      accepted: true,
      source: "common practice",
    },
    {
      key: "inside",
      label: "ε inside the square root, η·g/√(E + ε)",
      accepted: true,
      source:
        "Graves (2013), Generating Sequences With Recurrent Neural Networks, §4, arXiv:1308.0850; Ruder (2016), arXiv:1609.04747, §4.5",
    },
  ],
  exposedBy: ["faint"],
  whenUnprobed: "not probed: the optimizer has no setting for ε, so the probe with a large ε could not run",
};

const ADAM_EPS: ConventionAxis = {
  key: "epsPlacement",
  title: "ε placement",
  values: [
    {
      key: "corrected",
      label: "ε added after bias correction, α·m̂/(√v̂ + ε)",
      accepted: true,
      source: `${KINGMA_BA}, Algorithm 1`,
    },
    {
      key: "efficient",
      label: "ε added before bias correction, αₜ·m/(√v + ε) with αₜ = α·√(1 − β2ᵗ)/(1 − β1ᵗ)",
      accepted: true,
      source: `${KINGMA_BA}, §2 (the efficient form)`,
    },
  ],
  exposedBy: ["faint"],
  whenUnprobed: "not probed: the optimizer has no setting for ε, so the probe with a large ε could not run",
};

function decayAxis(claimed: "adam" | "adamw"): ConventionAxis {
  const isAdamW = claimed === "adamw";
  return {
    key: "decay",
    title: "weight decay",
    values: [
      {
        key: "coupled",
        label: "coupled L2, λθ added to the gradient before the moment estimates",
        accepted: !isAdamW,
        source: "common practice (Adam with L2 regularisation); " + `${LOSHCHILOV}, §2`,
        meaning: isAdamW
          ? "that is Adam with L2 regularisation, where the decay goes through the moment estimates, which AdamW avoids"
          : undefined,
      },
      {
        key: "decoupled-scaled",
        label: "decoupled and scaled by the learning rate, θ −= α·λ·θ beside the Adam step",
        accepted: isAdamW,
        source: `${LOSHCHILOV}, Algorithm 2 with the decay multiplied by the learning rate (common practice)`,
        meaning: isAdamW ? undefined : "that is AdamW's decoupled decay, not Adam with L2 regularisation",
      },
      {
        key: "decoupled",
        label: "decoupled and not scaled by the learning rate, θ −= λ·θ beside the Adam step",
        accepted: isAdamW,
        source: `${LOSHCHILOV}, Algorithm 2 with schedule multiplier ηₜ = 1`,
        meaning: isAdamW ? undefined : "that is AdamW's decoupled decay, not Adam with L2 regularisation",
      },
    ],
    exposedBy: ["flat", "bowl", "valley", "schedule", "faint"],
    whenUnprobed: "not probed",
  };
}

const AMSGRAD_MAX: ConventionAxis = {
  key: "amsgradMax",
  title: "AMSGrad maximum",
  values: [
    {
      key: "raw",
      label: "running maximum of the raw second moment v",
      accepted: true,
      source: REDDI,
    },
    {
      key: "corrected",
      label: "running maximum of the bias-corrected second moment v̂",
      accepted: true,
      source: "common practice",
    },
    {
      key: "none",
      label: "no running maximum",
      accepted: false,
      source: `${KINGMA_BA}, Algorithm 1`,
      meaning: "that is plain Adam: the AMSGrad maximum is not used",
    },
  ],
  exposedBy: ["amsgrad"],
  whenUnprobed:
    "not probed: the optimizer has no setting for beta2, so the probe with β2 = 0.9 could not run",
};

/** Axis keys and value keys per method, for validating `expect` (independent of the claim). */
export const METHOD_AXES: Readonly<Record<string, readonly ConventionAxis[]>> = {
  sgd: [],
  momentum: [MOMENTUM_FORM],
  nesterov: [NESTEROV_FORM, NESTEROV_LR],
  adagrad: [],
  rmsprop: [RMSPROP_EPS],
  adam: [ADAM_EPS, decayAxis("adam"), AMSGRAD_MAX],
  adamw: [ADAM_EPS, decayAxis("adamw"), AMSGRAD_MAX],
};

/** Every combination of one value per axis, in axis order. */
function combinations(axes: readonly ConventionAxis[]): Record<string, AxisValue>[] {
  let out: Record<string, AxisValue>[] = [{}];
  for (const axis of axes) {
    const next: Record<string, AxisValue>[] = [];
    for (const partial of out) for (const value of axis.values) next.push({ ...partial, [axis.key]: value });
    out = next;
  }
  return out;
}

function axisVariants(
  axes: readonly ConventionAxis[],
  build: (values: Record<string, AxisValue>) => { factory: ReferenceOptimizerFactory; patch: Hyper },
): Variant[] {
  return combinations(axes).map((values) => {
    const { factory, patch } = build(values);
    const meanings = Object.values(values)
      .map((v) => v.meaning)
      .filter((m): m is string => m !== undefined);
    return {
      label: axes.map((a) => `${a.title}: ${values[a.key].label}`).join("; ") || "the published rule",
      factory,
      patch,
      lrScale: 1,
      values: Object.fromEntries(Object.entries(values).map(([k, v]) => [k, v.key])),
      accepted: Object.values(values).every((v) => v.accepted),
      ...(meanings.length > 0 ? { meaning: meanings.join("; ") } : {}),
    };
  });
}

/**
 * The catalogue of `method` for a claim (complete reference hyperparameters) and the reference names the
 * optimizer under test lets the check set. Axes that cannot matter for this claim are left out: the
 * AMSGrad maximum unless the claim uses AMSGrad, the weight decay unless it is settable or nonzero.
 */
export function methodCatalogue(
  method: string,
  claim: Hyper,
  settable: ReadonlySet<string>,
): MethodCatalogue {
  const gamma = typeof claim.momentum === "number" ? claim.momentum : 0;
  switch (method) {
    case "sgd":
      return {
        method,
        title: "gradient descent (SGD)",
        source:
          "Robbins & Monro (1951), A Stochastic Approximation Method, Ann. Math. Statist. 22(3):400–407",
        factory: sgd,
        axes: [],
        variants: axisVariants([], () => ({ factory: sgd, patch: {} })),
        firstStepHint:
          "the step x −= η·∇f(x) already differs: check the learning rate and how the gradient is used",
        laterStepHint:
          "step 1 agrees, so something carried between steps differs (the learning rate or a hidden state)",
      };
    case "momentum":
      return {
        method,
        title: "heavy-ball momentum",
        source: `Polyak (1964), USSR Comput. Math. Math. Phys. 4(5):1–17, doi:10.1016/0041-5553(64)90137-5; ${SUTSKEVER}, eq. (1)–(2)`,
        factory: momentum,
        axes: [MOMENTUM_FORM],
        variants: [
          ...axisVariants([MOMENTUM_FORM], (v) => ({ factory: momentum, patch: { form: v.form.key } })),
          {
            label: "Nesterov's accelerated gradient",
            factory: nesterov,
            patch: { form: "lookahead" },
            lrScale: 1,
            values: {},
            accepted: false,
            meaning:
              "they follow Nesterov's method instead: the gradient is taken at the look-ahead point w − γv",
          },
          {
            label: "dampened momentum",
            factory: momentum,
            patch: { form: "lr-outside" },
            lrScale: 1 - gamma,
            values: {},
            accepted: false,
            meaning: "the velocity is dampened, b = γb + (1 − γ)g, which scales every step by 1 − γ",
          },
        ],
        firstStepHint:
          "the first step −η∇f(w₀) already differs (the velocity starts at zero): check the learning rate and the gradient",
        laterStepHint:
          "step 1 agrees (the velocity starts at zero), so the gradient step is right and what carries over between steps differs: check the momentum coefficient and the velocity update",
      };
    case "nesterov":
      return {
        method,
        title: "Nesterov's accelerated gradient",
        source: `Nesterov (1983), Soviet Mathematics Doklady 27(2):372–376; ${SUTSKEVER}, eq. (3)–(4)`,
        factory: nesterov,
        axes: [NESTEROV_FORM, NESTEROV_LR],
        variants: [
          ...axisVariants([NESTEROV_FORM, NESTEROV_LR], (v) => ({
            factory: nesterov,
            patch: { form: v.form.key, lrPlacement: v.lrPlacement.key },
          })),
          ...(["lr-inside", "lr-outside"] as const).map((form) => ({
            label: "heavy-ball momentum",
            factory: momentum,
            patch: { form },
            lrScale: 1,
            values: {},
            accepted: false,
            meaning:
              "the gradient is taken at the current point, not at the look-ahead point w − γv (that is heavy ball)",
          })),
        ],
        firstStepHint:
          "the first step already differs (the velocity starts at zero): check the learning rate and the gradient",
        laterStepHint:
          "step 1 agrees (the velocity starts at zero), so what carries over between steps differs: check the momentum coefficient, the velocity update and where the gradient is taken",
      };
    case "adagrad":
      return {
        method,
        title: "Adagrad",
        source:
          "Duchi, Hazan & Singer (2011), Adaptive Subgradient Methods for Online Learning and Stochastic Optimization, JMLR 12:2121–2159",
        factory: adagrad,
        axes: [],
        variants: axisVariants([], () => ({ factory: adagrad, patch: {} })),
        firstStepHint:
          "the first step η·g/(δ + |g|) already differs: check the learning rate, δ and the initial accumulator",
        laterStepHint: "step 1 agrees, so the accumulation of squared gradients differs",
      };
    case "rmsprop":
      return {
        method,
        title: "RMSProp",
        source: "Graves (2013), arXiv:1308.0850, §4; Ruder (2016), arXiv:1609.04747, §4.5",
        factory: rmsprop,
        axes: [RMSPROP_EPS],
        variants: axisVariants([RMSPROP_EPS], (v) => ({
          factory: rmsprop,
          patch: { epsPlacement: v.epsPlacement.key },
        })),
        firstStepHint:
          "the first step η·g/(√((1 − ρ)g²) + ε) already differs (no bias correction): check ρ, ε and the learning rate",
        laterStepHint: "step 1 agrees, so the running mean of g² differs: check ρ and the update of the mean",
      };
    case "adam":
    case "adamw": {
      const isAdamW = method === "adamw";
      const axes: ConventionAxis[] = [ADAM_EPS];
      const lambda = typeof claim.weightDecay === "number" ? claim.weightDecay : 0;
      if (settable.has("weightDecay") || lambda > 0) axes.push(decayAxis(method));
      if (claim.amsgrad === true) axes.push(AMSGRAD_MAX);
      return {
        method,
        title: isAdamW ? "AdamW" : "Adam",
        source: isAdamW ? `${LOSHCHILOV}, Algorithm 2` : `${KINGMA_BA}, Algorithm 1`,
        factory: isAdamW ? adamw : adam,
        axes,
        variants: axisVariants(axes, (v) => {
          const decay = v.decay?.key ?? (isAdamW ? "decoupled-scaled" : "coupled");
          const ams = v.amsgradMax?.key;
          const patch: Record<string, string | boolean> = { epsPlacement: v.epsPlacement.key };
          if (ams !== undefined) {
            patch.amsgrad = ams !== "none";
            patch.amsgradMax = ams === "none" ? "raw" : ams;
          }
          if (decay === "coupled") return { factory: adam, patch };
          return { factory: adamw, patch: { ...patch, decayScaledByLr: decay === "decoupled-scaled" } };
        }),
        firstStepHint:
          "the first step α·g/(|g| + ε) per coordinate already differs (Kingma & Ba 2015, Algorithm 1): check the bias correction, ε and the learning rate",
        laterStepHint:
          "step 1 agrees, so the moment estimates of later steps differ: check β1, β2, the bias corrections and that the step counter advances once per step",
      };
    }
    default:
      throw new RangeError(`methodCatalogue: unknown method ${JSON.stringify(method)}`);
  }
}
