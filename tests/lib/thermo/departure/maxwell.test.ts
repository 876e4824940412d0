import { describe, expect, it } from "vitest";
import { maxwellResidual } from "../../../../lib/thermo/departure/maxwell.js";
import { idealGas, pr, pureFluid, rk, srk, vdw } from "../../../../lib/thermo/index.js";
import { butane, methane, propane } from "../fixtures.js";

const KEYS = ["Z", "HR", "SR", "UR", "GR", "AR", "lnphi"] as const;
// Scale floor for relative comparison of quantities that pass through zero: 1e-6 of RT-sized values.
const close = (a: number, b: number, rel: number, floor: number) => Math.abs(a - b) <= rel * Math.max(Math.abs(b), floor);

describe("maxwellResidual", () => {
  for (const make of [vdw, rk, srk, pr]) {
    it(`maxwellResidual agrees with the ${make.name} closed forms to 1e-8 relative on a grid of states`, () => {
      // Check against the model's own closed forms (SVNA 7th ed. eqs. 6.66-6.68): two independent routes.
      const m = make(pureFluid(propane));
      for (const T of [250, 330, 369, 450, 700]) {
        for (const P of [1e4, 1e6, 5e6, 3e7]) {
          for (const V of m.volumes(T, P)) {
            const closed = m.residual(T, P, V);
            const num = maxwellResidual(m, T, V);
            for (const k of KEYS) expect(close(num[k], closed[k], 1e-8, k === "Z" || k === "lnphi" ? 1e-6 : 1e-3), `${k} T=${T} P=${P}`).toBe(true);
          }
        }
      }
    });
  }

  it("maxwellResidual gives component ln phi of a PR mixture equal to the closed form to 1e-8", () => {
    const m = pr({ components: [methane, butane], x: [0.3, 0.7], kij: [[0, 0.0133], [0.0133, 0]] });
    for (const [T, P] of [[300, 1e6], [380, 5e6]] as const) {
      for (const V of m.volumes(T, P)) {
        const closed = m.residual(T, P, V).lnphiComponents;
        const num = maxwellResidual(m, T, V).lnphiComponents;
        closed.forEach((c, i) => expect(Math.abs(num[i]! - c)).toBeLessThan(1e-8 * Math.max(1, Math.abs(c))));
      }
    }
  });

  it("maxwellResidual of an ideal gas is zero (definition)", () => {
    const r = maxwellResidual(idealGas(pureFluid(methane)), 300, 0.01);
    for (const k of ["HR", "SR", "UR", "GR", "AR", "lnphi"] as const) expect(Math.abs(r[k])).toBeLessThan(1e-9);
  });

  it("maxwellResidual: departures vanish as P -> 0 (ideal-gas limit)", () => {
    const m = pr(pureFluid(butane));
    // Low-pressure virial limit: H^R and ln phi are proportional to P (H^R = (B - T dB/dT) P).
    const r1 = maxwellResidual(m, 400, (8.314 * 400) / 1); // P about 1 Pa
    const r10 = maxwellResidual(m, 400, (8.314 * 400) / 10); // P about 10 Pa
    expect(Math.abs(r1.HR)).toBeLessThan(1e-2);
    expect(Math.abs(r1.lnphi)).toBeLessThan(1e-6);
    expect(Math.abs(r10.HR / r1.HR / (r10.P / r1.P) - 1)).toBeLessThan(1e-4);
  });

  it("maxwellResidual rejects a model without pressure(T, V) naming model", () => {
    const m = { ...pr(pureFluid(butane)), pressure: undefined };
    expect(() => maxwellResidual(m, 300, 1e-3)).toThrow(/pressure-explicit/);
  });
});
