// Engine benchmark: every figure is measured side by side in this one run, on the compiled build.
// Run: npm run bench (builds first). Prints a table and, last, one line of JSON.
//  1. runner overhead: the harness's run loop against a hand-written loop of the same optimizer and
//     problem (same instance types, same steps), alternated, median of repeated ratios;
//  2. worker speedup in steady state: the default suite on 1 thread and on 2 worker threads, code
//     compiled (results checked identical);
//  3. the default suite end to end through the CLI (a fresh node process, as a user runs it), 1 and 2
//     workers: the cold speedup, compilation included;
//  4. extended Rosenbrock at n = 10^6: whether the run loop with Adam allocates per step.
import { execFileSync } from "node:child_process";
import { fileURLToPath } from "node:url";
import { canonicalJson } from "../build/core/json.js";
import { Pcg32 } from "../build/core/rng.js";
import { parseConfig } from "../build/config/load.js";
import { DEFAULT_SUITE_YAML } from "../build/config/default-suite.js";
import { getOptimizer, resolveHyper } from "../build/optimizers/index.js";
import { getProblem, problemKey, resolveProblemParams } from "../build/problems/index.js";
import { executeRun } from "../build/runner/execute.js";
import { logCheckpoints } from "../build/runner/recorder.js";
import { SuitePool, runSuite } from "../build/runner/pool.js";
import { resolveSuite } from "../build/runner/suite.js";

const median = (a) => {
  const s = [...a].sort((x, y) => x - y);
  return s.length % 2 ? s[s.length >> 1] : (s[s.length / 2 - 1] + s[s.length / 2]) / 2;
};

function caseFor(problemName, params, optimizerName, hyper, steps) {
  const def = getProblem(problemName);
  const p = resolveProblemParams(def, params, "bench");
  const inst = def.create(p, { noise: new Pcg32(0n, 0n) });
  const factory = getOptimizer(optimizerName);
  return {
    def,
    factory,
    spec: {
      id: `${optimizerName}/default/${problemKey(def, p)}`,
      optimizer: optimizerName,
      use: `reference:${optimizerName}`,
      set: "default",
      hyper: resolveHyper(factory, hyper, "bench"),
      problem: def.name,
      problemKey: problemKey(def, p),
      params: p,
      dim: inst.dim,
      fStar: inst.fStar,
      fStarKind: inst.fStarKind,
      budget: { steps, evaluations: 0, seconds: 1e9 },
      stopAt: 0,
      ladder: [1e-1, 1e-2, 1e-3, 1e-4, 1e-6, 1e-8],
      blowUp: 1e6,
      checkpoints: logCheckpoints(steps),
      fingerprintSteps: 0,
      seeds: 1,
      measureEvery: 1,
    },
  };
}

/** The loop a maintainer would write by hand: evaluate, record f, check it, step. */
function handLoop({ def, factory, spec }) {
  const problem = def.create(spec.params, { noise: new Pcg32(1n, 2n) });
  const x = new Float64Array(problem.dim);
  problem.start(x, new Pcg32(1n, 1n));
  const opt = factory.create(spec.hyper, problem.dim);
  const fs = new Float64Array(spec.budget.steps + 1);
  let last = 0;
  let atIterate = false;
  const oracle = {
    evaluate(p, g) {
      const f = problem.evaluate(p, g);
      if (p === x && !atIterate) {
        atIterate = true;
        last = f;
      }
      return f;
    },
  };
  // f(x_k) is what convergence is judged on: taken from the step when the optimizer evaluates at the
  // iterate (known after the next step), else evaluated explicitly (look-ahead methods).
  for (let k = 1; k <= spec.budget.steps; k++) {
    atIterate = false;
    opt.step(x, oracle);
    if (atIterate) fs[k - 1] = last;
    else fs[k] = last = problem.objective(x);
    if (!Number.isFinite(last)) break;
  }
  return fs[spec.budget.steps - 1];
}

function time(fn) {
  const t = performance.now();
  fn();
  return performance.now() - t;
}

function overhead(name, c, reps) {
  let scratch;
  const runner = () => {
    const r = executeRun(c.spec, 0, 1, c.factory, c.def, { scratch });
    scratch = r.scratch;
  };
  for (let i = 0; i < 3; i++) {
    runner();
    handLoop(c);
  }
  const ratios = [];
  const hand = [];
  const harness = [];
  for (let i = 0; i < reps; i++) {
    const a = time(() => handLoop(c));
    const b = time(runner);
    hand.push(a);
    harness.push(b);
    ratios.push(b / a);
  }
  return { name, handMs: median(hand), runnerMs: median(harness), ratio: median(ratios) };
}

const out = {};
const rows = [];

// 1. Overhead.
const cases = [
  ["adam on quadratic (n=10, κ=100)", caseFor("quadratic", {}, "adam", { lr: 0.03 }, 20000)],
  [
    "adam on extended-rosenbrock (n=1000)",
    caseFor("extended-rosenbrock", { n: 1000 }, "adam", { lr: 0.01 }, 2000),
  ],
  [
    "nesterov on quadratic (n=10, κ=100)",
    caseFor("quadratic", {}, "nesterov", { lr: 0.001, momentum: 0.9 }, 20000),
  ],
  ["sgd on rosenbrock (n=2)", caseFor("rosenbrock", {}, "sgd", { lr: 0.001 }, 100000)],
];
out.overhead = {};
for (const [name, c] of cases) {
  const r = overhead(name, c, 15);
  out.overhead[name] = r.ratio;
  rows.push([
    `overhead: ${name}`,
    `hand ${r.handMs.toFixed(2)} ms, runner ${r.runnerMs.toFixed(2)} ms`,
    `ratio ${r.ratio.toFixed(3)}`,
  ]);
}

