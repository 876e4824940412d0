/**
 * Interrupt end to end. Cooperative: the language polls the stop flag, so the cell stops promptly and
 * variables are kept. Hard: a cell stuck where the flag is not polled is replaced after the grace
 * period, and the user is told the variables were lost.
 */
import { afterEach, describe, expect, it } from "vitest";
import { startKernel, type RunningKernel } from "../support/kernelProcess.js";

const exec = (code: string) => ({ code, silent: false, store_history: true, user_expressions: {}, allow_stdin: false, stop_on_error: true });
// Runs many seconds; the cell language polls shouldStop between elements of map (final language).
const LONG_CELL = "sum(map(1:3e7, f(x) = x^2))";

describe("interrupt_request", () => {
  let k: RunningKernel | undefined;
  afterEach(async () => k?.stop());

  it("interrupt_request stops a long cell promptly; the kernel answers and the next cell runs", async () => {
    k = await startKernel();
    await k.client.execute("keep = 5");
    const cell = k.client.request("shell", "execute_request", exec(LONG_CELL));
    await k.client.waitFor((r) => r.message.parent_header.msg_id === cell && r.message.header.msg_type === "execute_input", 10_000);
    await new Promise((r) => setTimeout(r, 300));
    const t0 = Date.now();
    const intr = k.client.request("control", "interrupt_request");
    const { reply: ireply } = await k.client.collect(intr, 5000);
    expect(ireply.content.status).toBe("ok");
    const { reply } = await k.client.collect(cell, 10_000);
    const elapsed = Date.now() - t0;
    expect(reply.content.status).toBe("error");
    expect(elapsed).toBeLessThan(8000); // grace period 2 s plus a fresh worker; far below the cell's own run time
    const after = await k.client.execute("keep + 1");
    if (reply.content.ename === "EngineRestarted") {
      // hard path: the language did not poll the flag in time; the user was told
      expect(String(reply.content.evalue)).toMatch(/variables and functions defined so far were lost/);
      expect(after.reply.content.status).toBe("error");
    } else {
      // cooperative path: variables kept
      expect(after.reply.content.status).toBe("ok");
      expect(String((after.iopub.find((m) => m.header.msg_type === "execute_result")!.content.data as Record<string, string>)["text/plain"])).toMatch(/^6\b/);
    }
  });

  it("SIGINT takes the same path as interrupt_request and does not kill the kernel", async () => {
    k = await startKernel();
    const cell = k.client.request("shell", "execute_request", exec(LONG_CELL));
    await k.client.waitFor((r) => r.message.parent_header.msg_id === cell && r.message.header.msg_type === "execute_input", 10_000);
    await new Promise((r) => setTimeout(r, 300));
    k.process.kill("SIGINT");
    const { reply } = await k.client.collect(cell, 10_000);
    expect(reply.content.status).toBe("error");
    expect(k.process.exitCode).toBeNull();
    expect((await k.client.execute("2 + 2")).reply.content.status).toBe("ok");
  });
});
