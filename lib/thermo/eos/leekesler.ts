/**
 * Lee-Kesler generalized correlation as an EosModel (id "lk").
 *
 * Method: three-parameter corresponding states. For each property X in {Z, HR/(R Tc), SR/R, ln phi}
 *   X = X0 + (omega / omega_r) (X_r - X0)
 * where X0 and X_r come from the modified BWR equation of the simple and reference (n-octane,
 * omega_r = 0.3978) fluids at the same Tr, Pr (see leekeslerFluid.ts). Source: Lee & Kesler, AIChE J.
 * 21 (1975) 510 (from memory). It is not pressure-explicit in V, so it has no pressure(T, V); the
 * "V" of a root is Z R T / P.
 * Mixtures: pseudo-critical constants by the Lee-Kesler-Ploecker rules (Ploecker, Knapp & Prausnitz,
 * Ind. Eng. Chem. Process Des. Dev. 17 (1978) 324, from memory), the default:
 *   Vci = (0.2905 - 0.085 omega_i) R Tci / Pci,  Vcij = (Vci^(1/3) + Vcj^(1/3))^3 / 8,
 *   Tcij = sqrt(Tci Tcj),  Vcm = sum sum x_i x_j Vcij,  Tcm = sum sum x_i x_j Vcij^0.25 Tcij / Vcm^0.25,
 *   omega_m = sum x_i omega_i,  Pcm = (0.2905 - 0.085 omega_m) R Tcm / Vcm;
 * or Kay's rule (mole-fraction averages of Tc, Pc, omega) on request. The fluid's kij (cubic binary
 * parameters) are not used. Component ln phi_i = d(n ln phi)/dn_i by central differences in the mole
 * numbers at constant T, P on the same (liquid or vapour) branch: about 1e-7 absolute.
 * Validity: 0.3 <= Tr <= 4 and Pr <= 10 (range of the published tables); outside, `validity` warns.
 * Accuracy: Z within about 1-2 % for non-polar and slightly polar fluids away from the critical point;
 * poor for strongly polar or associating fluids and quantum gases.
 * Cost: two root solves (lkRoots) per (T, P), shared by volumes() and residual() through a per-model
 * memo; about 10 us per pure-fluid state by selectRoot, 30-50 us for a binary (component ln phi), see
 * bench/thermo.ts leeKeslerStateTime.
 */
import { R } from "../constants.js";
import { ThermoError, requirePositive } from "../errors.js";
import { LK_OMEGA_REFERENCE, LK_REFERENCE, LK_SIMPLE, lkProperties, lkRoots } from "./leekeslerFluid.js";
import type { EosModel, Fluid, Residual } from "./types.js";

export type LeeKeslerMixing = "ploecker" | "kay";

export interface PseudoCritical {
  Tc: number;
  Pc: number;
  omega: number;
}

/** Pseudo-critical constants of a composition by the chosen mixing rule (pure fluid: its own constants). */
export function lkPseudoCritical(fluid: Fluid, x: readonly number[], mixing: LeeKeslerMixing): PseudoCritical {
  const comps = fluid.components;
  if (comps.length === 1) return { Tc: comps[0]!.Tc, Pc: comps[0]!.Pc, omega: comps[0]!.omega };
  let omega = 0;
  comps.forEach((c, i) => (omega += x[i]! * c.omega));
  if (mixing === "kay") {
    let Tc = 0;
    let Pc = 0;
    comps.forEach((c, i) => {
      Tc += x[i]! * c.Tc;
      Pc += x[i]! * c.Pc;
    });
    return { Tc, Pc, omega };
  }
  const cbrtV = comps.map((c) => Math.cbrt(((0.2905 - 0.085 * c.omega) * R * c.Tc) / c.Pc));
  let Vcm = 0;
  let sumT = 0;
  for (let i = 0; i < comps.length; i++) {
    for (let j = 0; j < comps.length; j++) {
      const Vcij = (cbrtV[i]! + cbrtV[j]!) ** 3 / 8;
      const w = x[i]! * x[j]!;
      Vcm += w * Vcij;
      sumT += w * Vcij ** 0.25 * Math.sqrt(comps[i]!.Tc * comps[j]!.Tc);
    }
  }
  const Tc = sumT / Vcm ** 0.25;
  return { Tc, Pc: ((0.2905 - 0.085 * omega) * R * Tc) / Vcm, omega };
}

