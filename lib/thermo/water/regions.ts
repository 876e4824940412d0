/**
 * IF97 region selection from (T, p) and the single-phase state there; saturated-phase states.
 * Region boundaries per IAPWS R7-97(2012) Sec. 2 (Fig. 1): region 1 left of the saturation line below
 * 623.15 K; region 2 right of it and below B23; region 3 between 623.15 K, B23 and 100 MPa; region 5
 * above 1073.15 K up to 50 MPa. Exactly on the saturation line (T, p) gives the liquid.
 */
import { ThermoError } from "../errors.js";
import { b23Pressure } from "./boundaries.js";
import { P_CRIT_MPA, P_MAX5_MPA, P_MAX_MPA, T_13, T_25, T_B23_MAX, T_CRIT, T_MAX, T_MIN, VALIDITY_TEXT } from "./constants.js";
import type { WaterPhase, WaterState } from "./properties.js";
import { region1 } from "./region1.js";
import { region2 } from "./region2.js";
import { region3, region3Density } from "./region3.js";
import { region5 } from "./region5.js";
import { if97Psat } from "./saturation.js";

/** Throws ThermoError naming T or p when (T, p) lies outside the IF97 range of validity. */
export function checkTP(T: number, p: number): void {
  if (!Number.isFinite(T) || T < T_MIN || T > T_MAX) {
    throw new ThermoError("T", `T = ${T} K is out of range: ${VALIDITY_TEXT}`);
  }
  if (!Number.isFinite(p) || p <= 0) {
    throw new ThermoError("p", `p must be a finite pressure > 0 Pa; got p = ${p} Pa (${VALIDITY_TEXT})`);
  }
  const pMax = T <= T_25 ? P_MAX_MPA : P_MAX5_MPA;
  if (p > pMax * 1e6) {
    throw new ThermoError("p", `p = ${p} Pa at T = ${T} K is out of range (maximum ${pMax} MPa there): ${VALIDITY_TEXT}`);
  }
}

/** IF97 region (1, 2, 3 or 5) of a valid (T, p), T in K, p in Pa. */
export function regionOfTP(T: number, p: number): 1 | 2 | 3 | 5 {
  checkTP(T, p);
  if (T > T_25) return 5;
  if (T <= T_13) return p >= if97Psat(T) ? 1 : 2;
  if (T > T_B23_MAX) return 2;
  return p > b23Pressure(T) ? 3 : 2;
}

/** Phase label: supercritical above both critical values, else by the branch the state lies on. */
export function phaseOf(T: number, p: number, fallback: WaterPhase): WaterPhase {
  return T > T_CRIT && p > P_CRIT_MPA * 1e6 ? "supercritical" : fallback;
}

/** Single-phase IF97 state at (T, p), SI in and out. */
export function stateTP(T: number, p: number): WaterState {
  const region = regionOfTP(T, p);
  let st: WaterState;
  if (region === 1) st = region1(T, p);
  else if (region === 2) st = region2(T, p);
  else if (region === 5) st = region5(T, p);
  else {
    const branch = T < T_CRIT && p < if97Psat(T) ? "vapor" : "liquid";
    st = region3(region3Density(p, T, branch), T);
    st = { ...st, phase: T < T_CRIT ? branch : st.phase };
  }
  return { ...st, phase: phaseOf(T, p, st.phase) };
}

/** Saturated liquid (x = 0) and vapour (x = 1) at T (K), both at p = ps(T); region 4 labels. */
export function saturatedPair(T: number): { liquid: WaterState; vapor: WaterState } {
  const ps = if97Psat(T);
  let liquid: WaterState;
  let vapor: WaterState;
  if (T <= T_13) {
    liquid = region1(T, ps);
    vapor = region2(T, ps);
  } else if (T_CRIT - T < 1e-7) {
    // At the critical point both phases are the critical state.
    liquid = region3(322, T);
    vapor = liquid;
  } else {
    liquid = region3(region3Density(ps, T, "liquid"), T);
    vapor = region3(region3Density(ps, T, "vapor"), T);
  }
  return {
    liquid: { ...liquid, p: ps, x: 0, phase: "liquid", region: 4 },
    vapor: { ...vapor, p: ps, x: 1, phase: "vapor", region: 4 },
  };
}

/** Two-phase mixture of vapour mass fraction x between a saturated pair; cp, cv, w are NaN for 0 < x < 1. */
export function mixture(liquid: WaterState, vapor: WaterState, x: number): WaterState {
  if (x === 0) return liquid;
  if (x === 1) return vapor;
  const mix = (a: number, b: number): number => a + x * (b - a);
  const T = liquid.T;
  const v = mix(liquid.v, vapor.v);
  const h = mix(liquid.h, vapor.h);
  const s = mix(liquid.s, vapor.s);
  const u = mix(liquid.u, vapor.u);
  return {
    T,
    p: liquid.p,
    v,
    rho: 1 / v,
    h,
    s,
    u,
    g: h - T * s,
    a: u - T * s,
    cp: Number.NaN,
    cv: Number.NaN,
    w: Number.NaN,
    x,
    phase: "two-phase",
    region: 4,
  };
}
