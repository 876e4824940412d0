/**
 * stateFrom(model, spec, {idealGas}): the state fixed by any two of T, P, V, H, S, U (SI units).
 *
 * Method, by what is given (Tmin = 0.2 Tc, Tmax = max(5 Tc, 2000 K) with Kay's-rule Tc for mixtures,
 * narrowed to where the ideal-gas H(T) rises: see temperatureRange):
 * - T and P: state(model, T, P) on the stable root.
 * - P and one of V, H, S, U: Brent on T at that P (paths.ts solveTAtP); a pure fluid below Pc is first
 *   checked against its saturated liquid and vapour (tsat): a target between them is two-phase, x by
 *   the lever rule.
 * - V and one of H, S, U (pressure-explicit models): Brent on T at that V (solveTAtV), two-phase inside
 *   the saturation dome (tvState.ts).
 * - T and one of V, H, S, U: search along the isotherm in ln V (pressure-explicit models; T and V give
 *   P directly) or ln P (Lee-Kesler); a 33-point scan finds every sign change, Brent polishes it.
 * - Two of H, S, U (and V with H, S, U for Lee-Kesler): nested. Along a path variable u = ln V
 *   (pressure-explicit models, V in (b, R Tmax/1 mPa)) or u = ln P (Lee-Kesler, 1 mPa..10 GPa) the
 *   inner solve finds T from S (if given, else U, or V) and reports on which side u lies when no T
 *   in [Tmin, Tmax] reaches it. A scan over u, with bisection on the feasible edges, confines the outer
 *   Brent search on the other property to where an inner root exists: this is what lets the solver
 *   start far from the answer without failing at pressures that have no solution. Along an isentrope
 *   H and U fall monotonically as V grows (dH = V dP, dU = -P dV), so those pairs have one root.
 * - (T, H) and (H, U) can have two states (H is not monotone in P along an isotherm below the
 *   Joule-Thomson inversion temperature; PV = H - U is not monotone along an isoenergetic path): the
 *   solver returns the state of lowest density, or of highest with {branch: "dense"}. (H, U) is also
 *   ill-conditioned in dilute gas (an ideal gas's H and U both depend on T alone): expect T and P
 *   there only to about 1e-3. For the ideal-gas model T, H and U are not independent (an error).
 * Every result is checked: the two given properties are reproduced to 1e-7 relative (energies with a
 * floor of R T, entropy of R) or a ThermoError names the pair and the range searched.
 * Validity: states with Tmin <= T <= Tmax; two-phase results only for pure fluids (mixtures are one
 * phase: a jump of the stable root is reported, not solved). Accuracy: that of the model; the solver
 * adds about 1e-10 relative.
 */
import { brent } from "../../numerics/index.js";
import { ThermoError, requirePositive } from "../errors.js";
import { energyText, entropyText, kelvin, pressureText, volumeText } from "../format.js";
import { pseudoCritical } from "../eos/phase.js";
import type { EosModel } from "../eos/types.js";
import { psat } from "../equilibrium/saturation.js";
import { state, twoPhase, type IdealGasFunctions, type Spec, type ThermoState } from "../state.js";
import { accepts, prop, solveTAtP, solveTAtV, type Inner, type Prop, type SolveContext } from "./paths.js";
import { stateAtTV } from "./tvState.js";

const KEYS = ["T", "P", "V", "H", "S", "U"] as const;
type Key = (typeof KEYS)[number];
const UNITS: Record<Key, string> = { T: "K", P: "Pa", V: "m^3/mol", H: "J/mol", S: "J/(mol K)", U: "J/mol" };
const GRID = 33;

/** The spec in readable units (6 significant figures). */
function fmt(spec: Spec, keys: readonly Key[]): string {
  const text = (k: Key, v: number) =>
    k === "T" ? kelvin(v) : k === "P" ? pressureText(v) : k === "V" ? volumeText(v) : k === "S" ? entropyText(v) : energyText(v);
  return keys.map((k) => `${k} = ${text(k, spec[k]!)}`).join(" and ");
}

