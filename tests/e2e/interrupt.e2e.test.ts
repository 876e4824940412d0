/**
 * Interrupt end to end, each path made deterministic.
 * Cooperative (the real cell language): the cell prints "started", then runs a vectorised built-in
 * over a big span, which polls the stop flag every 256 points; the test interrupts only after it has
 * seen "started", so the stop always lands in polling code: the reply is "Interrupted" and variables
 * are kept. Hard (the scripted test session's "spin", which never polls): after the grace period the
 * worker is replaced and the user is told the variables were lost.
 */
import { afterEach, describe, expect, it } from "vitest";
import { startKernel, type RunningKernel } from "../support/kernelProcess.js";

const exec = (code: string) => ({ code, silent: false, store_history: true, user_expressions: {}, allow_stdin: false, stop_on_error: true });
// 3e6 Peng-Robinson Z solutions in one call: about 20 s on this machine class, polled every 256 points.
// The span is made in an earlier cell, so polling starts right after "started" is printed.
const LONG_SETUP = "Ts = span(200 K, 400 K, 3e6);";
const LONG_CELL = 'echo("started"); z = zfactor(pr("methane"), Ts, 50 bar); 1';
// A long grace period: on a loaded machine the cooperative stop is then never overtaken by the hard path.
const COOPERATIVE = ["--interrupt-grace-ms", "10000"];
const FAKE_SESSION = new URL("../support/fakeSession.ts", import.meta.url).href;

/** Sends the long cell and resolves with its msg_id once its "started" stream has arrived. */
async function startLongCell(k: RunningKernel, code = LONG_CELL, marker: (type: string, content: Record<string, unknown>) => boolean = (t, c) => t === "stream" && /started/.test(String(c.text))) {
  const cell = k.client.request("shell", "execute_request", exec(code));
  await k.client.waitFor((r) => r.message.parent_header.msg_id === cell && marker(r.message.header.msg_type, r.message.content), 30_000, "the long cell to start");
  return cell;
}

describe("interrupt_request", () => {
  let k: RunningKernel | undefined;
  afterEach(async () => k?.stop());

  it("interrupt_request stops a polling cell promptly (cooperative): Interrupted, variables kept", async () => {
    k = await startKernel({ args: COOPERATIVE });
    await k.client.execute("keep = 5");
    await k.client.execute(LONG_SETUP);
    const cell = await startLongCell(k);
    const { reply: ireply } = await k.client.collect(k.client.request("control", "interrupt_request"), 5000);
    expect(ireply.content.status).toBe("ok");
    const { reply, iopub } = await k.client.collect(cell, 15_000); // the cell alone would run about 20 s
    expect(reply.content).toMatchObject({ status: "error", ename: "Interrupted" });
    expect(iopub.some((m) => m.header.msg_type === "error")).toBe(true);
    const after = await k.client.execute("keep + 1");
    expect(after.reply.content.status).toBe("ok");
    expect(String((after.iopub.find((m) => m.header.msg_type === "execute_result")!.content.data as Record<string, string>)["text/plain"])).toBe("6");
  });

  it("SIGINT takes the same cooperative path and does not kill the kernel", async () => {
    k = await startKernel({ args: COOPERATIVE });
    await k.client.execute("keep = 5");
    await k.client.execute(LONG_SETUP);
    const cell = await startLongCell(k);
    k.process.kill("SIGINT");
    const { reply } = await k.client.collect(cell, 15_000);
    expect(reply.content).toMatchObject({ status: "error", ename: "Interrupted" });
    expect(k.process.exitCode).toBeNull();
    expect((await k.client.execute("keep + 2")).reply.content.status).toBe("ok");
  });

  it("interrupt_request replaces an engine that ignores the flag (hard path): EngineRestarted, variables lost, kernel usable", async () => {
    k = await startKernel({ args: ["--session-module", FAKE_SESSION, "--interrupt-grace-ms", "500"] });
    await k.client.execute("keep = 5");
    expect((await k.client.execute("keep")).reply.content.status).toBe("ok");
    const cell = await startLongCell(k, "spin", (t) => t === "execute_input");
    await new Promise((r) => setTimeout(r, 200)); // the worker is inside the non-polling loop
    const t0 = Date.now();
    await k.client.collect(k.client.request("control", "interrupt_request"), 5000);
    const { reply } = await k.client.collect(cell, 20_000); // the spin alone would run 60 s
    expect(Date.now() - t0).toBeGreaterThanOrEqual(450); // the grace period was given first (a lower bound: load cannot break it)
    expect(reply.content).toMatchObject({ status: "error", ename: "EngineRestarted" });
    expect(String(reply.content.evalue)).toMatch(/variables and functions defined so far were lost/);
    const after = await k.client.execute("keep");
    expect(after.reply.content).toMatchObject({ status: "error", ename: "NameError" });
    expect((await k.client.execute("echo alive")).reply.content.status).toBe("ok");
    expect(k.stderr()).toMatch(/replacing the engine worker/);
  });
});
