import { describe, it } from "vitest";
import { srk } from "../../../../lib/thermo/eos/srk.js";
import { pureFluid } from "../../../../lib/thermo/eos/fluid.js";
import { expectCriticalPointAt, expectNamedModel } from "../../../support/cubicChecks.js";
import { propane } from "../fixtures.js";

describe("srk", () => {
  it("srk puts its critical point at Tc, Pc with the published Zc", () => {
    // Soave-Redlich-Kwong: Zc = 1/3 (exact; same form as RK). At Tc and Pc the three roots merge: the polished roots all lie within 1e-4 of Vc.
    // dP/dV = 0 at the critical volume (central difference, 1e-6 relative step): checked by expectCriticalPointAt.
    expectCriticalPointAt(srk(pureFluid(propane)), propane, 1 / 3);
  });
  it("srk names its model and source", () => {
    expectNamedModel(srk(pureFluid(propane)), "srk");
  });
});
