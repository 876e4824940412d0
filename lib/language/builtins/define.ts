/**
 * The built-in registry record. ONE record per built-in; completion, inspect help, "did you mean"
 * suggestions and the executed-examples test all derive from it.
 *
 * How to add a built-in
 * ---------------------
 * 1. Put it in lib/language/builtins/<group>.ts, which exports an array of definitions:
 *
 *      export const thermo: BuiltinDef[] = [
 *        defineBuiltin({
 *          name: "psat", group: "thermo",
 *          params: [
 *            { name: "m", type: "model", doc: "equation-of-state model" },
 *            { name: "T", type: "quantity", dim: "temperature", doc: "temperature" },
 *            { name: "options", type: "record", optional: true, doc: "{tol: ...}" },
 *          ],
 *          returns: "pressure",
 *          doc: "Saturation pressure ...", method: "equal fugacity ...", source: "...",
 *          examples: ['psat(pr("propane"), 300 K)'],
 *          vectorize: true,
 *          impl: ({ m, T, options }, ctx) => saturationPressure(m, T),   // T arrives as a number in K
 *        }),
 *      ];
 *
 *    and add one line to builtins/index.ts.
 * 2. Parameters. `type`:
 *      quantity  with `dim` (a name from ctx.units.dimensions): converted ONCE to an SI number, a wrong
 *                dimension is an error naming the argument; without `dim`: the mathjs Unit or number as is.
 *      number    plain number (a dimensionless quantity is accepted).
 *      string    text; `choices` restricts it.
 *      record    a `{key: value}` object.        array  an array/matrix (as a JS array).
 *      function  a language function (f(x) = ...), called with language values.
 *      any       passed through untouched.
 *      any other word ("model", "substance", "state", ...) = an opaque value (RichValue below) whose
 *                `kind` equals that word.
 *    `optional: true` may be omitted by the caller (arrives as undefined); `rest: true` (last param only)
 *    collects all remaining arguments into an array.
 * 3. Results. `returns` is a dimension name -> impl returns an SI number, wrapped into a quantity for
 *    the user. `returns: "record"` with `fields: {T: "temperature", H: "molar_energy", ...}` -> impl
 *    returns a plain object; number fields listed in `fields` are wrapped. Any other `returns` word
 *    ("model", "none", "any", ...) -> impl returns a language value as is (mathjs Unit, number, string,
 *    plain object for records, array, RichValue).
 * 4. Vectorising. With `vectorize: true`, a quantity/number parameter given an array (span, logspan,
 *    [..], a column) is converted to SI once and impl runs per element on plain numbers. Results come
 *    back compact: a dimension result -> one QuantityColumn (SI Float64Array + unit, still indexable
 *    like a matrix); a record result -> a record of columns (one per field). Several vector
 *    arguments must have the same length.
 * 5. Opaque values (models, substances, tables, charts) implement RichValue (values/rich.ts):
 *    `{ kind, toBundle(): MimeBundle, toText(): string, fields?(): string[] }`. show(x) and the cell
 *    result use toBundle(); completion after `x.` uses fields().
 * 6. ctx: shouldStop() (poll it in long loops and throw ctx.interrupted() when true), stdout(text),
 *    display(bundle), bundleOf(value) (rich output of any language value), units (SI bridge),
 *    column(si, dim) (build a QuantityColumn), call(fn, ...args) (call a language function), warn(text).
 * 7. Every entry of `examples` is executed by tests/lib/language/builtins/examples.test.ts: keep them
 *    self-contained and fast.
 */
import type { MimeBundle, ProgressTiming } from "../../display/index.js";
import type { UnitsBridge } from "../unitsBridge.js";
import type { QuantityColumn } from "../values/column.js";

export type ParamType =
  | "quantity" | "number" | "string" | "record" | "array" | "function" | "any" | "boolean"
  | (string & {});

export interface ParamSpec {
  name: string;
  type: ParamType;
  /** Dimension name for quantity params (see UnitsBridge.dimensions). */
  dim?: string;
  optional?: boolean;
  /** Last param only: collects every remaining argument into an array. */
  rest?: boolean;
  /** Allowed values of a string param. */
  choices?: readonly string[];
  doc: string;
}

