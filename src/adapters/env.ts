/**
 * The environment an optimizer process gets: an allow-list, never the harness's own environment.
 *
 * The optimizer under test is untrusted code (a pull request can change it), while the harness may run
 * with a GitHub token and other secrets in its environment (GITHUB_TOKEN, INPUT_*, ACTIONS_*). So the
 * child receives only the variables named here, copied from the harness when set, plus the literal
 * values the config gives under `adapters.NAME.env`. A deny-list would leak every secret nobody
 * thought of; an allow-list leaks none by construction.
 */

/**
 * Variables copied from the harness's environment when set: what programs need to find executables,
 * a home directory, the locale, the time zone and a temporary directory (and their Windows spellings).
 */
export const PASSED_VARIABLES: readonly string[] = Object.freeze([
  "PATH",
  "HOME",
  "LANG",
  "LANGUAGE",
  "LC_ALL",
  "LC_CTYPE",
  "LC_NUMERIC",
  "TZ",
  "TMPDIR",
  "TEMP",
  "TMP",
  "SYSTEMROOT",
  "WINDIR",
  "PATHEXT",
  "COMSPEC",
  "USERPROFILE",
]);

/**
 * The child's environment: the allow-listed variables from `parent` (when set), then `extra` (literal
 * values from the config) on top. Nothing else.
 */
export function minimalEnvironment(
  parent: Readonly<Record<string, string | undefined>>,
  extra: Readonly<Record<string, string>> = {},
): Record<string, string> {
  const env: Record<string, string> = {};
  for (const name of PASSED_VARIABLES) {
    const value = parent[name];
    if (value !== undefined) env[name] = value;
  }
  for (const [name, value] of Object.entries(extra)) env[name] = value;
  return env;
}
