import { describe, expect, it } from "vitest";
import { AbortWindow } from "../../../kernel/execution/index.js";

describe("AbortWindow", () => {
  it("AbortWindow aborts exactly the requests that arrived before the failure", () => {
    const w = new AbortWindow();
    const a = w.arrive();
    const b = w.arrive();
    expect(w.shouldAbort(a)).toBe(false);
    w.fail(); // a failed while b was queued
    expect(w.shouldAbort(b)).toBe(true);
    const c = w.arrive();
    expect(w.shouldAbort(c)).toBe(false);
  });
});
