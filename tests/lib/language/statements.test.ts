import { describe, expect, it } from "vitest";
import { codePointToOffset, offsetToCodePoint, positionOf, scanCell } from "../../../lib/language/statements.js";

describe("scanCell", () => {
  it("scanCell splits on newlines and ; at depth 0, marks ; as hidden, skips comments and blanks", () => {
    const code = "a = 1; b = 2\n# note\n\nc = (1 +\n 2)  # tail\n";
    const st = scanCell(code).statements;
    expect(st.map((s) => [s.text.trim(), s.hidden])).toEqual([["a = 1", true], ["b = 2", false], ["c = (1 +\n 2)  # tail", false]]);
    expect(code.slice(st[2]!.start).startsWith("c = (1")).toBe(true);
  });
  it("scanCell ignores separators inside strings and brackets", () => {
    expect(scanCell('x = "a;b#c"\ny = [1, 2; 3, 4]').statements.length).toBe(2);
  });
  it("scanCell reports open brackets, unbalanced closers, open strings and depth", () => {
    expect(scanCell("f(1, [2").open.map((o) => o.char)).toEqual(["(", "["]);
    expect(scanCell("1 + 2)").unbalancedAt).toBe(5);
    expect(scanCell("(]").unbalancedAt).toBe(1);
    expect(scanCell('x = "abc').openString).toBe(true);
    expect(scanCell("((()))").maxDepth).toBe(3);
  });
});

describe("positionOf", () => {
  it("positionOf gives 1-based line and code-point column", () => {
    const code = "a = 1\nb = \u{1F600} + c";
    expect(positionOf(code, code.indexOf("c"))).toEqual({ line: 2, column: 9, lineText: "b = \u{1F600} + c" });
  });
});

describe("codePointToOffset", () => {
  it("codePointToOffset and offsetToCodePoint convert around astral characters", () => {
    const code = "\u{1F600}ab";
    expect(codePointToOffset(code, 1)).toBe(2);
    expect(offsetToCodePoint(code, 3)).toBe(2);
  });
});
