import { describe, expect, it } from "vitest";
import * as c from "../../../../lib/thermo/water/constants.js";
import { if97Psat } from "../../../../lib/thermo/water/saturation.js";

describe("water constants", () => {
  it("R_KJ equals the universal gas constant over M to the 6 digits IF97 prints", () => {
    // IF97 Eq. (1): R = 0.461526 kJ/(kg K); CODATA R = 8.314462618 J/(mol K), IAPWS M = 18.015268 g/mol.
    expect(8.314462618 / c.M_WATER / 1000).toBeCloseTo(c.R_KJ, 5);
  });
  it("P_MIN_SAT_MPA and P_13_MPA are ps(273.15 K) and ps(623.15 K) of Eq. (30)", () => {
    expect(if97Psat(273.15) / 1e6 / c.P_MIN_SAT_MPA).toBeCloseTo(1, 10);
    expect(if97Psat(623.15) / 1e6 / c.P_13_MPA).toBeCloseTo(1, 10);
  });
  it("critical constants are the IF97 values 647.096 K, 22.064 MPa, 322 kg/m3", () => {
    // IAPWS R7-97(2012) Eqs. (2)-(4) (from memory).
    expect([c.T_CRIT, c.P_CRIT_MPA, c.RHO_CRIT]).toEqual([647.096, 22.064, 322]);
    expect(if97Psat(c.T_CRIT) / 1e6).toBeCloseTo(22.064, 6); // Eq. (30) ends at the critical point
  });
});