/** Lower edge of a path variable: just above the co-volume b for a cubic; else 5 % of R Tc/Pc. */
function pathRange(model: EosModel, path: "V" | "P", ctx: SolveContext): [number, number] {
  if (path === "P") return [Math.log(1e-3), Math.log(1e10)];
  const mix = (model as { mixture?: (T: number) => { b: number } }).mixture;
  const Vmin = mix ? mix(ctx.Tc).b * (1 + 1e-7) : (0.05 * 8.314462618 * ctx.Tc) / ctx.Pc;
  return [Math.log(Vmin), Math.log((8.314462618 * ctx.Tmax) / 1e-3)];
}

/**
 * Sign changes of g over a grid on [lo, hi] (points where g throws or is undefined are skipped),
 * polished by Brent; the root nearest `prefer` ("hi" or "lo") end. `g` returns [value, state].
 */
function scanRoot(
  g: (u: number) => [number, ThermoState] | undefined,
  lo: number,
  hi: number,
  prefer: "hi" | "lo",
  extra: number[] = [],
): ThermoState | undefined {
  const us = Array.from({ length: GRID }, (_, i) => lo + ((hi - lo) * i) / (GRID - 1)).concat(extra).sort((a, b) => a - b);
  const pts = us.map((u) => ({ u, r: safe(() => g(u)) })).filter((p) => p.r !== undefined) as { u: number; r: [number, ThermoState] }[];
  const order = prefer === "hi" ? [...pts.keys()].reverse() : [...pts.keys()];
  let tangent: [number, ThermoState] | undefined;
  for (const i of order) {
    const here = pts[i]!;
    if (here.r[0] === 0) return here.r[1];
    const j = prefer === "hi" ? i - 1 : i + 1;
    const other = pts[j];
    if (!other || here.r[0] * other.r[0] > 0) continue;
    const [a, b] = here.u < other.u ? [here.u, other.u] : [other.u, here.u];
    const found = safe(() => {
      const u = brent((v) => g(v)![0], a, b, { xtol: 1e-13 * Math.max(1, Math.abs(b)), rtol: 1e-14 }).value;
      return g(u)?.[1];
    });
    if (found) return found;
  }
  // No sign change: a root may still be a tangency (g touches zero at a minimum of |g|, as (H, U) can
  // along an isoenergetic path). Golden-section search on |g| around each local minimum of the scan;
  // the caller's final check accepts the state only if g is zero within tolerance.
  for (let i = 0; i < pts.length; i++) {
    const m = Math.abs(pts[i]!.r[0]);
    if ((i > 0 && Math.abs(pts[i - 1]!.r[0]) < m) || (i + 1 < pts.length && Math.abs(pts[i + 1]!.r[0]) < m)) continue;
    let a = pts[Math.max(0, i - 1)]!.u;
    let b = pts[Math.min(pts.length - 1, i + 1)]!.u;
    const abs = (u: number) => Math.abs(safe(() => g(u))?.[0] ?? Infinity);
    const phi = (Math.sqrt(5) - 1) / 2;
    for (let k = 0; k < 80 && b - a > 1e-13 * Math.max(1, Math.abs(b)); k++) {
      const c = b - phi * (b - a);
      const d = a + phi * (b - a);
      if (abs(c) < abs(d)) b = d;
      else a = c;
    }
    const r = safe(() => g(0.5 * (a + b)));
    if (r && Math.abs(r[0]) < 1e-9 * Math.max(1, Math.abs(pts[i]!.r[0]) + m)) return r[1];
    if (r) tangent = tangent && Math.abs(tangent[0]) <= Math.abs(r[0]) ? tangent : r;
  }
  return tangent?.[1];
}

function safe<T>(f: () => T): T | undefined {
  try {
    return f();
  } catch (e) {
    if (e instanceof ThermoError || (e as Error).name === "RootError") return undefined;
    throw e;
  }
}

