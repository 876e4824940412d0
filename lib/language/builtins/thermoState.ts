/**
 * Thermodynamics built-ins, part 2: state(), departure() and change().
 * state() takes T and P (scalars, or arrays/spans for a whole curve at the cost of plain-number
 * loops) or a record of any two properties; if97() models route to IAPWS-IF97.
 */
import {
  departure as thermoDeparture, maxwellResidual, psat as thermoPsat, requireSaturationP, requireSaturationT, stateFrom,
  tsat as thermoTsat, twoPhase, type Spec,
} from "../../thermo/index.js";
import { UnitsError } from "../../units/index.js";
import { modelDataOf, type ModelData } from "../values/thermo.js";
import { ArgumentError } from "./bind.js";
import { defineBuiltin, type BuiltinContext, type BuiltinDef } from "./define.js";
import { atElement, guard, if97SaturationHint, lengthOf, noteGroups, phaseArg, pick, requireAllAbove0, siArg } from "./thermoArgs.js";
import { columnCollector, eosRowAt, fastEosColumns, notesFor, recordOf, rowOf } from "./thermoRows.js";
import { waterAt, waterDeparture, waterFromSpec, type Row } from "./water.js";

const SPEC_DIMS: Record<string, string> = {
  T: "temperature", P: "pressure", V: "molar_volume", v: "specific_volume", rho: "density",
  H: "molar_energy", h: "specific_energy", S: "molar_entropy", s: "specific_entropy",
  U: "molar_energy", u: "specific_energy", x: "dimensionless",
};

/** Keys that take the same property on another basis (molar / per mass / density), and what each means. */
const SPEC_ALTERNATIVES: Record<string, string[]> = {
  H: ["h"], h: ["H"], S: ["s"], s: ["S"], U: ["u"], u: ["U"], V: ["v", "rho"], v: ["V", "rho"], rho: ["v", "V"],
};
const SPEC_MEANING: Record<string, string> = {
  H: "a molar enthalpy", h: "a per-mass enthalpy", S: "a molar entropy", s: "a per-mass entropy",
  U: "a molar internal energy", u: "a per-mass internal energy", V: "a molar volume", v: "a per-mass (specific) volume",
  rho: "a mass density",
};

/** One spec value to SI; a wrong dimension that fits another key (H given in kJ/kg) names that key. */
function specArg(value: unknown, k: string, ctx: BuiltinContext): number | Float64Array {
  try {
    return siArg(value, SPEC_DIMS[k]!, k, "state", ctx);
  } catch (e) {
    if (!(e instanceof UnitsError) || e.code !== "wrong_dimension") throw e;
    const fits = (alt: string) => {
      try {
        siArg(value, SPEC_DIMS[alt]!, alt, "state", ctx);
        return true;
      } catch {
        return false;
      }
    };
    const alt = (SPEC_ALTERNATIVES[k] ?? []).find(fits);
    if (alt === undefined) throw e;
    throw new UnitsError("wrong_dimension", `${e.message}; use ${alt}: for ${SPEC_MEANING[alt]}`);
  }
}

/** IF97 water at (T, P) on a requested phase; at saturation the error shows the {P: .., x: 0 or 1} form. */
function waterPhaseAt(T: number, P: number, phase: string | undefined, fn: string, ctx: BuiltinContext) {
  try {
    return waterAt(T, P, fn, phase);
  } catch (e) {
    const hint = e instanceof ArgumentError ? if97SaturationHint(T, P, phase, "", ctx) : "";
    if (!hint) throw e;
    throw new ArgumentError(`${(e as Error).message}${hint}`);
  }
}

const isPlainRecord = (x: unknown): x is Record<string, unknown> =>
  typeof x === "object" && x !== null && Object.getPrototypeOf(x) === Object.prototype && modelDataOf(x) === undefined;

function dataOf(m: unknown): ModelData {
  return modelDataOf(m)!; // the registry has checked kind "model"
}

