/**
 * Containment: every way an optimizer process can misbehave, injected by real child processes
 * (tests/fixtures/adapters/faulty.py through the client library, raw.py speaking the protocol by hand;
 * see the README there). Each fault must end the affected runs with stop "error" and the exact reason,
 * leave the other runs alone, and never make the harness throw. With a marker file the fixtures fault
 * in one process only, so the runs still queued show that a fresh process takes over.
 *
 * Every session runs 5 runs of gradient descent (lr 0.001) for 6 steps on Rosenbrock with at most 3
 * in flight: runs 0–2 start in the first process (runs 0 and 1 in the first lane of orders, run 2 in
 * the second, so reports alternate between the lanes and are numbered across both), runs 3–4 when
 * slots free up. The fault fires in the second instance a process creates (run 1), at its step 3:
 * that is the 7th report (lane 1: evaluation at x₀, steps 1, 2, 3; lane 2 in between).
 */
import { join } from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { InputError } from "../../src/core/errors.js";
import { ProcessSession } from "../../src/adapters/session.js";
import type { RunRequest } from "../../src/adapters/process-run.js";
import { getProblem } from "../../src/problems/index.js";
import type { ProcessAdapterSpec, RunMetrics } from "../../src/runner/types.js";
import { FIXTURES, ROOT, pySettings, suiteFromYaml, tempDir } from "./helpers.js";

const FAULTY = join(FIXTURES, "faulty.py");
const RAW = join(FIXTURES, "raw.py");
const PY = 'adapter "py"';

const sessions: ProcessSession[] = [];
afterAll(async () => {
  await Promise.all(sessions.map((s) => s.close()));
});

let requests: RunRequest[] = [];
async function requestsFor(steps = 6): Promise<RunRequest[]> {
  const suite = await suiteFromYaml(`
seeds: 5
budget: { steps: ${steps} }
optimizers: [{ name: sgd, hyper: { lr: 0.001 } }]
problems: [{ use: rosenbrock }]
`);
  const spec = suite.cases[0];
  return Array.from({ length: 5 }, (_, s) => ({
    spec,
    seedIndex: s,
    suiteSeed: suite.seed,
    definition: getProblem("rosenbrock"),
    optimizer: "sgd",
  }));
}

async function run(script: string, args: string[], over: Partial<ProcessAdapterSpec> = {}, steps = 6) {
  const session = new ProcessSession(pySettings(script, args, { maxRuns: 3, ...over }));
  sessions.push(session);
  const reqs =
    steps === 6
      ? (requests = requests.length > 0 ? requests : await requestsFor())
      : await requestsFor(steps);
  return { metrics: await session.run(reqs), session };
}

let healthy: RunMetrics[] = [];
const marker = () => join(tempDir(), "fault-happened");
const errors = (ms: RunMetrics[]) => ms.map((m) => (m.stop === "error" ? m.error : m.stop));

describe("a well-behaved client (control)", () => {
  it("completes every run through the library and by hand alike", async () => {
    healthy = (await run(FAULTY, ["ok"])).metrics;
    expect(healthy.map((m) => [m.stop, m.steps, m.evaluations])).toEqual(Array(5).fill(["steps", 6, 6]));
    expect((await run(RAW, ["ok"])).metrics).toEqual(healthy);
  });
});

