/**
 * The ideal-gas part of a state as two closures, H(T) and S(T, P), for a pure fluid or mixture: the
 * shape state() takes to turn departures into totals (H = H^ig + HR, S = S^ig + SR). Built once per
 * fluid so vectorised states do not re-check composition. Mixtures include -R sum x ln x in S.
 */
import type { Substance } from "../substances/types.js";
import { R } from "../constants.js";
import { requirePositive } from "../errors.js";
import { cp, cpWarnings, enthalpyIntegral, entropyIntegral } from "./cp.js";
import { mixtureIdealGasTotals, checkFractions } from "./mixture.js";
import { DEFAULT_REFERENCE, type ReferenceState } from "./reference.js";

export interface IdealGasClosures {
  /** J/mol against the reference. */
  H(T: number): number;
  /** J/(mol K) against the reference. */
  S(T: number, P: number): number;
  /** Ideal-gas Cp of the fluid, J/(mol K). */
  Cp(T: number): number;
  /** Extrapolation warnings for T (empty inside every component's Cp range). */
  warnings(T: number): string[];
  reference: string;
}

/** H, S, Cp closures for components at mole fractions x against `ref` (default: 298.15 K, 1 bar, H = S = 0). */
export function idealGasFunctions(
  components: readonly Substance[],
  x: readonly number[],
  ref: ReferenceState = DEFAULT_REFERENCE,
): IdealGasClosures {
  checkFractions(components, x);
  if (components.length === 1) {
    const s = components[0]!;
    return {
      // The H and S of idealGasTotals without its other fields and range texts (states call these per point).
      H: (T) => ref.H + enthalpyIntegral(s, ref.T, T),
      S: (T, P) => {
        requirePositive("P", P, "Pa");
        return ref.S + entropyIntegral(s, ref.T, T) - R * Math.log(P / ref.P);
      },
      Cp: (T) => cp(s, T),
      warnings: (T) => cpWarnings(s, T, ref.T),
      reference: ref.description,
    };
  }
  return {
    H: (T) => mixtureIdealGasTotals(components, x, T, ref.P, ref).H,
    S: (T, P) => mixtureIdealGasTotals(components, x, T, P, ref).S,
    Cp: (T) => mixtureIdealGasTotals(components, x, T, ref.P, ref).Cp,
    warnings: (T) => components.flatMap((s, i) => (x[i]! > 0 ? cpWarnings(s, T, ref.T) : [])),
    reference: `${ref.description}, each pure component (mixture adds -R sum x ln x)`,
  };
}
