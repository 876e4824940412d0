import { describe, expect, it } from "vitest";
import { derivative, DerivativeError, StopRequested } from "../../../lib/numerics/index.js";

// Check values are the analytic derivatives (calculus), tolerances explicit.
describe("derivative", () => {
  it("derivative of sin at 1 is cos(1) to 1e-12", () => {
    const r = derivative(Math.sin, 1);
    expect(Math.abs(r.value - Math.cos(1))).toBeLessThan(1e-12);
    expect(r.error).toBeLessThan(1e-10);
    expect(r.evaluations).toBeGreaterThan(2);
  });
  it("derivative of exp at 0 (x = 0 uses scale 1) is 1", () => {
    expect(Math.abs(derivative(Math.exp, 0).value - 1)).toBeLessThan(1e-12);
  });
  it("derivative second order of exp at 0 is 1", () => {
    expect(Math.abs(derivative(Math.exp, 0, { order: 2 }).value - 1)).toBeLessThan(1e-9);
  });
  it("derivative takes its step from the scale of x: d(RT/V)/dV at V = 1e-4 m^3/mol is -RT/V^2", () => {
    const RT = 8.314462618 * 300; // CODATA 2018 R times 300 K
    const r = derivative((v) => RT / v, 1e-4);
    expect(Math.abs(r.value / (-RT / 1e-8) - 1)).toBeLessThan(1e-10);
  });
  it("derivative at a pressure scale: d(P^2)/dP at 1e7 Pa is 2e7", () => {
    expect(Math.abs(derivative((p) => p * p, 1e7).value / 2e7 - 1)).toBeLessThan(1e-12);
  });
  it("derivative error estimate covers the actual error for log at 3", () => {
    const r = derivative(Math.log, 3);
    expect(Math.abs(r.value - 1 / 3)).toBeLessThanOrEqual(r.error + 1e-15);
  });
  it("derivative shrinks the step when f is undefined beyond a nearby limit (sqrt near 0)", () => {
    // x = 1e-3 with h = 0.05 reaches negative x where sqrt is NaN; the step is cut until finite.
    const r = derivative(Math.sqrt, 1e-3, { h: 0.05 });
    expect(Math.abs(r.value - 0.5 / Math.sqrt(1e-3))).toBeLessThan(1e-6);
  });
  it("derivative fails clearly when f is not finite at all around x", () => {
    expect(() => derivative(() => NaN, 1)).toThrow(DerivativeError);
    expect(() => derivative(() => NaN, 1)).toThrow(/not finite near x = 1/);
  });
  it("derivative names bad options", () => {
    expect(() => derivative(Math.sin, 1, { order: 3 })).toThrow(/option 'order' must be 1 or 2; got 3/);
    expect(() => derivative(Math.sin, 1, { h: 0 })).toThrow(/option 'h' must be a finite number > 0; got 0/);
  });
  it("derivative polls shouldStop", () => {
    expect(() => derivative(Math.sin, 1, { shouldStop: () => true })).toThrow(StopRequested);
  });
});
