/** Placeholder; replaced once the problem library lands. */
export const DEFAULT_SUITE_YAML = "";
