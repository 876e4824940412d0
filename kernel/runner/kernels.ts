/**
 * The two kernels the runner can drive: a caloric kernel process over ZeroMQ, started and spoken to as
 * any Jupyter client would (the default), and the in-process engine (--in-process: no sockets, faster,
 * but a runaway cell can only be stopped cooperatively).
 */
import { spawn, type ChildProcess } from "node:child_process";
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { isPending, renderPending, type MimeBundle } from "../../lib/display/index.js";
import { InProcessEngine, type EngineOutput, type RunResult } from "../engine/index.js";
import { kernelInfoContent, IMPLEMENTATION_VERSION } from "../protocol/index.js";
import { KernelClient, loopbackConnection } from "../wire/index.js";
import type { ExecuteReply, NotebookKernel } from "./execute.js";
import type { IopubEvent } from "./outputs.js";

const CLI = fileURLToPath(new URL("../cli.js", import.meta.url));

/**
 * Sends kernel_info until one is answered with its reply and idle status. The IOPub subscription joins
 * some time after connect, so the first request's status may be missed: resend soon (every 60 ms)
 * rather than waiting long on a message that will never come.
 */
async function waitUntilAnswering(client: KernelClient, timeoutMs: number) {
  const deadline = Date.now() + timeoutMs;
  let lastError: unknown;
  while (Date.now() < deadline) {
    const id = client.request("shell", "kernel_info_request");
    try {
      return (await client.collect(id, 60)).reply;
    } catch (e) {
      lastError = e;
    }
  }
  throw new Error(`kernel not ready within ${timeoutMs} ms (${(lastError as Error)?.message ?? "no answer"})`);
}

/** Adds SVG/PNG to a chart bundle carried by an output message (display, update or result). */
async function withPictures(content: Record<string, unknown>): Promise<Record<string, unknown>> {
  const data = content.data as MimeBundle | undefined;
  if (!data || typeof data !== "object" || !isPending(data)) return content;
  return { ...content, data: await renderPending(data) };
}

const EXECUTE_TIMEOUT_MS = 24 * 3600 * 1000; // the runner's own --timeout governs cells

export class ProcessKernel implements NotebookKernel {
  private constructor(
    private readonly child: ChildProcess,
    private readonly client: KernelClient,
    private readonly dir: string,
    private readonly infoContent: Record<string, unknown>,
    private readonly stderr: () => string,
  ) {}

  static async start(): Promise<ProcessKernel> {
    const info = await loopbackConnection();
    const dir = mkdtempSync(join(tmpdir(), "caloric-run-"));
    const file = join(dir, "connection.json");
    writeFileSync(file, JSON.stringify(info), { mode: 0o600 });
    // The runner renders chart pictures itself: the chart libraries then load once in this process for
    // all notebooks instead of once per kernel (about half a second of CPU each).
    const child = spawn(process.execPath, [CLI, "kernel", "-f", file, "--client-renders-charts"], { stdio: ["ignore", "ignore", "pipe"], env: { ...process.env, JPY_PARENT_PID: String(process.pid) } });
    let err = "";
    child.stderr!.on("data", (d: Buffer) => (err = (err + d.toString()).slice(-20_000)));
    const client = await KernelClient.connect(info);
    try {
      const reply = await waitUntilAnswering(client, 30_000);
      return new ProcessKernel(child, client, dir, reply.content as Record<string, unknown>, () => err);
    } catch (e) {
      client.close();
      child.kill("SIGKILL");
      rmSync(dir, { recursive: true, force: true });
      throw new Error(`the caloric kernel did not start: ${(e as Error).message}\n${err}`);
    }
  }

  async info() {
    return { language_info: this.infoContent.language_info as Record<string, unknown>, implementation_version: String(this.infoContent.implementation_version) };
  }

  async execute(code: string, onIopub: (ev: IopubEvent) => void): Promise<ExecuteReply> {
    if (this.child.exitCode !== null || this.child.signalCode !== null) {
      throw new Error(`the kernel process has exited (${this.child.exitCode ?? this.child.signalCode}):\n${this.stderr()}`);
    }
    const { reply, iopub } = await this.client.execute(code, { store_history: true, stop_on_error: true }, EXECUTE_TIMEOUT_MS);
    for (const m of iopub) onIopub({ msg_type: String(m.header.msg_type), content: await withPictures(m.content as Record<string, unknown>) });
    const c = reply.content as Record<string, unknown>;
    return { status: c.status as ExecuteReply["status"], execution_count: (c.execution_count as number) ?? null, ename: c.ename as string | undefined, evalue: c.evalue as string | undefined };
  }

