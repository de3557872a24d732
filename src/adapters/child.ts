/**
 * One optimizer process: spawned without a shell, with the minimal environment (./env.ts), spoken to
 * in JSON lines. Turns everything that can go wrong with a child into a `ChildFault` with a precise
 * reason: it could not start, it exited, it stayed silent past a time-out, a line was too long, a line
 * was not JSON. Keeps the tail of its stderr for error reports.
 *
 * Lines are read in order: `next` resolves with the child's next line (`exchange` = `send` + `next`).
 * A line that arrives when no reply is awaited is kept for the next `next` (where it is judged: it is
 * usually not the expected message).
 *
 * While no exchange is outstanding the child's handles are unreferenced, so an idle child never keeps
 * the harness (or a worker thread) alive; a child whose harness goes away reads end-of-file on stdin
 * and should exit.
 */
import { type ChildProcessWithoutNullStreams, spawn } from "node:child_process";
import type { Socket } from "node:net";

/** Why the link to a child failed; `reason` is a complete sentence for the run's `error`. */
export class ChildFault extends Error {
  override readonly name = "ChildFault";
  constructor(readonly reason: string) {
    super(reason);
  }
}

export interface ChildOptions {
  /** Program and arguments (no shell). */
  readonly command: readonly string[];
  readonly cwd: string;
  /** The complete environment of the child. */
  readonly env: Record<string, string>;
  /** Longest line accepted from the child, in bytes (without the newline). */
  readonly maxLineBytes: number;
  /** Characters of stderr kept for reports (the tail). */
  readonly stderrKeep?: number;
  /** Used in messages, e.g. `adapter "py"`. */
  readonly label: string;
}

/** At most this many characters of an offending line are quoted in a reason. */
export const QUOTE_CHARS = 120;

/** Quotes a line from a child for an error message: JSON string syntax, truncated. */
export function quoteLine(line: string): string {
  const cut = line.length > QUOTE_CHARS ? line.slice(0, QUOTE_CHARS) : line;
  return JSON.stringify(cut) + (line.length > QUOTE_CHARS ? ` (${line.length} characters, truncated)` : "");
}

export class ChildLink {
  private readonly child: ChildProcessWithoutNullStreams;
  private chunks: Buffer[] = [];
  private pendingBytes = 0;
  private readonly lines: string[] = [];
  private waiter: { resolve: (line: string) => void; reject: (fault: ChildFault) => void } | null = null;
  private fault: ChildFault | null = null;
  private stderrText = "";
  private exited = false;
  /** After an over-long line nothing more from this child is read. */
  private discarding = false;
  /** Set by kill(): the child is being stopped and must not be used again. */
  private killed = false;
  private exitPromise: Promise<void>;
  /** Lines received so far (for messages). */
  lineCount = 0;

  constructor(private readonly options: ChildOptions) {
    const [program, ...args] = options.command;
    this.child = spawn(program, args, {
      cwd: options.cwd,
      env: options.env,
      stdio: ["pipe", "pipe", "pipe"],
      shell: false,
      windowsHide: true,
      // Own process group, so a time-out can kill the child's own children too.
      detached: process.platform !== "win32",
    });
    let markExited: () => void = () => {};
    this.exitPromise = new Promise((resolve) => (markExited = resolve));
    this.child.on("error", (err: NodeJS.ErrnoException) => {
      const what =
        err.code === "ENOENT"
          ? `could not start ${quoteLine(program)}: not found (a bare name is looked up on PATH, a relative path ` +
            `from the working directory ${quoteLine(options.cwd)})`
          : `could not start ${quoteLine(program)}: ${err.message}`;
      this.setFault(new ChildFault(`${options.label}: ${what}`));
      this.exited = true;
      markExited();
    });
    // "close" comes once the output is drained too, so a last line written before exiting is still
    // read; a grandchild holding the pipes open must not delay the fault for long, hence the timer.
    const exitFault = (code: number | null, signal: NodeJS.Signals | null) => {
      const how = signal !== null ? `was killed by ${signal}` : `exited with status ${code}`;
      this.setFault(new ChildFault(`${options.label}: the process ${how}`));
    };
    this.child.on("exit", (code, signal) => {
      this.exited = true;
      markExited();
      setTimeout(() => exitFault(code, signal), 500).unref();
    });
    this.child.on("close", (code: number | null, signal: NodeJS.Signals | null) => exitFault(code, signal));
    this.child.stdout.on("data", (chunk: Buffer) => this.onData(chunk));
    this.child.stderr.setEncoding("utf8");
    this.child.stderr.on("data", (text: string) => {
      const keep = options.stderrKeep ?? 4000;
      this.stderrText = (this.stderrText + text).slice(-keep);
    });
    // A child that exits early makes writes fail with EPIPE; the exit handler reports it.
    this.child.stdin.on("error", () => {});
    this.idle();
  }

  get pid(): number | undefined {
    return this.child.pid;
  }

  get alive(): boolean {
    return !this.exited && !this.killed && this.fault === null;
  }

