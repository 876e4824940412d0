/**
 * Thermodynamic states in plain SI numbers (K, Pa, m^3/mol, J/mol, J/(mol K)).
 *
 * state(model, T, P, {phase, idealGas}): the chosen volume root (eos/phase.ts rules), Z, flags and
 * residual properties; with `idealGas` (ideal-gas enthalpy H(T) and entropy S(T, P) against a stated
 * reference, injected so this file does not depend on a Cp databank) also the totals
 *   H = H_ig(T) + H^R, S = S_ig(T, P) + S^R, U = H - PV, G = H - TS, A = U - TS.
 * twoPhase(model, saturation, x): the lever-rule state between saturated liquid and vapour.
 * Two-property specifications (stateFrom) live in spec/stateFrom.ts.
 * change(s1, s2): differences of every property present in both states.
 * Many (T, P) states of a pure fluid by a cubic model at once, into typed columns with the same
 * answers: stateColumns.ts (the fast path of vectorised state() calls).
 */
import { ThermoError } from "./errors.js";
import { checkPhase, pseudoCritical, selectRoot, type PhaseLabel, type PhaseRequest, type StateFlags } from "./eos/phase.js";
import type { EosModel, Residual } from "./eos/types.js";
import type { Saturation } from "./equilibrium/saturation.js";

/** Ideal-gas totals against a reference state, J/mol and J/(mol K). */
export interface IdealGasFunctions {
  H(T: number): number;
  S(T: number, P: number): number;
  /** e.g. "ideal gas at 298.15 K and 1 bar: H = 0, S = 0". */
  reference: string;
}

export interface StateOptions {
  phase?: PhaseRequest;
  idealGas?: IdealGasFunctions;
}

export interface ThermoState extends Residual {
  model: string;
  T: number;
  P: number;
  V: number;
  phase: PhaseLabel | "two-phase";
  flags: StateFlags;
  /** Vapour fraction of a two-phase state (0..1); absent for one phase. */
  x?: number;
  H?: number;
  S?: number;
  U?: number;
  G?: number;
  A?: number;
  reference?: string;
}

function totals(T: number, P: number, V: number, r: Residual, ig?: IdealGasFunctions) {
  if (!ig) return {};
  const H = ig.H(T) + r.HR;
  const S = ig.S(T, P) + r.SR;
  const U = H - P * V;
  return { H, S, U, G: H - T * S, A: U - T * S, reference: ig.reference };
}

/** The state at T (K) and P (Pa) on the requested or stable root. */
export function state(model: EosModel, T: number, P: number, options: StateOptions = {}): ThermoState {
  const c = selectRoot(model, T, P, checkPhase(options.phase));
  const r = c.residual;
  return { model: model.label, T, P, V: c.V, phase: c.phase, flags: c.flags, ...r, ...totals(T, P, c.V, r, options.idealGas) };
}

/** Two-phase state at saturation with vapour fraction x (lever rule on every molar property). */
export function twoPhase(model: EosModel, s: Saturation, x: number, ig?: IdealGasFunctions): ThermoState {
  const mixR = (k: "Z" | "HR" | "SR" | "UR" | "GR" | "AR" | "lnphi") => (1 - x) * s.liquid[k] + x * s.vapor[k];
  const r: Residual = {
    Z: mixR("Z"), HR: mixR("HR"), SR: mixR("SR"), UR: mixR("UR"), GR: mixR("GR"), AR: mixR("AR"),
    lnphi: mixR("lnphi"), lnphiComponents: [mixR("lnphi")],
  };
  const V = (1 - x) * s.VL + x * s.VV;
  const flags: StateFlags = { supercritical: false, nearCritical: false, metastable: false, twoPhase: true, multipleRoots: true, mixtureSinglePhase: false };
  const crit = pseudoCritical(model);
  flags.nearCritical = Math.abs(s.T / crit.Tc - 1) < 0.03 && Math.abs(s.P / crit.Pc - 1) < 0.1;
  return { model: model.label, T: s.T, P: s.P, V, phase: "two-phase", flags, x, ...r, ...totals(s.T, s.P, V, r, ig) };
}

export type Spec = Partial<Record<"T" | "P" | "V" | "H" | "S" | "U", number>>;

export interface StateChange {
  dT: number;
  dP: number;
  dV: number;
  dHR: number;
  dSR: number;
  dH?: number;
  dS?: number;
  dU?: number;
  dG?: number;
  dA?: number;
}

/** s2 minus s1 for every property present in both (totals only when both carry the same reference). */
export function change(s1: ThermoState, s2: ThermoState): StateChange {
  const out: StateChange = { dT: s2.T - s1.T, dP: s2.P - s1.P, dV: s2.V - s1.V, dHR: s2.HR - s1.HR, dSR: s2.SR - s1.SR };
  if (s1.reference !== undefined && s1.reference === s2.reference) {
    for (const k of ["H", "S", "U", "G", "A"] as const) {
      out[`d${k}`] = s2[k]! - s1[k]!;
    }
  } else if (s1.reference !== s2.reference) {
    throw new ThermoError("s2", `states have different ideal-gas references: "${s1.reference}" vs "${s2.reference}"`);
  }
  return out;
}
