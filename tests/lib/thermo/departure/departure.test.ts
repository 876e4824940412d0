import { describe, expect, it } from "vitest";
import { departure } from "../../../../lib/thermo/departure/departure.js";
import { pr, pureFluid, srk } from "../../../../lib/thermo/index.js";
import { butane } from "../fixtures.js";

describe("departure", () => {
  it("departure: closed and integrate routes agree on the liquid and vapour roots", () => {
    const m = srk(pureFluid(butane));
    for (const phase of ["liquid", "vapor"] as const) {
      const a = departure(m, 350, 9.4573e5, { phase });
      const b = departure(m, 350, 9.4573e5, { phase, route: "integrate" });
      expect(a.route).toBe("closed");
      expect(b.route).toBe("integrate");
      expect(Math.abs(b.HR / a.HR - 1)).toBeLessThan(1e-8);
      expect(a.V).toBe(b.V);
    }
  });
  it("departure rejects an unknown route naming route", () => {
    expect(() => departure(pr(pureFluid(butane)), 300, 1e5, { route: "guess" as "closed" })).toThrow(/route must be/);
  });
});
