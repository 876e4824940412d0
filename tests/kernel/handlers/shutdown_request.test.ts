import { describe, expect, it } from "vitest";
import { memoryKernel } from "../../support/memoryKernel.js";

describe("shutdown_request", () => {
  it("shutdown_request replies with restart echoed and then asks the kernel to stop, on control or shell", async () => {
    const k = memoryKernel();
    expect((await k.call("control", "shutdown_request", { restart: true })).reply!.content).toEqual({ status: "ok", restart: true });
    expect((await k.call("shell", "shutdown_request", {})).reply!.content).toEqual({ status: "ok", restart: false });
    expect(k.shutdowns).toEqual([true, false]);
  });
});
