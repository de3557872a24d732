/**
 * A process adapter session: one optimizer process (restarted when it dies) serving many runs at once.
 *
 * Each turn the harness sends one `orders` message — new runs to start, the loss and gradient for every
 * evaluation asked for in the last report, paused runs to resume, states to export, runs that are over
 * — and reads one `report` with the next evaluation requests and step boundaries of all its runs. Up to
 * `maxRuns` runs are in flight; a finished run's slot goes to the next queued run in the next turn, so
 * the traffic (and everything else) depends only on the requests, never on timing.
 *
 * Containment. Faults of one run end that run only, with a reason naming the report, the field, the
 * run and the bad value: a vector of the wrong length, NaN or Infinity in a point, a failure raised by
 * the optimizer code, an entry out of order. Faults of the process end every run in flight, with the
 * reason and the tail of the process's stderr: a crash, no report within the message time-out, a line
 * that is not JSON (anything a program prints to stdout by mistake), a message that is not a protocol
 * report, a line over `maxMessageBytes`. The process is then stopped and a fresh one serves the runs
 * still queued. Nothing a client does makes `run` throw. A run still going after the run time-out
 * ends with an error at the next report.
 */
import { existsSync } from "node:fs";
import { Ajv2020 } from "ajv/dist/2020.js";
import type { ErrorObject, ValidateFunction } from "ajv";
import { TOOL_NAME, TOOL_VERSION } from "../core/version.js";
import type { ProcessAdapterSpec, RunMetrics } from "../runner/types.js";
import { ChildFault, ChildLink, quoteLine } from "./child.js";
import { minimalEnvironment } from "./env.js";
import { ProtocolRun, type RunRequest } from "./process-run.js";
import {
  PROTOCOL_VERSIONS,
  type ReadyMessage,
  type ReportMessage,
  type ResumeEntry,
  type StartEntry,
} from "./protocol.js";
import { readySchema, reportSchema } from "./protocol-schema.js";

/** Settings of one process adapter (config `adapters.NAME`, `cwd` absolute). */
export type ProcessAdapterSettings = ProcessAdapterSpec;

type Run = ProtocolRun;

export interface SessionOptions {
  /** Where allow-listed variables are copied from; default process.env. */
  readonly parentEnv?: Readonly<Record<string, string | undefined>>;
  /** Clock in milliseconds (budgets and run time-outs); default performance.now. */
  readonly now?: () => number;
  /** Sees every protocol line, harness → client ("out") and client → harness ("in"): for tracing and tests. */
  readonly onLine?: (direction: "out" | "in", line: string) => void;
}

let validators: { ready: ValidateFunction; report: ValidateFunction } | null = null;
function getValidators() {
  if (validators === null) {
    const ajv = new Ajv2020({ allErrors: true, strict: true, allowUnionTypes: true });
    validators = { ready: ajv.compile(readySchema), report: ajv.compile(reportSchema) };
  }
  return validators;
}

/** Marker that replaces a bare NaN/Infinity token so the rest of a line can still be read. */
const NON_FINITE = "\u0000non-finite:";

const SECTIONS = ["steps", "evals", "states", "failed"] as const;
type Section = (typeof SECTIONS)[number];

export class ProcessSession {
  private link: ChildLink | null = null;
  private readyMessage: ReadyMessage | null = null;
  private nextClientId = 0;
  private reports = 0;
  private queue: Promise<unknown> = Promise.resolve();
  private readonly now: () => number;
  /** Runs ended in the last report of the previous `run` call, named in the next orders' `end`. */
  private ends: number[] = [];
  private readonly label: string;

  constructor(
    readonly settings: ProcessAdapterSettings,
    private readonly options: SessionOptions = {},
  ) {
    this.now = options.now ?? (() => performance.now());
    this.label = `adapter ${JSON.stringify(settings.name)}`;
  }

