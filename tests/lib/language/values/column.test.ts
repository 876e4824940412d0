import { describe, expect, it } from "vitest";
import { loadMathjs } from "../../../../lib/language/mathjs.js";
import { createColumnFactory, isQuantityColumn } from "../../../../lib/language/values/column.js";

const lib = loadMathjs();
const math = lib.create(lib.all, {});
const column = createColumnFactory(math);

describe("createColumnFactory", () => {
  it("a column behaves as a matrix of quantities in expressions (index, max, arithmetic, to)", () => {
    const scope = new Map<string, unknown>([["c", column(Float64Array.from([300, 310, 320]), "K", "K")]]);
    expect(math.evaluate("c[2]", scope).toString()).toBe("310 K");
    expect(math.evaluate("max(c)", scope).toString()).toBe("320 K");
    expect(math.evaluate("size(c)[1]", scope)).toBe(3);
    // 300 K = 26.85 degC (SI Brochure: t/degC = T/K - 273.15).
    expect(math.evaluate("(c to degC)[1]", scope).toNumber("degC")).toBeCloseTo(26.85, 9);
  });
  it("a column shows in its display unit but keeps SI values", () => {
    const c = column(Float64Array.from([293.15]), "K", "degC");
    expect(math.format(c.toArray()[0], { precision: 6 })).toBe("20 degC");
    expect(c.si[0]).toBe(293.15);
  });
  it("a column reads assignments back into its SI values", () => {
    const scope = new Map<string, unknown>([["c", column(Float64Array.from([1, 2]), "Pa", "Pa")]]);
    math.evaluate("c[2] = 1 kPa", scope);
    const c = scope.get("c");
    expect(isQuantityColumn(c) && Array.from(c.si)).toEqual([1, 1000]);
  });
  it("isQuantityColumn is false for plain matrices", () => {
    expect(isQuantityColumn(math.matrix([1, 2]))).toBe(false);
  });
});
