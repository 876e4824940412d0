import { describe, expect, it } from "vitest";
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
});