describe("faults of the whole process end the runs in flight; a fresh process serves the rest", () => {
  const expectRecovered = (ms: RunMetrics[]) => {
    expect(ms[3]).toEqual(healthy[3]);
    expect(ms[4]).toEqual(healthy[4]);
  };

  it("a crash (exit status 3), with the tail of stderr", async () => {
    const { metrics } = await run(FAULTY, ["crash", marker()]);
    const reason = `${PY}: the process exited with status 3\nstderr (last lines):\nfaulty.py: crashing on purpose`;
    expect(errors(metrics).slice(0, 3)).toEqual([reason, reason, reason]);
    expect(metrics.slice(0, 3).map((m) => [m.steps, m.evaluations])).toEqual([
      [2, 3],
      [2, 3],
      [2, 3],
    ]);
    expectRecovered(metrics);
  });

  it("a hang: no report within the message time-out", async () => {
    const { metrics } = await run(FAULTY, ["hang", marker()], {
      timeouts: { start: 20, message: 1, run: 120 },
    });
    const reason = `${PY}: no report within 1 s (time-out); the process was stopped`;
    expect(errors(metrics).slice(0, 3)).toEqual([reason, reason, reason]);
    expectRecovered(metrics);
  });

  it("a line that is not JSON, quoted", async () => {
    const { metrics } = await run(FAULTY, ["garbage", marker()]);
    const reason =
      `${PY}: report 7 is not JSON (stdout must carry protocol messages only; write diagnostics to stderr): ` +
      `"debug: step 3"`;
    expect(errors(metrics).slice(0, 3)).toEqual([reason, reason, reason]);
    expectRecovered(metrics);
  });

  it("JSON that is not a protocol report, quoted", async () => {
    const { metrics } = await run(RAW, ["not-protocol", marker()]);
    const reason = `${PY}: report 3 is not a protocol report (expected a JSON object with "type": "report"): "{\\"type\\": \\"progress\\"}"`;
    expect(errors(metrics).slice(0, 3)).toEqual([reason, reason, reason]);
    expectRecovered(metrics);
  });

  it("a report naming a run that does not exist, quoted and truncated", async () => {
    const { metrics } = await run(RAW, ["unknown-run", marker()]);
    for (const m of metrics.slice(0, 3)) {
      expect(m.stop).toBe("error");
      expect(
        m.error!.startsWith(
          `${PY}: report 3: evals names run 999, which is not in flight: "{\\"type\\": \\"report\\", \\"steps\\": [`,
        ),
      ).toBe(true);
      expect(m.error!.endsWith(" characters, truncated)")).toBe(true);
    }
    expectRecovered(metrics);
  });

  it("a message longer than maxMessageBytes", async () => {
    const { metrics } = await run(RAW, ["oversized", marker()], { maxMessageBytes: 65536 });
    for (const m of metrics.slice(0, 3)) {
      expect(m.stop).toBe("error");
      expect(m.error).toMatch(
        /^adapter "py": line 4 of its output is longer than maxMessageBytes \(65536 bytes\), starting "\{\\"type\\": \\"report\\", \\"steps\\": \[\{\\"run\\": 0, \\"x\\": \[.{40,}"; the process was stopped$/,
      );
    }
    expectRecovered(metrics);
  });
});

