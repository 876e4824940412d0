import { describe, expect, it } from "vitest";
import { createRestrictedMath, defineOnInstance, DISABLED_NAMES } from "../../../lib/language/mathInstance.js";

describe("createRestrictedMath", () => {
  const { math, parse } = createRestrictedMath({ functions: () => ({ twice: (x: unknown) => 2 * (x as number) }) });
  it("createRestrictedMath disables every parser-reaching function in the namespace", () => {
    for (const name of DISABLED_NAMES) {
      expect(() => (math as unknown as Record<string, () => unknown>)[name]!(), name).toThrow(/not available in cells/);
    }
  });
  it("createRestrictedMath keeps a private parser and the given functions", () => {
    expect(parse("twice(21)").compile().evaluate(new Map())).toBe(42);
  });
  it("createRestrictedMath installs units before locking", () => {
    let installed = false;
    createRestrictedMath({ installUnits: () => { installed = true; }, functions: () => ({}) });
    expect(installed).toBe(true);
  });
});

describe("defineOnInstance", () => {
  it("createRestrictedMath disables every name in expressions too, transforms included", () => {
    const { parse } = createRestrictedMath({ functions: () => ({}) });
    for (const name of ["evaluate", "parse", "simplify", "derivative", "compile"]) {
      expect(() => parse(`${name}("1+1")`).compile().evaluate(new Map()), name).toThrow(/not available in cells/);
    }
  });
  it("defineOnInstance puts a function and its transform where expressions find them", () => {
    const { math, parse } = createRestrictedMath({ functions: () => ({}) });
    const f = Object.assign((x: number) => x + 1, { transform: (x: number) => x + 100 });
    defineOnInstance(math, "bump", f);
    expect((math as unknown as { bump: (x: number) => number }).bump(1)).toBe(2); // the plain function from code
    expect(parse("bump(1)").compile().evaluate(new Map())).toBe(101); // the transform in expressions
    defineOnInstance(math, "bump", (x: unknown) => (x as number) * 3);
    expect(parse("bump(2)").compile().evaluate(new Map())).toBe(6); // an old transform does not linger
  });
});
