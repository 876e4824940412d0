/**
 * Truncated virial equation Z = 1 + B P/(R T) with a generalized second virial coefficient
 * (virialCorrelations.ts) as an EosModel (id "virial").
 *
 * Pressure-explicit form: P = R T / (V - B), which is Z = 1 + BP/RT solved for P exactly, so the
 * numerical Maxwell route from V = infinity reproduces the closed forms below to quadrature accuracy.
 * Closed forms at (T, P) (SVNA 7th ed. eqs. 6.55-6.56 and 11.64, from memory; exact for this form):
 *   Z = 1 + BP/RT,  HR = P (B - T dB/dT),  SR = -P dB/dT,  GR = B P,  UR = -T P dB/dT,  AR = 0,
 *   ln phi = B P/(R T),  ln phi_i = (P/RT) (2 sum_j x_j B_ij - B),  B = sum_i sum_j x_i x_j B_ij.
 * Validity: gases at low to moderate density. SVNA 7th ed. Fig. 3.14 (from memory): use where
 * Tr > 0.686 + 0.439 Pr, equivalently V/Vc >~ 2; `validity` warns outside. No liquid root exists.
 * Mixtures: the fluid's kij, if given, enter Tcij = sqrt(Tci Tcj)(1 - kij).
 */
import { R } from "../constants.js";
import { ThermoError, requirePositive } from "../errors.js";
import { kelvin, pressureText, volumeText } from "../format.js";
import type { EosModel, Fluid, Residual } from "./types.js";
import { pairB, pairConstants, type PairConstants, type VirialCorrelation } from "./virialCorrelations.js";

export interface VirialModel extends EosModel {
  readonly correlation: VirialCorrelation;
  /** Mixture B and dB/dT at T: m^3/mol and m^3/(mol K). */
  second(T: number): { B: number; dBdT: number };
  /** Warnings for states beyond the truncated virial equation's range (empty when inside). */
  validity(T: number, P: number): string[];
  /** The same model for another composition (used by the numerical route's component fugacities). */
  atComposition(x: readonly number[]): VirialModel;
}

/** Truncated virial model of a pure fluid or mixture. */
export function virial(fluid: Fluid, correlation: VirialCorrelation = "abbott"): VirialModel {
  if (correlation !== "abbott" && correlation !== "tsonopoulos") {
    throw new ThermoError("correlation", `virial correlation must be "abbott" or "tsonopoulos"; got "${String(correlation)}"`);
  }
  const comps = fluid.components;
  const n = comps.length;
  if (n === 0) throw new ThermoError("fluid", "the virial model needs at least one component");
  if (fluid.x.length !== n) throw new ThermoError("x", `need one mole fraction per component (${n}); got ${fluid.x.length}`);
  const pairs: PairConstants[][] = comps.map((a, i) => comps.map((b, j) => pairConstants(a, b, fluid.kij?.[i]?.[j] ?? 0)));
  const x = fluid.x;

  const matrix = (T: number) => pairs.map((row) => row.map((c) => pairB(c, correlation, T)));

  // Mixing rule B = sum_i sum_j x_i x_j B_ij (exact for the second virial coefficient), and its T-derivative.
  const mixed = (m: { B: number; dBdT: number }[][]) => {
    let B = 0;
    let dBdT = 0;
    for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) {
      B += x[i]! * x[j]! * m[i]![j]!.B;
      dBdT += x[i]! * x[j]! * m[i]![j]!.dBdT;
    }
    return { B, dBdT };
  };

  const second = (T: number) => {
    requirePositive("T", T, "K");
    return mixed(matrix(T));
  };

  // Kay's-rule pseudo-critical constants, used only for the validity rule of thumb.
  let Tpc = 0, Ppc = 0, Vpc = 0;
  comps.forEach((c, i) => { Tpc += x[i]! * c.Tc; Ppc += x[i]! * c.Pc; Vpc += x[i]! * c.Vc; });

  const name = correlation === "abbott" ? "Pitzer/Abbott" : "Tsonopoulos (1974)";
  return {
    id: "virial",
    label: `truncated virial Z = 1 + BP/RT, ${name} B`,
    source:
      correlation === "abbott"
        ? "Smith, Van Ness & Abbott, Introduction to Chemical Engineering Thermodynamics, 7th ed. (2005), Sec. 3.6"
        : "Tsonopoulos, AIChE J. 20 (1974) 263",
    fluid,
    correlation,
    second,
    atComposition: (xNew: readonly number[]) => virial({ ...fluid, x: xNew }, correlation),

    pressure(T: number, V: number): number {
      requirePositive("V", V, "m^3/mol");
      const { B } = second(T);
      if (V <= B) throw new ThermoError("V", `truncated virial P = RT/(V - B) needs V > B: V = ${volumeText(V)} is not above B = ${volumeText(B)} at T = ${kelvin(T)}; valid range V > ${volumeText(Math.max(B, 0))}`);
      return (R * T) / (V - B);
    },

    volumes(T: number, P: number): number[] {
      requirePositive("P", P, "Pa");
      const { B } = second(T);
      const V = (R * T) / P + B;
      if (V <= 0) {
        throw new ThermoError(
          "P",
          `truncated virial equation has no physical volume at T = ${kelvin(T)} above P = ${pressureText((R * T) / -B)} (Z = 1 + BP/RT <= 0); got P = ${pressureText(P)}: use a cubic or Lee-Kesler model`,
        );
      }
      return [V];
    },

    residual(T: number, P: number, _V: number): Residual {
      requirePositive("P", P, "Pa");
      const m = matrix(T);
      const { B, dBdT } = mixed(m);
      const RT = R * T;
      const lnphiComponents = comps.map((_, i) => {
        let s = 0;
        for (let j = 0; j < n; j++) s += x[j]! * m[i]![j]!.B;
        return (P / RT) * (2 * s - B);
      });
      return {
        Z: 1 + (B * P) / RT,
        HR: P * (B - T * dBdT),
        SR: -P * dBdT,
        UR: -T * P * dBdT,
        GR: B * P,
        AR: 0,
        lnphi: (B * P) / RT,
        lnphiComponents,
      };
    },

    validity(T: number, P: number): string[] {
      const Tr = T / Tpc;
      const Pr = P / Ppc;
      const out: string[] = [];
      if (Tr < 0.686 + 0.439 * Pr) {
        out.push(
          `truncated virial used beyond its range: Tr = ${Tr.toPrecision(3)} < 0.686 + 0.439 Pr = ${(0.686 + 0.439 * Pr).toPrecision(3)} (needs V/Vc >~ 2; SVNA 7th ed. Fig. 3.14)`,
        );
      }
      return out;
    },
  };
}
