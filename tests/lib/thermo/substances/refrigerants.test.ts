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
