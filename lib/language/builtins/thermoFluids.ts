/**
 * Substance and mixture values: databank lookups and user pseudo-components turned into language
 * values (quantity fields, a two-column display that names the source), and mixtures with their
 * mole fractions normalised (with a warning) and optional binary interaction parameters k_ij.
 */
import {
  CP_FORM_UNAVAILABLE, getSubstance, pseudoComponent, type PseudoComponentInput, type Substance,
} from "../../thermo/index.js";
import { thermoDataOf, thermoValue, type ThermoValue } from "../values/thermo.js";
import { ArgumentError } from "./bind.js";
import type { BuiltinContext } from "./define.js";
import { guard, isVectorArg } from "./thermoArgs.js";

const isMatrixLike = (x: unknown): x is { toArray(): unknown[] } =>
  typeof x === "object" && x !== null && (x as { isMatrix?: boolean }).isMatrix === true;

function cpText(s: Substance): string {
  if (s.cp.form === CP_FORM_UNAVAILABLE) return "none (give cp to get H, S, U, G totals)";
  const range = Number.isFinite(s.cp.Tmax) ? `, fitted ${s.cp.Tmin} to ${s.cp.Tmax} K` : "";
  return `${s.cp.form}; [${s.cp.coefficients.join(", ")}]${range} (${s.cp.source})`;
}

/** The substance value of a record (SI data inside, quantities shown). */
export function substanceValue(s: Substance, ctx: BuiltinContext): ThermoValue {
  const q = (x: number, dim: string) => (Number.isFinite(x) ? ctx.units.fromSI(x, dim) : "unknown");
  const fields: Record<string, unknown> = {
    name: s.name,
    formula: s.formula,
    M: ctx.units.fromSI(s.M, "g/mol"),
    Tc: q(s.Tc, "K"),
    Pc: q(s.Pc, "pressure"),
    Vc: ctx.units.fromSI(s.Vc, "cm^3/mol"),
    Zc: s.Zc,
    omega: s.omega,
    Tb: q(s.Tb, "K"),
    cp: cpText(s),
    source: s.source,
  };
  if (s.note) fields.note = s.note;
  const record = { ...fields };
  return thermoValue({ kind: "substance", substance: s }, fields, () => ctx.bundleOf(record), () => `substance ${s.name} (${s.source})`);
}

const PSEUDO_DIMS: Record<string, string> = { Tc: "temperature", Pc: "pressure", M: "molar_mass", Vc: "molar_volume", Tb: "temperature" };
const PSEUDO_KEYS = ["name", "Tc", "Pc", "omega", "M", "Vc", "Zc", "Tb", "cp", "source"];

/** A user pseudo-component from a record {name, Tc, Pc, omega, M, [Vc, Zc, Tb, cp, source]}. */
export function pseudoFromRecord(r: Record<string, unknown>, fn: string, ctx: BuiltinContext): Substance {
  for (const k of Object.keys(r)) {
    if (!PSEUDO_KEYS.includes(k)) throw new ArgumentError(`${fn}(): unknown field "${k}" in the substance record; valid fields: ${PSEUDO_KEYS.join(", ")}`);
  }
  const input: Record<string, unknown> = {};
  for (const [k, v] of Object.entries(r)) {
    if (PSEUDO_DIMS[k]) input[k] = ctx.units.toSI(v, PSEUDO_DIMS[k]!, k, fn);
    else if (k === "omega" || k === "Zc") input[k] = ctx.units.toSI(v, "dimensionless", k, fn);
    else if (k === "cp") input[k] = ctx.units.toSI(v, "molar_heat_capacity", "cp", fn);
    else input[k] = v;
  }
  for (const k of ["name", "Tc", "Pc", "omega", "M"]) {
    if (input[k] === undefined) throw new ArgumentError(`${fn}(): the substance record needs field ${k}; required: name, Tc, Pc, omega, M`);
  }
  return guard(fn, () => pseudoComponent(input as unknown as PseudoComponentInput));
}

/** A name -> databank substance, a record -> pseudo-component, a substance value -> itself. */
export function resolveSubstance(x: unknown, fn: string, ctx: BuiltinContext): ThermoValue {
  const d = thermoDataOf(x);
  if (d?.kind === "substance") return x as ThermoValue;
  if (typeof x === "string") return substanceValue(guard(fn, () => getSubstance(x)), ctx);
  if (typeof x === "object" && x !== null && !isVectorArg(x) && Object.getPrototypeOf(x) === Object.prototype) {
    return substanceValue(pseudoFromRecord(x as Record<string, unknown>, fn, ctx), ctx);
  }
  throw new ArgumentError(`argument x of ${fn}() needs a substance name like "methane" or a record {name, Tc, Pc, omega, M}, got ${ctx.textOf(x)}`);
}

