/**
 * simplifyForDisplay: results of arithmetic in messy compound units shown in their dimension's unit.
 * Check values are unit definitions and arithmetic: bar = 1e5 Pa, L = 1e-3 m^3 (NIST SP 811 B.8),
 * J = Pa m^3 = N m, R = 8.314462618 J/(mol K) (CODATA 2018).
 */
import type { MathJsInstance, Unit } from "mathjs";
import { describe, expect, it } from "vitest";
import { loadMathjs } from "../../../lib/language/mathjs.js";
import { installUnits, simplifyForDisplay } from "../../../lib/units/index.js";

const lib = loadMathjs();
const math = lib.create(lib.all, {}) as unknown as MathJsInstance;
installUnits(math);
const shown = (expr: string): string => {
  const v = simplifyForDisplay(math.evaluate(expr) as Unit);
  return typeof v === "number" ? `${+v.toPrecision(6)}` : `${+v.toNumber().toPrecision(6)} ${v.formatUnits()}`;
};

describe("simplifyForDisplay", () => {
  it("simplifyForDisplay shows a temperature from P V / (n R) in K", () => {
    // 100e5 Pa x 1 m^3 / (8.314462618 J/(mol K) x 3000 mol) = 400.908 K (python3).
    expect(shown("(100 bar) * (1 m^3) / ((8.314462618 J/(mol K)) * (3 kmol))")).toBe("400.908 K");
  });
  it("simplifyForDisplay shows J/(mol bar) results as molar volumes and bar L as energy", () => {
    // R T / P = 8.314462618 x 300 / 5e5 m^3/mol = 4.98868e-3 m^3/mol = 4.98868 L/mol.
    expect(shown("(8.314462618 J/(mol K)) * (300 K) / (5 bar)")).toBe("4.98868 L / mol");
    expect(shown("(2 J/mol) / (1 bar)")).toBe("20 cm^3 / mol"); // 2 / 1e5 m^3/mol = 2e-5 m^3/mol
    expect(shown("(2 bar) * (3 L)")).toBe("600 J"); // 2e5 Pa x 3e-3 m^3
    expect(shown("(1e6 N) / (1 m^2)")).toBe("1 MPa"); // N/m^2 = Pa
  });
  it("simplifyForDisplay gives a plain number for a dimensionless result in different units", () => {
    // mathjs already returns a number for most unitless results; a parsed unit text stays a Unit.
    const u = math.unit(6, "bar L / J");
    u.skipAutomaticSimplification = false; // as a product of quantities would leave it
    expect(simplifyForDisplay(u)).toBeCloseTo(600, 10); // 6 x 1e5 Pa x 1e-3 m^3 / J
    expect(simplifyForDisplay(math.evaluate("(2 bar) * (3 L) / (1 J)") as number)).toBeCloseTo(600, 10);
  });
  it("simplifyForDisplay keeps units with no more symbols than the SI unit, or no named dimension", () => {
    expect(shown("(5 kJ) / (1 kg)")).toBe("5 kJ / kg"); // J/kg has 2 symbols too
    expect(shown("(5 W) / ((1 m^2) * (1 K))")).toBe("5 W / (m^2 K)");
    expect(shown("(3 kg) * (2 m/s)")).toBe("6 (kg m) / s"); // momentum: no named dimension
    expect(shown("(2 kPa) * (1 kPa)")).toBe("2 kPa^2"); // cancelUnits only: one symbol
  });
  it("simplifyForDisplay keeps a unit the user asked for with to", () => {
    expect(shown("(2 bar) * (3 L) to bar L")).toBe("6 bar L");
    expect(shown("(8.314462618 J/(mol K)) * (300 K) / (5 bar) to J/(mol bar)")).toBe("498.868 J / (mol bar)"); // 8.314462618 x 300 / 5
  });
});
