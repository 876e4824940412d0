import { describe, expect, it } from "vitest";
import { R } from "../../../../lib/thermo/constants.js";
import { ThermoError } from "../../../../lib/thermo/errors.js";
import { cp, enthalpyIntegral } from "../../../../lib/thermo/idealGas/cp.js";
import { pseudoComponent } from "../../../../lib/thermo/substances/pseudo.js";

const base = { name: "C7+ cut", Tc: 600, Pc: 25e5, omega: 0.4, M: 0.12 };

describe("pseudoComponent", () => {
  it("pseudoComponent fills Zc by 0.291 - 0.080 omega and Vc = Zc R Tc / Pc, and says so", () => {
    const s = pseudoComponent(base);
    expect(s.Zc).toBeCloseTo(0.291 - 0.08 * 0.4, 12); // the documented correlation
    expect(s.Vc).toBeCloseTo((s.Zc * R * 600) / 25e5, 15);
    expect(s.user).toBe(true);
    expect(s.note).toMatch(/Zc = 0.291/);
  });

  it("pseudoComponent estimates Tb from the Edmister line: n-octane's constants give about its Tb", () => {
    // n-octane Tc 568.7 K, Pc 24.90 bar, omega 0.400 -> Tb 398.8 K (SVNA 7th ed. Table B.1, from memory);
    // the Edmister line is a rough estimate: 3 % (common practice for this shortcut).
    const s = pseudoComponent({ name: "oct", Tc: 568.7, Pc: 24.9e5, omega: 0.4, M: 0.114 });
    expect(Math.abs(s.Tb / 398.8 - 1)).toBeLessThan(0.03);
  });

  it("pseudoComponent without cp errors on ideal-gas totals, naming cp", () => {
    const s = pseudoComponent(base);
    expect(() => cp(s, 300)).toThrow(/no ideal-gas Cp correlation for "C7\+ cut"/);
    try {
      enthalpyIntegral(s, 298.15, 400);
    } catch (e) {
      expect((e as ThermoError).argument).toBe("cp");
    }
  });

  it("pseudoComponent takes a constant cp in J/(mol K)", () => {
    const s = pseudoComponent({ ...base, cp: 200 });
    expect(cp(s, 500)).toBeCloseTo(200, 10);
    expect(enthalpyIntegral(s, 300, 400)).toBeCloseTo(200 * 100, 8); // Cp dT for constant Cp
  });

  it("pseudoComponent rejects bad fields naming the field, range and unit", () => {
    expect(() => pseudoComponent({ ...base, Tc: -5 })).toThrow(/Tc must be a number in \(0, 2000\] K; got -5/);
    expect(() => pseudoComponent({ ...base, Pc: 0 })).toThrow(/Pc .* Pa/);
    expect(() => pseudoComponent({ ...base, omega: 3 })).toThrow(/omega/);
    expect(() => pseudoComponent({ ...base, M: 120 })).toThrow(/M must be .* kg\/mol; got 120/);
    expect(() => pseudoComponent({ ...base, Tb: 700 })).toThrow(/Tb .* below Tc/);
    expect(() => pseudoComponent({ ...base, name: "" })).toThrow(/name/);
    expect(() => pseudoComponent({ ...base, cp: { form: "nope", coefficients: [1, 2, 3, 4], Tmin: 1, Tmax: 2, source: "" } })).toThrow(/cp.form/);
  });
});
