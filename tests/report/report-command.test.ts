import { mkdtempSync, readFileSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { main } from "../../src/cli/main.js";
import type { Host } from "../../src/cli/host.js";
import { makeProject } from "../action/workflow.js";

const dir = mkdtempSync(join(tmpdir(), "gradgate-report-cli-"));
let out = "";
let err = "";
const host: Host = { out: (t) => (out += t), err: (t) => (err += t), interactive: false, cwd: dir };

beforeAll(async () => {
  await makeProject(dir);
  expect(
    await main(
      ["run", "--config", "candidate-slow.yml", "--out", "slow.json", "--workers", "1", "--quiet"],
      host,
    ),
  ).toBe(0);
  const code = await main(
    [
      "compare",
      "--results",
      "slow.json",
      "--config",
      "candidate-slow.yml",
      "--json",
      "verdict.json",
      "--workers",
      "1",
      "--quiet",
    ],
    host,
  );
  expect(code).toBe(1); // the gate fails: SGD got slower
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe("gradgate report", () => {
  it("renders the HTML report with charts and the job-summary Markdown from the files", async () => {
    out = "";
    const code = await main(
      [
        "report",
        "--verdict",
        "verdict.json",
        "--results",
        "slow.json",
        "--baselines",
        "baselines",
        "--html",
        "r.html",
        "--markdown",
        "r.md",
      ],
      host,
    );
    expect(code).toBe(0);
    expect(out).toBe("HTML report written to r.html\nMarkdown report written to r.md\n");
    const html = readFileSync(join(dir, "r.html"), "utf8");
    expect(html).toContain("Convergence gate failed");
    expect((html.match(/<svg /g) ?? []).length).toBe(2); // the two regressed SGD cases
    const md = readFileSync(join(dir, "r.md"), "utf8");
    expect(md.split("\n")[0]).toBe("### ❌ Convergence gate failed");
    expect((md.match(/```mermaid/g) ?? []).length).toBe(2);
  });

  it("draws no charts without the runs, and refuses bad use with exit code 2", async () => {
    expect(await main(["report", "--verdict", "verdict.json", "--markdown", "plain.md"], host)).toBe(0);
    expect(readFileSync(join(dir, "plain.md"), "utf8")).not.toContain("```mermaid");
    err = "";
    expect(await main(["report", "--verdict", "verdict.json"], host)).toBe(2);
    expect(err).toBe("gradgate: report: name an output: --html FILE and/or --markdown FILE\n");
    err = "";
    expect(await main(["report", "--verdict", "slow.json", "--html", "x.html"], host)).toBe(2);
    expect(err).toBe(
      'gradgate: verdict slow.json: format must be "gradgate-verdict", got "gradgate-results"; pass the file gradgate compare --json wrote\n',
    );
  });
});
