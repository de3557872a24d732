// npm run demo: gradgate's main job — run the suite, judge it against the baselines, report — on the
// bundled demo scenario (examples/demo/README.md): the fictional fernhill-optim package, whose pull
// request #57 is under review against the baselines of its release 2.3.
import { spawnSync } from "node:child_process";
import { fileURLToPath } from "node:url";

const root = fileURLToPath(new URL("..", import.meta.url));
const bin = fileURLToPath(new URL("../bin/gradgate.js", import.meta.url));
const env = { ...process.env, FERNHILL_BUILD: "pr-57" };
const out = ".gradgate/demo";

function gradgate(...args) {
  console.log(`\n$ gradgate ${args.join(" ")}`);
  const r = spawnSync(process.execPath, [bin, ...args], { cwd: root, env, stdio: "inherit" });
  if (r.error) throw r.error;
  return r.status;
}

console.log(`gradgate demo — fernhill-optim, pull request #57 ("make step() re-entrant; use the cheaper form of
Adam's update"), judged against the baselines of release 2.3 (examples/demo/baselines/).`);

const config = ["--config", "examples/demo/gradgate.yml"];
if (gradgate("run", ...config, "--out", `${out}/results.json`) !== 0) process.exit(1);
const gate = gradgate(
  "compare",
  ...config,
  "--results",
  `${out}/results.json`,
  "--baselines",
  "examples/demo/baselines",
  "--json",
  `${out}/verdict.json`,
);
if (gate !== 0 && gate !== 1) process.exit(gate ?? 1);
const report = gradgate(
  "report",
  "--verdict",
  `${out}/verdict.json`,
  "--results",
  `${out}/results.json`,
  "--baselines",
  "examples/demo/baselines",
  "--html",
  `${out}/report.html`,
  "--markdown",
  `${out}/summary.md`,
);
if (report !== 0) process.exit(report ?? 1);

if (gate === 1) {
  console.log(`
The gate failed, as it should: PR #57 allocates momentum's velocity inside step(), so the velocity no longer
persists and momentum became plain gradient descent (regressed on every problem). Its Adam rewrite moved ε
by a factor √(1 − β2ᵗ): the iterates changed from the first step, convergence stayed equivalent, so Adam
passes with its trajectory change reported. Full report: ${out}/report.html (summary: ${out}/summary.md).`);
  process.exit(0);
}
console.error("\nThe demo expected the gate to fail on PR #57's momentum change, but it passed.");
process.exit(1);
