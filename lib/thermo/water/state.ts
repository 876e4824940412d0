/**
 * if97State: the one entry point for water and steam by IAPWS-IF97. Accepts exactly one of the input
 * pairs {T, p}, {p, h}, {p, s}, {h, s}, {T, x}, {p, x} in SI (K, Pa, J/kg, J/(kg K), x as vapour mass fraction
 * 0..1) and returns a WaterState in SI. Out-of-range input throws ThermoError naming the argument.
 */
import { ThermoError } from "../errors.js";
import { P_CRIT_MPA, P_MIN_SAT_MPA, T_CRIT, T_MIN } from "./constants.js";
import { statePH, statePS } from "./flash.js";
import { stateHS } from "./hs.js";
import type { WaterState } from "./properties.js";
import { mixture, saturatedPair, stateTP } from "./regions.js";
import { if97Tsat } from "./saturation.js";

export type IF97Input =
  | { T: number; p: number }
  | { p: number; h: number }
  | { p: number; s: number }
  | { h: number; s: number }
  | { T: number; x: number }
  | { p: number; x: number };

const PAIRS = "{T, p}, {p, h}, {p, s}, {h, s}, {T, x} or {p, x}";

/** Water/steam state from one input pair (SI). See the module comment for the accepted pairs. */
export function if97State(input: IF97Input): WaterState {
  const given = Object.keys(input).filter((k) => (input as Record<string, unknown>)[k] !== undefined).sort().join(",");
  for (const [k, v] of Object.entries(input)) {
    if (v !== undefined && (typeof v !== "number" || !Number.isFinite(v))) {
      throw new ThermoError(k, `${k} must be a finite number; got ${String(v)}`);
    }
  }
  const i = input as Record<string, number>;
  switch (given) {
    case "T,p":
      return stateTP(i.T as number, i.p as number);
    case "h,p":
      return statePH(i.p as number, i.h as number);
    case "p,s":
      return statePS(i.p as number, i.s as number);
    case "h,s":
      return stateHS(i.h as number, i.s as number);
    case "T,x":
      return saturatedTX(i.T as number, i.x as number);
    case "p,x":
      return saturatedPX(i.p as number, i.x as number);
    default:
      throw new ThermoError("input", `if97State needs exactly one input pair: ${PAIRS}; got {${given}}`);
  }
}

function checkX(x: number): void {
  if (!(x >= 0 && x <= 1)) throw new ThermoError("x", `x (vapour mass fraction) must lie in 0..1; got x = ${x}`);
}

/** Two-phase state at T (K) with vapour fraction x; 273.15 K <= T <= 647.096 K. */
export function saturatedTX(T: number, x: number): WaterState {
  checkX(x);
  if (!(T >= T_MIN && T <= T_CRIT)) {
    throw new ThermoError("T", `a two-phase state needs 273.15 K <= T <= 647.096 K (triple to critical point); got T = ${T} K`);
  }
  const { liquid, vapor } = saturatedPair(T);
  return mixture(liquid, vapor, x);
}

/** Two-phase state at p (Pa) with vapour fraction x; 611.213 Pa <= p <= 22.064 MPa. */
export function saturatedPX(p: number, x: number): WaterState {
  checkX(x);
  if (!(p >= P_MIN_SAT_MPA * 1e6 * (1 - 1e-9) && p <= P_CRIT_MPA * 1e6)) {
    throw new ThermoError("p", `a two-phase state needs 611.213 Pa <= p <= 22.064 MPa (triple to critical point); got p = ${p} Pa`);
  }
  const T = Math.max(T_MIN, Math.min(T_CRIT, if97Tsat(p)));
  const st = mixture(...pairAt(T), x);
  return { ...st, p };
}

function pairAt(T: number): [WaterState, WaterState] {
  const { liquid, vapor } = saturatedPair(T);
  return [liquid, vapor];
}
