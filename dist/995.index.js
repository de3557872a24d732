export const id = 995;
export const ids = [995];
export const modules = {

/***/ 6376:
/***/ ((__unused_webpack___webpack_module__, __webpack_exports__, __webpack_require__) => {

// ESM COMPAT FLAG
__webpack_require__.r(__webpack_exports__);

// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  failureMessage: () => (/* binding */ failureMessage),
  run: () => (/* binding */ run)
});

// EXTERNAL MODULE: ./build/package/core/errors.js
var errors = __webpack_require__(4552);
// EXTERNAL MODULE: external "node:crypto"
var external_node_crypto_ = __webpack_require__(7598);
// EXTERNAL MODULE: ./node_modules/@actions/core/lib/core.js + 14 modules
var core = __webpack_require__(6421);
;// CONCATENATED MODULE: ./build/package/action/core-host.js
/** The ActionHost of a real workflow run: @actions/core (log commands, GITHUB_OUTPUT, GITHUB_STEP_SUMMARY). */


function coreHost() {
    return {
        debug: (m) => core/* debug */.Yz(m),
        info: (m) => core/* info */.pq(m),
        warning: (m) => core/* warning */.$e(m),
        annotate: (message, title) => core/* error */.z3(message, { title }),
        setOutput: (name, value) => core/* setOutput */.uH(name, value),
        appendSummary: async (markdown) => {
            await core/* summary */.z.addRaw(markdown, true).write();
            core/* summary */.z.emptyBuffer();
        },
        fail: (m) => core/* setFailed */.C1(m),
        group: (name, fn) => core/* group */.Os(name, fn),
        withoutCommands: async (fn) => {
            // The runner's "stop-commands" command: nothing is a command until the unguessable end token.
            const token = (0,external_node_crypto_.randomUUID)();
            core/* info */.pq(`::stop-commands::${token}`);
            try {
                return await fn();
            }
            finally {
                core/* info */.pq(`::${token}::`);
            }
        },
    };
}

// EXTERNAL MODULE: ./build/package/action/engine-env.js
var engine_env = __webpack_require__(4468);
// EXTERNAL MODULE: ./build/package/action/engine-process.js
var engine_process = __webpack_require__(6142);
// EXTERNAL MODULE: external "node:fs"
var external_node_fs_ = __webpack_require__(3024);
;// CONCATENATED MODULE: ./build/package/action/event.js
/**
 * The workflow run the Action is in, read from the runner's environment (GITHUB_*) and the event payload
 * file: which repository, which pull request (and whether it comes from a fork), which release, which
 * finished workflow run. Plain data; a missing payload gives nulls (never a guess), a corrupt one an error.
 */

function readContext(env) {
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
        pullRequest: pr && Number.isInteger(pr.number)
            ? {
                number: pr.number,
                headSha: str(obj(pr.head)?.sha),
                fork: isFork(pr),
            }
            : null,
        release: rel ? { tag: str(rel.tag_name), name: str(rel.name) } : null,
        workflowRun: wr
            ? {
                name: str(wr.name),
                id: Number.isInteger(wr.id) ? wr.id : 0,
                headSha: str(wr.head_sha),
                event: str(wr.event),
                pullRequests: (Array.isArray(wr.pull_requests) ? wr.pull_requests : [])
                    .map((p) => obj(p)?.number)
                    .filter((n) => Number.isInteger(n)),
            }
            : null,
    };
}
/** A pull request is from a fork when its head repository is not its base repository. */
function isFork(pr) {
    const head = obj(obj(pr.head)?.repo);
    const base = obj(obj(pr.base)?.repo);
    if (!head)
        return true; // the head repository was deleted: treat as foreign
    return str(head.full_name) !== str(base?.full_name);
}
function readPayload(path) {
    if (!path || !(0,external_node_fs_.existsSync)(path))
        return {};
    let data;
    try {
        data = JSON.parse((0,external_node_fs_.readFileSync)(path, "utf8"));
    }
    catch (err) {
        throw new Error(`the event payload GITHUB_EVENT_PATH=${path} is not valid JSON (${err.message})`);
    }
    return obj(data) ?? {};
}
function obj(v) {
    return v !== null && typeof v === "object" && !Array.isArray(v) ? v : null;
}
function str(v) {
    return typeof v === "string" ? v : "";
}

// EXTERNAL MODULE: external "node:path"
var external_node_path_ = __webpack_require__(6760);
// EXTERNAL MODULE: ./build/package/cli/host.js
var cli_host = __webpack_require__(3638);
// EXTERNAL MODULE: ./build/package/core/json.js
var json = __webpack_require__(625);
// EXTERNAL MODULE: ./build/package/io/files.js
var files = __webpack_require__(1687);
// EXTERNAL MODULE: ./build/package/cli/merge-command.js
var merge_command = __webpack_require__(6126);
// EXTERNAL MODULE: ./build/package/baselines/store.js
var store = __webpack_require__(1425);
// EXTERNAL MODULE: ./build/package/report/escape.js
var report_escape = __webpack_require__(4027);
// EXTERNAL MODULE: ./build/package/baselines/validate.js + 1 modules
var validate = __webpack_require__(5373);
// EXTERNAL MODULE: ./build/package/report/verdict-file.js
var verdict_file = __webpack_require__(3494);
;// CONCATENATED MODULE: ./build/package/action/documents.js
/**
 * Reading the documents a report is drawn from. In `publish` mode they come from an artifact of a run
 * that executed a pull request's code, so they are untrusted: size-capped, parsed as JSON, checked for the
 * shape the renderers rely on, and everything in them is escaped when rendered. The baseline runs (for
 * the charts) are read from this checkout, never from the artifact.
 */






