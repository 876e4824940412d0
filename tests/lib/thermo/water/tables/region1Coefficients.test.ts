import { describe, expect, it } from "vitest";
import { REGION1_GIBBS, REGION1_P_HS, REGION1_T_PH, REGION1_T_PS } from "../../../../../lib/thermo/water/tables/region1Coefficients.js";

// Term counts as printed in the IAPWS tables named in the source file (counts from memory of the tables,
// and each table also passes its verification values in the region tests).
describe("region1Coefficients", () => {
  it("region1Coefficients tables have the printed number of terms and equal-length I, J, n", () => {
    const tables: [{ I: readonly number[]; J: readonly number[]; n: readonly number[] }, number, boolean][] = [
      [REGION1_GIBBS, 34, true], // Table 2
      [REGION1_T_PH, 20, true], // Table 6
      [REGION1_T_PS, 20, true], // Table 8
      [REGION1_P_HS, 19, true], // SR2-01 Table 2
    ];
    for (const [t, count, hasI] of tables) {
      expect(t.n.length).toBe(count);
      expect(t.J.length).toBe(count);
      expect(t.I.length).toBe(hasI ? count : 0);
      expect(t.n.every((v) => Number.isFinite(v) && v !== 0)).toBe(true);
    }
  });
});