  /** The handshake: starts the process if needed and returns what it serves. Throws a `ChildFault`. */
  describe(): Promise<ReadyMessage> {
    return this.exclusive(() => this.ensureStarted());
  }

  /** Runs every request; resolves with their metrics in request order. Never rejects for client faults. */
  run(requests: readonly RunRequest[]): Promise<RunMetrics[]> {
    return this.exclusive(() => this.runAll(requests));
  }

  /** Says bye and waits for the process to exit (killing it after a grace period). */
  close(): Promise<void> {
    return this.exclusive(async () => {
      const link = this.link;
      this.link = null;
      if (link !== null) {
        const bye = JSON.stringify({ type: "bye" });
        if (link.alive) this.options.onLine?.("out", bye);
        await link.close(bye);
      }
    });
  }

  /** Process id of the current child (tests). */
  get pid(): number | undefined {
    return this.link?.pid;
  }

  /** The tail of the current (or last) child's stderr. */
  stderrTail(): string {
    return this.link?.stderrTail() ?? "";
  }

  private exclusive<T>(task: () => Promise<T>): Promise<T> {
    const result = this.queue.then(task, task);
    this.queue = result.catch(() => {});
    return result;
  }

  private async ensureStarted(): Promise<ReadyMessage> {
    if (this.link !== null && this.link.alive && this.readyMessage !== null) return this.readyMessage;
    if (this.link !== null) this.link.kill();
    const s = this.settings;
    if (!existsSync(s.cwd)) {
      throw new ChildFault(
        `${this.label}: the working directory ${quoteLine(s.cwd)} does not exist (adapters.${s.name}.cwd)`,
      );
    }
    const link = new ChildLink({
      command: s.command,
      cwd: s.cwd,
      env: minimalEnvironment(this.options.parentEnv ?? process.env, s.env),
      maxLineBytes: s.maxMessageBytes,
      label: this.label,
    });
    this.link = link;
    this.readyMessage = null;
    this.ends = [];
    this.reports = 0;
    const hello = {
      type: "hello",
      protocols: [...PROTOCOL_VERSIONS],
      harness: `${TOOL_NAME} ${TOOL_VERSION}`,
    };
    let line: string;
    try {
      line = await this.exchange(link, JSON.stringify(hello), s.timeouts.start, "ready message (handshake)");
    } catch (err) {
      throw this.withStderr(err as ChildFault, link);
    }
    const fail = (why: string) => {
      link.kill();
      return this.withStderr(new ChildFault(`${this.label}: handshake failed: ${why}`), link);
    };
    let message: unknown;
    try {
      message = JSON.parse(line);
    } catch {
      throw fail(`the first line is not JSON: ${quoteLine(line)}`);
    }
    const { ready } = getValidators();
    if (!ready(message))
      throw fail(`the first line is not a ready message (${ajvText(ready.errors)}): ${quoteLine(line)}`);
    const msg = message as ReadyMessage;
    if (!(PROTOCOL_VERSIONS as readonly number[]).includes(msg.protocol)) {
      throw fail(
        `protocol ${msg.protocol} is not spoken here (harness speaks ${PROTOCOL_VERSIONS.join(", ")})`,
      );
    }
    const names = new Set<string>();
    for (const o of msg.optimizers) {
      if (names.has(o.name)) throw fail(`optimizer ${JSON.stringify(o.name)} is listed twice`);
      names.add(o.name);
    }
    this.readyMessage = msg;
    return msg;
  }

  private async exchange(link: ChildLink, out: string, seconds: number, waitingFor: string): Promise<string> {
    const tap = this.options.onLine;
    if (tap === undefined) return link.exchange(out, seconds, waitingFor);
    tap("out", out);
    const line = await link.exchange(out, seconds, waitingFor);
    tap("in", line);
    return line;
  }

  private withStderr(fault: ChildFault, link: ChildLink | null = this.link): ChildFault {
    const tail = link?.stderrTail() ?? "";
    return tail === "" ? fault : new ChildFault(`${fault.reason}\nstderr (last lines):\n${tail}`);
  }

