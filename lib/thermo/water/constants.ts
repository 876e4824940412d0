/**
 * IAPWS-IF97 reference constants and validity limits.
 * Source: IAPWS R7-97(2012), Revised Release on the IAPWS Industrial Formulation 1997, Eqs. (1)-(3);
 * molar mass from IAPWS G5-01(2020) / IAPWS-95 (M = 18.015268 g/mol).
 * Internally IF97 works in MPa, kJ/kg, kJ/(kg K); the public API converts to SI at its edge.
 */

/** Specific gas constant of water, kJ/(kg K) (IF97 Eq. 1). */
export const R_KJ = 0.461526;
/** Critical temperature, K (IF97 Eq. 2). */
export const T_CRIT = 647.096;
/** Critical pressure, MPa (IF97 Eq. 3). */
export const P_CRIT_MPA = 22.064;
/** Critical density, kg/m^3 (IF97 Eq. 4). */
export const RHO_CRIT = 322;
/** Molar mass of water, kg/mol (IAPWS). */
export const M_WATER = 0.018015268;

/** Lowest temperature of the formulation, K. */
export const T_MIN = 273.15;
/** Upper temperature of region 1, lower bound of region 3, K. */
export const T_13 = 623.15;
/** Temperature above which region 2 extends to 100 MPa (B23 reaches 100 MPa at 863.15 K), K. */
export const T_B23_MAX = 863.15;
/** Upper temperature of regions 1-3, lower bound of region 5, K. */
export const T_25 = 1073.15;
/** Upper temperature of region 5, K. */
export const T_MAX = 2273.15;
/** Upper pressure for T <= 1073.15 K, MPa. */
export const P_MAX_MPA = 100;
/** Upper pressure of region 5, MPa. */
export const P_MAX5_MPA = 50;
/** Saturation pressure at 273.15 K from Eq. (30), MPa: the lowest pressure of the liquid region. */
export const P_MIN_SAT_MPA = 0.000611212677444;
/** Saturation pressure at 623.15 K from Eq. (30), MPa: where regions 1, 2, 3 and 4 meet. */
export const P_13_MPA = 16.5291642526;

/** Plain-language validity statement used in every out-of-range error. */
export const VALIDITY_TEXT =
  "IAPWS-IF97 is valid for 273.15 K <= T <= 1073.15 K at 0 < p <= 100 MPa, and 1073.15 K < T <= 2273.15 K at 0 < p <= 50 MPa";
