/**
 * The language's view of units: what a built-in needs at its edge (to SI numbers and back) and what
 * display needs (a quantity's dimension name and text). lib/units owns the policy; until its index
 * lands this file carries a minimal local version with the same shape, so built-ins can be written
 * against `ctx.units` now and keep working when the bridge switches to lib/units.
 */
import type { MathJsInstance, Unit } from "mathjs";

/** Named dimensions a built-in may declare, with the SI unit its numbers are in. */
export const SI_UNITS: Readonly<Record<string, string>> = {
  temperature: "K",
  temperature_difference: "K",
  pressure: "Pa",
  molar_volume: "m^3/mol",
  volume: "m^3",
  molar_energy: "J/mol",
  molar_entropy: "J/(mol K)",
  molar_heat_capacity: "J/(mol K)",
  energy: "J",
  entropy: "J/K",
  mass: "kg",
  amount: "mol",
  density: "kg/m^3",
  molar_density: "mol/m^3",
  specific_energy: "J/kg",
  specific_entropy: "J/(kg K)",
  specific_volume: "m^3/kg",
  molar_mass: "kg/mol",
  time: "s",
  power: "W",
  length: "m",
  area: "m^2",
  velocity: "m/s",
  mass_flow: "kg/s",
  molar_flow: "mol/s",
  volume_flow: "m^3/s",
  force: "N",
  frequency: "Hz",
};

export interface UnitsBridge {
  /** Dimension names known to toSI/fromSI, plus "dimensionless". */
  readonly dimensions: readonly string[];
  /** Converts a quantity to an SI number; throws a message naming argument, function, expected and got. */
  toSI(value: unknown, dim: string, argName: string, fnName: string): number;
  /** Builds a quantity from an SI number (dimensionless -> plain number). */
  fromSI(x: number, dimOrUnit: string): Unit | number;
  /** Name of a quantity's dimension ("pressure"), or undefined when it has no name here. */
  dimensionOf(value: Unit): string | undefined;
  /** The quantity as the user should read it (significant figures, user's unit). */
  formatQuantity(value: Unit, precision?: number): string;
}

/** "a pressure", "an amount": article for messages. */
export function describeDimension(dim: string): string {
  const words = dim.replace(/_/g, " ");
  return /^[aeiou]/.test(words) ? `an ${words}` : `a ${words}`;
}

export function createUnitsBridge(math: MathJsInstance): UnitsBridge {
  const probes = new Map<string, Unit>(Object.entries(SI_UNITS).map(([d, u]) => [d, math.unit(1, u)]));
  const dimensionOf = (value: Unit): string | undefined => {
    if (value.dimensions.every((p) => p === 0)) return "dimensionless";
    for (const [dim, probe] of probes) if (value.equalBase(probe)) return dim;
    return undefined;
  };
  const formatQuantity = (value: Unit, precision = 6): string => math.format(value, { precision });
  const describeGot = (value: unknown): string => {
    if (typeof value === "number") return `${math.format(value, { precision: 6 })} (a plain number)`;
    if (math.isUnit(value)) {
      const d = dimensionOf(value);
      return `${formatQuantity(value)} (${d ? describeDimension(d) : "units " + value.formatUnits()})`;
    }
    if (typeof value === "string") return `the text "${value}"`;
    return `a value of type ${math.typeOf(value)}`;
  };
  return {
    dimensions: [...probes.keys(), "dimensionless"],
    dimensionOf,
    formatQuantity,
    toSI(value, dim, argName, fnName) {
      if (dim === "dimensionless") {
        if (typeof value === "number") return value;
        if (math.isUnit(value) && dimensionOf(value) === "dimensionless") return value.toNumber("");
      } else {
        const probe = probes.get(dim);
        if (!probe) throw new Error(`${fnName}(): unknown dimension "${dim}" declared for argument ${argName}`);
        if (math.isUnit(value) && value.value !== null && value.equalBase(probe)) return value.toNumber(SI_UNITS[dim]!);
      }
      throw new Error(`argument ${argName} of ${fnName}() needs ${describeDimension(dim)}, got ${describeGot(value)}`);
    },
    fromSI(x, dimOrUnit) {
      if (dimOrUnit === "dimensionless") return x;
      const unit = SI_UNITS[dimOrUnit] ?? dimOrUnit;
      return math.unit(x, unit);
    },
  };
}
