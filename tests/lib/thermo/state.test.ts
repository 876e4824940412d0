import { describe, expect, it } from "vitest";
import { change, state, twoPhase, type IdealGasFunctions } from "../../../lib/thermo/state.js";
import { stateFrom } from "../../../lib/thermo/spec/stateFrom.js";
import { integrate } from "../../../lib/numerics/index.js";
import { pr, pureFluid, psat, R } from "../../../lib/thermo/index.js";
import { butane, methane } from "./fixtures.js";

// A constant-Cp ideal gas (Cp = 4R, test-only) against a stated reference: 298.15 K, 1 bar, H = S = 0.
const cp = 4 * R;
const ig: IdealGasFunctions = {
  H: (T) => cp * (T - 298.15),
  S: (T, P) => cp * Math.log(T / 298.15) - R * Math.log(P / 1e5),
  reference: "test ideal gas, Cp = 4R, H = S = 0 at 298.15 K and 1 bar",
};

describe("state", () => {
  it("state: isothermal Gibbs change equals the integral of V dP (dG = V dP at constant T)", () => {
    const m = pr(pureFluid(methane));
    const T = 250;
    const s1 = state(m, T, 1e5, { idealGas: ig });
    const s2 = state(m, T, 8e6, { idealGas: ig });
    const intVdP = integrate((P) => state(m, T, P).V, 1e5, 8e6, { rel: 1e-11 }).value;
    expect(Math.abs(change(s1, s2).dG! / intVdP - 1)).toBeLessThan(1e-8);
  });
  it("state carries totals H = H_ig + H^R and the reference it was given", () => {
    const s = state(pr(pureFluid(butane)), 400, 1e6, { idealGas: ig });
    expect(s.H).toBeCloseTo(ig.H(400) + s.HR, 9);
    expect(s.G).toBeCloseTo(s.H! - 400 * s.S!, 9);
    expect(s.reference).toBe(ig.reference);
  });
});

describe("stateFrom", () => {
  const m = pr(pureFluid(butane));
  it("stateFrom round-trips (P, H), (T, S), (T, V) and (P, S) to the original T, P", () => {
    for (const [T, P] of [[300, 1e5], [400, 3e6], [330, 2e6], [500, 1e7]] as const) {
      const s = state(m, T, P, { idealGas: ig });
      for (const spec of [{ P, H: s.H }, { T, S: s.S }, { T, V: s.V }, { P, S: s.S }]) {
        const r = stateFrom(m, spec, { idealGas: ig });
        expect(Math.abs(r.T / T - 1), JSON.stringify(spec)).toBeLessThan(1e-7);
        expect(Math.abs(r.P / P - 1), JSON.stringify(spec)).toBeLessThan(1e-6);
      }
    }
  });
  it("stateFrom gives a two-phase state with the lever-rule vapour fraction inside the dome", () => {
    const s = psat(m, 320);
    const V = 0.25 * s.VL + 0.75 * s.VV;
    const r = stateFrom(m, { T: 320, V }, { idealGas: ig });
    expect(r.phase).toBe("two-phase");
    expect(r.x).toBeCloseTo(0.75, 9);
    const H = stateFrom(m, { P: s.P, H: r.H }, { idealGas: ig });
    expect(H.x).toBeCloseTo(0.75, 6);
  });
  it("stateFrom needs exactly two properties and ideal-gas totals for H, S, U", () => {
    expect(() => stateFrom(m, { T: 300 })).toThrow(/exactly two/);
    expect(() => stateFrom(m, { T: 300, H: 1000 })).toThrow(/idealGas/);
  });
  it("twoPhase mixes saturated liquid and vapour by the lever rule", () => {
    const s = psat(m, 350);
    const t = twoPhase(m, s, 0.4, ig);
    expect(t.V).toBeCloseTo(0.6 * s.VL + 0.4 * s.VV, 15);
    expect(t.HR).toBeCloseTo(0.6 * s.liquid.HR + 0.4 * s.vapor.HR, 9);
    expect(t.phase).toBe("two-phase");
  });
  it("change refuses states with different references naming s2", () => {
    const a = state(m, 300, 1e5, { idealGas: ig });
    const b = state(m, 300, 1e5, { idealGas: { ...ig, reference: "other" } });
    expect(() => change(a, b)).toThrow(/different ideal-gas references/);
  });
});
