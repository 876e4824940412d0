import { describe, expect, it } from "vitest";
import { REGION2_IDEAL, REGION2_RESIDUAL } from "../../../../../lib/thermo/water/tables/region2Coefficients.js";

// Term counts as printed in the IAPWS tables named in the source file (counts from memory of the tables,
// and each table also passes its verification values in the region tests).
describe("region2Coefficients", () => {
  it("region2Coefficients tables have the printed number of terms and equal-length I, J, n", () => {
    const tables: [{ I: readonly number[]; J: readonly number[]; n: readonly number[] }, number, boolean][] = [
      [REGION2_IDEAL, 9, false], // Table 10
      [REGION2_RESIDUAL, 43, true], // Table 11
    ];
    for (const [t, count, hasI] of tables) {
      expect(t.n.length).toBe(count);
      expect(t.J.length).toBe(count);
      expect(t.I.length).toBe(hasI ? count : 0);
      expect(t.n.every((v) => Number.isFinite(v) && v !== 0)).toBe(true);
    }
  });
});
