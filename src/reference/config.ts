/**
 * The `checks` section of a suite config: validated against its JSON Schema fragment (the single home of
 * its defaults, `checksSchema` in src/config/schema.ts) and bound to the resolved suite — every
 * declaration to the cases it applies to — with one clear message per mistake naming the field, the bad
 * value and the expected form.
 */
import { Ajv2020 } from "ajv/dist/2020.js";
import type { ErrorObject } from "ajv";
import { checksSchema } from "../config/schema.js";
import { InputError, quote } from "../core/errors.js";
import type { Hyper, ProblemDefinition } from "../core/types.js";
import { resolveHyper } from "../optimizers/index.js";
import { getProblem } from "../problems/index.js";
import type { CaseSpec, SuiteSpec } from "../runner/types.js";
import { checkExpect } from "./conformance.js";
import type { LinearMethod } from "./linear-rate.js";
import type { MinimumTolerance } from "./known-minimum.js";
import { numberHyper } from "./rate-check.js";
import { probeInstance, quadraticFacts } from "./spectrum.js";
import { CONVENTION_KEYS, METHOD_AXES, METHOD_FACTORIES, METHODS } from "./variants.js";

/** Fields every declaration has after validation. */
interface Declared {
  /** Where it is in the config, e.g. "config gradgate.yml: checks.minimum[0]". */
  readonly where: string;
  readonly optimizer: string;
  readonly gating: boolean;
}

/** A declaration bound to the cases it checks, each with its problem definition. */
export interface Targets {
  readonly cases: readonly { readonly spec: CaseSpec; readonly definition: ProblemDefinition }[];
}

export interface MinimumCheck extends Declared, Targets {
  readonly basin: string;
  readonly tolerance: MinimumTolerance;
  readonly share: number;
}

export interface RateCheck extends Declared, Targets {
  readonly method: LinearMethod;
  readonly tuned: boolean;
  readonly names: { readonly lr: string; readonly momentum: string };
  readonly tolerance: number;
  readonly steps: number;
}

export interface StationaryCheck extends Declared, Targets {
  readonly names: { readonly lr: string };
  readonly precision: number;
  readonly sigmas: number;
}

export interface ConformanceCheck extends Declared {
  readonly set: string;
  readonly method: string;
  readonly hyper: Hyper;
  readonly names: Readonly<Record<string, string | null>>;
  readonly expect: Readonly<Record<string, string>>;
  readonly tolerance: number;
  /** The case whose hyperparameters the claim starts from, and whose optimizer (`use`) is checked. */
  readonly spec: CaseSpec;
}

/** The `checks` section, bound to a suite. */
export interface ReferenceChecks {
  readonly minimum: readonly MinimumCheck[];
  readonly rate: readonly RateCheck[];
  readonly stationary: readonly StationaryCheck[];
  readonly conformance: readonly ConformanceCheck[];
}

/** The raw, defaulted shape the schema guarantees. */
interface RawTarget {
  optimizer: string;
  problem: string;
  set?: string;
  gating: boolean;
}
interface RawChecks {
  minimum: (RawTarget & { basin: string; tolerance: MinimumTolerance; share: number })[];
  rate: (RawTarget & {
    method: LinearMethod;
    tuned: boolean;
    names: { lr: string; momentum: string };
    tolerance: number;
    steps: number;
  })[];
  stationary: (RawTarget & { names: { lr: string }; precision: number; sigmas: number })[];
  conformance: {
    optimizer: string;
    set: string;
    method: string;
    hyper?: Hyper;
    names: Record<string, string | null>;
    expect: Record<string, string>;
    tolerance: number;
    gating: boolean;
  }[];
}

let validator: ReturnType<Ajv2020["compile"]> | null = null;

function compile() {
  if (validator === null) {
    // verbose: errors carry their schema, so a message can list the known fields
    const ajv = new Ajv2020({
      allErrors: true,
      verbose: true,
      useDefaults: true,
      strict: true,
      allowUnionTypes: true,
    });
    // Wrapped, because ajv applies defaults to properties only (not to the schema root).
    validator = ajv.compile({ type: "object", properties: { checks: checksSchema } });
  }
  return validator;
}

/** "/checks/rate/0/method" → ".rate[0].method". */
function pathOf(pointer: string): string {
  return pointer
    .split("/")
    .slice(2)
    .map((p) => (/^\d+$/.test(p) ? `[${p}]` : `.${p}`))
    .join("");
}

