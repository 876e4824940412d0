import { describe, expect, it } from "vitest";
import { ExecutionState } from "../../../kernel/execution/index.js";

describe("ExecutionState", () => {
  it("ExecutionState.begin counts only cells stored in history", () => {
    const s = new ExecutionState();
    expect(s.begin("a", true)).toBe(1);
    expect(s.begin("b", false)).toBe(1);
    expect(s.begin("c", true)).toBe(2);
    expect(s.history.tail().map((e) => e.input)).toEqual(["a", "c"]);
  });
});
