import { describe, expect, it } from "vitest";
import { STATE_FIELDS, columnsOf, eosRowAt, fastEosColumns, identity, recordOf } from "../../../../lib/language/builtins/thermoRows.js";
import { languageSession } from "../../../support/languageSession.js";
import { isQuantityColumn } from "../../../../lib/language/values/column.js";
import { modelDataOf } from "../../../../lib/language/values/thermo.js";

const { internals, value } = languageSession();

describe("STATE_FIELDS", () => {
  it("STATE_FIELDS uses the DESIGN.md symbols: upper case molar, lower case specific", () => {
    expect(STATE_FIELDS.H).toBe("molar_energy");
    expect(STATE_FIELDS.h).toBe("specific_energy");
    expect(STATE_FIELDS.Cp).toBe("molar_heat_capacity");
    expect(STATE_FIELDS.cp).toBe("specific_heat_capacity");
    expect(STATE_FIELDS.w).toBe("velocity");
  });
});

describe("state record", () => {
  it("a scalar state lists every DESIGN.md field in order, with model and reference", () => {
    const s = value('state(pr("propane"), 350 K, 10 bar)') as Record<string, unknown>;
    expect(Object.keys(s)).toEqual(["T", "P", "phase", "V", "v", "rho", "Z", "H", "S", "U", "G", "A", "h", "s", "u", "g", "a",
      "HR", "SR", "UR", "GR", "AR", "phi", "lnphi", "f", "Cp", "Cv", "cp", "cv", "w", "model", "reference"]);
  });
  it("recordOf wraps SI numbers into quantities of the field's dimension and keeps NaN visible", () => {
    const d = modelDataOf(value('pr("propane")'))!;
    const ctx = { units: internals.units } as unknown as Parameters<typeof recordOf>[2];
    const r = recordOf({ T: 300, P: 1e5, phase: "vapor", Cp: NaN }, d, ctx);
    expect((r.T as { toNumber(u: string): number }).toNumber("K")).toBe(300);
    expect(Number.isNaN(r.Cp)).toBe(true);
    expect(r.model).toBe(identity(d).model);
  });
  it("columnsOf groups notes that differ only in numbers and counts the points", () => {
    const d = modelDataOf(value('lk("propane")'))!;
    const col = (si: Float64Array, dim: string) => ({ si, dim, isQuantityColumn: true });
    const ctx = { units: internals.units, column: col } as unknown as Parameters<typeof columnsOf>[2];
    const rows = [
      { T: 300, P: 1e5, phase: "vapor", notes: "Lee-Kesler used at Tr = 4.10, outside its tabulated range 0.3 to 4" },
      { T: 310, P: 1e5, phase: "vapor", notes: "Lee-Kesler used at Tr = 4.20, outside its tabulated range 0.3 to 4" },
      { T: 320, P: 1e5, phase: "vapor" },
    ];
    const c = columnsOf(rows, d, ctx);
    expect(c.notes).toBe("Lee-Kesler used at Tr = 4.10, outside its tabulated range 0.3 to 4 (2 of 3 points, first shown)");
    expect(c.phase).toEqual(["vapor", "vapor", "vapor"]);
    expect(isQuantityColumn(c.T)).toBe(true);
  });
});

describe("fastEosColumns", () => {
  const col = (si: Float64Array, dim: string, unit?: string) => ({ si, dim, unit, isQuantityColumn: true });
  const ctx = {
    units: internals.units, column: col, shouldStop: () => false, interrupted: () => new Error("interrupted"),
  } as unknown as Parameters<typeof fastEosColumns>[6];
  const si = (c: unknown) => (c as { si: Float64Array }).si;

  it("fastEosColumns gives the general path's record of columns: same keys, values to 1e-12 relative, phases, notes", () => {
    // Liquid, vapour, near-critical and supercritical states of pure fluids by four cubic models.
    const cases: [string, number, number, number, string | undefined][] = [
      ['pr("propane")', 200, 600, 5e6, undefined],
      ['srk("methane")', 100, 400, 4.6e6, undefined],
      ['vdw("n-butane")', 300, 420, 1e6, "vapor"],
      ['rk("water")', 300, 560, 1e7, "liquid"],
      ['pr("carbon dioxide")', 250, 320, 7.4e6, undefined],
    ];
    for (const [model, T0, T1, P, phase] of cases) {
      const d = modelDataOf(value(model))!;
      const n = 97;
      const T = Float64Array.from({ length: n }, (_, i) => T0 + ((T1 - T0) * i) / (n - 1));
      const fast = fastEosColumns(d, T, P, n, phase, "state", ctx)!;
      const general = columnsOf(Array.from(T, (t) => eosRowAt(d, t, P, phase, "state")), d, ctx);
      expect(Object.keys(fast), model).toEqual(Object.keys(general));
      // The propane span crosses Tc at 50 bar > Pc: its notes must be compared, not absent on both sides.
      if (model === 'pr("propane")') expect(String(general.notes)).toMatch(/supercritical .*of 97 points/);
      for (const k of Object.keys(general)) {
        const g = general[k];
        if (typeof g === "object" && g !== null && "si" in g) {
          const a = si(fast[k]);
          const b = si(g);
          for (let i = 0; i < n; i++) {
            if (Number.isNaN(b[i]!)) expect(Number.isNaN(a[i]!), `${model} ${k}[${i}]`).toBe(true);
            else expect(Math.abs(a[i]! - b[i]!) / Math.max(Math.abs(b[i]!), 1e-3), `${model} ${k}[${i}]`).toBeLessThan(1e-12);
          }
          // Same display unit as displayUnitFor over the whole column would choose.
          expect((fast[k] as { unit: string }).unit, `${model} ${k}`).toBe(internals.units.displayUnitFor(b, STATE_FIELDS[k]!));
        } else expect(fast[k], `${model} ${k}`).toEqual(g);
      }
    }
  });

  it("fastEosColumns leaves mixtures and non-cubic models to the general path (undefined)", () => {
    const T = Float64Array.of(300, 310);
    expect(fastEosColumns(modelDataOf(value('lk("propane")'))!, T, 1e5, 2, undefined, "state", ctx)).toBeUndefined();
    expect(fastEosColumns(modelDataOf(value('virial("propane")'))!, T, 1e5, 2, undefined, "state", ctx)).toBeUndefined();
    expect(fastEosColumns(modelDataOf(value('pr(mixture({methane: 0.9, ethane: 0.1}))'))!, T, 1e5, 2, undefined, "state", ctx)).toBeUndefined();
  });

  it("fastEosColumns throws the general path's error for a point it cannot answer", () => {
    const d = modelDataOf(value('pr("propane")'))!;
    expect(() => fastEosColumns(d, Float64Array.of(300, 380), 1e6, 2, "liquid", "state", ctx))
      .toThrow(/liquid root asked of a supercritical fluid at T = 380 K > Tc = 369\.8 K/);
  });
});
