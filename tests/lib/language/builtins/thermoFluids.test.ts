import { describe, expect, it } from "vitest";
import { languageSession } from "../../../support/languageSession.js";
import { thermoDataOf } from "../../../../lib/language/values/thermo.js";

const { session, sink, value, errorOf } = languageSession();

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

describe("mixtureValue (QA issue 5: kij forms, validation, pseudo-components)", () => {
  it("mixtureValue: a kij record that names no pair is an error naming argument kij and the accepted forms (item 15)", () => {
    const e = errorOf("mixture({methane: 0.5, CO2: 0.5}, {ki: 0.1})");
    expect(e).toMatch(/^argument kij of mixture\(\): key "ki" must name two different components .*accepted forms: a record of pairs \{"methane\/carbon dioxide": 0\.1\}.*symmetric n x n matrix/);
    expect(e).not.toMatch(/argument name|Did you mean/);
    // The option-record form {kij: ...} is accepted around either form.
    const d = thermoDataOf(value('mixture({methane: 0.5, CO2: 0.5}, {kij: {"methane/CO2": 0.1}})'));
    if (d?.kind !== "mixture") throw new Error("not a mixture");
    expect(d.kij).toEqual([[0, 0.1], [0.1, 0]]);
    expect(errorOf("mixture({methane: 0.5, CO2: 0.5}, {kij: 0.1})")).toMatch(/^argument kij of mixture\(\) needs a record of pairs/);
  });
  it("mixtureValue: an asymmetric kij or a non-zero diagonal is rejected at mixture() with 1-based indices and names (item 16)", () => {
    expect(errorOf("mixture({methane: 0.5, CO2: 0.5}, [0, 0.1; 0.2, 0])")).toMatch(/argument kij of mixture\(\) must be symmetric: kij\[1, 2\] = 0\.1 but kij\[2, 1\] = 0\.2 \(methane\/carbon dioxide\)/);
    expect(errorOf("mixture({methane: 0.5, CO2: 0.5}, [0.1, 0.1; 0.1, 0])")).toMatch(/the diagonal must be 0 .*kij\[1, 1\] \(methane\) = 0\.1/);
  });
  it("mixtureValue: user pseudo-components take part through the pair-list form (P4: a C7+ cut)", () => {
    session.run('cut = substance({name: "C7+", Tc: 540 K, Pc: 27 bar, omega: 0.35, M: 100 g/mol, cp: 200 J/(mol K)});', sink);
    const d = thermoDataOf(value('mixture([["methane", 0.8], [cut, 0.2]], {"methane/C7+": 0.04})'));
    if (d?.kind !== "mixture") throw new Error("not a mixture");
    expect(d.components.map((c) => c.name)).toEqual(["Methane", "C7+"]);
    expect(d.x).toEqual([0.8, 0.2]);
    expect(d.kij).toEqual([[0, 0.04], [0.04, 0]]);
    // Kay's rule Tpc = 0.8 * 190.6 + 0.2 * 540 = 260.48 K (methane Tc from SVNA Table B.1).
    expect((value('pr(mixture([["methane", 0.8], [cut, 0.2]]))') as { Tc: { toNumber(u: string): number } }).Tc.toNumber("K")).toBeCloseTo(260.48, 6);
    // A substance value inside the record form is pointed to the pair form.
    expect(errorOf("mixture({methane: 0.8, c7: cut})")).toMatch(/give a substance\(\.\.\.\) with its fraction as a pair, like mixture\(\[\["methane", 0\.8\], \[c7, 0\.2\]\]\)/);
  });
});
