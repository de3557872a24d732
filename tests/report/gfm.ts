/**
 * Just enough of GitHub-flavoured Markdown's inline rules to check what a report lets through: code spans
 * (backtick strings of equal length, GFM spec §6.1), fenced code blocks, and table cell separators (a pipe
 * not preceded by a backslash, GFM spec §4.10). Test helper only.
 */

/** Lines outside fenced code blocks (``` … ```), with their line numbers. */
export function proseLines(markdown: string): { line: string; n: number }[] {
  const out: { line: string; n: number }[] = [];
  let fence: string | null = null;
  markdown.split("\n").forEach((line, n) => {
    const m = /^(`{3,}|~{3,})/.exec(line);
    if (fence === null && m) fence = m[1];
    else if (fence !== null && line.startsWith(fence)) fence = null;
    else if (fence === null) out.push({ line, n });
  });
  return out;
}

/** Splits a line into its code spans' contents and the text outside them. */
export function codeSpans(line: string): { spans: string[]; outside: string } {
  const spans: string[] = [];
  let outside = "";
  let i = 0;
  while (i < line.length) {
    if (line[i] === "\\" && i + 1 < line.length) {
      outside += line.slice(i, i + 2);
      i += 2;
      continue;
    }
    if (line[i] !== "`") {
      outside += line[i++];
      continue;
    }
    let j = i;
    while (line[j] === "`") j++;
    const fence = line.slice(i, j);
    // Find a closing run of exactly the same length.
    let k = j;
    let close = -1;
    while (k < line.length) {
      if (line[k] === "`") {
        let e = k;
        while (line[e] === "`") e++;
        if (e - k === fence.length) {
          close = k;
          break;
        }
        k = e;
      } else k++;
    }
    if (close < 0) {
      outside += fence;
      i = j;
      continue;
    }
    let content = line.slice(j, close);
    if (content.length > 2 && content.startsWith(" ") && content.endsWith(" ") && content.trim() !== "") {
      content = content.slice(1, -1);
    }
    spans.push(content);
    outside += "\u0000"; // placeholder: a code span was here
    i = close + fence.length;
  }
  return { spans, outside };
}

/** Number of table cell separators in a row (pipes not escaped with a backslash), code spans included. */
export function cellSeparators(line: string): number {
  return (line.match(/(?<!\\)\|/g) ?? []).length;
}
