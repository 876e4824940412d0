/**
 * IAPWS-IF97 region 2 (superheated and supercritical vapour): basic equation g(p,T) = ideal part (Table 10)
 * + residual part (Table 11), Eq. (15). Validity: 273.15 K <= T <= 623.15 K for 0 < p <= ps(T);
 * 623.15 K < T <= 863.15 K for 0 < p <= pB23(T); 863.15 K < T <= 1073.15 K for 0 < p <= 100 MPa.
 * Source: IAPWS R7-97(2012) Sec. 6.1; derivative relations Table 12.
 */
import { fromGibbs, idealPlusResidual, type WaterState } from "./properties.js";
import { seriesInY, seriesWithDerivatives } from "./series.js";
import { REGION2_IDEAL, REGION2_RESIDUAL } from "./tables/region2Coefficients.js";

/** Properties of region 2 at T (K) and p (Pa), SI out. */
export function region2(T: number, p: number): WaterState {
  const pMPa = p / 1e6;
  const pi = pMPa; // reducing pressure p* = 1 MPa
  const tau = 540 / T; // reducing temperature T* = 540 K
  const ideal = seriesInY(REGION2_IDEAL, tau);
  const r = seriesWithDerivatives(REGION2_RESIDUAL, pi, tau - 0.5);
  const props = fromGibbs(T, pMPa, pi, tau, idealPlusResidual(pi, ideal, r));
  return { ...props, x: Number.NaN, phase: "vapor", region: 2 };
}
