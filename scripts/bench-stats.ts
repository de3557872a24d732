/**
 * Throughput of the statistics kernel (src/compare/stats). Run: `npx tsx scripts/bench-stats.ts`.
 *
 * Prints the time per call of each function on n = 30 paired seeds, then the budget scenario of the
 * design: 1,000 cases × 30 seeds × 3 metrics, each metric getting Hodges–Lehmann + CI, a Wilcoxon
 * test, a TOST equivalence test and a 1,000-resample bootstrap interval, plus Holm over the cases.
 * Timings are wall-clock on this machine, after a warm-up; nothing here is asserted.
 */
import { Pcg32 } from "../src/core/rng.js";
import {
  bootstrapInterval,
  equivalenceSignedRank,
  hodgesLehmann,
  holmAdjust,
  mannWhitneyU,
  pairedTTest,
  wilcoxonSignedRank,
  type BootstrapStatisticName,
} from "../src/compare/stats/index.js";

const N = 30;
const CASES = 1000;
const METRICS = 3;

function makeSamples(count: number, seed: bigint): Float64Array[] {
  const rng = new Pcg32(seed, 7n);
  const out: Float64Array[] = [];
  for (let c = 0; c < count; c++) {
    const d = new Float64Array(N);
    const shift = 0.02 * (rng.nextFloat() - 0.5);
    for (let i = 0; i < N; i++) d[i] = shift + 0.05 * rng.nextNormal();
    out.push(d);
  }
  return out;
}

let sink = 0;

function time(label: string, calls: number, body: (i: number) => number): number {
  for (let i = 0; i < Math.min(calls, 200); i++) sink += body(i); // warm-up
  const t0 = performance.now();
  for (let i = 0; i < calls; i++) sink += body(i);
  const ms = performance.now() - t0;
  const us = (1000 * ms) / calls;
  console.log(
    `${label.padEnd(58)} ${us.toFixed(2).padStart(9)} µs/call  (${calls} calls, ${ms.toFixed(1)} ms)`,
  );
  return ms;
}

const samples = makeSamples(CASES, 1n);
const other = makeSamples(CASES, 2n);
const pick = (i: number) => samples[i % samples.length];

console.log(`node ${process.version}, n = ${N} seeds per sample`);
time("wilcoxonSignedRank (exact, n = 30)", 20000, (i) => wilcoxonSignedRank(pick(i)).pValue);
time("equivalenceSignedRank (margin 0.05)", 20000, (i) => equivalenceSignedRank(pick(i), 0.05).pValue);
time("hodgesLehmann + exact 95% CI (465 Walsh averages)", 20000, (i) => hodgesLehmann(pick(i)).estimate);
time("pairedTTest", 20000, (i) => pairedTTest(pick(i)).pValue);
time("mannWhitneyU (30 vs 30, normal approx.)", 20000, (i) => mannWhitneyU(pick(i), other[i % CASES]).pValue);
for (const statistic of ["hodges-lehmann", "median", "mean"] as BootstrapStatisticName[]) {
  for (const method of ["bca", "percentile"] as const) {
    const rng = new Pcg32(3n, 1n);
    time(
      `bootstrapInterval ${statistic}, ${method}, B = 1000`,
      1000,
      (i) => bootstrapInterval(pick(i), { rng, statistic, method, resamples: 1000 }).lower,
    );
  }
}

/**
 * The budget scenario: every metric gets HL + CI, Wilcoxon and TOST; `bootstrapped` metrics per case also
 * get a BCa bootstrap (B = 1000) of `statistic`; Holm over the cases' worst p-values at the end.
 */
function scenario(statistic: BootstrapStatisticName, bootstrapped: number): number {
  const rng = new Pcg32(42n, 1n);
  const pValues = new Float64Array(CASES);
  const t0 = performance.now();
  for (let c = 0; c < CASES; c++) {
    let worst = 0;
    for (let m = 0; m < METRICS; m++) {
      const d = samples[(c + m * 331) % CASES];
      const hl = hodgesLehmann(d);
      const w = wilcoxonSignedRank(d);
      const e = equivalenceSignedRank(d, 0.05);
      sink += hl.lower + e.pValue;
      if (m < bootstrapped) sink += bootstrapInterval(d, { rng, statistic, resamples: 1000 }).lower;
      worst = Math.max(worst, w.pValue);
    }
    pValues[c] = worst;
  }
  sink += holmAdjust(pValues)[0];
  return performance.now() - t0;
}

for (const [statistic, bootstrapped] of [
  ["hodges-lehmann", 3],
  ["median", 3],
  ["hodges-lehmann", 1],
  ["hodges-lehmann", 0],
] as [BootstrapStatisticName, number][]) {
  scenario(statistic, bootstrapped); // warm-up
  const runs = [
    scenario(statistic, bootstrapped),
    scenario(statistic, bootstrapped),
    scenario(statistic, bootstrapped),
  ];
  const best = Math.min(...runs);
  const what =
    bootstrapped === 0 ? "no bootstrap" : `BCa bootstrap of ${statistic} on ${bootstrapped} metric(s)`;
  console.log(
    `scenario ${CASES} cases × ${N} seeds × ${METRICS} metrics, ${what}: ` +
      `best ${best.toFixed(0)} ms of [${runs.map((r) => r.toFixed(0)).join(", ")}]`,
  );
}
if (Number.isNaN(sink)) console.log("(sink is NaN)");
