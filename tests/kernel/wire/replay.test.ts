import { describe, expect, it } from "vitest";
import { ReplayGuard } from "../../../kernel/wire/index.js";

describe("ReplayGuard", () => {
  it("ReplayGuard.admit refuses a signature seen before", () => {
    const g = new ReplayGuard(10);
    expect(g.admit("a")).toBe(true);
    expect(g.admit("b")).toBe(true);
    expect(g.admit("a")).toBe(false);
  });

  it("ReplayGuard forgets the oldest beyond its capacity", () => {
    const g = new ReplayGuard(2);
    g.admit("a");
    g.admit("b");
    g.admit("c");
    expect(g.size).toBe(2);
    expect(g.admit("a")).toBe(true); // forgotten, so admitted again
    expect(g.admit("c")).toBe(false);
  });

  it("ReplayGuard rejects a bad capacity", () => {
    expect(() => new ReplayGuard(0)).toThrow(/capacity/);
  });
});
