import { describe, expect, it } from "vitest";
import { criticalConstants } from "../../../../lib/thermo/eos/criticalConstants.js";

// Published constants: van der Waals 27/64, 1/8, Zc 3/8 (exact); Redlich & Kwong, Chem. Rev. 44 (1949)
// 0.42748, 0.08664, Zc 1/3; Peng & Robinson, Ind. Eng. Chem. Fundam. 15 (1976) 59: 0.45724, 0.07780,
// Zc 0.307 (SVNA 7th ed. Table 3.1 prints 0.30740). Tolerances: half a unit of the printed last digit.
describe("criticalConstants", () => {
  it("criticalConstants(0, 0) gives van der Waals 27/64, 1/8, 3/8", () => {
    const c = criticalConstants(0, 0);
    expect(c.OmegaA).toBeCloseTo(27 / 64, 12);
    expect(c.OmegaB).toBeCloseTo(1 / 8, 12);
    expect(c.Zc).toBeCloseTo(3 / 8, 12);
  });
  it("criticalConstants(0, 1) gives Redlich-Kwong 0.42748, 0.08664, 1/3", () => {
    const c = criticalConstants(0, 1);
    expect(Math.abs(c.OmegaA - 0.42748)).toBeLessThan(5e-6);
    expect(Math.abs(c.OmegaB - 0.08664)).toBeLessThan(5e-6);
    expect(c.Zc).toBeCloseTo(1 / 3, 12);
  });
  it("criticalConstants(1 - sqrt2, 1 + sqrt2) gives Peng-Robinson 0.45724, 0.07780, 0.30740", () => {
    const c = criticalConstants(1 - Math.SQRT2, 1 + Math.SQRT2);
    expect(Math.abs(c.OmegaA - 0.45724)).toBeLessThan(5e-6);
    expect(Math.abs(c.OmegaB - 0.0778)).toBeLessThan(5e-6);
    expect(Math.abs(c.Zc - 0.3074)).toBeLessThan(5e-5);
  });
});
