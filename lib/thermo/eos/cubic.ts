/**
 * The generic two-parameter cubic equation of state, one form for the whole family:
 *
 *   P = RT/(V - b) - a(T) / ((V + eps b)(V + sig b))
 *
 * with a_i(T) = OmegaA alpha(Tr, omega) (R Tc)^2/Pc and b_i = OmegaB R Tc/Pc per component, and van der
 * Waals one-fluid mixing: a = sum_i sum_j x_i x_j sqrt(a_i a_j)(1 - k_ij), b = sum_i x_i b_i.
 * Method and closed forms: Smith, Van Ness & Abbott, Introduction to Chemical Engineering
 * Thermodynamics, 7th ed., section 3.6 (generic cubic), eqs. 6.66-6.68 (residual H, S, ln phi) and
 * 14.x (component ln phi with one-fluid mixing) (from memory; the algebra is re-derived in the comments).
 * Volume roots: the cubic in Z solved by lib/numerics cubicRoots, each root polished by Newton on the
 * polynomial, roots with Z <= B (V <= b) discarded as unphysical.
 * Units: SI (K, Pa, m^3/mol, J/mol, J/(mol K)). Valid for T > 0, P > 0; accuracy is that of the model.
 */
import { cubicRoots, polishCubicRoot } from "../../numerics/index.js";
import { R } from "../constants.js";
import { ThermoError, requirePositive } from "../errors.js";
import { kelvin, volumeText } from "../format.js";
import { validateFluid } from "./fluid.js";
import type { EosModel, Fluid, Residual } from "./types.js";

/** The constants that make one member of the cubic family. */
export interface CubicParameters {
  id: string;
  label: string;
  source: string;
  eps: number;
  sig: number;
  OmegaA: number;
  OmegaB: number;
  /** Critical compressibility factor implied by eps, sig, OmegaB (checked by the tests). */
  Zc: number;
  /** alpha(Tr) for a component of acentric factor omega, and d alpha / d Tr. */
  alpha(Tr: number, omega: number): number;
  dAlphaDTr(Tr: number, omega: number): number;
}

/** An EosModel of the cubic family; also exposes its parameters and a composition-changing copy. */
export interface CubicModel extends EosModel {
  readonly parameters: CubicParameters;
  pressure(T: number, V: number): number;
  /** Mixture a(T), da/dT (J m^3/mol^2, per K) and b (m^3/mol). */
  mixture(T: number): { a: number; dadT: number; b: number };
  /** The same model and components at other mole fractions (used by the numerical component route). */
  atComposition(x: readonly number[]): CubicModel;
  /** Co-volume b (m^3/mol): the model has no states at V <= b (P -> infinity as V -> b). */
  coVolume(): number;
}

