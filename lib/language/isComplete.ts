/**
 * is_complete: open brackets, an open string or a trailing operator mean the user is still typing
 * ("incomplete"); a closer without its opener, or a statement the parser rejects, is "invalid". A help
 * query (`?name`, `name?`) is complete.
 */
import type { MathNode } from "mathjs";
import type { IsCompleteResult } from "./session.js";
import { scanCell } from "./statements.js";
import { helpTarget } from "./helpQuery.js";

/** A line ending in one of these continues on the next line. */
const TRAILING_OPERATOR = /(?:[+\-*/^=,<>&|]|\bto|\bin|\band|\bor|\bxor|\bnot)\s*$/;

export function isCompleteCell(code: string, parse: (text: string) => MathNode): IsCompleteResult {
  if (helpTarget(code) !== undefined) return { status: "complete" };
  const scan = scanCell(code);
  if (scan.unbalancedAt !== undefined) return { status: "invalid" };
  if (scan.open.length > 0) return { status: "incomplete", indent: "  ".repeat(Math.min(scan.open.length, 4)) };
  if (scan.openString) return { status: "incomplete", indent: "" };
  const lastLine = code.replace(/\s+$/, "").split("\n").pop()!.replace(/#.*$/, "");
  if (TRAILING_OPERATOR.test(lastLine) && !/;\s*$/.test(lastLine)) return { status: "incomplete", indent: "  " };
  for (const st of scan.statements) {
    try {
      parse(st.text);
    } catch {
      return { status: "invalid" };
    }
  }
  return { status: "complete" };
}
