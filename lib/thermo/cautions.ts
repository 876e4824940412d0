/**
 * Cautions and range errors that no equation of state can give about itself, one documented rule each,
 * shared by every route to a state (state, departure, volume, zfactor, psat, tsat):
 *
 * 1. Triple point (pure fluids with a known Tt, substances/triplePoints.ts). Below Tt the stable
 *    condensed phase is a solid. A liquid root there gets the caution BELOW_TRIPLE; psat below Tt and
 *    tsat below Pt (or giving T < Tt) are errors, since the vapour there is in equilibrium with a solid.
 * 2. No triple-point data (user pseudo-components, mixtures, the few records without one): a liquid root
 *    at T < 0.5 Tc gets a caution. Rule of thumb (common practice): for most fluids Tt/Tc lies between
 *    0.25 and 0.7 (methane 0.48, CO2 0.71, water 0.42), so a liquid below 0.5 Tc may well be a solid.
 * 3. Pressure far beyond the model's meaning: P > 10 Pc (pseudo-critical for mixtures). Cubic and
 *    corresponding-states models are fitted to vapour pressures and densities up to a few Pc; at 10 Pc
 *    their dense branch is pure extrapolation (methane at 1e6 bar gives Z ~ 1000). Common practice.
 * Temperatures beyond the ideal-gas Cp fit are flagged by idealGas/cp.ts (cpRangeClass).
 * SI inputs (K, Pa); texts use readable units (format.ts).
 */
import { ThermoError } from "./errors.js";
import { kelvin, pressureText } from "./format.js";
import { pseudoCritical } from "./eos/phase.js";
import type { EosModel } from "./eos/types.js";

/** Factor on the (pseudo-)critical pressure above which rule 3 applies. */
export const FAR_PRESSURE_FACTOR = 10;
/** Fraction of Tc below which rule 2 applies to a liquid root. */
export const NO_TRIPLE_TR = 0.5;

export interface TripleInfo {
  name: string;
  Tt: number;
  Pt?: number;
}

/** The triple point of a pure fluid's component when known; undefined for mixtures and unknown data. */
export function triplePointOf(model: EosModel): TripleInfo | undefined {
  const comps = model.fluid.components;
  if (comps.length !== 1) return undefined;
  const c = comps[0]!;
  if (typeof c.Tt !== "number" || !(c.Tt > 0)) return undefined;
  return { name: c.name, Tt: c.Tt, ...(typeof c.Pt === "number" ? { Pt: c.Pt } : {}) };
}

function tripleText(t: TripleInfo): string {
  return `Tt = ${kelvin(t.Tt)}${t.Pt !== undefined ? `, Pt = ${pressureText(t.Pt)}` : ""}`;
}

/** Caution text of rule 1 for a fluid's triple point. */
export function belowTripleText(t: TripleInfo): string {
  return `below the triple point of ${t.name} (${tripleText(t)}): the stable phase is solid; the equation-of-state liquid is an extrapolation`;
}

/** psat(T) for T below the triple point: an error naming T and the triple point (rule 1). */
export function requireSaturationT(model: EosModel, T: number): void {
  const t = triplePointOf(model);
  if (t && T < t.Tt) {
    throw new ThermoError(
      "T",
      `T = ${kelvin(T)} is below the triple point of ${t.name} (${tripleText(t)}): there the vapour is in equilibrium with the solid, and no liquid vapour pressure exists; valid: ${kelvin(t.Tt)} <= T < Tc`,
    );
  }
}

/** tsat(P) below the triple-point pressure (or when the found T lies below Tt): an error naming P (rule 1). */
export function requireSaturationP(model: EosModel, P: number, Tfound?: number): void {
  const t = triplePointOf(model);
  if (!t) return;
  const belowP = t.Pt !== undefined && P < t.Pt;
  const belowT = Tfound !== undefined && Tfound < t.Tt;
  if (belowP || belowT) {
    const valid = t.Pt !== undefined ? `valid: ${pressureText(t.Pt)} <= P < Pc` : `valid: pressures whose saturation temperature is at least ${kelvin(t.Tt)}`;
    throw new ThermoError(
      "P",
      `P = ${pressureText(P)} is below the triple point of ${t.name} (${tripleText(t)})${belowT ? `: the equation of state would put saturation at ${kelvin(Tfound!)}` : ""}; there the vapour is in equilibrium with the solid (it sublimes), so no boiling temperature exists; ${valid}`,
    );
  }
}

const NONE: readonly string[] = Object.freeze([]);

/**
 * The rules 1-3 for one model, constants computed once: (T, P, phase) -> cautions (a shared empty array
 * when none applies, so a 10,000-point span allocates nothing). `phase` is the state's label ("liquid",
 * "vapor", "gas", "supercritical" or "two-phase"; a two-phase state contains liquid).
 */
export function cautionsFor(model: EosModel): (T: number, P: number, phase: string) => readonly string[] {
  const crit = pseudoCritical(model);
  const t = triplePointOf(model);
  const below = t ? belowTripleText(t) : "";
  const noTriple = `liquid root at T < 0.5 Tc (Tc = ${kelvin(crit.Tc)}) and no triple-point data for this fluid: it may be solid here, and the equation-of-state liquid is then an extrapolation`;
  const Pfar = FAR_PRESSURE_FACTOR * crit.Pc;
  return (T, P, phase) => {
    const liquid = phase === "liquid" || phase === "two-phase";
    const cold = liquid && (t ? T < t.Tt : T < NO_TRIPLE_TR * crit.Tc);
    const high = P > Pfar;
    if (!cold && !high) return NONE;
    const out: string[] = [];
    if (cold) out.push(t ? below : noTriple);
    if (high) out.push(`P = ${pressureText(P)} is more than 10 Pc (Pc = ${pressureText(crit.Pc)}): far outside the range where this model is meaningful`);
    return out;
  };
}

/** Rules 1-3 at one state (see cautionsFor). */
export function stateCautions(model: EosModel, T: number, P: number, phase: string): readonly string[] {
  return cautionsFor(model)(T, P, phase);
}
