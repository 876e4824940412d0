import { describe, expect, it } from "vitest";
import { if97Tsat } from "../../../../lib/thermo/water/saturation.js";
import { region1, region1PofHS, region1TofPH, region1TofPS } from "../../../../lib/thermo/water/region1.js";

/** Passes when `calc` equals the printed 9-significant-digit value to within half a unit in the 9th digit. */
function expect9(calc: number, printed: number): void {
  const unit = Math.pow(10, Math.floor(Math.log10(Math.abs(printed))) - 8);
  expect(Math.abs(calc - printed), `${calc} vs printed ${printed}`).toBeLessThanOrEqual(0.5 * unit * (1 + 1e-9));
}

// Source of every check value: IAPWS R7-97(2012) (IF97 revised release), Table 5 (basic equation),
// Table 7 (T(p,h)), Table 9 (T(p,s)); IAPWS SR2-01(2014) Table 3 (p(h,s)). Digits written from memory
// of those tables; the installed python3-iapws doctests print the same digits for the values they show.
describe("region1 (IF97 Table 5)", () => {
  const rows: [number, number, number[]][] = [
    // T K, p MPa, [v m3/kg, h kJ/kg, u kJ/kg, s kJ/kgK, cp kJ/kgK, w m/s]
    [300, 3, [0.100215168e-2, 0.115331273e3, 0.112324818e3, 0.392294792, 0.417301218e1, 0.150773921e4]],
    [300, 80, [0.971180894e-3, 0.184142828e3, 0.106448356e3, 0.368563852, 0.401008987e1, 0.163469054e4]],
    [500, 3, [0.120241800e-2, 0.975542239e3, 0.971934985e3, 0.258041912e1, 0.465580682e1, 0.124071337e4]],
  ];
  for (const [T, p, want] of rows) {
    it(`region1 at T = ${T} K, p = ${p} MPa matches Table 5 to 9 digits`, () => {
      const st = region1(T, p * 1e6);
      const got = [st.v, st.h / 1e3, st.u / 1e3, st.s / 1e3, st.cp / 1e3, st.w];
      got.forEach((g, k) => expect9(g, want[k] as number));
      expect(st.region).toBe(1);
      expect(st.rho * st.v).toBeCloseTo(1, 14);
    });
  }
});

describe("region1TofPH (IF97 Table 7)", () => {
  it("region1TofPH reproduces the three Table 7 temperatures", () => {
    expect9(region1TofPH(3e6, 500e3), 0.391798509e3);
    expect9(region1TofPH(80e6, 500e3), 0.378108626e3);
    expect9(region1TofPH(80e6, 1500e3), 0.611041229e3);
  });
  it("region1TofPH round trip T -> h -> T stays within the release's 25 mK", () => {
    for (const p of [0.1e6, 1e6, 10e6, 50e6, 100e6]) {
      for (let T = 275; T <= 620; T += 15) {
        if (p < 16.53e6 && T >= if97Tsat(p)) continue; // keep to region 1 (below the saturation line)
        const h = region1(T, p).h;
        expect(Math.abs(region1TofPH(p, h) - T)).toBeLessThan(0.025); // tolerance: IF97 Sec. 5.2.1
      }
    }
  });
});

describe("region1TofPS (IF97 Table 9)", () => {
  it("region1TofPS reproduces the three Table 9 temperatures", () => {
    expect9(region1TofPS(3e6, 0.5e3), 0.307842258e3);
    expect9(region1TofPS(80e6, 0.5e3), 0.309979785e3);
    expect9(region1TofPS(80e6, 3e3), 0.565899909e3);
  });
  it("region1TofPS round trip T -> s -> T stays within 25 mK", () => {
    for (const p of [1e6, 20e6, 100e6]) {
      for (let T = 280; T <= 450; T += 10) {
        expect(Math.abs(region1TofPS(p, region1(T, p).s) - T)).toBeLessThan(0.025); // IF97 Sec. 5.2.2
      }
    }
  });
});

describe("region1PofHS (IAPWS SR2-01(2014) Table 3)", () => {
  it("region1PofHS reproduces the three check pressures", () => {
    expect9(region1PofHS(0.001e3, 0) / 1e6, 0.9800980612e-3);
    expect9(region1PofHS(90e3, 0) / 1e6, 0.9192954727e2);
    expect9(region1PofHS(1500e3, 3.4e3) / 1e6, 0.5868294423e2);
  });
});
