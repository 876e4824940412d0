/** kernel/engine: the Interpreter interface and its two implementations (worker thread, in-process). */
export { engineLostError, type Interpreter, type EngineOutput, type RunResult, type CompletionResult, type InspectResult, type IsCompleteResult, type MimeBundle } from "./interpreter.js";
export { WorkerEngine, type WorkerEngineOptions } from "./workerHost.js";
export { InProcessEngine, type SessionFactory } from "./inProcess.js";
