import { describe, expect, it } from "vitest";
import { chartCases, curveOf, driftScore, leadDrift, orderCases } from "../../src/report/model.js";
import { mermaidChart, pickPoints } from "../../src/report/mermaid.js";
import { mdCode, mdText, mermaidText, escapeHtml } from "../../src/report/escape.js";
import { driftText } from "../../src/report/format.js";
import { caseOf, drift, geometricRuns, lumenVerdict } from "./documents.js";

describe("curveOf", () => {
  // Three seeds worked by hand: medians, minima and maxima at each checkpoint.
  const side = {
    case: { id: "c", checkpoints: [0, 1, 10, 100] },
    runs: [
      { stop: "steps" as const, trace: [10, 5, 1, 0.1] },
      // reached its target at step 10: holds its last gap afterwards
      { stop: "target" as const, trace: [10, 4, 1e-12, null] },
      // diverged after step 1: +∞ from then on
      { stop: "diverged" as const, trace: [10, 8, null, null] },
    ],
  };
  it("takes the median and range over seeds, holding stopped runs and counting diverged ones as +∞", () => {
    const c = curveOf(side);
    expect(c.steps).toEqual([0, 1, 10, 100]);
    expect(c.median).toEqual([10, 5, 1, 0.1]);
    expect(c.low).toEqual([10, 4, 1e-12, 1e-12]);
    expect(c.high).toEqual([10, 8, Infinity, Infinity]);
    expect(c.seeds).toBe(3);
  });
  it("leaves out a run that failed with an error past its end", () => {
    const c = curveOf({
      case: { id: "c", checkpoints: [0, 1] },
      runs: [{ stop: "error", trace: [3, null] }],
    });
    expect(c.median).toEqual([3, null]);
  });
});

describe("ordering and drift", () => {
  it("orders worst news first, then by how far a case moved", () => {
    const ids = orderCases(lumenVerdict().cases).map((c) => `${c.verdict}:${c.id}`);
    expect(ids).toEqual([
      "regressed:lumen-adam/default/rosenbrock",
      "inconclusive:lumen-adam/default/beale",
      "improved:lumen-sgd/default/quadratic(kappa=100)",
      "equivalent:lumen-adam/default/quadratic(kappa=100)",
      "unchanged:lumen-sgd/default/beale",
      "unchanged:lumen-sgd/default/rosenbrock",
    ]);
  });
  it("picks the decisive metric for the table and scores |ln ratio|", () => {
    const c = caseOf("a/default/p", "regressed", {
      drift: [
        drift({ status: "equivalent", ratio: 3 }),
        drift({ metric: "finalGap", kind: "finalGap", status: "regressed", ratio: 1.5 }),
        drift({ metric: "evaluations", kind: "evaluations", status: "regressed", ratio: 0.5, gating: false }),
      ],
    });
    expect(leadDrift(c)?.metric).toBe("finalGap");
    expect(driftScore(c)).toBeCloseTo(Math.log(3), 15); // absolute; the non-gating 0.5 is ignored
    expect(
      driftScore(
        caseOf("b/default/p", "regressed", {
          diverged: [{ seed: 1, baseline: "converged", candidate: "diverged" }],
        }),
      ),
    ).toBe(Infinity);
  });
  it("charts the failing cases first, never unchanged ones, only where candidate runs exist", () => {
    const v = lumenVerdict();
    const candidate = v.cases.map((c) => geometricRuns(c.id, 0.98));
    const picked = chartCases({ verdict: v, candidate }, 10).map((c) => c.id);
    expect(picked[0]).toBe("lumen-adam/default/rosenbrock");
    expect(picked).toHaveLength(4);
    expect(chartCases({ verdict: v }, 10)).toEqual([]);
  });
});

