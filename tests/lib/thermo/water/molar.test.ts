import { describe, expect, it } from "vitest";
import { perMassFromMolar, toMolar } from "../../../../lib/thermo/water/molar.js";
import { region1 } from "../../../../lib/thermo/water/region1.js";

describe("toMolar", () => {
  it("toMolar gives liquid water at 300 K, 3 MPa a molar volume of 18.05 cm3/mol", () => {
    // v = 0.100215168e-2 m3/kg (IF97 Table 5) times M = 18.015268 g/mol = 18.0540 cm3/mol.
    const m = toMolar(region1(300, 3e6));
    expect(m.V * 1e6).toBeCloseTo(18.054, 3);
    expect(m.Cp).toBeCloseTo(4173.01218 * 0.018015268, 6); // cp from Table 5 times M
  });
});

describe("perMassFromMolar", () => {
  it("perMassFromMolar inverts the multiplication by M", () => {
    expect(perMassFromMolar(40650)).toBeCloseTo(40650 / 0.018015268, 6); // 40.65 kJ/mol latent heat at 100 degC (common practice)
  });
});
