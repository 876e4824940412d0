import { describe, expect, it } from "vitest";
import { EpsilonTable } from "../../../lib/numerics/epsilonTable.js";

describe("EpsilonTable", () => {
  it("EpsilonTable.extrapolate is exact for a geometric sequence after three elements", () => {
    // S_n = 3 + 0.5 * 0.7^n: Aitken's delta-squared (the first epsilon column) recovers S = 3 exactly
    // from any three consecutive elements (algebra: S_n - S is geometric).
    const t = new EpsilonTable();
    for (let n = 0; n < 3; n++) t.push(3 + 0.5 * 0.7 ** n);
    const e = t.extrapolate();
    expect(Math.abs(e.value - 3)).toBeLessThan(1e-14);
    // DQELG compares the last three extrapolations; with fewer it reports no usable estimate.
    expect(e.error).toBe(Number.MAX_VALUE);
  });

  it("EpsilonTable.extrapolate accelerates the alternating harmonic series to ln 2", () => {
    // 1 - 1/2 + 1/3 - ... = ln 2 (Mercator series; ln 2 = 0.6931471805599453 from memory, = Math.LN2).
    // 14 partial sums alone are off by 3.4e-2; the Shanks transforms of the epsilon table by < 1e-9.
    const t = new EpsilonTable();
    let sum = 0;
    let last = { value: NaN, error: NaN };
    for (let k = 1; k <= 14; k++) {
      sum += (k % 2 ? 1 : -1) / k;
      t.push(sum);
      last = t.extrapolate();
    }
    expect(Math.abs(sum - Math.LN2)).toBeGreaterThan(1e-2);
    expect(Math.abs(last.value - Math.LN2)).toBeLessThan(1e-9);
    // The error estimate must cover the actual error (it is the spread of the last three results).
    expect(last.error).toBeGreaterThanOrEqual(Math.abs(last.value - Math.LN2));
    expect(last.error).toBeLessThan(1e-7);
  });

  it("EpsilonTable.extrapolate of the Leibniz series approaches pi/4", () => {
    // 1 - 1/3 + 1/5 - ... = pi/4 (Leibniz); the partial sums converge like 1/n, the transforms much faster.
    const t = new EpsilonTable();
    let sum = 0;
    let last = { value: NaN, error: NaN };
    for (let k = 0; k < 15; k++) {
      sum += (k % 2 ? -1 : 1) / (2 * k + 1);
      t.push(sum);
      last = t.extrapolate();
    }
    expect(Math.abs(last.value - Math.PI / 4)).toBeLessThan(1e-10);
    expect(last.error).toBeGreaterThanOrEqual(Math.abs(last.value - Math.PI / 4));
  });

  it("EpsilonTable.extrapolate reports convergence for a constant sequence", () => {
    const t = new EpsilonTable();
    for (let n = 0; n < 4; n++) t.push(1.25);
    const e = t.extrapolate();
    expect(e.value).toBe(1.25);
    expect(e.error).toBeLessThan(1e-14); // floor 5 eps |value| (DQELG)
  });

  it("EpsilonTable keeps at most 50 elements however long the sequence", () => {
    const t = new EpsilonTable();
    for (let n = 1; n <= 120; n++) {
      t.push(1 + 1 / n ** 1.5 + (n % 3) * 1e-3 / n);
      const e = t.extrapolate();
      expect(Number.isNaN(e.value)).toBe(false);
      expect(t.size).toBeLessThanOrEqual(50);
    }
  });

  it("EpsilonTable.extrapolate with fewer than three elements returns the latest one", () => {
    const t = new EpsilonTable();
    t.push(2);
    t.push(2.5);
    expect(t.extrapolate()).toEqual({ value: 2.5, error: Number.MAX_VALUE });
  });
});
