/**
 * Progressive output for long sweeps: one display (a display_id) that is shown once and then
 * updated as points arrive, the final chart replacing the partial ones (update_display_data).
 *
 * The target is anything with CellSink's display(bundle, {displayId, update}) signature; the
 * engine renders each bundle (renderPending) before sending. Updates are throttled by time so a
 * fast sweep does not spend its time drawing.
 */
import { chartBundle, type ChartSpec, type Series } from "./chart.js";
import { MIME, type MimeBundle } from "./mime.js";

export interface DisplayTarget {
  display(bundle: MimeBundle, options?: { displayId?: string; update?: boolean }): void;
}

/** A fresh display id (random UUID: ids must not collide across cells, kernels or notebooks). */
export function newDisplayId(prefix = "caloric"): string {
  return `${prefix}-${globalThis.crypto.randomUUID()}`;
}

export interface ProgressiveOptions {
  displayId?: string;
  /** Minimum milliseconds between partial updates (default 500). */
  minInterval?: number;
  /** Expected number of points in all, shown as progress in the partial text. */
  total?: number;
  /** Clock in milliseconds (default Date.now); injectable for tests. */
  now?: () => number;
}

export class ProgressiveChart {
  readonly displayId: string;
  private readonly series: { label: string; style?: string; x: number[]; y: number[] }[];
  private shown = false;
  private finished = false;
  private lastEmit = -Infinity;
  private count = 0;
  private readonly now: () => number;
  private readonly minInterval: number;

  constructor(private readonly spec: Omit<ChartSpec, "series"> & { series: readonly Pick<Series, "label" | "style">[] },
    private readonly target: DisplayTarget, private readonly options: ProgressiveOptions = {}) {
    if (spec.series.length === 0) throw new RangeError("progressive chart: needs at least one series, got none");
    this.series = spec.series.map((s) => ({ label: s.label, ...(s.style === undefined ? {} : { style: s.style }), x: [], y: [] }));
    this.displayId = options.displayId ?? newDisplayId();
    this.now = options.now ?? Date.now;
    this.minInterval = options.minInterval ?? 500;
    if (!(this.minInterval >= 0)) throw new RangeError(`progressive chart: minInterval must be >= 0 ms, got ${this.minInterval}`);
  }

  /** Appends one point to a series (by index or label); may send a throttled partial update. */
  add(series: number | string, x: number, y: number): void {
    if (this.finished) throw new Error("progressive chart: add() after finish()");
    const k = typeof series === "number" ? series : this.series.findIndex((s) => s.label === series);
    const s = this.series[k];
    if (!s) throw new RangeError(`progressive chart: no series ${JSON.stringify(series)}; have ${this.series.map((t) => `'${t.label}'`).join(", ")}`);
    s.x.push(x);
    s.y.push(y);
    this.count++;
    if (this.now() - this.lastEmit >= this.minInterval) this.emit(false);
  }

  /** The chart as it stands; final = without the progress line. */
  bundle(final: boolean): MimeBundle {
    const b = chartBundle({ ...this.spec, series: this.series });
    if (final) return b;
    const total = this.options.total ? ` of ${this.options.total}` : "";
    return { ...b, [MIME.text]: `${b[MIME.text]}\n(in progress: ${this.count}${total} points)` };
  }

  /** Sends the complete chart, replacing the partial one; returns the final bundle. */
  finish(): MimeBundle {
    if (this.finished) throw new Error("progressive chart: finish() called twice");
    const final = this.emit(true);
    this.finished = true;
    return final;
  }

  private emit(final: boolean): MimeBundle {
    const b = this.bundle(final);
    this.target.display(b, this.shown ? { displayId: this.displayId, update: true } : { displayId: this.displayId });
    this.shown = true;
    this.lastEmit = this.now();
    return b;
  }
}
