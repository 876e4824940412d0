/**
 * Opaque thermodynamic values of the language: substances, mixtures and models.
 *
 * Each is a FROZEN PLAIN OBJECT: its enumerable fields are language values (quantities, numbers,
 * text) that expressions can read (`s.Tc`, `m.source`), which mathjs allows only on plain objects;
 * the RichValue methods and the SI data the built-ins use are non-enumerable (the data under a
 * symbol, which no expression can name). Frozen, so a user cannot make a shown field disagree with
 * the data a calculation uses.
 */
import type { MimeBundle } from "../../display/index.js";
import type { EosModel, Substance } from "../../thermo/index.js";
import type { RichValue } from "./rich.js";

export const THERMO_DATA: unique symbol = Symbol("caloric.thermo");

/** Ideal-gas part of a model's fluid: Cp(T) and totals against the stated reference. */
export interface IdealGasPart {
  /** J/(mol K) at T (K). */
  Cp(T: number): number;
  /** J/mol at T. */
  H(T: number): number;
  /** J/(mol K) at T, P. */
  S(T: number, P: number): number;
  reference: string;
  /** Extrapolation notes for T (empty inside the correlation ranges). */
  warnings(T: number): string[];
}

export interface SubstanceData { kind: "substance"; substance: Substance }
export interface MixtureData { kind: "mixture"; components: Substance[]; x: number[]; kij?: number[][] }

export interface ModelData {
  kind: "model";
  /** "idealgas", "vdw", "rk", "srk", "pr", "virial", "lk" or "if97". */
  id: string;
  /** Model name for reports, e.g. "Peng-Robinson (1976 ...)". */
  label: string;
  source: string;
  /** "propane" or "methane 0.9, ethane 0.1". */
  fluidText: string;
  /** The equation of state (absent for if97, which routes to lib/thermo/water). */
  eos?: EosModel;
  /** Molar mass, kg/mol (mole-fraction average for mixtures). */
  M: number;
  /** Undefined when a component has no ideal-gas Cp (totals unavailable), and for if97. */
  idealGas?: IdealGasPart;
  /** Why totals are unavailable (shown in state notes). */
  noTotals?: string;
  /** Pseudo-critical constants (Kay's rule), K and Pa; NaN for if97. */
  Tc: number;
  Pc: number;
  /** Range warnings of models that have them (virial, Lee-Kesler). */
  validity?(T: number, P: number): string[];
  /**
   * Cautions no model gives itself (lib/thermo cautions.ts: below the triple point, liquid below 0.5 Tc
   * without triple-point data, P > 10 Pc) for a state of label `phase`; absent for if97.
   */
  cautions?(T: number, P: number, phase: string): readonly string[];
}

export type ThermoData = SubstanceData | MixtureData | ModelData;

export interface ThermoValue extends RichValue {
  readonly [THERMO_DATA]: ThermoData;
}

/**
 * A frozen plain object with `fields` visible to expressions and everything else hidden.
 * `bundle`/`text` render the value (built by the caller with the session's formatter).
 */
export function thermoValue(
  data: ThermoData,
  fields: Record<string, unknown>,
  bundle: () => MimeBundle,
  text: () => string,
): ThermoValue {
  const o: Record<string | symbol, unknown> = { ...fields };
  const hidden: Record<string | symbol, unknown> = {
    kind: data.kind,
    toBundle: bundle,
    toText: text,
    fields: () => Object.keys(fields),
    [THERMO_DATA]: data,
  };
  for (const key of Reflect.ownKeys(hidden)) {
    Object.defineProperty(o, key, { value: hidden[key as string], enumerable: false, writable: false, configurable: false });
  }
  return Object.freeze(o) as unknown as ThermoValue;
}

export function thermoDataOf(x: unknown): ThermoData | undefined {
  return typeof x === "object" && x !== null ? ((x as Record<symbol, unknown>)[THERMO_DATA] as ThermoData | undefined) : undefined;
}

export function modelDataOf(x: unknown): ModelData | undefined {
  const d = thermoDataOf(x);
  return d?.kind === "model" ? d : undefined;
}
