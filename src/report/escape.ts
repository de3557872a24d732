/**
 * Escaping for every piece of text that reaches a report. Names come from user config, from the
 * optimizer's own code (adapters describe themselves) and, in the publishing workflow, from a results file
 * that a pull request could have forged, so none of them may be able to add a link, an image, HTML, a
 * table cell, a mention or a Mermaid directive. Each target language has its own function; callers never
 * concatenate raw names.
 */

/** One line, no control characters (tabs and newlines become spaces), at most `max` characters. */
export function oneLine(value: unknown, max = 200): string {
  const text = String(value ?? "")
    // eslint-disable-next-line no-control-regex
    .replace(/[\u0000-\u001f\u007f-\u009f\u2028\u2029]+/g, " ")
    .trim();
  return text.length > max ? text.slice(0, max - 1) + "…" : text;
}

/** HTML text and attribute values: & < > " ' become entities. */
export function escapeHtml(value: unknown): string {
  return String(value ?? "")
    .replace(/&/g, "&amp;")
    .replace(/</g, "&lt;")
    .replace(/>/g, "&gt;")
    .replace(/"/g, "&quot;")
    .replace(/'/g, "&#39;");
}

/**
 * Plain text inside GitHub-flavoured Markdown (paragraphs, list items, table cells): every ASCII
 * punctuation character that Markdown gives a meaning to is backslash-escaped (so `[x](http://evil)`
 * stays text and `|` cannot end a table cell), `<`, `>` and `&` become entities (no HTML, no autolinks in
 * angle brackets), `:` and `.` are escaped so no bare URL or www address is linked, and `@` and `#` are
 * followed by a zero-width space so no one is mentioned and no issue is linked. One line, shortened to `max`.
 */
export function mdText(value: unknown, max = 200): string {
  return oneLine(value, max)
    .replace(/[\\`*_{}[\]()#+\-.!|~:^=$"'/]/g, (c) => `\\${c}`)
    .replace(/&/g, "&amp;")
    .replace(/</g, "&lt;")
    .replace(/>/g, "&gt;")
    .replace(/@/g, "&#64;\u200b")
    .replace(/\\#/g, "\\#\u200b");
}

/**
 * An identifier shown as code (case ids, optimizer and problem names) inside Markdown, including table
 * cells: a code span whose fence is longer than any run of backticks inside, with `|` escaped (GitHub
 * splits table rows on pipes before it reads code spans, and restores `\|` to `|` inside them).
 */
export function mdCode(value: unknown, max = 120): string {
  const text = oneLine(value, max).replace(/\|/g, "\\|");
  if (text === "") return "` `";
  let longest = 0;
  for (const run of text.match(/`+/g) ?? []) longest = Math.max(longest, run.length);
  const fence = "`".repeat(longest + 1);
  const pad =
    text.startsWith("`") || text.endsWith("`") || (text.startsWith(" ") && text.endsWith(" ")) ? " " : "";
  return `${fence}${pad}${text}${pad}${fence}`;
}

/**
 * Text inside a Mermaid chart (titles, axis labels, categories), which Mermaid places in double quotes:
 * only letters, digits, spaces and a few harmless marks survive; anything else becomes "?". Mermaid's
 * own syntax (quotes, brackets, `%%` directives, `;`, `#` entities) therefore cannot appear.
 */
export function mermaidText(value: unknown, max = 80): string {
  return oneLine(value, max).replace(/[^A-Za-z0-9 ._,/()=+\-×≤≥·]/g, "?");
}
