import { describe, expect, it } from "vitest";
import { codeCell, sourceText, type Notebook } from "../../../kernel/runner/notebook.js";
import { assignedNames, checkOverrides, INJECTED_TAG, injectOverrides, parseOverride, PARAMETERS_TAG } from "../../../kernel/runner/parameters.js";

const nb = (cells: Notebook["cells"]): Notebook => ({ nbformat: 4, nbformat_minor: 5, metadata: {}, cells });

describe("parseOverride", () => {
  it("parseOverride splits at the first = and keeps the expression", () => {
    expect(parseOverride('P2=60 bar')).toEqual({ name: "P2", expression: "60 bar" });
    expect(parseOverride("ratio=a==b")).toEqual({ name: "ratio", expression: "a==b" });
  });
  it("parseOverride rejects bad names and empty or multi-statement values", () => {
    expect(() => parseOverride("60 bar")).toThrow(/expected name=value/);
    expect(() => parseOverride("2P=1")).toThrow(/not a variable name/);
    expect(() => parseOverride("P=")).toThrow(/no value/);
    expect(() => parseOverride("P=1; x=2")).toThrow(/single expression/);
  });
});

describe("injectOverrides", () => {
  it("injectOverrides places the cell after the cell tagged parameters", () => {
    const out = injectOverrides(nb([codeCell("a = 1"), codeCell("P2 = 50 bar", [PARAMETERS_TAG]), codeCell("use(P2)")]), [{ name: "P2", expression: "60 bar" }]);
    expect(out.cells).toHaveLength(4);
    expect(out.cells[2]!.metadata).toEqual({ tags: [INJECTED_TAG] });
    expect(sourceText(out.cells[2]!.source)).toContain("P2 = 60 bar");
  });
  it("injectOverrides goes before the first code cell when nothing is tagged", () => {
    const md = { cell_type: "markdown" as const, source: "# t", metadata: {} };
    const out = injectOverrides(nb([md, codeCell("x = 1")]), [{ name: "x", expression: "2" }]);
    expect(out.cells[1]!.metadata).toEqual({ tags: [INJECTED_TAG] });
  });
  it("injectOverrides without overrides returns the notebook unchanged", () => {
    const input = nb([codeCell("x")]);
    expect(injectOverrides(input, [])).toBe(input);
  });
});

describe("checkOverrides", () => {
  it("assignedNames reads assignments at statement starts, not comparisons", () => {
    expect([...assignedNames("P1 = 10 bar; T1 = 300 K\nok = P1 == 2\n  x=1")]).toEqual(["P1", "T1", "ok", "x"]);
  });
  it("checkOverrides accepts names the parameters cell assigns", () => {
    const book = nb([codeCell("P2 = 50 bar\nT2 = 300 K", [PARAMETERS_TAG]), codeCell("Q = 1")]);
    expect(() => checkOverrides(book, [{ name: "P2", expression: "60 bar" }], "case.ipynb")).not.toThrow();
  });
  it("checkOverrides refuses a mistyped name and lists what the parameters cell assigns", () => {
    const book = nb([codeCell("P2 = 50 bar\nT2 = 300 K", [PARAMETERS_TAG]), codeCell("Q2 = 1")]);
    expect(() => checkOverrides(book, [{ name: "Q2", expression: "1 bar" }], "case.ipynb")).toThrow(
      /case\.ipynb: --set Q2: not assigned by its parameters cell \(which assigns P2, T2\)/,
    );
  });
  it("checkOverrides looks at every code cell when none is tagged", () => {
    const book = nb([codeCell("a = 1"), codeCell("b = 2")]);
    expect(() => checkOverrides(book, [{ name: "b", expression: "3" }], "x")).not.toThrow();
    expect(() => checkOverrides(book, [{ name: "c", expression: "3" }], "x")).toThrow(/not assigned by its code cells/);
  });
});
