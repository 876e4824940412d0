/**
 * The offset-unit policy on single values (DESIGN.md section 4). mathjs 15 stores an offset quantity
 * such as `25 degC` with value 25 (the unit's scale, WITHOUT the offset) and applies the offset only in
 * `to`/`toSI`; its arithmetic therefore silently drops offsets (`R * 25 degC` uses 25 K) and treats
 * `25 degC + 10 degC` as 35 degC. These rules replace that behaviour:
 *
 * - An offset quantity is a valued Unit made of ONE offset unit to the power 1 (`25 degC`, `5 barg`).
 *   Offset units inside compound units (`J/(g degC)`) are differences and are left alone, as mathjs does.
 * - absolute - absolute = a difference (degC -> K, degF -> deltaF, barg -> bar, psig -> psi, ...).
 * - absolute +/- difference = absolute in the same unit; absolute + absolute = error.
 * - In a product or quotient the offset quantity's dimension must cancel (temperature: the temperature
 *   exponent of the result is 0; gauge pressure: the mass exponent is 0, so `P1/P2`, `R*T/P`, `P/rho`
 *   use absolute pressure while `P*A`, `P*V`, `2*P` are errors); then the absolute value is used.
 *   Otherwise the expression is ambiguous and the error says how to write it.
 * - Powers other than 1 of an offset quantity are errors; comparisons use absolute values.
 */
import type { MathJsInstance, Unit } from "mathjs";
import { UnitsError } from "./errors.js";

/** Absolute (offset-free) unit used when an offset quantity's absolute value is needed. */
const ABSOLUTE_UNIT: Record<string, string> = { degC: "K", degF: "degR", barg: "bara", psig: "psia", kPag: "kPa", MPag: "MPa" };
/** Unit of the difference of two offset quantities, by the left operand's unit. */
const DIFFERENCE_UNIT: Record<string, string> = { degC: "K", degF: "deltaF", barg: "bar", psig: "psi", kPag: "kPa", MPag: "MPa" };
/** How to write a change of the same size, for error messages. */
const CHANGE_UNIT: Record<string, string> = { degC: "K (or deltaC)", degF: "deltaF", barg: "bar", psig: "psi", kPag: "kPa", MPag: "MPa" };

type Kind = "temperature" | "pressure";

export function isUnitValue(x: unknown): x is Unit {
  return typeof x === "object" && x !== null && (x as { type?: string }).type === "Unit" && (x as { isUnit?: boolean }).isUnit === true;
}

/** A valued single offset unit to the first power: an absolute temperature or a gauge pressure. */
export function isOffsetQuantity(x: unknown): x is Unit {
  if (!isUnitValue(x) || x.value === null || x.units.length !== 1) return false;
  const c = x.units[0]!;
  return c.unit.offset !== 0 && Math.abs(c.power - 1) < 1e-15;
}

/** Offset units are temperatures or gauge pressures; a temperature has exponent 1 on TEMPERATURE
 * (index 4 of mathjs's base dimensions). Read from the exponents: no unit is built or parsed. */
function kindOf(u: Unit, _math?: MathJsInstance): Kind {
  const d = u.dimensions;
  return d[4] === 1 && d.every((x, i) => i === 4 || x === 0) ? "temperature" : "pressure";
}

function unitName(u: Unit): string {
  return u.units[0]!.unit.name;
}

export function describe(u: Unit): string {
  return u.format({ precision: 6 });
}

/** The absolute value of an offset quantity in an offset-free unit (25 degC -> 298.15 K). */
export function absoluteOf(math: MathJsInstance, u: Unit): Unit {
  const target = ABSOLUTE_UNIT[unitName(u)];
  return target !== undefined ? u.to(target) : u.toSI();
}

/** Dimension index whose exponent must cancel for the absolute value to be unambiguous. */
function markerIndex(math: MathJsInstance, kind: Kind): number {
  return math.Unit.BASE_DIMENSIONS.indexOf(kind === "temperature" ? "TEMPERATURE" : "MASS");
}

function howToWrite(u: Unit, math: MathJsInstance): string {
  const name = unitName(u);
  const abs = ABSOLUTE_UNIT[name] ?? "SI";
  const magnitude = math.format(u.toNumber(name), { precision: 6 });
  const change = CHANGE_UNIT[name] ?? "its difference unit";
  return kindOf(u, math) === "temperature"
    ? `write (${describe(u)} to ${abs}) for the absolute temperature, or ${magnitude} ${change} for a temperature change`
    : `write (${describe(u)} to ${abs}) for the absolute pressure, or ${magnitude} ${change} for a pressure difference`;
}

