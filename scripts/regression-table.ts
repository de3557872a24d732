/**
 * The injected-regression table: runs the suite (tests/regressions/suite.yml, or --config FILE) with the
 * reference optimizers as the baseline, then each injected change and each last-bits rewrite of
 * tests/regressions/variants.ts, compares under the suite's policy (default policy unless the config sets
 * one) exactly as `gradgate compare` does, and prints a Markdown table: per variant the verdicts of the
 * replaced optimizer's cases, the trajectory fingerprint statuses and the gate verdict.
 * Run: npx tsx scripts/regression-table.ts [--config FILE | --default-suite] [--extra-seeds N]
 */
import { readFileSync } from "node:fs";
import { parseArgs } from "node:util";
import { describeHeadline } from "../src/compare/compare.js";
import { DEFAULT_SUITE_YAML } from "../src/config/default-suite.js";
import { runReference, runVariant, tally } from "../tests/regressions/harness.js";
import { VARIANTS } from "../tests/regressions/variants.js";

const { values } = parseArgs({
  options: {
    config: { type: "string", default: "tests/regressions/suite.yml" },
    "default-suite": { type: "boolean" },
    "extra-seeds": { type: "string" },
  },
});
const useDefault = values["default-suite"] === true;
const file = useDefault ? "(built-in default suite)" : (values.config as string);
const started = performance.now();
const ref = runReference(
  useDefault ? DEFAULT_SUITE_YAML : readFileSync(file, "utf8"),
  file,
  values["extra-seeds"] === undefined ? undefined : Number(values["extra-seeds"]),
);
let runs = ref.runs;
console.log(
  `Suite ${file}: ${ref.suite.cases.length} cases × ${ref.suite.cases[0]?.seeds ?? 0} seeds ` +
    `(+${ref.policy.extraSeeds.perCase} extra seeds in the baseline); policy: correction ${ref.policy.correction}, ` +
    `alpha ${ref.policy.alpha} (${ref.policy.extraSeeds.perCase > 0 ? "two looks" : "one look"}), margins ` +
    `steps ×${ref.policy.margin.stepsTo}, final gap ×${ref.policy.margin.finalGap}, evaluations ×${ref.policy.margin.evaluations}.\n`,
);
console.log(
  "| variant | kind | cases | regressed | improved | inconclusive | equivalent | unchanged | trajectory changed / float noise / identical | gate | example |",
);
console.log("|---|---|---:|---:|---:|---:|---:|---:|---|---|---|");
for (const v of VARIANTS) {
  const out = runVariant(ref, v);
  runs += out.runs;
  const t = tally(out);
  const worst =
    out.cases.find((c) => c.verdict === "regressed") ??
    out.cases.find((c) => c.verdict === "improved") ??
    out.cases.find((c) => c.fingerprint.status === "changed");
  const example = worst
    ? `${worst.problemKey}${worst.set === "default" ? "" : ` (${worst.set})`}: ${worst.verdict}` +
      (worst.headline
        ? `, ${describeHeadline(worst.headline)}`
        : worst.diverged.length > 0
          ? `, ${worst.diverged.length} seed(s) diverged`
          : "")
    : "—";
  console.log(
    `| ${v.name} | ${v.kind} | ${t.cases} | ${t.regressed} | ${t.improved} | ${t.inconclusive} | ${t.equivalent} | ${t.unchanged} | ` +
      `${t.trajectoryChanged} / ${t.floatNoise} / ${t.identical} | ${t.gate} | ${example} |`,
  );
}
console.log(
  `\n${runs} runs in ${((performance.now() - started) / 1000).toFixed(1)} s (node ${process.version}).`,
);
