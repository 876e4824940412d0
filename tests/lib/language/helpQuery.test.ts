import { describe, expect, it } from "vitest";
import { answerHelp, helpTarget } from "../../../lib/language/helpQuery.js";
import { createSession } from "../../../lib/language/index.js";

const silent = () => {
  const out: string[] = [];
  return { out, sink: { stdout: (t: string) => out.push(t), display() {}, clear() {} } };
};

describe("helpTarget", () => {
  it("helpTarget recognises ?name and name? and nothing else", () => {
    expect(helpTarget("?psat")).toBe("psat");
    expect(helpTarget("  psat?  ")).toBe("psat");
    expect(helpTarget("? psat")).toBe("psat");
    expect(helpTarget("psat(m, T)")).toBeUndefined();
    expect(helpTarget("a ? b")).toBeUndefined();
    expect(helpTarget("?")).toBeUndefined();
  });
});

describe("answerHelp", () => {
  it("answerHelp returns the inspect bundle at full detail, or a note with close matches", () => {
    const asked: [string, number, number][] = [];
    const inspect = (code: string, pos: number, detail: 0 | 1) => {
      asked.push([code, pos, detail]);
      return code === "psat" ? { found: true, bundle: { "text/plain": "psat help" } } : { found: false };
    };
    expect(answerHelp("psat", inspect, () => [])).toEqual({ found: true, bundle: { "text/plain": "psat help" } });
    expect(asked[0]).toEqual(["psat", 4, 1]);
    const missing = answerHelp("tsatt", inspect, () => ["tsat", "state", "volume"]);
    expect(missing).toEqual({ found: false, note: "No help for 'tsatt': not a known name; did you mean ?tsat or ?state?" });
    expect(answerHelp("qqqq", inspect, () => ["tsat"])).toEqual({ found: false, note: "No help for 'qqqq': not a known name" });
  });
});

describe("run with a help query", () => {
  const s = createSession({ shouldStop: () => false });
  it("run answers ?psat and psat? with the built-in's help as a result marked help", () => {
    for (const code of ["?psat", "psat?", " ? psat "]) {
      const c = silent();
      const r = s.run(code, c.sink);
      expect(r.ok, code).toBe(true);
      if (!r.ok) continue;
      expect(r.help).toBe("page");
      expect(r.result!["text/plain"]).toMatch(/^psat\(m: model, T: /);
      // The same text as inspect: one source of help.
      expect(r.result).toEqual(s.inspect("psat", 4, 1).bundle);
    }
  });
  it("run answers ?x for a variable with its value, and R? with the constant's source", () => {
    const c = silent();
    s.run("x = 5 bar", c.sink);
    const r = s.run("?x", c.sink);
    expect(r.ok && r.result!["text/plain"]).toBe("x = 5 bar");
    const rr = s.run("R?", c.sink);
    expect(rr.ok && rr.result!["text/plain"]).toMatch(/CODATA 2018/);
  });
  it("run answers ?nosuch with a note naming close matches, marked as a note", () => {
    const c = silent();
    const r = s.run("?tsatt", c.sink);
    expect(r.ok && r.help).toBe("note");
    expect(r.ok && r.result!["text/plain"]).toMatch(/^No help for 'tsatt': not a known name; did you mean \?tsat/);
    expect(c.out).toEqual([]);
  });
});
