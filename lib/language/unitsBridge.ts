/**
 * The language's view of lib/units, bound to one mathjs instance: what a built-in needs at its edge
 * (to SI numbers and back) and what display needs (a quantity's dimension name and text). The policy
 * itself (dimensions, offsets, display units) lives in lib/units; this file only adapts it.
 */
import type { MathJsInstance, Unit } from "mathjs";
import {
  DIMENSIONS, chooseUnit, chooseUnitName, dimensionOf, formatQuantity, fromSI, hasDimension, isDimensionName, isUnitValue, scalarSI,
  simplifyForDisplay, type DimensionName,
} from "../units/index.js";

export interface UnitsBridge {
  /** Dimension names a built-in may declare (lib/units DIMENSIONS), including "dimensionless". */
  readonly dimensions: readonly string[];
  /** Converts one quantity to an SI number; throws a UnitsError naming argument, function, expected and got. */
  toSI(value: unknown, dim: string, argName: string, fnName: string): number;
  /**
   * An SI number as a quantity. A dimension name gives a readable unit of that dimension (kPa, MPa,
   * kJ/mol ... as lib/units chooses); a unit string gives exactly that unit. Dimensionless -> number.
   */
  fromSI(x: number, dimOrUnit: string): Unit | number;
  /** SI unit string of a dimension name ("" for dimensionless), or the string itself if not a name. */
  siUnitOf(dimOrUnit: string): string;
  /** Display unit for a column of SI values of a dimension, chosen from its largest magnitude. */
  displayUnitFor(values: Float64Array, dimOrUnit: string): string;
  /** Name of a quantity's dimension ("pressure"), or undefined when it has no name. */
  dimensionOf(value: Unit): string | undefined;
  /**
   * The quantity as the user should read it (significant figures, the unit it carries; a result of
   * arithmetic in a messy compound unit in its dimension's unit, lib/units displayForm.ts).
   */
  formatQuantity(value: Unit | number): string;
  /** The value in the unit it is shown in (lib/units simplifyForDisplay). */
  displayForm(value: Unit): Unit | number;
}

/** "a pressure", "an amount": article for messages. */
export function describeDimension(dim: string): string {
  if (isDimensionName(dim)) return DIMENSIONS[dim].human;
  const words = dim.replace(/_/g, " ");
  return /^[aeiou]/.test(words) ? `an ${words}` : `a ${words}`;
}

export function createUnitsBridge(math: MathJsInstance): UnitsBridge {
  const siUnitOf = (dimOrUnit: string) => (isDimensionName(dimOrUnit) ? DIMENSIONS[dimOrUnit].si : dimOrUnit);
  // Display follows the quantity's dimension, not the declared name: a molar heat capacity shows
  // like the molar entropy listed first with the same exponents (what dimensionOf reports).
  const canonical = new Map<DimensionName, DimensionName>();
  const canonicalOf = (dim: DimensionName): DimensionName => {
    let c = canonical.get(dim);
    if (c === undefined) {
      c = (Object.keys(DIMENSIONS) as DimensionName[]).find((n) => hasDimension(DIMENSIONS[dim].exponents, n)) ?? dim;
      canonical.set(dim, c);
    }
    return c;
  };
  return {
    dimensions: Object.keys(DIMENSIONS),
    toSI(value, dim, argName, fnName) {
      if (!isDimensionName(dim)) throw new Error(`${fnName}(): unknown dimension "${dim}" declared for argument ${argName}`);
      return scalarSI(value, dim, argName, fnName);
    },
    fromSI(x, dimOrUnit) {
      if (isDimensionName(dimOrUnit) && Number.isFinite(x)) {
        if (DIMENSIONS[dimOrUnit].si === "") return x;
        const name = chooseUnitName(x, canonicalOf(dimOrUnit));
        if (name !== undefined) {
          // What Unit.to(name) builds, without a conversion: mathjs stores values in SI (none of
          // the display candidates has an offset), and `to` fixes the prefix.
          const u = math.unit(name) as Unit & { value: number; fixPrefix: boolean };
          u.value = x;
          u.fixPrefix = true;
          return u;
        }
      }
      const q = fromSI(math, x, dimOrUnit);
      return typeof q === "number" || !isDimensionName(dimOrUnit) || !Number.isFinite(x) ? q : chooseUnit(q);
    },
    siUnitOf,
    displayUnitFor(values, dimOrUnit) {
      const si = siUnitOf(dimOrUnit);
      if (!si || !isDimensionName(dimOrUnit)) return si;
      let big = 0;
      for (const v of values) if (Number.isFinite(v) && Math.abs(v) > big) big = Math.abs(v);
      return big === 0 ? si : chooseUnit(math.unit(big, si)).formatUnits();
    },
    dimensionOf: (value) => dimensionOf(value),
    formatQuantity: (value) => formatQuantity(isUnitValue(value) ? simplifyForDisplay(value) : value, { sig: 6 }),
    displayForm: (value) => simplifyForDisplay(value),
  };
}
