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

const KIJ_FORMS = 'a record of pairs {"methane/carbon dioxide": 0.1} (names as in the mixture, "a/b"), or a symmetric n x n matrix with zero diagonal in the order of the components';

/**
 * k_ij from the user's form: a record of "a/b" pairs, or a square matrix. {kij: ...} (the option-record
 * form) is unwrapped. Checked here, with 1-based indices and component names: square, finite, zero
 * diagonal, symmetric, so a mistake is reported at mixture() rather than later inside a model.
 */
function kijMatrix(kijIn: unknown, comps: readonly Substance[], fn: string, ctx: BuiltinContext): number[][] {
  const names = comps.map((c) => c.id);
  const n = names.length;
  const k = names.map(() => new Array<number>(n).fill(0));
  let kij = kijIn;
  if (typeof kij === "object" && kij !== null && !isVectorArg(kij) && Object.keys(kij).length === 1 && "kij" in kij) kij = (kij as { kij: unknown }).kij;
  if (isVectorArg(kij)) {
    const rows = (isMatrixLike(kij) ? kij.toArray() : (kij as unknown[])) as unknown[];
    if (rows.length !== n || rows.some((row) => !Array.isArray(row) || row.length !== n)) {
      throw new ArgumentError(`argument kij of ${fn}() must be a ${n} x ${n} matrix (components in the order ${names.join(", ")}); accepted forms: ${KIJ_FORMS}`);
    }
    rows.forEach((row, i) => (row as unknown[]).forEach((v, j) => { k[i]![j] = ctx.units.toSI(v, "dimensionless", `kij[${i + 1}, ${j + 1}]`, fn); }));
    for (let i = 0; i < n; i++) {
      if (k[i]![i] !== 0) throw new ArgumentError(`argument kij of ${fn}(): the diagonal must be 0 (a component does not interact with itself); kij[${i + 1}, ${i + 1}] (${names[i]}) = ${k[i]![i]}`);
      for (let j = i + 1; j < n; j++) {
        if (!Number.isFinite(k[i]![j]!)) throw new ArgumentError(`argument kij of ${fn}(): kij[${i + 1}, ${j + 1}] (${names[i]}/${names[j]}) must be a finite number, got ${k[i]![j]}`);
        if (k[i]![j] !== k[j]![i]) {
          throw new ArgumentError(`argument kij of ${fn}() must be symmetric: kij[${i + 1}, ${j + 1}] = ${k[i]![j]} but kij[${j + 1}, ${i + 1}] = ${k[j]![i]} (${names[i]}/${names[j]})`);
        }
      }
    }
    return k;
  }
  if (typeof kij === "object" && kij !== null && !isUnitLike(kij) && thermoDataOf(kij) === undefined) {
    for (const [key, v] of Object.entries(kij)) {
      const pair = key.split("/").map((p) => p.trim());
      const idx = pair.length === 2 ? pair.map((p) => componentIndex(p, comps)) : [];
      if (pair.length !== 2 || idx.some((i) => i < 0) || idx[0] === idx[1]) {
        throw new ArgumentError(`argument kij of ${fn}(): key "${key}" must name two different components of the mixture as "a/b" (components: ${names.join(", ")}); accepted forms: ${KIJ_FORMS}`);
      }
      const val = ctx.units.toSI(v, "dimensionless", `kij["${key}"]`, fn);
      if (!Number.isFinite(val)) throw new ArgumentError(`argument kij of ${fn}(): kij["${key}"] must be a finite number, got ${val}`);
      k[idx[0]!]![idx[1]!] = val;
      k[idx[1]!]![idx[0]!] = val;
    }
    return k;
  }
  throw new ArgumentError(`argument kij of ${fn}() needs ${KIJ_FORMS}; got ${ctx.textOf(kijIn)}`);
}

/** Index of a component named `p` (databank name, alias or formula, or a pseudo-component's name); -1 if none. */
function componentIndex(p: string, comps: readonly Substance[]): number {
  const direct = comps.findIndex((c) => c.id === p || c.name === p || c.id === p.toLowerCase());
  if (direct >= 0) return direct;
  try {
    const id = getSubstance(p).id;
    return comps.findIndex((c) => c.id === id);
  } catch {
    return -1;
  }
}

/** A mathjs matrix's own nested array (no clone). */
const matrixData = (m: { toArray(): unknown[] }): unknown[] => (m as unknown as { valueOf(): unknown[] }).valueOf();

