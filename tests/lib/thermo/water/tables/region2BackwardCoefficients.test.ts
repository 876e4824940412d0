import { describe, expect, it } from "vitest";
import { REGION2A_P_HS, REGION2A_T_PH, REGION2A_T_PS, REGION2B_P_HS, REGION2B_T_PH, REGION2B_T_PS, REGION2C_P_HS, REGION2C_T_PH, REGION2C_T_PS } from "../../../../../lib/thermo/water/tables/region2BackwardCoefficients.js";

// Term counts as printed in the IAPWS tables named in the source file (counts from memory of the tables,
// and each table also passes its verification values in the region tests).
describe("region2BackwardCoefficients", () => {
  it("region2BackwardCoefficients tables have the printed number of terms and equal-length I, J, n", () => {
    const tables: [{ I: readonly number[]; J: readonly number[]; n: readonly number[] }, number, boolean][] = [
      [REGION2A_T_PH, 34, true], // Table 20
      [REGION2B_T_PH, 38, true], // Table 21
      [REGION2C_T_PH, 23, true], // Table 22
      [REGION2A_T_PS, 46, true], // Table 25
      [REGION2B_T_PS, 44, true], // Table 26
      [REGION2C_T_PS, 30, true], // Table 27
      [REGION2A_P_HS, 29, true], // SR2-01 Table 6
      [REGION2B_P_HS, 33, true], // SR2-01 Table 7
      [REGION2C_P_HS, 31, true], // SR2-01 Table 8
    ];
    for (const [t, count, hasI] of tables) {
      expect(t.n.length).toBe(count);
      expect(t.J.length).toBe(count);
      expect(t.I.length).toBe(hasI ? count : 0);
      expect(t.n.every((v) => Number.isFinite(v) && v !== 0)).toBe(true);
    }
  });
});
