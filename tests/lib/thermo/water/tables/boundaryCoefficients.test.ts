import { describe, expect, it } from "vitest";
import { B23, B2BC, SATURATION } from "../../../../../lib/thermo/water/tables/boundaryCoefficients.js";

describe("boundaryCoefficients", () => {
  it("boundaryCoefficients hold 5 (Table 1), 5 (Table 19) and 10 (Table 34) coefficients", () => {
    expect([B23.length, B2BC.length, SATURATION.length]).toEqual([5, 5, 10]);
  });
  it("B23 coefficients reproduce the Sec. 4 check value 16.5291643 MPa at 623.15 K", () => {
    // IAPWS R7-97(2012) Sec. 4 (from memory).
    expect(B23[0] + B23[1] * 623.15 + B23[2] * 623.15 ** 2).toBeCloseTo(16.5291643, 6);
  });
});
