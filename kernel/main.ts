/**
 * Composition root of the kernel process: binds the sockets from the connection file (before loading
 * anything else) and answers on the main thread. The engine (and with it the worker thread and the cell language) is loaded only
 * after the first kernel_info exchange has been sent, or on the first request that needs it, or after
 * `engineStartMs` at the latest: on a busy machine a worker loading mathjs next to the first
 * kernel_info_reply would slow the kernel's cold start.
 */
import { randomUUID } from "node:crypto";
import type { Interpreter } from "./engine/index.js";
import type { KernelServices } from "./handlers/index.js";
import type { Message } from "./protocol/index.js";
import { KernelSockets, readConnectionFile, type WireMessage } from "./wire/index.js";

export interface KernelOptions {
  connectionFile: string;
  /** Run the language on the main thread (no hard interrupt; for debugging). */
  inProcess?: boolean;
  /** Interrupt grace period before the worker is replaced, ms (default 2000). */
  graceMs?: number;
  /** Module URL exporting createSession (default: the cell language; tests pass a scripted session). */
  sessionModule?: string;
  /**
   * Add SVG/PNG pictures to chart bundles (default true). The headless runner turns it off and renders
   * in its own process, where the chart libraries load once for all notebooks.
   */
  renderCharts?: boolean;
  /** Latest start of the engine after the sockets are bound, ms (default 500). */
  engineStartMs?: number;
  /** How often to check that the parent process (JPY_PARENT_PID) is alive, ms (default 1000). */
  parentPollMs?: number;
  /** Install SIGINT (interrupt) and SIGTERM (stop) handlers (default true). */
  handleSignals?: boolean;
  /** Ends the process once the kernel has stopped (default process.exit). */
  exit?: (code: number) => void;
  log?: (line: string) => void;
}

/** What runKernel hands back: for tests and embedding; Jupyter drives the kernel through messages. */
export interface KernelHandle {
  /** True once the engine has been asked to start. */
  readonly engineStarted: boolean;
  /** Shuts the engine down, closes the sockets (after pending sends) and calls `exit(code)`. */
  stop(code?: number): Promise<void>;
}

const stderrLog = (line: string) => process.stderr.write(`[caloric] ${line}\n`);

/** An engine created on demand: calls made before it exists wait for it; afterwards they go straight through. */
class LazyEngine implements Interpreter {
  private engine: Interpreter | undefined;
  private starting: Promise<Interpreter> | undefined;
  constructor(private readonly create: () => Promise<Interpreter>) {}

  get started(): boolean {
    return this.starting !== undefined;
  }
  /** Starts the engine if it has not been started; resolves when it is usable. */
  start(): Promise<Interpreter> {
    // A failed start is forgotten, so the next request tries again instead of failing for good.
    this.starting ??= this.create().then(
      (e) => (this.engine = e),
      (error: unknown) => {
        this.starting = undefined;
        throw error;
      },
    );
    return this.starting;
  }
  private with<T>(call: (e: Interpreter) => Promise<T>): Promise<T> {
    return this.engine ? call(this.engine) : this.start().then(call);
  }
  execute: Interpreter["execute"] = (code, onOutput) => this.with((e) => e.execute(code, onOutput));
  evaluate: Interpreter["evaluate"] = (expression) => this.with((e) => e.evaluate(expression));
  complete: Interpreter["complete"] = (code, pos) => this.with((e) => e.complete(code, pos));
  inspect: Interpreter["inspect"] = (code, pos, detail) => this.with((e) => e.inspect(code, pos, detail));
  isComplete: Interpreter["isComplete"] = (code) => this.with((e) => e.isComplete(code));
  interrupt(): void {
    this.engine?.interrupt();
  }
  async shutdown(): Promise<void> {
    if (this.starting) await (await this.starting.catch(() => undefined))?.shutdown();
  }
}

export async function runKernel(options: KernelOptions): Promise<KernelHandle> {
  const log = options.log ?? stderrLog;
  const exit = options.exit ?? ((code: number) => process.exit(code));
  const info = readConnectionFile(options.connectionFile);
  const sockets = await KernelSockets.bind(info, { log });
  // Bound first: clients connect (zeromq's I/O thread does the handshakes and the iopub subscription)
  // while the rest of the kernel loads. Requests wait in the sockets until listen() below.
  const [{ ExecutionState }, { Dispatcher, HANDLERS }, { IMPLEMENTATION_VERSION, makeBroadcast }] = await Promise.all([
    import("./execution/index.js"),
    import("./handlers/index.js"),
    import("./protocol/index.js"),
  ]);
  const identity = { session: randomUUID(), username: "caloric" };
  const engine = new LazyEngine(async () => {
    const { InProcessEngine, WorkerEngine } = await import("./engine/index.js");
    if (options.inProcess) return InProcessEngine.create(options.sessionModule ? (await import(options.sessionModule)).createSession : undefined);
    return new WorkerEngine({ graceMs: options.graceMs, sessionModule: options.sessionModule, renderCharts: options.renderCharts, log });
  });
  const startEngine = () => void engine.start().catch((e: Error) => log(`the engine failed to start: ${e.stack ?? e.message}`));
  let fallback: NodeJS.Timeout | undefined;
  let stopping: Promise<void> | undefined;
  const stop = (code = 0) =>
    (stopping ??= (async () => {
      clearTimeout(fallback);
      await engine.shutdown().catch(() => {});
      await sockets.close();
      exit(code);
    })());

  const services: KernelServices = {
    engine,
    execution: new ExecutionState(),
    identity,
    implementationVersion: IMPLEMENTATION_VERSION,
    requestShutdown: () => setImmediate(() => void stop(0)),
    log,
  };
  const send = (channel: Parameters<KernelSockets["send"]>[0], message: Message) => {
    const sent = sockets.send(channel, message as unknown as WireMessage);
    // The idle that ends the first kernel_info exchange: the client has its answer, so the engine may load now.
    if (!engine.started && channel === "iopub" && (message.parent_header as { msg_type?: string }).msg_type === "kernel_info_request" && message.content.execution_state === "idle") {
      void sent.then(() => setImmediate(startEngine));
    }
    return sent;
  };
  const dispatcher = new Dispatcher({ services, handlers: HANDLERS, outbox: { send } });
  sockets.listen((channel, message) => void dispatcher.receive(channel, message as unknown as Message));
  void sockets.send("iopub", makeBroadcast(undefined, "status", { execution_state: "starting" }, identity) as unknown as WireMessage);
  fallback = setTimeout(startEngine, options.engineStartMs ?? 500);

  if (options.handleSignals ?? true) {
    process.on("SIGINT", () => engine.interrupt());
    process.on("SIGTERM", () => void stop(0));
  }
  watchParent(options.parentPollMs ?? 1000, log, () => void stop(0));
  return {
    get engineStarted() {
      return engine.started;
    },
    stop,
  };
}

/** Exits with the parent: jupyter_client sets JPY_PARENT_PID; a dead parent would leave us orphaned. */
function watchParent(everyMs: number, log: (line: string) => void, onGone: () => void): void {
  const pid = Number(process.env.JPY_PARENT_PID);
  if (!Number.isInteger(pid) || pid <= 1) return;
  const timer = setInterval(() => {
    try {
      process.kill(pid, 0);
    } catch (e) {
      if ((e as NodeJS.ErrnoException).code === "EPERM") return; // alive, owned by someone else
      log(`parent process ${pid} is gone: shutting down`);
      clearInterval(timer);
      onGone();
    }
  }, everyMs);
  timer.unref();
}
