import { describe, expect, it } from "vitest";
import { R } from "../../../../lib/thermo/constants.js";
import { ThermoError } from "../../../../lib/thermo/errors.js";
import {
  editDistance,
  getSubstance,
  listSubstances,
  normalizeName,
  suggestSubstances,
} from "../../../../lib/thermo/substances/databank.js";

describe("getSubstance", () => {
  it("getSubstance resolves names, aliases and formulas case-insensitively", () => {
    const cases: [string, string][] = [
      ["CH4", "methane"], ["methane", "methane"], ["METHANE", "methane"],
      ["n-butane", "n-butane"], ["butane", "n-butane"], ["nC4", "n-butane"], ["iC4", "isobutane"],
      ["R134a", "r-134a"], ["R-134a", "r-134a"], ["r 134a", "r-134a"], ["HFC-134a", "r-134a"],
      ["carbon dioxide", "carbon dioxide"], ["CO2", "carbon dioxide"], ["R-744", "carbon dioxide"],
      ["R-717", "ammonia"], ["NH3", "ammonia"], ["H2O", "water"], ["steam", "water"], ["air", "air"],
      ["p-xylene", "p-xylene"], ["2,2,4-trimethylpentane", "isooctane"], ["N2", "nitrogen"], ["co", "carbon monoxide"],
    ];
    for (const [name, id] of cases) expect(getSubstance(name).id, name).toBe(id);
  });

  it("getSubstance throws a ThermoError with suggestions for an unknown name", () => {
    let err: unknown;
    try {
      getSubstance("methan");
    } catch (e) {
      err = e;
    }
    expect(err).toBeInstanceOf(ThermoError);
    expect((err as ThermoError).argument).toBe("name");
    expect((err as Error).message).toMatch(/unknown substance "methan".*Did you mean: methane/);
    expect(() => getSubstance("zzzzqqq")).toThrow(/unknown substance "zzzzqqq"/);
    expect(() => getSubstance("")).toThrow(/non-empty/);
  });
});

describe("suggestSubstances", () => {
  it("suggestSubstances ranks close spellings first", () => {
    expect(suggestSubstances("propan")[0]).toBe("propane");
    expect(suggestSubstances("toluen")[0]).toBe("toluene");
    expect(suggestSubstances("R134")[0]).toMatch(/r-134a|R134a/i);
  });
});

describe("editDistance", () => {
  it("editDistance counts single-character edits", () => {
    expect(editDistance("kitten", "sitting")).toBe(3); // classic textbook example
    expect(editDistance("", "abc")).toBe(3);
    expect(editDistance("same", "same")).toBe(0);
  });
});

describe("normalizeName", () => {
  it("normalizeName drops case, spaces, hyphens", () => {
    expect(normalizeName(" R-134 a")).toBe("r134a");
  });
});

describe("listSubstances", () => {
  const all = listSubstances();

  it("listSubstances has at least 45 records, unique ids, each with a source", () => {
    expect(all.length).toBeGreaterThanOrEqual(45);
    expect(new Set(all.map((s) => s.id)).size).toBe(all.length);
    for (const s of all) expect(s.source.length, s.id).toBeGreaterThan(20);
    for (const s of all) expect(s.cp.source.length, s.id).toBeGreaterThan(20);
  });

  it("listSubstances records are in SI with physically sensible magnitudes", () => {
    for (const s of all) {
      expect(s.M, s.id).toBeGreaterThan(0.001); // kg/mol
      expect(s.M, s.id).toBeLessThan(0.2);
      expect(s.Pc, s.id).toBeGreaterThan(2e5); // Pa: helium's 2.27 bar is the lowest
      expect(s.Pc, s.id).toBeLessThan(2.5e7);
      expect(s.Vc, s.id).toBeGreaterThan(3e-5); // m^3/mol
      expect(s.Vc, s.id).toBeLessThan(1e-3);
      expect(s.Tb, s.id).toBeLessThan(s.Tc);
      expect(s.cp.Tmax, s.id).toBeGreaterThan(s.cp.Tmin);
    }
  });

  it("listSubstances: tabulated Zc agrees with Pc Vc/(R Tc) within 1.5 % (catches typos in Tc, Pc, Vc)", () => {
    // Zc is printed rounded to 3 digits and Vc to 3-4, so 1.5 % covers rounding only.
    for (const s of all) {
      const z = (s.Pc * s.Vc) / (R * s.Tc);
      expect(Math.abs(z / s.Zc - 1), s.id).toBeLessThan(0.015);
    }
  });
});

describe("listSubstances molar masses", () => {
  // IUPAC standard atomic weights (abridged, 2021), g/mol (from memory).
  const W: Record<string, number> = { H: 1.008, C: 12.011, N: 14.007, O: 15.999, F: 18.998, S: 32.06, Cl: 35.45, Ar: 39.948, He: 4.0026, Ne: 20.18 };
  // Molecular formulas written independently of the data files (Hill order).
  const F: Record<string, string> = {
    methane: "CH4", ethane: "C2H6", propane: "C3H8", "n-butane": "C4H10", isobutane: "C4H10", "n-pentane": "C5H12",
    isopentane: "C5H12", neopentane: "C5H12", "n-hexane": "C6H14", "n-heptane": "C7H16", "n-octane": "C8H18",
    isooctane: "C8H18", "n-nonane": "C9H20", "n-decane": "C10H22", cyclohexane: "C6H12", ethylene: "C2H4",
    propylene: "C3H6", "1-butene": "C4H8", "1,3-butadiene": "C4H6", acetylene: "C2H2", benzene: "C6H6",
    toluene: "C7H8", ethylbenzene: "C8H10", "o-xylene": "C8H10", "m-xylene": "C8H10", "p-xylene": "C8H10",
    styrene: "C8H8", hydrogen: "H2", nitrogen: "N2", oxygen: "O2", argon: "Ar", helium: "He", neon: "Ne",
    "carbon monoxide": "CO", "carbon dioxide": "CO2", "hydrogen sulfide": "H2S", "sulfur dioxide": "O2S",
    chlorine: "Cl2", "hydrogen chloride": "ClH", "nitrous oxide": "N2O", "nitric oxide": "NO", water: "H2O",
    ammonia: "H3N", methanol: "CH4O", ethanol: "C2H6O", acetone: "C3H6O", "r-134a": "C2H2F4", "r-32": "CH2F2",
    "r-125": "C2HF5", "r-22": "CHClF2", "r-1234yf": "C3H2F4",
  };
  const mass = (f: string) => [...f.matchAll(/([A-Z][a-z]?)(\d*)/g)].reduce((m, [, el, n]) => m + W[el!]! * (n ? Number(n) : 1), 0);

  it("listSubstances: M equals the sum of IUPAC atomic weights of the formula within 0.05 %", () => {
    for (const s of listSubstances()) {
      if (s.id === "air") continue; // mixture: checked against Lemmon et al. (2000) below
      const f = F[s.id];
      expect(f, `formula for ${s.id} listed in this test`).toBeDefined();
      expect(Math.abs((s.M * 1000) / mass(f!) - 1), s.id).toBeLessThan(5e-4);
    }
    // Dry air 28.9586 g/mol: Lemmon, Jacobsen, Penoncello & Friend, JPCRD 29 (2000) 331 (from memory).
    expect(getSubstance("air").M).toBeCloseTo(0.0289586, 6);
  });
});
