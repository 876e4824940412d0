/**
 * State records: one SI row per state (from an equation of state or from IF97), then either one
 * record of quantities (scalar call) or one record of compact columns (vectorised call). The field
 * names and their dimensions are the product's interface (DESIGN.md section 4).
 */
import {
  PHASE_LABELS, STATE_FLAG_BITS, cubicStateColumns, heatCapacity, isPureCubic, state as thermoState, type StateFlags, type ThermoState,
} from "../../thermo/index.js";
import type { ModelData } from "../values/thermo.js";
import type { BuiltinContext } from "./define.js";
import { ArgumentError } from "./bind.js";
import { atElement, guard } from "./thermoArgs.js";
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

/** Cautions a state may carry (the same texts for scalar, general and fast vectorised paths). */
const NOTE = {
  nearCritical: "near the critical point (|T/Tc - 1| < 0.03, |P/Pc - 1| < 0.1): model errors grow here and small input changes move results a lot",
  supercritical: "supercritical (T > Tc and P > Pc)",
  metastable: "metastable root: another root at this T, P has lower Gibbs energy",
  saturation: "on the saturation line: liquid and vapour roots have equal fugacity",
  twoPhase: "two-phase (vapour fraction in x): Cp, Cv and w are undefined inside the dome",
  mixture: "mixture treated as one phase (no phase-split test was made)",
} as const;

/**
 * Notes of a state at T, P with root label `phase` and flags `f` (x: vapour fraction of a two-phase
 * state): the flags, the Cp correlation range, the model's validity range and lib/thermo's cautions
 * (triple point, P > 10 Pc). state(), departure(), volume(), zfactor(), psat() and tsat() all use it;
 * `totals: false` leaves out what concerns only ideal-gas totals (Cp range, missing Cp) and the purely
 * descriptive "supercritical", for results that use neither (Z, V, departures, saturation).
 */
export function notesFor(d: ModelData, T: number, P: number, phase: string, f: StateFlags, x?: number, totals = true): string[] {
  const notes: string[] = [];
  if (f.nearCritical) notes.push(NOTE.nearCritical);
  if (f.supercritical && totals) notes.push(NOTE.supercritical);
  if (f.metastable) notes.push(NOTE.metastable);
  if (f.twoPhase && x === undefined) notes.push(NOTE.saturation);
  if (x !== undefined) notes.push(NOTE.twoPhase);
  if (f.mixtureSinglePhase) notes.push(NOTE.mixture);
  if (d.noTotals && totals) notes.push(d.noTotals);
  if (d.idealGas && totals) notes.push(...d.idealGas.warnings(T));
  if (d.validity) notes.push(...d.validity(T, P));
  if (d.cautions) notes.push(...d.cautions(T, P, phase));
  return notes;
}

