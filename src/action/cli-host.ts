/** The CLI commands' Host inside the Action: their text goes to the step log, line by line. */
import type { Host } from "../cli/host.js";
import type { ActionHost } from "./host.js";

export function cliHostFor(action: ActionHost, cwd: string): Host {
  let pending = "";
  const write = (text: string) => {
    pending += text.replace(/\r/g, "\n");
    const lines = pending.split("\n");
    pending = lines.pop() ?? "";
    for (const line of lines) if (line.trim() !== "") action.info(line);
  };
  return { out: write, err: write, interactive: false, cwd };
}
