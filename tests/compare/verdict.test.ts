/**
 * Verdict logic on constructed paired samples with known answers: unchanged, float noise, clear
 * regression and improvement, equivalence within the margin, inconclusive, divergence, recovery, new,
 * missing, censoring, strict mode, and the multiplicity step.
 */
import { describe, expect, it } from "vitest";
import { compareResults } from "../../src/compare/compare.js";
import { resolvePolicy } from "../../src/compare/policy.js";
import type { CaseResult, RunMetrics } from "../../src/runner/types.js";
import { baselines, diverged, jitter, results, run, spec } from "./fixtures.js";

/** Extra seeds off: one look, alpha 0.05 as is. */
const ONE_LOOK = resolvePolicy({ extraSeeds: { perCase: 0 } });

function pairCase(n: number, cand: (i: number, base: RunMetrics) => RunMetrics, over = {}) {
  const s = spec({ seeds: n, ...over });
  const j = jitter(n, 0.2, 7);
  const baseRuns = Array.from({ length: n }, (_, i) => run(i, { scale: j[i] }));
  return {
    base: { case: s, runs: baseRuns } as CaseResult,
    cand: { case: s, runs: baseRuns.map((b, i) => cand(i, b)) } as CaseResult,
    j,
  };
}

function scaled(factor: number, width = 0.01) {
  const k = jitter(64, width, 11);
  const j = jitter(64, 0.2, 7);
  return (i: number) => run(i, { scale: j[i] * factor * k[i] });
}

