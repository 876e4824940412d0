/**
 * State records: one SI row per state (from an equation of state or from IF97), then either one
 * record of quantities (scalar call) or one record of compact columns (vectorised call). The field
 * names and their dimensions are the product's interface (DESIGN.md section 4).
 */
import { heatCapacity, state as thermoState, type ThermoState } from "../../thermo/index.js";
import type { ModelData } from "../values/thermo.js";
import type { BuiltinContext } from "./define.js";
import { ArgumentError } from "./bind.js";
import { guard } from "./thermoArgs.js";
import type { Row } from "./water.js";

/** Every numeric field of a state record and its dimension, in display order. */
export const STATE_FIELDS: Readonly<Record<string, string>> = {
  T: "temperature", P: "pressure", x: "dimensionless",
  V: "molar_volume", v: "specific_volume", rho: "density", Z: "dimensionless",
  H: "molar_energy", S: "molar_entropy", U: "molar_energy", G: "molar_energy", A: "molar_energy",
  h: "specific_energy", s: "specific_entropy", u: "specific_energy", g: "specific_energy", a: "specific_energy",
  HR: "molar_energy", SR: "molar_entropy", UR: "molar_energy", GR: "molar_energy", AR: "molar_energy",
  phi: "dimensionless", lnphi: "dimensionless", f: "pressure",
  Cp: "molar_heat_capacity", Cv: "molar_heat_capacity", cp: "specific_heat_capacity", cv: "specific_heat_capacity",
  w: "velocity",
};
const ORDER = ["T", "P", "phase", ...Object.keys(STATE_FIELDS).filter((k) => k !== "T" && k !== "P")];

/** Notes from a thermo state's flags, the Cp correlation range and the model's validity range. */
function notesOf(d: ModelData, s: ThermoState): string[] {
  const notes: string[] = [];
  const f = s.flags;
  if (f.nearCritical) notes.push("near the critical point (|T/Tc - 1| < 0.03, |P/Pc - 1| < 0.1): model errors grow here and small input changes move results a lot");
  if (f.supercritical) notes.push("supercritical (T > Tc and P > Pc)");
  if (f.metastable) notes.push("metastable root: another root at this T, P has lower Gibbs energy");
  if (f.twoPhase && s.x === undefined) notes.push("on the saturation line: liquid and vapour roots have equal fugacity");
  if (s.x !== undefined) notes.push("two-phase (vapour fraction in x): Cp, Cv and w are undefined inside the dome");
  if (f.mixtureSinglePhase) notes.push("mixture treated as one phase (no phase-split test was made)");
  if (d.noTotals) notes.push(d.noTotals);
  if (d.idealGas) notes.push(...d.idealGas.warnings(s.T));
  if (d.validity) notes.push(...d.validity(s.T, s.P));
  return notes;
}

/** SI row of an equation-of-state ThermoState (adds specific values, fugacity, Cp, Cv, w). */
export function rowOf(d: ModelData, s: ThermoState, fn: string): Row {
  const M = d.M;
  const tot = s.H !== undefined;
  let Cp: number | undefined;
  let Cv: number | undefined;
  let w: number | undefined;
  if (d.idealGas) {
    if (s.x !== undefined) Cp = Cv = w = NaN;
    else {
      const hc = guard(fn, () => heatCapacity(d.eos!, s.T, s.P, s.V, d.idealGas!.Cp(s.T), M));
      [Cp, Cv, w] = [hc.Cp, hc.Cv, hc.w];
    }
  }
  const phi = Math.exp(s.lnphi);
  // One literal with every key (undefined where absent): one object shape for every point of a span.
  const row = {
    T: s.T, P: s.P, phase: s.phase as string, x: s.x,
    V: s.V, v: s.V / M, rho: M / s.V, Z: s.Z,
    H: s.H, S: s.S, U: s.U, G: s.G, A: s.A,
    h: tot ? s.H! / M : undefined, s: tot ? s.S! / M : undefined, u: tot ? s.U! / M : undefined,
    g: tot ? s.G! / M : undefined, a: tot ? s.A! / M : undefined,
    HR: s.HR, SR: s.SR, UR: s.UR, GR: s.GR, AR: s.AR, phi, lnphi: s.lnphi, f: phi * s.P,
    Cp, Cv, cp: Cp === undefined ? undefined : Cp / M, cv: Cv === undefined ? undefined : Cv / M, w,
    notes: undefined as string | undefined,
  };
  const notes = notesOf(d, s);
  if (notes.length > 0) row.notes = notes.join("; ");
  return row as unknown as Row;
}

