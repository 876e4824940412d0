import { describe, expect, it } from "vitest";
import { getSubstance, pr, psat, pureFluid, TRIPLE_POINTS } from "../../../../lib/thermo/index.js";

describe("TRIPLE_POINTS", () => {
  it("TRIPLE_POINTS: every entry names a databank substance, lies below Tc, and cites a source", () => {
    for (const [id, t] of Object.entries(TRIPLE_POINTS)) {
      const s = getSubstance(id);
      expect(s.id).toBe(id);
      expect(t.Tt).toBeLessThan(s.Tc);
      expect(t.source.length).toBeGreaterThan(10);
      // The databank record carries the same values.
      expect(s.Tt).toBe(t.Tt);
      expect(s.Pt).toBe(t.Pt);
    }
  });

  it("TRIPLE_POINTS: Tt < Tb exactly when Pt < 1 atm (a fluid boils at 1 atm only if its triple point lies below it; CO2 sublimes)", () => {
    // Fact of phase diagrams: the liquid exists at 101325 Pa only if Pt < 101325 Pa, and then Tt < Tb.
    for (const [id, t] of Object.entries(TRIPLE_POINTS)) {
      const s = getSubstance(id);
      if (id === "carbon dioxide") {
        expect(t.Pt!).toBeGreaterThan(101325); // CO2 triple point 5.18 bar (Span & Wagner 1996, from memory)
        expect(s.Tb).toBeLessThan(t.Tt); // its "Tb" is the sublimation point 194.7 K
      } else {
        expect(t.Tt).toBeLessThan(s.Tb);
        if (t.Pt !== undefined) expect(t.Pt).toBeLessThan(101325);
      }
    }
  });

  it("TRIPLE_POINTS: water is IAPWS's triple point (273.16 K, 611.657 Pa)", () => {
    // IAPWS R6-95 (IAPWS-95), and python3-iapws: iapws._iapws.Tt = 273.16, Pt = 0.000611657 MPa.
    expect(getSubstance("water").Tt).toBe(273.16);
    expect(getSubstance("water").Pt).toBe(611.657);
  });

  it("TRIPLE_POINTS: Pt agrees with the Peng-Robinson vapour pressure at Tt within 15 % where Tt/Tc >= 0.45", () => {
    // An independent check of the recalled pressures: PR uses only Tc, Pc and omega (whose definition fixes
    // Psat at Tr = 0.7), so near Tr 0.45-0.7 it reproduces vapour pressures of non-polar fluids within about
    // 10 % (common practice). Excluded: water and sulfur dioxide (polar; PR is 20 % off there) and hydrogen
    // (quantum gas).
    let checked = 0;
    for (const [id, t] of Object.entries(TRIPLE_POINTS)) {
      const s = getSubstance(id);
      if (t.Pt === undefined || t.Tt / s.Tc < 0.45 || ["water", "sulfur dioxide", "hydrogen"].includes(id)) continue;
      const P = psat(pr(pureFluid(s)), t.Tt).P;
      expect(Math.abs(P / t.Pt - 1), id).toBeLessThan(0.15);
      checked++;
    }
    expect(checked).toBeGreaterThanOrEqual(10);
  });
});
