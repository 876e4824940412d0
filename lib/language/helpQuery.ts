/**
 * Help by query: a cell that is only `?name` or `name?` asks for the help of name (the same text as
 * inspect, at full detail). Handled here, in the language, so every way of running a cell (kernel,
 * in-process engine, runner) answers it alike; the kernel may move the bundle to its pager because
 * the run result says it is help. An unknown name gets a note with close matches instead (also a
 * result, marked as a note: a kernel writes it on stderr).
 */
import type { InspectResult } from "./session.js";
import { suggestNames } from "./suggest.js";

const QUERY = /^\s*(?:\?\s*([^\s?]+)|([^\s?]+)\s*\?)\s*$/u;

/** The queried name, or undefined if the cell is not a help query. */
export function helpTarget(code: string): string | undefined {
  const m = QUERY.exec(code);
  return m ? (m[1] ?? m[2]) : undefined;
}

export type HelpAnswer = { found: true; bundle: NonNullable<InspectResult["bundle"]> } | { found: false; note: string };

/**
 * The help for `name`: `inspect` is the session's inspect (one source of help text), `known` lists
 * the names a suggestion may come from.
 */
export function answerHelp(name: string, inspect: (code: string, cursorPos: number, detail: 0 | 1) => InspectResult, known: () => Iterable<string>): HelpAnswer {
  const r = inspect(name, [...name].length, 1);
  if (r.found && r.bundle) return { found: true, bundle: r.bundle };
  const close = suggestNames(name, known());
  const hint = close.length ? `; did you mean ${close.map((c) => `?${c}`).join(" or ")}?` : "";
  return { found: false, note: `No help for '${name}': not a known name${hint}` };
}