/** State at (T, P) on the requested phase by the model's equation of state. */
export function eosRowAt(d: ModelData, T: number, P: number, phase: string | undefined, fn: string): Row {
  if (phase === "liquid" && T >= d.Tc) {
    throw new ArgumentError(`argument phase of ${fn}(): liquid root asked of a supercritical fluid at T = ${fmt(T)} K > Tc = ${fmt(d.Tc)} K (${d.fluidText}); use "stable" or a T below Tc`);
  }
  const s = guard(fn, () => thermoState(d.eos!, T, P, { phase: (phase ?? "stable") as "stable", idealGas: d.idealGas }));
  return rowOf(d, s, fn);
}

const fmt = (x: number) => Number(x.toPrecision(5)).toString();

/** Model and reference text that identify which states may be compared. */
export function identity(d: ModelData): { model: string; reference: string } {
  const reference = d.id === "if97" ? "IAPWS-IF97: saturated liquid water at the triple point, u = 0, s = 0" : d.idealGas?.reference ?? "none (no ideal-gas Cp)";
  return { model: `${d.label}; ${d.fluidText}`, reference };
}

/** One row -> a record of quantities (fields in display order; notes, model, reference last). */
export function recordOf(row: Row, d: ModelData, ctx: BuiltinContext): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const k of ORDER) {
    const v = row[k];
    if (v === undefined) continue;
    out[k] = typeof v === "number" && STATE_FIELDS[k] ? (Number.isNaN(v) ? NaN : ctx.units.fromSI(v, STATE_FIELDS[k]!)) : v;
  }
  Object.assign(out, identity(d));
  if (row.notes) out.notes = row.notes;
  return out;
}

const NUMERIC = Object.keys(STATE_FIELDS);

/**
 * Collects the rows of a vectorised call straight into typed columns (no array of row objects), then
 * builds a record of columns (numbers) and an array (phase); distinct notes are listed once with counts.
 */
export function columnCollector(n: number) {
  const cols: Record<string, Float64Array> = {};
  const phase = new Array<string>(n);
  // Notes that differ only in their numbers (Tr = 0.71, 0.72 ...) are one caution: shown once, first instance.
  const groups = new Map<string, { text: string; count: number }>();
  const keyOf = new Map<string, string>();
  return {
    add(i: number, row: Row): void {
      for (let k = 0; k < NUMERIC.length; k++) {
        const key = NUMERIC[k]!;
        const v = row[key];
        if (typeof v === "number") (cols[key] ??= new Float64Array(n).fill(NaN))[i] = v;
      }
      phase[i] = String(row.phase ?? "");
      if (typeof row.notes !== "string") return;
      for (const note of row.notes.split("; ")) {
        let key = keyOf.get(note);
        if (key === undefined) keyOf.set(note, (key = note.replace(/[-+]?\d[\d.]*(e[-+]?\d+)?/g, "#")));
        const g = groups.get(key);
        if (g) g.count++;
        else groups.set(key, { text: note, count: 1 });
      }
    },
    finish(d: ModelData, ctx: BuiltinContext): Record<string, unknown> {
      const out: Record<string, unknown> = {};
      for (const k of ORDER) {
        if (k === "phase") out.phase = phase;
        else if (cols[k]) out[k] = ctx.column(cols[k]!, STATE_FIELDS[k]!);
      }
      Object.assign(out, identity(d));
      if (groups.size > 0) {
        out.notes = [...groups.values()]
          .map((g) => (g.count === n ? g.text : `${g.text} (${g.count} of ${n} points${/\d/.test(g.text) ? ", first shown" : ""})`))
          .join("; ");
      }
      return out;
    },
  };
}

/** Rows -> a record of columns (see columnCollector). */
export function columnsOf(rows: Row[], d: ModelData, ctx: BuiltinContext): Record<string, unknown> {
  const c = columnCollector(rows.length);
  rows.forEach((r, i) => c.add(i, r));
  return c.finish(d, ctx);
}