  private async runAll(requests: readonly RunRequest[]): Promise<RunMetrics[]> {
    const results: RunMetrics[] = new Array(requests.length);
    const index = new Map<Run, number>();
    const settle = (run: Run) => {
      results[index.get(run)!] = run.metrics!;
    };
    // Two lanes when there is room: the client works on one lane's orders while the harness works on
    // the other's report. Each lane is strictly request/reply; the client answers orders in the order
    // received, so the sequence of messages (and every decision) does not depend on timing.
    const max = this.settings.maxRuns;
    const lanes: Lane[] = (max >= 2 ? [Math.ceil(max / 2), Math.floor(max / 2)] : [max]).map((capacity) => ({
      capacity,
      active: new Map<number, Run>(),
      turn: new Turn([]),
    }));
    lanes[0].turn.end.push(...this.ends);
    this.ends = [];
    let next = 0;
    const inFlight = () => lanes.reduce((n, lane) => n + lane.active.size, 0);
    const fill = (lane: Lane) => {
      while (lane.active.size < lane.capacity && next < requests.length) {
        const run = new ProtocolRun(requests[next], this.now);
        index.set(run, next++);
        if (run.begin() !== null) {
          settle(run);
          continue;
        }
        const id = this.nextClientId++;
        lane.turn.start.push(run.startEntry(id));
        lane.turn.served.add(id);
        lane.active.set(id, run);
      }
    };

    while (next < requests.length || inFlight() > 0) {
      if (inFlight() === 0 && (this.link === null || !this.link.alive || this.readyMessage === null)) {
        try {
          await this.ensureStarted();
        } catch (err) {
          const reason = err instanceof ChildFault ? err.reason : String(err);
          for (; next < requests.length; next++) {
            const run = new ProtocolRun(requests[next], this.now);
            index.set(run, next);
            if (run.begin() === null) run.fail(reason);
            settle(run);
          }
          break;
        }
        for (const lane of lanes) lane.turn = new Turn([]);
      }
      const link = this.link!;
      const waiting: Lane[] = [];
      const send = (lane: Lane) => {
        fill(lane);
        if (lane.active.size === 0) return;
        const text = lane.turn.message(lane.active);
        this.options.onLine?.("out", text);
        link.send(text);
        waiting.push(lane);
      };
      lanes.forEach(send);
      let fault: string | null = null;
      while (waiting.length > 0) {
        const lane = waiting.shift()!;
        let line: string;
        try {
          line = await link.next(this.settings.timeouts.message, "report");
        } catch (err) {
          fault = this.withStderr(err as ChildFault, link).reason;
          break;
        }
        this.options.onLine?.("in", line);
        this.reports++;
        const following = new Turn([]);
        const processFault = this.processReport(line, lane.turn, following, lane.active, settle);
        if (processFault !== null) {
          link.kill();
          fault = this.withStderr(new ChildFault(processFault), link).reason;
          break;
        }
        lane.turn = following;
        send(lane);
      }
      if (fault !== null) {
        for (const lane of lanes) {
          this.faultAll(lane.active, fault, settle);
          lane.turn = new Turn([]);
        }
      }
    }
    // Runs ended in the last reports are still known to the client: name them in the next orders.
    for (const lane of lanes) this.ends.push(...lane.turn.end);
    return results;
  }

  private faultAll(active: Map<number, Run>, reason: string, settle: (run: Run) => void): void {
    for (const run of active.values()) {
      run.fail(reason);
      settle(run);
    }
    active.clear();
  }

