/**
 * Conformance to a published update rule: is the optimizer under test the method it claims to be, and
 * which of the method's forms does it follow?
 *
 * The optimizer under test and every known form of the claimed method (./variants.ts) run the same
 * probes (./probes.ts): same problem, same start, same hyperparameters, step by step. Each probe is a
 * small deterministic problem, so the same point always gets the same gradient; the probes are chosen so
 * that every convention shows (a learning-rate change for the momentum forms, a large ε for its
 * placement, a zero loss gradient for the weight decay, a falling second moment for AMSGrad). At every
 * step the iterates are compared norm-wise:
 *
 *   d_k = ‖c_k − r_k‖∞ / max(‖c_k‖∞, ‖r_k‖∞)          (relative)
 *
 * and a form *matches* when d_k ≤ tolerance at every step of every probe that ran. The default 1e−9 is far
 * above the rounding differences of equivalent arithmetic in double precision (about 1e−15 per step; a
 * few dozen steps are compared) and far below what a different rule produces on these probes (1e−6 and
 * more); float32 code needs about 1e−5 (docs/decisions/0003-reference-checks.md).
 *
 * The outcome: "is it right" — some accepted form matches (and the `expect` pins hold) — and "which
 * variant" — per convention axis, the values of the forms that match. When no accepted form matches, the
 * message names the first step at which the closest accepted form departs, by how much, and why that is
 * likely (a known mix-up that does match, or what a departure at that step and probe points to).
 */
import { InputError } from "../core/errors.js";
import type { Hyper, HyperValue } from "../core/types.js";
import type { CheckResult } from "../compare/types.js";
import { resolveHyper } from "../optimizers/index.js";
import { short } from "./format.js";
import { probesFor, type Probe } from "./probes.js";
import { type TrajectoryRequest, type TrajectorySource, runInProcess } from "./trajectory.js";
import {
  CONVENTION_KEYS,
  METHOD_FACTORIES,
  type ConventionAxis,
  type MethodCatalogue,
  type Variant,
  methodCatalogue,
} from "./variants.js";

/** What a conformance check needs. */
export interface ConformanceRequest {
  /** The optimizer's name in the suite (used in check ids). */
  readonly optimizer: string;
  /** The reference optimizer of the claimed method, e.g. "adam". */
  readonly method: string;
  /** Claimed hyperparameters in the reference's names (partial; defaults fill the rest). */
  readonly claim: Hyper;
  /** The optimizer's own hyperparameters (its case's values), in its own names. */
  readonly base: Hyper;
  /** Reference name → the optimizer's name, or null when it has no such setting. */
  readonly names: Readonly<Record<string, string | null>>;
  /** Axis key → value key the code must follow. */
  readonly expect: Readonly<Record<string, string>>;
  /** Relative (norm-wise) tolerance on the iterates. */
  readonly tolerance: number;
  readonly gating: boolean;
  readonly source: TrajectorySource;
  /** Locates the declaration in messages, e.g. "config gradgate.yml: checks.conformance[0]". */
  readonly where: string;
}

/** Where a form first leaves the optimizer's iterates on one probe. */
export interface Departure {
  readonly probe: Probe;
  readonly step: number;
  /** d_k at that step (Infinity when one side is not finite). */
  readonly relative: number;
}

/** How one form compares with the optimizer on every probe that ran. */
export interface VariantResult {
  readonly variant: Variant;
  /** The earliest departure over the probes, or null when it matches everywhere. */
  readonly departure: Departure | null;
  /** Probes it matches. */
  readonly matched: number;
  /** Largest d_k over every compared step (for a matching form: how close the match is). */
  readonly maxRelative: number;
  /** Departure per probe id (null: matches on that probe). */
  readonly byProbe: ReadonlyMap<string, Departure | null>;
}

/** Relative norm-wise difference of two iterates; 0 for bitwise-equal NaN coordinates, Infinity for one-sided non-finite. */
export function relativeDifference(a: Float64Array, b: Float64Array): number {
  let diff = 0;
  let scale = 0;
  for (let i = 0; i < a.length; i++) {
    const x = a[i];
    const y = b[i];
    if (!Number.isFinite(x) || !Number.isFinite(y)) {
      if (Object.is(x, y)) continue;
      return Infinity;
    }
    diff = Math.max(diff, Math.abs(x - y));
    scale = Math.max(scale, Math.abs(x), Math.abs(y));
  }
  if (diff === 0) return 0;
  return diff / scale;
}

