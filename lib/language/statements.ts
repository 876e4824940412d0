/**
 * Splits a cell into statements with their source offsets, so errors can name line and column.
 * Separators are newlines and `;` at bracket depth 0, outside strings and # comments; `;` hides the
 * statement's value. mathjs itself allows newlines inside brackets, so a bracketed expression can
 * span lines.
 */

export interface Statement {
  /** Source text of the statement (comments included; mathjs skips them). */
  text: string;
  /** Offset of text in the cell (UTF-16 units). */
  start: number;
  /** Ended by `;`: evaluate but do not show. */
  hidden: boolean;
}

export interface ScanResult {
  statements: Statement[];
  /** Deepest bracket nesting seen. */
  maxDepth: number;
  /** Offset of the first closer without an opener, if any. */
  unbalancedAt?: number;
  /** Brackets still open at the end, innermost last, with their offsets. */
  open: { char: string; at: number }[];
  /** The cell ends inside a string. */
  openString: boolean;
}

const PAIRS: Record<string, string> = { ")": "(", "]": "[", "}": "{" };

export function scanCell(code: string): ScanResult {
  const statements: Statement[] = [];
  const open: { char: string; at: number }[] = [];
  let maxDepth = 0;
  let unbalancedAt: number | undefined;
  let start = 0;
  let quote: string | null = null;
  const push = (end: number, hidden: boolean) => {
    const text = code.slice(start, end);
    if (text.replace(/#.*$/gm, "").trim() !== "") statements.push({ text, start, hidden });
    start = end + 1;
  };
  for (let i = 0; i < code.length; i++) {
    const ch = code[i]!;
    if (quote) {
      if (ch === "\\") i++;
      else if (ch === quote) quote = null;
      else if (ch === "\n") quote = null; // a string never spans lines; mathjs will report it
      continue;
    }
    if (ch === '"' || ch === "'") quote = ch;
    else if (ch === "#") {
      while (i + 1 < code.length && code[i + 1] !== "\n") i++;
    } else if (ch === "(" || ch === "[" || ch === "{") {
      open.push({ char: ch, at: i });
      maxDepth = Math.max(maxDepth, open.length);
    } else if (ch === ")" || ch === "]" || ch === "}") {
      if (open.length === 0 || open[open.length - 1]!.char !== PAIRS[ch]) unbalancedAt ??= i;
      else open.pop();
    } else if (open.length === 0 && (ch === "\n" || ch === ";")) {
      push(i, ch === ";");
    }
  }
  push(code.length, false);
  return { statements, maxDepth, unbalancedAt, open, openString: quote !== null };
}

/** 1-based line and column (in code points) of a UTF-16 offset. */
export function positionOf(code: string, offset: number): { line: number; column: number; lineText: string } {
  const before = code.slice(0, offset);
  const lineStart = before.lastIndexOf("\n") + 1;
  const lineEnd = code.indexOf("\n", lineStart);
  return {
    line: before.split("\n").length,
    column: Array.from(code.slice(lineStart, offset)).length + 1,
    lineText: code.slice(lineStart, lineEnd < 0 ? code.length : lineEnd),
  };
}

/** Converts a cursor position in code points to a UTF-16 offset, and back. */
export function codePointToOffset(code: string, cursor: number): number {
  let offset = 0;
  let n = 0;
  for (const ch of code) {
    if (n >= cursor) break;
    offset += ch.length;
    n++;
  }
  return offset;
}

export function offsetToCodePoint(code: string, offset: number): number {
  return Array.from(code.slice(0, offset)).length;
}
