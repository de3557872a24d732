/**
 * A small stand-in for GitHub's REST API on 127.0.0.1: issue comments (list with pages, create, update)
 * and pull requests (head commit). It records every request, can be told to answer a route with an error
 * (403, 422, a rate limit...) a number of times, and closes itself after a minute at the latest. Test
 * helper; its answers follow the shapes of GitHub's REST API documentation, trimmed to the fields
 * gradgate reads.
 */
import { createServer, type IncomingMessage, type Server } from "node:http";
import type { AddressInfo } from "node:net";

export interface Recorded {
  readonly method: string;
  readonly path: string;
  readonly auth: string;
  readonly body: unknown;
}

export interface Fault {
  readonly status: number;
  readonly body?: unknown;
  readonly headers?: Record<string, string>;
  /** How many requests get the fault (default: all). */
  times?: number;
}

export interface StoredComment {
  id: number;
  body: string;
  user: { login: string; type: string };
}

export class FakeGitHub {
  readonly requests: Recorded[] = [];
  readonly comments = new Map<number, StoredComment[]>();
  readonly pulls = new Map<number, { headSha: string }>();
  /** Route key ("GET comments", "POST comments", "PATCH comment", "GET pull") → fault. */
  readonly faults = new Map<string, Fault>();
  private nextId = 1000;
  private server: Server | null = null;
  private timer: NodeJS.Timeout | null = null;

  /** Base URL, e.g. http://127.0.0.1:41234 (valid after start). */
  url = "";

  async start(): Promise<void> {
    this.server = createServer((req, res) => {
      void this.handle(req).then(({ status, body, headers }) => {
        res.writeHead(status, { "content-type": "application/json", ...headers });
        res.end(body === undefined ? "" : JSON.stringify(body));
      });
    });
    await new Promise<void>((ok) => this.server!.listen(0, "127.0.0.1", ok));
    this.url = `http://127.0.0.1:${(this.server.address() as AddressInfo).port}`;
    this.timer = setTimeout(() => void this.stop(), 60_000);
    this.timer.unref();
  }

  async stop(): Promise<void> {
    if (this.timer) clearTimeout(this.timer);
    const s = this.server;
    this.server = null;
    if (s) await new Promise<void>((ok) => s.close(() => ok()));
  }

  reset(): void {
    this.requests.length = 0;
    this.comments.clear();
    this.pulls.clear();
    this.faults.clear();
  }

  /** Requests that changed something (POST, PATCH). */
  writes(): Recorded[] {
    return this.requests.filter((r) => r.method === "POST" || r.method === "PATCH");
  }

  private async handle(
    req: IncomingMessage,
  ): Promise<{ status: number; body?: unknown; headers?: Record<string, string> }> {
    const chunks: Buffer[] = [];
    let size = 0;
    for await (const chunk of req) {
      size += (chunk as Buffer).length;
      if (size > 2_000_000) return { status: 413, body: { message: "too large" } };
      chunks.push(chunk as Buffer);
    }
    const text = Buffer.concat(chunks).toString("utf8");
    const body = text ? JSON.parse(text) : null;
    const url = new URL(req.url ?? "/", "http://x");
    const method = req.method ?? "GET";
    this.requests.push({
      method,
      path: url.pathname + url.search,
      auth: String(req.headers.authorization ?? ""),
      body,
    });

    let m = /^\/repos\/[^/]+\/[^/]+\/issues\/(\d+)\/comments$/.exec(url.pathname);
    const route = m
      ? `${method} comments`
      : /^\/repos\/[^/]+\/[^/]+\/issues\/comments\/\d+$/.test(url.pathname)
        ? `${method} comment`
        : /^\/repos\/[^/]+\/[^/]+\/pulls\/\d+$/.test(url.pathname)
          ? `${method} pull`
          : "other";
    const fault = this.faults.get(route);
    if (fault && (fault.times === undefined || fault.times > 0)) {
      if (fault.times !== undefined) fault.times--;
      return { status: fault.status, body: fault.body ?? { message: "fault" }, headers: fault.headers };
    }

    if (m && method === "GET") {
      const all = this.comments.get(Number(m[1])) ?? [];
      const perPage = Number(url.searchParams.get("per_page") ?? 30);
      const page = Number(url.searchParams.get("page") ?? 1);
      return { status: 200, body: all.slice((page - 1) * perPage, page * perPage).map((c) => this.view(c)) };
    }
    if (m && method === "POST") {
      const c = {
        id: this.nextId++,
        body: String(body?.body ?? ""),
        user: { login: "github-actions[bot]", type: "Bot" },
      };
      const list = this.comments.get(Number(m[1])) ?? [];
      list.push(c);
      this.comments.set(Number(m[1]), list);
      return { status: 201, body: this.view(c) };
    }
    m = /^\/repos\/[^/]+\/[^/]+\/issues\/comments\/(\d+)$/.exec(url.pathname);
    if (m && method === "PATCH") {
      for (const list of this.comments.values()) {
        const c = list.find((x) => x.id === Number(m![1]));
        if (c) {
          c.body = String(body?.body ?? "");
          return { status: 200, body: this.view(c) };
        }
      }
      return { status: 404, body: { message: "Not Found" } };
    }
    m = /^\/repos\/[^/]+\/[^/]+\/pulls\/(\d+)$/.exec(url.pathname);
    if (m && method === "GET") {
      const pr = this.pulls.get(Number(m[1]));
      return pr
        ? { status: 200, body: { number: Number(m[1]), head: { sha: pr.headSha } } }
        : { status: 404, body: { message: "Not Found" } };
    }
    return { status: 404, body: { message: "Not Found" } };
  }

  private view(c: StoredComment) {
    return {
      id: c.id,
      body: c.body,
      html_url: `https://github.example/o/r/pull/1#issuecomment-${c.id}`,
      user: c.user,
    };
  }
}
