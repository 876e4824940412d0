/**
 * User-defined pseudo-components (petroleum fractions, fluids missing from the databank).
 *
 * Required: name, Tc (K), Pc (Pa), omega, M (kg/mol). Optional fields are filled as follows, and the
 * record's `note` says which were filled:
 * - Zc: Pitzer-type correlation Zc = 0.291 - 0.080 omega (Reid, Prausnitz & Poling, The Properties of
 *   Gases and Liquids, 4th ed. (1987), Sec. 2-3 (from memory)); typical error 2-5 % for non-polar fluids.
 * - Vc: from Zc, Vc = Zc R Tc / Pc.
 * - Tb: Edmister (1958) vapour-pressure line log10(P/Pc) = (7/3)(1 + omega)(1 - Tc/T) solved at
 *   P = 101325 Pa; a rough estimate (several K). NaN when Pc <= 101325 Pa.
 * - cp: never guessed. Absent -> the record carries an "unavailable" correlation, and any ideal-gas
 *   total (H, S, U, G) asked of it throws an error naming the missing field. A number is taken as a
 *   constant Cp in J/(mol K).
 */
import { P_ATM, R } from "../constants.js";
import { ThermoError } from "../errors.js";
import { CP_FORMS, CP_FORM_R_QUADRATIC_INVERSE } from "./record.js";
import type { CpCorrelation, Substance } from "./types.js";

/** Form string of the placeholder correlation of a pseudo-component given without cp. */
export const CP_FORM_UNAVAILABLE = "unavailable";

export interface PseudoComponentInput {
  name: string;
  /** K */
  Tc: number;
  /** Pa */
  Pc: number;
  omega: number;
  /** kg/mol */
  M: number;
  /** m^3/mol */
  Vc?: number;
  Zc?: number;
  /** K */
  Tb?: number;
  /** A correlation, or a constant Cp in J/(mol K). */
  cp?: CpCorrelation | number;
  source?: string;
}

function checkRange(argument: string, value: unknown, lo: number, hi: number, unit: string): number {
  if (typeof value !== "number" || !Number.isFinite(value) || value <= lo || value > hi) {
    throw new ThermoError(
      argument,
      `pseudo-component field ${argument} must be a number in (${lo}, ${hi}] ${unit}; got ${String(value)}`,
    );
  }
  return value;
}

function checkCp(cp: CpCorrelation | number): CpCorrelation {
  if (typeof cp === "number") {
    checkRange("cp", cp, 0, 5000, "J/(mol K) (a constant ideal-gas Cp)");
    return {
      form: CP_FORM_R_QUADRATIC_INVERSE,
      coefficients: [cp / R, 0, 0, 0],
      Tmin: 0,
      Tmax: Infinity,
      source: "user-given constant Cp",
    };
  }
  if (!CP_FORMS.includes(cp.form)) {
    throw new ThermoError("cp", `cp.form must be one of ${CP_FORMS.map((f) => `"${f}"`).join(", ")}; got "${cp.form}"`);
  }
  if (!Array.isArray(cp.coefficients) || cp.coefficients.length !== 4 || !cp.coefficients.every(Number.isFinite)) {
    throw new ThermoError("cp", `cp.coefficients must be 4 finite numbers [A, B, C, D]; got ${JSON.stringify(cp.coefficients)}`);
  }
  if (!(cp.Tmin >= 0 && cp.Tmax > cp.Tmin)) {
    throw new ThermoError("cp", `cp needs 0 <= Tmin < Tmax (K); got Tmin = ${cp.Tmin}, Tmax = ${cp.Tmax}`);
  }
  return { ...cp, source: cp.source ?? "user-given" };
}

/** Validates a user pseudo-component and fills the missing optional fields (see module comment). */
export function pseudoComponent(input: PseudoComponentInput): Substance {
  if (typeof input !== "object" || input === null) {
    throw new ThermoError("substance", "a pseudo-component needs a record {name, Tc, Pc, omega, M}");
  }
  if (typeof input.name !== "string" || input.name.trim() === "") {
    throw new ThermoError("name", `pseudo-component field name must be a non-empty string; got ${JSON.stringify(input.name)}`);
  }
  const Tc = checkRange("Tc", input.Tc, 0, 2000, "K");
  const Pc = checkRange("Pc", input.Pc, 0, 1e8, "Pa");
  const omega = checkRange("omega", input.omega, -1, 2, "(dimensionless)");
  const M = checkRange("M", input.M, 0, 5, "kg/mol");
  const filled: string[] = [];

  let Zc: number;
  let Vc: number;
  if (input.Vc !== undefined) {
    Vc = checkRange("Vc", input.Vc, 0, 0.01, "m^3/mol");
    if (input.Zc !== undefined) Zc = checkRange("Zc", input.Zc, 0.1, 0.5, "(dimensionless)");
    else {
      Zc = (Pc * Vc) / (R * Tc);
      filled.push("Zc = Pc Vc / (R Tc)");
    }
  } else {
    if (input.Zc !== undefined) Zc = checkRange("Zc", input.Zc, 0.1, 0.5, "(dimensionless)");
    else {
      Zc = 0.291 - 0.08 * omega;
      filled.push("Zc = 0.291 - 0.080 omega (Pitzer-type correlation)");
    }
    Vc = (Zc * R * Tc) / Pc;
    filled.push("Vc = Zc R Tc / Pc");
  }

  let Tb: number;
  if (input.Tb !== undefined) {
    Tb = checkRange("Tb", input.Tb, 0, Tc, "K (must be below Tc)");
  } else if (Pc > P_ATM) {
    Tb = Tc / (1 - (3 * Math.log10(P_ATM / Pc)) / (7 * (1 + omega)));
    filled.push("Tb from the Edmister vapour-pressure line at 101325 Pa");
  } else {
    Tb = NaN;
    filled.push("Tb unknown (Pc <= 1 atm)");
  }

  let cp: CpCorrelation;
  if (input.cp !== undefined) cp = checkCp(input.cp);
  else {
    cp = { form: CP_FORM_UNAVAILABLE, coefficients: [], Tmin: 0, Tmax: 0, source: "none given" };
    filled.push("no ideal-gas Cp: totals H, S, U, G unavailable until cp is given");
  }

  const record: Substance = {
    id: input.name.trim().toLowerCase(),
    name: input.name.trim(),
    formula: "",
    aliases: [],
    M,
    Tc,
    Pc,
    Vc,
    Zc,
    omega,
    Tb,
    cp,
    source: input.source ?? "user-defined pseudo-component",
    user: true,
  };
  if (filled.length > 0) record.note = `filled: ${filled.join("; ")}`;
  return record;
}
