/**
 * Argument plumbing shared by the thermodynamics built-ins: thermo errors turned into errors that
 * name the user's argument and function, fluids from names / substances / mixtures, quantities or
 * arrays of quantities to SI numbers (once per array), and the broadcast loop of vectorised calls.
 */
import { if97Tsat, kelvinText, pressureText, ThermoError, volumeText, WATER_P_CRIT_MPA, type Fluid } from "../../thermo/index.js";
import { isQuantityColumn } from "../values/column.js";
import { thermoDataOf } from "../values/thermo.js";
import { ArgumentError } from "./bind.js";
import type { BuiltinContext } from "./define.js";

/** Runs f; a ThermoError becomes an ArgumentError "argument X of fn(): ..." (the session adds the caret). */
export function guard<T>(fn: string, f: () => T, rename: Record<string, string> = {}): T {
  try {
    return f();
  } catch (e) {
    if (e instanceof ThermoError) {
      const arg = rename[e.argument] ?? e.argument;
      throw new ArgumentError(`argument ${arg} of ${fn}(): ${e.message}`);
    }
    throw e;
  }
}

const isUnitLike = (x: unknown) => typeof x === "object" && x !== null && (x as { isUnit?: boolean }).isUnit === true;
const isMatrixLike = (x: unknown): x is { toArray(): unknown[] } =>
  typeof x === "object" && x !== null && (x as { isMatrix?: boolean }).isMatrix === true;

/** True for arrays, matrices and columns (a vectorised argument). */
export function isVectorArg(x: unknown): boolean {
  return Array.isArray(x) || isMatrixLike(x);
}

/** One quantity -> SI number, or an array/column of them -> Float64Array (columns read without copying). */
export function siArg(value: unknown, dim: string, name: string, fn: string, ctx: BuiltinContext): number | Float64Array {
  if (value === undefined) throw new ArgumentError(`${fn}() is missing argument ${name} (${dim.replace(/_/g, " ")})`);
  if (isQuantityColumn(value)) {
    const si = ctx.units.siUnitOf(dim);
    if (value.siUnit === si) return value.si;
  }
  if (isVectorArg(value)) {
    const items = (isMatrixLike(value) ? value.toArray() : (value as unknown[])).flat(Infinity);
    return Float64Array.from(items, (v, i) => ctx.units.toSI(v, dim, `${name}[${i + 1}]`, fn));
  }
  if (!isUnitLike(value) && typeof value !== "number") {
    throw new ArgumentError(`argument ${name} of ${fn}() needs ${dim.replace(/_/g, " ")} quantity, got ${ctx.textOf(value)}`);
  }
  return ctx.units.toSI(value, dim, name, fn);
}

/** Common length of the array inputs (undefined when all are scalars); mismatches are errors. */
export function lengthOf(fn: string, inputs: Record<string, number | Float64Array>): number | undefined {
  let n: number | undefined;
  let first = "";
  for (const [k, v] of Object.entries(inputs)) {
    if (typeof v === "number") continue;
    if (n === undefined) [n, first] = [v.length, k];
    else if (v.length !== n) throw new ArgumentError(`${fn}(): array arguments must have the same length; ${first} has ${n}, ${k} has ${v.length}`);
  }
  return n;
}

/** Element i of every input (scalars repeat), into `into`. */
export function pick(inputs: Record<string, number | Float64Array>, i: number, into: Record<string, number>): Record<string, number> {
  for (const k in inputs) {
    const v = inputs[k]!;
    into[k] = typeof v === "number" ? v : v[i]!;
  }
  return into;
}

/** Requires a finite absolute temperature, pressure or volume above zero, naming the argument. */
export function requireAbove0(fn: string, name: string, value: number, unit: "K" | "Pa" | "m^3/mol"): void {
  if (!(value > 0) || !Number.isFinite(value)) {
    const what = unit === "K" ? "0 K (absolute temperature)" : unit === "Pa" ? "0 Pa (absolute pressure)" : "0 m^3/mol";
    const got = !Number.isFinite(value) ? String(value) : unit === "K" ? kelvinText(value) : unit === "Pa" ? pressureText(value) : volumeText(value);
    throw new ArgumentError(`argument ${name} of ${fn}() must be above ${what}${Number.isFinite(value) ? "" : " and finite"}, got ${got}`);
  }
}

/**
 * The phase argument in either form every thermo built-in accepts: a positional string ("liquid") or an
 * options record ({phase: "liquid"}); "vapour" is read as "vapor". Undefined -> undefined (stable).
 * `allowed` lists other option keys the record may carry (departure's route and rel).
 */
export function phaseArg(value: unknown, fn: string, ctx: BuiltinContext, allowed: readonly string[] = []): "stable" | "liquid" | "vapor" | undefined {
  let v = value;
  if (typeof value === "object" && value !== null && !isVectorArg(value) && !isUnitLike(value) && thermoDataOf(value) === undefined) {
    const o = value as Record<string, unknown>;
    for (const k of Object.keys(o)) {
      if (k !== "phase" && !allowed.includes(k)) throw new ArgumentError(`option "${k}" of ${fn}() is not known; valid options: ${["phase", ...allowed].join(", ")}`);
    }
    v = o.phase;
  }
  if (v === undefined) return undefined;
  if (v === "vapour") return "vapor";
  if (v === "stable" || v === "liquid" || v === "vapor") return v;
  throw new ArgumentError(`argument phase of ${fn}() must be "stable", "liquid" or "vapor" (as text, or as a record {phase: "liquid"}), got ${ctx.textOf(v)}`);
}

