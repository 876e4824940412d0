import { describe, expect, it } from "vitest";
import { mathWithUnits } from "../../support/mathWithUnits.js";
import type { Unit } from "mathjs";
import { per_mass, per_mole } from "../../../lib/units/basis.js";

describe("per_mass / per_mole", () => {
  const math = mathWithUnits();
  it("per_mass converts a molar heat of combustion with the molar mass", () => {
    // methane: 890.3 kJ/mol HHV, M = 16.043 g/mol -> 890.3/16.043 = 55.4946 MJ/kg (arithmetic;
    // handbook HHV about 55.5 MJ/kg, from memory)
    const h = per_mass(math.unit(890.3, "kJ/mol"), math.unit(16.043, "g/mol")) as Unit;
    expect(h.toNumber("MJ/kg")).toBeCloseTo(55.4946, 3);
  });
  it("per_mole converts a specific heat back", () => {
    // 2.22 kJ/(kg K) x 16.043 g/mol = 35.615 J/(mol K) (arithmetic)
    const c = per_mole(math.unit(2.22, "kJ/(kg K)"), math.unit(16.043, "g/mol")) as Unit;
    expect(c.toNumber("J/(mol K)")).toBeCloseTo(35.615, 3);
  });
  it("per_mass refuses a per-mass argument and a wrong molar mass", () => {
    expect(() => per_mass(math.unit(1, "kJ/kg"), math.unit(16, "g/mol"))).toThrow(/argument x of per_mass\(\) needs a per-mole quantity/);
    expect(() => per_mass(math.unit(1, "kJ/mol"), math.unit(16, "g"))).toThrow(/argument M of per_mass\(\) needs a molar mass.*got 16 g \(a mass\)/);
    expect(() => per_mole(math.unit(1, "kJ/mol"), math.unit(16, "g/mol"))).toThrow(/not already per mole/);
  });
});
