import { describe, expect, it } from "vitest";
import { mathWithUnits } from "../../support/mathWithUnits.js";
import { containsOffset } from "../../../lib/units/arithmetic.js";
import type { Matrix, Unit } from "mathjs";

describe("installOffsetPolicy (via installUnits)", () => {
  const math = mathWithUnits();
  const ev = (s: string) => math.evaluate(s) as unknown;
  it("containsOffset finds offsets in arrays and matrices", () => {
    expect(containsOffset(ev("[1 K, 2 degC]"))).toBe(true);
    expect(containsOffset(ev("matrix([1 K, 2 K])"))).toBe(false);
    expect(containsOffset(ev("matrix([[1 bar], [2 barg]])"))).toBe(true);
  });
  it("subtract works element by element on arrays", () => {
    const d = (ev("[20 degC, 30 degC] - 10 degC") as Matrix).toArray() as Unit[];
    expect(d.map((x) => x.toNumber("K"))).toEqual([10, 20]); // differences in K (arithmetic)
    expect(d[0]!.formatUnits()).toBe("K");
  });
  it("multiply of an array of offset temperatures by R uses absolute values", () => {
    // Parenthesised: mathjs reads "x * 8.3 J/(mol K)" as (x * 8.3 J)/(mol K), where T does not cancel.
    const rt = (ev("[25 degC, 125 degC] * (8.314462618 J/(mol K))") as Matrix).toArray() as Unit[];
    // R T at 298.15 K and 398.15 K, scipy.constants R
    expect(rt[0]!.toNumber("J/mol")).toBeCloseTo(2478.9570, 3);
    expect(rt[1]!.toNumber("J/mol")).toBeCloseTo(3310.4033, 3);
  });
  it("dotMultiply and dotPow follow the same rules", () => {
    expect(() => ev("[25 degC] .* [2]")).toThrow(/absolute temperature/);
    expect(() => ev("[25 degC] .^ 2")).toThrow(/power of an offset quantity/);
  });
  it("compare family uses absolute values (mathjs alone gets these wrong)", () => {
    expect(ev("30 degC > 300 K")).toBe(true); // 303.15 K > 300 K
    expect(ev("0 barg == 1 atm")).toBe(true); // gauge zero is one atmosphere
    expect((ev("[20 degC, 30 degC] < 300 K") as Matrix).toArray()).toEqual([true, false]);
    expect(() => ev("(25 degC) * 8.314462618 J/(mol K)")).toThrow(/\(25 degC to K\)/);
  });
  it("add with several arguments folds pairwise", () => {
    expect((math.add(math.unit(25, "degC"), math.unit(1, "K"), math.unit(2, "K")) as unknown as Unit).toNumber("degC")).toBeCloseTo(28, 10);
  });
  it("matrix product with offsets is refused", () => {
    expect(() => ev("[[25 degC]] * [[2]]")).toThrow(/convert them first/);
  });
});

describe("cbrt (via installUnits)", () => {
  const math = mathWithUnits();
  it("cbrt of a negative quantity leaves its argument unchanged", () => {
    const x = math.unit(-8, "m^3");
    const r = math.cbrt(x) as unknown as Unit;
    expect(r.toNumber("m")).toBeCloseTo(-2, 12); // (-2 m)^3 = -8 m^3
    expect(x.toNumber("m^3")).toBe(-8); // mathjs 15 alone flips this to +8
    const xs = [math.unit(-27, "m^3")];
    math.map(xs as never, math.cbrt as never); // elementwise, as a cell writes map(xs, cbrt)
    expect(xs[0]!.toNumber("m^3")).toBe(-27);
    expect(math.cbrt(27)).toBeCloseTo(3, 12); // 3^3 = 27
  });
});