/** Largest document read (bytes): far above a real suite's, far below what would hurt the runner. */
const MAX_DOCUMENT_BYTES = 64 * 1024 * 1024;
function readCapped(path, shown, what) {
    if (!(0,external_node_fs_.existsSync)(path))
        throw new errors/* InputError */.d(`${what} ${shown}: no such file`);
    const size = (0,external_node_fs_.statSync)(path).size;
    if (size > MAX_DOCUMENT_BYTES) {
        throw new errors/* InputError */.d(`${what} ${shown} is ${size} bytes, more than the ${MAX_DOCUMENT_BYTES} bytes gradgate reads`);
    }
    return (0,external_node_fs_.readFileSync)(path, "utf8");
}
/** Reads a verdict document and checks the fields the reports use. */
function readVerdict(cwd, file) {
    return (0,verdict_file/* parseVerdict */.P)(readCapped((0,external_node_path_.resolve)(cwd, file), file, "verdict"), file);
}
/** Reads and validates a results document (schema of src/baselines/validate.ts). */
function readResultsDoc(cwd, file) {
    return (0,validate/* parseResults */.c2)(readCapped((0,external_node_path_.resolve)(cwd, file), file, "results"), file);
}
/** The baselines' runs by case, for the charts; empty when the directory is absent. */
function readBaselineRuns(cwd, dir) {
    const path = (0,external_node_path_.resolve)(cwd, dir);
    if (!(0,external_node_fs_.existsSync)(path))
        return [];
    return [...(0,store/* readBaselineDir */.v5)(path, dir.replace(/\/+$/, "")).values()].flatMap((b) => b.cases);
}
/** Where the gate job leaves the pull request for the publishing workflow: beside the verdict. */
function handoffPath(cwd, verdictFile) {
    return (0,external_node_path_.join)((0,external_node_path_.dirname)((0,external_node_path_.resolve)(cwd, verdictFile)), "pull-request.json");
}
/** Reads pull-request.json (untrusted: only a number and a commit id are taken from it). */
function readHandoff(path, shown) {
    const text = readCapped(path, shown, "pull-request file");
    let d;
    try {
        d = (JSON.parse(text) ?? {});
    }
    catch (err) {
        throw new errors/* InputError */.d(`pull-request file ${shown} is not valid JSON (${err.message})`);
    }
    if (!Number.isInteger(d.number) || d.number < 1) {
        throw new errors/* InputError */.d(`pull-request file ${shown}: number must be a pull-request number, got ${(0,errors/* quote */.h)(d.number)}`);
    }
    if (typeof d.headSha !== "string" || !/^[0-9a-f]{40}$/.test(d.headSha)) {
        throw new errors/* InputError */.d(`pull-request file ${shown}: headSha must be a 40-digit commit id, got ${(0,errors/* quote */.h)(d.headSha)}`);
    }
    return { number: d.number, headSha: d.headSha };
}

;// CONCATENATED MODULE: ./build/package/action/github-api.js
/**
 * The only door to GitHub's REST API: the four calls gradgate makes (list, create and update issue
 * comments; read a pull request), over `fetch`, against GITHUB_API_URL (tests point it at a local
 * server). Every failure becomes an ApiError with a kind the caller can act on: `forbidden` (a read-only
 * token, as on pull requests from forks), `rate-limited` (waited for once when the wait is short),
 * `invalid` (422), `not-found`, `server`, `network`. Nothing here decides a verdict.
 */
