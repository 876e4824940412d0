/**
 * IAPWS-IF97 region 3 (around the critical point): basic equation f(rho,T), Eq. (28), Table 30, and
 * the density at given (p,T) by a bracketed solve of p(rho,T) = p.
 * Validity: 623.15 K <= T <= TB23(p), pB23(T) <= p <= 100 MPa. Source: IAPWS R7-97(2012) Sec. 6.3;
 * derivative relations Table 31.
 * Density solve: Newton on the isotherm p(rho) from a start on the named branch's side (see
 * region3Density), with the original grid scan + Brent as fallback. Below the critical temperature an
 * isotherm has a van der Waals loop, so the branch must be named; above it the root is unique. This
 * stands in for the supplementary v(p,T) backward equations (IAPWS SR5-05(2016)), not implemented here.
 */
import { brent } from "../../numerics/index.js";
import { ThermoError } from "../errors.js";
import { R_KJ, RHO_CRIT, T_CRIT } from "./constants.js";
import { fromHelmholtz, type WaterState } from "./properties.js";
import { seriesWithDerivatives } from "./series.js";
import { REGION3_HELMHOLTZ, REGION3_N1 } from "./tables/region3Coefficients.js";

/** Properties of region 3 at density rho (kg/m^3) and T (K), SI out. Phase labelled by density vs rho_c. */
export function region3(rho: number, T: number): WaterState {
  const delta = rho / RHO_CRIT;
  const tau = T_CRIT / T;
  const r = seriesWithDerivatives(REGION3_HELMHOLTZ, delta, tau);
  const props = fromHelmholtz(rho, T, delta, tau, {
    f: REGION3_N1 * Math.log(delta) + r.f,
    fd: REGION3_N1 / delta + r.fx,
    fdd: -REGION3_N1 / (delta * delta) + r.fxx,
    ft: r.fy,
    ftt: r.fyy,
    fdt: r.fxy,
  });
  return { ...props, x: Number.NaN, phase: rho >= RHO_CRIT ? "liquid" : "vapor", region: 3 };
}

/** Pressure (Pa) of region 3 at rho (kg/m^3), T (K): the cheap path used inside the density solve. */
export function region3Pressure(rho: number, T: number): number {
  const delta = rho / RHO_CRIT;
  const tau = T_CRIT / T;
  let fd = REGION3_N1 / delta;
  const t = REGION3_HELMHOLTZ;
  for (let k = 0; k < t.n.length; k++) {
    const i = t.I[k] as number;
    if (i === 0) continue;
    fd += (t.n[k] as number) * i * Math.pow(delta, i - 1) * Math.pow(tau, t.J[k] as number);
  }
  return rho * R_KJ * T * delta * fd * 1000; // kPa * 1000 = Pa
}

/** Densities spanned by the scan, kg/m^3: region 3 lies inside roughly 110..770 kg/m^3. */
const RHO_LO = 40;
const RHO_HI = 1000;
/**
 * Upper end for Newton: every region-3 state lies below ~765 kg/m^3 (623.15 K, 100 MPa), p(rho) is
 * increasing and convex on 450..800 kg/m^3 below T_crit and exceeds 100 MPa at 800 kg/m^3 for every
 * region-3 temperature; beyond ~880 kg/m^3 the fitted polynomial turns over (p falls), so starting at
 * 1000 would send Newton the wrong way (checked by scanning the isotherms 623.15..863.15 K).
 */
const RHO_NEWTON_MAX = 800;

/**
 * Density (kg/m^3) of region 3 at p (Pa), T (K). branch "liquid" takes the densest root, "vapor" the
 * least dense; above T_crit both give the single root. Throws ThermoError("p") when no root exists.
 *
 * Method: Newton on p(rho) with the exact slope dp/drho = R T (2 delta phi_d + delta^2 phi_dd), the
 * tau powers formed once per call. Below T_crit the start is chosen so Newton converges monotonically:
 * the vapour branch is concave, so start at the ideal-gas density p/(R T), left of the root (Z < 1); the
 * liquid branch is convex, so start at 800 kg/m^3, right of it. Above T_crit a Newton step that leaves
 * the bracket [40, 800] kg/m^3 bisects it instead. A root on the wrong side of rho_c, a non-positive
 * slope or no convergence in 60 steps hands over to the original grid scan + Brent, which is the
 * reference (tests hold the two together to 1e-12). Converged to |drho| < 1e-13 rho.
 */
