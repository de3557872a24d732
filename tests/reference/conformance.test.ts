import { describe, expect, it } from "vitest";
import type { CheckResult } from "../../src/compare/types.js";
import { InputError } from "../../src/core/errors.js";
import type { Hyper, OptimizerFactory } from "../../src/core/types.js";
import { getOptimizer } from "../../src/optimizers/index.js";
import { checkConformance, relativeDifference } from "../../src/reference/conformance.js";
import { BOWL, FLAT } from "../../src/reference/probes.js";
import { type TrajectorySource, inProcessSource, runInProcess } from "../../src/reference/trajectory.js";
import { fixture, fixtureList, suiteFrom } from "./helpers.js";
import {
  throwingOptimizer,
  userAdam,
  userMomentum,
  userNesterov,
  userRmsprop,
  userSgd,
} from "./wrong-optimizers.js";

interface Declared {
  method: string;
  base?: Hyper;
  claim?: Hyper;
  names?: Record<string, string | null>;
  expect?: Record<string, string>;
  tolerance?: number;
}

async function conform(source: TrajectorySource, d: Declared): Promise<CheckResult[]> {
  return checkConformance({
    optimizer: "o",
    method: d.method,
    claim: d.claim ?? {},
    base: d.base ?? {},
    names: d.names ?? {},
    expect: d.expect ?? {},
    tolerance: d.tolerance ?? 1e-9,
    gating: true,
    source,
    where: "config test.yml: checks.conformance[0]",
  });
}

const ref = (name: string) => inProcessSource(getOptimizer(name), `reference:${name}`);
const user = (f: OptimizerFactory) => inProcessSource(f, `module:${f.name}`);

/** Axis key → the value the result names (from the per-axis results' summaries), "?" when not determined. */
function conventions(
  results: readonly CheckResult[],
  labels: Record<string, string>,
): Record<string, string> {
  const out: Record<string, string> = {};
  for (const r of results.slice(1)) {
    const axis = r.id.split(":")[2];
    const found = Object.entries(labels).find(([, text]) => r.summary.includes(text));
    out[axis] = r.status === "pass" && found ? found[0] : r.status;
  }
  return out;
}

/** Short, unique fragments of each value's label (src/reference/variants.ts). */
const LABELS: Record<string, string> = {
  "lr-inside": "learning rate inside the velocity",
  "lr-outside": "learning rate outside the velocity",
  lookahead: "the parameters hold w and",
  "stored-lookahead": "the parameters hold the look-ahead point",
  outside: "ε outside the square root",
  inside: "ε inside the square root",
  corrected: "ε added after bias correction",
  efficient: "ε added before bias correction",
  coupled: "coupled L2",
  "decoupled-scaled": "decoupled and scaled by the learning rate",
  decoupled: "decoupled and not scaled",
  raw: "running maximum of the raw second moment",
  "max-corrected": "running maximum of the bias-corrected second moment",
};

