/**
 * Text for a quantity: significant figures (default 5, clamped to 4..6), in the user's units with
 * repeated units cancelled. With `auto`, a result that a built-in produced in SI is shown in the
 * candidate unit of its dimension that puts the number in [1, 1000) (engineering prefixes: Pa, kPa,
 * MPa; J/mol, kJ/mol; cm^3/mol, L/mol, m^3/mol ...); if none does, the one nearest that range.
 * Temperatures stay in K. Offset quantities print in their own unit (25 degC).
 */
import type { Unit } from "mathjs";
import { type DimensionName, dimensionOf } from "./dimensions.js";
import { isUnitValue } from "./offset.js";
import { cancelUnits } from "./simplify.js";

export const DISPLAY_CANDIDATES: Partial<Record<DimensionName, readonly string[]>> = {
  pressure: ["Pa", "kPa", "MPa", "GPa"],
  energy: ["J", "kJ", "MJ", "GJ"],
  molar_energy: ["J/mol", "kJ/mol"],
  specific_energy: ["J/kg", "kJ/kg", "MJ/kg"],
  molar_volume: ["cm^3/mol", "L/mol", "m^3/mol"],
  volume: ["cm^3", "L", "m^3"],
  power: ["W", "kW", "MW", "GW"],
  molar_entropy: ["J/(mol K)", "kJ/(mol K)"],
  specific_entropy: ["J/(kg K)", "kJ/(kg K)"],
  density: ["kg/m^3"],
  length: ["mm", "m", "km"],
  mass: ["g", "kg", "t"],
  molar_mass: ["g/mol", "kg/mol"],
  time: ["s"],
  temperature: ["K"],
};

export interface FormatOptions {
  /** Significant figures, 4..6 (default 5). */
  sig?: number;
  /** Choose a readable unit for SI results of built-ins (see module note). */
  auto?: boolean;
}

function formatNumber(x: number, sig: number): string {
  if (x === 0 || !Number.isFinite(x)) return String(x);
  const a = Math.abs(x);
  if (a >= 1e-4 && a < 1e9) return String(Number(x.toPrecision(sig)));
  const [mant, exp] = x.toExponential(sig - 1).split("e");
  return `${String(Number(mant))}e${exp!.replace("+", "")}`;
}

function unitText(u: Unit): string {
  return u.formatUnits();
}

/** Pick the display unit for an SI result (auto mode). */
export function chooseUnit(u: Unit): Unit {
  const dim = dimensionOf(u);
  const cands = dim !== undefined ? DISPLAY_CANDIDATES[dim] : undefined;
  if (cands === undefined) return u;
  let best = u.to(cands[0]!);
  let bestScore = Infinity;
  for (const c of cands) {
    const v = Math.abs(u.toNumber(c));
    const score = v === 0 ? 0 : v >= 1 && v < 1000 ? 0 : Math.abs(Math.log10(v) - (v < 1 ? 0 : 2.999));
    if (score < bestScore) {
      bestScore = score;
      best = u.to(c);
    }
  }
  return best;
}

export function formatQuantity(x: Unit | number, options: FormatOptions = {}): string {
  const sig = Math.min(6, Math.max(4, Math.round(options.sig ?? 5)));
  if (!isUnitValue(x)) return formatNumber(Number(x), sig);
  if (x.value === null) return unitText(x);
  const simpler = cancelUnits(x);
  if (!isUnitValue(simpler)) return formatNumber(simpler, sig);
  const shown = options.auto === true ? chooseUnit(simpler) : simpler;
  const only = shown.units.length === 1 && shown.units[0]!.power === 1 ? shown.units[0]! : undefined;
  // For a single unit mathjs's toNumber keeps the offset (25 degC stays 25); compounds use their string.
  const value = only !== undefined ? shown.toNumber(prefixName(only) + only.unit.name) : shown.toNumber(unitText(shown));
  return `${formatNumber(value, sig)} ${unitText(shown)}`;
}

function prefixName(c: Unit["units"][number]): string {
  return typeof c.prefix === "string" ? c.prefix : ((c.prefix as { name?: string } | undefined)?.name ?? "");
}
