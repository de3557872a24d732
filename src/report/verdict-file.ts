/**
 * A verdict document read back from its JSON text (the file `gradgate compare --json` wrote, or an
 * artifact of another job, which may be forged): parsed, and checked for the fields the reports rely on,
 * with messages naming the file, the field and the bad value. Pure: the caller reads the file.
 */
import { InputError, quote } from "../core/errors.js";
import { CASE_VERDICTS, VERDICT_FORMAT, VERDICT_VERSION, type VerdictDocument } from "../compare/types.js";

export function parseVerdict(text: string, file: string): VerdictDocument {
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch (err) {
    throw new InputError(`verdict ${file} is not valid JSON (${(err as Error).message})`);
  }
  const d = (data ?? {}) as Record<string, unknown>;
  const where = `verdict ${file}`;
  if (d.format !== VERDICT_FORMAT) {
    throw new InputError(
      `${where}: format must be "${VERDICT_FORMAT}", got ${quote(d.format)}; pass the file gradgate compare --json wrote`,
    );
  }
  if (d.version !== VERDICT_VERSION)
    throw new InputError(`${where}: version must be ${VERDICT_VERSION}, got ${quote(d.version)}`);
  const gate = (d.gate ?? {}) as Record<string, unknown>;
  if (gate.verdict !== "pass" && gate.verdict !== "fail") {
    throw new InputError(`${where}: gate.verdict must be "pass" or "fail", got ${quote(gate.verdict)}`);
  }
  if (!Array.isArray(gate.reasons))
    throw new InputError(`${where}: gate.reasons must be a list, got ${quote(gate.reasons)}`);
  const counts = (d.counts ?? null) as Record<string, unknown> | null;
  if (
    counts === null ||
    typeof counts !== "object" ||
    !CASE_VERDICTS.every((v) => Number.isInteger(counts[v]))
  ) {
    throw new InputError(`${where}: counts must give a whole number for each of ${CASE_VERDICTS.join(", ")}`);
  }
  if (!Array.isArray(d.cases)) throw new InputError(`${where}: cases must be a list, got ${quote(d.cases)}`);
  (d.cases as unknown[]).forEach((c, i) => {
    const x = (c ?? {}) as Record<string, unknown>;
    if (typeof x.id !== "string")
      throw new InputError(`${where}: cases[${i}].id must be a string, got ${quote(x.id)}`);
    if (!(CASE_VERDICTS as readonly unknown[]).includes(x.verdict)) {
      throw new InputError(
        `${where}: cases[${i}].verdict must be one of ${CASE_VERDICTS.join(", ")}, got ${quote(x.verdict)}`,
      );
    }
    if (typeof x.failsGate !== "boolean") {
      throw new InputError(
        `${where}: cases[${i}].failsGate must be true or false, got ${quote(x.failsGate)}`,
      );
    }
    for (const list of ["reasons", "drift", "checks", "diverged", "recovered"]) {
      if (!Array.isArray(x[list]))
        throw new InputError(`${where}: cases[${i}].${list} must be a list, got ${quote(x[list])}`);
    }
  });
  return data as VerdictDocument;
}
