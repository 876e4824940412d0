/**
 * criticalConstants: OmegaA, OmegaB and Zc of a generic cubic P = RT/(V-b) - a/((V+eps b)(V+sig b)),
 * from the critical-point conditions (dP/dV = d2P/dV2 = 0 at Tc, Pc), i.e. the cubic in Z has the triple
 * root Zc there: Z^3 + c2 Z^2 + c1 Z + c0 = (Z - Zc)^3. Matching c2 gives Zc = (1 - (eps+sig-1) B)/3,
 * matching c1 gives A, and c0 leaves one equation in B = OmegaB, solved by Brent's method.
 * Results reproduce the published constants: vdW 27/64, 1/8, 3/8; RK 0.42748, 0.08664, 1/3;
 * PR 0.45724, 0.07780, 0.30740 (Peng & Robinson 1976, Ind. Eng. Chem. Fundam. 15, 59).
 * Using the exact values (not the rounded printed ones) puts the model's critical point exactly at the
 * component's Tc and Pc, so psat -> Pc as T -> Tc.
 */
import { brent } from "../../numerics/index.js";

export function criticalConstants(eps: number, sig: number): { OmegaA: number; OmegaB: number; Zc: number } {
  const S = eps + sig;
  const Pm = eps * sig;
  const zc = (B: number) => (1 - (S - 1) * B) / 3;
  const aOf = (B: number) => 3 * zc(B) ** 2 - Pm * B * B + S * B * (B + 1);
  const g = (B: number) => Pm * B * B * (B + 1) + aOf(B) * B - zc(B) ** 3;
  const OmegaB = brent(g, 1e-6, 0.3, { xtol: 1e-17, rtol: 1e-15 }).value;
  return { OmegaA: aOf(OmegaB), OmegaB, Zc: zc(OmegaB) };
}
