/**
 * Design checks: the rows `verify(...)` emits under MIME.check, collected from a cell's outputs so the
 * runner can summarise them and set its exit code. Only the fields the runner needs are read; the
 * rest of the payload is shown as the row's text.
 */
import { MIME } from "../../lib/display/index.js";
import type { Output } from "./notebook.js";

export interface CheckRow {
  label: string;
  pass: boolean;
  /** One-line account, e.g. "Z = 0.872 vs target 0.87 +/- 0.01". */
  detail: string;
  /** The code cell that produced it, counted from 1 (as execution counts [n] are). */
  cell: number;
}

function detailOf(payload: Record<string, unknown>, text: unknown): string {
  // The row's own one-line message repeats the verdict and label before ": "; keep what follows.
  if (typeof payload.message === "string" && payload.message.trim()) {
    const m = payload.message.trim();
    const at = m.indexOf(`${String(payload.label)}: `);
    return at >= 0 ? m.slice(at + String(payload.label).length + 2) : m;
  }
  if (typeof text === "string" && text.trim()) return text.trim().split("\n").join(" ");
  const parts = ["value", "target", "tolerance"].filter((k) => payload[k] !== undefined).map((k) => `${k} ${String(payload[k])}`);
  return parts.join(", ");
}

export function checksIn(outputs: Output[], cell: number): CheckRow[] {
  const rows: CheckRow[] = [];
  for (const out of outputs) {
    if (out.output_type !== "display_data" && out.output_type !== "execute_result") continue;
    const payload = out.data[MIME.check];
    if (payload === undefined) continue;
    const list = Array.isArray(payload) ? payload : [payload];
    for (const item of list) {
      const p = (typeof item === "string" ? JSON.parse(item) : item) as Record<string, unknown>;
      rows.push({
        label: String(p.label ?? "(unnamed check)"),
        pass: p.pass === true,
        detail: detailOf(p, list.length === 1 ? out.data[MIME.text] : undefined),
        cell,
      });
    }
  }
  return rows;
}
