/**
 * Alkenes, alkynes and aromatics. Constants as printed in the cited tables (bar, cm^3/mol, g/mol).
 */
import { cpCubic, cpTableC1, fromTable } from "./record.js";
import { RPP4_CP, SVNA_B1, SVNA_C1 } from "./sources.js";
import type { Substance } from "./types.js";

export const UNSATURATED: readonly Substance[] = [
  { id: "ethylene", name: "Ethylene", formula: "C2H4", aliases: ["ethene", "C2=", "R-1150"], cas: "74-85-1",
    M: 28.054, omega: 0.087, Tc: 282.3, Pc_bar: 50.40, Zc: 0.281, Vc_cm3: 131.0, Tb: 169.4,
    cp: cpTableC1(1.424, 14.394, -4.392, 0, 1500, SVNA_C1), source: SVNA_B1 },
  { id: "propylene", name: "Propylene", formula: "C3H6", aliases: ["propene", "C3=", "R-1270"], cas: "115-07-1",
    M: 42.081, omega: 0.14, Tc: 365.6, Pc_bar: 46.65, Zc: 0.289, Vc_cm3: 188.4, Tb: 225.5,
    cp: cpTableC1(1.637, 22.706, -6.915, 0, 1500, SVNA_C1), source: SVNA_B1 },
  { id: "1-butene", name: "1-Butene", formula: "C4H8", aliases: ["butene", "but-1-ene", "butylene"], cas: "106-98-9",
    M: 56.108, omega: 0.191, Tc: 420.0, Pc_bar: 40.43, Zc: 0.277, Vc_cm3: 239.3, Tb: 266.9,
    cp: cpTableC1(1.967, 31.630, -9.873, 0, 1500, SVNA_C1), source: SVNA_B1 },
  { id: "1,3-butadiene", name: "1,3-Butadiene", formula: "C4H6", aliases: ["butadiene"], cas: "106-99-0",
    M: 54.092, omega: 0.19, Tc: 425.2, Pc_bar: 42.77, Zc: 0.267, Vc_cm3: 220.4, Tb: 268.7,
    cp: cpTableC1(2.734, 26.786, -8.882, 0, 1500, SVNA_C1), source: SVNA_B1 },
  { id: "acetylene", name: "Acetylene", formula: "C2H2", aliases: ["ethyne"], cas: "74-86-2",
    M: 26.038, omega: 0.187, Tc: 308.3, Pc_bar: 61.39, Zc: 0.271, Vc_cm3: 113.0, Tb: 189.4,
    cp: cpTableC1(6.132, 1.952, 0, -1.299, 1500, SVNA_C1), source: SVNA_B1,
    note: "Tb is the sublimation point at 101325 Pa (acetylene has no liquid at 1 atm)" },
  { id: "benzene", name: "Benzene", formula: "C6H6", aliases: [], cas: "71-43-2",
    M: 78.114, omega: 0.21, Tc: 562.2, Pc_bar: 48.98, Zc: 0.271, Vc_cm3: 259.0, Tb: 353.2,
    cp: cpTableC1(-0.206, 39.064, -13.301, 0, 1500, SVNA_C1), source: SVNA_B1 },
  { id: "toluene", name: "Toluene", formula: "C7H8", aliases: ["methylbenzene"], cas: "108-88-3",
    M: 92.141, omega: 0.262, Tc: 591.8, Pc_bar: 41.06, Zc: 0.264, Vc_cm3: 316.0, Tb: 383.8,
    cp: cpTableC1(0.290, 47.052, -15.716, 0, 1500, SVNA_C1), source: SVNA_B1 },
  { id: "ethylbenzene", name: "Ethylbenzene", formula: "C8H10", aliases: [], cas: "100-41-4",
    M: 106.167, omega: 0.303, Tc: 617.2, Pc_bar: 36.06, Zc: 0.263, Vc_cm3: 374.0, Tb: 409.4,
    cp: cpTableC1(1.124, 55.380, -18.476, 0, 1500, SVNA_C1), source: SVNA_B1 },
  { id: "o-xylene", name: "o-Xylene", formula: "o-C8H10", aliases: ["oxylene", "1,2-dimethylbenzene"], cas: "95-47-6",
    M: 106.167, omega: 0.31, Tc: 630.3, Pc_bar: 37.34, Zc: 0.262, Vc_cm3: 370.0, Tb: 417.6,
    cp: cpCubic(-15.85, 5.962e-1, -3.443e-4, 7.528e-8, 273, 1500, RPP4_CP), source: SVNA_B1 },
  { id: "m-xylene", name: "m-Xylene", formula: "m-C8H10", aliases: ["mxylene", "1,3-dimethylbenzene"], cas: "108-38-3",
    M: 106.167, omega: 0.326, Tc: 617.1, Pc_bar: 35.36, Zc: 0.259, Vc_cm3: 376.0, Tb: 412.3,
    cp: cpCubic(-29.17, 6.297e-1, -3.747e-4, 8.478e-8, 273, 1500, RPP4_CP), source: SVNA_B1 },
  { id: "p-xylene", name: "p-Xylene", formula: "p-C8H10", aliases: ["pxylene", "1,4-dimethylbenzene"], cas: "106-42-3",
    M: 106.167, omega: 0.322, Tc: 616.2, Pc_bar: 35.11, Zc: 0.260, Vc_cm3: 379.0, Tb: 411.5,
    cp: cpCubic(-25.09, 6.042e-1, -3.374e-4, 6.820e-8, 273, 1500, RPP4_CP), source: SVNA_B1 },
  { id: "styrene", name: "Styrene", formula: "C8H8", aliases: ["vinylbenzene", "ethenylbenzene"], cas: "100-42-5",
    M: 104.152, omega: 0.297, Tc: 636.0, Pc_bar: 38.40, Zc: 0.256, Vc_cm3: 352.0, Tb: 418.3,
    cp: cpTableC1(2.050, 50.192, -16.662, 0, 1500, SVNA_C1), source: SVNA_B1 },
].map(fromTable);