/**
 * Fast route when the outer property is monotone along the path (inner S: H and U fall along an
 * isentrope as V grows; inner V: H, U, S rise along an isochore with P): bisect on the inner side
 * to a feasible u, step by 1 in u downhill in |g| until g changes sign (or bisect to the feasible edge),
 * then Brent. About 10-30 inner solves instead of a full scan. Undefined when it does not succeed.
 */
function monotoneOuter(
  inner: (u: number) => Inner,
  g: (u: number) => [number, ThermoState] | undefined,
  lo: number,
  hi: number,
): ThermoState | undefined {
  let a = lo;
  let b = hi;
  let u = 0.5 * (lo + hi);
  let r = inner(u);
  for (let k = 0; k < 60 && !r.state; k++) {
    if (r.side === 0) return undefined;
    if (r.side === -1) a = u;
    else b = u;
    u = 0.5 * (a + b);
    r = inner(u);
  }
  if (!r.state) return undefined;
  let [gu, su] = g(u)!;
  if (gu === 0) return su;
  const probe = g(u + 1e-3) ?? g(u - 1e-3);
  if (!probe) return undefined;
  const slope = (g(u + 1e-3) ? probe[0] - gu : gu - probe[0]);
  const dir = (gu > 0) === (slope > 0) ? -1 : 1;
  for (let k = 0; k < 80; k++) {
    const next = Math.min(hi, Math.max(lo, u + dir));
    let v = g(next);
    let at = next;
    if (!v) {
      // Infeasible beyond: bisect to the feasible edge and test there.
      let [good, bad] = [u, next];
      for (let j = 0; j < 50; j++) {
        const mid = 0.5 * (good + bad);
        if (g(mid)) good = mid;
        else bad = mid;
      }
      v = g(good);
      at = good;
      if (!v || v[0] * gu > 0) return undefined;
    }
    if (v[0] * gu <= 0) {
      const [x, y] = u < at ? [u, at] : [at, u];
      const root = brent((w) => g(w)![0], x, y, { xtol: 1e-13 * Math.max(1, Math.abs(y)), rtol: 1e-14 }).value;
      return g(root)?.[1];
    }
    if (at === u) return undefined;
    [u, gu, su] = [at, v[0], v[1]];
  }
  return undefined;
}

/** Nested solve along u: inner T from (k1 = t1), outer root of k2 - t2 restricted to feasible u. */
function nested(ctx: SolveContext & { dense: boolean }, path: "V" | "P", k1: Prop, t1: number, k2: Prop, t2: number): ThermoState | undefined {
  const inner = (u: number): Inner => (path === "V" ? solveTAtV(ctx, Math.exp(u), k1, t1) : solveTAtP(ctx, Math.exp(u), k1, t1));
  const [lo, hi] = pathRange(ctx.model, path, ctx);
  const g = (u: number): [number, ThermoState] | undefined => {
    const r = inner(u);
    return r.state ? [prop(r.state, k2) - t2, r.state] : undefined;
  };
  if (k1 === "S" || k1 === "V") {
    const quick = safe(() => monotoneOuter(inner, g, lo, hi));
    if (quick) return quick;
  }
  const us = Array.from({ length: GRID }, (_, i) => lo + ((hi - lo) * i) / (GRID - 1));
  const sides = us.map((u) => safe(() => inner(u)) ?? { side: 0 as const });
  // Feasible edges: between an infeasible grid point and a feasible neighbour, bisect to the edge so the
  // outer search can reach roots beyond the last feasible grid point.
  const extra: number[] = [];
  const edge = (bad: number, good: number) => {
    for (let k = 0; k < 48; k++) {
      const mid = 0.5 * (bad + good);
      if (safe(() => inner(mid))?.state) good = mid;
      else bad = mid;
    }
    return good;
  };
  for (let i = 0; i + 1 < GRID; i++) {
    const a = sides[i]!;
    const b = sides[i + 1]!;
    if (!a.state && b.state) extra.push(edge(us[i]!, us[i + 1]!));
    if (a.state && !b.state) extra.push(edge(us[i + 1]!, us[i]!));
    if (a.side === -1 && b.side === 1) {
      // Feasible band narrower than the grid: find a point inside it by bisection on the side.
      let [x, y] = [us[i]!, us[i + 1]!];
      for (let k = 0; k < 60; k++) {
        const mid = 0.5 * (x + y);
        const r = safe(() => inner(mid));
        if (r?.state) {
          extra.push(mid, edge(x, mid), edge(y, mid));
          break;
        }
        if (!r || r.side === 0) break;
        if (r.side === -1) x = mid;
        else y = mid;
      }
    }
  }
  return scanRoot(g, lo, hi, (path === "V") !== ctx.dense ? "hi" : "lo", extra);
}