class ApiError extends Error {
    kind;
    status;
    retryAfter;
    name = "ApiError";
    constructor(message, kind, status, 
    /** Seconds until the rate limit resets, when GitHub said. */
    retryAfter = null) {
        super(message);
        this.kind = kind;
        this.status = status;
        this.retryAfter = retryAfter;
    }
}
/** Most comments read when looking for gradgate's own (pages of 100). */
const MAX_PAGES = 30;
class GitHubApi {
    options;
    base;
    constructor(options) {
        this.options = options;
        this.base = options.baseUrl.replace(/\/+$/, "");
    }
    /** Comments of an issue or pull request, oldest first. */
    async listComments(owner, repo, issue) {
        const out = [];
        for (let page = 1; page <= MAX_PAGES; page++) {
            const data = await this.call("GET", `/repos/${seg(owner)}/${seg(repo)}/issues/${issue}/comments?per_page=100&page=${page}`);
            if (!Array.isArray(data))
                throw new ApiError("GitHub API: the comment list is not a list", "server", 200);
            out.push(...data.map(toComment));
            if (data.length < 100)
                break;
        }
        return out;
    }
    async createComment(owner, repo, issue, body) {
        return toComment(await this.call("POST", `/repos/${seg(owner)}/${seg(repo)}/issues/${issue}/comments`, { body }));
    }
    async updateComment(owner, repo, id, body) {
        return toComment(await this.call("PATCH", `/repos/${seg(owner)}/${seg(repo)}/issues/comments/${id}`, { body }));
    }
    /** The head commit of a pull request. */
    async pullRequestHead(owner, repo, pull) {
        const data = (await this.call("GET", `/repos/${seg(owner)}/${seg(repo)}/pulls/${pull}`));
        return typeof data?.head?.sha === "string" ? data.head.sha : "";
    }
    async call(method, path, body, retried = false) {
        let res;
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
        }
        catch (err) {
            const cause = err.cause?.code ?? err.name;
            throw new ApiError(`GitHub API ${method} ${stripQuery(path)}: no answer (${cause})`, "network", null);
        }
        const text = await res.text();
        let data = null;
        try {
            data = text === "" ? null : JSON.parse(text);
        }
        catch {
            data = null;
        }
        if (res.ok)
            return data;
        const message = typeof data?.message === "string"
            ? data.message
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
        const kind = res.status === 401 || res.status === 403
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
function rateLimitWait(res, message) {
    const limited = res.status === 429 ||
        (res.status === 403 && (res.headers.get("x-ratelimit-remaining") === "0" || /rate limit/i.test(message)));
    if (!limited)
        return null;
    const after = res.headers.get("retry-after");
    if (after !== null && /^\d+$/.test(after))
        return Number(after);
    const reset = res.headers.get("x-ratelimit-reset");
    if (reset !== null && /^\d+$/.test(reset))
        return Math.max(0, Number(reset) - Math.floor(Date.now() / 1000));
    return 60;
}
function toComment(raw) {
    const c = (raw ?? {});
    const user = (c.user ?? {});
    if (!Number.isInteger(c.id))
        throw new ApiError("GitHub API: a comment without an id", "server", 200);
    return {
        id: c.id,
        body: typeof c.body === "string" ? c.body : "",
        htmlUrl: typeof c.html_url === "string" ? c.html_url : "",
        author: typeof user.login === "string" ? user.login : "",
        authorType: typeof user.type === "string" ? user.type : "",
    };
}
function seg(s) {
    return encodeURIComponent(s);
}
function stripQuery(path) {
    return path.replace(/\?.*$/, "");
}

// EXTERNAL MODULE: ./build/package/report/html.js + 1 modules
var html = __webpack_require__(5013);
// EXTERNAL MODULE: ./build/package/report/markdown.js + 1 modules
var markdown = __webpack_require__(902);
;// CONCATENATED MODULE: ./build/package/action/comment.js
/**
 * One pull-request comment per workflow (and comment key), found again by its hidden marker and updated
 * in place, so a pull request never collects a comment per push.
 */



/** The marker of the comment of `workflow` (and `key`): a hash, so no name reaches the HTML comment. */
function markerFor(workflow, key) {
    const id = (0,external_node_crypto_.createHash)("sha256").update(`${workflow}\n${key}`).digest("hex").slice(0, 16);
    return (0,markdown/* commentMarker */.Ql)(id);
}
/**
 * Updates the comment that starts with `marker`, or creates one. When several carry the marker (someone
 * copied it), the oldest one written by a bot account is taken, else the oldest.
 */
async function upsertComment(api, repo, issue, marker, body) {
    const ours = (await api.listComments(repo.owner, repo.repo, issue)).filter((c) => c.body.startsWith(marker));
    const existing = ours.find((c) => c.authorType === "Bot") ?? ours[0];
    if (existing) {
        try {
            const c = await api.updateComment(repo.owner, repo.repo, existing.id, body);
            return { action: "updated", url: c.htmlUrl, id: c.id };
        }
        catch (err) {
            // Deleted between the listing and the update: write a new one.
            if (!(err instanceof ApiError && err.kind === "not-found"))
                throw err;
        }
    }
    const c = await api.createComment(repo.owner, repo.repo, issue, body);
    return { action: "created", url: c.htmlUrl, id: c.id };
}

// EXTERNAL MODULE: ./build/package/runner/shard.js
var runner_shard = __webpack_require__(862);
;// CONCATENATED MODULE: ./build/package/action/settings.js
/**
 * The Action's inputs and outputs: their names (the only place they are spelled), their defaults (kept
 * equal to action.yml by tests/action/action-yml.test.ts, which also checks the table in
 * docs/workflows.md), and the one function that turns the INPUT_* environment into a typed settings
 * object. Every resolved value is logged at debug level, except the token.
 */


const MODES = ["gate", "rebaseline", "merge", "publish"];
/** Input names (constants, so no name is spelled twice). */
const INPUT = {
    mode: "mode",
    config: "config",
    baselines: "baselines",
    workers: "workers",
    shard: "shard",
    shardResults: "shard-results",
    resultsFile: "results-file",
    verdictFile: "verdict-file",
    reportFile: "report-file",
    reason: "reason",
    allowSuiteChange: "allow-suite-change",
    prComment: "pr-comment",
    commentKey: "comment-key",
    pullRequest: "pull-request",
    failJob: "fail-job",
    artifactName: "artifact-name",
    token: "token",
};
/** Every input, in the order action.yml and the docs list them. */
const INPUTS = [
    {
        name: INPUT.mode,
        default: "gate",
        description: "What to do: `gate` (run the suite, compare with the baselines, report), `rebaseline` (run the suite and write new baselines), `merge` (combine shard results, then compare and report), `publish` (report a verdict made in another job; runs no optimizer code).",
    },
    {
        name: INPUT.config,
        default: "",
        description: "Suite config file. Empty: `gradgate.yml` in the working directory, else the built-in default suite.",
    },
    {
        name: INPUT.baselines,
        default: "baselines",
        description: "Directory of the baseline files and the audit log.",
    },
    {
        name: INPUT.workers,
        default: "auto",
        description: "Worker threads for the runs: a positive integer, or `auto` (the machine's cores, at most 8).",
    },
    {
        name: INPUT.shard,
        default: "",
        description: "`gate` mode: run only shard `i/n` of the runs (e.g. `2/4`, one matrix job per shard) and write its results; a `merge` job compares and reports.",
    },
    {
        name: INPUT.shardResults,
        default: ".gradgate/shards",
        description: "`merge` mode: shard results files, or directories holding them, one per line.",
    },
    {
        name: INPUT.resultsFile,
        default: ".gradgate/results.json",
        description: "Results document: written by `gate`, `rebaseline` and `merge`; read by `publish` (for the charts).",
    },
    {
        name: INPUT.verdictFile,
        default: ".gradgate/verdict.json",
        description: "Verdict document: written by `gate` and `merge`; read by `publish`.",
    },
    {
        name: INPUT.reportFile,
        default: ".gradgate/report.html",
        description: "Self-contained HTML report with charts, written by `gate`, `merge` and `publish`.",
    },
    {
        name: INPUT.reason,
        default: "",
        description: "`rebaseline` mode: why the baselines change (kept in the audit log). Empty on a release: the release's tag and name.",
    },
    {
        name: INPUT.allowSuiteChange,
        default: "false",
        description: "`rebaseline` mode: accept results of a changed suite definition (replaces the whole baseline set).",
    },
    {
        name: INPUT.prComment,
        default: "true",
        description: "Post the report as a pull-request comment, updated in place on later pushes (needs `pull-requests: write`).",
    },
    {
        name: INPUT.commentKey,
        default: "",
        description: "Tells apart the comments of several gradgate jobs in one workflow (one comment per workflow and key).",
    },
    {
        name: INPUT.pullRequest,
        default: "",
        description: "`publish` mode: pull-request number. Empty: read from `pull-request.json` beside the verdict file (written by `gate`).",
    },
    {
        name: INPUT.failJob,
        default: "true",
        description: "`gate` and `merge` modes: fail the step when the gate fails.",
    },
    {
        name: INPUT.artifactName,
        default: "gradgate-report",
        description: "Name under which the workflow uploads the reports (only used to point readers to it).",
    },
    {
        name: INPUT.token,
        default: "${{ github.token }}",
        description: "Token for the pull-request comment. Never passed to the optimizer under test.",
    },
];
/** Output names. */
const OUTPUT = {
    verdict: "verdict",
    cases: "cases",
    regressed: "regressed",
    counts: "counts",
    resultsFile: "results-file",
    verdictFile: "verdict-file",
    reportFile: "report-file",
    commentUrl: "comment-url",
    baselinesChanged: "baselines-changed",
};
/** Every output with its description, in the order action.yml and the docs list them. */
const OUTPUTS = [
    {
        name: OUTPUT.verdict,
        description: "Gate verdict: `pass` or `fail` (empty when nothing was judged: a shard run or `rebaseline`).",
    },
    { name: OUTPUT.cases, description: "Number of cases judged." },
    { name: OUTPUT.regressed, description: "Number of regressed cases." },
    {
        name: OUTPUT.counts,
        description: 'Cases per verdict as JSON, e.g. `{"regressed":1,"unchanged":11,...}`.',
    },
    { name: OUTPUT.resultsFile, description: "Path of the results document written or read." },
    { name: OUTPUT.verdictFile, description: "Path of the verdict document written or read." },
    { name: OUTPUT.reportFile, description: "Path of the HTML report." },
    {
        name: OUTPUT.commentUrl,
        description: "URL of the pull-request comment created or updated (empty when none).",
    },
    {
        name: OUTPUT.baselinesChanged,
        description: "`rebaseline` mode: `true` when baseline files were written.",
    },
];
const DEFAULTS = new Map(INPUTS.map((i) => [i.name, i.default]));
/**
 * The value of an input as the runner passes it: INPUT_<NAME> with the name upper-cased and spaces
 * replaced by underscores (hyphens stay), trimmed. An empty or missing value takes the default of
 * action.yml, except where the default is an expression the runner evaluates (the token).
 */
function inputValue(env, name) {
    const raw = env[`INPUT_${name.replace(/ /g, "_").toUpperCase()}`];
    const value = (raw ?? "").trim();
    if (value !== "")
        return value;
    const fallback = DEFAULTS.get(name) ?? "";
    return fallback.startsWith("${{") ? "" : fallback;
}
/** Reads and checks every input; `debug` receives one line per resolved value. */
function readSettings(env, debug = () => { }) {
    const get = (name) => inputValue(env, name);
    const mode = get(INPUT.mode);
    if (!MODES.includes(mode)) {
        throw new errors/* InputError */.d(`input ${INPUT.mode} must be one of ${MODES.join(", ")}, got ${(0,errors/* quote */.h)(mode)}`);
    }
    const workersText = get(INPUT.workers);
    let workers;
    if (workersText !== "auto") {
        if (!/^\d+$/.test(workersText) || Number(workersText) < 1) {
            throw new errors/* InputError */.d(`input ${INPUT.workers} must be a positive integer or "auto", got ${(0,errors/* quote */.h)(workersText)}`);
        }
        workers = Number(workersText);
    }
    const shardText = get(INPUT.shard);
    const shard = shardText === "" ? undefined : (0,runner_shard/* parseShard */.uK)(shardText, `input ${INPUT.shard}`);
    if (shard && mode !== "gate") {
        throw new errors/* InputError */.d(`input ${INPUT.shard} is for mode "gate" (one shard of the runs), got mode ${(0,errors/* quote */.h)(mode)}`);
    }
    const prText = get(INPUT.pullRequest);
    let pullRequest;
    if (prText !== "") {
        if (!/^[1-9]\d{0,9}$/.test(prText)) {
            throw new errors/* InputError */.d(`input ${INPUT.pullRequest} must be a pull-request number, got ${(0,errors/* quote */.h)(prText)}`);
        }
        pullRequest = Number(prText);
    }
    const commentKey = get(INPUT.commentKey);
    const settings = {
        mode: mode,
        config: get(INPUT.config) || undefined,
        baselines: nonEmpty(get(INPUT.baselines), INPUT.baselines),
        workers,
        shard,
        shardResults: get(INPUT.shardResults)
            .split(/\r?\n/)
            .map((s) => s.trim())
            .filter((s) => s !== ""),
        resultsFile: nonEmpty(get(INPUT.resultsFile), INPUT.resultsFile),
        verdictFile: nonEmpty(get(INPUT.verdictFile), INPUT.verdictFile),
        reportFile: nonEmpty(get(INPUT.reportFile), INPUT.reportFile),
        reason: get(INPUT.reason),
        allowSuiteChange: bool(get(INPUT.allowSuiteChange), INPUT.allowSuiteChange),
        prComment: bool(get(INPUT.prComment), INPUT.prComment),
        commentKey,
        pullRequest,
        failJob: bool(get(INPUT.failJob), INPUT.failJob),
        artifactName: get(INPUT.artifactName),
        token: get(INPUT.token),
    };
    if (settings.mode === "merge" && settings.shardResults.length === 0) {
        throw new errors/* InputError */.d(`input ${INPUT.shardResults} must name the shard results (files or directories) in mode "merge"`);
    }
    for (const [key, value] of Object.entries(settings)) {
        const shown = key === "token"
            ? value
                ? "(set, not shown)"
                : "(empty)"
            : value === undefined
                ? "(default)"
                : JSON.stringify(value);
        debug(`gradgate setting ${key} = ${shown}`);
    }
    return settings;
}
/** YAML 1.2 core schema booleans, as the runner's own boolean inputs accept them. */
function bool(text, name) {
    if (/^(true|True|TRUE)$/.test(text))
        return true;
    if (/^(false|False|FALSE)$/.test(text))
        return false;
    throw new errors/* InputError */.d(`input ${name} must be true or false, got ${(0,errors/* quote */.h)(text)}`);
}
function nonEmpty(text, name) {
    if (text === "")
        throw new errors/* InputError */.d(`input ${name} must not be empty`);
    return text;
}

;// CONCATENATED MODULE: ./build/package/action/report-step.js
/**
 * Telling the world about a verdict, in an order that keeps the verdict independent of GitHub's API:
 * outputs, the HTML report, error annotations and the job summary first (local files only), and the
 * pull-request comment last, whose failure (read-only token, rate limit, refusal) is a warning with the
 * reason, never a change of verdict.
 */







/** Most error annotations per step (GitHub shows ten per step). */
const MAX_ANNOTATIONS = 10;
async function reportVerdict(host, settings, context, cwd, report) {
    const v = report.verdict;
    host.setOutput(OUTPUT.verdict, v.gate.verdict);
    host.setOutput(OUTPUT.cases, String(v.cases.length));
    host.setOutput(OUTPUT.regressed, String(v.counts.regressed));
    host.setOutput(OUTPUT.counts, JSON.stringify(v.counts));
    host.setOutput(OUTPUT.verdictFile, settings.verdictFile);
    host.setOutput(OUTPUT.commentUrl, "");
    const input = {
        verdict: v,
        candidate: report.candidate,
        baseline: report.baseline,
        notes: report.notes,
        links: { run: report.runUrl, artifact: settings.artifactName || undefined },
    };
    (0,files/* writeFileAtomic */.Z)((0,external_node_path_.resolve)(cwd, settings.reportFile), (0,html/* renderHtml */.K)(input));
    host.setOutput(OUTPUT.reportFile, settings.reportFile);
    host.info(`gradgate: HTML report written to ${settings.reportFile}`);
    const failing = v.cases.filter((c) => c.failsGate);
    for (const c of failing.slice(0, MAX_ANNOTATIONS)) {
        const why = c.reasons.map((r) => r.message).join("; ") || c.verdict;
        host.annotate(`${c.verdict}: ${why}`, `gradgate: ${c.id}`);
    }
    if (failing.length > MAX_ANNOTATIONS) {
        host.annotate(`${failing.length - MAX_ANNOTATIONS} more failing cases; see the job summary`, "gradgate: more failing cases");
    }
    try {
        await host.appendSummary((0,markdown/* renderMarkdown */.Gc)(input, { target: "summary" }));
    }
    catch (err) {
        host.warning(`gradgate could not write the job summary: ${err.message}`);
    }
    if (!settings.prComment || report.pullRequest === null)
        return;
    if (report.noComment) {
        host.info(report.noComment);
        return;
    }
    if (context.repository === null) {
        host.warning("gradgate: GITHUB_REPOSITORY is not set; no pull-request comment");
        return;
    }
    if (settings.token === "") {
        host.warning(`gradgate: input token is empty; no pull-request comment (the verdict is in the job summary)`);
        return;
    }
    const marker = markerFor(report.commentWorkflow, settings.commentKey);
    const body = (0,markdown/* renderMarkdown */.Gc)(input, { target: "comment", marker });
    const api = new GitHubApi({ baseUrl: context.apiUrl, token: settings.token });
    try {
        const posted = await upsertComment(api, context.repository, report.pullRequest, marker, body);
        host.setOutput(OUTPUT.commentUrl, posted.url);
        host.info(`gradgate: ${posted.action} the comment on pull request #${report.pullRequest}: ${posted.url}`);
    }
    catch (err) {
        if (!(err instanceof ApiError))
            throw err;
        host.warning(commentFailure(err, report.pullRequest));
    }
}
/** One warning per kind of failure, saying what it means for the reader. */
function commentFailure(err, pr) {
    const tail = "The verdict is unaffected: it is in the job summary, the step outputs and the verdict file.";
    switch (err.kind) {
        case "forbidden":
            return (`gradgate could not write the comment on pull request #${pr}: the token may not write pull-request comments ` +
                `(${err.message}). Pull requests from forks get a read-only token; publish the comment from a workflow_run ` +
                `workflow (docs/workflows.md), or grant "pull-requests: write" for pull requests from this repository. ${tail}`);
        case "rate-limited":
            return `gradgate hit GitHub's API rate limit and left the comment on pull request #${pr} as it was (${err.message}). ${tail}`;
        case "invalid":
            return `GitHub refused the comment on pull request #${pr} (${err.message}). ${tail}`;
        default:
            return `gradgate could not reach GitHub to comment on pull request #${pr} (${err.message}). ${tail}`;
    }
}

;// CONCATENATED MODULE: ./build/package/action/modes.js
/**
 * The four modes of the Action, each a short sequence of the CLI's own commands (one engine) followed by
 * the report:
 * - gate: run the suite (or one shard of it), compare with the baselines, report;
 * - merge: combine shard results, compare, report;
 * - publish: report a verdict file made by another job (no optimizer code runs here);
 * - rebaseline: run the suite and write new baselines with an audit entry.
 *
 * Every CLI command that can load code of the repository (run; compare, with its extra-seed re-runs and
 * reference checks; rebaseline, with its extra seeds) runs in the engine process (./engine-process.ts),
 * never in this one, which holds the token. This process merges shard files, reads the documents the
 * engine wrote, reports, and talks to the GitHub API.
 */














/** The note shown when the token of a fork's pull request cannot comment. */
const FORK_NOTE = "This pull request comes from a fork, so this job's token is read-only: the verdict stays in this job summary " +
    "and in the results artifact, and a separate workflow_run workflow posts the comment without running the " +
    "pull request's code (see docs/workflows.md).";
async function runMode(m) {
    switch (m.settings.mode) {
        case "gate":
            return m.settings.shard ? shardRun(m) : gate(m);
        case "merge":
            return merge(m);
        case "publish":
            return publish(m);
        case "rebaseline":
            return rebaseline(m);
    }
}
/** Runs one CLI command in the engine process, with the token kept out of its reach. */
function engine(m, command) {
    return (0,engine_process/* runEngine */.cn)({ host: m.host, cwd: m.cwd, secrets: [m.settings.token] }, command);
}
/** The options every engine command shares: the config (when given) and the workers (unless auto). */
function suiteOptions(s) {
    return [
        ...(s.config !== undefined ? [`--config=${s.config}`] : []),
        ...(s.workers !== undefined ? [`--workers=${s.workers}`] : []),
    ];
}
async function runSuite(m, shard = m.settings.shard) {
    const { settings: s } = m;
    await m.host.group(shard ? `Run shard ${shard.index}/${shard.count} of the suite` : "Run the suite", () => engine(m, {
        argv: [
            "run",
            `--out=${s.resultsFile}`,
            ...suiteOptions(s),
            ...(shard ? [`--shard=${shard.index}/${shard.count}`] : []),
        ],
        codes: [cli_host/* EXIT */.d.ok],
        writes: s.resultsFile,
    }));
    m.host.setOutput(OUTPUT.resultsFile, s.resultsFile);
}
async function gate(m) {
    await runSuite(m);
    await judge(m);
}
async function shardRun(m) {
    await runSuite(m);
    const shard = m.settings.shard;
    m.host.setOutput(OUTPUT.verdict, "");
    await m.host.appendSummary(`### Convergence gate: shard ${shard.index}/${shard.count} ran\n\n` +
        `Results written to ${(0,report_escape/* mdCode */.xs)(m.settings.resultsFile)}; the job that merges the shards judges them.\n`);
}
async function merge(m) {
    const { settings: s } = m;
    const doc = (0,merge_command/* readAndMerge */.gY)(m.cwd, s.shardResults);
    (0,files/* writeFileAtomic */.Z)((0,external_node_path_.resolve)(m.cwd, s.resultsFile), (0,json/* canonicalJson */.d)(doc));
    m.host.info(`gradgate: merged ${doc.cases.length} cases, ${doc.suite.runs} runs into ${s.resultsFile}`);
    m.host.setOutput(OUTPUT.resultsFile, s.resultsFile);
    await judge(m);
}
/** Compare the results file with the baselines, write the verdict file, report, and fail the step if asked. */
async function judge(m) {
    const { settings: s, context, host } = m;
    const code = await host.group("Compare with the baselines", () => engine(m, {
        argv: [
            "compare",
            `--results=${s.resultsFile}`,
            `--baselines=${s.baselines}`,
            `--json=${s.verdictFile}`,
            ...suiteOptions(s),
        ],
        codes: [cli_host/* EXIT */.d.ok, cli_host/* EXIT */.d.fail],
        writes: s.verdictFile,
    }));
    const verdict = readVerdict(m.cwd, s.verdictFile);
    if ((code === cli_host/* EXIT */.d.ok) !== (verdict.gate.verdict === "pass")) {
        throw new Error(`the engine process's exit code ${code} disagrees with the gate verdict "${verdict.gate.verdict}" in ${s.verdictFile}`);
    }
    const results = readResultsDoc(m.cwd, s.resultsFile);
    const pr = context.pullRequest;
    if (pr && /^[0-9a-f]{40}$/.test(pr.headSha)) {
        // For the publishing workflow: which pull request (and commit) this verdict belongs to.
        (0,files/* writeFileAtomic */.Z)(handoffPath(m.cwd, s.verdictFile), (0,json/* canonicalJson */.d)({ number: pr.number, headSha: pr.headSha }));
    }
    await reportVerdict(host, s, context, m.cwd, {
        verdict,
        candidate: results.cases,
        baseline: readBaselineRuns(m.cwd, s.baselines),
        notes: pr?.fork ? [FORK_NOTE] : [],
        pullRequest: pr?.number ?? null,
        noComment: pr?.fork ? `gradgate: ${FORK_NOTE}` : undefined,
        commentWorkflow: context.workflow,
        runUrl: runUrl(context, context.runId),
    });
    if (verdict.gate.verdict === "fail") {
        const counts = Object.entries(verdict.counts)
            .filter(([k, n]) => n > 0 && verdict.cases.some((c) => c.verdict === k && c.failsGate))
            .map(([k, n]) => `${n} ${k}`)
            .join(", ");
        const message = `convergence gate failed${counts ? `: ${counts}` : ""} (see the job summary)`;
        if (s.failJob)
            host.fail(message);
        else
            host.warning(`${message}; the step passes because ${INPUT.failJob} is false`);
    }
}
async function publish(m) {
    const { settings: s, context, host } = m;
    const verdict = readVerdict(m.cwd, s.verdictFile);
    host.setOutput(OUTPUT.resultsFile, s.resultsFile);
    let candidate;
    if ((0,external_node_fs_.existsSync)((0,external_node_path_.resolve)(m.cwd, s.resultsFile))) {
        try {
            candidate = [...readResultsDoc(m.cwd, s.resultsFile).cases];
        }
        catch (err) {
            if (!(err instanceof errors/* InputError */.d))
                throw err;
            host.warning(`gradgate: charts left out: ${err.message}`);
        }
    }
    let baseline;
    try {
        baseline = readBaselineRuns(m.cwd, s.baselines);
    }
    catch (err) {
        if (!(err instanceof errors/* InputError */.d))
            throw err;
        host.warning(`gradgate: baseline curves left out: ${err.message}`);
    }
    const run = context.workflowRun;
    const handoffFile = handoffPath(m.cwd, s.verdictFile);
    const handoff = (0,external_node_fs_.existsSync)(handoffFile)
        ? readHandoff(handoffFile, "pull-request.json")
        : null;
    const number = s.pullRequest ?? handoff?.number ?? run?.pullRequests[0] ?? null;
    const notes = [
        `Published by a separate workflow from the verdict file of ${run ? `run ${run.id}` : "another job"}; no code from the pull request ran here.`,
    ];
    let noComment;
    const expectedHead = run?.headSha || handoff?.headSha || "";
    if (number !== null && s.prComment && s.token !== "" && context.repository && expectedHead) {
        // The artifact names the pull request; make sure it is the one whose commit was judged.
        try {
            const head = await new GitHubApi({ baseUrl: context.apiUrl, token: s.token }).pullRequestHead(context.repository.owner, context.repository.repo, number);
            if (head !== expectedHead) {
                noComment =
                    `gradgate: not commenting on pull request #${number}: its head is ${head.slice(0, 12) || "unknown"} but the ` +
                        `verdict was made for ${expectedHead.slice(0, 12)} (a newer push will publish its own verdict)`;
            }
        }
        catch (err) {
            if (!(err instanceof ApiError))
                throw err;
            noComment = `gradgate: not commenting: could not read pull request #${number} (${err.message})`;
        }
    }
    await reportVerdict(host, s, context, m.cwd, {
        verdict,
        candidate,
        baseline,
        notes,
        pullRequest: noComment ? null : number,
        commentWorkflow: run?.name || context.workflow,
        runUrl: runUrl(context, run ? String(run.id) : context.runId),
    });
    if (noComment)
        host.warning(noComment);
}
async function rebaseline(m) {
    const { settings: s, context, host } = m;
    let reason = s.reason;
    if (reason === "" && context.release) {
        const { tag, name } = context.release;
        reason = `release ${tag}${name && name !== tag ? `: ${name}` : ""}`;
    }
    if (reason === "") {
        throw new errors/* InputError */.d(`input ${INPUT.reason} is required in mode "rebaseline" outside a release: say why the baselines change, ` +
            `e.g. "adam: fix bias correction (#123)"`);
    }
    await runSuite(m, undefined);
    const before = (0,store/* readAuditLog */.Ob)((0,external_node_path_.resolve)(m.cwd, s.baselines), s.baselines).length;
    await host.group("Write the baselines", () => engine(m, {
        argv: [
            "rebaseline",
            `--results=${s.resultsFile}`,
            `--reason=${reason}`,
            `--baselines=${s.baselines}`,
            ...(/^[0-9a-f]{40}$/.test(context.sha) ? [`--commit=${context.sha}`] : []),
            ...(s.allowSuiteChange ? ["--allow-suite-change"] : []),
            ...suiteOptions(s),
        ],
        codes: [cli_host/* EXIT */.d.ok],
    }));
    const log = (0,store/* readAuditLog */.Ob)((0,external_node_path_.resolve)(m.cwd, s.baselines), s.baselines);
    const entry = log.length > before ? log[log.length - 1] : null;
    host.setOutput(OUTPUT.baselinesChanged, String(entry !== null));
    host.setOutput(OUTPUT.verdict, "");
    const lines = [`### Baselines refreshed`, "", `Reason: ${(0,report_escape/* mdText */.bC)(reason, 300)}`, ""];
    if (entry) {
        const tally = new Map();
        for (const c of entry.cases)
            tally.set(c.verdict, (tally.get(c.verdict) ?? 0) + 1);
        lines.push(`Files written: ${entry.files.map((f) => (0,report_escape/* mdCode */.xs)(`${s.baselines}/${f.file}`)).join(", ") || "none"}` +
            (entry.removed.length ? `; removed: ${entry.removed.map((f) => (0,report_escape/* mdCode */.xs)(f)).join(", ")}` : ""), "", `Against the previous baselines: ${[...tally].map(([k, n]) => `${n} ${(0,report_escape/* mdText */.bC)(k, 20)}`).join(" · ") || "no cases"}` +
            `${entry.suiteChanged ? " (the suite definition changed)" : ""}.`, "", `The audit entry is the last line of ${(0,report_escape/* mdCode */.xs)(`${s.baselines}/audit.jsonl`)}.`);
    }
    await host.appendSummary(lines.join("\n") + "\n");
}
function runUrl(context, id) {
    if (!context.repository || !/^\d+$/.test(id))
        return undefined;
    return `${context.serverUrl}/${context.repository.owner}/${context.repository.repo}/actions/runs/${id}`;
}

;// CONCATENATED MODULE: ./build/package/action/run.js
/**
 * The Action's `run()`: read the inputs and the workflow context, keep the token out of reach of the
 * optimizer under test, run the mode, and turn anything thrown (Error or not) into one failure message.
 * No side effects on import: tests import it and call it with their own INPUT_* environment.
 *
 * The token is read here, into the settings, and stays in this process: optimizer code runs only in the
 * engine process (./engine-process.ts), whose environment, arguments and files never carry it. The
 * credential variables are also removed from this process's environment once read (defence in depth:
 * nothing started from here inherits them by accident).
 */







async function run(host = coreHost()) {
    try {
        const settings = readSettings(process.env, (line) => host.debug(line));
        for (const name of engine_env/* CREDENTIAL_VARIABLES */.eB)
            delete process.env[name];
        const context = readContext(process.env);
        host.debug(`gradgate context: event ${context.eventName || "(none)"}, repository ${context.repository ? `${context.repository.owner}/${context.repository.repo}` : "(none)"}, pull request ${context.pullRequest ? `#${context.pullRequest.number}${context.pullRequest.fork ? " (fork)" : ""}` : "(none)"}`);
        await runMode({ host, settings, context, cwd: process.cwd() });
    }
    catch (err) {
        host.fail(failureMessage(err));
    }
}
/** One line for people: input errors and the engine process's failures as they are, anything else marked as a gradgate bug with its stack. */
function failureMessage(err) {
    if (err instanceof errors/* InputError */.d || err instanceof engine_process/* EngineFailure */.F7)
        return `gradgate: ${err.message}`;
    if (err instanceof Error)
        return `gradgate: internal error (please report): ${err.stack ?? err.message}`;
    return `gradgate: internal error (please report): ${String(err)}`;
}


/***/ })

};
