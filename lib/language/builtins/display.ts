/**
 * table, chart and verify: the language side of lib/display. Language values (quantities, compact
 * columns, arrays, records) are turned into plain numbers in ONE display unit per column or axis,
 * with the unit label alongside; lib/display does the layout.
 *
 * table() and chart() return opaque values (kind "table" / "chart") shown as the cell result or by
 * show(); a chart's SVG/PNG are added by the engine (lib/display renderPending) before sending.
 * verify() displays its pass/fail row at once (several checks per cell all show) and returns nothing.
 */
import type { Unit } from "mathjs";
import {
  chartBundle, chartSummary, checkBundle, tableBundle, tableFromColumns, tableFromRecord, tableFromRecords,
  type Cell, type ChartSpec, type MimeBundle, type TableColumn,
} from "../../display/index.js";
import type { RichValue } from "../values/rich.js";
import { isQuantityColumn } from "../values/column.js";
import { ArgumentError } from "./bind.js";
import { defineBuiltin, type BuiltinContext, type BuiltinDef } from "./define.js";

interface Plain { values: Cell[]; unit: string; dimension?: string }

const isUnit = (x: unknown): x is Unit => typeof x === "object" && x !== null && (x as { isUnit?: boolean }).isUnit === true;
const isMatrix = (x: unknown): x is { toArray(): unknown[] } =>
  typeof x === "object" && x !== null && (x as { isMatrix?: boolean }).isMatrix === true;
const isVector = (x: unknown) => Array.isArray(x) || isMatrix(x);
const isRecord = (x: unknown): x is Record<string, unknown> =>
  typeof x === "object" && x !== null && Object.getPrototypeOf(x) === Object.prototype;

/** SI -> display unit is affine for every unit (offsets for degC, psig): d = a + b * si. */
function affine(ctx: BuiltinContext, unit: string): { a: number; b: number } {
  const at = (x: number) => (ctx.units.fromSI(x, unit) as Unit).toNumber(unit);
  const a = at(0);
  return { a, b: at(1) - a };
}

function dimensionName(ctx: BuiltinContext, u: Unit): string | undefined {
  return ctx.units.dimensionOf(u)?.replace(/_/g, " ");
}

/** Any language value as plain cells in one unit (`unit` forces it). `where` names it in errors. */
function toPlain(ctx: BuiltinContext, value: unknown, where: string, fn: string, unit?: string): Plain {
  if (isQuantityColumn(value)) {
    if (!value.siUnit) return { values: Array.from(value.si), unit: "" };
    const u = unit ?? value.unit;
    const probe = ctx.units.fromSI(1, value.siUnit) as Unit;
    if (unit !== undefined) convertOne(probe, unit, where, fn);
    const { a, b } = affine(ctx, u);
    return { values: Array.from(value.si, (x) => a + b * x), unit: u, dimension: dimensionName(ctx, probe) };
  }
  const items = isMatrix(value) ? value.toArray().flat(Infinity) : Array.isArray(value) ? value.flat(Infinity) : [value];
  const first = items.find(isUnit);
  if (!first) {
    items.forEach((v, i) => {
      if (!(v === null || ["number", "string", "boolean"].includes(typeof v))) {
        throw new ArgumentError(`${fn}(): ${where}${items.length > 1 ? `[${i + 1}]` : ""} must be a number, quantity or text, got ${ctx.textOf(v)}`);
      }
    });
    if (unit) throw new ArgumentError(`${fn}(): ${where} holds plain numbers, so it cannot be shown in "${unit}"`);
    return { values: items as Cell[], unit: "" };
  }
  const u = unit ?? first.formatUnits();
  const values = items.map((v, i) => {
    if (!isUnit(v)) {
      throw new ArgumentError(`${fn}(): ${where} mixes quantities and other values: item ${i + 1} is ${ctx.textOf(v)}, item 1 is ${ctx.textOf(first)}`);
    }
    return convertOne(v, u, `${where}${items.length > 1 ? `[${i + 1}]` : ""}`, fn);
  });
  return { values, unit: u, dimension: dimensionName(ctx, first) };
}

function convertOne(v: Unit, unit: string, where: string, fn: string): number {
  try {
    return v.toNumber(unit);
  } catch {
    throw new ArgumentError(`${fn}(): ${where} is ${v.formatUnits() || "a plain number"}, which cannot be shown in "${unit}"`);
  }
}

function textOption(ctx: BuiltinContext, o: Record<string, unknown>, key: string, fn: string): string | undefined {
  const v = o[key];
  if (v === undefined) return undefined;
  if (typeof v !== "string") throw new ArgumentError(`${fn}(): option ${key} needs text in quotes, got ${ctx.textOf(v)}`);
  return v;
}

