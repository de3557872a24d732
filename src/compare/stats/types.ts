/**
 * Shared vocabulary of the statistics kernel.
 *
 * The kernel works on plain numbers: a paired sample `d` is an array of per-seed differences
 * (usually log ratios d_i = ln(candidate_i / baseline_i), see `pairedLogRatios`), two unpaired
 * samples are two arrays. Nothing here does I/O or keeps state beyond caches of exact null
 * distributions and reusable scratch buffers.
 */

/**
 * Direction of the alternative hypothesis about the location of `d` (or of x against y):
 * "two-sided" (≠), "greater" (> 0, i.e. the candidate's metric is larger), "less" (< 0).
 * The strings are the ones used in the statistics literature and by reference libraries.
 */
export type Alternative = "two-sided" | "greater" | "less";

/** The accepted values of {@link Alternative}, in the order error messages list them. */
export const ALTERNATIVES: readonly Alternative[] = ["two-sided", "greater", "less"];

/**
 * How a rank test computes its p-value: "auto" picks "exact" when the exact null distribution
 * applies (small sample, no ties) and "normal" otherwise; "exact" insists (and throws when it does
 * not apply); "normal" always uses the large-sample normal approximation.
 */
export type RankMethod = "auto" | "exact" | "normal";

/** The accepted values of {@link RankMethod}. */
export const RANK_METHODS: readonly RankMethod[] = ["auto", "exact", "normal"];

/** Read-only array-like of numbers: plain arrays and typed arrays both qualify. */
export type Sample = ArrayLike<number>;
