/**
 * Helpers that build databank records from the units the published tables print (bar, cm^3/mol,
 * g/mol) so each data line can be compared with its table by eye; converted once to SI here.
 */
import type { CpCorrelation, Substance } from "./types.js";

/** Cp^ig/R = A + B T + C T^2 + D T^-2 (T in K): the form of the standard chemical-engineering text's Table C.1. */
export const CP_FORM_R_QUADRATIC_INVERSE = "Cp/R = A + B T + C T^2 + D T^-2";
/** Cp^ig = A + B T + C T^2 + D T^3 in J/(mol K) (T in K): the form of the 4th-edition handbook appendix. */
export const CP_FORM_J_CUBIC = "Cp = A + B T + C T^2 + D T^3 [J/(mol K)]";

/** The Cp forms the idealGas module can integrate analytically. */
export const CP_FORMS: readonly string[] = [CP_FORM_R_QUADRATIC_INVERSE, CP_FORM_J_CUBIC];

/** Table values as printed: A, 10^3 B, 10^6 C, 10^-5 D for the Cp/R form. */
export function cpTableC1(
  A: number,
  B1e3: number,
  C1e6: number,
  Dm5: number,
  Tmax: number,
  source: string,
): CpCorrelation {
  return {
    form: CP_FORM_R_QUADRATIC_INVERSE,
    coefficients: [A, B1e3 * 1e-3, C1e6 * 1e-6, Dm5 * 1e5],
    Tmin: 298,
    Tmax,
    source,
  };
}

/** Cubic polynomial in J/(mol K), coefficients as printed (A, B, C, D). */
export function cpCubic(
  A: number,
  B: number,
  C: number,
  D: number,
  Tmin: number,
  Tmax: number,
  source: string,
): CpCorrelation {
  return { form: CP_FORM_J_CUBIC, coefficients: [A, B, C, D], Tmin, Tmax, source };
}

/** Monatomic gases: Cp/R = 5/2 exactly (translational motion only; electronic excitation negligible below ~3000 K). */
export function cpMonatomic(): CpCorrelation {
  return {
    form: CP_FORM_R_QUADRATIC_INVERSE,
    coefficients: [2.5, 0, 0, 0],
    Tmin: 1,
    Tmax: 3000,
    source: "kinetic theory of a monatomic ideal gas: Cp = 5R/2 (textbook result)",
  };
}

/** Fields as printed in critical-constant tables: M g/mol, Tc K, Pc bar, Vc cm^3/mol, Tb K. */
export interface TableRow {
  id: string;
  name: string;
  formula: string;
  aliases: readonly string[];
  cas?: string;
  M: number;
  omega: number;
  Tc: number;
  Pc_bar: number;
  Zc: number;
  Vc_cm3: number;
  Tb: number;
  cp: CpCorrelation;
  source: string;
  note?: string;
}

/** Converts one printed table row to an SI Substance record. */
export function fromTable(row: TableRow): Substance {
  const s: Substance & { note?: string } = {
    id: row.id,
    name: row.name,
    formula: row.formula,
    aliases: row.aliases,
    M: row.M / 1000,
    Tc: row.Tc,
    Pc: row.Pc_bar * 1e5,
    Vc: row.Vc_cm3 * 1e-6,
    Zc: row.Zc,
    omega: row.omega,
    Tb: row.Tb,
    cp: row.cp,
    source: row.source,
  };
  if (row.cas !== undefined) s.cas = row.cas;
  if (row.note !== undefined) s.note = row.note;
  return s;
}
