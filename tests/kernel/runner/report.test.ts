import { describe, expect, it } from "vitest";
import { MIME } from "../../../lib/display/index.js";
import { codeCell, type Notebook } from "../../../kernel/runner/notebook.js";
import { CAUTION, escapeHtml, renderOutput, renderReport } from "../../../kernel/runner/report.js";

const svg = '<svg xmlns="http://www.w3.org/2000/svg"><text>P (bar)</text></svg>';

describe("renderReport", () => {
  const nb: Notebook = {
    nbformat: 4,
    nbformat_minor: 5,
    metadata: {},
    cells: [
      { cell_type: "markdown", source: "# Booster K-101\n\nSuction *conditions*.", metadata: {} },
      { ...codeCell("chart(...)"), execution_count: 1, outputs: [{ output_type: "display_data", data: { [MIME.text]: "chart", [MIME.svg]: svg, [MIME.png]: "iVBOR" }, metadata: {} }] },
      { ...codeCell("x < 1"), execution_count: 2, outputs: [{ output_type: "error", ename: "LanguageError", evalue: "bad <thing>", traceback: ["\x1b[31mLanguageError\x1b[0m: bad <thing>"] }] },
    ],
  };
  const html = renderReport(nb, {
    title: "Booster K-101",
    source: "booster.ipynb",
    toolVersion: "0.1.0",
    executedAt: "2026-12-01T00:00:00Z",
    checks: [
      { label: "discharge T", pass: true, detail: "140 degC < 150 degC", cell: 2 },
      { label: "power", pass: false, detail: "2.1 MW > 2 MW", cell: 2 },
    ],
    errors: [{ cell: 3, message: "LanguageError: bad <thing>" }],
  });

  it("renderReport puts the design-check summary and the caution before the cells", () => {
    expect(html.indexOf('id="checks"')).toBeLessThan(html.indexOf("<main>"));
    expect(html).toContain("FAIL: 1 cell error(s), 1 failed check(s)");
    expect(html).toContain(escapeHtml(CAUTION));
  });
  it("renderReport renders markdown and inlines charts as SVG, with no scripts or external links", () => {
    expect(html).toContain("<h1>Booster K-101</h1>");
    expect(html).toContain("<em>conditions</em>");
    expect(html).toContain(svg);
    expect(html).not.toMatch(/<script|src="http|href="http/);
  });
  it("renderReport escapes error text and strips terminal colours", () => {
    expect(html).toContain("LanguageError: bad &lt;thing&gt;");
    expect(html).not.toContain("\x1b[");
  });
});

describe("renderOutput", () => {
  it("renderOutput prefers SVG, then HTML, then PNG, then text", () => {
    expect(renderOutput({ output_type: "display_data", data: { [MIME.text]: "t", [MIME.html]: "<table></table>" }, metadata: {} })).toContain("<table>");
    expect(renderOutput({ output_type: "display_data", data: { [MIME.text]: "t", [MIME.png]: "AAAA" }, metadata: {} })).toContain("data:image/png;base64,AAAA");
    expect(renderOutput({ output_type: "execute_result", data: { [MIME.text]: "1 < 2" }, metadata: {}, execution_count: 1 })).toBe("<pre>1 &lt; 2</pre>");
  });
});

describe("renderReport header", () => {
  const nb: Notebook = { nbformat: 4, nbformat_minor: 5, metadata: {}, cells: [{ cell_type: "markdown", source: "# Case A", metadata: {} }] };
  const info = { title: "Case A", source: "a.ipynb", toolVersion: "0.1.0", executedAt: "now", checks: [], errors: [] };
  it("renderReport does not repeat a title the notebook shows itself", () => {
    const html = renderReport(nb, { ...info, titleInNotebook: true });
    expect(html.match(/<h1>Case A<\/h1>/g)).toHaveLength(1);
    expect(html).toContain("<title>Case A</title>");
  });
  it("renderReport heads the page with the title when the notebook has none", () => {
    const html = renderReport({ ...nb, cells: [] }, info);
    expect(html.match(/<h1>Case A<\/h1>/g)).toHaveLength(1);
  });
});