/** Runs `point` once per element of the (broadcast) inputs; scalars give a record, arrays columns. */
function evaluate(d: ModelData, inputs: Record<string, number | Float64Array>, point: (a: Record<string, number>) => Row, fn: string, ctx: BuiltinContext) {
  const n = lengthOf(fn, inputs);
  const args: Record<string, number> = {};
  if (n === undefined) return recordOf(point(pick(inputs, 0, args)), d, ctx);
  const collect = columnCollector(n);
  for (let i = 0; i < n; i++) {
    if ((i & 255) === 0 && ctx.shouldStop()) throw ctx.interrupted();
    collect.add(i, atElement(i, n, () => point(pick(inputs, i, args))));
  }
  return collect.finish(d, ctx);
}

/** A two-property spec in SI: molar keys for equations of state (v, rho, h, s, u via M). */
function specOf(d: ModelData, raw: Record<string, number>, fn: string): Spec {
  const spec: Spec = {};
  const set = (k: keyof Spec, v: number, from: string) => {
    if (spec[k] !== undefined) throw new ArgumentError(`argument spec of ${fn}(): ${from} and ${k} give the same property twice; give two different properties`);
    spec[k] = v;
  };
  for (const [k, v] of Object.entries(raw)) {
    if (k === "v") set("V", v * d.M, k);
    else if (k === "rho") set("V", d.M / v, k);
    else if (k === "h" || k === "s" || k === "u") set(k.toUpperCase() as "H", v * d.M, k);
    else if (k === "x") throw new ArgumentError(`argument spec of ${fn}(): x (vapour fraction) goes with T or P, as {T: .., x: ..} or {P: .., x: ..}`);
    else set(k as keyof Spec, v, k);
  }
  if ((spec.H !== undefined || spec.S !== undefined || spec.U !== undefined) && !d.idealGas) {
    throw new ArgumentError(`argument spec of ${fn}(): H, S and U need ideal-gas totals, and ${d.noTotals}`);
  }
  return spec;
}

/**
 * A saturated state of a pure fluid from {T, x} or {P, x}: psat(T) or tsat(P) by equal fugacity (with
 * the triple-point checks of psat()/tsat()), then the lever rule between the saturated liquid (x = 0)
 * and vapour (x = 1) on every molar property.
 */
function saturatedAt(d: ModelData, a: Record<string, number>, fn: string): Row {
  const x = a.x!;
  const other = a.T !== undefined ? "T" : a.P !== undefined ? "P" : undefined;
  if (!other) throw new ArgumentError(`argument spec of ${fn}(): x (vapour fraction) goes with T or P, as {T: .., x: ..} or {P: .., x: ..}`);
  if (!(x >= 0 && x <= 1)) throw new ArgumentError(`argument spec of ${fn}(): x (vapour fraction) must lie in 0..1 (0 saturated liquid, 1 saturated vapour), got ${x}`);
  if (d.eos!.fluid.components.length !== 1) throw new ArgumentError(`argument spec of ${fn}(): {${other}, x} needs a pure fluid; ${d.fluidText} is a mixture (its bubble and dew points differ; no flash is made here)`);
  const sat = other === "T"
    ? guard(fn, () => { requireSaturationT(d.eos!, a.T!); return thermoPsat(d.eos!, a.T!); }, { model: "m" })
    : guard(fn, () => {
      requireSaturationP(d.eos!, a.P!);
      const s = thermoTsat(d.eos!, a.P!);
      requireSaturationP(d.eos!, a.P!, s.T);
      return s;
    }, { model: "m" });
  return rowOf(d, twoPhase(d.eos!, sat, x, d.idealGas), fn);
}

function stateFromRecord(d: ModelData, record: Record<string, unknown>, ctx: BuiltinContext) {
  const fn = "state";
  const keys = Object.keys(record);
  for (const k of keys) {
    if (!SPEC_DIMS[k]) throw new ArgumentError(`argument spec of state(): unknown property "${k}"; give two of T, P, V (or v, rho), H (or h), S (or s), U (or u), or T or P with x (vapour fraction)`);
  }
  if (keys.length !== 2) throw new ArgumentError(`argument spec of state() needs exactly two properties, like {P: 10 bar, H: 5 kJ/mol}; got ${keys.length}: {${keys.join(", ")}}`);
  const inputs: Record<string, number | Float64Array> = {};
  for (const k of keys) inputs[k] = specArg(record[k], k, ctx);
  for (const k of ["T", "P", "V", "v", "rho"]) if (inputs[k] !== undefined) requireAllAbove0(fn, k, inputs[k]!, k === "T" ? "K" : k === "P" ? "Pa" : "m^3/mol");
  const point = d.id === "if97"
    ? (a: Record<string, number>) => waterFromSpec({ ...a }, fn)
    : inputs.x !== undefined
      ? (a: Record<string, number>) => saturatedAt(d, a, fn)
      : (a: Record<string, number>) => rowOf(d, guard(fn, () => stateFrom(d.eos!, specOf(d, a, fn), { idealGas: d.idealGas }), { spec: "spec" }), fn);
  return evaluate(d, inputs, point, fn, ctx);
}

