import { describe, expect, it } from "vitest";
import { loadMathjs } from "../../../lib/language/mathjs.js";
import { installUnits } from "../../../lib/units/index.js";
import { createUnitsBridge, describeDimension } from "../../../lib/language/unitsBridge.js";

const lib = loadMathjs();
const math = lib.create(lib.all, {});
installUnits(math);
const u = createUnitsBridge(math);

describe("createUnitsBridge", () => {
  it("toSI converts offsets to absolute SI (0 barg = 101325 Pa: gauge against 1 atm, exact)", () => {
    expect(u.toSI(math.unit(0, "barg"), "pressure", "P", "f")).toBeCloseTo(101325, 6);
    expect(u.toSI(math.unit(25, "degC"), "temperature", "T", "f")).toBeCloseTo(298.15, 9);
  });
  it("toSI names argument and function on a wrong dimension and refuses unknown dimensions", () => {
    expect(() => u.toSI(math.unit(25, "degC"), "pressure", "P", "state")).toThrow(/argument P of state\(\) needs a pressure.*got 25 degC \(a temperature\)/);
    expect(() => u.toSI(1, "nonsense", "x", "f")).toThrow(/unknown dimension "nonsense"/);
  });
  it("fromSI picks a readable unit for a dimension and keeps an explicit unit string", () => {
    const p = u.fromSI(2.5e6, "pressure");
    expect(math.isUnit(p) && p.toNumber("Pa")).toBeCloseTo(2.5e6, 6);
    expect(math.isUnit(p) && p.formatUnits()).toBe("MPa");
    const q = u.fromSI(1e5, "bar");
    expect(math.isUnit(q) && q.toString()).toBe("1 bar");
    expect(u.fromSI(0.5, "dimensionless")).toBe(0.5);
  });
  it("displayUnitFor chooses one unit for a whole column", () => {
    expect(u.displayUnitFor(Float64Array.from([1e5, 2e6]), "pressure")).toBe("MPa");
    expect(u.siUnitOf("molar_volume")).toBe("m^3/mol");
  });
});

describe("describeDimension", () => {
  it("describeDimension gives the article", () => {
    expect(describeDimension("pressure")).toBe("a pressure");
    expect(describeDimension("model")).toBe("a model");
    expect(describeDimension("opaque_thing")).toBe("an opaque thing");
  });
});