/** Builds a cubic model of the given family member for a fluid (pure = one component, x = [1]). */
export function cubicModel(parameters: CubicParameters, fluid: Fluid, options: { validate?: boolean } = {}): CubicModel {
  // atComposition skips validation: the numerical component route perturbs x slightly (possibly below 0),
  // which the mixing rule (a polynomial in x) handles exactly.
  if (options.validate !== false) validateFluid(fluid);
  const comps = fluid.components;
  const n = comps.length;
  const x = fluid.x;
  const { eps, sig, OmegaA, OmegaB } = parameters;
  const ac = comps.map((c) => (OmegaA * (R * c.Tc) ** 2) / c.Pc);
  const bi = comps.map((c) => (OmegaB * R * c.Tc) / c.Pc);
  const kij = (i: number, j: number) => fluid.kij?.[i]?.[j] ?? 0;
  let bmix = 0;
  for (let i = 0; i < n; i++) bmix += x[i]! * bi[i]!;
  const ai = new Array<number>(n).fill(0);
  const dai = new Array<number>(n).fill(0);

  /** Fills ai, dai at T; returns a, da/dT; `sums` (if given) receives sum_j x_j a_ij for each i. */
  function mix(T: number, sums?: number[]): { a: number; dadT: number; b: number } {
    for (let i = 0; i < n; i++) {
      const c = comps[i]!;
      const Tr = T / c.Tc;
      ai[i] = ac[i]! * parameters.alpha(Tr, c.omega);
      dai[i] = (ac[i]! * parameters.dAlphaDTr(Tr, c.omega)) / c.Tc;
    }
    let a = 0;
    let dadT = 0;
    for (let i = 0; i < n; i++) {
      let s = 0;
      for (let j = 0; j < n; j++) {
        const k = 1 - kij(i, j);
        const rt = Math.sqrt(ai[i]! * ai[j]!);
        const aij = k * rt;
        // d sqrt(ai aj)/dT = (ai' aj + ai aj') / (2 sqrt(ai aj))
        const daij = rt > 0 ? (k * (dai[i]! * ai[j]! + ai[i]! * dai[j]!)) / (2 * rt) : 0;
        s += x[j]! * aij;
        dadT += x[i]! * x[j]! * daij;
      }
      a += x[i]! * s;
      if (sums) sums[i] = s;
    }
    return { a, dadT, b: bmix };
  }

  /** I = integral of the attractive term: ln((Z + sig B)/(Z + eps B))/(sig - eps), or B/(Z + eps B) if sig = eps. */
  function integralI(Z: number, B: number): number {
    return sig === eps ? B / (Z + eps * B) : Math.log((Z + sig * B) / (Z + eps * B)) / (sig - eps);
  }

  const model: CubicModel = {
    id: parameters.id,
    label: parameters.label,
    source: parameters.source,
    fluid,
    parameters,
    mixture: (T) => mix(T),
    atComposition: (xNew) => cubicModel(parameters, { ...fluid, x: [...xNew] }, { validate: false }),

    coVolume: () => bmix,

    pressure(T: number, V: number): number {
      if (!(V > bmix)) throw coVolumeError(parameters, fluid, T, V, bmix);
      const { a, b } = mix(T);
      return (R * T) / (V - b) - a / ((V + eps * b) * (V + sig * b));
    },

    volumes(T: number, P: number): number[] {
      requirePositive("T", T, "K");
      requirePositive("P", P, "Pa");
      const { a, b } = mix(T);
      const RT = R * T;
      const A = (a * P) / (RT * RT);
      const B = (b * P) / RT;
      // Z^3 + c2 Z^2 + c1 Z + c0 = 0, from (Z-B)(Z+eps B)(Z+sig B) = (Z+eps B)(Z+sig B) - A (Z-B).
      const S = eps + sig;
      const Pm = eps * sig;
      const c2 = (S - 1) * B - 1;
      const c1 = A + Pm * B * B - S * B * (B + 1);
      const c0 = -(Pm * B * B * (B + 1) + A * B);
      const out: number[] = [];
      for (const z0 of cubicRoots(c2, c1, c0)) {
        // Newton polish (up to 3 steps), each step kept only if it lowers |f|: near a double or triple
        // root f' -> 0 and a raw step on rounding noise could throw the root far away.
        const z = polishCubicRoot(z0, c2, c1, c0, 3);
        if (z > B && Number.isFinite(z)) out.push((z * RT) / P);
      }
      out.sort((p, q) => p - q);
      // A double root may come back twice after polishing: keep one.
      return out.filter((v, i) => i === 0 || v - out[i - 1]! > 1e-12 * v);
    },

    residual(T: number, P: number, V: number): Residual {
      requirePositive("T", T, "K");
      requirePositive("P", P, "Pa");
      const sums = new Array<number>(n).fill(0);
      const { a, dadT, b } = mix(T, sums);
      if (!(V > b)) throw coVolumeError(parameters, fluid, T, V, b);
      const RT = R * T;
      const Z = (P * V) / RT;
      const B = (b * P) / RT;
      const I = integralI(Z, B);
      const lnZB = Math.log(Z - B);
      // H^R/RT = Z - 1 + (T da/dT - a)/(b R T) I;  S^R/R = ln(Z - B) + (da/dT)/(b R) I.
      const HR = RT * (Z - 1) + ((T * dadT - a) / b) * I;
      const SR = R * lnZB + (dadT / b) * I;
      const GR = HR - T * SR;
      const UR = HR - RT * (Z - 1);
      const AR = UR - T * SR;
      const q = a / (b * RT);
      const lnphiComponents = new Array<number>(n);
      for (let i = 0; i < n; i++) {
        // ln phi_i = (b_i/b)(Z-1) - ln(Z-B) - q I (2 sum_j x_j a_ij / a - b_i/b)
        const br = bi[i]! / b;
        const abar = a > 0 ? (2 * sums[i]!) / a : 0;
        lnphiComponents[i] = br * (Z - 1) - lnZB - q * I * (abar - br);
      }
      return { Z, HR, SR, UR, GR, AR, lnphi: GR / RT, lnphiComponents };
    },
  };
  return model;
}

/**
 * The error for V <= b: the repulsive term RT/(V - b) diverges at the co-volume, so below it the cubic
 * gives negative or infinite pressures that describe no state (b = OmegaB R Tc/Pc, e.g. Peng-Robinson
 * propane 0.07780 R Tc/Pc = 56.3 cm^3/mol).
 */
function coVolumeError(p: CubicParameters, fluid: Fluid, T: number, V: number, b: number): ThermoError {
  const what = fluid.components.length === 1 ? fluid.components[0]!.name : "this mixture";
  return new ThermoError(
    "V",
    `V = ${volumeText(V)} is not above the co-volume of ${p.label} for ${what} at T = ${kelvin(T)}: the model has no states there; valid range V > b = ${volumeText(b)}`,
  );
}

/** The critical point of a pure-component cubic: Vc = Zc R Tc / Pc (Tc, Pc reproduced exactly). */
export function cubicCriticalVolume(parameters: CubicParameters, Tc: number, Pc: number): number {
  return (parameters.Zc * R * Tc) / Pc;
}
