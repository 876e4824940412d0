import { describe, expect, it } from "vitest";
import { engineOutputEvent, InProcessKernel, KernelSupply } from "../../../kernel/runner/kernels.js";
import type { IopubEvent } from "../../../kernel/runner/outputs.js";

describe("engineOutputEvent", () => {
  it("engineOutputEvent maps engine outputs to the IOPub messages of the messaging spec", () => {
    expect(engineOutputEvent({ kind: "stdout", text: "x" })).toEqual({ msg_type: "stream", content: { name: "stdout", text: "x" } });
    expect(engineOutputEvent({ kind: "clear", wait: true })).toEqual({ msg_type: "clear_output", content: { wait: true } });
    expect(engineOutputEvent({ kind: "display", bundle: { "text/plain": "a" }, displayId: "d", update: true })).toEqual({ msg_type: "update_display_data", content: { data: { "text/plain": "a" }, metadata: {}, transient: { display_id: "d" } } });
    expect(engineOutputEvent({ kind: "display", bundle: { "text/plain": "a" } })).toEqual({ msg_type: "display_data", content: { data: { "text/plain": "a" }, metadata: {} } });
  });
});

describe("InProcessKernel", () => {
  it("InProcessKernel counts executions, keeps variables and reports errors as a kernel would", async () => {
    const k = await InProcessKernel.start();
    const events: IopubEvent[] = [];
    expect(await k.execute("x = 2 bar;", (e) => events.push(e))).toEqual({ status: "ok", execution_count: 1 });
    const r = await k.execute("x to kPa", (e) => events.push(e));
    expect(r).toEqual({ status: "ok", execution_count: 2 });
    const result = events.find((e) => e.msg_type === "execute_result")!;
    expect(String((result.content.data as Record<string, unknown>)["text/plain"])).toContain("200 kPa");
    const bad = await k.execute("x + 1 kg", (e) => events.push(e));
    expect(bad.status).toBe("error");
    expect(events.at(-1)!.msg_type).toBe("error");
    expect((await k.info()).language_info.name).toBe("caloric");
    await k.close();
  });
});

describe("KernelSupply", () => {
  const fake = (id: number) => ({ id, closed: false, info: async () => ({ language_info: {}, implementation_version: "" }), execute: async () => ({ status: "ok" as const, execution_count: 1 }), interrupt: async () => {}, close: async function (this: { closed: boolean }) { this.closed = true; } });
  it("KernelSupply starts the next kernel when one is handed out, and no more than announced", async () => {
    let started = 0;
    const supply = new KernelSupply(async () => fake(++started), 3, 1);
    const first = await supply.acquire();
    expect(started).toBe(2); // the second is already starting while the first notebook runs
    await supply.acquire();
    await supply.acquire();
    expect(started).toBe(3);
    expect(() => supply.acquire()).toThrow(/more kernels asked for than announced/);
    expect((first as unknown as { id: number }).id).toBe(1);
  });
  it("KernelSupply keeps up to `ahead` kernels starting, never more than will be used", async () => {
    let started = 0;
    const supply = new KernelSupply(async () => fake(++started), 4, 2);
    await supply.acquire();
    expect(started).toBe(3); // this one and two ahead
    await supply.acquire();
    expect(started).toBe(4); // only one more is needed in all
    await supply.acquire();
    await supply.acquire();
    expect(started).toBe(4);
  });
  it("KernelSupply.dispose closes a prestarted kernel nobody used", async () => {
    const made: ReturnType<typeof fake>[] = [];
    const supply = new KernelSupply(async () => { const k = fake(made.length + 1); made.push(k); return k; }, 2);
    await supply.acquire();
    await supply.dispose();
    expect(made[1]!.closed).toBe(true);
  });
  it("KernelSupply reports a failed prestart to the notebook that acquires it", async () => {
    let n = 0;
    const supply = new KernelSupply(async () => { if (++n === 2) throw new Error("port in use"); return fake(n); }, 2);
    await supply.acquire();
    await expect(supply.acquire()).rejects.toThrow("port in use");
  });
});
