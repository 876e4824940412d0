/**
 * Design-check rows (the language's verify()): a labelled comparison of a computed value with a
 * target, shown pass/fail in words and symbol (never colour alone), and carried as a custom MIME
 * type (MIME.check) that the headless runner collects.
 */
import { escapeHtml, shortNumber } from "./format.js";
import { MIME, type MimeBundle } from "./mime.js";

/**
 * How value is compared with target:
 * - "within": |value - target| <= tolerance (default)
 * - "atmost": value <= target + tolerance (e.g. a temperature limit)
 * - "atleast": value >= target - tolerance (e.g. a minimum margin)
 */
export type CheckComparison = "within" | "atmost" | "atleast";

export interface CheckInput {
  label: string;
  /** Value, target and tolerance in the same display unit. */
  value: number;
  target: number;
  tolerance: number;
  unit?: string;
  comparison?: CheckComparison;
  /** The caller's verdict; computed from the numbers when omitted. */
  pass?: boolean;
  note?: string;
}

/** The JSON carried under MIME.check: one design check, everything the runner's summary needs. */
export interface CheckRecord {
  label: string;
  pass: boolean;
  value: number;
  target: number;
  tolerance: number;
  unit: string;
  comparison: CheckComparison;
  /** value - target, in unit. */
  deviation: number;
  /** One line stating the result, the same as text/plain. */
  message: string;
  note?: string;
}

const COMPARISONS: readonly CheckComparison[] = ["within", "atmost", "atleast"];

/** Verdict from the numbers. NaN anywhere fails: an unknown value never passes a check. */
export function evaluateCheck(value: number, target: number, tolerance: number, comparison: CheckComparison = "within"): boolean {
  if (comparison === "within") return Math.abs(value - target) <= tolerance;
  if (comparison === "atmost") return value <= target + tolerance;
  return value >= target - tolerance;
}

function validate(c: CheckInput): void {
  if (typeof c.label !== "string" || c.label.trim() === "") throw new TypeError("verify: label must be a non-empty text");
  for (const k of ["value", "target", "tolerance"] as const) {
    if (typeof c[k] !== "number") throw new TypeError(`verify: ${k} must be a number, got ${typeof c[k]}`);
  }
  if (!(c.tolerance >= 0)) throw new RangeError(`verify: tolerance must be zero or positive, got ${c.tolerance}`);
  if (c.comparison !== undefined && !COMPARISONS.includes(c.comparison)) {
    throw new RangeError(`verify: comparison must be one of ${COMPARISONS.join(", ")}, got '${String(c.comparison)}'`);
  }
}

interface Parts { record: CheckRecord; rule: string; dev: string }

/**
 * Tolerances and deviations are differences: in an offset unit (degC, barg ...) they are written in
 * the unit of the same size without the offset, so "+5 K" is never read as 5 degC = 278.15 K.
 */
const DIFFERENCE_UNIT: Readonly<Record<string, string>> = { degC: "K", degF: "deltaF", barg: "bar", psig: "psi", kPag: "kPa", MPag: "MPa" };

function parts(c: CheckInput): Parts {
  validate(c);
  const comparison = c.comparison ?? "within";
  const pass = c.pass ?? evaluateCheck(c.value, c.target, c.tolerance, comparison);
  const unit = c.unit ?? "";
  const u = unit ? ` ${unit}` : "";
  const du = unit ? ` ${DIFFERENCE_UNIT[unit] ?? unit}` : "";
  const deviation = c.value - c.target;
  const rule =
    comparison === "within" ? `target ${shortNumber(c.target)}${u} ± ${shortNumber(c.tolerance)}${du}`
    : comparison === "atmost" ? `limit at most ${shortNumber(c.target)}${u}${c.tolerance ? ` (+${shortNumber(c.tolerance)}${du})` : ""}`
    : `limit at least ${shortNumber(c.target)}${u}${c.tolerance ? ` (-${shortNumber(c.tolerance)}${du})` : ""}`;
  const dev = `${deviation >= 0 ? "+" : ""}${shortNumber(deviation)}${du}`;
  const message = `${pass ? "✔ PASS" : "✘ FAIL"}  ${c.label}: ${shortNumber(c.value)}${u}, ${rule}, deviation ${dev}`;
  const record: CheckRecord = {
    label: c.label, pass, value: c.value, target: c.target, tolerance: c.tolerance, unit, comparison, deviation, message,
    ...(c.note ? { note: c.note } : {}),
  };
  return { record, rule, dev };
}

/** The JSON record of a check (what MIME.check carries). */
export function checkRecord(c: CheckInput): CheckRecord {
  return parts(c).record;
}

/** One design-check row: MIME.check JSON, text/html and text/plain. */
export function checkBundle(c: CheckInput): MimeBundle {
  const { record: r, rule, dev } = parts(c);
  const mark = r.pass ? "#2f8a4c" : "#c0392b"; // accent only; the words PASS/FAIL carry the meaning
  const u = r.unit ? ` ${escapeHtml(r.unit)}` : "";
  const html =
    `<div class="caloric-check" style="border-left:4px solid ${mark};padding:2px 10px;margin:2px 0">` +
    `<strong style="color:${mark}">${r.pass ? "✔ PASS" : "✘ FAIL"}</strong> ` +
    `<strong>${escapeHtml(r.label)}</strong>: ${escapeHtml(shortNumber(r.value))}${u}` +
    ` <span style="opacity:0.8">(${escapeHtml(rule)}; deviation ${escapeHtml(dev)})</span>` +
    (r.note ? `<div style="font-size:90%;opacity:0.8">${escapeHtml(r.note)}</div>` : "") +
    `</div>`;
  const text = r.note ? `${r.message}\n  ${r.note}` : r.message;
  return { [MIME.text]: text, [MIME.html]: html, [MIME.check]: r };
}
