import { describe, expect, it } from "vitest";
import { newtonSafe, RootError, StopRequested } from "../../../lib/numerics/index.js";

describe("newtonSafe", () => {
  it("newtonSafe of x^2 - 2 is sqrt(2) (closed form) in few evaluations", () => {
    const r = newtonSafe((x) => x * x - 2, (x) => 2 * x, 0, 2);
    expect(r.value).toBeCloseTo(Math.SQRT2, 15);
    expect(r.evaluations).toBeLessThan(20);
  });
  it("newtonSafe of Wallis' cubic x^3 - 2x - 5 = 2.0945514815423265 (classical value, from memory)", () => {
    const r = newtonSafe((x) => x ** 3 - 2 * x - 5, (x) => 3 * x * x - 2, 2, 3);
    expect(r.value).toBeCloseTo(2.0945514815423265, 14);
  });
  it("newtonSafe falls back to bisection where Newton would leave the bracket (atan)", () => {
    // Plain Newton from x0 = 2 diverges on atan; the bracket keeps it safe. Root 0 (closed form).
    const r = newtonSafe(Math.atan, (x) => 1 / (1 + x * x), -1, 5, { xtol: 1e-14 });
    expect(Math.abs(r.value)).toBeLessThan(1e-13);
  });
  it("newtonSafe rejects a bracket without a sign change", () => {
    expect(() => newtonSafe((x) => x * x + 1, (x) => 2 * x, -1, 1)).toThrow(RootError);
    expect(() => newtonSafe((x) => x * x + 1, (x) => 2 * x, -1, 1)).toThrow(/have the same sign/);
  });
  it("newtonSafe names a non-finite derivative and its x", () => {
    expect(() => newtonSafe((x) => x - 0.3, () => NaN, 0, 1)).toThrow(/df returned NaN at x = 0.5/);
  });
  it("newtonSafe names a non-function df", () => {
    expect(() => newtonSafe((x) => x, 3 as never, 0, 1)).toThrow(/argument 'df' must be a function/);
  });
  it("newtonSafe polls shouldStop", () => {
    expect(() => newtonSafe((x) => x - 0.3, () => 1, 0, 1, { shouldStop: () => true })).toThrow(StopRequested);
  });
});
