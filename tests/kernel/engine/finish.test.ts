import { describe, expect, it } from "vitest";
import { chartBundle, MIME } from "../../../lib/display/index.js";
import { finishBundles, needsFinishing, warmRenderer } from "../../../kernel/engine/finish.js";

describe("finishBundles", () => {
  it("finishBundles leaves messages without bundles and plain bundles untouched", async () => {
    const stdout = { kind: "output", id: 1, output: { kind: "stdout", text: "x" } };
    expect(await finishBundles(stdout)).toBe(stdout);
    const plain = { kind: "output", id: 1, output: { kind: "display", bundle: { [MIME.text]: "5 bar" } } };
    expect(await finishBundles(plain)).toEqual(plain);
  });
  it("finishBundles adds SVG and PNG to a chart bundle in a display output and in a cell result", async () => {
    const bundle = chartBundle({ x: { title: "P", unit: "bar" }, y: { title: "Z" }, series: [{ label: "Z", x: [1, 2, 3], y: [1, 0.98, 0.95] }] });
    expect(bundle[MIME.svg]).toBeUndefined();
    const out = await finishBundles({ kind: "output", id: 1, output: { kind: "display", bundle } });
    expect(String((out.output.bundle as Record<string, unknown>)[MIME.svg])).toContain("<svg");
    const done = await finishBundles({ kind: "done", id: 2, value: { ok: true, result: bundle } });
    expect(String((done.value.result as Record<string, unknown>)[MIME.svg])).toContain("<svg");
    expect(typeof (done.value.result as Record<string, unknown>)[MIME.png]).toBe("string");
  });
  it("needsFinishing is true only for a chart bundle still without its SVG, wherever the message carries it", () => {
    const chart = chartBundle({ x: { title: "P", unit: "bar" }, y: { title: "Z" }, series: [{ label: "Z", x: [1, 2], y: [1, 0.98] }] });
    expect(needsFinishing({ kind: "output", id: 1, output: { kind: "display", bundle: chart } })).toBe(true);
    expect(needsFinishing({ kind: "done", id: 1, value: { ok: true, result: chart } })).toBe(true);
    expect(needsFinishing({ ok: true, result: chart })).toBe(true);
    expect(needsFinishing({ kind: "done", id: 1, value: { ok: true, result: { ...chart, [MIME.svg]: "<svg/>" } } })).toBe(false);
    expect(needsFinishing({ kind: "done", id: 1, value: { ok: true, result: { [MIME.text]: "2 bar" } } })).toBe(false);
    expect(needsFinishing({ kind: "output", id: 1, output: { kind: "stdout", text: "x" } })).toBe(false);
    expect(needsFinishing({ kind: "done", id: 1, value: { ok: false, error: { ename: "E", evalue: "", traceback: [] } } })).toBe(false);
  });
});

describe("warmRenderer", () => {
  it("warmRenderer loads the chart renderer and reports that a picture was made", async () => {
    expect(await warmRenderer()).toBe(true);
  });
});
