/**
 * Benchmark of the comparison engine: 1,000 cases × 30 paired seeds, timed with performance.now()
 * around `compareResults` only (building the synthetic inputs is not timed). Three scenarios:
 *   unchanged — every run bitwise equal to its baseline (the common pull request);
 *   mixed     — a third unchanged, a third float noise (equivalent), a third drifted by ×0.8…×1.3;
 *   worst     — every metric of every case changed (each run's step counts scaled by a per-seed jitter).
 * Prints a table and, last, one line of JSON. Run: npx tsx scripts/bench-compare.ts [--cases N] [--seeds N]
 */
import { parseArgs } from "node:util";
import { compareResults } from "../src/compare/compare.js";
import { baselines, jitter, results, run, spec } from "../tests/compare/fixtures.js";
import type { CaseResult } from "../src/runner/types.js";

const { values } = parseArgs({
  options: {
    cases: { type: "string", default: "1000" },
    seeds: { type: "string", default: "30" },
    repeat: { type: "string", default: "5" },
  },
});
const CASES = Number(values.cases);
const SEEDS = Number(values.seeds);
const REPEAT = Number(values.repeat);

function scenario(kind: "unchanged" | "mixed" | "worst") {
  const base: CaseResult[] = [];
  const cand: CaseResult[] = [];
  for (let c = 0; c < CASES; c++) {
    const s = spec({ optimizer: `opt${c % 10}`, problemKey: `p${c}(n=4)`, seeds: SEEDS });
    const j = jitter(SEEDS, 0.2, c + 1);
    const b = Array.from({ length: SEEDS }, (_, i) => run(i, { scale: j[i] }));
    base.push({ case: s, runs: b });
    const mode = kind === "unchanged" ? 0 : kind === "worst" ? 2 : c % 3;
    if (mode === 0) cand.push({ case: s, runs: b });
    else if (mode === 1) {
      cand.push({
        case: s,
        runs: b.map((r) => ({
          ...r,
          finalGap: (r.finalGap ?? 0) * (1 + 1e-15),
          iterates: r.iterates?.map((x) => x.map((v) => (v === null ? v : v * (1 + 1e-16)))),
        })),
      });
    } else {
      const factor = 0.8 + (0.5 * ((c * 7919) % 100)) / 100;
      const k = jitter(SEEDS, 0.05, 1000 + c);
      cand.push({
        case: s,
        runs: Array.from({ length: SEEDS }, (_, i) => run(i, { scale: j[i] * factor * k[i] })),
      });
    }
  }
  return { candidate: results(cand), base: baselines(base) };
}

const rows: { scenario: string; cases: number; seeds: number; medianMs: number; minMs: number }[] = [];
for (const kind of ["unchanged", "mixed", "worst"] as const) {
  const { candidate, base } = scenario(kind);
  compareResults(candidate, base); // warm-up (JIT, exact tables)
  const times: number[] = [];
  for (let r = 0; r < REPEAT; r++) {
    const t0 = performance.now();
    compareResults(candidate, base);
    times.push(performance.now() - t0);
  }
  times.sort((a, b) => a - b);
  rows.push({
    scenario: kind,
    cases: CASES,
    seeds: SEEDS,
    medianMs: times[times.length >> 1],
    minMs: times[0],
  });
}
console.log(
  `compareResults, ${CASES} cases × ${SEEDS} seeds, ${REPEAT} repeats after one warm-up (node ${process.version})`,
);
console.log("| scenario | median ms | min ms |\n|---|---:|---:|");
for (const r of rows) console.log(`| ${r.scenario} | ${r.medianMs.toFixed(1)} | ${r.minMs.toFixed(1)} |`);
console.log(JSON.stringify({ bench: "compare", node: process.version, results: rows }));
