/**
 * An optimizer module of "the repository" that behaves like hostile code would, for the tests of the
 * process boundary: when loaded it writes down its process id, parent process id, thread, environment and
 * command line, and it wraps `fetch`, `http`/`https` `request`/`get` and `ClientRequest#setHeader` of its
 * own thread to write down every request and Authorization header sent from there. Its optimizer is plain
 * gradient descent, so in place of the reference SGD it gives the reference SGD's numbers. Everything it
 * records goes, one JSON object a line, to spy.jsonl beside the module. Test helper.
 */
import { existsSync, readFileSync, writeFileSync } from "node:fs";
import { join } from "node:path";

export const SPY_FILE = "spy-sgd.mjs";
export const SPY_LOG = "spy.jsonl";

const SOURCE = String.raw`import { appendFileSync } from "node:fs";
import http from "node:http";
import https from "node:https";
import { threadId } from "node:worker_threads";

const log = new URL("./spy.jsonl", import.meta.url);
const note = (kind, data = {}) =>
  appendFileSync(log, JSON.stringify({ kind, pid: process.pid, ppid: process.ppid, threadId, ...data }) + "\n");

function authorizationIn(headers) {
  if (!headers) return null;
  if (typeof headers.get === "function") return headers.get("authorization");
  const pairs = Array.isArray(headers) ? headers : Object.entries(headers);
  for (const [name, value] of pairs) if (String(name).toLowerCase() === "authorization") return String(value);
  return null;
}

// (a) Everything this process shows of its environment and command line.
note("loaded", { env: { ...process.env }, argv: process.argv, execArgv: process.execArgv });

// (b) Every way this thread could send the token somewhere: wrapped, so each request is written down.
const realFetch = globalThis.fetch;
globalThis.fetch = function (input, init) {
  const request = input instanceof Request ? input : null;
  note("request", {
    via: "fetch",
    url: String(request ? request.url : input),
    authorization: authorizationIn(init?.headers) ?? authorizationIn(request?.headers),
  });
  return realFetch.call(this, input, init);
};
const wrapped = [];
for (const [name, mod] of [["http", http], ["https", https]]) {
  for (const fn of ["request", "get"]) {
    const real = mod[fn];
    wrapped.push([mod, fn, real]);
    mod[fn] = function (...args) {
      const options = args.find((a) => a !== null && typeof a === "object" && !(a instanceof URL));
      note("request", { via: name + "." + fn, authorization: authorizationIn(options?.headers) });
      return real.apply(this, args);
    };
  }
}
const realSetHeader = http.ClientRequest.prototype.setHeader;
http.ClientRequest.prototype.setHeader = function (name, value) {
  if (String(name).toLowerCase() === "authorization") {
    note("request", { via: "ClientRequest.setHeader", authorization: String(value) });
  }
  return realSetHeader.call(this, name, value);
};

/** Puts back what this module wrapped (for a test that loads it into its own process). */
export function unwrap() {
  globalThis.fetch = realFetch;
  for (const [mod, fn, real] of wrapped) mod[fn] = real;
  http.ClientRequest.prototype.setHeader = realSetHeader;
}

let stepped = false;
export const spySgd = {
  name: "spy-sgd",
  title: "gradient descent that spies on its process (test module)",
  defaults: { lr: 0.01 },
  create(hyper, dim) {
    const g = new Float64Array(dim);
    return {
      step(x, oracle) {
        if (!stepped) {
          stepped = true;
          note("step");
        }
        oracle.evaluate(x, g);
        for (let i = 0; i < dim; i++) x[i] -= hyper.lr * g[i];
      },
    };
  },
};
`;

export interface SpyRecord {
  readonly kind: "loaded" | "request" | "step";
  readonly pid: number;
  readonly ppid: number;
  readonly threadId: number;
  readonly env?: Record<string, string>;
  readonly argv?: string[];
  readonly execArgv?: string[];
  readonly via?: string;
  readonly url?: string;
  readonly authorization?: string | null;
}

/**
 * Writes the spy module into `dir` and `spy.yml`: the suite of `base` (a config file in `dir`) with the
 * reference SGD replaced by the spy and, with `check`, a reference check of the spy (so that `compare`
 * loads the module too).
 */
export function writeSpyProject(dir: string, base: string, check: boolean): string {
  writeFileSync(join(dir, SPY_FILE), SOURCE);
  const suite = readFileSync(join(dir, base), "utf8");
  const replaced = suite.replace("    use: sgd\n", `    use: module:./${SPY_FILE}#spySgd\n`);
  if (replaced === suite) throw new Error(`${base} has no "use: sgd" line to replace`);
  const checks = check
    ? "checks:\n  minimum:\n    - { optimizer: sgd, problem: quadratic, gating: false }\n"
    : "";
  writeFileSync(join(dir, "spy.yml"), replaced + checks);
  writeFileSync(join(dir, SPY_LOG), "");
  return "spy.yml";
}

export function readSpy(dir: string): SpyRecord[] {
  const path = join(dir, SPY_LOG);
  if (!existsSync(path)) return [];
  return readFileSync(path, "utf8")
    .split("\n")
    .filter((l) => l !== "")
    .map((l) => JSON.parse(l) as SpyRecord);
}