function sigfigsOption(ctx: BuiltinContext, o: Record<string, unknown>, fn: string): number | undefined {
  const v = o.sigfigs;
  if (v === undefined) return undefined;
  if (typeof v !== "number" || !Number.isInteger(v) || v < 1 || v > 17) {
    throw new ArgumentError(`${fn}(): option sigfigs must be a whole number from 1 to 17, got ${ctx.textOf(v)}`);
  }
  return v;
}

function checkOptions(o: Record<string, unknown>, allowed: readonly string[], fn: string): void {
  for (const k of Object.keys(o)) {
    if (!allowed.includes(k)) throw new ArgumentError(`${fn}(): unknown option ${k}; options are ${allowed.join(", ")}`);
  }
}

function rich(kind: string, bundle: () => MimeBundle, text: () => string): RichValue {
  return { kind, toBundle: bundle, toText: text };
}

const TABLE_OPTIONS = ["title", "sigfigs", "units", "note"] as const;

function buildTable(ctx: BuiltinContext, data: unknown, options: Record<string, unknown> = {}): RichValue {
  checkOptions(options, TABLE_OPTIONS, "table");
  const units = options.units === undefined ? {} : options.units;
  if (!isRecord(units) || Object.values(units).some((u) => typeof u !== "string")) {
    throw new ArgumentError(`table(): option units needs a record of unit texts like {P: "bar"}, got ${ctx.textOf(units)}`);
  }
  const unitOf = (k: string) => (units as Record<string, string>)[k];
  const note = textOption(ctx, options, "note", "table");
  const opts = { title: textOption(ctx, options, "title", "table"), sigfigs: sigfigsOption(ctx, options, "table"), notes: note ? [note] : undefined };
  let spec;
  if (isVector(data)) {
    const rows = isMatrix(data) ? data.toArray() : (data as unknown[]);
    spec = tableFromRecords(rows.map((row, i) => {
      if (!isRecord(row)) throw new ArgumentError(`table(): row ${i + 1} must be a record like {T: 300 K}, got ${ctx.textOf(row)}`);
      return Object.fromEntries(Object.entries(row).map(([k, v]) => {
        const p = toPlain(ctx, v, `row ${i + 1} ${k}`, "table", unitOf(k));
        if (p.values.length !== 1) throw new ArgumentError(`table(): row ${i + 1} ${k} must be a single value, got ${p.values.length} values`);
        return [k, { value: p.values[0], unit: p.unit || undefined }];
      }));
    }), opts);
  } else if (isRecord(data)) {
    const entries = Object.entries(data);
    if (entries.length === 0) throw new ArgumentError("table(): the record is empty; give columns like {P: span(1 bar, 10 bar, 5)}");
    if (entries.some(([, v]) => isVector(v) || isQuantityColumn(v))) {
      const plain = entries.map(([k, v]) => [k, toPlain(ctx, v, k, "table", unitOf(k))] as const);
      const n = Math.max(...plain.map(([, p]) => p.values.length));
      const columns: TableColumn[] = plain.map(([k, p]) => {
        // A single value beside columns repeats down the table (e.g. {T: 300 K, P: span(...)}).
        if (p.values.length === 1 && n > 1) return { name: k, unit: p.unit, values: new Array<Cell>(n).fill(p.values[0]) };
        if (p.values.length !== n) {
          throw new ArgumentError(`table(): columns must have equal length; ${plain.find(([, q]) => q.values.length === n)![0]} has ${n} values, ${k} has ${p.values.length}`);
        }
        return { name: k, unit: p.unit, values: p.values };
      });
      spec = tableFromColumns(columns, opts);
    } else {
      spec = tableFromRecord(Object.fromEntries(entries.map(([k, v]) => {
        const p = toPlain(ctx, v, k, "table", unitOf(k));
        return [k, { value: p.values[0], unit: p.unit }];
      })), opts);
    }
  } else {
    throw new ArgumentError(`table(): needs a record of columns, a list of records or one record, got ${ctx.textOf(data)}`);
  }
  const bundle = tableBundle(spec);
  return rich("table", () => bundle, () => bundle["text/plain"]);
}

const CHART_OPTIONS = ["title", "subtitle", "xlabel", "ylabel", "xunit", "yunit", "log", "mark", "legend", "width", "height"] as const;

