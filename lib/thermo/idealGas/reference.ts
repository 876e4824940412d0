/**
 * Ideal-gas totals H, S, U, G, A of a pure substance against a declared reference state.
 *
 * Reference state (default): the ideal gas at T0 = 298.15 K and P0 = 1 bar with H = 0 and S = 0.
 * Why this choice: it is the thermochemical standard state temperature and pressure, needs no
 * saturation data (so it works for every record, including supercritical gases and pseudo-components),
 * and differences between states, which are all a design calculation uses, do not depend on it.
 * Users may pass another reference (T0, P0, H0, S0); the description travels with every result.
 *
 * H^ig(T) = H0 + int_T0^T Cp dT;   S^ig(T, P) = S0 + int_T0^T Cp/T dT - R ln(P/P0);
 * U = H - R T;   G = H - T S;   A = U - T S.   Units: J/mol, J/(mol K).
 */
import { P_REF, R, T_REF } from "../constants.js";
import { ThermoError, requirePositive } from "../errors.js";
import type { Substance } from "../substances/types.js";
import { cp, cpWarnings, enthalpyIntegral, entropyIntegral } from "./cp.js";

export interface ReferenceState {
  /** K */
  readonly T: number;
  /** Pa */
  readonly P: number;
  /** J/mol */
  readonly H: number;
  /** J/(mol K) */
  readonly S: number;
  readonly description: string;
}

/** Ideal gas at 298.15 K and 1 bar with H = 0 and S = 0. */
export const DEFAULT_REFERENCE: ReferenceState = Object.freeze({
  T: T_REF,
  P: P_REF,
  H: 0,
  S: 0,
  description: "ideal gas at 298.15 K and 1 bar: H = 0, S = 0",
});

/** Builds a reference state, checking its fields; `description` is generated when absent. */
export function referenceState(T: number, P: number, H = 0, S = 0, description?: string): ReferenceState {
  requirePositive("T0", T, "K");
  requirePositive("P0", P, "Pa");
  if (!Number.isFinite(H)) throw new ThermoError("H0", `reference H0 must be a finite number (J/mol); got ${H}`);
  if (!Number.isFinite(S)) throw new ThermoError("S0", `reference S0 must be a finite number (J/(mol K)); got ${S}`);
  return Object.freeze({
    T,
    P,
    H,
    S,
    description: description ?? `ideal gas at ${T} K and ${P / 1e5} bar: H = ${H} J/mol, S = ${S} J/(mol K)`,
  });
}

export interface IdealGasTotals {
  H: number;
  S: number;
  U: number;
  G: number;
  A: number;
  Cp: number;
  Cv: number;
  reference: string;
  /** Extrapolation notes (empty when T and the reference T are inside the correlation's range). */
  warnings: string[];
}

/** Ideal-gas totals of a pure substance at (T, P) against `ref`. */
export function idealGasTotals(sub: Substance, T: number, P: number, ref: ReferenceState = DEFAULT_REFERENCE): IdealGasTotals {
  requirePositive("T", T, "K");
  requirePositive("P", P, "Pa");
  const H = ref.H + enthalpyIntegral(sub, ref.T, T);
  const S = ref.S + entropyIntegral(sub, ref.T, T) - R * Math.log(P / ref.P);
  const U = H - R * T;
  const Cp = cp(sub, T);
  return {
    H,
    S,
    U,
    G: H - T * S,
    A: U - T * S,
    Cp,
    Cv: Cp - R,
    reference: ref.description,
    warnings: cpWarnings(sub, T, ref.T),
  };
}