  /**
   * Applies one report to the runs and assembles the next orders in `next`. Run-level faults end single
   * runs; returns the reason of a fault that concerns the whole process (the caller then stops it).
   */
  private processReport(
    line: string,
    turn: Turn,
    next: Turn,
    active: Map<number, Run>,
    settle: (run: Run) => void,
  ): string | null {
    const where = `${this.label}: report ${this.reports}`;
    let data: unknown;
    try {
      data = JSON.parse(line);
    } catch {
      data = parseWithNonFinite(line);
      if (data === undefined) {
        return `${where} is not JSON (stdout must carry protocol messages only; write diagnostics to stderr): ${quoteLine(line)}`;
      }
    }
    if (
      data === null ||
      typeof data !== "object" ||
      Array.isArray(data) ||
      (data as { type?: unknown }).type !== "report"
    ) {
      return `${where} is not a protocol report (expected a JSON object with "type": "report"): ${quoteLine(line)}`;
    }
    const report = data as Record<string, unknown>;
    const endRun = (id: number, reason: string) => {
      const run = active.get(id);
      if (run !== undefined && run.status !== "ended") run.fail(reason);
    };
    const isOver = (id: number) => active.get(id)!.status === "ended";

    // Schema check; an error inside one entry ends that entry's run only.
    const { report: validate } = getValidators();
    if (!validate(report)) {
      const bad = new Map<Section, Set<number>>();
      for (const e of validate.errors ?? []) {
        const m = /^\/(steps|evals|states|failed)\/(\d+)(.*)$/.exec(e.instancePath);
        const section = m?.[1] as Section | undefined;
        const list = section !== undefined ? report[section] : undefined;
        const entry =
          Array.isArray(list) && m ? (list[Number(m[2])] as { run?: unknown } | undefined) : undefined;
        const id = entry?.run;
        if (m === null || section === undefined || typeof id !== "number" || !active.has(id)) {
          return `${where} is not a valid report: ${e.instancePath || "the message"} ${e.message}: ${quoteLine(line)}`;
        }
        const path = `${section}[${m[2]}]${jsonPointerToPath(m[3])}`;
        const value = valueAt(entry, m[3]);
        const detail =
          typeof value === "string" && value.startsWith(NON_FINITE)
            ? `is ${value.slice(NON_FINITE.length)}, which JSON cannot carry (send null for a point that is not finite)`
            : `${e.message}, got ${quoteLine(JSON.stringify(value) ?? "nothing")}`;
        endRun(id, `${where}: ${path} of run ${id} ${detail}`);
        let set = bad.get(section);
        if (set === undefined) bad.set(section, (set = new Set()));
        set.add(Number(m[2]));
      }
      for (const [section, indices] of bad) {
        const kept = (report[section] as unknown[]).filter((_, i) => !indices.has(i));
        (report as Record<string, unknown>)[section] = kept;
      }
    }
    const msg = report as unknown as ReportMessage;

    // Every id must be a run in flight; anything else is a client bug that confuses all runs.
    for (const section of SECTIONS) {
      for (const entry of (msg[section] ?? []) as readonly { run: number }[]) {
        if (!active.has(entry.run)) {
          return `${where}: ${section} names run ${entry.run}, which is not in flight: ${quoteLine(line)}`;
        }
      }
    }

    const addressed = new Set<number>();
    const stepped = new Set<number>();
    const evaluated = new Set<number>();

    (msg.steps ?? []).forEach((entry, i) => {
      const id = entry.run;
      addressed.add(id);
      if (isOver(id)) return;
      const run = active.get(id)!;
      if (stepped.has(id))
        return endRun(id, `${where}: steps[${i}] is a second step of run ${id} in one report`);
      stepped.add(id);
      if (!turn.served.has(id)) {
        return endRun(
          id,
          `${where}: steps[${i}] reports a step of run ${id}, which is paused after step ${run.k}`,
        );
      }
      if (entry.x !== null && entry.x.length !== run.dim) {
        return endRun(
          id,
          `${where}: steps[${i}].x of run ${id} has ${entry.x.length} numbers, expected ${run.dim}`,
        );
      }
      const status = run.onStep(entry.x);
      if (entry.eval === true && status !== "ended") {
        if (status === "paused") {
          return endRun(
            id,
            `${where}: steps[${i}] of run ${id} asks for an evaluation after pausing at step ${run.k}`,
          );
        }
        evaluated.add(id);
        const values = run.onEval("iterate");
        if (values !== null) next.answer(id, values);
      }
    });

    (msg.evals ?? []).forEach((entry, i) => {
      const id = entry.run;
      addressed.add(id);
      if (isOver(id)) return;
      const run = active.get(id)!;
      if (evaluated.has(id))
        return endRun(id, `${where}: evals[${i}] is a second evaluation request of run ${id} in one report`);
      evaluated.add(id);
      if (run.status === "paused" || !turn.served.has(id)) {
        return endRun(
          id,
          `${where}: evals[${i}] asks for an evaluation for run ${id}, which is paused after step ${run.k}`,
        );
      }
      if (entry.x !== null && entry.x.length !== run.dim) {
        return endRun(
          id,
          `${where}: evals[${i}].x of run ${id} has ${entry.x.length} numbers, expected ${run.dim}`,
        );
      }
      const values = run.onEval(entry.x);
      if (values !== null) next.answer(id, values);
    });

    (msg.failed ?? []).forEach((entry) => {
      addressed.add(entry.run);
      if (!isOver(entry.run)) active.get(entry.run)!.onFailed(entry.phase, truncate(entry.message, 500));
    });

    (msg.states ?? []).forEach((entry, i) => {
      const id = entry.run;
      addressed.add(id);
      if (isOver(id)) return;
      const run = active.get(id)!;
      if (!run.awaitingState)
        return endRun(id, `${where}: states[${i}] carries a state of run ${id}, which was not asked for`);
      run.awaitingState = false;
      run.status = "running";
      // The run goes on in a fresh instance that imports the state (resume scenario).
      next.end.push(id);
      active.delete(id);
      const fresh = this.nextClientId++;
      next.start.push(run.startEntry(fresh, entry.state));
      next.served.add(fresh);
      active.set(fresh, run);
    });

    // Runs that were given something must answer; paused runs must send the state asked for.
    for (const id of turn.served) {
      if (active.has(id) && !addressed.has(id) && !isOver(id)) {
        endRun(
          id,
          `${where} says nothing about run ${id} (expected a step, an evaluation request or a failure)`,
        );
      }
    }
    for (const id of turn.exportState) {
      const run = active.get(id);
      if (run !== undefined && run.awaitingState && run.status !== "ended") {
        endRun(id, `${where} does not carry the state of run ${id}, asked for after step ${run.k}`);
      }
    }

    const now = this.now();
    const limit = this.settings.timeouts.run;
    for (const [id, run] of active) {
      if (run.status !== "ended" && now - run.startedAt > limit * 1000) {
        endRun(
          id,
          `${this.label}: run time-out: run ${id} still going after ${limit} s (timeouts.run), at step ${run.k}`,
        );
      }
      if (run.status === "ended") {
        active.delete(id);
        next.end.push(id);
        settle(run);
      } else if (run.status === "paused") {
        if (stepped.has(id)) this.atPause(run, id, next);
      } else if (!evaluated.has(id) && stepped.has(id)) {
        // A step without an evaluation request: the run waits until the next orders resume it.
        next.resume.push({ run: id });
        next.served.add(id);
      }
    }
    return null;
  }

