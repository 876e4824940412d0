/**
 * One cell-language session for the built-in tests, with the small readers they all use:
 *   value(code)      the language value of one expression (throws the cell's error text)
 *   num(code, unit)  that value, a quantity, as a number in `unit`
 *   text(code)       the text/plain result of a cell (throws the cell's error text)
 *   errorOf(code)    the error text of a cell, "" when it ran
 * Every call runs in the same session, so names assigned by one are seen by the next.
 */
import type { Unit } from "mathjs";
import type { CellSink } from "../../lib/language/index.js";
import { createSessionWithInternals } from "../../lib/language/createSession.js";

/** A sink that drops every output. */
export const quietSink = (): CellSink => ({ stdout() {}, display() {}, clear() {} });

/** |a/b - 1|: the relative difference the thermo tests compare against. */
export const rel = (a: number, b: number): number => Math.abs(a / b - 1);

export function languageSession(sink: CellSink = quietSink()) {
  const { session, internals } = createSessionWithInternals({ shouldStop: () => false });
  const value = (code: string): unknown => {
    const r = session.run(`__v = ${code};`, sink);
    if (!r.ok) throw new Error(r.error.evalue);
    return internals.scope.get("__v");
  };
  const num = (code: string, unit: string): number => (value(code) as Unit).toNumber(unit);
  const text = (code: string): string => {
    const r = session.run(code, sink);
    if (!r.ok) throw new Error(r.error.evalue);
    return String(r.result?.["text/plain"] ?? "");
  };
  const errorOf = (code: string): string => {
    const r = session.run(code, sink);
    return r.ok ? "" : r.error.evalue;
  };
  return { session, internals, sink, value, num, text, errorOf };
}
