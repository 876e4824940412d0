import { describe, expect, it } from "vitest";
import { selectRoot, checkPhase, pseudoCritical } from "../../../../lib/thermo/eos/phase.js";
import { pr, pureFluid, psat, ThermoError } from "../../../../lib/thermo/index.js";
import { butane, methane, propane } from "../fixtures.js";

describe("selectRoot", () => {
  const m = pr(pureFluid(butane));
  it("selectRoot picks vapour below Psat and liquid above it (lowest Gibbs energy)", () => {
    const P = psat(m, 350).P;
    expect(selectRoot(m, 350, 0.9 * P).phase).toBe("vapor");
    expect(selectRoot(m, 350, 1.1 * P).phase).toBe("liquid");
    expect(selectRoot(m, 350, 1.1 * P, "vapor").flags.metastable).toBe(true);
  });
  it("selectRoot flags two-phase on the saturation line", () => {
    const s = psat(m, 350);
    const c = selectRoot(m, 350, s.P);
    expect(c.flags.twoPhase).toBe(true);
    expect(c.roots.length).toBe(3);
  });
  it("selectRoot flags supercritical and near-critical states (rule: |Tr-1| < 0.03 and |Pr-1| < 0.10)", () => {
    const c = selectRoot(m, 430, 40e5);
    expect(c.phase).toBe("supercritical");
    expect(c.flags.supercritical && c.flags.nearCritical).toBe(true);
    expect(selectRoot(m, 600, 1e5).phase).toBe("gas");
  });
  it("selectRoot refuses liquid above Tc naming phase and the valid range", () => {
    try {
      selectRoot(m, 500, 1e7, "liquid");
      throw new Error("no error");
    } catch (e) {
      expect((e as ThermoError).argument).toBe("phase");
      expect((e as Error).message).toMatch(/valid: T < 425.1 K/);
    }
  });
  it("selectRoot refuses T <= 0 and P <= 0 naming the argument", () => {
    expect(() => selectRoot(m, -1, 1e5)).toThrow(/T must be/);
    expect(() => selectRoot(m, 300, 0)).toThrow(/P must be/);
  });
  it("checkPhase rejects unknown phases", () => {
    expect(() => checkPhase("solid")).toThrow(/phase must be one of/);
  });
  it("pseudoCritical uses Kay's rule (mole-fraction averages, Kay 1936)", () => {
    const c = pseudoCritical(pr({ components: [methane, propane], x: [0.5, 0.5] }));
    expect(c.Tc).toBeCloseTo((methane.Tc + propane.Tc) / 2, 10);
  });
});
