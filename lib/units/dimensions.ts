/**
 * The dimensions built-ins declare for their arguments and results. Exponents are over mathjs's base
 * dimensions (MASS, LENGTH, TIME, CURRENT, TEMPERATURE, LUMINOUS_INTENSITY, AMOUNT_OF_SUBSTANCE,
 * ANGLE, BIT), so checks need no mathjs instance. Some physical quantities share a dimension (entropy
 * and heat capacity, J/K); `dimensionOf` names the first listed, the checks accept either name.
 */
import type { Unit } from "mathjs";

export interface Dimension {
  /** SI unit string in mathjs syntax; "" for dimensionless. */
  si: string;
  /** With article, for messages: "a pressure". */
  human: string;
  /** Exponents of [mass, length, time, current, temperature, luminous intensity, amount, angle, bit]. */
  exponents: readonly number[];
}

const d = (si: string, human: string, m: number, l: number, t: number, th: number, n: number): Dimension => ({
  si,
  human,
  exponents: [m, l, t, 0, th, 0, n, 0, 0],
});

export const DIMENSIONS = {
  dimensionless: d("", "a plain number (dimensionless)", 0, 0, 0, 0, 0),
  temperature: d("K", "a temperature", 0, 0, 0, 1, 0),
  pressure: d("Pa", "a pressure", 1, -1, -2, 0, 0),
  molar_volume: d("m^3/mol", "a molar volume", 0, 3, 0, 0, -1),
  volume: d("m^3", "a volume", 0, 3, 0, 0, 0),
  specific_volume: d("m^3/kg", "a specific volume", -1, 3, 0, 0, 0),
  molar_energy: d("J/mol", "a molar energy", 1, 2, -2, 0, -1),
  molar_entropy: d("J/(mol K)", "a molar entropy", 1, 2, -2, -1, -1),
  molar_heat_capacity: d("J/(mol K)", "a molar heat capacity", 1, 2, -2, -1, -1),
  energy: d("J", "an energy", 1, 2, -2, 0, 0),
  entropy: d("J/K", "an entropy", 1, 2, -2, -1, 0),
  heat_capacity: d("J/K", "a heat capacity", 1, 2, -2, -1, 0),
  specific_energy: d("J/kg", "a specific energy", 0, 2, -2, 0, 0),
  specific_entropy: d("J/(kg K)", "a specific entropy", 0, 2, -2, -1, 0),
  specific_heat_capacity: d("J/(kg K)", "a specific heat capacity", 0, 2, -2, -1, 0),
  mass: d("kg", "a mass", 1, 0, 0, 0, 0),
  amount: d("mol", "an amount of substance", 0, 0, 0, 0, 1),
  density: d("kg/m^3", "a mass density", 1, -3, 0, 0, 0),
  molar_density: d("mol/m^3", "a molar density", 0, -3, 0, 0, 1),
  molar_mass: d("kg/mol", "a molar mass", 1, 0, 0, 0, -1),
  time: d("s", "a time", 0, 0, 1, 0, 0),
  power: d("W", "a power", 1, 2, -3, 0, 0),
  length: d("m", "a length", 0, 1, 0, 0, 0),
  area: d("m^2", "an area", 0, 2, 0, 0, 0),
  velocity: d("m/s", "a velocity", 0, 1, -1, 0, 0),
  acceleration: d("m/s^2", "an acceleration", 0, 1, -2, 0, 0),
  force: d("N", "a force", 1, 1, -2, 0, 0),
  mass_flow: d("kg/s", "a mass flow", 1, 0, -1, 0, 0),
  molar_flow: d("mol/s", "a molar flow", 0, 0, -1, 0, 1),
  volume_flow: d("m^3/s", "a volume flow", 0, 3, -1, 0, 0),
  dynamic_viscosity: d("Pa s", "a dynamic viscosity", 1, -1, -1, 0, 0),
  kinematic_viscosity: d("m^2/s", "a kinematic viscosity", 0, 2, -1, 0, 0),
  thermal_conductivity: d("W/(m K)", "a thermal conductivity", 1, 1, -3, -1, 0),
  heat_transfer_coefficient: d("W/(m^2 K)", "a heat transfer coefficient", 1, 0, -3, -1, 0),
  heat_flux: d("W/m^2", "a heat flux", 1, 0, -3, 0, 0),
  inverse_temperature: d("1/K", "an inverse temperature", 0, 0, 0, -1, 0),
  pressure_per_temperature: d("Pa/K", "a pressure per temperature", 1, -1, -2, -1, 0),
} as const satisfies Record<string, Dimension>;

export type DimensionName = keyof typeof DIMENSIONS;

export function isDimensionName(x: string): x is DimensionName {
  return Object.prototype.hasOwnProperty.call(DIMENSIONS, x);
}

/** True when a unit's dimension exponents equal the named dimension's. */
export function hasDimension(exponents: readonly number[], dim: DimensionName): boolean {
  const want = DIMENSIONS[dim].exponents;
  const n = Math.max(want.length, exponents.length);
  for (let i = 0; i < n; i++) if (Math.abs((exponents[i] ?? 0) - (want[i] ?? 0)) > 1e-12) return false;
  return true;
}

/** Name of the (first listed) dimension of a unit or number, or undefined when none matches. */
export function dimensionOf(x: Unit | number): DimensionName | undefined {
  const exps = typeof x === "number" ? [] : x.dimensions;
  for (const name of Object.keys(DIMENSIONS) as DimensionName[]) if (hasDimension(exps, name)) return name;
  return undefined;
}
