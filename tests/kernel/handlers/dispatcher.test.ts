import { describe, expect, it } from "vitest";
import { Dispatcher, type Handler } from "../../../kernel/handlers/index.js";
import { memoryKernel } from "../../support/memoryKernel.js";

describe("Dispatcher", () => {
  it("Dispatcher wraps a request in busy ... idle with exactly one reply parented by it", async () => {
    const k = memoryKernel();
    const r = await k.call("shell", "kernel_info_request");
    expect(r.types).toEqual(["status", "status"]);
    expect(r.iopub.map((m) => m.content.execution_state)).toEqual(["busy", "idle"]);
    expect(r.replies).toHaveLength(1);
    expect(r.reply!.header.msg_type).toBe("kernel_info_reply");
    expect(r.reply!.parent_header).toEqual(r.request.header);
    expect(r.reply!.identities.map(String)).toEqual(["client-1"]);
    expect(r.reply!.header.version).toBe("5.3");
  });

  it("Dispatcher turns a thrown handler error into one error reply naming the bad field", async () => {
    const k = memoryKernel();
    const r = await k.call("shell", "complete_request", { code: "ps", cursor_pos: 7 });
    expect(r.replies).toHaveLength(1);
    expect(r.reply!.content).toMatchObject({ status: "error", ename: "RequestError", evalue: "cursor_pos: expected 0..2 (code points in code), got 7" });
    expect(r.types).toEqual(["status", "status"]);
  });

  it("Dispatcher logs an unknown msg_type, sends no reply, and still publishes busy/idle", async () => {
    const k = memoryKernel();
    const r = await k.call("shell", "frobnicate_request");
    expect(r.replies).toHaveLength(0);
    expect(r.types).toEqual(["status", "status"]);
    expect(k.logs.some((l) => /unknown msg_type "frobnicate_request"/.test(l))).toBe(true);
  });

  it("Dispatcher answers control while a shell request is still running", async () => {
    const k = memoryKernel();
    let release!: () => void;
    const gate = new Promise<void>((r) => (release = r));
    const slow: Handler = async (ctx) => {
      await gate;
      await ctx.reply({ status: "ok" });
    };
    const d = new Dispatcher({ services: k.services, outbox: { send: (channel, message) => void k.sent.push({ channel, message }) }, handlers: { slow_request: slow, kernel_info_request: (ctx) => ctx.reply({ status: "ok" }) } });
    const shell = d.receive("shell", k.request("slow_request"));
    await d.receive("control", k.request("kernel_info_request"));
    expect(k.sent.filter((s) => s.channel === "control")).toHaveLength(1);
    expect(k.sent.filter((s) => s.channel === "shell")).toHaveLength(0);
    release();
    await shell;
    expect(k.sent.filter((s) => s.channel === "shell")).toHaveLength(1);
  });

  it("Dispatcher suppresses a second reply and reports a handler that forgot to reply", async () => {
    const k = memoryKernel();
    const d = new Dispatcher({
      services: k.services,
      outbox: { send: (channel, message) => void k.sent.push({ channel, message }) },
      handlers: {
        twice_request: async (ctx) => {
          await ctx.reply({ status: "ok" });
          await ctx.reply({ status: "ok" });
        },
        silent_request: () => {},
      },
    });
    await d.receive("shell", k.request("twice_request"));
    await d.receive("shell", k.request("silent_request"));
    const replies = k.sent.filter((s) => s.channel === "shell").map((s) => s.message);
    expect(replies.map((m) => m.header.msg_type)).toEqual(["twice_reply", "silent_reply"]);
    expect(replies[1]!.content).toMatchObject({ status: "error", evalue: "silent_request handler produced no reply" });
  });

  it("Dispatcher ignores stdin traffic (no input_request is ever pending)", async () => {
    const k = memoryKernel();
    await k.dispatcher.receive("stdin", k.request("input_reply", { value: "x" }));
    expect(k.sent).toHaveLength(0);
  });
});
