/**
 * Help by query: a cell that is only `?name` (or `name?`) shows the help for name in the pager
 * (payload source "page"), as front ends expect; an unknown name gets a note on stderr. It reuses the
 * language's inspect, so help text lives in one place.
 */
import type { Interpreter, MimeBundle } from "../engine/index.js";

export type HelpOutcome = { kind: "page"; bundle: MimeBundle } | { kind: "missing"; name: string };

const QUERY = /^\s*(?:\?\s*([^\s?]+)|([^\s?]+)\s*\?)\s*$/u;

/** The queried name, or undefined if the cell is not a help query. */
export function helpTarget(code: string): string | undefined {
  const m = QUERY.exec(code);
  return m ? (m[1] ?? m[2]) : undefined;
}

export async function answerHelp(engine: Interpreter, name: string): Promise<HelpOutcome> {
  const r = await engine.inspect(name, [...name].length, 1);
  return r.found && r.bundle ? { kind: "page", bundle: r.bundle } : { kind: "missing", name };
}
