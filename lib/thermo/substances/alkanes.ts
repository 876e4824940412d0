/**
 * Saturated hydrocarbons C1-C10 and common isomers. Constants as printed in the cited tables
 * (bar, cm^3/mol, g/mol), converted to SI by fromTable.
 */
import { cpCubic, cpTableC1, fromTable } from "./record.js";
import { PGL5_A, RPP4_CP, SVNA_B1, SVNA_C1 } from "./sources.js";
import type { Substance } from "./types.js";

export const ALKANES: readonly Substance[] = [
  { id: "methane", name: "Methane", formula: "CH4", aliases: ["C1", "R-50", "natural gas (as methane)"], cas: "74-82-8",
    M: 16.043, omega: 0.012, Tc: 190.6, Pc_bar: 45.99, Zc: 0.286, Vc_cm3: 98.6, Tb: 111.4,
    cp: cpTableC1(1.702, 9.081, -2.164, 0, 1500, SVNA_C1), source: SVNA_B1 },
  { id: "ethane", name: "Ethane", formula: "C2H6", aliases: ["C2", "R-170"], cas: "74-84-0",
    M: 30.07, omega: 0.1, Tc: 305.3, Pc_bar: 48.72, Zc: 0.279, Vc_cm3: 145.5, Tb: 184.6,
    cp: cpTableC1(1.131, 19.225, -5.561, 0, 1500, SVNA_C1), source: SVNA_B1 },
  { id: "propane", name: "Propane", formula: "C3H8", aliases: ["C3", "R-290"], cas: "74-98-6",
    M: 44.097, omega: 0.152, Tc: 369.8, Pc_bar: 42.48, Zc: 0.276, Vc_cm3: 200.0, Tb: 231.1,
    cp: cpTableC1(1.213, 28.785, -8.824, 0, 1500, SVNA_C1), source: SVNA_B1 },
  { id: "n-butane", name: "n-Butane", formula: "C4H10", aliases: ["butane", "nC4", "n-C4", "R-600"], cas: "106-97-8",
    M: 58.123, omega: 0.2, Tc: 425.1, Pc_bar: 37.96, Zc: 0.274, Vc_cm3: 255.0, Tb: 272.7,
    cp: cpTableC1(1.935, 36.915, -11.402, 0, 1500, SVNA_C1), source: SVNA_B1 },
  { id: "isobutane", name: "Isobutane", formula: "i-C4H10", aliases: ["iC4", "i-C4", "i-butane", "2-methylpropane", "R-600a"], cas: "75-28-5",
    M: 58.123, omega: 0.181, Tc: 408.1, Pc_bar: 36.48, Zc: 0.282, Vc_cm3: 262.7, Tb: 261.4,
    cp: cpTableC1(1.677, 37.853, -11.945, 0, 1500, SVNA_C1), source: SVNA_B1 },
  { id: "n-pentane", name: "n-Pentane", formula: "C5H12", aliases: ["pentane", "nC5", "n-C5", "R-601"], cas: "109-66-0",
    M: 72.15, omega: 0.252, Tc: 469.7, Pc_bar: 33.70, Zc: 0.270, Vc_cm3: 313.0, Tb: 309.2,
    cp: cpTableC1(2.464, 45.351, -14.111, 0, 1500, SVNA_C1), source: SVNA_B1 },
  { id: "isopentane", name: "Isopentane", formula: "i-C5H12", aliases: ["iC5", "i-C5", "2-methylbutane", "R-601a"], cas: "78-78-4",
    M: 72.15, omega: 0.227, Tc: 460.39, Pc_bar: 33.81, Zc: 0.270, Vc_cm3: 306.0, Tb: 300.99,
    cp: cpCubic(-9.525, 5.066e-1, -2.729e-4, 5.723e-8, 273, 1500, RPP4_CP), source: PGL5_A },
  { id: "neopentane", name: "Neopentane", formula: "neo-C5H12", aliases: ["neoC5", "2,2-dimethylpropane"], cas: "463-82-1",
    M: 72.15, omega: 0.196, Tc: 433.75, Pc_bar: 31.99, Zc: 0.272, Vc_cm3: 307.0, Tb: 282.65,
    cp: cpCubic(-16.59, 5.552e-1, -3.306e-4, 7.633e-8, 273, 1500, RPP4_CP), source: PGL5_A },
  { id: "n-hexane", name: "n-Hexane", formula: "C6H14", aliases: ["hexane", "nC6", "n-C6"], cas: "110-54-3",
    M: 86.177, omega: 0.301, Tc: 507.6, Pc_bar: 30.25, Zc: 0.266, Vc_cm3: 371.0, Tb: 341.9,
    cp: cpTableC1(3.025, 53.722, -16.791, 0, 1500, SVNA_C1), source: SVNA_B1 },
  { id: "n-heptane", name: "n-Heptane", formula: "C7H16", aliases: ["heptane", "nC7", "n-C7"], cas: "142-82-5",
    M: 100.204, omega: 0.35, Tc: 540.2, Pc_bar: 27.40, Zc: 0.261, Vc_cm3: 428.0, Tb: 371.6,
    cp: cpTableC1(3.570, 62.127, -19.486, 0, 1500, SVNA_C1), source: SVNA_B1 },
  { id: "n-octane", name: "n-Octane", formula: "C8H18", aliases: ["octane", "nC8", "n-C8"], cas: "111-65-9",
    M: 114.231, omega: 0.4, Tc: 568.7, Pc_bar: 24.90, Zc: 0.256, Vc_cm3: 486.0, Tb: 398.8,
    // A = 4.108, not the 8.163 printed in some printings and reproductions of Table C.1: 8.163 contradicts the
    // table's own Cp298/R column (23.174) and the series (A rises about 0.54 per CH2), and gives Cp 20 % high.
    cp: cpTableC1(4.108, 70.567, -22.208, 0, 1500, `${SVNA_C1}; A = 4.108 in place of the misprinted 8.163 (consistent with the printed Cp298/R = 23.174)`), source: SVNA_B1 },
  { id: "isooctane", name: "Isooctane", formula: "i-C8H18", aliases: ["iC8", "2,2,4-trimethylpentane"], cas: "540-84-1",
    M: 114.231, omega: 0.303, Tc: 543.8, Pc_bar: 25.68, Zc: 0.266, Vc_cm3: 468.0, Tb: 372.39,
    cp: cpCubic(-7.461, 7.787e-1, -4.287e-4, 9.173e-8, 273, 1500, RPP4_CP), source: PGL5_A },
  { id: "n-nonane", name: "n-Nonane", formula: "C9H20", aliases: ["nonane", "nC9", "n-C9"], cas: "111-84-2",
    M: 128.258, omega: 0.445, Tc: 594.6, Pc_bar: 22.90, Zc: 0.255, Vc_cm3: 551.0, Tb: 423.97,
    cp: cpCubic(-8.374, 8.729e-1, -4.823e-4, 1.031e-7, 273, 1500, RPP4_CP), source: PGL5_A },
  { id: "n-decane", name: "n-Decane", formula: "C10H22", aliases: ["decane", "nC10", "n-C10"], cas: "124-18-5",
    M: 142.285, omega: 0.49, Tc: 617.7, Pc_bar: 21.10, Zc: 0.256, Vc_cm3: 624.0, Tb: 447.3,
    cp: cpCubic(-7.913, 9.609e-1, -5.288e-4, 1.131e-7, 273, 1500, RPP4_CP), source: PGL5_A },
  { id: "cyclohexane", name: "Cyclohexane", formula: "C6H12", aliases: ["cC6", "cyclo-C6"], cas: "110-82-7",
    M: 84.161, omega: 0.21, Tc: 553.6, Pc_bar: 40.73, Zc: 0.273, Vc_cm3: 308.0, Tb: 353.9,
    cp: cpTableC1(-3.876, 63.249, -20.928, 0, 1500, SVNA_C1), source: SVNA_B1 },
].map(fromTable);
