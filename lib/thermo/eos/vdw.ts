/**
 * van der Waals equation of state (J. D. van der Waals, "Over de continuiteit van den gas- en
 * vloeistoftoestand", thesis, Leiden, 1873): P = RT/(V - b) - a/V^2, alpha = 1 (a independent of T).
 * In the generic cubic form eps = sig = 0; OmegaA = 27/64, OmegaB = 1/8, Zc = 3/8 from the critical
 * conditions. Qualitative only: liquid volumes and vapour pressures are poor (Zc 0.375 vs ~0.27 real).
 */
import { criticalConstants } from "./criticalConstants.js";
import { cubicModel, type CubicModel, type CubicParameters } from "./cubic.js";
import type { Fluid } from "./types.js";

export const VDW: CubicParameters = {
  id: "vdw",
  label: "van der Waals (1873)",
  source: "J. D. van der Waals, thesis, Leiden (1873); generic cubic form: Smith, Van Ness & Abbott, 7th ed., Table 3.1",
  eps: 0,
  sig: 0,
  ...criticalConstants(0, 0),
  alpha: () => 1,
  dAlphaDTr: () => 0,
};

/** van der Waals model of a fluid (pure or mixture with one-fluid mixing and k_ij). */
export const vdw = (fluid: Fluid): CubicModel => cubicModel(VDW, fluid);
