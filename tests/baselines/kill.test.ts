/**
 * A rebaseline killed mid-write (a real child process, SIGKILL) never leaves a mix of old and new files:
 * killed before the commit point, the previous files are intact byte for byte (and the stray temporary
 * files go at the next command); killed after it, the next command completes the new set. The child is
 * stopped at a named point by GRADGATE_TEST_PAUSE_AT (src/baselines/store.ts) and killed by the test.
 */
import { spawn } from "node:child_process";
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";
import { readAuditLog, readBaselineDir } from "../../src/baselines/store.js";
import { main } from "../../src/cli/main.js";
import { JOURNAL } from "../../src/baselines/store.js";
import { results, run, spec } from "../compare/fixtures.js";
import { captureHost, tempDir, writeConfig, writeResults } from "./helpers/host.js";

const ROOT = fileURLToPath(new URL("../../", import.meta.url));
const CLI = fileURLToPath(new URL("./helpers/cli.ts", import.meta.url));

function doc(scale: number) {
  const cases = ["adam", "sgd", "momentum"].map((o) => ({
    case: spec({ optimizer: o }),
    runs: Array.from({ length: 5 }, (_, i) => run(i, { scale })),
  }));
  return results(cases);
}

/**
 * Runs the CLI in a child, waits until it pauses at `point`, kills it with SIGKILL. The child runs in the
 * project root (where `--import tsx` resolves), so every path is given absolute.
 */
function killAt(cwd: string, point: string, args: string[]): Promise<string> {
  const absolute = args.map((a) => (/\.json$/.test(a) ? join(cwd, a) : a));
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, ["--import", "tsx", CLI, ...absolute, "--baselines", join(cwd, "baselines")], {
      cwd: ROOT,
      env: { ...process.env, GRADGATE_TEST_PAUSE_AT: point, NODE_OPTIONS: "" },
      stdio: ["ignore", "pipe", "pipe"],
    });
    let stderr = "";
    child.stderr.on("data", (chunk: Buffer) => {
      stderr += chunk.toString();
      if (stderr.includes(`gradgate-test-paused ${point}`)) child.kill("SIGKILL");
    });
    child.on("error", reject);
    child.on("exit", (code, signal) => {
      if (signal === "SIGKILL") resolve(stderr);
      else reject(new Error(`child exited with ${code} before pausing at ${point}: ${stderr}`));
    });
  });
}

function snapshot(dir: string): Record<string, string> {
  return Object.fromEntries(readdirSync(dir).sort().map((n) => [n, readFileSync(join(dir, n), "utf8")]));
}

async function setUp() {
  const cwd = tempDir();
  writeConfig(cwd);
  writeResults(cwd, "r1.json", doc(1));
  writeResults(cwd, "r2.json", doc(1.2));
  const h = captureHost(cwd);
  const code = await main(["rebaseline", "--results", "r1.json", "--reason", "first", "--commit", "c1", "--config", "gradgate.json", "--quiet"], h);
  expect(code, h.stderr).toBe(0);
  return cwd;
}

const second = ["rebaseline", "--results", "r2.json", "--reason", "second", "--commit", "c2", "--config", "gradgate.json", "--quiet"];

describe("a killed rebaseline", () => {
  it("before its commit point leaves the previous files intact", async () => {
    const cwd = await setUp();
    const dir = join(cwd, "baselines");
    const before = snapshot(dir);
    expect(Object.keys(before)).toEqual(["adam.json", "audit.jsonl", "momentum.json", "sgd.json"]);
    await killAt(cwd, "temp:2", second);
    const after = readdirSync(dir).sort();
    expect(after.filter((n) => n.endsWith(".tmp"))).toHaveLength(2); // the two temp files written so far
    for (const [name, text] of Object.entries(before)) expect(readFileSync(join(dir, name), "utf8")).toBe(text);
    // The next command cleans up and sees the previous set.
    const h = captureHost(cwd);
    expect(await main(["history", "adam"], h)).toBe(0);
    expect(h.stderr).toBe("gradgate: baselines/: removed 2 temporary file(s) of an interrupted rebaseline\n");
    expect(snapshot(dir)).toEqual(before);
  }, 60_000);

  it("after its commit point is completed by the next command: the new set, whole", async () => {
    const cwd = await setUp();
    const dir = join(cwd, "baselines");
    await killAt(cwd, "rename:1", second);
    expect(readdirSync(dir)).toContain(JOURNAL);
    const h = captureHost(cwd);
    expect(await main(["history", "sgd"], h)).toBe(0);
    expect(h.stderr).toBe("gradgate: baselines/: completed an interrupted rebaseline (4 file(s))\n");
    expect(readdirSync(dir).sort()).toEqual(["adam.json", "audit.jsonl", "momentum.json", "sgd.json"]);
    const set = readBaselineDir(dir, "baselines");
    expect([...set.values()].map((b) => b.provenance.reason)).toEqual(["second", "second", "second"]);
    expect(readAuditLog(dir, "baselines").map((e) => e.reason)).toEqual(["first", "second"]);
  }, 60_000);
});

