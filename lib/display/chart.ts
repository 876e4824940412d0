/**
 * Line and point charts of one or several series against a swept variable, as a Vega-Lite spec and a
 * text/plain summary. This part is synchronous and needs no vega: the SVG and PNG copies are added
 * later by `renderPending` (render.ts), because vega renders asynchronously.
 */
import { shortNumber } from "./format.js";
import { MIME, VEGA_LITE_SCHEMA, type MimeBundle } from "./mime.js";
import { chartConfig, DASHES, PALETTE } from "./style.js";

export interface AxisSpec {
  /** Quantity name, e.g. "P" or "reduced pressure Pr". */
  title: string;
  /** Unit label appended as "[unit]"; omit for dimensionless quantities. */
  unit?: string;
  log?: boolean;
  domain?: readonly [number, number];
  /** Include zero in a linear axis (default false: engineering curves rarely start at zero). */
  zero?: boolean;
}

export interface Series {
  label: string;
  x: readonly number[];
  y: readonly number[];
  /** Second grouping drawn as a dash pattern (e.g. the model in a model comparison). */
  style?: string;
}

export type ChartMark = "line" | "point" | "line+point";

export interface ChartSpec {
  title?: string;
  subtitle?: string;
  x: AxisSpec;
  y: AxisSpec;
  series: readonly Series[];
  mark?: ChartMark;
  /** Legend titles for the colour (series) and dash (style) groupings. */
  seriesTitle?: string;
  styleTitle?: string;
  width?: number;
  height?: number;
  notes?: readonly string[];
}

export const axisTitle = (a: AxisSpec) => (a.unit ? `${a.title} [${a.unit}]` : a.title);

interface Row { i: number; x: number | null; y: number | null; series: string; style?: string }

function checkSeries(spec: ChartSpec): void {
  if (!Array.isArray(spec.series) || spec.series.length === 0) throw new RangeError("chart: needs at least one series, got none");
  for (const [axis, name] of [[spec.x, "x"], [spec.y, "y"]] as const) {
    if (!axis || typeof axis.title !== "string") throw new TypeError(`chart: the ${name} axis needs a title`);
    if (axis.domain && !(axis.domain[0] < axis.domain[1])) {
      throw new RangeError(`chart: ${name} axis domain must be [low, high] with low < high, got [${axis.domain.join(", ")}]`);
    }
  }
  const labels = new Set<string>();
  for (const s of spec.series) {
    if (s.x.length !== s.y.length) {
      throw new RangeError(`chart: series '${s.label}' has ${s.x.length} x values but ${s.y.length} y values`);
    }
    const key = `${s.label}\u0000${s.style ?? ""}`;
    if (labels.has(key)) throw new TypeError(`chart: series label '${s.label}' is used twice; give each series its own label`);
    labels.add(key);
    for (const [axis, vals, name] of [[spec.x, s.x, "x"], [spec.y, s.y, "y"]] as const) {
      if (!axis.log) continue;
      const k = (vals as readonly number[]).findIndex((v: number) => Number.isFinite(v) && v <= 0);
      if (k >= 0) {
        throw new RangeError(`chart: the ${name} axis is logarithmic but series '${s.label}' has ${name}[${k}] = ${vals[k]}; log axes need positive values`);
      }
    }
  }
}

const finiteOrNull = (v: number) => (Number.isFinite(v) ? v : null);