function kijMatrix(kij: unknown, names: string[], fn: string, ctx: BuiltinContext): number[][] {
  const n = names.length;
  const k = names.map(() => new Array<number>(n).fill(0));
  if (isVectorArg(kij)) {
    const rows = (isMatrixLike(kij) ? kij.toArray() : (kij as unknown[])) as unknown[];
    if (rows.length !== n || rows.some((row) => !Array.isArray(row) || row.length !== n)) {
      throw new ArgumentError(`argument kij of ${fn}() must be a ${n} x ${n} matrix (components in the order ${names.join(", ")})`);
    }
    rows.forEach((row, i) => (row as unknown[]).forEach((v, j) => { k[i]![j] = ctx.units.toSI(v, "dimensionless", `kij[${i + 1}, ${j + 1}]`, fn); }));
    return k;
  }
  if (typeof kij === "object" && kij !== null) {
    for (const [key, v] of Object.entries(kij)) {
      const pair = key.split("/");
      const idx = pair.map((p) => names.findIndex((nm) => nm === guard(fn, () => getSubstance(p.trim())).id));
      if (pair.length !== 2 || idx.some((i) => i < 0)) {
        throw new ArgumentError(`argument kij of ${fn}(): key "${key}" must name two components of the mixture as "a/b" (components: ${names.join(", ")})`);
      }
      const val = ctx.units.toSI(v, "dimensionless", `kij["${key}"]`, fn);
      k[idx[0]!]![idx[1]!] = val;
      k[idx[1]!]![idx[0]!] = val;
    }
    return k;
  }
  throw new ArgumentError(`argument kij of ${fn}() needs a matrix or a record like {"methane/ethane": 0.003}, got ${ctx.textOf(kij)}`);
}

/** A mixture value from {name: fraction, ...}; fractions not summing to 1 are normalised with a warning. */
export function mixtureValue(fractions: Record<string, unknown>, kij: unknown, ctx: BuiltinContext): ThermoValue {
  const fn = "mixture";
  const entries = Object.entries(fractions);
  if (entries.length === 0) throw new ArgumentError(`argument fractions of mixture() needs at least one component, like {methane: 0.9, ethane: 0.1}`);
  const components = entries.map(([name]) => guard(fn, () => getSubstance(name), { name: "fractions" }));
  const ids = components.map((c) => c.id);
  ids.forEach((id, i) => {
    if (ids.indexOf(id) !== i) throw new ArgumentError(`argument fractions of mixture(): "${entries[i]![0]}" and "${entries[ids.indexOf(id)]![0]}" are the same substance (${id})`);
  });
  const raw = entries.map(([name, v]) => ctx.units.toSI(v, "dimensionless", `fractions.${name}`, fn));
  raw.forEach((v, i) => {
    if (!(v >= 0) || !Number.isFinite(v)) throw new ArgumentError(`argument fractions of mixture(): the fraction of ${entries[i]![0]} must be a number >= 0, got ${v}`);
  });
  const sum = raw.reduce((a, b) => a + b, 0);
  if (!(sum > 0)) throw new ArgumentError(`argument fractions of mixture(): the fractions sum to 0`);
  if (Math.abs(sum - 1) > 1e-9) ctx.warn(`mixture(): mole fractions summed to ${sum}; normalised to sum to 1`);
  const x = raw.map((v) => v / sum);
  const k = kij === undefined ? undefined : kijMatrix(kij, ids, fn, ctx);
  const M = components.reduce((a, c, i) => a + x[i]! * c.M, 0);
  const fields: Record<string, unknown> = {
    components: components.map((c) => c.id).join(", "),
    x: Object.fromEntries(ids.map((id, i) => [id, x[i]])),
    M: ctx.units.fromSI(M, "g/mol"),
  };
  if (k) fields.kij = k.map((row) => row.join(" ")).join("; ");
  fields.source = components.map((c) => `${c.id}: ${c.source}`).join("; ");
  const record = { ...fields, x: ids.map((id, i) => `${id} ${x[i]!.toPrecision(6)}`).join(", ") };
  return thermoValue(
    { kind: "mixture", components, x, ...(k ? { kij: k } : {}) },
    fields,
    () => ctx.bundleOf(record),
    () => `mixture ${ids.map((id, i) => `${id} ${x[i]!.toPrecision(4)}`).join(", ")}`,
  );
}
