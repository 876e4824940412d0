import { describe, expect, it } from "vitest";
import { NotebookError, parseNotebook, serializeNotebook, sourceText, withCellIds, codeCell } from "../../../kernel/runner/notebook.js";

const minimal = { nbformat: 4, nbformat_minor: 4, metadata: {}, cells: [{ cell_type: "markdown", source: ["# A", "\n"], metadata: {} }, { cell_type: "code", source: "1+1", metadata: {}, outputs: [], execution_count: null }] };

describe("parseNotebook", () => {
  it("parseNotebook reads nbformat 4 and keeps cells", () => {
    const nb = parseNotebook(JSON.stringify(minimal), "a.ipynb");
    expect(nb.cells).toHaveLength(2);
    expect(sourceText(nb.cells[0]!.source)).toBe("# A\n");
  });
  it("parseNotebook names the file and the problem", () => {
    expect(() => parseNotebook("{", "bad.ipynb")).toThrow(/bad\.ipynb: not valid JSON/);
    expect(() => parseNotebook(JSON.stringify({ ...minimal, nbformat: 3 }), "old.ipynb")).toThrow(/old\.ipynb: not an nbformat 4 notebook/);
    expect(() => parseNotebook(JSON.stringify({ ...minimal, cells: [{ cell_type: "widget", source: "" }] }), "x.ipynb")).toThrow(NotebookError);
    expect(() => parseNotebook(JSON.stringify({ ...minimal, cells: [{ cell_type: "code", source: 5 }] }), "x.ipynb")).toThrow(/cell 1 has no text source/);
  });
});

describe("withCellIds", () => {
  it("withCellIds gives unique valid ids and writes 4.5 (nbformat 4.5 made ids required)", () => {
    const nb = withCellIds(parseNotebook(JSON.stringify({ ...minimal, cells: [codeCell("a"), { ...codeCell("b"), id: "dup" }, { ...codeCell("c"), id: "dup" }] }), "x"));
    const ids = nb.cells.map((c) => c.id!);
    expect(new Set(ids).size).toBe(3);
    ids.forEach((id) => expect(id).toMatch(/^[a-zA-Z0-9-_]{1,64}$/));
    expect(nb.nbformat_minor).toBe(5);
    expect(serializeNotebook(nb).endsWith("\n")).toBe(true);
  });
});
