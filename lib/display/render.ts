/**
 * Headless rendering of Vega-Lite specs: SVG by vega's string renderer (no browser, no canvas
 * package), PNG by resvg from that SVG with a font shipped in node_modules (no system fonts).
 *
 * vega, vega-lite and resvg are imported on the first render only (dynamic import), so loading
 * lib/display costs nothing at kernel start. Node caches the modules after the first import.
 */
import { createRequire } from "node:module";
import { MIME, type MimeBundle } from "./mime.js";
import { CHART_FONT_FAMILY } from "./style.js";

export interface RenderOptions {
  /** Add the PNG copy (default true): untrusted notebooks and the classic notebook need it. */
  png?: boolean;
  /** PNG pixels per SVG pixel (default 1: the picture shows at the size the SVG declares). */
  pngScale?: number;
}

export interface RenderedChart {
  svg: string;
  /** Base64 PNG, as Jupyter carries binary MIME data; absent when options.png is false. */
  png?: string;
}

/** Paths of the shipped TTFs (regular and bold: chart titles are bold). */
export function chartFontFiles(): string[] {
  const require = createRequire(import.meta.url);
  return ["DejaVuSans.ttf", "DejaVuSans-Bold.ttf"].map((f) => require.resolve(`dejavu-fonts-ttf/ttf/${f}`));
}

/** Compiles a Vega-Lite spec; compiler warnings are errors here, since a warned spec draws wrong. */
export async function compileVegaLite(spec: Record<string, unknown>): Promise<Record<string, unknown>> {
  const vl = await import("vega-lite");
  const warnings: string[] = [];
  const collect = (...m: unknown[]) => { warnings.push(m.map(String).join(" ")); };
  interface Logger { level(): Logger; warn(...m: unknown[]): void; error(...m: unknown[]): void; info(): void; debug(): void }
  const logger: Logger = { level: () => logger, warn: collect, error: collect, info() {}, debug() {} };
  // The spec is built by chart.ts as plain JSON; vega-lite's TopLevelSpec type is structural.
  const out = vl.compile(spec as unknown as Parameters<typeof vl.compile>[0], { logger: logger as never });
  if (warnings.length) throw new Error(`chart: the Vega-Lite compiler reported: ${warnings.join("; ")}`);
  return out.spec as unknown as Record<string, unknown>;
}

export async function renderSvg(spec: Record<string, unknown>): Promise<string> {
  const vega = await import("vega");
  const compiled = await compileVegaLite(spec);
  const view = new vega.View(vega.parse(compiled as never), { renderer: "none" });
  try {
    return await view.toSVG();
  } finally {
    view.finalize();
  }
}

export async function renderPng(svg: string, scale = 1): Promise<string> {
  if (!(scale > 0 && scale <= 8)) throw new RangeError(`chart: pngScale must be in (0, 8], got ${scale}`);
  const { Resvg } = await import("@resvg/resvg-js");
  const resvg = new Resvg(svg, {
    font: { fontFiles: chartFontFiles(), loadSystemFonts: false, defaultFontFamily: CHART_FONT_FAMILY },
    fitTo: { mode: "zoom", value: scale },
  });
  return Buffer.from(resvg.render().asPng()).toString("base64");
}

/** SVG and (optionally) PNG of a Vega-Lite spec. */
export async function renderChart(spec: Record<string, unknown>, options: RenderOptions = {}): Promise<RenderedChart> {
  const svg = await renderSvg(spec);
  return options.png === false ? { svg } : { svg, png: await renderPng(svg, options.pngScale ?? 1) };
}

/** True when a bundle carries a Vega-Lite spec but not yet its SVG copy. */
export function isPending(bundle: MimeBundle): boolean {
  return MIME.vegalite in bundle && !(MIME.svg in bundle);
}

/**
 * THE step the kernel engine runs on every bundle before sending it (execute_result, display_data,
 * update_display_data): adds image/svg+xml and image/png to chart bundles, returns other bundles
 * unchanged (same object). A render failure does not lose the output: the bundle is returned with
 * its text/plain extended by the reason, and the Vega-Lite spec kept for front ends that draw it.
 */
export async function renderPending(bundle: MimeBundle, options: RenderOptions = {}): Promise<MimeBundle> {
  if (!isPending(bundle)) return bundle;
  try {
    const { svg, png } = await renderChart(bundle[MIME.vegalite] as Record<string, unknown>, options);
    return { ...bundle, [MIME.svg]: svg, ...(png === undefined ? {} : { [MIME.png]: png }) };
  } catch (e) {
    const reason = e instanceof Error ? e.message : String(e);
    return { ...bundle, [MIME.text]: `${bundle[MIME.text]}\n(picture not rendered: ${reason})` };
  }
}
