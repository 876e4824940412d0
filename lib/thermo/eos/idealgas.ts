/**
 * Ideal-gas model: PV = RT. Every residual property is zero, Z = 1, ln phi = 0 for every component.
 * Exact in the limit P -> 0; a fair approximation when Z stays within ~1 % of 1 (common practice).
 */
import { R } from "../constants.js";
import { requirePositive } from "../errors.js";
import { validateFluid } from "./fluid.js";
import type { EosModel, Fluid, Residual } from "./types.js";

export function idealGas(fluid: Fluid): EosModel {
  validateFluid(fluid);
  return {
    id: "idealgas",
    label: "ideal gas",
    source: "ideal-gas law PV = RT (Clapeyron 1834)",
    fluid,
    pressure: (T, V) => (R * T) / V,
    volumes(T, P) {
      requirePositive("T", T, "K");
      requirePositive("P", P, "Pa");
      return [(R * T) / P];
    },
    residual(T, P, V): Residual {
      requirePositive("T", T, "K");
      requirePositive("P", P, "Pa");
      requirePositive("V", V, "m^3/mol");
      return { Z: 1, HR: 0, SR: 0, UR: 0, GR: 0, AR: 0, lnphi: 0, lnphiComponents: fluid.x.map(() => 0) };
    },
  };
}