  /** A run reached its pause point: put the scenario's action in the next orders. */
  private atPause(run: Run, id: number, next: Turn): void {
    const action = run.request.control?.action;
    if (action?.kind === "restart") {
      run.awaitingState = true;
      next.exportState.push(id);
      return;
    }
    run.status = "running";
    next.resume.push(action?.kind === "lr" ? { run: id, lr: action.lr } : { run: id });
    next.served.add(id);
  }
}

/** One lane: at most `capacity` runs, whose orders and reports alternate strictly. */
interface Lane {
  readonly capacity: number;
  readonly active: Map<number, Run>;
  turn: Turn;
}

/** One orders message being assembled, and the client runs it serves. */
class Turn {
  readonly start: StartEntry[] = [];
  /** Values entries as JSON text (built without intermediate objects: the hot path). */
  readonly values: { readonly run: number; readonly text: string }[] = [];
  readonly resume: ResumeEntry[] = [];
  readonly exportState: number[] = [];
  /** Client run ids that must be answered in the report to this turn. */
  readonly served = new Set<number>();
  constructor(readonly end: number[]) {}

  answer(run: number, text: string): void {
    this.values.push({ run, text });
    this.served.add(run);
  }

  /** The message as one JSON line; entries of runs that ended meanwhile are left out. */
  message(active: Map<number, Run>): string {
    const live = (id: number) => {
      const status = active.get(id)?.status;
      return status === "running" || status === "paused";
    };
    // Joined once at the end: one flat string, cheaper to write than a long chain of concatenations.
    const parts: string[] = ['{"type":"orders"'];
    if (this.end.length > 0) parts.push(`,"end":${JSON.stringify(this.end)}`);
    if (this.start.length > 0) parts.push(`,"start":${JSON.stringify(this.start)}`);
    let first = true;
    for (const v of this.values) {
      if (!live(v.run)) continue;
      parts.push(first ? ',"values":[' : ",", v.text);
      first = false;
    }
    if (!first) parts.push("]");
    const resume = this.resume.filter((r) => live(r.run));
    if (resume.length > 0) parts.push(`,"resume":${JSON.stringify(resume)}`);
    const exportState = this.exportState.filter(live);
    if (exportState.length > 0) parts.push(`,"exportState":${JSON.stringify(exportState)}`);
    parts.push("}");
    return parts.join("");
  }
}

