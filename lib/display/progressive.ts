/**
 * Progressive output for long sweeps: one display (a display_id) that appears once a sweep has run
 * for a while, is updated as results arrive, and is finally replaced by the finished chart
 * (update_display_data).
 *
 * Why partial bundles carry a placeholder image/svg+xml: the engine holds back a chart bundle that
 * still needs its pictures (Vega-Lite present, no SVG: `isPending`) until the synchronous cell run
 * returns, so a pending partial would only arrive after the sweep had ended. A partial bundle
 * therefore carries a small SVG frame saying how far the sweep has come ("in progress: 120 of 600
 * points") and keeps the Vega-Lite spec, from which JupyterLab draws the live partial chart. The
 * final bundle is an ordinary pending chart bundle: the engine renders its SVG and PNG.
 *
 * Why a start delay: a sweep that ends quickly should produce exactly one output, the chart as the
 * cell's result; only sweeps that outlast `startAfter` show a progress display at all.
 *
 * The target is anything with CellSink's display(bundle, {displayId, update}) signature.
 */
import { chartBundle, type ChartSpec, type Series } from "./chart.js";
import { escapeHtml } from "./format.js";
import { MIME, type MimeBundle } from "./mime.js";
import { isPending } from "./render.js";
import { CHART_BACKGROUND, CHART_FONT } from "./style.js";

export interface DisplayTarget {
  display(bundle: MimeBundle, options?: { displayId?: string; update?: boolean }): void;
}

/** A fresh display id (random UUID: ids must not collide across cells, kernels or notebooks). */
export function newDisplayId(prefix = "caloric"): string {
  return `${prefix}-${globalThis.crypto.randomUUID()}`;
}

/** When progress displays appear and how often they change. Config flows in from the session. */
export interface ProgressTiming {
  /** Clock in milliseconds (default performance.now); injectable for tests. */
  now?: () => number;
  /** No display before the work has run this many milliseconds (default 500). */
  startAfter?: number;
  /** Minimum milliseconds between partial updates (default 500). */
  minInterval?: number;
}

export const DEFAULT_START_AFTER_MS = 500;
export const DEFAULT_MIN_INTERVAL_MS = 500;

/** How far a piece of work has come: done of total (total unknown when absent). */
export interface Progress {
  done: number;
  total?: number;
  /** What is counted (default "points"). */
  unit?: string;
}

/** "in progress: 120 of 600 points" */
export function progressText(p: Progress, state = "in progress"): string {
  return `${state}: ${p.done}${p.total === undefined ? "" : ` of ${p.total}`} ${p.unit ?? "points"}`;
}

const sizeOf = (bundle: MimeBundle): { width: number; height: number } => {
  const vl = bundle[MIME.vegalite] as { width?: unknown; height?: unknown } | undefined;
  // The finished picture adds title, legend and padding around the plot area; come close to it so
  // the output does not jump much when the final chart replaces the placeholder.
  const w = typeof vl?.width === "number" ? vl.width + 150 : 630;
  const h = typeof vl?.height === "number" ? vl.height + 110 : 410;
  return { width: Math.round(w), height: Math.round(h) };
};

/**
 * A small well-formed SVG standing in for a chart that is still being computed: a frame in the
 * chart style with the chart's title and a status line. No vega needed, so it is made synchronously.
 */
export function placeholderSvg(status: string, options: { title?: string; width?: number; height?: number } = {}): string {
  const width = options.width ?? 630;
  const height = options.height ?? 410;
  if (!(width > 0 && height > 0)) throw new RangeError(`placeholder: width and height must be positive, got ${width} x ${height}`);
  const font = escapeHtml(CHART_FONT);
  const title = options.title
    ? `<text x="24" y="36" font-family="${font}" font-size="14" font-weight="bold" fill="#2b2b28">${escapeHtml(options.title)}</text>` : "";
  return [
    `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}" class="caloric-progress">`,
    `<rect x="0.5" y="0.5" width="${width - 1}" height="${height - 1}" fill="${CHART_BACKGROUND}" stroke="#cfcdc4" stroke-dasharray="6 4"/>`,
    title,
    `<text x="${width / 2}" y="${height / 2}" text-anchor="middle" font-family="${font}" font-size="13" fill="#5d5b55">${escapeHtml(status)}</text>`,
    `</svg>`,
  ].join("");
}

/**
 * A partial chart bundle: the chart's text with a status line appended, its Vega-Lite spec, and a
 * placeholder SVG, so the engine sends it at once (it is not pending) and text-only front ends see
 * the status. Any PNG copy of an earlier picture is dropped: it would show the wrong curves.
 */
export function partialChartBundle(chart: MimeBundle, status: string): MimeBundle {
  const vl = chart[MIME.vegalite] as { title?: { text?: unknown } } | undefined;
  const title = typeof vl?.title?.text === "string" && vl.title.text ? vl.title.text : undefined;
  const { [MIME.png]: _png, [MIME.svg]: _svg, ...rest } = chart;
  return {
    ...rest,
    [MIME.text]: `${chart[MIME.text]}\n(${status})`,
    [MIME.svg]: placeholderSvg(status, { title, ...sizeOf(chart) }),
  };
}

/**
 * One progress display for one piece of work. Call offer() as often as convenient (it only reads the
 * clock); the partial bundle is built only when an update is due. finish() replaces the display with
 * the final bundle when one was shown; otherwise it sends nothing and the caller returns the bundle
 * as the cell's value.
 */
export class ProgressiveDisplay {
  readonly displayId: string;
  private readonly now: () => number;
  private readonly startAfter: number;
  private readonly minInterval: number;
  private readonly started: number;
  private lastEmit = -Infinity;
  private isShown = false;
  private closed = false;
  private last?: { progress: Progress; build: () => MimeBundle | undefined };

