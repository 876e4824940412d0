/**
 * The generic numerical route to residual properties, using only P(T, V) of a pressure-explicit model.
 *
 * Sign conventions. "(T,V)" residuals compare with the ideal gas at the same T and V; the results
 * returned compare with the ideal gas at the same T and P (as the closed forms do). With rho = 1/V and
 * the residual pressure P^r = P - RT rho (which vanishes like rho^2 as rho -> 0):
 *   A^R(T,V) = integral_V^inf [P - RT/V'] dV'          = integral_0^rho P^r / rho'^2 drho'
 *   S^R(T,V) = -(dA^R/dT)_V = integral_V^inf [R/V' - (dP/dT)_V] dV'
 *                                                       = -integral_0^rho (dP^r/dT)_V / rho'^2 drho'
 *   U^R      = A^R + T S^R = integral_inf^V [T (dP/dT)_V - P] dV'   (same at fixed T,V or T,P)
 * then, at P = P(T, V) and Z = PV/RT (the ideal gas at T, P has volume V Z):
 *   A^R = A^R(T,V) - RT ln Z,  S^R = S^R(T,V) + R ln Z,  H^R = U^R + RT (Z - 1),  G^R = H^R - T S^R,
 *   ln phi = G^R / RT.
 * Component ln phi_i (mixtures, models with atComposition) = integral_0^rho [(1/RT)(dP^r/dn_i)_{T,Vt,n_j}]
 * / rho'^2 drho' - ln Z, with dP^r/dn_i taken numerically at total volume Vt = 1/rho' for n = x.
 * The substitution V -> rho makes the range finite and the integrands smooth (they tend to the second
 * virial coefficient terms at rho = 0). Derivatives: lib/numerics derivative (Richardson-extrapolated
 * central differences); quadrature: lib/numerics integrate (adaptive Gauss-Kronrod).
 * Accuracy: agrees with the closed forms to ~1e-10 relative at the default tolerances (tests: 1e-8).
 * Units: T K, V m^3/mol; energies J/mol, entropies J/(mol K).
 */
import { derivative, integrate } from "../../numerics/index.js";
import { R } from "../constants.js";
import { ThermoError, requirePositive } from "../errors.js";
import { kelvin, pressureText, volumeText } from "../format.js";
import type { EosModel, Residual } from "../eos/types.js";

export interface MaxwellOptions {
  /** Relative tolerance of each quadrature (default 1e-10). */
  rel?: number;
  /** Poll for interruption. */
  shouldStop?: () => boolean;
}

export interface MaxwellResidual extends Residual {
  /** The pressure P(T, V) the residuals refer to, Pa. */
  P: number;
  /** Total function evaluations of P(T, V) used (cost of the route). */
  evaluations: number;
  /** Quadrature error estimates of A^R(T,V) (J/mol) and S^R(T,V) (J/(mol K)). */
  errors: { AR: number; SR: number };
}

/** Pressure-explicit model check shared by the numerical routes. */
export function requirePressure(model: EosModel): (T: number, V: number) => number {
  if (typeof model.pressure !== "function") {
    throw new ThermoError("model", `${model.label} has no pressure(T, V) function; the numerical Maxwell route needs a pressure-explicit model`);
  }
  return model.pressure.bind(model);
}

/** Residual properties at (T, V) by integrating the Maxwell relations from V = infinity. */
export function maxwellResidual(model: EosModel, T: number, V: number, options: MaxwellOptions = {}): MaxwellResidual {
  requirePositive("T", T, "K");
  requirePositive("V", V, "m^3/mol");
  const pressure = requirePressure(model);
  const rel = options.rel ?? 1e-10;
  // No end-point smoothing: the integrands are smooth on [0, rho] (they tend to second-virial terms).
  // Absolute floors (1e-11 RT, 1e-11 R) let exactly-zero integrals (ideal gas) terminate; the numerical
  // temperature derivative carries ~1e-12 relative noise, so rel much below 1e-11 cannot be met.
  const quad = { rel, abs: 1e-11 * R * T, maxEval: 200_000, smooth: false, shouldStop: options.shouldStop };
  let evaluations = 0;
  const Pr = (t: number, rho: number) => {
    evaluations++;
    return pressure(t, 1 / rho) - R * t * rho;
  };
  const P = pressure(T, V);
  if (!Number.isFinite(P) || P <= 0) {
    throw new ThermoError("V", `${model.label}: P(T = ${kelvin(T)}, V = ${volumeText(V)}) = ${pressureText(P)} is not a positive pressure`);
  }
  const rho = 1 / V;
  // Below rCut the integrand is held at its value at rCut: P^r = P - RT rho loses digits to cancellation
  // as rho -> 0 (noise ~ eps RT / rho after dividing by rho^2), while the integrand itself is flat there;
  // the approximation costs < 1e-10 relative (rCut^2/2 times a slope of order integrand / rho_liquid).
  const rCut = 1e-5 * rho;
  const a = integrate((r) => { const q = Math.max(r, rCut); return Pr(T, q) / (q * q); }, 0, rho, quad);
  const s = integrate((r) => { const q = Math.max(r, rCut); return -derivative((t) => Pr(t, q), T).value / (q * q); }, 0, rho, { ...quad, abs: 1e-11 * R });
  const RT = R * T;
  const Z = (P * V) / RT;
  const lnZ = Math.log(Z);
  const UR = a.value + T * s.value;
  const SR = s.value + R * lnZ;
  const AR = a.value - RT * lnZ;
  const HR = UR + RT * (Z - 1);
  const GR = HR - T * SR;
  const lnphi = GR / RT;
  const lnphiComponents = componentLnphi(model, T, rho, lnZ, lnphi, quad, () => evaluations++);
  return { Z, HR, SR, UR, GR, AR, lnphi, lnphiComponents, P, evaluations, errors: { AR: a.error, SR: s.error } };
}

type Composable = EosModel & { atComposition(x: readonly number[]): EosModel };

function componentLnphi(
  model: EosModel,
  T: number,
  rho: number,
  lnZ: number,
  lnphi: number,
  quad: { rel: number; abs: number; maxEval: number; smooth: boolean; shouldStop?: () => boolean },
  count: () => void,
): number[] {
  const x = model.fluid.x;
  if (x.length === 1) return [lnphi];
  const at = (model as Partial<Composable>).atComposition;
  if (typeof at !== "function") {
    throw new ThermoError("model", `${model.label}: component fugacities by the numerical route need a model that can change composition`);
  }
  const RT = R * T;
  return x.map((_, i) => {
    // n = x (1 mol in total); add h mol of component i at fixed total volume Vt = 1/r.
    const Prn = (h: number, r: number) => {
      count();
      const N = 1 + h;
      const xh = x.map((xj, j) => (xj + (j === i ? h : 0)) / N);
      const m = at.call(model, xh);
      return m.pressure!(T, 1 / (r * N)) - (RT * N * r);
    };
    const rCut = 1e-5 * rho;
    const g = (r: number) => { const q = Math.max(r, rCut); return derivative((h) => Prn(h, q), 0, { h: 1e-3 }).value / (RT * q * q); };
    const value = integrate(g, 0, rho, { ...quad, abs: 1e-11 }).value;
    return value - lnZ;
  });
}
