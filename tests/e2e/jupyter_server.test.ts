/**
 * Through a real Jupyter server, as a front end drives the kernel: Debian's notebook server (loopback,
 * token, every Jupyter directory in a temporary place) with the kernelspec from `caloric install`, and
 * @jupyterlab/services (the client library of JupyterLab) over `ws` from Node. Starts a kernel, runs
 * cells and reads their outputs (stream, a quantity's execute_result, a chart's display_data with its
 * SVG), interrupts a long cell (the server turns the REST call into an interrupt_request on control,
 * since kernel.json declares interrupt_mode "message"), restarts (variables gone), shuts down, and
 * stops the server within a bounded time.
 */
import { spawn, execFileSync, type ChildProcess } from "node:child_process";
import { randomUUID } from "node:crypto";
import { mkdirSync, mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { KernelManager, ServerConnection, type Kernel, type KernelMessage } from "@jupyterlab/services";
import WebSocket from "ws";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { jupyterEnv } from "../support/jupyterEnv.js";
import { freePort } from "../../kernel/wire/index.js";
import { CLI } from "../support/kernelProcess.js";

// A cell that runs for many seconds and polls the interrupt flag all along: 3e6 Peng-Robinson Z
// solutions in one vectorised call (the built-in polls every 256 points; about 6 s per 1e6 here).
// The span is made in an earlier cell, so polling starts right after "started" is printed.
const LONG_SETUP = "Ts = span(200 K, 400 K, 3e6);";
const LONG_CELL = 'echo("started"); z = zfactor(pr("methane"), Ts, 50 bar); 1';

interface Run {
  reply: KernelMessage.IExecuteReplyMsg;
  iopub: KernelMessage.IIOPubMessage[];
}

/** Executes a cell and collects its iopub messages until the reply (services resolves done after idle). */
async function run(kernel: Kernel.IKernelConnection, code: string, onIOPub?: (m: KernelMessage.IIOPubMessage) => void): Promise<Run> {
  const iopub: KernelMessage.IIOPubMessage[] = [];
  const future = kernel.requestExecute({ code, stop_on_error: false });
  future.onIOPub = (m) => {
    iopub.push(m);
    onIOPub?.(m);
  };
  const reply = (await future.done) as KernelMessage.IExecuteReplyMsg;
  return { reply, iopub };
}

const ofType = (r: Run, type: string) => r.iopub.filter((m) => m.header.msg_type === type);
const textOf = (m: KernelMessage.IIOPubMessage) => String(((m.content as { data?: Record<string, unknown> }).data ?? {})["text/plain"]);

async function waitForServer(baseUrl: string, token: string, server: ChildProcess, log: () => string): Promise<void> {
  const deadline = Date.now() + 60_000;
  while (Date.now() < deadline) {
    if (server.exitCode !== null) throw new Error(`jupyter notebook exited with ${server.exitCode}:\n${log()}`);
    try {
      const r = await fetch(`${baseUrl}api/kernelspecs`, { headers: { Authorization: `token ${token}` } });
      if (r.ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`jupyter notebook did not answer within 60 s:\n${log()}`);
}

describe("caloric through a Jupyter notebook server", () => {
  let server: ChildProcess;
  let serverLog = "";
  let settings: ServerConnection.ISettings;
  let manager: KernelManager;
  let kernel: Kernel.IKernelConnection;
  let baseUrl: string;
  let token: string;

  beforeAll(async () => {
    const tmp = mkdtempSync(join(tmpdir(), "caloric-server-"));
    execFileSync(process.execPath, [CLI, "install", "--prefix", join(tmp, "prefix")]);
    const notebooks = join(tmp, "notebooks");
    mkdirSync(notebooks);
    const port = await freePort();
    token = randomUUID();
    baseUrl = `http://127.0.0.1:${port}/`;
    server = spawn(
      "/usr/bin/jupyter",
      ["notebook", "--no-browser", "--allow-root", "--ip=127.0.0.1", `--port=${port}`, "--port-retries=0", `--NotebookApp.token=${token}`, `--notebook-dir=${notebooks}`],
      { env: jupyterEnv(tmp), stdio: ["ignore", "pipe", "pipe"] },
    );
    server.stdout!.on("data", (d: Buffer) => (serverLog += d.toString()));
    server.stderr!.on("data", (d: Buffer) => (serverLog += d.toString()));
    await waitForServer(baseUrl, token, server, () => serverLog);
    settings = ServerConnection.makeSettings({ baseUrl, wsUrl: `ws://127.0.0.1:${port}/`, token, appendToken: true, WebSocket: WebSocket as unknown as typeof globalThis.WebSocket });
    manager = new KernelManager({ serverSettings: settings });
    await manager.ready;
  }, 120_000);

  afterAll(async () => {
    manager?.dispose();
    if (!server || server.exitCode !== null) return;
    const exited = new Promise((r) => server.once("exit", r));
    server.kill("SIGTERM"); // the notebook server shuts its kernels down on SIGTERM
    const timer = setTimeout(() => server.kill("SIGKILL"), 10_000);
    await exited;
    clearTimeout(timer);
  }, 30_000);

  it("KernelManager.startNew starts caloric from the installed kernelspec", async () => {
    const specs = (await (await fetch(`${baseUrl}api/kernelspecs`, { headers: { Authorization: `token ${token}` } })).json()) as { kernelspecs: Record<string, { spec: { language: string; interrupt_mode: string } }> };
    expect(specs.kernelspecs.caloric?.spec).toMatchObject({ language: "caloric", interrupt_mode: "message" });
    kernel = await manager.startNew({ name: "caloric" });
    const info = await kernel.info;
    expect(info.language_info.name).toBe("caloric");
    expect(info.protocol_version).toBe("5.3");
  }, 60_000);

  it("requestExecute: stdout stream, a quantity's execute_result, variables kept between cells", async () => {
    const hello = await run(kernel, 'echo("hello from caloric")');
    expect(hello.reply.content.status).toBe("ok");
    expect(ofType(hello, "stream").map((m) => (m.content as { text: string }).text).join("")).toBe("hello from caloric\n");
    expect((await run(kernel, "P1 = 2 bar")).reply.content.status).toBe("ok");
    const q = await run(kernel, "P1 to kPa");
    expect(q.reply.content.status).toBe("ok");
    const results = ofType(q, "execute_result");
    expect(results).toHaveLength(1);
    expect(textOf(results[0]!)).toMatch(/^200 kPa$/); // 1 bar = 100 kPa exactly (SI definition of the bar)
  }, 60_000);

  it("requestExecute: a chart shown with show() arrives as display_data with Vega-Lite and SVG", async () => {
    const r = await run(kernel, 'show(chart(span(1 bar, 10 bar, 5), span(1, 0.9, 5), {ylabel: "Z", title: "Compressibility"}))');
    expect(r.reply.content.status).toBe("ok");
    const displays = ofType(r, "display_data");
    expect(displays).toHaveLength(1);
    const data = (displays[0]!.content as { data: Record<string, unknown> }).data;
    expect(data["application/vnd.vegalite.v5+json"]).toBeTypeOf("object");
    expect(String(data["image/svg+xml"])).toMatch(/^<svg[\s\S]*<\/svg>\s*$/);
  }, 60_000);

  it("kernel.interrupt stops a long cell promptly; variables survive (cooperative path)", async () => {
    expect((await run(kernel, LONG_SETUP)).reply.content.status).toBe("ok");
    let started!: () => void;
    const startedSeen = new Promise<void>((r) => (started = r));
    const running = run(kernel, LONG_CELL, (m) => {
      if (m.header.msg_type === "stream" && /started/.test((m.content as { text: string }).text)) started();
    });
    await startedSeen; // the stream arrives while the cell runs: the worker sends plain outputs at once
    await kernel.interrupt();
    const r = await running;
    expect(r.reply.content.status).toBe("error");
    expect((r.reply.content as KernelMessage.IReplyErrorContent).ename).toBe("Interrupted");
    const after = await run(kernel, "P1");
    expect(textOf(ofType(after, "execute_result")[0]!)).toBe("2 bar");
  }, 60_000);

  it("kernel.restart gives a fresh kernel: earlier variables are gone", async () => {
    await kernel.restart();
    const r = await run(kernel, "P1");
    expect(r.reply.content.status).toBe("error");
    expect(ofType(r, "error")).toHaveLength(1);
    expect((await run(kernel, "1 + 1")).reply.content.status).toBe("ok");
  }, 60_000);

  it("kernel.shutdown ends the kernel; the server lists no kernels", async () => {
    await kernel.shutdown();
    expect(kernel.isDisposed || kernel.status === "dead").toBe(true);
    const kernels = (await (await fetch(`${baseUrl}api/kernels`, { headers: { Authorization: `token ${token}` } })).json()) as unknown[];
    expect(kernels).toEqual([]);
  }, 60_000);
});
