/**
 * heatCapacity(model, T, P, V, CpIdeal, M): real-fluid Cp, Cv and speed of sound at one root (T, P, V)
 * of any EosModel, from the model's own P-V-T behaviour plus the ideal-gas Cp.
 *
 * Method (exact thermodynamic identities; derivatives by central differences):
 * - Cubic models (vdW, RK, SRK, PR), analytically from a(T), b of the generic form
 *   P = RT/(V-b) - a/((V+eps b)(V+sig b)):  Cv^R = T a''(T) I(V), I = ln((V+sig b)/(V+eps b))/(b(sig-eps))
 *   (I = 1/(V+eps b) when eps = sig), with a'' by a central difference of the model's da/dT;
 *   (dP/dT)_V and (dP/dV)_T in closed form. About ten times cheaper than the generic route below.
 * - Other pressure-explicit models (virial, ideal gas), at fixed V:
 *     Cv = Cv_ig + (dU^R/dT)_V,  Cv_ig = Cp_ig - R,
 *     Cp = Cv - T (dP/dT)_V^2 / (dP/dV)_T.
 *   U^R(T, V) comes from the model's closed form residual at P(T, V): no root solving, 4 evaluations.
 * - Models without P(T, V) (Lee-Kesler), at fixed P on the same root branch (the root nearest V):
 *     Cp = Cp_ig + (dH^R/dT)_P,  Cv = Cp + T (dV/dT)_P^2 / (dV/dP)_T.
 * - Speed of sound w^2 = (dP/drho)_s = -(V^2/M) (Cp/Cv) (dP/dV)_T, rho = M/V (M in kg/mol).
 * Steps: 1e-5 relative in T, 1e-6 relative in V or P; truncation and round-off each stay near 1e-9
 * relative for smooth models, far below any model's own accuracy.
 * Validity: one-phase states; (dP/dV)_T must be negative (mechanically stable root), otherwise the
 * results are NaN. Two-phase mixtures of liquid and vapour have no finite Cp: callers report NaN.
 * Units: T K, P Pa, V m^3/mol, Cp and Cv J/(mol K), w m/s. Source: the identities are in any
 * chemical-engineering thermodynamics text (e.g. Smith, Van Ness & Abbott, 7th ed., ch. 6, from memory).
 */
import { R } from "../constants.js";
import { requirePositive } from "../errors.js";
import type { CubicModel } from "../eos/cubic.js";
import type { EosModel } from "../eos/types.js";

export interface HeatCapacities {
  /** J/(mol K) */
  Cp: number;
  /** J/(mol K) */
  Cv: number;
  /** Speed of sound, m/s (NaN when M is not given or the root is not mechanically stable). */
  w: number;
  /** (dP/dT)_V, Pa/K */
  dPdT: number;
  /** (dP/dV)_T, Pa mol/m^3 */
  dPdV: number;
}

const HT = 1e-5;
const HV = 1e-6;

/** Nearest root to V at (T, P), so a derivative stays on one branch. */
function nearestRoot(model: EosModel, T: number, P: number, V: number): number {
  const roots = model.volumes(T, P);
  let best = NaN;
  let err = Infinity;
  for (const r of roots) {
    const e = Math.abs(r - V);
    if (e < err) [best, err] = [r, e];
  }
  return best;
}

export function heatCapacity(model: EosModel, T: number, P: number, V: number, CpIdeal: number, M?: number): HeatCapacities {
  requirePositive("T", T, "K");
  requirePositive("P", P, "Pa");
  requirePositive("V", V, "m^3/mol");
  const h = HT * T;
  let Cp: number;
  let Cv: number;
  let dPdT: number;
  let dPdV: number;
  const cubic = model as Partial<CubicModel>;
  if (cubic.parameters && typeof cubic.mixture === "function") {
    const { eps, sig } = cubic.parameters;
    const { a, dadT, b } = cubic.mixture(T);
    const d2a = (cubic.mixture(T + h).dadT - cubic.mixture(T - h).dadT) / (2 * h);
    const Ve = V + eps * b;
    const Vs = V + sig * b;
    const I = eps === sig ? 1 / Ve : Math.log(Vs / Ve) / (b * (sig - eps));
    dPdT = R / (V - b) - dadT / (Ve * Vs);
    dPdV = -(R * T) / ((V - b) * (V - b)) + (a * (Ve + Vs)) / (Ve * Ve * Vs * Vs);
    Cv = CpIdeal - R + T * d2a * I;
    Cp = Cv - (T * dPdT * dPdT) / dPdV;
  } else if (typeof model.pressure === "function") {
    const p = (t: number, v: number) => model.pressure!(t, v);
    const UR = (t: number) => model.residual(t, p(t, V), V).UR;
    dPdT = (p(T + h, V) - p(T - h, V)) / (2 * h);
    const k = HV * V;
    dPdV = (p(T, V + k) - p(T, V - k)) / (2 * k);
    Cv = CpIdeal - R + (UR(T + h) - UR(T - h)) / (2 * h);
    Cp = Cv - (T * dPdT * dPdT) / dPdV;
  } else {
    const branch = (t: number, pp: number) => {
      const v = nearestRoot(model, t, pp, V);
      return { V: v, HR: model.residual(t, pp, v).HR };
    };
    const up = branch(T + h, P);
    const down = branch(T - h, P);
    const k = HV * P;
    const dVdP = (nearestRoot(model, T, P + k, V) - nearestRoot(model, T, P - k, V)) / (2 * k);
    const dVdT = (up.V - down.V) / (2 * h);
    Cp = CpIdeal + (up.HR - down.HR) / (2 * h);
    Cv = Cp + (T * dVdT * dVdT) / dVdP;
    dPdV = 1 / dVdP;
    dPdT = -dVdT / dVdP;
  }
  const stable = dPdV < 0 && Cv > 0 && Cp > 0;
  const w = stable && M !== undefined && M > 0 ? Math.sqrt((-(V * V) / M) * (Cp / Cv) * dPdV) : NaN;
  return stable ? { Cp, Cv, w, dPdT, dPdV } : { Cp: NaN, Cv: NaN, w: NaN, dPdT, dPdV };
}
