/**
 * gradgate statistics kernel: pure functions, plain data in and out, no I/O.
 * One function (or one small family) per file; see each file's doc comment for the formula, the
 * published source and the cost.
 */
export type { Alternative, RankMethod, Sample } from "./types.js";
export { ALTERNATIVES, RANK_METHODS } from "./types.js";

export { pairedLogRatios } from "./log-ratios.js";

export { wilcoxonSignedRank } from "./wilcoxon.js";
export type { SignedRankOptions, SignedRankResult } from "./wilcoxon.js";
export {
  SIGNED_RANK_EXACT_MAX_N,
  signedRankCdf,
  signedRankLowerTail,
  signedRankUpperTail,
} from "./signed-rank-distribution.js";

export { hodgesLehmann } from "./hodges-lehmann.js";
export type { HodgesLehmannOptions, HodgesLehmannResult } from "./hodges-lehmann.js";

export { bootstrapInterval, bcaLevels, BOOTSTRAP_MAX_RESAMPLES } from "./bootstrap.js";
export type {
  BcaLevels,
  BootstrapMethod,
  BootstrapOptions,
  BootstrapResult,
  BootstrapStatisticName,
} from "./bootstrap.js";
export { resampleHodgesLehmann, resampleMean, resampleMedian } from "./resample-statistics.js";
export { drawCounts } from "./draw-counts.js";
export type { CountStatistic, CountStatisticFactory } from "./resample-statistics.js";

export { equivalenceSignedRank } from "./equivalence.js";
export type { EquivalenceOptions, EquivalenceResult } from "./equivalence.js";

export { holmAdjust } from "./holm.js";
export { benjaminiHochbergAdjust } from "./benjamini-hochberg.js";

export { mannWhitneyU } from "./mann-whitney.js";
export type { MannWhitneyOptions, MannWhitneyResult } from "./mann-whitney.js";
export { MANN_WHITNEY_EXACT_MAX_TOTAL, mannWhitneyCdf } from "./mann-whitney-distribution.js";

export { pairedTTest } from "./paired-t-test.js";
export type { PairedTTestOptions, PairedTTestResult } from "./paired-t-test.js";

export { normalCdf, normalSf } from "./normal-cdf.js";
export { normalQuantile } from "./normal-quantile.js";
export { studentTCdf, studentTSf, studentTTwoTail } from "./student-t.js";
export { incompleteBeta } from "./incomplete-beta.js";
export { logBeta, logGamma } from "./log-gamma.js";
export { erfc } from "./erfc.js";
export { quantileInPlace, selectInPlace } from "./select.js";
