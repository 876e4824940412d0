import { describe, expect, it } from "vitest";
import { cubicStateColumns, isPureCubic, PHASE_LABELS, STATE_FLAG_BITS, type StateColumns } from "../../../lib/thermo/stateColumns.js";
import { state } from "../../../lib/thermo/state.js";
import { heatCapacity } from "../../../lib/thermo/departure/heatCapacity.js";
import { getSubstance } from "../../../lib/thermo/substances/databank.js";
import { idealGasFunctions } from "../../../lib/thermo/idealGas/functions.js";
import { pureFluid } from "../../../lib/thermo/eos/fluid.js";
import { pr } from "../../../lib/thermo/eos/pr.js";
import { srk } from "../../../lib/thermo/eos/srk.js";
import { rk } from "../../../lib/thermo/eos/rk.js";
import { vdw } from "../../../lib/thermo/eos/vdw.js";
import { psat } from "../../../lib/thermo/equilibrium/saturation.js";
import { idealGas } from "../../../lib/thermo/eos/idealgas.js";
import type { CubicModel } from "../../../lib/thermo/eos/cubic.js";
import type { PhaseRequest } from "../../../lib/thermo/eos/phase.js";
import { R } from "../../../lib/thermo/constants.js";

const FIELDS = ["V", "Z", "HR", "SR", "UR", "GR", "AR", "lnphi"] as const;
const TOTALS = ["H", "S", "U", "G", "A", "Cp", "Cv", "w"] as const;

/** Largest |fast - general| / max(|general|, floor) over every field of point i. */
function deviation(c: StateColumns, i: number, g: Record<string, number>): number {
  let worst = 0;
  const cmp = (a: number, b: number) => {
    if (Number.isNaN(a) && Number.isNaN(b)) return;
    // Floor 1e-3 (J/mol, J/(mol K) or plain): totals like H pass through 0 near the reference temperature.
    worst = Math.max(worst, Number.isNaN(a - b) ? Infinity : Math.abs(a - b) / Math.max(Math.abs(b), 1e-3));
  };
  for (const k of FIELDS) cmp(c[k][i]!, g[k]!);
  if (c.totals) for (const k of TOTALS) cmp(c.totals[k][i]!, g[k]!);
  return worst;
}

function general(m: CubicModel, T: number, P: number, phase: PhaseRequest, ig: ReturnType<typeof idealGasFunctions>, M: number) {
  const s = state(m, T, P, { phase, idealGas: ig });
  const hc = heatCapacity(m, T, P, s.V, ig.Cp(T), M);
  return { s, row: { ...s, ...hc } as unknown as Record<string, number> };
}

const flagBits = (f: { supercritical: boolean; nearCritical: boolean; metastable: boolean; twoPhase: boolean; multipleRoots: boolean }) =>
  (f.supercritical ? STATE_FLAG_BITS.supercritical : 0) | (f.nearCritical ? STATE_FLAG_BITS.nearCritical : 0) |
  (f.metastable ? STATE_FLAG_BITS.metastable : 0) | (f.twoPhase ? STATE_FLAG_BITS.twoPhase : 0) |
  (f.multipleRoots ? STATE_FLAG_BITS.multipleRoots : 0);

