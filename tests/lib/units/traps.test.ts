/**
 * Classic unit mistakes, evaluated through a mathjs instance with installUnits applied (the cell
 * language builds its instance the same way). Each row: the expression and either the right value
 * (in the stated unit, relative tolerance 1e-5 unless given) with its source, or the expected error text.
 * Numeric references marked "scipy.constants" were computed with Debian's python3-scipy
 * (scipy.constants: psi, atm, bar, Btu, calorie_th, pound, foot, R, g), i.e. NIST/CODATA values.
 */
import type { Unit } from "mathjs";
import { describe, expect, it } from "vitest";
import { mathWithUnits } from "../../support/mathWithUnits.js";

type Row =
  | { expr: string; unit: string; value: number; rtol?: number; source: string }
  | { expr: string; bool: boolean; source: string }
  | { expr: string; error: RegExp; source: string };

const rows: Row[] = [
  // Gauge vs absolute pressure.
  { expr: "5 barg", unit: "bara", value: 6.01325, source: "1 atm = 1.01325 bar exactly (ISO 2533 standard atmosphere)" },
  { expr: "0 psig", unit: "psia", value: 14.69594877551345, source: "scipy.constants atm/psi" },
  { expr: "30 psi", unit: "psia", value: 30, source: "psi has no offset here: psi is an absolute-or-difference unit like Pa (policy)" },
  { expr: "(5 barg) / (1 bara)", unit: "", value: 6.01325, source: "ratios use absolute pressure; 1 atm = 1.01325 bar" },
  { expr: "2 * (5 barg)", error: /gauge pressure.*\(5 barg to bara\)/, source: "policy: scaling a gauge pressure is ambiguous" },
  { expr: "(5 barg) * (2 m^2)", error: /gauge pressure.*5 bar for a pressure difference/, source: "policy: force from gauge vs absolute pressure is ambiguous" },
  { expr: "(5 barg) - (2 barg)", unit: "bar", value: 3, source: "difference of two gauge pressures is a pressure difference (arithmetic)" },
  { expr: "(5 barg) + (2 barg)", error: /adds two absolute gauge pressures/, source: "policy: absolute + absolute has no meaning" },
  { expr: "(5 barg) + (1 bar)", unit: "barg", value: 6, source: "absolute + difference is absolute (arithmetic)" },
  { expr: "8.314462618 J/(mol K) * (25 degC) / (5 barg)", unit: "m^3/mol", value: 0.004122491214495822, source: "ideal gas V = RT/P with 298.15 K, 601325 Pa; scipy.constants R, atm" },
  // Compound values converted INTO offset units (mathjs 15 alone keeps the SI number: 400.908 degC).
  { expr: "100 bar * 1 m^3 / (8.314462618 J/(mol K) * 3 kmol)", unit: "degC", value: 127.75785014980909, source: "T = PV/(nR) = 400.90785 K (python3, CODATA R) - 273.15" },
  { expr: "100 bar * 1 m^3 / (8.314462618 J/(mol K) * 3 kmol)", unit: "degF", value: 261.9641302696563, source: "400.90785 K x 9/5 - 459.67 (NIST SP 811 B.8)" },
  { expr: "1e6 N / (1 m^2)", unit: "barg", value: 8.98675, source: "(1e6 Pa - 101325 Pa) / 1e5 Pa; 1 atm = 101325 Pa exact" },
  { expr: "1e6 N / (1 m^2)", unit: "psig", value: 130.34178895469577, source: "(1e6 - 101325) Pa / 6894.757293 Pa/psi (scipy.constants psi)" },
  { expr: "(1e6 N / (1 m^2) to barg) - (0 barg)", unit: "bar", value: 8.98675, source: "gauge reading minus 0 barg is the same difference" },
  // Offset temperatures.
  { expr: "25 degC + 10 degC", error: /adds two absolute temperatures.*10 K/, source: "policy: absolute + absolute has no meaning" },
  { expr: "(25 degC) - (15 degC)", unit: "K", value: 10, source: "difference of two temperatures is a difference in K (arithmetic)" },
  { expr: "((25 degC) - (15 degC)) * 4.184 J/(g K)", unit: "J/g", value: 41.84, source: "cp dT of water 4.184 J/(g K) over 10 K (arithmetic); not 283.15 K" },
  { expr: "8.314462618 J/(mol K) * 25 degC", unit: "J/mol", value: 2478.9570295567, source: "R T at 298.15 K; scipy.constants R" },
  { expr: "2 * (25 degC)", error: /absolute temperature.*\(25 degC to K\)/, source: "policy: scaling an offset temperature is ambiguous" },
  { expr: "5 degC/minute", error: /5 K \(or deltaC\) for a temperature change/, source: "policy: a rate needs a temperature difference" },
  { expr: "5 deltaC/minute", unit: "K/s", value: 5 / 60, source: "1 degree Celsius interval = 1 K (ITS-90)" },
  { expr: "1 / (25 degC)", error: /quotient where its temperature does not cancel/, source: "policy: 1/T alone is ambiguous" },
  { expr: "(25 degC) / (300 K)", unit: "", value: 298.15 / 300, source: "ratio uses absolute temperature 298.15 K (arithmetic)" },
  { expr: "exp(-50 kJ/mol / (8.314462618 J/(mol K) * 25 degC))", unit: "", value: 1.7393179680896622e-9, rtol: 1e-9, source: "Arrhenius factor at 298.15 K; computed with python math.exp and scipy.constants R" },
  { expr: "(25 degC) + 10 K", unit: "degC", value: 35, source: "absolute + difference is absolute (arithmetic)" },
  { expr: "(300 K) - (25 degC)", unit: "K", value: 1.85, source: "300 K - 298.15 K (arithmetic)" },
  { expr: "(77 degF) - (32 degF)", unit: "K", value: 25, source: "45 degF interval x 5/9 K (NIST SP 811 B.8)" },
  { expr: "(100 degF) - (50 degF)", unit: "deltaF", value: 50, source: "degF difference stays in Fahrenheit-size degrees (arithmetic)" },
  { expr: "10 degC", unit: "degF", value: 50, source: "degF = degC x 9/5 + 32 (NIST SP 811)" },
  { expr: "-40 degC", unit: "degF", value: -40, source: "the scales cross at -40 (from memory, follows from NIST SP 811 formula)" },
  { expr: "(25 degC) ^ 2", error: /power of an offset quantity/, source: "policy: powers of offset quantities are ambiguous" },
  { expr: "sum([20 degC, 30 degC])", error: /sum of several absolute temperatures/, source: "policy: absolute + absolute" },
  { expr: "mean([20 degC, 30 degC])", unit: "degC", value: 25, source: "mean of 293.15 K and 303.15 K is 298.15 K (arithmetic)" },
  { expr: "30 degC > 300 K", bool: true, source: "303.15 K > 300 K: comparisons use absolute values (mathjs alone compares 30 < 300)" },
  // Per-degree compound units are differences.
  { expr: "4.184 J/(g degC)", unit: "J/(g K)", value: 4.184, source: "a per-degree unit is per kelvin interval (ITS-90)" },
  { expr: "1 Btu/(lbm degF)", unit: "J/(g K)", value: 4.1868, source: "Btu_IT/(lb degF) = 4.1868 kJ/(kg K) exactly (NIST SP 811 B.8)" },
  // Amounts and masses.
  { expr: "1 kmol", unit: "mol", value: 1000, source: "SI prefix k = 1000" },
  { expr: "1 lbmol", unit: "kmol", value: 0.45359237, source: "lb = 0.45359237 kg exactly (1959 international pound)" },
  { expr: "1 lbm", unit: "kg", value: 0.45359237, source: "1959 international pound" },
  { expr: "1 lbf", unit: "N", value: 4.4482216152605, source: "scipy.constants pound_force" },
  { expr: "1 lbm + 1 lbf", error: /cannot add 1 lbm \(a mass\) and 1 lbf \(a force\)/, source: "mass and force are different dimensions" },
  // Energies.
  { expr: "1 Btu", unit: "kJ", value: 1.05505585262, source: "scipy.constants Btu (IT)" },
  { expr: "1 kcal", unit: "kJ", value: 4.184, source: "scipy.constants calorie_th" },
  { expr: "1 MMBtu", unit: "GJ", value: 1.05505585262, source: "10^6 Btu_IT, scipy.constants Btu" },
  { expr: "1 TR", unit: "kW", value: 3.5168528420666667, source: "12000 Btu_IT/h (NIST SP 811 B.8), scipy.constants Btu" },
  // Standard volumes are amounts, and differ.
  { expr: "1 Sm3", unit: "mol", value: 42.292543379936916, source: "ISO 13443: 15 degC, 101.325 kPa; n = PV/RT with scipy.constants R" },
  { expr: "1 Nm3", unit: "mol", value: 44.61503340629259, source: "DIN 1343: 0 degC, 101.325 kPa; n = PV/RT" },
  { expr: "(1 Sm3) / (1 Nm3)", unit: "", value: 273.15 / 288.15, source: "ratio of reference temperatures (ideal gas)" },
  { expr: "1 lbmol", unit: "scf", value: 379.4827616866026, rtol: 1e-6, source: "60 degF, 14.696 psia; trade figure 379.5 scf/lbmol (from memory), computed with scipy.constants" },
  { expr: "1 MMscfd", unit: "kmol/h", value: 49.803796091643584, source: "10^6 scf/day with scf as above" },
  { expr: "101.325 kPa * 1 m^3 / (8.314462618 J/(mol K) * 15 degC)", unit: "mol", value: 42.292543379936916, source: "ideal gas at ISO 13443 conditions; degC in R*T is absolute" },
  // R in various units.
  { expr: "8.314462618 J/(mol K)", unit: "Btu/(lbmol degR)", value: 1.9858752789720073, source: "scipy.constants R, Btu, pound; handbook 1.986 Btu/(lbmol R) (from memory)" },
  { expr: "8.314462618 J/(mol K)", unit: "psia ft^3/(lbmol degR)", value: 10.731577088818504, source: "scipy.constants; handbook 10.73 psia ft^3/(lbmol R) (from memory)" },
  { expr: "8.314462618 J/(mol K)", unit: "L bar/(mol K)", value: 0.08314462618, source: "CODATA 2018 R" },
  // Other daily units.
  { expr: "1 atm", unit: "psia", value: 14.69594877551345, source: "scipy.constants atm/psi" },
  { expr: "1 Torr", unit: "Pa", value: 133.32236842105263, source: "scipy.constants torr" },
  { expr: "1 inH2O", unit: "Pa", value: 249.08891, source: "0.0254 m x 1000 kg/m^3 x 9.80665 m/s^2 (conventional, NIST SP 811 B.8)" },
  { expr: "1 bbl", unit: "gal", value: 42, source: "petroleum barrel = 42 US gal (NIST SP 811 B.8)" },
];

describe("unit traps (installUnits + mathjs)", () => {
  const math = mathWithUnits();
  it("has at least 30 rows", () => {
    expect(rows.length).toBeGreaterThanOrEqual(30);
  });
  for (const row of rows) {
    it(`evaluate: ${row.expr}${"unit" in row && row.unit !== "" ? ` in ${row.unit}` : ""}`, () => {
      if ("error" in row) {
        expect(() => math.evaluate(row.expr)).toThrow(row.error);
        return;
      }
      const v = math.evaluate(row.expr) as unknown;
      if ("bool" in row) {
        expect(v).toBe(row.bool);
        return;
      }
      const got = row.unit === "" ? (typeof v === "number" ? v : (v as Unit).toNumber("")) : (v as Unit).toNumber(row.unit);
      const rtol = row.rtol ?? 1e-5;
      expect(Math.abs(got - row.value)).toBeLessThanOrEqual(rtol * Math.max(Math.abs(row.value), 1e-300));
    });
  }
});
