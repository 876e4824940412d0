import { describe, expect, it } from "vitest";
import { SendQueue } from "../../../kernel/wire/index.js";

describe("SendQueue", () => {
  it("SendQueue keeps one send in flight and the enqueue order", async () => {
    let inFlight = 0;
    let maxInFlight = 0;
    const order: string[] = [];
    const q = new SendQueue(async (frames) => {
      inFlight++;
      maxInFlight = Math.max(maxInFlight, inFlight);
      await new Promise((r) => setTimeout(r, frames[0]!.length)); // longer frames take longer
      order.push(frames[0]!.toString());
      inFlight--;
    });
    const all = ["aaaa", "b", "ccc", "dd"].map((s) => q.enqueue([Buffer.from(s)]));
    expect(q.size).toBe(4);
    await Promise.all(all);
    expect(order).toEqual(["aaaa", "b", "ccc", "dd"]);
    expect(maxInFlight).toBe(1);
    expect(q.size).toBe(0);
  });

  it("SendQueue reports a failed send and carries on with the next", async () => {
    const errors: unknown[] = [];
    const sent: string[] = [];
    const q = new SendQueue(async (f) => {
      if (f[0]!.toString() === "bad") throw new Error("EBUSY");
      sent.push(f[0]!.toString());
    }, (e) => errors.push(e));
    await Promise.all([q.enqueue([Buffer.from("bad")]), q.enqueue([Buffer.from("good")])]);
    expect(sent).toEqual(["good"]);
    expect(errors).toHaveLength(1);
  });
});
