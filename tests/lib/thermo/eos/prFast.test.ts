import { describe, expect, it } from "vitest";
import { prStateFast } from "../../../../lib/thermo/eos/prFast.js";
import { pr } from "../../../../lib/thermo/eos/pr.js";
import { pureFluid } from "../../../../lib/thermo/eos/fluid.js";
import { selectRoot } from "../../../../lib/thermo/eos/phase.js";
import { butane, methane } from "../fixtures.js";

describe("prStateFast", () => {
  it("prStateFast equals pr().residual on the stable root to 1e-10 (gas, liquid, supercritical, 3-root states)", () => {
    const out = new Float64Array(4);
    for (const c of [methane, butane]) {
      const m = pr(pureFluid(c));
      for (const T of [150, 250, 300, 350, 420, 600]) {
        for (const P of [1e4, 1e5, 1e6, 5e6, 2e7]) {
          const ref = selectRoot(m, T, P).residual;
          prStateFast(T, P, c.Tc, c.Pc, c.omega, out);
          const scale = (x: number) => Math.max(Math.abs(x), 1e-6);
          expect(Math.abs(out[0]! - ref.Z) / ref.Z).toBeLessThan(1e-10);
          expect(Math.abs(out[1]! - ref.HR) / scale(ref.HR)).toBeLessThan(1e-8);
          expect(Math.abs(out[2]! - ref.SR) / scale(ref.SR)).toBeLessThan(1e-8);
          expect(Math.abs(out[3]! - ref.lnphi) / scale(ref.lnphi)).toBeLessThan(1e-8);
        }
      }
    }
  });
});
