import { describe, expect, it } from "vitest";
import { idealGas } from "../../../../lib/thermo/eos/idealgas.js";
import { pureFluid } from "../../../../lib/thermo/eos/fluid.js";
import { R } from "../../../../lib/thermo/constants.js";
import { methane, butane } from "../fixtures.js";

describe("idealGas", () => {
  it("idealGas: V = RT/P, Z = 1 and every residual zero (definition of the ideal gas)", () => {
    const m = idealGas({ components: [methane, butane], x: [0.5, 0.5] });
    const [V] = m.volumes(300, 1e6);
    expect(V).toBeCloseTo((R * 300) / 1e6, 15);
    const r = m.residual(300, 1e6, V!);
    expect([r.Z, r.HR, r.SR, r.UR, r.GR, r.AR, r.lnphi, ...r.lnphiComponents]).toEqual([1, 0, 0, 0, 0, 0, 0, 0, 0]);
    expect(m.pressure!(300, V!)).toBeCloseTo(1e6, 6);
  });
  it("idealGas rejects T <= 0", () => {
    expect(() => idealGas(pureFluid(methane)).volumes(-5, 1e5)).toThrow(/T must be/);
  });
});