/**
 * Distinct notes of the points of a call, once each: a note on every point as is, one on some with
 * "(k of n points)". Notes that differ only in their numbers count as one (the first one is shown).
 */
export function noteGroups() {
  const groups = new Map<string, { text: string; count: number }>();
  return {
    add(notes: readonly string[] | undefined): void {
      if (!notes) return;
      for (const text of notes) {
        const key = text.replace(/[-+]?\d[\d.]*(e[-+]?\d+)?/g, "#");
        const g = groups.get(key);
        if (g) g.count++;
        else groups.set(key, { text, count: 1 });
      }
    },
    texts(n: number): string[] {
      return [...groups.values()].map((g) => (g.count >= n ? g.text : `${g.text} (${g.count} of ${n} points${/\d/.test(g.text) ? ", first shown" : ""})`));
    },
  };
}

/**
 * A property built-in over scalars or arrays (spans, columns) with its cautions: inputs are converted
 * once (siArg), `point` gives the SI value and the notes of one point; the result is a quantity or a
 * column of `dim`, and each distinct note is shown once as a warning naming the call.
 */
export function propertyCall(
  fn: string,
  inputs: Record<string, number | Float64Array>,
  dim: string,
  point: (a: Record<string, number>) => { value: number; notes?: readonly string[] },
  ctx: BuiltinContext,
): unknown {
  const n = lengthOf(fn, inputs);
  const args: Record<string, number> = {};
  const notes = noteGroups();
  let out: unknown;
  if (n === undefined) {
    const r = point(pick(inputs, 0, args));
    notes.add(r.notes);
    out = ctx.units.fromSI(r.value, dim);
  } else {
    const values = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      if ((i & 255) === 0 && ctx.shouldStop()) throw ctx.interrupted();
      const r = atElement(i, n, () => point(pick(inputs, i, args)));
      values[i] = r.value;
      notes.add(r.notes);
    }
    out = ctx.column(values, dim);
  }
  for (const t of notes.texts(n ?? 1)) ctx.warn(`${fn}(): ${t}`);
  return out;
}

/** The same check over a vector input: reports the first bad element with its 1-based index. */
export function requireAllAbove0(fn: string, name: string, v: number | Float64Array, unit: "K" | "Pa" | "m^3/mol"): void {
  if (typeof v === "number") return requireAbove0(fn, name, v, unit);
  for (let i = 0; i < v.length; i++) if (!(v[i]! > 0) || !Number.isFinite(v[i]!)) requireAbove0(fn, `${name}[${i + 1}]`, v[i]!, unit);
}

/** A Fluid from what a model call accepts; `resolve` turns a name or record into a substance value's data. */
export function fluidOf(x: unknown, fn: string, ctx: BuiltinContext, resolve: (x: unknown) => unknown): Fluid {
  const value = typeof x === "string" || (typeof x === "object" && x !== null && thermoDataOf(x) === undefined && !isVectorArg(x) && !isUnitLike(x))
    ? resolve(x)
    : x;
  const d = thermoDataOf(value);
  if (d?.kind === "substance") return { components: [d.substance], x: [1] };
  if (d?.kind === "mixture") return { components: d.components, x: d.x, ...(d.kij ? { kij: d.kij } : {}) };
  throw new ArgumentError(`argument x of ${fn}() needs a substance name like "methane", a substance(...) or a mixture(...), got ${ctx.textOf(x)}`);
}

/**
 * When a phase was asked of IF97 water at its saturation temperature (T = Tsat(P) to 1e-5 relative,
 * what a typed or computed Tsat carries), the text that shows how to ask for the saturated liquid or
 * vapour instead (`field` appended, e.g. ".V"); "" otherwise. IF97 gives only the stable phase, and
 * at Tsat itself rounding decides which side of the line a state falls on.
 */
export function if97SaturationHint(T: number, P: number, phase: string | undefined, field: string, ctx: BuiltinContext): string {
  if ((phase !== "liquid" && phase !== "vapor") || !(P > 0 && P < WATER_P_CRIT_MPA * 1e6)) return "";
  let Ts: number;
  try {
    Ts = if97Tsat(P);
  } catch {
    return "";
  }
  if (!(Math.abs(T / Ts - 1) < 1e-5)) return "";
  const p = ctx.units.formatQuantity(ctx.units.fromSI(P, "pressure"));
  const which = phase === "liquid" ? "liquid" : "vapour";
  return `. T is the saturation temperature at this pressure (Tsat = ${Number(Ts.toPrecision(7))} K): for saturated ${which} use state(if97(), {P: ${p}, x: ${phase === "liquid" ? 0 : 1}})${field}`;
}

/** Runs point i of a vectorised call; an ArgumentError gains which element it came from. */
export function atElement<T>(i: number, n: number, f: () => T): T {
  try {
    return f();
  } catch (e) {
    if (e instanceof ArgumentError) throw new ArgumentError(`${e.message} (at element ${i + 1} of ${n})`);
    throw e;
  }
}
