import { describe, expect, it } from "vitest";
import { pureFluid, validateFluid } from "../../../../lib/thermo/eos/fluid.js";
import { ThermoError } from "../../../../lib/thermo/errors.js";
import { butane, methane } from "../fixtures.js";

const argOf = (f: () => void) => {
  try { f(); } catch (e) { return (e as ThermoError).argument; }
  return "no error";
};

describe("validateFluid", () => {
  it("validateFluid accepts a pure fluid and a normalised binary", () => {
    expect(() => validateFluid(pureFluid(methane))).not.toThrow();
    expect(() => validateFluid({ components: [methane, butane], x: [0.3, 0.7], kij: [[0, 0.02], [0.02, 0]] })).not.toThrow();
  });
  it("validateFluid names the bad field", () => {
    expect(argOf(() => validateFluid({ components: [], x: [] }))).toBe("fluid");
    expect(argOf(() => validateFluid({ components: [methane, butane], x: [0.5] }))).toBe("x");
    expect(argOf(() => validateFluid({ components: [methane, butane], x: [0.5, 0.6] }))).toBe("x");
    expect(argOf(() => validateFluid({ components: [methane, butane], x: [-0.1, 1.1] }))).toBe("x");
    expect(argOf(() => validateFluid({ components: [methane, butane], x: [0.5, 0.5], kij: [[0, 0.1], [0.2, 0]] }))).toBe("kij");
    expect(argOf(() => validateFluid({ components: [{ ...methane, Tc: -1 }], x: [1] }))).toBe("Tc");
  });
});
