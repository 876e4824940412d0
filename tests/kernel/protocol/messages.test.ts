import { describe, expect, it } from "vitest";
import { HEADER_COMPATIBLE, PROTOCOL_VERSION } from "../../../kernel/protocol/index.js";

describe("messages", () => {
  it("PROTOCOL_VERSION is 5.3 and the header type is compatible with @jupyterlab/services", () => {
    expect(PROTOCOL_VERSION).toBe("5.3");
    expect(HEADER_COMPATIBLE).toBe(true);
  });
});
