import { describe, expect, it } from "vitest";
import type { Unit } from "mathjs";
import { languageSession } from "../../../support/languageSession.js";

const out: string[] = [];
const { session, sink, value, num, text, errorOf } = languageSession({ stdout: (t: string) => { out.push(t); }, display() {}, clear() {} });

describe("substance", () => {
  it("substance(\"methane\") shows a two-column table with its source, and fields read as quantities", () => {
    expect(text('substance("methane")')).toMatch(/Tc\s+190\.6 K[\s\S]*source\s+Smith, Van Ness/);
    // Methane: Tc 190.6 K, Pc 45.99 bar, M 16.043 g/mol (SVNA 7th ed. Table B.1, from memory)
    expect(num('substance("CH4").Tc', "K")).toBeCloseTo(190.6, 6);
    expect(num('substance("methane").Pc', "bar")).toBeCloseTo(45.99, 6);
    expect(num('substance("methane").M', "g/mol")).toBeCloseTo(16.043, 6);
  });
  it("substance fields cannot be changed (the value is frozen)", () => {
    session.run('sm = substance("methane");', sink);
    session.run("sm.Tc = 5 K;", sink);
    expect(num("sm.Tc", "K")).toBeCloseTo(190.6, 6);
  });
  it("substance of a record makes a pseudo-component with filled fields noted", () => {
    expect(num('substance({name: "cut", Tc: 540 K, Pc: 27 bar, omega: 0.35, M: 100 g/mol}).Pc', "Pa")).toBeCloseTo(27e5, 3);
    expect(text('substance({name: "cut", Tc: 540 K, Pc: 27 bar, omega: 0.35, M: 100 g/mol})')).toMatch(/note\s+filled: Zc = 0\.291/);
  });
  it("substance errors: unknown names get suggestions, records name the bad field", () => {
    expect(errorOf('substance("methan")')).toMatch(/unknown substance "methan"\. Did you mean: methane/);
    expect(errorOf('substance({name: "cut", Tc: 540 K, Pc: 27 bar, omega: 0.35})')).toMatch(/needs field M/);
    expect(errorOf('substance({name: "cut", Tc: 540 bar, Pc: 27 bar, omega: 0.35, M: 100 g/mol})')).toMatch(/Tc/);
    expect(errorOf('substance({name: "cut", Tc: 540 K, Pc: 27 bar, omega: 0.35, M: 100 g/mol, colour: 1})')).toMatch(/unknown field "colour"/);
  });
});

describe("mixture", () => {
  it("mixture normalises fractions that do not sum to 1, with a warning", () => {
    out.length = 0;
    const x = value("mixture({methane: 0.9, ethane: 0.2}).x") as Record<string, number>;
    expect(x.methane).toBeCloseTo(0.9 / 1.1, 14);
    expect(out.join("")).toMatch(/warning: mixture\(\): mole fractions summed to 1\.1/);
  });
  it("mixture M is the mole-fraction average of the components' M (definition)", () => {
    expect(num("mixture({methane: 0.9, ethane: 0.1}).M", "g/mol")).toBeCloseTo(0.9 * 16.043 + 0.1 * 30.07, 6);
  });
  it("mixture errors: unknown names with suggestions, negative fractions, bad kij", () => {
    expect(errorOf("mixture({methan: 0.5, ethane: 0.5})")).toMatch(/argument fractions of mixture\(\): unknown substance "methan"\. Did you mean: methane/);
    expect(errorOf("mixture({methane: -0.5, ethane: 0.5})")).toMatch(/must be a number >= 0/);
    expect(errorOf("mixture({methane: 0.5, ethane: 0.5}, [[0, 0.1]])")).toMatch(/argument kij of mixture\(\) must be a 2 x 2 matrix/);
    expect(errorOf('mixture({methane: 0.5, ethane: 0.5}, {"methane/propane": 0.1})')).toMatch(/must name two different components of the mixture as "a\/b"/);
    expect(errorOf("mixture({methane: 0.5, CH4: 0.5})")).toMatch(/same substance/);
  });
  it("mixture kij changes the PR mixture's Z (k_ij enters a_ij = sqrt(a_i a_j)(1 - k_ij))", () => {
    const z0 = value("zfactor(pr(mixture({methane: 0.5, propane: 0.5})), 300 K, 50 bar)") as number;
    const z1 = value('zfactor(pr(mixture({methane: 0.5, propane: 0.5}, {"methane/propane": 0.1})), 300 K, 50 bar)') as number;
    expect(z1).toBeGreaterThan(z0); // smaller attraction -> larger Z
  });
});

