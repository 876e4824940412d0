/**
 * IAPWS-IF97 region 3 (near-critical): basic equation in Helmholtz free energy f(rho,T).
 * Coefficients transcribed from the IAPWS publication named beside each table; every number is the
 * printed value (14 significant digits in the IF97 release, 15 in the supplementary releases). Dimensionless; see the equation cited for the reducing quantities.
 */
import type { Terms } from "./terms.js";

/** IAPWS R7-97(2012), Revised Release on IF97, Table 30: n_1 multiplies ln(delta) in Eq. (28). */
export const REGION3_N1 = 1.0658070028513;

/** IAPWS R7-97(2012), Revised Release on IF97, Table 30: n_i, I_i, J_i for i = 2..40 of Eq. (28) (39 terms). */
export const REGION3_HELMHOLTZ: Terms = {
  I: [
    0, 0, 0, 0, 0, 0, 0, 1, 1, 1, 1, 2,
    2, 2, 2, 2, 2, 3, 3, 3, 3, 3, 4, 4,
    4, 4, 5, 5, 5, 6, 6, 6, 7, 8, 9, 9,
    10, 10, 11,
  ],
  J: [
    0, 1, 2, 7, 10, 12, 23, 2, 6, 15, 17, 0,
    2, 6, 7, 22, 26, 0, 2, 4, 16, 26, 0, 2,
    4, 26, 1, 3, 26, 0, 2, 26, 2, 26, 2, 26,
    0, 1, 26,
  ],
  n: [
    -1.5732845290239e1, 2.0944396974307e1, -7.6867707878716e0, 2.6185947787954e0,
    -2.808078114862e0, 1.2053369696517e0, -8.4566812812502e-3, -1.2654315477714e0,
    -1.1524407806681e0, 8.8521043984318e-1, -6.4207765181607e-1, 3.8493460186671e-1,
    -8.5214708824206e-1, 4.8972281541877e0, -3.0502617256965e0, 3.9420536879154e-2,
    1.2558408424308e-1, -2.799932969871e-1, 1.389979956946e0, -2.018991502357e0,
    -8.2147637173963e-3, -4.7596035734923e-1, 4.39840744735e-2, -4.4476435428739e-1,
    9.0572070719733e-1, 7.0522450087967e-1, 1.0770512626332e-1, -3.2913623258954e-1,
    -5.0871062041158e-1, -2.2175400873096e-2, 9.4260751665092e-2, 1.6436278447961e-1,
    -1.3503372241348e-2, -1.4834345352472e-2, 5.7922953628084e-4, 3.2308904703711e-3,
    8.0964802996215e-5, -1.6557679795037e-4, -4.4923899061815e-5,
  ],
};
