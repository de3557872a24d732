/**
 * Telling the world about a verdict, in an order that keeps the verdict independent of GitHub's API:
 * outputs, the HTML report, error annotations and the job summary first (local files only), and the
 * pull-request comment last, whose failure (read-only token, rate limit, refusal) is a warning with the
 * reason, never a change of verdict.
 */
import { resolve } from "node:path";
import type { VerdictDocument } from "../compare/types.js";
import { writeFileAtomic } from "../io/files.js";
import { renderHtml } from "../report/html.js";
import { renderMarkdown } from "../report/markdown.js";
import type { CaseRuns, ReportInput } from "../report/model.js";
import { markerFor, upsertComment } from "./comment.js";
import type { RunContext } from "./event.js";
import { ApiError, GitHubApi } from "./github-api.js";
import type { ActionHost } from "./host.js";
import { OUTPUT, type Settings } from "./settings.js";

/** Most error annotations per step (GitHub shows ten per step). */
const MAX_ANNOTATIONS = 10;

export interface VerdictReport {
  readonly verdict: VerdictDocument;
  readonly candidate?: readonly CaseRuns[];
  readonly baseline?: readonly CaseRuns[];
  readonly notes: readonly string[];
  /** The pull request to comment on, or null. */
  readonly pullRequest: number | null;
  /** Why no comment is attempted even though there is a pull request (e.g. a fork's read-only token). */
  readonly noComment?: string;
  /** The workflow whose comment this is (the gate's workflow, also when another workflow publishes). */
  readonly commentWorkflow: string;
  /** The workflow run that produced the verdict. */
  readonly runUrl?: string;
}

export async function reportVerdict(
  host: ActionHost,
  settings: Settings,
  context: RunContext,
  cwd: string,
  report: VerdictReport,
): Promise<void> {
  const v = report.verdict;
  host.setOutput(OUTPUT.verdict, v.gate.verdict);
  host.setOutput(OUTPUT.cases, String(v.cases.length));
  host.setOutput(OUTPUT.regressed, String(v.counts.regressed));
  host.setOutput(OUTPUT.counts, JSON.stringify(v.counts));
  host.setOutput(OUTPUT.verdictFile, settings.verdictFile);
  host.setOutput(OUTPUT.commentUrl, "");

  const input: ReportInput = {
    verdict: v,
    candidate: report.candidate,
    baseline: report.baseline,
    notes: report.notes,
    links: { run: report.runUrl, artifact: settings.artifactName || undefined },
  };
  writeFileAtomic(resolve(cwd, settings.reportFile), renderHtml(input));
  host.setOutput(OUTPUT.reportFile, settings.reportFile);
  host.info(`gradgate: HTML report written to ${settings.reportFile}`);

  const failing = v.cases.filter((c) => c.failsGate);
  for (const c of failing.slice(0, MAX_ANNOTATIONS)) {
    const why = c.reasons.map((r) => r.message).join("; ") || c.verdict;
    host.annotate(`${c.verdict}: ${why}`, `gradgate: ${c.id}`);
  }
  if (failing.length > MAX_ANNOTATIONS) {
    host.annotate(
      `${failing.length - MAX_ANNOTATIONS} more failing cases; see the job summary`,
      "gradgate: more failing cases",
    );
  }

  try {
    await host.appendSummary(renderMarkdown(input, { target: "summary" }));
  } catch (err) {
    host.warning(`gradgate could not write the job summary: ${(err as Error).message}`);
  }

  if (!settings.prComment || report.pullRequest === null) return;
  if (report.noComment) {
    host.info(report.noComment);
    return;
  }
  if (context.repository === null) {
    host.warning("gradgate: GITHUB_REPOSITORY is not set; no pull-request comment");
    return;
  }
  if (settings.token === "") {
    host.warning(
      `gradgate: input token is empty; no pull-request comment (the verdict is in the job summary)`,
    );
    return;
  }
  const marker = markerFor(report.commentWorkflow, settings.commentKey);
  const body = renderMarkdown(input, { target: "comment", marker });
  const api = new GitHubApi({ baseUrl: context.apiUrl, token: settings.token });
  try {
    const posted = await upsertComment(api, context.repository, report.pullRequest, marker, body);
    host.setOutput(OUTPUT.commentUrl, posted.url);
    host.info(`gradgate: ${posted.action} the comment on pull request #${report.pullRequest}: ${posted.url}`);
  } catch (err) {
    if (!(err instanceof ApiError)) throw err;
    host.warning(commentFailure(err, report.pullRequest));
  }
}

/** One warning per kind of failure, saying what it means for the reader. */
export function commentFailure(err: ApiError, pr: number): string {
  const tail = "The verdict is unaffected: it is in the job summary, the step outputs and the verdict file.";
  switch (err.kind) {
    case "forbidden":
      return (
        `gradgate could not write the comment on pull request #${pr}: the token may not write pull-request comments ` +
        `(${err.message}). Pull requests from forks get a read-only token; publish the comment from a workflow_run ` +
        `workflow (docs/workflows.md), or grant "pull-requests: write" for pull requests from this repository. ${tail}`
      );
    case "rate-limited":
      return `gradgate hit GitHub's API rate limit and left the comment on pull request #${pr} as it was (${err.message}). ${tail}`;
    case "invalid":
      return `GitHub refused the comment on pull request #${pr} (${err.message}). ${tail}`;
    default:
      return `gradgate could not reach GitHub to comment on pull request #${pr} (${err.message}). ${tail}`;
  }
}