export function region3Density(p: number, T: number, branch: "liquid" | "vapor"): number {
  const rho = newtonDensity(p, T, branch);
  return rho ?? region3DensityByScan(p, T, branch);
}

/** n_i tau^J_i for the terms with I_i > 0, and their I_i: the isotherm's coefficients in delta. */
function isotherm(T: number): { c: Float64Array; I: Int32Array } {
  const t = REGION3_HELMHOLTZ;
  const tau = T_CRIT / T;
  const c = new Float64Array(t.n.length);
  const I = new Int32Array(t.n.length);
  for (let k = 0; k < t.n.length; k++) {
    I[k] = t.I[k] as number;
    c[k] = (t.n[k] as number) * Math.pow(tau, t.J[k] as number);
  }
  return { c, I };
}

function newtonDensity(p: number, T: number, branch: "liquid" | "vapor"): number | undefined {
  const { c, I } = isotherm(T);
  const RT = R_KJ * T * 1000; // J/kg
  const pow = new Float64Array(13);
  // p(rho) - p and dp/drho at rho; delta powers by repeated multiplication (I <= 11 in Table 30).
  const evalAt = (rho: number): [number, number] => {
    const delta = rho / RHO_CRIT;
    pow[0] = 1;
    for (let i = 1; i < 13; i++) pow[i] = (pow[i - 1] as number) * delta;
    let fd = REGION3_N1 / delta;
    let fdd = -REGION3_N1 / (delta * delta);
    for (let k = 0; k < c.length; k++) {
      const i = I[k] as number;
      if (i === 0) continue;
      const ck = c[k] as number;
      fd += ck * i * (pow[i - 1] as number);
      if (i > 1) fdd += ck * i * (i - 1) * (pow[i - 2] as number);
    }
    return [rho * RT * delta * fd - p, RT * (2 * delta * fd + delta * delta * fdd)];
  };
  const super_ = !(T < T_CRIT);
  let lo = RHO_LO;
  let hi = RHO_NEWTON_MAX;
  let rho = super_ ? RHO_CRIT : branch === "vapor" ? Math.max(RHO_LO, p / RT) : RHO_NEWTON_MAX;
  for (let k = 0; k < 60; k++) {
    const [f, d] = evalAt(rho);
    if (super_) {
      if (f < 0) lo = rho;
      else hi = rho;
    } else if (!(d > 0)) return undefined;
    let next = rho - f / d;
    if (super_ && !(next > lo && next < hi && d > 0)) next = (lo + hi) / 2;
    if (!(next >= RHO_LO / 2 && next <= RHO_NEWTON_MAX)) return undefined;
    if (Math.abs(next - rho) < 1e-13 * rho || (super_ && hi - lo < 1e-13 * hi)) {
      const [fr, dr] = evalAt(next);
      if (!(dr > 0) || !(Math.abs(fr) <= 1e-9 * p)) return undefined;
      if (!super_ && (branch === "liquid" ? next < RHO_CRIT : next > RHO_CRIT)) return undefined;
      return next;
    }
    rho = next;
  }
  return undefined;
}

/** The reference solve (and fallback): scan the isotherm on a grid from the branch's side, then Brent. */
export function region3DensityByScan(p: number, T: number, branch: "liquid" | "vapor"): number {
  const f = (rho: number): number => region3Pressure(rho, T) - p;
  // Near the critical point the two roots are close: a finer grid keeps them apart.
  const steps = Math.abs(T - T_CRIT) < 2 ? 800 : 120;
  const dr = (RHO_HI - RHO_LO) / steps;
  if (branch === "liquid") {
    let hi = RHO_HI;
    let fhi = f(hi);
    for (let k = 1; k <= steps; k++) {
      const lo = RHO_HI - k * dr;
      const flo = f(lo);
      if (fhi >= 0 && flo <= 0) return brent(f, lo, hi, { xtol: hi * 1e-12, rtol: 0 }, "IF97 region 3 density").value;
      hi = lo;
      fhi = flo;
    }
  } else {
    let lo = RHO_LO;
    let flo = f(lo);
    for (let k = 1; k <= steps; k++) {
      const hi = RHO_LO + k * dr;
      const fhi = f(hi);
      if (flo <= 0 && fhi >= 0) return brent(f, lo, hi, { xtol: hi * 1e-12, rtol: 0 }, "IF97 region 3 density").value;
      lo = hi;
      flo = fhi;
    }
  }
  throw new ThermoError("p", `IF97 region 3: no ${branch} density found at T = ${T} K, p = ${p} Pa`);
}