function describe(errors: readonly ErrorObject[], data: unknown, where: string): string {
  const lines: string[] = [];
  const seen = new Set<string>();
  for (const e of errors) {
    const path = pathOf(e.instancePath);
    const field = `${where}${path}`;
    const p = e.params as Record<string, unknown>;
    let value: unknown = data;
    for (const part of e.instancePath.split("/").slice(1)) value = (value as Record<string, unknown>)?.[part];
    let line: string;
    switch (e.keyword) {
      case "additionalProperties": {
        const known = Object.keys((e.parentSchema as { properties?: object })?.properties ?? {}).join(", ");
        line = `${field}.${String(p.additionalProperty)} is not a known field (known: ${known})`;
        break;
      }
      case "required":
        line = `${field}.${String(p.missingProperty)} is required`;
        break;
      case "enum":
        line = `${field} must be one of ${(p.allowedValues as unknown[]).map((v) => JSON.stringify(v)).join(", ")}, got ${quote(value)}`;
        break;
      case "type":
        line = `${field} must be ${[p.type]
          .flat()
          .map((t) => (t === "null" ? "null" : /^[aeiou]/.test(String(t)) ? `an ${t}` : `a ${t}`))
          .join(" or ")}, got ${quote(value)}`;
        break;
      case "minimum":
      case "maximum":
      case "exclusiveMinimum":
      case "exclusiveMaximum": {
        const op = { minimum: "≥", maximum: "≤", exclusiveMinimum: ">", exclusiveMaximum: "<" }[e.keyword];
        line = `${field} must be ${op} ${String(p.limit)}, got ${quote(value)}`;
        break;
      }
      default:
        line = `${field} ${e.message ?? "is invalid"}, got ${quote(value)}`;
    }
    const key = `${path}|${e.keyword}`;
    if (seen.has(key)) continue;
    seen.add(key);
    lines.push(line);
  }
  return lines.join("\n");
}

/** Validates the `checks` section and fills in its defaults. `where` names it, e.g. "config gradgate.yml: checks". */
export function parseChecks(raw: unknown, where: string): RawChecks {
  const data = structuredClone(raw ?? {});
  if (data === null || typeof data !== "object" || Array.isArray(data)) {
    throw new InputError(`${where} must be a mapping, got ${quote(raw)}`);
  }
  const validate = compile();
  const wrapped = { checks: data };
  if (!validate(wrapped)) throw new InputError(describe(validate.errors ?? [], wrapped, where));
  return wrapped.checks as unknown as RawChecks;
}

function knownOptimizers(suite: SuiteSpec): string[] {
  return [...new Set(suite.cases.map((c) => c.optimizer))];
}

function checkOptimizer(suite: SuiteSpec, name: string, where: string): void {
  const known = knownOptimizers(suite);
  if (!known.includes(name)) {
    throw new InputError(
      `${where}.optimizer ${quote(name)} is not an optimizer of the suite (known: ${known.join(", ")})`,
    );
  }
}

/** The cases a declaration applies to; at least one, else an error saying what the suite has. */
function matchCases(suite: SuiteSpec, d: RawTarget, where: string): Targets["cases"] {
  checkOptimizer(suite, d.optimizer, where);
  // Scenario cases replay a resume or a learning-rate change, which the checks' own runs do not: ordinary cases only.
  const own = suite.cases.filter((c) => c.optimizer === d.optimizer && c.scenario === undefined);
  const found = own.filter(
    (c) =>
      (c.problem === d.problem || c.problemKey === d.problem) && (d.set === undefined || c.set === d.set),
  );
  if (found.length === 0) {
    const problems = [...new Set(own.map((c) => c.problemKey))].join(", ");
    const sets = [...new Set(own.map((c) => c.set))].join(", ");
    throw new InputError(
      `${where} matches no case: ${d.optimizer} runs ${problems} (sets: ${sets}), not ${quote(d.problem)}` +
        (d.set !== undefined ? ` in set ${quote(d.set)}` : ""),
    );
  }
  return found.map((spec) => ({ spec, definition: getProblem(spec.problem) }));
}

/**
 * Validates `raw` (the config's `checks`, possibly absent) and binds every declaration to the suite.
 * `file` names the config in messages.
 */
