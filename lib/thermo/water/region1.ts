/**
 * IAPWS-IF97 region 1 (compressed and saturated liquid): basic equation g(p,T), Eq. (7), and the
 * backward equations T(p,h), Eq. (11), T(p,s), Eq. (13), and p(h,s), Eq. (1) of IAPWS SR2-01(2014).
 * Validity: 273.15 K <= T <= 623.15 K, ps(T) <= p <= 100 MPa.
 * Accuracy: the basic equation reproduces IAPWS-95 to within the IF97 tolerances (v 0.05 %, h 0.2 kJ/kg
 * ... see the release, Sec. 5); backward T(p,h) and T(p,s) agree with the basic equation to 25 mK,
 * p(h,s) to 0.6 % (release and supplementary release, stated tolerances).
 */
import { fromGibbs, type WaterState } from "./properties.js";
import { seriesValue, seriesWithDerivatives } from "./series.js";
import { REGION1_GIBBS, REGION1_P_HS, REGION1_T_PH, REGION1_T_PS } from "./tables/region1Coefficients.js";

/** Properties of region 1 at T (K) and p (Pa), SI out. Region label 1, phase "liquid" (caller may relabel). */
export function region1(T: number, p: number): WaterState {
  const pMPa = p / 1e6;
  const pi = pMPa / 16.53;
  const tau = 1386 / T;
  // gamma = sum n (7.1 - pi)^I (tau - 1.222)^J; d/dpi = -d/dx.
  const s = seriesWithDerivatives(REGION1_GIBBS, 7.1 - pi, tau - 1.222);
  const props = fromGibbs(T, pMPa, pi, tau, { g: s.f, gp: -s.fx, gpp: s.fxx, gt: s.fy, gtt: s.fyy, gpt: -s.fxy });
  return { ...props, x: Number.NaN, phase: "liquid", region: 1 };
}

/** Backward T(p,h) of region 1, Eq. (11): p in Pa, h in J/kg, returns K (within 25 mK of Eq. 7). */
export function region1TofPH(p: number, h: number): number {
  return seriesValue(REGION1_T_PH, p / 1e6, h / 2.5e6 + 1);
}

/** Backward T(p,s) of region 1, Eq. (13): p in Pa, s in J/(kg K), returns K (within 25 mK of Eq. 7). */
export function region1TofPS(p: number, s: number): number {
  return seriesValue(REGION1_T_PS, p / 1e6, s / 1000 + 2);
}

/** Backward p(h,s) of region 1, IAPWS SR2-01(2014) Eq. (1): h in J/kg, s in J/(kg K), returns Pa. */
export function region1PofHS(h: number, s: number): number {
  return 100e6 * seriesValue(REGION1_P_HS, h / 3.4e6 + 0.05, s / 7600 + 0.05);
}
