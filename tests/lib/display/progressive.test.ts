import { describe, expect, it } from "vitest";
import { MIME, type MimeBundle } from "../../../lib/display/mime.js";
import { isPending } from "../../../lib/display/render.js";
import { chartBundle } from "../../../lib/display/chart.js";
import {
  newDisplayId, partialChartBundle, placeholderSvg, ProgressiveChart, ProgressiveDisplay, progressText,
} from "../../../lib/display/progressive.js";

type Call = { bundle: MimeBundle; options?: { displayId?: string; update?: boolean } };

function recorder() {
  const calls: Call[] = [];
  return { calls, target: { display: (bundle: MimeBundle, options?: Call["options"]) => calls.push({ bundle, options }) } };
}

const spec = { title: "Z of a test gas", x: { title: "P", unit: "bar" }, y: { title: "Z" }, series: [{ label: "300 K" }, { label: "400 K" }] };
const smallChart = () => chartBundle({ ...spec, series: [{ label: "300 K", x: [1, 2], y: [0.99, 0.98] }] });

/** Minimal XML well-formedness: one root, every tag closed in order, attributes quoted. */
function wellFormed(svg: string): boolean {
  const stack: string[] = [];
  for (const m of svg.matchAll(/<(\/?)([a-zA-Z][\w:-]*)((?:\s+[\w:-]+="[^"<]*")*)\s*(\/?)>/g)) {
    if (m[1]) { if (stack.pop() !== m[2]) return false; } else if (!m[4]) stack.push(m[2]!);
  }
  const stripped = svg.replace(/<[^>]*>/g, "");
  return stack.length === 0 && !/[<>]/.test(stripped) && svg.startsWith("<svg") && svg.endsWith("</svg>");
}

describe("progressText", () => {
  it("progressText counts done of total with the unit", () => {
    expect(progressText({ done: 120, total: 600 })).toBe("in progress: 120 of 600 points");
    expect(progressText({ done: 3, unit: "curves" }, "stopped")).toBe("stopped: 3 curves");
  });
});

describe("placeholderSvg", () => {
  it("placeholderSvg is well-formed SVG with the status and escaped title", () => {
    const svg = placeholderSvg("in progress: 1 of 2 points", { title: "H <R> & co", width: 300, height: 200 });
    expect(wellFormed(svg)).toBe(true);
    expect(svg).toContain("in progress: 1 of 2 points");
    expect(svg).toContain("H &lt;R&gt; &amp; co");
    expect(svg).toContain('width="300"');
    expect(() => placeholderSvg("x", { width: 0 })).toThrow(/width and height must be positive, got 0 x 410/);
  });
});

describe("partialChartBundle", () => {
  it("partialChartBundle keeps the Vega-Lite spec, adds a placeholder SVG and is not pending", () => {
    const chart = smallChart();
    expect(isPending(chart)).toBe(true);
    const p = partialChartBundle({ ...chart, [MIME.png]: "old" }, "in progress: 2 of 10 points");
    expect(isPending(p)).toBe(false);
    expect(p[MIME.vegalite]).toBe(chart[MIME.vegalite]);
    expect(p[MIME.png]).toBeUndefined();
    expect(String(p[MIME.svg])).toContain("in progress: 2 of 10 points");
    expect(String(p[MIME.svg])).toContain("Z of a test gas");
    expect(wellFormed(String(p[MIME.svg]))).toBe(true);
    expect(p[MIME.text]).toBe(`${chart[MIME.text]}\n(in progress: 2 of 10 points)`);
  });
});

describe("ProgressiveDisplay", () => {
  it("ProgressiveDisplay stays silent before startAfter, then shows and updates one display id, throttled", () => {
    let t = 1000;
    const { calls, target } = recorder();
    const d = new ProgressiveDisplay(target, { now: () => t, startAfter: 500, minInterval: 200, displayId: "d1" });
    let builds = 0;
    const build = () => { builds++; return smallChart(); };
    t = 1499;
    expect(d.offer({ done: 1, total: 10 }, build)).toBe(false); // 499 ms < startAfter
    expect(builds).toBe(0); // nothing is drawn before an update is due
    t = 1500;
    expect(d.offer({ done: 2, total: 10 }, build)).toBe(true);
    t = 1699;
    expect(d.offer({ done: 3, total: 10 }, build)).toBe(false); // 199 ms < minInterval
    t = 1700;
    expect(d.offer({ done: 4, total: 10 }, build)).toBe(true);
    expect(builds).toBe(2);
    const final = smallChart();
    const out = d.finish(final);
    expect(out).toEqual({ bundle: final, displayId: "d1" });
    const update = { displayId: "d1", update: true };
    expect(calls.map((c) => c.options)).toEqual([{ displayId: "d1" }, update, update, update]);
    expect(String(calls[0]!.bundle[MIME.svg])).toContain("in progress: 2 of 10 points");
    expect(String(calls[1]!.bundle[MIME.svg])).toContain("in progress: 4 of 10 points");
    // While the engine draws the final picture, the display says the work is done.
    expect(String(calls[2]!.bundle[MIME.svg])).toContain("computed 10 points; drawing the chart");
    expect(calls[2]!.bundle[MIME.vegalite]).toBe(final[MIME.vegalite]);
    expect(isPending(calls[2]!.bundle)).toBe(false);
    expect(calls[3]!.bundle).toBe(final);
    expect(isPending(calls[3]!.bundle)).toBe(true); // the engine renders the final picture
    expect(() => d.offer({ done: 5 }, build)).toThrow(/after finish/);
    expect(() => d.finish(final)).toThrow(/twice/);
  });
  it("ProgressiveDisplay of quick work sends nothing and returns the bundle without a display id", () => {
    const t = 0;
    const { calls, target } = recorder();
    const d = new ProgressiveDisplay(target, { now: () => t });
    d.offer({ done: 1 }, smallChart);
    const final = smallChart();
    expect(d.finish(final)).toEqual({ bundle: final });
    expect(d.shown).toBe(false);
    expect(calls).toHaveLength(0);
  });
  it("ProgressiveDisplay waits when there is nothing to draw yet", () => {
    let t = 0;
    const { calls, target } = recorder();
    const d = new ProgressiveDisplay(target, { now: () => t, startAfter: 0, minInterval: 0 });
    expect(d.offer({ done: 1 }, () => undefined)).toBe(false);
    t = 1;
    expect(d.offer({ done: 2 }, smallChart)).toBe(true);
    expect(calls).toHaveLength(1);
  });
  it("ProgressiveDisplay.abandon marks a shown display as stopped, and is silent when nothing was shown", () => {
    let t = 0;
    const { calls, target } = recorder();
    const d = new ProgressiveDisplay(target, { now: () => t, startAfter: 0, minInterval: 0 });
    d.offer({ done: 5, total: 9 }, smallChart);
    t = 10;
    d.abandon("interrupted");
    expect(calls).toHaveLength(2);
    expect(calls[1]!.options).toEqual({ displayId: d.displayId, update: true });
    expect(String(calls[1]!.bundle[MIME.svg])).toContain("stopped: 5 of 9 points: interrupted");
    expect(calls[1]!.bundle[MIME.text]).toMatch(/\(stopped: 5 of 9 points: interrupted\)$/);
    d.abandon("again"); // closed: no second message
    expect(calls).toHaveLength(2);
    const quiet = recorder();
    new ProgressiveDisplay(quiet.target).abandon("error");
    expect(quiet.calls).toHaveLength(0);
  });
  it("ProgressiveDisplay refuses negative timings", () => {
    const { target } = recorder();
    expect(() => new ProgressiveDisplay(target, { startAfter: -1 })).toThrow(/startAfter must be >= 0 ms, got -1/);
    expect(() => new ProgressiveDisplay(target, { minInterval: Number.NaN })).toThrow(/minInterval must be >= 0 ms, got NaN/);
  });
});

describe("ProgressiveChart", () => {
  it("ProgressiveChart adds points, shows partials under one display id and replaces them at the end", () => {
    let t = 0;
    const { calls, target } = recorder();
    const p = new ProgressiveChart(spec, target, { startAfter: 100, minInterval: 100, total: 4, now: () => t });
    p.add(0, 1, 0.99); // before startAfter: nothing shown
    t = 100;
    p.add("300 K", 2, 0.98); // shown
    t = 150;
    p.add(1, 1, 0.995); // within the interval: no update
    const { bundle: final, displayId } = p.finish();
    expect(displayId).toBe(p.displayId);
    const update = { displayId: p.displayId, update: true };
    expect(calls.map((c) => c.options)).toEqual([{ displayId: p.displayId }, update, update]);
    expect(calls[0]!.bundle[MIME.text]).toContain("(in progress: 2 of 4 points)");
    expect(calls[0]!.bundle[MIME.text]).toContain("300 K: 2 points");
    expect(final[MIME.text]).not.toContain("in progress");
    expect(final[MIME.text]).toContain("400 K: 1 points");
    expect(calls[1]!.bundle[MIME.text]).toContain("(computed 4 points; drawing the chart)");
    expect(calls[2]!.bundle).toBe(final);
  });
  it("ProgressiveDisplay.finish with a bundle that needs no picture sends it alone", () => {
    let t = 0;
    const { calls, target } = recorder();
    const d = new ProgressiveDisplay(target, { now: () => t, startAfter: 0, minInterval: 0 });
    t = 1;
    d.offer({ done: 1 }, smallChart);
    const done = { [MIME.text]: "a table" };
    d.finish(done);
    expect(calls.map((c) => c.bundle)).toEqual([expect.anything(), done]);
  });
  it("ProgressiveChart refuses unknown series and use after finish", () => {
    const { target } = recorder();
    const p = new ProgressiveChart(spec, target, { displayId: "d1" });
    expect(p.displayId).toBe("d1");
    expect(() => p.add("500 K", 1, 1)).toThrow(/no series "500 K"; have '300 K', '400 K'/);
    p.add(0, 1, 1);
    expect(p.finish().displayId).toBeUndefined(); // quick: never shown
    expect(() => p.add(0, 2, 1)).toThrow(/after finish/);
    expect(() => p.finish()).toThrow(/twice/);
    expect(() => new ProgressiveChart({ ...spec, series: [] }, target)).toThrow(/at least one series/);
  });
});

describe("newDisplayId", () => {
  it("newDisplayId gives distinct ids with the prefix", () => {
    const a = newDisplayId("sweep");
    expect(a).toMatch(/^sweep-[0-9a-f-]{36}$/);
    expect(newDisplayId("sweep")).not.toBe(a);
  });
});
