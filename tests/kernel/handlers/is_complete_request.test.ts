import { describe, expect, it } from "vitest";
import { memoryKernel } from "../../support/memoryKernel.js";

describe("is_complete_request", () => {
  it("is_complete_request passes complete, incomplete (with indent) and invalid", async () => {
    const k = memoryKernel();
    expect((await k.call("shell", "is_complete_request", { code: "f(1)" })).reply!.content).toEqual({ status: "complete" });
    expect((await k.call("shell", "is_complete_request", { code: "f(1" })).reply!.content).toEqual({ status: "incomplete", indent: "" });
    expect((await k.call("shell", "is_complete_request", { code: "f)" })).reply!.content).toEqual({ status: "invalid" });
  });
});