/**
 * The optimizer's name for each non-convention reference hyperparameter: the declared mapping, else the
 * same name when the optimizer declares it (or when its names are unknown), else null.
 */
export function resolveNames(
  method: string,
  declared: Readonly<Record<string, string | null>>,
  known: readonly string[] | undefined,
): Record<string, string | null> {
  const factory = METHOD_FACTORIES[method];
  const out: Record<string, string | null> = {};
  for (const name of Object.keys(factory.hyperSpecs)) {
    if (CONVENTION_KEYS.includes(name)) continue;
    if (Object.prototype.hasOwnProperty.call(declared, name)) out[name] = declared[name];
    else out[name] = known === undefined || known.includes(name) ? name : null;
  }
  return out;
}

/** The complete claim: reference defaults, then the optimizer's own values (translated), then the declared claim. */
function completeClaim(request: ConformanceRequest, names: Readonly<Record<string, string | null>>): Hyper {
  const factory = METHOD_FACTORIES[request.method];
  const merged: Record<string, HyperValue> = {};
  for (const [ref, own] of Object.entries(names)) {
    if (own === null || !Object.prototype.hasOwnProperty.call(request.base, own)) continue;
    const value = request.base[own];
    const spec = factory.hyperSpecs[ref];
    if (
      (spec.type === "number" && typeof value === "number") ||
      (spec.type === "boolean" && typeof value === "boolean")
    ) {
      merged[ref] = value;
    }
  }
  Object.assign(merged, request.claim);
  return resolveHyper(factory, merged, `${request.where}: the claimed hyperparameters`);
}

/** Reference hyperparameters of one probe: the claim with the probe's settings where they can be set. */
function probeValues(claim: Hyper, probe: Probe, settable: ReadonlySet<string>): Record<string, HyperValue> {
  const out: Record<string, HyperValue> = { ...claim };
  for (const [k, v] of Object.entries(probe.set)) if (settable.has(k)) out[k] = v;
  return out;
}

function probeRequest(probe: Probe, hyper: Hyper, lr: number): TrajectoryRequest {
  return {
    definition: probe.definition,
    params: {},
    problemKey: probe.definition.name,
    hyper,
    steps: probe.steps,
    suiteSeed: 0,
    seedIndex: 0,
    ...(probe.lrChange ? { lrChange: { after: probe.lrChange.after, lr: lr * probe.lrChange.factor } } : {}),
  };
}

/** Collects copies of the iterates x₀ … x_n. */
function collector(): { iterates: Float64Array[]; observe: (k: number, x: Float64Array) => void } {
  const iterates: Float64Array[] = [];
  return { iterates, observe: (_k, x) => iterates.push(Float64Array.from(x)) };
}

/** The reference trajectory of `variant` on `probe`. */
function referenceTrajectory(
  variant: Variant,
  values: Readonly<Record<string, HyperValue>>,
  probe: Probe,
): Float64Array[] {
  const specs = variant.factory.hyperSpecs;
  const hyper: Record<string, HyperValue> = {};
  for (const [k, v] of Object.entries(values))
    if (Object.prototype.hasOwnProperty.call(specs, k)) hyper[k] = v;
  Object.assign(hyper, variant.patch);
  const lr = (values.lr as number) * variant.lrScale;
  hyper.lr = lr;
  const { iterates, observe } = collector();
  const outcome = runInProcess(variant.factory, probeRequest(probe, hyper, lr), observe);
  if (outcome.steps === 0 && outcome.error !== undefined) {
    throw new Error(
      `conformance: the reference ${variant.factory.name} could not run probe ${probe.id}: ${outcome.error}`,
    );
  }
  return iterates;
}

