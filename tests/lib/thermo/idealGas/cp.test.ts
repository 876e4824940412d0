import { describe, expect, it } from "vitest";
import { R } from "../../../../lib/thermo/constants.js";
import { cp, cpWarnings, cv, enthalpyIntegral, entropyIntegral } from "../../../../lib/thermo/idealGas/cp.js";
import { getSubstance } from "../../../../lib/thermo/substances/databank.js";

/** Composite Simpson rule, 2000 panels: an independent check of the closed-form integrals. */
function simpson(f: (x: number) => number, a: number, b: number, n = 2000): number {
  const h = (b - a) / n;
  let s = f(a) + f(b);
  for (let i = 1; i < n; i++) s += f(a + i * h) * (i % 2 ? 4 : 2);
  return (s * h) / 3;
}

describe("enthalpyIntegral", () => {
  it("enthalpyIntegral: methane 260 -> 600 degC needs 19,778 J/mol (SVNA 7th ed. Example 4.3, from memory)", () => {
    const q = enthalpyIntegral(getSubstance("methane"), 533.15, 873.15);
    expect(Math.abs(q / 19778 - 1)).toBeLessThan(1e-3); // the book rounds to 5 figures
  });

  it("enthalpyIntegral equals Simpson quadrature of cp for both correlation forms (1e-9 relative)", () => {
    for (const name of ["methane", "carbon dioxide", "isopentane", "r-22"]) {
      const s = getSubstance(name);
      const exact = enthalpyIntegral(s, 300, 1200);
      expect(Math.abs(exact / simpson((T) => cp(s, T), 300, 1200) - 1), name).toBeLessThan(1e-9);
    }
  });
});

describe("entropyIntegral", () => {
  it("entropyIntegral equals Simpson quadrature of cp/T for both forms (1e-9 relative)", () => {
    for (const name of ["ethane", "water", "o-xylene", "argon"]) {
      const s = getSubstance(name);
      const exact = entropyIntegral(s, 298.15, 900);
      expect(Math.abs(exact / simpson((T) => cp(s, T) / T, 298.15, 900) - 1), name).toBeLessThan(1e-9);
    }
  });

  it("entropyIntegral of a monatomic gas is (5/2) R ln(T/T0) exactly (kinetic theory)", () => {
    expect(entropyIntegral(getSubstance("argon"), 300, 600)).toBeCloseTo(2.5 * R * Math.log(2), 12);
  });
});

describe("cp", () => {
  it("cp minus cv is R (ideal gas, Mayer's relation)", () => {
    const s = getSubstance("propane");
    expect(cp(s, 450) - cv(s, 450)).toBeCloseTo(R, 12);
  });

  it("cp rejects T <= 0 naming T", () => {
    expect(() => cp(getSubstance("methane"), 0)).toThrow(/T must be a finite number > 0 K; got 0/);
  });
});

describe("cpWarnings", () => {
  it("cpWarnings flags temperatures outside the fitted range and only those", () => {
    const s = getSubstance("methane"); // Table C.1 range 298-1500 K
    expect(cpWarnings(s, 400, 1000)).toEqual([]);
    const w = cpWarnings(s, 200, 400, 1800);
    expect(w).toHaveLength(2);
    expect(w[0]).toMatch(/Methane extrapolated at T = 200 K \(correlation fitted for 298 to 1500 K\)/);
    // Rule of cpRangeClass (common practice, documented in cp.ts): within 10 % of the range is not flagged
    // (288.15 K standard conditions with a fit from 298 K; 1.1 x 1500 K = 1650 K); beyond 50 % is "far".
    expect(cpWarnings(s, 288.15, 269, 1650)).toEqual([]);
    expect(cpWarnings(s, 268)).toHaveLength(1);
    expect(cpWarnings(s, 1e5)[0]).toMatch(/Methane used far outside its fitted range 298 to 1500 K .*not meaningful.*\(T = 100000 K\)/);
    expect(cpWarnings(s, 2250)[0]).toMatch(/extrapolated at T = 2250 K/);
  });
});
