/**
 * Root selection and state flags for any EosModel at (T, P).
 *
 * Rules (documented here, used everywhere):
 * - Pseudo-critical point: Kay's rule, Tpc = sum x_i Tc_i, Ppc = sum x_i Pc_i (W. B. Kay, Ind. Eng. Chem.
 *   28, 1014, 1936); for a pure fluid these are Tc and Pc, which a cubic with exact OmegaA/OmegaB reproduces.
 * - "stable" (default) picks the root of lowest Gibbs energy: at one T, P, G_i - G_j = RT (lnphi_i - lnphi_j).
 * - "liquid" / "vapor" pick the smallest / largest physical root. The middle root of three is mechanically
 *   unstable (dP/dV > 0) and never chosen.
 * - supercritical: T > Tpc and P > Ppc. nearCritical: |T/Tpc - 1| < 0.03 and |P/Ppc - 1| < 0.10 (a cubic's
 *   errors grow sharply there and small input changes move results a lot).
 * - metastable: the chosen root has higher G than another root (only possible on request).
 * - twoPhase: liquid and vapour roots with equal G within 1e-9 RT (on the saturation line). For mixtures
 *   this is not a phase-stability test; mixtures are reported single-phase (mixtureSinglePhase flag).
 * - A single root below Tpc is labelled by volume: liquid if V < splitVolume(model) (below),
 *   vapor otherwise; above Tpc it is "supercritical" (P > Ppc) or "gas".
 */
import { R } from "../constants.js";
import { ThermoError } from "../errors.js";
import { kelvin, pressureText } from "../format.js";
import type { EosModel, Residual } from "./types.js";

export type PhaseRequest = "stable" | "liquid" | "vapor";
export type PhaseLabel = "liquid" | "vapor" | "gas" | "supercritical";

export interface StateFlags {
  supercritical: boolean;
  nearCritical: boolean;
  metastable: boolean;
  twoPhase: boolean;
  /** More than one physical root exists at (T, P). */
  multipleRoots: boolean;
  /** Mixture treated as one phase (no phase-split test was made). */
  mixtureSinglePhase: boolean;
}

export interface RootChoice {
  V: number;
  phase: PhaseLabel;
  flags: StateFlags;
  residual: Residual;
  /** Every physical root at (T, P), ascending. */
  roots: number[];
}

/** Kay's-rule pseudo-critical constants of a model's fluid (K, Pa, m^3/mol). */
export function pseudoCritical(model: EosModel): { Tc: number; Pc: number; Vc: number } {
  let Tc = 0;
  let Pc = 0;
  let Vc = 0;
  model.fluid.components.forEach((c, i) => {
    const xi = model.fluid.x[i]!;
    Tc += xi * c.Tc;
    Pc += xi * c.Pc;
    Vc += xi * c.Vc;
  });
  return { Tc, Pc, Vc };
}

/**
 * Volume that separates liquid-like from vapour-like single roots below Tc: the model's own critical
 * volume Zc R Tc/Pc for the cubic family (liquid roots lie below the liquid spinodal, which lies below
 * it), otherwise Kay's-rule Vc of the components.
 */
export function splitVolume(model: EosModel): number {
  const crit = pseudoCritical(model);
  const Zc = (model as { parameters?: { Zc?: number } }).parameters?.Zc;
  return typeof Zc === "number" ? (Zc * R * crit.Tc) / crit.Pc : crit.Vc;
}

const PHASES: readonly string[] = ["stable", "liquid", "vapor"];

/** Checks a phase argument from outside; returns it typed. */
export function checkPhase(phase: unknown): PhaseRequest {
  if (phase === undefined) return "stable";
  if (typeof phase !== "string" || !PHASES.includes(phase)) {
    throw new ThermoError("phase", `phase must be one of "stable", "liquid", "vapor"; got ${JSON.stringify(phase)}`);
  }
  return phase as PhaseRequest;
}

/** Chooses the volume root at (T, P) per the rules above; throws ThermoError for impossible requests. */
export function selectRoot(model: EosModel, T: number, P: number, phase: PhaseRequest = "stable"): RootChoice {
  checkPhase(phase);
  const crit = { ...pseudoCritical(model), Vc: splitVolume(model) };
  const roots = model.volumes(T, P);
  if (roots.length === 0) {
    throw new ThermoError("P", `${model.label}: no physical volume root (V > b) at T = ${kelvin(T)}, P = ${pressureText(P)}`);
  }
  const above = T >= crit.Tc;
  if (phase === "liquid" && above) {
    throw new ThermoError(
      "phase",
      `"liquid" requested at T = ${kelvin(T)}, at or above the critical temperature ${kelvin(crit.Tc)}: no distinct liquid exists; valid: T < ${kelvin(crit.Tc)}, or phase "stable"`,
    );
  }
  const liquid = roots[0]!;
  const vapor = roots[roots.length - 1]!;
  const multipleRoots = roots.length > 1;
  const rl = model.residual(T, P, liquid);
  const rv = multipleRoots ? model.residual(T, P, vapor) : rl;
  let V: number;
  let residual: Residual;
  if (phase === "liquid") {
    if (!multipleRoots && liquid >= crit.Vc && crit.Vc > 0) {
      throw new ThermoError("phase", `"liquid" requested at T = ${kelvin(T)}, P = ${pressureText(P)} but only a vapour-like root exists (P below the liquid spinodal)`);
    }
    [V, residual] = [liquid, rl];
  } else if (phase === "vapor") {
    if (!multipleRoots && !above && liquid < crit.Vc) {
      throw new ThermoError("phase", `"vapor" requested at T = ${kelvin(T)}, P = ${pressureText(P)} but only a liquid-like root exists (P above the vapour spinodal)`);
    }
    [V, residual] = [vapor, rv];
  } else {
    [V, residual] = rl.lnphi <= rv.lnphi ? [liquid, rl] : [vapor, rv];
  }
  const dG = rl.lnphi - rv.lnphi;
  const mixture = model.fluid.components.length > 1;
  const flags: StateFlags = {
    supercritical: T > crit.Tc && P > crit.Pc,
    nearCritical: Math.abs(T / crit.Tc - 1) < 0.03 && Math.abs(P / crit.Pc - 1) < 0.1,
    metastable: multipleRoots && ((V === liquid && dG > 1e-9) || (V === vapor && dG < -1e-9)),
    twoPhase: multipleRoots && !mixture && Math.abs(dG) <= 1e-9,
    multipleRoots,
    mixtureSinglePhase: mixture,
  };
  let label: PhaseLabel;
  if (above) label = P > crit.Pc ? "supercritical" : "gas";
  else if (multipleRoots) label = V === liquid ? "liquid" : "vapor";
  else label = V < crit.Vc ? "liquid" : "vapor";
  return { V, phase: label, flags, residual, roots };
}
