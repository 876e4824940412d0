import { describe, expect, it } from "vitest";
import { createSession } from "../../../lib/language/index.js";

const sink = { stdout() {}, display() {}, clear() {} };

describe("complete", () => {
  const s = createSession({ shouldStop: () => false });
  s.run("st = {Tc: 190.6 K, Pc: 45.99 bar, omega: 0.011}\nspeedy = 3", sink);

  it("complete offers variables first, then built-ins, for a prefix", () => {
    const r = s.complete("x = sp", 6);
    expect(r.matches.slice(0, 2)).toEqual(["speedy", "span"]);
    expect([r.cursorStart, r.cursorEnd]).toEqual([4, 6]);
  });
  it("complete offers record fields after `name.`", () => {
    const r = s.complete("st.", 3);
    expect(r.matches).toEqual(["Tc", "Pc", "omega"]);
    expect(s.complete("y = st.P", 8).matches).toEqual(["Pc"]);
  });
  it("complete offers units after a number", () => {
    expect(s.complete("3 psi", 5).matches).toEqual(expect.arrayContaining(["psi", "psia", "psig"]));
  });
  it("complete counts cursor positions in code points", () => {
    const code = "\u{1F600} + spe";
    const r = s.complete(code, 7);
    expect(r.matches).toContain("speedy");
    expect([r.cursorStart, r.cursorEnd]).toEqual([4, 7]);
  });
  it("complete inside quotes offers substance names and phase words, replacing only the typed text", () => {
    const r = s.complete('m = pr("prop', 12);
    expect(r.matches).toContain("propane");
    expect([r.cursorStart, r.cursorEnd]).toEqual([8, 12]);
    expect(s.complete('state(m, 300 K, 5 bar, "l', 25).matches).toEqual(["liquid"]);
    expect(s.complete('echo("sp', 8).matches).toEqual([]);
  });
});
