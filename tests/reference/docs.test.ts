import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { parse } from "yaml";
import { checksSchema } from "../../src/config/schema.js";

const DOC = readFileSync(new URL("../../docs/reference-checks.md", import.meta.url), "utf8");

/** The rows of the defaults table in docs/reference-checks.md: "kind.field" → default (parsed as YAML). */
function documentedDefaults(): Map<string, unknown> {
  const table = DOC.split("<!-- defaults:begin -->")[1].split("<!-- defaults:end -->")[0];
  const rows = new Map<string, unknown>();
  for (const line of table.split("\n")) {
    const m = /^\| `([a-z]+)\[\]\.([A-Za-z]+)` \| `([^`]*)` \|/.exec(line);
    if (m) rows.set(`${m[1]}.${m[2]}`, parse(m[3]));
  }
  return rows;
}

/** Every default the schema declares for the fields of each kind of check (an empty object default shows the defaults of its fields). */
function schemaDefaults(): Map<string, unknown> {
  const out = new Map<string, unknown>();
  for (const [kind, list] of Object.entries(checksSchema.properties)) {
    for (const [field, spec] of Object.entries(
      list.items.properties as Record<string, Record<string, unknown>>,
    )) {
      if (!("default" in spec)) continue;
      let value = spec.default;
      const props = spec.properties as Record<string, { default?: unknown }> | undefined;
      if (props && value !== null && typeof value === "object" && Object.keys(value).length === 0) {
        const filled = Object.fromEntries(
          Object.entries(props).flatMap(([k, p]) => ("default" in p ? [[k, p.default]] : [])),
        );
        if (Object.keys(filled).length > 0) value = filled;
      }
      out.set(`${kind}.${field}`, value);
    }
  }
  return out;
}

describe("docs/reference-checks.md", () => {
  it("documents every default exactly as the schema declares it", () => {
    const documented = documentedDefaults();
    expect(documented.size).toBeGreaterThan(10);
    expect(documented).toEqual(schemaDefaults());
  });
});
