/**
 * Ideal-gas heat capacity of a substance record and its exact integrals.
 *
 * Method: the record's correlation evaluated directly; int Cp dT and int Cp/T dT in closed form for
 * each supported form (no quadrature error):
 * - "Cp/R = A + B T + C T^2 + D T^-2":
 *     int Cp dT   = R [A dT + B/2 d(T^2) + C/3 d(T^3) - D d(1/T)]
 *     int Cp/T dT = R [A ln(T/T0) + B dT + C/2 d(T^2) - D/2 d(T^-2)]
 * - "Cp = A + B T + C T^2 + D T^3" (J/(mol K)):
 *     int Cp dT   = A dT + B/2 d(T^2) + C/3 d(T^3) + D/4 d(T^4)
 *     int Cp/T dT = A ln(T/T0) + B dT + C/2 d(T^2) + D/3 d(T^3)
 * Units: T in K, Cp in J/(mol K), int Cp dT in J/mol, int Cp/T dT in J/(mol K).
 * Validity: the correlation's [Tmin, Tmax]; outside it the polynomial is extrapolated and
 * `cpWarnings` says so by the rule of cpRangeClass (flagged beyond 10 %, "far outside" beyond 50 %) (values are still returned: extrapolation is the caller's informed choice).
 * Accuracy: that of the correlation (typically 1-2 % inside its range; see each record's source).
 */
import { R } from "../constants.js";
import { ThermoError, requirePositive } from "../errors.js";
import { num } from "../format.js";
import { CP_FORM_J_CUBIC, CP_FORM_R_QUADRATIC_INVERSE } from "../substances/record.js";
import type { Substance } from "../substances/types.js";

type Kind = "R-quadratic-inverse" | "J-cubic";

function kindOf(sub: Substance): Kind {
  const form = sub.cp.form;
  if (form === CP_FORM_R_QUADRATIC_INVERSE) return "R-quadratic-inverse";
  if (form === CP_FORM_J_CUBIC) return "J-cubic";
  throw new ThermoError(
    "cp",
    `no ideal-gas Cp correlation for "${sub.name}" (form "${form}"): give the substance a cp field ` +
      `(a constant in J/(mol K) or {form, coefficients, Tmin, Tmax}) to compute H, S, U, G totals`,
  );
}

function coeffs(sub: Substance): [number, number, number, number] {
  const c = sub.cp.coefficients;
  return [c[0] ?? 0, c[1] ?? 0, c[2] ?? 0, c[3] ?? 0];
}

/** Ideal-gas Cp at T, J/(mol K). */
export function cp(sub: Substance, T: number): number {
  requirePositive("T", T, "K");
  const [A, B, C, D] = coeffs(sub);
  return kindOf(sub) === "R-quadratic-inverse"
    ? R * (A + B * T + C * T * T + D / (T * T))
    : A + T * (B + T * (C + T * D));
}

/** Ideal-gas Cv = Cp - R at T, J/(mol K). */
export function cv(sub: Substance, T: number): number {
  return cp(sub, T) - R;
}

/** Integral of Cp dT from T0 to T, J/mol (exact for the correlation). */
export function enthalpyIntegral(sub: Substance, T0: number, T: number): number {
  requirePositive("T", T, "K");
  requirePositive("Tref", T0, "K");
  const [A, B, C, D] = coeffs(sub);
  if (kindOf(sub) === "R-quadratic-inverse") {
    return R * (A * (T - T0) + (B / 2) * (T * T - T0 * T0) + (C / 3) * (T ** 3 - T0 ** 3) - D * (1 / T - 1 / T0));
  }
  return A * (T - T0) + (B / 2) * (T * T - T0 * T0) + (C / 3) * (T ** 3 - T0 ** 3) + (D / 4) * (T ** 4 - T0 ** 4);
}

/** Integral of Cp/T dT from T0 to T, J/(mol K) (exact for the correlation). */
export function entropyIntegral(sub: Substance, T0: number, T: number): number {
  requirePositive("T", T, "K");
  requirePositive("Tref", T0, "K");
  const [A, B, C, D] = coeffs(sub);
  const lnT = Math.log(T / T0);
  if (kindOf(sub) === "R-quadratic-inverse") {
    return R * (A * lnT + B * (T - T0) + (C / 2) * (T * T - T0 * T0) - (D / 2) * (1 / (T * T) - 1 / (T0 * T0)));
  }
  return A * lnT + B * (T - T0) + (C / 2) * (T * T - T0 * T0) + (D / 3) * (T ** 3 - T0 ** 3);
}

/**
 * Rule for flagging a Cp correlation used outside its fitted range [Tmin, Tmax] (documented here, used
 * by every caller): a fit of this kind degrades gradually at its ends, so temperatures within 10 % of the
 * range (0.9 Tmin to 1.1 Tmax) are not flagged (e.g. 288.15 K standard conditions with a fit from 298 K);
 * beyond that the value is "extrapolated"; beyond 50 % (T < 0.5 Tmin or T > 1.5 Tmax) the polynomial is
 * "far outside" its range and may even turn negative (a quadratic Cp at 10^5 K), so totals are not
 * meaningful. The margins are common practice for polynomial fits, not a published rule.
 */
export const CP_MARGIN = 0.1;
export const CP_FAR_MARGIN = 0.5;

/** "far", "extrapolated" or undefined (inside the flagging margin) for T against the fit's range. */
export function cpRangeClass(Tmin: number, Tmax: number, T: number): "far" | "extrapolated" | undefined {
  if (T >= Tmin * (1 - CP_MARGIN) && T <= Tmax * (1 + CP_MARGIN)) return undefined;
  return T < Tmin * (1 - CP_FAR_MARGIN) || T > Tmax * (1 + CP_FAR_MARGIN) ? "far" : "extrapolated";
}

/** The caution text for a component's Cp fit used at `cls` (no temperature in it: one text per range). */
export function cpRangeText(name: string, Tmin: number, Tmax: number, cls: "far" | "extrapolated"): string {
  const range = `${num(Tmin)} to ${num(Tmax)} K`;
  return cls === "far"
    ? `ideal-gas Cp of ${name} used far outside its fitted range ${range} (more than 50 % beyond it): the fit is not meaningful there, so H, S, U, G, A, Cp and w are unreliable`
    : `ideal-gas Cp of ${name} extrapolated more than 10 % outside its fitted range ${range}`;
}

/**
 * Warnings for temperatures outside the correlation's fitted range by the rule above (empty when
 * none is flagged). Each names the substance, the temperature and the range.
 */
export function cpWarnings(sub: Substance, ...temperatures: number[]): string[] {
  const { Tmin, Tmax } = sub.cp;
  const out: string[] = [];
  for (const T of temperatures) {
    const cls = cpRangeClass(Tmin, Tmax, T);
    if (cls === "far") out.push(`${cpRangeText(sub.name, Tmin, Tmax, cls)} (T = ${num(T)} K)`);
    else if (cls) out.push(`ideal-gas Cp of ${sub.name} extrapolated at T = ${num(T)} K (correlation fitted for ${num(Tmin)} to ${num(Tmax)} K)`);
  }
  return out;
}
