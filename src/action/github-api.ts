/**
 * The only door to GitHub's REST API: the four calls gradgate makes (list, create and update issue
 * comments; read a pull request), over `fetch`, against GITHUB_API_URL (tests point it at a local
 * server). Every failure becomes an ApiError with a kind the caller can act on: `forbidden` (a read-only
 * token, as on pull requests from forks), `rate-limited` (waited for once when the wait is short),
 * `invalid` (422), `not-found`, `server`, `network`. Nothing here decides a verdict.
 */

export type ApiErrorKind = "forbidden" | "rate-limited" | "invalid" | "not-found" | "server" | "network";

export class ApiError extends Error {
  override readonly name = "ApiError";
  constructor(
    message: string,
    readonly kind: ApiErrorKind,
    readonly status: number | null,
    /** Seconds until the rate limit resets, when GitHub said. */
    readonly retryAfter: number | null = null,
  ) {
    super(message);
  }
}

export interface IssueComment {
  readonly id: number;
  readonly body: string;
  readonly htmlUrl: string;
  readonly author: string;
  /** "Bot" for apps such as github-actions[bot], "User" for people and personal tokens. */
  readonly authorType: string;
}

export interface ApiOptions {
  /** e.g. https://api.github.com (GITHUB_API_URL); no trailing slash needed. */
  readonly baseUrl: string;
  readonly token: string;
  /** Per request, milliseconds (default 15 s). */
  readonly timeoutMs?: number;
  /** Longest rate-limit wait taken before one retry, seconds (default 10). */
  readonly maxWaitSeconds?: number;
  readonly userAgent?: string;
}

/** Most comments read when looking for gradgate's own (pages of 100). */
const MAX_PAGES = 30;

export class GitHubApi {
  private readonly base: string;

  constructor(private readonly options: ApiOptions) {
    this.base = options.baseUrl.replace(/\/+$/, "");
  }

  /** Comments of an issue or pull request, oldest first. */
  async listComments(owner: string, repo: string, issue: number): Promise<IssueComment[]> {
    const out: IssueComment[] = [];
    for (let page = 1; page <= MAX_PAGES; page++) {
      const data = await this.call(
        "GET",
        `/repos/${seg(owner)}/${seg(repo)}/issues/${issue}/comments?per_page=100&page=${page}`,
      );
      if (!Array.isArray(data))
        throw new ApiError("GitHub API: the comment list is not a list", "server", 200);
      out.push(...data.map(toComment));
      if (data.length < 100) break;
    }
    return out;
  }

  async createComment(owner: string, repo: string, issue: number, body: string): Promise<IssueComment> {
    return toComment(
      await this.call("POST", `/repos/${seg(owner)}/${seg(repo)}/issues/${issue}/comments`, { body }),
    );
  }

  async updateComment(owner: string, repo: string, id: number, body: string): Promise<IssueComment> {
    return toComment(
      await this.call("PATCH", `/repos/${seg(owner)}/${seg(repo)}/issues/comments/${id}`, { body }),
    );
  }

  /** The head commit of a pull request. */
  async pullRequestHead(owner: string, repo: string, pull: number): Promise<string> {
    const data = (await this.call("GET", `/repos/${seg(owner)}/${seg(repo)}/pulls/${pull}`)) as {
      head?: { sha?: unknown };
    };
    return typeof data?.head?.sha === "string" ? data.head.sha : "";
  }

  private async call(method: string, path: string, body?: unknown, retried = false): Promise<unknown> {
    let res: Response;
    try {
      res = await fetch(`${this.base}${path}`, {
        method,
        headers: {
          accept: "application/vnd.github+json",
          authorization: `Bearer ${this.options.token}`,
          "x-github-api-version": "2022-11-28",
          "user-agent": this.options.userAgent ?? "gradgate",
          ...(body === undefined ? {} : { "content-type": "application/json" }),
        },
        body: body === undefined ? undefined : JSON.stringify(body),
        signal: AbortSignal.timeout(this.options.timeoutMs ?? 15_000),
      });
    } catch (err) {
      const cause = (err as { cause?: { code?: string } }).cause?.code ?? (err as Error).name;
      throw new ApiError(`GitHub API ${method} ${stripQuery(path)}: no answer (${cause})`, "network", null);
    }
    const text = await res.text();
    let data: unknown = null;
    try {
      data = text === "" ? null : JSON.parse(text);
    } catch {
      data = null;
    }
    if (res.ok) return data;

    const message =
      typeof (data as { message?: unknown })?.message === "string"
        ? (data as { message: string }).message
        : "";
    const wait = rateLimitWait(res, message);
    const what = `GitHub API ${method} ${stripQuery(path)}: ${res.status}${message ? ` ${JSON.stringify(message.slice(0, 200))}` : ""}`;
    if (wait !== null) {
      if (!retried && wait <= (this.options.maxWaitSeconds ?? 10)) {
        await new Promise((r) => setTimeout(r, wait * 1000));
        return this.call(method, path, body, true);
      }
      throw new ApiError(`${what} (rate limited; retry in ${wait} s)`, "rate-limited", res.status, wait);
    }
    const kind: ApiErrorKind =
      res.status === 401 || res.status === 403
        ? "forbidden"
        : res.status === 404
          ? "not-found"
          : res.status === 422
            ? "invalid"
            : "server";
    throw new ApiError(what, kind, res.status);
  }
}

/**
 * Seconds to wait when the answer is a rate limit (429, or 403 with no requests left or a "secondary rate
 * limit" message), else null. From retry-after, else x-ratelimit-reset, else a minute.
 */
function rateLimitWait(res: Response, message: string): number | null {
  const limited =
    res.status === 429 ||
    (res.status === 403 && (res.headers.get("x-ratelimit-remaining") === "0" || /rate limit/i.test(message)));
  if (!limited) return null;
  const after = res.headers.get("retry-after");
  if (after !== null && /^\d+$/.test(after)) return Number(after);
  const reset = res.headers.get("x-ratelimit-reset");
  if (reset !== null && /^\d+$/.test(reset))
    return Math.max(0, Number(reset) - Math.floor(Date.now() / 1000));
  return 60;
}

function toComment(raw: unknown): IssueComment {
  const c = (raw ?? {}) as Record<string, unknown>;
  const user = (c.user ?? {}) as Record<string, unknown>;
  if (!Number.isInteger(c.id)) throw new ApiError("GitHub API: a comment without an id", "server", 200);
  return {
    id: c.id as number,
    body: typeof c.body === "string" ? c.body : "",
    htmlUrl: typeof c.html_url === "string" ? c.html_url : "",
    author: typeof user.login === "string" ? user.login : "",
    authorType: typeof user.type === "string" ? user.type : "",
  };
}

function seg(s: string): string {
  return encodeURIComponent(s);
}

function stripQuery(path: string): string {
  return path.replace(/\?.*$/, "");
}
