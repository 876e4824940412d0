import { describe, expect, it } from "vitest";
import { R } from "../../../../lib/thermo/constants.js";
import { cp } from "../../../../lib/thermo/idealGas/cp.js";
import { UNSATURATED } from "../../../../lib/thermo/substances/unsaturated.js";

const get = (id: string) => UNSATURATED.find((s) => s.id === id)!;

describe("UNSATURATED", () => {
  it("UNSATURATED ideal-gas Cp at 298.15 K within 4 % of tabulated values", () => {
    // J/(mol K), ideal gas at 298.15 K: JANAF tables (ethylene 42.89, acetylene 44.04) and TRC
    // (benzene 82.4, toluene 103.6, propylene 64.3, p-xylene 126.9), all from memory. The 298-1500 K
    // fits read up to about 3.5 % high at their low end (ethylene, benzene).
    const ref: [string, number][] = [
      ["ethylene", 42.89], ["acetylene", 44.04], ["benzene", 82.4], ["toluene", 103.6], ["propylene", 64.3], ["p-xylene", 126.9],
    ];
    for (const [id, v] of ref) expect(Math.abs(cp(get(id), 298.15) / v - 1), id).toBeLessThan(0.04);
  });

  it("UNSATURATED xylenes: o-xylene has the highest Tc and Tb of the three (handbook ordering)", () => {
    expect(get("o-xylene").Tc).toBeGreaterThan(get("m-xylene").Tc);
    expect(get("o-xylene").Tb).toBeGreaterThan(get("p-xylene").Tb);
  });

  it("UNSATURATED acetylene's Tb is flagged as a sublimation point", () => {
    expect(get("acetylene").note).toMatch(/sublimation/);
  });
  it("UNSATURATED Cp/R at 298.15 K equals the Cp298/R column printed beside each Table C.1 row (0.05 %)", () => {
    // SVNA 7th ed. (2005) Table C.1, column "Cp^ig_298/R" (from memory); catches a mistyped coefficient.
    // 1,3-butadiene is left out: its printed column is not recalled with confidence. 0.05 %: rounding only.
    const ref: [string, number][] = [
      ["ethylene", 5.325], ["propylene", 7.792], ["1-butene", 10.52], ["acetylene", 5.253], ["benzene", 10.259],
      ["toluene", 12.922], ["ethylbenzene", 15.993], ["styrene", 15.534],
    ];
    for (const [id, v] of ref) expect(Math.abs(cp(get(id), 298.15) / R / v - 1), id).toBeLessThan(5e-4);
  });

  it("UNSATURATED ideal-gas Cp of the remaining rows within 4 % of TRC values at 298.15 K", () => {
    // J/(mol K), ideal gas at 298.15 K, TRC Thermodynamic Tables - Hydrocarbons (from memory): 1-butene 85.65,
    // 1,3-butadiene 79.54, ethylbenzene 128.41, o-xylene 133.26, m-xylene 127.57. 4 %: the Table C.1
    // fits read 2-4 % high at 298 K for these (1,3-butadiene 3.8 %); the 4th-ed. cubics within 0.5 %.
    const ref: [string, number][] = [
      ["1-butene", 85.65], ["1,3-butadiene", 79.54], ["ethylbenzene", 128.41], ["o-xylene", 133.26], ["m-xylene", 127.57],
    ];
    for (const [id, v] of ref) expect(Math.abs(cp(get(id), 298.15) / v - 1), id).toBeLessThan(0.04);
  });
});
