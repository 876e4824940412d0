import { describe, expect, it } from "vitest";
import { loadMathjs } from "../../../lib/language/mathjs.js";

describe("loadMathjs", () => {
  it("loadMathjs returns the bundle with create and all", () => {
    const m = loadMathjs();
    expect(typeof m.create).toBe("function");
    expect(m.create(m.all, {}).evaluate("2 + 3")).toBe(5);
  });
});
