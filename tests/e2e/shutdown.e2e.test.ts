import { describe, expect, it } from "vitest";
import { startKernel } from "../support/kernelProcess.js";

describe("shutdown_request", () => {
  it("shutdown_request on control replies, publishes idle, and the process exits 0", async () => {
    const k = await startKernel();
    const id = k.client.request("control", "shutdown_request", { restart: false });
    const { reply } = await k.client.collect(id, 10_000);
    expect(reply.content).toEqual({ status: "ok", restart: false });
    expect(await k.exited).toBe(0);
    await k.stop();
  });

  it("shutdown_request with restart on shell replies restart=true and exits (the manager starts a new kernel)", async () => {
    const k = await startKernel();
    const id = k.client.request("shell", "shutdown_request", { restart: true });
    const { reply } = await k.client.collect(id, 10_000);
    expect(reply.content).toEqual({ status: "ok", restart: true });
    expect(await k.exited).toBe(0);
    await k.stop();
    const again = await startKernel();
    expect((await again.client.execute("1 + 2")).reply.content.status).toBe("ok");
    await again.stop();
  });

  it("kernel exits when the JPY_PARENT_PID process is gone", async () => {
    const { spawn } = await import("node:child_process");
    const parent = spawn("sleep", ["30"]);
    const k = await startKernel({ env: { JPY_PARENT_PID: String(parent.pid) } });
    parent.kill("SIGKILL");
    expect(await k.exited).toBe(0);
    await k.stop();
  });
});
