import { describe, expect, it } from "vitest";
import { memoryKernel } from "../../support/memoryKernel.js";

describe("history_request", () => {
  it("history_request answers tail, range and search (with output pairs)", async () => {
    const k = memoryKernel();
    for (const code of ["a = 1", "a", "b = 2", "a"]) await k.call("shell", "execute_request", { code });
    const tail = await k.call("shell", "history_request", { hist_access_type: "tail", n: 2, output: false, raw: true });
    expect(tail.reply!.content).toEqual({ status: "ok", history: [[1, 3, "b = 2"], [1, 4, "a"]] });
    const withOut = await k.call("shell", "history_request", { hist_access_type: "tail", n: 1, output: true, raw: true });
    expect(withOut.reply!.content.history).toEqual([[1, 4, ["a", "1"]]]);
    const range = await k.call("shell", "history_request", { hist_access_type: "range", session: 0, start: 2, stop: 4, output: false, raw: true });
    expect(range.reply!.content.history).toEqual([[1, 2, "a"], [1, 3, "b = 2"]]);
    const search = await k.call("shell", "history_request", { hist_access_type: "search", pattern: "a*", unique: true, output: false, raw: true });
    expect(search.reply!.content.history).toEqual([[1, 1, "a = 1"], [1, 4, "a"]]);
    const bad = await k.call("shell", "history_request", { hist_access_type: "everything", output: false, raw: true });
    expect(bad.reply!.content).toMatchObject({ status: "error", evalue: 'hist_access_type: expected "tail", "range" or "search", got "everything"' });
  });
  it("history_request: tail n=0 gives no rows, a negative n is an error reply, range of an earlier (negative) session gives none", async () => {
    const k = memoryKernel();
    for (const code of ["a = 1", "a"]) await k.call("shell", "execute_request", { code });
    const zero = await k.call("shell", "history_request", { hist_access_type: "tail", n: 0, output: false, raw: true });
    expect(zero.reply!.content).toEqual({ status: "ok", history: [] });
    const negative = await k.call("shell", "history_request", { hist_access_type: "search", pattern: "*", n: -1, output: false, raw: true });
    expect(negative.reply!.content).toMatchObject({ status: "error", ename: "RequestError", evalue: "n: expected a count of 0 or more, got -1" });
    expect(negative.types).toEqual(["status", "status"]);
    const earlier = await k.call("shell", "history_request", { hist_access_type: "range", session: -1, start: 1, stop: 3, output: false, raw: true });
    expect(earlier.reply!.content).toEqual({ status: "ok", history: [] });
  });
});