describe("case verdicts", () => {
  it("bitwise equal runs are unchanged and the gate passes", () => {
    const { base, cand } = pairCase(5, (_, b) => ({ ...b }));
    const v = compareResults(results([cand]), baselines([base]));
    expect(v.cases[0].verdict).toBe("unchanged");
    expect(v.cases[0].fingerprint.status).toBe("identical");
    expect(v.cases[0].drift).toEqual([]);
    expect(v.gate).toEqual({ verdict: "pass", reasons: [], checks: [] });
    expect(v.counts.unchanged).toBe(1);
  });

  it("float noise (final gaps below the floor, iterates a few ulps apart) is equivalent, not unchanged", () => {
    const { base, cand } = pairCase(5, (_, b) => ({
      ...b,
      finalGap: b.finalGap! * (1 + 4e-16),
      iterates: b.iterates!.map((x) => x.map((v) => (v === null ? v : v * (1 + 2.2e-16)))),
    }));
    const v = compareResults(results([cand]), baselines([base]));
    const c = v.cases[0];
    expect(c.verdict).toBe("equivalent");
    expect(c.drift.every((d) => d.status === "unchanged")).toBe(true);
    expect(c.fingerprint.status).toBe("float-noise");
    expect(c.fingerprint.maxRelative).toBeLessThan(1e-15);
    expect(c.reasons.map((r) => r.code)).toEqual(["trajectory"]);
    expect(v.gate.verdict).toBe("pass");
  });

  it("a clear slowdown on every seed (×1.3) is regressed and fails the gate", () => {
    const { base, cand } = pairCase(30, scaled(1.3));
    const v = compareResults(results([cand]), baselines([base]), { policy: ONE_LOOK });
    const c = v.cases[0];
    expect(c.verdict).toBe("regressed");
    expect(c.failsGate).toBe(true);
    const deep = c.drift.find((d) => d.metric === "stepsTo(1e-6)")!;
    expect(deep.status).toBe("regressed");
    expect(deep.ratio).toBeGreaterThan(1.25);
    expect(deep.ratio).toBeLessThan(1.35);
    expect(deep.interval!.low).toBeGreaterThan(1.1);
    expect(deep.adjustedPValue).toBeLessThan(0.05);
    expect(c.headline?.status).toBe("regressed");
    expect(c.headline?.interval?.method).toMatch(/^bootstrap-/);
    expect(
      c.headline!.interval!.low! < c.headline!.ratio && c.headline!.ratio < c.headline!.interval!.high!,
    ).toBe(true);
    expect(v.gate.verdict).toBe("fail");
    expect(v.gate.reasons[0].case).toBe(c.id);
    expect(v.gate.reasons[0].message).toMatch(/^adam\/default\/quadratic\(n=4\): regressed — stepsTo/);
  });

  it("a clear speedup (×0.7) is improved and passes under the default policy", () => {
    const { base, cand } = pairCase(30, scaled(0.7));
    const v = compareResults(results([cand]), baselines([base]), { policy: ONE_LOOK });
    expect(v.cases[0].verdict).toBe("improved");
    expect(v.cases[0].failsGate).toBe(false);
    expect(v.gate.verdict).toBe("pass");
  });

  it("strict mode fails an improvement too (pure refactors must not change behaviour)", () => {
    const { base, cand } = pairCase(30, scaled(0.7));
    const strict = resolvePolicy({ strict: true, extraSeeds: { perCase: 0 } });
    const v = compareResults(results([cand]), baselines([base]), { policy: strict });
    expect(v.cases[0].verdict).toBe("improved");
    expect(v.gate.verdict).toBe("fail");
    expect(v.cases[0].reasons.at(-1)).toEqual({
      code: "strict",
      message: "strict policy: a improved case is a behaviour change",
    });
  });

  it("a shift well inside the margin (×1.02 ± 1 %) is shown equivalent", () => {
    const { base, cand } = pairCase(30, scaled(1.02));
    const v = compareResults(results([cand]), baselines([base]), { policy: ONE_LOOK });
    const c = v.cases[0];
    expect(c.verdict).toBe("equivalent");
    const deep = c.drift.find((d) => d.metric === "stepsTo(1e-6)")!;
    expect(deep.status).toBe("equivalent");
    expect(deep.equivalencePValue).toBeLessThan(0.05);
    expect(deep.interval!.low! > 1 / 1.1 && deep.interval!.high! < 1.1).toBe(true);
  });

  it("five seeds cannot show a ×1.3 slowdown beyond the margin after correction: inconclusive, gate passes", () => {
    const { base, cand } = pairCase(5, scaled(1.3));
    const v = compareResults(results([cand]), baselines([base]), { policy: ONE_LOOK });
    const c = v.cases[0];
    expect(c.verdict).toBe("inconclusive");
    expect(c.reasons.find((r) => r.code === "inconclusive")?.message).toMatch(
      /^changed, neither shown beyond nor within the margins at alpha 0\.05: stepsTo\(1e-1\) ×1\.3/,
    );
    expect(v.gate.verdict).toBe("pass");
    // ... and with failOn including inconclusive, it fails.
    const picky = resolvePolicy({ failOn: ["regressed", "inconclusive"], extraSeeds: { perCase: 0 } });
    expect(compareResults(results([cand]), baselines([base]), { policy: picky }).gate.verdict).toBe("fail");
  });

  it("a seed that diverges where the baseline converged is regressed and fails even if failOn omits regressed", () => {
    const { base, cand } = pairCase(30, (i, b) => (i === 4 ? diverged(i) : b));
    const lenient = resolvePolicy({ failOn: ["missing"], extraSeeds: { perCase: 0 } });
    const v = compareResults(results([cand]), baselines([base]), { policy: lenient });
    const c = v.cases[0];
    expect(c.verdict).toBe("regressed");
    expect(c.diverged).toEqual([
      {
        seed: 4,
        baseline: expect.stringMatching(/^converged at step \d+$/),
        candidate: "diverged (non-finite) at step 12",
      },
    ]);
    expect(c.reasons.find((r) => r.code === "diverged")?.message).toMatch(
      /^seed 4 diverged \(non-finite\) at step 12; the baseline converged at step \d+$/,
    );
    expect(v.gate.verdict).toBe("fail");
  });

  it("a seed that no longer diverges is improved (the reverse rule)", () => {
    const n = 30;
    const s = spec({ seeds: n });
    const j = jitter(n, 0.2, 7);
    const good = Array.from({ length: n }, (_, i) => run(i, { scale: j[i] }));
    const bad = good.map((r, i) => (i === 2 ? diverged(i) : r));
    const v = compareResults(results([{ case: s, runs: good }]), baselines([{ case: s, runs: bad }]), {
      policy: ONE_LOOK,
    });
    expect(v.cases[0].verdict).toBe("improved");
    expect(v.cases[0].recovered.map((e) => e.seed)).toEqual([2]);
  });

  it("cases without a baseline are new, baselines without a candidate are missing (and fail by default)", () => {
    const a = spec({ problemKey: "a(n=4)" });
    const b = spec({ problemKey: "b(n=4)" });
    const c = spec({ problemKey: "c(n=4)" });
    const runs = Array.from({ length: 5 }, (_, i) => run(i));
    const v = compareResults(
      results([
        { case: a, runs },
        { case: c, runs },
      ]),
      baselines([
        { case: a, runs },
        { case: b, runs },
      ]),
    );
    expect(v.cases.map((x) => [x.id, x.verdict])).toEqual([
      ["adam/default/a(n=4)", "unchanged"],
      ["adam/default/c(n=4)", "new"],
      ["adam/default/b(n=4)", "missing"],
    ]);
    expect(v.gate.verdict).toBe("fail");
    expect(v.gate.reasons.map((r) => r.case)).toEqual(["adam/default/b(n=4)"]);
  });

  it("a case whose definition changed (budget) is new, with the change named", () => {
    const s = spec();
    const runs = Array.from({ length: 5 }, (_, i) => run(i));
    const longer = { ...s, budget: { ...s.budget, steps: 2000 } };
    const v = compareResults(results([{ case: longer, runs }]), baselines([{ case: s, runs }]));
    expect(v.cases[0].verdict).toBe("new");
    expect(v.cases[0].reasons[0].message).toBe(
      'the case definition changed since the baseline (budget {"steps":1000,"evaluations":0,"seconds":30} → ' +
        '{"steps":2000,"evaluations":0,"seconds":30}); the runs are not comparable: rebaseline',
    );
  });

  it("runs that stop reaching the deepest rungs are censored at the budget and the lost reach is a signal", () => {
    const { base, cand } = pairCase(30, (i, b) => ({
      ...b,
      stop: "steps",
      steps: 1000,
      evaluations: 1000,
      stepsTo: [...b.stepsTo.slice(0, 4), null, null],
      evaluationsTo: [...b.evaluationsTo.slice(0, 4), null, null],
      finalGap: 1e-5,
    }));
    const v = compareResults(results([cand]), baselines([base]), { policy: ONE_LOOK });
    const c = v.cases[0];
    expect(c.verdict).toBe("regressed");
    const deepest = c.drift.find((d) => d.metric === "stepsTo(1e-8)")!;
    expect(deepest.censored).toEqual({ baseline: 0, candidate: 30 });
    expect(deepest.bound).toBe("at-least");
    // Exact sign test, 30 lost of 30 changed: 2 · 2⁻³⁰ (scipy 1.17.1: scipy.stats.binomtest(0, 30, 0.5).pvalue).
    expect(deepest.reach).toEqual({
      baseline: 30,
      candidate: 0,
      lost: 30,
      gained: 0,
      pValue: expect.closeTo(2 * 2 ** -30, 20),
    });
    expect(deepest.status).toBe("regressed");
    expect(c.reasons.some((r) => r.code === "reach" && r.metric === "stepsTo(1e-8)")).toBe(true);
    expect(deepest.equivalencePValue).toBeGreaterThan(0.5);
  });

  it("trajectory changed, convergence equivalent: both are reported", () => {
    const { base, cand } = pairCase(30, (i, b) => ({
      ...b,
      iterates: b.iterates!.map((x, s) => x.map((v) => (s >= 1 && v !== null ? v * (1 + 1e-7) : v))),
      stepsTo: b.stepsTo.map((x) => (x === null ? null : x + (i % 2))),
    }));
    const v = compareResults(results([cand]), baselines([base]), { policy: ONE_LOOK });
    const c = v.cases[0];
    expect(c.verdict).toBe("equivalent");
    expect(c.fingerprint).toMatchObject({
      status: "changed",
      fromStep: 2,
      firstDifferentStep: 2,
      seeds: 30,
      seedsChanged: 30,
    });
    expect(c.reasons.find((r) => r.code === "trajectory")?.message).toMatch(
      /^trajectory changed from step 2 \(relative 1e-7 > 1e-12\), convergence equivalent$/,
    );
  });

  it("seeds pair up by seed index, whatever their order", () => {
    const { base, cand } = pairCase(30, scaled(1.3));
    const shuffled = { ...cand, runs: [...cand.runs].reverse() };
    const a = compareResults(results([cand]), baselines([base]), { policy: ONE_LOOK });
    const b = compareResults(results([shuffled]), baselines([base]), { policy: ONE_LOOK });
    expect(b.cases[0].drift).toEqual(a.cases[0].drift);
  });

  it("the same inputs give the same document (seeded bootstrap)", () => {
    const { base, cand } = pairCase(30, scaled(1.3));
    const a = compareResults(results([cand]), baselines([base]));
    const b = compareResults(results([cand]), baselines([base]));
    expect(JSON.stringify(b)).toBe(JSON.stringify(a));
  });
});

