/**
 * The execution counter: execute_input and execute_reply carry it; it advances for every execute with
 * store_history (silent implies no history), errors included, as the reference kernel does.
 */
import { AbortWindow } from "./abortWindow.js";
import { History } from "./history.js";

export class ExecutionState {
  private count = 0;
  readonly history = new History();
  readonly abort = new AbortWindow();

  get executionCount(): number {
    return this.count;
  }

  /** Starts a cell; returns the count to show for it. */
  begin(code: string, storeHistory: boolean): number {
    if (!storeHistory) return this.count;
    this.count++;
    this.history.add(this.count, code);
    return this.count;
  }
}
