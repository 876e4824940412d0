import { describe, expect, it } from "vitest";
import { seriesInY, seriesValue, seriesWithDerivatives } from "../../../../lib/thermo/water/series.js";

const T = { I: [0, 1, 2, -1], J: [1, 0, 3, -2], n: [2, -3, 0.5, 1.5] };

describe("seriesValue", () => {
  it("seriesValue sums n x^I y^J term by term (hand-computed)", () => {
    // 2*y - 3*x + 0.5*x^2*y^3 + 1.5/(x*y^2) at x = 2, y = 3: 6 - 6 + 54 + 1.5/18 (arithmetic)
    expect(seriesValue(T, 2, 3)).toBeCloseTo(54 + 1.5 / 18, 12);
  });
});

describe("seriesWithDerivatives", () => {
  it("seriesWithDerivatives matches central finite differences (step 1e-4, tol 1e-6 relative)", () => {
    const x = 1.7;
    const y = 0.8;
    const d = seriesWithDerivatives(T, x, y);
    const h = 1e-4;
    const f = (a: number, b: number): number => seriesValue(T, a, b);
    expect(d.f).toBeCloseTo(f(x, y), 12);
    expect(d.fx).toBeCloseTo((f(x + h, y) - f(x - h, y)) / (2 * h), 6);
    expect(d.fy).toBeCloseTo((f(x, y + h) - f(x, y - h)) / (2 * h), 6);
    expect(d.fxx).toBeCloseTo((f(x + h, y) - 2 * f(x, y) + f(x - h, y)) / (h * h), 4);
    expect(d.fyy).toBeCloseTo((f(x, y + h) - 2 * f(x, y) + f(x, y - h)) / (h * h), 4);
    expect(d.fxy).toBeCloseTo((f(x + h, y + h) - f(x + h, y - h) - f(x - h, y + h) + f(x - h, y - h)) / (4 * h * h), 4);
  });
});

describe("seriesInY", () => {
  it("seriesInY gives the sum over y and its derivatives", () => {
    const t = { I: [], J: [0, 1, -1], n: [1, 2, 3] };
    const r = seriesInY(t, 2); // 1 + 2y + 3/y; d/dy = 2 - 3/y^2; d2 = 6/y^3 (calculus)
    expect(r.f).toBeCloseTo(6.5, 14);
    expect(r.fy).toBeCloseTo(1.25, 14);
    expect(r.fyy).toBeCloseTo(0.75, 14);
  });
});
