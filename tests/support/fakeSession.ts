/**
 * A tiny scripted Session for engine and handler tests, independent of the real cell language:
 *   "name = 5"      stores a number          "name"       returns it (error if unknown)
 *   "echo TEXT"     writes TEXT to stdout     "show TEXT"  displays TEXT (display id "d1")
 *   "update TEXT"   updates display "d1"      "clear"      clear_output(wait=false)
 *   "loop"          busy loop polling shouldStop (cooperative interrupt)
 *   "spin"          busy loop that never polls (needs the hard interrupt)
 *   "fail"          an error result           "throw"      throws (engine fault path)
 *   "announce TEXT" writes TEXT, then loops polling shouldStop (outputs must reach the host mid-cell)
 *   "chart"         displays a Vega-Lite bundle without its SVG (pending), then writes "after"
 *   "uncloneable"   returns a value holding a function (cannot cross a worker boundary)
 *   "?psat"/"psat?" a help result (help: "page"); "?other" a "No help" note (help: "note")
 */
import type { CellSink, RunResult, Session, SessionOptions } from "../../lib/language/index.js";

export function createSession(options: SessionOptions): Session {
  const vars = new Map<string, number>();
  const err = (ename: string, evalue: string): RunResult => ({ ok: false, error: { ename, evalue, traceback: [`${ename}: ${evalue}`] } });
  const run = (code: string, sink: CellSink): RunResult => {
    let m: RegExpExecArray | null;
    if ((m = /^(\w+)\s*=\s*(-?\d+(?:\.\d+)?)$/.exec(code))) {
      vars.set(m[1]!, Number(m[2]));
      return { ok: true };
    }
    if ((m = /^echo (.*)$/s.exec(code))) {
      sink.stdout(m[1]! + "\n");
      return { ok: true };
    }
    if ((m = /^show (.*)$/s.exec(code))) {
      sink.display({ "text/plain": m[1]! }, { displayId: "d1" });
      return { ok: true };
    }
    if ((m = /^update (.*)$/s.exec(code))) {
      sink.display({ "text/plain": m[1]! }, { displayId: "d1", update: true });
      return { ok: true };
    }
    if (code === "clear") {
      sink.clear(false);
      return { ok: true };
    }
    if (code === "loop") {
      for (;;) if (options.shouldStop()) return err("Interrupted", "stopped by the user");
    }
    if (code === "spin") {
      const end = Date.now() + 60_000;
      while (Date.now() < end) {
        // deliberately never polls shouldStop
      }
      return { ok: true };
    }
    if ((m = /^announce (.*)$/s.exec(code))) {
      sink.stdout(m[1]! + "\n");
      for (;;) if (options.shouldStop()) return err("Interrupted", "stopped by the user");
    }
    if (code === "chart") {
      const spec = { $schema: "https://vega.github.io/schema/vega-lite/v5.json", data: { values: [{ x: 1, y: 2 }, { x: 2, y: 3 }] }, mark: "line", encoding: { x: { field: "x", type: "quantitative" }, y: { field: "y", type: "quantitative" } } };
      sink.display({ "text/plain": "a chart", "application/vnd.vegalite.v5+json": spec });
      sink.stdout("after\n");
      return { ok: true };
    }
    if (code === "uncloneable") return { ok: true, result: { "text/plain": "x", hook: () => 1 } };
    if ((m = /^\s*(?:\?(\w+)|(\w+)\?)\s*$/.exec(code))) {
      const name = m[1] ?? m[2]!;
      if (name === "psat") return { ok: true, result: { "text/plain": "psat(m, T): saturation pressure" }, help: "page" };
      return { ok: true, result: { "text/plain": `No help for '${name}': not a known name` }, help: "note" };
    }
    if (code === "fail") return err("ValueError", "asked to fail");
    if (code === "throw") throw new Error("session fault");
    if (code.trim() === "") return { ok: true };
    if (vars.has(code.trim())) return { ok: true, result: { "text/plain": String(vars.get(code.trim())) } };
    return err("NameError", `unknown name ${JSON.stringify(code)}`);
  };
  return {
    run,
    evaluateExpression: (e) => run(e, { stdout() {}, display() {}, clear() {} }),
    complete: (code, cursorPos) => {
      const chars = [...code];
      let start = cursorPos;
      while (start > 0 && /\w/u.test(chars[start - 1]!)) start--;
      const prefix = chars.slice(start, cursorPos).join("");
      return { matches: ["pressure", "psat", "volume", ...vars.keys()].filter((n) => n.startsWith(prefix)), cursorStart: start, cursorEnd: cursorPos };
    },
    inspect: (code) => (/psat/.test(code) ? { found: true, bundle: { "text/plain": "psat(m, T): saturation pressure" } } : { found: false }),
    isComplete: (code) => {
      let depth = 0;
      for (const ch of code) depth += ch === "(" ? 1 : ch === ")" ? -1 : 0;
      return depth > 0 ? { status: "incomplete", indent: "" } : depth < 0 ? { status: "invalid" } : { status: "complete" };
    },
  };
}
