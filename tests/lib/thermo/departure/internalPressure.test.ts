import { describe, expect, it } from "vitest";
import { internalPressure } from "../../../../lib/thermo/departure/internalPressure.js";
import { idealGas, pureFluid, vdw } from "../../../../lib/thermo/index.js";
import { butane } from "../fixtures.js";

describe("internalPressure", () => {
  it("internalPressure of an ideal gas is zero (Joule's law: U depends on T only)", () => {
    expect(Math.abs(internalPressure(idealGas(pureFluid(butane)), 300, 0.02))).toBeLessThan(1e-9);
  });
  it("internalPressure of van der Waals is a/V^2 (textbook result, T (dP/dT)_V - P = a/V^2)", () => {
    const m = vdw(pureFluid(butane));
    const { a } = m.mixture(350);
    for (const V of [1e-4, 1e-3, 1e-2]) expect(Math.abs(internalPressure(m, 350, V) / (a / (V * V)) - 1)).toBeLessThan(1e-9);
  });
  it("internalPressure rejects V <= 0 naming V", () => {
    expect(() => internalPressure(vdw(pureFluid(butane)), 300, 0)).toThrow(/V must be/);
  });
});
