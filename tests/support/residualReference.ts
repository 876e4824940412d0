/**
 * Residual-property fixtures tabulated from reference equations (tests/fixtures/iapws95/*.json, written by
 * tests/fixtures/iapws95/generate.py from Debian's python3-iapws), and the check the reference tests run
 * on them: a model's Z, HR/RT, SR/R and ln phi at each tabulated T, P on the asked phase, within bounds.
 */
import { readFileSync } from "node:fs";
import { expect } from "vitest";
import { departure, R, type EosModel } from "../../lib/thermo/index.js";

export interface ReferenceRow {
  T: number;
  P: number;
  rho: number;
  Z: number;
  HR_RT: number;
  SR_R: number;
  lnphi: number;
  /** The generator solved for the density itself (the library's own solver failed there). */
  resolved?: boolean;
}

export interface ReferenceFixture {
  library: string;
  class?: string;
  constants: { Tc_K: number; Pc_MPa: number; M_g_mol: number };
  vapour: ReferenceRow[];
  liquid: ReferenceRow[];
  saturated_liquid: ReferenceRow[];
  saturated_vapour: ReferenceRow[];
}

/** Largest |deviation| allowed: Z relative, HR/RT, SR/R and ln phi absolute. */
export interface ReferenceBound {
  Z: number;
  HR: number;
  SR: number;
  lnphi: number;
}

/** One fixture file of tests/fixtures/iapws95/ by name ("water.json", "ammonia.json", "air.json"). */
export function loadReferenceFixture(name: string): ReferenceFixture {
  return JSON.parse(readFileSync(new URL(`../fixtures/iapws95/${name}`, import.meta.url), "utf8")) as ReferenceFixture;
}

/** Checks every row against the model on the requested branch; the message names the state and `reference`. */
export function checkRegion(model: EosModel, rows: ReferenceRow[], phase: "liquid" | "vapor", bound: ReferenceBound, reference = "reference"): void {
  expect(rows.length).toBeGreaterThan(0);
  for (const row of rows) {
    const r = departure(model, row.T, row.P, { phase });
    const where = `${model.id} ${phase} T=${row.T} K P=${(row.P / 1e6).toPrecision(4)} MPa`;
    expect(Math.abs(r.Z / row.Z - 1), `${where}: Z ${r.Z} vs ${reference} ${row.Z}`).toBeLessThan(bound.Z);
    expect(Math.abs(r.HR / (R * row.T) - row.HR_RT), `${where}: HR/RT vs ${row.HR_RT}`).toBeLessThan(bound.HR);
    expect(Math.abs(r.SR / R - row.SR_R), `${where}: SR/R vs ${row.SR_R}`).toBeLessThan(bound.SR);
    expect(Math.abs(r.lnphi - row.lnphi), `${where}: ln phi vs ${row.lnphi}`).toBeLessThan(bound.lnphi);
  }
}
