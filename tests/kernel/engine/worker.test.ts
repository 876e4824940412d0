/**
 * The worker entry, driven directly over its message protocol (no host): a worker thread on
 * kernel/engine/worker.ts with the scripted test session. Checks what the host relies on: "ready"
 * once the session has loaded, outputs before "done", outputs sent while a cell still runs, the
 * shared interrupt flag, chart pictures added in order, and faults reported as "fail".
 */
import { Worker } from "node:worker_threads";
import { afterEach, describe, expect, it } from "vitest";
import type { FromWorker, ToWorker, WorkerData, WorkerOp } from "../../../kernel/engine/protocol.js";

const WORKER = new URL("../../../kernel/engine/worker.ts", import.meta.url).href;
const FAKE = new URL("../../support/fakeSession.ts", import.meta.url).href;

class Harness {
  readonly flag = new Int32Array(new SharedArrayBuffer(4));
  readonly received: FromWorker[] = [];
  readonly worker: Worker;
  private waiters: Array<() => void> = [];
  private nextId = 1;
  constructor(sessionModule = FAKE, extra: Partial<WorkerData> = {}) {
    const data: WorkerData = { flag: this.flag.buffer as SharedArrayBuffer, sessionModule, ...extra };
    // The sources are TypeScript under the test runner: register tsx in the worker first (as the host does).
    this.worker = new Worker(`import("tsx/esm/api").then((m) => { m.register(); return import(${JSON.stringify(WORKER)}); })`, { eval: true, workerData: data });
    this.worker.on("message", (m: FromWorker) => {
      this.received.push(m);
      for (const w of this.waiters.splice(0)) w();
    });
  }
  send(op: WorkerOp): number {
    const id = this.nextId++;
    this.worker.postMessage({ id, ...op } satisfies ToWorker);
    return id;
  }
  /** Resolves with the first received message matching `pred` (already received ones count). */
  async until(pred: (m: FromWorker) => boolean, timeoutMs = 20_000): Promise<FromWorker> {
    const deadline = Date.now() + timeoutMs;
    for (;;) {
      const hit = this.received.find(pred);
      if (hit) return hit;
      if (Date.now() > deadline) throw new Error(`no matching message; got ${JSON.stringify(this.received)}`);
      await new Promise<void>((r) => {
        this.waiters.push(r);
        setTimeout(r, 100);
      });
    }
  }
  of(id: number): FromWorker[] {
    return this.received.filter((m) => m.kind !== "ready" && m.id === id);
  }
}

const isDone = (id: number) => (m: FromWorker) => (m.kind === "done" || m.kind === "fail") && m.id === id;

describe("kernel/engine/worker", () => {
  let h: Harness | undefined;
  afterEach(async () => {
    await h?.worker.terminate();
    h = undefined;
  });

  it("worker posts ready once the session loads, then answers run with its outputs before done, in order", async () => {
    h = new Harness();
    await h.until((m) => m.kind === "ready");
    expect((await h.until(isDone(h.send({ op: "run", code: "x = 5" }))))).toMatchObject({ kind: "done", value: { ok: true } });
    const id = h.send({ op: "run", code: "echo hi" });
    await h.until(isDone(id));
    expect(h.of(id)).toEqual([
      { kind: "output", id, output: { kind: "stdout", text: "hi\n" } },
      { kind: "done", id, value: { ok: true } },
    ]);
    const x = h.send({ op: "run", code: "x" });
    expect(await h.until(isDone(x))).toEqual({ kind: "done", id: x, value: { ok: true, result: { "text/plain": "5" } } });
  });

  it("worker answers eval, complete, inspect and isComplete from the same session", async () => {
    h = new Harness();
    await h.until(isDone(h.send({ op: "run", code: "pz = 3" })));
    const e = h.send({ op: "eval", expression: "pz" });
    const c = h.send({ op: "complete", code: "p", cursorPos: 1 });
    const i = h.send({ op: "inspect", code: "psat", cursorPos: 2, detailLevel: 0 });
    const k = h.send({ op: "isComplete", code: "f(" });
    expect(await h.until(isDone(e))).toMatchObject({ value: { ok: true, result: { "text/plain": "3" } } });
    expect(await h.until(isDone(c))).toMatchObject({ value: { matches: ["pressure", "psat", "pz"], cursorStart: 0, cursorEnd: 1 } });
    expect(await h.until(isDone(i))).toMatchObject({ value: { found: true } });
    expect(await h.until(isDone(k))).toMatchObject({ value: { status: "incomplete" } });
  });

  it("worker sends a cell's stdout while the cell is still running, and the shared flag stops it", async () => {
    h = new Harness();
    const id = h.send({ op: "run", code: "announce working" });
    // The session is now in a loop that only the flag ends: the output must already have arrived.
    expect(await h.until((m) => m.kind === "output" && m.id === id)).toMatchObject({ output: { kind: "stdout", text: "working\n" } });
    expect(h.of(id).some((m) => m.kind === "done")).toBe(false);
    Atomics.store(h.flag, 0, 1);
    expect(await h.until(isDone(id))).toMatchObject({ kind: "done", value: { ok: false, error: { ename: "Interrupted" } } });
  });

  it("worker adds the SVG to a pending chart and keeps later outputs behind it", async () => {
    h = new Harness();
    const id = h.send({ op: "run", code: "chart" });
    await h.until(isDone(id), 60_000); // the first chart loads vega
    const msgs = h.of(id);
    expect(msgs.map((m) => (m.kind === "output" ? m.output.kind : m.kind))).toEqual(["display", "stdout", "done"]);
    const first = msgs[0]!;
    const bundle = first.kind === "output" && first.output.kind === "display" ? first.output.bundle : {};
    expect(String((bundle as Record<string, unknown>)["image/svg+xml"])).toMatch(/^<svg/);
  }, 90_000);

  it("worker with renderCharts false sends a chart without pictures, at once (the client renders them)", async () => {
    h = new Harness(FAKE, { renderCharts: false });
    const id = h.send({ op: "run", code: "chart" });
    await h.until(isDone(id));
    const first = h.of(id)[0]!;
    const bundle = (first.kind === "output" && first.output.kind === "display" ? first.output.bundle : {}) as Record<string, unknown>;
    expect(bundle["application/vnd.vegalite.v5+json"]).toBeDefined();
    expect(bundle["image/svg+xml"]).toBeUndefined();
  });

  it("worker reports a session that throws, or a value that cannot be sent, as fail and stays usable", async () => {
    h = new Harness();
    expect(await h.until(isDone(h.send({ op: "run", code: "throw" })))).toMatchObject({ kind: "fail", message: expect.stringMatching(/session fault/) });
    expect(await h.until(isDone(h.send({ op: "run", code: "uncloneable" })))).toMatchObject({ kind: "fail", message: expect.stringMatching(/could not send its answer/) });
    expect(await h.until(isDone(h.send({ op: "run", code: "y = 1" })))).toMatchObject({ kind: "done", value: { ok: true } });
  });

  it("worker answers every request with fail when the session module cannot load", async () => {
    h = new Harness(new URL("./no-such-session-module.js", import.meta.url).href);
    const id = h.send({ op: "run", code: "1" });
    expect(await h.until(isDone(id))).toMatchObject({ kind: "fail", message: expect.stringMatching(/the cell language failed to load/) });
    expect(h.received.some((m) => m.kind === "ready")).toBe(false);
  });
});
