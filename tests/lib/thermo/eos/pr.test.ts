import { describe, expect, it } from "vitest";
import { pr } from "../../../../lib/thermo/eos/pr.js";
import { pureFluid } from "../../../../lib/thermo/eos/fluid.js";
import { expectCriticalPointAt, expectNamedModel } from "../../../support/cubicChecks.js";
import { propane } from "../fixtures.js";

describe("pr", () => {
  it("pr puts its critical point at Tc, Pc with the published Zc", () => {
    // Peng-Robinson: Zc = 0.30740 (Peng & Robinson 1976; SVNA 7th ed. Table 3.1). At Tc and Pc the three roots merge: the polished roots all lie within 1e-4 of Vc.
    // dP/dV = 0 at the critical volume (central difference, 1e-6 relative step): checked by expectCriticalPointAt.
    expectCriticalPointAt(pr(pureFluid(propane)), propane, 0.3074013);
  });
  it("pr names its model and source", () => {
    expectNamedModel(pr(pureFluid(propane)), "pr");
  });
});

import { prKappa } from "../../../../lib/thermo/eos/pr.js";
describe("prKappa", () => {
  it("prKappa uses the 1976 polynomial up to omega 0.49 and the 1978 one above", () => {
    // Peng & Robinson (1976): 0.37464 + 1.54226 w - 0.26992 w^2; Robinson & Peng (1978, GPA RR-28):
    // 0.379642 + 1.48503 w - 0.164423 w^2 + 0.016666 w^3. The switch is at omega > 0.49 exactly.
    expect(prKappa(0.2)).toBeCloseTo(0.37464 + 1.54226 * 0.2 - 0.26992 * 0.04, 14);
    expect(prKappa(0.6)).toBeCloseTo(0.379642 + 1.48503 * 0.6 - 0.164423 * 0.36 + 0.016666 * 0.216, 14);
    expect(prKappa(0.49)).toBeCloseTo(0.37464 + 1.54226 * 0.49 - 0.26992 * 0.49 ** 2, 14);
    expect(prKappa(0.4901)).toBeCloseTo(0.379642 + 1.48503 * 0.4901 - 0.164423 * 0.4901 ** 2 + 0.016666 * 0.4901 ** 3, 14);
  });
});
