import { describe, expect, it } from "vitest";
import { getSubstance, heatCapacity, idealGas, idealGasCp, pr, pureFluid, R, srk, state } from "../../../../lib/thermo/index.js";

describe("heatCapacity", () => {
  it("heatCapacity of the ideal-gas model: Cv = Cp - R and w = sqrt(gamma R T / M) (exact ideal-gas relations)", () => {
    const n2 = getSubstance("nitrogen");
    const m = idealGas(pureFluid(n2));
    const T = 300;
    const V = (R * T) / 1e5;
    const cp = idealGasCp(n2, T);
    const r = heatCapacity(m, T, 1e5, V, cp, n2.M);
    expect(r.Cv / (cp - R)).toBeCloseTo(1, 7);
    expect(r.Cp / cp).toBeCloseTo(1, 7);
    expect(r.w / Math.sqrt(((cp / (cp - R)) * R * T) / (n2.M))).toBeCloseTo(1, 7);
  });

  it("heatCapacity of PR steam at low pressure matches IAPWS-95 Cp, Cv and w within 1.5 %", () => {
    // IAPWS-95 values from Debian python3-iapws 1.5: /usr/bin/python3 -c "from iapws import IAPWS95;
    // s=IAPWS95(T=T,P=P_MPa); print(s.cp*18.015268, s.cv*18.015268, s.w)". At these low densities the
    // cubic adds little; what remains is the ideal-gas Cp correlation's own error (SVNA Table C.1,
    // about 1 %), so 1.5 % is the bound.
    const water = getSubstance("water");
    const M = water.M;
    for (const [T, P, Cp95, Cv95, w95] of [
      [400, 1e4, 34.43851975932954, 26.06146115221047, 493.3890338287585],
      [500, 1e5, 35.69289075123188, 27.17026908385353, 548.3138393244353],
    ] as const) {
      for (const make of [pr, srk]) {
        const m = make(pureFluid(water));
        const s = state(m, T, P);
        const r = heatCapacity(m, T, P, s.V, idealGasCp(water, T), M);
        expect(Math.abs(r.Cp / Cp95 - 1), `${m.id} Cp ${T}`).toBeLessThan(0.015);
        expect(Math.abs(r.Cv / Cv95 - 1), `${m.id} Cv ${T}`).toBeLessThan(0.015);
        expect(Math.abs(r.w / w95 - 1), `${m.id} w ${T}`).toBeLessThan(0.015);
      }
    }
  });

  it("heatCapacity: Cp - Cv = -T (dP/dT)_V^2 / (dP/dV)_T and Cp > Cv for dense PR methane (exact identity)", () => {
    const ch4 = getSubstance("methane");
    const m = pr(pureFluid(ch4));
    const s = state(m, 200, 1e7);
    const r = heatCapacity(m, 200, 1e7, s.V, idealGasCp(ch4, 200), ch4.M);
    expect(r.Cp - r.Cv).toBeCloseTo((-200 * r.dPdT * r.dPdT) / r.dPdV, 6);
    expect(r.Cp).toBeGreaterThan(r.Cv);
    expect(r.w).toBeGreaterThan(0);
  });

  it("heatCapacity names the argument for non-positive input", () => {
    const m = pr(pureFluid(getSubstance("methane")));
    expect(() => heatCapacity(m, -1, 1e5, 0.02, 35)).toThrow(/T must be/);
    expect(() => heatCapacity(m, 300, 1e5, 0, 35)).toThrow(/V must be/);
  });
});