function buildChart(ctx: BuiltinContext, x: unknown, y: unknown, options: Record<string, unknown> = {}): RichValue {
  checkOptions(options, CHART_OPTIONS, "chart");
  const text = (k: string) => textOption(ctx, options, k, "chart");
  const log = text("log") ?? "";
  if (!["", "x", "y", "xy"].includes(log)) throw new ArgumentError(`chart(): option log must be "x", "y" or "xy", got "${log}"`);
  const mark = text("mark") ?? "line";
  if (!["line", "point", "line+point"].includes(mark)) throw new ArgumentError(`chart(): option mark must be "line", "point" or "line+point", got "${mark}"`);
  const size = (k: "width" | "height") => {
    const v = options[k];
    if (v === undefined) return undefined;
    if (typeof v !== "number" || !(v >= 50 && v <= 4000)) throw new ArgumentError(`chart(): option ${k} must be a number of pixels from 50 to 4000, got ${ctx.textOf(v)}`);
    return v;
  };
  const xs = toPlain(ctx, x, "x", "chart", text("xunit"));
  const ySets: [string, unknown][] = isRecord(y) ? Object.entries(y) : [[text("legend") ?? "y", y]];
  if (ySets.length === 0) throw new ArgumentError("chart(): y is an empty record; give series like {\"300 K\": Z1}");
  let yUnit = text("yunit");
  let yDim: string | undefined;
  const series = ySets.map(([label, v]) => {
    const p = toPlain(ctx, v, isRecord(y) ? `y.${label}` : "y", "chart", yUnit);
    yUnit ??= p.unit; // every series in the first series' unit
    yDim ??= p.dimension;
    const nums = p.values.map((c, i) => {
      if (typeof c !== "number") throw new ArgumentError(`chart(): series ${label} item ${i + 1} must be a number or quantity, got ${String(c)}`);
      return c;
    });
    if (nums.length !== xs.values.length) {
      throw new ArgumentError(`chart(): x has ${xs.values.length} values but series ${label} has ${nums.length}; give one y per x`);
    }
    return { label, x: xs.values as number[], y: nums };
  });
  if (xs.values.some((c) => typeof c !== "number")) throw new ArgumentError("chart(): x must hold numbers or quantities");
  const spec: ChartSpec = {
    title: text("title"), subtitle: text("subtitle"),
    x: { title: text("xlabel") ?? xs.dimension ?? "x", unit: xs.unit || undefined, log: log.includes("x") },
    y: { title: text("ylabel") ?? yDim ?? "y", unit: yUnit || undefined, log: log.includes("y") },
    series, mark: mark as ChartSpec["mark"], width: size("width"), height: size("height"),
  };
  const bundle = chartBundle(spec); // validates now, so errors point at the chart() call
  return rich("chart", () => bundle, () => chartSummary(spec));
}

function runVerify(ctx: BuiltinContext, label: string, value: unknown, target: unknown, tolerance: unknown, comparison?: string): void {
  const fn = "verify";
  const t = toPlain(ctx, target, "target", fn);
  const v = toPlain(ctx, value, "value", fn, t.unit || undefined);
  if (t.values.length !== 1 || v.values.length !== 1) throw new ArgumentError("verify(): value and target must be single values, not arrays");
  if (!t.unit && isUnit(value)) throw new ArgumentError(`verify(): value is ${ctx.textOf(value)} but target ${ctx.textOf(target)} has no unit`);
  const [vn, tn] = [v.values[0], t.values[0]];
  if (typeof vn !== "number" || typeof tn !== "number") throw new ArgumentError("verify(): value and target must be numbers or quantities");
  let tol: number;
  let note: string | undefined;
  const relative = (fraction: number) => {
    if (!(fraction >= 0)) throw new ArgumentError(`verify(): a relative tolerance must be zero or positive, got ${fraction}`);
    note = `tolerance ${+(fraction * 100).toPrecision(6)} % of target`;
    // A percentage of an offset unit (degC, barg) is a percentage of the absolute value, so that
    // 150 degC and 423.15 K give the same band (units policy: offsets are never silently dropped).
    const { a, b } = t.unit ? affine(ctx, t.unit) : { a: 0, b: 1 };
    if (a !== 0) {
      const absolute = (tn - a) / b;
      const dim = t.dimension?.replace(/ /g, "_");
      note += ` (of the absolute ${dim ? ctx.textOf(ctx.units.fromSI(absolute, dim)) : String(absolute)})`;
      return Math.abs(absolute) * fraction * Math.abs(b);
    }
    return Math.abs(tn) * fraction;
  };
  if (typeof tolerance === "string") {
    const m = /^\s*([0-9.eE+-]+)\s*%\s*$/.exec(tolerance);
    if (!m || !Number.isFinite(Number(m[1]))) throw new ArgumentError(`verify(): tolerance text must be a percentage like "2%", got "${tolerance}"`);
    tol = relative(Number(m[1]) / 100);
  } else if (typeof tolerance === "number") {
    // With units on the value, a plain number (2% is 0.02) is a fraction of the target.
    tol = t.unit ? relative(tolerance) : tolerance;
  } else if (isUnit(tolerance)) {
    if (!t.unit) throw new ArgumentError(`verify(): tolerance ${ctx.textOf(tolerance)} has a unit but target ${ctx.textOf(target)} has none`);
    // A tolerance is a difference: scale only, no offset (5 K and 5 degC are the same band).
    const own = tolerance.formatUnits();
    const ownScale = affine(ctx, own).b;
    convertOne(tolerance, t.unit, "tolerance", fn);
    tol = (tolerance.toNumber(own) / ownScale) * affine(ctx, t.unit).b;
  } else {
    throw new ArgumentError(`verify(): tolerance must be a quantity like 0.5 bar, a fraction like 2% or a number, got ${ctx.textOf(tolerance)}`);
  }
  if (!(tol >= 0)) throw new ArgumentError(`verify(): tolerance must be zero or positive, got ${ctx.textOf(tolerance)}`);
  ctx.display(checkBundle({
    label, value: vn, target: tn, tolerance: tol, unit: t.unit, note,
    comparison: (comparison ?? "within") as "within" | "atmost" | "atleast",
  }));
}

