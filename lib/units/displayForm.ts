/**
 * How a result of arithmetic is shown: its units cancelled and, where a compound unit has a simpler
 * well-known equivalent, in that unit (see simplifyForDisplay).
 */
import type { Unit } from "mathjs";
import { DIMENSIONS, dimensionOf } from "./dimensions.js";
import { chooseUnitName } from "./format.js";
import { cancelUnits } from "./simplify.js";

/** Number of unit symbols in a unit text ("J/(mol K)" -> 3, "Pa" -> 1, "" -> 0). */
function symbolCount(text: string): number {
  return text.match(/[A-Za-z]+/g)?.length ?? 0;
}

/**
 * The form in which a result of arithmetic is shown. Repeated units are cancelled (cancelUnits);
 * then a compound unit that takes more unit symbols than the SI unit of its dimension is shown in
 * that dimension's unit instead: `(bar m^3 K) / J` -> K, `J / (mol bar)` -> cm^3/mol (or L/mol, m^3/mol:
 * the candidate of format.ts that gives a number in [1, 1000)), `(bar L) / J` -> a plain number,
 * `N / m^2` -> Pa. A unit as written is kept: `kJ/kg`, `W/(m^2 K)` (as many symbols as the SI unit),
 * momentum `kg m/s` (no named dimension), and any value whose units the user chose: a `to`/`in`
 * result or a number-unit literal (both carry mathjs's skipAutomaticSimplification flag; products
 * and quotients of two quantities clear it).
 */
export function simplifyForDisplay(u: Unit | number): Unit | number {
  if (typeof u === "number") return u;
  const c = cancelUnits(u);
  if (typeof c === "number" || c.value === null || (u as { skipAutomaticSimplification?: boolean }).skipAutomaticSimplification === true) return c;
  if (c.units.length < 2) return c;
  const dim = dimensionOf(c);
  if (dim === undefined) return c;
  const si = DIMENSIONS[dim].si;
  if (symbolCount(c.formatUnits()) <= symbolCount(si)) return c;
  if (si === "") return Number(c.value); // stored in SI: the pure number
  const name = chooseUnitName(Number(c.value), dim) ?? si;
  return c.to(name);
}
