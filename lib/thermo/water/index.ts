/**
 * Water and steam by IAPWS-IF97 (IAPWS R7-97(2012), with the 2007 extension of region 5 to 50 MPa;
 * p(h,s) backward equations of IAPWS SR2-01(2014)). SI numbers in and out: K, Pa, m^3/kg, kg/m^3, J/kg,
 * J/(kg K), m/s; molar values via toMolar with M = 0.018015268 kg/mol.
 *
 * Main entry: if97State({T, p} | {p, h} | {p, s} | {h, s} | {T, x} | {p, x}) -> WaterState
 *   {T, p, v, rho, h, s, u, g, a, cp, cv, w, x, phase, region}.
 * Departures and fugacity: waterResidual(state) -> {hr, sr, ur, gr, ar, Z, lnphi, phi, f} against IF97's
 * ideal-gas part (region 2 Table 10, region 5 Table 37 above 1073.15 K).
 * Saturation: if97Psat(T), if97Tsat(p). Region equations and backward equations are exported for
 * callers that want them directly (each documents its own validity and accuracy).
 * Validity: 273.15 K <= T <= 1073.15 K for p <= 100 MPa; 1073.15 K < T <= 2273.15 K for p <= 50 MPa.
 * Errors: ThermoError with .argument naming the offending input and a message stating the valid range.
 */
export { if97State, saturatedPX, saturatedTX, type IF97Input } from "./state.js";
export type { WaterPhase, WaterState } from "./properties.js";
export { if97Psat, if97Tsat } from "./saturation.js";
export { toMolar, perMassFromMolar, type WaterMolar } from "./molar.js";
export { waterIdealGas, waterResidual, type WaterIdealGas, type WaterResidual } from "./departure.js";
export { M_WATER, R_KJ, T_CRIT, P_CRIT_MPA, RHO_CRIT, VALIDITY_TEXT } from "./constants.js";
export { region1, region1TofPH, region1TofPS, region1PofHS } from "./region1.js";
export { region2 } from "./region2.js";
export { region2TofPH, region2TofPS, region2PofHS, subregion2PH, subregion2PS, subregion2HS } from "./region2Backward.js";
export { region3, region3Density, region3Pressure } from "./region3.js";
export { region5 } from "./region5.js";
export { b23Pressure, b23Temperature, b2bcPressure, b2bcEnthalpy, h2abOfS } from "./boundaries.js";
export { regionOfTP, stateTP, saturatedPair } from "./regions.js";
export { statePH, statePS } from "./flash.js";
export { stateHS } from "./hs.js";