export const display: BuiltinDef[] = [
  defineBuiltin({
    name: "table", group: "output",
    params: [
      { name: "data", type: "any", doc: "a record of columns {P: span(...), Z: ...}, a list of records [{T: ..}, ..] or one record" },
      { name: "options", type: "record", optional: true, doc: '{title: "...", sigfigs: 5, units: {P: "bar"}, note: "..."}' },
    ],
    returns: "table",
    doc: "A table with one unit per column (shown in the header) and the same significant figures down each column. A single value beside columns repeats on every row.",
    examples: ['table({P: span(1 bar, 10 bar, 4), T: 300 K})', 'table([{T: 300 K, P: 1 bar}, {T: 350 K, P: 2 bar}], {units: {P: "kPa"}})'],
    impl: ({ data, options }, ctx) => buildTable(ctx, data, options),
  }),
  defineBuiltin({
    name: "chart", group: "output",
    params: [
      { name: "x", type: "any", doc: "the swept values (quantities or numbers)" },
      { name: "y", type: "any", doc: 'values of one series, or a record of series {"300 K": y1, "400 K": y2}' },
      { name: "options", type: "record", optional: true, doc: '{title, subtitle, xlabel, ylabel, xunit: "bar", yunit, log: "x"|"y"|"xy", mark: "line"|"point"|"line+point", legend, width, height}' },
    ],
    returns: "chart",
    doc: "A line or point chart of one or several series against x; axis titles carry the units (default titles: the quantities' dimensions). Shows as an interactive Vega-Lite chart with SVG and PNG copies.",
    examples: ['chart(span(1 bar, 10 bar, 5), span(1, 0.9, 5), {ylabel: "Z", title: "Compressibility"})', 'chart([1, 2, 3] bar, {a: [1, 2, 3] K, b: [2, 3, 4] K}, {log: "x"})'],
    impl: ({ x, y, options }, ctx) => buildChart(ctx, x, y, options),
  }),
  defineBuiltin({
    name: "verify", group: "output",
    params: [
      { name: "label", type: "string", doc: "what is checked, e.g. \"discharge temperature\"" },
      { name: "value", type: "any", doc: "the computed value" },
      { name: "target", type: "any", doc: "the design value, same dimension as value" },
      { name: "tolerance", type: "any", doc: 'allowed deviation: a quantity (5 K), or a fraction of target (2% or "2%")' },
      { name: "comparison", type: "string", optional: true, choices: ["within", "atmost", "atleast"], doc: '"within" |value - target| <= tolerance (default), "atmost" value <= target + tolerance, "atleast" value >= target - tolerance' },
    ],
    returns: "none",
    doc: "A design check: shows a PASS/FAIL row now and records it for the headless runner, whose exit code is non-zero if any check fails.",
    examples: ['verify("stored mass", 124 kg, 125 kg, 2 kg)', 'verify("discharge temperature", 150 degC, 160 degC, 0 K, "atmost")'],
    impl: ({ label, value, target, tolerance, comparison }, ctx) => runVerify(ctx, label, value, target, tolerance, comparison),
  }),
];
