import { describe, expect, it } from "vitest";
import { HANDLERS } from "../../../kernel/handlers/index.js";

describe("HANDLERS", () => {
  it("HANDLERS lists every message type the kernel answers, one per file", () => {
    expect(Object.keys(HANDLERS).sort()).toEqual([
      "comm_close", "comm_info_request", "comm_msg", "comm_open", "complete_request", "execute_request",
      "history_request", "inspect_request", "interrupt_request", "is_complete_request", "kernel_info_request", "shutdown_request",
    ]);
  });
});
