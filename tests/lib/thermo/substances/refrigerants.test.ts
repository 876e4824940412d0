import { describe, expect, it } from "vitest";
import { cp } from "../../../../lib/thermo/idealGas/cp.js";
import { getSubstance } from "../../../../lib/thermo/substances/databank.js";
import { REFRIGERANTS } from "../../../../lib/thermo/substances/refrigerants.js";

const get = (id: string) => REFRIGERANTS.find((s) => s.id === id)!;

describe("REFRIGERANTS", () => {
  it("REFRIGERANTS normal boiling points match ASHRAE data within 0.5 K", () => {
    // ASHRAE Handbook Fundamentals, refrigerant properties table (from memory), K.
    const ref: [string, number][] = [["r-134a", 247.08], ["r-32", 221.5], ["r-125", 225.06], ["r-22", 232.34], ["r-1234yf", 243.7]];
    for (const [id, Tb] of ref) expect(Math.abs(get(id).Tb - Tb), id).toBeLessThan(0.5);
  });

  it("REFRIGERANTS ideal-gas Cp at 298.15 K within 3 % of tabulated values", () => {
    // J/(mol K): CH2F2 42.89 and CHClF2 55.9 from JANAF 4th ed. (from memory); R-134a about 87 from the
    // ideal-gas part of Tillner-Roth & Baehr (1994) (from memory).
    const ref: [string, number][] = [["r-32", 42.89], ["r-22", 55.9], ["r-134a", 87.0]];
    for (const [id, v] of ref) expect(Math.abs(cp(get(id), 298.15) / v - 1), id).toBeLessThan(0.03);
  });

  it("REFRIGERANTS critical point and M/Vc agree with each fluid's reference equation of state (0.1 %, 0.3 %)", () => {
    // [Tc K, Pc MPa, rhoc kg/m^3] of the reference equations cited in each record (from memory): R-134a
    // Tillner-Roth & Baehr (1994); R-32 Tillner-Roth & Yokozeki (1997); R-125 Lemmon & Jacobsen (2005);
    // R-22 Kamei et al. (1995); R-1234yf Richter et al. (2011). 0.1 % in Tc and Pc catches a transcription
    // slip; 0.3 % in M/Vc covers Vc rounded to 4 digits.
    const ref: [string, number, number, number][] = [
      ["r-134a", 374.21, 4.0593, 511.9], ["r-32", 351.255, 5.782, 424.0], ["r-125", 339.173, 3.6177, 573.58],
      ["r-22", 369.295, 4.99, 523.84], ["r-1234yf", 367.85, 3.3822, 475.55],
    ];
    for (const [id, Tc, Pc, rhoc] of ref) {
      const s = get(id);
      expect(Math.abs(s.Tc / Tc - 1), id).toBeLessThan(1e-3);
      expect(Math.abs(s.Pc / (Pc * 1e6) - 1), id).toBeLessThan(1e-3);
      expect(Math.abs(s.M / s.Vc / rhoc - 1), id).toBeLessThan(3e-3);
    }
  });

  it("REFRIGERANTS ideal-gas Cp rises smoothly over 275-500 K (slope positive, no bend-back)", () => {
    // Ideal-gas Cp of these molecules rises smoothly, almost linearly, at these temperatures (statistical
    // thermodynamics: vibrational modes awakening); a mistyped C or D bends a cubic back. Check: the mean
    // slope over 375-500 K is positive and within a factor of 2 of that over 275-375 K (common practice).
    for (const s of REFRIGERANTS) {
      const lo = (cp(s, 375) - cp(s, 275)) / 100;
      const hi = (cp(s, 500) - cp(s, 375)) / 125;
      expect(lo, s.id).toBeGreaterThan(0);
      expect(hi, s.id).toBeGreaterThan(0);
      expect(hi / lo, s.id).toBeGreaterThan(0.5);
      expect(hi / lo, s.id).toBeLessThan(2);
    }
  });

  it("REFRIGERANTS resolve by ASHRAE number with or without hyphen; R-744 and R-717 are aliases", () => {
    expect(getSubstance("R1234yf").id).toBe("r-1234yf");
    expect(getSubstance("r-32").id).toBe("r-32");
    expect(getSubstance("R744").id).toBe("carbon dioxide");
    expect(getSubstance("R717").id).toBe("ammonia");
  });

  it("REFRIGERANTS with approximate Cp say so in their note", () => {
    for (const id of ["r-134a", "r-32", "r-125", "r-1234yf"]) expect(get(id).note, id).toMatch(/approximate/);
  });
});
