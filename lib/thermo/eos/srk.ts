/**
 * Soave-Redlich-Kwong equation of state (G. Soave, Chem. Eng. Sci. 27, 1197-1203, 1972): the RK form
 * (eps = 0, sig = 1, OmegaA = 0.42748, OmegaB = 0.08664, Zc = 1/3) with
 * alpha = [1 + m (1 - Tr^0.5)]^2, m = 0.480 + 1.574 omega - 0.176 omega^2.
 * m was fitted so that alpha reproduces the acentric-factor vapour pressure at Tr = 0.7; vapour
 * pressures of non-polar fluids within a few %, liquid volumes 10-20 % high.
 */
import { criticalConstants } from "./criticalConstants.js";
import { cubicModel, type CubicModel, type CubicParameters } from "./cubic.js";
import { soaveAlpha, soaveAlphaDTr } from "./soaveAlpha.js";
import type { Fluid } from "./types.js";

/** Soave's slope m(omega), Chem. Eng. Sci. 27 (1972) 1197. */
export const srkSlope = (omega: number): number => 0.48 + 1.574 * omega - 0.176 * omega * omega;

export const SRK: CubicParameters = {
  id: "srk",
  label: "Soave-Redlich-Kwong (1972)",
  source: "G. Soave, Chem. Eng. Sci. 27 (1972) 1197",
  eps: 0,
  sig: 1,
  ...criticalConstants(0, 1),
  alpha: (Tr, omega) => soaveAlpha(Tr, srkSlope(omega)),
  dAlphaDTr: (Tr, omega) => soaveAlphaDTr(Tr, srkSlope(omega)),
};

/** Soave-Redlich-Kwong model of a fluid (pure or mixture with one-fluid mixing and k_ij). */
export const srk = (fluid: Fluid): CubicModel => cubicModel(SRK, fluid);