/**
 * Search range of T: 0.2 Tc .. max(5 Tc, 2000 K), narrowed to where the ideal-gas enthalpy rises with
 * T (positive Cp): an extrapolated Cp correlation can turn negative far outside its range (CO2's
 * D/T^2 term below about 145 K), which would make H(T) and S(T) fold back and the search ambiguous.
 */
function temperatureRange(Tc: number, ig?: IdealGasFunctions): [number, number] {
  let lo = 0.2 * Tc;
  let hi = Math.max(5 * Tc, 2000);
  if (!ig) return [lo, hi];
  const n = 96;
  const Ts = Array.from({ length: n + 1 }, (_, i) => lo * (hi / lo) ** (i / n));
  const H = Ts.map((T) => ig.H(T));
  for (let i = 0; i < n; i++) {
    if (!(H[i + 1]! > H[i]!)) {
      if (Ts[i + 1]! <= Tc) lo = Ts[i + 1]!;
      else if (hi === Math.max(5 * Tc, 2000)) hi = Ts[i]!;
    }
  }
  return [lo, hi];
}

/** The state fixed by any two of T, P, V, H, S, U (SI). Two-phase states for pure fluids below Tc. */
export interface StateFromOptions {
  idealGas?: IdealGasFunctions;
  /**
   * Which state to return when the pair fixes more than one ((T, H) below the Joule-Thomson inversion
   * temperature, (H, U)): "light" (default) the one of lowest density, "dense" the one of highest.
   */
  branch?: "light" | "dense";
}

export function stateFrom(model: EosModel, spec: Spec, options: StateFromOptions = {}): ThermoState {
  const given = KEYS.filter((k) => spec[k] !== undefined);
  if (given.length !== 2) {
    throw new ThermoError("spec", `give exactly two of T, P, V, H, S, U; got ${given.length ? given.join(", ") : "none"}`);
  }
  for (const k of given) {
    if (k === "T" || k === "P" || k === "V") requirePositive(k, spec[k]!, UNITS[k]);
    else if (!Number.isFinite(spec[k]!)) throw new ThermoError(k, `${k} must be a finite number (${UNITS[k]}); got ${spec[k]}`);
  }
  const ig = options.idealGas;
  const branch = options.branch ?? "light";
  if (branch !== "light" && branch !== "dense") throw new ThermoError("branch", `branch must be "light" or "dense"; got ${JSON.stringify(branch)}`);
  if (given.some((k) => k === "H" || k === "S" || k === "U") && !ig) {
    throw new ThermoError("idealGas", `${given.join(", ")}: H, S and U need ideal-gas totals: pass idealGas {H(T), S(T, P), reference}`);
  }
  const [k1, k2] = given as [Key, Key];
  if (k1 === "T" && k2 === "P") return state(model, spec.T!, spec.P!, { idealGas: ig });
  const crit = pseudoCritical(model);
  if (model.id === "idealgas" && ["T", "H", "U"].includes(k1) && ["T", "H", "U"].includes(k2)) {
    throw new ThermoError("spec", `${k1} and ${k2} of an ideal gas depend on T alone and do not fix a state: give P, V or S as one of the two`);
  }
  const [Tmin, Tmax] = temperatureRange(crit.Tc, ig);
  const ctx: SolveContext & { dense: boolean } = {
    model, idealGas: ig, Tmin, Tmax, Tc: crit.Tc, Pc: crit.Pc,
    pure: model.fluid.components.length === 1, psatCache: new Map(), dense: branch === "dense",
  };
  const explicitP = typeof model.pressure === "function";
  const result = solveSpec(ctx, explicitP, spec, k1, k2);
  const ok = result && given.every((k) => (k === "T" || k === "P" || k === "V" ? accepts("T", result[k], spec[k]!, result.T) || Math.abs(result[k] / spec[k]! - 1) < 1e-7 : accepts(k, result[k]!, spec[k]!, result.T)));
  if (!result || !ok) {
    throw new ThermoError(
      k2,
      `no ${model.label} state with ${fmt(spec, given)} for ${kelvin(ctx.Tmin)} <= T <= ${kelvin(ctx.Tmax)}` +
        (result ? ` (closest found: T = ${kelvin(result.T)}, P = ${pressureText(result.P)})` : ""),
    );
  }
  return result;
}

