import { describe, expect, it } from "vitest";
import { pr, pureFluid, state, type IdealGasFunctions, R } from "../../../../lib/thermo/index.js";
import { accepts, solveTAtP, solveTAtV, validInterval, type SolveContext } from "../../../../lib/thermo/spec/paths.js";
import { methane } from "../fixtures.js";

// Constant-Cp ideal gas (Cp = 4R, test-only) against 298.15 K, 1 bar.
const ig: IdealGasFunctions = {
  H: (T) => 4 * R * (T - 298.15),
  S: (T, P) => 4 * R * Math.log(T / 298.15) - R * Math.log(P / 1e5),
  reference: "test ideal gas, Cp = 4R",
};
const m = pr(pureFluid(methane));
const ctx: SolveContext = { model: m, idealGas: ig, Tmin: 40, Tmax: 2000, Tc: methane.Tc, Pc: methane.Pc, pure: true, psatCache: new Map() };

describe("paths", () => {
  it("solveTAtV and solveTAtP recover T of a supercritical state from S", () => {
    const s = state(m, 250, 8e6, { idealGas: ig });
    expect(solveTAtV(ctx, s.V, "S", s.S!).state!.T).toBeCloseTo(250, 7);
    expect(solveTAtP(ctx, 8e6, "S", s.S!).state!.T).toBeCloseTo(250, 7);
  });
  it("solveTAtV reports the side: V too large when even Tmin has too much entropy, too small when Tmax has too little", () => {
    // Targets no (T, V) state reaches: -1e4 and +1e4 J/(mol K).
    expect(solveTAtV(ctx, 1e3, "S", -1e4).side).toBe(1);
    expect(solveTAtV(ctx, 3e-5, "S", 1e4).side).toBe(-1);
  });
  it("solveTAtP reports the side: P too small / too large (S falls with P)", () => {
    expect(solveTAtP(ctx, 1e-3, "S", -1e4).side).toBe(-1);
    expect(solveTAtP(ctx, 1e10, "S", 1e4).side).toBe(1);
  });
  it("validInterval finds the valid sub-interval edge by bisection", () => {
    const [a, b] = validInterval((t) => t >= 123.4, 10, 1000)!;
    expect(a).toBeCloseTo(123.4, 9);
    expect(b).toBe(1000);
    expect(validInterval(() => false, 10, 1000)).toBeUndefined();
  });
  it("accepts uses 1e-7 relative with an R T floor for energies", () => {
    expect(accepts("H", 1e-5, 0, 300)).toBe(true);
    expect(accepts("H", 1, 0, 300)).toBe(false);
  });
});
