import { describe, expect, it } from "vitest";
import * as water from "../../../../lib/thermo/water/index.js";

describe("lib/thermo/water index", () => {
  it("index exports the public API used by the language layer", () => {
    for (const name of ["if97State", "if97Psat", "if97Tsat", "toMolar", "region1", "region2", "region3", "region5", "statePH", "statePS"]) {
      expect(typeof (water as Record<string, unknown>)[name], name).toBe("function");
    }
    expect(water.M_WATER).toBe(0.018015268); // IAPWS molar mass, kg/mol
  });
  it("if97State via the index returns the SI record with every documented field", () => {
    const st = water.if97State({ T: 300, p: 3e6 });
    for (const k of ["T", "p", "v", "rho", "h", "s", "u", "g", "a", "cp", "cv", "w", "x", "phase", "region"]) {
      expect(st, k).toHaveProperty(k);
    }
    expect(st.h).toBeCloseTo(115331.273, 2); // IF97 Table 5, 0.115331273e3 kJ/kg
  });
});
