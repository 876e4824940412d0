/**
 * The one interface every equation-of-state model implements. SI numbers only:
 * T in K, P in Pa, V in m^3/mol, energies J/mol, entropies J/(mol K).
 */
import type { Substance } from "../substances/types.js";

/** A pure fluid is a mixture of one component with x = [1]. */
export interface Fluid {
  components: readonly Substance[];
  /** Mole fractions, summing to 1. */
  x: readonly number[];
  /** Binary interaction parameters, symmetric, zero diagonal; absent = all zero. */
  kij?: readonly (readonly number[])[];
}

/** Residual (departure) properties at one (T, P, V) root: property minus ideal-gas value at the same T and P. */
export interface Residual {
  Z: number;
  HR: number;
  SR: number;
  UR: number;
  GR: number;
  AR: number;
  /** ln of the mixture (or pure) fugacity coefficient: GR/(RT). */
  lnphi: number;
  /** ln of each component's fugacity coefficient in the mixture. */
  lnphiComponents: number[];
}

export interface EosModel {
  /** Short key as in the language: "idealgas", "vdw", "rk", "srk", "pr", "virial", "lk". */
  readonly id: string;
  /** Name for reports, e.g. "Peng-Robinson (1976; 1978 kappa for omega > 0.49)". */
  readonly label: string;
  /** Published source of the model's equations. */
  readonly source: string;
  readonly fluid: Fluid;
  /** P(T, V) for pressure-explicit models (all but Lee-Kesler); used by the numerical Maxwell route. */
  pressure?(T: number, V: number): number;
  /** All real, physical molar-volume roots at (T, P), ascending (liquid-like first). */
  volumes(T: number, P: number): number[];
  /** Closed-form residual properties at (T, P) on the root V (one of volumes(T, P)). */
  residual(T: number, P: number, V: number): Residual;
}
