/**
 * The property set every IF97 region returns, and the conversion from the dimensionless derivatives of
 * a Gibbs free energy gamma(pi, tau) or a Helmholtz free energy phi(delta, tau) to it.
 * Relations: IAPWS R7-97(2012) Table 3 (region 1), Table 12 (region 2), Table 31 (region 3),
 * Table 39 (region 5). Results are SI: K, Pa, m^3/kg, kg/m^3, J/kg, J/(kg K), m/s.
 */
import { R_KJ } from "./constants.js";
import type { SeriesDerivatives } from "./series.js";

export type WaterPhase = "liquid" | "vapor" | "supercritical" | "two-phase";

/** One IF97 state in SI units. x is the vapour mass fraction (NaN for single-phase states). */
export interface WaterState {
  T: number;
  p: number;
  v: number;
  rho: number;
  h: number;
  s: number;
  u: number;
  /** Gibbs free energy h - T s, J/kg. */
  g: number;
  /** Helmholtz free energy u - T s, J/kg. */
  a: number;
  /** Isobaric heat capacity, J/(kg K); NaN inside the two-phase dome. */
  cp: number;
  /** Isochoric heat capacity, J/(kg K); NaN inside the two-phase dome. */
  cv: number;
  /** Speed of sound, m/s; NaN inside the two-phase dome. */
  w: number;
  x: number;
  phase: WaterPhase;
  /** IF97 region 1, 2, 3, 4 (two-phase) or 5. */
  region: 1 | 2 | 3 | 4 | 5;
}

/** gamma and its partial derivatives: p = d/dpi, t = d/dtau. */
export interface GibbsDerivatives {
  g: number;
  gp: number;
  gpp: number;
  gt: number;
  gtt: number;
  gpt: number;
}

/** phi and its partial derivatives: d = d/ddelta, t = d/dtau. */
export interface HelmholtzDerivatives {
  f: number;
  fd: number;
  fdd: number;
  ft: number;
  ftt: number;
  fdt: number;
}

/**
 * The vapour regions' (2 and 5) gamma = ln(pi) + gamma_o(tau) + gamma_r(pi, tau), as the derivatives
 * fromGibbs takes: the ideal part's pi-dependence is ln(pi) alone (IF97 Eqs. 15-17 and 32-34; Tables 12
 * and 39). `ideal` is gamma_o's series in tau, `residual` gamma_r's with x = pi.
 */
export function idealPlusResidual(pi: number, ideal: { f: number; fy: number; fyy: number }, residual: SeriesDerivatives): GibbsDerivatives {
  return {
    g: Math.log(pi) + ideal.f + residual.f,
    gp: 1 / pi + residual.fx,
    gpp: -1 / (pi * pi) + residual.fxx,
    gt: ideal.fy + residual.fy,
    gtt: ideal.fyy + residual.fyy,
    gpt: residual.fxy,
  };
}

/** Properties from gamma(pi, tau); T in K, pMPa in MPa. Works for regions 1, 2 and 5 (total derivatives). */
export function fromGibbs(
  T: number,
  pMPa: number,
  pi: number,
  tau: number,
  d: GibbsDerivatives,
): Omit<WaterState, "x" | "phase" | "region"> {
  const RT = R_KJ * T; // kJ/kg
  const v = (pi * d.gp * RT) / (pMPa * 1000); // m^3/kg
  const h = RT * tau * d.gt;
  const s = R_KJ * (tau * d.gt - d.g);
  const u = RT * (tau * d.gt - pi * d.gp);
  const cp = -R_KJ * tau * tau * d.gtt;
  const cross = d.gp - tau * d.gpt;
  const cv = R_KJ * (-tau * tau * d.gtt + (cross * cross) / d.gpp);
  const w = Math.sqrt((RT * 1000 * d.gp * d.gp) / ((cross * cross) / (tau * tau * d.gtt) - d.gpp));
  return finish(T, pMPa, v, h, s, u, cp, cv, w);
}

/** Properties from phi(delta, tau); rho in kg/m^3, T in K (region 3). */
export function fromHelmholtz(
  rho: number,
  T: number,
  delta: number,
  tau: number,
  d: HelmholtzDerivatives,
): Omit<WaterState, "x" | "phase" | "region"> {
  const RT = R_KJ * T;
  const pMPa = (rho * RT * delta * d.fd) / 1000;
  const u = RT * tau * d.ft;
  const s = R_KJ * (tau * d.ft - d.f);
  const h = RT * (tau * d.ft + delta * d.fd);
  const cv = -R_KJ * tau * tau * d.ftt;
  const stiff = 2 * delta * d.fd + delta * delta * d.fdd;
  const cross = delta * d.fd - delta * tau * d.fdt;
  const cp = R_KJ * (-tau * tau * d.ftt + (cross * cross) / stiff);
  const w = Math.sqrt(RT * 1000 * (stiff - (cross * cross) / (tau * tau * d.ftt)));
  return finish(T, pMPa, 1 / rho, h, s, u, cp, cv, w);
}

/** kJ -> J and MPa -> Pa at the module edge; g and a follow from h, u, s. */
function finish(
  T: number,
  pMPa: number,
  v: number,
  hKJ: number,
  sKJ: number,
  uKJ: number,
  cpKJ: number,
  cvKJ: number,
  w: number,
): Omit<WaterState, "x" | "phase" | "region"> {
  const h = hKJ * 1000;
  const s = sKJ * 1000;
  const u = uKJ * 1000;
  return {
    T,
    p: pMPa * 1e6,
    v,
    rho: 1 / v,
    h,
    s,
    u,
    g: h - T * s,
    a: u - T * s,
    cp: cpKJ * 1000,
    cv: cvKJ * 1000,
    w,
  };
}
