/**
 * Number formatting for tables, chart summaries and design checks: significant figures that stay
 * consistent down a column, so a reader compares values digit for digit.
 *
 * A column is written either all in fixed notation (when every magnitude fits between 1e-3 and 1e7,
 * the range engineers read without counting zeros) or all in exponential notation; each value keeps
 * the column's number of significant figures.
 */

/** A table or chart cell as the caller hands it over: numbers already in the display unit. */
export type Cell = number | string | boolean | null | undefined;

export type Notation = "fixed" | "exponential";

/** Default significant figures: 5 resolves a 0.01 % difference, finer than property data warrant. */
export const DEFAULT_SIGFIGS = 5;

const FIXED_MIN = 1e-3;
const FIXED_MAX = 1e7;

export function checkSigfigs(sigfigs: number, where: string): number {
  if (!Number.isInteger(sigfigs) || sigfigs < 1 || sigfigs > 17) {
    throw new RangeError(`${where}: sigfigs must be an integer from 1 to 17, got ${String(sigfigs)}`);
  }
  return sigfigs;
}

/** The notation a whole column uses: fixed unless a nonzero finite value falls outside [1e-3, 1e7). */
export function columnNotation(values: readonly Cell[], sigfigs: number): Notation {
  for (const v of values) {
    if (typeof v !== "number" || !Number.isFinite(v) || v === 0) continue;
    const r = Math.abs(Number(v.toPrecision(sigfigs)));
    if (r < FIXED_MIN || r >= FIXED_MAX) return "exponential";
  }
  return "fixed";
}

/** Non-finite numbers: spelled so a reader (and a spreadsheet) does not mistake them for data. */
function nonFinite(x: number): string {
  return Number.isNaN(x) ? "NaN" : x > 0 ? "inf" : "-inf";
}

/**
 * One number with `sigfigs` significant figures in the given notation. Exponential form is
 * "1.2346e+5" (mantissa with sigfigs digits, exponent without padding), parseable by Number().
 */
export function formatNumber(x: number, sigfigs = DEFAULT_SIGFIGS, notation?: Notation): string {
  if (!Number.isFinite(x)) return nonFinite(x);
  const mode = notation ?? columnNotation([x], sigfigs);
  if (mode === "exponential") {
    const [mantissa, exponent] = x.toExponential(sigfigs - 1).split("e");
    return `${mantissa}e${exponent}`;
  }
  if (x === 0) return "0";
  // Round first, then take the exponent of the rounded value: 9.99996 at 5 figures is 10.000.
  const rounded = Number(x.toPrecision(sigfigs));
  const exponent = Math.floor(Math.log10(Math.abs(rounded)));
  const decimals = Math.min(100, Math.max(0, sigfigs - 1 - exponent));
  return rounded.toFixed(decimals);
}

/** Any cell as text; numbers in the column's notation; empty cells as an em dash. */
export function formatCell(v: Cell, sigfigs: number, notation: Notation): string {
  if (v === null || v === undefined) return "—";
  if (typeof v === "number") return formatNumber(v, sigfigs, notation);
  if (typeof v === "boolean") return v ? "true" : "false";
  return v;
}

/** A short human number for summaries and legends: up to 4 figures, trailing zeros dropped. */
export function shortNumber(x: number, sigfigs = 4): string {
  if (!Number.isFinite(x)) return nonFinite(x);
  if (x === 0) return "0";
  const s = formatNumber(x, sigfigs);
  if (s.includes("e")) {
    const [m, e] = s.split("e");
    return `${trimZeros(m!)}e${e}`;
  }
  return trimZeros(s);
}

function trimZeros(s: string): string {
  return s.includes(".") ? s.replace(/0+$/, "").replace(/\.$/, "") : s;
}

/** HTML rendering of a formatted number: exponent as a superscript power of ten. */
export function htmlNumber(text: string): string {
  const m = /^(-?[\d.]+)e([+-])(\d+)$/.exec(text);
  if (!m) return escapeHtml(text);
  const sign = m[2] === "-" ? "&minus;" : "";
  return `${m[1]}&times;10<sup>${sign}${m[3]}</sup>`;
}

export function escapeHtml(s: string): string {
  return s.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;");
}

/** Display width of a string in code points (good enough for aligned monospace text). */
export function textWidth(s: string): number {
  return [...s].length;
}
