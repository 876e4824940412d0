/**
 * Tables: named columns of numbers (already in the display unit) with a unit label per column,
 * rendered as aligned text/plain, text/html and text/markdown.
 *
 * The HTML carries no colours: borders use a translucent grey that reads on light and dark front
 * ends, numbers are right-aligned with tabular figures so decimal places line up.
 */
import {
  checkSigfigs, columnNotation, DEFAULT_SIGFIGS, escapeHtml, formatCell, htmlNumber, textWidth,
  type Cell, type Notation,
} from "./format.js";
import { MIME, type MimeBundle } from "./mime.js";

export interface TableColumn {
  name: string;
  /** Unit label shown in the header, e.g. "bar" or "kJ/kg"; omit for dimensionless or text. */
  unit?: string;
  values: readonly Cell[];
  /** Significant figures for this column (default: the table's). */
  sigfigs?: number;
}

export interface TableSpec {
  columns: readonly TableColumn[];
  title?: string;
  /** Short notes shown under the table (cautions, reference state). */
  notes?: readonly string[];
  sigfigs?: number;
}

/** A record entry: a bare cell, or a value with its unit label. */
export type RecordEntry = Cell | { value: Cell; unit?: string };
export type TableRecord = Readonly<Record<string, RecordEntry>>;

export interface TableOptions {
  title?: string;
  notes?: readonly string[];
  sigfigs?: number;
  /** Unit labels by column name, for records whose entries are bare numbers. */
  units?: Readonly<Record<string, string>>;
}

function isEntryObject(e: RecordEntry): e is { value: Cell; unit?: string } {
  return typeof e === "object" && e !== null;
}

/** Rows (records) to columns. Columns appear in first-seen key order; a missing key is an empty cell. */
export function tableFromRecords(rows: readonly TableRecord[], options: TableOptions = {}): TableSpec {
  const names: string[] = [];
  const units = new Map<string, string | undefined>(Object.entries(options.units ?? {}));
  rows.forEach((row, i) => {
    for (const [k, e] of Object.entries(row)) {
      if (!names.includes(k)) names.push(k);
      if (isEntryObject(e) && e.unit !== undefined) {
        const seen = units.get(k);
        if (seen !== undefined && seen !== e.unit) {
          throw new TypeError(`table: column '${k}' mixes units: '${seen}' and '${e.unit}' (row ${i + 1}); convert to one unit first`);
        }
        units.set(k, e.unit);
      }
    }
  });
  const columns = names.map((name) => ({
    name,
    unit: units.get(name),
    values: rows.map((row) => {
      const e = row[name];
      return isEntryObject(e as RecordEntry) ? (e as { value: Cell }).value : (e as Cell);
    }),
  }));
  return { columns, title: options.title, notes: options.notes, sigfigs: options.sigfigs };
}

/** One record as a property list: columns "quantity", "value", "unit" (each row has its own unit). */
export function tableFromRecord(record: TableRecord, options: TableOptions = {}): TableSpec {
  const keys = Object.keys(record);
  const entries = keys.map((k) => record[k] as RecordEntry);
  const values = entries.map((e) => (isEntryObject(e) ? e.value : e));
  const unitOf = (k: string, e: RecordEntry) => (isEntryObject(e) ? e.unit : undefined) ?? options.units?.[k] ?? "";
  return {
    columns: [
      { name: "quantity", values: keys },
      { name: "value", values },
      { name: "unit", values: keys.map((k, i) => unitOf(k, entries[i]!)) },
    ],
    title: options.title,
    notes: options.notes,
    sigfigs: options.sigfigs,
  };
}

/** Named columns of equal length. */
export function tableFromColumns(columns: readonly TableColumn[], options: TableOptions = {}): TableSpec {
  return { columns, title: options.title, notes: options.notes, sigfigs: options.sigfigs };
}

interface Laid {
  headers: string[];
  units: (string | undefined)[];
  numeric: boolean[];
  notations: Notation[];
  cells: string[][]; // [row][column], plain text
  sigfigs: number[];
}

function validate(spec: TableSpec): void {
  if (spec.columns.length === 0) throw new RangeError("table: needs at least one column, got none");
  const n = spec.columns[0]!.values.length;
  const seen = new Set<string>();
  for (const c of spec.columns) {
    if (typeof c.name !== "string" || c.name === "") throw new TypeError("table: every column needs a non-empty name");
    if (seen.has(c.name)) throw new TypeError(`table: column name '${c.name}' appears twice`);
    seen.add(c.name);
    if (c.values.length !== n) {
      throw new RangeError(
        `table: columns must have equal length: '${spec.columns[0]!.name}' has ${n} values, '${c.name}' has ${c.values.length}`,
      );
    }
  }
}

