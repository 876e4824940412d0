/**
 * Peng-Robinson equation of state (D.-Y. Peng and D. B. Robinson, Ind. Eng. Chem. Fundam. 15, 59-64,
 * 1976): P = RT/(V - b) - a/(V^2 + 2bV - b^2), i.e. eps = 1 - sqrt 2, sig = 1 + sqrt 2;
 * OmegaA = 0.45724, OmegaB = 0.07780, Zc = 0.30740 (exact values from the critical conditions);
 * alpha = [1 + kappa (1 - Tr^0.5)]^2 with
 *   kappa = 0.37464 + 1.54226 omega - 0.26992 omega^2                              (1976, omega <= 0.49)
 *   kappa = 0.379642 + 1.48503 omega - 0.164423 omega^2 + 0.016666 omega^3          (1978, omega > 0.49;
 *           D. B. Robinson and D.-Y. Peng, GPA Research Report RR-28, 1978).
 * Vapour pressures of hydrocarbons within a few %, liquid densities typically within ~10 %.
 */
import { criticalConstants } from "./criticalConstants.js";
import { cubicModel, type CubicModel, type CubicParameters } from "./cubic.js";
import { soaveAlpha, soaveAlphaDTr } from "./soaveAlpha.js";
import type { Fluid } from "./types.js";

/** kappa(omega): the 1976 polynomial, or the 1978 one for omega > 0.49. */
export function prKappa(omega: number): number {
  return omega > 0.49
    ? 0.379642 + 1.48503 * omega - 0.164423 * omega * omega + 0.016666 * omega * omega * omega
    : 0.37464 + 1.54226 * omega - 0.26992 * omega * omega;
}

export const PR: CubicParameters = {
  id: "pr",
  label: "Peng-Robinson (1976; 1978 kappa for omega > 0.49)",
  source: "D.-Y. Peng, D. B. Robinson, Ind. Eng. Chem. Fundam. 15 (1976) 59; Robinson & Peng, GPA RR-28 (1978)",
  eps: 1 - Math.SQRT2,
  sig: 1 + Math.SQRT2,
  ...criticalConstants(1 - Math.SQRT2, 1 + Math.SQRT2),
  alpha: (Tr, omega) => soaveAlpha(Tr, prKappa(omega)),
  dAlphaDTr: (Tr, omega) => soaveAlphaDTr(Tr, prKappa(omega)),
};

/** Peng-Robinson model of a fluid (pure or mixture with one-fluid mixing and k_ij). */
export const pr = (fluid: Fluid): CubicModel => cubicModel(PR, fluid);
