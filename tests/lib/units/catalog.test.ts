import { describe, expect, it } from "vitest";
import { mathWithUnits } from "../../support/mathWithUnits.js";
import { ADDED_UNITS, ATM_PA, PSI_PA, R_GAS } from "../../../lib/units/catalog.js";

describe("ADDED_UNITS", () => {
  it("ADDED_UNITS: every entry has help text and a source", () => {
    for (const u of ADDED_UNITS) {
      expect(u.help.length, u.name).toBeGreaterThan(5);
      expect(u.source.length, u.name).toBeGreaterThan(3);
    }
  });
  it("ADDED_UNITS constants match scipy.constants (psi 6894.757293168361 Pa, R 8.314462618, atm 101325)", () => {
    expect(PSI_PA).toBeCloseTo(6894.757293168361, 9); // scipy.constants.psi
    expect(R_GAS).toBe(8.314462618); // CODATA 2018 exact
    expect(ATM_PA).toBe(101325); // exact by definition
  });
  it("ADDED_UNITS: standard-volume units state their reference conditions in help", () => {
    const help = (n: string) => ADDED_UNITS.find((u) => u.name === n)!.help;
    expect(help("Sm3")).toMatch(/15 degC and 101.325 kPa/);
    expect(help("Nm3")).toMatch(/0 degC and 101.325 kPa/);
    expect(help("scf")).toMatch(/60 degF and 14.696 psia/);
  });
  it("ADDED_UNITS: every entry exists in an installed instance with its SI value", () => {
    const math = mathWithUnits();
    for (const u of ADDED_UNITS) {
      const si = math.unit(u.definition).toSI();
      const one = math.unit(1, u.name).toSI();
      // offset units: 1 unit = (1 + offset) x scale
      const expected = si.value * (1 + (u.offset ?? 0));
      expect(Math.abs(one.value - expected), u.name).toBeLessThanOrEqual(1e-12 * Math.abs(expected));
    }
  });
  it("ADDED_UNITS: psig and barg read 0 at one standard atmosphere", () => {
    const math = mathWithUnits();
    expect(math.unit(101325, "Pa").toNumber("psig")).toBeCloseTo(0, 12); // 1 atm = 0 gauge by definition
    expect(math.unit(101325, "Pa").toNumber("barg")).toBeCloseTo(0, 12);
    expect(math.unit(0, "kPag").toNumber("kPa")).toBeCloseTo(101.325, 12);
    expect(math.unit(0, "MPag").toNumber("MPa")).toBeCloseTo(0.101325, 12);
  });
  it("ADDED_UNITS: day as d (Sm3/d), US and UK gallons, lower-case standard-volume aliases", () => {
    const math = mathWithUnits();
    expect(math.unit(1, "d").toNumber("h")).toBe(24); // NIST SP 811 table 6: d = 86 400 s
    expect(math.unit(1, "USgal").toNumber("L")).toBeCloseTo(3.785411784, 12); // NIST SP 811 B.8 (231 in^3, exact)
    expect(math.unit(1, "USgal").toNumber("gal")).toBeCloseTo(1, 12); // mathjs gal is the US gallon
    expect(math.unit(1, "UKgal").toNumber("L")).toBeCloseTo(4.54609, 12); // UK Weights and Measures Act 1985
    expect(math.unit(1, "mmscfd").toNumber("MMscfd")).toBeCloseTo(1, 12);
    expect(math.unit(1, "mscf").toNumber("scf")).toBeCloseTo(1000, 9); // M = thousand (gas-industry usage, common practice)
    expect(math.unit(1, "mmscf").toNumber("scf")).toBeCloseTo(1e6, 6);
    expect(math.unit(1, "Mscfd").toNumber("MMscfd")).toBeCloseTo(1e-3, 15);
    // 1e6 Sm3/d = 1e6 x 101325/(R x 288.15) / 86400 mol/s = 489.497 mol/s (python3, CODATA R, ISO 13443)
    expect(math.evaluate("1e6 Sm3/d").toNumber("mol/s")).toBeCloseTo(489.49702986, 6);
    // d has no prefixes: dm stays the decimetre.
    expect(math.unit(1, "dm").toNumber("m")).toBeCloseTo(0.1, 15);
  });
});
