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
  { cell: "1 m + 1 s", error: /units do not match/ },
  { cell: "x = 3 barr", error: /unknown name "barr"; did you mean "bar"/ },
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