function dims(x: unknown): number[] {
  return isUnitValue(x) ? x.dimensions : [];
}

/**
 * Check a product or quotient `a op b` (op multiply or divide) where at least one side is an offset
 * quantity; return the operands to use (offset quantities replaced by absolute values) or throw.
 */
export function productOperands(math: MathJsInstance, op: "multiply" | "divide", a: unknown, b: unknown): [unknown, unknown] {
  const sign = op === "multiply" ? 1 : -1;
  const da = dims(a);
  const db = dims(b);
  const out: [unknown, unknown] = [a, b];
  for (const [i, x] of [a, b].entries()) {
    if (!isOffsetQuantity(x)) continue;
    const k = markerIndex(math, kindOf(x, math));
    const exponent = (da[k] ?? 0) + sign * (db[k] ?? 0);
    if (Math.abs(exponent) > 1e-12) {
      const kind = kindOf(x, math) === "temperature" ? "an absolute temperature (offset unit)" : "a gauge pressure (offset against 1 atm)";
      const what = op === "multiply" ? "a product" : "a quotient";
      const dimWord = kindOf(x, math) === "temperature" ? "temperature" : "pressure";
      throw new UnitsError(
        "ambiguous_offset",
        `${describe(x)} is ${kind}; in ${what} where its ${dimWord} does not cancel its meaning is ambiguous: ${howToWrite(x, math)}`,
      );
    }
    out[i] = absoluteOf(math, x);
  }
  return out;
}

/** Rules for `a + b` and `a - b` between two valued units of the same dimension. */
export function sumOperands(math: MathJsInstance, op: "add" | "subtract", a: Unit, b: Unit): Unit {
  const oa = isOffsetQuantity(a);
  const ob = isOffsetQuantity(b);
  if (oa && ob && op === "add") {
    const word = kindOf(a, math) === "temperature" ? "temperatures" : "gauge pressures";
    throw new UnitsError(
      "absolute_plus_absolute",
      `${describe(a)} + ${describe(b)} adds two absolute ${word}, which has no meaning; if ${describe(b)} is a change, ${howToWrite(b, math).replace(/^write .*?, or /, "write ")}`,
    );
  }
  if (oa && ob) return differenceOf(math, a, b);
  if (oa || ob) {
    if (op === "subtract" && ob) return differenceOf(math, a, b); // 300 K - 25 degC: both absolute
    // absolute +/- change: the result is absolute, in the absolute operand's unit.
    const abs = oa ? a : b;
    const siAbs = absoluteOf(math, abs).toSI().value;
    const siOther = (oa ? b : a).toSI().value;
    return math.unit(op === "add" ? siAbs + siOther : siAbs - siOther, siUnit(math, abs)).to(unitName(abs));
  }
  throw new UnitsError("bad_argument", "sumOperands needs an offset quantity"); // callers check first
}

function siUnit(math: MathJsInstance, u: Unit): string {
  return kindOf(u, math) === "temperature" ? "K" : "Pa";
}

function differenceOf(math: MathJsInstance, a: Unit, b: Unit): Unit {
  const si = (isOffsetQuantity(a) ? absoluteOf(math, a) : a).toSI().value - (isOffsetQuantity(b) ? absoluteOf(math, b) : b).toSI().value;
  const target = isOffsetQuantity(a) ? (DIFFERENCE_UNIT[unitName(a)] ?? siUnit(math, a)) : (a as Unit).formatUnits();
  return math.unit(si, siUnit(math, isOffsetQuantity(a) ? a : b)).to(target);
}

/** `x ^ p` for an offset quantity is ambiguous except p = 1. */
export function checkPower(math: MathJsInstance, x: unknown, p: unknown): void {
  if (isOffsetQuantity(x) && !(typeof p === "number" && p === 1)) {
    throw new UnitsError("ambiguous_offset", `${describe(x)} ^ ${String(p)}: a power of an offset quantity is ambiguous; ${howToWrite(x, math)}`);
  }
}

/** Comparisons are unambiguous: compare absolute values. */
export function comparable(math: MathJsInstance, x: unknown): unknown {
  return isOffsetQuantity(x) ? absoluteOf(math, x) : x;
}
