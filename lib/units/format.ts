/**
 * Text for a quantity: significant figures (default 5, clamped to 4..6), in the user's units with
 * repeated units cancelled. With `auto`, a result that a built-in produced in SI is shown in the
 * candidate unit of its dimension that puts the number in [1, 1000) (engineering prefixes: Pa, kPa,
 * MPa; J/mol, kJ/mol; cm^3/mol, L/mol, m^3/mol ...); if none does, the one nearest that range.
 * Temperatures stay in K. Offset quantities print in their own unit (25 degC).
 */
import type { Unit } from "mathjs";
import { type DimensionName, dimensionOf } from "./dimensions.js";
import { isOffsetQuantity, isUnitValue } from "./offset.js";
import { cancelUnits } from "./simplify.js";

export const DISPLAY_CANDIDATES: Partial<Record<DimensionName, readonly string[]>> = {
  pressure: ["Pa", "kPa", "MPa", "GPa"],
  energy: ["J", "kJ", "MJ", "GJ"],
  molar_energy: ["J/mol", "kJ/mol"],
  // Specific enthalpy, internal energy and heating values read in kJ/kg in steam tables and datasheets
  // (3051.7 kJ/kg, not 3.0517 MJ/kg), so kJ/kg is the largest automatic choice.
  specific_energy: ["J/kg", "kJ/kg"],
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

/**
 * SI value of one of each display candidate (1 kPa = 1e3 Pa, 1 cm^3/mol = 1e-6 m^3/mol ...), so the
 * choice is made on plain numbers and only the chosen unit is converted to. Exact by the SI prefix
 * definitions (and 1 L = 1e-3 m^3, 1 t = 1e3 kg, CGPM 1964/1879); format.test.ts checks every entry
 * against mathjs's own unit table.
 */
export const CANDIDATE_SI_FACTORS: Readonly<Record<string, number>> = {
  Pa: 1, kPa: 1e3, MPa: 1e6, GPa: 1e9,
  J: 1, kJ: 1e3, MJ: 1e6, GJ: 1e9,
  "J/mol": 1, "kJ/mol": 1e3,
  "J/kg": 1, "kJ/kg": 1e3, "MJ/kg": 1e6,
  "cm^3/mol": 1e-6, "L/mol": 1e-3, "m^3/mol": 1,
  "cm^3": 1e-6, L: 1e-3, "m^3": 1,
  W: 1, kW: 1e3, MW: 1e6, GW: 1e9,
  "J/(mol K)": 1, "kJ/(mol K)": 1e3,
  "J/(kg K)": 1, "kJ/(kg K)": 1e3,
  "kg/m^3": 1,
  mm: 1e-3, m: 1, km: 1e3,
  g: 1e-3, kg: 1, t: 1e3,
  "g/mol": 1e-3, "kg/mol": 1,
  s: 1,
  K: 1,
};

/**
 * The candidate that puts |si| (an SI magnitude of the dimension) in [1, 1000), else the nearest to
 * that range (module note). Plain numbers only; undefined when the dimension has no candidates.
 */
export function chooseUnitName(si: number, dim: DimensionName): string | undefined {
  const cands = DISPLAY_CANDIDATES[dim];
  if (cands === undefined) return undefined;
  let best = cands[0]!;
  let bestScore = Infinity;
  const a = Math.abs(si);
  for (const c of cands) {
    const v = a / (CANDIDATE_SI_FACTORS[c] ?? NaN);
    const score = v === 0 ? 0 : v >= 1 && v < 1000 ? 0 : Math.abs(Math.log10(v) - (v < 1 ? 0 : 2.999));
    if (score < bestScore) {
      bestScore = score;
      best = c;
    }
  }
  return best;
}

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
  const stored = (u as { value: unknown }).value;
  if (dim === undefined || stored === null) return u;
  // mathjs keeps values in SI except for the offset (25 degC is stored as 25): add it where present.
  const si = isOffsetQuantity(u) ? Number(u.toSI().value) : Number(stored);
  const name = chooseUnitName(si, dim);
  return name === undefined ? u : u.to(name);
}

export function formatQuantity(x: Unit | number, options: FormatOptions = {}): string {
  const sig = Math.min(6, Math.max(4, Math.round(options.sig ?? 5)));
  if (!isUnitValue(x)) return formatNumber(Number(x), sig);
  if (x.value === null) return unitText(x);
  const simpler = cancelUnits(x);
  if (!isUnitValue(simpler)) return formatNumber(simpler, sig);
  const shown = options.auto === true ? chooseUnit(simpler) : simpler;
  // toNumber() without a target reads the value in the unit's own units and prefixes (what
  // formatUnits prints), offset kept (25 degC stays 25), with no unit string to parse.
  return `${formatNumber(shown.toNumber(), sig)} ${unitText(shown)}`;
}
