import { describe, expect, it } from "vitest";
import { createSession } from "../../../lib/language/index.js";
import { createSessionWithInternals } from "../../../lib/language/createSession.js";
import type { MimeBundle } from "../../../lib/display/index.js";
import { defineBuiltin } from "../../../lib/language/builtins/define.js";

function capture() {
  const out: string[] = [];
  const shown: string[] = [];
  return { out, shown, sink: { stdout: (t: string) => out.push(t), display: (b: MimeBundle) => shown.push(b["text/plain"]), clear() {} } };
}
const text = (r: ReturnType<ReturnType<typeof createSession>["run"]>) => (r.ok ? r.result?.["text/plain"] : `ERROR ${r.error.evalue}`);

describe("run", () => {
  it("run shows earlier visible values via display and the last as the result; `;` hides", () => {
    const s = createSession({ shouldStop: () => false });
    const c = capture();
    const r = s.run("# comment line\n\na = 2 bar\nb = a * 2;  # hidden\nb\nb to kPa", c.sink);
    expect(c.shown).toEqual(["a = 2 bar", "4 bar"]);
    // 4 bar = 400 kPa (bar = 100 kPa, NIST SP 811 B.8).
    expect(text(r)).toBe("400 kPa");
  });
  it("run warns once per name when a variable or function takes a built-in's name", () => {
    const s = createSession({ shouldStop: () => false });
    const c = capture();
    expect(text(s.run("state = 3", c.sink))).toBe("state = 3");
    s.run("state = 4\npsat(x) = x", c.sink);
    expect(c.out.filter((t) => /hides the built-in state\(\)/.test(t))).toHaveLength(1);
    expect(c.out.filter((t) => /hides the built-in psat\(\)/.test(t))).toHaveLength(1);
    s.run("pressure1 = 2", c.sink);
    expect(c.out).toHaveLength(2);
  });
  it("run keeps variables and functions across cells and after errors", () => {
    const s = createSession({ shouldStop: () => false });
    const c = capture();
    s.run("f(x) = 2 x\nk = 3", c.sink);
    expect(s.run("k = 10\nundefinedThing + 1\nk = 99", c.sink).ok).toBe(false);
    expect(text(s.run("f(k)", c.sink))).toBe("20");
  });
  it("run stops between statements when shouldStop is true and keeps earlier assignments", () => {
    let calls = 0;
    const { session, internals } = createSessionWithInternals({ shouldStop: () => ++calls > 2 });
    const r = session.run("a1 = 1\na2 = 2\na3 = 3\na4 = 4", capture().sink);
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.error.ename).toBe("Interrupted");
      expect(r.error.evalue).toMatch(/line 3, column 1/);
    }
    expect(internals.scope.get("a2")).toBe(2);
    expect(internals.scope.has("a3")).toBe(false);
  });
  it("run reports line, column and a caret under an unknown name, with suggestions", () => {
    const s = createSession({ shouldStop: () => false });
    // A name no built-in resembles (the thermo group registers pressure(), which is one edit from "pressur1").
    s.run("dpline1 = 3 bar", capture().sink);
    const r = s.run("x = 1\ny = 2 *  dplne1", capture().sink);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.error.ename).toBe("NameError");
    expect(r.error.evalue).toBe('unknown name "dplne1"; did you mean "dpline1"? (line 2, column 10)');
    expect(r.error.traceback.slice(-2)).toEqual(["    y = 2 *  dplne1", "             ^^^^^^"]);
  });
  it("run points a syntax error at its column on the right line", () => {
    const r = createSession({ shouldStop: () => false }).run("a = 1\nb = (2 + * 3)", capture().sink);
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.error.ename).toBe("SyntaxError");
      expect(r.error.evalue).toMatch(/line 2, column 1[01]\)/);
    }
  });
  it("run translates a wrong dimension in a built-in into argument/expected/got", () => {
    const r = createSession({ shouldStop: () => false }).run("span(1 K, 2 K, 3 bar)", capture().sink);
    expect(r.ok ? "" : r.error.evalue).toMatch(/argument n of span\(\) needs a plain number.*got 3 bar \(a pressure\)/);
  });
  it("run allows statements spanning lines inside brackets and strings containing # and ;", () => {
    const s = createSession({ shouldStop: () => false });
    const r = s.run('t = "a#b;c"\nm = [1, 2;\n 3, 4]\nsize(m)', capture().sink);
    expect(text(r)).toBe("[2, 2]");
  });
  it("run keeps offsets honest: difference of two absolute temperatures is in K", () => {
    // 80 degC - 20 degC is a difference of 60 K (ITS-90: the degree Celsius equals the kelvin in size).
    const r = createSession({ shouldStop: () => false }).run("(80 degC - 20 degC) to K", capture().sink);
    expect(text(r)).toBe("60 K");
  });
});

describe("evaluateExpression", () => {
  it("evaluateExpression returns the value without displays and sees the scope", () => {
    const s = createSession({ shouldStop: () => false });
    s.run("q = 5", capture().sink);
    expect(text(s.evaluateExpression("q * 2"))).toBe("10");
  });
});

describe("run with values already shown", () => {
  // A built-in that shows its result under a display id and returns it marked with that id, as the
  // progressive charts do after a long sweep.
  const shownOnce = defineBuiltin({
    name: "shown_once", group: "test", params: [], returns: "any", doc: "test", examples: ["shown_once()"],
    impl: (_a, ctx) => {
      const bundle = { "text/plain": "the chart" };
      ctx.display(bundle, { displayId: "d-1" });
      return { kind: "chart", toBundle: () => bundle, toText: () => "the chart", displayId: "d-1" };
    },
  });
  it("run leaves out a value its built-in already showed, once per cell; later cells and show() repeat it", () => {
    const { session } = createSessionWithInternals({ shouldStop: () => false }, [shownOnce]);
    const c = capture();
    const r = session.run("x = shown_once()", c.sink);
    expect(c.shown).toEqual(["the chart"]);
    expect(r).toEqual({ ok: true });
    expect(text(session.run("x", c.sink))).toBe("the chart");
    const d = capture();
    expect(text(session.run("show(x); 2", d.sink))).toBe("2");
    expect(d.shown).toEqual(["the chart"]);
    // Same cell: the producing statement is skipped, a later line naming the value shows it.
    expect(text(session.run("y = shown_once()\ny", capture().sink))).toBe("the chart");
  });
  it("run keeps outputs in statement order when a later statement displays (show, progress)", () => {
    const { session } = createSessionWithInternals({ shouldStop: () => false }, [shownOnce]);
    const c = capture();
    expect(text(session.run("1 bar\nshow(2 bar)\n3 bar", c.sink))).toBe("3 bar");
    expect(c.shown).toEqual(["1 bar", "2 bar"]);
    const d = capture();
    expect(session.run("5\nx = shown_once()", d.sink)).toEqual({ ok: true });
    expect(d.shown).toEqual(["5", "the chart"]);
  });
  it("evaluateExpression returns the value: nothing was shown to a user", () => {
    const { session } = createSessionWithInternals({ shouldStop: () => false }, [shownOnce]);
    expect(text(session.evaluateExpression("shown_once()"))).toBe("the chart");
  });
});
