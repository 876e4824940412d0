import { describe, expect, it } from "vitest";
import { R } from "../../../../lib/thermo/constants.js";
import { DEFAULT_REFERENCE, idealGasTotals, referenceState } from "../../../../lib/thermo/idealGas/reference.js";
import { getSubstance } from "../../../../lib/thermo/substances/databank.js";

const n2 = getSubstance("nitrogen");

describe("idealGasTotals", () => {
  it("idealGasTotals is zero H and S at the default reference (298.15 K, 1 bar) and states it", () => {
    const t = idealGasTotals(n2, 298.15, 1e5);
    expect(t.H).toBe(0);
    expect(t.S).toBeCloseTo(0, 14);
    expect(t.reference).toBe("ideal gas at 298.15 K and 1 bar: H = 0, S = 0");
    expect(t.U).toBeCloseTo(-R * 298.15, 10); // U = H - RT for an ideal gas
  });

  it("idealGasTotals: isothermal compression changes S by -R ln(P2/P1) and leaves H unchanged", () => {
    const a = idealGasTotals(n2, 400, 1e5);
    const b = idealGasTotals(n2, 400, 1e6);
    expect(b.H).toBe(a.H);
    expect(b.S - a.S).toBeCloseTo(-R * Math.log(10), 12);
    expect(b.G - a.G).toBeCloseTo(R * 400 * Math.log(10), 8); // dG = RT ln(P2/P1), ideal gas
  });

  it("idealGasTotals: N2 300 -> 1000 K enthalpy change within 1 % of JANAF (21,460 J/mol)", () => {
    // JANAF 4th ed.: H(1000) - H(298.15) = 21.460 kJ/mol, H(300) - H(298.15) = 0.054 kJ/mol (from memory).
    const dH = idealGasTotals(n2, 1000, 1e5).H - idealGasTotals(n2, 300, 1e5).H;
    expect(Math.abs(dH / (21460 - 54) - 1)).toBeLessThan(0.01);
  });

  it("idealGasTotals: differences do not depend on the reference chosen", () => {
    const ref = referenceState(273.15, 101325, 1000, 5);
    const d1 = idealGasTotals(n2, 700, 3e5).S - idealGasTotals(n2, 350, 2e5).S;
    const d2 = idealGasTotals(n2, 700, 3e5, ref).S - idealGasTotals(n2, 350, 2e5, ref).S;
    expect(d2).toBeCloseTo(d1, 10);
    expect(idealGasTotals(n2, 273.15, 101325, ref).H).toBe(1000);
  });

  it("idealGasTotals carries extrapolation warnings and G = H - TS, A = U - TS", () => {
    const t = idealGasTotals(getSubstance("methane"), 2500, 1e5);
    // Methane's Table C.1 fit ends at 1500 K: 2500 K is more than 50 % beyond it (cp.ts rule).
    expect(t.warnings.join()).toMatch(/far outside its fitted range 298 to 1500 K.*\(T = 2500 K\)/);
    expect(t.G).toBeCloseTo(t.H - 2500 * t.S, 6);
    expect(t.A).toBeCloseTo(t.U - 2500 * t.S, 6);
  });

  it("idealGasTotals rejects P <= 0 naming P", () => {
    expect(() => idealGasTotals(n2, 300, -1)).toThrow(/P must be a finite number > 0 Pa/);
  });
});

describe("referenceState", () => {
  it("referenceState validates and describes itself", () => {
    expect(referenceState(300, 2e5).description).toMatch(/300 K and 2 bar/);
    expect(() => referenceState(0, 1e5)).toThrow(/T0/);
    expect(DEFAULT_REFERENCE.T).toBe(298.15);
  });
});
