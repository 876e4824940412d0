import { describe, expect, it } from "vitest";
import { mathWithUnits } from "../../support/mathWithUnits.js";
import { loadMathjs } from "../../../lib/language/mathjs.js";

describe("installUnits", () => {
  it("installUnits adds units and keeps ordinary mathjs working", () => {
    const math = mathWithUnits();
    expect(math.evaluate("1 kcal to J").toNumber("J")).toBeCloseTo(4184, 9); // thermochemical calorie, NIST SP 811
    expect(math.evaluate("det([[1,2],[3,4]])")).toBeCloseTo(-2, 12); // 1*4 - 2*3
    expect(math.evaluate("sum([1,2,3])")).toBe(6);
    expect(math.evaluate("[1,2] * [3,4]")).toBe(11); // dot product 3 + 8
    expect(math.evaluate("2 m * 3 m").toNumber("m^2")).toBeCloseTo(6, 12);
  });
  it("installUnits on a fresh instance does not leak into another instance", () => {
    mathWithUnits();
    const m = loadMathjs();
    const plain = m.create(m.all, {});
    expect(() => plain.unit(1, "barg")).toThrow(/not found/);
  });
});
