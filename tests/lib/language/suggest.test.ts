import { describe, expect, it } from "vitest";
import { editDistance, suggestNames } from "../../../lib/language/suggest.js";

describe("editDistance", () => {
  it("editDistance counts edits, swaps as one and case changes as half", () => {
    expect(editDistance("kitten", "sitting")).toBe(3); // classic Levenshtein example (from memory)
    expect(editDistance("psat", "pzat")).toBe(1);
    expect(editDistance("tsat", "tsta")).toBe(1);
    expect(editDistance("Tc", "tc")).toBe(0.5);
  });
});

describe("suggestNames", () => {
  it("suggestNames returns the nearest candidates only", () => {
    expect(suggestNames("sapn", ["span", "logspan", "spin", "sum"])).toEqual(["span", "spin"]); // swap costs 1, two substitutions 2
    expect(suggestNames("zzzz", ["span", "sum"])).toEqual([]);
  });
});
