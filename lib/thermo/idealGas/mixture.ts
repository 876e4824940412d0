/**
 * Ideal-gas mixtures: Cp is the mole-fraction average of the components' Cp; H and S totals add the
 * components' values at the mixture T and P, plus the ideal entropy of mixing -R sum x_i ln x_i
 * (zero-fraction terms contribute 0, the limit of x ln x). No heat of mixing for ideal gases.
 * Source: any chemical-engineering thermodynamics text, ideal-gas mixture model (Gibbs's theorem).
 */
import { R } from "../constants.js";
import { ThermoError, requirePositive } from "../errors.js";
import type { Substance } from "../substances/types.js";
import { cp } from "./cp.js";
import { DEFAULT_REFERENCE, idealGasTotals, type IdealGasTotals, type ReferenceState } from "./reference.js";

/** Checks that x has one finite, non-negative fraction per component summing to 1 within 1e-9. */
export function checkFractions(components: readonly Substance[], x: readonly number[]): void {
  if (x.length !== components.length) {
    throw new ThermoError("x", `need one mole fraction per component (${components.length}); got ${x.length}`);
  }
  let sum = 0;
  x.forEach((xi, i) => {
    if (!Number.isFinite(xi) || xi < 0) {
      throw new ThermoError("x", `mole fraction of ${components[i]!.name} must be a number >= 0; got ${xi}`);
    }
    sum += xi;
  });
  if (Math.abs(sum - 1) > 1e-9) throw new ThermoError("x", `mole fractions must sum to 1; they sum to ${sum}`);
}

/** -R sum x ln x, J/(mol K): the ideal entropy of mixing (>= 0). */
export function idealMixingEntropy(x: readonly number[]): number {
  let s = 0;
  for (const xi of x) if (xi > 0) s -= xi * Math.log(xi);
  return R * s;
}

/** Mixture ideal-gas Cp = sum x_i Cp_i(T), J/(mol K). */
export function mixtureCp(components: readonly Substance[], x: readonly number[], T: number): number {
  checkFractions(components, x);
  requirePositive("T", T, "K");
  let c = 0;
  components.forEach((s, i) => {
    if (x[i]! > 0) c += x[i]! * cp(s, T);
  });
  return c;
}

/** Ideal-gas mixture totals at (T, P): each component at the mixture T and P, plus mixing entropy. */
export function mixtureIdealGasTotals(
  components: readonly Substance[],
  x: readonly number[],
  T: number,
  P: number,
  ref: ReferenceState = DEFAULT_REFERENCE,
): IdealGasTotals {
  checkFractions(components, x);
  const total: IdealGasTotals = { H: 0, S: 0, U: 0, G: 0, A: 0, Cp: 0, Cv: 0, reference: ref.description, warnings: [] };
  components.forEach((s, i) => {
    const xi = x[i]!;
    if (xi === 0) return;
    const t = idealGasTotals(s, T, P, ref);
    total.H += xi * t.H;
    total.S += xi * t.S;
    total.Cp += xi * t.Cp;
    total.warnings.push(...t.warnings);
  });
  total.S += idealMixingEntropy(x);
  total.U = total.H - R * T;
  total.G = total.H - T * total.S;
  total.A = total.U - T * total.S;
  total.Cv = total.Cp - R;
  total.reference = `${ref.description}, each pure component (mixture adds -R sum x ln x)`;
  return total;
}