export function resolveChecks(raw: unknown, suite: SuiteSpec, file: string): ReferenceChecks {
  const where = `config ${file}: checks`;
  const checks = parseChecks(raw, where);

  const minimum = checks.minimum.map((d, i): MinimumCheck => {
    const w = `${where}.minimum[${i}]`;
    const cases = matchCases(suite, d, w);
    for (const { spec, definition } of cases) {
      const basins = (definition.basins ?? []).map((b) => b.name);
      if (d.basin === "global") {
        if (spec.fStarKind === "lower-bound") {
          throw new InputError(
            `${w}: problem ${spec.problemKey} knows only a lower bound of f*, so it has no known minimum to reach`,
          );
        }
      } else if (!basins.includes(d.basin)) {
        throw new InputError(
          `${w}.basin ${quote(d.basin)} is not a basin of problem ${definition.name} (known: global${basins.map((b) => ", " + b).join("")})`,
        );
      }
      const target =
        d.basin === "global" ? spec.fStar : definition.basins!.find((b) => b.name === d.basin)!.f;
      if (d.tolerance.kind === "relative" && target === 0) {
        throw new InputError(
          `${w}.tolerance: a relative tolerance needs a nonzero target, and ${spec.problemKey} has f = 0 there; use kind: absolute`,
        );
      }
    }
    return {
      where: w,
      optimizer: d.optimizer,
      gating: d.gating,
      cases,
      basin: d.basin,
      tolerance: d.tolerance,
      share: d.share,
    };
  });

  const rate = checks.rate.map((d, i): RateCheck => {
    const w = `${where}.rate[${i}]`;
    const cases = matchCases(suite, d, w);
    for (const { spec, definition } of cases) {
      const instance = probeInstance(definition, spec.params);
      if (quadraticFacts(instance) === null || instance.stochastic) {
        throw new InputError(
          `${w}.problem: ${spec.problemKey} has no known spectrum; rate checks need a quadratic (quadratic, or noisy-quadratic with sigma: 0)`,
        );
      }
      if (!d.tuned) {
        numberHyper(spec, d.names.lr, w, "step size", true);
        if (d.method !== "gradient-descent") numberHyper(spec, d.names.momentum, w, "momentum", true);
      }
    }
    return {
      where: w,
      optimizer: d.optimizer,
      gating: d.gating,
      cases,
      method: d.method,
      tuned: d.tuned,
      names: d.names,
      tolerance: d.tolerance,
      steps: d.steps,
    };
  });

  const stationary = checks.stationary.map((d, i): StationaryCheck => {
    const w = `${where}.stationary[${i}]`;
    const cases = matchCases(suite, d, w);
    for (const { spec, definition } of cases) {
      const facts = quadraticFacts(probeInstance(definition, spec.params));
      if (facts === null || !(facts.sigma > 0) || facts.rotation !== null) {
        throw new InputError(
          `${w}.problem: ${spec.problemKey} is not a diagonal quadratic with gradient noise (use noisy-quadratic with sigma > 0)`,
        );
      }
      const lr = numberHyper(spec, d.names.lr, w, "step size");
      const bad = Array.from(facts.eigenvalues).find((l) => !(lr * l > 0 && lr * l < 2));
      if (bad !== undefined) {
        throw new InputError(
          `${w}: case ${spec.id} has lr·λ = ${lr * bad} for λ = ${bad}; SGD has a stationary distribution only for 0 < lr·λ < 2`,
        );
      }
    }
    return {
      where: w,
      optimizer: d.optimizer,
      gating: d.gating,
      cases,
      names: d.names,
      precision: d.precision,
      sigmas: d.sigmas,
    };
  });

  const conformance = checks.conformance.map((d, i): ConformanceCheck => {
    const w = `${where}.conformance[${i}]`;
    checkOptimizer(suite, d.optimizer, w);
    if (!METHODS.includes(d.method)) {
      throw new InputError(
        `${w}.method must be one of ${METHODS.map((m) => JSON.stringify(m)).join(", ")}, got ${quote(d.method)}`,
      );
    }
    const spec = suite.cases.find(
      (c) => c.optimizer === d.optimizer && c.set === d.set && c.scenario === undefined,
    );
    if (spec === undefined) {
      const sets = [
        ...new Set(suite.cases.filter((c) => c.optimizer === d.optimizer).map((c) => c.set)),
      ].join(", ");
      throw new InputError(
        `${w}.set ${quote(d.set)} is not a hyperparameter set of ${d.optimizer} (known: ${sets})`,
      );
    }
    const factory = METHOD_FACTORIES[d.method];
    const referenceNames = Object.keys(factory.hyperSpecs).filter((k) => !CONVENTION_KEYS.includes(k));
    for (const key of Object.keys(d.names)) {
      if (!referenceNames.includes(key)) {
        throw new InputError(
          `${w}.names.${key} is not a hyperparameter of ${d.method} (known: ${referenceNames.join(", ")})`,
        );
      }
    }
    const hyper = d.hyper ?? {};
    for (const key of Object.keys(hyper)) {
      if (CONVENTION_KEYS.includes(key)) {
        throw new InputError(
          `${w}.hyper.${key} selects a form, which the check finds out itself; pin it with ${w}.expect.${key} instead`,
        );
      }
    }
    resolveHyper(factory, hyper, `${w}.hyper`);
    checkExpect(d.method, d.expect, METHOD_AXES[d.method], w);
    return {
      where: w,
      optimizer: d.optimizer,
      gating: d.gating,
      set: d.set,
      method: d.method,
      hyper,
      names: d.names,
      expect: d.expect,
      tolerance: d.tolerance,
      spec,
    };
  });

  return { minimum, rate, stationary, conformance };
}
