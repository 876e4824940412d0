/**
 * IAPWS-IF97 region 5 (high-temperature steam, 1073.15 K to 2273.15 K, p <= 50 MPa).
 * Coefficients transcribed from the IAPWS publication named beside each table; every number is the
 * printed value (14 significant digits in the IF97 release, 15 in the supplementary releases). Dimensionless; see the equation cited for the reducing quantities.
 */
import type { Terms } from "./terms.js";

/** IAPWS R7-97(2012), Revised Release on IF97, Table 37: n0_i, J0_i of the ideal-gas part of Eq. (32). */
export const REGION5_IDEAL: Terms = {
  I: [],
  J: [
    0, 1, -3, -2, -1, 2,
  ],
  n: [
    -1.3179983674201e1, 6.8540841634434e0, -2.4805148933466e-2, 3.6901534980333e-1,
    -3.1161318213925e0, -3.2961626538917e-1,
  ],
};

/** IAPWS R7-97(2012), Revised Release on IF97, Table 38: n_i, I_i, J_i of the residual part of Eq. (32) (6 terms). */
export const REGION5_RESIDUAL: Terms = {
  I: [
    1, 1, 1, 2, 2, 3,
  ],
  J: [
    1, 2, 3, 3, 9, 7,
  ],
  n: [
    1.5736404855259e-3, 9.0153761673944e-4, -5.0270077677648e-3, 2.2440037409485e-6,
    -4.1163275453471e-6, 3.7919454822955e-8,
  ],
};
