/**
 * stateAtTV(model, T, V, {idealGas, psatCache}): the state fixed by temperature and molar volume, for
 * pressure-explicit models (every model with pressure(T, V); not Lee-Kesler).
 *
 * Why (T, V): the pair fixes one state without any root choice, and every property used by the
 * two-property solver (H, S, U, and P itself) is continuous in V at fixed T and in T at fixed V, across
 * the two-phase dome included. For a pure fluid below Tc the saturated volumes VL, VV come first
 * (equal fugacity, equilibrium/saturation.ts); VL < V < VV gives a two-phase state with vapour fraction
 * x = (V - VL)/(VV - VL) (lever rule). Outside the dome P = P(T, V) and the residual properties are the
 * model's closed forms at exactly that V (even when it is a metastable or mechanically unstable root,
 * which is flagged: possible only for mixtures, which get no phase-split test).
 * Units: K, m^3/mol, Pa, J/mol, J/(mol K). Errors: ThermoError naming V when P(T, V) <= 0 or the model
 * cannot evaluate V (e.g. V <= b of a cubic).
 */
import { ThermoError, requirePositive } from "../errors.js";
import { kelvin, pressureText, volumeText } from "../format.js";
import { pseudoCritical, selectRoot, splitVolume, type PhaseLabel } from "../eos/phase.js";
import type { EosModel } from "../eos/types.js";
import { psat, type Saturation } from "../equilibrium/saturation.js";
import { state, twoPhase, type IdealGasFunctions, type ThermoState } from "../state.js";

export interface TVOptions {
  idealGas?: IdealGasFunctions;
  /** Saturation results by temperature, shared by the many calls of one solve (psat is the costly part). */
  psatCache?: Map<number, Saturation>;
}

/** Saturation at T for a pure fluid below Tc, through the cache. */
export function cachedPsat(model: EosModel, T: number, cache?: Map<number, Saturation>): Saturation {
  const hit = cache?.get(T);
  if (hit) return hit;
  const s = psat(model, T);
  if (cache) {
    // Bounded: a solve visits a few hundred temperatures at most; drop the oldest beyond that.
    if (cache.size > 512) cache.delete(cache.keys().next().value!);
    cache.set(T, s);
  }
  return s;
}

/** The state at T (K) and V (m^3/mol); two-phase (with x) inside a pure fluid's saturation dome. */
export function stateAtTV(model: EosModel, T: number, V: number, options: TVOptions = {}): ThermoState {
  requirePositive("T", T, "K");
  requirePositive("V", V, "m^3/mol");
  const pressure = model.pressure?.bind(model);
  if (!pressure) throw new ThermoError("model", `${model.label} has no pressure(T, V): give T or P instead of V`);
  const ig = options.idealGas;
  const crit = pseudoCritical(model);
  if (model.fluid.components.length === 1 && T < crit.Tc) {
    const s = cachedPsat(model, T, options.psatCache);
    if (V >= s.VL && V <= s.VV) return twoPhase(model, s, (V - s.VL) / (s.VV - s.VL), ig);
  }
  const P = pressure(T, V);
  if (!(P > 0) || !Number.isFinite(P)) {
    throw new ThermoError("V", `${model.label}: P(T = ${kelvin(T)}, V = ${volumeText(V)}) = ${pressureText(P)}; a state needs P > 0`);
  }
  const s = state(model, T, P, { idealGas: ig });
  if (Math.abs(s.V - V) <= 1e-9 * V) return s;
  // V is another root at (T, P) than the stable one: evaluate the model at exactly V.
  const choice = selectRoot(model, T, P, "stable");
  const near = choice.roots.reduce((a, r) => (Math.abs(r - V) < Math.abs(a - V) ? r : a), choice.roots[0]!);
  const Vr = Math.abs(near - V) <= 1e-6 * V ? near : V;
  const r = model.residual(T, P, Vr);
  let phase: PhaseLabel;
  if (T >= crit.Tc) phase = P > crit.Pc ? "supercritical" : "gas";
  else phase = Vr < splitVolume(model) ? "liquid" : "vapor";
  const at = state(model, T, P, { idealGas: ig });
  const H = ig ? ig.H(T) + r.HR : undefined;
  const S = ig ? ig.S(T, P) + r.SR : undefined;
  const totals =
    H !== undefined && S !== undefined
      ? { H, S, U: H - P * Vr, G: H - T * S, A: H - P * Vr - T * S, reference: ig!.reference }
      : {};
  return { ...at, V: Vr, phase, flags: { ...at.flags, metastable: true }, ...r, ...totals };
}
