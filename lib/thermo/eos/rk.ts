/**
 * Redlich-Kwong equation of state (O. Redlich and J. N. S. Kwong, Chem. Rev. 44, 233-244, 1949):
 * P = RT/(V - b) - a/(T^0.5 V (V + b)); in the generic cubic form eps = 0, sig = 1, alpha = Tr^-1/2,
 * OmegaA = 0.42748, OmegaB = 0.08664, Zc = 1/3 (exact values from the critical conditions).
 * Fair for gases at Tr above ~1 and moderate Pr; vapour pressures poor (no acentric factor).
 */
import { criticalConstants } from "./criticalConstants.js";
import { cubicModel, type CubicModel, type CubicParameters } from "./cubic.js";
import type { Fluid } from "./types.js";

export const RK: CubicParameters = {
  id: "rk",
  label: "Redlich-Kwong (1949)",
  source: "O. Redlich, J. N. S. Kwong, Chem. Rev. 44 (1949) 233",
  eps: 0,
  sig: 1,
  ...criticalConstants(0, 1),
  alpha: (Tr) => 1 / Math.sqrt(Tr),
  dAlphaDTr: (Tr) => -0.5 / (Tr * Math.sqrt(Tr)),
};

/** Redlich-Kwong model of a fluid (pure or mixture with one-fluid mixing and k_ij). */
export const rk = (fluid: Fluid): CubicModel => cubicModel(RK, fluid);
