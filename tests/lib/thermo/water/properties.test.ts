import { describe, expect, it } from "vitest";
import { fromGibbs, fromHelmholtz } from "../../../../lib/thermo/water/properties.js";

// An ideal gas with constant cp: gamma = ln(pi) + c ln(tau) (reduced Gibbs energy up to linear terms in tau).
// Then v = RT/p, cp = c R, cv = (c - 1) R, w^2 = (cp/cv) R T (textbook ideal-gas relations).
describe("fromGibbs", () => {
  it("fromGibbs reproduces the ideal-gas relations for an ideal-gas gamma", () => {
    const R = 461.526; // J/(kg K), IF97 Eq. (1)
    const c = 4;
    const T = 500;
    const pMPa = 0.1;
    const tau = 540 / T;
    const pi = pMPa;
    const st = fromGibbs(T, pMPa, pi, tau, {
      g: Math.log(pi) + c * Math.log(tau),
      gp: 1 / pi,
      gpp: -1 / (pi * pi),
      gt: c / tau,
      gtt: -c / (tau * tau),
      gpt: 0,
    });
    expect(st.v).toBeCloseTo((R * T) / (pMPa * 1e6), 12);
    expect(st.h).toBeCloseTo(c * R * T, 6);
    expect(st.cp).toBeCloseTo(c * R, 9);
    expect(st.cv).toBeCloseTo((c - 1) * R, 9);
    expect(st.w).toBeCloseTo(Math.sqrt((c / (c - 1)) * R * T), 9);
  });
});

describe("fromHelmholtz", () => {
  it("fromHelmholtz gives p = rho R T for phi = ln(delta) (ideal gas)", () => {
    const st = fromHelmholtz(2, 600, 2 / 322, 647.096 / 600, { f: Math.log(2 / 322), fd: 322 / 2, fdd: -(322 * 322) / 4, ft: 0, ftt: 1e-300, fdt: 0 });
    expect(st.p).toBeCloseTo(2 * 461.526 * 600, 6);
    expect(st.h - st.u).toBeCloseTo(st.p * st.v, 6); // h = u + p v (definition)
    expect(st.g).toBeCloseTo(st.h - 600 * st.s, 6);
  });
});
