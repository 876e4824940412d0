/**
 * runKernel, the composition root, run inside the test process over real loopback sockets with the
 * wire client. What it promises: kernel_info is answered on the main thread without the engine; the
 * engine loads after the first kernel_info exchange, on the first request that needs it, or after
 * engineStartMs; shutdown closes everything and exits with 0; and its own module graph holds no
 * engine and nothing from lib/ (so cold start does not pay for the language or the chart libraries).
 */
import { spawnSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { pathToFileURL } from "node:url";
import { afterEach, describe, expect, it } from "vitest";
import { runKernel, type KernelHandle, type KernelOptions } from "../../kernel/main.js";
import { KernelClient, loopbackConnection } from "../../kernel/wire/index.js";
import { REPO_ROOT } from "../support/kernelProcess.js";

const FAKE = new URL("../support/fakeSession.ts", import.meta.url).href;

interface Started {
  handle: KernelHandle;
  client: KernelClient;
  exits: number[];
  logs: string[];
}

async function start(options: Partial<KernelOptions> = {}): Promise<Started> {
  const info = await loopbackConnection();
  const file = join(mkdtempSync(join(tmpdir(), "caloric-main-")), "connection.json");
  writeFileSync(file, JSON.stringify(info));
  const exits: number[] = [];
  const logs: string[] = [];
  const handle = await runKernel({ connectionFile: file, sessionModule: FAKE, handleSignals: false, engineStartMs: 600_000, exit: (c) => exits.push(c), log: (l) => logs.push(l), ...options });
  const client = await KernelClient.connect(info);
  return { handle, client, exits, logs };
}

async function eventually(check: () => boolean, what: string, timeoutMs = 20_000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (!check()) {
    if (Date.now() > deadline) throw new Error(`timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 20));
  }
}

describe("runKernel", () => {
  let k: Started | undefined;
  afterEach(async () => {
    k?.client.close();
    await k?.handle.stop();
    k = undefined;
  });

  it("runKernel answers kernel_info while the engine cannot load, and starts the engine after that exchange", async () => {
    // A session module whose loading never finishes: kernel_info must not depend on it.
    const hanging = join(mkdtempSync(join(tmpdir(), "caloric-main-")), "hanging.mjs");
    writeFileSync(hanging, "await new Promise(() => {});\nexport const createSession = undefined;\n");
    k = await start({ sessionModule: pathToFileURL(hanging).href });
    expect(k.handle.engineStarted).toBe(false); // binding alone does not start it
    const reply = await k.client.waitForReady(20_000);
    expect(reply.header.msg_type).toBe("kernel_info_reply");
    expect((reply.content.language_info as { name: string }).name).toBe("caloric");
    await eventually(() => k!.handle.engineStarted, "the engine to start after the kernel_info exchange");
  });

  it("runKernel starts the engine on the first request that needs it (no kernel_info first)", async () => {
    k = await start();
    expect(k.handle.engineStarted).toBe(false);
    const first = await k.client.execute("x = 5");
    expect(first.reply.content.status).toBe("ok");
    expect(k.handle.engineStarted).toBe(true);
    const { reply, iopub } = await k.client.execute("x");
    expect(reply.content).toMatchObject({ status: "ok", execution_count: 2 });
    expect(iopub.map((m) => m.header.msg_type)).toEqual(["status", "execute_input", "execute_result", "status"]);
  });

  it("runKernel starts the engine after engineStartMs even if no request comes", async () => {
    k = await start({ engineStartMs: 50 });
    await eventually(() => k!.handle.engineStarted, "the fallback start");
  });

  it("runKernel: shutdown_request is answered, then the engine and sockets close and exit(0) is called once", async () => {
    k = await start();
    await k.client.execute("y = 1"); // a live worker to shut down
    const id = k.client.request("control", "shutdown_request", { restart: false });
    const { reply } = await k.client.collect(id, 10_000);
    expect(reply.content).toEqual({ status: "ok", restart: false });
    await eventually(() => k!.exits.length > 0, "exit");
    await k.handle.stop(); // a second stop is the same stop
    expect(k.exits).toEqual([0]);
  });

  it("runKernel's static module graph (compiled) holds the wire but neither the engine nor anything from lib/", () => {
    const dir = mkdtempSync(join(tmpdir(), "caloric-graph-"));
    writeFileSync(join(dir, "hook.mjs"), 'export async function load(url, context, next) { if (url.startsWith("file:")) process.stderr.write("LOADED " + url + "\\n"); return next(url, context); }\n');
    writeFileSync(join(dir, "register.mjs"), `import { register } from "node:module";\nregister(${JSON.stringify(pathToFileURL(join(dir, "hook.mjs")).href)});\n`);
    const main = pathToFileURL(join(REPO_ROOT, "dist", "kernel", "main.js")).href;
    const r = spawnSync(process.execPath, ["--import", pathToFileURL(join(dir, "register.mjs")).href, "-e", `import(${JSON.stringify(main)})`], { encoding: "utf8" });
    expect(r.status, r.stderr).toBe(0);
    const loaded = r.stderr.split("\n").filter((l) => l.startsWith("LOADED ")).map((l) => l.slice("LOADED ".length));
    expect(loaded.some((u) => u.endsWith("/dist/kernel/main.js"))).toBe(true); // the hook saw the graph
    expect(loaded.some((u) => u.endsWith("/dist/kernel/wire/kernelSockets.js"))).toBe(true); // sockets bind before the rest loads
    expect(loaded.filter((u) => u.includes("/dist/lib/") || u.includes("/dist/kernel/engine/") || /node_modules\/(mathjs|vega)/.test(u))).toEqual([]);
  });
});
