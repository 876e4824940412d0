/**
 * The edge between quantities and plain SI numbers: built-ins call toSI once per argument (arrays once
 * per array) and fromSI on results. Offset quantities convert to absolute SI (25 degC -> 298.15 K,
 * 0 barg -> 101325 Pa): as built-in arguments their role is never ambiguous.
 */
import type { MathJsInstance, Unit } from "mathjs";
import { DIMENSIONS, type DimensionName, dimensionOf, hasDimension, isDimensionName } from "./dimensions.js";
import { UnitsError } from "./errors.js";
import { isOffsetQuantity, isUnitValue } from "./offset.js";

function isMatrixLike(x: unknown): x is { isMatrix: true; valueOf(): unknown } {
  return typeof x === "object" && x !== null && (x as { isMatrix?: boolean }).isMatrix === true;
}

/** How a value looks in an error message: "25 degC (a temperature)". */
export function describeValue(x: unknown): string {
  if (isUnitValue(x)) {
    const dim = dimensionOf(x);
    const u: Unit = x;
    const text = (u.value as number | null) === null ? u.formatUnits() : u.format({ precision: 6 });
    return `${text} (${dim !== undefined ? DIMENSIONS[dim].human : "a quantity of another dimension"})`;
  }
  if (typeof x === "number") return `${x} (a plain number)`;
  if (typeof x === "string") return `the text "${x.length > 30 ? x.slice(0, 30) + "..." : x}"`;
  if (typeof x === "boolean") return `${x} (a boolean)`;
  if (x === null || x === undefined) return "nothing";
  if (Array.isArray(x) || isMatrixLike(x)) return "an array";
  return "a value of another kind";
}

function scalarToSI(x: unknown, dim: DimensionName, argName: string, fnName: string): number {
  if (typeof x === "number") {
    if (dim === "dimensionless") return x;
  } else if (isUnitValue(x) && x.value !== null && hasDimension(x.dimensions, dim)) {
    // mathjs keeps non-offset values in SI already; offset quantities need their offset applied.
    const u: Unit = x;
    return Number(isOffsetQuantity(u) ? u.toSI().value : (u as Unit).value);
  }
  const example = dim === "dimensionless" ? "" : `, e.g. 1 ${DIMENSIONS[dim].si}`;
  throw new UnitsError(
    "wrong_dimension",
    `argument ${argName} of ${fnName}() needs ${DIMENSIONS[dim].human}${example}, got ${describeValue(x)}`,
  );
}

/**
 * A quantity in SI as a plain number; arrays and matrices become a Float64Array (converted once).
 * Plain numbers are accepted only for the dimensionless dimension.
 */
export function toSI(value: unknown, dim: DimensionName, argName: string, fnName: string): number | Float64Array {
  if (Array.isArray(value) || isMatrixLike(value)) {
    const flat = (isMatrixLike(value) ? (value.valueOf() as unknown[]) : value).flat(Infinity) as unknown[];
    const out = new Float64Array(flat.length);
    for (let i = 0; i < flat.length; i++) out[i] = scalarToSI(flat[i], dim, `${argName}[${i + 1}]`, fnName);
    return out;
  }
  return scalarToSI(value, dim, argName, fnName);
}

/** A scalar SI number only (arrays refused), for arguments that must be single values. */
export function scalarSI(value: unknown, dim: DimensionName, argName: string, fnName: string): number {
  if (Array.isArray(value) || isMatrixLike(value)) {
    throw new UnitsError("bad_argument", `argument ${argName} of ${fnName}() needs a single value, got an array`);
  }
  return scalarToSI(value, dim, argName, fnName);
}

/**
 * An SI number back as a quantity: in the dimension's SI unit, or in the given unit string (which must
 * have the same dimension as the SI value's unit). Dimensionless gives a plain number.
 */
export function fromSI(math: MathJsInstance, x: number, dimOrUnit: DimensionName | string): Unit | number {
  if (isDimensionName(dimOrUnit)) {
    const si = DIMENSIONS[dimOrUnit].si;
    return si === "" ? x : math.unit(x, si);
  }
  const target = math.unit(dimOrUnit);
  // Start from a single SI unit where one exists (Pa, K): mathjs applies a target's offset (psig,
  // degC) only when converting from a non-compound unit.
  const dim = dimensionOf(target);
  const si = dim !== undefined && DIMENSIONS[dim].si !== "" ? DIMENSIONS[dim].si : target.toSI().formatUnits();
  return math.unit(x, si).to(dimOrUnit);
}

/** fromSI over an array of SI numbers (a plain array of quantities, as span() returns). */
export function fromSIArray(math: MathJsInstance, xs: ArrayLike<number>, dimOrUnit: DimensionName | string): (Unit | number)[] {
  const out: (Unit | number)[] = new Array<Unit | number>(xs.length);
  for (let i = 0; i < xs.length; i++) out[i] = fromSI(math, xs[i]!, dimOrUnit);
  return out;
}
