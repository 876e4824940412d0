import { afterAll, describe, expect, it } from "vitest";
import { KernelClient, parseConnectionInfo } from "../../../kernel/wire/index.js";
import { startKernel, type RunningKernel } from "../../support/kernelProcess.js";

describe("KernelClient", () => {
  let kernel: RunningKernel | undefined;
  afterAll(async () => kernel?.stop());

  it("KernelClient.build signs requests with a 5.3 header and a fresh msg_id", async () => {
    const info = parseConnectionInfo({ transport: "tcp", ip: "127.0.0.1", shell_port: 1, iopub_port: 2, stdin_port: 3, control_port: 4, hb_port: 5, key: "k" });
    const c = await KernelClient.connect(info);
    const a = c.build("kernel_info_request", {});
    const b = c.build("kernel_info_request", {});
    expect(a.message.header).toMatchObject({ msg_type: "kernel_info_request", version: "5.3", session: c.session });
    expect(a.msgId).not.toBe(b.msgId);
    expect(a.frames[1]!.toString()).toMatch(/^[0-9a-f]{64}$/);
    c.close();
  });

  it("KernelClient.waitForReady, execute and collect drive a real kernel", async () => {
    kernel = await startKernel();
    const { reply, iopub } = await kernel.client.execute("1+1");
    expect(reply.content.status).toBe("ok");
    expect(iopub[0]!.content).toEqual({ execution_state: "busy" });
    expect(iopub.at(-1)!.content).toEqual({ execution_state: "idle" });
    await expect(kernel.client.waitFor(() => false, 50, "nothing")).rejects.toThrow(/timed out after 50 ms waiting for nothing/);
  });
});
