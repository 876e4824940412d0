/**
 * Display of language values as MIME bundles: quantities with 6 significant figures in the user's
 * unit, records as two-column tables (aligned text + HTML), arrays and columns compactly, functions
 * by their signature, opaque values through RichValue. Big tables and charts belong to lib/display.
 */
import type { MathJsInstance, Unit } from "mathjs";
import { MIME, type MimeBundle } from "../display/index.js";
import { isRichValue } from "./values/rich.js";
import { isQuantityColumn } from "./values/column.js";
import type { UnitsBridge } from "./unitsBridge.js";
import { autoNumberText } from "./numberText.js";

const PRECISION = 6;
/** Arrays longer than this print their head and tail only. */
const MAX_ITEMS = 12;

export interface Formatter {
  text(value: unknown): string;
  bundle(value: unknown): MimeBundle;
}

const escapeHtml = (s: string) => s.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;");

export function createFormatter(math: MathJsInstance, units: UnitsBridge): Formatter {
  // Same text as math.format with these options (numberText.ts), without its per-call cost.
  const num = (x: number) => autoNumberText(x, PRECISION, -4, 9) ?? math.format(x, { precision: PRECISION, lowerExp: -4, upperExp: 9 });

  const isRecord = (v: unknown): v is Record<string, unknown> =>
    typeof v === "object" && v !== null && Object.getPrototypeOf(v) === Object.prototype && !isRichValue(v);

  const elide = <T>(items: T[], show: (t: T) => string): string => {
    const parts = items.length > MAX_ITEMS
      ? [...items.slice(0, 6).map(show), "...", ...items.slice(-3).map(show)]
      : items.map(show);
    return `[${parts.join(", ")}]`;
  };

  /** Arrays of quantities sharing one unit print once: [1, 2, 3] K (3 values). */
  const textArray = (raw: unknown[]): string => {
    const count = raw.length > MAX_ITEMS ? ` (${raw.length} values)` : "";
    // Results of arithmetic in a messy compound unit show in their dimension's unit, as scalars do.
    const items = raw.map((u) => (math.isUnit(u) ? units.displayForm(u) : u));
    if (items.length > 0 && items.every((u) => math.isUnit(u))) {
      const unitsOf = (items as Unit[]).map((u) => u.formatUnits());
      if (unitsOf.every((s) => s === unitsOf[0])) {
        const unit = unitsOf[0]!;
        return `${elide(items as Unit[], (u) => num(u.toNumber(unit)))} ${unit}${count}`;
      }
    }
    return elide(items, text) + count;
  };

  const text = (value: unknown): string => {
    if (value === undefined) return "";
    if (value === null) return "null";
    if (typeof value === "number") return num(value);
    if (typeof value === "string") return value;
    if (typeof value === "boolean") return String(value);
    if (typeof value === "function") {
      const f = value as { syntax?: string; name?: string };
      return f.syntax ?? `${f.name || "function"}(...)`;
    }
    if (math.isUnit(value)) return units.formatQuantity(value);
    if (isRichValue(value)) return value.toText();
    if (isQuantityColumn(value)) {
      const si = value.si;
      const count = si.length > MAX_ITEMS ? ` (${si.length} values)` : "";
      if (!value.unit) return elide(Array.from(si), num) + count;
      return textArray(value.toArray() as unknown[]).replace(/ \(\d+ values\)$/, "") + count;
    }
    if (math.isMatrix(value)) return textMatrix(value.toArray() as unknown[]);
    if (Array.isArray(value)) return textMatrix(value);
    if (isRecord(value)) return `{${Object.entries(value).map(([k, v]) => `${k}: ${text(v)}`).join(", ")}}`;
    return math.format(value, { precision: PRECISION });
  };

  const textMatrix = (items: unknown[]): string =>
    items.some((x) => Array.isArray(x)) ? `[${items.map((row) => (Array.isArray(row) ? textArray(row) : text(row))).join(",\n ")}]` : textArray(items);

  const recordBundle = (rec: Record<string, unknown>): MimeBundle => {
    const rows = Object.entries(rec).map(([k, v]) => [k, text(v)] as const);
    const width = Math.max(0, ...rows.map(([k]) => Array.from(k).length));
    const plain = rows.map(([k, v]) => `${k.padEnd(width)}  ${v.replace(/\n/g, "\n" + " ".repeat(width + 2))}`).join("\n");
    const html = `<table class="caloric-record"><tbody>${rows
      .map(([k, v]) => `<tr><th style="text-align:left">${escapeHtml(k)}</th><td style="text-align:left">${escapeHtml(v)}</td></tr>`)
      .join("")}</tbody></table>`;
    return { [MIME.text]: plain, [MIME.html]: html };
  };

  /**
   * LaTeX from the quantity's text ("0.0093924 (bar L mol) / J"): the number and unit exactly as
   * text/plain shows them (units cancelled once, formatted once).
   */
  const latexOfText = (shown: string): string | undefined => {
    const cut = shown.indexOf(" ");
    if (cut < 0) return undefined;
    const n = shown.slice(0, cut);
    const tex = shown.slice(cut + 1).replace(/\^(-?[\d.]+)/g, "^{$1}").replace(/ /g, "\\,");
    return `$${n.replace(/e([+-]?\d+)$/, (_, e: string) => `\\times 10^{${Number(e)}}`)}\\ \\mathrm{${tex}}$`;
  };

  const bundle = (value: unknown): MimeBundle => {
    if (isRichValue(value)) return value.toBundle();
    if (isRecord(value)) return recordBundle(value);
    const shown = text(value);
    const b: MimeBundle = { [MIME.text]: shown };
    if (math.isUnit(value) && value.value !== null) {
      const tex = latexOfText(shown);
      if (tex) b[MIME.latex] = tex;
    }
    return b;
  };

  return { text, bundle };
}
