/**
 * The self-contained HTML report of one executed notebook: design-check summary first, then every
 * cell (markdown rendered, code, outputs with charts as inline SVG), the cautions at top and bottom.
 * No scripts and no external resources, so it opens anywhere and can be archived with the design file.
 */
import { marked } from "marked";
import { MIME } from "../../lib/display/index.js";
import type { CheckRow } from "./checks.js";
import { sourceText, type Notebook, type Output } from "./notebook.js";

export interface ReportInfo {
  title: string;
  /** The notebook shows its own title (a markdown heading): the header then does not repeat it. */
  titleInNotebook?: boolean;
  source: string;
  toolVersion: string;
  executedAt: string;
  checks: CheckRow[];
  /** Cell errors, 1-based cell index and message. */
  errors: { cell: number; message: string }[];
}

export const CAUTION =
  "Caloric supports engineering judgement; it does not replace it. Pressure equipment, relief systems and " +
  "flammable or toxic gases are governed by local codes and standards: have every design checked and " +
  "approved by a qualified, licensed engineer. Equations of state are approximations; check the model " +
  "named in each result and the flags on near-critical or extrapolated states.";

export const escapeHtml = (s: string): string =>
  s.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;");

const text = (v: unknown): string => (Array.isArray(v) ? v.join("") : String(v ?? ""));
// Terminal colour codes in tracebacks are noise in HTML.
const stripAnsi = (s: string): string => s.replace(/\x1b\[[0-9;]*m/g, "");

const STYLE = `
:root { --ink:#1d2433; --muted:#5b6475; --rule:#d8dce4; --pass:#1f7a4d; --fail:#b3261e; --accent:#2d5f8b; --code:#f5f6f8; }
@media (prefers-color-scheme: dark) { :root { --ink:#e6e8ec; --muted:#a4abb8; --rule:#3a4150; --pass:#5fc08f; --fail:#f08a80; --accent:#8ab8e6; --code:#1f232b; } body { background:#14171d; } }
body { font: 15px/1.5 system-ui, sans-serif; color: var(--ink); max-width: 62rem; margin: 2rem auto; padding: 0 1.2rem; }
header h1 { margin-bottom: .2rem; } header p { color: var(--muted); margin: .1rem 0; }
.caution { border-left: 4px solid var(--accent); padding: .5rem .9rem; margin: 1rem 0; background: var(--code); }
table { border-collapse: collapse; margin: .5rem 0; } th, td { border-bottom: 1px solid var(--rule); padding: .25rem .6rem; text-align: left; }
td.num { text-align: right; font-variant-numeric: tabular-nums; }
.verdict { font-weight: 700; } .pass { color: var(--pass); } .fail { color: var(--fail); }
.cell { margin: 1.2rem 0; } .cell .count { color: var(--muted); font-size: .8rem; }
pre { background: var(--code); padding: .6rem .8rem; overflow-x: auto; border-radius: 4px; }
pre.error { border-left: 4px solid var(--fail); } pre.stream { border-left: 4px solid var(--rule); }
.output svg { max-width: 100%; height: auto; } .output img { max-width: 100%; }
`;

function checksSection(info: ReportInfo): string {
  const failed = info.checks.filter((c) => !c.pass).length;
  const verdict =
    info.errors.length > 0
      ? `<p class="verdict fail">FAIL: ${info.errors.length} cell error(s)${failed ? `, ${failed} failed check(s)` : ""}</p>`
      : failed > 0
        ? `<p class="verdict fail">FAIL: ${failed} of ${info.checks.length} design check(s) failed</p>`
        : `<p class="verdict pass">PASS: all ${info.checks.length} design check(s) met</p>`;
  const rows = info.checks
    .map((c) => `<tr><td class="verdict ${c.pass ? "pass" : "fail"}">${c.pass ? "PASS" : "FAIL"}</td><td>${escapeHtml(c.label)}</td><td>${escapeHtml(c.detail)}</td><td class="num">[${c.cell}]</td></tr>`)
    .join("\n");
  const errors = info.errors.map((e) => `<li>cell [${e.cell}]: ${escapeHtml(e.message)}</li>`).join("");
  return `<section id="checks"><h2>Design checks</h2>${verdict}
${info.checks.length ? `<table><thead><tr><th>result</th><th>check</th><th>detail</th><th>cell</th></tr></thead><tbody>${rows}</tbody></table>` : "<p>No design checks in this notebook.</p>"}
${errors ? `<ul class="fail">${errors}</ul>` : ""}</section>`;
}

/** The richest representation a static page can show, in order of preference. */
export function renderOutput(out: Output): string {
  switch (out.output_type) {
    case "stream":
      return `<pre class="stream">${escapeHtml(text(out.text))}</pre>`;
    case "error":
      return `<pre class="error">${escapeHtml(stripAnsi(out.traceback.length ? out.traceback.join("\n") : `${out.ename}: ${out.evalue}`))}</pre>`;
    default: {
      const d = out.data;
      if (d[MIME.svg] !== undefined) return `<div class="output">${text(d[MIME.svg])}</div>`;
      if (d[MIME.html] !== undefined) return `<div class="output">${text(d[MIME.html])}</div>`;
      if (d[MIME.png] !== undefined) return `<div class="output"><img alt="chart" src="data:image/png;base64,${text(d[MIME.png]).replace(/\n/g, "")}"></div>`;
      if (d[MIME.markdown] !== undefined) return `<div class="output">${marked.parse(text(d[MIME.markdown]), { async: false })}</div>`;
      return `<pre>${escapeHtml(text(d[MIME.text]))}</pre>`;
    }
  }
}

export function renderReport(nb: Notebook, info: ReportInfo): string {
  const cells = nb.cells
    .map((cell) => {
      if (cell.cell_type !== "code") {
        return cell.cell_type === "markdown" ? `<section class="cell md">${marked.parse(sourceText(cell.source), { async: false })}</section>` : "";
      }
      const count = cell.execution_count ?? " ";
      return `<section class="cell code"><div class="count">[${count}]</div><pre class="source">${escapeHtml(sourceText(cell.source))}</pre>${cell.outputs.map(renderOutput).join("\n")}</section>`;
    })
    .join("\n");
  return `<!DOCTYPE html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>${escapeHtml(info.title)}</title><style>${STYLE}</style></head>
<body><header>${info.titleInNotebook ? "" : `<h1>${escapeHtml(info.title)}</h1>`}
<p>Source: ${escapeHtml(info.source)} · executed ${escapeHtml(info.executedAt)} · Caloric ${escapeHtml(info.toolVersion)}</p></header>
<div class="caution"><strong>Caution.</strong> ${escapeHtml(CAUTION)}</div>
${checksSection(info)}
<main>${cells}</main>
<footer><div class="caution">${escapeHtml(CAUTION)}</div></footer>
</body></html>
`;
}
