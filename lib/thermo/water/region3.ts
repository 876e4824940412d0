/**
 * IAPWS-IF97 region 3 (around the critical point): basic equation f(rho,T), Eq. (28), Table 30, and
 * the density at given (p,T) by a bracketed solve of p(rho,T) = p.
 * Validity: 623.15 K <= T <= TB23(p), pB23(T) <= p <= 100 MPa. Source: IAPWS R7-97(2012) Sec. 6.3;
 * derivative relations Table 31.
 * Density solve: the isotherm p(rho) is scanned on a grid (from the dense side for liquid-like states,
 * from the dilute side for vapour-like ones) to bracket the first crossing, then Brent polishes it to
 * 1e-11 relative. Below the critical temperature an isotherm has a van der Waals loop, so the branch
 * must be named; above it the root is unique. This replaces the 2014 supplementary v(p,T) backward
 * equations (IAPWS SR5-05(2016)), which are not implemented here.
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
 * Density (kg/m^3) of region 3 at p (Pa), T (K). branch "liquid" takes the densest root, "vapor" the
 * least dense; above T_crit both give the single root. Throws ThermoError("p") when no root exists.
 */
export function region3Density(p: number, T: number, branch: "liquid" | "vapor"): number {
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