describe("models", () => {
  it("each model shows its name, source and fluid", () => {
    expect(text('pr("propane")')).toMatch(/Peng-Robinson[\s\S]*fluid\s+propane[\s\S]*Ind\. Eng\. Chem\. Fundam/);
    for (const id of ["idealgas", "vdw", "rk", "srk", "virial", "lk"]) expect(text(`${id}("ethane")`)).toMatch(/fluid\s+ethane/);
  });
  it("models accept a name, a substance or a mixture, and check their options", () => {
    expect(value('pr(substance("ethane")).fluid')).toBe("ethane");
    expect(String(value("srk(mixture({methane: 0.9, ethane: 0.1})).fluid"))).toMatch(/methane 0\.9000, ethane 0\.1000/);
    expect(errorOf('virial("ethane", {correlation: "x"})')).toMatch(/option correlation of virial\(\) must be one of "abbott", "tsonopoulos"/);
    expect(errorOf('pr("ethane", {mixing: "kay"})')).toMatch(/option "mixing" of pr\(\) is not known/);
    expect(errorOf("pr(5)")).toMatch(/argument x of pr\(\) needs a substance name/);
  });
  it("a reference option moves the totals by exactly the stated H0 (definition of the reference state)", () => {
    const a = num('state(pr("propane"), 350 K, 10 bar).H', "J/mol");
    const b = num('state(pr("propane", {reference: {H: 1 kJ/mol}}), 350 K, 10 bar).H', "J/mol");
    expect(b - a).toBeCloseTo(1000, 8);
  });
});

describe("per_mass", () => {
  it("per_mass(x, M) divides by M and per_mole multiplies (definition)", () => {
    expect(num("per_mass(10 kJ/mol, 44.097 g/mol)", "kJ/kg")).toBeCloseTo(10 / 0.044097, 8);
    expect(num("per_mole(2257 kJ/kg, 18.015 g/mol)", "kJ/mol")).toBeCloseTo(2257 * 0.018015, 8);
    expect(errorOf("per_mass(10 kJ/kg, 44 g/mol)")).toMatch(/argument x of per_mass\(\) needs a per-mole quantity/);
  });
});

describe("per_mass display (QA issue 5, P4)", () => {
  it("per_mass shows per kg in the numerator's units: 10 kJ/mol / 44.097 g/mol = 226.773 kJ/kg", () => {
    // Arithmetic: 10 kJ/mol / 0.044097 kg/mol = 226.773 kJ/kg.
    const v = value("per_mass(10 kJ/mol, 44.097 g/mol)") as Unit;
    expect(v.formatUnits()).toBe("kJ / kg");
    expect(v.toNumber("kJ/kg")).toBeCloseTo(226.7728, 3);
    expect((value("per_mass(10 J/(mol K), 44.097 g/mol)") as Unit).formatUnits()).toBe("J / (kg K)");
    // A kmol basis keeps its meaning: 10 kJ/kmol / 44.097 kg/kmol = 0.226773 kJ/kg.
    expect(num("per_mass(10 kJ/kmol, 44.097 kg/kmol)", "kJ/kg")).toBeCloseTo(0.226773, 6);
  });
});

describe("change per mass (QA issue 5, P4)", () => {
  it("change() gives dh, ds, du, dg, dv per mass where M is known, equal to the molar changes over M", () => {
    session.run('cm = pr("propane"); c = change(state(cm, 300 K, 1 bar), state(cm, 400 K, 10 bar));', sink);
    const M = 0.044097; // propane, SVNA Table B.1 (from memory)
    for (const [mol, mass, um, us] of [["dH", "dh", "J/mol", "J/kg"], ["dS", "ds", "J/(mol K)", "J/(kg K)"], ["dU", "du", "J/mol", "J/kg"], ["dG", "dg", "J/mol", "J/kg"], ["dV", "dv", "m^3/mol", "m^3/kg"]] as const) {
      expect(Math.abs(num(`c.${mass}`, us) / (num(`c.${mol}`, um) / M) - 1)).toBeLessThan(1e-12);
    }
  });
});
