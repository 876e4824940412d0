import { describe, expect, it } from "vitest";
import { isRichValue } from "../../../../lib/language/values/rich.js";
import { THERMO_DATA, modelDataOf, thermoDataOf, thermoValue } from "../../../../lib/language/values/thermo.js";
import { getSubstance } from "../../../../lib/thermo/index.js";

describe("thermoValue", () => {
  const s = getSubstance("methane");
  const v = thermoValue({ kind: "substance", substance: s }, { name: "Methane", Tc: 190.6 }, () => ({ "text/plain": "T" }), () => "t");

  it("thermoValue is a frozen plain object: fields enumerable, RichValue methods and data hidden", () => {
    expect(Object.getPrototypeOf(v)).toBe(Object.prototype);
    expect(Object.keys(v)).toEqual(["name", "Tc"]);
    expect(Object.isFrozen(v)).toBe(true);
    expect(isRichValue(v)).toBe(true);
    expect(v.kind).toBe("substance");
    expect(v.fields?.()).toEqual(["name", "Tc"]);
    expect(v[THERMO_DATA]).toEqual({ kind: "substance", substance: s });
  });

  it("thermoDataOf / modelDataOf read the hidden data and reject other values", () => {
    expect(thermoDataOf(v)?.kind).toBe("substance");
    expect(modelDataOf(v)).toBeUndefined();
    expect(thermoDataOf({ a: 1 })).toBeUndefined();
    expect(thermoDataOf(null)).toBeUndefined();
  });
});
