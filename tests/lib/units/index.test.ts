import { describe, expect, it } from "vitest";
import * as units from "../../../lib/units/index.js";

describe("lib/units index", () => {
  it("index exports the public API", () => {
    for (const name of ["installUnits", "toSI", "scalarSI", "fromSI", "fromSIArray", "dimensionOf", "per_mass", "per_mole", "formatQuantity", "UnitsError"]) {
      expect(typeof (units as Record<string, unknown>)[name], name).toBe("function");
    }
    expect(units.DIMENSIONS.pressure.si).toBe("Pa");
  });
});
