import { describe, expect, it } from "vitest";
import { pr, rk, srk, vdw, pureFluid, R } from "../../../../lib/thermo/index.js";
import { butane, methane, propane } from "../fixtures.js";

// Smith, Van Ness & Abbott, 7th ed., Example 3.9 (from memory): n-butane at 350 K and its vapour
// pressure 9.4573 bar, saturated vapour / liquid molar volumes in cm^3/mol. The book rounds OmegaA,
// OmegaB and Tc, Pc; tolerance 0.05 % of each value.
const BOOK = [
  ["vdw", vdw, 2667.1, 191.0],
  ["rk", rk, 2555.3, 133.3],
  ["srk", srk, 2520.3, 127.8],
  ["pr", pr, 2486.1, 112.6],
] as const;

describe("cubicModel", () => {
  for (const [id, make, Vv, Vl] of BOOK) {
    it(`volumes: ${id} n-butane at 350 K, 9.4573 bar matches the textbook example`, () => {
      const roots = make(pureFluid(butane)).volumes(350, 9.4573e5).map((v) => v * 1e6);
      expect(roots.length).toBe(3);
      expect(Math.abs(roots[2]! / Vv - 1)).toBeLessThan(5e-4);
      expect(Math.abs(roots[0]! / Vl - 1)).toBeLessThan(5e-4);
    });
  }

  it("pressure(T, V) returns P on every root (roots polished to 1e-12 relative)", () => {
    for (const make of [vdw, rk, srk, pr]) {
      const m = make(pureFluid(propane));
      for (const [T, P] of [[300, 1e5], [300, 9e5], [350, 3e6], [450, 1e7]] as const) {
        for (const V of m.volumes(T, P)) expect(Math.abs(m.pressure(T, V) / P - 1)).toBeLessThan(1e-10);
      }
    }
  });

  it("residual: component ln phi sum to the mixture ln phi (sum x_i ln phi_i = ln phi, exact identity)", () => {
    const m = pr({ components: [methane, butane], x: [0.4, 0.6], kij: [[0, 0.02], [0.02, 0]] });
    for (const V of m.volumes(350, 2e6)) {
      const r = m.residual(350, 2e6, V);
      expect(Math.abs(0.4 * r.lnphiComponents[0]! + 0.6 * r.lnphiComponents[1]! - r.lnphi)).toBeLessThan(1e-12);
    }
  });

  it("residual: a pure fluid and a 'mixture' of the same fluid twice agree", () => {
    const T = 320;
    const P = 5e6;
    const one = srk(pureFluid(methane));
    const two = srk({ components: [methane, methane], x: [0.25, 0.75] });
    const r1 = one.residual(T, P, one.volumes(T, P)[0]!);
    const r2 = two.residual(T, P, two.volumes(T, P)[0]!);
    expect(r2.HR).toBeCloseTo(r1.HR, 9);
    expect(r2.lnphiComponents[0]).toBeCloseTo(r1.lnphi, 12);
  });

  it("residual: identities U^R = H^R - RT(Z-1), G^R = H^R - T S^R, A^R = U^R - T S^R", () => {
    const m = pr(pureFluid(butane));
    const T = 400;
    const P = 2e6;
    const r = m.residual(T, P, m.volumes(T, P)[0]!);
    expect(r.UR).toBeCloseTo(r.HR - R * T * (r.Z - 1), 8);
    expect(r.GR).toBeCloseTo(r.HR - T * r.SR, 8);
    expect(r.AR).toBeCloseTo(r.UR - T * r.SR, 8);
    expect(r.lnphi).toBeCloseTo(r.GR / (R * T), 12);
  });

  it("residual rejects V <= b naming V", () => {
    const m = pr(pureFluid(butane));
    expect(() => m.residual(300, 1e5, 1e-6)).toThrow(/co-volume/);
  });

  it("volumes rejects T <= 0 and P <= 0 naming the argument", () => {
    const m = pr(pureFluid(butane));
    expect(() => m.volumes(0, 1e5)).toThrow(/T must be/);
    expect(() => m.volumes(300, -1)).toThrow(/P must be/);
  });
});
