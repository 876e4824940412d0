/**
 * Finishing display bundles before they leave the engine: lib/display's renderPending adds the SVG and
 * PNG copies to chart bundles (vega and resvg load on the first chart only); other bundles pass through.
 */
import { renderPending, type MimeBundle } from "../../lib/display/index.js";

const isBundle = (v: unknown): v is MimeBundle => typeof v === "object" && v !== null && typeof (v as Record<string, unknown>)["text/plain"] === "string";

/**
 * Returns the message with every MIME bundle it carries finished: an output's bundle, or the result
 * bundle of a cell run ({ok: true, result}). Anything else is returned as it is.
 */
export async function finishBundles<T>(message: T): Promise<T> {
  const m = message as Record<string, unknown>;
  const output = m.output as { kind?: string; bundle?: unknown } | undefined;
  if (output?.kind === "display" && isBundle(output.bundle)) {
    return { ...m, output: { ...output, bundle: await renderPending(output.bundle) } } as T;
  }
  const value = m.value as { ok?: boolean; result?: unknown } | undefined;
  if (value?.ok === true && isBundle(value.result)) {
    return { ...m, value: { ...value, result: await renderPending(value.result) } } as T;
  }
  if (m.ok === true && isBundle(m.result)) return { ...m, result: await renderPending(m.result) } as T;
  return message;
}
