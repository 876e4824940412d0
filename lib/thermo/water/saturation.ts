/**
 * IAPWS-IF97 region 4: the saturation-pressure equation ps(T), Eq. (30), and its exact inverse Ts(p),
 * Eq. (31), both from the implicit quadratic Eq. (29) with the Table 34 coefficients.
 * Validity: 273.15 K <= T <= 647.096 K; 611.213 Pa <= p <= 22.064 MPa. Eq. (31) is consistent with
 * Eq. (30) to round-off. Accuracy vs IAPWS-95: ps within 0.025 % (release, Sec. 8). SI in and out.
 */
import { ThermoError } from "../errors.js";
import { P_CRIT_MPA, P_MIN_SAT_MPA, T_CRIT, T_MIN } from "./constants.js";
import { SATURATION as N } from "./tables/boundaryCoefficients.js";

/** Saturation pressure (Pa) at T (K). Throws ThermoError("T") outside 273.15 K .. 647.096 K. */
export function if97Psat(T: number): number {
  if (!(T >= T_MIN && T <= T_CRIT)) {
    throw new ThermoError("T", `IF97 saturation pressure needs 273.15 K <= T <= 647.096 K (triple to critical point); got T = ${T} K`);
  }
  const theta = T + N[8] / (T - N[9]);
  const A = theta * theta + N[0] * theta + N[1];
  const B = N[2] * theta * theta + N[3] * theta + N[4];
  const C = N[5] * theta * theta + N[6] * theta + N[7];
  const r = (2 * C) / (-B + Math.sqrt(B * B - 4 * A * C));
  return r * r * r * r * 1e6;
}

/** Saturation temperature (K) at p (Pa). Throws ThermoError("p") outside 611.213 Pa .. 22.064 MPa. */
export function if97Tsat(p: number): number {
  const pMPa = p / 1e6;
  // Allow the round-off of ps(273.15 K) itself at the lower end.
  if (!(pMPa >= P_MIN_SAT_MPA * (1 - 1e-9) && pMPa <= P_CRIT_MPA)) {
    throw new ThermoError("p", `IF97 saturation temperature needs 611.213 Pa <= p <= 22.064 MPa (triple to critical point); got p = ${p} Pa`);
  }
  const beta = Math.sqrt(Math.sqrt(pMPa));
  const E = beta * beta + N[2] * beta + N[5];
  const F = N[0] * beta * beta + N[3] * beta + N[6];
  const G = N[1] * beta * beta + N[4] * beta + N[7];
  const D = (2 * G) / (-F - Math.sqrt(F * F - 4 * E * G));
  return (N[9] + D - Math.sqrt((N[9] + D) * (N[9] + D) - 4 * (N[8] + N[9] * D))) / 2;
}
