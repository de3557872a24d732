/**
 * Evaluations per second through the subprocess protocol with the Python client
 * (clients/python/gradgate_client.py serving examples/adapters/python/optimizers.py): gradient descent
 * on a 2-D problem, the cheapest optimizer and problem there are, so the figure is the protocol's own
 * cost (JSON both ways, the client's bookkeeping, the harness's recorder) and not the arithmetic.
 *
 *   batched:   1024 runs in flight in one process (every message carries up to 1024 evaluations)
 *   unbatched: 1 run in flight (every message carries one evaluation)
 *
 * Both are measured side by side in one process, alternating, three rounds each; the median round is
 * reported, with the CPU time per evaluation of the harness and of the client (from /proc on Linux):
 * the harness and the client work in parallel (two lanes of orders in flight), so on an idle machine
 * with two cores the batched rate approaches 1 / max(harness, client) CPU time. The last line of output
 * is JSON. Run: npx tsx scripts/bench-protocol.ts [--quick]
 */
import { readFileSync } from "node:fs";
import { availableParallelism } from "node:os";
import { fileURLToPath } from "node:url";
import { parseConfig } from "../src/config/load.js";
import { resolveSuite } from "../src/runner/suite.js";
import { getProblem } from "../src/problems/index.js";
import { ProcessSession } from "../src/adapters/session.js";
import type { RunRequest } from "../src/adapters/process-run.js";

const quick = process.argv.includes("--quick");
const STEPS = 1000;
const BATCHED_RUNS = quick ? 256 : 2048;
const UNBATCHED_RUNS = quick ? 4 : 16;
const ROUNDS = 3;
const script = fileURLToPath(new URL("../examples/adapters/python/optimizers.py", import.meta.url));

const config = parseConfig(
  `seeds: 1
budget: { steps: ${STEPS}, seconds: 3600 }
stopAt: 0
optimizers: [{ name: sgd, hyper: { lr: 0.01 } }]
problems: [{ use: quadratic, params: { n: 2, kappa: 10, rotate: 0 } }]
`,
  "bench-protocol.yml",
);
const spec = resolveSuite(config, "bench-protocol.yml").cases[0];
const definition = getProblem(spec.problem);
const requests = (n: number): RunRequest[] =>
  Array.from({ length: n }, (_, s) => ({ spec, seedIndex: s, suiteSeed: 1, definition, optimizer: "sgd" }));

function session(maxRuns: number): ProcessSession {
  return new ProcessSession({
    name: "bench",
    command: ["python3", script],
    cwd: process.cwd(),
    env: {},
    maxRuns,
    maxMessageBytes: 1 << 26,
    timeouts: { start: 30, message: 120, run: 3600 },
  });
}

/** CPU seconds (user + system) a process has used so far, from /proc (Linux); null elsewhere. */
function childCpuSeconds(pid: number | undefined): number | null {
  if (pid === undefined) return null;
  try {
    const fields = readFileSync(`/proc/${pid}/stat`, "utf8").split(") ")[1].split(" ");
    return (Number(fields[11]) + Number(fields[12])) / 100; // utime, stime in clock ticks (USER_HZ = 100)
  } catch {
    return null;
  }
}

interface Round {
  readonly perSecond: number;
  /** CPU microseconds per evaluation in the harness (this process) and in the Python client. */
  readonly harnessCpu: number;
  readonly clientCpu: number | null;
}

async function measure(s: ProcessSession, runs: number): Promise<Round> {
  await s.describe(); // process start-up is not part of the figure
  const cpu0 = process.cpuUsage();
  const child0 = childCpuSeconds(s.pid);
  const t0 = performance.now();
  const metrics = await s.run(requests(runs));
  const seconds = (performance.now() - t0) / 1000;
  const cpu = process.cpuUsage(cpu0);
  const child1 = childCpuSeconds(s.pid);
  const evaluations = metrics.reduce((n, m) => n + m.evaluations, 0);
  const failed = metrics.filter((m) => m.stop === "error");
  if (failed.length > 0) throw new Error(`bench runs failed: ${failed[0].error}`);
  return {
    perSecond: evaluations / seconds,
    harnessCpu: (cpu.user + cpu.system) / evaluations,
    clientCpu: child0 === null || child1 === null ? null : ((child1 - child0) * 1e6) / evaluations,
  };
}

/** The round with the median throughput. */
const median = (rounds: Round[]) =>
  [...rounds].sort((a, b) => a.perSecond - b.perSecond)[Math.floor(rounds.length / 2)];
const fmt = (n: number) => Math.round(n).toLocaleString("en");
const cpuText = (r: Round) =>
  `CPU µs/evaluation: harness ${r.harnessCpu.toFixed(2)}, client ${r.clientCpu === null ? "?" : r.clientCpu.toFixed(2)}`;

const batchedSession = session(1024);
const unbatchedSession = session(1);
const batched: Round[] = [];
const unbatched: Round[] = [];
for (let round = 0; round < ROUNDS; round++) {
  batched.push(await measure(batchedSession, BATCHED_RUNS));
  unbatched.push(await measure(unbatchedSession, UNBATCHED_RUNS));
  console.log(
    `round ${round + 1}: batched ${fmt(batched[round].perSecond)} evaluations/s (${cpuText(batched[round])})`,
  );
  console.log(
    `         unbatched ${fmt(unbatched[round].perSecond)} evaluations/s (${cpuText(unbatched[round])})`,
  );
}
await Promise.all([batchedSession.close(), unbatchedSession.close()]);

const summary = (r: Round, runsInFlight: number, runs: number) => ({
  runsInFlight,
  runs,
  evaluationsPerSecond: Math.round(r.perSecond),
  harnessCpuMicrosecondsPerEvaluation: Number(r.harnessCpu.toFixed(3)),
  clientCpuMicrosecondsPerEvaluation: r.clientCpu === null ? null : Number(r.clientCpu.toFixed(3)),
});
const b = median(batched);
const u = median(unbatched);
const result = {
  bench: "protocol",
  client: "python3 clients/python/gradgate_client.py (examples/adapters/python/optimizers.py, sgd)",
  problem: spec.problemKey,
  steps: STEPS,
  rounds: ROUNDS,
  cpus: availableParallelism(),
  batched: summary(b, 1024, BATCHED_RUNS),
  unbatched: summary(u, 1, UNBATCHED_RUNS),
  speedup: Number((b.perSecond / u.perSecond).toFixed(1)),
};
console.log(JSON.stringify(result));
