import { describe, expect, it } from "vitest";
import { brentRoot } from "../../../../lib/thermo/water/solve.js";

describe("brentRoot", () => {
  it("brentRoot finds the fixed point of cos, 0.7390851332151607 (Dottie number, from memory)", () => {
    expect(brentRoot((x) => Math.cos(x) - x, 0, 1, 1e-14)).toBeCloseTo(0.7390851332151607, 13);
  });
  it("brentRoot finds sqrt(2) on [1, 2]", () => {
    expect(brentRoot((x) => x * x - 2, 1, 2, 1e-15)).toBeCloseTo(Math.SQRT2, 14);
  });
  it("brentRoot throws when the interval does not bracket a root", () => {
    expect(() => brentRoot((x) => x * x + 1, -1, 1, 1e-9)).toThrow(/do not bracket/);
  });
});
