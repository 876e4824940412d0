import { describe, expect, it } from "vitest";
import { mathWithUnits } from "../../support/mathWithUnits.js";
import { DIMENSIONS, dimensionOf, hasDimension, isDimensionName } from "../../../lib/units/dimensions.js";

describe("DIMENSIONS", () => {
  it("DIMENSIONS: each SI unit string has the declared exponents", () => {
    const math = mathWithUnits();
    for (const [name, d] of Object.entries(DIMENSIONS)) {
      if (d.si === "") continue;
      expect(hasDimension(math.unit(d.si).dimensions, name as keyof typeof DIMENSIONS), name).toBe(true);
      expect(d.human).toMatch(/^(a|an) /);
    }
  });
  it("dimensionOf names practical units", () => {
    const math = mathWithUnits();
    expect(dimensionOf(math.unit(5, "psia"))).toBe("pressure");
    expect(dimensionOf(math.unit(25, "degC"))).toBe("temperature");
    expect(dimensionOf(math.unit(1, "Btu/lbmol"))).toBe("molar_energy");
    expect(dimensionOf(math.unit(1, "Btu/lbm"))).toBe("specific_energy");
    expect(dimensionOf(math.unit(1, "ft^3/lbmol"))).toBe("molar_volume");
    expect(dimensionOf(math.unit(1, "MMscfd"))).toBe("molar_flow");
    expect(dimensionOf(math.unit(1, "Sm3"))).toBe("amount");
    expect(dimensionOf(3)).toBe("dimensionless");
    expect(dimensionOf(math.unit(1, "m/s^3"))).toBeUndefined();
  });
  it("isDimensionName tells dimension names from unit strings", () => {
    expect(isDimensionName("pressure")).toBe(true);
    expect(isDimensionName("kPa")).toBe(false);
    expect(isDimensionName("toString")).toBe(false);
  });
});
