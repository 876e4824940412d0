import { execFileSync } from "node:child_process";
import { beforeAll, describe, expect, it } from "vitest";
import { brent, RootError, StopRequested } from "../../../lib/numerics/index.js";

// Roots compared with scipy.optimize.brentq (Debian python3-scipy) computed in the test.
const CASES = [
  { name: "x^2 - 2 on [0, 2]", f: (x: number) => x * x - 2, py: "x*x-2", lo: 0, hi: 2 },
  { name: "cos(x) - x on [0, 1]", f: (x: number) => Math.cos(x) - x, py: "np.cos(x)-x", lo: 0, hi: 1 },
  { name: "x^3 - 2x - 5 on [2, 3] (Wallis' cubic)", f: (x: number) => x ** 3 - 2 * x - 5, py: "x**3-2*x-5", lo: 2, hi: 3 },
  { name: "exp(x) - 1e6 on [0, 20]", f: (x: number) => Math.exp(x) - 1e6, py: "np.exp(x)-1e6", lo: 0, hi: 20 },
  { name: "steep tanh(50(x - 0.37)) on [0, 1]", f: (x: number) => Math.tanh(50 * (x - 0.37)), py: "np.tanh(50*(x-0.37))", lo: 0, hi: 1 },
  { name: "flat (x - 1)^5 on [0, 3]", f: (x: number) => (x - 1) ** 5, py: "(x-1)**5", lo: 0, hi: 3 },
  { name: "van der Waals-like 1/(V-b) - 1/V^2 - 0.1 on [1.2, 20]", f: (v: number) => 1 / (v - 1) - 1 / (v * v) - 0.1, py: "1/(x-1)-1/(x*x)-0.1", lo: 1.2, hi: 20 },
];
let scipy: number[] = [];
beforeAll(() => {
  const calls = CASES.map((c) => `brentq(lambda x: ${c.py}, ${c.lo}, ${c.hi}, xtol=1e-300, rtol=4*np.finfo(float).eps, maxiter=500)`);
  const script = `import json, numpy as np\nfrom scipy.optimize import brentq\nprint(json.dumps([${calls.join(", ")}]))`;
  scipy = JSON.parse(execFileSync("/usr/bin/python3", ["-c", script], { encoding: "utf8" })) as number[];
});

describe("brent against scipy.optimize.brentq", () => {
  CASES.forEach((c, i) => {
    it(`brent ${c.name} agrees with brentq to 1e-14 relative`, () => {
      const r = brent(c.f, c.lo, c.hi);
      // Both stop at rtol = 4 eps; allow a few ulps more for flat functions where sign changes smear.
      expect(Math.abs(r.value - scipy[i]!)).toBeLessThanOrEqual(1e-14 * Math.abs(scipy[i]!) + 1e-300);
      expect(r.error).toBeLessThanOrEqual(1e-14 * Math.abs(r.value));
    });
  });
  it("brent of x^2 - 2 is sqrt(2) (closed form)", () => {
    expect(brent((x) => x * x - 2, 0, 2).value).toBeCloseTo(Math.SQRT2, 15);
  });
  it("brent with xtol stops early with error within xtol", () => {
    const r = brent((x) => x * x - 2, 0, 2, { xtol: 1e-3 });
    expect(Math.abs(r.value - Math.SQRT2)).toBeLessThan(1e-3);
  });
  it("brent accepts the bracket in either order and returns an exact end-point root", () => {
    expect(brent((x) => x - 1, 3, 0).value).toBeCloseTo(1, 15);
    expect(brent((x) => x - 1, 1, 5)).toMatchObject({ value: 1, error: 0 });
  });
});

describe("brent bracket expansion and errors", () => {
  it("brent without a sign change names both ends and suggests expand", () => {
    expect(() => brent((x) => x * x + 1, -1, 1)).toThrow(/have the same sign.*expand: true/);
    expect(() => brent((x) => x * x + 1, -1, 1)).toThrow(RootError);
  });
  it("brent with expand finds ln(1e6) from [0, 1]", () => {
    const r = brent((x) => Math.exp(x) - 1e6, 0, 1, { expand: true });
    expect(r.value).toBeCloseTo(Math.log(1e6), 13);
  });
  it("brent expansion stops where f is undefined (V <= b gives NaN) and grows the other side", () => {
    const f = (v: number) => (v <= 1 ? NaN : 1 / (v - 1) - 0.001);
    const r = brent(f, 2, 3, { expand: true });
    expect(r.value).toBeCloseTo(1001, 9);
  });
  it("brent expansion respects the lower/upper limits and fails clearly", () => {
    expect(() => brent((x) => x + 10, 0, 1, { expand: true, lower: -5 })).toThrow(/no sign change found after expanding/);
  });
  it("brent reports NaN from f with the x", () => {
    expect(() => brent((x) => (x > 0.5 ? NaN : -1), 0, 1)).toThrow(/f returned NaN at x = /);
  });
  it("brent names bad arguments", () => {
    expect(() => brent((x) => x, Infinity, 1)).toThrow(/argument 'lo' must be a finite number; got Infinity/);
    expect(() => brent((x) => x, -1, 1, { maxIter: 0 })).toThrow(/option 'maxIter' must be an integer >= 1; got 0/);
    expect(() => brent((x) => x, -1, 1, { expand: "yes" } as never)).toThrow(/option 'expand'/);
  });
  it("brent uses the caller's name in messages (seek)", () => {
    expect(() => brent((x) => x * x + 1, -1, 1, {}, "seek")).toThrow(/^seek: /);
  });
  it("brent hits maxIter with a RootError", () => {
    expect(() => brent((x) => x ** 3 - 2 * x - 5, 0, 10, { maxIter: 2 })).toThrow(/no convergence within maxIter = 2/);
  });
  it("brent polls shouldStop", () => {
    expect(() => brent((x) => x - Math.PI, 0, 10, { shouldStop: () => true })).toThrow(StopRequested);
  });
});
