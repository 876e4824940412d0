/**
 * Text of a plain number exactly as mathjs's format(x, {precision, lowerExp, upperExp}) writes it
 * ("auto" notation), without its generic machinery: mathjs splits the number's shortest decimal
 * text into digit arrays and goes through typed dispatch, about 10 us per number, which made
 * displaying a dimensionless result cost more than computing it. Same algorithm, on strings:
 *
 * 1. digits and exponent of the shortest round-trip text (String(x)), leading/trailing zeros off;
 * 2. round half up on those DECIMAL digits to `precision` significant digits (so 1.2345665 shows
 *    as 1.23457, as mathjs does, not as the binary value's toPrecision would round it);
 * 3. exponent e of the rounded value below lowerExp or at/above upperExp: "d.ddde+E" / "d.ddde-E",
 *    else fixed notation; trailing zeros after the decimal point removed in both.
 *
 * numberText.test.ts holds it equal to mathjs on a large random sample and on rounding edges.
 */

/** mathjs-identical "auto" text of a finite non-zero number; undefined for 0, NaN, +-Infinity. */
export function autoNumberText(x: number, precision: number, lowerExp: number, upperExp: number): string | undefined {
  if (x === 0 || !Number.isFinite(x)) return undefined;
  const str = String(x);
  const sign = str.charCodeAt(0) === 45 ? "-" : "";
  const body = sign ? str.slice(1) : str;
  const ePos = body.indexOf("e");
  const mant = ePos < 0 ? body : body.slice(0, ePos);
  let exponent = ePos < 0 ? 0 : Number(body.slice(ePos + 1));
  const dot = mant.indexOf(".");
  exponent += dot !== -1 ? dot - 1 : mant.length - 1;
  let digits = dot === -1 ? mant : mant.slice(0, dot) + mant.slice(dot + 1);
  let lead = 0;
  while (lead < digits.length && digits.charCodeAt(lead) === 48) lead++;
  exponent -= lead;
  digits = digits.slice(lead);

  if (digits.length > precision) {
    const up = digits.charCodeAt(precision) >= 53; // first removed digit >= "5": half up
    const kept = digits.slice(0, precision).split("").map(Number);
    if (up) {
      let i = precision - 1;
      kept[i]!++;
      while (i > 0 && kept[i] === 10) {
        kept[i] = 0;
        i--;
        kept[i]!++;
      }
      if (kept[0] === 10) { // 9.99999|5 -> 10.0000: one more digit in front
        kept[0] = 0;
        kept.unshift(1);
        exponent++;
      }
    }
    digits = kept.join("");
  }
  let end = digits.length;
  while (end > 1 && digits.charCodeAt(end - 1) === 48) end--;
  digits = digits.slice(0, end);

  if (exponent < lowerExp || exponent >= upperExp) {
    const rest = digits.slice(1);
    return `${sign}${digits[0]}${rest ? "." + rest : ""}e${exponent >= 0 ? "+" : ""}${exponent}`;
  }
  if (exponent < 0) return `${sign}0.${"0".repeat(-exponent - 1)}${digits}`;
  const int = digits.length > exponent + 1 ? digits.slice(0, exponent + 1) : digits + "0".repeat(exponent + 1 - digits.length);
  const frac = digits.slice(exponent + 1);
  return `${sign}${int}${frac ? "." + frac : ""}`;
}
