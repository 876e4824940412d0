import { describe, expect, it } from "vitest";
import { srk } from "../../../../lib/thermo/eos/srk.js";
import { pureFluid } from "../../../../lib/thermo/eos/fluid.js";
import { R } from "../../../../lib/thermo/constants.js";
import { propane } from "../fixtures.js";

describe("srk", () => {
  it("srk puts its critical point at Tc, Pc with the published Zc", () => {
    // Soave-Redlich-Kwong: Zc = 1/3 (exact; same form as RK). At Tc and Pc the three roots merge: the polished roots all lie within 1e-4 of Vc.
    const m = srk(pureFluid(propane));
    const Vc = (m.parameters.Zc * R * propane.Tc) / propane.Pc;
    expect(Math.abs(m.parameters.Zc - 1 / 3)).toBeLessThan(1e-6);
    for (const V of m.volumes(propane.Tc, propane.Pc)) expect(Math.abs(V / Vc - 1)).toBeLessThan(1e-4);
    // dP/dV = 0 at the critical volume (central difference, 1e-6 relative step).
    const h = Vc * 1e-6;
    const slope = (m.pressure(propane.Tc, Vc + h) - m.pressure(propane.Tc, Vc - h)) / (2 * h);
    expect(Math.abs(slope * Vc / propane.Pc)).toBeLessThan(1e-6);
  });
  it("srk names its model and source", () => {
    const m = srk(pureFluid(propane));
    expect(m.id).toBe("srk");
    expect(m.source.length).toBeGreaterThan(10);
  });
});
