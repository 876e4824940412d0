import { describe, expect, it } from "vitest";
import { STATE_FIELDS, columnsOf, identity, recordOf } from "../../../../lib/language/builtins/thermoRows.js";
import { createSessionWithInternals } from "../../../../lib/language/createSession.js";
import { isQuantityColumn } from "../../../../lib/language/values/column.js";
import { modelDataOf } from "../../../../lib/language/values/thermo.js";

const { session, internals } = createSessionWithInternals({ shouldStop: () => false });
const value = (code: string): unknown => {
  const r = session.run(`__v = ${code};`, { stdout() {}, display() {}, clear() {} });
  if (!r.ok) throw new Error(r.error.evalue);
  return internals.scope.get("__v");
};

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