describe("conformance: correct code passes and its convention is recognised", () => {
  it.each<[string, TrajectorySource, Declared, Record<string, string>]>([
    ["reference SGD", ref("sgd"), { method: "sgd" }, {}],
    ["reference heavy ball, lr inside", ref("momentum"), { method: "momentum" }, { form: "lr-inside" }],
    [
      "reference heavy ball, lr outside",
      ref("momentum"),
      { method: "momentum", base: { form: "lr-outside" } },
      { form: "lr-outside" },
    ],
    [
      "user heavy ball, lr outside",
      user(userMomentum({ form: "outside" })),
      { method: "momentum" },
      { form: "lr-outside" },
    ],
    [
      "reference Nesterov, look-ahead",
      ref("nesterov"),
      { method: "nesterov" },
      { form: "lookahead", lrPlacement: "lr-inside" },
    ],
    [
      "reference Nesterov, stored look-ahead",
      ref("nesterov"),
      { method: "nesterov", base: { form: "stored-lookahead" } },
      { form: "stored-lookahead", lrPlacement: "lr-inside" },
    ],
    [
      "user Nesterov, look-ahead",
      user(userNesterov()),
      { method: "nesterov" },
      { form: "lookahead", lrPlacement: "lr-inside" },
    ],
    [
      "user Nesterov as frameworks write it",
      user(userNesterov({ framework: true })),
      { method: "nesterov" },
      { form: "stored-lookahead", lrPlacement: "lr-outside" },
    ],
    ["reference Adagrad", ref("adagrad"), { method: "adagrad" }, {}],
    ["reference RMSProp, ε outside", ref("rmsprop"), { method: "rmsprop" }, { epsPlacement: "outside" }],
    [
      "reference RMSProp, ε inside",
      ref("rmsprop"),
      { method: "rmsprop", base: { epsPlacement: "inside" } },
      { epsPlacement: "inside" },
    ],
    [
      "user RMSProp, ε inside",
      user(userRmsprop({ epsInside: true })),
      { method: "rmsprop" },
      { epsPlacement: "inside" },
    ],
    [
      "reference Adam, Algorithm 1",
      ref("adam"),
      { method: "adam" },
      { epsPlacement: "corrected", decay: "coupled" },
    ],
    [
      "reference Adam, efficient form",
      ref("adam"),
      { method: "adam", base: { epsPlacement: "efficient" } },
      { epsPlacement: "efficient", decay: "coupled" },
    ],
    [
      "user Adam, efficient form",
      user(userAdam({ eps: "efficient" })),
      { method: "adam" },
      { epsPlacement: "efficient", decay: "coupled" },
    ],
    [
      "reference AdamW, decay scaled by lr",
      ref("adamw"),
      { method: "adamw" },
      { epsPlacement: "corrected", decay: "decoupled-scaled" },
    ],
    [
      "reference AdamW, decay not scaled",
      ref("adamw"),
      { method: "adamw", base: { decayScaledByLr: false } },
      { epsPlacement: "corrected", decay: "decoupled" },
    ],
    [
      "user AdamW, decay scaled by lr",
      user(userAdam({ decay: "decoupled-scaled" })),
      { method: "adamw" },
      { epsPlacement: "corrected", decay: "decoupled-scaled" },
    ],
    [
      "user AdamW, decay not scaled",
      user(userAdam({ decay: "decoupled" })),
      { method: "adamw" },
      { epsPlacement: "corrected", decay: "decoupled" },
    ],
    [
      "reference AMSGrad, raw maximum",
      ref("adam"),
      { method: "adam", claim: { amsgrad: true } },
      { epsPlacement: "corrected", decay: "coupled", amsgradMax: "raw" },
    ],
    [
      "reference AMSGrad, corrected maximum",
      ref("adam"),
      { method: "adam", base: { amsgradMax: "corrected" }, claim: { amsgrad: true } },
      { epsPlacement: "corrected", decay: "coupled", amsgradMax: "max-corrected" },
    ],
    [
      "user AMSGrad, corrected maximum",
      user(userAdam({ amsgrad: "corrected" })),
      { method: "adam", claim: { amsgrad: true } },
      { epsPlacement: "corrected", decay: "coupled", amsgradMax: "max-corrected" },
    ],
  ])("%s", async (_name, source, declared, expected) => {
    const results = await conform(source, declared);
    expect(results[0].status, results[0].summary).toBe("pass");
    expect(results[0]).toMatchObject({
      id: "conformance:o",
      gating: true,
      tolerance: { kind: "relative", value: 1e-9 },
    });
    // how close the match is: a few roundings apart, far below the tolerance
    expect(results[0].measured!).toBeLessThanOrEqual(1e-12);
    expect(conventions(results, LABELS)).toEqual(expected);
    for (const axis of results.slice(1)) expect(axis.gating).toBe(false);
  });

  it("says when the two momentum forms cannot be told apart (no setLearningRate)", async () => {
    const results = await conform(user(userMomentum({ schedule: false })), { method: "momentum" });
    expect(results[0].status).toBe("pass");
    expect(results[0].summary).toContain("learning-rate placement: indistinguishable");
    expect(results[0].summary).toContain(
      "not run: schedule (the optimizer cannot change its learning rate between steps)",
    );
    expect(results[1]).toMatchObject({
      id: "conformance:o:form",
      status: "skipped",
      summary:
        "heavy-ball momentum learning-rate placement: indistinguishable at constant lr: both forms give the same iterates, and the optimizer cannot change its learning rate between steps",
    });
  });

  it("maps hyperparameter names and skips probes whose setting the optimizer lacks", async () => {
    const results = await conform(user(userSgd()), {
      method: "sgd",
      base: { learning_rate: 0.02 },
      names: { lr: "learning_rate", weightDecay: null },
    });
    expect(results[0].status).toBe("pass");
    expect(results[0].summary).toBe(
      "gradient descent (SGD) conformance: matches the published rule step for step on 3 probes (bowl, valley, schedule) " +
        "within 1.0e-9 (relative); not run: flat (no setting for weightDecay)",
    );
  });
});