const DEPARTURE_FIELDS = {
  T: "temperature", P: "pressure", V: "molar_volume", Z: "dimensionless",
  HR: "molar_energy", SR: "molar_entropy", UR: "molar_energy", GR: "molar_energy", AR: "molar_energy",
  lnphi: "dimensionless", phi: "dimensionless", AR_error: "molar_energy", SR_error: "molar_entropy", evaluations: "dimensionless",
} as const;

/**
 * departure() over scalars or spans: one record of SI numbers (bind wraps them), or one of columns; the
 * model is named and each distinct caution listed once (with its count of points when not on all).
 */
function departureRecord(d: ModelData, inputs: Record<string, number | Float64Array>, point: (a: Record<string, number>) => Row, ctx: BuiltinContext): Record<string, unknown> {
  const fn = "departure";
  const n = lengthOf(fn, inputs);
  const args: Record<string, number> = {};
  const model = `${d.label}; ${d.fluidText}`;
  if (n === undefined) return { ...point(pick(inputs, 0, args)), model };
  const rows: Row[] = [];
  const notes = noteGroups();
  for (let i = 0; i < n; i++) {
    if ((i & 255) === 0 && ctx.shouldStop()) throw ctx.interrupted();
    const r = atElement(i, n, () => point(pick(inputs, i, args)));
    rows.push(r);
    notes.add(typeof r.notes === "string" ? r.notes.split("; ") : undefined);
  }
  const out: Record<string, unknown> = {};
  for (const [k, dim] of Object.entries(DEPARTURE_FIELDS)) {
    if (typeof rows[0]![k] === "number") out[k] = ctx.column(Float64Array.from(rows, (r) => r[k] as number), dim);
    if (k === "V") out.phase = rows.map((r) => r.phase);
  }
  out.route = rows[0]!.route;
  out.model = model;
  const texts = notes.texts(n);
  if (texts.length > 0) out.notes = texts.join("; ");
  return out;
}

const CHANGE = {
  T: "temperature", P: "pressure", V: "molar_volume", H: "molar_energy", S: "molar_entropy", U: "molar_energy", G: "molar_energy", A: "molar_energy",
  // Per mass, where the states carry them (molar mass known): dv, dh, ds, du, dg, da.
  v: "specific_volume", h: "specific_energy", s: "specific_entropy", u: "specific_energy", g: "specific_energy", a: "specific_energy",
} as const;

