import { describe, expect, it } from "vitest";
import { REGION5_IDEAL, REGION5_RESIDUAL } from "../../../../../lib/thermo/water/tables/region5Coefficients.js";

// Term counts as printed in the IAPWS tables named in the source file (counts from memory of the tables,
// and each table also passes its verification values in the region tests).
describe("region5Coefficients", () => {
  it("region5Coefficients tables have the printed number of terms and equal-length I, J, n", () => {
    const tables: [{ I: readonly number[]; J: readonly number[]; n: readonly number[] }, number, boolean][] = [
      [REGION5_IDEAL, 6, false], // Table 37
      [REGION5_RESIDUAL, 6, true], // Table 38
    ];
    for (const [t, count, hasI] of tables) {
      expect(t.n.length).toBe(count);
      expect(t.J.length).toBe(count);
      expect(t.I.length).toBe(hasI ? count : 0);
      expect(t.n.every((v) => Number.isFinite(v) && v !== 0)).toBe(true);
    }
  });
});
