import { describe, it } from "vitest";
import { rk } from "../../../../lib/thermo/eos/rk.js";
import { pureFluid } from "../../../../lib/thermo/eos/fluid.js";
import { expectCriticalPointAt, expectNamedModel } from "../../../support/cubicChecks.js";
import { propane } from "../fixtures.js";

describe("rk", () => {
  it("rk puts its critical point at Tc, Pc with the published Zc", () => {
    // Redlich-Kwong: Zc = 1/3 (exact). At Tc and Pc the three roots merge: the polished roots all lie within 1e-4 of Vc.
    // dP/dV = 0 at the critical volume (central difference, 1e-6 relative step): checked by expectCriticalPointAt.
    expectCriticalPointAt(rk(pureFluid(propane)), propane, 1 / 3);
  });
  it("rk names its model and source", () => {
    expectNamedModel(rk(pureFluid(propane)), "rk");
  });
});