const isUnitLike = (x: unknown) => typeof x === "object" && x !== null && (x as { isUnit?: boolean }).isUnit === true;

/**
 * The components and raw fractions of mixture()'s first argument: a record {name: fraction}, or a list of
 * [component, fraction] pairs where a component is a name or a substance value (so user pseudo-components
 * such as a C7+ cut can take part: mixture([["methane", 0.8], [substance({...}), 0.2]])).
 */
function entriesOf(fractions: unknown, fn: string, ctx: BuiltinContext): { label: string; substance: Substance; value: unknown }[] {
  if (isVectorArg(fractions)) {
    // valueOf, not toArray: toArray deep-clones the elements, which drops a substance value's hidden data.
    const items = (isMatrixLike(fractions) ? matrixData(fractions) : (fractions as unknown[])) as unknown[];
    return items.map((item, i) => {
      const pair = isMatrixLike(item) ? matrixData(item) : item;
      if (!Array.isArray(pair) || pair.length !== 2) {
        throw new ArgumentError(`argument fractions of ${fn}(): item ${i + 1} must be a pair [component, fraction] like ["methane", 0.8] or [substance({...}), 0.2], got ${ctx.textOf(item)}`);
      }
      const [c, v] = pair as [unknown, unknown];
      const d = thermoDataOf(c);
      if (d?.kind === "substance") return { label: d.substance.name, substance: d.substance, value: v };
      if (typeof c === "string") return { label: c, substance: guard(fn, () => getSubstance(c), { name: "fractions" }), value: v };
      throw new ArgumentError(`argument fractions of ${fn}(): item ${i + 1} needs a substance name or a substance(...) first, got ${ctx.textOf(c)}`);
    });
  }
  if (typeof fractions !== "object" || fractions === null || isUnitLike(fractions) || thermoDataOf(fractions) !== undefined) {
    throw new ArgumentError(`argument fractions of ${fn}() needs a record like {methane: 0.9, ethane: 0.1} or a list of pairs like [["methane", 0.8], [substance({...}), 0.2]], got ${ctx.textOf(fractions)}`);
  }
  return Object.entries(fractions).map(([name, v]) => {
    const d = thermoDataOf(v);
    if (d?.kind === "substance") {
      throw new ArgumentError(`argument fractions of ${fn}(): ${name}: give a substance(...) with its fraction as a pair, like mixture([["methane", 0.8], [${name}, 0.2]])`);
    }
    return { label: name, substance: guard(fn, () => getSubstance(name), { name: "fractions" }), value: v };
  });
}

/**
 * A mixture value from {name: fraction, ...} or [[component, fraction], ...] (components by name or as
 * substance values, e.g. user pseudo-components); fractions not summing to 1 are normalised with a warning.
 */
export function mixtureValue(fractions: unknown, kij: unknown, ctx: BuiltinContext): ThermoValue {
  const fn = "mixture";
  const entries = entriesOf(fractions, fn, ctx);
  if (entries.length === 0) throw new ArgumentError(`argument fractions of mixture() needs at least one component, like {methane: 0.9, ethane: 0.1}`);
  const components = entries.map((e) => e.substance);
  const ids = components.map((c) => c.id);
  ids.forEach((id, i) => {
    if (ids.indexOf(id) !== i) throw new ArgumentError(`argument fractions of mixture(): "${entries[i]!.label}" and "${entries[ids.indexOf(id)]!.label}" are the same substance (${id})`);
  });
  const raw = entries.map((e) => ctx.units.toSI(e.value, "dimensionless", `fractions.${e.label}`, fn));
  raw.forEach((v, i) => {
    if (!(v >= 0) || !Number.isFinite(v)) throw new ArgumentError(`argument fractions of mixture(): the fraction of ${entries[i]!.label} must be a number >= 0, got ${v}`);
  });
  const sum = raw.reduce((a, b) => a + b, 0);
  if (!(sum > 0)) throw new ArgumentError(`argument fractions of mixture(): the fractions sum to 0`);
  if (Math.abs(sum - 1) > 1e-9) ctx.warn(`mixture(): mole fractions summed to ${Number(sum.toPrecision(6))}; normalised to sum to 1`);
  const x = raw.map((v) => v / sum);
  const k = kij === undefined ? undefined : kijMatrix(kij, components, fn, ctx);
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
