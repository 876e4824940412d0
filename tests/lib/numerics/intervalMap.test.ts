import { describe, expect, it } from "vitest";
import { intervalMap } from "../../../lib/numerics/intervalMap.js";

// The maps are checked by calculus: end points land where they should, and the jacobian agrees with
// a central difference of x(u).
function checkJacobian(map: ReturnType<typeof intervalMap>, u: number): void {
  const h = 1e-6;
  const fd = (map.x(u + h) - map.x(u - h)) / (2 * h);
  expect(Math.abs(map.jacobian(u) - Math.abs(fd)) / Math.abs(fd)).toBeLessThan(1e-7);
}

describe("intervalMap", () => {
  it("intervalMap finite smoothed: u = 0, 0.5, 1 map to a, midpoint, b", () => {
    const m = intervalMap(2, 6, true);
    expect(m.x(0)).toBe(2);
    expect(m.x(0.5)).toBe(4);
    expect(m.x(1)).toBe(6);
    expect(m.jacobian(0)).toBe(0); // s'(0) = 0 is what tames end-point singularities
    [0.1, 0.4, 0.7, 0.95].forEach((u) => checkJacobian(m, u));
  });
  it("intervalMap keeps relative precision of the distance to the upper end", () => {
    const m = intervalMap(0, 1, true);
    const u = 1 - 1e-6;
    const expected = 3e-12 - 2e-18; // 1 - s(u) = v^2 (3 - 2v), v = 1e-6 (algebra)
    expect(Math.abs(1 - m.x(u) - expected) / expected).toBeLessThan(1e-3);
  });
  it("intervalMap semi-infinite [a, inf) uses L = |a| and reaches a at u = 1", () => {
    const m = intervalMap(1e-4, Infinity, false);
    expect(m.x(1)).toBe(1e-4);
    expect(m.x(0.5)).toBeCloseTo(2e-4, 18); // a + L (1 - t)/t with t = 0.5, L = 1e-4
    [0.2, 0.5, 0.9].forEach((u) => checkJacobian(m, u));
  });
  it("intervalMap lower-infinite (-inf, b] increases from -inf to b", () => {
    const m = intervalMap(-Infinity, 2, true);
    expect(m.x(1)).toBe(2);
    expect(m.x(0.3)).toBeLessThan(m.x(0.6));
    [0.2, 0.5, 0.9].forEach((u) => checkJacobian(m, u));
  });
  it("intervalMap (-inf, inf) maps 0.5 to 0 and is odd about it", () => {
    const m = intervalMap(-Infinity, Infinity, true);
    expect(m.x(0.5)).toBe(0);
    expect(m.x(0.2)).toBeCloseTo(-m.x(0.8), 12);
    [0.1, 0.3, 0.6, 0.85].forEach((u) => checkJacobian(m, u));
  });
  it("intervalMap honours an explicit scale", () => {
    expect(intervalMap(0, Infinity, false, 10).x(0.5)).toBeCloseTo(10, 12);
  });
});
