import { describe, expect, it } from "vitest";
import { loadMathjs } from "../../../lib/language/mathjs.js";

describe("loadMathjs", () => {
  it("loadMathjs returns the full mathjs API from the single-file bundle", () => {
    const math = loadMathjs();
    expect(typeof math.create).toBe("function");
    // 1 bar = 100 kPa by definition (SI brochure, 9th edition, table 8: non-SI units accepted).
    expect(math.evaluate("1 bar to kPa").toNumber("kPa")).toBeCloseTo(100, 12);
  });
});