  /** The last `lines` lines of stderr (at most `chars` characters), or "" if it wrote none. */
  stderrTail(lines = 10, chars = 1000): string {
    const all = this.stderrText.replace(/\s+$/, "").split("\n");
    return all.slice(-lines).join("\n").slice(-chars);
  }

  /**
   * Writes `line` (a newline is added) and resolves with the child's next line. Rejects with a
   * `ChildFault` when the child exits, writes a line that is too long, or stays silent `seconds`.
   */
  exchange(line: string, seconds: number, waitingFor: string): Promise<string> {
    if (this.fault !== null) return Promise.reject(this.fault);
    this.send(line);
    return this.next(seconds, waitingFor);
  }

  /** Writes `line` (a newline is added); a failed write shows up as the child's exit. */
  send(line: string): void {
    if (this.fault !== null || this.killed) return;
    this.child.stdin.write(line + "\n");
  }

  /** Resolves with the next line (no write), with the same faults as `exchange`. */
  next(seconds: number, waitingFor: string): Promise<string> {
    if (this.lines.length > 0) return Promise.resolve(this.lines.shift()!);
    if (this.fault !== null) return Promise.reject(this.fault);
    this.busy();
    return new Promise<string>((resolve, reject) => {
      const timer = setTimeout(() => {
        this.waiter = null;
        this.setFault(
          new ChildFault(
            `${this.options.label}: no ${waitingFor} within ${seconds} s (time-out); the process was stopped`,
          ),
        );
        this.kill();
        reject(this.fault!);
      }, seconds * 1000);
      this.waiter = {
        resolve: (l) => {
          clearTimeout(timer);
          this.idle();
          resolve(l);
        },
        reject: (f) => {
          clearTimeout(timer);
          this.idle();
          reject(f);
        },
      };
    });
  }

  /** Ends the session politely: writes `line`, closes stdin, kills after `graceSeconds`. */
  async close(line: string | null, graceSeconds = 2): Promise<void> {
    if (!this.exited) {
      if (line !== null && this.fault === null) this.child.stdin.write(line + "\n");
      this.child.stdin.end();
      const timer = setTimeout(() => this.kill(), graceSeconds * 1000);
      this.busy();
      await this.exitPromise;
      clearTimeout(timer);
    }
    this.setFault(new ChildFault(`${this.options.label}: the process was closed`));
  }

  /** Kills the child (and its process group) at once. */
  kill(): void {
    this.killed = true;
    this.discarding = true;
    if (this.exited) return;
    const pid = this.child.pid;
    try {
      if (pid !== undefined && process.platform !== "win32") process.kill(-pid, "SIGKILL");
      else this.child.kill("SIGKILL");
    } catch {
      this.child.kill("SIGKILL");
    }
  }

  /** Records a fault (the first one wins) and fails a waiting exchange. */
  setFault(fault: ChildFault): void {
    if (this.fault === null) this.fault = fault;
    const w = this.waiter;
    if (w !== null) {
      this.waiter = null;
      w.reject(this.fault);
    }
  }

  private onData(chunk: Buffer): void {
    if (this.discarding) return;
    let start = 0;
    for (;;) {
      const nl = chunk.indexOf(10, start);
      if (nl < 0) break;
      const piece = chunk.subarray(start, nl);
      if (this.pendingBytes + piece.length > this.options.maxLineBytes) return this.tooLong(piece);
      let text: string;
      if (this.chunks.length === 0) text = piece.toString("utf8");
      else {
        this.chunks.push(piece);
        text = Buffer.concat(this.chunks).toString("utf8");
        this.chunks = [];
      }
      this.pendingBytes = 0;
      start = nl + 1;
      this.lineCount++;
      this.deliver(text.endsWith("\r") ? text.slice(0, -1) : text);
    }
    if (start < chunk.length) {
      const rest = chunk.subarray(start);
      if (this.pendingBytes + rest.length > this.options.maxLineBytes) return this.tooLong(rest);
      // Copy: the stream may reuse its buffer.
      this.chunks.push(Buffer.from(rest));
      this.pendingBytes += rest.length;
    }
  }

  private tooLong(piece: Buffer): void {
    const head = Buffer.concat([...this.chunks, piece.subarray(0, QUOTE_CHARS)])
      .subarray(0, QUOTE_CHARS)
      .toString("utf8");
    this.chunks = [];
    this.discarding = true;
    this.setFault(
      new ChildFault(
        `${this.options.label}: line ${this.lineCount + 1} of its output is longer than maxMessageBytes ` +
          `(${this.options.maxLineBytes} bytes), starting ${quoteLine(head)}; the process was stopped`,
      ),
    );
    this.kill();
  }

  private deliver(line: string): void {
    const w = this.waiter;
    if (w !== null) {
      this.waiter = null;
      w.resolve(line);
    } else {
      this.lines.push(line);
    }
  }

  private busy(): void {
    this.child.ref();
    for (const s of [this.child.stdin, this.child.stdout, this.child.stderr])
      (s as unknown as Socket).ref?.();
  }

  private idle(): void {
    this.child.unref();
    for (const s of [this.child.stdin, this.child.stdout, this.child.stderr])
      (s as unknown as Socket).unref?.();
  }
}
