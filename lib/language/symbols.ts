/**
 * Symbols people paste or type from keyboards and datasheets, rewritten before parsing: `25 °C`,
 * `25 ℃`, `77 °F`, `5 × 3`, `10 ÷ 2`, `J/(mol·K)`, `m³`, `µm`, the minus sign `−`. mathjs reads `°`
 * as a syntax error and `×`, `÷`, `℃` as letters of a name, so these failed as unknown names.
 *
 * Outside strings and # comments only. The rewrite keeps a map from every character of the new
 * text to the one it came from, so errors still point at the user's own line and column.
 */
import { LanguageError } from "./errors.js";
import { positionOf } from "./statements.js";

/** Longest first where one symbol starts another (°C before °). */
const REWRITES: readonly (readonly [string, string])[] = [
  ["°C", "degC"], ["°F", "degF"], ["°R", "degR"], ["°K", "K"], ["℃", "degC"], ["℉", "degF"], ["°", "deg"],
  ["×", "*"], ["÷", "/"], ["·", "*"], ["⋅", "*"], ["−", "-"],
  ["²", "^2"], ["³", "^3"], ["µ", "u"],
];

const FIRST_CHARS = new Set(REWRITES.map(([from]) => from[0]!));

export interface Normalized {
  /** The text to parse. */
  code: string;
  /** True when anything was rewritten. */
  changed: boolean;
  /** Offset in the original code (UTF-16 units) of an offset in the rewritten code. */
  original(offset: number): number;
}

export function normalizeSymbols(code: string): Normalized {
  let hit = false;
  for (const ch of code) if (FIRST_CHARS.has(ch)) { hit = true; break; }
  if (!hit) return { code, changed: false, original: (o) => o };
  let out = "";
  const map: number[] = [];
  let quote: string | null = null;
  let comment = false;
  for (let i = 0; i < code.length; ) {
    const ch = code[i]!;
    if (comment || quote) {
      if (ch === "\n") comment = false, quote = null;
      else if (quote && ch === "\\" && i + 1 < code.length) {
        out += ch + code[i + 1];
        map.push(i, i + 1);
        i += 2;
        continue;
      } else if (ch === quote) quote = null;
    } else if (ch === '"' || ch === "'") quote = ch;
    else if (ch === "#") comment = true;
    else if (FIRST_CHARS.has(ch)) {
      const rule = REWRITES.find(([from]) => code.startsWith(from, i));
      if (rule) {
        const [from, to] = rule;
        // A unit symbol glued to the number before it (25°C) reads as 25 degC.
        for (let k = 0; k < to.length; k++) map.push(i);
        out += to;
        i += from.length;
        continue;
      }
    }
    out += ch;
    map.push(i);
    i++;
  }
  map.push(code.length);
  return { code: out, changed: true, original: (o) => map[Math.max(0, Math.min(o, map.length - 1))]! };
}

/** UTF-16 offset of a 1-based line and code-point column in text. */
export function offsetOf(text: string, line: number, column: number): number {
  let start = 0;
  for (let l = 1; l < line; l++) {
    const nl = text.indexOf("\n", start);
    if (nl < 0) break;
    start = nl + 1;
  }
  let offset = start;
  for (let c = 1; c < column && offset < text.length; c++) offset += text.codePointAt(offset)! > 0xffff ? 2 : 1;
  return offset;
}

/** The same error placed on the user's original text (line, column, source line and caret width). */
export function placeOnOriginal(err: LanguageError, norm: Normalized, original: string): LanguageError {
  if (!norm.changed) return err;
  const start = offsetOf(norm.code, err.line, err.column);
  const end = Math.max(start + 1, offsetOf(norm.code, err.line, err.column + Math.max(1, err.caretWidth)));
  const from = norm.original(start);
  const to = Math.max(from + 1, norm.original(end - 1) + 1);
  const pos = positionOf(original, from);
  const width = Array.from(original.slice(from, Math.min(to, original.indexOf("\n", from) < 0 ? original.length : original.indexOf("\n", from)))).length;
  return new LanguageError(err.message, pos.line, pos.column, pos.lineText, Math.max(1, width), err.kind);
}
