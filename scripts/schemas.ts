/** The schemas that ship as files in schema/, each with the object the code validates with. */
import { baselineSchema } from "../src/baselines/schema.js";
import { configSchema } from "../src/config/schema.js";
import { PROTOCOL_SCHEMAS } from "../src/adapters/protocol-schema.js";

export const SHIPPED_SCHEMAS: readonly { file: string; schema: unknown }[] = [
  { file: "schema/gradgate.schema.json", schema: configSchema },
  { file: "schema/baseline.schema.json", schema: baselineSchema },
  ...PROTOCOL_SCHEMAS,
];
