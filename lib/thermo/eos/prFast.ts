/**
 * prStateFast: allocation-free Peng-Robinson state of a PURE component for loops over many states
 * (vectorised language calls, benchmarks). Same equations and constants as pr.ts (exact OmegaA/OmegaB,
 * 1976/1978 kappa), same answers as pr(fluid).residual on the stable root (tests check to 1e-10).
 * The cubic in Z is solved inline by Cardano (one real root) or the trigonometric form (three), then one
 * Newton polish; lib/numerics cubicRoots returns a fresh array per call, which this hot path avoids.
 * When three roots exist the one of lower Gibbs energy (lower ln phi) is returned.
 * Writes out[0..3] = Z, H^R (J/mol), S^R (J/(mol K)), ln phi; returns Z. Valid for T > 0, P > 0
 * (inputs are not checked here: callers check once per array).
 */
import { polishCubicRoot } from "../../numerics/index.js";
import { R } from "../constants.js";
import { PR, prKappa } from "./pr.js";

const S2 = Math.SQRT2;
const OA = PR.OmegaA;
const OB = PR.OmegaB;

export function prStateFast(T: number, P: number, Tc: number, Pc: number, omega: number, out: Float64Array): number {
  const k = prKappa(omega);
  const sq = Math.sqrt(T / Tc);
  const s = 1 + k * (1 - sq);
  const ac = (OA * R * R * Tc * Tc) / Pc;
  const b = (OB * R * Tc) / Pc;
  const a = ac * s * s;
  const dadT = (-ac * k * s) / Math.sqrt(T * Tc);
  const RT = R * T;
  const A = (a * P) / (RT * RT);
  const B = (b * P) / RT;
  const c2 = B - 1;
  const c1 = A - 3 * B * B - 2 * B;
  const c0 = -(A * B - B * B - B * B * B);
  const p = c1 - (c2 * c2) / 3;
  const q = (2 * c2 * c2 * c2) / 27 - (c2 * c1) / 3 + c0;
  const disc = (q * q) / 4 + (p * p * p) / 27;
  let Z: number;
  if (disc >= 0) {
    const sd = Math.sqrt(disc);
    Z = Math.cbrt(-q / 2 + sd) + Math.cbrt(-q / 2 - sd) - c2 / 3;
    Z = polish(Z, c2, c1, c0);
  } else {
    const r = Math.sqrt(-p / 3);
    const phi = Math.acos(Math.max(-1, Math.min(1, -q / (2 * r * r * r))));
    const zv = polish(2 * r * Math.cos(phi / 3) - c2 / 3, c2, c1, c0);
    const zl = polish(2 * r * Math.cos((phi + 2 * Math.PI) / 3) - c2 / 3, c2, c1, c0);
    Z = zl > B && lnphiOf(zl, A, B) < lnphiOf(zv, A, B) ? zl : zv;
  }
  const L = Math.log((Z + (1 + S2) * B) / (Z + (1 - S2) * B));
  const lnZB = Math.log(Z - B);
  out[0] = Z;
  out[1] = RT * (Z - 1) + ((T * dadT - a) / (2 * S2 * b)) * L;
  out[2] = R * lnZB + (dadT / (2 * S2 * b)) * L;
  out[3] = Z - 1 - lnZB - (A / (2 * S2 * B)) * L;
  return Z;
}

/** One Newton step, kept only if it helps: near a multiple root f' -> 0 and the step is noise. */
const polish = (z: number, c2: number, c1: number, c0: number): number => polishCubicRoot(z, c2, c1, c0, 1);

function lnphiOf(Z: number, A: number, B: number): number {
  return Z - 1 - Math.log(Z - B) - (A / (2 * S2 * B)) * Math.log((Z + (1 + S2) * B) / (Z + (1 - S2) * B));
}
