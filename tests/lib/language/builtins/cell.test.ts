import { describe, expect, it } from "vitest";
import { createSession } from "../../../../lib/language/index.js";
import type { MimeBundle } from "../../../../lib/display/index.js";

function capture() {
  const out: string[] = [];
  const shown: MimeBundle[] = [];
  return { out, shown, sink: { stdout: (t: string) => out.push(t), display: (b: MimeBundle) => shown.push(b), clear() {} } };
}

describe("echo", () => {
  it("echo writes its arguments as one line to stdout and shows no value", () => {
    const s = createSession({ shouldStop: () => false });
    const c = capture();
    const r = s.run('echo("P =", 2.5 bar, 3)', c.sink);
    expect(c.out).toEqual(["P = 2.5 bar 3\n"]);
    expect(r).toEqual({ ok: true });
  });
});

describe("show", () => {
  it("show displays a record's table in the middle of a cell", () => {
    const s = createSession({ shouldStop: () => false });
    const c = capture();
    const r = s.run("show({T: 300 K})\n1 + 1", c.sink);
    expect(c.shown[0]!["text/plain"]).toBe("T  300 K");
    expect(String(c.shown[0]!["text/html"])).toContain("<table");
    expect(r.ok && r.result?.["text/plain"]).toBe("2");
  });
});

describe("clear", () => {
  it("clear asks the front end to clear the cell's output, now or at the next output", () => {
    const s = createSession({ shouldStop: () => false });
    const waits: boolean[] = [];
    const sink = { stdout() {}, display() {}, clear: (w: boolean) => waits.push(w) };
    expect(s.run("clear()\nclear(true)", sink)).toEqual({ ok: true });
    expect(waits).toEqual([false, true]);
  });
});
