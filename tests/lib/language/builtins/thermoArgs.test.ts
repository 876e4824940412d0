import { describe, expect, it } from "vitest";
import { ArgumentError } from "../../../../lib/language/builtins/bind.js";
import { guard, lengthOf, pick, requireAbove0, requireAllAbove0 } from "../../../../lib/language/builtins/thermoArgs.js";
import { ThermoError } from "../../../../lib/thermo/index.js";

describe("guard", () => {
  it("guard turns a ThermoError into an ArgumentError naming the argument and function (renamed if asked)", () => {
    const f = () => { throw new ThermoError("p", "p must be > 0"); };
    expect(() => guard("state", f, { p: "P" })).toThrow(ArgumentError);
    expect(() => guard("state", f, { p: "P" })).toThrow(/^argument P of state\(\): p must be > 0$/);
    expect(guard("x", () => 3)).toBe(3);
    expect(() => guard("x", () => { throw new RangeError("other"); })).toThrow(RangeError);
  });
});

describe("lengthOf", () => {
  it("lengthOf: undefined for scalars, the common length otherwise, an error naming both on mismatch", () => {
    expect(lengthOf("f", { T: 1, P: 2 })).toBeUndefined();
    expect(lengthOf("f", { T: new Float64Array(3), P: 2 })).toBe(3);
    expect(() => lengthOf("f", { T: new Float64Array(3), P: new Float64Array(2) })).toThrow(/T has 3, P has 2/);
  });
});

describe("pick", () => {
  it("pick repeats scalars and indexes arrays", () => {
    expect(pick({ T: Float64Array.of(1, 2), P: 5 }, 1, {})).toEqual({ T: 2, P: 5 });
  });
});

describe("requireAbove0", () => {
  it("requireAbove0 names the argument, the bound and the value; requireAllAbove0 the element", () => {
    expect(() => requireAbove0("state", "T", -1, "K")).toThrow(/argument T of state\(\) must be above 0 K \(absolute temperature\), got -1 K/);
    expect(() => requireAllAbove0("state", "P", Float64Array.of(1, 0), "Pa")).toThrow(/argument P\[2\] of state\(\)/);
    expect(() => requireAbove0("state", "T", 1, "K")).not.toThrow();
  });
});