export interface BuiltinContext {
  shouldStop(): boolean;
  /** The error to throw when shouldStop() turned true. */
  interrupted(): Error;
  stdout(text: string): void;
  /** With displayId, a later call with update=true replaces that display (progressive output). */
  display(bundle: MimeBundle, options?: { displayId?: string; update?: boolean }): void;
  /** clear_output: wait=true clears when the next output arrives. */
  clear(wait: boolean): void;
  /** Rich output of any language value (quantities, records, RichValues ...). */
  bundleOf(value: unknown): MimeBundle;
  /** One-line text of any language value. */
  textOf(value: unknown): string;
  warn(text: string): void;
  units: UnitsBridge;
  /**
   * A compact column of SI values. dimOrUnit: a dimension name or an SI unit string ("" for plain
   * numbers); displayUnit: the unit to show them in (default: the dimension's display unit).
   */
  column(si: Float64Array, dimOrUnit: string, displayUnit?: string): QuantityColumn;
  /** Calls a language function with language values. */
  call(fn: unknown, ...args: unknown[]): unknown;
  /**
   * Timing of progress displays for long work (the session's SessionOptions.progress). A built-in
   * that showed its result progressively under a display id returns a RichValue carrying that
   * displayId, and the session does not show it a second time as the statement's value.
   */
  progress?: ProgressTiming;
}

export type BuiltinArgs = Record<string, any>;

export interface BuiltinDef {
  name: string;
  group: string;
  params: readonly ParamSpec[];
  /** A dimension name (impl returns an SI number), "record" (see fields) or a value word. */
  returns: string;
  /** For returns "record": dimension of each numeric field. */
  fields?: Readonly<Record<string, string>>;
  doc: string;
  method?: string;
  source?: string;
  examples: readonly string[];
  vectorize?: boolean;
  impl: (args: BuiltinArgs, ctx: BuiltinContext) => unknown;
}

const BASE_TYPES = new Set(["quantity", "number", "string", "record", "array", "function", "any", "boolean"]);

/** Checks the record's own consistency at load time, so a mistake fails every test at once. */
export function defineBuiltin(def: BuiltinDef): BuiltinDef {
  if (!/^[a-z_][a-z0-9_]*$/i.test(def.name)) throw new Error(`defineBuiltin: bad name "${def.name}"`);
  const seen = new Set<string>();
  def.params.forEach((p, i) => {
    if (seen.has(p.name)) throw new Error(`defineBuiltin ${def.name}: duplicate param ${p.name}`);
    seen.add(p.name);
    if (p.rest && i !== def.params.length - 1) throw new Error(`defineBuiltin ${def.name}: rest param ${p.name} must be last`);
    if (p.dim && p.type !== "quantity") throw new Error(`defineBuiltin ${def.name}: dim on non-quantity param ${p.name}`);
    if (!p.doc) throw new Error(`defineBuiltin ${def.name}: param ${p.name} needs a doc`);
  });
  const firstOptional = def.params.findIndex((p) => p.optional || p.rest);
  if (firstOptional >= 0 && def.params.slice(firstOptional).some((p) => !p.optional && !p.rest)) {
    throw new Error(`defineBuiltin ${def.name}: required params must come before optional ones`);
  }
  if (!def.doc) throw new Error(`defineBuiltin ${def.name}: needs doc`);
  if (def.examples.length === 0) throw new Error(`defineBuiltin ${def.name}: needs at least one example`);
  return Object.freeze({ ...def, params: Object.freeze([...def.params]) });
}

export function isOpaqueType(type: ParamType): boolean {
  return !BASE_TYPES.has(type);
}

/** `psat(m: model, T: temperature, [options: record]) -> pressure` */
export function signatureOf(def: BuiltinDef): string {
  const params = def.params.map((p) => {
    const kind = p.dim ?? p.type;
    const core = `${p.rest ? "..." : ""}${p.name}: ${kind}${p.choices ? ` (${p.choices.map((c) => `"${c}"`).join(" | ")})` : ""}`;
    return p.optional ? `[${core}]` : core;
  });
  return `${def.name}(${params.join(", ")}) -> ${def.returns}`;
}
