import { describe, expect, it } from "vitest";
import { memoryKernel } from "../../support/memoryKernel.js";

describe("comm_info_request", () => {
  it("comm_info_request replies an empty comms map, with or without target_name", async () => {
    const k = memoryKernel();
    expect((await k.call("shell", "comm_info_request")).reply!.content).toEqual({ status: "ok", comms: {} });
    expect((await k.call("shell", "comm_info_request", { target_name: "x" })).reply!.content).toEqual({ status: "ok", comms: {} });
  });
});