describe("faults of one run end that run only", () => {
  it("an iterate of the wrong length", async () => {
    const { metrics } = await run(FAULTY, ["wrong-length"]);
    expect(errors(metrics)).toEqual([
      "steps",
      `${PY}: report 7: steps[1].x of run 1 has 3 numbers, expected 2`,
      "steps",
      "steps",
      "steps",
    ]);
    expect(metrics[0]).toEqual(healthy[0]);
  });

  it("a bare NaN token in an evaluation point", async () => {
    const { metrics } = await run(RAW, ["nan-token"]);
    expect(errors(metrics)).toEqual([
      `${PY}: report 3: evals[0].x[0] of run 0 is NaN, which JSON cannot carry (send null for a point that is not finite)`,
      "steps",
      "steps",
      "steps",
      "steps",
    ]);
    expect(metrics.slice(1)).toEqual(healthy.slice(1));
  });

  it("a bare -Infinity token in an evaluation point", async () => {
    const { metrics } = await run(RAW, ["inf-token"]);
    expect(errors(metrics)).toEqual([
      `${PY}: report 3: evals[0].x[0] of run 0 is -Infinity, which JSON cannot carry (send null for a point that is not finite)`,
      "steps",
      "steps",
      "steps",
      "steps",
    ]);
    expect(metrics.slice(1)).toEqual(healthy.slice(1));
  });

  it("a run the report says nothing about", async () => {
    const { metrics } = await run(RAW, ["forget-run"]);
    expect(errors(metrics)).toEqual([
      `${PY}: report 3 says nothing about run 0 (expected a step, an evaluation request or a failure)`,
      "steps",
      "steps",
      "steps",
      "steps",
    ]);
  });

  it("an exception in the optimizer code", async () => {
    const { metrics } = await run(FAULTY, ["raise"]);
    expect(errors(metrics)).toEqual([
      "steps",
      "step 3 threw: ValueError: boom at step 3",
      "steps",
      "steps",
      "steps",
    ]);
    expect(metrics[1].evaluations).toBe(3);
  });

  it("a run past the run time-out (each step takes 50 ms, the limit is 0.3 s)", async () => {
    const { metrics } = await run(FAULTY, ["slow"], { timeouts: { start: 20, message: 20, run: 0.3 } }, 1000);
    metrics.forEach((m, i) => {
      expect(m.stop).toBe("error");
      expect(m.error).toMatch(
        new RegExp(
          `^adapter "py": run time-out: run ${i} still going after 0.3 s \\(timeouts.run\\), at step \\d+$`,
        ),
      );
    });
  });

  it("a non-finite iterate (sent as null) is a divergence, as in-process", async () => {
    const { metrics } = await run(FAULTY, ["nan"]);
    expect(metrics.map((m) => m.stop)).toEqual(["steps", "diverged", "steps", "steps", "steps"]);
    expect([metrics[1].divergence, metrics[1].divergedAt, metrics[1].finalGap]).toEqual([
      "non-finite",
      3,
      null,
    ]);
  });
});

describe("a process that does not start fails every run with the reason", () => {
  it.each([
    ["bad-ready", `${PY}: handshake failed: the first line is not JSON: "hello yourself"`],
    ["old-protocol", `${PY}: handshake failed: protocol 99 is not spoken here (harness speaks 1)`],
    [
      "exit-at-hello",
      `${PY}: the process exited with status 5\nstderr (last lines):\nraw.py: refusing to start`,
    ],
  ])("%s", async (mode, reason) => {
    const { metrics } = await run(RAW, [mode]);
    expect(errors(metrics)).toEqual(Array(5).fill(reason));
    expect(metrics.map((m) => [m.steps, m.evaluations, m.f0 !== null])).toEqual(Array(5).fill([0, 0, true]));
  });

  it("a program that does not exist", async () => {
    const session = new ProcessSession({ ...pySettings(RAW), command: ["no-such-program-gradgate"] });
    sessions.push(session);
    const metrics = await session.run(await requestsFor());
    expect(errors(metrics)).toEqual(
      Array(5).fill(
        `${PY}: could not start "no-such-program-gradgate": not found (a bare name is looked up on PATH, a relative path from the working directory ${JSON.stringify(ROOT)})`,
      ),
    );
  });

  it("is a config error when the suite is prepared", async () => {
    const yaml = `
adapters:
  py: { command: [python3, ${JSON.stringify(RAW)}, old-protocol] }
optimizers: [{ name: a, use: "py:sgd" }]
problems: [{ use: rosenbrock }]
`;
    const err = await suiteFromYaml(yaml).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(InputError);
    expect((err as Error).message).toBe(
      `config gradgate.yml: adapters.py (command ${JSON.stringify(["python3", RAW, "old-protocol"])}): ` +
        `${PY}: handshake failed: protocol 99 is not spoken here (harness speaks 1)`,
    );
  });

  it("names an optimizer the process does not serve", async () => {
    const yaml = `
adapters:
  py: { command: [python3, ${JSON.stringify(RAW)}, ok] }
optimizers: [{ name: a, use: "py:adam" }]
problems: [{ use: rosenbrock }]
`;
    const err = await suiteFromYaml(yaml).catch((e: unknown) => e);
    expect((err as Error).message).toBe(
      `config gradgate.yml: optimizers[0].use "py:adam": adapter "py" serves no optimizer "adam" (it serves: sgd)`,
    );
  });
});