/** First step at which two trajectories differ by more than `tolerance`, and the largest difference. */
function compare(candidate: readonly Float64Array[], reference: readonly Float64Array[], tolerance: number) {
  let first: { step: number; relative: number } | null = null;
  let max = 0;
  const n = Math.max(candidate.length, reference.length);
  for (let k = 0; k < n; k++) {
    const c = candidate[k];
    const r = reference[k];
    const d = c === undefined || r === undefined ? Infinity : relativeDifference(c, r);
    if (d > max) max = d;
    if (first === null && !(d <= tolerance)) first = { step: k, relative: d };
  }
  return { first, max };
}

/** Orders forms from the closest to the farthest: more probes matched, later departure, smaller difference. */
function closer(a: VariantResult, b: VariantResult): number {
  if (a.matched !== b.matched) return b.matched - a.matched;
  const sa = a.departure?.step ?? Infinity;
  const sb = b.departure?.step ?? Infinity;
  if (sa !== sb) return sb - sa;
  return (a.departure?.relative ?? 0) - (b.departure?.relative ?? 0);
}

/** What a departure confined to one special probe says about the code. */
const PROBE_CONCLUSIONS: Readonly<Record<string, string>> = {
  faint: "ε enters differently from every known form",
  flat: "the weight decay is applied differently from every known form",
  amsgrad: "the running maximum of the second moment is kept differently from every known form",
};

/** Differences this many times smaller than the largest one count as side effects of it. */
const DOMINANCE = 1e3;

/** Why the closest accepted form departs, as a clause. */
function departureHint(
  catalogue: MethodCatalogue,
  closest: VariantResult,
  results: readonly VariantResult[],
  ran: readonly Probe[],
): string {
  const impostor = results.find((r) => r.departure === null && !r.variant.accepted);
  if (impostor !== undefined) return impostor.variant.meaning ?? `they match ${impostor.variant.label}`;
  const dep = closest.departure!;
  const failing = ran
    .map((p) => closest.byProbe.get(p.id))
    .filter((d): d is Departure => d !== null && d !== undefined);
  const dominant = failing.reduce((a, b) => (b.relative > a.relative ? b : a));
  const others = failing.filter((d) => d !== dominant);
  const alone = others.every((d) => d.relative * DOMINANCE <= dominant.relative);
  const probe = dominant.probe;
  if (alone) {
    const where =
      others.length === 0
        ? `only the probe "${probe.title}" departs`
        : `the difference is largest on the probe "${probe.title}" (${short(dominant.relative)}, against at most ` +
          `${short(Math.max(...others.map((d) => d.relative)))} elsewhere)`;
    if (probe.id === "schedule" && probe.lrChange && dominant.step === probe.lrChange.after + 1) {
      return `${where}, right after the learning-rate change, so the new learning rate is applied differently from the published rule: one step late, not at all, or to the accumulated velocity`;
    }
    const conclusion = PROBE_CONCLUSIONS[probe.id];
    if (conclusion !== undefined) return `${where}, so ${conclusion}`;
  }
  return dep.step <= 1 ? catalogue.firstStepHint : catalogue.laterStepHint;
}

/** Labels of an axis's values, quoted for a list. */
function valueLabels(axis: ConventionAxis, keys: readonly string[]): string {
  return keys.map((k) => axis.values.find((v) => v.key === k)?.label ?? k).join(" / ");
}

/**
 * Runs the conformance check. Returns the overall result (id `conformance:OPTIMIZER`) followed by one
 * informational result per convention axis (id `conformance:OPTIMIZER:AXIS`, never gating). Throws an
 * `InputError` when the claimed hyperparameters are invalid for the reference optimizer.
 */