function notesOf(d: ModelData, s: ThermoState): string[] {
  return notesFor(d, s.T, s.P, s.phase, s.flags, s.x);
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
 * ctx.column with the display unit chosen from the largest finite magnitude found by an indexed loop
 * (the choice displayUnitFor makes from the whole column, which it reaches through an iterator: about
 * ten times slower over the thirty columns of a 10,000-point state).
 */
function columnOf(si: Float64Array, dim: string, ctx: BuiltinContext) {
  let big = 0;
  for (let i = 0; i < si.length; i++) {
    const v = si[i]!;
    if (v === v && v !== Infinity && v !== -Infinity && Math.abs(v) > big) big = Math.abs(v);
  }
  return ctx.column(si, dim, ctx.units.displayUnitFor(Float64Array.of(big), dim));
}

/**
 * Collects the rows of a vectorised call straight into typed columns (no array of row objects), then
 * builds a record of columns (numbers) and an array (phase); distinct notes are listed once with counts.
 * `column`, `phaseAt` and `note` fill it without rows (the fast path of stateColumns.ts).
 */
export function columnCollector(n: number) {
  const cols: Record<string, Float64Array> = {};
  const phase = new Array<string>(n);
  // Notes that differ only in their numbers (Tr = 0.71, 0.72 ...) are one caution: shown once, first instance.
  const groups = new Map<string, { text: string; count: number }>();
  const keyOf = new Map<string, string>();
  let last: { text: string; count: number } | undefined;
  let lastText = "";
  const note = (text: string): void => {
    // The same caution on consecutive points (the common case of a span) skips the lookups.
    if (last !== undefined && text === lastText) {
      last.count++;
      return;
    }
    let key = keyOf.get(text);
    if (key === undefined) keyOf.set(text, (key = text.replace(/[-+]?\d[\d.]*(e[-+]?\d+)?/g, "#")));
    let g = groups.get(key);
    if (g) g.count++;
    else groups.set(key, (g = { text, count: 1 }));
    last = g;
    lastText = text;
  };
  return {
    add(i: number, row: Row): void {
      for (let k = 0; k < NUMERIC.length; k++) {
        const key = NUMERIC[k]!;
        const v = row[key];
        if (typeof v === "number") (cols[key] ??= new Float64Array(n).fill(NaN))[i] = v;
      }
      phase[i] = String(row.phase ?? "");
      if (typeof row.notes !== "string") return;
      for (const t of row.notes.split("; ")) note(t);
    },
    /** A whole numeric column of SI values (field of STATE_FIELDS). */
    column(key: string, values: Float64Array): void {
      cols[key] = values;
    },
    phaseAt(i: number, label: string): void {
      phase[i] = label;
    },
    note,
    finish(d: ModelData, ctx: BuiltinContext): Record<string, unknown> {
      const out: Record<string, unknown> = {};
      for (const k of ORDER) {
        if (k === "phase") out.phase = phase;
        else if (cols[k]) out[k] = columnOf(cols[k]!, STATE_FIELDS[k]!, ctx);
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

/**
 * Fast path of a vectorised state(m, T, P) for a pure fluid by a cubic model: lib/thermo's
 * cubicStateColumns fills the columns (no row per point), then per-mass values, phi and f follow by
 * the same arithmetic as rowOf, and notes by the same texts and grouping. Returns undefined when the
 * model is not a pure cubic, or when a point needs the general path (which then names the error).
 */
export function fastEosColumns(d: ModelData, T: Float64Array | number, P: Float64Array | number, n: number, phase: string | undefined, fn: string, ctx: BuiltinContext): Record<string, unknown> | undefined {
  const eos = d.eos;
  if (!eos || !isPureCubic(eos)) return undefined;
  const c = cubicStateColumns(eos, T, P, n, { phase: (phase ?? "stable") as "stable", idealGas: d.idealGas, M: d.M, shouldStop: ctx.shouldStop });
  if (c.interrupted) throw ctx.interrupted();
  const at = (x: Float64Array | number, i: number) => (typeof x === "number" ? x : x[i]!);
  if (c.stoppedAt >= 0) {
    const i = c.stoppedAt;
    atElement(i, n, () => eosRowAt(d, at(T, i), at(P, i), phase, fn)); // throws the general path's error
    return undefined; // the general path accepts the point: let it do the whole call
  }
  const M = d.M;
  const col = columnCollector(n);
  const f64 = () => new Float64Array(n);
  const Tcol = typeof T === "number" ? f64().fill(T) : T.slice();
  const Pcol = typeof P === "number" ? f64().fill(P) : P.slice();
  const [v, rho, phi, f] = [f64(), f64(), f64(), f64()];
  // rowOf's arithmetic, one plain loop (a callback per column would be a megamorphic call per element).
  for (let i = 0; i < n; i++) {
    const V = c.V[i]!;
    v[i] = V / M;
    rho[i] = M / V;
    phi[i] = Math.exp(c.lnphi[i]!);
    f[i] = phi[i]! * Pcol[i]!;
  }
  const set: Record<string, Float64Array> = {
    T: Tcol, P: Pcol, V: c.V, v, rho, Z: c.Z, HR: c.HR, SR: c.SR, UR: c.UR, GR: c.GR, AR: c.AR, phi, lnphi: c.lnphi, f,
  };
  if (c.totals) {
    const t = c.totals;
    Object.assign(set, { H: t.H, S: t.S, U: t.U, G: t.G, A: t.A, Cp: t.Cp, Cv: t.Cv, w: t.w });
    for (const k of ["H", "S", "U", "G", "A", "Cp", "Cv"] as const) {
      const src = t[k];
      const dst = f64();
      for (let i = 0; i < n; i++) dst[i] = src[i]! / M;
      set[k.toLowerCase()] = dst;
    }
  }
  for (const k in set) col.column(k, set[k]!);
  const labels = PHASE_LABELS;
  const warnings = d.idealGas ? d.idealGas.warnings : undefined;
  for (let i = 0; i < n; i++) {
    col.phaseAt(i, labels[c.phase[i]!]!);
    // Notes in notesOf's order.
    const fl = c.flags[i]!;
    if (fl !== 0) {
      if (fl & STATE_FLAG_BITS.nearCritical) col.note(NOTE.nearCritical);
      if (fl & STATE_FLAG_BITS.supercritical) col.note(NOTE.supercritical);
      if (fl & STATE_FLAG_BITS.metastable) col.note(NOTE.metastable);
      if (fl & STATE_FLAG_BITS.twoPhase) col.note(NOTE.saturation);
    }
    if (d.noTotals) col.note(d.noTotals);
    if (warnings) {
      const ws = warnings(Tcol[i]!);
      for (let j = 0; j < ws.length; j++) col.note(ws[j]!);
    }
    if (d.validity) {
      const ws = d.validity(Tcol[i]!, Pcol[i]!);
      for (let j = 0; j < ws.length; j++) col.note(ws[j]!);
    }
    if (d.cautions) {
      const ws = d.cautions(Tcol[i]!, Pcol[i]!, labels[c.phase[i]!]!);
      for (let j = 0; j < ws.length; j++) col.note(ws[j]!);
    }
  }
  return col.finish(d, ctx);
}

/** Rows -> a record of columns (see columnCollector). */
export function columnsOf(rows: Row[], d: ModelData, ctx: BuiltinContext): Record<string, unknown> {
  const c = columnCollector(rows.length);
  rows.forEach((r, i) => c.add(i, r));
  return c.finish(d, ctx);
}
