/** Messages between the worker host and the worker entry (structured-clone data only). */
import type { EngineOutput } from "./interpreter.js";

export type WorkerOp =
  | { op: "run"; code: string }
  | { op: "eval"; expression: string }
  | { op: "complete"; code: string; cursorPos: number }
  | { op: "inspect"; code: string; cursorPos: number; detailLevel: 0 | 1 }
  | { op: "isComplete"; code: string };

export type ToWorker = { id: number } & WorkerOp;

export type FromWorker =
  | { kind: "ready" }
  | { kind: "output"; id: number; output: EngineOutput }
  | { kind: "done"; id: number; value: unknown }
  | { kind: "fail"; id: number; message: string };

export interface WorkerData {
  /** Int32Array over a SharedArrayBuffer: slot 0 is 1 while an interrupt is requested. */
  flag: SharedArrayBuffer;
  /** Module URL exporting createSession (default: the cell language). */
  sessionModule: string;
  /** Add SVG/PNG pictures to chart bundles, and load the renderer when idle (default true). */
  renderCharts?: boolean;
}
