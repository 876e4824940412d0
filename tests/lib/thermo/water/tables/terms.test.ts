import { describe, expect, it } from "vitest";
import type { Terms } from "../../../../../lib/thermo/water/tables/terms.js";
import { REGION1_GIBBS } from "../../../../../lib/thermo/water/tables/region1Coefficients.js";

describe("Terms", () => {
  it("Terms describes a coefficient table (region 1, Table 2: first term n = 0.14632971213167, I = 0, J = -2)", () => {
    const t: Terms = REGION1_GIBBS;
    // IAPWS R7-97(2012) Table 2, i = 1 (from memory).
    expect([t.I[0], t.J[0], t.n[0]]).toEqual([0, -2, 0.14632971213167]);
  });
});