/** The Vega-Lite (v5 schema) spec of a chart. Plain JSON. */
export function chartSpec(spec: ChartSpec): Record<string, unknown> {
  checkSeries(spec);
  const rows: Row[] = [];
  for (const s of spec.series) {
    for (let i = 0; i < s.x.length; i++) {
      const row: Row = { i, x: finiteOrNull(s.x[i]!), y: finiteOrNull(s.y[i]!), series: s.label };
      if (s.style !== undefined) row.style = s.style;
      rows.push(row);
    }
  }
  const seriesLabels = [...new Set(spec.series.map((s) => s.label))];
  const styles = [...new Set(spec.series.flatMap((s) => (s.style === undefined ? [] : [s.style])))];
  const axis = (a: AxisSpec, field: "x" | "y") => ({
    field,
    type: "quantitative",
    title: axisTitle(a),
    scale: {
      type: a.log ? "log" : "linear",
      ...(a.log ? {} : { zero: a.zero ?? false }),
      ...(a.domain ? { domain: [...a.domain] } : {}),
      // A "nice" log domain jumps a whole decade past the data; keep log axes tight.
      nice: !a.domain && !a.log,
    },
    axis: a.log ? { format: "~g", grid: true } : { grid: true },
  });
  const mark = spec.mark ?? "line";
  const markDef =
    mark === "point"
      ? { type: "point", clip: true }
      : { type: "line", clip: true, ...(mark === "line+point" ? { point: { filled: true, size: 22 } } : {}) };
  const encoding: Record<string, unknown> = {
    x: axis(spec.x, "x"),
    y: axis(spec.y, "y"),
    color: {
      field: "series",
      type: "nominal",
      title: spec.seriesTitle ?? null,
      sort: seriesLabels,
      scale: { domain: seriesLabels, range: seriesLabels.map((_, k) => PALETTE[k % PALETTE.length]) },
      legend: seriesLabels.length > 1 ? {} : null,
    },
    // Draw each curve in the caller's order, not sorted by x: curves may turn back on themselves.
    ...(mark === "point" ? {} : { order: { field: "i", type: "quantitative" } }),
    tooltip: [
      { field: "series", type: "nominal", title: spec.seriesTitle ?? "series" },
      ...(styles.length ? [{ field: "style", type: "nominal", title: spec.styleTitle ?? "style" }] : []),
      { field: "x", type: "quantitative", title: axisTitle(spec.x), format: ".5~g" },
      { field: "y", type: "quantitative", title: axisTitle(spec.y), format: ".5~g" },
    ],
  };
  if (styles.length) {
    encoding.strokeDash = {
      field: "style",
      type: "nominal",
      title: spec.styleTitle ?? null,
      sort: styles,
      scale: { domain: styles, range: styles.map((_, k) => [...DASHES[k % DASHES.length]!]) },
      legend: { symbolType: "stroke", symbolSize: 420, symbolStrokeWidth: 1.8 },
    };
  }
  // Notes (cautions) ride in the subtitle so they stay visible in the SVG and PNG copies.
  const sub = [...(spec.subtitle ? [spec.subtitle] : []), ...(spec.notes ?? []).map((n) => `Note: ${n}`)];
  const title = spec.title || sub.length
    ? { title: { text: spec.title ?? "", ...(sub.length ? { subtitle: sub.length === 1 ? sub[0] : sub } : {}) } }
    : {};
  return {
    $schema: VEGA_LITE_SCHEMA,
    ...title,
    width: spec.width ?? 480,
    height: spec.height ?? 300,
    data: { values: rows },
    mark: markDef,
    encoding,
    config: chartConfig(),
  };
}

function range(vals: readonly number[]): string {
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of vals) {
    if (!Number.isFinite(v)) continue;
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  return lo <= hi ? `${shortNumber(lo)} to ${shortNumber(hi)}` : "no finite values";
}

/** A few lines a text-only front end shows instead of the picture. */
export function chartSummary(spec: ChartSpec): string {
  const lines = [`Chart: ${spec.title ?? `${spec.y.title} vs ${spec.x.title}`}`];
  const all = (k: "x" | "y") => spec.series.flatMap((s) => [...s[k]]);
  lines.push(`  x: ${axisTitle(spec.x)}${spec.x.log ? " (log)" : ""}, ${range(all("x"))}`);
  lines.push(`  y: ${axisTitle(spec.y)}${spec.y.log ? " (log)" : ""}, ${range(all("y"))}`);
  for (const s of spec.series) {
    const bad = s.y.filter((v) => !Number.isFinite(v)).length + s.x.filter((v) => !Number.isFinite(v)).length;
    const name = s.style === undefined ? s.label : `${s.label}, ${s.style}`;
    lines.push(`  ${name}: ${s.x.length} points${bad ? ` (${bad} not finite, left out)` : ""}`);
  }
  for (const n of spec.notes ?? []) lines.push(`Note: ${n}`);
  return lines.join("\n");
}

/**
 * A chart bundle WITHOUT its pictures: text/plain + Vega-Lite. Pass it through `renderPending`
 * before sending to add image/svg+xml and image/png.
 */
export function chartBundle(spec: ChartSpec): MimeBundle {
  const vl = chartSpec(spec);
  return { [MIME.text]: chartSummary(spec), [MIME.vegalite]: vl };
}