type Branch = "liquid" | "vapor";

interface BranchState {
  Z: number;
  HRdRTc: number;
  SRdR: number;
  lnphi: number;
}

export interface LeeKeslerModel extends EosModel {
  readonly mixing: LeeKeslerMixing;
  /** Pseudo-critical constants used for the fluid's composition. */
  readonly pseudoCritical: PseudoCritical;
  /** Warnings for states outside the tabulated range (empty when inside). */
  validity(T: number, P: number): string[];
}

/** Interpolated properties on each available branch at (Tr, Pr). */
function branches(pc: PseudoCritical, Tr: number, Pr: number): Map<Branch, BranchState> {
  const r0 = lkRoots(LK_SIMPLE, Tr, Pr);
  const rr = lkRoots(LK_REFERENCE, Tr, Pr);
  if (r0.length === 0 || rr.length === 0) {
    throw new ThermoError("P", `Lee-Kesler equation has no root at Tr = ${Tr.toPrecision(4)}, Pr = ${Pr.toPrecision(4)}`);
  }
  const w = pc.omega / LK_OMEGA_REFERENCE;
  const at = (v0: number, vr: number): BranchState => {
    const a = lkProperties(LK_SIMPLE, Tr, v0);
    const b = lkProperties(LK_REFERENCE, Tr, vr);
    return {
      Z: a.Z + w * (b.Z - a.Z),
      HRdRTc: a.HRdRTc + w * (b.HRdRTc - a.HRdRTc),
      SRdR: a.SRdR + w * (b.SRdR - a.SRdR),
      lnphi: a.lnphi + w * (b.lnphi - a.lnphi),
    };
  };
  const out = new Map<Branch, BranchState>();
  out.set("vapor", at(r0[r0.length - 1]!, rr[rr.length - 1]!));
  if (r0.length > 1 || rr.length > 1) out.set("liquid", at(r0[0]!, rr[0]!));
  for (const [k, s] of out) if (!(s.Z > 0)) out.delete(k);
  return out;
}

/**
 * branches() with a memo of the last few (pseudo-critical constants, T, P): one state asks for the same
 * branches from volumes() and from residual() of each root, and a mixture's component ln phi asks for
 * the same shifted compositions on both roots. Results are pure functions of the key, so a hit returns
 * exactly what a fresh call would. One memo per model (no shared state); callers must not mutate the Map.
 */
function branchMemo(size = 8): (pc: PseudoCritical, T: number, P: number) => Map<Branch, BranchState> {
  const keys = new Float64Array(5 * size).fill(NaN);
  const values: (Map<Branch, BranchState> | undefined)[] = new Array(size);
  let next = 0;
  return (pc, T, P) => {
    for (let i = 0; i < size; i++) {
      const o = 5 * i;
      if (keys[o] === T && keys[o + 1] === P && keys[o + 2] === pc.Tc && keys[o + 3] === pc.Pc && keys[o + 4] === pc.omega) {
        return values[i]!;
      }
    }
    const out = branches(pc, T / pc.Tc, P / pc.Pc);
    const o = 5 * next;
    keys[o] = T;
    keys[o + 1] = P;
    keys[o + 2] = pc.Tc;
    keys[o + 3] = pc.Pc;
    keys[o + 4] = pc.omega;
    values[next] = out;
    next = (next + 1) % size;
    return out;
  };
}