function truncate(text: string, max: number): string {
  return text.length > max ? text.slice(0, max - 3) + "..." : text;
}

function ajvText(errors: ErrorObject[] | null | undefined): string {
  const e = errors?.[0];
  return e === undefined ? "invalid" : `${e.instancePath || "the message"} ${e.message}`;
}

/** "/x/1" → ".x[1]". */
function jsonPointerToPath(pointer: string): string {
  let out = "";
  for (const part of pointer.split("/").slice(1)) out += /^\d+$/.test(part) ? `[${part}]` : `.${part}`;
  return out;
}

function valueAt(data: unknown, pointer: string): unknown {
  let v = data;
  for (const part of pointer.split("/").slice(1)) {
    if (v === null || typeof v !== "object") return undefined;
    v = (v as Record<string, unknown>)[part];
  }
  return v;
}

/**
 * Reads a line that failed JSON.parse once more with bare NaN, Infinity and -Infinity tokens (outside
 * strings) replaced by marker strings, so that the runs whose points hold them can be named. Returns
 * undefined when the line is not JSON even so.
 */
export function parseWithNonFinite(line: string): unknown {
  if (!/NaN|Infinity/.test(line)) return undefined;
  let out = "";
  let inString = false;
  let i = 0;
  while (i < line.length) {
    const c = line[i];
    if (inString) {
      out += c;
      if (c === "\\") {
        out += line[i + 1] ?? "";
        i += 2;
        continue;
      }
      if (c === '"') inString = false;
      i++;
      continue;
    }
    if (c === '"') {
      inString = true;
      out += c;
      i++;
      continue;
    }
    const token = line.startsWith("-Infinity", i)
      ? "-Infinity"
      : line.startsWith("Infinity", i)
        ? "Infinity"
        : line.startsWith("NaN", i)
          ? "NaN"
          : null;
    if (token !== null) {
      out += JSON.stringify(NON_FINITE + token);
      i += token.length;
      continue;
    }
    out += c;
    i++;
  }
  try {
    return JSON.parse(out);
  } catch {
    return undefined;
  }
}
