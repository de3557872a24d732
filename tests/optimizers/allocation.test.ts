/**
 * "No allocation per step": after a warm-up (so the step is compiled by the optimizing tier), a
 * measured stretch of steps must cause no garbage collection and grow V8's young generation (where
 * short-lived objects are allocated) by far less than one small object per step. Old and code space
 * are not counted: they grow once when the JIT compiles or recompiles the step, not per step. A
 * control that allocates one small typed array per step must fail the same measurement, so the check
 * is known to be able to fail.
 */
import v8 from "node:v8";
import vm from "node:vm";
import { PerformanceObserver } from "node:perf_hooks";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Oracle } from "../../src/core/types.js";
import { adam } from "../../src/optimizers/index.js";
import { CASES } from "./cases.js";

const DIM = 64;
const WARMUP = 20_000;
const STEPS = 20_000;
/**
 * Young-generation growth allowed over STEPS steps: 64 KiB, i.e. ~3.3 bytes per step, while one boxed
 * number per step (16 bytes) would be 320 KB. The measurement itself costs ~2 KB.
 */
const GROWTH_BOUND = 64 * 1024;
const YOUNG_SPACES = new Set(["new_space", "new_large_object_space"]);

function youngBytes(): number {
  let total = 0;
  for (const space of v8.getHeapSpaceStatistics()) {
    if (YOUNG_SPACES.has(space.space_name)) total += space.space_used_size;
  }
  return total;
}

v8.setFlagsFromString("--expose-gc");
const gc = vm.runInNewContext("gc") as () => void;

let collections = 0;
const observer = new PerformanceObserver((list) => {
  collections += list.getEntries().length;
});
beforeAll(() => observer.observe({ entryTypes: ["gc"] }));
afterAll(() => observer.disconnect());

/** f = ½Σaᵢxᵢ² with a fixed spread of curvatures; returns the integer 0 so no number is boxed. */
const curvature = Float64Array.from({ length: DIM }, (_, i) => 0.1 + (i % 8));
const oracle: Oracle = {
  evaluate(x: Float64Array, grad: Float64Array): number {
    for (let i = 0; i < x.length; i++) grad[i] = curvature[i] * x[i];
    return 0;
  },
};
const start = Float64Array.from({ length: DIM }, (_, i) => 1 + (i % 5) * 0.25);

const settle = () => new Promise<void>((resolve) => setTimeout(resolve, 20));

function steps(step: (x: Float64Array) => void, x: Float64Array, n: number): void {
  // Restart from the same point now and then so the iterate never underflows or settles.
  for (let k = 1; k <= n; k++) {
    step(x);
    if (k % 1000 === 0) x.set(start);
  }
}

/** Young-generation growth and garbage collections over STEPS steps, after WARMUP steps. */
async function measure(step: (x: Float64Array) => void): Promise<{ growth: number; collections: number }> {
  const x = start.slice();
  for (let r = 0; r < WARMUP / 1000; r++) steps(step, x, 1000);
  gc();
  await settle();
  collections = 0;
  const before = youngBytes();
  steps(step, x, STEPS);
  const after = youngBytes();
  await settle(); // gc entries are delivered asynchronously
  return { growth: after - before, collections };
}

/**
 * Until the optimizing compiler has finished (it works on a background thread, which a busy machine
 * delays), a step runs in a tier that boxes intermediate numbers. So up to three measurements are taken,
 * with a pause between them for the compiler, and the first clean one counts; a step that allocates once
 * compiled allocates in all three (the control below checks exactly that).
 */
async function measureCompiled(
  step: (x: Float64Array) => void,
): Promise<{ growth: number; collections: number }> {
  let result = await measure(step);
  for (let attempt = 1; attempt < 3 && (result.collections > 0 || result.growth >= GROWTH_BOUND); attempt++) {
    await new Promise<void>((resolve) => setTimeout(resolve, 250));
    result = await measure(step);
  }
  return result;
}

describe("no allocation per step", () => {
  it.each(CASES.map((c) => [c.label, c] as const))("%s", async (_label, c) => {
    const opt = c.factory.create(c.hyper, DIM);
    const result = await measureCompiled((x) => opt.step(x, oracle));
    expect(result.collections).toBe(0);
    expect(result.growth).toBeLessThan(GROWTH_BOUND);
  });

  it("control: one small typed array per step is detected, on every attempt", async () => {
    const opt = adam.create({}, DIM);
    const kept: { last: Float64Array | null } = { last: null };
    const result = await measureCompiled((x) => {
      opt.step(x, oracle);
      kept.last = new Float64Array(4);
    });
    expect(result.collections > 0 || result.growth >= GROWTH_BOUND).toBe(true);
  });
});
