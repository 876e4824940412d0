import { describe, expect, it } from "vitest";
import { ThermoError, requirePositive } from "../../../lib/thermo/errors.js";

describe("ThermoError", () => {
  it("ThermoError carries the argument and message", () => {
    const e = new ThermoError("T", "T must be > 0");
    expect(e).toBeInstanceOf(Error);
    expect([e.name, e.argument, e.message]).toEqual(["ThermoError", "T", "T must be > 0"]);
  });
  it("requirePositive rejects 0, negatives, NaN and Infinity, naming the argument and unit", () => {
    for (const bad of [0, -1, Number.NaN, Infinity]) {
      expect(() => requirePositive("P", bad, "Pa")).toThrow(/P must be a finite number > 0 Pa/);
    }
    expect(() => requirePositive("P", 1, "Pa")).not.toThrow();
  });
});
