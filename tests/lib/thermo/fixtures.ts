/**
 * Inline Substance records for the thermo tests (so they do not depend on the databank).
 * Constants: Smith, Van Ness & Abbott, Introduction to Chemical Engineering Thermodynamics, 7th ed.,
 * Appendix B, Table B.1 (from memory). Cp is not used by these tests.
 */
import type { Substance } from "../../../lib/thermo/substances/types.js";

const noCp = { form: "unused", coefficients: [], Tmin: 0, Tmax: 0, source: "not needed by these tests" };

function sub(id: string, M: number, Tc: number, PcBar: number, VcCm3: number, Zc: number, omega: number, Tb: number): Substance {
  return { id, name: id, formula: id, aliases: [], M, Tc, Pc: PcBar * 1e5, Vc: VcCm3 * 1e-6, Zc, omega, Tb, cp: noCp, source: "SVNA 7th ed. Table B.1 (from memory)" };
}

export const methane = sub("methane", 0.016043, 190.6, 45.99, 98.6, 0.286, 0.012, 111.4);
export const ethane = sub("ethane", 0.03007, 305.3, 48.72, 145.5, 0.279, 0.1, 184.6);
export const propane = sub("propane", 0.044097, 369.8, 42.48, 200.0, 0.276, 0.152, 231.1);
export const butane = sub("n-butane", 0.058123, 425.1, 37.96, 255.0, 0.274, 0.2, 272.7);
export const water = sub("water", 0.018015, 647.1, 220.55, 55.9, 0.229, 0.345, 373.15);
/** n-decane, omega 0.490 (> 0.49 switches Peng-Robinson to the 1978 kappa at 0.491). */
export const decane = sub("n-decane", 0.142285, 617.7, 21.1, 600.0, 0.256, 0.49, 447.3);
