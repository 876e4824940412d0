/**
 * Vapour-liquid saturation of a pure fluid by equal fugacity of the liquid and vapour volume roots.
 *
 * psat(model, T): Newton on ln P for f(ln P) = ln phi_L - ln phi_V, whose slope is Z_L - Z_V
 * (d ln phi/d ln P = Z - 1), safeguarded by a bracket: f > 0 (or only a vapour root) means P < Psat,
 * f < 0 (or only a liquid root) means P > Psat; a step leaving the bracket is replaced by its geometric
 * midpoint. Start: Wilson's correlation (wilson.ts). Converged when |f| < 1e-12 (fugacities equal to
 * ~1e-12 relative). tsat(model, P): Newton on T with the Clausius-Clapeyron slope
 * d ln Psat/dT = dH_vap/(R T^2 (Z_V - Z_L)), kept below Tc.
 * Valid: pure fluids, 0 < T < Tc (0 < P < Pc). Errors name the argument and the valid range.
 * Units: K, Pa, m^3/mol, J/mol.
 */
import { R } from "../constants.js";
import { ThermoError, requirePositive } from "../errors.js";
import { kelvin, pressureText } from "../format.js";
import { pseudoCritical, splitVolume } from "../eos/phase.js";
import type { EosModel, Residual } from "../eos/types.js";
import { wilsonPsat, wilsonTsat } from "./wilson.js";

export interface Saturation {
  T: number;
  P: number;
  /** Saturated liquid and vapour molar volumes, m^3/mol. */
  VL: number;
  VV: number;
  liquid: Residual;
  vapor: Residual;
  /** Enthalpy of vaporisation H^R_V - H^R_L, J/mol. */
  Hvap: number;
  iterations: number;
}

export interface SaturationOptions {
  shouldStop?: () => boolean;
}

function pure(model: EosModel): { Tc: number; Pc: number; Vc: number; omega: number } {
  if (model.fluid.components.length !== 1) {
    throw new ThermoError("model", `saturation by equal fugacity is for pure fluids; ${model.label} has ${model.fluid.components.length} components`);
  }
  return { ...pseudoCritical(model), Vc: splitVolume(model), omega: model.fluid.components[0]!.omega };
}

/**
 * Models with a single volume root everywhere (ideal gas, truncated virial) describe no liquid, so
 * vapour-liquid equilibrium does not exist in them: say so instead of "no convergence".
 */
function requireLiquidRoot(model: EosModel): void {
  if (model.id === "idealgas" || model.id === "virial") {
    throw new ThermoError(
      "model",
      `${model.label} has no liquid root, so it has no vapour-liquid equilibrium (no saturation pressure or temperature); use a model with a liquid: pr, srk, rk, vdw or lk`,
    );
  }
}

/** Saturation pressure (and saturated phases) at T. */
export function psat(model: EosModel, T: number, options: SaturationOptions = {}): Saturation {
  requirePositive("T", T, "K");
  const c = pure(model);
  if (T >= c.Tc) {
    throw new ThermoError("T", `psat: T = ${kelvin(T)} is not below the critical temperature ${kelvin(c.Tc)}; valid: 0 < T < ${kelvin(c.Tc)}`);
  }
  requireLiquidRoot(model);
  let lo = 0;
  let hi = c.Pc;
  let lnP = Math.log(Math.min(wilsonPsat(c, T), 0.999 * c.Pc));
  for (let k = 1; k <= 200; k++) {
    if (options.shouldStop?.()) throw new ThermoError("T", "psat: stopped on request");
    const P = Math.exp(lnP);
    const roots = model.volumes(T, P);
    let next: number;
    if (roots.length >= 2) {
      const VL = roots[0]!;
      const VV = roots[roots.length - 1]!;
      const liquid = model.residual(T, P, VL);
      const vapor = model.residual(T, P, VV);
      const f = liquid.lnphi - vapor.lnphi;
      if (Math.abs(f) < 1e-12) {
        return { T, P, VL, VV, liquid, vapor, Hvap: vapor.HR - liquid.HR, iterations: k };
      }
      if (f > 0) lo = P;
      else hi = P;
      next = lnP - f / (liquid.Z - vapor.Z);
    } else {
      // One root: liquid-like above the vapour spinodal (P too high), vapour-like below the liquid one.
      if (roots[0]! < c.Vc) hi = P;
      else lo = P;
      next = Number.NaN;
    }
    const inside = (v: number) => Number.isFinite(v) && v > (lo > 0 ? Math.log(lo) : -Infinity) && v < Math.log(hi);
    if (!inside(next)) next = lo > 0 ? 0.5 * (Math.log(lo) + Math.log(hi)) : lnP - 1;
    lnP = next;
  }
  throw new ThermoError("T", `psat: no convergence at T = ${kelvin(T)} (Tc = ${kelvin(c.Tc)}) for ${model.label}`);
}

/** Saturation temperature (and saturated phases) at P. */
export function tsat(model: EosModel, P: number, options: SaturationOptions = {}): Saturation {
  requirePositive("P", P, "Pa");
  const c = pure(model);
  if (P >= c.Pc) {
    throw new ThermoError("P", `tsat: P = ${pressureText(P)} is not below the critical pressure ${pressureText(c.Pc)}; valid: 0 < P < ${pressureText(c.Pc)}`);
  }
  requireLiquidRoot(model);
  const lnTarget = Math.log(P);
  let T = Math.min(wilsonTsat(c, P), c.Tc * 0.999);
  let lo = 0;
  let hi = c.Tc;
  for (let k = 1; k <= 100; k++) {
    const s = psat(model, T, options);
    const g = Math.log(s.P) - lnTarget;
    if (Math.abs(g) < 1e-11) return { ...s, P, iterations: k };
    if (g > 0) hi = T;
    else lo = T;
    const slope = s.Hvap / (R * T * T * (s.vapor.Z - s.liquid.Z));
    let next = T - g / slope;
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    T = next;
  }
  throw new ThermoError("P", `tsat: no convergence at P = ${pressureText(P)} (Pc = ${pressureText(c.Pc)}) for ${model.label}`);
}
