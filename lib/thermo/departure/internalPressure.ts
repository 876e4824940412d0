/**
 * internalPressure(model, T, V) = (dU/dV)_T = T (dP/dT)_V - P, in Pa, from P(T, V) alone with a
 * numerical (Richardson-extrapolated central-difference) temperature derivative. Zero for an ideal gas;
 * a/V^2 for van der Waals. The ideal part RT/V is subtracted before differentiating, so the result keeps
 * its relative accuracy (~1e-10) even at low density where it is tiny beside P.
 */
import { derivative } from "../../numerics/index.js";
import { R } from "../constants.js";
import { requirePositive } from "../errors.js";
import type { EosModel } from "../eos/types.js";
import { requirePressure } from "./maxwell.js";

export function internalPressure(model: EosModel, T: number, V: number): number {
  requirePositive("T", T, "K");
  requirePositive("V", V, "m^3/mol");
  const pressure = requirePressure(model);
  const Pr = (t: number) => pressure(t, V) - (R * t) / V;
  // T dP/dT - P = T dPr/dT - Pr (the ideal parts cancel exactly).
  return T * derivative(Pr, T).value - Pr(T);
}
