/**
 * The comparison policy: which metrics gate, the practical margins, alpha, the multiplicity correction,
 * what fails the gate, the strict setting for pure refactors, and the extra-seed re-runs. Its defaults
 * live in one place, the `policy` fragment of the config schema (src/config/schema.ts); `resolvePolicy`
 * fills them in with ajv, so a config without `policy` gets exactly the documented defaults
 * (docs/decisions/0001-statistical-verdict.md, kept in step by tests/compare/policy.test.ts).
 */
import { Ajv2020 } from "ajv/dist/2020.js";
import type { ErrorObject } from "ajv";
import { InputError, quote } from "../core/errors.js";
import { policySchema } from "../config/schema.js";
import type { MetricKind } from "./types.js";

export type Correction = "holm" | "benjamini-hochberg" | "none";

/** Case verdicts that can be made to fail the gate (regressed always can; unchanged/equivalent never). */
export type FailingVerdict = "regressed" | "missing" | "inconclusive" | "improved" | "new";

export interface Policy {
  /** Gating metrics; the others are reported only. */
  readonly metrics: readonly MetricKind[];
  /** Practical margins as ratios m > 1: a shift inside [1/m, m] is of no practical concern. */
  readonly margin: Readonly<Record<MetricKind, number>>;
  /** Significance level of every decision, per look. */
  readonly alpha: number;
  readonly correction: Correction;
  readonly failOn: readonly FailingVerdict[];
  /** Fail on every case that is neither unchanged nor equivalent. */
  readonly strict: boolean;
  readonly bootstrap: { readonly resamples: number; readonly seed: number };
  /** Relative, norm-wise tolerance of the trajectory fingerprint. */
  readonly fingerprintTolerance: number;
  /** Final gaps below gapFloor × gap₀ (relative) count as equal. */
  readonly gapFloor: number;
  readonly extraSeeds: { readonly perCase: number; readonly maxRuns: number };
}

let validator: ReturnType<Ajv2020["compile"]> | null = null;

function compile() {
  if (validator === null) {
    const ajv = new Ajv2020({
      allErrors: true,
      verbose: true,
      useDefaults: true,
      strict: true,
      allowUnionTypes: true,
    });
    // Wrapped, because ajv applies defaults to properties only (not to the schema root).
    validator = ajv.compile({ type: "object", properties: { policy: policySchema } });
  }
  return validator;
}

/**
 * Validates a policy object (e.g. the config's `policy`, or a `--policy` JSON) and fills in the defaults.
 * `where` names its origin in messages, e.g. "config gradgate.yml: policy".
 */
export function resolvePolicy(raw: unknown, where = "policy"): Policy {
  const data = structuredClone(raw ?? {});
  if (data === null || typeof data !== "object" || Array.isArray(data)) {
    throw new InputError(`${where} must be a mapping, got ${quote(raw)}`);
  }
  const validate = compile();
  const wrapped = { policy: data };
  if (!validate(wrapped)) throw new InputError(describe(validate.errors ?? [], wrapped, where));
  return wrapped.policy as Policy;
}

/** The defaults, exactly as the schema states them. */
export const DEFAULT_POLICY: Policy = Object.freeze(resolvePolicy({}));

function describe(errors: readonly ErrorObject[], data: unknown, where: string): string {
  const lines: string[] = [];
  for (const e of errors) {
    const path = e.instancePath
      .split("/")
      .slice(2)
      .map((p) => (/^\d+$/.test(p) ? `[${p}]` : `.${p}`))
      .join("");
    const field = `${where}${path}`;
    const p = e.params as Record<string, unknown>;
    let value: unknown = data;
    for (const part of e.instancePath.split("/").slice(1)) value = (value as Record<string, unknown>)?.[part];
    switch (e.keyword) {
      case "additionalProperties": {
        const known = Object.keys((e.parentSchema as { properties?: object })?.properties ?? {}).join(", ");
        lines.push(`${field}.${String(p.additionalProperty)} is not a known field (known: ${known})`);
        break;
      }
      case "enum":
        lines.push(
          `${field} must be one of ${(p.allowedValues as unknown[]).map((v) => JSON.stringify(v)).join(", ")}, got ${quote(value)}`,
        );
        break;
      case "uniqueItems":
        lines.push(`${field} lists ${quote(value)} with a repeated item; list each once`);
        break;
      default:
        lines.push(`${field} ${e.message ?? "is invalid"}, got ${quote(value)}`);
    }
  }
  return lines.join("\n");
}
