/**
 * Thermodynamic states in plain SI numbers (K, Pa, m^3/mol, J/mol, J/(mol K)).
 *
 * state(model, T, P, {phase, idealGas}): the chosen volume root (eos/phase.ts rules), Z, flags and
 * residual properties; with `idealGas` (ideal-gas enthalpy H(T) and entropy S(T, P) against a stated
 * reference, injected so this file does not depend on a Cp databank) also the totals
 *   H = H_ig(T) + H^R, S = S_ig(T, P) + S^R, U = H - PV, G = H - TS, A = U - TS.
 * stateFrom(model, spec): any two of T, P, V, H, S, U. With T or P or V fixed, the other unknown is
 * found by Brent's method (lib/numerics brent) on a property that is continuous along the path; for a
 * pure fluid below Tc the saturated states are computed first, and a target between the saturated
 * liquid and vapour values gives a two-phase state with vapour fraction x (lever rule). Pairs without
 * T, P or V (H-S, H-U, S-U) nest two Brent searches (P outside, T inside).
 * change(s1, s2): differences of every property present in both states.
 */
import { brent } from "../numerics/index.js";
import { ThermoError, requirePositive } from "./errors.js";
import { checkPhase, pseudoCritical, selectRoot, type PhaseLabel, type PhaseRequest, type StateFlags } from "./eos/phase.js";
import type { EosModel, Residual } from "./eos/types.js";
import { psat, tsat, type Saturation } from "./equilibrium/saturation.js";

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

