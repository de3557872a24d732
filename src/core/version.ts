/** gradgate's own version; tests/core/version.test.ts keeps it equal to package.json. */
export const TOOL_NAME = "gradgate";
export const TOOL_VERSION = "0.1.0";
