import { describe, expect, it } from "vitest";
import { mathWithUnits } from "../../support/mathWithUnits.js";
import type { Unit } from "mathjs";
import { installParseCache, PARSE_CACHE_LIMIT } from "../../../lib/units/index.js";

type UnitClass = { parse(s: string, o?: unknown): Unit };

describe("installParseCache", () => {
  it("installParseCache hands out equal but separate units: changing one leaves the next parse intact", () => {
    const math = mathWithUnits();
    const U = (math as unknown as { Unit: UnitClass }).Unit;
    const a = U.parse("kJ/(mol K)");
    const b = U.parse("kJ/(mol K)");
    expect(a).not.toBe(b);
    expect(a.equals(b)).toBe(true);
    (a as unknown as { value: number }).value = 42; // what Unit.to does to a parsed unit
    expect(U.parse("kJ/(mol K)").value).toBeNull();
    // 1 kJ/(mol K) = 1000 J/(mol K): SI prefix kilo = 1e3 (SI Brochure, 9th ed., Table 7)
    expect(math.unit(1, "kJ/(mol K)").toNumber("J/(mol K)")).toBeCloseTo(1000, 9);
  });
  it("installParseCache forgets parsed units when a unit is redefined", () => {
    const math = mathWithUnits();
    math.createUnit("testvol", { definition: "1 m^3" });
    expect(math.unit(1, "testvol").toNumber("m^3")).toBe(1); // definition above
    math.createUnit("testvol", { definition: "2 m^3" }, { override: true });
    expect(math.unit(1, "testvol").toNumber("m^3")).toBe(2); // redefinition above, not the cached 1 m^3
  });
  it("installParseCache keeps unknown units an error and stays correct past its size limit", () => {
    const math = mathWithUnits();
    expect(() => math.unit("5 notaunit")).toThrow(/notaunit/);
    expect(() => math.unit("5 notaunit")).toThrow(/notaunit/);
    for (let i = 0; i <= PARSE_CACHE_LIMIT + 5; i++) expect(math.unit(`${i} mm`).toNumber("m")).toBeCloseTo(i / 1000, 12); // milli = 1e-3
    expect(math.unit("3 bar").toNumber("kPa")).toBeCloseTo(300, 9); // bar = 100 kPa (NIST SP 811 B.8)
  });
  it("installParseCache is idempotent on one instance", () => {
    const math = mathWithUnits();
    installParseCache(math);
    expect(math.unit("2 psi").toNumber("Pa")).toBeCloseTo(13789.514, 2); // psi = 6894.757 Pa (NIST SP 811 B.8, 7 significant figures)
  });
});

describe("installParseCache with options", () => {
  it("installParseCache keeps calls with and without allowNoUnits apart", () => {
    const math = mathWithUnits();
    const U = (math as unknown as { Unit: UnitClass }).Unit;
    expect(U.parse("5", { allowNoUnits: true }).toNumber()).toBe(5); // a bare number is allowed here
    expect(() => U.parse("5")).toThrow(); // and refused without the option, cache or not
    expect(U.parse("5", { allowNoUnits: true }).toNumber()).toBe(5);
    // math.unit("J/mol") parses with allowNoUnits: 1 kJ/mol = 1000 J/mol (SI prefix kilo)
    expect(math.unit("J/mol").equalBase(math.unit("kJ/mol"))).toBe(true);
    expect(math.unit("2 kJ/mol").toNumber("J/mol")).toBeCloseTo(2000, 9);
    expect(math.unit("2 kJ/mol").toNumber("J/mol")).toBeCloseTo(2000, 9);
  });
});
