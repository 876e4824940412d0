/**
 * IF97 states from pressure and enthalpy, or pressure and entropy ("flashes").
 * Method: locate the region from the property values on its boundaries at the given p (saturation
 * line, 623.15 K, B23, 1073.15 K); in regions 1 and 2 start from the backward equation T(p,h) or T(p,s)
 * of IAPWS R7-97(2012) and polish with Newton on the basic equation (dh/dT = cp, ds/dT = cp/T) so the
 * returned state satisfies the basic equation to ~1e-12 relative; region 5 and region 3 use Brent on T
 * (region 3 with the density from region3Density). Inside the dome the vapour fraction is
 * x = (h - h') / (h'' - h') (or with s). Validity: the IF97 range in T, with p <= 100 MPa.
 */
import { brent } from "../../numerics/index.js";
import { ThermoError } from "../errors.js";
import { b23Temperature } from "./boundaries.js";
import { P_13_MPA, P_CRIT_MPA, P_MAX5_MPA, P_MAX_MPA, P_MIN_SAT_MPA, T_13, T_25, T_CRIT, T_MAX, T_MIN } from "./constants.js";
import type { WaterState } from "./properties.js";
import { region1, region1TofPH, region1TofPS } from "./region1.js";
import { region2 } from "./region2.js";
import { region2TofPH, region2TofPS } from "./region2Backward.js";
import { region3, region3Density } from "./region3.js";
import { region5 } from "./region5.js";
import { mixture, phaseOf, saturatedPair } from "./regions.js";
import { if97Tsat } from "./saturation.js";

type Key = "h" | "s";
type RegionFn = (T: number, p: number) => WaterState;

/** State at pressure p (Pa) and specific enthalpy h (J/kg). */
export function statePH(p: number, h: number): WaterState {
  return flash(p, h, "h");
}

/** State at pressure p (Pa) and specific entropy s (J/(kg K)). */
export function statePS(p: number, s: number): WaterState {
  return flash(p, s, "s");
}

function flash(p: number, y: number, key: Key): WaterState {
  const unit = key === "h" ? "J/kg" : "J/(kg K)";
  if (!Number.isFinite(p) || p <= 0 || p > P_MAX_MPA * 1e6) {
    throw new ThermoError("p", `p must satisfy 0 < p <= 100 MPa for IF97; got p = ${p} Pa`);
  }
  if (!Number.isFinite(y)) throw new ThermoError(key, `${key} must be a finite number in ${unit}; got ${y}`);
  const cold = p >= P_MIN_SAT_MPA * 1e6 ? region1(T_MIN, p) : region2(T_MIN, p);
  const hot = p <= P_MAX5_MPA * 1e6 ? region5(T_MAX, p) : region2(T_25, p);
  if (y < cold[key] - 1e-9 * Math.abs(cold[key]) - 1e-9 || y > hot[key] + 1e-9 * Math.abs(hot[key])) {
    throw new ThermoError(
      key,
      `${key} = ${y} ${unit} at p = ${p} Pa is outside IF97: it must lie between ${cold[key]} (T = 273.15 K) and ${hot[key]} ${unit} (T = ${hot.T} K)`,
    );
  }
  if (p < P_MIN_SAT_MPA * 1e6) return vaporSide(p, y, key, T_MIN);
  if (p <= P_13_MPA * 1e6) {
    const Ts = Math.max(T_MIN, if97Tsat(p)); // Eq. (31) rounds just below 273.15 K at the lowest pressures
    const liq = region1(Ts, p);
    const vap = region2(Ts, p);
    if (y <= liq[key]) return solveGibbsRegion(region1, p, y, key, T_MIN, Ts, backward1(p, y, key));
    if (y < vap[key]) return twoPhase(Ts, y, key);
    return vaporSide(p, y, key, Ts);
  }
  const top1 = region1(T_13, p);
  if (y <= top1[key]) return solveGibbsRegion(region1, p, y, key, T_MIN, T_13, backward1(p, y, key));
  const TB = b23Temperature(p);
  if (y >= region2(TB, p)[key]) return vaporSide(p, y, key, TB);
  if (p < P_CRIT_MPA * 1e6) {
    const Ts = Math.max(T_MIN, if97Tsat(p)); // Eq. (31) rounds just below 273.15 K at the lowest pressures
    const { liquid, vapor } = saturatedPair(Ts);
    if (y > liquid[key] && y < vapor[key]) return twoPhase(Ts, y, key);
    if (y <= liquid[key]) return solveRegion3(p, y, key, T_13, Ts, "liquid");
    return solveRegion3(p, y, key, Ts, TB, "vapor");
  }
  return solveRegion3(p, y, key, T_13, TB, "liquid");
}

