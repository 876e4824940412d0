/**
 * Units a practitioner types daily that mathjs 15.2 lacks (checked against the instance: psia, psig,
 * bara, barg, kPag, MPag, lbmol, cal, kcal, Btu, MMBtu, therm, standard-volume amounts, ton of
 * refrigeration, Torr, inH2O, inHg, ksi, cP, cSt, gpm are missing; degR, kmol, BTU, mbar, torr, mmHg,
 * lbm, lbf exist). Each entry carries its definition and source so help text can show them.
 *
 * Standard-volume gas units are AMOUNTS of substance (mol), converted by the ideal-gas law n = P V/(R T)
 * at their reference conditions; real gases at those conditions differ by a few tenths of a percent
 * (methane Z about 0.998 at 15 degC and 1 atm, from memory), which is the trade's convention too.
 */

/** CODATA 2018 exact molar gas constant, J/(mol K). */
export const R_GAS = 8.314462618;
/** Standard atmosphere, Pa (exact by definition, ISO 2533 / CGPM 1954). */
export const ATM_PA = 101325;
/** Pound-force per square inch in Pa (exact from lbf = 0.45359237 kg x 9.80665 m/s^2 and in = 0.0254 m). */
export const PSI_PA = (0.45359237 * 9.80665) / (0.0254 * 0.0254);

/** Moles of ideal gas in one cubic metre at P (Pa), T (K). */
function molesPerM3(pPa: number, tK: number): number {
  return pPa / (R_GAS * tK);
}

export interface AddedUnit {
  name: string;
  /** mathjs definition string, in units that exist before this one is added. */
  definition: string;
  /** Offset in the unit's own scale (gauge pressures: 1 atm expressed in that unit). */
  offset?: number;
  aliases?: string[];
  /** Allow SI prefixes ("short" set), e.g. cal -> kcal. */
  prefixes?: "short";
  /** Replace a mathjs unit of the same name (only bbl, see its help). */
  override?: boolean;
  help: string;
  source: string;
}

const SCF_P = 14.696 * PSI_PA; // Pa
const SCF_T = (60 + 459.67) * (5 / 9); // K
const FT3 = 0.3048 ** 3; // m^3

