/**
 * Composition root of the kernel process: binds the sockets from the connection file, answers on the
 * main thread, and starts the engine worker in the background right after binding so kernel_info
 * does not wait for it.
 */
import { randomUUID } from "node:crypto";
import { InProcessEngine, WorkerEngine, type Interpreter } from "./engine/index.js";
import { ExecutionState } from "./execution/index.js";
import { Dispatcher, HANDLERS, type KernelServices } from "./handlers/index.js";
import { IMPLEMENTATION_VERSION, makeBroadcast, type Message } from "./protocol/index.js";
import { KernelSockets, readConnectionFile, type WireMessage } from "./wire/index.js";

export interface KernelOptions {
  connectionFile: string;
  /** Run the language on the main thread (no hard interrupt; for debugging). */
  inProcess?: boolean;
  /** Interrupt grace period before the worker is replaced, ms (default 2000). */
  graceMs?: number;
  /** How often to check that the parent process (JPY_PARENT_PID) is alive, ms (default 1000). */
  parentPollMs?: number;
  log?: (line: string) => void;
}

const stderrLog = (line: string) => process.stderr.write(`[caloric] ${line}\n`);

/** A lazily bound engine: calls wait for the engine, which is created after the sockets are bound. */
class DeferredEngine implements Interpreter {
  private engine: Interpreter | undefined;
  private readonly ready: Promise<Interpreter>;
  private resolve!: (e: Interpreter) => void;
  constructor() {
    this.ready = new Promise((r) => (this.resolve = r));
  }
  set(engine: Interpreter): void {
    this.engine = engine;
    this.resolve(engine);
  }
  execute: Interpreter["execute"] = async (code, onOutput) => (await this.ready).execute(code, onOutput);
  evaluate: Interpreter["evaluate"] = async (e) => (await this.ready).evaluate(e);
  complete: Interpreter["complete"] = async (c, p) => (await this.ready).complete(c, p);
  inspect: Interpreter["inspect"] = async (c, p, d) => (await this.ready).inspect(c, p, d);
  isComplete: Interpreter["isComplete"] = async (c) => (await this.ready).isComplete(c);
  interrupt(): void {
    this.engine?.interrupt();
  }
  async shutdown(): Promise<void> {
    await this.engine?.shutdown();
  }
}

export async function runKernel(options: KernelOptions): Promise<void> {
  const log = options.log ?? stderrLog;
  const info = readConnectionFile(options.connectionFile);
  const sockets = await KernelSockets.bind(info, { log });
  const identity = { session: randomUUID(), username: "caloric" };
  const engine = new DeferredEngine();
  let stopping = false;

  const stop = async (code: number) => {
    if (stopping) return;
    stopping = true;
    await engine.shutdown().catch(() => {});
    await sockets.close();
    process.exit(code);
  };

  const services: KernelServices = {
    engine,
    execution: new ExecutionState(),
    identity,
    implementationVersion: IMPLEMENTATION_VERSION,
    requestShutdown: () => setImmediate(() => void stop(0)),
    log,
  };
  const dispatcher = new Dispatcher({
    services,
    handlers: HANDLERS,
    outbox: { send: (channel, message) => sockets.send(channel, message as unknown as WireMessage) },
  });
  sockets.listen((channel, message) => void dispatcher.receive(channel, message as unknown as Message));
  void sockets.send("iopub", makeBroadcast(undefined, "status", { execution_state: "starting" }, identity) as unknown as WireMessage);

  // The engine starts after the event loop has had a turn to answer an early kernel_info_request.
  setImmediate(() => {
    if (options.inProcess) void InProcessEngine.create().then((e) => engine.set(e));
    else engine.set(new WorkerEngine({ graceMs: options.graceMs, log }));
  });

  process.on("SIGINT", () => engine.interrupt());
  process.on("SIGTERM", () => void stop(0));
  watchParent(options.parentPollMs ?? 1000, log, () => void stop(0));
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
