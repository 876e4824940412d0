import { describe, expect, it } from "vitest";
import { P_ATM, P_REF, R, T_REF } from "../../../lib/thermo/constants.js";

describe("constants", () => {
  it("R equals N_A k_B from the exact 2019 SI definitions", () => {
    // SI Brochure 9th ed. (2019): N_A = 6.02214076e23 /mol, k_B = 1.380649e-23 J/K, both exact; CODATA
    // 2018 prints R = 8.314 462 618... (10 significant figures), so agreement to 2e-10 J/(mol K).
    expect(Math.abs(R - 6.02214076e23 * 1.380649e-23)).toBeLessThan(2e-10);
  });
  it("reference conditions are 1 bar, 298.15 K and 1 atm = 101325 Pa", () => {
    // IUPAC standard pressure 1 bar; 1 atm = 101325 Pa exactly (CGPM 1954).
    expect([P_REF, T_REF, P_ATM]).toEqual([1e5, 298.15, 101325]);
  });
});
