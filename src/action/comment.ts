/**
 * One pull-request comment per workflow (and comment key), found again by its hidden marker and updated
 * in place, so a pull request never collects a comment per push.
 */
import { createHash } from "node:crypto";
import { commentMarker } from "../report/markdown.js";
import { ApiError, type GitHubApi, type IssueComment } from "./github-api.js";

/** The marker of the comment of `workflow` (and `key`): a hash, so no name reaches the HTML comment. */
export function markerFor(workflow: string, key: string): string {
  const id = createHash("sha256").update(`${workflow}\n${key}`).digest("hex").slice(0, 16);
  return commentMarker(id);
}

export interface Posted {
  readonly action: "created" | "updated";
  readonly url: string;
  readonly id: number;
}

/**
 * Updates the comment that starts with `marker`, or creates one. When several carry the marker (someone
 * copied it), the oldest one written by a bot account is taken, else the oldest.
 */
export async function upsertComment(
  api: GitHubApi,
  repo: { owner: string; repo: string },
  issue: number,
  marker: string,
  body: string,
): Promise<Posted> {
  const ours = (await api.listComments(repo.owner, repo.repo, issue)).filter((c) =>
    c.body.startsWith(marker),
  );
  const existing: IssueComment | undefined = ours.find((c) => c.authorType === "Bot") ?? ours[0];
  if (existing) {
    try {
      const c = await api.updateComment(repo.owner, repo.repo, existing.id, body);
      return { action: "updated", url: c.htmlUrl, id: c.id };
    } catch (err) {
      // Deleted between the listing and the update: write a new one.
      if (!(err instanceof ApiError && err.kind === "not-found")) throw err;
    }
  }
  const c = await api.createComment(repo.owner, repo.repo, issue, body);
  return { action: "created", url: c.htmlUrl, id: c.id };
}
