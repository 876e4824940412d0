import { describe, expect, it } from "vitest";
import { mathWithUnits } from "../../support/mathWithUnits.js";
import type { Unit } from "mathjs";
import { describeValue, fromSI, fromSIArray, scalarSI, toSI } from "../../../lib/units/convert.js";

describe("toSI", () => {
  const math = mathWithUnits();
  it("toSI converts offset units to absolute", () => {
    expect(toSI(math.unit(25, "degC"), "temperature", "T", "state")).toBeCloseTo(298.15, 10); // 273.15 offset, ITS-90
    expect(toSI(math.unit(77, "degF"), "temperature", "T", "state")).toBeCloseTo(298.15, 10); // (77+459.67) x 5/9
    expect(toSI(math.unit(0, "barg"), "pressure", "P", "state")).toBeCloseTo(101325, 6); // 1 atm
    expect(toSI(math.unit(100, "psig"), "pressure", "P", "state")).toBeCloseTo(790800.7293, 3); // 100 x 6894.757293168 Pa + 101325 Pa (scipy.constants psi, atm)
  });
  it("toSI converts plain units and arrays once", () => {
    expect(toSI(math.unit(2, "MPa"), "pressure", "P", "state")).toBeCloseTo(2e6, 6);
    const arr = toSI(math.evaluate("[1 bar, 2 bar, 3 bar]"), "pressure", "P", "state");
    expect(arr).toBeInstanceOf(Float64Array);
    expect(Array.from(arr as Float64Array)).toEqual([1e5, 2e5, 3e5]);
    expect(toSI(0.5, "dimensionless", "x", "f")).toBe(0.5);
  });
  it("toSI errors name the argument, function, expectation and what came", () => {
    expect(() => toSI(math.unit(25, "degC"), "pressure", "P", "state")).toThrow("argument P of state() needs a pressure, e.g. 1 Pa, got 25 degC (a temperature)");
    expect(() => toSI(25, "temperature", "T", "state")).toThrow("argument T of state() needs a temperature, e.g. 1 K, got 25 (a plain number)");
    expect(() => toSI(math.evaluate("[1 bar, 2 K]"), "pressure", "P", "state")).toThrow(/argument P\[2\] of state\(\) needs a pressure.*got 2 K/);
    expect(() => toSI("x", "pressure", "P", "state")).toThrow(/got the text "x"/);
    expect(() => scalarSI(math.evaluate("[1 bar]"), "pressure", "P", "psat")).toThrow(/needs a single value, got an array/);
  });
  it("fromSI returns SI units, named units and plain numbers", () => {
    expect((fromSI(math, 101325, "pressure") as Unit).toNumber("Pa")).toBe(101325);
    expect((fromSI(math, 298.15, "degC") as Unit).toNumber("degC")).toBeCloseTo(25, 10); // ITS-90 offset
    expect((fromSI(math, 101325, "psig") as Unit).toNumber("psig")).toBeCloseTo(0, 10);
    expect(fromSI(math, 0.9, "dimensionless")).toBe(0.9);
    const xs = fromSIArray(math, new Float64Array([1e5, 2e5]), "bar");
    expect(xs.map((x) => (x as Unit).toNumber("bar"))).toEqual([1, 2]);
  });
  it("describeValue names kinds of values", () => {
    expect(describeValue(math.unit(3, "m/s^3"))).toBe("3 m / s^3 (a quantity of another dimension)");
    expect(describeValue(true)).toBe("true (a boolean)");
  });
});