describe("Mermaid chart", () => {
  it("picks log-spaced checkpoints, step 0 first", () => {
    const steps = [
      0, 1, 2, 3, 4, 5, 6, 7, 8, 10, 12, 14, 17, 21, 25, 30, 35, 42, 50, 60, 72, 86, 103, 123, 147, 176, 210,
      251, 300,
    ];
    const picked = pickPoints(steps, 8).map((i) => steps[i]);
    // targets 300^(j/6) for j = 0..6: 1, 2.59, 6.69, 17.3, 44.8, 116, 300 → nearest in log distance
    expect(picked).toEqual([0, 1, 3, 7, 17, 42, 123, 300]);
  });
  it("plots log10 of the median and range, on a whole-decade axis", () => {
    const cand = curveOf({
      case: { id: "c", checkpoints: [0, 1, 10] },
      runs: [
        { stop: "steps", trace: [100, 1, 1e-3] },
        { stop: "steps", trace: [100, 10, 1e-2] },
        { stop: "steps", trace: [100, 0.1, 1e-4] },
      ],
    });
    const text = mermaidChart("c", cand, null)!;
    const lines = text.split("\n");
    expect(lines[0]).toBe("```mermaid");
    expect(lines).toContain('  x-axis "step (log-spaced checkpoints)" ["0", "1", "10"]');
    expect(lines).toContain('  y-axis "log10 gap" -4 --> 2');
    // high, low, median
    expect(lines.filter((l) => l.startsWith("  line "))).toEqual([
      "  line [2, 1, -2]",
      "  line [2, -1, -4]",
      "  line [2, 0, -3]",
    ]);
    expect(lines[1]).toContain('"plotColorPalette":"#f2b48a, #f2b48a, #c4450c"');
  });
  it("draws the baseline only when its checkpoints are the candidate's", () => {
    const a = curveOf(geometricRuns("c", 0.98));
    const other = curveOf({
      ...geometricRuns("c", 0.98),
      case: { id: "c", checkpoints: [0, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12, 13, 14, 15] },
    });
    expect(mermaidChart("c", a, a)!.match(/ {2}line /g)).toHaveLength(6);
    expect(mermaidChart("c", a, other)!.match(/ {2}line /g)).toHaveLength(3);
  });
});

describe("escaping", () => {
  it.each([
    ["[x](http://evil)", "\\[x\\]\\(http\\:\\/\\/evil\\)"],
    ["a|b", "a\\|b"],
    ["<script>", "&lt;script&gt;"],
    ["@me", "&#64;\u200bme"],
    ["#7", "\\#\u200b7"],
    ["x\ny", "x y"],
  ])("mdText(%j)", (raw, escaped) => {
    expect(mdText(raw)).toBe(escaped);
  });
  it.each([
    ["adam", "`adam`"],
    ["a`b", "``a`b``"],
    ["`a", "`` `a ``"],
    ["a|b", "`a\\|b`"],
    ["", "` `"],
  ])("mdCode(%j)", (raw, code) => {
    expect(mdCode(raw)).toBe(code);
  });
  it("reduces Mermaid text to harmless characters and HTML to entities", () => {
    expect(mermaidText('a"]%%{init}%%;#x')).toBe("a?????init?????x");
    expect(escapeHtml(`<a href="x">'&`)).toBe("&lt;a href=&quot;x&quot;&gt;&#39;&amp;");
  });
});

describe("the comparison's headline and open intervals", () => {
  it("leads with the headline's metric and bootstrap interval; an open end shows as 0 or ∞", () => {
    const c = caseOf("a/default/p", "regressed", {
      drift: [
        drift({ status: "regressed", ratio: 3 }),
        drift({ metric: "finalGap", kind: "finalGap", rung: null, status: "regressed", ratio: 1.5 }),
      ],
      headline: {
        metric: "finalGap",
        ratio: 1.5,
        bound: "none",
        status: "regressed",
        interval: { low: 1.2, high: null, level: 0.975, method: "bootstrap-bca", resamples: 1000 },
      },
    });
    const lead = leadDrift(c)!;
    expect(lead.metric).toBe("finalGap");
    expect(driftText(lead)).toBe("×1.5 (97.5% CI 1.2–∞)");
    expect(
      driftText({ ...lead, interval: { ...lead.interval!, low: null, high: 2 }, bound: "at-least" }),
    ).toBe("≥×1.5 (97.5% CI 0–2)");
  });
});
