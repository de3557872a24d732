/**
 * Fitted asymptotic rate of a run on a quadratic — what the rate check compares with the spectral radius.
 *
 * The gap g_k = f(x_k) − f* of a linear method behaves asymptotically like C·k^m·ρ^(2k): m = 0 when the
 * blocks attaining ρ are diagonalisable, m = 2 when one has a double root (the error then behaves like
 * k·ρᵏ, the "optimal" parameters of heavy ball and Nesterov do this). So ln g_k − m·ln k is linear in
 * k with slope 2·ln ρ, and ρ = exp(slope/2) is the per-step contraction of the error.
 *
 * Window: from the first step whose gap is at most `upper`·g₀ (past the start-up transient, where the
 * slower-than-dominant components have not yet died out) to the step before the gap first drops below
 * `lower`·g₀ (before rounding noise of the iterates, about 1e-16 relative, dominates). When the dominant
 * roots are complex the gap oscillates (it can come close to zero at single steps), so the window is cut
 * into blocks of at least half an oscillation period and the fit goes through the largest value of each
 * block — the envelope — by least squares. Without oscillation the blocks are single steps.
 *
 * Source: the asymptotic forms are those of ./linear-rate.ts (derived there); the envelope fit is our
 * own choice. Cost: O(window length).
 */

export interface RateFitOptions {
  /** m in ln g_k − m·ln k; 2 when a dominant block has a double root, else 0. */
  readonly logPower: number;
  /** Steps per block of the envelope fit (≥ 1). */
  readonly block: number;
  /** The window starts where gap ≤ upper·gap₀ (relative). */
  readonly upper: number;
  /** The window ends before the gap first drops below lower·gap₀ (relative). */
  readonly lower: number;
}

export const DEFAULT_FIT: RateFitOptions = { logPower: 0, block: 1, upper: 1e-3, lower: 1e-16 };

export interface RateFit {
  /** Fitted per-step contraction of the error (the gap contracts like rho²). */
  readonly rho: number;
  /** First and last step of the window. */
  readonly from: number;
  readonly to: number;
  /** Points (block maxima) in the least-squares fit. */
  readonly points: number;
  /** Block length actually used. */
  readonly block: number;
}

/** Why no fit was possible. */
export interface NoFit {
  readonly rho: null;
  readonly why: string;
}

/** Fewest blocks a fit goes through; the block is shortened when the window is short. */
const MIN_BLOCKS = 8;

/**
 * Fits ρ to the gaps g_0 … g_n of one run (index = step). Returns the fit, or the reason none was
 * possible (the gap never got below upper·g₀, or the window is shorter than 8 steps).
 */
export function fitRate(gaps: ArrayLike<number>, options: Partial<RateFitOptions> = {}): RateFit | NoFit {
  const { logPower, upper, lower } = { ...DEFAULT_FIT, ...options };
  const n = gaps.length - 1;
  const g0 = gaps[0];
  if (!(g0 > 0) || !Number.isFinite(g0))
    return { rho: null, why: `the initial gap is ${g0}, not a positive number` };
  let from = -1;
  for (let k = 1; k <= n; k++) {
    const g = gaps[k];
    if (!Number.isFinite(g)) return { rho: null, why: `the gap is not finite at step ${k}` };
    if (g <= upper * g0) {
      from = k;
      break;
    }
  }
  if (from < 0) {
    return { rho: null, why: `the gap never fell to ${upper} of the initial gap in ${n} steps` };
  }
  let to = n;
  for (let k = from + 1; k <= n; k++) {
    const g = gaps[k];
    if (!Number.isFinite(g) || !(g >= lower * g0)) {
      to = k - 1;
      break;
    }
  }
  const length = to - from + 1;
  if (length < MIN_BLOCKS) {
    return { rho: null, why: `only ${length} steps lie between ${upper} and ${lower} of the initial gap` };
  }
  const block = Math.max(1, Math.min(Math.floor(options.block ?? 1), Math.floor(length / MIN_BLOCKS)));
  let count = 0;
  let sx = 0;
  let sy = 0;
  let sxx = 0;
  let sxy = 0;
  for (let start = from; start + block - 1 <= to; start += block) {
    let bestK = -1;
    let bestY = -Infinity;
    for (let k = start; k < start + block; k++) {
      const g = gaps[k];
      if (!(g > 0)) continue;
      const y = Math.log(g) - logPower * Math.log(k);
      if (y > bestY) {
        bestY = y;
        bestK = k;
      }
    }
    if (bestK < 0) continue;
    count++;
    sx += bestK;
    sy += bestY;
    sxx += bestK * bestK;
    sxy += bestK * bestY;
  }
  const den = count * sxx - sx * sx;
  if (count < 3 || !(den > 0))
    return { rho: null, why: `too few positive gaps in the window [${from}, ${to}]` };
  const slope = (count * sxy - sx * sy) / den;
  return { rho: Math.exp(slope / 2), from, to, points: count, block };
}
