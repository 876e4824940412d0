/**
 * Turns a registry record into the function an expression calls: checks arity, converts arguments
 * at the edge (quantities to SI numbers once), runs impl (per element when vectorised) and wraps
 * SI results back into quantities or compact columns.
 */
import type { MathJsInstance } from "mathjs";
import { isRichValue } from "../values/rich.js";
import { isQuantityColumn } from "../values/column.js";
import { describeDimension } from "../unitsBridge.js";
import { isOpaqueType, type BuiltinArgs, type BuiltinContext, type BuiltinDef, type ParamSpec } from "./define.js";

/** A user-facing error from a built-in's argument handling; the session adds position and caret. */
export class ArgumentError extends Error {
  override name = "ArgumentError";
}

type Vector = Float64Array;

export function bindBuiltin(def: BuiltinDef, math: MathJsInstance, ctx: () => BuiltinContext): (...args: unknown[]) => unknown {
  const fn = def.name;
  const required = def.params.filter((p) => !p.optional && !p.rest).length;
  const hasRest = def.params.some((p) => p.rest);

  const isVectorLike = (v: unknown): boolean => Array.isArray(v) || math.isMatrix(v);

  const vectorOf = (value: unknown, p: ParamSpec, c: BuiltinContext): Vector => {
    if (isQuantityColumn(value) && p.dim && p.dim !== "dimensionless") {
      const probe = c.units.fromSI(1, p.dim);
      if (math.isUnit(probe) && math.unit(1, value.siUnit).equalBase(probe)) return value.si;
    }
    const items = (math.isMatrix(value) ? (value.toArray() as unknown[]) : (value as unknown[])).flat(Infinity);
    const out = new Float64Array(items.length);
    items.forEach((item, i) => { out[i] = scalarOf(item, p, c, `${p.name}[${i + 1}]`); });
    return out;
  };

  const scalarOf = (value: unknown, p: ParamSpec, c: BuiltinContext, label = p.name): number => {
    if (p.type === "number") {
      if (typeof value === "number") return value;
      if (math.isUnit(value)) return c.units.toSI(value, "dimensionless", label, fn);
      throw new ArgumentError(`argument ${label} of ${fn}() needs a number, got ${c.textOf(value)}`);
    }
    return c.units.toSI(value, p.dim!, label, fn);
  };

  const convert = (value: unknown, p: ParamSpec, c: BuiltinContext): unknown => {
    if (value === undefined) return undefined;
    const got = () => c.textOf(value);
    switch (p.type) {
      case "quantity":
        return p.dim ? scalarOf(value, p, c) : value;
      case "number":
        return scalarOf(value, p, c);
      case "string":
        if (typeof value !== "string") throw new ArgumentError(`argument ${p.name} of ${fn}() needs text in quotes, got ${got()}`);
        if (p.choices && !p.choices.includes(value)) {
          throw new ArgumentError(`argument ${p.name} of ${fn}() must be one of ${p.choices.map((x) => `"${x}"`).join(", ")}, got "${value}"`);
        }
        return value;
      case "boolean":
        if (typeof value !== "boolean") throw new ArgumentError(`argument ${p.name} of ${fn}() needs true or false, got ${got()}`);
        return value;
      case "record":
        if (typeof value !== "object" || value === null || Array.isArray(value) || math.isMatrix(value) || math.isUnit(value) || isRichValue(value)) {
          throw new ArgumentError(`argument ${p.name} of ${fn}() needs a record like {key: value}, got ${got()}`);
        }
        return value;
      case "array":
        if (math.isMatrix(value)) return value.toArray();
        if (Array.isArray(value)) return value;
        throw new ArgumentError(`argument ${p.name} of ${fn}() needs an array like [1, 2, 3], got ${got()}`);
      case "function":
        if (typeof value !== "function") throw new ArgumentError(`argument ${p.name} of ${fn}() needs a function like f(x) = x^2, got ${got()}`);
        return value;
      case "any":
        return value;
      default:
        if (isOpaqueType(p.type) && !(isRichValue(value) && value.kind === p.type)) {
          throw new ArgumentError(`argument ${p.name} of ${fn}() needs ${describeDimension(p.type)}, got ${got()}`);
        }
        return value;
    }
  };

  const wrap = (result: unknown, c: BuiltinContext): unknown => {
    if (typeof result === "number" && c.units.dimensions.includes(def.returns)) return c.units.fromSI(result, def.returns);
    if (def.returns === "record" && def.fields && typeof result === "object" && result !== null) {
      const out: Record<string, unknown> = {};
      for (const [k, v] of Object.entries(result)) {
        const dim = def.fields[k];
        out[k] = typeof v === "number" && dim ? c.units.fromSI(v, dim) : v;
      }
      return out;
    }
    return result;
  };

  const wrapColumns = (results: unknown[], c: BuiltinContext): unknown => {
    if (c.units.dimensions.includes(def.returns) && results.every((r) => typeof r === "number")) {
      return c.column(Float64Array.from(results as number[]), def.returns);
    }
    if (def.returns === "record" && def.fields && results.length > 0 && results.every((r) => typeof r === "object" && r !== null)) {
      const rows = results as Record<string, unknown>[];
      const out: Record<string, unknown> = {};
      for (const key of Object.keys(rows[0]!)) {
        const dim = def.fields[key];
        if (dim && rows.every((r) => typeof r[key] === "number")) out[key] = c.column(Float64Array.from(rows, (r) => r[key] as number), dim);
        else out[key] = math.matrix(rows.map((r) => wrap1(r[key], dim, c)) as never);
      }
      return out;
    }
    return math.matrix(results.map((r) => wrap(r, c)) as never);
  };

  const wrap1 = (v: unknown, dim: string | undefined, c: BuiltinContext) =>
    typeof v === "number" && dim ? c.units.fromSI(v, dim) : v;

  const call = (...raw: unknown[]): unknown => {
    const c = ctx();
    if (raw.length < required) {
      const missing = def.params.filter((p) => !p.optional && !p.rest)[raw.length]!;
      throw new ArgumentError(`${fn}() is missing argument ${missing.name} (${missing.dim ?? missing.type}); expected ${signatureLine(def)}`);
    }
    if (!hasRest && raw.length > def.params.length) {
      throw new ArgumentError(`${fn}() takes at most ${def.params.length} argument${def.params.length === 1 ? "" : "s"}, got ${raw.length}; expected ${signatureLine(def)}`);
    }
    const args: BuiltinArgs = {};
    const vectors: { name: string; values: Vector }[] = [];
    def.params.forEach((p, i) => {
      if (p.rest) { args[p.name] = raw.slice(i).map((v) => convert(v, { ...p, rest: false }, c)); return; }
      const value = raw[i];
      if (def.vectorize && (p.type === "quantity" && p.dim || p.type === "number") && isVectorLike(value)) {
        vectors.push({ name: p.name, values: vectorOf(value, p, c) });
      } else {
        args[p.name] = convert(value, p, c);
      }
    });
    if (vectors.length === 0) return wrap(def.impl(args, c), c);
    const n = vectors[0]!.values.length;
    for (const v of vectors) {
      if (v.values.length !== n) {
        throw new ArgumentError(`${fn}(): array arguments must have the same length; ${vectors[0]!.name} has ${n}, ${v.name} has ${v.values.length}`);
      }
    }
    const results = new Array<unknown>(n);
    for (let i = 0; i < n; i++) {
      if ((i & 255) === 0 && c.shouldStop()) throw c.interrupted();
      for (const v of vectors) args[v.name] = v.values[i];
      results[i] = def.impl(args, c);
    }
    return wrapColumns(results, c);
  };
  Object.defineProperty(call, "name", { value: fn });
  return call;
}

function signatureLine(def: BuiltinDef): string {
  return `${def.name}(${def.params.map((p) => (p.optional ? `[${p.name}]` : p.rest ? `...${p.name}` : p.name)).join(", ")})`;
}
