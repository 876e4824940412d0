import { describe, expect, it } from "vitest";
import { R } from "../../../../lib/thermo/constants.js";
import { cp } from "../../../../lib/thermo/idealGas/cp.js";
import { POLAR } from "../../../../lib/thermo/substances/polar.js";

const get = (id: string) => POLAR.find((s) => s.id === id)!;

describe("POLAR", () => {
  it("POLAR water uses the IAPWS critical point", () => {
    const w = get("water");
    expect(w.Tc).toBe(647.096); // IAPWS R2-83 (exact by definition)
    expect(w.Pc).toBeCloseTo(22.064e6, 0); // IAPWS R2-83
    expect(w.M / w.Vc).toBeCloseTo(322, 0); // rho_c = 322 kg/m^3, IAPWS R2-83
    expect(w.Zc).toBeCloseTo((w.Pc * w.Vc) / (R * w.Tc), 3);
  });

  it("POLAR ideal-gas Cp within 3.5 % of JANAF at 300-1000 K", () => {
    // J/(mol K), JANAF 4th ed. (1998), from memory. The 3.5 % band covers the 298-2000 K fit of water's
    // correlation, which reads about 3 % low at room temperature.
    const ref: [string, number, number][] = [
      ["water", 300, 33.6], ["water", 500, 35.23], ["water", 1000, 41.27],
      ["ammonia", 300, 35.65], ["ammonia", 500, 42.05],
    ];
    for (const [id, T, v] of ref) expect(Math.abs(cp(get(id), T) / v - 1), `${id} ${T} K`).toBeLessThan(0.035);
  });

  it("POLAR ammonia and methanol critical points agree with reference equations (Tc 0.2 %, Pc 1 %)", () => {
    // NH3: Tillner-Roth, Harms-Watzenberg & Baehr (1993) 405.40 K, 11.333 MPa; methanol: de Reuck &
    // Craven (1993) 512.6 K, 8.104 MPa; from memory.
    expect(Math.abs(get("ammonia").Tc / 405.4 - 1)).toBeLessThan(0.002);
    expect(Math.abs(get("ammonia").Pc / 11.333e6 - 1)).toBeLessThan(0.01);
    expect(Math.abs(get("methanol").Tc / 512.6 - 1)).toBeLessThan(0.002);
    expect(Math.abs(get("methanol").Pc / 8.104e6 - 1)).toBeLessThan(0.01);
  });

  it("POLAR records warn that generalized correlations are least accurate for them", () => {
    for (const s of POLAR) expect(s.note, s.id).toMatch(/polar/);
  });
});
