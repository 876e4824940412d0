import { describe, expect, it } from "vitest";
import { zmq } from "../../../kernel/wire/zmq.js";

describe("kernel/wire/zmq", () => {
  it("zmq is the zeromq package itself (the same classes an ES import gives)", async () => {
    const viaImport = await import("zeromq");
    expect(zmq.Router).toBe(viaImport.Router);
    expect(zmq.Publisher).toBe(viaImport.Publisher);
    const s = new zmq.Reply({ linger: 0 });
    expect(s.closed).toBe(false);
    s.close();
    expect(s.closed).toBe(true);
  });
});