describe("conformance: deliberately wrong code fails with a sentence a maintainer understands", () => {
  it("Nesterov with a dropped look-ahead (heavy ball)", async () => {
    const [r] = await conform(user(userNesterov({ dropLookahead: true })), { method: "nesterov" });
    expect(r.status).toBe("fail");
    expect(r.summary).toMatch(
      /^Nesterov's accelerated gradient conformance: from step 2 the iterates differ from the published rule by \d\.\de-\d \(relative, probe "[a-z ]+"\); the gradient is taken at the current point, not at the look-ahead point w − γv \(that is heavy ball\)$/,
    );
  });

  it("heavy ball with a wrong momentum coefficient", async () => {
    const [r] = await conform(user(userMomentum({ fixedMomentum: 0.8 })), {
      method: "momentum",
      base: { momentum: 0.9 },
    });
    expect(r.status).toBe("fail");
    expect(r.summary).toMatch(
      /^heavy-ball momentum conformance: from step 2 the iterates differ from the published rule by \d\.\de-\d \(relative, probe "[a-z ]+"\); step 1 agrees \(the velocity starts at zero\), so the gradient step is right and what carries over between steps differs: check the momentum coefficient and the velocity update$/,
    );
  });

  it("Adam with ε moved inside the square root (no published form)", async () => {
    const [r] = await conform(user(userAdam({ eps: "inside-sqrt" })), { method: "adam" });
    expect(r.status).toBe("fail");
    expect(r.summary).toMatch(
      /^Adam conformance: from step 1 the iterates differ from the published rule by \d\.\de-\d \(relative, probe "gradients of order 1e-3 with ε = 1e-2"\); the difference is largest on the probe "gradients of order 1e-3 with ε = 1e-2" \(\d\.\de-\d, against at most \d\.\de-\d+ elsewhere\), so ε enters differently from every known form$/,
    );
  });

  it("RMSProp with ε inside the square root where the declaration pins it outside", async () => {
    const results = await conform(user(userRmsprop({ epsInside: true })), {
      method: "rmsprop",
      expect: { epsPlacement: "outside" },
    });
    expect(results[0]).toMatchObject({
      status: "fail",
      summary:
        "RMSProp conformance: the code follows ε placement: ε inside the square root, η·g/√(E + ε), but the declaration expects ε outside the square root, η·g/(√E + ε)",
    });
    expect(results[1]).toMatchObject({ id: "conformance:o:epsPlacement", status: "fail" });
  });

  it("AdamW written as Adam + L2 (coupled decay)", async () => {
    const results = await conform(user(userAdam({ decay: "coupled" })), { method: "adamw" });
    expect(results[0].status).toBe("fail");
    expect(results[0].summary).toMatch(
      /^AdamW conformance: from step 1 the iterates differ from the published rule by \d\.\de-\d \(relative, probe "[^"]+"\); that is Adam with L2 regularisation, where the decay goes through the moment estimates, which AdamW avoids$/,
    );
    expect(results.find((x) => x.id === "conformance:o:decay")).toMatchObject({ status: "fail" });
  });

  it("Adam with decoupled decay declared as Adam + L2", async () => {
    const [r] = await conform(user(userAdam({ decay: "decoupled-scaled" })), { method: "adam" });
    expect(r.status).toBe("fail");
    expect(r.summary).toMatch(/; that is AdamW's decoupled decay, not Adam with L2 regularisation$/);
  });

  it("AMSGrad silently turned into Adam (the flag is ignored)", async () => {
    const [r] = await conform(user(userAdam({ amsgrad: "ignored" })), {
      method: "adam",
      claim: { amsgrad: true },
    });
    expect(r.status).toBe("fail");
    expect(r.summary).toMatch(
      /\(relative, probe "second moment falling early \(β2 = 0\.9\)"\); that is plain Adam: the AMSGrad maximum is not used$/,
    );
  });

  it("a learning-rate change applied one step late", async () => {
    const [r] = await conform(user(userSgd({ lateSchedule: true })), {
      method: "sgd",
      names: { lr: "learning_rate" },
    });
    expect(r.status).toBe("fail");
    expect(r.summary).toMatch(
      /^gradient descent \(SGD\) conformance: from step 9 the iterates differ from the published rule by \d\.\de-\d \(relative, probe "learning rate cut to a quarter after step 8"\); only the probe "learning rate cut to a quarter after step 8" departs, right after the learning-rate change, so the new learning rate is applied differently from the published rule: one step late, not at all, or to the accumulated velocity; not run: flat \(no setting for weightDecay\)$/,
    );
  });

  it("an optimizer that throws", async () => {
    const [r] = await conform(user(throwingOptimizer()), { method: "sgd" });
    expect(r).toMatchObject({
      status: "fail",
      summary:
        'gradient descent (SGD) conformance: the optimizer failed on the probe "diagonal quadratic": step 3 threw: out of memory (simulated)',
    });
  });

  it("an optimizer that rejects a name it is given says how to map names", async () => {
    const strict = userSgd();
    const hidden: TrajectorySource = {
      label: "module:strict",
      run: (req, obs) => inProcessSource(strict).run(req, obs),
    };
    const [r] = await conform(hidden, { method: "sgd" });
    expect(r.summary).toBe(
      'gradient descent (SGD) conformance: the optimizer failed on the probe "diagonal quadratic": creating the optimizer failed: ' +
        "user-sgd: unknown option lr; map or drop hyperparameter names with config test.yml: checks.conformance[0].names",
    );
  });
});

describe("conformance: the forms it compares with reproduce published values on its probes", () => {
  const first = (name: string, hyper: Hyper, definition = BOWL, steps = 1): Float64Array => {
    let last = new Float64Array(0);
    runInProcess(
      getOptimizer(name),
      { definition, params: {}, problemKey: definition.name, hyper, steps, suiteSeed: 0, seedIndex: 0 },
      (_k, x) => {
        last = Float64Array.from(x);
      },
    );
    return last;
  };

  it("Adam's first step is α·g/(|g| + ε) per coordinate (Kingma & Ba 2015, Algorithm 1)", () => {
    // expected: numpy, reference_values.out adam_first_step_bowl (α = 0.01, ε = 1e-8)
    expect(
      relativeDifference(first("adam", { lr: 0.01 }), Float64Array.from(fixtureList("adam_first_step_bowl"))),
    ).toBeLessThanOrEqual(1e-15);
  });

  it("RMSProp's first step is η/√(1 − ρ) per coordinate for a negligible ε (no bias correction; Ruder 2016 §4.5)", () => {
    const x = first("rmsprop", { lr: 0.001, rho: 0.9, eps: 1e-12 });
    // bowl start (1, −0.6, 0.8): each coordinate moves by η·3.1623 against its gradient's sign
    const ratio = fixture("rmsprop_first_step_ratio");
    expect(Math.abs((1 - x[0]) / 0.001 - ratio)).toBeLessThanOrEqual(1e-8); // absolute, ε/|g| of 1e-12
    expect(Math.abs((x[1] + 0.6) / 0.001 - ratio)).toBeLessThanOrEqual(1e-8);
  });

  it("with a zero loss gradient, AdamW shrinks θ by (1 − αλ) per step, Adam + L2 does not (Loshchilov & Hutter 2019, Algorithm 2)", () => {
    // θ₀ = 1 (FLAT's first coordinate), α = 1e-3, λ = 1e-2, 100 steps
    const scaled = first("adamw", { lr: 1e-3, weightDecay: 1e-2 }, FLAT, 100)[0];
    const unscaled = first("adamw", { lr: 1e-3, weightDecay: 1e-2, decayScaledByLr: false }, FLAT, 100)[0];
    const l2 = first("adam", { lr: 1e-3, weightDecay: 1e-2 }, FLAT, 100)[0];
    // absolute, 1e-14: a hundred multiplications, each rounded to about 1e-16
    expect(Math.abs(scaled - fixture("adamw_zero_grad_scaled_100"))).toBeLessThanOrEqual(1e-14); // 0.9990005 = (1 − lr·λ)^100: Loshchilov & Hutter (2019), Algorithm 2, decay scaled by lr [recomputed]
    expect(Math.abs(unscaled - 0.99 ** 100)).toBeLessThanOrEqual(1e-14); // (1 − λ)^100
    expect(Math.abs(l2 - fixture("adam_l2_zero_grad_100"))).toBeLessThanOrEqual(1e-12); // absolute; 0.9017437 = Adam with coupled L2 (Kingma & Ba 2015, Algorithm 1, gradient + λθ) [recomputed]
  });
});

describe("conformance: config", () => {
  const text = (check: string) => `
optimizers: [{ name: mine, use: adam }]
problems: [{ use: rosenbrock }]
checks: { conformance: [${check}] }
`;
  it.each<[string, string, string]>([
    [
      "an unknown method",
      "{ optimizer: mine, method: lion }",
      'config test.yml: checks.conformance[0].method must be one of "sgd", "momentum", "nesterov", "adagrad", "rmsprop", "adam", "adamw", got "lion"',
    ],
    [
      "a convention in the claim",
      "{ optimizer: mine, method: adam, hyper: { epsPlacement: efficient } }",
      "config test.yml: checks.conformance[0].hyper.epsPlacement selects a form, which the check finds out itself; pin it with config test.yml: checks.conformance[0].expect.epsPlacement instead",
    ],
    [
      "an invalid claimed value",
      "{ optimizer: mine, method: adam, hyper: { beta1: 1.5 } }",
      "config test.yml: checks.conformance[0].hyper.beta1 must be a number in [0, 1), got 1.5",
    ],
    [
      "a name that is no hyperparameter of the method",
      "{ optimizer: mine, method: adam, names: { momentum: mu } }",
      "config test.yml: checks.conformance[0].names.momentum is not a hyperparameter of adam (known: lr, beta1, beta2, eps, weightDecay, amsgrad)",
    ],
    [
      "an unknown convention",
      "{ optimizer: mine, method: rmsprop, expect: { form: lr-inside } }",
      "config test.yml: checks.conformance[0].expect.form is not a convention of rmsprop (known: epsPlacement)",
    ],
    [
      "a mix-up as expectation",
      "{ optimizer: mine, method: adamw, expect: { decay: coupled } }",
      'config test.yml: checks.conformance[0].expect.decay must be one of "decoupled-scaled", "decoupled", got "coupled"',
    ],
    [
      "an unknown set",
      "{ optimizer: mine, method: adam, set: fast }",
      'config test.yml: checks.conformance[0].set "fast" is not a hyperparameter set of mine (known: default)',
    ],
  ])("rejects %s", (_name, check, message) => {
    expect(() => suiteFrom(text(check))).toThrow(new InputError(message));
  });
});