export async function checkConformance(request: ConformanceRequest): Promise<CheckResult[]> {
  const { method, tolerance } = request;
  const id = `conformance:${request.optimizer}`;
  const names = resolveNames(method, request.names, request.source.hyperNames);
  const settable = new Set(Object.keys(names).filter((k) => names[k] !== null));
  const claim = completeClaim(request, names);
  const catalogue = methodCatalogue(method, claim, settable);
  const tol = { kind: "relative" as const, value: tolerance };
  const head = `${catalogue.title} conformance`;
  const fail = (summary: string, extra: Partial<CheckResult> = {}): CheckResult[] => [
    {
      id,
      status: "fail",
      gating: request.gating,
      summary,
      source: catalogue.source,
      tolerance: tol,
      ...extra,
    },
  ];

  // 1. The optimizer under test on every probe it can run.
  const ran: Probe[] = [];
  const skipped: string[] = [];
  const candidate = new Map<string, Float64Array[]>();
  for (const probe of probesFor(method, claim)) {
    const missing = probe.requires.filter((r) => !settable.has(r));
    if (missing.length > 0) {
      skipped.push(`${probe.id} (no setting for ${missing.join(", ")})`);
      continue;
    }
    const values = probeValues(claim, probe, settable);
    const hyper: Record<string, HyperValue> = { ...request.base };
    for (const [ref, own] of Object.entries(names)) if (own !== null) hyper[own] = values[ref];
    const { iterates, observe } = collector();
    const outcome = await request.source.run(probeRequest(probe, hyper, values.lr as number), observe);
    if (outcome.lrChange === "unsupported") {
      skipped.push(`${probe.id} (the optimizer cannot change its learning rate between steps)`);
      continue;
    }
    if (outcome.error !== undefined) {
      const hint =
        outcome.steps === 0 ? `; map or drop hyperparameter names with ${request.where}.names` : "";
      return fail(`${head}: the optimizer failed on the probe "${probe.title}": ${outcome.error}${hint}`);
    }
    ran.push(probe);
    candidate.set(probe.id, iterates);
  }
  if (ran.length === 0) {
    return [
      {
        id,
        status: "skipped",
        gating: request.gating,
        summary: `${head}: no probe could run (${skipped.join("; ")})`,
        source: catalogue.source,
      },
    ];
  }

  // 2. Every known form on the same probes.
  const results: VariantResult[] = [];
  for (const variant of catalogue.variants) {
    let departure: Departure | null = null;
    let matched = 0;
    let maxRelative = 0;
    const byProbe = new Map<string, Departure | null>();
    for (const probe of ran) {
      const reference = referenceTrajectory(variant, probeValues(claim, probe, settable), probe);
      const { first, max } = compare(candidate.get(probe.id)!, reference, tolerance);
      maxRelative = Math.max(maxRelative, max);
      const dep = first === null ? null : { probe, step: first.step, relative: first.relative };
      byProbe.set(probe.id, dep);
      if (dep === null) matched++;
      else if (
        departure === null ||
        dep.step < departure.step ||
        (dep.step === departure.step && dep.relative > departure.relative)
      ) {
        departure = dep;
      }
    }
    results.push({ variant, departure, matched, maxRelative, byProbe });
  }

  // 3. Which values of each axis are consistent with the iterates.
  const matching = results.filter((r) => r.departure === null);
  const axisResults = catalogue.axes.map((axis) => axisOutcome(axis, matching, ran, request, catalogue));
  const probeList = `${ran.length} probe${ran.length === 1 ? "" : "s"} (${ran.map((p) => p.id).join(", ")})`;
  const notRun = skipped.length > 0 ? `; not run: ${skipped.join("; ")}` : "";
  const acceptedMatches = matching.filter((r) => r.variant.accepted);

  if (acceptedMatches.length > 0) {
    const violated = pinViolations(catalogue, request.expect, acceptedMatches);
    const best = acceptedMatches.reduce((a, b) => (b.maxRelative < a.maxRelative ? b : a));
    if (violated.length > 0) {
      return [
        ...fail(`${head}: ${violated.join("; ")}`, { measured: best.maxRelative, expected: 0 }),
        ...axisResults,
      ];
    }
    const conventions = catalogue.axes.map((axis) => {
      const keys = [...new Set(acceptedMatches.map((r) => r.variant.values[axis.key]))];
      return keys.length === 1
        ? `${axis.title}: ${valueLabels(axis, keys)}`
        : `${axis.title}: indistinguishable`;
    });
    const which = conventions.length > 0 ? `; ${conventions.join("; ")}` : "";
    return [
      {
        id,
        status: "pass",
        gating: request.gating,
        summary: `${head}: matches the published rule step for step on ${probeList} within ${short(tolerance)} (relative)${which}${notRun}`,
        source: catalogue.source,
        measured: best.maxRelative,
        expected: 0,
        tolerance: tol,
      },
      ...axisResults,
    ];
  }

  const accepted = results.filter((r) => r.variant.accepted).sort(closer);
  const closest = accepted[0];
  const dep = closest.departure!;
  const hint = departureHint(catalogue, closest, results, ran);
  const summary =
    `${head}: from step ${dep.step} the iterates differ from the published rule by ${short(dep.relative)} ` +
    `(relative, probe "${dep.probe.title}"); ${hint}${notRun}`;
  return [...fail(summary, { measured: dep.relative, expected: 0 }), ...axisResults];
}

