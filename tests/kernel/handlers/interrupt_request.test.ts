import { describe, expect, it } from "vitest";
import { InProcessEngine } from "../../../kernel/engine/index.js";
import { createSession } from "../../support/fakeSession.js";
import { memoryKernel } from "../../support/memoryKernel.js";

describe("interrupt_request", () => {
  it("interrupt_request replies ok on control and raises the engine's stop flag", async () => {
    const engine = new InProcessEngine(createSession);
    let interrupted = 0;
    const orig = engine.interrupt.bind(engine);
    engine.interrupt = () => {
      interrupted++;
      orig();
    };
    const r = await memoryKernel(engine).call("control", "interrupt_request");
    expect(r.reply!.content).toEqual({ status: "ok" });
    expect(r.reply!.header.msg_type).toBe("interrupt_reply");
    expect(interrupted).toBe(1);
  });
});
