import { describe, expect, it } from "vitest";
import { fromGibbs, fromHelmholtz, idealPlusResidual } from "../../../../lib/thermo/water/properties.js";

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

describe("idealPlusResidual", () => {
  it("idealPlusResidual with no residual part is the ideal gas: v = RT/p, cp = c R for gamma_o = c ln(tau)", () => {
    const R = 461.526; // J/(kg K), IF97 Eq. (1)
    const c = 4;
    const T = 500;
    const pMPa = 2;
    const tau = 540 / T;
    const none = { f: 0, fx: 0, fxx: 0, fy: 0, fyy: 0, fxy: 0 };
    const d = idealPlusResidual(pMPa, { f: c * Math.log(tau), fy: c / tau, fyy: -c / (tau * tau) }, none);
    const st = fromGibbs(T, pMPa, pMPa, tau, d);
    // Textbook ideal-gas relations: v = RT/p, cp = c R.
    expect(Math.abs(st.v / ((R * T) / (pMPa * 1e6)) - 1)).toBeLessThan(1e-12);
    expect(Math.abs(st.cp / (c * R) - 1)).toBeLessThan(1e-12);
  });
  it("idealPlusResidual adds the residual's pi and tau derivatives to the ideal part's term by term", () => {
    const r = { f: 0.1, fx: 0.2, fxx: 0.3, fy: 0.4, fyy: 0.5, fxy: 0.6 };
    const d = idealPlusResidual(2, { f: 1, fy: 2, fyy: 3 }, r);
    // d/dpi ln(pi) = 1/pi, d2/dpi2 ln(pi) = -1/pi^2 (calculus); the ideal part has no pi-tau cross term.
    expect(d).toEqual({ g: Math.log(2) + 1 + 0.1, gp: 0.5 + 0.2, gpp: -0.25 + 0.3, gt: 2 + 0.4, gtt: 3 + 0.5, gpt: 0.6 });
  });
});