function solveSpec(ctx: SolveContext & { dense: boolean }, explicitP: boolean, spec: Spec, k1: Key, k2: Key): ThermoState | undefined {
  const { model, idealGas: ig } = ctx;
  if (k1 === "P") return safe(() => solveTAtP(ctx, spec.P!, k2 as Prop, spec[k2]!).state);
  if (k1 === "T") {
    const T = spec.T!;
    const k = k2 as Prop;
    if (explicitP) {
      if (k === "V") return stateAtTV(model, T, spec.V!, { idealGas: ig, psatCache: ctx.psatCache });
      const [lo, hi] = pathRange(model, "V", ctx);
      const g = (u: number): [number, ThermoState] => {
        const s = stateAtTV(model, T, Math.exp(u), { idealGas: ig, psatCache: ctx.psatCache });
        return [prop(s, k) - spec[k]!, s];
      };
      // The dome's edges split the scan there: H(V) along an isotherm turns at the saturated liquid.
      const sat = ctx.pure && T < ctx.Tc ? safe(() => psat(model, T)) : undefined;
      const edges = sat ? [Math.log(sat.VL), Math.log(sat.VL) - 1e-3, Math.log(sat.VV)] : [];
      return scanRoot(g, lo, hi, ctx.dense ? "lo" : "hi", edges);
    }
    // Lee-Kesler: along the isotherm in ln P; the two-phase states all sit at Psat.
    if (ctx.pure && T < ctx.Tc && !ctx.dense) {
      const s = safe(() => psat(model, T));
      if (s) {
        const a = prop(twoPhase(model, s, 0, ig), k);
        const b = prop(twoPhase(model, s, 1, ig), k);
        if ((spec[k]! - a) * (spec[k]! - b) <= 0) return twoPhase(model, s, (spec[k]! - a) / (b - a), ig);
      }
    }
    const [lo, hi] = pathRange(model, "P", ctx);
    const g = (u: number): [number, ThermoState] => {
      const s = state(model, T, Math.exp(u), { idealGas: ig });
      return [prop(s, k) - spec[k]!, s];
    };
    const found = scanRoot(g, lo, hi, ctx.dense ? "hi" : "lo");
    return found && accepts(k, prop(found, k), spec[k]!, T) ? found : undefined;
  }
  if (k1 === "V" && explicitP) return safe(() => solveTAtV(ctx, spec.V!, k2 as Prop, spec[k2]!).state);
  // Nested: prefer S as the inner property (monotone in T and in the path variable), then U, then V.
  const pair = [k1, k2] as Prop[];
  const innerKey = pair.includes("S") ? "S" : pair.includes("V") ? "V" : "U";
  const outerKey = pair.find((k) => k !== innerKey)!;
  const path = explicitP && innerKey !== "V" ? "V" : "P";
  return nested(ctx, path, innerKey, spec[innerKey]!, outerKey, spec[outerKey]!);
}
