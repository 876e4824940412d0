import { describe, expect, it } from "vitest";
import { soaveAlpha, soaveAlphaDTr } from "../../../../lib/thermo/eos/soaveAlpha.js";
import { derivative } from "../../../../lib/numerics/index.js";

describe("soaveAlpha", () => {
  it("soaveAlpha is 1 at Tr = 1 for any slope (definition, Soave 1972)", () => {
    for (const m of [0.3, 0.8, 1.2]) expect(soaveAlpha(1, m)).toBe(1);
  });
  it("soaveAlphaDTr matches a numerical derivative to 1e-9", () => {
    for (const [Tr, m] of [[0.5, 0.7], [0.9, 0.5], [1.7, 1.1]] as const) {
      const num = derivative((t) => soaveAlpha(t, m), Tr).value;
      expect(Math.abs(soaveAlphaDTr(Tr, m) - num)).toBeLessThan(1e-9);
    }
  });
});
