import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { SHIPPED_SCHEMAS } from "../scripts/schemas.js";

describe("shipped JSON Schemas", () => {
  it.each(SHIPPED_SCHEMAS.map((s) => [s.file, s.schema]))(
    "%s matches the schema the code uses (npm run schema)",
    (file, schema) => {
      const onDisk = JSON.parse(readFileSync(new URL(`../${file}`, import.meta.url), "utf8"));
      expect(onDisk).toEqual(schema);
    },
  );
});
