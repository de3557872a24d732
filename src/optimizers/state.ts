/**
 * Export and import of a reference optimizer's state, for resuming a run in a fresh instance.
 *
 * A state is a flat JSON-safe record: `step` (the step counter, a nonnegative integer), `lr` (the
 * current learning rate, which `setLearningRate` may have changed) and one array of `dim` finite
 * numbers per internal buffer (moments, velocity, accumulator). Each optimizer names its keys in a
 * layout; an import is checked completely against that layout before anything is copied, so a
 * rejected state leaves the instance untouched. Keys differ between forms whose buffers mean
 * different things (e.g. momentum's `velocity` vs `buffer`), so a state cannot be resumed by the wrong
 * form by accident.
 *
 * Cost: O(dim · number of buffers); never called inside a step.
 */
import { InputError, quote } from "../core/errors.js";
import type { OptimizerState } from "../core/types.js";

/** What one state key holds. */
export type StateField = "count" | "lr" | "vector";

/** State key → kind, in export order. */
export type StateLayout = Readonly<Record<string, StateField>>;

/** Quotes a bad value; numbers (also inside arrays) keep their JavaScript spelling, so NaN shows as NaN. */
function show(value: unknown): string {
  if (typeof value === "number") return String(value);
  if (Array.isArray(value)) {
    const text = `[${value.map((v) => (typeof v === "number" ? String(v) : quote(v))).join(",")}]`;
    return text.length > 80 ? text.slice(0, 77) + "..." : text;
  }
  return quote(value);
}

/**
 * Throws an `InputError` unless `state` matches `layout` exactly: no missing or unknown keys, counts
 * are nonnegative integers, `lr` is a positive finite number, vectors are arrays of `dim` finite numbers.
 * `who` names the caller, e.g. `importState adam`.
 */
export function checkState(state: unknown, layout: StateLayout, dim: number, who: string): OptimizerState {
  const expected = Object.keys(layout);
  if (state === null || typeof state !== "object" || Array.isArray(state)) {
    throw new InputError(
      `${who}: state must be an object with keys ${expected.join(", ")}, got ${show(state)}`,
    );
  }
  const record = state as Record<string, unknown>;
  for (const key of Object.keys(record)) {
    if (!Object.prototype.hasOwnProperty.call(layout, key)) {
      throw new InputError(
        `${who}: state.${key} is not part of this optimizer's state (expected: ${expected.join(", ")})`,
      );
    }
  }
  for (const key of expected) {
    if (!Object.prototype.hasOwnProperty.call(record, key)) {
      throw new InputError(`${who}: state.${key} is missing (expected: ${expected.join(", ")})`);
    }
    const value = record[key];
    switch (layout[key]) {
      case "count":
        if (typeof value !== "number" || !Number.isSafeInteger(value) || value < 0) {
          throw new InputError(`${who}: state.${key} must be a nonnegative integer, got ${show(value)}`);
        }
        break;
      case "lr":
        if (typeof value !== "number" || !Number.isFinite(value) || !(value > 0)) {
          throw new InputError(`${who}: state.${key} must be a positive number, got ${show(value)}`);
        }
        break;
      case "vector":
        if (
          !Array.isArray(value) ||
          value.length !== dim ||
          !value.every((v) => typeof v === "number" && Number.isFinite(v))
        ) {
          throw new InputError(
            `${who}: state.${key} must be an array of ${dim} finite numbers, got ${show(value)}`,
          );
        }
        break;
    }
  }
  return record as OptimizerState;
}

/** Copies a checked state vector into an instance buffer. */
export function loadVector(state: OptimizerState, key: string, into: Float64Array): void {
  const values = state[key] as number[];
  for (let i = 0; i < into.length; i++) into[i] = values[i];
}

/** A buffer as a plain array (JSON-safe, exact: doubles round-trip through JSON text). */
export function saveVector(buffer: Float64Array): number[] {
  return Array.from(buffer);
}
