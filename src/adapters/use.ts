/**
 * The spellings of `optimizers[].use` in a suite config, and their parser:
 *
 *   adam  |  reference:adam             a reference optimizer of gradgate itself
 *   module:./opt/my-adam.mjs#myAdam     an export of an ES module (JavaScript), path relative to the
 *                                       config file's directory; without "#name", the default export
 *   py:adam                             optimizer "adam" served by the process adapter declared as
 *                                       `adapters.py` in the same config
 *
 * "reference" and "module" are therefore reserved: no process adapter may take either name.
 */
import { InputError, quote } from "../core/errors.js";

export type UseSpec =
  | { readonly kind: "reference"; readonly name: string }
  | { readonly kind: "module"; readonly path: string; readonly exportName: string }
  | { readonly kind: "process"; readonly adapter: string; readonly optimizer: string };

/** Names a process adapter may not take. */
export const RESERVED_ADAPTER_NAMES: readonly string[] = Object.freeze(["reference", "module"]);

/** File extensions of TypeScript sources, which Node 20 cannot load without a build step. */
const TYPESCRIPT = /\.(ts|mts|cts|tsx)$/i;

/**
 * Parses a `use` string. `adapters` are the process adapters the config declares; `where` locates the
 * string for messages (e.g. `config gradgate.yml: optimizers[2].use`).
 */
export function parseUse(use: string, adapters: readonly string[], where: string): UseSpec {
  const colon = use.indexOf(":");
  if (colon < 0) return { kind: "reference", name: use };
  const prefix = use.slice(0, colon);
  const rest = use.slice(colon + 1);
  if (prefix === "reference") return { kind: "reference", name: rest };
  if (prefix === "module") {
    const hash = rest.lastIndexOf("#");
    const path = hash < 0 ? rest : rest.slice(0, hash);
    const exportName = hash < 0 ? "default" : rest.slice(hash + 1);
    const form = `expected module:PATH#EXPORT, e.g. "module:./opt/my-adam.mjs#myAdam"`;
    if (!(path.startsWith("./") || path.startsWith("../") || path.startsWith("/"))) {
      throw new InputError(
        `${where} ${quote(use)}: the module path must start with "./" or "../" (relative to the config file's directory) or "/"; ${form}`,
      );
    }
    if (TYPESCRIPT.test(path)) {
      throw new InputError(
        `${where} ${quote(use)}: ${quote(path)} is TypeScript, which Node 20 cannot load directly; ` +
          `compile it to JavaScript first (e.g. tsc) and name the .js or .mjs file (see docs/adapters.md)`,
      );
    }
    if (!/^[A-Za-z_$][A-Za-z0-9_$]*$/.test(exportName)) {
      throw new InputError(`${where} ${quote(use)}: ${quote(exportName)} is not an export name; ${form}`);
    }
    return { kind: "module", path, exportName };
  }
  if (adapters.includes(prefix)) {
    if (rest === "") throw new InputError(`${where} ${quote(use)}: name the optimizer after "${prefix}:"`);
    return { kind: "process", adapter: prefix, optimizer: rest };
  }
  const declared = adapters.length > 0 ? adapters.join(", ") : "none";
  throw new InputError(
    `${where} ${quote(use)}: ${quote(prefix)} is neither "reference", "module" nor a process adapter declared under adapters (declared: ${declared})`,
  );
}
