import { describe, expect, it } from "vitest";
import { subdivide, type SubdivideSettings } from "../../../lib/numerics/subdivide.js";

// subdivide works on u in [0, 1] with the caller counting evaluations; this helper does the counting.
function run(g: (u: number) => number, extra: Partial<SubdivideSettings> = {}) {
  let n = 0;
  const counted = (u: number) => {
    n++;
    return g(u);
  };
  const out = subdivide(counted, { abs: 0, rel: 1e-10, maxEval: 50_000, poll: () => {}, evaluations: () => n, ...extra });
  return { ...out, evaluations: n };
}

describe("subdivide", () => {
  it("subdivide extrapolates an end-point singularity u^-1/2 to 2 (antiderivative 2 sqrt(u))", () => {
    const r = run((u) => u ** -0.5);
    expect(r.extrapolated).toBe(true);
    expect(r.shortfall).toBeUndefined();
    expect(Math.abs(r.value - 2)).toBeLessThan(2e-10);
    expect(r.error).toBeGreaterThanOrEqual(Math.abs(r.value - 2));
  });

  it("subdivide extrapolates log(u) on [0, 1] to -1 (antiderivative u ln u - u)", () => {
    const r = run(Math.log);
    expect(r.extrapolated).toBe(true);
    expect(Math.abs(r.value + 1)).toBeLessThan(1e-10);
  });

  it("subdivide takes one rule for a polynomial (K21 exact through degree 31, QUADPACK DQK21)", () => {
    const r = run((u) => 3 * u * u);
    expect(r).toMatchObject({ intervals: 1, extrapolated: false, evaluations: 21 });
    expect(Math.abs(r.value - 1)).toBeLessThan(1e-15);
  });

  it("subdivide resolves an interior peak by bisection alone (no extrapolation)", () => {
    // 1/((u-0.3)^2 + 1e-4) integrates to 100 (atan(70) + atan(30)) (arctan antiderivative).
    const exact = 100 * (Math.atan(70) + Math.atan(30));
    const r = run((u) => 1 / ((u - 0.3) ** 2 + 1e-4));
    expect(r.extrapolated).toBe(false);
    expect(Math.abs(r.value - exact) / exact).toBeLessThan(1e-10);
  });

  it("subdivide flags u^-1.0001 (not integrable at 0) instead of returning a number", () => {
    const r = run((u) => u ** -1.0001);
    expect(r.shortfall).toBeDefined();
  });

  it("subdivide flags sums that overflow as divergent", () => {
    const r = run((u) => (u < 1e-300 ? 1e308 : 1 / (u * u * u)));
    expect(r.shortfall).toBe("divergent");
  });

  it("subdivide stops at maxEval with the shortfall named", () => {
    const r = run((u) => Math.cos(1000 * u), { maxEval: 100 });
    expect(r.shortfall).toBe("maxEval");
    expect(r.evaluations).toBeLessThanOrEqual(100);
  });

  it("subdivide polls once per bisection and lets the poll's exception through", () => {
    let polls = 0;
    const poll = () => {
      if (++polls > 2) throw new Error("stop");
    };
    expect(() => run((u) => Math.cos(1000 * u), { poll })).toThrow("stop");
    expect(polls).toBe(3);
  });
});