export const thermoState: BuiltinDef[] = [
  defineBuiltin({
    name: "state",
    group: "thermo",
    params: [
      { name: "m", type: "model", doc: 'a model: pr("propane"), if97(), ...' },
      { name: "T", type: "any", doc: "temperature (or a span of them), or a record of two properties like {P: 10 bar, H: 5 kJ/mol}" },
      { name: "P", type: "any", optional: true, doc: "pressure (or a span of them)" },
      { name: "phase", type: "any", optional: true, doc: '"stable" (default, lowest Gibbs energy), "liquid" or "vapor" root, as text or as a record {phase: "liquid"}' },
    ],
    returns: "record",
    doc: "The state of a fluid: T, P, phase, V, v, rho, Z, totals H, S, U, G, A (molar, vs the stated reference) and h, s, u, g, a (per mass), departures HR, SR, UR, GR, AR, phi, lnphi, f (fugacity), Cp, Cv, cp, cv, w (speed of sound), x (vapour fraction) when two-phase, the model, reference and cautions. Read fields as s.H, s.Z ...; spans give columns. A saturated or two-phase state of a pure fluid: state(m, {T: .., x: ..}) or {P: .., x: ..} (x = 0 saturated liquid, 1 saturated vapour).",
    method: "Equation of state: volume root chosen by lowest Gibbs energy (or as asked), closed-form departures, ideal-gas Cp integrals; Cp, Cv and w from P-V-T derivatives. Two-property specs solved by Brent's method on the model (two-phase by the lever rule below Tc). if97(): IAPWS-IF97 regions and backward equations.",
    source: "lib/thermo (models, departures, IF97); each model's display names its published source",
    examples: ['state(pr("propane"), 350 K, 10 bar)', 'state(pr("propane"), 300 K, 20 bar, "liquid").rho', 'state(pr("propane"), {T: 300 K, x: 0.4}).H', 'state(srk("methane"), span(200 K, 300 K, 3), 50 bar).Z', 'state(pr("propane"), {P: 10 bar, H: 15 kJ/mol}).T', "state(if97(), {P: 10 bar, x: 0.5}).h"],
    impl: ({ m, T, P, phase }, ctx) => {
      const d = dataOf(m);
      const ph = phaseArg(phase, "state", ctx);
      if (isPlainRecord(T)) {
        if (P !== undefined || phase !== undefined) throw new ArgumentError("state(m, {..}) takes the two properties in one record; remove the arguments after it");
        return stateFromRecord(d, T, ctx);
      }
      if (P === undefined) throw new ArgumentError("state() is missing argument P (pressure); use state(m, T, P) or state(m, {two properties})");
      const inputs = { T: siArg(T, "temperature", "T", "state", ctx), P: siArg(P, "pressure", "P", "state", ctx) };
      requireAllAbove0("state", "T", inputs.T, "K");
      requireAllAbove0("state", "P", inputs.P, "Pa");
      const n = d.id === "if97" ? undefined : lengthOf("state", inputs);
      const fast = n === undefined ? undefined : fastEosColumns(d, inputs.T, inputs.P, n, ph, "state", ctx);
      if (fast) return fast;
      const point = d.id === "if97"
        ? (a: Record<string, number>) => waterPhaseAt(a.T!, a.P!, ph, "state", ctx)
        : (a: Record<string, number>) => eosRowAt(d, a.T!, a.P!, ph, "state");
      return evaluate(d, inputs, point, "state", ctx);
    },
  }),
  defineBuiltin({
    name: "departure",
    group: "thermo",
    params: [
      { name: "m", type: "model", doc: "an equation-of-state model" },
      { name: "T", type: "quantity", doc: "temperature (or a span of them)" },
      { name: "P", type: "quantity", doc: "pressure (or a span of them)" },
      { name: "options", type: "any", optional: true, doc: '{route: "closed" | "integrate", phase: "stable" | "liquid" | "vapor", rel: 1e-10}, or the phase alone as text ("liquid")' },
    ],
    returns: "record",
    fields: DEPARTURE_FIELDS,
    doc: "Departure (residual) functions at T, P: HR, SR, UR, GR, AR, lnphi, phi, Z, V, with the model that produced them and the same cautions as state(). route \"integrate\" computes them by integrating the Maxwell relation from V = infinity using only P(T, V), and reports its quadrature error estimates, so you can see it agree with the closed form.",
    method: "closed: the model's closed forms. integrate: A^R and S^R as integrals over density of the residual pressure and its T-derivative (adaptive Gauss-Kronrod), then H^R, U^R, G^R, ln phi.",
    source: "lib/thermo/departure (closed forms per model; numerical Maxwell route)",
    examples: ['departure(pr("propane"), 350 K, 10 bar)', 'departure(pr("propane"), 350 K, 10 bar, {route: "integrate"}).HR', 'departure(pr("propane"), 300 K, 20 bar, "liquid").HR'],
    impl: ({ m, T, P, options }, ctx) => {
      const d = dataOf(m);
      const fn = "departure";
      const o = (typeof options === "object" && options !== null ? options : {}) as Record<string, unknown>;
      const phase = phaseArg(options, fn, ctx, ["route", "rel"]) ?? "stable";
      const inputs = { T: siArg(T, "temperature", "T", fn, ctx), P: siArg(P, "pressure", "P", fn, ctx) };
      requireAllAbove0(fn, "T", inputs.T, "K");
      requireAllAbove0(fn, "P", inputs.P, "Pa");
      const route = o.route ?? "closed";
      if (route !== "closed" && route !== "integrate") throw new ArgumentError(`option route of departure() must be "closed" or "integrate", got ${ctx.textOf(route)}`);
      const rel = o.rel === undefined ? undefined : ctx.units.toSI(o.rel, "dimensionless", "rel", fn);
      const point = (a: Record<string, number>): Row => {
        if (d.id === "if97") return waterDeparture(a.T!, a.P!, { ...o, phase }, fn);
        const closed = guard(fn, () => thermoDeparture(d.eos!, a.T!, a.P!, { phase, route: "closed" }));
        const base = { T: a.T!, P: a.P!, V: closed.V, phase: closed.phase, route: route as string };
        const notes = notesFor(d, a.T!, a.P!, closed.phase, closed.flags, undefined, false);
        const tail: Row = notes.length > 0 ? { notes: notes.join("; ") } : {};
        if (route === "closed") {
          const { Z, HR, SR, UR, GR, AR, lnphi } = closed;
          return { ...base, Z, HR, SR, UR, GR, AR, lnphi, phi: Math.exp(lnphi), ...tail };
        }
        const r = guard(fn, () => maxwellResidual(d.eos!, a.T!, closed.V, { rel, shouldStop: ctx.shouldStop }));
        return {
          ...base, Z: r.Z, HR: r.HR, SR: r.SR, UR: r.UR, GR: r.GR, AR: r.AR, lnphi: r.lnphi, phi: Math.exp(r.lnphi),
          AR_error: r.errors.AR, SR_error: r.errors.SR, evaluations: r.evaluations, ...tail,
        };
      };
      return departureRecord(d, inputs, point, ctx);
    },
  }),
  defineBuiltin({
    name: "change",
    group: "thermo",
    params: [
      { name: "s1", type: "record", doc: "the first state (from state())" },
      { name: "s2", type: "record", doc: "the second state, same model, fluid and reference" },
    ],
    returns: "record",
    doc: "Property changes from s1 to s2: dT, dP, dV, dH, dS, dU, dG, dA (molar) and dv, dh, ds, du, dg, da (per mass, where the molar mass is known). Both states must come from the same model, fluid and reference state; spans give columns.",
    method: "Differences of the state records' values (s2 - s1); the reference state cancels.",
    examples: ['m = pr("propane"); change(state(m, 300 K, 1 bar), state(m, 400 K, 10 bar)).dH'],
    impl: ({ s1, s2 }, ctx) => {
      for (const [name, s] of [["s1", s1], ["s2", s2]] as const) {
        if (typeof s.model !== "string" || s.T === undefined || s.P === undefined) {
          throw new ArgumentError(`argument ${name} of change() needs a state record from state(), got ${ctx.textOf(s)}`);
        }
      }
      if (s1.model !== s2.model) throw new ArgumentError(`argument s2 of change(): the states come from different models or fluids: "${s1.model}" and "${s2.model}"`);
      if (s1.reference !== s2.reference) throw new ArgumentError(`argument s2 of change(): the states have different reference states: "${s1.reference}" and "${s2.reference}"`);
      const out: Record<string, unknown> = {};
      for (const [k, dim] of Object.entries(CHANGE)) {
        if (s1[k] === undefined || s2[k] === undefined) continue;
        const a = siArg(s1[k], dim, `s1.${k}`, "change", ctx);
        const b = siArg(s2[k], dim, `s2.${k}`, "change", ctx);
        const n = lengthOf("change", { s1: a, s2: b });
        if (n === undefined) out[`d${k}`] = ctx.units.fromSI((b as number) - (a as number), dim);
        else {
          const diff = new Float64Array(n);
          for (let i = 0; i < n; i++) diff[i] = (typeof b === "number" ? b : b[i]!) - (typeof a === "number" ? a : a[i]!);
          out[`d${k}`] = ctx.column(diff, dim);
        }
      }
      out.model = s1.model;
      return out;
    },
  }),
];