/** Lee-Kesler model of a pure fluid or mixture; `mixing` picks the pseudo-critical rule. */
export function leeKesler(fluid: Fluid, mixing: LeeKeslerMixing = "ploecker"): LeeKeslerModel {
  if (fluid.components.length === 0) throw new ThermoError("fluid", "Lee-Kesler needs at least one component");
  if (fluid.x.length !== fluid.components.length) {
    throw new ThermoError("x", `need one mole fraction per component (${fluid.components.length}); got ${fluid.x.length}`);
  }
  if (mixing !== "ploecker" && mixing !== "kay") {
    throw new ThermoError("mixing", `Lee-Kesler mixing must be "ploecker" or "kay"; got "${String(mixing)}"`);
  }
  const pc = lkPseudoCritical(fluid, fluid.x, mixing);
  const n = fluid.components.length;
  const memo = branchMemo();

  const branchOf = (T: number, P: number, V: number): Branch => {
    const all = memo(pc, T, P);
    let best: Branch = "vapor";
    let err = Infinity;
    for (const [k, s] of all) {
      const e = Math.abs((s.Z * R * T) / P - V);
      if (e < err) {
        err = e;
        best = k;
      }
    }
    return best;
  };

  const lnphiAt = (x: readonly number[], T: number, P: number, branch: Branch): number => {
    const p = lkPseudoCritical(fluid, x, mixing);
    const all = memo(p, T, P);
    const s = all.get(branch) ?? all.get("vapor")!;
    return s.lnphi;
  };

  return {
    id: "lk",
    label: `Lee-Kesler (1975)${n > 1 ? (mixing === "kay" ? ", Kay's rule pseudo-criticals" : ", Lee-Kesler-Ploecker mixing") : ""}`,
    source: "Lee & Kesler, AIChE J. 21 (1975) 510; mixtures: Ploecker, Knapp & Prausnitz, Ind. Eng. Chem. Process Des. Dev. 17 (1978) 324",
    fluid,
    mixing,
    pseudoCritical: pc,

    volumes(T: number, P: number): number[] {
      requirePositive("T", T, "K");
      requirePositive("P", P, "Pa");
      const vs = [...memo(pc, T, P).values()].map((s) => (s.Z * R * T) / P);
      vs.sort((a, b) => a - b);
      return vs.filter((v, i) => i === 0 || Math.abs(v - vs[i - 1]!) > 1e-12 * v);
    },

    residual(T: number, P: number, V: number): Residual {
      requirePositive("T", T, "K");
      requirePositive("P", P, "Pa");
      requirePositive("V", V, "m^3/mol");
      const branch = branchOf(T, P, V);
      const s = memo(pc, T, P).get(branch)!;
      const HR = s.HRdRTc * R * pc.Tc;
      const SR = s.SRdR * R;
      const GR = HR - T * SR;
      const UR = HR - R * T * (s.Z - 1);
      const AR = GR - R * T * (s.Z - 1);
      let lnphiComponents: number[];
      if (n === 1) lnphiComponents = [s.lnphi];
      else {
        // d(n lnphi)/dn_i at constant T, P and the other n_j, from mole numbers n = x (total 1).
        const h = 1e-5;
        lnphiComponents = fluid.x.map((_, i) => {
          const shifted = (d: number) => {
            const nn = fluid.x.map((xj, j) => (j === i ? xj + d : xj));
            const tot = 1 + d;
            return tot * lnphiAt(nn.map((v) => v / tot), T, P, branch);
          };
          // Central difference, or forward where a fraction is too small to step down.
          const back = fluid.x[i]! > h ? h : 0;
          return (shifted(h) - shifted(-back)) / (h + back);
        });
      }
      return { Z: s.Z, HR, SR, UR, GR, AR, lnphi: s.lnphi, lnphiComponents };
    },

    validity(T: number, P: number): string[] {
      const Tr = T / pc.Tc;
      const Pr = P / pc.Pc;
      const out: string[] = [];
      if (Tr < 0.3 || Tr > 4) out.push(`Lee-Kesler used at Tr = ${Tr.toPrecision(3)}, outside its tabulated range 0.3 to 4`);
      if (Pr > 10) out.push(`Lee-Kesler used at Pr = ${Pr.toPrecision(3)}, above its tabulated range (Pr <= 10)`);
      if (Math.abs(Tr - 1) < 0.03 && Math.abs(Pr - 1) < 0.1) out.push("near the (pseudo-)critical point: properties change steeply");
      return out;
    },
  };
}
