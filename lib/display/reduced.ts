/**
 * Generalized (corresponding-states) charts: a dimensionless departure function or the
 * compressibility factor Z against reduced pressure Pr = P/Pc, one curve per reduced temperature
 * Tr = T/Tc, for one model or a comparison of models (colour = Tr, dash = model).
 *
 * The curves arrive computed (lib/thermo does the thermodynamics); this file only lays them out.
 */
import { chartBundle, type ChartSpec, type Series } from "./chart.js";
import { shortNumber } from "./format.js";
import type { MimeBundle } from "./mime.js";

export interface ReducedCurve {
  /** Reduced temperature T/Tc of this isotherm. */
  Tr: number;
  /** Model label (e.g. "Peng-Robinson"); curves without one form a single-model chart. */
  model?: string;
  Pr: readonly number[];
  values: readonly number[];
}

/**
 * Which dimensionless departure is plotted. Signs as computed by the caller (departure = real minus
 * ideal gas at the same T and P); the axis title states the group exactly.
 */
export type DepartureProperty = "H" | "S" | "U" | "G" | "A" | "lnphi" | "phi";

export const DEPARTURE_TITLES: Readonly<Record<DepartureProperty, string>> = {
  H: "HR/(R·Tc)",
  S: "SR/R",
  U: "UR/(R·Tc)",
  G: "GR/(R·T)",
  A: "AR/(R·T)",
  lnphi: "ln φ",
  phi: "φ = f/P",
};

export interface ReducedChartOptions {
  title?: string;
  subtitle?: string;
  /** Logarithmic Pr axis (default false). */
  logPr?: boolean;
  mark?: ChartSpec["mark"];
  notes?: readonly string[];
}

function reducedSeries(curves: readonly ReducedCurve[], where: string): Series[] {
  if (!Array.isArray(curves) || curves.length === 0) throw new RangeError(`${where}: needs at least one curve, got none`);
  return curves.map((c, k) => {
    if (!(Number.isFinite(c.Tr) && c.Tr > 0)) {
      throw new RangeError(`${where}: curve ${k + 1} needs a positive reduced temperature Tr, got ${String(c.Tr)}`);
    }
    if (c.Pr.length !== c.values.length) {
      throw new RangeError(`${where}: curve Tr = ${shortNumber(c.Tr)} has ${c.Pr.length} Pr values but ${c.values.length} property values`);
    }
    const series: Series = { label: `Tr = ${shortNumber(c.Tr)}`, x: c.Pr, y: c.values };
    return c.model === undefined ? series : { ...series, style: c.model };
  });
}

function reducedSpec(curves: readonly ReducedCurve[], yTitle: string, where: string, o: ReducedChartOptions): ChartSpec {
  const series = reducedSeries(curves, where);
  const models = [...new Set(curves.flatMap((c) => (c.model === undefined ? [] : [c.model])))];
  return {
    title: o.title,
    subtitle: o.subtitle ?? (models.length === 1 ? models[0] : models.length > 1 ? models.join(" vs ") : undefined),
    x: { title: "reduced pressure Pr = P/Pc", log: o.logPr ?? false, zero: !o.logPr },
    y: { title: yTitle },
    series,
    mark: o.mark,
    seriesTitle: "Tr = T/Tc",
    styleTitle: models.length ? "model" : undefined,
    notes: o.notes,
  };
}

/** Departure-function chart: a dimensionless departure vs Pr, one curve per Tr (and per model). */
export function departureChartSpec(property: DepartureProperty, curves: readonly ReducedCurve[], options: ReducedChartOptions = {}): ChartSpec {
  const yTitle = DEPARTURE_TITLES[property];
  if (yTitle === undefined) {
    throw new RangeError(`departure chart: property must be one of ${Object.keys(DEPARTURE_TITLES).join(", ")}, got '${String(property)}'`);
  }
  return reducedSpec(curves, yTitle, "departure chart", {
    ...options, title: options.title ?? `Departure ${yTitle} vs reduced pressure`,
  });
}

export function departureChart(property: DepartureProperty, curves: readonly ReducedCurve[], options: ReducedChartOptions = {}): MimeBundle {
  return chartBundle(departureChartSpec(property, curves, options));
}

/** Generalized compressibility chart: Z = PV/(RT) vs Pr, one curve per Tr (and per model). */
export function zChartSpec(curves: readonly ReducedCurve[], options: ReducedChartOptions = {}): ChartSpec {
  return reducedSpec(curves, "Z = PV/(RT)", "Z chart", { ...options, title: options.title ?? "Generalized compressibility factor" });
}

export function zChart(curves: readonly ReducedCurve[], options: ReducedChartOptions = {}): MimeBundle {
  return chartBundle(zChartSpec(curves, options));
}