function backward1(p: number, y: number, key: Key): number {
  return key === "h" ? region1TofPH(p, y) : region1TofPS(p, y);
}

/** Region 2 up to 1073.15 K, region 5 above; TLow is the lower temperature bound at this p. */
function vaporSide(p: number, y: number, key: Key, TLow: number): WaterState {
  if (p <= P_MAX5_MPA * 1e6 && y > region2(T_25, p)[key]) {
    return solveGibbsRegion(region5, p, y, key, T_25, T_MAX, Number.NaN);
  }
  const guess = key === "h" ? region2TofPH(p, y) : region2TofPS(p, y);
  return solveGibbsRegion(region2, p, y, key, TLow, T_25, guess);
}

function twoPhase(Ts: number, y: number, key: Key): WaterState {
  const { liquid, vapor } = saturatedPair(Ts);
  const x = (y - liquid[key]) / (vapor[key] - liquid[key]);
  return mixture(liquid, vapor, Math.min(1, Math.max(0, x)));
}

/** Newton from the backward-equation guess, Brent on [lo, hi] if Newton strays or stalls. */
function solveGibbsRegion(fn: RegionFn, p: number, y: number, key: Key, lo: number, hi: number, guess: number): WaterState {
  let T = guess;
  if (Number.isFinite(T) && T >= lo && T <= hi) {
    for (let k = 0; k < 8; k++) {
      const st = fn(T, p);
      const slope = key === "h" ? st.cp : st.cp / T;
      const dT = (st[key] - y) / slope;
      T -= dT;
      if (!(T >= lo - 1e-9 && T <= hi + 1e-9)) break;
      if (Math.abs(dT) < 1e-10 * T) return label(fn(Math.min(hi, Math.max(lo, T)), p));
    }
  }
  const edge = seam((t) => fn(t, p)[key] - y, lo, hi, key, y);
  if (edge !== undefined) return label(fn(edge, p));
  T = brent((t) => fn(t, p)[key] - y, lo, hi, { xtol: 1e-11 * hi, rtol: 0 }, "IF97 flash").value;
  return label(fn(T, p));
}

/**
 * Adjacent IF97 regions meet only to the release's consistency tolerances, so at a boundary (623.15 K
 * between 1 and 3, B23 between 2 and 3, 1073.15 K between 2 and 5) a value y can fall in the thin gap
 * between the two regions' boundary values. Such a y belongs on the boundary: return that end. Returns
 * undefined when [lo, hi] brackets y (the normal case); a miss wider than 1e-4 relative is a real error.
 */
function seam(f: (T: number) => number, lo: number, hi: number, key: Key, y: number): number | undefined {
  const flo = f(lo);
  const fhi = f(hi);
  if (flo <= 0 && fhi >= 0) return undefined;
  const tol = 1e-4 * Math.max(Math.abs(y), key === "h" ? 1e5 : 100);
  if (flo > 0 && flo <= tol) return lo;
  if (fhi < 0 && -fhi <= tol) return hi;
  throw new ThermoError(key, `IF97 flash: ${key} = ${y} is not reached between T = ${lo} K and ${hi} K at this pressure`);
}

function solveRegion3(p: number, y: number, key: Key, lo: number, hi: number, branch: "liquid" | "vapor"): WaterState {
  const at = (T: number): WaterState => region3(region3Density(p, T, branch), T);
  const edge = seam((t) => at(t)[key] - y, lo, hi, key, y);
  const T = edge ?? brent((t) => at(t)[key] - y, lo, hi, { xtol: 1e-11 * hi, rtol: 0 }, "IF97 region 3 flash").value;
  const st = at(T);
  return label({ ...st, p, phase: T < T_CRIT ? branch : st.phase });
}

function label(st: WaterState): WaterState {
  return { ...st, phase: phaseOf(st.T, st.p, st.phase) };
}
