/**
 * lib/display: values -> MIME bundles. Knows nothing of mathjs or Jupyter: inputs are plain data
 * (numbers already converted to the display unit, unit labels as strings).
 *
 * RENDERING CONTRACT (kernel engine and language engineers, please follow):
 * - Everything the language calls here is SYNCHRONOUS: tableBundle, chartBundle, departureChart,
 *   zChart, checkBundle, ProgressiveChart, ProgressiveDisplay. A chart bundle leaves the language
 *   with text/plain and the Vega-Lite spec only.
 * - vega renders asynchronously (View.toSVG returns a promise; its dataflow is async all the way
 *   down), so the SVG and PNG cannot be made inside the synchronous Session.run. Instead the engine
 *   calls `await renderPending(bundle)` on EVERY bundle before sending it (execute_result,
 *   display_data, update_display_data). It adds image/svg+xml and image/png to chart bundles (a
 *   bundle with the Vega-Lite type but no SVG is "pending") and returns any other bundle as is.
 *   Bundles stay plain JSON, so this works on either side of the worker boundary; do it in the
 *   worker (after run() returns / as the sink receives displays) to keep the main thread free.
 * - Progress displays of a running sweep (progressive.ts) are NOT pending: they carry a placeholder
 *   SVG (a frame with "in progress: n of N points") beside the Vega-Lite spec, so the engine sends
 *   them while the cell still runs; the final update carries a normal pending chart bundle.
 * - vega, vega-lite and resvg are loaded by dynamic import on the first render: importing this
 *   index costs nothing at kernel start. The first chart pays about 0.3 s for loading.
 * - The PNG's text uses DejaVu Sans from the dejavu-fonts-ttf package, loaded by path with system
 *   fonts off, so it renders the same on a machine without fonts.
 */
export { MIME, VEGA_LITE_SCHEMA } from "./mime.js";
export type { MimeBundle } from "./mime.js";
export {
  DEFAULT_SIGFIGS, formatNumber, formatCell, columnNotation, shortNumber, escapeHtml,
  type Cell, type Notation,
} from "./format.js";
export {
  tableBundle, tableFromColumns, tableFromRecords, tableFromRecord,
  type TableColumn, type TableSpec, type TableRecord, type RecordEntry, type TableOptions,
} from "./table.js";
export {
  chartBundle, chartSpec, chartSummary, axisTitle,
  type AxisSpec, type Series, type ChartSpec, type ChartMark,
} from "./chart.js";
export {
  departureChart, departureChartSpec, zChart, zChartSpec, DEPARTURE_TITLES,
  type ReducedCurve, type DepartureProperty, type ReducedChartOptions,
} from "./reduced.js";
export { checkBundle, checkRecord, evaluateCheck, type CheckInput, type CheckRecord, type CheckComparison } from "./check.js";
export {
  ProgressiveChart, ProgressiveDisplay, newDisplayId, placeholderSvg, partialChartBundle, progressText,
  DEFAULT_START_AFTER_MS, DEFAULT_MIN_INTERVAL_MS,
  type DisplayTarget, type ProgressiveOptions, type ProgressTiming, type Progress,
} from "./progressive.js";
export {
  renderPending, renderChart, renderSvg, renderPng, compileVegaLite, isPending, chartFontFiles,
  type RenderOptions, type RenderedChart,
} from "./render.js";
export { PALETTE, CHART_FONT_FAMILY } from "./style.js";
