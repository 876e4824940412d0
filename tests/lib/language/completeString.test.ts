import { describe, expect, it } from "vitest";
import { enclosingCall, openStringStart, PHASE_WORDS, stringCompletions } from "../../../lib/language/completeString.js";
import { BUILTINS } from "../../../lib/language/index.js";
import { listSubstances } from "../../../lib/thermo/index.js";

const registry = new Map(BUILTINS.map((d) => [d.name, d]));
const at = (code: string) => stringCompletions(code, code.length, registry);

describe("openStringStart", () => {
  it("openStringStart finds the quote of a string still open at the cursor, ignoring closed ones and comments", () => {
    expect(openStringStart('pr("me')).toBe(3);
    expect(openStringStart('pr("methane"), "x')).toBe(15);
    expect(openStringStart('pr("methane")')).toBeUndefined();
    expect(openStringStart('1 # "comment')).toBeUndefined();
    expect(openStringStart("a = 'it\\'s")).toBe(4);
  });
});

describe("enclosingCall", () => {
  it("enclosingCall names the call and the argument index, looking through records, arrays and strings", () => {
    expect(enclosingCall('state(pr("a,b"), 300 K, 5 bar, ', 31)).toEqual({ name: "state", index: 3 });
    expect(enclosingCall("state(m, T, P, {phase: ", 23)).toEqual({ name: "state", index: 3 });
    expect(enclosingCall('mixture({methane: 0.9, ', 23)).toEqual({ name: "mixture", index: 0 });
    expect(enclosingCall("x = [1, ", 8)).toBeUndefined();
  });
});

describe("stringCompletions", () => {
  it("stringCompletions offers databank names for substance(), model calls and mixture()", () => {
    expect(at('substance("meth')!.matches).toEqual(expect.arrayContaining(["methane", "methanol"]));
    expect(at('pr("prop')!.matches).toContain("propane");
    expect(at('srk("n-but')!.matches).toEqual(["n-butane"]);
    expect(at('mixture({"eth')!.matches).toContain("ethane");
    expect(at('mixture([["CH')!.matches).toContain("CH4");
    // Every offered word is a databank id, formula or alias.
    const known = new Set(listSubstances().flatMap((s) => [s.id, s.formula, ...s.aliases]));
    for (const w of at('pr("')!.matches) expect(known.has(w), w).toBe(true);
  });
  it("stringCompletions offers the phase words where the parameter is phase", () => {
    expect(at('state(pr("methane"), 300 K, 50 bar, "')!.matches).toEqual([...PHASE_WORDS]);
    expect(at('state(m, 300 K, 50 bar, {phase: "li')!.matches).toEqual(["liquid"]);
    expect(at('volume(m, 300 K, 50 bar, "v')!.matches).toEqual(["vapor"]);
  });
  it("stringCompletions offers nothing in other strings and steps aside outside strings", () => {
    expect(at('echo("me')).toEqual({ matches: [], start: 6 });
    expect(at('x = "ab')!.matches).toEqual([]);
    expect(at("pr(")).toBeUndefined();
  });
});
