/**
 * Unit traps through the whole language (parser, units policy, built-in edge, error translation).
 * Each row: a cell and either the expected value (with its source) or the expected error text.
 * lib/units keeps the fuller table of arithmetic traps; these rows check that cells deliver them.
 */
import { describe, expect, it } from "vitest";
import { createSession } from "../../../lib/language/index.js";

const session = createSession({ shouldStop: () => false });
const sink = { stdout() {}, display() {}, clear() {} };

type Row = { cell: string; value?: [unit: string, expected: number, relTol: number, source: string]; error?: RegExp };

const ROWS: Row[] = [
  // 25 degC = 298.15 K (SI Brochure 9th ed. 2.3.1: T/K = t/degC + 273.15).
  { cell: "T = 25 degC\nR = 8.314462618 J/(mol K)\nR*T/(1 bar) to L/mol", value: ["L/mol", 24.78957, 1e-6, "R*298.15 K/1e5 Pa, CODATA R"] },
  { cell: "(80 degC - 20 degC) to K", value: ["K", 60, 1e-12, "ITS-90: the degree Celsius equals the kelvin"] },
  { cell: "0 barg to bara", value: ["bara", 1.01325, 1e-12, "gauge against 1 atm = 101325 Pa (exact)"] },
  { cell: "14.696 psia to kPa", value: ["kPa", 101.325, 2e-5, "psi = 6894.757 Pa, NIST SP 811 B.8"] },
  { cell: "1 lbmol to mol", value: ["mol", 453.59237, 1e-12, "lb = 0.45359237 kg exactly"] },
  { cell: "span(20 degC, 80 degC, 4)[4] to K", value: ["K", 353.15, 1e-12, "80 + 273.15"] },
  // A compound temperature or pressure converted into an offset unit (mathjs 15 alone shows 400.908 degC).
  { cell: "a = 100 bar * 1 m^3 / (8.314462618 J/(mol K) * 3 kmol); a to degC", value: ["degC", 127.758, 1e-5, "PV/(nR) = 400.908 K (python3, CODATA R) - 273.15"] },
  { cell: "100 bar * 1 m^3 / (8.314462618 J/(mol K) * 3 kmol) in degF", value: ["degF", 261.964, 1e-5, "400.908 K x 9/5 - 459.67 (NIST SP 811)"] },
  { cell: "1e6 N / (1 m^2) to barg", value: ["barg", 8.98675, 1e-6, "1e6 Pa - 101325 Pa = 898675 Pa gauge"] },
  { cell: "(1e6 N / (1 m^2)) to psig", value: ["psig", 130.342, 1e-5, "898675 Pa / 6894.757 Pa/psi (NIST SP 811 B.8)"] },
  { cell: "2 * (25 degC)", error: /K|offset|degC/ },
  { cell: "25 degC + 25 degC", error: /.+/ },
  { cell: "span(1 bar, 300 K, 3)", error: /same dimension/ },
  { cell: "logspan(1 bar, 100 bar, 3 K)", error: /argument n of logspan\(\).*got 3 K \(a temperature\)/ },
  { cell: "1 m + 1 s", error: /cannot add 1 m \(a length\) and 1 s \(a time\): both sides of \+ and - must have the same dimension/ },
  { cell: "x = 3 barr", error: /unknown name "barr"; did you mean "bar"/ },
  // Symbols typed or pasted from datasheets (symbols.ts).
  { cell: "25 °C to K", value: ["K", 298.15, 1e-12, "SI Brochure 9th ed. 2.3.1: T/K = t/degC + 273.15"] },
  { cell: "25 ℃ to K", value: ["K", 298.15, 1e-12, "SI Brochure 9th ed. 2.3.1"] },
  { cell: "77 °F to degC", value: ["degC", 25, 1e-12, "NIST SP 811 B.8: t/degC = (t/degF - 32)/1.8"] },
  { cell: "5 × 3", value: ["", 15, 0, "arithmetic"] },
  { cell: "10 ÷ 2", value: ["", 5, 0, "arithmetic"] },
  { cell: "8.314462618 J/(mol·K) * 300 K to J/mol", value: ["J/mol", 2494.3387854, 1e-9, "8.314462618 x 300 (CODATA 2018 R)"] },
  // Units added for datasheets (lib/units catalog.ts).
  { cell: "1e6 Sm3/d to mol/s", value: ["mol/s", 489.497029860, 1e-9, "101325 Pa/(R 288.15 K) x 1e6 / 86400 s (ISO 13443 conditions, python3)"] },
  { cell: "1 USgal to L", value: ["L", 3.785411784, 1e-12, "NIST SP 811 B.8: US gallon = 231 in^3 = 3.785411784 L"] },
  { cell: "1 mmscfd to MMscfd", value: ["MMscfd", 1, 1e-12, "alias (gas-industry usage, common practice)"] },
  { cell: "1 mscf to scf", value: ["scf", 1000, 1e-12, "M = thousand in gas-industry usage (common practice)"] },
  // Dimension mismatches and mathjs internals in the user's terms.
  { cell: "1 Sm3 to m^3", error: /cannot convert 1 Sm3 \(an amount of substance\) to m\^3 \(a volume\).*Sm3 is an amount of substance, not a volume.*15 degC and 101\.325 kPa.*R \* T \/ P/ },
  { cell: 'pr("methane")*2', error: /cannot use a model in \*: \* works on numbers, quantities and arrays/ },
  { cell: "sqrt(-1 bar^2)", error: /complex number/ },
  { cell: "1 bar > 1 K", error: /cannot compare \(>\) 1 bar \(a pressure\) and 1 K \(a temperature\)/ },
  { cell: "integrate(f(x, y) = x*y, 0, 1)", error: /f needs more arguments than it was given: it got 1 \(argument 2 is missing\); integrate\(\) calls it with one argument/ },
];

describe("unit traps in cells", () => {
  for (const row of ROWS) {
    it(`run: ${row.cell.replace(/\n/g, " ; ")}`, () => {
      const r = session.run(row.cell, sink);
      if (row.error) {
        expect(r.ok).toBe(false);
        if (!r.ok) expect(r.error.evalue).toMatch(row.error);
        return;
      }
      expect(r.ok ? "" : r.error.evalue).toBe("");
      if (!r.ok || !row.value) return;
      const [unit, expected, tol] = row.value;
      const text = String(r.result?.["text/plain"]);
      const [num, ...rest] = text.split(" ");
      expect(rest.join("").replace(/\s/g, ""), text).toBe(unit.replace(/\s/g, ""));
      const got = Number(num);
      expect(Math.abs(got - expected) / Math.abs(expected)).toBeLessThanOrEqual(Math.max(tol, 5e-6)); // display keeps 6 figures
    });
  }
});
