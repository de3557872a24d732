/**
 * Writes action.yml from the inputs and outputs declared in src/action/settings.ts (their one home), and
 * the table of inputs and outputs in docs/workflows.md between its markers. `npm run action-docs`;
 * tests/action/action-yml.test.ts fails when either file is stale.
 */
import { readFileSync, writeFileSync } from "node:fs";
import { actionYml, replaceTables } from "../src/action/action-docs.js";

writeFileSync("action.yml", actionYml());
const docs = "docs/workflows.md";
writeFileSync(docs, replaceTables(readFileSync(docs, "utf8")));
