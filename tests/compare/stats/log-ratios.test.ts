import { describe, expect, it } from "vitest";
import { pairedLogRatios } from "../../../src/compare/stats/log-ratios.js";

describe("pairedLogRatios", () => {
  it("computes ln(candidate) − ln(baseline) per seed; identical pairs give exactly 0", () => {
    const d = pairedLogRatios([2, 5, 1e-300, 7], [1, 5, 1e-300, 14]);
    expect(Array.from(d)).toEqual([Math.log(2), 0, 0, Math.log(7) - Math.log(14)]);
    expect(d[3]).toBeCloseTo(-Math.LN2, 15); // absolute tolerance 5e-16
  });

  it("fills a caller-owned buffer and returns a view of its first n values", () => {
    const out = new Float64Array(8);
    const d = pairedLogRatios([1, Math.E], [1, 1], out);
    expect(d.length).toBe(2);
    expect(d.buffer).toBe(out.buffer);
    expect(out[1]).toBe(1);
  });

  it("rejects unpaired lengths, non-positive metrics and a short buffer", () => {
    expect(() => pairedLogRatios([1, 2], [1])).toThrow(
      "pairedLogRatios: candidate and baseline must pair up seed by seed (same length), got 2 and 1",
    );
    expect(() => pairedLogRatios([1, 0], [1, 1])).toThrow(
      "pairedLogRatios: candidate[1] must be a finite number greater than 0, got 0",
    );
    expect(() => pairedLogRatios([1], [-3])).toThrow(
      "pairedLogRatios: baseline[0] must be a finite number greater than 0, got -3",
    );
    expect(() => pairedLogRatios([1, 1], [1, 1], new Float64Array(1))).toThrow(
      "pairedLogRatios: out must hold at least 2 values, got length 1",
    );
  });
});
