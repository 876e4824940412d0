/**
 * Finishing display bundles before they leave the engine: lib/display's renderPending adds the SVG and
 * PNG copies to chart bundles (vega and resvg load on the first chart only); other bundles pass through.
 */
import { chartBundle, isPending, renderPending, type MimeBundle } from "../../lib/display/index.js";

const isBundle = (v: unknown): v is MimeBundle => typeof v === "object" && v !== null && typeof (v as Record<string, unknown>)["text/plain"] === "string";

/** Where a message carries a bundle: an output's bundle, or the result bundle of a cell run. */
type Slot = { bundle: MimeBundle; put(finished: MimeBundle): unknown };

function slotOf(message: unknown): Slot | undefined {
  const m = message as Record<string, unknown>;
  const output = m.output as { kind?: string; bundle?: unknown } | undefined;
  if (output?.kind === "display" && isBundle(output.bundle)) return { bundle: output.bundle, put: (b) => ({ ...m, output: { ...output, bundle: b } }) };
  const value = m.value as { ok?: boolean; result?: unknown } | undefined;
  if (value?.ok === true && isBundle(value.result)) return { bundle: value.result, put: (b) => ({ ...m, value: { ...value, result: b } }) };
  if (m.ok === true && isBundle(m.result)) return { bundle: m.result, put: (b) => ({ ...m, result: b }) };
  return undefined;
}

/**
 * True when finishBundles would change the message (it carries a chart without its pictures). The
 * worker sends every other message at once, which keeps plain outputs live while a long cell runs
 * and spares the round trip of a trivial cell the asynchronous chain.
 */
export function needsFinishing(message: unknown): boolean {
  const slot = slotOf(message);
  return slot !== undefined && isPending(slot.bundle);
}

/**
 * Returns the message with every MIME bundle it carries finished: an output's bundle, or the result
 * bundle of a cell run ({ok: true, result}). Anything else is returned as it is.
 */
export async function finishBundles<T>(message: T): Promise<T> {
  const slot = slotOf(message);
  if (!slot || !isPending(slot.bundle)) return message;
  return slot.put(await renderPending(slot.bundle)) as T;
}

/**
 * Loads and exercises the chart renderer once (a three-point chart, SVG and PNG), so the user's first
 * chart costs what later ones do. Failures are ignored: the first real chart reports them.
 */
export async function warmRenderer(): Promise<boolean> {
  try {
    const warm = await renderPending(chartBundle({ x: { title: "x" }, y: { title: "y" }, series: [{ label: "warm-up", x: [0, 1, 2], y: [0, 1, 4] }] }));
    return typeof warm["image/svg+xml"] === "string";
  } catch {
    return false;
  }
}