// 2. Worker speedup on the default suite, two ways:
//    - steady state: one thread against two worker threads, both with their code already compiled
//      (a warm-up pass first; the pool keeps its workers between passes);
//    - cold, end to end: the CLI in a fresh process with --workers 1 and --workers 2 (part 3), where
//      every thread also compiles its code, on the same two cores.
const suite = resolveSuite(parseConfig(DEFAULT_SUITE_YAML, "default"), "default");
const all = Array.from({ length: suite.cases.reduce((n, c) => n + c.seeds, 0) }, (_, i) => i);
await runSuite(suite, { workers: 1 });
const pool = new SuitePool(suite, 2);
await pool.run(all);
const w1 = [];
const w2 = [];
let same = true;
let reference;
for (let i = 0; i < 3; i++) {
  let t = performance.now();
  const a = await runSuite(suite, { workers: 1 });
  w1.push(performance.now() - t);
  t = performance.now();
  const b = await pool.run(all);
  w2.push(performance.now() - t);
  reference ??= canonicalJson(a);
  same &&= canonicalJson(a) === reference && canonicalJson(b) === reference;
}
await pool.close();
out.workers = { oneMs: median(w1), twoMs: median(w2), speedup: median(w1) / median(w2), identical: same };
rows.push(["default suite, 1 thread (warm)", `${median(w1).toFixed(0)} ms`, ""]);
rows.push([
  "default suite, 2 worker threads (warm)",
  `${median(w2).toFixed(0)} ms`,
  `speedup ${out.workers.speedup.toFixed(2)} (target ≥ 1.8), identical: ${same}`,
]);

// 3. End to end through the CLI, in a fresh process, with 1 and with 2 workers (cold: compilation included).
const bin = fileURLToPath(new URL("../bin/gradgate.js", import.meta.url));
const cli = (workers) => {
  const t = performance.now();
  execFileSync(
    process.execPath,
    [
      bin,
      "run",
      "--quiet",
      "--workers",
      String(workers),
      "--out",
      `/tmp/gradgate-bench-results-${workers}.json`,
    ],
    { cwd: "/tmp", stdio: "ignore" },
  );
  return performance.now() - t;
};
const e1 = [];
const e2 = [];
for (let i = 0; i < 3; i++) {
  e1.push(cli(1));
  e2.push(cli(2));
}
out.endToEndSeconds = median(e2) / 1000;
out.endToEnd = {
  oneWorkerSeconds: median(e1) / 1000,
  twoWorkersSeconds: median(e2) / 1000,
  speedup: median(e1) / median(e2),
};
rows.push(["default suite end to end (CLI, 1 worker)", `${(median(e1) / 1000).toFixed(2)} s`, ""]);
rows.push([
  "default suite end to end (CLI, 2 workers)",
  `${out.endToEndSeconds.toFixed(2)} s`,
  `target ≤ 5 s; cold speedup ${out.endToEnd.speedup.toFixed(2)}`,
]);

// 4. Allocation per step at n = 10^6 (an iterate is 7812 KiB: one copy per step would show at once).
// Heap figures alone are noisy here (the start point's million seeded draws and the 8 MB buffers of
// each run trigger collections at varying moments), so the collections themselves are counted: a
// 10-step and a 210-step run, each after a full collection; the extra 200 steps must add none.
{
  const gc = globalThis.gc;
  const { PerformanceObserver } = await import("node:perf_hooks");
  const c = caseFor("extended-rosenbrock", { n: 1_000_000 }, "adam", { lr: 0.001 }, 210);
  const withSteps = (steps) => ({
    ...c.spec,
    budget: { ...c.spec.budget, steps },
    checkpoints: logCheckpoints(steps),
  });
  executeRun(withSteps(20), 0, 1, c.factory, c.def); // warm up
  let collections = 0;
  const observer = new PerformanceObserver((list) => (collections += list.getEntries().length));
  observer.observe({ entryTypes: ["gc"] });
  const measure = async (steps) => {
    gc?.();
    await new Promise((r) => setTimeout(r, 50));
    collections = 0;
    const before = process.memoryUsage();
    const t = performance.now();
    executeRun(withSteps(steps), 0, 1, c.factory, c.def);
    const ms = performance.now() - t;
    const after = process.memoryUsage();
    await new Promise((r) => setTimeout(r, 50));
    return { steps, ms, collections, heapGrowth: after.heapUsed - before.heapUsed };
  };
  const short = await measure(10);
  const long = await measure(210);
  observer.disconnect();
  out.largeScale = {
    n: 1_000_000,
    short,
    long,
    extraCollectionsPer200Steps: long.collections - short.collections,
    gcExposed: gc !== undefined,
  };
  rows.push([
    "extended-rosenbrock n=1e6, adam, 10 vs 210 steps",
    `${short.ms.toFixed(0)} ms vs ${long.ms.toFixed(0)} ms`,
    `garbage collections during the run: ${short.collections} vs ${long.collections} (heap growth ${(short.heapGrowth / 1024).toFixed(0)} vs ${(long.heapGrowth / 1024).toFixed(0)} KiB)`,
  ]);
}

const w = rows.reduce((m, r) => Math.max(m, r[0].length), 0);
const w2c = rows.reduce((m, r) => Math.max(m, r[1].length), 0);
for (const r of rows) console.log(`${r[0].padEnd(w)}  ${r[1].padEnd(w2c)}  ${r[2]}`);
console.log(JSON.stringify(out));
