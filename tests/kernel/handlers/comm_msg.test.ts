import { describe, expect, it } from "vitest";
import { memoryKernel } from "../../support/memoryKernel.js";

describe("comm_msg", () => {
  it("comm_msg for an unknown comm is logged, with busy/idle and no reply", async () => {
    const k = memoryKernel();
    const r = await k.call("shell", "comm_msg", { comm_id: "c9", data: {} });
    expect(r.replies).toHaveLength(0);
    expect(r.types).toEqual(["status", "status"]);
    expect(k.logs.some((l) => l.includes("c9"))).toBe(true);
  });
});
