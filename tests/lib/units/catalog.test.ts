import { describe, expect, it } from "vitest";
import { ADDED_UNITS, ATM_PA, PSI_PA, R_GAS } from "../../../lib/units/catalog.js";
import type { MathJsInstance } from "mathjs";
import { loadMathjs } from "../../../lib/language/mathjs.js";
import { installUnits } from "../../../lib/units/index.js";

function mathWithUnits(): MathJsInstance {
  const m = loadMathjs();
  const math = m.create(m.all, {}) as unknown as MathJsInstance;
  installUnits(math);
  return math;
}

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
});
