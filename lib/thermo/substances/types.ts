/**
 * Substance records. SI units throughout: K, Pa, m^3/mol, kg/mol.
 */

/** Ideal-gas heat capacity correlation; `cp` in J/(mol K). Each table names its published source. */
export interface CpCorrelation {
  /** e.g. "Cp/R = A + B T + C T^2 + D T^-2" */
  form: string;
  coefficients: readonly number[];
  /** Range of temperature (K) over which the correlation was fitted. */
  Tmin: number;
  Tmax: number;
  source: string;
}

export interface Substance {
  /** Canonical lower-case key, e.g. "methane", "n-butane". */
  id: string;
  name: string;
  formula: string;
  aliases: readonly string[];
  cas?: string;
  /** Molar mass, kg/mol. */
  M: number;
  Tc: number;
  Pc: number;
  /** Critical molar volume, m^3/mol. */
  Vc: number;
  Zc: number;
  omega: number;
  /** Normal boiling point, K (at 101325 Pa). */
  Tb: number;
  cp: CpCorrelation;
  /** Where the constants come from: book, table, edition; "(from memory)" where recalled. */
  source: string;
  /**
   * Triple point, K and Pa (Pt may be unknown): below Tt the stable condensed phase is a solid, so an
   * equation-of-state liquid there is an extrapolation and psat/tsat do not apply. Absent = unknown.
   */
  Tt?: number;
  Pt?: number;
  /** Where Tt and Pt come from. */
  tripleSource?: string;
  /** True for a user-defined pseudo-component. */
  user?: boolean;
  /** Caveats for the user, e.g. "Tb is the sublimation point" or how defaults were filled. */
  note?: string;
}
