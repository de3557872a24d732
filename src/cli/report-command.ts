/**
 * `gradgate report --verdict FILE [--results FILE] [--baselines DIR] [--html OUT] [--markdown OUT]`:
 * renders a verdict document (with the charts when the results and baselines are at hand) as the
 * self-contained HTML report and/or the Markdown of the job summary, the same pure renderers the Action uses.
 */
import { existsSync, readFileSync } from "node:fs";
import { resolve } from "node:path";
import { InputError } from "../core/errors.js";
import { writeFileAtomic } from "../io/files.js";
import { readBaselineDir } from "../baselines/store.js";
import { parseResults } from "../baselines/validate.js";
import { renderHtml } from "../report/html.js";
import { renderMarkdown } from "../report/markdown.js";
import type { CaseRuns } from "../report/model.js";
import { parseVerdict } from "../report/verdict-file.js";
import { EXIT, type Host } from "./host.js";

export interface ReportArgs {
  readonly verdict: string;
  readonly results?: string;
  readonly baselines?: string;
  readonly html?: string;
  readonly markdown?: string;
}

export function reportCommand(host: Host, args: ReportArgs): number {
  if (args.html === undefined && args.markdown === undefined) {
    throw new InputError("report: name an output: --html FILE and/or --markdown FILE");
  }
  const read = (file: string, what: string) => {
    const path = resolve(host.cwd, file);
    if (!existsSync(path)) throw new InputError(`report: ${what} ${file}: no such file`);
    return readFileSync(path, "utf8");
  };
  const verdict = parseVerdict(read(args.verdict, "verdict"), args.verdict);
  const candidate: CaseRuns[] | undefined = args.results
    ? [...parseResults(read(args.results, "results"), args.results).cases]
    : undefined;
  let baseline: CaseRuns[] | undefined;
  if (args.baselines !== undefined) {
    const dir = resolve(host.cwd, args.baselines);
    if (!existsSync(dir)) throw new InputError(`report: baselines ${args.baselines}: no such directory`);
    baseline = [...readBaselineDir(dir, args.baselines.replace(/\/+$/, "")).values()].flatMap((b) => b.cases);
  }
  const input = { verdict, candidate, baseline };
  if (args.html !== undefined) {
    writeFileAtomic(resolve(host.cwd, args.html), renderHtml(input));
    host.out(`HTML report written to ${args.html}\n`);
  }
  if (args.markdown !== undefined) {
    writeFileAtomic(resolve(host.cwd, args.markdown), renderMarkdown(input, { target: "summary" }));
    host.out(`Markdown report written to ${args.markdown}\n`);
  }
  return EXIT.ok;
}
