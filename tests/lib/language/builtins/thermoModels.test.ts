import { describe, expect, it } from "vitest";
import { idealGasPart } from "../../../../lib/language/builtins/thermoModels.js";
import { languageSession } from "../../../support/languageSession.js";
import { modelDataOf } from "../../../../lib/language/values/thermo.js";
import { DEFAULT_REFERENCE, getSubstance, pseudoComponent } from "../../../../lib/thermo/index.js";

const { value } = languageSession();

describe("idealGasPart", () => {
  it("idealGasPart: H is 0 at the reference T and S is 0 at the reference T and P (DEFAULT_REFERENCE: 298.15 K, 1 bar)", () => {
    const part = idealGasPart({ components: [getSubstance("propane")], x: [1] }, DEFAULT_REFERENCE);
    if (typeof part === "string") throw new Error(part);
    expect(Math.abs(part.H(298.15))).toBeLessThan(1e-9);
    expect(Math.abs(part.S(298.15, 1e5))).toBeLessThan(1e-12);
    expect(part.warnings(400)).toEqual([]);
    // Propane's Table C.1 fit: 298 to 1500 K. Rule (cp.ts, common practice): flag beyond 10 %, "far" beyond 50 %.
    expect(part.warnings(3000)[0]).toMatch(/Propane used far outside its fitted range 298 to 1500 K/);
    expect(part.warnings(1600)).toEqual([]);
    expect(part.warnings(288.15)).toEqual([]);
    expect(part.warnings(1700)[0]).toMatch(/extrapolated more than 10 % outside its fitted range 298 to 1500 K/);
  });
  it("idealGasPart names the component without Cp", () => {
    const cut = pseudoComponent({ name: "cut", Tc: 540, Pc: 27e5, omega: 0.35, M: 0.1 });
    expect(idealGasPart({ components: [cut], x: [1] }, DEFAULT_REFERENCE)).toMatch(/no ideal-gas Cp for cut/);
  });
});

describe("modelValue", () => {
  it("modelValue: M and Kay's-rule Tc of a mixture are mole-fraction averages (W. B. Kay, 1936)", () => {
    const d = modelDataOf(value("pr(mixture({methane: 0.5, ethane: 0.5}))"));
    expect(d?.M).toBeCloseTo(0.5 * 0.016043 + 0.5 * 0.03007, 9);
    expect(d?.Tc).toBeCloseTo(0.5 * 190.6 + 0.5 * 305.3, 9);
  });
  it("modelValue without Cp still gives residual states and says why totals are missing", () => {
    const s = value('state(pr(substance({name: "cut", Tc: 540 K, Pc: 27 bar, omega: 0.35, M: 100 g/mol})), 600 K, 10 bar)') as Record<string, unknown>;
    expect(s.H).toBeUndefined();
    expect(s.HR).toBeDefined();
    expect(String(s.notes)).toMatch(/no ideal-gas Cp for cut/);
  });
});
