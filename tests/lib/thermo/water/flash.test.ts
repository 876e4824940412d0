import { describe, expect, it } from "vitest";
import { statePH, statePS } from "../../../../lib/thermo/water/flash.js";
import { stateTP } from "../../../../lib/thermo/water/regions.js";
import { ThermoError } from "../../../../lib/thermo/errors.js";

describe("statePH", () => {
  it("statePH round trip T -> h -> T to 1 microkelvin across regions 1, 2, 3 and 5", () => {
    // Backward guesses are polished on the basic equations, so the flash is exact to solver tolerance.
    const grid: [number, number][] = [
      [280, 0.1e6], [350, 10e6], [600, 90e6], [400, 0.1e6], [900, 5e6], [1000, 80e6],
      [660, 30e6], [700, 60e6], [630, 17e6], [1200, 10e6], [2200, 45e6], [300, 1e3],
    ];
    for (const [T, p] of grid) {
      const st = statePH(p, stateTP(T, p).h);
      expect(Math.abs(st.T - T), `T=${T} p=${p}`).toBeLessThan(1e-6);
    }
  });
  it("statePH names h above the 2273.15 K enthalpy", () => {
    expect(() => statePH(1e6, 9e6)).toThrow(ThermoError);
  });
});

describe("statePS", () => {
  it("statePS round trip T -> s -> T to 1 microkelvin", () => {
    for (const [T, p] of [[300, 5e6], [500, 1e6], [680, 40e6], [1100, 1e6]] as const) {
      expect(Math.abs(statePS(p, stateTP(T, p).s).T - T)).toBeLessThan(1e-6);
    }
  });
  it("statePS gives the isentropic expansion end point inside the dome with 0 < x < 1", () => {
    // Turbine expansion from 10 MPa, 773.15 K to 10 kPa ends wet (textbook worked example shape; x ~ 0.8).
    const s1 = stateTP(773.15, 10e6).s;
    const end = statePS(10e3, s1);
    expect(end.region).toBe(4);
    expect(end.x).toBeGreaterThan(0.75);
    expect(end.x).toBeLessThan(0.85);
  });
});
