import { describe, expect, it } from "vitest";
import { vdw } from "../../../../lib/thermo/eos/vdw.js";
import { pureFluid } from "../../../../lib/thermo/eos/fluid.js";
import { R } from "../../../../lib/thermo/constants.js";
import { propane } from "../fixtures.js";

describe("vdw", () => {
  it("vdw puts its critical point at Tc, Pc with the published Zc", () => {
    // van der Waals: Zc = 3/8 (exact). At Tc and Pc the three roots merge: the polished roots all lie within 1e-4 of Vc.
    const m = vdw(pureFluid(propane));
    const Vc = (m.parameters.Zc * R * propane.Tc) / propane.Pc;
    expect(Math.abs(m.parameters.Zc - 3 / 8)).toBeLessThan(1e-6);
    for (const V of m.volumes(propane.Tc, propane.Pc)) expect(Math.abs(V / Vc - 1)).toBeLessThan(1e-4);
    // dP/dV = 0 at the critical volume (central difference, 1e-6 relative step).
    const h = Vc * 1e-6;
    const slope = (m.pressure(propane.Tc, Vc + h) - m.pressure(propane.Tc, Vc - h)) / (2 * h);
    expect(Math.abs(slope * Vc / propane.Pc)).toBeLessThan(1e-6);
  });
  it("vdw names its model and source", () => {
    const m = vdw(pureFluid(propane));
    expect(m.id).toBe("vdw");
    expect(m.source.length).toBeGreaterThan(10);
  });
});