describe("cubicStateColumns", () => {
  const models = { pr, srk, rk, vdw };
  // propane and methane (light), n-decane (omega 0.49: Peng-Robinson's kappa switch), water (polar).
  const fluids = ["propane", "methane", "n-decane", "water"].map((n) => getSubstance(n));

  it("cubicStateColumns equals state() + heatCapacity() to 1e-12 relative: liquid, vapour, two-root, supercritical, every phase request", () => {
    let points = 0;
    let stops = 0;
    let ties = 0;
    for (const [name, make] of Object.entries(models)) {
      for (const sub of fluids) {
        const m = make(pureFluid(sub));
        const ig = idealGasFunctions([sub], [1]);
        const Ts = [0.45, 0.6, 0.7, 0.85, 0.95, 0.99, 1.0, 1.01, 1.05, 1.5, 3].map((r) => r * sub.Tc);
        for (const T of Ts) {
          const Ps = [1e3, 1e5, 0.3 * sub.Pc, 0.97 * sub.Pc, sub.Pc, 1.05 * sub.Pc, 3 * sub.Pc];
          // The model's own saturation pressure gives the two-root, equal-fugacity states.
          if (T < 0.99 * sub.Tc) Ps.push(psat(m, T).P);
          for (const P of Ps) {
            for (const phase of ["stable", "liquid", "vapor"] as const) {
              const c = cubicStateColumns(m, Float64Array.of(T), Float64Array.of(P), 1, { phase, idealGas: ig, M: sub.M });
              let g: ReturnType<typeof general> | undefined;
              try {
                g = general(m, T, P, phase, ig, sub.M);
              } catch {
                g = undefined;
              }
              const where = `${name} ${sub.id} T=${T} P=${P} ${phase}`;
              if (!g) {
                // The general path rejects this request: the fast path must stop there too.
                expect(c.stoppedAt, where).toBe(0);
                stops++;
                continue;
              }
              expect(c.stoppedAt, where).toBe(-1);
              if (T === sub.Tc && P === sub.Pc) {
                // The critical point itself: a triple root, conditioned at cbrt(machine epsilon) ~ 6e-6
                // (either path may see one root or a close pair), and Cp, w diverge. Agreement there
                // is to the conditioning limit, with both flagged near-critical.
                expect(Math.abs(c.V[0]! / g.s.V - 1), where).toBeLessThan(1e-4);
                expect(c.flags[0]! & STATE_FLAG_BITS.nearCritical, where).toBeTruthy();
                continue;
              }
              const label = PHASE_LABELS[c.phase[0]!]!;
              if (phase === "stable" && g.s.flags.twoPhase && label !== g.s.phase) {
                // Equal-fugacity tie (|G_L - G_V| <= 1e-9 RT): rounding decides which root is "stable";
                // both lie on the saturation line and both paths flag it. Compare the same root.
                g = general(m, T, P, label as PhaseRequest, ig, sub.M);
                ties++;
              }
              expect(deviation(c, 0, g.row), where).toBeLessThan(1e-12);
              expect(PHASE_LABELS[c.phase[0]!], where).toBe(g.s.phase);
              expect(c.flags[0], where).toBe(flagBits(g.s.flags));
              points++;
            }
          }
        }
      }
    }
    // Guards against a grid that silently tests nothing: most requests are answerable, some are not.
    expect(points).toBeGreaterThan(800);
    expect(stops).toBeGreaterThan(20);
    expect(ties).toBeLessThan(20);
  });

  it("cubicStateColumns marks two-root states at the model's saturation pressure as twoPhase, and metastable roots on request", () => {
    const sub = getSubstance("propane");
    const m = pr(pureFluid(sub));
    const T = 300;
    const Ps = psat(m, T).P;
    const at = (P: number, phase: PhaseRequest) => cubicStateColumns(m, T, P, 1, { phase });
    expect(at(Ps, "stable").flags[0]! & STATE_FLAG_BITS.twoPhase).toBeTruthy();
    // Below psat the vapour is stable: the liquid root, asked for, is metastable (and labelled liquid).
    const c = at(0.9 * Ps, "liquid");
    expect(c.flags[0]! & STATE_FLAG_BITS.metastable).toBeTruthy();
    expect(PHASE_LABELS[c.phase[0]!]).toBe("liquid");
    expect(PHASE_LABELS[at(0.9 * Ps, "stable").phase[0]!]).toBe("vapor");
    expect(PHASE_LABELS[at(1.1 * Ps, "stable").phase[0]!]).toBe("liquid");
  });

  it("cubicStateColumns over a span with a scalar pressure matches point-by-point calls", () => {
    const sub = getSubstance("propane");
    const m = pr(pureFluid(sub));
    const ig = idealGasFunctions([sub], [1]);
    const n = 401;
    const T = Float64Array.from({ length: n }, (_, i) => 200 + i);
    const c = cubicStateColumns(m, T, 5e6, n, { idealGas: ig, M: sub.M });
    expect(c.stoppedAt).toBe(-1);
    for (const i of [0, 50, 169, 170, 171, 200, 400]) {
      const g = general(m, T[i]!, 5e6, "stable", ig, sub.M);
      expect(deviation(c, i, g.row)).toBeLessThan(1e-12);
    }
  });

  it("cubicStateColumns speed of sound tends to the ideal-gas value sqrt(gamma R T / M) as P -> 0", () => {
    // Ideal-gas limit w^2 = (Cp/Cv) R T / M with Cv = Cp - R (textbook identity, from memory).
    const sub = getSubstance("nitrogen");
    const ig = idealGasFunctions([sub], [1]);
    const T = 300;
    const c = cubicStateColumns(pr(pureFluid(sub)), T, 10, 1, { idealGas: ig, M: sub.M });
    const cp = ig.Cp(T);
    const wIdeal = Math.sqrt(((cp / (cp - R)) * R * T) / sub.M);
    // At 10 Pa the real-gas correction is of order B P / (R T) ~ 1e-7 (from memory for N2: B ~ -5 cm3/mol).
    expect(Math.abs(c.totals!.w[0]! / wIdeal - 1)).toBeLessThan(1e-6);
    // Nitrogen at 300 K: about 353 m/s (common handbook value, from memory), within 1 %.
    expect(Math.abs(c.totals!.w[0]! / 353 - 1)).toBeLessThan(0.01);
  });

  it("cubicStateColumns stops at the first point the general path would reject, and polls shouldStop", () => {
    const sub = getSubstance("propane");
    const m = pr(pureFluid(sub));
    // "liquid" at or above Tc has no answer: index 2 (T = Tc) stops the loop.
    const c = cubicStateColumns(m, Float64Array.of(300, 350, sub.Tc, 400), 5e6, 4, { phase: "liquid" });
    expect(c.stoppedAt).toBe(2);
    expect(c.interrupted).toBe(false);
    const big = new Float64Array(5000).fill(300);
    const s = cubicStateColumns(m, big, 1e5, big.length, { shouldStop: () => true });
    expect(s.interrupted).toBe(true);
    expect(s.stoppedAt).toBe(1024);
  });

  it("isPureCubic accepts one-component cubic models only", () => {
    const propane = getSubstance("propane");
    const methane = getSubstance("methane");
    expect(isPureCubic(pr(pureFluid(propane)))).toBe(true);
    expect(isPureCubic(vdw(pureFluid(propane)))).toBe(true);
    expect(isPureCubic(pr({ components: [propane, methane], x: [0.5, 0.5] }))).toBe(false);
    expect(isPureCubic(idealGas(pureFluid(propane)))).toBe(false);
  });
});
