import { describe, expect, it } from "vitest";
import { memoryKernel } from "../../support/memoryKernel.js";

describe("comm_open", () => {
  it("comm_open to an unknown target closes the comm on iopub and sends no reply", async () => {
    const r = await memoryKernel().call("shell", "comm_open", { comm_id: "c1", target_name: "nobody", data: {} });
    expect(r.replies).toHaveLength(0);
    expect(r.types).toEqual(["status", "comm_close", "status"]);
    expect(r.iopub[1]!.content).toEqual({ comm_id: "c1", data: {} });
  });
});
