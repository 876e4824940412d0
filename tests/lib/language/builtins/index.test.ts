import { describe, expect, it } from "vitest";
import { BUILTINS } from "../../../../lib/language/builtins/index.js";

describe("BUILTINS", () => {
  it("BUILTINS have unique names and each has a group, doc and example", () => {
    const names = BUILTINS.map((b) => b.name);
    expect(new Set(names).size).toBe(names.length);
    for (const b of BUILTINS) {
      expect(b.group, b.name).toBeTruthy();
      expect(b.examples.length, b.name).toBeGreaterThan(0);
    }
    expect(names).toEqual(expect.arrayContaining(["span", "logspan", "echo", "show"]));
  });
});
