/**
 * Inner solves of the two-property state solver: the temperature at which one property (V, H, S or U)
 * reaches its target along a fixed molar volume (pressure-explicit models) or a fixed pressure (any
 * model), or the side on which the fixed value lies when no temperature in [Tmin, Tmax] reaches it.
 *
 * Method: Brent's method on T (lib/numerics brent, x tolerance 1e-12 T). Every one of V, H, S, U
 * increases with T at fixed V and at fixed P in a stable one-phase state (Cv > 0, Cp > 0, thermal
 * expansion > 0 for the cubic family), and through the two-phase region the lever-rule values are
 * continuous, so a sign change of prop(T) - target is a unique root.
 * Side: S, U increase with V at fixed T ((dS/dV)_T = (dP/dT)_V > 0; (dU/dV)_T = T (dP/dT)_V - P > 0
 * for models whose attraction weakens with T) and S, V, U decrease with P; so when even Tmin gives too
 * much of the property the fixed V is too large (P too small), and when even Tmax gives too little
 * the fixed V is too small (P too large). The outer search (stateFrom.ts) uses this to confine itself
 * to where a root exists. States the model cannot evaluate (P(T, V) <= 0, no volume root) are cut off
 * by bisection on validity, assuming the valid temperatures form one interval.
 * Units: K, Pa, m^3/mol, J/mol, J/(mol K).
 */
import { brent } from "../../numerics/index.js";
import { ThermoError } from "../errors.js";
import type { EosModel } from "../eos/types.js";
import { tsat, type Saturation } from "../equilibrium/saturation.js";
import { state, twoPhase, type IdealGasFunctions, type ThermoState } from "../state.js";
import { stateAtTV } from "./tvState.js";
import type { PhaseRequest } from "../eos/phase.js";

export type Prop = "V" | "H" | "S" | "U";
/** -1: the fixed V or P is too small for the target; +1: too large; 0: solved. */
export type Side = -1 | 0 | 1;

export interface Inner {
  side: Side;
  state?: ThermoState;
}

export interface SolveContext {
  model: EosModel;
  idealGas?: IdealGasFunctions;
  Tmin: number;
  Tmax: number;
  Tc: number;
  Pc: number;
  pure: boolean;
  psatCache: Map<number, Saturation>;
}

/** A property of a state; H, S, U need ideal-gas totals. */
export function prop(s: ThermoState, k: Prop): number {
  const v = s[k];
  if (v === undefined) throw new ThermoError("idealGas", `${k} needs ideal-gas totals: pass idealGas {H(T), S(T, P), reference}`);
  return v;
}

/** Tolerance for accepting a solved property: 1e-7 relative, with R T (energies) or R (entropy) as floor. */
export function accepts(k: Prop | "T" | "P", got: number, target: number, T: number): boolean {
  const floor = k === "H" || k === "U" ? 8.314 * T : k === "S" ? 8.314 : 0;
  return Math.abs(got - target) <= 1e-7 * Math.max(Math.abs(target), floor);
}

function tryEval<T>(f: () => T): T | undefined {
  try {
    return f();
  } catch (e) {
    if (e instanceof ThermoError) return undefined;
    throw e;
  }
}

/** The valid sub-interval [a, b] of [lo, hi] for `ok`, assuming validity holds on one interval. */
export function validInterval(ok: (t: number) => boolean, lo: number, hi: number): [number, number] | undefined {
  const okLo = ok(lo);
  const okHi = ok(hi);
  if (okLo && okHi) return [lo, hi];
  let inside: number | undefined;
  for (let i = 1; i < 24 && inside === undefined; i++) {
    const t = lo * (hi / lo) ** (i / 24);
    if (ok(t)) inside = t;
  }
  if (inside === undefined) return undefined;
  const edge = (bad: number, good: number) => {
    for (let k = 0; k < 60 && Math.abs(good - bad) > 1e-13 * good; k++) {
      const mid = 0.5 * (bad + good);
      if (ok(mid)) good = mid;
      else bad = mid;
    }
    return good;
  };
  return [okLo ? lo : edge(lo, inside), okHi ? hi : edge(hi, inside)];
}

/** Brent root of an increasing f on [lo, hi] where f(lo) <= 0 <= f(hi). */
function rootT(f: (T: number) => number, lo: number, hi: number): number {
  return brent(f, lo, hi, { xtol: 1e-12 * hi, rtol: 1e-14 }).value;
}

/** T at fixed V (pressure-explicit models) with prop k = target. */
export function solveTAtV(ctx: SolveContext, V: number, k: Prop, target: number): Inner {
  const at = (T: number) => stateAtTV(ctx.model, T, V, { idealGas: ctx.idealGas, psatCache: ctx.psatCache });
  const range = validInterval((T) => tryEval(() => at(T)) !== undefined, ctx.Tmin, ctx.Tmax);
  if (!range) return { side: -1 };
  const [lo, hi] = range;
  const f = (T: number) => prop(at(T), k) - target;
  if (f(lo) > 0) return { side: 1 };
  if (f(hi) < 0) return { side: -1 };
  return { side: 0, state: at(rootT(f, lo, hi)) };
}

/** T at fixed P (any model) with prop k = target; two-phase by the lever rule for a pure fluid below Pc. */
export function solveTAtP(ctx: SolveContext, P: number, k: Prop, target: number): Inner {
  const { model, idealGas: ig } = ctx;
  let lo = ctx.Tmin;
  let hi = ctx.Tmax;
  let phase: PhaseRequest = "stable";
  if (ctx.pure && P < ctx.Pc) {
    const s = tryEval(() => tsat(model, P));
    if (s) {
      const a = prop(twoPhase(model, s, 0, ig), k);
      const b = prop(twoPhase(model, s, 1, ig), k);
      if (target >= a && target <= b) return { side: 0, state: twoPhase(model, s, b > a ? (target - a) / (b - a) : 0, ig) };
      if (target < a) {
        if (s.T <= lo) return { side: -1 };
        [hi, phase] = [s.T, "liquid"];
      } else {
        if (s.T >= hi) return { side: 1 };
        [lo, phase] = [s.T, "vapor"];
      }
    }
  }
  const at = (T: number) => state(model, T, P, { phase, idealGas: ig });
  const range = validInterval((T) => tryEval(() => at(T)) !== undefined, lo, hi);
  if (!range) return { side: 1 };
  [lo, hi] = range;
  const f = (T: number) => prop(at(T), k) - target;
  if (f(lo) > 0) return { side: -1 };
  if (f(hi) < 0) return { side: 1 };
  const s = at(rootT(f, lo, hi));
  // A mixture's stable root can jump with T (a phase change this model does not split): Brent then
  // converges on the jump, which is not a solution.
  if (!accepts(k, prop(s, k), target, s.T)) return { side: 0 };
  return { side: 0, state: s };
}
