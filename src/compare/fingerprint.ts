/**
 * Trajectory fingerprint: did the arithmetic itself change? Compares the first iterates x_1 … x_F of
 * paired seeds (RunMetrics.iterates). Per step the difference is relative and norm-wise,
 *   r_k = ‖x_k^c − x_k^b‖∞ / max(‖x_k^c‖∞, ‖x_k^b‖∞)   (0 when both are the zero vector),
 * so a coordinate near zero does not blow the figure up. Bitwise equal everywhere → "identical";
 * different bits but every r_k ≤ tolerance → "float-noise"; otherwise "changed" from the first step where
 * some seed exceeds the tolerance. A run that kept fewer iterates on one side (it stopped or diverged
 * earlier) counts as changed from the first missing step. −0 and +0 count as equal (JSON keeps no sign
 * of zero).
 * Cost: O(seeds · steps · dim).
 */
import type { RunMetrics } from "../runner/types.js";
import type { TrajectoryFingerprint } from "./types.js";

/** r_k of one step: −1 when bitwise equal, Infinity when not comparable (NaN, lengths differ). */
function stepDifference(x: readonly (number | null)[], y: readonly (number | null)[]): number {
  if (x.length !== y.length) return Infinity;
  let bitwise = true;
  let diff = 0;
  let scale = 0;
  for (let i = 0; i < x.length; i++) {
    const xi = x[i];
    const yi = y[i];
    if (xi === yi) {
      const m = xi === null ? 0 : Math.abs(xi);
      if (m > scale) scale = m;
      continue;
    }
    bitwise = false;
    // null stands for a coordinate that left the finite range: any difference with it is unbounded.
    if (xi === null || yi === null) return Infinity;
    const dd = Math.abs(xi - yi);
    diff = Number.isNaN(dd) ? Infinity : Math.max(diff, dd);
    scale = Math.max(scale, Math.abs(xi), Math.abs(yi));
  }
  if (bitwise) return -1;
  return scale === 0 || !Number.isFinite(scale) ? Infinity : diff / scale;
}

export function compareFingerprint(
  pairs: readonly { readonly base: RunMetrics; readonly cand: RunMetrics }[],
  tolerance: number,
): TrajectoryFingerprint {
  let seeds = 0;
  let steps = 0;
  let firstDifferent = Infinity;
  let fromStep = Infinity;
  let relativeAtStep = 0;
  let maxRelative = 0;
  let seedsChanged = 0;
  for (const { base, cand } of pairs) {
    const a = base.iterates;
    const b = cand.iterates;
    if (a === undefined || b === undefined || (a.length === 0 && b.length === 0)) continue;
    seeds++;
    const k = Math.min(a.length, b.length);
    steps = Math.max(steps, a.length, b.length);
    let exceedAt = Infinity;
    let exceedR = 0;
    for (let s = 0; s < k; s++) {
      const r = stepDifference(a[s], b[s]);
      if (r < 0) continue;
      firstDifferent = Math.min(firstDifferent, s + 1);
      maxRelative = Math.max(maxRelative, r);
      if (r > tolerance && exceedAt === Infinity) {
        exceedAt = s + 1;
        exceedR = r;
      }
    }
    if (a.length !== b.length) {
      firstDifferent = Math.min(firstDifferent, k + 1);
      maxRelative = Infinity;
      if (exceedAt === Infinity) {
        exceedAt = k + 1;
        exceedR = Infinity;
      }
    }
    if (exceedAt === Infinity) continue;
    seedsChanged++;
    if (exceedAt < fromStep) {
      fromStep = exceedAt;
      relativeAtStep = exceedR;
    } else if (exceedAt === fromStep) relativeAtStep = Math.max(relativeAtStep, exceedR);
  }
  const finite = (v: number) => (Number.isFinite(v) ? v : null);
  if (seeds === 0) {
    return {
      status: "unavailable",
      tolerance,
      seeds: 0,
      steps: 0,
      firstDifferentStep: null,
      fromStep: null,
      relativeAtStep: null,
      maxRelative: null,
      seedsChanged: 0,
    };
  }
  const identical = firstDifferent === Infinity;
  const status = identical ? "identical" : seedsChanged > 0 ? "changed" : "float-noise";
  return {
    status,
    tolerance,
    seeds,
    steps,
    firstDifferentStep: identical ? null : firstDifferent,
    fromStep: status === "changed" ? fromStep : null,
    relativeAtStep: status === "changed" ? finite(relativeAtStep) : null,
    maxRelative: finite(maxRelative),
    seedsChanged,
  };
}
