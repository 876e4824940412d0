import { describe, expect, it } from "vitest";
import { mathWithUnits } from "../../support/mathWithUnits.js";
import { CANDIDATE_SI_FACTORS, DISPLAY_CANDIDATES, chooseUnit, chooseUnitName, formatQuantity } from "../../../lib/units/format.js";

describe("formatQuantity", () => {
  const math = mathWithUnits();
  it("formatQuantity keeps the user's units and cancels repeats", () => {
    expect(formatQuantity(math.evaluate("8.314462618 J/(mol K) * 25 degC"))).toBe("2479 J / mol"); // 2478.957 to 5 s.f.
    expect(formatQuantity(math.unit(25, "degC"))).toBe("25 degC");
    expect(formatQuantity(math.unit(5, "barg"))).toBe("5 barg");
    expect(formatQuantity(math.unit(14.69594877551345, "psia"), { sig: 6 })).toBe("14.6959 psia");
  });
  it("formatQuantity picks engineering prefixes for SI results with auto", () => {
    expect(formatQuantity(math.unit(2.5e6, "Pa"), { auto: true })).toBe("2.5 MPa");
    expect(formatQuantity(math.unit(0.0244, "m^3/mol"), { auto: true })).toBe("24.4 L / mol");
    expect(formatQuantity(math.unit(4.2e-5, "m^3/mol"), { auto: true })).toBe("42 cm^3 / mol");
    expect(formatQuantity(math.unit(-1234.5, "J/mol"), { auto: true, sig: 4 })).toBe("-1.234 kJ / mol");
    expect(formatQuantity(math.unit(300, "K"), { auto: true })).toBe("300 K");
  });
  it("formatQuantity uses exponents for very large and small numbers and clamps sig", () => {
    expect(formatQuantity(1.23456789e12, { sig: 9 })).toBe("1.23457e12");
    expect(formatQuantity(1.5e-7)).toBe("1.5e-7");
    expect(formatQuantity(0)).toBe("0");
  });
  it("chooseUnit leaves unknown dimensions alone", () => {
    const u = math.unit(3, "m/s^3");
    expect(chooseUnit(u)).toBe(u);
  });
});

describe("chooseUnitName", () => {
  const math = mathWithUnits();
  it("CANDIDATE_SI_FACTORS agree with mathjs's unit table for every display candidate", () => {
    for (const cands of Object.values(DISPLAY_CANDIDATES)) {
      for (const c of cands!) {
        // mathjs's own definition of one c in SI, against the table (SI prefixes, L = 1e-3 m^3, t = 1e3 kg)
        expect(CANDIDATE_SI_FACTORS[c], c).toBeCloseTo(Number(math.unit(1, c).toSI().toNumber()), 12);
      }
    }
  });
  it("chooseUnitName puts the number in [1, 1000) or nearest to it", () => {
    expect(chooseUnitName(2.5e6, "pressure")).toBe("MPa"); // 2.5 MPa
    expect(chooseUnitName(999.9, "pressure")).toBe("Pa");
    expect(chooseUnitName(1000, "pressure")).toBe("kPa"); // 1 kPa
    expect(chooseUnitName(-4.2e4, "molar_energy")).toBe("kJ/mol"); // sign ignored: -42 kJ/mol
    expect(chooseUnitName(2.4e-5, "molar_volume")).toBe("cm^3/mol"); // 24 cm^3/mol
    expect(chooseUnitName(1e-9, "pressure")).toBe("Pa"); // below every range: the nearest
    // Specific enthalpy stays in kJ/kg as steam tables print it: 3051.7 kJ/kg for steam at 10 bar,
    // 300 degC (IAPWS-IF97; common practice to quote kJ/kg).
    expect(chooseUnitName(3.0517e6, "specific_energy")).toBe("kJ/kg");
    expect(chooseUnitName(1e13, "pressure")).toBe("GPa"); // above every range: the nearest
    expect(chooseUnitName(0, "energy")).toBe("J");
    expect(chooseUnitName(5, "heat_flux")).toBeUndefined(); // no candidates: caller keeps SI
  });
  it("chooseUnit gives the same choice on quantities, offsets resolved", () => {
    expect(chooseUnit(math.unit(2.5e6, "Pa")).formatUnits()).toBe("MPa");
    expect(chooseUnit(math.unit(25, "degC")).toNumber("K")).toBeCloseTo(298.15, 12); // 0 degC = 273.15 K (ITS-90)
    expect(chooseUnit(math.unit(0, "barg")).formatUnits()).toBe("kPa"); // 0 barg = 101.325 kPa absolute
  });
});
