/**
 * Departure (residual) functions and fugacity of an IF97 water state.
 *
 * Basis: the ideal gas is IF97's own ideal-gas Gibbs function, gamma^0(pi, tau) = ln pi + sum n_i tau^J_i,
 * the ideal part of region 2 (IAPWS R7-97(2012) Eq. (16), Table 10; tau = 540 K / T) for T <= 1073.15 K,
 * and the ideal part of region 5 (Eq. (33), Table 37; tau = 1000 K / T) above, where region 5 is the only
 * region. Both carry the IF97 reference state (u = s = 0 for saturated liquid at the triple point), so a
 * residual is simply total minus ideal gas at the same T and p:
 *   h^R = h - h^0(T),  s^R = s - s^0(T, p),  g^R = h^R - T s^R,
 *   u^R = u - (h^0 - R T),  a^R = u^R - T s^R,  ln phi = g^R / (R T),  f = p phi,  Z = p v / (R T).
 * In regions 2 and 5 this equals R T tau gamma^r_tau etc. from the residual part alone; in regions 1, 3
 * and the two-phase dome it is the only route. Units: J/kg, J/(kg K), Pa; phi and Z dimensionless.
 * Validity: wherever the state itself is valid (273.15 K .. 2273.15 K). Accuracy: that of the state
 * (round-off of the subtraction is below 1e-9 J/kg). Equal fugacity of the saturated phases holds only
 * to the consistency of the IF97 saturation-pressure equation (30) with the separately fitted basic
 * equations: |ln phi' - ln phi''| = |g' - g''| / (R T) reaches 6.8e-5 (near 367 K), i.e. about 0.007 % in
 * fugacity; that is a property of IF97, not of this code (python3-iapws gives the same g' - g'').
 * python3-iapws reports the same quantity as IAPWS97(...).Liquid/Vapor.fi (its g0 uses the same parts).
 */
import { R_KJ, T_25 } from "./constants.js";
import type { WaterState } from "./properties.js";
import { seriesInY } from "./series.js";
import { REGION2_IDEAL } from "./tables/region2Coefficients.js";
import { REGION5_IDEAL } from "./tables/region5Coefficients.js";

/** Specific gas constant of water in J/(kg K) (IF97 Eq. 1). */
const R_J = R_KJ * 1000;

/** Ideal-gas specific properties of water at T (K), p (Pa): J/kg and J/(kg K). */
export interface WaterIdealGas {
  h: number;
  s: number;
  u: number;
  g: number;
  cp: number;
}

/** Residual (state minus ideal gas at the same T, p) properties of a water state, per kg, with phi, f, Z. */
export interface WaterResidual {
  hr: number;
  sr: number;
  ur: number;
  gr: number;
  ar: number;
  Z: number;
  lnphi: number;
  phi: number;
  /** Fugacity, Pa. */
  f: number;
}

/**
 * IF97 ideal-gas properties at T (K) and p (Pa): region 2 ideal part (Table 10) up to 1073.15 K,
 * region 5 ideal part (Table 37) above. h and cp depend on T only; s and g also on p through -R ln p.
 */
export function waterIdealGas(T: number, p: number): WaterIdealGas {
  const high = T > T_25;
  const tau = (high ? 1000 : 540) / T;
  const i = seriesInY(high ? REGION5_IDEAL : REGION2_IDEAL, tau);
  const lnPi = Math.log(p / 1e6); // p* = 1 MPa in both regions
  const h = R_J * T * tau * i.fy;
  const s = R_J * (tau * i.fy - lnPi - i.f);
  return { h, s, u: h - R_J * T, g: h - T * s, cp: -R_J * tau * tau * i.fyy };
}

/** Departure functions, fugacity coefficient and fugacity of an IF97 state (any region, two-phase too). */
export function waterResidual(st: WaterState): WaterResidual {
  const ig = waterIdealGas(st.T, st.p);
  const RT = R_J * st.T;
  const hr = st.h - ig.h;
  const sr = st.s - ig.s;
  const ur = st.u - ig.u;
  const gr = hr - st.T * sr;
  const lnphi = gr / RT;
  const phi = Math.exp(lnphi);
  return { hr, sr, ur, gr, ar: ur - st.T * sr, Z: (st.p * st.v) / RT, lnphi, phi, f: st.p * phi };
}
