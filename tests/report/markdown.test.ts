import { describe, expect, it } from "vitest";
import { COMMENT_LIMIT, commentMarker, renderMarkdown, safeUrl } from "../../src/report/markdown.js";
import type { CaseVerdict } from "../../src/compare/types.js";
import { caseOf, check, drift, geometricRuns, lumenVerdict, verdictOf } from "./documents.js";
import { cellSeparators, codeSpans, proseLines } from "./gfm.js";

const MARKER = commentMarker("0123456789abcdef");

describe("renderMarkdown on the lumen scenario", () => {
  const verdict = lumenVerdict();
  const candidate = verdict.cases.map((c) => geometricRuns(c.id, c.verdict === "regressed" ? 0.985 : 0.98));
  const baseline = verdict.cases.map((c) => geometricRuns(c.id, 0.98));
  const text = renderMarkdown({ verdict, candidate, baseline }, { target: "comment", marker: MARKER });

  it("starts with the hidden marker and the gate's verdict", () => {
    const lines = text.split("\n");
    expect(lines[0]).toBe("<!-- gradgate-report 0123456789abcdef -->");
    expect(lines[1]).toBe("### ❌ Convergence gate failed");
    expect(lines[3]).toBe(
      "**1 regressed** · 1 inconclusive · 1 improved · 1 equivalent · 2 unchanged — 6 cases compared with the baseline",
    );
  });

  it("lists the changed cases worst first with drift, interval, adjusted p and checks", () => {
    const rows = text.split("\n").filter((l) => l.startsWith("| `"));
    expect(rows[0]).toBe(
      "| `lumen-adam/default/rosenbrock` | 🔴 regressed | steps to 1e\\-3 ×1\\.46 \\(95% CI 1\\.31–1\\.62\\); " +
        "adj. p 0\\.0039 | ❌ 1 of 2 failed: `rate` |",
    );
    expect(rows[1]).toContain("`lumen-adam/default/beale` | 🟡 inconclusive");
    expect(rows[2]).toContain(
      "`lumen-sgd/default/quadratic(kappa=100)` | 🟢 improved | steps to 1e\\-3 ×0\\.71",
    );
    // The quiet cases are folded away below the charts.
    expect(text).toContain("<summary>3 cases unchanged or equivalent</summary>");
  });

  it("draws the cases that drifted most, the regression first, with the log10 caption", () => {
    expect(text).toContain("<summary>Convergence of the 3 cases that drifted most</summary>");
    expect(text).toContain("plots **log10 of the gap**");
    const first = text.indexOf("```mermaid");
    expect(text.lastIndexOf("`lumen-adam/default/rosenbrock` — regressed", first)).toBeGreaterThan(0);
    expect((text.match(/```mermaid/g) ?? []).length).toBe(3);
  });

  it("says when everything passed", () => {
    const quiet = verdictOf([
      caseOf("lumen-sgd/default/rosenbrock", "unchanged"),
      caseOf("lumen-sgd/default/beale", "equivalent"),
    ]);
    const md = renderMarkdown({ verdict: quiet }, { target: "summary" });
    expect(md.split("\n")[0]).toBe("### ✅ Convergence gate passed");
    expect(md).toContain("Every case is unchanged or equivalent to its baseline (2 cases).");
    expect(md).toContain("<summary>All 2 cases</summary>");
  });
});

describe("Markdown injection through names and messages", () => {
  const evil = [
    "[x](http://evil.example)",
    "a|b|c",
    "<script>alert(1)</script>",
    "tick`s``here",
    "@octocat please look",
    "![img](http://evil.example/p.png)",
    "line\nbreak #12",
  ];
  const cases = evil.map((name, i) =>
    caseOf(`${name}/default/rosenbrock`, i % 2 ? "regressed" : "improved", {
      reasons: [{ code: "drift", message: `${name} moved ${name}` }],
      checks: [check({ id: name, status: "fail", summary: name })],
      drift: [drift({ status: "regressed", ratio: 1.5, metric: name, kind: "weird" as never })],
    }),
  );
  const verdict = verdictOf(cases);
  const text = renderMarkdown(
    {
      verdict,
      candidate: cases.map((c) => geometricRuns(c.id, 0.98)),
      baseline: cases.map((c) => geometricRuns(c.id, 0.97)),
      notes: ["note with [link](http://evil.example) and <b>html</b>"],
    },
    { target: "comment", marker: MARKER },
  );
  const prose = proseLines(text);

  it("keeps every name inside a code span or escaped: no link, image, HTML, mention or autolink", () => {
    const allowedTags = /^<(\/?details( open)?|\/?summary|\/?sub|!-- gradgate-report [0-9a-f]+ --)>$/;
    for (const { line, n } of prose) {
      const { outside } = codeSpans(line);
      // Unescaped Markdown link/image syntax outside code spans.
      expect(outside, `line ${n}: ${line}`).not.toMatch(/(?<!\\)\[[^\]]*(?<!\\)\]\(/);
      // Raw HTML tags other than our own structure.
      for (const tag of outside.match(/<[^>]*>/g) ?? [])
        expect(tag, `line ${n}: ${line}`).toMatch(allowedTags);
      // Bare URLs (GitHub autolinks "http://host.tld") and mentions.
      expect(outside, `line ${n}`).not.toMatch(/https?:\/\//);
      expect(outside, `line ${n}`).not.toMatch(/@octocat/);
      expect(outside, `line ${n}`).not.toMatch(/(?<!\\)#12/);
    }
  });

  it("keeps the table shape: every row has exactly four cells", () => {
    const rows = prose.filter(({ line }) => line.startsWith("| "));
    expect(rows.length).toBeGreaterThanOrEqual(evil.length + 2);
    for (const { line, n } of rows) expect(cellSeparators(line), `line ${n}: ${line}`).toBe(5);
  });

  it("shows each name as literal code in its row (pipes restored, newlines as spaces)", () => {
    for (const name of evil) {
      const id = `${name.replace(/\n/g, " ")}/default/rosenbrock`;
      const found = prose.some(({ line }) =>
        codeSpans(line).spans.some((s) => s.replace(/\\\|/g, "|") === id),
      );
      expect(found, id).toBe(true);
    }
  });

  it("sanitises the Mermaid titles", () => {
    const titles = text.split("\n").filter((l) => l.startsWith("  title "));
    expect(titles.length).toBeGreaterThan(0);
    for (const t of titles) expect(t).toMatch(/^ {2}title "[A-Za-z0-9 ._,/()=+\-×≤≥·?]*"$/);
    const inner = titles.map((t) => t.slice('  title "'.length, -1)).join("");
    expect(inner).not.toMatch(/[<>[\]`|@#%;"]/);
  });
});

describe("size limits", () => {
  // 200 cases: 40 regressed, 30 improved, 10 inconclusive, the rest equivalent or unchanged.
  function big(n: number, reasonLength = 80) {
    const cases = Array.from({ length: n }, (_, i) => {
      const verdict: CaseVerdict =
        i < n * 0.2
          ? "regressed"
          : i < n * 0.35
            ? "improved"
            : i < n * 0.4
              ? "inconclusive"
              : i % 2
                ? "equivalent"
                : "unchanged";
      const ratio =
        verdict === "regressed" ? 1.2 + (i % 17) / 10 : verdict === "improved" ? 0.8 - (i % 7) / 50 : 1.01;
      return caseOf(`opt${i % 7}/set${i % 3}/quadratic(kappa=${10 ** (1 + (i % 5))},n=${10 + i})`, verdict, {
        reasons: verdict === "regressed" ? [{ code: "drift", message: "x".repeat(reasonLength) }] : [],
        drift: [
          drift({
            status:
              verdict === "unchanged"
                ? "unchanged"
                : verdict === "inconclusive"
                  ? "inconclusive"
                  : verdict === "regressed"
                    ? "regressed"
                    : verdict === "improved"
                      ? "improved"
                      : "equivalent",
            ratio,
          }),
        ],
        checks: [check(), check({ id: "rate", status: i % 11 === 0 ? "fail" : "pass" })],
      });
    });
    const verdict = verdictOf(cases);
    return {
      verdict,
      candidate: cases.map((c, i) => geometricRuns(c.id, 0.98 + (i % 5) / 1000)),
      baseline: cases.map((c) => geometricRuns(c.id, 0.98)),
    };
  }

  it("keeps a comment for 200 cases under 65,536 characters and readable", () => {
    const text = renderMarkdown(big(200), { target: "comment", marker: MARKER });
    expect(text.length).toBeLessThanOrEqual(COMMENT_LIMIT);
    const lines = text.split("\n");
    expect(lines[1]).toBe("### ❌ Convergence gate failed");
    expect(lines[3]).toBe(
      "**40 regressed** · 10 inconclusive · 30 improved · 60 equivalent · 60 unchanged — 200 cases compared with the baseline",
    );
    // The main table holds the 25 worst; the other 55 changed cases are folded, then the 120 quiet ones.
    const firstTable = lines.indexOf("| Case | Verdict | Drift (candidate ÷ baseline) | Reference checks |");
    const rows: string[] = [];
    for (let i = firstTable + 2; lines[i]?.startsWith("| "); i++) rows.push(lines[i]);
    expect(rows).toHaveLength(25);
    expect(rows.every((r) => r.includes("🔴 regressed"))).toBe(true);
    expect(text).toContain("<summary>55 more changed cases</summary>");
    expect((text.match(/```mermaid/g) ?? []).length).toBe(3);
    // The reasons are capped at ten lines.
    expect(text).toContain("- … and 30 more");
  });

  it("shortens a report that does not fit, keeps the headline and says where the full one is", () => {
    const input = { ...big(2000, 300), links: { artifact: "gradgate-report" } };
    const text = renderMarkdown(input, { target: "comment", marker: MARKER });
    expect(text.length).toBeLessThanOrEqual(COMMENT_LIMIT);
    expect(text.split("\n")[1]).toBe("### ❌ Convergence gate failed");
    expect(text).toContain(
      "> This report is shortened to fit GitHub's size limit for comments; the full report is in the workflow run's artifact `gradgate-report`.",
    );
    expect(text).not.toContain("unchanged or equivalent</summary>");
    expect(text.split("\n")[3]).toContain("**400 regressed**");
  });

  it("measures job summaries in bytes, not characters", () => {
    const input = big(200);
    const full = renderMarkdown(input, { target: "summary" });
    const bytes = Buffer.byteLength(full, "utf8");
    expect(bytes).toBeGreaterThan(full.length); // emoji and "÷" take several bytes
    const cut = renderMarkdown(input, { target: "summary", limit: full.length });
    expect(Buffer.byteLength(cut, "utf8")).toBeLessThanOrEqual(full.length);
    expect(cut).toContain("size limit for job summaries");
  });
});

describe("commentMarker and safeUrl", () => {
  it("accepts only hex identities", () => {
    expect(() => commentMarker("--> <b>")).toThrow("comment marker identity must be hex, got --> <b>");
  });
  it.each([
    ["https://github.com/o/r/actions/runs/12", "https://github.com/o/r/actions/runs/12"],
    ["http://127.0.0.1:8080/o/r/actions/runs/1", "http://127.0.0.1:8080/o/r/actions/runs/1"],
    ["javascript:alert(1)", null],
    ["https://x.example/a)(b", null],
    ["https://x.example/a b", null],
  ])("safeUrl(%j) = %j", (url, expected) => {
    expect(safeUrl(url)).toBe(expected);
  });
});
