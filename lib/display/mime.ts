/**
 * MIME type strings, defined once. Every output of Caloric is a bundle keyed by these.
 */
export const MIME = {
  text: "text/plain",
  html: "text/html",
  markdown: "text/markdown",
  latex: "text/latex",
  svg: "image/svg+xml",
  png: "image/png",
  vegalite: "application/vnd.vegalite.v5+json",
  /** Design-check rows (verify): read by the headless runner. */
  check: "application/vnd.caloric.check+json",
} as const;

/** A Jupyter MIME bundle: text/plain is always present. Binary types (PNG) are base64 strings. */
export type MimeBundle = { [MIME.text]: string } & Record<string, unknown>;

/**
 * The Vega-Lite schema every chart declares, pinned here once. It matches the MIME type above (v5):
 * front ends pick their renderer by MIME type and check the schema's major version. The specs use
 * only features common to Vega-Lite 5 and the 6.x compiler installed here.
 */
export const VEGA_LITE_SCHEMA = "https://vega.github.io/schema/vega-lite/v5.json";
