import { describe, it } from "vitest";
import { vdw } from "../../../../lib/thermo/eos/vdw.js";
import { pureFluid } from "../../../../lib/thermo/eos/fluid.js";
import { expectCriticalPointAt, expectNamedModel } from "../../../support/cubicChecks.js";
import { propane } from "../fixtures.js";

describe("vdw", () => {
  it("vdw puts its critical point at Tc, Pc with the published Zc", () => {
    // van der Waals: Zc = 3/8 (exact). At Tc and Pc the three roots merge: the polished roots all lie within 1e-4 of Vc.
    // dP/dV = 0 at the critical volume (central difference, 1e-6 relative step): checked by expectCriticalPointAt.
    expectCriticalPointAt(vdw(pureFluid(propane)), propane, 3 / 8);
  });
  it("vdw names its model and source", () => {
    expectNamedModel(vdw(pureFluid(propane)), "vdw");
  });
});
