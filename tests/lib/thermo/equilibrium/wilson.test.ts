import { describe, expect, it } from "vitest";
import { wilsonPsat, wilsonTsat } from "../../../../lib/thermo/equilibrium/wilson.js";
import { propane } from "../fixtures.js";

describe("wilsonPsat", () => {
  it("wilsonPsat gives Pc at Tc and log10(Psat/Pc) = -1 - omega at Tr = 0.7 within 0.001 (Pitzer's definition)", () => {
    expect(wilsonPsat(propane, propane.Tc)).toBeCloseTo(propane.Pc, 6);
    const l = Math.log10(wilsonPsat(propane, 0.7 * propane.Tc) / propane.Pc);
    expect(Math.abs(l - (-1 - propane.omega))).toBeLessThan(1e-3);
  });
  it("wilsonTsat inverts wilsonPsat", () => {
    expect(wilsonTsat(propane, wilsonPsat(propane, 250))).toBeCloseTo(250, 9);
  });
});
