/**
 * The Interpreter: what the handlers ask of the cell language, asynchronously. Implemented by the
 * worker host (the kernel's default: user code never runs on the main thread) and by the in-process
 * engine (tests, and the runner's --in-process option). Values cross as MIME bundles and errors, never
 * as Jupyter messages.
 */
import type { CompletionResult, InspectResult, IsCompleteResult, RunResult } from "../../lib/language/index.js";

/** A Jupyter MIME bundle (text/plain always present), as the language returns it. */
export type MimeBundle = NonNullable<Extract<RunResult, { ok: true }>["result"]>;

export type { CompletionResult, InspectResult, IsCompleteResult, RunResult };

/** Output produced while a cell runs, in order. */
export type EngineOutput =
  | { kind: "stdout"; text: string }
  | { kind: "display"; bundle: MimeBundle; displayId?: string; update?: boolean }
  | { kind: "clear"; wait: boolean };

export interface Interpreter {
  /** Runs one cell; onOutput receives its outputs before the promise resolves. */
  execute(code: string, onOutput: (output: EngineOutput) => void): Promise<RunResult>;
  /** user_expressions: evaluated after the cell, with no visible output. */
  evaluate(expression: string): Promise<RunResult>;
  /** cursorPos and the returned offsets count Unicode code points. */
  complete(code: string, cursorPos: number): Promise<CompletionResult>;
  inspect(code: string, cursorPos: number, detailLevel: 0 | 1): Promise<InspectResult>;
  isComplete(code: string): Promise<IsCompleteResult>;
  /**
   * Asks the running cell to stop (cooperative flag). An engine that can, replaces a cell that has not
   * stopped after its grace period and reports that the variables were lost. No effect when idle.
   */
  interrupt(): void;
  /** Stops the engine for good. */
  shutdown(): Promise<void>;
}

/** The error an engine reports when it had to be replaced and the session state is gone. */
export function engineLostError(reason: string): RunResult {
  const evalue =
    `${reason} The calculation engine was restarted: all variables and functions defined so far were lost. ` +
    "Re-run the cells that define them.";
  return { ok: false, error: { ename: "EngineRestarted", evalue, traceback: [`EngineRestarted: ${evalue}`] } };
}
