import { execFileSync } from "node:child_process";
import { describe, expect, it } from "vitest";
import { GAUSS10_WEIGHTS, KRONROD21_NODES, KRONROD21_WEIGHTS, kronrod21 } from "../../../lib/numerics/index.js";

describe("kronrod21 constants", () => {
  it("KRONROD21_NODES odd entries and GAUSS10_WEIGHTS match numpy.polynomial.legendre.leggauss(10)", () => {
    const out = execFileSync(
      "/usr/bin/python3",
      ["-c", "import json, numpy as np; x, w = np.polynomial.legendre.leggauss(10); print(json.dumps([list(x), list(w)]))"],
      { encoding: "utf8" },
    );
    const [x, w] = JSON.parse(out) as [number[], number[]];
    // numpy returns ascending nodes; ours are the positive half, descending: x[9-k] <-> node 2k+1.
    for (let k = 0; k < 5; k++) {
      expect(Math.abs(KRONROD21_NODES[2 * k + 1]! - x[9 - k]!)).toBeLessThan(1e-15);
      expect(Math.abs(GAUSS10_WEIGHTS[k]! - w[9 - k]!)).toBeLessThan(1e-15);
    }
  });
  it("KRONROD21_WEIGHTS sum to 2 (the length of [-1, 1])", () => {
    const sum = KRONROD21_WEIGHTS[10]! + 2 * KRONROD21_WEIGHTS.slice(0, 10).reduce((s, w) => s + w, 0);
    expect(Math.abs(sum - 2)).toBeLessThan(1e-15);
  });
  it("kronrod21 integrates x^k exactly on [-1, 1] for even k <= 30 (degree of exactness 31, Kronrod 1965)", () => {
    for (let k = 0; k <= 30; k += 2) {
      const r = kronrod21((x) => x ** k, -1, 1);
      expect(Math.abs(r.value - 2 / (k + 1))).toBeLessThan(1e-14); // closed form 2/(k+1)
    }
  });
  it("kronrod21 is not exact for x^34, so its error estimate is nonzero there", () => {
    const r = kronrod21((x) => x ** 34, -1, 1);
    expect(Math.abs(r.value - 2 / 35)).toBeGreaterThan(1e-12);
    expect(r.error).toBeGreaterThan(Math.abs(r.value - 2 / 35));
  });
  it("kronrod21 error floor is 50 eps times the integral of |f| (QUADPACK DQK21)", () => {
    const r = kronrod21(() => 1, 0, 3);
    expect(r.value).toBeCloseTo(3, 14);
    expect(r.resabs).toBeCloseTo(3, 14);
    expect(r.error).toBeCloseTo(50 * Number.EPSILON * 3, 25);
  });
});

describe("kronrod21 resasc", () => {
  it("kronrod21 resasc is the integral of |g - mean|: 0 for a constant, = resabs for an odd g on [-1, 1]", () => {
    // A constant has no deviation from its mean (up to rounding); for g(x) = x on
    // [-1, 1] the mean is 0, so resasc and resabs are the same sum, both ~ int |x| dx = 1 (calculus).
    const flat = kronrod21(() => 4, 0, 2);
    // Only rounding remains (the weights sum to 2 within a few eps); the estimate sits at its floor.
    expect(flat.resasc).toBeLessThan(1e-14);
    expect(flat.error).toBeLessThanOrEqual(50 * Number.EPSILON * flat.resabs);
    const odd = kronrod21((x) => x, -1, 1);
    expect(odd.resasc).toBeCloseTo(odd.resabs, 15);
    expect(Math.abs(odd.resabs - 1)).toBeLessThan(1e-2);
  });
});
