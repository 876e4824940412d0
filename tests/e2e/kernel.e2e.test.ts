/**
 * End to end over real ZeroMQ sockets: the compiled kernel process, driven by the wire client.
 * The long cell uses only plain mathjs syntax (runs under the placeholder and the final language):
 * summing squares of 3e6 numbers takes well over a second on this machine class.
 */
import { createHmac } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { startKernel, type RunningKernel } from "../support/kernelProcess.js";

const LONG_CELL = "sum(map(1:3e6, f(x) = x^2))";

describe("kernel over sockets", () => {
  let k: RunningKernel;
  beforeAll(async () => {
    k = await startKernel();
  });
  afterAll(async () => k?.stop());

  it("kernel_info_request over shell and control: one reply, busy then idle", async () => {
    for (const channel of ["shell", "control"] as const) {
      const id = k.client.request(channel, "kernel_info_request");
      const { reply, iopub } = await k.client.collect(id, 10_000);
      expect(reply.header.msg_type).toBe("kernel_info_reply");
      expect((reply.content.language_info as { name: string }).name).toBe("caloric");
      expect(iopub.map((m) => m.content.execution_state)).toEqual(["busy", "idle"]);
      expect(k.client.childrenOf(id).filter((m) => m.header.msg_type.endsWith("_reply"))).toHaveLength(1);
    }
  });

  it("execute_request: execute_input, result, reply; variables persist across cells", async () => {
    await k.client.execute("a = 6");
    const { reply, iopub } = await k.client.execute("a * 7");
    expect(reply.content.status).toBe("ok");
    expect(iopub.map((m) => m.header.msg_type)).toEqual(["status", "execute_input", "execute_result", "status"]);
    expect(String((iopub[2]!.content.data as Record<string, string>)["text/plain"])).toMatch(/^42\b/);
  });

  it("execute_request error: error message and error reply, kernel stays up", async () => {
    const { reply, iopub } = await k.client.execute("nosuchname_xyz + 1");
    expect(reply.content.status).toBe("error");
    expect(iopub.some((m) => m.header.msg_type === "error")).toBe(true);
    expect((await k.client.execute("1 + 1")).reply.content.status).toBe("ok");
  });

  it("complete, inspect, is_complete, history, comm_info requests each get one reply", async () => {
    const requests: Array<[string, Record<string, unknown>]> = [
      ["complete_request", { code: "sq", cursor_pos: 2 }],
      ["inspect_request", { code: "sqrt", cursor_pos: 4, detail_level: 0 }],
      ["is_complete_request", { code: "1 +" }],
      ["history_request", { hist_access_type: "tail", n: 3, output: false, raw: true }],
      ["comm_info_request", {}],
    ];
    for (const [type, content] of requests) {
      const id = k.client.request("shell", type, content);
      const { reply } = await k.client.collect(id, 10_000);
      expect(reply.header.msg_type).toBe(type.replace("_request", "_reply"));
      expect(reply.content.status === "ok" || type === "is_complete_request").toBe(true);
    }
  });

  it("comm_open to an unknown target is closed; comm_msg and comm_close get busy/idle only", async () => {
    const open = k.client.request("shell", "comm_open", { comm_id: "c-1", target_name: "none", data: {} });
    const closed = await k.client.waitFor((r) => r.message.header.msg_type === "comm_close" && r.message.parent_header.msg_id === open, 5000);
    expect(closed.message.content.comm_id).toBe("c-1");
    for (const type of ["comm_msg", "comm_close"]) {
      const id = k.client.request("shell", type, { comm_id: "c-1", data: {} });
      await k.client.waitFor((r) => r.message.parent_header.msg_id === id && r.message.content.execution_state === "idle", 5000);
      expect(k.client.childrenOf(id, "shell")).toHaveLength(0);
    }
  });

  it("bad signature, unsigned and replayed messages get no reply and the kernel stays alive", async () => {
    const wrong = k.client.build("kernel_info_request", {});
    wrong.frames[1] = Buffer.from("f".repeat(64));
    const unsigned = k.client.build("kernel_info_request", {});
    unsigned.frames[1] = Buffer.alloc(0);
    const original = k.client.build("execute_request", { code: "replayed = 1", silent: false, store_history: true, user_expressions: {}, allow_stdin: false, stop_on_error: true });
    await k.client.sendFrames("shell", wrong.frames);
    await k.client.sendFrames("shell", unsigned.frames);
    await k.client.sendFrames("shell", original.frames);
    await k.client.collect(original.msgId, 10_000); // the first copy is answered
    const before = k.client.childrenOf(original.msgId).length;
    await k.client.sendFrames("shell", original.frames); // byte-identical replay
    const probe = k.client.request("shell", "kernel_info_request");
    await k.client.collect(probe, 10_000);
    await new Promise((r) => setTimeout(r, 200));
    expect(k.client.childrenOf(wrong.msgId)).toHaveLength(0);
    expect(k.client.childrenOf(unsigned.msgId)).toHaveLength(0);
    expect(k.client.childrenOf(original.msgId)).toHaveLength(before);
    expect(k.stderr()).toMatch(/invalid signature/);
    expect(k.stderr()).toMatch(/unsigned/);
    expect(k.stderr()).toMatch(/replayed/);
    expect(k.process.exitCode).toBeNull();
  });

  it("decode over sockets: validly signed but malformed frames (garbage JSON, content not an object, header without msg_type) and missing delimiter or frames are dropped; nothing runs", async () => {
    await k.client.execute("kept = 41");
    // Re-sign tampered parts with the connection key, as a client holding the key but sending garbage would.
    const resign = (frames: Buffer[]) => {
      const h = createHmac("sha256", k.info.key);
      for (const part of frames.slice(2, 6)) h.update(part);
      frames[1] = Buffer.from(h.digest("hex"));
      return frames;
    };
    const cell = (code: string) => k.client.build("execute_request", { code, silent: false, store_history: true, user_expressions: {}, allow_stdin: false, stop_on_error: true });
    const garbage = cell("kept = 0");
    garbage.frames[5] = Buffer.from("{not json");
    const array = cell("kept = 0");
    array.frames[5] = Buffer.from("[1, 2]");
    const noType = cell("kept = 0");
    noType.frames[2] = Buffer.from(JSON.stringify({ msg_id: noType.msgId, session: "s" }));
    const noDelimiter = cell("kept = 0");
    const fewFrames = cell("kept = 0");
    await k.client.sendFrames("shell", resign(garbage.frames));
    await k.client.sendFrames("shell", resign(array.frames));
    await k.client.sendFrames("shell", resign(noType.frames));
    await k.client.sendFrames("shell", noDelimiter.frames.slice(1));
    await k.client.sendFrames("shell", fewFrames.frames.slice(0, 5));
    const { iopub } = await k.client.execute("kept + 1");
    await new Promise((r) => setTimeout(r, 200));
    for (const m of [garbage, array, noType, noDelimiter, fewFrames]) expect(k.client.childrenOf(m.msgId)).toHaveLength(0);
    expect(String((iopub.find((m) => m.header.msg_type === "execute_result")!.content.data as Record<string, string>)["text/plain"])).toMatch(/^42\b/);
    expect(k.stderr()).toMatch(/content is not valid JSON/);
    expect(k.stderr()).toMatch(/content is not a JSON object/);
    expect(k.stderr()).toMatch(/header lacks msg_type/);
    expect(k.stderr()).toMatch(/no <IDS\|MSG> delimiter/);
    expect(k.stderr()).toMatch(/expected 5 frames after the delimiter/);
    expect(k.process.exitCode).toBeNull();
  });

  it("heartbeat and control answer while a long cell runs; control is not queued behind shell", async () => {
    const cell = k.client.request("shell", "execute_request", { code: LONG_CELL, silent: false, store_history: true, user_expressions: {}, allow_stdin: false, stop_on_error: true });
    await k.client.waitFor((r) => r.message.parent_header.msg_id === cell && r.message.header.msg_type === "execute_input", 10_000);
    const ping = await k.client.ping(1000);
    expect(ping).not.toBeNull();
    const info = k.client.request("control", "kernel_info_request");
    await k.client.waitFor((r) => r.channel === "control" && r.message.parent_header.msg_id === info, 1000, "control reply during a busy cell");
    expect(k.client.childrenOf(cell, "shell")).toHaveLength(0); // the cell is still running
    const { reply } = await k.client.collect(cell, 120_000);
    expect(reply.content.status).toBe("ok");
  });
});
