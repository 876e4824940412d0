import { describe, expect, it } from "vitest";
import { cubicRoots, NumericsInputError, polishCubicRoot } from "../../../lib/numerics/index.js";

// Check values are constructed: the cubic (x - r1)(x - r2)(x - r3) expanded (Vieta's formulas), so the
// expected roots are r1, r2, r3 themselves. Tolerances follow the conditioning of rounded coefficients:
// simple roots ~ eps, double roots ~ sqrt(eps) = 1.5e-8, triple roots ~ cbrt(eps) = 6e-6 (relative).
function fromRoots(r1: number, r2: number, r3: number): [number, number, number] {
  return [-(r1 + r2 + r3), r1 * r2 + r1 * r3 + r2 * r3, -r1 * r2 * r3];
}
function expectRoots(actual: number[], expected: number[], relTol: number): void {
  expect(actual.length).toBe(expected.length);
  const scale = Math.max(...expected.map(Math.abs), 1e-300);
  expected.forEach((r, i) => expect(Math.abs(actual[i]! - r)).toBeLessThanOrEqual(relTol * scale));
}

describe("cubicRoots", () => {
  it("cubicRoots of (x-1)(x-2)(x-3) are 1, 2, 3 ascending", () => {
    expectRoots(cubicRoots(...fromRoots(3, 1, 2)), [1, 2, 3], 1e-14);
  });
  it("cubicRoots of a cubic equation of state shape: Z roots 0.001, 0.05, 0.9", () => {
    expectRoots(cubicRoots(...fromRoots(0.9, 0.001, 0.05)), [0.001, 0.05, 0.9], 1e-14);
  });
  it("cubicRoots with one real root: x^3 + 1 = 0 gives -1", () => {
    expectRoots(cubicRoots(0, 0, 1), [-1], 1e-15);
  });
  it("cubicRoots keeps a complex pair out: x (x^2 - x + 0.25 + 1e-12) has only the root 0", () => {
    // roots 0 and 0.5 +/- 1e-6 i: the imaginary part is far above rounding, so not a double root.
    expect(cubicRoots(-1, 0.25 + 1e-12, 0)).toEqual([0]);
  });
  it("cubicRoots of (x-1)^2 (x-3) reports the double root twice", () => {
    expectRoots(cubicRoots(...fromRoots(1, 1, 3)), [1, 1, 3], 2e-8);
  });
  it("cubicRoots of (x-2)^3 reports a triple root", () => {
    expectRoots(cubicRoots(...fromRoots(2, 2, 2)), [2, 2, 2], 1e-5);
  });
  it("cubicRoots of (x-0.3)^3 (inexact coefficients) reports three roots near 0.3", () => {
    expectRoots(cubicRoots(...fromRoots(0.3, 0.3, 0.3)), [0.3, 0.3, 0.3], 3e-5);
  });
  it("cubicRoots near a double root: r and r(1+1e-6) are resolved with the third root exact", () => {
    const roots = cubicRoots(...fromRoots(0.07, 0.07 * (1 + 1e-6), 0.8));
    expectRoots(roots, [0.07, 0.07 * (1 + 1e-6), 0.8], 1e-8);
  });
  it("cubicRoots across scales: roots 1e-5, 1e-5, 1 (double root small next to a large one)", () => {
    const roots = cubicRoots(...fromRoots(1e-5, 1e-5, 1));
    expect(roots.length).toBe(3);
    expect(Math.abs(roots[2]! - 1)).toBeLessThan(1e-15);
    expect(Math.abs(roots[0]! - 1e-5)).toBeLessThan(1e-5 * 1e-6);
  });
  it("cubicRoots with negative and large roots: -1e3, 2, 5e2", () => {
    expectRoots(cubicRoots(...fromRoots(-1e3, 2, 5e2)), [-1e3, 2, 5e2], 1e-14);
  });
  it("cubicRoots x^3 = 0 gives the triple root 0 exactly", () => {
    expect(cubicRoots(0, 0, 0)).toEqual([0, 0, 0]);
  });
  it("cubicRoots residuals vanish on random cubics with three separated roots", () => {
    // Deterministic pseudo-random roots (LCG) so failures are reproducible.
    let seed = 12345;
    const rnd = () => ((seed = (seed * 1103515245 + 12345) % 2147483648) / 2147483648) * 4 - 2;
    for (let k = 0; k < 500; k++) {
      const r = [rnd(), rnd(), rnd()].sort((x, y) => x - y);
      if (r[1]! - r[0]! < 1e-3 || r[2]! - r[1]! < 1e-3) continue;
      expectRoots(cubicRoots(...fromRoots(r[0]!, r[1]!, r[2]!)), r, 1e-11);
    }
  });
  it("cubicRoots rejects non-finite coefficients naming the argument", () => {
    expect(() => cubicRoots(1, NaN, 0)).toThrow(NumericsInputError);
    expect(() => cubicRoots(1, NaN, 0)).toThrow(/argument 'a1' must be a finite number; got NaN/);
  });
});

describe("polishCubicRoot", () => {
  it("polishCubicRoot takes a rough estimate of a simple root to within a few ulps", () => {
    // (x - 1)(x - 2)(x - 3) from Vieta's formulas; 2.9 lies in the basin of the root 3.
    const [a2, a1, a0] = fromRoots(1, 2, 3);
    // Newton's error roughly squares each step: 0.1 -> 2e-2 -> 5e-4 -> 5e-7 -> 3e-13 (x - p/p' iterated by hand).
    expect(Math.abs(polishCubicRoot(2.9, a2, a1, a0) - 3)).toBeLessThan(1e-11);
    expect(Math.abs(polishCubicRoot(2.999, a2, a1, a0) - 3)).toBeLessThan(4 * Number.EPSILON * 3);
  });
  it("polishCubicRoot stops after maxSteps and keeps no step that raises |p|", () => {
    const [a2, a1, a0] = fromRoots(1, 2, 3);
    const one = polishCubicRoot(2.9, a2, a1, a0, 1);
    // One Newton step from 2.9: x - p(x)/p'(x) with p(2.9) = 1.9*0.9*(-0.1) = -0.171, p'(2.9) = 0.9*(-0.1) + 1.9*(-0.1) + 1.9*0.9 = 1.43 (hand calculation).
    expect(Math.abs(one - (2.9 + 0.171 / 1.43))).toBeLessThan(1e-12);
    expect(polishCubicRoot(2.9, a2, a1, a0, 0)).toBe(2.9);
    // x^3 at its triple root 0: p = p' = 0, so no step is taken and the root comes back untouched.
    expect(polishCubicRoot(0, 0, 0, 0)).toBe(0);
  });
});
