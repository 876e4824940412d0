/**
 * pinUnitLiterals: a unit written right after a number stays a unit whatever the scope holds.
 * Check values are unit definitions: 1 ft = 0.3048 m, 1 L = 1e-3 m^3, 1 min = 60 s (NIST SP 811 B.8,
 * exact), and plain arithmetic.
 */
import type { MathJsInstance, MathNode, Unit } from "mathjs";
import { describe, expect, it } from "vitest";
import { loadMathjs } from "../../../lib/language/mathjs.js";
import { installUnits } from "../../../lib/units/index.js";
import { pinUnitLiterals } from "../../../lib/language/literals.js";
import { createSession } from "../../../lib/language/index.js";

const lib = loadMathjs();
const math = lib.create(lib.all, {}) as unknown as MathJsInstance;
installUnits(math);
const UnitClass = (math as unknown as { Unit: Parameters<typeof pinUnitLiterals>[1] }).Unit;

function pinned(code: string): { count: number; shadowed: string[]; run(scope?: Map<string, unknown>): unknown } {
  const node = math.parse(code) as MathNode;
  const shadowed: string[] = [];
  const count = pinUnitLiterals(node, UnitClass, (name, literal) => shadowed.push(`${name} in ${literal}`));
  const c = node.compile();
  return { count, shadowed, run: (scope = new Map()) => c.evaluate(scope) };
}

describe("pinUnitLiterals", () => {
  it("pinUnitLiterals keeps `5 m` a length when a variable m exists, and reports the shadowed name", () => {
    const p = pinned("5 m");
    expect(p.count).toBe(1);
    const v = p.run(new Map<string, unknown>([["m", 7]])) as Unit;
    expect(v.toNumber("m")).toBe(5); // plain mathjs gives 35
    expect(p.shadowed).toEqual(["m in 5 m"]);
    expect(math.parse("5 m").compile().evaluate(new Map([["m", 7]]))).toBe(35); // the behaviour fixed here
  });
  it("pinUnitLiterals covers powers, quotients, juxtaposed units and parenthesised groups", () => {
    const scope = new Map<string, unknown>([["m", 7], ["s", 2], ["K", 0.5], ["mol", 3], ["kg", 9]]);
    expect((pinned("1 m^2").run(scope) as Unit).toNumber("m^2")).toBe(1);
    expect((pinned("3 m/s").run(scope) as Unit).toNumber("m/s")).toBe(3);
    expect((pinned("8.314 J/(mol K)").run(scope) as Unit).toNumber("J/(mol K)")).toBeCloseTo(8.314, 12);
    expect((pinned("8.314 J/(mol*K)").run(scope) as Unit).toNumber("J/(mol K)")).toBeCloseTo(8.314, 12);
    expect((pinned("2 kg m/s^2").run(scope) as Unit).toNumber("N")).toBeCloseTo(2, 12);
    expect((pinned("-5 degC").run(scope) as Unit).toNumber("K")).toBeCloseTo(268.15, 12); // 0 degC = 273.15 K
    expect((pinned("1/2 m").run(scope) as Unit).toNumber("m")).toBe(0.5);
  });
  it("pinUnitLiterals reads `5 min` and `2 sec` as times (mathjs alone finds its functions min and sec)", () => {
    expect((pinned("5 min").run() as Unit).toNumber("s")).toBe(300); // 1 min = 60 s
    expect((pinned("2 sec").run() as Unit).toNumber("s")).toBe(2);
  });
  it("pinUnitLiterals pins the target of to/in without reporting it", () => {
    const p = pinned("3 ft to m");
    const v = p.run(new Map<string, unknown>([["m", "a model"]])) as Unit;
    expect(v.toNumber("m")).toBeCloseTo(0.9144, 12); // 3 x 0.3048 m
    expect(p.shadowed).toEqual([]);
    expect((pinned("x in L").run(new Map<string, unknown>([["x", math.unit(2, "m^3")], ["L", 4]])) as Unit).toNumber("L")).toBeCloseTo(2000, 9);
  });
  it("pinUnitLiterals leaves names alone when no number comes first, and after an explicit *", () => {
    const scope = new Map<string, unknown>([["T", math.unit(300, "K")], ["m", 7]]);
    expect(pinned("1 / T").count).toBe(0);
    expect((pinned("1 / T").run(scope) as Unit).toNumber("K^-1")).toBeCloseTo(1 / 300, 15);
    expect((pinned("2 * T").run(scope) as Unit).toNumber("K")).toBe(600);
    expect((pinned("5 m * T").run(scope) as Unit).toNumber("m K")).toBe(1500); // 5 m times T = 300 K
    expect(pinned("m").run(scope)).toBe(7);
    expect(pinned("x m").count).toBe(0); // a variable times m: m keeps mathjs's meaning
  });
  it("pinUnitLiterals pins a literal inside a function body and reports a parameter of that name", () => {
    const p = pinned("g(K) = 5 K");
    const scope = new Map<string, unknown>();
    p.run(scope);
    const g = scope.get("g") as (k: number) => Unit;
    expect(g(2).toNumber("K")).toBe(5);
    expect(p.shadowed).toEqual(["K in 5 K"]);
  });
});

describe("unit literals in a session", () => {
  it("a session shows a literal in the units written, a result of arithmetic simplified", () => {
    const s = createSession({ shouldStop: () => false });
    const sink = { stdout() {}, display() {}, clear() {} };
    const text = (code: string) => {
      const r = s.run(code, sink);
      return r.ok ? String(r.result?.["text/plain"]) : `ERROR ${r.error.evalue}`;
    };
    expect(text("2 J/(mol bar)")).toBe("2 J / (mol bar)"); // as written
    expect(text("R * 300 K / (5 bar)")).toBe("4.98868 L / mol"); // 8.314462618 x 300 / 5e5 m^3/mol (CODATA R)
    expect(text("a = 100 bar * 1 m^3 / (8.314462618 J/(mol K) * 3 kmol)")).toBe("a = 400.908 K"); // P V/(n R)
    expect(text("a to degC")).toBe("127.758 degC"); // 400.908 K - 273.15
  });

  it("a session keeps `1 m` a metre after m = pr(...) and warns once per name", () => {
    const out: string[] = [];
    const sink = { stdout: (t: string) => out.push(t), display() {}, clear() {} };
    const s = createSession({ shouldStop: () => false });
    const text = (code: string) => {
      const r = s.run(code, sink);
      return r.ok ? String(r.result?.["text/plain"]) : `ERROR ${r.error.evalue}`;
    };
    text('m = pr("methane")');
    expect(text("1 m")).toBe("1 m");
    expect(text("2 m^2")).toBe("2 m^2");
    expect(out.join("")).toMatch(/^warning: in "1 m", m is read as the unit m, not as your variable m.*2 \* m\)\n$/);
    expect(out).toHaveLength(1);
    expect(text("L = 2\n5 L to m^3")).toBe("0.005 m^3"); // 1 L = 1e-3 m^3
    expect(text("3 * L")).toBe("6");
    expect(out).toHaveLength(2);
  });
});
