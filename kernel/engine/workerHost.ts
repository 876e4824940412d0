/**
 * Worker host: runs the cell language in a worker_thread so the main thread (heartbeat, control,
 * iopub) stays responsive. Interrupt sets a shared flag the language polls (cooperative); if the cell
 * has not finished after the grace period, the worker is terminated and replaced, and the cell's reply
 * says plainly that the variables were lost.
 */
import { Worker } from "node:worker_threads";
import { engineLostError, type EngineOutput, type Interpreter, type RunResult } from "./interpreter.js";
import type { FromWorker, ToWorker, WorkerData, WorkerOp } from "./protocol.js";

export interface WorkerEngineOptions {
  /** Milliseconds between the interrupt request and replacing the worker (default 2000). */
  graceMs?: number;
  /** Module URL exporting createSession (default: the cell language). */
  sessionModule?: string;
  /** Add SVG/PNG pictures to chart bundles in the worker (default true). */
  renderCharts?: boolean;
  log?: (line: string) => void;
}

interface Pending {
  op: WorkerOp["op"];
  resolve: (value: unknown) => void;
  reject: (error: Error) => void;
  onOutput?: (output: EngineOutput) => void;
}

const here = import.meta.url;
const fromSource = here.endsWith(".ts");
/** Compiled builds run worker.js; under the test runner (TypeScript sources) the worker loads worker.ts through tsx. */
const WORKER_URL = new URL(fromSource ? "./worker.ts" : "./worker.js", here);
/** tsx's loader API, resolved from here so an eval'd worker finds it whatever the working directory. */
function tsxApi(): string {
  try {
    return import.meta.resolve("tsx/esm/api");
  } catch {
    return "tsx/esm/api";
  }
}
const DEFAULT_SESSION_MODULE = new URL(fromSource ? "../../lib/language/index.ts" : "../../lib/language/index.js", here).href;

export class WorkerEngine implements Interpreter {
  private worker!: Worker;
  private readonly flag = new Int32Array(new SharedArrayBuffer(4));
  private readonly pending = new Map<number, Pending>();
  private nextId = 1;
  private runningId: number | undefined;
  private graceTimer: NodeJS.Timeout | undefined;
  private stopped = false;
  private readonly graceMs: number;
  private readonly sessionModule: string;
  private readonly renderCharts: boolean;
  private readonly log: (line: string) => void;
  /** Number of workers started so far (1 + replacements). */
  generation = 0;

  constructor(options: WorkerEngineOptions = {}) {
    this.graceMs = options.graceMs ?? 2000;
    if (!(this.graceMs >= 0)) throw new Error(`graceMs must be >= 0, got ${options.graceMs}`);
    this.sessionModule = options.sessionModule ?? DEFAULT_SESSION_MODULE;
    this.renderCharts = options.renderCharts ?? true;
    this.log = options.log ?? (() => {});
    this.spawn();
  }

  private spawn(): void {
    this.generation++;
    const data: WorkerData = { flag: this.flag.buffer as SharedArrayBuffer, sessionModule: this.sessionModule, renderCharts: this.renderCharts };
    // TypeScript sources (the test runner, or a test session module given to the compiled kernel):
    // register tsx inside the worker, then load the entry. Compiled builds with the language never load tsx.
    const worker =
      fromSource || this.sessionModule.endsWith(".ts")
        ? new Worker(`import(${JSON.stringify(tsxApi())}).then((m) => { m.register(); return import(${JSON.stringify(WORKER_URL.href)}); })`, { eval: true, workerData: data })
        : new Worker(WORKER_URL, { workerData: data });
    worker.unref();
    worker.on("message", (m: FromWorker) => this.onMessage(m));
    worker.on("error", (e) => {
      if (worker !== this.worker) return;
      this.log(`engine worker error: ${e.stack ?? e.message}`);
      this.replace(`The calculation engine failed (${e.message}).`);
    });
    worker.on("exit", (code) => {
      if (worker !== this.worker || this.stopped) return;
      this.log(`engine worker exited with code ${code}`);
      this.replace(`The calculation engine stopped unexpectedly (exit code ${code}).`);
    });
    this.worker = worker;
  }

  private onMessage(m: FromWorker): void {
    if (m.kind === "ready") return;
    const p = this.pending.get(m.id);
    if (!p) return;
    if (m.kind === "output") {
      p.onOutput?.(m.output);
      return;
    }
    this.pending.delete(m.id);
    if (m.id === this.runningId) this.finishRun();
    if (m.kind === "done") p.resolve(m.value);
    else p.reject(new Error(m.message));
  }

  private finishRun(): void {
    this.runningId = undefined;
    clearTimeout(this.graceTimer);
    this.graceTimer = undefined;
  }

  /** Terminates the current worker, answers everything pending, and starts a fresh worker. */
  private replace(reason: string): void {
    const old = this.worker;
    this.finishRun();
    const lost = [...this.pending.values()];
    this.pending.clear();
    if (!this.stopped) this.spawn();
    void old.terminate();
    for (const p of lost) {
      if (p.op === "run" || p.op === "eval") p.resolve(engineLostError(reason));
      else p.reject(new Error(reason));
    }
  }

  private call<T>(op: WorkerOp, onOutput?: (output: EngineOutput) => void): Promise<T> {
    if (this.stopped) return Promise.reject(new Error("the engine has been shut down"));
    const id = this.nextId++;
    if (op.op === "run") {
      Atomics.store(this.flag, 0, 0);
      this.runningId = id;
    }
    return new Promise<T>((resolve, reject) => {
      this.pending.set(id, { op: op.op, resolve: resolve as (v: unknown) => void, reject, onOutput });
      const message: ToWorker = { id, ...op };
      this.worker.postMessage(message);
    });
  }

  execute(code: string, onOutput: (output: EngineOutput) => void): Promise<RunResult> {
    return this.call<RunResult>({ op: "run", code }, onOutput);
  }
  evaluate(expression: string): Promise<RunResult> {
    return this.call({ op: "eval", expression });
  }
  complete(code: string, cursorPos: number) {
    return this.call<Awaited<ReturnType<Interpreter["complete"]>>>({ op: "complete", code, cursorPos });
  }
  inspect(code: string, cursorPos: number, detailLevel: 0 | 1) {
    return this.call<Awaited<ReturnType<Interpreter["inspect"]>>>({ op: "inspect", code, cursorPos, detailLevel });
  }
  isComplete(code: string) {
    return this.call<Awaited<ReturnType<Interpreter["isComplete"]>>>({ op: "isComplete", code });
  }

  interrupt(): void {
    if (this.runningId === undefined || this.stopped) return;
    Atomics.store(this.flag, 0, 1);
    if (this.graceTimer) return;
    const id = this.runningId;
    this.graceTimer = setTimeout(() => {
      this.graceTimer = undefined;
      if (this.runningId !== id) return;
      this.log(`cell did not stop within ${this.graceMs} ms of the interrupt: replacing the engine worker`);
      this.replace(`The cell did not stop within ${(this.graceMs / 1000).toFixed(1)} s of the interrupt.`);
    }, this.graceMs);
  }

  async shutdown(): Promise<void> {
    if (this.stopped) return;
    this.stopped = true;
    clearTimeout(this.graceTimer);
    for (const p of this.pending.values()) p.reject(new Error("the engine has been shut down"));
    this.pending.clear();
    await this.worker.terminate();
  }
}
