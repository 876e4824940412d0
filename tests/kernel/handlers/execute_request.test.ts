import { describe, expect, it } from "vitest";
import { memoryKernel } from "../../support/memoryKernel.js";

const exec = (code: string, extra: Record<string, unknown> = {}) => ({ code, silent: false, store_history: true, user_expressions: {}, allow_stdin: false, stop_on_error: true, ...extra });

describe("execute_request", () => {
  it("execute_request publishes busy, execute_input, execute_result, idle and replies ok with the count", async () => {
    const k = memoryKernel();
    await k.call("shell", "execute_request", exec("x = 4"));
    const r = await k.call("shell", "execute_request", exec("x"));
    expect(r.types).toEqual(["status", "execute_input", "execute_result", "status"]);
    expect(r.iopub[1]!.content).toEqual({ code: "x", execution_count: 2 });
    expect(r.iopub[2]!.content).toEqual({ execution_count: 2, data: { "text/plain": "4" }, metadata: {} });
    expect(r.reply!.content).toEqual({ status: "ok", execution_count: 2, user_expressions: {}, payload: [] });
  });

  it("execute_request maps stdout, display, update and clear to stream, display_data, update_display_data, clear_output", async () => {
    const k = memoryKernel();
    expect((await k.call("shell", "execute_request", exec("echo hi"))).iopub[2]!.content).toEqual({ name: "stdout", text: "hi\n" });
    const show = (await k.call("shell", "execute_request", exec("show A"))).iopub[2]!;
    expect(show.header.msg_type).toBe("display_data");
    expect(show.content).toEqual({ data: { "text/plain": "A" }, metadata: {}, transient: { display_id: "d1" } });
    const upd = (await k.call("shell", "execute_request", exec("update B"))).iopub[2]!;
    expect(upd.header.msg_type).toBe("update_display_data");
    expect(upd.content.transient).toEqual({ display_id: "d1" });
    const clear = (await k.call("shell", "execute_request", exec("clear"))).iopub[2]!;
    expect([clear.header.msg_type, clear.content]).toEqual(["clear_output", { wait: false }]);
  });

  it("execute_request publishes error and replies error with ename, evalue, traceback", async () => {
    const k = memoryKernel();
    const r = await k.call("shell", "execute_request", exec("fail"));
    expect(r.types).toEqual(["status", "execute_input", "error", "status"]);
    expect(r.reply!.content).toMatchObject({ status: "error", execution_count: 1, ename: "ValueError", evalue: "asked to fail", traceback: ["ValueError: asked to fail"] });
  });

  it("execute_request silent: no execute_input, no execute_result, count unchanged, not in history", async () => {
    const k = memoryKernel();
    await k.call("shell", "execute_request", exec("x = 1"));
    const r = await k.call("shell", "execute_request", exec("x", { silent: true }));
    expect(r.types).toEqual(["status", "status"]);
    expect(r.reply!.content.execution_count).toBe(1);
    expect(k.services.execution.history.size).toBe(1);
  });

  it("execute_request store_history=false keeps the count and the history", async () => {
    const k = memoryKernel();
    const r = await k.call("shell", "execute_request", exec("x = 1", { store_history: false }));
    expect(r.reply!.content.execution_count).toBe(0);
    expect(k.services.execution.history.size).toBe(0);
  });

  it("execute_request evaluates user_expressions after the cell, errors included", async () => {
    const k = memoryKernel();
    const r = await k.call("shell", "execute_request", exec("y = 7", { user_expressions: { a: "y", b: "nope", c: 3 } }));
    expect(r.reply!.content.user_expressions).toEqual({
      a: { status: "ok", data: { "text/plain": "7" }, metadata: {} },
      b: { status: "error", ename: "NameError", evalue: 'unknown name "nope"', traceback: ['NameError: unknown name "nope"'] },
      c: { status: "error", ename: "RequestError", evalue: "user_expressions.c: expected a string expression", traceback: ["user_expressions.c: expected a string expression"] },
    });
  });

  it("execute_request stop_on_error aborts executes that arrived before the failing reply, not later ones", async () => {
    const k = memoryKernel();
    const failing = k.dispatcher.receive("shell", k.request("execute_request", exec("fail")));
    const queued = k.request("execute_request", exec("x = 1"));
    const queuedDone = k.dispatcher.receive("shell", queued);
    await Promise.all([failing, queuedDone]);
    const reply = k.sent.find((s) => s.channel === "shell" && s.message.parent_header.msg_id === queued.header.msg_id)!.message;
    expect(reply.content).toEqual({ status: "aborted", execution_count: 1 });
    const later = await k.call("shell", "execute_request", exec("x = 2"));
    expect(later.reply!.content.status).toBe("ok");
    expect(later.reply!.content.execution_count).toBe(2);
  });

  it("execute_request stop_on_error=false lets queued cells run", async () => {
    const k = memoryKernel();
    const failing = k.dispatcher.receive("shell", k.request("execute_request", exec("fail", { stop_on_error: false })));
    const queued = k.request("execute_request", exec("x = 1"));
    await Promise.all([failing, k.dispatcher.receive("shell", queued)]);
    const reply = k.sent.find((s) => s.channel === "shell" && s.message.parent_header.msg_id === queued.header.msg_id)!.message;
    expect(reply.content.status).toBe("ok");
  });

  it("execute_request pages a run result marked help, and writes a no-help note on stderr, neither as execute_result", async () => {
    const k = memoryKernel();
    const r = await k.call("shell", "execute_request", exec("?psat"));
    expect(r.reply!.content.payload).toEqual([{ source: "page", data: { "text/plain": "psat(m, T): saturation pressure" }, start: 0 }]);
    expect(r.types).not.toContain("execute_result");
    const m = await k.call("shell", "execute_request", exec("zzz?"));
    expect(m.iopub.find((x) => x.header.msg_type === "stream")!.content).toEqual({ name: "stderr", text: "No help for 'zzz': not a known name\n" });
    expect(m.types).not.toContain("execute_result");
    expect(m.reply!.content).toMatchObject({ status: "ok", payload: [] });
  });

  it("execute_request rejects a non-string code with an error reply", async () => {
    const k = memoryKernel();
    const r = await k.call("shell", "execute_request", { code: 42 });
    expect(r.reply!.content).toMatchObject({ status: "error", evalue: "code: expected a string, got 42" });
  });
  it("execute_request rejects user_expressions that is not an object before running anything, keeping count and variables", async () => {
    const k = memoryKernel();
    await k.call("shell", "execute_request", exec("x = 5"));
    for (const bad of ["abc", [1], 7]) {
      const r = await k.call("shell", "execute_request", exec("x = 99", { user_expressions: bad }));
      expect(r.types).toEqual(["status", "status"]);
      expect(r.reply!.content).toEqual({
        status: "error",
        execution_count: 1,
        ename: "RequestError",
        evalue: `user_expressions: expected an object of name: expression strings, got ${JSON.stringify(bad)}`,
        traceback: [`RequestError: user_expressions: expected an object of name: expression strings, got ${JSON.stringify(bad)}`],
        user_expressions: {},
        payload: [],
      });
    }
    const after = await k.call("shell", "execute_request", exec("x"));
    expect(after.reply!.content.execution_count).toBe(2);
    expect(after.iopub[2]!.content.data).toEqual({ "text/plain": "5" });
  });

  it("execute_request field errors (code, silent) reply with the current execution_count and nothing runs", async () => {
    const k = memoryKernel();
    const r = await k.call("shell", "execute_request", exec("x = 1", { silent: "yes" }));
    expect(r.types).toEqual(["status", "status"]);
    expect(r.reply!.content).toMatchObject({ status: "error", execution_count: 0, evalue: 'silent: expected true or false, got "yes"' });
    expect(k.services.execution.history.size).toBe(0);
  });
});