function layout(spec: TableSpec): Laid {
  validate(spec);
  const tableSig = checkSigfigs(spec.sigfigs ?? DEFAULT_SIGFIGS, "table");
  const sigfigs = spec.columns.map((c) => checkSigfigs(c.sigfigs ?? tableSig, `table column '${c.name}'`));
  const notations = spec.columns.map((c, j) => columnNotation(c.values, sigfigs[j]!));
  const numeric = spec.columns.map((c) => c.values.some((v) => typeof v === "number"));
  const rows = spec.columns[0]!.values.length;
  const cells: string[][] = [];
  for (let i = 0; i < rows; i++) {
    cells.push(spec.columns.map((c, j) => formatCell(c.values[i], sigfigs[j]!, notations[j]!)));
  }
  return {
    headers: spec.columns.map((c) => c.name),
    units: spec.columns.map((c) => (c.unit === "" ? undefined : c.unit)),
    numeric, notations, cells, sigfigs,
  };
}

const headerText = (name: string, unit: string | undefined) => (unit ? `${name} [${unit}]` : name);

function plainText(spec: TableSpec, t: Laid): string {
  const heads = t.headers.map((h, j) => headerText(h, t.units[j]));
  const widths = heads.map((h, j) => Math.max(textWidth(h), ...t.cells.map((r) => textWidth(r[j]!))));
  const pad = (s: string, j: number) => {
    const fill = " ".repeat(widths[j]! - textWidth(s));
    return t.numeric[j] ? fill + s : s + fill;
  };
  const lines: string[] = [];
  if (spec.title) lines.push(spec.title);
  lines.push(heads.map(pad).join("  ").trimEnd());
  lines.push(widths.map((w) => "-".repeat(w)).join("  "));
  for (const r of t.cells) lines.push(r.map(pad).join("  ").trimEnd());
  for (const note of spec.notes ?? []) lines.push(`Note: ${note}`);
  return lines.join("\n");
}

const mdEscape = (s: string) => s.replace(/\\/g, "\\\\").replace(/\|/g, "\\|").replace(/\n/g, " ");

function markdown(spec: TableSpec, t: Laid): string {
  const lines: string[] = [];
  if (spec.title) lines.push(`**${mdEscape(spec.title)}**`, "");
  lines.push(`| ${t.headers.map((h, j) => mdEscape(headerText(h, t.units[j]))).join(" | ")} |`);
  lines.push(`|${t.numeric.map((n) => (n ? " ---: " : " :--- ")).join("|")}|`);
  for (const r of t.cells) lines.push(`| ${r.map(mdEscape).join(" | ")} |`);
  for (const note of spec.notes ?? []) lines.push("", `*Note: ${mdEscape(note)}*`);
  return lines.join("\n");
}

const RULE = "1px solid rgba(127,127,127,0.45)";

function html(spec: TableSpec, t: Laid): string {
  const align = (j: number) => (t.numeric[j] ? "right" : "left");
  const th = t.headers.map((h, j) => {
    const unit = t.units[j] ? ` <span style="font-weight:normal;opacity:0.75">[${escapeHtml(t.units[j]!)}]</span>` : "";
    return `<th style="text-align:${align(j)};padding:2px 10px;border-bottom:${RULE}">${escapeHtml(h)}${unit}</th>`;
  });
  const body = t.cells.map((r) => {
    const tds = r.map((s, j) => {
      const content = t.numeric[j] ? htmlNumber(s) : escapeHtml(s);
      return `<td style="text-align:${align(j)};padding:1px 10px">${content}</td>`;
    });
    return `<tr>${tds.join("")}</tr>`;
  });
  const caption = spec.title
    ? `<caption style="caption-side:top;text-align:left;font-weight:bold;padding:2px 10px">${escapeHtml(spec.title)}</caption>`
    : "";
  const notes = (spec.notes ?? [])
    .map((n) => `<div style="font-size:90%;opacity:0.8;padding:2px 10px">Note: ${escapeHtml(n)}</div>`)
    .join("");
  return (
    `<div class="caloric-table"><table style="border-collapse:collapse;font-variant-numeric:tabular-nums;border-bottom:${RULE}">` +
    `${caption}<thead><tr>${th.join("")}</tr></thead><tbody>${body.join("")}</tbody></table>${notes}</div>`
  );
}

/** A table as a MIME bundle: text/plain (aligned), text/html, text/markdown. */
export function tableBundle(spec: TableSpec): MimeBundle {
  const t = layout(spec);
  return { [MIME.text]: plainText(spec, t), [MIME.html]: html(spec, t), [MIME.markdown]: markdown(spec, t) };
}
