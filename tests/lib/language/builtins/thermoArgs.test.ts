import { describe, expect, it } from "vitest";
import { ArgumentError } from "../../../../lib/language/builtins/bind.js";
import { atElement, guard, if97SaturationHint, lengthOf, pick, requireAbove0, requireAllAbove0 } from "../../../../lib/language/builtins/thermoArgs.js";
import { createSessionWithInternals } from "../../../../lib/language/createSession.js";
import { ThermoError, if97Tsat } from "../../../../lib/thermo/index.js";

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
    // Readable numbers, no raw floats or SI (QA issue 5, item 19): 8e6 Pa reads as bar, Infinity is named.
    expect(() => requireAbove0("state", "T", Infinity, "K")).toThrow(/must be above 0 K \(absolute temperature\) and finite, got Infinity$/);
    expect(() => requireAbove0("state", "P", -8e6, "Pa")).toThrow(/got -80 bar$/);
  });
});

describe("if97SaturationHint", () => {
  const { internals } = createSessionWithInternals({ shouldStop: () => false });
  const ctx = { units: internals.units } as unknown as Parameters<typeof if97SaturationHint>[4];
  it("if97SaturationHint names the {P, x} form within 1e-5 relative of Tsat(P) below the critical pressure, nothing otherwise", () => {
    // IAPWS-IF97 saturation: Tsat(0.1 MPa) = 372.755919 K (IF97 Table 36 check value for p = 0.1 MPa, from memory).
    const Ts = if97Tsat(1e5);
    expect(Math.abs(Ts - 372.755919)).toBeLessThan(1e-5);
    expect(if97SaturationHint(Ts, 1e5, "liquid", "", ctx)).toMatch(/Tsat = 372\.7559 K\): for saturated liquid use state\(if97\(\), \{P: 100 kPa, x: 0\}\)$/);
    expect(if97SaturationHint(Ts * (1 + 5e-6), 1e5, "vapor", ".V", ctx)).toMatch(/saturated vapour use state\(if97\(\), \{P: 100 kPa, x: 1\}\)\.V$/);
    expect(if97SaturationHint(Ts * (1 + 2e-5), 1e5, "vapor", "", ctx)).toBe("");
    expect(if97SaturationHint(Ts, 1e5, "stable", "", ctx)).toBe("");
    expect(if97SaturationHint(700, 25e6, "liquid", "", ctx)).toBe(""); // above the critical pressure 22.064 MPa
  });
});

describe("atElement", () => {
  it("atElement adds the 1-based element to an ArgumentError and lets other errors through unchanged", () => {
    expect(() => atElement(4, 10, () => { throw new ArgumentError("argument T of state(): bad"); })).toThrow(/^argument T of state\(\): bad \(at element 5 of 10\)$/);
    expect(() => atElement(0, 2, () => { throw new RangeError("other"); })).toThrow(RangeError);
    expect(atElement(0, 1, () => 7)).toBe(7);
  });
});
