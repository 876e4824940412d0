/**
 * Citations shared by the databank files. "(from memory)" marks numbers recalled from the named table
 * rather than read from it during writing; tests compare them with independent values.
 */

/** Critical constants, acentric factor, normal boiling point. */
export const SVNA_B1 =
  "Smith, Van Ness & Abbott, Introduction to Chemical Engineering Thermodynamics, 7th ed. (2005), App. B, Table B.1 (from memory)";

export const SVNA_C1 =
  "Smith, Van Ness & Abbott, Introduction to Chemical Engineering Thermodynamics, 7th ed. (2005), App. C, Table C.1, Cp/R = A + BT + CT^2 + DT^-2, 298 K to Tmax (from memory)";

export const PGL5_A =
  "Poling, Prausnitz & O'Connell, The Properties of Gases and Liquids, 5th ed. (2001), App. A, Table A-1 (from memory)";

export const RPP4_CP =
  "Reid, Prausnitz & Poling, The Properties of Gases and Liquids, 4th ed. (1987), App. A, Cp^ig = A + BT + CT^2 + DT^3 J/(mol K) (from memory)";

export const IAPWS_CRIT =
  "IAPWS R2-83 critical point of ordinary water (Tc = 647.096 K, Pc = 22.064 MPa, rhoc = 322 kg/m^3); omega = -1 - log10(Psat(0.7 Tc)/Pc) = 0.3443 and Tb = 373.124 K from the IAPWS-95 saturation curve (IAPWS R6-95, 2018 revision; PGL 5th ed. App. A rounds omega to 0.345) (from memory, checked against python3-iapws)";

export const REFRIG_CP_APPROX =
  "approximate fit (+-3 %) to ideal-gas Cp from the ideal-gas part of the reference equation of state cited for the fluid (from memory)";
