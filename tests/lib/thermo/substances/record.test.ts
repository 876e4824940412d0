import { describe, expect, it } from "vitest";
import { CP_FORMS, cpCubic, cpMonatomic, cpTableC1, fromTable } from "../../../../lib/thermo/substances/record.js";

describe("fromTable", () => {
  it("fromTable converts bar, cm^3/mol and g/mol to Pa, m^3/mol and kg/mol", () => {
    const s = fromTable({
      id: "x", name: "X", formula: "X", aliases: [], M: 16.043, omega: 0.012, Tc: 190.6, Pc_bar: 45.99, Zc: 0.286,
      Vc_cm3: 98.6, Tb: 111.4, cp: cpMonatomic(), source: "test",
    });
    expect(s.M).toBeCloseTo(0.016043, 9); // 1 g = 1e-3 kg (SI definition)
    expect(s.Pc).toBeCloseTo(4.599e6, 3); // 1 bar = 1e5 Pa (SI definition)
    expect(s.Vc).toBeCloseTo(9.86e-5, 12); // 1 cm^3 = 1e-6 m^3
  });
});

describe("cpTableC1", () => {
  it("cpTableC1 scales the printed 10^3 B, 10^6 C, 10^-5 D columns", () => {
    const c = cpTableC1(1.702, 9.081, -2.164, 0.5, 1500, "s");
    expect(c.coefficients).toEqual([1.702, 9.081e-3, -2.164e-6, 0.5e5]);
    expect(CP_FORMS).toContain(c.form);
  });
});

describe("cpCubic", () => {
  it("cpCubic keeps coefficients and range as given", () => {
    const c = cpCubic(1, 2, 3, 4, 273, 1500, "s");
    expect(c.coefficients).toEqual([1, 2, 3, 4]);
    expect([c.Tmin, c.Tmax]).toEqual([273, 1500]);
    expect(CP_FORMS).toContain(c.form);
  });
});
