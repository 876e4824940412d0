/**
 * IAPWS-IF97 region 5 (high-temperature steam): basic equation g(p,T) = ideal part (Table 37) + residual
 * part (Table 38), Eq. (32). Validity: 1073.15 K <= T <= 2273.15 K, 0 < p <= 50 MPa (the 2007 revision
 * extended it from 10 MPa). Source: IAPWS R7-97(2012) Sec. 7; derivative relations Table 39.
 */
import { fromGibbs, idealPlusResidual, type WaterState } from "./properties.js";
import { seriesInY, seriesWithDerivatives } from "./series.js";
import { REGION5_IDEAL, REGION5_RESIDUAL } from "./tables/region5Coefficients.js";

/** Properties of region 5 at T (K) and p (Pa), SI out. */
export function region5(T: number, p: number): WaterState {
  const pMPa = p / 1e6;
  const pi = pMPa; // p* = 1 MPa
  const tau = 1000 / T; // T* = 1000 K
  const ideal = seriesInY(REGION5_IDEAL, tau);
  const r = seriesWithDerivatives(REGION5_RESIDUAL, pi, tau);
  const props = fromGibbs(T, pMPa, pi, tau, idealPlusResidual(pi, ideal, r));
  return { ...props, x: Number.NaN, phase: "vapor", region: 5 };
}
