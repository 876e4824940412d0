/**
 * Refrigerants by ASHRAE 34 number. Critical constants are those of each fluid's reference equation of
 * state (critical density converted to Vc = M / rhoc); Zc = Pc Vc / (R Tc).
 */
import { cpCubic, fromTable } from "./record.js";
import { REFRIG_CP_APPROX, RPP4_CP } from "./sources.js";
import type { Substance } from "./types.js";

const CP_NOTE = "ideal-gas Cp correlation approximate (+-3 %)";

export const REFRIGERANTS: readonly Substance[] = [
  { id: "r-134a", name: "R-134a (1,1,1,2-tetrafluoroethane)", formula: "CH2FCF3", aliases: ["R134a", "HFC-134a", "1,1,1,2-tetrafluoroethane", "C2H2F4"], cas: "811-97-2",
    M: 102.032, omega: 0.327, Tc: 374.21, Pc_bar: 40.593, Zc: 0.260, Vc_cm3: 199.3, Tb: 247.08,
    cp: cpCubic(11.484, 0.30773, -1.8095e-4, -7.4074e-9, 250, 500, REFRIG_CP_APPROX),
    source: "Tillner-Roth & Baehr, J. Phys. Chem. Ref. Data 23 (1994) 657 (from memory)", note: CP_NOTE },
  { id: "r-32", name: "R-32 (difluoromethane)", formula: "CH2F2", aliases: ["R32", "HFC-32", "difluoromethane"], cas: "75-10-5",
    M: 52.024, omega: 0.277, Tc: 351.255, Pc_bar: 57.82, Zc: 0.243, Vc_cm3: 122.7, Tb: 221.5,
    cp: cpCubic(27.601, 0.013084, 1.79e-4, -1.6669e-7, 250, 600, REFRIG_CP_APPROX),
    source: "Tillner-Roth & Yokozeki, J. Phys. Chem. Ref. Data 26 (1997) 1273 (from memory)", note: CP_NOTE },
  { id: "r-125", name: "R-125 (pentafluoroethane)", formula: "C2HF5", aliases: ["R125", "HFC-125", "pentafluoroethane"], cas: "354-33-6",
    M: 120.022, omega: 0.305, Tc: 339.17, Pc_bar: 36.177, Zc: 0.268, Vc_cm3: 209.25, Tb: 225.06,
    cp: cpCubic(16.337, 0.33318, -2.2647e-4, 0, 250, 500, REFRIG_CP_APPROX),
    source: "Lemmon & Jacobsen, J. Phys. Chem. Ref. Data 34 (2005) 69 (from memory)", note: CP_NOTE },
  { id: "r-22", name: "R-22 (chlorodifluoromethane)", formula: "CHClF2", aliases: ["R22", "HCFC-22", "chlorodifluoromethane"], cas: "75-45-6",
    M: 86.468, omega: 0.221, Tc: 369.295, Pc_bar: 49.90, Zc: 0.268, Vc_cm3: 165.07, Tb: 232.34,
    cp: cpCubic(17.30, 1.618e-1, -1.170e-4, 3.058e-8, 273, 1500, RPP4_CP),
    source: "Kamei, Beyerlein & Jacobsen, Int. J. Thermophys. 16 (1995) 1155 (from memory)" },
  { id: "r-1234yf", name: "R-1234yf (2,3,3,3-tetrafluoropropene)", formula: "CF3CF=CH2", aliases: ["R1234yf", "HFO-1234yf", "2,3,3,3-tetrafluoropropene", "C3H2F4"], cas: "754-12-1",
    M: 114.042, omega: 0.276, Tc: 367.85, Pc_bar: 33.822, Zc: 0.265, Vc_cm3: 239.8, Tb: 243.67,
    cp: cpCubic(24.0, 0.32, -2.0e-4, 0, 250, 500, REFRIG_CP_APPROX),
    source: "Richter, McLinden & Lemmon, J. Chem. Eng. Data 56 (2011) 3254 (from memory)", note: CP_NOTE },
].map(fromTable);
