import { describe, expect, it } from "vitest";
import { createSession } from "../../../lib/language/index.js";
import { nameAt } from "../../../lib/language/inspect.js";

describe("inspect", () => {
  const s = createSession({ shouldStop: () => false });
  s.run("Tr = 0.9", { stdout() {}, display() {}, clear() {} });

  it("inspect of a built-in shows signature, argument kinds, method and example from the registry", () => {
    const r = s.inspect("logspan(1 bar, ", 15, 0);
    expect(r.found).toBe(true);
    const t = String(r.bundle?.["text/plain"]);
    expect(t.split("\n")[0]).toBe("logspan(a: quantity, b: quantity, n: number) -> column");
    expect(t).toMatch(/Method: a \(b\/a\)/);
    expect(t).toMatch(/Example:\n  logspan\(1 bar, 100 bar, 3\)/);
  });
  it("inspect of a variable shows its value; of a unit its SI size", () => {
    expect(s.inspect("Tr", 1, 0).bundle?.["text/plain"]).toBe("Tr = 0.9");
    // psia: 6894.757 Pa (NIST SP 811 B.8).
    expect(String(s.inspect("3 psia", 5, 0).bundle?.["text/plain"])).toMatch(/^psia: unit of pressure, 1 psia = 6894.76 Pa/);
  });
  it("inspect of a unit states that a unit right after a number stays the unit (literals.ts)", () => {
    const t = String(s.inspect("5 L", 3, 0).bundle?.["text/plain"]);
    expect(t).toMatch(/^L: unit of volume, 1 L = 0.001 m\^3\n/); // 1 L = 1e-3 m^3 (CGPM 1964)
    expect(t).toMatch(/Right after a number \(2 L, 2 L\^2, 2 L\/s\) and after to\/in, L is always this unit/);
  });
  it("inspect finds nothing on blank space outside calls", () => {
    expect(s.inspect("   ", 1, 0).found).toBe(false);
  });
});

describe("nameAt", () => {
  it("nameAt finds the word under the cursor or the enclosing call", () => {
    expect(nameAt("span(1, 2", 8)).toBe("span");
    expect(nameAt("x = spa", 7)).toBe("spa");
    expect(nameAt("f(g(1), ", 8)).toBe("f");
  });
});
