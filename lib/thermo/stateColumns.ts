/**
 * cubicStateColumns: many (T, P) states of a PURE fluid by a cubic equation of state (vdW, RK, SRK, PR)
 * at once, written straight into Float64Array columns with no object per point. This is the fast path
 * of vectorised state() calls; the answers are those of the general path (state() with selectRoot,
 * cubic.ts residual and heatCapacity) to about 1e-12 relative (tests hold them together on liquid,
 * vapour, two-root and supercritical states), because it evaluates the same formulas in the same order:
 * - a(T), da/dT from the model's alpha function (one-fluid rule with one component: a = (1 - k11) a1);
 * - the cubic in Z from cubic.ts, physical roots by eos/cubicZ.ts; "stable" = lowest Gibbs energy
 *   (lowest ln phi), "liquid"/"vapor" = smallest/largest physical root; flags and phase labels by the
 *   rules of eos/phase.ts (supercritical, nearCritical, metastable, twoPhase, multipleRoots);
 * - H^R, S^R, U^R, G^R, A^R, ln phi by the closed forms of cubic.ts (Smith, Van Ness & Abbott, 7th ed.,
 *   eqs. 6.66-6.68, from memory);
 * - with ideal-gas functions: totals H = H^ig(T) + H^R, S = S^ig(T, P) + S^R, U = H - PV, G = H - TS,
 *   A = U - TS (the ideal-gas Cp closed-form integrals), and Cp, Cv, w by heatCapacity's analytic cubic
 *   route (a'' by the same central difference, step 1e-5 T).
 * Units: T K, P Pa, V m^3/mol, energies J/mol, entropies and heat capacities J/(mol K), w m/s; M kg/mol.
 * Validity: T > 0, P > 0. A point the general path would reject (no physical root, a requested phase
 * that has no root there, "liquid" at or above Tc) stops the loop: `stoppedAt` is its index, so the caller
 * can ask the general path, which names the error. Accuracy: that of the model.
 */
import { R } from "./constants.js";
import type { CubicModel } from "./eos/cubic.js";
import { physicalZRoots } from "./eos/cubicZ.js";
import { splitVolume, type PhaseRequest } from "./eos/phase.js";
import type { EosModel } from "./eos/types.js";

/** Phase codes of the `phase` column (index into this list). */
export const PHASE_LABELS = ["liquid", "vapor", "gas", "supercritical"] as const;
/** Bits of the `flags` column (names as in StateFlags). */
export const STATE_FLAG_BITS = { supercritical: 1, nearCritical: 2, metastable: 4, twoPhase: 8, multipleRoots: 16 } as const;

/** Ideal-gas closed forms per point: H (J/mol), S (J/(mol K)) against a reference, and Cp (J/(mol K)). */
export interface ColumnIdealGas {
  H(T: number): number;
  S(T: number, P: number): number;
  Cp(T: number): number;
}

export interface ColumnOptions {
  phase?: PhaseRequest;
  idealGas?: ColumnIdealGas;
  /** Molar mass, kg/mol, for the speed of sound (w is NaN without it). */
  M?: number;
  /** Polled every 1024 points; when it returns true the loop stops (interrupted = true). */
  shouldStop?: () => boolean;
}

export interface StateColumns {
  n: number;
  /** Index of the first point not evaluated (see the file comment); -1 when every point was. */
  stoppedAt: number;
  interrupted: boolean;
  V: Float64Array; Z: Float64Array; HR: Float64Array; SR: Float64Array; UR: Float64Array;
  GR: Float64Array; AR: Float64Array; lnphi: Float64Array;
  /** Index into PHASE_LABELS. */
  phase: Uint8Array;
  /** STATE_FLAG_BITS. */
  flags: Uint8Array;
  /** Present when ideal-gas functions were given. */
  totals?: { H: Float64Array; S: Float64Array; U: Float64Array; G: Float64Array; A: Float64Array; Cp: Float64Array; Cv: Float64Array; w: Float64Array };
}

