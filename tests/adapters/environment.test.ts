/**
 * Fork safety: an optimizer process gets an allow-listed environment only (src/adapters/env.ts), never
 * the harness's secrets. The child (tests/fixtures/adapters/env_dump.py) writes its whole environment to
 * a file; the harness's environment holds stand-ins for a token, action inputs and runner variables.
 */
import { execFileSync } from "node:child_process";
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ProcessSession } from "../../src/adapters/session.js";
import { PASSED_VARIABLES, minimalEnvironment } from "../../src/adapters/env.js";
import { getProblem } from "../../src/problems/index.js";
import { FIXTURES, pySettings, suiteFromYaml, tempDir } from "./helpers.js";

const SECRETS: Record<string, string> = {
  GITHUB_TOKEN: "ghs_pretend-token",
  "INPUT_GITHUB-TOKEN": "ghs_pretend-input",
  INPUT_TOKEN: "pretend",
  ACTIONS_RUNTIME_TOKEN: "pretend-runtime",
  ACTIONS_ID_TOKEN_REQUEST_URL: "http://127.0.0.1:9/token",
  AWS_SECRET_ACCESS_KEY: "pretend-aws",
  NODE_OPTIONS: "--require /tmp/evil.js",
  PYTHONPATH: "/tmp/evil",
  GRADGATE_ANYTHING: "not on the list either",
};

describe("minimalEnvironment", () => {
  it("copies the allow-listed variables that are set, then the config's literal values", () => {
    expect(
      minimalEnvironment({ PATH: "/bin", HOME: "/h", GITHUB_TOKEN: "t", LANG: undefined }, { SEED: "1" }),
    ).toEqual({
      PATH: "/bin",
      HOME: "/h",
      SEED: "1",
    });
  });
});

describe("the optimizer process", () => {
  const saved: Record<string, string | undefined> = {};
  beforeAll(() => {
    for (const [k, v] of Object.entries(SECRETS)) {
      saved[k] = process.env[k];
      process.env[k] = v;
    }
  });
  afterAll(() => {
    for (const [k, v] of Object.entries(saved)) {
      if (v === undefined) delete process.env[k];
      else process.env[k] = v;
    }
  });

  it("sees PATH, HOME and the locale, the config's env, and nothing else", async () => {
    const out = join(tempDir(), "env.json");
    // The interpreter itself, not a version manager's python3 shim (a shell script that adds its own
    // variables before starting Python).
    const python = execFileSync("python3", ["-c", "import sys; print(sys.executable)"], {
      encoding: "utf8",
    }).trim();
    const session = new ProcessSession(
      pySettings(join(FIXTURES, "env_dump.py"), [out], {
        command: [python, join(FIXTURES, "env_dump.py"), out],
        env: { OMP_NUM_THREADS: "1" },
      }),
    );
    const suite = await suiteFromYaml(`seeds: 1
budget: { steps: 3 }
optimizers: [{ name: sgd, hyper: { lr: 0.001 } }]
problems: [{ use: rosenbrock }]
`);
    const [metrics] = await session.run([
      {
        spec: suite.cases[0],
        seedIndex: 0,
        suiteSeed: 1,
        definition: getProblem("rosenbrock"),
        optimizer: "sgd",
      },
    ]);
    await session.close();
    expect(metrics.stop).toBe("steps");
    const env = JSON.parse(readFileSync(out, "utf8")) as Record<string, string>;
    for (const name of Object.keys(SECRETS)) expect(env[name], name).toBeUndefined();
    expect(Object.values(env).some((v) => v.includes("pretend"))).toBe(false);
    expect(env.OMP_NUM_THREADS).toBe("1");
    expect(env.PATH).toBe(process.env.PATH);
    if (process.env.HOME !== undefined) expect(env.HOME).toBe(process.env.HOME);
    // Python may coerce the locale by setting LC_CTYPE (PEP 538), which is on the list too.
    const allowed = new Set([...PASSED_VARIABLES, "OMP_NUM_THREADS"]);
    expect(Object.keys(env).filter((k) => !allowed.has(k))).toEqual([]);
  });
});
