import { describe, expect, it } from "vitest";
import { memoryKernel } from "../../support/memoryKernel.js";

describe("comm_close", () => {
  it("comm_close has no reply and keeps busy/idle", async () => {
    const r = await memoryKernel().call("shell", "comm_close", { comm_id: "c1", data: {} });
    expect(r.replies).toHaveLength(0);
    expect(r.types).toEqual(["status", "status"]);
  });
});
