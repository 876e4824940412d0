import { describe, expect, it } from "vitest";
import { createSessionWithInternals } from "../../../../lib/language/createSession.js";
import { thermoDataOf } from "../../../../lib/language/values/thermo.js";

const { session, internals } = createSessionWithInternals({ shouldStop: () => false });
const sink = { stdout() {}, display() {}, clear() {} };
const value = (code: string): unknown => {
  const r = session.run(`__v = ${code};`, sink);
  if (!r.ok) throw new Error(r.error.evalue);
  return internals.scope.get("__v");
};

describe("substanceValue", () => {
  it("substanceValue carries the databank record in SI underneath the displayed quantities", () => {
    const d = thermoDataOf(value('substance("propane")'));
    if (d?.kind !== "substance") throw new Error("not a substance");
    // Propane Tc 369.8 K, Pc 42.48 bar (SVNA 7th ed. Table B.1, from memory)
    expect(d.substance.Tc).toBeCloseTo(369.8, 6);
    expect(d.substance.Pc).toBeCloseTo(42.48e5, 0);
  });
});

describe("pseudoFromRecord", () => {
  it("pseudoFromRecord converts each field once to SI (degC to K, bar to Pa, g/mol to kg/mol, constant cp)", () => {
    const d = thermoDataOf(value('substance({name: "cut", Tc: 266.85 degC, Pc: 27 bar, omega: 0.35, M: 100 g/mol, cp: 200 J/(mol K)})'));
    if (d?.kind !== "substance") throw new Error("not a substance");
    expect(d.substance.Tc).toBeCloseTo(540, 9);
    expect(d.substance.M).toBeCloseTo(0.1, 12);
    expect(d.substance.cp.coefficients[0]! * 8.314462618).toBeCloseTo(200, 9);
  });
});

describe("mixtureValue", () => {
  it("mixtureValue keeps normalised fractions and a symmetric kij matrix from the 'a/b' record form", () => {
    const d = thermoDataOf(value('mixture({methane: 2, ethane: 2}, {"ethane/methane": 0.02})'));
    if (d?.kind !== "mixture") throw new Error("not a mixture");
    expect(d.x).toEqual([0.5, 0.5]);
    expect(d.kij).toEqual([[0, 0.02], [0.02, 0]]);
  });
  it("mixtureValue accepts the matrix form of kij", () => {
    const d = thermoDataOf(value("mixture({methane: 0.5, ethane: 0.5}, [[0, 0.01], [0.01, 0]])"));
    if (d?.kind !== "mixture") throw new Error("not a mixture");
    expect(d.kij).toEqual([[0, 0.01], [0.01, 0]]);
  });
});

describe("resolveSubstance", () => {
  it("resolveSubstance passes a substance value through unchanged", () => {
    session.run('sx = substance("ethane");', sink);
    expect(thermoDataOf(value("pr(sx)"))?.kind).toBe("model");
  });
});