  constructor(private readonly target: DisplayTarget, options: ProgressTiming & { displayId?: string } = {}) {
    this.now = options.now ?? (() => performance.now());
    this.startAfter = options.startAfter ?? DEFAULT_START_AFTER_MS;
    this.minInterval = options.minInterval ?? DEFAULT_MIN_INTERVAL_MS;
    if (!(this.startAfter >= 0)) throw new RangeError(`progressive display: startAfter must be >= 0 ms, got ${this.startAfter}`);
    if (!(this.minInterval >= 0)) throw new RangeError(`progressive display: minInterval must be >= 0 ms, got ${this.minInterval}`);
    this.displayId = options.displayId ?? newDisplayId();
    this.started = this.now();
  }

  /** True once a partial display has been sent. */
  get shown(): boolean {
    return this.isShown;
  }

  /**
   * Reports progress; sends a partial update when the start delay and the interval have passed.
   * build returns the chart as it stands (a chart bundle) or undefined when there is nothing to
   * draw yet. Returns true when an update was sent.
   */
  offer(progress: Progress, build: () => MimeBundle | undefined): boolean {
    if (this.closed) throw new Error("progressive display: offer() after finish()");
    this.last = { progress, build };
    const t = this.now();
    if (t - this.started < this.startAfter || t - this.lastEmit < this.minInterval) return false;
    const chart = build();
    if (!chart) return false;
    this.send(partialChartBundle(chart, progressText(progress)));
    this.lastEmit = t;
    return true;
  }

  /**
   * Ends the work. When a partial display was shown, it is replaced by `final` (sent as an update)
   * and the display id is returned; otherwise nothing is sent. A final chart still needing its
   * pictures is announced first by a partial saying the work is done and the picture is being
   * drawn: the engine draws it only after the cell returns, which takes seconds for big charts,
   * and the last "in progress" count should not stand meanwhile.
   */
  finish(final: MimeBundle): { bundle: MimeBundle; displayId?: string } {
    if (this.closed) throw new Error("progressive display: finish() called twice");
    this.closed = true;
    if (!this.isShown) return { bundle: final };
    if (isPending(final)) {
      const p = this.last?.progress;
      const count = p ? `${p.total ?? p.done} ${p.unit ?? "points"}` : "all points";
      this.send(partialChartBundle(final, `computed ${count}; drawing the chart`));
    }
    this.send(final);
    return { bundle: final, displayId: this.displayId };
  }

  /**
   * The work stopped early (interrupt, error): a shown display is replaced by the last partial chart
   * marked as stopped, so no "in progress" frame is left on the page. Nothing is sent otherwise.
   */
  abandon(reason: string): void {
    if (this.closed) return;
    this.closed = true;
    if (!this.isShown || !this.last) return;
    let chart: MimeBundle | undefined;
    try {
      chart = this.last.build();
    } catch {
      chart = undefined; // the reason below still reaches the page
    }
    const status = `${progressText(this.last.progress, "stopped")}: ${reason}`;
    this.send(chart ? partialChartBundle(chart, status) : { [MIME.text]: `(${status})` });
  }

  private send(bundle: MimeBundle): void {
    this.target.display(bundle, this.isShown ? { displayId: this.displayId, update: true } : { displayId: this.displayId });
    this.isShown = true;
  }
}

export interface ProgressiveOptions extends ProgressTiming {
  displayId?: string;
  /** Expected number of points in all, shown as progress. */
  total?: number;
}

/**
 * A line/point chart filled point by point (lib/display's chartBundle layout) on top of
 * ProgressiveDisplay. For charts with their own layout (departure and Z charts), use
 * ProgressiveDisplay with a builder directly.
 */
export class ProgressiveChart {
  private readonly series: { label: string; style?: string; x: number[]; y: number[] }[];
  private readonly display: ProgressiveDisplay;
  private count = 0;

  constructor(private readonly spec: Omit<ChartSpec, "series"> & { series: readonly Pick<Series, "label" | "style">[] },
    target: DisplayTarget, private readonly options: ProgressiveOptions = {}) {
    if (spec.series.length === 0) throw new RangeError("progressive chart: needs at least one series, got none");
    this.series = spec.series.map((s) => ({ label: s.label, ...(s.style === undefined ? {} : { style: s.style }), x: [], y: [] }));
    this.display = new ProgressiveDisplay(target, options);
  }

  get displayId(): string {
    return this.display.displayId;
  }

  get shown(): boolean {
    return this.display.shown;
  }

  /** Appends one point to a series (by index or label); may send a throttled partial update. */
  add(series: number | string, x: number, y: number): void {
    const k = typeof series === "number" ? series : this.series.findIndex((s) => s.label === series);
    const s = this.series[k];
    if (!s) throw new RangeError(`progressive chart: no series ${JSON.stringify(series)}; have ${this.series.map((t) => `'${t.label}'`).join(", ")}`);
    s.x.push(x);
    s.y.push(y);
    this.count++;
    this.display.offer({ done: this.count, total: this.options.total }, () => this.bundle());
  }

  /** The chart as it stands (a pending chart bundle, without pictures). */
  bundle(): MimeBundle {
    return chartBundle({ ...this.spec, series: this.series });
  }

  /** The complete chart: replaces the partial display when one was shown (then displayId is set). */
  finish(): { bundle: MimeBundle; displayId?: string } {
    return this.display.finish(this.bundle());
  }

  /** Marks a shown display as stopped (see ProgressiveDisplay.abandon). */
  abandon(reason: string): void {
    this.display.abandon(reason);
  }
}