describe("multiplicity across cases", () => {
  // 20 cases, each 10 seeds all ×1.3: per metric the minimum-effect p is 2·2⁻¹⁰ ≈ 0.00195 (exact
  // signed-rank, all ranks positive), far below 0.05 alone but not after Holm over 20 cases × 7 tests.
  function family() {
    const base: CaseResult[] = [];
    const cand: CaseResult[] = [];
    for (let c = 0; c < 20; c++) {
      const s = spec({ seeds: 10, problemKey: `p${c}(n=4)` });
      const j = jitter(10, 0.2, 100 + c);
      const k = jitter(10, 0.01, 200 + c);
      base.push({ case: s, runs: j.map((x, i) => run(i, { scale: x })) });
      cand.push({ case: s, runs: j.map((x, i) => run(i, { scale: x * 1.3 * k[i] })) });
    }
    return { base: baselines(base), cand: results(cand) };
  }
  const verdicts = (correction: string) => {
    const { base, cand } = family();
    const v = compareResults(cand, base, {
      policy: resolvePolicy({ correction, extraSeeds: { perCase: 0 } }),
    });
    return { counts: v.counts, drift: v.cases[0].drift.find((d) => d.metric === "stepsTo(1e-6)")! };
  };

  it("without correction every case is regressed", () => {
    const { counts, drift } = verdicts("none");
    expect(drift.marginPValue).toBeCloseTo(2 / 1024, 12);
    expect(drift.adjustedPValue).toBe(drift.marginPValue);
    expect(counts.regressed).toBe(20);
  });

  it("Holm (family-wise) holds them all back: inconclusive", () => {
    const { counts, drift } = verdicts("holm");
    expect(drift.adjustedPValue).toBeGreaterThan(0.05);
    expect(counts.inconclusive).toBe(20);
    expect(counts.regressed).toBe(0);
  });

  it("Benjamini–Hochberg (false discovery rate) lets them through: all p-values are small together", () => {
    const { counts, drift } = verdicts("benjamini-hochberg");
    expect(drift.adjustedPValue).toBeGreaterThanOrEqual(drift.marginPValue!);
    expect(drift.adjustedPValue).toBeLessThan(0.05);
    expect(counts.regressed).toBe(20);
  });

  it("one look or two: alpha is split across the looks the policy allows", () => {
    const { base, cand } = family();
    expect(compareResults(cand, base, { policy: resolvePolicy({}) }).statistics).toEqual({
      looks: 2,
      alphaPerLook: 0.025,
    });
    expect(compareResults(cand, base, { policy: ONE_LOOK }).statistics).toEqual({
      looks: 1,
      alphaPerLook: 0.05,
    });
  });
});

describe("resume scenarios", () => {
  it("a resumed run that stops retracing the uninterrupted one, where the baseline's did, is regressed", () => {
    const n = 30;
    const s = spec({ seeds: n, scenario: { name: "resume-at-100", resume: { at: 100 } } });
    const j = jitter(n, 0.2, 7);
    const base = j.map((x, i) => run(i, { scale: x, resume: { equal: true, firstDifference: null } }));
    const cand = base.map((r, i) => (i === 3 ? { ...r, resume: { equal: false, firstDifference: 101 } } : r));
    const v = compareResults(results([{ case: s, runs: cand }]), baselines([{ case: s, runs: base }]), {
      policy: ONE_LOOK,
    });
    expect(v.cases[0].verdict).toBe("regressed");
    expect(v.cases[0].reasons[0]).toEqual({
      code: "resume",
      seed: 3,
      message:
        "seed 3: the resumed run no longer retraces the uninterrupted one (first difference at step 101); the baseline's did bit for bit",
    });
    expect(v.gate.verdict).toBe("fail");
  });
});
