/** kernel/execution: execution count, history, stop_on_error abort window. */
export { History, globToRegExp, CURRENT_SESSION, type HistoryEntry, type HistoryRow } from "./history.js";
export { AbortWindow } from "./abortWindow.js";
export { ExecutionState } from "./executionState.js";
