import { describe, expect, it } from "vitest";
import { MIME, type MimeBundle } from "../../../lib/display/mime.js";
import { newDisplayId, ProgressiveChart } from "../../../lib/display/progressive.js";

type Call = { bundle: MimeBundle; options?: { displayId?: string; update?: boolean } };

function recorder() {
  const calls: Call[] = [];
  return { calls, target: { display: (bundle: MimeBundle, options?: Call["options"]) => calls.push({ bundle, options }) } };
}

const spec = { x: { title: "P", unit: "bar" }, y: { title: "Z" }, series: [{ label: "300 K" }, { label: "400 K" }] };

describe("ProgressiveChart", () => {
  it("ProgressiveChart shows once, then updates the same display id, throttled by time", () => {
    let t = 0;
    const { calls, target } = recorder();
    const p = new ProgressiveChart(spec, target, { minInterval: 100, total: 4, now: () => t });
    p.add(0, 1, 0.99); // first point: shown at once
    t = 50;
    p.add("300 K", 2, 0.98); // within the interval: no update
    t = 150;
    p.add(1, 1, 0.995); // interval passed: update
    const final = p.finish();
    expect(calls.map((c) => c.options)).toEqual([
      { displayId: p.displayId }, { displayId: p.displayId, update: true }, { displayId: p.displayId, update: true },
    ]);
    expect(calls[0]!.bundle[MIME.text]).toContain("(in progress: 1 of 4 points)");
    expect(calls[1]!.bundle[MIME.text]).toContain("(in progress: 3 of 4 points)");
    expect(final[MIME.text]).not.toContain("in progress");
    expect(final[MIME.text]).toContain("300 K: 2 points");
    expect(calls[2]!.bundle).toBe(final);
  });
  it("ProgressiveChart refuses unknown series and use after finish", () => {
    const { target } = recorder();
    const p = new ProgressiveChart(spec, target, { displayId: "d1" });
    expect(p.displayId).toBe("d1");
    expect(() => p.add("500 K", 1, 1)).toThrow(/no series "500 K"; have '300 K', '400 K'/);
    p.add(0, 1, 1);
    p.finish();
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
