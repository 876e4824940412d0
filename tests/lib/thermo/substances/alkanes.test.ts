import { describe, expect, it } from "vitest";
import { cp } from "../../../../lib/thermo/idealGas/cp.js";
import { ALKANES } from "../../../../lib/thermo/substances/alkanes.js";

const get = (id: string) => ALKANES.find((s) => s.id === id)!;

describe("ALKANES", () => {
  it("ALKANES: n-alkane Tc, Tb, omega and Vc rise and (from C2) Pc falls with carbon number (homologous series)", () => {
    const series = ["methane", "ethane", "propane", "n-butane", "n-pentane", "n-hexane", "n-heptane", "n-octane", "n-nonane", "n-decane"].map(get);
    for (let i = 1; i < series.length; i++) {
      const [a, b] = [series[i - 1]!, series[i]!];
      expect(b.Tc, b.id).toBeGreaterThan(a.Tc);
      expect(b.Tb, b.id).toBeGreaterThan(a.Tb);
      expect(b.omega, b.id).toBeGreaterThan(a.omega);
      expect(b.Vc, b.id).toBeGreaterThan(a.Vc);
      // Pc falls from ethane on (methane's Pc, 46.0 bar, is below ethane's 48.7 bar: a real feature).
      if (i > 1) expect(b.Pc, b.id).toBeLessThan(a.Pc);
    }
  });

  it("ALKANES critical points agree with reference equations of state (Tc 0.2 %, Pc 1 %)", () => {
    // [Tc K, Pc Pa]: methane Setzmann & Wagner JPCRD 20 (1991); propane Lemmon, McLinden & Wagner JCED 54 (2009);
    // n-butane Buecker & Wagner JPCRD 35 (2006); all from memory.
    const ref: [string, number, number][] = [
      ["methane", 190.564, 4.5992e6],
      ["propane", 369.89, 4.2512e6],
      ["n-butane", 425.125, 3.796e6],
    ];
    for (const [id, Tc, Pc] of ref) {
      expect(Math.abs(get(id).Tc / Tc - 1), id).toBeLessThan(0.002);
      expect(Math.abs(get(id).Pc / Pc - 1), id).toBeLessThan(0.01);
    }
  });

  it("ALKANES ideal-gas Cp agrees with statistical-thermodynamics tables within 2 %", () => {
    // J/(mol K). Methane: Gurvich, Veyts et al. (1989); ethane, propane: Chao et al. (1973), as reproduced
    // in the NIST-compiled gas-phase heat-capacity tables.
    const ref: [string, number, number][] = [
      ["methane", 298.15, 35.69], ["methane", 500, 46.63], ["methane", 800, 64.08],
      ["ethane", 298.15, 52.49], ["ethane", 500, 77.94], ["ethane", 800, 107.94],
      ["propane", 298.15, 73.60], ["propane", 500, 112.59], ["propane", 800, 154.77],
    ];
    for (const [id, T, v] of ref) expect(Math.abs(cp(get(id), T) / v - 1), `${id} ${T} K`).toBeLessThan(0.02);
  });

  it("ALKANES isomers have the same molar mass and lower Tb than the normal paraffin", () => {
    expect(get("isobutane").M).toBe(get("n-butane").M);
    expect(get("isobutane").Tb).toBeLessThan(get("n-butane").Tb);
    expect(get("neopentane").Tb).toBeLessThan(get("isopentane").Tb);
    expect(get("isopentane").Tb).toBeLessThan(get("n-pentane").Tb);
  });
});
