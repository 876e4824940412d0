import { describe, expect, it } from "vitest";
import { pr, psat, pureFluid, state } from "../../../../lib/thermo/index.js";
import { cachedPsat, stateAtTV } from "../../../../lib/thermo/spec/tvState.js";
import { butane } from "../fixtures.js";

describe("stateAtTV", () => {
  const m = pr(pureFluid(butane));
  it("stateAtTV reproduces state(T, P) outside the dome (P from the model's own P(T, V))", () => {
    for (const [T, P] of [[300, 1e5], [300, 5e6], [500, 1e7]] as const) {
      const s = state(m, T, P);
      const r = stateAtTV(m, T, s.V);
      expect(r.P / P).toBeCloseTo(1, 9);
      expect(r.HR).toBeCloseTo(s.HR, 6);
      expect(r.phase).toBe(s.phase);
    }
  });
  it("stateAtTV gives a two-phase state with x = (V - VL)/(VV - VL) inside the dome", () => {
    const s = psat(m, 350);
    const r = stateAtTV(m, 350, s.VL + 0.2 * (s.VV - s.VL));
    expect(r.phase).toBe("two-phase");
    expect(r.x!).toBeCloseTo(0.2, 12);
    expect(r.P).toBe(s.P);
  });
  it("stateAtTV errors name V for V at or below the co-volume and for non-positive V", () => {
    const b = m.mixture(600).b;
    expect(() => stateAtTV(m, 600, 0.5 * b)).toThrow(/V|co-volume|P > 0/);
    expect(() => stateAtTV(m, 600, -1)).toThrow(/V must be a finite number > 0/);
  });
  it("cachedPsat returns the cached saturation for a repeated T", () => {
    const cache = new Map();
    const a = cachedPsat(m, 330, cache);
    expect(cachedPsat(m, 330, cache)).toBe(a);
    expect(a.P).toBeCloseTo(psat(m, 330).P, 6);
  });
});
