/**
 * LanguageError: what went wrong, in the user's terms, and where (line, column, caret under the
 * source). translateError turns mathjs and JavaScript errors into these.
 */
import type { CellError } from "./session.js";
import { positionOf } from "./statements.js";
import { suggestNames } from "./suggest.js";
import { arityMessage, wrongTypeMessage } from "./typeErrors.js";

export class LanguageError extends Error {
  override name = "LanguageError";
  constructor(
    message: string,
    /** 1-based line and column (code points) in the cell. */
    readonly line: number,
    readonly column: number,
    /** The source line and a caret line under the offending part. */
    readonly sourceLine: string,
    readonly caretWidth = 1,
    readonly kind = "Error",
  ) {
    super(message);
  }

  toCellError(): CellError {
    const caret = " ".repeat(Math.max(0, this.column - 1)) + "^".repeat(Math.max(1, this.caretWidth));
    return {
      ename: this.kind,
      evalue: `${this.message} (line ${this.line}, column ${this.column})`,
      traceback: [`${this.kind}: ${this.message}`, `  line ${this.line}, column ${this.column}:`, `    ${this.sourceLine}`, `    ${caret}`],
    };
  }
}

/** Names an error can suggest from, gathered lazily. */
export type NameSource = () => Iterable<string>;

interface Located { message: string; kind: string; offset?: number; width?: number }


/** Offset of identifier `name` in text as a whole word (not inside a string), or -1. */
function findWord(text: string, name: string): number {
  const escaped = name.replace(/[.*+?^${}()|[\]\\]/g, "\\$&");
  const m = new RegExp(`(^|[^A-Za-z0-9_."'])(${escaped})(?![A-Za-z0-9_])`).exec(text);
  return m ? m.index + m[1]!.length : -1;
}

/** mathjs rethrows an error from a callback (map, filter, forEach) as a TypeError carrying only the text. */
const CALLBACK_ERROR = /^Function (\w+) cannot apply callback arguments to function ([^:]+): ([\s\S]*)$/;

function explain(err: unknown, text: string, names: NameSource): Located {
  const e = err as { name?: string; message?: string; char?: number; code?: string };
  const message = String(e?.message ?? err);
  const wrapped = CALLBACK_ERROR.exec(message);
  if (wrapped) {
    const inner = wrapped[3]!;
    // The interrupt thrown inside a user function must still read as an interrupt.
    if (/^interrupted by the user/.test(inner)) return { kind: "Interrupted", message: inner };
    const found = explain({ message: inner }, text, names);
    return { ...found, message: `${found.message} (in ${wrapped[2]!.trim()} called by ${wrapped[1]}())` };
  }
  if (e?.name === "SyntaxError" && typeof e.char === "number") {
    const clean = message.replace(/\s*\(char \d+\)$/, "");
    return { kind: "SyntaxError", message: clean.charAt(0).toLowerCase() + clean.slice(1), offset: Math.max(0, e.char - 1) };
  }
  let m = /^Undefined (symbol|function) (\S+)/.exec(message);
  if (m) {
    const name = m[2]!;
    const hints = suggestNames(name, names());
    const hint = hints.length ? `; did you mean ${hints.map((h) => `"${h}"`).join(" or ")}?` : "";
    const what = m[1] === "function" ? "function" : "name";
    return { kind: "NameError", message: `unknown ${what} "${name}"${hint}`, offset: findWord(text, name), width: Array.from(name).length };
  }
  if (e?.name === "FieldError" && typeof (e as { field?: unknown }).field === "string") {
    const field = (e as { field: string }).field;
    const dot = new RegExp(`\\.\\s*${field.replace(/[.*+?^${}()|[\]\\]/g, "\\$&")}(?![A-Za-z0-9_])`).exec(text);
    const at = dot ? dot.index + dot[0].length - field.length : text.indexOf(field);
    return { kind: "FieldError", message, offset: at, width: Array.from(field).length };
  }
  if (e?.name === "RangeError" && /call stack/i.test(message)) {
    return { kind: "RecursionError", message: "too deeply nested, or a function that calls itself without end" };
  }
  m = /^Unexpected type of argument in function (\w+) \(expected: ([^,]+), actual: ([^,]+), index: (\d+)\)/.exec(message);
  if (m) {
    return { kind: "TypeError", message: wrongTypeMessage(m[1]!, m[2]!, m[3]!, Number(m[4])), offset: findWord(text, m[1]!) };
  }
  const arity = arityMessage(message, text);
  if (arity !== undefined) {
    const fn = /function (\S+)/.exec(message)![1]!;
    return { kind: "TypeError", message: arity, offset: findWord(text, fn), width: Array.from(fn).length };
  }
  m = /^(?:No access to (?:property|method)|Cannot access method) "([^"]+)"/.exec(message);
  if (m) {
    const at = text.indexOf(m[1]!);
    return { kind: "SecurityError", message: `access to "${m[1]}" is not allowed in cells`, offset: at, width: Array.from(m[1]!).length };
  }
  if (/^Units do not match/.test(message)) {
    return { kind: "UnitsError", message: "units do not match: both sides of + or - (or a comparison, or a conversion) must have the same dimension" };
  }
  if (/^range \S+ has \S+ elements/.test(message)) {
    // The size guard on `a:b`: point at the colon of the range (or at range( when called by name).
    const call = findWord(text, "range");
    const colon = text.replace(/"[^"]*"|'[^']*'/g, (q) => " ".repeat(q.length)).indexOf(":");
    const at = call >= 0 ? call : colon;
    return { kind: e?.name === "ArgumentError" ? "ArgumentError" : "Error", message, offset: at, width: call >= 0 ? 5 : 1 };
  }
  m = /^(?:argument \S+ of |)(\w+)\(\)/.exec(message) ?? /of (\w+)\(\)/.exec(message);
  const kind = e?.name === "UnitsError" ? ((e as { code?: string }).code === "not_a_quantity" ? "TypeError" : "UnitsError") : e?.name === "ArgumentError" ? "ArgumentError" : e?.name === "Interrupted" ? "Interrupted" : "Error";
  return { kind, message, offset: m ? findWord(text, m[1]!) : undefined, width: m ? Array.from(m[1]!).length : undefined };
}

/** A LanguageError for `err` raised while running the statement starting at `start` of `code`. */
export function translateError(err: unknown, code: string, start: number, text: string, names: NameSource): LanguageError {
  if (err instanceof LanguageError) return err;
  const found = explain(err, text, names);
  const lead = text.length - text.trimStart().length;
  const rel = found.offset !== undefined && found.offset >= 0 ? found.offset : lead;
  const pos = positionOf(code, start + Math.min(rel, text.length));
  const width = found.width ?? (found.offset !== undefined && found.offset >= 0 ? 1 : Math.max(1, Array.from(text.trim().split("\n")[0] ?? "").length));
  return new LanguageError(found.message, pos.line, pos.column, pos.lineText, width, found.kind);
}

