import { afterEach, describe, expect, it } from "vitest";
import { WorkerEngine, type EngineOutput } from "../../../kernel/engine/index.js";

const FAKE = new URL("../../support/fakeSession.ts", import.meta.url).href;

describe("WorkerEngine", () => {
  let engine: WorkerEngine | undefined;
  afterEach(async () => engine?.shutdown());

  it("WorkerEngine runs cells in a worker, keeps variables, and streams outputs before the result", async () => {
    engine = new WorkerEngine({ sessionModule: FAKE });
    const outputs: EngineOutput[] = [];
    expect(await engine.execute("x = 5", () => {})).toEqual({ ok: true });
    expect(await engine.execute("echo hi", (o) => outputs.push(o))).toEqual({ ok: true });
    expect(outputs).toEqual([{ kind: "stdout", text: "hi\n" }]);
    expect(await engine.execute("x", () => {})).toEqual({ ok: true, result: { "text/plain": "5" } });
    expect(await engine.complete("ps", 2)).toEqual({ matches: ["psat"], cursorStart: 0, cursorEnd: 2 });
    expect(await engine.isComplete("f(")).toEqual({ status: "incomplete", indent: "" });
  });

  it("WorkerEngine.interrupt stops a cooperative loop and keeps the variables", async () => {
    engine = new WorkerEngine({ sessionModule: FAKE, graceMs: 5000 });
    await engine.execute("x = 7", () => {});
    const running = engine.execute("loop", () => {});
    await new Promise((r) => setTimeout(r, 200));
    engine.interrupt();
    const r = await running;
    expect(r).toMatchObject({ ok: false, error: { ename: "Interrupted" } });
    expect(engine.generation).toBe(1);
    expect(await engine.execute("x", () => {})).toEqual({ ok: true, result: { "text/plain": "7" } });
  });

  it("WorkerEngine.interrupt replaces a worker that ignores the flag after the grace period and says variables were lost", async () => {
    const logs: string[] = [];
    engine = new WorkerEngine({ sessionModule: FAKE, graceMs: 300, log: (l) => logs.push(l) });
    await engine.execute("x = 7", () => {});
    const running = engine.execute("spin", () => {});
    await new Promise((r) => setTimeout(r, 200));
    const t0 = Date.now();
    engine.interrupt();
    const r = await running;
    expect(Date.now() - t0).toBeLessThan(10_000); // returns after the grace period, not after the 60 s spin
    expect(r).toMatchObject({ ok: false, error: { ename: "EngineRestarted", evalue: expect.stringMatching(/variables and functions defined so far were lost/) } });
    expect(engine.generation).toBe(2);
    expect(await engine.execute("x", () => {})).toMatchObject({ ok: false, error: { ename: "NameError" } });
  });

  it("WorkerEngine reports a session that throws as a failed call, and stays usable", async () => {
    engine = new WorkerEngine({ sessionModule: FAKE });
    await expect(engine.execute("throw", () => {})).rejects.toThrow(/session fault/);
    expect(await engine.execute("y = 1", () => {})).toEqual({ ok: true });
  });

  it("WorkerEngine rejects calls after shutdown and a bad grace period up front", async () => {
    const e = new WorkerEngine({ sessionModule: FAKE });
    await e.shutdown();
    await expect(e.execute("x", () => {})).rejects.toThrow(/shut down/);
    expect(() => new WorkerEngine({ graceMs: -1 })).toThrow(/graceMs must be >= 0/);
  });
});
