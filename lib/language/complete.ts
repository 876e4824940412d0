/**
 * Completion: variables, built-ins, mathjs functions and units by prefix; after `name.` the fields
 * of that record (or RichValue.fields()); inside a string, substance names or phase words where the
 * built-in's parameter takes them (completeString.ts). Cursor positions are Unicode code points.
 */
import type { CompletionResult } from "./session.js";
import type { SessionInternals } from "./createSession.js";
import { codePointToOffset, offsetToCodePoint } from "./statements.js";
import { isRichValue } from "./values/rich.js";
import { stringCompletions } from "./completeString.js";

const WORD_TAIL = /[A-Za-z_0-9\u00C0-\uFFFF]*$/;

/** Field names of a value reached by a dotted path of plain names (no calls are evaluated). */
function fieldsOf(internals: SessionInternals, path: string[]): string[] {
  let value: unknown = internals.scope.get(path[0]!);
  for (const key of path.slice(1)) {
    if (typeof value !== "object" || value === null || !Object.prototype.hasOwnProperty.call(value, key)) return [];
    value = (value as Record<string, unknown>)[key];
  }
  if (isRichValue(value)) return value.fields?.() ?? [];
  if (typeof value === "object" && value !== null && Object.getPrototypeOf(value) === Object.prototype) return Object.keys(value);
  return [];
}

export function completeAt(internals: SessionInternals, code: string, cursorPos: number): CompletionResult {
  const end = codePointToOffset(code, cursorPos);
  const before = code.slice(0, end);
  const prefix = WORD_TAIL.exec(before)![0];
  const startOffset = end - prefix.length;
  const result = (matches: string[]): CompletionResult => ({
    matches,
    cursorStart: offsetToCodePoint(code, startOffset),
    cursorEnd: cursorPos,
  });
  const inString = stringCompletions(code, end, internals.registry);
  if (inString) return { matches: inString.matches, cursorStart: offsetToCodePoint(code, inString.start), cursorEnd: cursorPos };
  const dotted = /([A-Za-z_][A-Za-z_0-9]*(?:\.[A-Za-z_][A-Za-z_0-9]*)*)\.$/.exec(before.slice(0, startOffset));
  if (dotted && !/[0-9]$/.test(before.slice(0, startOffset - 1))) {
    return result(fieldsOf(internals, dotted[1]!.split(".")).filter((f) => f.startsWith(prefix)));
  }
  if (!prefix || /^[0-9]/.test(prefix)) return result([]);
  // After a number (`300 k|`) units come first; otherwise names in scope, then built-ins, then the rest.
  const afterNumber = /[0-9.]\s*$/.test(before.slice(0, startOffset));
  const groups = afterNumber
    ? [internals.unitNames()]
    : [[...internals.scope.keys()], [...internals.registry.keys()], internals.knownNames()];
  const seen = new Set<string>();
  const matches: string[] = [];
  for (const group of groups) {
    for (const name of [...group].sort()) {
      if (name.startsWith(prefix) && !seen.has(name)) {
        seen.add(name);
        matches.push(name);
      }
    }
  }
  return result(matches);
}
