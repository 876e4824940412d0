/**
 * Checks every two-parameter cubic equation of state must pass, shared by the vdw, rk, srk and pr tests.
 * Each test file keeps its own published Zc (with its source) and calls these with it.
 */
import { expect } from "vitest";
import { R } from "../../lib/thermo/constants.js";

interface CriticalFluid { Tc: number; Pc: number }
interface CubicLike {
  id: string;
  source: string;
  parameters: { Zc: number };
  pressure(T: number, V: number): number;
  volumes(T: number, P: number): readonly number[];
}

/**
 * The model's critical point is at the fluid's Tc, Pc with compressibility factor `Zc` (within 1e-6):
 * there the three roots merge (the polished roots all lie within 1e-4 of Vc) and dP/dV = 0 at Vc
 * (central difference with a 1e-6 relative step, scaled by Vc / Pc, below 1e-6).
 */
export function expectCriticalPointAt(m: CubicLike, fluid: CriticalFluid, Zc: number): void {
  const Vc = (m.parameters.Zc * R * fluid.Tc) / fluid.Pc;
  expect(Math.abs(m.parameters.Zc - Zc)).toBeLessThan(1e-6);
  for (const V of m.volumes(fluid.Tc, fluid.Pc)) expect(Math.abs(V / Vc - 1)).toBeLessThan(1e-4);
  const h = Vc * 1e-6;
  const slope = (m.pressure(fluid.Tc, Vc + h) - m.pressure(fluid.Tc, Vc - h)) / (2 * h);
  expect(Math.abs(slope * Vc / fluid.Pc)).toBeLessThan(1e-6);
}

/** The model carries its id and a source text longer than a stub. */
export function expectNamedModel(m: CubicLike, id: string): void {
  expect(m.id).toBe(id);
  expect(m.source.length).toBeGreaterThan(10);
}
