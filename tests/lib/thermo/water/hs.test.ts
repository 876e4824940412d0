import { describe, expect, it } from "vitest";
import { ThermoError } from "../../../../lib/thermo/errors.js";
import { stateHS } from "../../../../lib/thermo/water/hs.js";
import { region1PofHS } from "../../../../lib/thermo/water/region1.js";
import { region2PofHS } from "../../../../lib/thermo/water/region2Backward.js";
import { if97State } from "../../../../lib/thermo/water/state.js";
import type { WaterState } from "../../../../lib/thermo/water/properties.js";

/**
 * Round trip (T, p) -> (h, s) -> state. Along an isentrope dh = v dp, so a pressure error dp shows as
 * v dp in h: for a liquid p is ill-conditioned in (h, s) (1 MPa moves h by ~1 kJ/kg), and the check on
 * p is made in that currency. Tolerances: 1e-9 of max(|h|, 10 kJ/kg), the solver's stopping rule.
 */
function roundTrip(ref: WaterState): void {
  const st = stateHS(ref.h, ref.s);
  const scale = Math.max(Math.abs(ref.h), 1e4);
  const where = `T=${ref.T} p=${ref.p} x=${ref.x}`;
  expect(Math.abs(st.h - ref.h) / scale, `h ${where}`).toBeLessThan(1e-9);
  // s is the flash's own input; region 3's (p, s) flash stops at 1e-11 relative in T, hence 1e-10.
  expect(Math.abs(st.s - ref.s) / Math.max(Math.abs(ref.s), 100), `s ${where}`).toBeLessThan(1e-10);
  expect((Math.abs(st.p - ref.p) * ref.v) / scale, `p ${where}`).toBeLessThan(2e-9);
  // T follows p on liquid-like states (wet steam with little vapour too): 0.1 mK covers that.
  expect(Math.abs(st.T - ref.T), `T ${where}`).toBeLessThan(1e-4);
  if (ref.region !== 4) expect(st.region, where).toBe(ref.region);
}

describe("stateHS", () => {
  it("stateHS inverts (T, p) states in regions 1, 2, 3 and 5", () => {
    const Ts = [273.16, 300, 400, 500, 600, 623.15, 640, 650, 700, 800, 900, 1073.15, 1200, 2000, 2273];
    const ps = [611.3, 1e3, 1e5, 1e6, 1e7, 16.6e6, 22.064e6, 25e6, 50e6, 100e6];
    const regions = new Set<number>();
    for (const T of Ts) {
      for (const p of ps) {
        if (T > 1073.15 && p > 50e6) continue;
        const ref = if97State({ T, p });
        regions.add(ref.region);
        roundTrip(ref);
      }
    }
    expect([...regions].sort()).toEqual([1, 2, 3, 5]);
  });
  it("stateHS inside the dome returns the pressure and quality of the wet state", () => {
    for (const p of [700, 1e5, 5e6, 20e6, 22e6]) {
      for (const x of [0.001, 0.3, 0.99]) {
        const wet = if97State({ p, x });
        const st = stateHS(wet.h, wet.s);
        expect(st.region).toBe(4);
        expect(st.x, `p=${p} x=${x}`).toBeCloseTo(x, 6); // x follows p, ill-conditioned near 22 MPa
        roundTrip(wet);
      }
    }
  });
  it("stateHS lands within the stated accuracy of the p(h,s) backward equations (IAPWS SR2-01)", () => {
    // SR2-01(2014) gives p(h,s) consistent with the basic equations to 0.6 % (region 1) and 0.019 %
    // (region 2, worst subregion) in p (from memory; the release's consistency table). The exact
    // (Newton-refined) state must therefore sit that close to the backward value.
    const liq = if97State({ T: 400, p: 30e6 });
    expect(Math.abs(stateHS(liq.h, liq.s).p / region1PofHS(liq.h, liq.s) - 1)).toBeLessThan(6e-3);
    for (const [T, p] of [[500, 1e6], [700, 10e6], [900, 50e6]] as const) {
      const vap = if97State({ T, p });
      expect(Math.abs(stateHS(vap.h, vap.s).p / region2PofHS(vap.h, vap.s) - 1), `T=${T} p=${p}`).toBeLessThan(2e-4);
    }
  });
  it("stateHS names h and gives the enthalpy span of the isentrope when no state exists", () => {
    try {
      stateHS(5e6, 1000);
      throw new Error("expected a ThermoError");
    } catch (e) {
      expect(e).toBeInstanceOf(ThermoError);
      expect((e as ThermoError).argument).toBe("h");
      expect((e as Error).message).toMatch(/no IF97 state has h = 5000000 J\/kg and s = 1000 J\/\(kg K\).*h from about/);
    }
  });
  it("stateHS rejects non-finite input naming the argument", () => {
    expect(() => stateHS(Number.NaN, 1000)).toThrow(/h must be a finite number/);
    expect(() => stateHS(1e6, Number.POSITIVE_INFINITY)).toThrow(/s must be a finite number/);
  });
  it("if97State({h, s}) routes to stateHS", () => {
    const ref = if97State({ T: 550, p: 3e6 });
    expect(if97State({ h: ref.h, s: ref.s }).T).toBeCloseTo(550, 6);
  });
});
