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
    // b = R Tc/(8 Pc) = 116.4 cm^3/mol for n-butane: V from 2e-4 m^3/mol up lies above it.
    for (const V of [2e-4, 1e-3, 1e-2]) expect(Math.abs(internalPressure(m, 350, V) / (a / (V * V)) - 1)).toBeLessThan(1e-9);
  });
  it("internalPressure rejects V <= b naming V and the valid range (QA issue 5, item 3)", () => {
    // vdW b = R Tc/(8 Pc) (van der Waals 1873; textbook): n-butane 8.314462618 * 425.1 / (8 * 37.96e5) = 116.388 cm^3/mol.
    expect(() => internalPressure(vdw(pureFluid(butane)), 350, 1e-4)).toThrow(/V = 100 cm\^3\/mol is not above the co-volume .* valid range V > b = 116\.38\d cm\^3\/mol/);
  });
  it("internalPressure rejects V <= 0 naming V", () => {
    expect(() => internalPressure(vdw(pureFluid(butane)), 300, 0)).toThrow(/V must be/);
  });
});
