import { describe, expect, it } from "vitest";
import { R } from "../../../../lib/thermo/constants.js";
import { idealGasFunctions } from "../../../../lib/thermo/idealGas/functions.js";
import { enthalpyIntegral } from "../../../../lib/thermo/idealGas/cp.js";
import { getSubstance } from "../../../../lib/thermo/substances/databank.js";

describe("idealGasFunctions", () => {
  it("idealGasFunctions (pure) gives H from the Cp integral and S with -R ln(P/P0)", () => {
    const s = getSubstance("carbon dioxide");
    const f = idealGasFunctions([s], [1]);
    expect(f.H(500)).toBeCloseTo(enthalpyIntegral(s, 298.15, 500), 8);
    expect(f.S(298.15, 1e6)).toBeCloseTo(-R * Math.log(10), 10); // isothermal ideal-gas entropy change
    expect(f.reference).toMatch(/298.15 K and 1 bar/);
    expect(f.warnings(3000).length).toBe(1); // CO2 correlation fitted to 2000 K
  });

  it("idealGasFunctions (mixture) adds R ln 2 of mixing for an equimolar binary at the reference", () => {
    const f = idealGasFunctions([getSubstance("nitrogen"), getSubstance("oxygen")], [0.5, 0.5]);
    expect(f.H(298.15)).toBeCloseTo(0, 10);
    expect(f.S(298.15, 1e5)).toBeCloseTo(R * Math.log(2), 10); // Gibbs's theorem
    expect(() => idealGasFunctions([getSubstance("nitrogen")], [0.5])).toThrow(/sum to 1/);
  });
});
