/** JSON Pointer (RFC 6901) helpers for turning schema errors into messages people read. */

/** "/problems/2/seeds" → "problems[2].seeds". */
export function jsonPointerToPath(pointer: string): string {
  let out = "";
  for (const raw of pointer.split("/").slice(1)) {
    const part = unescape(raw);
    out += /^\d+$/.test(part) ? `[${part}]` : out === "" ? part : `.${part}`;
  }
  return out;
}

/** The value `pointer` names inside `data`, or undefined when the path does not exist. */
export function valueAtPointer(data: unknown, pointer: string): unknown {
  let v: unknown = data;
  for (const raw of pointer.split("/").slice(1)) {
    if (v === null || typeof v !== "object") return undefined;
    v = (v as Record<string, unknown>)[unescape(raw)];
  }
  return v;
}

function unescape(token: string): string {
  return token.replace(/~1/g, "/").replace(/~0/g, "~");
}