export const ADDED_UNITS: readonly AddedUnit[] = [
  // Pressures: absolute and gauge. Gauge units are offset units against 1 atm = 101325 Pa.
  { name: "psia", definition: `${PSI_PA} Pa`, help: "pound-force per square inch, absolute", source: "NIST SP 811 (2008) B.8: psi = 6894.757 Pa" },
  { name: "psig", definition: `${PSI_PA} Pa`, offset: ATM_PA / PSI_PA, help: "psi gauge, above 1 atm = 101325 Pa (14.696 psia); an offset unit like degC", source: "NIST SP 811 B.8; atmosphere 101325 Pa exact" },
  { name: "bara", definition: "1e5 Pa", help: "bar, absolute", source: "NIST SP 811 B.8: bar = 1e5 Pa" },
  { name: "barg", definition: "1e5 Pa", offset: ATM_PA / 1e5, help: "bar gauge, above 1 atm = 1.01325 bar; an offset unit like degC", source: "NIST SP 811 B.8" },
  { name: "kPag", definition: "1e3 Pa", offset: ATM_PA / 1e3, help: "kPa gauge, above 1 atm = 101.325 kPa", source: "atmosphere 101325 Pa exact" },
  { name: "MPag", definition: "1e6 Pa", offset: ATM_PA / 1e6, help: "MPa gauge, above 1 atm = 0.101325 MPa", source: "atmosphere 101325 Pa exact" },
  { name: "ksi", definition: `${1000 * PSI_PA} Pa`, help: "1000 psi (stresses)", source: "NIST SP 811 B.8" },
  { name: "Torr", definition: `${ATM_PA / 760} Pa`, help: "1/760 atm", source: "NIST SP 811 B.8: torr = 101325/760 Pa" },
  { name: "inH2O", definition: `${0.0254 * 1000 * 9.80665} Pa`, help: "conventional inch of water (1000 kg/m^3, standard gravity), 249.089 Pa", source: "NIST SP 811 B.8 (conventional, 4 degC: 249.0889 Pa)" },
  { name: "inHg", definition: "3386.389 Pa", help: "conventional inch of mercury (0 degC)", source: "NIST SP 811 B.8: inHg (32 degF) = 3386.38 Pa" },
  // Temperature differences: no offset, for rates and explicit differences.
  { name: "deltaC", definition: "1 K", help: "a temperature DIFFERENCE of one degree Celsius (= 1 K), e.g. 5 deltaC/minute", source: "ITS-90: degree Celsius equals the kelvin in size" },
  { name: "deltaF", definition: `${5 / 9} K`, help: "a temperature DIFFERENCE of one degree Fahrenheit (= 5/9 K)", source: "NIST SP 811 B.8: degF interval = 5/9 K" },
  // Amounts.
  { name: "lbmol", definition: "453.59237 mol", aliases: ["lbmole"], help: "pound-mole: 453.59237 mol", source: "lb = 0.45359237 kg exactly (international pound, 1959)" },
  // Energies.
  { name: "cal", definition: "4.184 J", prefixes: "short", help: "thermochemical calorie, 4.184 J (kcal = 4184 J)", source: "NIST SP 811 B.8: calorie (thermochemical) = 4.184 J" },
  { name: "Btu", definition: "1055.05585262 J", help: "British thermal unit (International Table), 1055.05585262 J", source: "NIST SP 811 B.8: Btu_IT = 1055.056 J" },
  { name: "MMBtu", definition: "1055.05585262e6 J", help: "one million Btu (IT)", source: "NIST SP 811 B.8; MM = million, trade usage" },
  { name: "therm", definition: "105505585.262 J", help: "100000 Btu (IT)", source: "NIST SP 811 B.8 (therm EC = 1.05506e8 J)" },
  // Powers.
  { name: "TR", definition: `${(12000 * 1055.05585262) / 3600} W`, aliases: ["tonref"], help: "ton of refrigeration: 12000 Btu/h = 3516.85 W", source: "NIST SP 811 B.8: ton of refrigeration = 12000 Btu_IT/h" },
  // Standard-volume gas amounts (ideal-gas law at stated reference conditions).
  { name: "Sm3", definition: `${molesPerM3(ATM_PA, 288.15)} mol`, help: "standard cubic metre as an AMOUNT of gas: ideal gas at 15 degC and 101.325 kPa (42.29 mol)", source: "ISO 13443:1996 standard reference conditions" },
  { name: "Nm3", definition: `${molesPerM3(ATM_PA, 273.15)} mol`, help: "normal cubic metre as an AMOUNT of gas: ideal gas at 0 degC and 101.325 kPa (44.62 mol)", source: "DIN 1343 normal conditions" },
  { name: "scf", definition: `${molesPerM3(SCF_P, SCF_T) * FT3} mol`, help: "standard cubic foot as an AMOUNT of gas: ideal gas at 60 degF and 14.696 psia (1.1953 mol; 379.5 scf per lbmol)", source: "GPA 2172 / US gas-industry standard conditions 60 degF, 14.696 psia" },
  { name: "Mscf", definition: `${1e3 * molesPerM3(SCF_P, SCF_T) * FT3} mol`, aliases: ["mscf", "MSCF"], help: "one thousand scf (M = thousand, gas-industry usage)", source: "as scf" },
  { name: "MMscf", definition: `${1e6 * molesPerM3(SCF_P, SCF_T) * FT3} mol`, aliases: ["mmscf", "MMSCF"], help: "one million scf", source: "as scf" },
  { name: "MMscfd", definition: `${(1e6 * molesPerM3(SCF_P, SCF_T) * FT3) / 86400} mol/s`, aliases: ["MMSCFD", "mmscfd"], help: "million standard cubic feet per day, a MOLAR flow (60 degF, 14.696 psia)", source: "as scf" },
  { name: "Mscfd", definition: `${(1e3 * molesPerM3(SCF_P, SCF_T) * FT3) / 86400} mol/s`, aliases: ["MSCFD", "mscfd"], help: "thousand standard cubic feet per day, a MOLAR flow (60 degF, 14.696 psia)", source: "as scf" },
  // Time: the day as `d` (Sm3/d, bbl/d on datasheets); mathjs has `day` only. No prefixes, so no
  // kd or md; a variable named d still wins over the unit, as for every unit name.
  { name: "d", definition: "86400 s", help: "day, 86400 s (as in Sm3/d, bbl/d)", source: "NIST SP 811 (2008) table 6: day = 86 400 s" },
  // Volumes: US and imperial gallons by name (mathjs's gal is the US gallon).
  { name: "USgal", definition: "3.785411784e-3 m^3", help: "US liquid gallon, 3.785411784 L (same as gal)", source: "NIST SP 811 B.8: gallon (US) = 3.785412e-3 m^3 (exact 231 in^3)" },
  { name: "UKgal", definition: "4.54609e-3 m^3", aliases: ["impgal"], help: "imperial (UK) gallon, 4.54609 L", source: "UK Weights and Measures Act 1985: gallon = 4.54609 dm^3" },
  // Transport and flow units seen on datasheets.
  { name: "cP", definition: "1e-3 Pa s", help: "centipoise, 1 mPa s", source: "NIST SP 811 B.8" },
  { name: "cSt", definition: "1e-6 m^2/s", help: "centistokes, 1 mm^2/s", source: "NIST SP 811 B.8" },
  { name: "gpm", definition: "3.785411784e-3 m^3/minute", help: "US gallon per minute", source: "NIST SP 811 B.8: gallon (US) = 3.785412e-3 m^3" },
  { name: "bbl", definition: "0.158987294928 m^3", override: true, help: "petroleum barrel, 42 US gal (replaces mathjs's 31-gallon bbl)", source: "NIST SP 811 B.8: barrel (for petroleum, 42 gal) = 0.1589873 m^3" },
];
