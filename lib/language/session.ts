/**
 * The contract between the kernel's engine and the cell language. The engine (worker or in-process)
 * creates one Session per kernel lifetime and calls it synchronously; the Session never sees Jupyter
 * messages: it writes text and rich displays to a CellSink and returns a result bundle or an error.
 */
import type { MimeBundle, ProgressTiming } from "../display/index.js";

export interface CellSink {
  /** Text for the stdout stream (echo). */
  stdout(text: string): void;
  /** A rich display in the middle of a cell (show). With displayId, later calls with update=true replace it. */
  display(bundle: MimeBundle, options?: { displayId?: string; update?: boolean }): void;
  /** clear_output; wait=true clears when the next output arrives. */
  clear(wait: boolean): void;
}

export interface CellError {
  ename: string;
  evalue: string;
  /** Lines shown to the user (plain text, no ANSI needed): message, source line, caret. */
  traceback: string[];
}

export type RunResult =
  /**
   * help: the cell was a help query (`?name`). "page": result is the help text (a kernel may show it
   * in its pager); "note": result is a one-line note that there is no help for the name, with close
   * matches (a kernel may write it on stderr).
   */
  | { ok: true; result?: MimeBundle; help?: "page" | "note" }
  | { ok: false; error: CellError };

export interface SessionOptions {
  /** Polled by the statement loop and every numerics loop; true means the user asked to stop. */
  shouldStop: () => boolean;
  /**
   * When long sweeps (departure_chart, zchart) start showing a progress display and how often they
   * update it; a clock can be injected for tests. Defaults: after 0.5 s, at most every 0.5 s.
   */
  progress?: ProgressTiming;
}

export interface CompletionResult {
  matches: string[];
  /** Offsets in Unicode code points into the code. */
  cursorStart: number;
  cursorEnd: number;
}

export interface InspectResult {
  found: boolean;
  bundle?: MimeBundle;
}

export interface IsCompleteResult {
  status: "complete" | "incomplete" | "invalid";
  indent?: string;
}

export interface Session {
  /** Run one cell. Variables persist across calls and survive errors and interrupts. */
  run(code: string, sink: CellSink): RunResult;
  /** Evaluate a single expression without side effects on visible output (user_expressions). */
  evaluateExpression(expression: string): RunResult;
  /** cursorPos counts Unicode code points. */
  complete(code: string, cursorPos: number): CompletionResult;
  inspect(code: string, cursorPos: number, detailLevel: 0 | 1): InspectResult;
  isComplete(code: string): IsCompleteResult;
}
