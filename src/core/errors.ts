/**
 * An error in what the user gave us (config, baseline file, adapter output, command line). Its message
 * names the file, the field, the bad value and the expected form; entry points print it as is and
 * exit with the input-error code.
 */
export class InputError extends Error {
  override readonly name = "InputError";
}

/** Quotes a user-supplied value for an error message, shortened when long. */
export function quote(value: unknown): string {
  let text: string;
  if (typeof value === "string") text = JSON.stringify(value);
  else if (value === undefined) text = "nothing";
  else {
    try {
      text = JSON.stringify(value) ?? String(value);
    } catch {
      text = String(value);
    }
  }
  return text.length > 80 ? text.slice(0, 77) + "..." : text;
}
