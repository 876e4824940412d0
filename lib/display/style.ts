/**
 * Caloric's own chart look: a warm off-white card, muted grid, one sans-serif family that ships with
 * the package (DejaVu Sans, so the PNG copy renders identically on a machine without fonts), and a
 * palette chosen for contrast between neighbouring series and for greyscale printing.
 */

/** The font family name written into the SVG; the PNG renderer loads exactly this family. */
export const CHART_FONT_FAMILY = "DejaVu Sans";
/** Fallbacks matter only in browsers showing the SVG; resvg resolves the first name. */
export const CHART_FONT = `${CHART_FONT_FAMILY}, Verdana, Arial, sans-serif`;

/** Series colours in order: teal, rust, olive, plum, slate blue, ochre, brick, sea green. */
export const PALETTE = [
  "#17708a", "#c8582a", "#6c7f1f", "#8a3f7a", "#4f5fa8", "#b88a12", "#a33b3b", "#2f8f6b",
] as const;

/** Stroke dash patterns for a second grouping (e.g. one per model in a comparison). */
export const DASHES = [[1, 0], [7, 3], [2, 2], [9, 3, 2, 3], [4, 4]] as const;

export const CHART_BACKGROUND = "#fbfaf6";

/** Vega-Lite config block (plain JSON, no functions: it travels inside the notebook). */
export function chartConfig(): Record<string, unknown> {
  const ink = "#2b2b28";
  return {
    font: CHART_FONT,
    background: CHART_BACKGROUND,
    padding: 12,
    view: { stroke: "#cfcdc4", strokeWidth: 1 },
    title: { anchor: "start", fontSize: 14, fontWeight: "bold", color: ink, subtitleColor: "#5d5b55", offset: 10 },
    axis: {
      labelColor: "#45443f", titleColor: ink, titleFontWeight: "normal", titleFontSize: 12, labelFontSize: 10.5,
      domainColor: "#8a877d", tickColor: "#8a877d", gridColor: "#e6e3da", gridDash: [3, 2], titlePadding: 8,
    },
    legend: { labelColor: "#45443f", titleColor: ink, titleFontWeight: "normal", labelFontSize: 10.5, symbolStrokeWidth: 2 },
    line: { strokeWidth: 1.8, strokeCap: "round", strokeJoin: "round" },
    point: { size: 28, filled: true },
  };
}
