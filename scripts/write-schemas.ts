/**
 * Writes the JSON Schemas that ship in schema/ (for editors and client authors) from the TypeScript
 * objects the code validates with. tests/schemas.test.ts fails when a file here is stale.
 * Run: npm run schema
 */
import { mkdirSync, writeFileSync } from "node:fs";
import { dirname } from "node:path";
import { fileURLToPath } from "node:url";
import { SHIPPED_SCHEMAS } from "./schemas.js";

const root = new URL("../", import.meta.url);
for (const { file, schema } of SHIPPED_SCHEMAS) {
  const path = fileURLToPath(new URL(file, root));
  mkdirSync(dirname(path), { recursive: true });
  writeFileSync(path, JSON.stringify(schema, null, 2) + "\n");
  console.log(`wrote ${file}`);
}