  async interrupt(): Promise<void> {
    this.client.request("control", "interrupt_request");
  }

  async close(): Promise<void> {
    try {
      const id = this.client.request("control", "shutdown_request", { restart: false });
      await this.client.collect(id, 3_000).catch(() => undefined);
    } finally {
      this.client.close();
      if (this.child.exitCode === null && this.child.signalCode === null) {
        const gone = new Promise((r) => this.child.once("exit", r));
        const timer = setTimeout(() => this.child.kill("SIGKILL"), 3_000);
        await gone;
        clearTimeout(timer);
      }
      rmSync(this.dir, { recursive: true, force: true });
    }
  }
}

/** Maps engine outputs to the IOPub events a kernel process would send. */
export function engineOutputEvent(out: EngineOutput): IopubEvent {
  switch (out.kind) {
    case "stdout":
      return { msg_type: "stream", content: { name: "stdout", text: out.text } };
    case "clear":
      return { msg_type: "clear_output", content: { wait: out.wait } };
    case "display":
      return {
        msg_type: out.update ? "update_display_data" : "display_data",
        content: { data: out.bundle, metadata: {}, ...(out.displayId ? { transient: { display_id: out.displayId } } : {}) },
      };
  }
}

/**
 * Hands out kernels one notebook at a time and keeps up to `ahead` more starting in the background
 * while the current notebook runs, so with several notebooks the kernel start-up (process, worker,
 * language) is mostly hidden behind the previous notebooks' cells.
 */
export class KernelSupply {
  private readonly started: Promise<NotebookKernel>[] = [];
  private remaining: number;

  constructor(
    private readonly start: () => Promise<NotebookKernel>,
    count: number,
    private readonly ahead = 2,
  ) {
    this.remaining = count;
  }

  /** A ready (or starting) kernel; tops up the kernels starting in the background if more are needed. */
  acquire(): Promise<NotebookKernel> {
    if (this.remaining <= 0) throw new Error("KernelSupply: more kernels asked for than announced");
    this.remaining--;
    const current = this.started.shift() ?? this.start();
    while (this.started.length < Math.min(this.ahead, this.remaining)) {
      const next = this.start();
      // A prestarted kernel that fails is reported when its notebook acquires it, not as an unhandled rejection.
      next.catch(() => undefined);
      this.started.push(next);
    }
    return current;
  }

  /** Closes prestarted kernels nobody will use. */
  async dispose(): Promise<void> {
    const spare = this.started.splice(0);
    await Promise.all(spare.map((p) => p.then((k) => k.close()).catch(() => undefined)));
  }
}

export class InProcessKernel implements NotebookKernel {
  private count = 0;
  private constructor(private readonly engine: InProcessEngine) {}

  static async start(): Promise<InProcessKernel> {
    return new InProcessKernel(await InProcessEngine.create());
  }

  async info() {
    const content = kernelInfoContent(IMPLEMENTATION_VERSION) as Record<string, unknown>;
    return { language_info: content.language_info as Record<string, unknown>, implementation_version: IMPLEMENTATION_VERSION };
  }

  async execute(code: string, onIopub: (ev: IopubEvent) => void): Promise<ExecuteReply> {
    const n = ++this.count;
    const result: RunResult = await this.engine.execute(code, (out) => onIopub(engineOutputEvent(out)));
    if (!result.ok) {
      onIopub({ msg_type: "error", content: { ...result.error } });
      return { status: "error", execution_count: n, ename: result.error.ename, evalue: result.error.evalue };
    }
    if (result.result) onIopub({ msg_type: "execute_result", content: { data: result.result, metadata: {}, execution_count: n } });
    return { status: "ok", execution_count: n };
  }

  async interrupt(): Promise<void> {
    this.engine.interrupt();
  }

  async close(): Promise<void> {
    await this.engine.shutdown();
  }
}
