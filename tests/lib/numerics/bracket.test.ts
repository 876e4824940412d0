import { describe, expect, it } from "vitest";
import { expandBracket } from "../../../lib/numerics/bracket.js";
import { RootError } from "../../../lib/numerics/index.js";

const noStop = () => {};
describe("expandBracket", () => {
  it("expandBracket grows toward the side with smaller |f| until the sign changes", () => {
    const f = (x: number) => x - 100;
    const b = expandBracket("seek", f, { lo: 0, hi: 1, flo: -100, fhi: -99, evaluations: 2 }, 60, -Infinity, Infinity, noStop);
    expect(b.lo).toBeLessThan(100);
    expect(b.hi).toBeGreaterThan(100);
    expect(Math.sign(b.flo)).not.toBe(Math.sign(b.fhi));
    expect(b.evaluations).toBeGreaterThan(2);
  });
  it("expandBracket freezes a side where f is not finite", () => {
    const f = (x: number) => (x < 0 ? NaN : 5 - x);
    const b = expandBracket("seek", f, { lo: 0.5, hi: 1, flo: 4.5, fhi: 4, evaluations: 2 }, 60, -Infinity, Infinity, noStop);
    expect(b.lo).toBeGreaterThanOrEqual(0);
    expect(b.hi).toBeGreaterThan(5);
  });
  it("expandBracket throws a RootError naming the final range when no sign change exists", () => {
    expect(() =>
      expandBracket("seek", (x) => x * x + 1, { lo: -1, hi: 1, flo: 2, fhi: 2, evaluations: 2 }, 10, -Infinity, Infinity, noStop),
    ).toThrow(RootError);
  });
});
