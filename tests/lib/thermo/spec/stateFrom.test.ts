import { describe, expect, it } from "vitest";
import { getSubstance, idealGas, idealGasFunctions, pr, psat, pureFluid, srk, state, stateFrom } from "../../../../lib/thermo/index.js";

// Round trips: a state computed at (T, P) gives values of every property; each pair of them must lead
// back to the same T and P. Tolerances: T to 1e-6 and P to 1e-5 relative (the solver works to ~1e-10;
// the margin covers near-flat directions such as S along a liquid isotherm).
const PAIRS = [["H", "S"], ["S", "U"], ["V", "H"], ["V", "S"], ["V", "U"], ["T", "S"], ["T", "U"], ["T", "V"], ["T", "H"], ["P", "H"], ["P", "S"], ["P", "U"], ["P", "V"]] as const;
// (Tr, Pr): compressed liquid, dilute gas, vapour, supercritical, dense supercritical, hot gas.
const GRID: [number, number][] = [[0.7, 0.05], [0.7, 2], [0.9, 0.5], [1.1, 0.5], [1.3, 3], [2, 1], [1.5, 0.01], [0.6, 10]];
const FLUIDS = ["methane", "n-butane", "water", "carbon dioxide", "nitrogen"];

describe("stateFrom", () => {
  for (const [label, make] of [["PR", pr], ["SRK", srk]] as const) {
    it(`stateFrom round-trips every pair on gas, liquid and supercritical states (${label})`, () => {
      for (const name of FLUIDS) {
        const sub = getSubstance(name);
        const ig = idealGasFunctions([sub], [1]);
        const m = make(pureFluid(sub));
        for (const [tr, pr_] of GRID) {
          const T = tr * sub.Tc;
          const P = pr_ * sub.Pc;
          const s = state(m, T, P, { idealGas: ig });
          for (const [a, b] of PAIRS) {
            const spec = { [a]: s[a], [b]: s[b] };
            let r = stateFrom(m, spec, { idealGas: ig });
            // (T, H) of a compressed liquid has a second, lower-density state (two-phase or vapour).
            if (a === "T" && b === "H" && s.phase === "liquid") r = stateFrom(m, spec, { idealGas: ig, branch: "dense" });
            const where = `${label} ${name} Tr=${tr} Pr=${pr_} (${a}, ${b})`;
            expect(Math.abs(r.T / T - 1), where).toBeLessThan(1e-6);
            expect(Math.abs(r.P / P - 1), where).toBeLessThan(1e-5);
          }
        }
      }
    });
  }

  it("stateFrom (H, U) returns a state that reproduces both, on every grid state (PR)", () => {
    // (H, U) can fix several states (H - U = PV is not monotone along an isoenergetic path), so the
    // check is the defining one: both given properties come back to 1e-7 relative (floor R T).
    for (const name of ["methane", "n-butane", "water"]) {
      const sub = getSubstance(name);
      const ig = idealGasFunctions([sub], [1]);
      const m = pr(pureFluid(sub));
      for (const [tr, pr_] of GRID) {
        const s = state(m, tr * sub.Tc, pr_ * sub.Pc, { idealGas: ig });
        const r = stateFrom(m, { H: s.H, U: s.U }, { idealGas: ig });
        const tol = 1e-7 * Math.max(Math.abs(s.H!), 8.314 * s.T) * 1.0001;
        expect(Math.abs(r.H! - s.H!), `${name} ${tr} ${pr_}`).toBeLessThan(tol);
        expect(Math.abs(r.U! - s.U!), `${name} ${tr} ${pr_}`).toBeLessThan(tol);
      }
    }
  });

  it("stateFrom gives two-phase states with the lever-rule x from (H, S), (S, U), (V, H), (P, H) and (T, S)", () => {
    const sub = getSubstance("propane");
    const ig = idealGasFunctions([sub], [1]);
    const m = pr(pureFluid(sub));
    const sat = psat(m, 300);
    const x = 0.3;
    const mix = (k: "H" | "S" | "U" | "V") => {
      const L = stateFrom(m, { T: 300, V: sat.VL * (1 + 1e-12) }, { idealGas: ig })[k]!;
      const V = stateFrom(m, { T: 300, V: sat.VV * (1 - 1e-12) }, { idealGas: ig })[k]!;
      return (1 - x) * L + x * V;
    };
    for (const spec of [{ H: mix("H"), S: mix("S") }, { S: mix("S"), U: mix("U") }, { V: mix("V"), H: mix("H") }, { P: sat.P, H: mix("H") }, { T: 300, S: mix("S") }]) {
      const r = stateFrom(m, spec, { idealGas: ig });
      expect(r.phase, JSON.stringify(spec)).toBe("two-phase");
      expect(r.x!, JSON.stringify(spec)).toBeCloseTo(x, 6);
      expect(r.T, JSON.stringify(spec)).toBeCloseTo(300, 5);
    }
  });

  it("stateFrom errors name the property and the range searched when no state exists", () => {
    const sub = getSubstance("methane");
    const ig = idealGasFunctions([sub], [1]);
    const m = pr(pureFluid(sub));
    expect(() => stateFrom(m, { P: 1e5, H: 1e9 }, { idealGas: ig })).toThrow(/no Peng-Robinson.*H = 1000000 kJ\/mol.*K <= T <=/);
    expect(() => stateFrom(m, { T: 300 })).toThrow(/exactly two/);
    expect(() => stateFrom(m, { T: 300, H: 1000 })).toThrow(/idealGas/);
    expect(() => stateFrom(m, { T: 300, V: -1 })).toThrow(/V must be a finite number > 0/);
    expect(() => stateFrom(m, { T: 300, H: Number.NaN }, { idealGas: ig })).toThrow(/H must be a finite number/);
    expect(() => stateFrom(m, { T: 300, P: 1e5 }, { branch: "middle" as "light" })).toThrow(/branch must be/);
    expect(() => stateFrom(idealGas(pureFluid(sub)), { T: 300, H: 0 }, { idealGas: ig })).toThrow(/depend on T alone/);
  });

  it("stateFrom on the ideal-gas model: (H, S) gives T from H_ig and P from S_ig (exact ideal-gas relations)", () => {
    const sub = getSubstance("nitrogen");
    const ig = idealGasFunctions([sub], [1]);
    const m = idealGas(pureFluid(sub));
    const r = stateFrom(m, { H: ig.H(500), S: ig.S(500, 3e6) }, { idealGas: ig });
    expect(r.T).toBeCloseTo(500, 6);
    expect(r.P / 3e6).toBeCloseTo(1, 8);
  });
});
