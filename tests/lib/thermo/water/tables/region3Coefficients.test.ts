import { describe, expect, it } from "vitest";
import { REGION3_HELMHOLTZ } from "../../../../../lib/thermo/water/tables/region3Coefficients.js";

// Term counts as printed in the IAPWS tables named in the source file (counts from memory of the tables,
// and each table also passes its verification values in the region tests).
describe("region3Coefficients", () => {
  it("region3Coefficients tables have the printed number of terms and equal-length I, J, n", () => {
    const tables: [{ I: readonly number[]; J: readonly number[]; n: readonly number[] }, number, boolean][] = [
      [REGION3_HELMHOLTZ, 39, true], // Table 30, i = 2..40 (n_1 is the log term)
    ];
    for (const [t, count, hasI] of tables) {
      expect(t.n.length).toBe(count);
      expect(t.J.length).toBe(count);
      expect(t.I.length).toBe(hasI ? count : 0);
      expect(t.n.every((v) => Number.isFinite(v) && v !== 0)).toBe(true);
    }
  });
});
