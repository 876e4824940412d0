/**
 * Physical constants and reference conditions used across lib/thermo. SI units.
 */

/** Molar gas constant, J/(mol K). CODATA 2018: exact, since the 2019 SI redefinition fixes k_B and N_A. */
export const R = 8.314462618;

/** Standard-state pressure for ideal-gas reference states, Pa (IUPAC standard pressure, 1 bar). */
export const P_REF = 1e5;

/** Reference temperature for ideal-gas reference states, K (25 degC, the usual thermochemical choice). */
export const T_REF = 298.15;

/** One standard atmosphere, Pa (exact by definition); the normal boiling point is measured at it. */
export const P_ATM = 101325;
