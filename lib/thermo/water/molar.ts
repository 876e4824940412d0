/**
 * Molar view of an IF97 state with M = 0.018015268 kg/mol (IAPWS). Upper-case symbols are molar
 * (m^3/mol, J/mol, J/(mol K)), following the project's convention for state records.
 */
import { M_WATER } from "./constants.js";
import type { WaterState } from "./properties.js";

export interface WaterMolar {
  V: number;
  H: number;
  S: number;
  U: number;
  G: number;
  A: number;
  Cp: number;
  Cv: number;
}

/** Molar properties of a water state: specific value times M. */
export function toMolar(st: WaterState): WaterMolar {
  return {
    V: st.v * M_WATER,
    H: st.h * M_WATER,
    S: st.s * M_WATER,
    U: st.u * M_WATER,
    G: st.g * M_WATER,
    A: st.a * M_WATER,
    Cp: st.cp * M_WATER,
    Cv: st.cv * M_WATER,
  };
}

/** Specific (per kg) quantity from a molar one: divide by M (kg/mol). */
export function perMassFromMolar(molar: number): number {
  return molar / M_WATER;
}
