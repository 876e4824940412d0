/**
 * IAPWS-IF97 boundary equations: B23 (regions 2/3), B2bc (subregions 2b/2c) and the region 4
 * saturation-pressure equation. Values as printed in IAPWS R7-97(2012).
 */

/** IAPWS R7-97(2012), Revised Release on IF97, Table 1: n_1..n_5 of the B23 equations, Eqs. (5) and (6); p in MPa, T in K. */
export const B23 = [
  0.34805185628969e3, -0.11671859879975e1, 0.10192970039326e-2, 0.57254459862746e3, 0.13918839778870e2,
] as const;

/** IAPWS R7-97(2012), Revised Release on IF97, Table 19: n_1..n_5 of the B2bc equations, Eqs. (20) and (21); p in MPa, h in kJ/kg. */
export const B2BC = [
  0.90584278514723e3, -0.67955786399241, 0.12809002730136e-3, 0.26526571908428e4, 0.45257578905948e1,
] as const;

/** IAPWS R7-97(2012), Revised Release on IF97, Table 34: n_1..n_10 of the saturation equations, Eqs. (30) and (31); p in MPa, T in K. */
export const SATURATION = [
  1.1670521452767e3, -7.2421316703206e5, -1.7073846940092e1, 1.202082470247e4, -3.2325550322333e6,
  1.491510861353e1, -4.8232657361591e3, 4.0511340542057e5, -2.3855557567849e-1, 6.5017534844798e2,
] as const;
