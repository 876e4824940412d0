/**
 * IF97 auxiliary boundary equations (IAPWS R7-97(2012)):
 * - B23 between regions 2 and 3, Eqs. (5)/(6), valid 623.15 K <= T <= 863.15 K, 16.5292 MPa <= p <= 100 MPa;
 * - B2bc between subregions 2b and 2c of the backward equations, Eqs. (20)/(21);
 * - the 2a/2b boundary h(s) of the p(h,s) backward equations, IAPWS SR2-01(2014) Eq. (2).
 * SI in and out (K, Pa, J/kg, J/(kg K)).
 */
import { B23, B2BC } from "./tables/boundaryCoefficients.js";

/** Pressure on the B23 line at temperature T (K), Pa. */
export function b23Pressure(T: number): number {
  return (B23[0] + B23[1] * T + B23[2] * T * T) * 1e6;
}

/** Temperature on the B23 line at pressure p (Pa), K. */
export function b23Temperature(p: number): number {
  return B23[3] + Math.sqrt((p / 1e6 - B23[4]) / B23[2]);
}

/** Pressure on the B2bc line at enthalpy h (J/kg), Pa. */
export function b2bcPressure(h: number): number {
  const hk = h / 1000;
  return (B2BC[0] + B2BC[1] * hk + B2BC[2] * hk * hk) * 1e6;
}

/** Enthalpy on the B2bc line at pressure p (Pa), J/kg. */
export function b2bcEnthalpy(p: number): number {
  return (B2BC[3] + Math.sqrt((p / 1e6 - B2BC[4]) / B2BC[2])) * 1000;
}

/**
 * Enthalpy on the 2a/2b boundary of the p(h,s) backward equations at entropy s (J/(kg K)), J/kg.
 * Coefficients: IAPWS SR2-01(2014), Eq. (2) and its coefficient table.
 */
export function h2abOfS(s: number): number {
  const sk = s / 1000;
  return (-0.349898083432139e4 + 0.257560716905876e4 * sk - 0.421073558227969e3 * sk * sk + 0.276349063799944e2 * sk * sk * sk) * 1000;
}
