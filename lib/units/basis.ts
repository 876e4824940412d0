/**
 * Molar <-> mass basis, only where the user asks: per_mass(H, M) turns J/mol into J/kg-type units and
 * per_mole(h, M) the reverse, through a molar mass the user supplies (never guessed from context).
 */
import type { Unit } from "mathjs";
import { DIMENSIONS, hasDimension } from "./dimensions.js";
import { describeValue } from "./convert.js";
import { UnitsError } from "./errors.js";
import { isOffsetQuantity, isUnitValue } from "./offset.js";
import { cancelUnits } from "./simplify.js";

const AMOUNT = 6; // index of AMOUNT_OF_SUBSTANCE among mathjs base dimensions

function checkMolarMass(M: unknown, fnName: string): Unit {
  if (!isUnitValue(M) || M.value === null || !hasDimension(M.dimensions, "molar_mass")) {
    throw new UnitsError("wrong_dimension", `argument M of ${fnName}() needs ${DIMENSIONS.molar_mass.human}, e.g. 16.043 g/mol, got ${describeValue(M)}`);
  }
  return M;
}

/**
 * A molar quantity has amount^-1 (J/mol, m^3/mol). A specific one cannot be told by dimension alone
 * (J/kg is m^2/s^2), so per_mole accepts any quantity that is not already per mole.
 */
function checkQuantity(x: unknown, fnName: "per_mass" | "per_mole"): Unit {
  const ok = isUnitValue(x) && x.value !== null && !isOffsetQuantity(x);
  const perMole = ok && Math.abs(((x as Unit).dimensions[AMOUNT] ?? 0) + 1) < 1e-12;
  if (!ok || (fnName === "per_mass") !== perMole) {
    const want = fnName === "per_mass" ? "a per-mole quantity such as J/mol or m^3/mol" : "a per-mass quantity such as J/kg or m^3/kg (not already per mole)";
    throw new UnitsError("wrong_dimension", `argument x of ${fnName}() needs ${want}, got ${describeValue(x)}`);
  }
  return x as Unit;
}

/** A molar quantity (per mol) divided by molar mass gives per mass (J/mol with M in g/mol -> J/g). */
export function per_mass(x: unknown, M: unknown): Unit | number {
  const r = checkQuantity(x, "per_mass").divide(checkMolarMass(M, "per_mass"));
  return typeof r === "number" ? r : cancelUnits(r);
}

/** A specific quantity (per mass) times molar mass gives per mole (J/g with M in g/mol -> J/mol). */
export function per_mole(x: unknown, M: unknown): Unit | number {
  return cancelUnits(checkQuantity(x, "per_mole").multiply(checkMolarMass(M, "per_mole")));
}
