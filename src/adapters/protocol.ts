/**
 * The subprocess protocol, version 1: the messages the harness and an optimizer process exchange as
 * JSON lines over the process's stdin (harness → client) and stdout (client → harness). The JSON
 * Schemas of these messages are in ./protocol-schema.ts and ship as files in schema/protocol/; the
 * design is recorded in docs/adapters.md ("The subprocess protocol").
 *
 * Shape of a session:
 *   harness: hello            client: ready      (version and the optimizers it serves, with capabilities)
 *   harness: orders           client: report     (repeated; exactly one report answers each orders)
 *   harness: bye              client exits
 *
 * One `orders` message carries work for many runs at once (start, evaluation values, resume, state
 * export, end); its `report` answers for exactly those runs (step boundaries with iterates, evaluation
 * requests, exported states, failures) and no others. A run the orders do not name waits. The client
 * answers orders one by one, in the order received; the harness may send a second orders (for other
 * runs) before the first report arrives, so both sides compute at the same time. The harness owns the
 * problems: the client never sees a problem, only points it asked about and the loss and gradient there.
 *
 * A run's life in the client: `start` → evaluation requests and step reports, each step ending with
 * the new iterate; after a step reported without an evaluation request for the next step (a step that
 * needed none, or the pause point) the run waits until an orders `resume`s it.
 *
 * Numbers: every number is a JSON number. JSON has no NaN or Infinity, so non-finite values are
 * spelled `null` where the protocol allows it: a non-finite loss or gradient entry the harness
 * computed, or a client iterate or evaluation point that is no longer finite (the run has diverged).
 * A bare NaN or Infinity token is not JSON and is a protocol fault.
 */

/** The protocol versions this harness speaks, newest last. */
export const PROTOCOL_VERSIONS = [1] as const;
export type ProtocolVersion = (typeof PROTOCOL_VERSIONS)[number];

/** Optional optimizer capabilities a client declares in its handshake. */
export const CAPABILITIES = ["state", "lr"] as const;
/**
 * `state`: the optimizer can export its state and import it into a fresh instance (resume scenarios);
 * `lr`: the optimizer can change its learning rate between steps (learning-rate-change scenarios).
 */
export type Capability = (typeof CAPABILITIES)[number];

/** Where in a run a client-side failure happened. */
export const FAILURE_PHASES = ["create", "step", "exportState", "importState", "setLearningRate"] as const;
export type FailurePhase = (typeof FAILURE_PHASES)[number];

/** A hyperparameter value as the protocol carries it. */
export type WireHyperValue = number | boolean | string;

// ---------------------------------------------------------------- harness → client

/** First message of a session: the versions the harness speaks. */
export interface HelloMessage {
  readonly type: "hello";
  readonly protocols: readonly number[];
  /** The harness, e.g. "gradgate 0.1.0" (informative). */
  readonly harness: string;
}

/** Create an optimizer instance for a new run and begin stepping from `x`. */
export interface StartEntry {
  /** Run id, unique within the session (the harness never reuses one). */
  readonly run: number;
  /** One of the names the client listed in `ready`. */
  readonly optimizer: string;
  /** Hyperparameters, the optimizer's defaults already merged in. */
  readonly hyper: Readonly<Record<string, WireHyperValue>>;
  readonly dim: number;
  /** The start point (length `dim`). */
  readonly x: readonly number[];
  /** Import this exported state into the new instance before the first step (resume scenarios). */
  readonly state?: Readonly<Record<string, number | readonly number[]>>;
  /** After completing the step with this number (counted from 1 for this instance), wait for `resume`. */
  readonly pause?: number;
}

/** The loss and gradient at the point a run asked about. `null` stands for a non-finite number. */
export interface ValuesEntry {
  readonly run: number;
  readonly f: number | null;
  readonly g: readonly (number | null)[];
}

/**
 * Continue a waiting run (at its pause point, or after a step reported without an evaluation request),
 * optionally with a new learning rate and a new pause point (absent: the pause point is unchanged).
 */
export interface ResumeEntry {
  readonly run: number;
  /** Call setLearningRate(lr) before the next step. */
  readonly lr?: number;
  /** Pause again after the step with this number (counted from 1 for this instance). */
  readonly pause?: number;
}

export interface OrdersMessage {
  readonly type: "orders";
  readonly start?: readonly StartEntry[];
  readonly values?: readonly ValuesEntry[];
  readonly resume?: readonly ResumeEntry[];
  /** Paused runs whose state the client must send in `states`. */
  readonly exportState?: readonly number[];
  /** Runs that are over: forget them (no reply expected for them). */
  readonly end?: readonly number[];
}

/** Last message: the client exits (status 0) after reading it. */
export interface ByeMessage {
  readonly type: "bye";
}

export type HarnessMessage = HelloMessage | OrdersMessage | ByeMessage;

// ---------------------------------------------------------------- client → harness

/** One optimizer a client serves. */
export interface OptimizerDescription {
  readonly name: string;
  readonly title?: string;
  /** Default hyperparameters; the harness merges the config's values over them. */
  readonly defaults?: Readonly<Record<string, WireHyperValue>>;
  readonly capabilities: readonly Capability[];
}

/** Answer to `hello`: the version chosen and the optimizers served. */
export interface ReadyMessage {
  readonly type: "ready";
  readonly protocol: number;
  /** The client, e.g. "gradgate_client.py 1" (informative). */
  readonly client?: string;
  readonly optimizers: readonly OptimizerDescription[];
}

/**
 * A run completed a step: `x` is the new iterate (`null`: not finite). `eval: true` says the next
 * step's first evaluation is at this iterate, so the harness answers it without a separate request.
 */
export interface StepEntry {
  readonly run: number;
  readonly x: readonly number[] | null;
  readonly eval?: boolean;
}

/** A run asks for the loss and gradient at `x` (`null`: the point is not finite). */
export interface EvalEntry {
  readonly run: number;
  readonly x: readonly number[] | null;
}

export interface StateEntry {
  readonly run: number;
  readonly state: Readonly<Record<string, number | readonly number[]>>;
}

/** The optimizer code failed for a run (an exception): the run ends with an error. */
export interface FailedEntry {
  readonly run: number;
  readonly phase: FailurePhase;
  readonly message: string;
}

export interface ReportMessage {
  readonly type: "report";
  readonly steps?: readonly StepEntry[];
  readonly evals?: readonly EvalEntry[];
  readonly states?: readonly StateEntry[];
  readonly failed?: readonly FailedEntry[];
}

export type ClientMessage = ReadyMessage | ReportMessage;
