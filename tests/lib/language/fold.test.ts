import { describe, expect, it } from "vitest";
import type { MathJsInstance, MathNode, Unit } from "mathjs";
import { loadMathjs } from "../../../lib/language/mathjs.js";
import { installUnits } from "../../../lib/units/index.js";
import { foldConstantQuantities } from "../../../lib/language/fold.js";

const lib = loadMathjs();
const math = lib.create(lib.all, {}) as unknown as MathJsInstance;
installUnits(math);
const UnitClass = (math as unknown as { Unit: { isValuelessUnit(n: string): boolean } }).Unit;

function folded(code: string): { node: MathNode; marked: number; run(scope?: Map<string, unknown>): unknown } {
  const node = math.parse(code);
  const marked = foldConstantQuantities(node, UnitClass);
  const c = node.compile();
  return { node, marked, run: (scope = new Map()) => c.evaluate(scope) };
}

const plain = (code: string, scope = new Map<string, unknown>()) => math.parse(code).compile().evaluate(scope);

describe("foldConstantQuantities", () => {
  it("foldConstantQuantities gives the same values as plain evaluation", () => {
    const cases: [string, string, number][] = [
      ["8.314 J/(mol K) * 300 K", "J/mol", 2494.2], // 8.314 x 300, arithmetic
      ["47 degC", "K", 320.15], // 0 degC = 273.15 K (ITS-90)
      ["(20 degC to K)", "K", 293.15], // ITS-90
      ["-3 bar", "kPa", -300], // bar = 100 kPa (NIST SP 811 B.8)
      ["2 bar + 1 bar", "bar", 3],
      ["1 psi to Pa", "Pa", 6894.757], // psi = 6894.757 Pa (NIST SP 811 B.8); checked to 1e-3 below
      ["(1 m)^3", "L", 1000], // 1 L = 1e-3 m^3 (CGPM 1964)
      ["300 K - 25 degC", "K", 1.85], // absolute - absolute = difference: 300 - 298.15
    ];
    for (const [code, unit, want] of cases) {
      const f = folded(code);
      expect(f.marked, code).toBeGreaterThan(0);
      const got = f.run() as Unit;
      expect(got.toNumber(unit), code).toBeCloseTo(want, unit === "Pa" ? 3 : 9);
      expect(got.toNumber(unit), code).toBe((plain(code) as Unit).toNumber(unit));
    }
  });
  it("foldConstantQuantities hands out a fresh copy on every run", () => {
    const f = folded("5 bar");
    const a = f.run() as Unit;
    const b = f.run() as Unit;
    expect(a).not.toBe(b);
    expect(a.equals(b)).toBe(true);
  });
  it("foldConstantQuantities marks only sub-expressions made of literals and unit names", () => {
    expect(folded("P * 5 bar").marked).toBe(2); // `bar` and `5 bar`; P is a variable
    expect(folded("f(x) * 2").marked).toBe(0);
    expect(folded("[1, 2] bar").marked).toBe(1); // only `bar`: arrays are never folded (they can be changed in place)
    expect(folded("x = 3").marked).toBe(0);
  });
  it("foldConstantQuantities yields to a variable that shadows a unit name, at every run", () => {
    const f = folded("5 K");
    expect((f.run() as Unit).toNumber("K")).toBe(5);
    expect(f.run(new Map([["K", 3]]))).toBe(15); // the user's K = 3, as mathjs itself does
    expect((f.run() as Unit).toNumber("K")).toBe(5);
  });
  it("foldConstantQuantities leaves a function parameter named like a unit alone", () => {
    const scope = new Map<string, unknown>();
    folded("g(K) = 5 K").run(scope);
    expect((scope.get("g") as (k: number) => number)(2)).toBe(10);
  });
  it("foldConstantQuantities leaves an ambiguous offset expression to fail at run time with its own message", () => {
    const f = folded("5 degC / minute");
    expect(() => f.run()).toThrow(/5 degC is an absolute temperature/);
  });
});
