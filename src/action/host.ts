/**
 * What the Action's modes need from their surroundings: logging, annotations, step outputs, the job
 * summary and the step's failure. The real one (core-host.ts) is the only file that imports
 * @actions/core; everything else in src/action talks to this interface.
 */
export interface ActionHost {
  debug(message: string): void;
  info(message: string): void;
  /** A warning annotation. */
  warning(message: string): void;
  /** An error annotation (does not by itself fail the step). */
  annotate(message: string, title: string): void;
  setOutput(name: string, value: string): void;
  /** Appends Markdown to this step's job summary. */
  appendSummary(markdown: string): Promise<void>;
  /** Marks the step failed with one message. */
  fail(message: string): void;
  /** Runs `fn` inside a collapsible log group. */
  group<T>(name: string, fn: () => Promise<T>): Promise<T>;
  /**
   * Runs `fn` with workflow commands switched off: lines logged meanwhile (the engine process's output,
   * which optimizer code can write to) are shown as text, never read as commands.
   */
  withoutCommands<T>(fn: () => Promise<T>): Promise<T>;
}