/** Two-phase state at saturation with vapour fraction x. */
function twoPhase(model: EosModel, s: Saturation, x: number, ig?: IdealGasFunctions): ThermoState {
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
type Prop = "V" | "H" | "S" | "U";
const KEYS = ["T", "P", "V", "H", "S", "U"] as const;

function get(s: ThermoState, k: Prop): number {
  const v = s[k];
  if (v === undefined) throw new ThermoError("idealGas", `${k} needs ideal-gas totals: pass idealGas {H(T), S(T, P), reference}`);
  return v;
}

function solve(f: (v: number) => number, lo: number, hi: number, what: string): number {
  try {
    // Grow the bracket from lo in doubling steps: far ends (thousands of kelvin) can lie where an
    // ideal-gas Cp polynomial has turned negative, so H(T) there is meaningless; take the first sign change.
    const f0 = f(lo);
    let a = lo;
    for (let step = (hi - lo) / 1024; a < hi && f0 !== 0; step *= 2) {
      const b = Math.min(hi, a + step);
      if (Math.sign(f(b)) !== Math.sign(f0)) return brent(f, a, b, { xtol: 1e-12 * Math.abs(hi), rtol: 1e-13 }).value;
      a = b;
    }
    return brent(f, lo, hi, { xtol: 1e-12 * Math.abs(hi), rtol: 1e-13 }).value;
  } catch (e) {
    throw new ThermoError(what, `no state found with ${what} in [${lo}, ${hi}]: ${(e as Error).message}`);
  }
}

/** The state fixed by any two of T, P, V, H, S, U (SI). Two-phase states for pure fluids below Tc. */
export function stateFrom(model: EosModel, spec: Spec, options: { idealGas?: IdealGasFunctions } = {}): ThermoState {
  const given = KEYS.filter((k) => spec[k] !== undefined);
  if (given.length !== 2) {
    throw new ThermoError("spec", `give exactly two of T, P, V, H, S, U; got ${given.length ? given.join(", ") : "none"}`);
  }
  for (const k of given) if (k !== "H" && k !== "S" && k !== "U") requirePositive(k, spec[k]!, k === "T" ? "K" : k === "P" ? "Pa" : "m^3/mol");
  const ig = options.idealGas;
  const crit = pseudoCritical(model);
  const isPure = model.fluid.components.length === 1;
  const [k1, k2] = given as [(typeof KEYS)[number], (typeof KEYS)[number]];
  if (k1 === "T" && k2 === "P") return state(model, spec.T!, spec.P!, { idealGas: ig });
  const Tmin = 0.2 * crit.Tc;
  const Tmax = Math.max(20 * crit.Tc, 3000);
  const lnPmin = Math.log(1);
  const lnPmax = Math.log(1e10);

  // Along a path, the saturated pair (if any) and the single-phase property as a function of the unknown.
  const onSat = (s: Saturation, prop: Prop, target: number): ThermoState | undefined => {
    const L = twoPhase(model, s, 0, ig);
    const Vp = twoPhase(model, s, 1, ig);
    const a = get(L, prop);
    const b = get(Vp, prop);
    if ((target - a) * (target - b) > 0) return undefined;
    return twoPhase(model, s, (target - a) / (b - a), ig);
  };

  if (k1 === "T" || k1 === "P") {
    const fixed = k1;
    const prop = k2 as Prop;
    const target = spec[prop]!;
    const fixedValue = spec[fixed]!;
    const sub = isPure && (fixed === "T" ? fixedValue < crit.Tc : fixedValue < crit.Pc);
    const at = (u: number, phase?: PhaseRequest) =>
      fixed === "T" ? state(model, fixedValue, Math.exp(u), { phase, idealGas: ig }) : state(model, u, fixedValue, { phase, idealGas: ig });
    let lo = fixed === "T" ? lnPmin : Tmin;
    let hi = fixed === "T" ? lnPmax : Tmax;
    let phase: PhaseRequest | undefined;
    if (sub) {
      const s = fixed === "T" ? psat(model, fixedValue) : tsat(model, fixedValue);
      const two = onSat(s, prop, target);
      if (two) return two;
      const vapValue = get(twoPhase(model, s, 1, ig), prop);
      const liqValue = get(twoPhase(model, s, 0, ig), prop);
      const vaporSide = Math.abs(target - vapValue) < Math.abs(target - liqValue);
      const u = fixed === "T" ? Math.log(s.P) : s.T;
      // At fixed T the vapour lies at lower P; at fixed P at higher T.
      if ((fixed === "T") === vaporSide) hi = u;
      else lo = u;
      phase = vaporSide ? "vapor" : "liquid";
    }
    const u = solve((v) => get(at(v, phase), prop) - target, lo, hi, prop);
    return at(u, phase);
  }

  if (k1 === "V") {
    const V = spec.V!;
    const prop = k2 as Exclude<Prop, "V">;
    const pressure = model.pressure?.bind(model);
    if (!pressure) throw new ThermoError("model", `${model.label} has no pressure(T, V); give T or P instead of V`);
    // Continuous in T at fixed V: two-phase inside the dome, one phase outside.
    const atT = (T: number): ThermoState => {
      if (isPure && T < crit.Tc) {
        const s = psat(model, T);
        if (V > s.VL && V < s.VV) return twoPhase(model, s, (V - s.VL) / (s.VV - s.VL), ig);
      }
      const P = pressure(T, V);
      if (!(P > 0)) throw new ThermoError("V", `P(T = ${T} K, V = ${V}) = ${P} Pa is not positive`);
      const roots = model.volumes(T, P);
      const liquidRoot = roots.length > 1 && Math.abs(roots[0]! - V) < Math.abs(roots[roots.length - 1]! - V);
      return state(model, T, P, { phase: roots.length > 1 ? (liquidRoot ? "liquid" : "vapor") : "stable", idealGas: ig });
    };
    const T = solve((t) => get(atT(t), prop) - spec[prop]!, Tmin, Tmax, prop);
    return atT(T);
  }

  // Neither T, P nor V: outer search on ln P, inner on T.
  const inner = k1 as Prop;
  const outer = k2 as Prop;
  const u = solve((v) => get(stateFrom(model, { P: Math.exp(v), [inner]: spec[inner] }, options), outer) - spec[outer]!, Math.log(10), Math.log(1e9), outer);
  return stateFrom(model, { P: Math.exp(u), [inner]: spec[inner] }, options);
}

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