/** Sentences for every `expect` pin that no matching accepted form satisfies. */
function pinViolations(
  catalogue: MethodCatalogue,
  expect: Readonly<Record<string, string>>,
  acceptedMatches: readonly VariantResult[],
): string[] {
  const out: string[] = [];
  for (const [axisKey, want] of Object.entries(expect)) {
    const axis = catalogue.axes.find((a) => a.key === axisKey);
    if (axis === undefined) continue; // an axis that cannot matter for this claim (e.g. AMSGrad off)
    const found = [...new Set(acceptedMatches.map((r) => r.variant.values[axisKey]))];
    if (found.includes(want)) continue;
    out.push(
      `the code follows ${axis.title}: ${valueLabels(axis, found)}, but the declaration expects ${valueLabels(axis, [want])}`,
    );
  }
  return out;
}

/** The informational result of one convention axis. */
function axisOutcome(
  axis: ConventionAxis,
  matching: readonly VariantResult[],
  ran: readonly Probe[],
  request: ConformanceRequest,
  catalogue: MethodCatalogue,
): CheckResult {
  const id = `conformance:${request.optimizer}:${axis.key}`;
  const base = { id, gating: false, source: catalogue.source };
  const withValue = matching.filter((r) => r.variant.values[axis.key] !== undefined);
  const keys = [...new Set(withValue.map((r) => r.variant.values[axis.key]))];
  const title = `${catalogue.title} ${axis.title}`;
  if (keys.length === 0) {
    return {
      ...base,
      status: "skipped",
      summary: `${title}: not determined, no known form matches the iterates`,
    };
  }
  if (keys.length > 1) {
    const exposed = ran.some((p) => axis.exposedBy.includes(p.id));
    const why = exposed ? `the probes could not tell ${valueLabels(axis, keys)} apart` : axis.whenUnprobed;
    return { ...base, status: "skipped", summary: `${title}: ${why}` };
  }
  const value = axis.values.find((v) => v.key === keys[0])!;
  const want = request.expect[axis.key];
  if (!value.accepted) {
    return {
      ...base,
      status: "fail",
      summary: `${title}: ${value.label}; ${value.meaning ?? "not a form of this method"}`,
      source: value.source,
    };
  }
  if (want !== undefined && want !== value.key) {
    return {
      ...base,
      status: "fail",
      summary: `${title}: ${value.label}; the declaration expects ${valueLabels(axis, [want])}`,
      source: value.source,
    };
  }
  return { ...base, status: "pass", summary: `${title}: ${value.label}`, source: value.source };
}

/**
 * Throws an `InputError` unless `expect` names conventions of `method` and forms of the method for them
 * (see METHOD_AXES; a known mix-up such as AMSGrad without its maximum cannot be expected).
 */
export function checkExpect(
  method: string,
  expect: Readonly<Record<string, string>>,
  axes: readonly ConventionAxis[],
  where: string,
): void {
  for (const [key, value] of Object.entries(expect)) {
    const axis = axes.find((a) => a.key === key);
    if (axis === undefined) {
      const known = axes.map((a) => a.key).join(", ") || "none";
      throw new InputError(`${where}.expect.${key} is not a convention of ${method} (known: ${known})`);
    }
    const forms = axis.values.filter((v) => v.accepted).map((v) => v.key);
    if (!forms.includes(value)) {
      throw new InputError(
        `${where}.expect.${key} must be one of ${forms.map((v) => JSON.stringify(v)).join(", ")}, got ${JSON.stringify(value)}`,
      );
    }
  }
}
