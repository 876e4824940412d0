import { describe, expect, it } from "vitest";
import { b23Temperature } from "../../../../lib/thermo/water/boundaries.js";
import { if97Tsat } from "../../../../lib/thermo/water/saturation.js";
import { region2 } from "../../../../lib/thermo/water/region2.js";
import {
  region2PofHS,
  region2TofPH,
  region2TofPS,
  subregion2HS,
  subregion2PH,
  subregion2PS,
} from "../../../../lib/thermo/water/region2Backward.js";

/** Lowest temperature of region 2 at p: the saturation line below 16.53 MPa, else the B23 line. */
function lowestT2(p: number): number {
  return p <= 16.5291642e6 ? if97Tsat(p) : b23Temperature(p);
}

function expect9(calc: number, printed: number): void {
  const unit = Math.pow(10, Math.floor(Math.log10(Math.abs(printed))) - 8);
  expect(Math.abs(calc - printed), `${calc} vs printed ${printed}`).toBeLessThanOrEqual(0.5 * unit * (1 + 1e-9));
}

// Check values: IAPWS R7-97(2012) Table 24 (T(p,h)) and Table 29 (T(p,s)); IAPWS SR2-01(2014) Table 9
// (p(h,s)). Written from memory; python3-iapws doctests print the same digits for those they show.
describe("region2TofPH (IF97 Table 24)", () => {
  const rows: [number, number, string, number][] = [
    [0.001, 3000, "2a", 0.534433241e3],
    [3, 3000, "2a", 0.575373370e3],
    [3, 4000, "2a", 0.101077577e4],
    [5, 3500, "2b", 0.801299102e3],
    [5, 4000, "2b", 0.101531583e4],
    [25, 3500, "2b", 0.875279054e3],
    [40, 2700, "2c", 0.743056411e3],
    [60, 2700, "2c", 0.791137067e3],
    [60, 3200, "2c", 0.882756860e3],
  ];
  for (const [p, h, sub, T] of rows) {
    it(`region2TofPH at p = ${p} MPa, h = ${h} kJ/kg is subregion ${sub}, T = ${T} K`, () => {
      expect(subregion2PH(p * 1e6, h * 1e3)).toBe(sub);
      expect9(region2TofPH(p * 1e6, h * 1e3), T);
    });
  }
  it("region2TofPH round trip T -> h -> T within 25 mK over region 2", () => {
    // Tolerances: IF97 Sec. 6.3.2 states 10 mK (2a, 2b) and 25 mK (2c).
    for (const p of [0.01e6, 1e6, 5e6, 10e6, 20e6, 60e6, 100e6]) {
      for (let T = lowestT2(p); T <= 1073.15; T += 25) {
        expect(Math.abs(region2TofPH(p, region2(T, p).h) - T), `p=${p} T=${T}`).toBeLessThan(0.025);
      }
    }
  });
});

describe("region2TofPS (IF97 Table 29)", () => {
  const rows: [number, number, string, number][] = [
    [0.1, 7.5, "2a", 0.399517097e3],
    [0.1, 8, "2a", 0.514127081e3],
    [2.5, 8, "2a", 0.103984917e4],
    [8, 6, "2b", 0.600484040e3],
    [8, 7.5, "2b", 0.106495556e4],
    [90, 6, "2b", 0.103801126e4],
    [20, 5.75, "2c", 0.697992849e3],
    [80, 5.25, "2c", 0.854011484e3],
    [80, 5.75, "2c", 0.949017998e3],
  ];
  for (const [p, s, sub, T] of rows) {
    it(`region2TofPS at p = ${p} MPa, s = ${s} kJ/(kg K) is subregion ${sub}, T = ${T} K`, () => {
      expect(subregion2PS(p * 1e6, s * 1e3)).toBe(sub);
      expect9(region2TofPS(p * 1e6, s * 1e3), T);
    });
  }
  it("region2TofPS round trip T -> s -> T within 25 mK", () => {
    for (const p of [0.01e6, 1e6, 10e6, 60e6]) {
      for (let T = lowestT2(p); T <= 1073.15; T += 25) {
        expect(Math.abs(region2TofPS(p, region2(T, p).s) - T)).toBeLessThan(0.025); // IF97 Sec. 6.3.2
      }
    }
  });
});

describe("region2PofHS (IAPWS SR2-01(2014) Table 9)", () => {
  const rows: [number, number, string, number][] = [
    [2800, 6.5, "2a", 0.1371012767e1],
    [2800, 9.5, "2a", 0.1879743844e-2],
    [4100, 9.5, "2a", 0.1024788997],
    [2800, 6, "2b", 0.4793911442e1],
    [3600, 6, "2b", 0.8395519209e2],
    [3600, 7, "2b", 0.7527161441e1],
    [2800, 5.1, "2c", 0.9439202060e2],
    [2800, 5.8, "2c", 0.8414574124e1],
    [3400, 5.8, "2c", 0.8376903879e2],
  ];
  for (const [h, s, sub, p] of rows) {
    it(`region2PofHS at h = ${h} kJ/kg, s = ${s} kJ/(kg K) is subregion ${sub}, p = ${p} MPa`, () => {
      expect(subregion2HS(h * 1e3, s * 1e3)).toBe(sub);
      expect9(region2PofHS(h * 1e3, s * 1e3) / 1e6, p);
    });
  }
});
