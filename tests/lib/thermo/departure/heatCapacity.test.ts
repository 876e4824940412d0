import { describe, expect, it } from "vitest";
import { R, heatCapacity, idealGas, leeKesler, pr, pureFluid, selectRoot, state, vdw } from "../../../../lib/thermo/index.js";
import { butane, methane, propane } from "../fixtures.js";

describe("heatCapacity", () => {
  it("heatCapacity: ideal gas gives Cp = Cp_ig, Cv = Cp - R and w = sqrt(gamma R T / M) (kinetic theory / any thermodynamics text, from memory)", () => {
    const m = idealGas(pureFluid(methane));
    const T = 300;
    const Cp0 = 3.5 * R; // test-only constant ideal-gas Cp
    const V = (R * T) / 1e5;
    const r = heatCapacity(m, T, 1e5, V, Cp0, 0.028);
    expect(Math.abs(r.Cp / Cp0 - 1)).toBeLessThan(1e-8);
    expect(Math.abs(r.Cv / (Cp0 - R) - 1)).toBeLessThan(1e-8);
    expect(Math.abs(r.w / Math.sqrt((1.4 * R * T) / 0.028) - 1)).toBeLessThan(1e-8);
  });

  it("heatCapacity: van der Waals has Cv = Cv_ig and Cp - Cv = R / (1 - 2a(V-b)^2/(R T V^3)) (textbook closed form, from memory)", () => {
    const m = vdw(pureFluid(propane));
    const T = 350;
    const P = 1e6;
    const V = selectRoot(m, T, P).V;
    const { a, b } = m.mixture(T);
    const Cp0 = 80;
    const r = heatCapacity(m, T, P, V, Cp0);
    expect(Math.abs(r.Cv - (Cp0 - R))).toBeLessThan(1e-6);
    const expected = R / (1 - (2 * a * (V - b) ** 2) / (R * T * V ** 3));
    expect(Math.abs((r.Cp - r.Cv) / expected - 1)).toBeLessThan(1e-7);
    expect(Number.isNaN(r.w)).toBe(true); // no M given
  });

  it("heatCapacity: Peng-Robinson Cp equals (dH/dT)_P of the state totals (independent route, central difference, 1e-6 relative)", () => {
    const m = pr(pureFluid(butane));
    const Cp0 = 100; // constant ideal-gas Cp for the check: H_ig = Cp0 (T - 298.15)
    const ig = { H: (T: number) => Cp0 * (T - 298.15), S: (T: number, P: number) => Cp0 * Math.log(T / 298.15) - R * Math.log(P / 1e5), reference: "test" };
    for (const [T, P, phase] of [[400, 2e6, "vapor"], [300, 1e6, "liquid"], [500, 8e6, "stable"]] as const) {
      const s = state(m, T, P, { phase, idealGas: ig });
      const h = 1e-4 * T;
      const dHdT = (state(m, T + h, P, { phase, idealGas: ig }).H! - state(m, T - h, P, { phase, idealGas: ig }).H!) / (2 * h);
      const r = heatCapacity(m, T, P, s.V, Cp0, butane.M);
      expect(Math.abs(r.Cp / dHdT - 1)).toBeLessThan(1e-6);
      expect(r.w).toBeGreaterThan(0);
    }
  });

  it("heatCapacity: Lee-Kesler (no P(T, V)) takes the fixed-P route and agrees with Peng-Robinson within 5 % for a light gas (common practice)", () => {
    const T = 350;
    const P = 5e6;
    const lk = leeKesler(pureFluid(methane));
    const p = pr(pureFluid(methane));
    const a = heatCapacity(lk, T, P, selectRoot(lk, T, P).V, 40, methane.M);
    const b = heatCapacity(p, T, P, selectRoot(p, T, P).V, 40, methane.M);
    expect(Math.abs(a.Cp / b.Cp - 1)).toBeLessThan(0.05);
    expect(Math.abs(a.w / b.w - 1)).toBeLessThan(0.05);
  });

  it("heatCapacity: rejects T <= 0 naming the argument", () => {
    expect(() => heatCapacity(pr(pureFluid(methane)), 0, 1e5, 0.02, 30)).toThrow(/T must be/);
  });
});
