import { describe, expect, it } from "vitest";
import { memoryKernel } from "../../support/memoryKernel.js";

describe("inspect_request", () => {
  it("inspect_request returns found and the help bundle, or found=false with empty data", async () => {
    const k = memoryKernel();
    expect((await k.call("shell", "inspect_request", { code: "psat(", cursor_pos: 4, detail_level: 0 })).reply!.content).toEqual({
      status: "ok", found: true, data: { "text/plain": "psat(m, T): saturation pressure" }, metadata: {},
    });
    expect((await k.call("shell", "inspect_request", { code: "zz", cursor_pos: 2 })).reply!.content).toEqual({ status: "ok", found: false, data: {}, metadata: {} });
    expect((await k.call("shell", "inspect_request", { code: "zz", detail_level: 2 })).reply!.content).toMatchObject({ status: "error", evalue: "detail_level: expected 0 or 1, got 2" });
  });
});
