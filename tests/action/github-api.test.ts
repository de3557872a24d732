import { createServer } from "node:net";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { markerFor, upsertComment } from "../../src/action/comment.js";
import { ApiError, GitHubApi } from "../../src/action/github-api.js";
import { FakeGitHub } from "./fake-github.js";

const gh = new FakeGitHub();
const repo = { owner: "lumen-labs", repo: "lumen" };
let api: GitHubApi;

beforeAll(async () => {
  await gh.start();
  api = new GitHubApi({ baseUrl: gh.url, token: "t0ken", maxWaitSeconds: 2 });
});
afterAll(() => gh.stop());
beforeEach(() => gh.reset());

async function apiError(p: Promise<unknown>): Promise<ApiError> {
  try {
    await p;
  } catch (err) {
    if (err instanceof ApiError) return err;
    throw err;
  }
  throw new Error("expected an ApiError");
}

describe("GitHubApi against a local server", () => {
  it("creates, lists (across pages) and updates comments with the token", async () => {
    for (let i = 0; i < 130; i++)
      gh.comments.set(7, [
        ...(gh.comments.get(7) ?? []),
        { id: i + 1, body: `c${i}`, user: { login: "someone", type: "User" } },
      ]);
    const made = await api.createComment(repo.owner, repo.repo, 7, "hello");
    const all = await api.listComments(repo.owner, repo.repo, 7);
    expect(all).toHaveLength(131);
    expect(all[130]).toEqual({
      id: made.id,
      body: "hello",
      htmlUrl: made.htmlUrl,
      author: "github-actions[bot]",
      authorType: "Bot",
    });
    await api.updateComment(repo.owner, repo.repo, made.id, "again");
    expect(gh.comments.get(7)![130].body).toBe("again");
    expect(gh.requests.map((r) => `${r.method} ${r.path}`)).toEqual([
      "POST /repos/lumen-labs/lumen/issues/7/comments",
      "GET /repos/lumen-labs/lumen/issues/7/comments?per_page=100&page=1",
      "GET /repos/lumen-labs/lumen/issues/7/comments?per_page=100&page=2",
      `PATCH /repos/lumen-labs/lumen/issues/comments/${made.id}`,
    ]);
    expect(gh.requests.every((r) => r.auth === "Bearer t0ken")).toBe(true);
  });

  it.each([
    [
      403,
      { message: "Resource not accessible by integration" },
      {},
      "forbidden",
      'GitHub API POST /repos/lumen-labs/lumen/issues/7/comments: 403 "Resource not accessible by integration"',
    ],
    [
      422,
      { message: "Validation Failed" },
      {},
      "invalid",
      'GitHub API POST /repos/lumen-labs/lumen/issues/7/comments: 422 "Validation Failed"',
    ],
    [
      500,
      { message: "boom" },
      {},
      "server",
      'GitHub API POST /repos/lumen-labs/lumen/issues/7/comments: 500 "boom"',
    ],
    [
      403,
      { message: "API rate limit exceeded" },
      { "x-ratelimit-remaining": "0", "x-ratelimit-reset": String(Math.floor(Date.now() / 1000) + 3600) },
      "rate-limited",
      /^GitHub API POST \/repos\/lumen-labs\/lumen\/issues\/7\/comments: 403 "API rate limit exceeded" \(rate limited; retry in 3[56]\d\d s\)$/,
    ],
  ])("turns %i into a %s error", async (status, body, headers, kind, message) => {
    gh.faults.set("POST comments", { status, body, headers });
    const err = await apiError(api.createComment(repo.owner, repo.repo, 7, "x"));
    expect(err.kind).toBe(kind);
    expect(err.status).toBe(status);
    if (typeof message === "string") expect(err.message).toBe(message);
    else expect(err.message).toMatch(message);
    expect(gh.requests).toHaveLength(1); // a long rate-limit wait is not waited for
  });

  it("waits once for a short rate limit (429 with retry-after) and goes on", async () => {
    gh.faults.set("POST comments", {
      status: 429,
      headers: { "retry-after": "1" },
      body: { message: "slow down" },
      times: 1,
    });
    const started = Date.now();
    const made = await api.createComment(repo.owner, repo.repo, 7, "after the wait");
    expect(Date.now() - started).toBeGreaterThanOrEqual(900);
    expect(made.body).toBe("after the wait");
    expect(gh.requests.map((r) => r.method)).toEqual(["POST", "POST"]);
  });

  it("reports a server that is not there as a network error", async () => {
    // A port that was free a moment ago: nothing listens there now.
    const port = await new Promise<number>((ok) => {
      const s = createServer().listen(0, "127.0.0.1", () => {
        const p = (s.address() as { port: number }).port;
        s.close(() => ok(p));
      });
    });
    const down = new GitHubApi({ baseUrl: `http://127.0.0.1:${port}`, token: "t" });
    const err = await apiError(down.listComments("o", "r", 1));
    expect(err.kind).toBe("network");
    expect(err.message).toBe("GitHub API GET /repos/o/r/issues/1/comments: no answer (ECONNREFUSED)");
  });
});

describe("upsertComment", () => {
  const marker = markerFor("convergence", "");

  it("creates the first comment, then updates it in place", async () => {
    gh.comments.set(3, [{ id: 1, body: "LGTM", user: { login: "maintainer", type: "User" } }]);
    const first = await upsertComment(api, repo, 3, marker, `${marker}\nfirst`);
    const second = await upsertComment(api, repo, 3, marker, `${marker}\nsecond`);
    expect(first.action).toBe("created");
    expect(second).toEqual({ action: "updated", url: first.url, id: first.id });
    expect(gh.comments.get(3)!.map((c) => c.body)).toEqual(["LGTM", `${marker}\nsecond`]);
  });

  it("keeps one comment per workflow and key", async () => {
    const other = markerFor("convergence", "gpu");
    expect(other).not.toBe(marker);
    expect(marker).toMatch(/^<!-- gradgate-report [0-9a-f]{16} -->$/);
    await upsertComment(api, repo, 3, marker, `${marker}\na`);
    await upsertComment(api, repo, 3, other, `${other}\nb`);
    await upsertComment(api, repo, 3, marker, `${marker}\nc`);
    expect(gh.comments.get(3)!.map((c) => c.body)).toEqual([`${marker}\nc`, `${other}\nb`]);
  });

  it("prefers the bot's comment when someone copied the marker", async () => {
    gh.comments.set(3, [
      { id: 1, body: `${marker}\ncopied by a person`, user: { login: "mallory", type: "User" } },
      { id: 2, body: `${marker}\nours`, user: { login: "github-actions[bot]", type: "Bot" } },
    ]);
    const posted = await upsertComment(api, repo, 3, marker, `${marker}\nnew`);
    expect(posted.id).toBe(2);
    expect(gh.comments.get(3)![0].body).toBe(`${marker}\ncopied by a person`);
  });

  it("writes a new comment when the old one was deleted meanwhile", async () => {
    gh.comments.set(3, [
      { id: 5, body: `${marker}\nold`, user: { login: "github-actions[bot]", type: "Bot" } },
    ]);
    gh.faults.set("PATCH comment", { status: 404, body: { message: "Not Found" } });
    const posted = await upsertComment(api, repo, 3, marker, `${marker}\nnew`);
    expect(posted.action).toBe("created");
  });
});
