import { describe, expect, it } from "vitest";
import { memoryKernel } from "../../support/memoryKernel.js";

describe("complete_request", () => {
  it("complete_request returns matches and code-point offsets", async () => {
    const r = await memoryKernel().call("shell", "complete_request", { code: "𝛼 = ps", cursor_pos: 6 });
    expect(r.reply!.content).toEqual({ status: "ok", matches: ["psat"], cursor_start: 4, cursor_end: 6, metadata: {} });
  });
});
