import { spawnSync } from "node:child_process";
import { existsSync, mkdtempSync, readFileSync, rmSync, statSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { renderHtml } from "../../src/report/html.js";
import { SIDE_COLOURS } from "../../src/report/svg.js";
import { caseOf, check, geometricRuns, lumenVerdict, verdictOf } from "./documents.js";
import { countColour, readPng } from "./png.js";

const CHROMIUM = "/usr/bin/chromium";
const dir = mkdtempSync(join(tmpdir(), "gradgate-html-"));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function lumenHtml(): string {
  const v = lumenVerdict();
  const rate = (verdict: string) => (verdict === "regressed" ? 0.99 : verdict === "improved" ? 0.97 : 0.98);
  return renderHtml({
    verdict: v,
    candidate: v.cases.map((c) => geometricRuns(c.id, rate(c.verdict))),
    baseline: v.cases.map((c) => geometricRuns(c.id, 0.98)),
  });
}

describe("renderHtml", () => {
  const html = lumenHtml();

  it("is self-contained: no scripts, no external resources, and a policy that forbids fetching", () => {
    expect(html).toContain(
      `<meta http-equiv="Content-Security-Policy" content="default-src 'none'; style-src 'unsafe-inline'; img-src data:">`,
    );
    expect(html).not.toMatch(/<script|<link|<img|<iframe|@import|url\(/i);
    // The only URL is the SVG namespace, which browsers never fetch.
    expect(html.match(/https?:\/\/[^"\s)]+/g)?.every((u) => u === "http://www.w3.org/2000/svg")).toBe(true);
  });

  it("draws a log-log SVG chart per drifted case, baseline and candidate", () => {
    expect((html.match(/<svg /g) ?? []).length).toBe(4);
    expect(html).toContain("step (log scale)");
    expect(html).toContain(`stroke="${SIDE_COLOURS.candidate.line}"`);
    expect(html).toContain(`stroke="${SIDE_COLOURS.baseline.line}"`);
    expect(html).toContain("<h2>All 6 cases</h2>");
  });

  it("escapes names and messages", () => {
    const evil = "<img src=x onerror=alert(1)>&\"'";
    const v = verdictOf([
      caseOf(`${evil}/default/p`, "regressed", {
        reasons: [{ code: "drift", message: evil }],
        checks: [check({ id: evil, summary: evil, source: evil, status: "fail" })],
      }),
    ]);
    const out = renderHtml({
      verdict: v,
      candidate: [geometricRuns(`${evil}/default/p`, 0.98)],
      notes: [evil],
    });
    expect(out).not.toContain("<img");
    expect(out).toContain("&lt;img src=x onerror=alert(1)&gt;&amp;&quot;&#39;");
  });
});

describe("the HTML report in a real headless browser", () => {
  it("renders to a non-trivial screenshot with both curves visible", () => {
    expect(existsSync(CHROMIUM), `${CHROMIUM} is missing: apt-get install -y chromium (see .ci/run)`).toBe(
      true,
    );
    const page = join(dir, "report.html");
    const shot = join(dir, "report.png");
    writeFileSync(page, lumenHtml());
    const result = spawnSync(
      CHROMIUM,
      [
        "--headless",
        "--no-sandbox",
        "--disable-gpu",
        "--disable-background-networking",
        "--disable-component-update",
        "--disable-sync",
        "--no-first-run",
        `--user-data-dir=${join(dir, "profile")}`,
        "--window-size=1200,1000",
        `--screenshot=${shot}`,
        `file://${page}`,
      ],
      { timeout: 60_000, encoding: "utf8", env: { PATH: process.env.PATH ?? "/usr/bin:/bin", HOME: dir } },
    );
    expect(result.error, String(result.error)).toBeUndefined();
    expect(existsSync(shot), result.stderr).toBe(true);
    expect(statSync(shot).size).toBeGreaterThan(20_000);
    const img = readPng(readFileSync(shot));
    expect([img.width, img.height]).toEqual([1200, 1000]);
    // The median lines of both sides and the red FAIL badge are on screen (each a few hundred pixels).
    expect(countColour(img, SIDE_COLOURS.candidate.line)).toBeGreaterThan(300);
    expect(countColour(img, SIDE_COLOURS.baseline.line)).toBeGreaterThan(300);
    expect(countColour(img, "#cf222e", 4)).toBeGreaterThan(300);
    // To look at it yourself: GRADGATE_SCREENSHOT=/some/file.png npx vitest run tests/report/html.test.ts
    if (process.env.GRADGATE_SCREENSHOT) writeFileSync(process.env.GRADGATE_SCREENSHOT, readFileSync(shot));
  });
});
