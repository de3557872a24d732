/**
 * The workflow run the Action is in, read from the runner's environment (GITHUB_*) and the event payload
 * file: which repository, which pull request (and whether it comes from a fork), which release, which
 * finished workflow run. Plain data; a missing payload gives nulls (never a guess), a corrupt one an error.
 */
import { existsSync, readFileSync } from "node:fs";

export interface PullRequestInfo {
  readonly number: number;
  readonly headSha: string;
  /** The head branch lives in another repository: the job's token is read-only and holds no secrets. */
  readonly fork: boolean;
}

export interface WorkflowRunInfo {
  /** Name of the workflow that finished (its comments are "its" comments). */
  readonly name: string;
  readonly id: number;
  readonly headSha: string;
  readonly event: string;
  /** Pull requests GitHub associates with the run (empty for pull requests from forks). */
  readonly pullRequests: readonly number[];
}

export interface RunContext {
  readonly eventName: string;
  /** "owner/name", or null outside a workflow. */
  readonly repository: { readonly owner: string; readonly repo: string } | null;
  readonly sha: string;
  readonly workflow: string;
  readonly runId: string;
  readonly serverUrl: string;
  readonly apiUrl: string;
  readonly pullRequest: PullRequestInfo | null;
  readonly release: { readonly tag: string; readonly name: string } | null;
  readonly workflowRun: WorkflowRunInfo | null;
}

type Env = Readonly<Record<string, string | undefined>>;

export function readContext(env: Env): RunContext {
  const payload = readPayload(env.GITHUB_EVENT_PATH);
  const [owner, repo] = (env.GITHUB_REPOSITORY ?? "").split("/");
  const pr = obj(payload.pull_request);
  const rel = obj(payload.release);
  const wr = obj(payload.workflow_run);
  return {
    eventName: env.GITHUB_EVENT_NAME ?? "",
    repository: owner && repo ? { owner, repo } : null,
    sha: env.GITHUB_SHA ?? "",
    workflow: env.GITHUB_WORKFLOW ?? "",
    runId: env.GITHUB_RUN_ID ?? "",
    serverUrl: (env.GITHUB_SERVER_URL ?? "https://github.com").replace(/\/+$/, ""),
    apiUrl: (env.GITHUB_API_URL ?? "https://api.github.com").replace(/\/+$/, ""),
    pullRequest:
      pr && Number.isInteger(pr.number)
        ? {
            number: pr.number as number,
            headSha: str(obj(pr.head)?.sha),
            fork: isFork(pr),
          }
        : null,
    release: rel ? { tag: str(rel.tag_name), name: str(rel.name) } : null,
    workflowRun: wr
      ? {
          name: str(wr.name),
          id: Number.isInteger(wr.id) ? (wr.id as number) : 0,
          headSha: str(wr.head_sha),
          event: str(wr.event),
          pullRequests: (Array.isArray(wr.pull_requests) ? wr.pull_requests : [])
            .map((p) => obj(p)?.number)
            .filter((n): n is number => Number.isInteger(n)),
        }
      : null,
  };
}

/** A pull request is from a fork when its head repository is not its base repository. */
function isFork(pr: Record<string, unknown>): boolean {
  const head = obj(obj(pr.head)?.repo);
  const base = obj(obj(pr.base)?.repo);
  if (!head) return true; // the head repository was deleted: treat as foreign
  return str(head.full_name) !== str(base?.full_name);
}

function readPayload(path: string | undefined): Record<string, unknown> {
  if (!path || !existsSync(path)) return {};
  let data: unknown;
  try {
    data = JSON.parse(readFileSync(path, "utf8"));
  } catch (err) {
    throw new Error(
      `the event payload GITHUB_EVENT_PATH=${path} is not valid JSON (${(err as Error).message})`,
    );
  }
  return obj(data) ?? {};
}

function obj(v: unknown): Record<string, unknown> | null {
  return v !== null && typeof v === "object" && !Array.isArray(v) ? (v as Record<string, unknown>) : null;
}

function str(v: unknown): string {
  return typeof v === "string" ? v : "";
}
