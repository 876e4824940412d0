/**
 * IAPWS-IF97 region 2 backward equations, subregions 2a (p <= 4 MPa), 2b and 2c (split by B2bc for
 * T(p,h), by s = 5.85 kJ/(kg K) for T(p,s)):
 * T(p,h) Eqs. (22)-(24), T(p,s) Eqs. (25)-(27) of IAPWS R7-97(2012); p(h,s) Eqs. (3)-(5) of IAPWS
 * SR2-01(2014). Accuracy vs the basic equation: T within 10 mK (2a, 2b) / 25 mK (2c) as the release
 * states; p(h,s) within 0.0035 % .. 0.019 % (supplementary release). SI in and out.
 */
import { b2bcEnthalpy, h2abOfS } from "./boundaries.js";
import { seriesValue } from "./series.js";
import {
  REGION2A_P_HS,
  REGION2A_T_PH,
  REGION2A_T_PS,
  REGION2B_P_HS,
  REGION2B_T_PH,
  REGION2B_T_PS,
  REGION2C_P_HS,
  REGION2C_T_PH,
  REGION2C_T_PS,
} from "./tables/region2BackwardCoefficients.js";

export type Subregion2 = "2a" | "2b" | "2c";

/** Subregion for T(p,h): 2a below 4 MPa, else 2b on the high-enthalpy side of B2bc, else 2c. */
export function subregion2PH(p: number, h: number): Subregion2 {
  if (p <= 4e6) return "2a";
  // B2bc starts at 6.5467 MPa; between 4 MPa and there everything is 2b.
  if (p <= 6.546699678e6) return "2b";
  return h >= b2bcEnthalpy(p) ? "2b" : "2c";
}

/** Subregion for T(p,s): 2a below 4 MPa, else 2b for s >= 5.85 kJ/(kg K), else 2c. */
export function subregion2PS(p: number, s: number): Subregion2 {
  if (p <= 4e6) return "2a";
  return s >= 5850 ? "2b" : "2c";
}

/** Backward T(p,h) in region 2 (K) from p (Pa), h (J/kg); subregion chosen by subregion2PH unless given. */
export function region2TofPH(p: number, h: number, sub: Subregion2 = subregion2PH(p, h)): number {
  const pi = p / 1e6;
  const eta = h / 2e6;
  if (sub === "2a") return seriesValue(REGION2A_T_PH, pi, eta - 2.1);
  if (sub === "2b") return seriesValue(REGION2B_T_PH, pi - 2, eta - 2.6);
  return seriesValue(REGION2C_T_PH, pi + 25, eta - 1.8);
}

/** Backward T(p,s) in region 2 (K) from p (Pa), s (J/(kg K)). */
export function region2TofPS(p: number, s: number, sub: Subregion2 = subregion2PS(p, s)): number {
  const pi = p / 1e6;
  if (sub === "2a") return seriesValue(REGION2A_T_PS, pi, s / 2000 - 2);
  if (sub === "2b") return seriesValue(REGION2B_T_PS, pi, 10 - s / 785.3);
  return seriesValue(REGION2C_T_PS, pi, 2 - s / 2925.1);
}

/** Subregion for p(h,s): 2a below the h2ab(s) line, else 2b for s >= 5.85 kJ/(kg K), else 2c. */
export function subregion2HS(h: number, s: number): Subregion2 {
  if (h <= h2abOfS(s)) return "2a";
  return s >= 5850 ? "2b" : "2c";
}

/** Backward p(h,s) in region 2 (Pa) from h (J/kg), s (J/(kg K)), IAPWS SR2-01(2014). */
export function region2PofHS(h: number, s: number, sub: Subregion2 = subregion2HS(h, s)): number {
  if (sub === "2a") return 4e6 * pow4(seriesValue(REGION2A_P_HS, h / 4.2e6 - 0.5, s / 12000 - 1.2));
  if (sub === "2b") return 100e6 * pow4(seriesValue(REGION2B_P_HS, h / 4.1e6 - 0.6, s / 7900 - 1.01));
  return 100e6 * pow4(seriesValue(REGION2C_P_HS, h / 3.5e6 - 0.7, s / 5900 - 1.1));
}

function pow4(x: number): number {
  const x2 = x * x;
  return x2 * x2;
}
