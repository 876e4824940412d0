/**
 * Generalized second virial coefficient correlations, reduced form B Pc / (R Tc) = B0(Tr) + omega B1(Tr),
 * with their temperature derivatives (for HR and SR), and the cross-coefficient combining rules.
 *
 * - Pitzer/Abbott: B0 = 0.083 - 0.422/Tr^1.6, B1 = 0.139 - 0.172/Tr^4.2 (Abbott's fit to Pitzer's
 *   correlation; Smith, Van Ness & Abbott, Introduction to Chemical Engineering Thermodynamics, 7th ed.,
 *   eqs. 3.65-3.66, from memory).
 * - Tsonopoulos (AIChE J. 20 (1974) 263, from memory), non-polar terms:
 *   f0 = 0.1445 - 0.330/Tr - 0.1385/Tr^2 - 0.0121/Tr^3 - 0.000607/Tr^8
 *   f1 = 0.0637 + 0.331/Tr^2 - 0.423/Tr^3 - 0.008/Tr^8
 * Combining rules (Prausnitz, Lichtenthaler & de Azevedo, Molecular Thermodynamics of Fluid-Phase
 * Equilibria, 3rd ed. (1999), and SVNA 7th ed. eqs. 11.70-11.74, from memory):
 *   omega_ij = (omega_i + omega_j)/2, Tcij = sqrt(Tci Tcj)(1 - kij), Zcij = (Zci + Zcj)/2,
 *   Vcij = ((Vci^(1/3) + Vcj^(1/3))/2)^3, Pcij = Zcij R Tcij / Vcij.
 * Accuracy: B of non-polar gases typically within 5-10 cm^3/mol (a few %) for Tr > 0.6 or so.
 */
import { R } from "../constants.js";
import type { Substance } from "../substances/types.js";

export type VirialCorrelation = "abbott" | "tsonopoulos";

/** B0 and B1 and their derivatives with respect to Tr. */
export interface ReducedB {
  B0: number;
  B1: number;
  dB0: number;
  dB1: number;
}

export function reducedB(correlation: VirialCorrelation, Tr: number): ReducedB {
  if (correlation === "abbott") {
    return {
      B0: 0.083 - 0.422 / Tr ** 1.6,
      B1: 0.139 - 0.172 / Tr ** 4.2,
      dB0: (0.422 * 1.6) / Tr ** 2.6,
      dB1: (0.172 * 4.2) / Tr ** 5.2,
    };
  }
  return {
    B0: 0.1445 - 0.33 / Tr - 0.1385 / Tr ** 2 - 0.0121 / Tr ** 3 - 0.000607 / Tr ** 8,
    B1: 0.0637 + 0.331 / Tr ** 2 - 0.423 / Tr ** 3 - 0.008 / Tr ** 8,
    dB0: 0.33 / Tr ** 2 + 0.277 / Tr ** 3 + 0.0363 / Tr ** 4 + 0.004856 / Tr ** 9,
    dB1: -0.662 / Tr ** 3 + 1.269 / Tr ** 4 + 0.064 / Tr ** 9,
  };
}

/** Critical constants of one pair (i, j), by the combining rules above (i = j gives the pure ones). */
export interface PairConstants {
  Tc: number;
  Pc: number;
  omega: number;
}

export function pairConstants(a: Substance, b: Substance, kij = 0): PairConstants {
  if (a === b && kij === 0) return { Tc: a.Tc, Pc: a.Pc, omega: a.omega };
  const Tc = Math.sqrt(a.Tc * b.Tc) * (1 - kij);
  const Zc = (a.Zc + b.Zc) / 2;
  const Vc = ((Math.cbrt(a.Vc) + Math.cbrt(b.Vc)) / 2) ** 3;
  return { Tc, Pc: (Zc * R * Tc) / Vc, omega: (a.omega + b.omega) / 2 };
}

/** B (m^3/mol) and dB/dT (m^3/(mol K)) of one pair at T. */
export function pairB(c: PairConstants, correlation: VirialCorrelation, T: number): { B: number; dBdT: number } {
  const Tr = T / c.Tc;
  const r = reducedB(correlation, Tr);
  const scale = (R * c.Tc) / c.Pc;
  return { B: scale * (r.B0 + c.omega * r.B1), dBdT: (scale / c.Tc) * (r.dB0 + c.omega * r.dB1) };
}
