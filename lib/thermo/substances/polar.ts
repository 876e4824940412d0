/**
 * Water, ammonia, alcohols and ketones: polar fluids for which generalized (two-parameter corresponding
 * states) correlations are least accurate; records say so in their notes.
 */
import { cpCubic, cpTableC1, fromTable } from "./record.js";
import { IAPWS_CRIT, RPP4_CP, SVNA_B1, SVNA_C1 } from "./sources.js";
import type { Substance } from "./types.js";

const POLAR_NOTE = "polar fluid: generalized correlations (Lee-Kesler, virial, cubic with kij = 0) are least accurate here";

export const POLAR: readonly Substance[] = [
  { id: "water", name: "Water", formula: "H2O", aliases: ["steam", "R-718"], cas: "7732-18-5",
    // Vc = M / rhoc = 18.015268 g/mol / 322 kg/m^3; Zc = Pc Vc / (R Tc).
    M: 18.015268, omega: 0.3443, Tc: 647.096, Pc_bar: 220.64, Zc: 0.2294, Vc_cm3: 55.948, Tb: 373.124,
    cp: cpTableC1(3.470, 1.450, 0, 0.121, 2000, SVNA_C1), source: IAPWS_CRIT,
    note: POLAR_NOTE + "; use if97() for water and steam properties" },
  { id: "ammonia", name: "Ammonia", formula: "NH3", aliases: ["R-717", "R717"], cas: "7664-41-7",
    M: 17.031, omega: 0.253, Tc: 405.7, Pc_bar: 112.80, Zc: 0.242, Vc_cm3: 72.5, Tb: 239.7,
    cp: cpTableC1(3.578, 3.020, 0, -0.186, 1800, SVNA_C1), source: SVNA_B1, note: POLAR_NOTE },
  { id: "methanol", name: "Methanol", formula: "CH3OH", aliases: ["CH4O", "methyl alcohol", "MeOH"], cas: "67-56-1",
    M: 32.042, omega: 0.564, Tc: 512.6, Pc_bar: 80.97, Zc: 0.224, Vc_cm3: 118.0, Tb: 337.9,
    cp: cpTableC1(2.211, 12.216, -3.450, 0, 1500, SVNA_C1), source: SVNA_B1, note: POLAR_NOTE },
  { id: "ethanol", name: "Ethanol", formula: "C2H5OH", aliases: ["C2H6O", "ethyl alcohol", "EtOH"], cas: "64-17-5",
    M: 46.069, omega: 0.645, Tc: 513.9, Pc_bar: 61.48, Zc: 0.240, Vc_cm3: 167.0, Tb: 351.4,
    cp: cpTableC1(3.518, 20.001, -6.002, 0, 1500, SVNA_C1), source: SVNA_B1, note: POLAR_NOTE },
  { id: "acetone", name: "Acetone", formula: "C3H6O", aliases: ["propanone", "2-propanone", "dimethyl ketone"], cas: "67-64-1",
    M: 58.08, omega: 0.307, Tc: 508.2, Pc_bar: 47.01, Zc: 0.233, Vc_cm3: 209.0, Tb: 329.4,
    cp: cpCubic(6.301, 2.606e-1, -1.253e-4, 2.038e-8, 273, 1500, RPP4_CP), source: SVNA_B1, note: POLAR_NOTE },
].map(fromTable);
