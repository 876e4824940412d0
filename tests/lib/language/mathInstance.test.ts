import { describe, expect, it } from "vitest";
import { createRestrictedMath, DISABLED_NAMES } from "../../../lib/language/mathInstance.js";

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