/** True for a cubic-family model of one component at mole fraction 1 (what the fast path handles). */
export function isPureCubic(model: EosModel): model is CubicModel {
  const m = model as Partial<CubicModel>;
  return m.parameters !== undefined && typeof m.mixture === "function" && model.fluid.components.length === 1 && model.fluid.x[0] === 1;
}

export function cubicStateColumns(model: CubicModel, T: Float64Array | number, P: Float64Array | number, n: number, options: ColumnOptions = {}): StateColumns {
  const { eps, sig, OmegaA, OmegaB, alpha, dAlphaDTr } = model.parameters;
  const c = model.fluid.components[0]!;
  const { Tc, Pc, omega } = c;
  const k11 = 1 - (model.fluid.kij?.[0]?.[0] ?? 0);
  const ac = (OmegaA * (R * Tc) ** 2) / Pc;
  const b = (OmegaB * R * Tc) / Pc;
  const Vsplit = splitVolume(model);
  const phaseReq = options.phase ?? "stable";
  const ig = options.idealGas;
  const M = options.M;
  const S = eps + sig;
  const Pm = eps * sig;
  const f64 = () => new Float64Array(n);
  const out: StateColumns = {
    n, stoppedAt: -1, interrupted: false,
    V: f64(), Z: f64(), HR: f64(), SR: f64(), UR: f64(), GR: f64(), AR: f64(), lnphi: f64(),
    phase: new Uint8Array(n), flags: new Uint8Array(n),
  };
  const tot = ig ? { H: f64(), S: f64(), U: f64(), G: f64(), A: f64(), Cp: f64(), Cv: f64(), w: f64() } : undefined;
  if (tot) out.totals = tot;
  const roots = new Float64Array(3);
  // Residual of one root (cubic.ts residual, same operation order): [Z, HR, SR, UR, GR, AR, lnphi].
  const rl = new Float64Array(7);
  const rv = new Float64Array(7);
  let a = 0;
  let dadT = 0;
  // a(T) and da/dT of the one-fluid rule with one component (cubic.ts mix with x = [1]).
  const mixAt = (t: number): void => {
    const Tr = t / Tc;
    const ai = ac * alpha(Tr, omega);
    const dai = (ac * dAlphaDTr(Tr, omega)) / Tc;
    const rt = Math.sqrt(ai * ai);
    a = k11 * rt;
    dadT = rt > 0 ? (k11 * (dai * ai + ai * dai)) / (2 * rt) : 0;
  };
  const residual = (t: number, p: number, V: number, r: Float64Array): void => {
    const RT = R * t;
    const Z = (p * V) / RT;
    const B = (b * p) / RT;
    const I = sig === eps ? B / (Z + eps * B) : Math.log((Z + sig * B) / (Z + eps * B)) / (sig - eps);
    const lnZB = Math.log(Z - B);
    const HR = RT * (Z - 1) + ((t * dadT - a) / b) * I;
    const SR = R * lnZB + (dadT / b) * I;
    const GR = HR - t * SR;
    const UR = HR - RT * (Z - 1);
    r[0] = Z; r[1] = HR; r[2] = SR; r[3] = UR; r[4] = GR; r[5] = UR - t * SR; r[6] = GR / RT;
  };

  for (let i = 0; i < n; i++) {
    if ((i & 1023) === 0 && i > 0 && options.shouldStop?.()) {
      out.stoppedAt = i;
      out.interrupted = true;
      return out;
    }
    const t = typeof T === "number" ? T : T[i]!;
    const p = typeof P === "number" ? P : P[i]!;
    if (!(t > 0) || !(p > 0) || !Number.isFinite(t) || !Number.isFinite(p)) return stop(out, i);
    mixAt(t);
    const RT = R * t;
    const A = (a * p) / (RT * RT);
    const B = (b * p) / RT;
    const c2 = (S - 1) * B - 1;
    const c1 = A + Pm * B * B - S * B * (B + 1);
    const c0 = -(Pm * B * B * (B + 1) + A * B);
    const nr = physicalZRoots(c2, c1, c0, B, roots);
    if (nr === 0) return stop(out, i);
    const above = t >= Tc;
    if (phaseReq === "liquid" && above) return stop(out, i);
    const VL = (roots[0]! * RT) / p;
    const VV = (roots[nr - 1]! * RT) / p;
    const multiple = nr > 1;
    if (!(VL > b)) return stop(out, i);
    residual(t, p, VL, rl);
    if (multiple) residual(t, p, VV, rv);
    else rv.set(rl);
    let liquidChosen: boolean;
    if (phaseReq === "liquid") {
      if (!multiple && VL >= Vsplit && Vsplit > 0) return stop(out, i);
      liquidChosen = true;
    } else if (phaseReq === "vapor") {
      if (!multiple && !above && VL < Vsplit) return stop(out, i);
      liquidChosen = false; // with one root, rv is rl
    } else liquidChosen = rl[6]! <= rv[6]!;
    const r = liquidChosen ? rl : rv;
    const V = liquidChosen ? VL : VV;
    const dG = rl[6]! - rv[6]!;
    let flags = 0;
    if (t > Tc && p > Pc) flags |= STATE_FLAG_BITS.supercritical;
    if (Math.abs(t / Tc - 1) < 0.03 && Math.abs(p / Pc - 1) < 0.1) flags |= STATE_FLAG_BITS.nearCritical;
    if (multiple && ((liquidChosen && dG > 1e-9) || (!liquidChosen && dG < -1e-9))) flags |= STATE_FLAG_BITS.metastable;
    if (multiple && Math.abs(dG) <= 1e-9) flags |= STATE_FLAG_BITS.twoPhase;
    if (multiple) flags |= STATE_FLAG_BITS.multipleRoots;
    out.flags[i] = flags;
    out.phase[i] = above ? (p > Pc ? 3 : 2) : multiple ? (liquidChosen ? 0 : 1) : V < Vsplit ? 0 : 1;
    out.V[i] = V;
    out.Z[i] = r[0]!; out.HR[i] = r[1]!; out.SR[i] = r[2]!; out.UR[i] = r[3]!;
    out.GR[i] = r[4]!; out.AR[i] = r[5]!; out.lnphi[i] = r[6]!;
    if (!tot || !ig) continue;
    const H = ig.H(t) + r[1]!;
    const St = ig.S(t, p) + r[2]!;
    const U = H - p * V;
    tot.H[i] = H; tot.S[i] = St; tot.U[i] = U; tot.G[i] = H - t * St; tot.A[i] = U - t * St;
    heatCapacities(i, t, V, ig.Cp(t));
  }
  return out;

  // heatCapacity.ts, cubic route: Cv = Cp_ig - R + T a'' I(V), Cp = Cv - T (dP/dT)_V^2 / (dP/dV)_T,
  // w^2 = -(V^2/M)(Cp/Cv)(dP/dV)_T; NaN unless the root is mechanically stable.
  function heatCapacities(i: number, t: number, V: number, CpIdeal: number): void {
    const h = 1e-5 * t;
    const a0 = a;
    const da0 = dadT;
    mixAt(t + h);
    const up = dadT;
    mixAt(t - h);
    const down = dadT;
    a = a0;
    dadT = da0;
    const d2a = (up - down) / (2 * h);
    const Ve = V + eps * b;
    const Vs = V + sig * b;
    const I = eps === sig ? 1 / Ve : Math.log(Vs / Ve) / (b * (sig - eps));
    const dPdT = R / (V - b) - dadT / (Ve * Vs);
    const dPdV = -(R * t) / ((V - b) * (V - b)) + (a * (Ve + Vs)) / (Ve * Ve * Vs * Vs);
    const Cv = CpIdeal - R + t * d2a * I;
    const Cp = Cv - (t * dPdT * dPdT) / dPdV;
    const stable = dPdV < 0 && Cv > 0 && Cp > 0;
    tot!.Cp[i] = stable ? Cp : NaN;
    tot!.Cv[i] = stable ? Cv : NaN;
    tot!.w[i] = stable && M !== undefined && M > 0 ? Math.sqrt((-(V * V) / M) * (Cp / Cv) * dPdV) : NaN;
  }
}

function stop(out: StateColumns, i: number): StateColumns {
  out.stoppedAt = i;
  return out;
}
